#include "io/case_builder.h"

namespace cw::io {

using nlohmann::json;
using namespace cw::engine;

namespace {

const json& section(const json& document, const char* name) {
  static const json empty = json::object();
  const auto it = document.find(name);
  return it != document.end() ? *it : empty;
}

bool has(const json& object, const char* key) {
  return object.contains(key);
}

void read(const json& object, const char* key, double& target) {
  if (has(object, key)) target = object[key].get<double>();
}

void read(const json& object, const char* key, bool& target) {
  if (has(object, key)) target = object[key].get<bool>();
}

std::string text(const json& object, const char* key, const std::string& fallback) {
  return has(object, key) ? object[key].get<std::string>() : fallback;
}

/// An efficiency given as "isentropic_efficiency" or "polytropic_efficiency"; else the default.
void readEfficiency(const json& object, Efficiency& target) {
  if (has(object, "polytropic_efficiency"))
    target = {EfficiencyBasis::Polytropic, object["polytropic_efficiency"].get<double>()};
  else if (has(object, "isentropic_efficiency"))
    target = {EfficiencyBasis::Isentropic, object["isentropic_efficiency"].get<double>()};
}

FlightInputs buildFlight(const json& o) {
  FlightInputs flight;
  if (has(o, "ambient_temperature_K") || has(o, "ambient_pressure_Pa")) {
    GivenAmbient given;
    read(o, "ambient_temperature_K", given.temperature);
    read(o, "ambient_pressure_Pa", given.pressure);
    flight.ambient = given;
  } else {
    StandardAtmosphereAmbient standard;
    read(o, "altitude_m", standard.altitude);
    read(o, "geometric_altitude", standard.geometricAltitude);
    read(o, "isa_offset_K", standard.isaOffset);
    flight.ambient = standard;
  }
  read(o, "mach", flight.mach);
  read(o, "specific_humidity_kg_per_kg", flight.specificHumidity);
  return flight;
}

DesignInputs buildDesign(const json& o) {
  DesignInputs design;
  if (has(o, "required_net_thrust_N")) {
    design.target = NetThrustTarget{o["required_net_thrust_N"].get<double>()};
  } else {
    AirMassFlowTarget flow;
    read(o, "air_mass_flow_kg_per_s", flow.airMassFlow);
    design.target = flow;
  }
  return design;
}

FuelInputs buildFuel(const json& o) {
  FuelInputs fuel;
  read(o, "lower_heating_value_J_per_kg", fuel.lowerHeatingValue);
  read(o, "hydrogen_carbon_ratio", fuel.hydrogenCarbonRatio);
  read(o, "temperature_K", fuel.temperature);
  return fuel;
}

GasModelInputs buildGasModel(const json& o) {
  GasModelInputs gas;
  const std::string kind = text(o, "kind", "thermally-perfect");
  if (kind == "constant-cp") {
    ConstantCpGasModel model;
    read(o, "cp_J_per_kg_K", model.cp);
    read(o, "gamma", model.gamma);
    gas.model = model;
  } else if (kind == "two-gamma") {
    TwoGammaGasModel model;
    read(o, "cold_cp_J_per_kg_K", model.coldCp);
    read(o, "cold_gamma", model.coldGamma);
    read(o, "hot_cp_J_per_kg_K", model.hotCp);
    read(o, "hot_gamma", model.hotGamma);
    gas.model = model;
  }
  read(o, "neglect_fuel_mass", gas.neglectFuelMass);
  return gas;
}

InletInputs buildInlet(const json& o) {
  InletInputs inlet;
  if (has(o, "ram_efficiency")) {
    inlet.lossBasis = InletLossBasis::RamEfficiency;
    inlet.loss = o["ram_efficiency"].get<double>();
  } else {
    read(o, "pressure_recovery", inlet.loss);
  }
  if (text(o, "supersonic_recovery_rule", "none") == "mil-e-5008b")
    inlet.supersonicRecoveryRule = SupersonicRecoveryRule::MilE5008B;
  return inlet;
}

CompressorInputs buildCompressor(const json& o) {
  CompressorInputs compressor;
  read(o, "pressure_ratio", compressor.pressureRatio);
  readEfficiency(o, compressor.efficiency);
  read(o, "bleed_fraction", compressor.bleedFraction);
  return compressor;
}

BurnerInputs buildBurner(const json& o) {
  BurnerInputs burner;
  if (has(o, "fuel_air_ratio")) {
    burner.setting = FuelAirRatioSetting{o["fuel_air_ratio"].get<double>()};
  } else {
    ExitTemperatureSetting setting;
    read(o, "exit_temperature_K", setting.exitTemperature);
    burner.setting = setting;
  }
  read(o, "pressure_loss_fraction", burner.pressureLossFraction);
  read(o, "combustion_efficiency", burner.combustionEfficiency);
  return burner;
}

TurbineInputs buildTurbine(const json& o) {
  TurbineInputs turbine;
  readEfficiency(o, turbine.efficiency);
  read(o, "mechanical_efficiency", turbine.mechanicalEfficiency);
  read(o, "power_offtake_W", turbine.powerOfftake);
  return turbine;
}

AfterburnerInputs buildAfterburner(const json& o) {
  AfterburnerInputs afterburner;
  read(o, "enabled", afterburner.enabled);
  read(o, "exit_temperature_K", afterburner.exitTemperature);
  read(o, "pressure_loss_fraction_lit", afterburner.pressureLossFractionLit);
  read(o, "pressure_loss_fraction_unlit", afterburner.pressureLossFractionUnlit);
  read(o, "combustion_efficiency", afterburner.combustionEfficiency);
  return afterburner;
}

NozzleInputs buildNozzle(const json& o) {
  NozzleInputs nozzle;
  if (text(o, "kind", "convergent") == "convergent-divergent") {
    if (text(o, "expansion", "full") == "area-ratio") {
      FixedAreaRatioNozzle fixed;
      read(o, "exit_to_throat_area_ratio", fixed.exitToThroatAreaRatio);
      nozzle.geometry = fixed;
    } else {
      nozzle.geometry = FullyExpandingNozzle{};
    }
  }
  if (has(o, "isentropic_efficiency")) {
    nozzle.lossBasis = NozzleLossBasis::IsentropicEfficiency;
    nozzle.loss = o["isentropic_efficiency"].get<double>();
  } else {
    read(o, "velocity_coefficient", nozzle.loss);
  }
  read(o, "discharge_coefficient", nozzle.dischargeCoefficient);
  return nozzle;
}

}  // namespace

Case buildCase(const json& clean) {
  Case inputs;
  inputs.title = text(clean, "title", "");
  inputs.notes = text(clean, "notes", "");
  inputs.flight = buildFlight(section(clean, "flight"));
  inputs.design = buildDesign(section(clean, "design"));
  inputs.fuel = buildFuel(section(clean, "fuel"));
  inputs.gasModel = buildGasModel(section(clean, "gas_model"));
  inputs.inlet = buildInlet(section(clean, "inlet"));
  inputs.compressor = buildCompressor(section(clean, "compressor"));
  inputs.burner = buildBurner(section(clean, "burner"));
  inputs.turbine = buildTurbine(section(clean, "turbine"));
  read(section(clean, "jet_pipe"), "pressure_loss_fraction", inputs.jetPipe.pressureLossFraction);
  inputs.afterburner = buildAfterburner(section(clean, "afterburner"));
  inputs.nozzle = buildNozzle(section(clean, "nozzle"));
  read(section(clean, "sizing"), "engine_face_mach", inputs.sizing.engineFaceMach);
  read(section(clean, "sizing"), "hub_to_tip_ratio", inputs.sizing.hubToTipRatio);
  return inputs;
}

}  // namespace cw::io
