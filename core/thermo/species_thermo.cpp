#include "thermo/species_thermo.h"

#include "common/error.h"
#include "thermo/gas.h"

#include <cmath>
#include <utility>

namespace cw::thermo {

SpeciesThermo::SpeciesThermo(std::string name, double molarMass, std::map<std::string, int> elements,
                             NasaPolynomial low, NasaPolynomial high)
    : name_(std::move(name)),
      molarMass_(molarMass),
      elements_(std::move(elements)),
      low_(std::move(low)),
      high_(std::move(high)) {
  const std::string where = "species " + name_;
  if (!std::isfinite(molarMass_) || molarMass_ <= 0.0)
    throw InvalidInput(where + ": molar mass", molarMass_, "kg/mol", "(0, inf) kg/mol");
  if (elements_.empty()) throw InvalidInput(where, "has no elements");
  for (const auto& [element, count] : elements_)
    if (count <= 0) throw InvalidInput(where + ": atoms of " + element, count, "", "[1, inf)");
  if (low_.maximumTemperature() != high_.minimumTemperature())
    throw InvalidInput(where + ": minimum temperature of the high range", high_.minimumTemperature(), "K",
                       "[" + messageNumber(low_.maximumTemperature()) + ", " +
                           messageNumber(low_.maximumTemperature()) + "] K (the low range's maximum)");
  const Jumps jumps = jumpsAtMidTemperature();
  const std::string range = "[-" + messageNumber(kContinuityTolerance) + ", " +
                            messageNumber(kContinuityTolerance) +
                            "] (continuity at T_mid = " + messageNumber(midTemperature()) + " K)";
  if (!(std::abs(jumps.cpOverR) <= kContinuityTolerance))
    throw InvalidInput(where + ": jump of cp/R at T_mid", jumps.cpOverR, "", range);
  if (!(std::abs(jumps.enthalpyOverRT) <= kContinuityTolerance))
    throw InvalidInput(where + ": jump of h/(RT) at T_mid", jumps.enthalpyOverRT, "", range);
  if (!(std::abs(jumps.entropyOverR) <= kContinuityTolerance))
    throw InvalidInput(where + ": jump of s/R at T_mid", jumps.entropyOverR, "", range);
}

void SpeciesThermo::extendBelow(NasaPolynomial cold) {
  const std::string where = "species " + name_ + ": cold range";
  const double joint = low_.minimumTemperature();
  if (cold.maximumTemperature() != joint)
    throw InvalidInput(
        where + ": maximum temperature", cold.maximumTemperature(), "K",
        "[" + messageNumber(joint) + ", " + messageNumber(joint) + "] K (the low range's minimum)");
  const TemperaturePowers t(joint);
  const std::string range = "[-" + messageNumber(kContinuityTolerance) + ", " +
                            messageNumber(kContinuityTolerance) + "] (continuity at " + messageNumber(joint) +
                            " K)";
  for (const auto& [jump, what] : {std::pair{low_.cpOverR(t) - cold.cpOverR(t), ": jump of cp/R"},
                                   {low_.enthalpyOverRT(t) - cold.enthalpyOverRT(t), ": jump of h/(RT)"},
                                   {low_.entropyOverR(t) - cold.entropyOverR(t), ": jump of s/R"}})
    if (!(std::abs(jump) <= kContinuityTolerance)) throw InvalidInput(where + what, jump, "", range);
  cold_ = std::move(cold);
}

std::vector<double> SpeciesThermo::breakTemperatures() const {
  if (cold_) return {low_.minimumTemperature(), midTemperature()};
  return {midTemperature()};
}

int SpeciesThermo::atoms(const std::string& element) const {
  const auto it = elements_.find(element);
  return it == elements_.end() ? 0 : it->second;
}

void SpeciesThermo::checkTemperature(double temperature) const {
  if (!std::isfinite(temperature) || temperature < minimumTemperature() || temperature > maximumTemperature())
    throw OutOfRange(
        "species " + name_ + ": temperature", temperature, "K",
        "[" + messageNumber(minimumTemperature()) + ", " + messageNumber(maximumTemperature()) + "] K");
}

double SpeciesThermo::cpOverR(double temperature) const {
  checkTemperature(temperature);
  return rangeAt(temperature).cpOverR(TemperaturePowers(temperature));
}

double SpeciesThermo::enthalpyOverRT(double temperature) const {
  checkTemperature(temperature);
  return rangeAt(temperature).enthalpyOverRT(TemperaturePowers(temperature));
}

double SpeciesThermo::entropyOverR(double temperature) const {
  checkTemperature(temperature);
  return rangeAt(temperature).entropyOverR(TemperaturePowers(temperature));
}

double SpeciesThermo::cp(double temperature) const {
  return kMolarGasConstant * cpOverR(temperature);
}

double SpeciesThermo::enthalpy(double temperature) const {
  return kMolarGasConstant * temperature * enthalpyOverRT(temperature);
}

double SpeciesThermo::standardEntropy(double temperature) const {
  return kMolarGasConstant * entropyOverR(temperature);
}

SpeciesThermo::Jumps SpeciesThermo::jumpsAtMidTemperature() const {
  const TemperaturePowers t(midTemperature());
  return {high_.cpOverR(t) - low_.cpOverR(t), high_.enthalpyOverRT(t) - low_.enthalpyOverRT(t),
          high_.entropyOverR(t) - low_.entropyOverR(t)};
}

}  // namespace cw::thermo
