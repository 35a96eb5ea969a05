#pragma once
// A set of species with unique names, looked up by name or index. standard() holds the twelve
// species embedded from NASA TM-4513 (thermo/species_data.h): N2, O2, Ar, CO2, H2O, CO, H2, OH,
// H, O, NO, N, in that order.

#include "thermo/species_thermo.h"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace cw::thermo {

class SpeciesTable {
 public:
  /// Throws cw::InvalidInput when the list is empty or two species share a name.
  explicit SpeciesTable(std::vector<SpeciesThermo> species);

  /// The embedded NASA TM-4513 species (built once, on first use).
  static const SpeciesTable& standard();

  std::size_t size() const { return species_.size(); }
  const SpeciesThermo& operator[](std::size_t index) const { return species_.at(index); }
  const std::vector<SpeciesThermo>& species() const { return species_; }

  /// Index of the named species, or nullopt.
  std::optional<std::size_t> find(const std::string& name) const;
  /// Index of the named species; throws cw::InvalidInput naming `where` and listing the known names.
  std::size_t index(const std::string& name, const std::string& where = "species") const;
  /// The named species; throws as index().
  const SpeciesThermo& byName(const std::string& name, const std::string& where = "species") const;
  /// The names, comma-separated, in table order (for messages).
  std::string namesList() const;

 private:
  std::vector<SpeciesThermo> species_;
};

}  // namespace cw::thermo
