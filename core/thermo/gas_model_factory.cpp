#include "thermo/gas_model_factory.h"

#include "common/error.h"
#include "thermo/calorically_perfect_model.h"

#include <variant>

namespace cw::thermo {

namespace {

/// Stoichiometric fuel-air ratio of C H_y in air of the U.S. Standard Atmosphere 1976 dry
/// composition (O2 mole fraction 0.209476 of the four main constituents), diluted by
/// specific humidity q: f_st = (M_C + y M_H) / ((1 + y/4) M_air / x_O2) (1 - q)
/// (complete combustion C H_y + (1 + y/4) O2 -> C O2 + (y/2) H2O).
double stoichiometricFuelAirRatio(double hydrogenCarbonRatio, double specificHumidity) {
  constexpr double xN2 = 0.78084, xO2 = 0.209476, xAr = 0.00934, xCO2 = 0.000314;
  constexpr double sum = xN2 + xO2 + xAr + xCO2;
  constexpr double airMolarMass = (xN2 * 28.0134 + xO2 * 31.9988 + xAr * 39.948 + xCO2 * 44.0095) / sum;
  const double fuelPerMoleCarbon = 12.0107 + hydrogenCarbonRatio * 1.00794;
  const double airPerMoleOxygen = airMolarMass / (xO2 / sum);
  return fuelPerMoleCarbon / ((1.0 + hydrogenCarbonRatio / 4.0) * airPerMoleOxygen) * (1.0 - specificHumidity);
}

}  // namespace

std::unique_ptr<GasModel> makeGasModel(const engine::GasModelInputs& inputs, const engine::FuelInputs& fuel,
                                       double specificHumidity) {
  const double stoichiometric = stoichiometricFuelAirRatio(fuel.hydrogenCarbonRatio, specificHumidity);
  // The calorically perfect models measure enthalpy from 0 K (h = cp T), the convention of
  // parametric cycle analysis, so that the burner balance is Mattingly's eq. 7.9.
  constexpr double zeroKelvin = 0.0;
  if (const auto* c = std::get_if<engine::ConstantCpGasModel>(&inputs.model)) {
    auto gas = std::make_shared<const ConstantCpGas>(c->cp, c->gamma, "constant-cp gas", zeroKelvin);
    return std::make_unique<CaloricallyPerfectModel>("constant-cp", gas, gas, fuel.lowerHeatingValue, stoichiometric,
                                                     inputs.neglectFuelMass);
  }
  if (const auto* t = std::get_if<engine::TwoGammaGasModel>(&inputs.model)) {
    auto cold = std::make_shared<const ConstantCpGas>(t->coldCp, t->coldGamma, "two-gamma air", zeroKelvin);
    auto hot = std::make_shared<const ConstantCpGas>(t->hotCp, t->hotGamma, "two-gamma products", zeroKelvin);
    return std::make_unique<CaloricallyPerfectModel>("two-gamma", cold, hot, fuel.lowerHeatingValue, stoichiometric,
                                                     inputs.neglectFuelMass);
  }
  throw InvalidInput("/gas_model/kind", "thermally-perfect is not available yet in this build");
}

}  // namespace cw::thermo
