#pragma once
// The fuel of a case: a hydrocarbon C H_y, burnt completely (thermo/fuel.h builds it). Plain
// struct, SI units.

namespace cw::thermo {

struct FuelInputs {
  double lowerHeatingValue = 43.0e6;  ///< at 298.15 K [J/kg]
  double hydrogenCarbonRatio = 1.9;   ///< molar H/C ratio y of C H_y [-]
  double temperature = 298.15;        ///< delivery temperature at the burner [K]
  bool operator==(const FuelInputs&) const = default;
};

}  // namespace cw::thermo
