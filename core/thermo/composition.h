#pragma once
// The composition of an ideal-gas mixture over the species of a table: mole fractions x_i and
// mass fractions y_i, dense over the table (absent species have 0).
//
//   M   = sum_i x_i M_i                 (mixture molar mass)
//   y_i = x_i M_i / M
//   R   = R_u / M = sum_i y_i R_u / M_i
//
// (ideal-gas mixtures, Dalton's law; e.g. Cengel and Boles, Thermodynamics: An Engineering
// Approach, ch. 13.) The table must outlive the composition (SpeciesTable::standard() does).

#include "thermo/species_table.h"

#include <string>
#include <utility>
#include <vector>

namespace cw::thermo {

class Composition {
 public:
  using Amounts = std::vector<std::pair<std::string, double>>;

  /// From amounts of substance in any unit (mol, or mole fractions); normalised. Repeated names
  /// add up. Throws cw::InvalidInput naming `where` for an unknown name, a negative or non-finite
  /// amount, or a zero total.
  static Composition fromMoles(const Amounts& moles, const SpeciesTable& table = SpeciesTable::standard(),
                               const std::string& where = "composition");
  /// From masses in any unit (kg, or mass fractions); normalised. Throws as fromMoles().
  static Composition fromMasses(const Amounts& masses, const SpeciesTable& table = SpeciesTable::standard(),
                                const std::string& where = "composition");
  /// From amounts of substance by table index (size() == table.size()); normalised. Throws as
  /// fromMoles(). For solvers that build many compositions over one table: no look-up by name.
  static Composition fromDenseMoles(const SpeciesTable& table, std::vector<double> moles,
                                    const char* where = "composition");
  /// One pure species.
  static Composition pure(const std::string& name, const SpeciesTable& table = SpeciesTable::standard());

  const SpeciesTable& table() const { return *table_; }
  std::size_t size() const { return moleFractions_.size(); }

  /// Mole fractions, by table index. [-]
  const std::vector<double>& moleFractions() const { return moleFractions_; }
  /// Mass fractions, by table index. [-]
  const std::vector<double>& massFractions() const { return massFractions_; }
  /// Mole fraction of a species (0 when absent); throws cw::InvalidInput for an unknown name. [-]
  double moleFraction(const std::string& name) const;
  /// Mass fraction of a species (0 when absent); throws cw::InvalidInput for an unknown name. [-]
  double massFraction(const std::string& name) const;

  /// Mixture molar mass M. [kg/mol]
  double molarMass() const { return molarMass_; }
  /// Specific gas constant R_u / M. [J/(kg K)]
  double gasConstant() const;
  /// Atoms of an element per kilogram of mixture. [mol/kg]
  double elementMolesPerKilogram(const std::string& element) const;

  /// The species present and their mole fractions, e.g. "N2 0.7808, O2 0.2095" (for messages).
  std::string summary() const;

 private:
  Composition(const SpeciesTable& table, std::vector<double> moles);

  const SpeciesTable* table_;
  std::vector<double> moleFractions_;
  std::vector<double> massFractions_;
  double molarMass_ = 0.0;
};

}  // namespace cw::thermo
