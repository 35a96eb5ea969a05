#include "analysis/loss_catalogue.h"

#include "common/error.h"
#include "engine/parameter_registry.h"

namespace cw::analysis {

namespace {

using engine::Case;

bool always(const Case&) {
  return true;
}

const std::string kPoint = "point of efficiency (0.01)";
const std::string kPercent = "percent of pressure-loss fraction (0.01)";

LossParameter efficiencyParameter(std::string field, double (*get)(const Case&), void (*set)(Case&, double),
                                  std::string unit = kPoint) {
  // Efficiencies, recoveries and coefficients are valid in (0, 1] (engine/parameter_registry.cpp);
  // 0.01 stands in for the open lower end, far below any design value.
  return {std::move(field), std::move(unit), 0.01, 0.01, 1.0, get, set};
}

/// A loss that is one number of the case, all from its registry entry: its path, getter and
/// setter, its bounds (an open lower end of 0 becomes 0.01, far below any design value) and its
/// lossless value.
LossDefinition registryLoss(std::string key, std::string_view section, std::string_view name,
                            std::string unit, double unitSize) {
  const engine::Parameter& p = *engine::findParameter(section, name);
  const std::string si(engine::siUnit(p.quantity));
  const double lossless = *p.lossless;
  return {std::move(key),
          p.pointer(),
          messageNumber(lossless) + (si.empty() ? "" : " " + si),
          p.applies,
          [set = p.set, lossless](Case& c) { set(c, lossless); },
          LossParameter{p.pointer(), std::move(unit), unitSize, p.range.lowClosed ? p.range.low : 0.01,
                        p.range.high, p.get, p.set}};
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
  list.push_back(
      {"compressor_efficiency", "/compressor/isentropic_efficiency or /compressor/polytropic_efficiency",
       "isentropic efficiency 1", &always,
       [](Case& c) {
         c.compressor.efficiency = Efficiency{EfficiencyBasis::Isentropic, 1.0};
       },
       efficiencyParameter(
           "/compressor efficiency (as given)", [](const Case& c) { return c.compressor.efficiency.value; },
           [](Case& c, double v) { c.compressor.efficiency.value = v; })});
  list.push_back(registryLoss("burner_pressure_loss", "burner", "pressure_loss_fraction", kPercent, 0.01));
  list.push_back(registryLoss("combustion_efficiency", "burner", "combustion_efficiency", kPoint, 0.01));
  list.push_back(
      {"turbine_efficiency", "/turbine/isentropic_efficiency or /turbine/polytropic_efficiency",
       "isentropic efficiency 1", &always,
       [](Case& c) {
         c.turbine.efficiency = Efficiency{EfficiencyBasis::Isentropic, 1.0};
       },
       efficiencyParameter(
           "/turbine efficiency (as given)", [](const Case& c) { return c.turbine.efficiency.value; },
           [](Case& c, double v) { c.turbine.efficiency.value = v; })});
  list.push_back(registryLoss("mechanical_efficiency", "turbine", "mechanical_efficiency", kPoint, 0.01));
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
  list.push_back(registryLoss("bleed", "compressor", "bleed_fraction", "percent of bleed (0.01)", 0.01));
  list.push_back(
      registryLoss("power_offtake", "turbine", "power_offtake_W", "kW of offtake (1000 W)", 1000.0));
  return list;
}

}  // namespace

const std::vector<LossDefinition>& lossCatalogue() {
  static const std::vector<LossDefinition> catalogue = makeCatalogue();
  return catalogue;
}

std::string lossKeyList() {
  std::string list;
  for (const auto& loss : lossCatalogue()) list += (list.empty() ? "" : ", ") + loss.key;
  return list;
}

const LossDefinition& lossByKey(const std::string& key, const std::string& where) {
  for (const auto& loss : lossCatalogue())
    if (loss.key == key) return loss;
  throw InvalidInput(where, "unknown loss '" + key + "'; valid losses: " + lossKeyList());
}

}  // namespace cw::analysis
