#include "engine/case_validation.h"

#include "common/error.h"
#include "engine/case_validation_error.h"
#include "engine/parameter_registry.h"

#include <algorithm>
#include <iterator>
#include <string>
#include <string_view>
#include <utility>

namespace cw::engine {

namespace {

// The ranges of every number come from the registry of parameters (parameter_registry.h); the
// rules below are the cross-parameter checks that are no range.

class Checker {
 public:
  // Paths and units as plain text: a valid value costs one comparison, no string is built.
  void check(const Parameter& p, double value, const ValidRange& range) {
    if (range.contains(value)) return;
    const std::string unit(siUnit(p.quantity));
    const std::string valid = range.text() + (unit.empty() ? "" : " " + unit);
    const std::string path = p.pointer();
    problems_.push_back({path, formatNumber(value), valid, InvalidInput(path, value, unit, valid).what()});
  }
  void fail(const std::string& path, const std::string& value, const std::string& valid,
            const std::string& message) {
    problems_.push_back({path, value, valid, path + ": " + message});
  }
  std::vector<CaseProblem> take() { return std::move(problems_); }

 private:
  std::vector<CaseProblem> problems_;
};

/// The hot gas of the two-gamma model stands for the products of burning in the cold gas: its gamma
/// at most the cold one, its cp at least the cold one (as products against air: more triatomic
/// molecules, hotter). A stiffer or less heat-holding hot gas makes the model's energy books give
/// an exhaust colder than the intake and a thermal efficiency above 1. Checked when both
/// values are in their own ranges (common practice, no source).
void checkHotGas(Checker& c, const Case& k) {
  const auto* g = std::get_if<TwoGammaGasModel>(&k.gasModel.model);
  if (!g) return;
  auto inRange = [&k](std::string_view key, double value) {
    return findParameter("gas_model", key)->rangeFor(k).contains(value);
  };
  if (!inRange("cold_gamma", g->coldGamma) || !inRange("hot_gamma", g->hotGamma) ||
      !inRange("cold_cp_J_per_kg_K", g->coldCp) || !inRange("hot_cp_J_per_kg_K", g->hotCp))
    return;
  if (g->hotGamma > g->coldGamma)
    c.fail("/gas_model/hot_gamma", formatNumber(g->hotGamma), "(1, cold_gamma]",
           messageNumber(g->hotGamma) + " is above the cold gamma " + messageNumber(g->coldGamma) +
               ": the products of combustion are never stiffer than the air they come from");
  if (g->hotCp < g->coldCp)
    c.fail("/gas_model/hot_cp_J_per_kg_K", formatNumber(g->hotCp), "[cold_cp_J_per_kg_K, 1e5) J/(kg K)",
           messageNumber(g->hotCp) + " J/(kg K) is below the cold cp " + messageNumber(g->coldCp) +
               " J/(kg K): the products of combustion hold more heat per kelvin than the air they come from");
}

/// The thermally perfect model always carries the fuel's mass and composition.
void checkNeglectFuelMass(Checker& c, const Case& k) {
  if (std::holds_alternative<ThermallyPerfectGasModel>(k.gasModel.model) && k.gasModel.neglectFuelMass)
    c.fail("/gas_model/neglect_fuel_mass", "true", "false with kind \"thermally-perfect\"",
           "true is allowed only with kind \"constant-cp\" or \"two-gamma\"");
}

/// A cross-parameter rule, checked after the ranges of its section.
struct NamedRule {
  std::string_view section;
  std::string_view name;
  void (*check)(Checker&, const Case&);
};

constexpr NamedRule kRules[] = {
    {"gas_model", "hot gas no stiffer and no less heat-holding than the cold gas", &checkHotGas},
    {"gas_model", "neglect_fuel_mass only for the constant-cp and two-gamma models", &checkNeglectFuelMass},
};

void checkRules(Checker& c, const Case& k, std::string_view section) {
  for (const NamedRule& rule : kRules)
    if (rule.section == section) rule.check(c, k);
}

/// The numbers of the registry, and after the last one of each section its section's rules:
/// found once (validation runs for every point of a trade study).
struct Step {
  const Parameter* number;  ///< or nullptr: the rules of `section`
  std::string_view section;
};

std::vector<Step> makeSteps() {
  std::vector<Step> steps;
  const std::vector<Parameter>& registry = parameterRegistry();
  for (std::size_t i = 0; i < registry.size(); ++i) {
    const Parameter& p = registry[i];
    if (p.kind == ParameterKind::Number) steps.push_back({&p, p.section});
    const bool lastOfSection = i + 1 == registry.size() || registry[i + 1].section != p.section;
    if (lastOfSection && std::any_of(std::begin(kRules), std::end(kRules),
                                     [&p](const NamedRule& rule) { return rule.section == p.section; }))
      steps.push_back({nullptr, p.section});
  }
  return steps;
}

}  // namespace

std::vector<CaseProblem> validateCase(const Case& inputs) {
  static const std::vector<Step> steps = makeSteps();
  Checker checker;
  for (const Step& step : steps) {
    if (!step.number)
      checkRules(checker, inputs, step.section);
    else if (step.number->applies(inputs))
      checker.check(*step.number, step.number->get(inputs), step.number->rangeFor(inputs));
  }
  return checker.take();
}

void requireValidCase(const Case& inputs) {
  std::vector<CaseProblem> problems = validateCase(inputs);
  if (!problems.empty()) throw CaseValidationError("case", std::move(problems));
}

}  // namespace cw::engine
