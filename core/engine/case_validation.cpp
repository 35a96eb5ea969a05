#include "engine/case_validation.h"

#include "common/error.h"
#include "engine/case_validation_error.h"

#include <string>
#include <string_view>
#include <utility>

namespace cw::engine {

namespace {

/// An interval with open or closed ends.
struct Interval {
  double low;
  bool lowClosed;
  double high;
  bool highClosed;

  bool contains(double x) const {
    // Written so that NaN is outside.
    const bool aboveLow = lowClosed ? x >= low : x > low;
    const bool belowHigh = highClosed ? x <= high : x < high;
    return aboveLow && belowHigh;
  }
  std::string text() const {
    return std::string(lowClosed ? "[" : "(") + messageNumber(low) + ", " + messageNumber(high) +
           (highClosed ? "]" : ")");
  }
};

constexpr Interval closed(double low, double high) {
  return {low, true, high, true};
}
constexpr Interval openClosed(double low, double high) {
  return {low, false, high, true};
}
constexpr Interval closedOpen(double low, double high) {
  return {low, true, high, false};
}
constexpr Interval open(double low, double high) {
  return {low, false, high, false};
}

/// (0, 1]: efficiencies, recoveries, coefficients.
constexpr Interval kUnitFraction = openClosed(0.0, 1.0);
/// [0, 0.3]: pressure-loss fractions of ducts and burners.
constexpr Interval kLossFraction = closed(0.0, 0.3);
/// Specific heat and ratio of specific heats of the simple gas models.
constexpr Interval kCp = open(0.0, 1.0e5);
constexpr Interval kGamma = openClosed(1.0, 5.0 / 3.0);
/// The two-gamma model's hot gas: combustion products are never stiffer than air (gamma of
/// diatomic air 1.4; products about 1.3; common practice, no source).
constexpr Interval kHotGamma = openClosed(1.0, 1.4);
/// Burner and afterburner exit temperatures.
constexpr Interval kExitTemperature = closed(300.0, 2500.0);

class Checker {
 public:
  // Paths and units as plain text: a valid value costs one comparison, no string is built.
  void check(std::string_view path, double value, const Interval& range, std::string_view unit = {}) {
    if (range.contains(value)) return;
    const std::string valid = range.text() + (unit.empty() ? "" : " " + std::string(unit));
    problems_.push_back({std::string(path), formatNumber(value), valid,
                         InvalidInput(std::string(path), value, std::string(unit), valid).what()});
  }
  void fail(const std::string& path, const std::string& value, const std::string& valid,
            const std::string& message) {
    problems_.push_back({path, value, valid, path + ": " + message});
  }
  std::vector<CaseProblem> take() { return std::move(problems_); }

