#pragma once
// The loss audit of a case: what each loss costs in specific thrust and TSFC.
//
//   one at a time  each loss alone removed from the actual cycle:
//                    delta = figure(actual with that loss removed) - figure(actual)
//   waterfall      from the ideal twin, the losses added back one by one in the given order:
//                    step_k = figure(ideal + losses 1..k) - figure(ideal + losses 1..k-1),
//                  the last evaluation being the actual cycle itself, so the steps sum to
//                  figure(actual) - figure(ideal) by construction (a telescoping sum). The steps
//                  depend on the order, because the losses interact.
//
// Every evaluation keeps the actual cycle's W2 and Tt4 (analysis/audit_point.h). Losses that do
// not apply to the case (an afterburner neither lit nor with an unlit loss) are left out.
// Sensitivities and the second-law view are in loss_sensitivity.h and exergy_balance.h.

#include "analysis/audit_point.h"
#include "analysis/exergy_balance.h"
#include "analysis/loss_sensitivity.h"

#include <string>
#include <vector>

namespace cw::analysis {

/// The change in the figures when one loss is removed or added.
struct LossDelta {
  std::string loss;                  ///< the loss key (analysis/loss_catalogue.h)
  double deltaSpecificThrust = 0.0;  ///< [N s/kg]
  double deltaTsfc = 0.0;            ///< [kg/(N s)]
};

struct LossAudit {
  AuditFigures actual;                      ///< the actual cycle at the audit point
  AuditFigures ideal;                       ///< its ideal twin
  std::vector<LossDelta> oneAtATime;        ///< removed from the actual cycle, flow order
  std::vector<std::string> waterfallOrder;  ///< the order the losses were added in
  std::vector<LossDelta> waterfall;         ///< added to the ideal twin, in waterfallOrder
  std::vector<LossSensitivity> sensitivities;
  ExergyBalance exergy;  ///< of the actual cycle
};

/// The waterfall order: the given keys first, in their order, then the remaining losses in flow
/// order; losses that do not apply to the case are dropped. An unknown or repeated key throws
/// cw::InvalidInput naming the key (and, when unknown, listing the valid ones).
std::vector<std::string> waterfallOrderOf(const engine::Case& actual, const std::vector<std::string>& given);

/// The one-at-a-time view alone.
std::vector<LossDelta> oneAtATime(const AuditPoint& point);

/// The waterfall alone, in the given (complete, checked) order.
std::vector<LossDelta> waterfall(const AuditPoint& point, const std::vector<std::string>& order);

/// The whole audit. Throws what the case's evaluation throws.
LossAudit auditCase(const engine::Case& actual, const std::vector<std::string>& order = {});

}  // namespace cw::analysis
