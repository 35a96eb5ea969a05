#include "thermo/calorically_perfect_model.h"

#include "common/error.h"

namespace cw::thermo {

CaloricallyPerfectModel::CaloricallyPerfectModel(std::string kind, std::shared_ptr<const ConstantCpGas> cold,
                                                 std::shared_ptr<const ConstantCpGas> hot,
                                                 double lowerHeatingValue, double stoichiometricFuelAirRatio,
                                                 bool neglectFuelMass)
    : kind_(std::move(kind)),
      cold_(std::move(cold)),
      hot_(std::move(hot)),
      lowerHeatingValue_(lowerHeatingValue),
      stoichiometric_(stoichiometricFuelAirRatio),
      neglectFuelMass_(neglectFuelMass) {}

std::shared_ptr<const Gas> CaloricallyPerfectModel::products(double fuelAirRatio) const {
  if (!(fuelAirRatio >= 0.0 && fuelAirRatio <= stoichiometric_))
    throw InvalidInput("fuel-air ratio", fuelAirRatio, "", "[0, " + messageNumber(stoichiometric_) + "]");
  return hot_;
}

std::shared_ptr<const Gas> CaloricallyPerfectModel::productsEntering(double fuelAirRatio, const Gas& entering,
                                                                     double temperature,
                                                                     double pressure) const {
  products(fuelAirRatio);  // checks f
  const double entropy = entering.entropy(temperature, pressure);
  if (hot_->entropy(temperature, pressure) == entropy) return hot_;  // constant-cp: one gas, one scale
  return hot_->withEntropyAt(temperature, pressure, entropy);
}

}  // namespace cw::thermo
