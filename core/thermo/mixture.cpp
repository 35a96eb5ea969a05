#include "thermo/mixture.h"

#include "common/error.h"

#include <cmath>

namespace cw::thermo {

Composition dryAir() {
  // U.S. Standard Atmosphere, 1976, Table 3 (sea-level mole fractions); renormalised by fromMoles.
  return Composition::fromMoles({{"N2", 0.78084}, {"O2", 0.209476}, {"Ar", 0.00934}, {"CO2", 0.000314}},
                                SpeciesTable::standard(), "dry air");
}

Composition humidAir(double specificHumidity, const std::string& where) {
  if (!std::isfinite(specificHumidity) || specificHumidity < 0.0 ||
      specificHumidity > kMaximumSpecificHumidity)
    throw InvalidInput(where, specificHumidity, "kg/kg",
                       "[0, " + messageNumber(kMaximumSpecificHumidity) + "] kg/kg");
  // y_i = (1 - q) y_i,dry, y_H2O = q.
  return mixByMass(dryAir(), 1.0 - specificHumidity, Composition::pure("H2O"), specificHumidity);
}

Composition mixByMass(const Composition& a, double massA, const Composition& b, double massB) {
  if (&a.table() != &b.table())
    throw InvalidInput("mixture", "the two compositions use different species tables");
  if (!std::isfinite(massA) || massA < 0.0)
    throw InvalidInput("mixture: mass of the first part", massA, "kg", "[0, inf) kg");
  if (!std::isfinite(massB) || massB < 0.0)
    throw InvalidInput("mixture: mass of the second part", massB, "kg", "[0, inf) kg");
  Composition::Amounts masses;
  for (std::size_t i = 0; i < a.size(); ++i) {
    const double m = massA * a.massFractions()[i] + massB * b.massFractions()[i];
    if (m > 0.0) masses.emplace_back(a.table()[i].name(), m);
  }
  return Composition::fromMasses(masses, a.table(), "mixture");
}

}  // namespace cw::thermo
