#include "thermo/thermally_perfect_model.h"

#include "common/error.h"
#include "thermo/combustion.h"
#include "thermo/mixture.h"

#include <utility>

namespace cw::thermo {

ThermallyPerfectModel::ThermallyPerfectModel(HydrocarbonFuel fuel, double specificHumidity,
                                             double fuelTemperature)
    : fuel_(std::move(fuel)),
      airComposition_(humidAir(specificHumidity)),
      air_(std::make_shared<ThermallyPerfectGas>(airComposition_, "air (thermally perfect)")),
      fuelEnthalpy_(fuel_.enthalpy(fuelTemperature)),
      stoichiometric_(thermo::stoichiometricFuelAirRatio(airComposition_, fuel_)) {
  stoichiometricProducts_ = std::make_shared<ThermallyPerfectGas>(
      completeCombustionProducts(airComposition_, fuel_, stoichiometric_), "stoichiometric products");
}

double ThermallyPerfectModel::productEnthalpyPerUnitAir(double temperature, double fuelAirRatio) const {
  if (!(fuelAirRatio >= 0.0 && fuelAirRatio <= stoichiometric_))
    throw InvalidInput("fuel-air ratio", fuelAirRatio, "", "[0, " + formatNumber(stoichiometric_) + "]");
  const double products = fuelAirRatio * (1.0 + stoichiometric_) / stoichiometric_;
  return (1.0 - fuelAirRatio / stoichiometric_) * air_->enthalpy(temperature) +
         products * stoichiometricProducts_->enthalpy(temperature);
}

std::shared_ptr<const Gas> ThermallyPerfectModel::products(double fuelAirRatio) const {
  if (fuelAirRatio == 0.0) return air_;
  return std::make_shared<ThermallyPerfectGas>(
      completeCombustionProducts(airComposition_, fuel_, fuelAirRatio),
      "products, f = " + formatNumber(fuelAirRatio));
}

}  // namespace cw::thermo
