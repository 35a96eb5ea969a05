#include "thermo/species_table.h"

#include "common/error.h"
#include "thermo/species_data.h"

#include <utility>

namespace cw::thermo {

namespace {

SpeciesThermo fromRecord(const SpeciesRecord& r) {
  const std::string where = std::string("species ") + r.name;
  std::map<std::string, int> elements;
  for (const auto& e : r.elements)
    if (e.element) elements[e.element] += e.count;
  SpeciesThermo species(r.name, r.molarMass, std::move(elements),
                        NasaPolynomial(r.tLow, r.tMid, r.low, where + " (low range)"),
                        NasaPolynomial(r.tMid, r.tHigh, r.high, where + " (high range)"));
  if (r.tCold < r.tLow) species.extendBelow(NasaPolynomial(r.tCold, r.tLow, r.cold, where + " (cold range)"));
  return species;
}

std::vector<SpeciesThermo> embeddedSpecies() {
  std::vector<SpeciesThermo> species;
  for (const auto& record : embeddedSpeciesRecords()) species.push_back(fromRecord(record));
  return species;
}

}  // namespace

SpeciesTable::SpeciesTable(std::vector<SpeciesThermo> species) : species_(std::move(species)) {
  if (species_.empty()) throw InvalidInput("species table", "has no species");
  for (std::size_t i = 0; i < species_.size(); ++i)
    for (std::size_t j = 0; j < i; ++j)
      if (species_[i].name() == species_[j].name())
        throw InvalidInput("species table", "species '" + species_[i].name() + "' appears twice");
}

const SpeciesTable& SpeciesTable::standard() {
  static const SpeciesTable table(embeddedSpecies());
  return table;
}

std::optional<std::size_t> SpeciesTable::find(const std::string& name) const {
  for (std::size_t i = 0; i < species_.size(); ++i)
    if (species_[i].name() == name) return i;
  return std::nullopt;
}

std::size_t SpeciesTable::index(const std::string& name, const std::string& where) const {
  if (const auto i = find(name)) return *i;
  throw InvalidInput(where, "unknown species '" + name + "' (known: " + namesList() + ")");
}

const SpeciesThermo& SpeciesTable::byName(const std::string& name, const std::string& where) const {
  return species_[index(name, where)];
}

std::string SpeciesTable::namesList() const {
  std::string text;
  for (const auto& s : species_) text += (text.empty() ? "" : ", ") + s.name();
  return text;
}

}  // namespace cw::thermo
