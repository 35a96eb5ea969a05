#pragma once
// Mixtures the engine breathes: dry air, humid air, and mixing two compositions by mass.
//
// Dry air: the sea-level composition of the U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562,
// Table 3), mole fractions N2 0.78084, O2 0.209476, Ar 0.00934, CO2 0.000314. The trace gases
// of that table (Ne, He, Kr, Xe, CH4, H2, ...; together about 3e-5) are neglected and the four
// fractions renormalised to sum to 1 (they sum to 0.99997).
//
// Humid air: specific humidity q = m_H2O / (m_dry + m_H2O), the mass of water vapour per unit
// mass of humid air, so the mass fractions are y_i = (1 - q) y_i,dry and y_H2O = q.

#include "thermo/composition.h"

namespace cw::thermo {

/// Highest specific humidity accepted (about saturation at 40 °C, sea level; as the case files). [kg/kg]
inline constexpr double kMaximumSpecificHumidity = 0.05;

/// Dry air, U.S. Standard Atmosphere 1976 composition, trace gases neglected (see above).
Composition dryAir();

/// Humid air of specific humidity q (kg water vapour per kg humid air); throws cw::InvalidInput
/// naming `where` unless 0 <= q <= kMaximumSpecificHumidity.
Composition humidAir(double specificHumidity, const std::string& where = "specific humidity");

/// The mixture of massA kg of a and massB kg of b (same species table; masses >= 0, not both 0).
Composition mixByMass(const Composition& a, double massA, const Composition& b, double massB);

}  // namespace cw::thermo
