#pragma once
// The design-point sequence of a network: the free stream, then every component in flow order
// (each shaft's turbine delivering what its compressors took), then performance summed over every
// nozzle and shaft, sizing of the engine face and every nozzle, and the process paths. A
// net-thrust target is met on the core's Newton solver (core/solve) in the air mass flow.

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"
#include "network/design_state.h"
#include "network/network.h"
#include "thermo/gas_model.h"

namespace cw::network {

/// The evaluation itself, on a case and gas model that the caller keeps alive. The flight
/// condition's states do not depend on the air mass flow: they are found once, for every at().
class DesignPoint {
 public:
  /// Builds the topology's network for the case in place.
  DesignPoint(const engine::Case& inputs, Topology topology, const thermo::GasModel& model, bool withPaths);

  /// The network run at a given engine-face air mass flow W2. [kg/s]
  engine::CycleResult at(double airMassFlow) const;
  /// At the case's air mass flow, or at the one that gives the required net thrust.
  engine::CycleResult design() const;

 private:
  void run(DesignState& state) const;
  /// The net thrust at a given air mass flow, the design state run without a result; throws
  /// cw::NoSolution unless it is positive, as at() does. [N]
  double netThrustAt(double airMassFlow) const;
  engine::CycleResult resultOf(DesignState& state) const;

  const engine::Case& inputs_;
  Network network_;
  DesignContext context_;
};

}  // namespace cw::network
