// Writing case files: caseToJson and writeCaseFile (declared in io/case_file.h).
#include "io/atomic_file.h"
#include "io/case_file.h"
#include "io/case_keys.h"

namespace cw::io {

using nlohmann::json;
using namespace cw::engine;

namespace {

void writeEfficiency(json& object, const Efficiency& efficiency) {
  object[efficiency.basis == EfficiencyBasis::Isentropic ? "isentropic_efficiency"
                                                         : "polytropic_efficiency"] = efficiency.value;
}

json flightToJson(const FlightInputs& flight) {
  json o = json::object();
  if (const auto* standard = std::get_if<StandardAtmosphereAmbient>(&flight.ambient)) {
    o["altitude_m"] = standard->altitude;
    o["geometric_altitude"] = standard->geometricAltitude;
    o["isa_offset_K"] = standard->isaOffset;
  } else {
    const auto& given = std::get<GivenAmbient>(flight.ambient);
    o["ambient_temperature_K"] = given.temperature;
    o["ambient_pressure_Pa"] = given.pressure;
  }
  o["mach"] = flight.mach;
  o["specific_humidity_kg_per_kg"] = flight.specificHumidity;
  return o;
}

json designToJson(const DesignInputs& design) {
  json o = json::object();
  if (const auto* flow = std::get_if<AirMassFlowTarget>(&design.target))
    o["air_mass_flow_kg_per_s"] = flow->airMassFlow;
  else
    o["required_net_thrust_N"] = std::get<NetThrustTarget>(design.target).netThrust;
  return o;
}

json gasModelToJson(const GasModelInputs& gas) {
  json o = json::object();
  if (const auto* constant = std::get_if<ConstantCpGasModel>(&gas.model)) {
    o["kind"] = "constant-cp";
    o["cp_J_per_kg_K"] = constant->cp;
    o["gamma"] = constant->gamma;
  } else if (const auto* two = std::get_if<TwoGammaGasModel>(&gas.model)) {
    o["kind"] = "two-gamma";
    o["cold_cp_J_per_kg_K"] = two->coldCp;
    o["cold_gamma"] = two->coldGamma;
    o["hot_cp_J_per_kg_K"] = two->hotCp;
    o["hot_gamma"] = two->hotGamma;
  } else {
    o["kind"] = "thermally-perfect";
  }
  o["neglect_fuel_mass"] = gas.neglectFuelMass;
  return o;
}

json inletToJson(const InletInputs& inlet) {
  json o = json::object();
  o[inlet.lossBasis == InletLossBasis::PressureRecovery ? "pressure_recovery" : "ram_efficiency"] =
      inlet.loss;
  o["supersonic_recovery_rule"] =
      inlet.supersonicRecoveryRule == SupersonicRecoveryRule::MilE5008B ? "mil-e-5008b" : "none";
  return o;
}

json burnerToJson(const BurnerInputs& burner) {
  json o = json::object();
  if (const auto* temperature = std::get_if<ExitTemperatureSetting>(&burner.setting))
    o["exit_temperature_K"] = temperature->exitTemperature;
  else
    o["fuel_air_ratio"] = std::get<FuelAirRatioSetting>(burner.setting).fuelAirRatio;
  o["pressure_loss_fraction"] = burner.pressureLossFraction;
  o["combustion_efficiency"] = burner.combustionEfficiency;
  return o;
}

json nozzleToJson(const NozzleInputs& nozzle) {
  json o = json::object();
  if (std::holds_alternative<ConvergentNozzle>(nozzle.geometry)) {
    o["kind"] = "convergent";
  } else {
    o["kind"] = "convergent-divergent";
    if (const auto* fixed = std::get_if<FixedAreaRatioNozzle>(&nozzle.geometry)) {
      o["expansion"] = "area-ratio";
      o["exit_to_throat_area_ratio"] = fixed->exitToThroatAreaRatio;
    } else {
      o["expansion"] = "full";
    }
  }
  o[nozzle.lossBasis == NozzleLossBasis::VelocityCoefficient ? "velocity_coefficient"
                                                             : "isentropic_efficiency"] = nozzle.loss;
  o["discharge_coefficient"] = nozzle.dischargeCoefficient;
  return o;
}

/// The document with its keys in the order of the format's key table.
nlohmann::ordered_json ordered(const json& document) {
  nlohmann::ordered_json result = nlohmann::ordered_json::object();
  const CaseSection& top = caseSections().front();
  for (const CaseKey& key : top.keys)
    if (document.contains(std::string(key.name)))
      result[std::string(key.name)] = document[std::string(key.name)];
  for (const CaseSection& section : caseSections()) {
    const std::string name(section.name);
    if (name.empty() || !document.contains(name)) continue;
    nlohmann::ordered_json object = nlohmann::ordered_json::object();
    for (const CaseKey& key : section.keys)
      if (document[name].contains(std::string(key.name)))
        object[std::string(key.name)] = document[name][std::string(key.name)];
    result[name] = std::move(object);
  }
  return result;
}

}  // namespace

json caseToJson(const Case& inputs) {
  json d = json::object();
  d["format"] = std::string(kCaseFormat);
  d["version"] = kCaseVersion;
  d["title"] = inputs.title;
  d["notes"] = inputs.notes;
  d["flight"] = flightToJson(inputs.flight);
  d["design"] = designToJson(inputs.design);
  d["fuel"] = {{"lower_heating_value_J_per_kg", inputs.fuel.lowerHeatingValue},
               {"hydrogen_carbon_ratio", inputs.fuel.hydrogenCarbonRatio},
               {"temperature_K", inputs.fuel.temperature}};
  d["gas_model"] = gasModelToJson(inputs.gasModel);
  d["inlet"] = inletToJson(inputs.inlet);
  d["compressor"] = {{"pressure_ratio", inputs.compressor.pressureRatio},
                     {"bleed_fraction", inputs.compressor.bleedFraction}};
  writeEfficiency(d["compressor"], inputs.compressor.efficiency);
  d["burner"] = burnerToJson(inputs.burner);
  d["turbine"] = {{"mechanical_efficiency", inputs.turbine.mechanicalEfficiency},
                  {"power_offtake_W", inputs.turbine.powerOfftake}};
  writeEfficiency(d["turbine"], inputs.turbine.efficiency);
  d["jet_pipe"] = {{"pressure_loss_fraction", inputs.jetPipe.pressureLossFraction}};
  d["afterburner"] = {{"enabled", inputs.afterburner.enabled},
                      {"exit_temperature_K", inputs.afterburner.exitTemperature},
                      {"pressure_loss_fraction_lit", inputs.afterburner.pressureLossFractionLit},
                      {"pressure_loss_fraction_unlit", inputs.afterburner.pressureLossFractionUnlit},
                      {"combustion_efficiency", inputs.afterburner.combustionEfficiency}};
  d["nozzle"] = nozzleToJson(inputs.nozzle);
  d["sizing"] = {{"engine_face_mach", inputs.sizing.engineFaceMach},
                 {"hub_to_tip_ratio", inputs.sizing.hubToTipRatio}};
  return d;
}

void writeCaseFile(const std::string& path, const Case& inputs) {
  writeFileAtomically(path, ordered(caseToJson(inputs)).dump(2) + "\n");
}

}  // namespace cw::io
