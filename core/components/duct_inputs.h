#pragma once
// The inputs of a duct (components/duct.h). Plain struct, SI units.

namespace cw::components {

/// A duct between components (the jet pipe from turbine exit to nozzle entry).
struct DuctInputs {
  double pressureLossFraction = 0.02;  ///< 1 - pt_out / pt_in [-]
  bool operator==(const DuctInputs&) const = default;
};

}  // namespace cw::components
