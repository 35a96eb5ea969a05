#include "engine/turbojet.h"

#include "atmosphere/standard_atmosphere.h"
#include "common/error.h"
#include "components/compressor.h"
#include "components/duct.h"
#include "components/heat_addition.h"
#include "components/inlet.h"
#include "components/nozzle.h"
#include "components/turbine.h"
#include "engine/gas_model_factory.h"
#include "engine/process_paths.h"
#include "flow/compressible_flow.h"
#include "solve/newton_solver.h"

#include <cmath>
#include <limits>
#include <numbers>

namespace cw::engine {

FreeStream freeStreamOf(const FlightInputs& flight) {
  FreeStream fs;
  fs.mach = flight.mach;
  if (const auto* standard = std::get_if<StandardAtmosphereAmbient>(&flight.ambient)) {
    const atmosphere::StandardAtmosphere atmosphere(standard->isaOffset);
    const atmosphere::AtmosphereState state = standard->geometricAltitude
                                                  ? atmosphere.atGeometricAltitude(standard->altitude)
                                                  : atmosphere.atGeopotentialAltitude(standard->altitude);
    fs.temperature = state.temperature;
    fs.pressure = state.pressure;
  } else {
    const auto& given = std::get<GivenAmbient>(flight.ambient);
    fs.temperature = given.temperature;
    fs.pressure = given.pressure;
  }
  return fs;
}

Turbojet::Turbojet(const Case& inputs, bool withPaths)
    : inputs_(inputs),
      withPaths_(withPaths),
      gasModel_(makeGasModel(inputs.gasModel, inputs.fuel, inputs.flight.specificHumidity)) {
  // The single-spool assembly: a two-spool case is read and written, but not evaluated here
  // (it would be evaluated as a single spool with the HP compressor alone).
  if (inputs.architecture != Architecture::Turbojet)
    throw InvalidInput("engine.architecture",
                       "this build reads and writes two-spool turbojet cases but cannot evaluate them yet");
}

namespace {

/// A station from a total state with the stream at rest (no area known there).
Station stationAtRest(const char* id, const TotalState& t, double entropyReference) {
  Station s;
  s.id = id;
  s.gas = t.gas;
  s.totalTemperature = s.staticTemperature = t.temperature;
  s.totalPressure = s.staticPressure = t.pressure;
  s.totalEnthalpy = t.enthalpy;
  s.massFlow = t.massFlow;
  s.fuelAirRatio = t.fuelAirRatio;
  s.entropy = t.gas->entropy(t.temperature, t.pressure) - entropyReference;
  return s;
}

/// Thermal, propulsive and overall efficiency in the earth frame (Cumpsty, Jet Propulsion, 2nd
/// ed. 2003, ch. 1, from memory): the useful power P_u = F_n V0 + P_x (the offtake is delivered
/// power), the kinetic energy left in the wake E_w = (W9 / 2)(V_e - V0)^2 with the effective jet
/// velocity V_e = F_g / W9, and the energy input W_f (LHV + V0^2 / 2) (the fuel's kinetic energy
/// at flight speed; left out with the fuel's mass when the model neglects it):
///   eta_th = (P_u + E_w) / input,  eta_p = P_u / (P_u + E_w),  eta_o = P_u / input = eta_th eta_p.
/// eta_p is at most 1 for any jet. With no offtake, P_u + E_w is the jet's kinetic-energy gain in
/// the engine frame plus the fuel's W_f V0^2 / 2 (the jet's W9 = W2 + W_f), so eta_th is the
/// textbook thermal efficiency (Mattingly, Elements of Propulsion, 2006, eqs. 1.11-1.13).
void setEfficiencies(Performance& perf, double jetMassFlow, double flightVelocity, double offtake,
                     const thermo::GasModel& model) {
  const double useful = perf.netThrust * flightVelocity + offtake;
  const double slip = perf.effectiveJetVelocity - flightVelocity;
  const double wake = 0.5 * jetMassFlow * slip * slip;
  const double fuelKinetic = model.neglectsFuelMass() ? 0.0 : 0.5 * flightVelocity * flightVelocity;
  const double input = perf.fuelFlow * (model.lowerHeatingValue() + fuelKinetic);
  perf.thermalEfficiency = (useful + wake) / input;
  perf.propulsiveEfficiency = useful + wake > 0.0 ? useful / (useful + wake) : 0.0;
  perf.overallEfficiency = useful / input;
}

/// Runs one component: a state beyond the gas data found inside it is reported against the component.
template <typename Run>
auto within(const char* component, Run&& run) -> decltype(run()) {
  try {
    return run();
  } catch (const OutOfRange& e) {
    throw OutOfRange(component, std::string("a state beyond the gas data (") + e.what() + ")");
  }
}

double entropyRate(const Station& in, const Station& out) {
  return out.massFlow * (out.entropy - in.entropy);
}

/// The evaluation itself, on a case and gas model that the caller keeps alive. The flight
/// condition's states do not depend on the air mass flow: they are found once, for every at().
class Assembly {
 public:
  Assembly(const Case& inputs, const thermo::GasModel& model, bool withPaths);
  CycleResult at(double airMassFlow) const;
  CycleResult design() const;

