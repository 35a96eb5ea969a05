#pragma once
// The NASA 7-coefficient data of twelve species embedded in the library (N2, O2, Ar, CO2,
// H2O, CO, H2, OH, H, O, NO, N), from McBride, Gordon and Reno, Coefficients for Calculating
// Thermodynamic and Transport Properties of Individual Species, NASA TM-4513, 1993.
//
// Generated from the reference copy core/thermo/data/nasa7-tm4513.json by
// scripts/generate_species_data.py; tests/core/test_species.cpp checks the two agree.
// Coefficient order a1..a7 as in thermo/nasa_polynomial.h; molar masses in kg/mol.

#include <array>
#include <span>

namespace cw::thermo {

/// Source line of the embedded data (kept with the data, as the JSON file keeps it).
inline constexpr const char* kSpeciesDataSource =
    "B.J. McBride, S. Gordon and M.A. Reno, Coefficients for Calculating Thermodynamic and Transport "
    "Properties of Individual Species, NASA TM-4513, 1993";

/// Atoms of one element in a species' formula, e.g. {"O", 2}; {nullptr, 0} marks an unused slot.
struct ElementCount {
  const char* element;
  int count;
};

/// One species as tabulated: two ranges [tLow, tMid] and [tMid, tHigh], and for the air species a
/// range [tCold, tLow] below the tabulated ones (derived: core/thermo/data/cold-extension.json).
struct SpeciesRecord {
  const char* name;
  const char* note;            ///< the data set's own date/origin tag, e.g. "TPIS78"
  double molarMass;            ///< [kg/mol]
  double tCold;                ///< [K]; equal to tLow when there is no range below tLow
  double tLow;                 ///< [K]
  double tMid;                 ///< [K]
  double tHigh;                ///< [K]
  std::array<double, 7> cold;  ///< a1..a7 on [tCold, tLow] (a copy of low when tCold = tLow)
  std::array<double, 7> low;   ///< a1..a7 on [tLow, tMid]
  std::array<double, 7> high;  ///< a1..a7 on [tMid, tHigh]
  std::array<ElementCount, 2> elements;
};

/// The twelve embedded records, in the order N2, O2, Ar, CO2, H2O, CO, H2, OH, H, O, NO, N.
std::span<const SpeciesRecord> embeddedSpeciesRecords();

}  // namespace cw::thermo
