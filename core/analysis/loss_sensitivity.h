#pragma once
// Sensitivities of specific thrust and TSFC to each loss parameter, per the unit a practitioner
// uses: per point of efficiency or coefficient (0.01), per percent of pressure-loss fraction
// (0.01), per percent of bleed (0.01 of the inlet air), per kW of power offtake.
//
// Central differences at the audit point (W2 and Tt4 fixed, analysis/audit_point.h):
//   dF/dx ~ (F(x + h) - F(x - h)) / (2 h),            error O(h^2)
// with h = 1e-4 of the parameter's unit range (1e-4 in an efficiency or fraction, whose range
// is 1; 0.1 kW, i.e. 1e-4 of 1 MW, for the offtake). Where x + h or x - h leaves the valid
// range (an efficiency at 1, a loss at 0) the one-sided second-order formula is used,
//   dF/dx ~ (-3 F(x) + 4 F(x + s h) - F(x + 2 s h)) / (2 s h),   s = +1 forward, -1 backward,
// also O(h^2) (e.g. Fornberg, Generation of finite difference formulas on arbitrarily spaced
// grids, Math. Comp. 51, 1988, the three-point stencil; common practice). The result says which.
// The nozzle expansion has no continuous parameter and no sensitivity.

#include "analysis/audit_point.h"

#include <string>
#include <vector>

namespace cw::analysis {

enum class DifferenceScheme { Central, Forward, Backward };

/// "central", "forward", "backward".
std::string toString(DifferenceScheme scheme);

struct LossSensitivity {
  std::string loss;       ///< the loss key
  std::string field;      ///< the case path of the parameter
  std::string unit;       ///< the "per" unit, e.g. "point of efficiency (0.01)"
  double unitSize = 0.0;  ///< that unit in the parameter's value [-] or [W]
  double value = 0.0;     ///< the parameter's value in the case [-] or [W]
  double step = 0.0;      ///< the difference step h [-] or [W]
  DifferenceScheme scheme = DifferenceScheme::Central;
  double specificThrustPerUnit = 0.0;  ///< dF_s/dx times the unit [N s/kg per unit]
  double tsfcPerUnit = 0.0;            ///< dTSFC/dx times the unit [kg/(N s) per unit]
};

/// The relative difference step: h = kRelativeStep times the parameter's unit range. [-]
inline constexpr double kRelativeStep = 1e-4;

/// One loss's sensitivity with the step h = relativeStep times its unit range (1, or 1 MW for
/// the offtake). Throws cw::InvalidInput for a key without a parameter.
LossSensitivity sensitivityOf(const AuditPoint& point, const std::string& key,
                              double relativeStep = kRelativeStep);

/// Every applicable loss with a parameter, in flow order.
std::vector<LossSensitivity> sensitivities(const AuditPoint& point, double relativeStep = kRelativeStep);

}  // namespace cw::analysis
