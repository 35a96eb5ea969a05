#include "thermo/composition.h"

#include "common/error.h"
#include "thermo/gas.h"

#include <charconv>
#include <cmath>

namespace cw::thermo {

namespace {

std::vector<double> denseAmounts(const Composition::Amounts& amounts, const SpeciesTable& table,
                                 const std::string& where) {
  std::vector<double> dense(table.size(), 0.0);
  for (const auto& [name, amount] : amounts) {
    const std::size_t i = table.index(name, where);
    if (!std::isfinite(amount) || amount < 0.0)
      throw InvalidInput(where + ": amount of " + name, amount, "", "[0, inf)");
    dense[i] += amount;
  }
  return dense;
}

}  // namespace

Composition::Composition(const SpeciesTable& table, std::vector<double> moles)
    : table_(&table), moleFractions_(std::move(moles)), massFractions_(table.size(), 0.0) {
  double total = 0.0;
  for (double n : moleFractions_) total += n;
  for (double& x : moleFractions_) x /= total;
  for (std::size_t i = 0; i < size(); ++i) molarMass_ += moleFractions_[i] * table[i].molarMass();
  for (std::size_t i = 0; i < size(); ++i)
    massFractions_[i] = moleFractions_[i] * table[i].molarMass() / molarMass_;
}

Composition Composition::fromMoles(const Amounts& moles, const SpeciesTable& table,
                                   const std::string& where) {
  std::vector<double> dense = denseAmounts(moles, table, where);
  double total = 0.0;
  for (double n : dense) total += n;
  if (!(total > 0.0) || !std::isfinite(total))
    throw InvalidInput(where + ": total amount", total, "", "(0, inf)");
  return Composition(table, std::move(dense));
}

Composition Composition::fromDenseMoles(const SpeciesTable& table, std::vector<double> moles,
                                        const char* where) {
  if (moles.size() != table.size())
    throw InvalidInput(std::string(where) + ": number of amounts", double(moles.size()), "",
                       "[" + std::to_string(table.size()) + ", " + std::to_string(table.size()) + "]");
  double total = 0.0;
  for (std::size_t i = 0; i < moles.size(); ++i) {
    if (!std::isfinite(moles[i]) || moles[i] < 0.0)
      throw InvalidInput(std::string(where) + ": amount of " + table[i].name(), moles[i], "", "[0, inf)");
    total += moles[i];
  }
  if (!(total > 0.0) || !std::isfinite(total))
    throw InvalidInput(std::string(where) + ": total amount", total, "", "(0, inf)");
  return Composition(table, std::move(moles));
}

Composition Composition::fromMasses(const Amounts& masses, const SpeciesTable& table,
                                    const std::string& where) {
  std::vector<double> dense = denseAmounts(masses, table, where);
  double total = 0.0;
  for (std::size_t i = 0; i < dense.size(); ++i) {
    total += dense[i];
    dense[i] /= table[i].molarMass();  // moles from masses: n_i = m_i / M_i
  }
  if (!(total > 0.0) || !std::isfinite(total))
    throw InvalidInput(where + ": total mass", total, "", "(0, inf)");
  return Composition(table, std::move(dense));
}

Composition Composition::pure(const std::string& name, const SpeciesTable& table) {
  return fromMoles({{name, 1.0}}, table, "species");
}

double Composition::moleFraction(const std::string& name) const {
  return moleFractions_[table_->index(name)];
}

double Composition::massFraction(const std::string& name) const {
  return massFractions_[table_->index(name)];
}

double Composition::gasConstant() const {
  return kMolarGasConstant / molarMass_;
}

double Composition::elementMolesPerKilogram(const std::string& element) const {
  // Atoms per mole of mixture, sum_i x_i a_i, divided by the molar mass.
  double atoms = 0.0;
  for (std::size_t i = 0; i < size(); ++i) atoms += moleFractions_[i] * (*table_)[i].atoms(element);
  return atoms / molarMass_;
}

std::string Composition::summary() const {
  std::string text;
  for (std::size_t i = 0; i < size(); ++i) {
    if (moleFractions_[i] <= 0.0) continue;
    char buffer[32];  // locale-independent, four significant digits
    const auto result =
        std::to_chars(buffer, buffer + sizeof buffer, moleFractions_[i], std::chars_format::general, 4);
    text += (text.empty() ? "" : ", ") + (*table_)[i].name() + " " + std::string(buffer, result.ptr);
  }
  return text;
}

}  // namespace cw::thermo
