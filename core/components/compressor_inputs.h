#pragma once
// The inputs of the compressor (components/compressor.h). Plain struct, SI units.

#include "components/efficiency_inputs.h"

namespace cw::components {

struct CompressorInputs {
  double pressureRatio = 10.0;  ///< pt3 / pt2 [-]
  Efficiency efficiency{EfficiencyBasis::Isentropic, 0.85};
  double bleedFraction = 0.0;  ///< bled off at compressor exit, per unit of inlet air [-]
  bool operator==(const CompressorInputs&) const = default;
};

}  // namespace cw::components
