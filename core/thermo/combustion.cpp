#include "thermo/combustion.h"

#include "common/error.h"

#include <algorithm>
#include <cmath>

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

double stoichiometricFuelAirRatio(const Composition& air, const HydrocarbonFuel& fuel) {
  checkElements(air);
  // f_st = (b_O - 2 b_C - b_H/2) / ((2 + y/2) / M_f): the fuel takes (1 + y/4) O2 = (2 + y/2) O atoms per
  // mole.
  const double spareOxygenAtoms =
      2.0 * oxygenLeft(air.elementMolesPerKilogram("C"), air.elementMolesPerKilogram("H"),
                       air.elementMolesPerKilogram("O"));
  if (!(spareOxygenAtoms > 0.0))
    throw InvalidInput("combustion air", "holds no free oxygen (" + air.summary() + ")");
  return spareOxygenAtoms / (2.0 * fuel.oxygenDemand());
}

Composition completeCombustionProducts(const Composition& air, const HydrocarbonFuel& fuel,
                                       double fuelAirRatio, const std::string& where) {
  const double stoichiometric = stoichiometricFuelAirRatio(air, fuel);
  if (!std::isfinite(fuelAirRatio) || fuelAirRatio < 0.0 || fuelAirRatio > stoichiometric)
    throw InvalidInput(where, fuelAirRatio, "", "[0, " + formatNumber(stoichiometric) + "]");
  // Atoms per kg of air, air plus fuel (b_C,fuel = 1/M_f, b_H,fuel = y/M_f).
  const double fuelMoles = fuelAirRatio / fuel.molarMass();
  const double carbon = air.elementMolesPerKilogram("C") + fuelMoles;
  const double hydrogen = air.elementMolesPerKilogram("H") + fuelMoles * fuel.hydrogenCarbonRatio();
  const double oxygen = air.elementMolesPerKilogram("O");
  const double nitrogen = air.elementMolesPerKilogram("N");
  const double argon = air.elementMolesPerKilogram("Ar");
  // At f = f_st rounding may leave -1e-17 mol of O2: clamp to zero.
  const double o2 = std::max(0.0, oxygenLeft(carbon, hydrogen, oxygen));
  return Composition::fromMoles(
      {{"CO2", carbon}, {"H2O", 0.5 * hydrogen}, {"N2", 0.5 * nitrogen}, {"O2", o2}, {"Ar", argon}},
      air.table(), "combustion products");
}

}  // namespace cw::thermo