 private:
  const Case& inputs_;
  const thermo::GasModel& model_;
  bool withPaths_;
  std::shared_ptr<const thermo::Gas> air_;
  FreeStream fs_;
  double entropyReference_;  ///< s(T0, p0) of the air [J/(kg K)]
  flow::FlowState free_;     ///< the free stream, static state (T0, p0) at M0
};

Assembly::Assembly(const Case& inputs, const thermo::GasModel& model, bool withPaths)
    : inputs_(inputs),
      model_(model),
      withPaths_(withPaths),
      air_(model.air()),
      fs_(freeStreamOf(inputs.flight)) {
  const thermo::Gas& air = *air_;
  if (fs_.temperature < air.minimumTemperature() || fs_.temperature > air.maximumTemperature())
    throw OutOfRange("/flight (ambient temperature, " + model.kind() + " gas data)", fs_.temperature, "K",
                     "[" + messageNumber(air.minimumTemperature()) + ", " +
                         messageNumber(air.maximumTemperature()) + "] K");
  entropyReference_ = air.entropy(fs_.temperature, fs_.pressure);
  free_ = flow::fromStatic(air, fs_.temperature, fs_.pressure, fs_.mach);
}

CycleResult Assembly::at(double airMassFlow) const {
  const thermo::GasModel& model = model_;
  const auto& air = air_;
  const FreeStream& fs = fs_;
  const double entropyReference = entropyReference_;
  const flow::FlowState& free = free_;
  CycleResult result;

  // 0: free stream.
  Station s0;
  s0.id = "0";
  s0.gas = air;
  s0.totalTemperature = free.total.temperature;
  s0.totalPressure = free.total.pressure;
  s0.totalEnthalpy = free.totalEnthalpy;
  s0.staticTemperature = fs.temperature;
  s0.staticPressure = fs.pressure;
  s0.mach = fs.mach;
  s0.velocity = free.velocity;
  s0.massFlow = airMassFlow;
  s0.entropy = 0.0;
  if (free.velocity > 0.0) s0.area = airMassFlow / free.massFlux();

  // 2: engine face, at the sizing Mach number.
  const TotalState t2 = within("inlet", [&] { return components::Inlet(inputs_.inlet).exit(s0); });
  Station s2 = stationAtRest("2", t2, entropyReference);
  flow::FlowState face;
  try {
    face = flow::fromTotal(*air, t2.temperature, t2.pressure, inputs_.sizing.engineFaceMach);
  } catch (const Error& e) {
    throw InvalidInput("/sizing/engine_face_mach", std::string("at the engine face: ") + e.what());
  }
  s2.staticTemperature = face.local.temperature;
  s2.staticPressure = face.local.pressure;
  s2.mach = face.mach;
  s2.velocity = face.velocity;
  s2.area = airMassFlow / face.massFlux();

  // 3: compressor exit, after the bleed.
  const components::Compressor::Result compression =
      within("compressor", [&] { return components::Compressor(inputs_.compressor).exit(t2); });
  Station s3 = stationAtRest("3", compression.exit, entropyReference);

  // 4: burner exit.
  const components::HeatAddition burner("burner", model, inputs_.burner.pressureLossFraction,
                                        inputs_.burner.combustionEfficiency);
  const components::HeatAddition::Result combustion = within("burner", [&] {
    return std::holds_alternative<ExitTemperatureSetting>(inputs_.burner.setting)
               ? burner.toExitTemperature(
                     compression.exit,
                     std::get<ExitTemperatureSetting>(inputs_.burner.setting).exitTemperature)
               : burner.withFuelAirRatio(compression.exit,
                                         std::get<FuelAirRatioSetting>(inputs_.burner.setting).fuelAirRatio);
  });
  Station s4 = stationAtRest("4", combustion.exit, entropyReference);

  // 5: turbine exit.
  const components::Turbine::Result expansion = within("turbine", [&] {
    return components::Turbine(inputs_.turbine).exit(combustion.exit, compression.power);
  });
  Station s5 = stationAtRest("5", expansion.exit, entropyReference);

  // 7: nozzle entry, through the jet pipe and (when lit) the afterburner.
  TotalState t7 = components::Duct(inputs_.jetPipe.pressureLossFraction).exit(expansion.exit);
  std::optional<Station> s6;
  double afterburnerFuel = 0.0;
  if (inputs_.afterburner.enabled) {
    s6 = stationAtRest("6", t7, entropyReference);
    const components::HeatAddition afterburner("afterburner", model,
                                               inputs_.afterburner.pressureLossFractionLit,
                                               inputs_.afterburner.combustionEfficiency);
    const auto reheat = within("afterburner", [&] {
      return afterburner.toExitTemperature(t7, inputs_.afterburner.exitTemperature);
    });
    t7 = reheat.exit;
    afterburnerFuel = reheat.fuelMassFlow;
  } else if (inputs_.afterburner.pressureLossFractionUnlit > 0.0) {
    t7 = components::Duct(inputs_.afterburner.pressureLossFractionUnlit).exit(t7);
  }
  Station s7 = stationAtRest("7", t7, entropyReference);

  // 8, 9: nozzle throat and exit.
  components::Nozzle::Result jet =
      within("nozzle", [&] { return components::Nozzle(inputs_.nozzle).expand(t7, fs.pressure); });
  Station s8 = std::move(jet.throat), s9 = std::move(jet.exit);
  s8.entropy = s8.gas->entropy(s8.staticTemperature, s8.staticPressure) - entropyReference;
  s9.entropy = s9.gas->entropy(s9.staticTemperature, s9.staticPressure) - entropyReference;

  // Performance (Mattingly, Elements of Propulsion, 2006, eqs. 7.1-7.3 and 1.11-1.13).
  Performance& perf = result.performance;
  perf.grossThrust = jet.grossThrust;
  perf.ramDrag = airMassFlow * free.velocity;
  perf.netThrust = perf.grossThrust - perf.ramDrag;
  if (!(perf.netThrust > 0.0))
    throw NoSolution("cycle", "the net thrust " + messageNumber(perf.netThrust) +
                                  " N is not positive: the jet is slower than the flight speed");
  perf.specificThrust = perf.netThrust / airMassFlow;
  perf.fuelFlow = combustion.fuelMassFlow + afterburnerFuel;
  perf.fuelAirRatio = perf.fuelFlow / s3.massFlow;
  perf.thrustSpecificFuelConsumption = perf.fuelFlow / perf.netThrust;
  perf.jetVelocity = s9.velocity;
  perf.effectiveJetVelocity = perf.grossThrust / s9.massFlow;
  perf.nozzleChoked = jet.choked;
  setEfficiencies(perf, s9.massFlow, free.velocity, inputs_.turbine.powerOfftake, model);

  // Sizing.
  Sizing& size = result.sizing;
  size.airMassFlow = airMassFlow;
  size.captureArea = s0.area;
  size.engineFaceArea = *s2.area;
  const double hub = inputs_.sizing.hubToTipRatio;
  size.engineFaceDiameter = std::sqrt(4.0 * size.engineFaceArea / (std::numbers::pi * (1.0 - hub * hub)));
  size.throatArea = *s8.area;
  size.exitArea = *s9.area;
  size.fuelFlow = perf.fuelFlow;

  // Component summaries: shaft power and entropy generated by each loss.
  const double burnerLossEntropy =
      s4.massFlow * s4.gas->gasConstant() * std::log(compression.exit.pressure / combustion.exit.pressure);
  auto& components = result.components;
  components.reserve(7);
  components.push_back({"inlet", 0.0, std::nullopt, entropyRate(s0, s2)});
  components.push_back(
      {"compressor", compression.power, compression.efficiency, s2.massFlow * (s3.entropy - s2.entropy)});
  components.push_back({"burner", 0.0, std::nullopt, burnerLossEntropy});
  components.push_back({"turbine", -expansion.power, expansion.efficiency, entropyRate(s4, s5)});
  components.push_back({"jet_pipe", 0.0, std::nullopt, entropyRate(s5, s6 ? *s6 : s7)});
  if (s6) {
    const double abLoss =
        s7.massFlow * s7.gas->gasConstant() * std::log(s6->totalPressure / s7.totalPressure);
    components.push_back({"afterburner", 0.0, std::nullopt, abLoss});
  }
  components.push_back({"nozzle", 0.0, jet.efficiency, entropyRate(s7, s9)});

  // Process paths (charts only), while the stations are at hand.
  if (withPaths_) {
    auto& paths = result.paths;
    paths.reserve(8);
    paths.push_back(pressurePath("inlet", "0", "2", *air, s0.staticTemperature, s0.staticPressure,
                                 s2.totalTemperature, s2.totalPressure, entropyReference));
    paths.push_back(pressurePath("compressor", "2", "3", *air, s2.totalTemperature, s2.totalPressure,
                                 s3.totalTemperature, s3.totalPressure, entropyReference));
    paths.push_back(heatingPath("burner", "3", "4", *s3.gas, *s4.gas, s3.totalTemperature, s3.totalPressure,
                                s4.totalTemperature, s4.totalPressure, entropyReference));
    paths.push_back(pressurePath("turbine", "4", "5", *s4.gas, s4.totalTemperature, s4.totalPressure,
                                 s5.totalTemperature, s5.totalPressure, entropyReference));
    const Station& jetPipeEnd = s6 ? *s6 : s7;
    paths.push_back(pressurePath("jet_pipe", "5", jetPipeEnd.id, *s5.gas, s5.totalTemperature,
                                 s5.totalPressure, jetPipeEnd.totalTemperature, jetPipeEnd.totalPressure,
                                 entropyReference));
    if (s6)
      paths.push_back(heatingPath("afterburner", "6", "7", *s6->gas, *s7.gas, s6->totalTemperature,
                                  s6->totalPressure, s7.totalTemperature, s7.totalPressure,
                                  entropyReference));
    paths.push_back(pressurePath("nozzle", "7", "9", *s7.gas, s7.totalTemperature, s7.totalPressure,
                                 s9.staticTemperature, s9.staticPressure, entropyReference));
    paths.push_back(closurePath(*s9.gas, s9.staticTemperature, s9.staticPressure, fs.temperature, fs.pressure,
                                entropyReference, *air));
  }

  // The stations, in flow order, moved into the result (each holds a shared gas).
  auto& stations = result.stations;
  stations.reserve(9);
  for (Station* s : {&s0, &s2, &s3, &s4, &s5}) stations.push_back(std::move(*s));
  if (s6) stations.push_back(std::move(*s6));
  for (Station* s : {&s7, &s8, &s9}) stations.push_back(std::move(*s));
  return result;
}

CycleResult Assembly::design() const {
  if (const auto* flow = std::get_if<AirMassFlowTarget>(&inputs_.design.target)) return at(flow->airMassFlow);
  const double required = std::get<NetThrustTarget>(inputs_.design.target).netThrust;
  // Net thrust rises with air mass flow (linearly but for the fixed power offtake): the core's
  // Newton solver on W2, started from the linear estimate through the cycle at 10 kg/s, to
  // 1e-12 relative in thrust.
  const double linearEstimate = 10.0 * required / at(10.0).performance.netThrust;
  const double w0 = std::isfinite(linearEstimate) && linearEstimate > 0.0 ? linearEstimate : 10.0;
  solve::NonlinearSystem thrustMatch{[this, required](const Eigen::VectorXd& w) {
                                       Eigen::VectorXd f(1);
                                       f(0) = w(0) > 0.0 ? at(w(0)).performance.netThrust - required
                                                         : std::numeric_limits<double>::quiet_NaN();
                                       return f;
                                     },
                                     {}};
  solve::NewtonOptions options;
  options.maxIterations = 60;
  options.residualScale = Eigen::VectorXd::Constant(1, required);
  options.typicalX = Eigen::VectorXd::Constant(1, w0);
  const Eigen::VectorXd start = Eigen::VectorXd::Constant(1, w0);
  return at(solve::solveNewtonOrThrow(thrustMatch, start, "design.required_net_thrust_N: air mass flow",
                                      options)(0));
}

}  // namespace

CycleResult Turbojet::evaluate() const {
  return Assembly(inputs_, *gasModel_, withPaths_).design();
}

CycleResult Turbojet::evaluateAt(double airMassFlow) const {
  return Assembly(inputs_, *gasModel_, withPaths_).at(airMassFlow);
}

CycleResult evaluateTurbojet(const Case& inputs, const thermo::GasModel& gasModel, bool withPaths) {
  return Assembly(inputs, gasModel, withPaths).design();
}

}  // namespace cw::engine
