#include "engine/gas_model_factory.h"

#include "common/error.h"
#include "thermo/calorically_perfect_model.h"
#include "thermo/combustion.h"
#include "thermo/mixture.h"
#include "thermo/thermally_perfect_model.h"

#include <variant>

namespace cw::engine {

using thermo::CaloricallyPerfectModel;
using thermo::ConstantCpGas;
using thermo::GasModel;
using thermo::HydrocarbonFuel;
using thermo::ThermallyPerfectModel;

std::shared_ptr<const GasModel> makeGasModel(const GasModelInputs& inputs, const thermo::FuelInputs& fuel,
                                             double specificHumidity) {
  auto hydrocarbon = [&] { return HydrocarbonFuel(fuel.hydrogenCarbonRatio, fuel.lowerHeatingValue); };
  auto stoichiometricRatio = [&] {
    // The element balance costs more than a two-gamma design point: keep the last one per thread
    // (keyed on every input hydrocarbon() checks, so invalid fuel data still throw).
    thread_local double lastHydrogenCarbonRatio = -1.0, lastHeatingValue = -1.0, lastHumidity = -1.0;
    thread_local double lastRatio = 0.0;
    if (fuel.hydrogenCarbonRatio != lastHydrogenCarbonRatio || fuel.lowerHeatingValue != lastHeatingValue ||
        specificHumidity != lastHumidity) {
      lastRatio = thermo::stoichiometricFuelAirRatio(thermo::humidAir(specificHumidity), hydrocarbon());
      lastHydrogenCarbonRatio = fuel.hydrogenCarbonRatio;
      lastHeatingValue = fuel.lowerHeatingValue;
      lastHumidity = specificHumidity;
    }
    return lastRatio;
  };
  // The calorically perfect models measure enthalpy from 0 K (h = cp T), the convention of
  // parametric cycle analysis, so that the burner balance is Mattingly's eq. 7.9.
  constexpr double zeroKelvin = 0.0;
  if (const auto* c = std::get_if<ConstantCpGasModel>(&inputs.model)) {
    auto gas = std::make_shared<const ConstantCpGas>(c->cp, c->gamma, "constant-cp gas", zeroKelvin);
    return std::make_shared<const CaloricallyPerfectModel>("constant-cp", gas, gas, fuel.lowerHeatingValue,
                                                           stoichiometricRatio(), inputs.neglectFuelMass);
  }
  if (const auto* t = std::get_if<TwoGammaGasModel>(&inputs.model)) {
    auto cold = std::make_shared<const ConstantCpGas>(t->coldCp, t->coldGamma, "two-gamma air", zeroKelvin);
    auto hot = std::make_shared<const ConstantCpGas>(t->hotCp, t->hotGamma, "two-gamma products", zeroKelvin);
    return std::make_shared<const CaloricallyPerfectModel>("two-gamma", cold, hot, fuel.lowerHeatingValue,
                                                           stoichiometricRatio(), inputs.neglectFuelMass);
  }
  // Thermally perfect: NASA species data, absolute enthalpies (thermo/thermally_perfect_model.h).
  struct Key {
    double hydrogenCarbonRatio, lowerHeatingValue, temperature, specificHumidity;
    bool operator==(const Key&) const = default;
  };
  thread_local Key lastKey{-1.0, -1.0, -1.0, -1.0};
  thread_local std::shared_ptr<const GasModel> lastModel;
  const Key key{fuel.hydrogenCarbonRatio, fuel.lowerHeatingValue, fuel.temperature, specificHumidity};
  if (!lastModel || !(key == lastKey)) {
    lastModel =
        std::make_shared<const ThermallyPerfectModel>(hydrocarbon(), specificHumidity, fuel.temperature);
    lastKey = key;
  }
  return lastModel;
}

}  // namespace cw::engine
