#pragma once
// The inputs of the turbine (components/turbine.h). Plain struct, SI units.

#include "components/efficiency_inputs.h"

namespace cw::components {

struct TurbineInputs {
  Efficiency efficiency{EfficiencyBasis::Isentropic, 0.88};
  double mechanicalEfficiency = 0.99;  ///< compressor power / turbine power, shaft losses [-]
  double powerOfftake = 0.0;           ///< shaft power taken for accessories [W]
  bool operator==(const TurbineInputs&) const = default;
};

}  // namespace cw::components
