#pragma once
// The inputs of the burner and the afterburner, the two heat additions (components/heat_addition.h).
// Plain structs, SI units.

#include <variant>

namespace cw::components {

struct ExitTemperatureSetting {
  double exitTemperature = 1400.0;  ///< Tt4 [K]
  bool operator==(const ExitTemperatureSetting&) const = default;
};

struct FuelAirRatioSetting {
  double fuelAirRatio = 0.02;  ///< fuel per unit of burner air [-]
  bool operator==(const FuelAirRatioSetting&) const = default;
};

struct BurnerInputs {
  std::variant<ExitTemperatureSetting, FuelAirRatioSetting> setting;
  double pressureLossFraction = 0.05;  ///< 1 - pt4 / pt3 [-]
  double combustionEfficiency = 0.99;  ///< fraction of the heating value released [-]
  bool operator==(const BurnerInputs&) const = default;
};

/// The afterburner: lit (enabled) or not. Unlit, its duct loses pressureLossFractionUnlit;
/// the default 0 describes an engine without afterburner hardware.
struct AfterburnerInputs {
  bool enabled = false;                    ///< lit
  double exitTemperature = 2000.0;         ///< Tt7 when lit [K]
  double pressureLossFractionLit = 0.05;   ///< 1 - pt_out / pt_in when lit [-]
  double pressureLossFractionUnlit = 0.0;  ///< 1 - pt_out / pt_in when not lit [-]
  double combustionEfficiency = 0.95;      ///< when lit [-]
  bool operator==(const AfterburnerInputs&) const = default;
};

}  // namespace cw::components
