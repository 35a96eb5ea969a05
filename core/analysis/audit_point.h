#pragma once
// The fixed point of a loss audit: every evaluation of the audit keeps the actual cycle's
// engine-face air mass flow W2 and burner exit temperature Tt4, as the ideal twin does
// (analysis/ideal_twin.h), so a case set by thrust or by fuel-air ratio is audited at its
// resolved W2 and Tt4.

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"

namespace cw::analysis {

/// Specific thrust and TSFC of one evaluation of the audit.
struct AuditFigures {
  double specificThrust = 0.0;                 ///< F_n / W2 [N s/kg]
  double thrustSpecificFuelConsumption = 0.0;  ///< W_f / F_n [kg/(N s)]
};

class AuditPoint {
 public:
  /// Validates the case (cw::engine::CaseValidationError), evaluates it once and fixes its W2 and Tt4.
  explicit AuditPoint(const engine::Case& actual);

  /// The case at the fixed W2 and Tt4 (design target and burner setting replaced).
  const engine::Case& baseCase() const { return base_; }
  /// The actual cycle, as evaluated from the case as given.
  const engine::CycleResult& actual() const { return actual_; }
  /// The ideal twin of the base case.
  engine::Case idealCase() const;

  /// Evaluates a variant of the base case (fast path, no process paths). Throws cw::NoSolution
  /// when the variant has no cycle.
  static AuditFigures figuresOf(const engine::Case& variant);

 private:
  engine::CycleResult actual_;
  engine::Case base_;
};

}  // namespace cw::analysis
