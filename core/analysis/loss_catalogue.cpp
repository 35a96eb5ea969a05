#include "analysis/loss_catalogue.h"

#include "common/error.h"
#include "engine/case_roles.h"
#include "engine/parameter_registry.h"

#include <algorithm>

namespace cw::analysis {

namespace {

using engine::Case;

bool always(const Case&) {
  return true;
}

const std::string kPoint = "point of efficiency (0.01)";
const std::string kPercent = "percent of pressure-loss fraction (0.01)";

LossParameter efficiencyParameter(std::string field, std::function<double(const Case&)> get,
                                  std::function<void(Case&, double)> set, std::string unit = kPoint) {
  // Efficiencies, recoveries and coefficients are valid in (0, 1] (engine/parameter_registry.cpp);
  // 0.01 stands in for the open lower end, far below any design value.
  return {std::move(field), std::move(unit), 0.01, 0.01, 1.0, std::move(get), std::move(set)};
}

/// A loss that is one number of the case, all from its registry entry: its path, getter and
/// setter, its bounds (an open lower end of 0 becomes 0.01, far below any design value) and its
/// lossless value. `architecture`: that of the entry's role, if only one architecture has it.
LossDefinition registryLoss(std::string key, std::string_view section, std::string_view name,
                            std::string unit, double unitSize,
                            std::optional<engine::Architecture> architecture = std::nullopt) {
  const engine::Parameter& p = *engine::findParameter(section, name);
  const std::string si(engine::siUnit(p.quantity));
  const double lossless = *p.lossless;
  return {std::move(key),
          p.pointer(),
          messageNumber(lossless) + (si.empty() ? "" : " " + si),
          p.applies,
          [set = p.set, lossless](Case& c) { set(c, lossless); },
          LossParameter{p.pointer(), std::move(unit), unitSize, p.range.lowClosed ? p.range.low : 0.01,
                        p.range.high, p.get, p.set},
          architecture};
}

/// A role's loss key: the single spool's roles and the two-spool's high-pressure ones (the same
/// member of Case) keep the single-spool keys that audit orders, settings and the command line
/// name; a low-pressure role's keys begin "low_pressure_".
std::string keyOf(std::string_view role, std::string_view loss) {
  return std::string(role.starts_with("low_pressure_") ? "low_pressure_" : "") + std::string(loss);
}

/// A turbomachine's efficiency (one description for every compressor and turbine role): removed
/// as the registry's lossless isentropic efficiency; its parameter the efficiency as given
/// (isentropic or polytropic), so that its sensitivity keeps the case's basis.
template <class Role>
LossDefinition efficiencyLoss(const Role& role, std::string_view loss) {
  const std::string r(role.name);
  const engine::Parameter& basis = *engine::findParameter(role.name, "efficiency_basis");
  const engine::Parameter& isentropic = *engine::findParameter(role.name, "isentropic_efficiency");
  const double lossless = *isentropic.lossless;
  const auto m = role.member;
  return {keyOf(role.name, loss),
          "/" + r + "/isentropic_efficiency or /" + r + "/polytropic_efficiency",
          "isentropic efficiency " + messageNumber(lossless),
          basis.applies,
          [set = isentropic.set, lossless](Case& c) { set(c, lossless); },
          efficiencyParameter(
              "/" + r + " efficiency (as given)", [m](const Case& c) { return (c.*m).efficiency.value; },
              [m](Case& c, double v) { (c.*m).efficiency.value = v; }),
          role.architecture};
}

LossParameter lossFractionParameter(std::string field, double (*get)(const Case&),
                                    void (*set)(Case&, double)) {
  return {std::move(field), kPercent, 0.01, 0.0, 0.3, get, set};
}

std::vector<LossDefinition> makeCatalogue() {
  using namespace engine;
  std::vector<LossDefinition> list;
  list.push_back(
      {"inlet_recovery", "/inlet/pressure_recovery or /inlet/ram_efficiency, /inlet/supersonic_recovery_rule",
       "pressure recovery 1, no supersonic rule", &always,
       [](Case& c) {
         c.inlet = InletInputs{InletLossBasis::PressureRecovery, 1.0, SupersonicRecoveryRule::None};
       },
       efficiencyParameter(
           "/inlet/pressure_recovery or /inlet/ram_efficiency (as given)",
           [](const Case& c) { return c.inlet.loss; }, [](Case& c, double v) { c.inlet.loss = v; },
           "point of recovery or ram efficiency (0.01)")});
  for (const CompressorRole& role : kCompressorRoles)
    list.push_back(efficiencyLoss(role, "compressor_efficiency"));
  list.push_back(registryLoss("burner_pressure_loss", "burner", "pressure_loss_fraction", kPercent, 0.01));
  list.push_back(registryLoss("combustion_efficiency", "burner", "combustion_efficiency", kPoint, 0.01));
  for (const TurbineRole& role : kTurbineRoles) {
    list.push_back(efficiencyLoss(role, "turbine_efficiency"));
    list.push_back(registryLoss(keyOf(role.name, "mechanical_efficiency"), role.name, "mechanical_efficiency",
                                kPoint, 0.01, role.architecture));
  }
  list.push_back(registryLoss("jet_pipe_loss", "jet_pipe", "pressure_loss_fraction", kPercent, 0.01));
  // The afterburner's parameter is the pressure-loss fraction in effect (lit or unlit).
  list.push_back(
      {"afterburner_loss",
       "/afterburner/pressure_loss_fraction_lit, /afterburner/pressure_loss_fraction_unlit, "
       "/afterburner/combustion_efficiency",
       "pressure-loss fractions 0, combustion efficiency 1",
       [](const Case& c) { return c.afterburner.enabled || c.afterburner.pressureLossFractionUnlit > 0.0; },
       [](Case& c) {
         c.afterburner.pressureLossFractionLit = 0.0;
         c.afterburner.pressureLossFractionUnlit = 0.0;
         c.afterburner.combustionEfficiency = 1.0;
       },
       lossFractionParameter(
           "/afterburner/pressure_loss_fraction_lit or _unlit (in effect)",
           [](const Case& c) {
             return c.afterburner.enabled ? c.afterburner.pressureLossFractionLit
                                          : c.afterburner.pressureLossFractionUnlit;
           },
           [](Case& c, double v) {
             (c.afterburner.enabled ? c.afterburner.pressureLossFractionLit
                                    : c.afterburner.pressureLossFractionUnlit) = v;
           })});
  list.push_back(
      {"nozzle_velocity_coefficient", "/nozzle/velocity_coefficient or /nozzle/isentropic_efficiency",
       "velocity coefficient 1", &always,
       [](Case& c) {
         c.nozzle.lossBasis = NozzleLossBasis::VelocityCoefficient;
         c.nozzle.loss = 1.0;
       },
       efficiencyParameter(
           "/nozzle/velocity_coefficient or /nozzle/isentropic_efficiency (as given)",
           [](const Case& c) { return c.nozzle.loss; }, [](Case& c, double v) { c.nozzle.loss = v; },
           "point of velocity coefficient or nozzle efficiency (0.01)")});
  list.push_back(registryLoss("nozzle_discharge_coefficient", "nozzle", "discharge_coefficient",
                              "point of discharge coefficient (0.01)", 0.01));
  list.push_back({"nozzle_expansion", "/nozzle/kind, /nozzle/exit_to_throat_area_ratio",
                  "convergent-divergent, full expansion to ambient pressure", &always,
                  [](Case& c) { c.nozzle.geometry = FullyExpandingNozzle{}; }, std::nullopt});
  for (const CompressorRole& role : kCompressorRoles)
    list.push_back(registryLoss(keyOf(role.name, "bleed"), role.name, "bleed_fraction",
                                "percent of bleed (0.01)", 0.01, role.architecture));
  for (const TurbineRole& role : kTurbineRoles)
    list.push_back(registryLoss(keyOf(role.name, "power_offtake"), role.name, "power_offtake_W",
                                "kW of offtake (1000 W)", 1000.0, role.architecture));
  return list;
}

}  // namespace

const std::vector<LossDefinition>& lossCatalogue() {
  static const std::vector<LossDefinition> catalogue = makeCatalogue();
  return catalogue;
}

bool ofArchitecture(const LossDefinition& loss, engine::Architecture architecture) {
  return !loss.architecture || *loss.architecture == architecture;
}

std::vector<const LossDefinition*> lossesOf(engine::Architecture architecture) {
  std::vector<const LossDefinition*> list;
  for (const auto& loss : lossCatalogue())
    if (ofArchitecture(loss, architecture)) list.push_back(&loss);
  return list;
}

std::vector<std::string> lossKeys() {
  // Each key at its last entry: a key the single spool's and the two-spool's high-pressure roles
  // share stands after the low-pressure compressor's (flow order of the engine with most roles).
  std::vector<std::string> keys;
  const auto& all = lossCatalogue();
  for (auto it = all.rbegin(); it != all.rend(); ++it)
    if (std::find(keys.begin(), keys.end(), it->key) == keys.end()) keys.push_back(it->key);
  std::reverse(keys.begin(), keys.end());
  return keys;
}

std::string lossKeyList() {
  std::string list;
  for (const auto& key : lossKeys()) list += (list.empty() ? "" : ", ") + key;
  return list;
}

bool isLossKey(const std::string& key) {
  return std::any_of(lossCatalogue().begin(), lossCatalogue().end(),
                     [&](const LossDefinition& loss) { return loss.key == key; });
}

const LossDefinition& lossByKey(const std::string& key, const engine::Case& c, const std::string& where) {
  const LossDefinition* known = nullptr;
  for (const auto& loss : lossCatalogue()) {
    if (loss.key != key) continue;
    if (ofArchitecture(loss, c.architecture)) return loss;
    if (!known) known = &loss;
  }
  if (known) return *known;  // a loss of another architecture: it does not apply to the case
  throw InvalidInput(where, "unknown loss '" + key + "'; valid losses: " + lossKeyList());
}

}  // namespace cw::analysis