 private:
  std::vector<CaseProblem> problems_;
};

void checkFlight(Checker& c, const FlightInputs& f) {
  if (const auto* standard = std::get_if<StandardAtmosphereAmbient>(&f.ambient)) {
    // U.S. Standard Atmosphere 1976: -5 km to 86 km geometric; 86 km is 84852 m geopotential.
    c.check("/flight/altitude_m", standard->altitude,
            closed(-5000.0, standard->geometricAltitude ? 86000.0 : 84852.0), "m");
    c.check("/flight/isa_offset_K", standard->isaOffset, closed(-100.0, 100.0), "K");
  } else {
    const auto& given = std::get<GivenAmbient>(f.ambient);
    c.check("/flight/ambient_temperature_K", given.temperature, openClosed(150.0, 350.0), "K");
    c.check("/flight/ambient_pressure_Pa", given.pressure, openClosed(0.0, 2.0e5), "Pa");
  }
  c.check("/flight/mach", f.mach, closed(0.0, 5.0));
  c.check("/flight/specific_humidity_kg_per_kg", f.specificHumidity, closed(0.0, 0.05), "kg/kg");
}

void checkDesign(Checker& c, const DesignInputs& d) {
  if (const auto* flow = std::get_if<AirMassFlowTarget>(&d.target))
    c.check("/design/air_mass_flow_kg_per_s", flow->airMassFlow, openClosed(0.0, 2000.0), "kg/s");
  else
    c.check("/design/required_net_thrust_N", std::get<NetThrustTarget>(d.target).netThrust,
            openClosed(0.0, 2.0e6), "N");
}

void checkFuel(Checker& c, const FuelInputs& f) {
  c.check("/fuel/lower_heating_value_J_per_kg", f.lowerHeatingValue, closed(1.0e6, 1.5e8), "J/kg");
  c.check("/fuel/hydrogen_carbon_ratio", f.hydrogenCarbonRatio, closed(0.0, 4.0));
  c.check("/fuel/temperature_K", f.temperature, closed(200.0, 1000.0), "K");
}

/// The hot gas of the two-gamma model stands for the products of burning in the cold gas: its gamma
/// at most the cold one, its cp at least the cold one (as products against air: more triatomic
/// molecules, hotter). A stiffer or less heat-holding hot gas makes the model's energy books give
/// an exhaust colder than the intake and a thermal efficiency above 1. Checked when both
/// values are in their own ranges (common practice, no source).
void checkHotGas(Checker& c, const TwoGammaGasModel& g) {
  if (!kGamma.contains(g.coldGamma) || !kHotGamma.contains(g.hotGamma) || !kCp.contains(g.coldCp) ||
      !kCp.contains(g.hotCp))
    return;
  if (g.hotGamma > g.coldGamma)
    c.fail("/gas_model/hot_gamma", formatNumber(g.hotGamma), "(1, cold_gamma]",
           messageNumber(g.hotGamma) + " is above the cold gamma " + messageNumber(g.coldGamma) +
               ": the products of combustion are never stiffer than the air they come from");
  if (g.hotCp < g.coldCp)
    c.fail("/gas_model/hot_cp_J_per_kg_K", formatNumber(g.hotCp), "[cold_cp_J_per_kg_K, 1e5) J/(kg K)",
           messageNumber(g.hotCp) + " J/(kg K) is below the cold cp " + messageNumber(g.coldCp) +
               " J/(kg K): the products of combustion hold more heat per kelvin than the air they come from");
}

void checkGasModel(Checker& c, const GasModelInputs& g) {
  if (const auto* constant = std::get_if<ConstantCpGasModel>(&g.model)) {
    c.check("/gas_model/cp_J_per_kg_K", constant->cp, kCp, "J/(kg K)");
    c.check("/gas_model/gamma", constant->gamma, kGamma);
  } else if (const auto* two = std::get_if<TwoGammaGasModel>(&g.model)) {
    c.check("/gas_model/cold_cp_J_per_kg_K", two->coldCp, kCp, "J/(kg K)");
    c.check("/gas_model/cold_gamma", two->coldGamma, kGamma);
    c.check("/gas_model/hot_cp_J_per_kg_K", two->hotCp, kCp, "J/(kg K)");
    c.check("/gas_model/hot_gamma", two->hotGamma, kHotGamma);
    checkHotGas(c, *two);
  } else if (g.neglectFuelMass) {
    c.fail("/gas_model/neglect_fuel_mass", "true", "false with kind \"thermally-perfect\"",
           "true is allowed only with kind \"constant-cp\" or \"two-gamma\"");
  }
}

void checkEfficiency(Checker& c, std::string_view isentropicPath, std::string_view polytropicPath,
                     const Efficiency& e) {
  c.check(e.basis == EfficiencyBasis::Isentropic ? isentropicPath : polytropicPath, e.value, kUnitFraction);
}

void checkComponents(Checker& c, const Case& k) {
  c.check(k.inlet.lossBasis == InletLossBasis::PressureRecovery ? "/inlet/pressure_recovery"
                                                                : "/inlet/ram_efficiency",
          k.inlet.loss, kUnitFraction);

  c.check("/compressor/pressure_ratio", k.compressor.pressureRatio, closed(1.0, 60.0));
  checkEfficiency(c, "/compressor/isentropic_efficiency", "/compressor/polytropic_efficiency",
                  k.compressor.efficiency);
  c.check("/compressor/bleed_fraction", k.compressor.bleedFraction, closed(0.0, 0.3));

  if (const auto* t = std::get_if<ExitTemperatureSetting>(&k.burner.setting))
    c.check("/burner/exit_temperature_K", t->exitTemperature, kExitTemperature, "K");
  else
    // Above stoichiometric (0.058 to 0.087 for H/C 4 to 0) the burner itself refuses.
    c.check("/burner/fuel_air_ratio", std::get<FuelAirRatioSetting>(k.burner.setting).fuelAirRatio,
            openClosed(0.0, 0.1));
  c.check("/burner/pressure_loss_fraction", k.burner.pressureLossFraction, kLossFraction);
  c.check("/burner/combustion_efficiency", k.burner.combustionEfficiency, kUnitFraction);

  checkEfficiency(c, "/turbine/isentropic_efficiency", "/turbine/polytropic_efficiency",
                  k.turbine.efficiency);
  c.check("/turbine/mechanical_efficiency", k.turbine.mechanicalEfficiency, kUnitFraction);
  c.check("/turbine/power_offtake_W", k.turbine.powerOfftake, closed(0.0, 5.0e7), "W");

  c.check("/jet_pipe/pressure_loss_fraction", k.jetPipe.pressureLossFraction, kLossFraction);

  c.check("/afterburner/exit_temperature_K", k.afterburner.exitTemperature, kExitTemperature, "K");
  c.check("/afterburner/pressure_loss_fraction_lit", k.afterburner.pressureLossFractionLit, kLossFraction);
  c.check("/afterburner/pressure_loss_fraction_unlit", k.afterburner.pressureLossFractionUnlit,
          kLossFraction);
  c.check("/afterburner/combustion_efficiency", k.afterburner.combustionEfficiency, kUnitFraction);

  if (const auto* fixed = std::get_if<FixedAreaRatioNozzle>(&k.nozzle.geometry))
    c.check("/nozzle/exit_to_throat_area_ratio", fixed->exitToThroatAreaRatio, closed(1.0, 50.0));
  c.check(k.nozzle.lossBasis == NozzleLossBasis::VelocityCoefficient ? "/nozzle/velocity_coefficient"
                                                                     : "/nozzle/isentropic_efficiency",
          k.nozzle.loss, kUnitFraction);
  c.check("/nozzle/discharge_coefficient", k.nozzle.dischargeCoefficient, kUnitFraction);

  c.check("/sizing/engine_face_mach", k.sizing.engineFaceMach, openClosed(0.0, 0.8));
  c.check("/sizing/hub_to_tip_ratio", k.sizing.hubToTipRatio, closedOpen(0.0, 0.9));
}

}  // namespace

std::vector<CaseProblem> validateCase(const Case& inputs) {
  Checker checker;
  checkFlight(checker, inputs.flight);
  checkDesign(checker, inputs.design);
  checkFuel(checker, inputs.fuel);
  checkGasModel(checker, inputs.gasModel);
  checkComponents(checker, inputs);
  return checker.take();
}

void requireValidCase(const Case& inputs) {
  std::vector<CaseProblem> problems = validateCase(inputs);
  if (!problems.empty()) throw CaseValidationError("case", std::move(problems));
}

}  // namespace cw::engine
