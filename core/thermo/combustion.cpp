#include "thermo/combustion.h"

#include "common/error.h"

#include <algorithm>
#include <cmath>
#include <vector>

namespace cw::thermo {

namespace {

void checkElements(const Composition& air) {
  for (std::size_t i = 0; i < air.size(); ++i) {
    if (air.moleFractions()[i] <= 0.0) continue;
    for (const auto& [element, count] : air.table()[i].elements())
      if (element != "C" && element != "H" && element != "O" && element != "N" && element != "Ar")
        throw InvalidInput("combustion air", "holds element " + element + " (in " + air.table()[i].name() +
                                                 "); complete combustion handles C, H, O, N and Ar only");
  }
}

/// Moles of O2 left per kg of air when b_C, b_H, b_O atoms [mol/kg air] burn completely.
double oxygenLeft(double carbon, double hydrogen, double oxygen) {
  return 0.5 * (oxygen - 2.0 * carbon - 0.5 * hydrogen);
}

}  // namespace

CompleteCombustion::CompleteCombustion(const Composition& air, const HydrocarbonFuel& fuel)
    : table_(&air.table()),
      fuelMolarMass_(fuel.molarMass()),
      hydrogenCarbonRatio_(fuel.hydrogenCarbonRatio()),
      carbon_(air.elementMolesPerKilogram("C")),
      hydrogen_(air.elementMolesPerKilogram("H")),
      oxygen_(air.elementMolesPerKilogram("O")),
      nitrogen_(air.elementMolesPerKilogram("N")),
      argon_(air.elementMolesPerKilogram("Ar")),
      stoichiometric_(0.0),
      co2_(table_->find("CO2").value_or(kAbsent)),
      h2o_(table_->find("H2O").value_or(kAbsent)),
      n2_(table_->find("N2").value_or(kAbsent)),
      o2_(table_->find("O2").value_or(kAbsent)),
      ar_(table_->find("Ar").value_or(kAbsent)) {
  checkElements(air);
  // f_st = (b_O - 2 b_C - b_H/2) / ((2 + y/2) / M_f): the fuel takes (1 + y/4) O2 = (2 + y/2) O atoms per
  // mole.
  const double spareOxygenAtoms = 2.0 * oxygenLeft(carbon_, hydrogen_, oxygen_);
  if (!(spareOxygenAtoms > 0.0))
    throw InvalidInput("combustion air", "holds no free oxygen (" + air.summary() + ")");
  stoichiometric_ = spareOxygenAtoms / (2.0 * fuel.oxygenDemand());
}

Composition CompleteCombustion::products(double fuelAirRatio, const std::string& where) const {
  if (!std::isfinite(fuelAirRatio) || fuelAirRatio < 0.0 || fuelAirRatio > stoichiometric_)
    throw InvalidInput(where, fuelAirRatio, "", "[0, " + messageNumber(stoichiometric_) + "]");
  if (co2_ == kAbsent || h2o_ == kAbsent || n2_ == kAbsent || o2_ == kAbsent || ar_ == kAbsent)
    // index() throws cw::InvalidInput naming the first product species the table lacks.
    for (const char* name : {"CO2", "H2O", "N2", "O2", "Ar"}) table_->index(name, "combustion products");
  // Atoms per kg of air, air plus fuel (b_C,fuel = 1/M_f, b_H,fuel = y/M_f).
  const double fuelMoles = fuelAirRatio / fuelMolarMass_;
  const double carbon = carbon_ + fuelMoles;
  const double hydrogen = hydrogen_ + fuelMoles * hydrogenCarbonRatio_;
  // At f = f_st rounding may leave -1e-17 mol of O2: clamp to zero.
  const double o2 = std::max(0.0, oxygenLeft(carbon, hydrogen, oxygen_));
  std::vector<double> moles(table_->size(), 0.0);
  moles[co2_] = carbon;
  moles[h2o_] = 0.5 * hydrogen;
  moles[n2_] = 0.5 * nitrogen_;
  moles[o2_] = o2;
  moles[ar_] = argon_;
  return Composition::fromDenseMoles(*table_, std::move(moles), "combustion products");
}

double stoichiometricFuelAirRatio(const Composition& air, const HydrocarbonFuel& fuel) {
  return CompleteCombustion(air, fuel).stoichiometricFuelAirRatio();
}

Composition completeCombustionProducts(const Composition& air, const HydrocarbonFuel& fuel,
                                       double fuelAirRatio, const std::string& where) {
  return CompleteCombustion(air, fuel).products(fuelAirRatio, where);
}

}  // namespace cw::thermo
