#include "thermo/fuel.h"

#include "common/error.h"

#include <cmath>

namespace cw::thermo {

namespace {

// Standard atomic weights used by the species data (core/thermo/data/nasa7-tm4513.json, "units"). [kg/mol]
constexpr double kCarbonMolarMass = 12.0107e-3;
constexpr double kHydrogenMolarMass = 1.00794e-3;

}  // namespace

HydrocarbonFuel::HydrocarbonFuel(double hydrogenCarbonRatio, double lowerHeatingValue, double cp,
                                 const SpeciesTable& table)
    : y_(hydrogenCarbonRatio), lowerHeatingValue_(lowerHeatingValue), cp_(cp), table_(&table) {
  if (!std::isfinite(y_) || y_ < 0.0 || y_ > kMaximumHydrogenCarbonRatio)
    throw InvalidInput("fuel hydrogen-carbon ratio", y_, "",
                       "[0, " + messageNumber(kMaximumHydrogenCarbonRatio) + "]");
  if (!std::isfinite(lowerHeatingValue_) || lowerHeatingValue_ < kMinimumHeatingValue ||
      lowerHeatingValue_ > kMaximumHeatingValue)
    throw InvalidInput(
        "fuel lower heating value", lowerHeatingValue_, "J/kg",
        "[" + messageNumber(kMinimumHeatingValue) + ", " + messageNumber(kMaximumHeatingValue) + "] J/kg");
  if (!std::isfinite(cp_) || cp_ <= 0.0 || cp_ > 1.0e4)
    throw InvalidInput("fuel specific heat", cp_, "J/(kg K)", "(0, 10000] J/(kg K)");
  molarMass_ = kCarbonMolarMass + y_ * kHydrogenMolarMass;
  // h_f,fuel = M_f LHV + h_CO2(T0) + (y/2) h_H2O(T0) - (1 + y/4) h_O2(T0)   [J/mol], see fuel.h.
  const double t0 = kReferenceTemperature;
  const double molar = molarMass_ * lowerHeatingValue_ + table.byName("CO2").enthalpy(t0) +
                       0.5 * y_ * table.byName("H2O").enthalpy(t0) -
                       (1.0 + 0.25 * y_) * table.byName("O2").enthalpy(t0);
  formationEnthalpy_ = molar / molarMass_;
}

HydrocarbonFuel HydrocarbonFuel::keroseneLike() {
  return HydrocarbonFuel(1.9, 43.0e6);
}

double HydrocarbonFuel::entropy(double temperature) const {
  enthalpy(temperature);  // checks the range
  return kStandardEntropy + cp_ * std::log(temperature / kReferenceTemperature);
}

double HydrocarbonFuel::enthalpy(double temperature) const {
  if (!std::isfinite(temperature) || temperature < kMinimumTemperature || temperature > kMaximumTemperature)
    throw OutOfRange(
        "fuel temperature", temperature, "K",
        "[" + messageNumber(kMinimumTemperature) + ", " + messageNumber(kMaximumTemperature) + "] K");
  // h_fuel(T) = h_f,fuel + cp_fuel (T - T0), see fuel.h.
  return formationEnthalpy_ + cp_ * (temperature - kReferenceTemperature);
}

}  // namespace cw::thermo
