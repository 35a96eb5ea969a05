#include "network/design_point.h"

#include "common/error.h"
#include "engine/process_paths.h"
#include "flow/compressible_flow.h"
#include "solve/newton_solver.h"

#include <cmath>
#include <limits>
#include <numbers>

namespace cw::network {

namespace {

DesignContext contextOf(const engine::Case& inputs, const thermo::GasModel& model, bool withPaths) {
  const engine::FreeStream fs = engine::freeStreamOf(inputs.flight);
  auto air = model.air();
  if (fs.temperature < air->minimumTemperature() || fs.temperature > air->maximumTemperature())
    throw OutOfRange("/flight (ambient temperature, " + model.kind() + " gas data)", fs.temperature, "K",
                     "[" + messageNumber(air->minimumTemperature()) + ", " +
                         messageNumber(air->maximumTemperature()) + "] K");
  const double reference = air->entropy(fs.temperature, fs.pressure);
  const flow::FlowState free = flow::fromStatic(*air, fs.temperature, fs.pressure, fs.mach);
  return {model, std::move(air), fs, free, reference, withPaths};
}

/// The free stream's station: its static state at M0, zero entropy on the result's datum.
stream::Station freeStreamStation(const std::string& id, const DesignContext& c, double airMassFlow) {
  stream::Station s0;
  s0.id = id;
  s0.gas = c.air;
  s0.totalTemperature = c.free.total.temperature;
  s0.totalPressure = c.free.total.pressure;
  s0.totalEnthalpy = c.free.totalEnthalpy;
  s0.staticTemperature = c.freeStream.temperature;
  s0.staticPressure = c.freeStream.pressure;
  s0.mach = c.freeStream.mach;
  s0.velocity = c.free.velocity;
  s0.massFlow = airMassFlow;
  s0.entropy = 0.0;
  if (c.free.velocity > 0.0) s0.area = airMassFlow / c.free.massFlux();
  return s0;
}

/// Thermal, propulsive and overall efficiency in the earth frame (Cumpsty, Jet Propulsion, 2nd
/// ed. 2003, ch. 1, from memory): the useful power P_u = F_n V0 + P_x (the offtake is delivered
/// power), the kinetic energy left in the wakes E_w = sum (W9 / 2)(V_e - V0)^2 over the nozzles
/// with each effective jet velocity V_e = F_g / W9, and the energy input W_f (LHV + V0^2 / 2)
/// (the fuel's kinetic energy at flight speed; left out with the fuel's mass when the model
/// neglects it):
///   eta_th = (P_u + E_w) / input,  eta_p = P_u / (P_u + E_w),  eta_o = P_u / input = eta_th eta_p.
/// eta_p is at most 1 for any jet. With no offtake, P_u + E_w is the jets' kinetic-energy gain in
/// the engine frame plus the fuel's W_f V0^2 / 2, so eta_th is the textbook thermal efficiency
/// (Mattingly, Elements of Propulsion, 2006, eqs. 1.11-1.13).
void setEfficiencies(engine::Performance& perf, double wake, double flightVelocity,
                     const thermo::GasModel& model) {
  const double useful = perf.netThrust * flightVelocity + perf.shaftPowerOfftake;
  const double fuelKinetic = model.neglectsFuelMass() ? 0.0 : 0.5 * flightVelocity * flightVelocity;
  const double input = perf.fuelFlow * (model.lowerHeatingValue() + fuelKinetic);
  perf.thermalEfficiency = (useful + wake) / input;
  perf.propulsiveEfficiency = useful + wake > 0.0 ? useful / (useful + wake) : 0.0;
  perf.overallEfficiency = useful / input;
}

/// Throws cw::NoSolution unless the net thrust is positive. [N]
void requireNetThrust(double netThrust) {
  if (!(netThrust > 0.0))
    throw NoSolution("cycle",
                     "the net thrust " + messageNumber(netThrust) +
                         " N is not positive: the jet is slower than the flight speed",
                     {kReasonThrustNotPositive, {}, {{netThrust, "N"}}, {}});
}

}  // namespace

DesignPoint::DesignPoint(const engine::Case& inputs, Topology topology, const thermo::GasModel& model,
                         bool withPaths)
    : inputs_(inputs), context_(contextOf(inputs, model, withPaths)) {
  topology(network_, inputs, model);
  network_.description();  // built once (unless the topology shares it), shared by every result
}

void DesignPoint::run(DesignState& state) const {
  const double airMassFlow = state.airMassFlow;
  state.summaries.reserve(network_.components().size());
  for (const ShaftSpec& shaft : network_.shafts())
    state.shafts.push_back({shaft.name, shaft.mechanicalEfficiency, shaft.powerOfftake, 0.0, 0.0});
  state.put(freeStreamStation(network_.roles().freeStream, context_, airMassFlow));
  for (const auto& component : network_.components()) component->design(state);
}

engine::CycleResult DesignPoint::at(double airMassFlow) const {
  DesignState state(context_, airMassFlow);
  run(state);
  return resultOf(state);
}

double DesignPoint::netThrustAt(double airMassFlow) const {
  DesignState state(context_, airMassFlow);
  run(state);
  double grossThrust = 0.0;
  for (const NozzleRecord& n : state.nozzles) grossThrust += n.grossThrust;
  const double netThrust = grossThrust - airMassFlow * context_.free.velocity;
  requireNetThrust(netThrust);
  return netThrust;
}

engine::CycleResult DesignPoint::resultOf(DesignState& state) const {
  engine::CycleResult result;
  const StationRoles& roles = network_.roles();
  const stream::Station& s0 = state.stations.front();  // the free stream, put first by run()
  const double airMassFlow = state.airMassFlow, flightVelocity = context_.free.velocity;

  // Performance (Mattingly, Elements of Propulsion, 2006, eqs. 7.1-7.3 and 1.11-1.13), summed
  // over the nozzles and shafts; the core nozzle (the first) gives the jet velocity.
  engine::Performance& perf = result.performance;
  double jetMassFlow = 0.0, wake = 0.0;
  for (const NozzleRecord& n : state.nozzles) {
    perf.grossThrust += n.grossThrust;
    jetMassFlow += n.exitMassFlow;
    const double slip = n.grossThrust / n.exitMassFlow - flightVelocity;
    wake += 0.5 * n.exitMassFlow * slip * slip;
  }
  perf.ramDrag = airMassFlow * flightVelocity;
  perf.netThrust = perf.grossThrust - perf.ramDrag;
  requireNetThrust(perf.netThrust);
  perf.specificThrust = perf.netThrust / airMassFlow;
  perf.fuelFlow = state.fuelFlow;
  perf.fuelAirRatio = perf.fuelFlow / state.at(roles.burnerEntry).massFlow;
  perf.thrustSpecificFuelConsumption = perf.fuelFlow / perf.netThrust;
  const NozzleRecord& core = state.nozzles.front();
  perf.jetVelocity = core.exitVelocity;
  perf.effectiveJetVelocity = perf.grossThrust / jetMassFlow;
  perf.nozzleChoked = core.choked;
  for (const engine::ShaftBalance& shaft : state.shafts) perf.shaftPowerOfftake += shaft.powerOfftake;
  setEfficiencies(perf, wake, flightVelocity, context_.model);

  // Sizing: the engine face and every nozzle.
  engine::Sizing& size = result.sizing;
  size.airMassFlow = airMassFlow;
  size.captureArea = s0.area;
  size.engineFaceArea = *state.at(roles.engineFace).area;
  const double hub = inputs_.sizing.hubToTipRatio;
  size.engineFaceDiameter = std::sqrt(4.0 * size.engineFaceArea / (std::numbers::pi * (1.0 - hub * hub)));
  for (const NozzleRecord& n : state.nozzles)
    size.nozzles.push_back({std::string(n.nozzle), n.throatArea, n.exitArea});
  size.throatArea = size.nozzles.front().throatArea;
  size.exitArea = size.nozzles.front().exitArea;
  size.fuelFlow = perf.fuelFlow;

  // Process paths (charts only), while the stations are at hand; each nozzle's closure last.
  if (context_.withPaths) {
    auto& paths = result.paths;
    paths.reserve(network_.components().size() + state.nozzles.size());
    for (const auto& component : network_.components()) component->addPath(state, paths);
    for (const NozzleRecord& n : state.nozzles) {
      const stream::Station& exit = state.at(n.exit);
      paths.push_back(engine::closurePath(*exit.gas, exit.staticTemperature, exit.staticPressure,
                                          context_.freeStream.temperature, context_.freeStream.pressure,
                                          context_.entropyReference, *context_.air, std::string(n.exit),
                                          roles.freeStream));
    }
  }

  // The stations, in flow order, moved into the result (each holds a shared gas).
  result.stations = std::move(state.stations);
  result.internalStations = std::move(state.internalStations);
  result.components = std::move(state.summaries);
  result.shafts = std::move(state.shafts);
  result.network = network_.description();
  return result;
}

engine::CycleResult DesignPoint::design() const {
  using engine::AirMassFlowTarget;
  using engine::NetThrustTarget;
  if (const auto* flow = std::get_if<AirMassFlowTarget>(&inputs_.design.target)) return at(flow->airMassFlow);
  const double required = std::get<NetThrustTarget>(inputs_.design.target).netThrust;
  // Net thrust rises with air mass flow (linearly but for the fixed power offtake): the core's
  // Newton solver on W2, started from the linear estimate through the cycle at 10 kg/s, to
  // 1e-12 relative in thrust.
  // Each iteration needs the net thrust alone (netThrustAt: the same sum as at()'s).
  const double linearEstimate = 10.0 * required / netThrustAt(10.0);
  const double w0 = std::isfinite(linearEstimate) && linearEstimate > 0.0 ? linearEstimate : 10.0;
  solve::NonlinearSystem thrustMatch{[this, required](const Eigen::VectorXd& w) {
                                       Eigen::VectorXd f(1);
                                       f(0) = w(0) > 0.0 ? netThrustAt(w(0)) - required
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

}  // namespace cw::network
