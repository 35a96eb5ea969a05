#pragma once
// Turbine, stations 4 -> 5.
//
// Shaft work balance (Mattingly, Elements of Propulsion, 2006, eq. 7.17, with the shaft
// power offtake P_x of eq. 7.27 for a turbojet with losses):
//   eta_m W4 (ht4 - ht5) = P_c + P_x
// The exit pressure follows from the exit temperature and the efficiency on its basis
// (components/efficiency.h). If the turbine cannot supply the power (its exit enthalpy
// falls below what the gas data cover, or its expansion ratio becomes unphysical) the
// result is cw::NoSolution: "the turbine cannot drive the compressor".

#include "components/efficiency.h"
#include "components/turbine_inputs.h"
#include "stream/station.h"

namespace cw::components {

class Turbine {
 public:
  struct Result {
    stream::TotalState exit;    ///< station 5
    double specificWork = 0.0;  ///< ht4 - ht5 [J/kg]
    double power = 0.0;         ///< W4 (ht4 - ht5) [W]
    EfficiencyPair efficiency;  ///< both bases [-]
  };

  explicit Turbine(const TurbineInputs& inputs) : inputs_(inputs) {}

  /// Expands the stream so that it delivers the compressor power plus the offtake. [W]
  Result exit(const stream::TotalState& entry, double compressorPower) const;

 private:
  TurbineInputs inputs_;
};

}  // namespace cw::components
