#include "thermo/thermally_perfect_model.h"

#include "common/error.h"
#include "thermo/mixture.h"

#include <utility>

namespace cw::thermo {

ThermallyPerfectModel::ThermallyPerfectModel(HydrocarbonFuel fuel, double specificHumidity,
                                             double fuelTemperature)
    : fuel_(std::move(fuel)),
      airComposition_(humidAir(specificHumidity)),
      combustion_(airComposition_, fuel_),
      air_(std::make_shared<ThermallyPerfectGas>(airComposition_, "air (thermally perfect)")),
      fuelEnthalpy_(fuel_.enthalpy(fuelTemperature)),
      fuelEntropy_(fuel_.entropy(fuelTemperature)),
      stoichiometric_(combustion_.stoichiometricFuelAirRatio()) {
  stoichiometricProducts_ =
      std::make_shared<ThermallyPerfectGas>(combustion_.products(stoichiometric_), "stoichiometric products");
}

double ThermallyPerfectModel::productEnthalpyPerUnitAir(double temperature, double fuelAirRatio) const {
  if (!(fuelAirRatio >= 0.0 && fuelAirRatio <= stoichiometric_))
    throw InvalidInput("fuel-air ratio", fuelAirRatio, "", "[0, " + messageNumber(stoichiometric_) + "]");
  const double products = fuelAirRatio * (1.0 + stoichiometric_) / stoichiometric_;
  return (1.0 - fuelAirRatio / stoichiometric_) * air_->enthalpy(temperature) +
         products * stoichiometricProducts_->enthalpy(temperature);
}

namespace {

/// Products at one fuel-air ratio, described as "products, f = <f>": the text is formatted when
/// asked for (messages, exports), not each time a burner makes the gas.
class ProductsGas final : public ThermallyPerfectGas {
 public:
  ProductsGas(Composition composition, double fuelAirRatio)
      : ThermallyPerfectGas(std::move(composition), "products"), fuelAirRatio_(fuelAirRatio) {}
  std::string description() const override { return "products, f = " + messageNumber(fuelAirRatio_); }

 private:
  double fuelAirRatio_;
};

}  // namespace

std::shared_ptr<const Gas> ThermallyPerfectModel::products(double fuelAirRatio) const {
  if (fuelAirRatio == 0.0) return air_;
  return std::make_shared<ProductsGas>(combustion_.products(fuelAirRatio), fuelAirRatio);
}

}  // namespace cw::thermo
