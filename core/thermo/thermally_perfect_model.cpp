#include "thermo/thermally_perfect_model.h"

#include "common/error.h"
#include "thermo/combustion.h"
#include "thermo/mixture.h"

#include <utility>

namespace cw::thermo {

ThermallyPerfectModel::ThermallyPerfectModel(HydrocarbonFuel fuel, double specificHumidity, double fuelTemperature)
    : fuel_(std::move(fuel)),
      airComposition_(humidAir(specificHumidity)),
      air_(std::make_shared<ThermallyPerfectGas>(airComposition_, "air (thermally perfect)")),
      fuelEnthalpy_(fuel_.enthalpy(fuelTemperature)),
      stoichiometric_(thermo::stoichiometricFuelAirRatio(airComposition_, fuel_)) {}

std::shared_ptr<const Gas> ThermallyPerfectModel::products(double fuelAirRatio) const {
  if (fuelAirRatio == 0.0) return air_;
  return std::make_shared<ThermallyPerfectGas>(completeCombustionProducts(airComposition_, fuel_, fuelAirRatio),
                                               "products, f = " + formatNumber(fuelAirRatio));
}

}  // namespace cw::thermo
