#pragma once
// The thermally perfect gas model: NASA TM-4513 species data, (humid) air and the frozen
// products of complete lean combustion of a C H_y fuel (thermo/combustion.h), all on the
// absolute enthalpy scale, so the burner balance of thermo/gas_model.h holds with
// h_fuel = h_f,fuel + cp_fuel (T_fuel - 298.15 K) (thermo/fuel.h).

#include "thermo/combustion.h"
#include "thermo/fuel.h"
#include "thermo/gas_model.h"
#include "thermo/thermally_perfect_gas.h"

#include <memory>

namespace cw::thermo {

class ThermallyPerfectModel : public GasModel {
 public:
  /// Throws cw::InvalidInput for a specific humidity outside [0, 0.05] and cw::OutOfRange for a
  /// fuel temperature outside [200, 1000] K.
  ThermallyPerfectModel(HydrocarbonFuel fuel, double specificHumidity = 0.0,
                        double fuelTemperature = HydrocarbonFuel::kReferenceTemperature);

  std::string kind() const override { return "thermally-perfect"; }
  std::shared_ptr<const Gas> air() const override { return air_; }
  std::shared_ptr<const Gas> products(double fuelAirRatio) const override;
  double fuelEnthalpy() const override { return fuelEnthalpy_; }
  /// The liquid fuel's absolute entropy at its delivery temperature (HydrocarbonFuel::entropy).
  double fuelEntropy(double /*enteringEntropy*/) const override { return fuelEntropy_; }
  double lowerHeatingValue() const override { return fuel_.lowerHeatingValue(); }
  double stoichiometricFuelAirRatio() const override { return stoichiometric_; }
  /// Lean products at f are a mass blend of (1 - f/f_st) kg of air and f (1 + f_st)/f_st kg of
  /// stoichiometric products per kg of air (species mass balance of complete combustion), so
  /// (1 + f) h_p(T; f) = (1 - f/f_st) h_air(T) + f (1 + f_st)/f_st h_st(T). [J/kg of air]
  double productEnthalpyPerUnitAir(double temperature, double fuelAirRatio) const override;

  const HydrocarbonFuel& fuel() const { return fuel_; }

 private:
  HydrocarbonFuel fuel_;
  Composition airComposition_;
  CompleteCombustion combustion_;
  std::shared_ptr<const ThermallyPerfectGas> air_;
  std::shared_ptr<const ThermallyPerfectGas> stoichiometricProducts_;
  double fuelEnthalpy_;
  double fuelEntropy_;
  double stoichiometric_;
};

}  // namespace cw::thermo
