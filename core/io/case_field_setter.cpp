#include "io/case_field_setter.h"

#include "io/case_keys.h"

#include <utility>

namespace cw::io {

namespace {

using namespace engine;

/// The alternative T of a variant, selected (default-constructed) if it was not.
template <typename T, typename Variant>
T& select(Variant& v) {
  if (!std::holds_alternative<T>(v)) v = T{};
  return std::get<T>(v);
}

struct Entry {
  std::string_view path;
  CaseFieldSetter set;
};

// One line per numeric key of io/case_keys.cpp; tests/core/test_trade_study.cpp checks that
// the list is complete and that each setter agrees with applySetOverride + parseCase.
const Entry kSetters[] = {
    {"flight.altitude_m",
     [](Case& c, double v) { select<StandardAtmosphereAmbient>(c.flight.ambient).altitude = v; }},
    {"flight.isa_offset_K",
     [](Case& c, double v) { select<StandardAtmosphereAmbient>(c.flight.ambient).isaOffset = v; }},
    {"flight.ambient_temperature_K",
     [](Case& c, double v) { select<GivenAmbient>(c.flight.ambient).temperature = v; }},
    {"flight.ambient_pressure_Pa",
     [](Case& c, double v) { select<GivenAmbient>(c.flight.ambient).pressure = v; }},
    {"flight.mach", [](Case& c, double v) { c.flight.mach = v; }},
    {"flight.specific_humidity_kg_per_kg", [](Case& c, double v) { c.flight.specificHumidity = v; }},
    {"design.air_mass_flow_kg_per_s",
     [](Case& c, double v) { select<AirMassFlowTarget>(c.design.target).airMassFlow = v; }},
    {"design.required_net_thrust_N",
     [](Case& c, double v) { select<NetThrustTarget>(c.design.target).netThrust = v; }},
    {"fuel.lower_heating_value_J_per_kg", [](Case& c, double v) { c.fuel.lowerHeatingValue = v; }},
    {"fuel.hydrogen_carbon_ratio", [](Case& c, double v) { c.fuel.hydrogenCarbonRatio = v; }},
    {"fuel.temperature_K", [](Case& c, double v) { c.fuel.temperature = v; }},
    {"gas_model.cp_J_per_kg_K",
     [](Case& c, double v) { select<ConstantCpGasModel>(c.gasModel.model).cp = v; }},
    {"gas_model.gamma", [](Case& c, double v) { select<ConstantCpGasModel>(c.gasModel.model).gamma = v; }},
    {"gas_model.cold_cp_J_per_kg_K",
     [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).coldCp = v; }},
    {"gas_model.cold_gamma",
     [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).coldGamma = v; }},
    {"gas_model.hot_cp_J_per_kg_K",
     [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).hotCp = v; }},
    {"gas_model.hot_gamma",
     [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).hotGamma = v; }},
    {"inlet.pressure_recovery",
     [](Case& c, double v) {
       c.inlet.lossBasis = InletLossBasis::PressureRecovery;
       c.inlet.loss = v;
     }},
    {"inlet.ram_efficiency",
     [](Case& c, double v) {
       c.inlet.lossBasis = InletLossBasis::RamEfficiency;
       c.inlet.loss = v;
     }},
    {"compressor.pressure_ratio", [](Case& c, double v) { c.compressor.pressureRatio = v; }},
    {"compressor.isentropic_efficiency",
     [](Case& c, double v) {
       c.compressor.efficiency = {EfficiencyBasis::Isentropic, v};
     }},
    {"compressor.polytropic_efficiency",
     [](Case& c, double v) {
       c.compressor.efficiency = {EfficiencyBasis::Polytropic, v};
     }},
    {"compressor.bleed_fraction", [](Case& c, double v) { c.compressor.bleedFraction = v; }},
    {"burner.exit_temperature_K",
     [](Case& c, double v) { select<ExitTemperatureSetting>(c.burner.setting).exitTemperature = v; }},
    {"burner.fuel_air_ratio",
     [](Case& c, double v) { select<FuelAirRatioSetting>(c.burner.setting).fuelAirRatio = v; }},
    {"burner.pressure_loss_fraction", [](Case& c, double v) { c.burner.pressureLossFraction = v; }},
    {"burner.combustion_efficiency", [](Case& c, double v) { c.burner.combustionEfficiency = v; }},
    {"turbine.isentropic_efficiency",
     [](Case& c, double v) {
       c.turbine.efficiency = {EfficiencyBasis::Isentropic, v};
     }},
    {"turbine.polytropic_efficiency",
     [](Case& c, double v) {
       c.turbine.efficiency = {EfficiencyBasis::Polytropic, v};
     }},
    {"turbine.mechanical_efficiency", [](Case& c, double v) { c.turbine.mechanicalEfficiency = v; }},
    {"turbine.power_offtake_W", [](Case& c, double v) { c.turbine.powerOfftake = v; }},
    {"jet_pipe.pressure_loss_fraction", [](Case& c, double v) { c.jetPipe.pressureLossFraction = v; }},
    {"afterburner.exit_temperature_K", [](Case& c, double v) { c.afterburner.exitTemperature = v; }},
    {"afterburner.pressure_loss_fraction_lit",
     [](Case& c, double v) { c.afterburner.pressureLossFractionLit = v; }},
    {"afterburner.pressure_loss_fraction_unlit",
     [](Case& c, double v) { c.afterburner.pressureLossFractionUnlit = v; }},
    {"afterburner.combustion_efficiency", [](Case& c, double v) { c.afterburner.combustionEfficiency = v; }},
    {"nozzle.exit_to_throat_area_ratio",
     [](Case& c, double v) { select<FixedAreaRatioNozzle>(c.nozzle.geometry).exitToThroatAreaRatio = v; }},
    {"nozzle.velocity_coefficient",
     [](Case& c, double v) {
       c.nozzle.lossBasis = NozzleLossBasis::VelocityCoefficient;
       c.nozzle.loss = v;
     }},
    {"nozzle.isentropic_efficiency",
     [](Case& c, double v) {
       c.nozzle.lossBasis = NozzleLossBasis::IsentropicEfficiency;
       c.nozzle.loss = v;
     }},
    {"nozzle.discharge_coefficient", [](Case& c, double v) { c.nozzle.dischargeCoefficient = v; }},
    {"sizing.engine_face_mach", [](Case& c, double v) { c.sizing.engineFaceMach = v; }},
    {"sizing.hub_to_tip_ratio", [](Case& c, double v) { c.sizing.hubToTipRatio = v; }},
};

}  // namespace

CaseFieldSetter numericCaseFieldSetter(std::string_view path) {
  for (const Entry& entry : kSetters)
    if (entry.path == path) return entry.set;
  return nullptr;
}

std::vector<std::string> numericCaseFieldPaths() {
  std::vector<std::string> paths;
  for (const CaseSection& section : caseSections())
    for (const CaseKey& key : section.keys)
      if (key.type == CaseKeyType::Number)
        paths.push_back(std::string(section.name) + "." + std::string(key.name));
  return paths;
}

}  // namespace cw::io
