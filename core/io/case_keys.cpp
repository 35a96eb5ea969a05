#include "io/case_keys.h"

#include <algorithm>
#include <numeric>

namespace cw::io {

namespace {

using T = CaseKeyType;

CaseKey number(std::string_view name, std::vector<CaseKeyCondition> conditions = {}) {
  return {name, T::Number, {}, std::move(conditions)};
}
CaseKey boolean(std::string_view name) {
  return {name, T::Boolean, {}, {}};
}
CaseKey choice(std::string_view name, std::vector<std::string_view> choices,
               std::vector<CaseKeyCondition> conditions = {}) {
  return {name, T::Choice, std::move(choices), std::move(conditions)};
}
CaseKeyGroup oneOf(std::string_view a, std::string_view b, bool required = false) {
  return {{{{a}, {a}}, {{b}, {b}}}, required};
}

std::vector<CaseSection> makeSections() {
  const std::vector<CaseKeyCondition> constantCp{{"kind", "constant-cp"}};
  const std::vector<CaseKeyCondition> twoGamma{{"kind", "two-gamma"}};
  const std::vector<CaseKeyCondition> convergentDivergent{{"kind", "convergent-divergent"}};
  const std::vector<CaseKeyCondition> areaRatio{{"kind", "convergent-divergent"},
                                                {"expansion", "area-ratio"}};
  return {
      {"",
       true,
       {{"format", T::String, {}, {}},
        {"version", T::Integer, {}, {}},
        {"title", T::String, {}, {}},
        {"notes", T::String, {}, {}}},
       {"format", "version"},
       {}},
      {"flight",
       true,
       {number("altitude_m"), boolean("geometric_altitude"), number("isa_offset_K"),
        number("ambient_temperature_K"), number("ambient_pressure_Pa"), number("mach"),
        number("specific_humidity_kg_per_kg")},
       {"mach"},
       {{{{{"altitude_m", "geometric_altitude", "isa_offset_K"}, {"altitude_m"}},
          {{"ambient_temperature_K", "ambient_pressure_Pa"},
           {"ambient_temperature_K", "ambient_pressure_Pa"}}},
         true}}},
      {"design",
       true,
       {number("air_mass_flow_kg_per_s"), number("required_net_thrust_N")},
       {},
       {oneOf("air_mass_flow_kg_per_s", "required_net_thrust_N", true)}},
      {"fuel",
       false,
       {number("lower_heating_value_J_per_kg"), number("hydrogen_carbon_ratio"), number("temperature_K")},
       {},
       {}},
      {"gas_model",
       false,
       {choice("kind", {"thermally-perfect", "constant-cp", "two-gamma"}),
        number("cp_J_per_kg_K", constantCp), number("gamma", constantCp),
        number("cold_cp_J_per_kg_K", twoGamma), number("cold_gamma", twoGamma),
        number("hot_cp_J_per_kg_K", twoGamma), number("hot_gamma", twoGamma), boolean("neglect_fuel_mass")},
       {},
       {}},
      {"inlet",
       false,
       {number("pressure_recovery"), number("ram_efficiency"),
        choice("supersonic_recovery_rule", {"none", "mil-e-5008b"})},
       {},
       {oneOf("pressure_recovery", "ram_efficiency")}},
      {"compressor",
       false,
       {number("pressure_ratio"), number("isentropic_efficiency"), number("polytropic_efficiency"),
        number("bleed_fraction")},
       {},
       {oneOf("isentropic_efficiency", "polytropic_efficiency")}},
      {"burner",
       false,
       {number("exit_temperature_K"), number("fuel_air_ratio"), number("pressure_loss_fraction"),
        number("combustion_efficiency")},
       {},
       {oneOf("exit_temperature_K", "fuel_air_ratio")}},
      {"turbine",
       false,
       {number("isentropic_efficiency"), number("polytropic_efficiency"), number("mechanical_efficiency"),
        number("power_offtake_W")},
       {},
       {oneOf("isentropic_efficiency", "polytropic_efficiency")}},
      {"jet_pipe", false, {number("pressure_loss_fraction")}, {}, {}},
      {"afterburner",
       false,
       {boolean("enabled"), number("exit_temperature_K"), number("pressure_loss_fraction_lit"),
        number("pressure_loss_fraction_unlit"), number("combustion_efficiency")},
       {},
       {}},
      {"nozzle",
       false,
       {choice("kind", {"convergent", "convergent-divergent"}),
        choice("expansion", {"full", "area-ratio"}, convergentDivergent),
        number("exit_to_throat_area_ratio", areaRatio), number("velocity_coefficient"),
        number("isentropic_efficiency"), number("discharge_coefficient")},
       {},
       {oneOf("velocity_coefficient", "isentropic_efficiency")}},
      {"sizing", false, {number("engine_face_mach"), number("hub_to_tip_ratio")}, {}, {}},
  };
}

}  // namespace

const CaseKey* CaseSection::find(std::string_view key) const {
  for (const CaseKey& k : keys)
    if (k.name == key) return &k;
  return nullptr;
}

const std::vector<CaseSection>& caseSections() {
  static const std::vector<CaseSection> sections = makeSections();
  return sections;
}

const CaseSection* findCaseSection(std::string_view name) {
  for (const CaseSection& s : caseSections())
    if (s.name == name) return &s;
  return nullptr;
}

std::vector<std::string> knownCaseKeyPaths() {
  std::vector<std::string> paths;
  for (const CaseSection& s : caseSections()) {
    if (!s.name.empty()) paths.push_back("/" + std::string(s.name));
    for (const CaseKey& k : s.keys)
      paths.push_back((s.name.empty() ? "" : "/" + std::string(s.name)) + "/" + std::string(k.name));
  }
  return paths;
}

static std::size_t editDistance(std::string_view a, std::string_view b) {
  std::vector<std::size_t> row(b.size() + 1);
  std::iota(row.begin(), row.end(), std::size_t{0});
  for (std::size_t i = 1; i <= a.size(); ++i) {
    std::size_t diagonal = row[0];
    row[0] = i;
    for (std::size_t j = 1; j <= b.size(); ++j) {
      const std::size_t above = row[j];
      row[j] = std::min({row[j] + 1, row[j - 1] + 1, diagonal + (a[i - 1] == b[j - 1] ? 0 : 1)});
      diagonal = above;
    }
  }
  return row[b.size()];
}

std::string closestName(std::string_view name, const std::vector<std::string_view>& candidates) {
  std::string best;
  std::size_t bestDistance = 3;
  for (std::string_view candidate : candidates) {
    // At most two edits apart means at most two characters longer or shorter: skip the rest
    // unmeasured (a megabyte-long unknown key must not cost a megabyte times every name).
    const std::size_t longer = std::max(name.size(), candidate.size());
    if (longer - std::min(name.size(), candidate.size()) >= bestDistance) continue;
    const std::size_t d = editDistance(name, candidate);
    if (d < bestDistance) {
      bestDistance = d;
      best = candidate;
    }
  }
  return best;
}

}  // namespace cw::io
