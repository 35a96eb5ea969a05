#pragma once
// An engine of any architecture evaluated at its design point: the case's topology
// (topologies.h) run by the design-point sequence (design_point.h).

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"
#include "thermo/gas_model.h"

#include <memory>

namespace cw::network {

class Engine {
 public:
  /// Builds the gas model of a validated case. Without paths, the evaluation skips the process
  /// paths that only the charts need (sweeps, audits).
  explicit Engine(const engine::Case& inputs, bool withPaths = true);

  /// Evaluates the design point: at the case's air mass flow, or at the air mass flow that
  /// gives the required net thrust. Throws cw::NoSolution when no cycle exists.
  engine::CycleResult evaluate() const;

  /// Evaluates at a given engine-face air mass flow W2. [kg/s]
  engine::CycleResult evaluateAt(double airMassFlow) const;

  const thermo::GasModel& gasModel() const { return *gasModel_; }

 private:
  engine::Case inputs_;
  bool withPaths_;
  std::shared_ptr<const thermo::GasModel> gasModel_;
};

/// The design point of a validated case, as Engine(inputs, withPaths).evaluate() gives it, on a
/// gas model built for the case's gas model inputs, fuel and humidity (makeGasModel), without a
/// copy of the case: for callers that evaluate a case and its variants on one gas model.
engine::CycleResult evaluateEngine(const engine::Case& inputs, const thermo::GasModel& gasModel,
                                   bool withPaths = true);

}  // namespace cw::network
