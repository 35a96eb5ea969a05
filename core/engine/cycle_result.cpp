#include "engine/cycle_result.h"

#include "common/error.h"

#include <cmath>
#include <stdexcept>

namespace cw::engine {

namespace {

/// Throws when value is not finite; the message (built only then) names what and where.
void check(double value, const std::string& which, const char* what, const char* where = "",
           const std::string& name = {}) {
  if (std::isfinite(value)) return;
  throw NoSolution("cycle",
                   "the " + which + " has no finite " + what + where + name +
                       "; the inputs are beyond what the model can evaluate",
                   {kReasonResultNotFinite, {}, {}, {}});
}

}  // namespace

void requireFinite(const CycleResult& result, const std::string& which) {
  const Performance& p = result.performance;
  for (const auto& [value, name] : {std::pair{p.netThrust, "net thrust"},
                                    {p.grossThrust, "gross thrust"},
                                    {p.ramDrag, "ram drag"},
                                    {p.specificThrust, "specific thrust"},
                                    {p.thrustSpecificFuelConsumption, "TSFC"},
                                    {p.fuelFlow, "fuel flow"},
                                    {p.fuelAirRatio, "fuel-air ratio"},
                                    {p.thermalEfficiency, "thermal efficiency"},
                                    {p.propulsiveEfficiency, "propulsive efficiency"},
                                    {p.overallEfficiency, "overall efficiency"},
                                    {p.jetVelocity, "jet velocity"},
                                    {p.effectiveJetVelocity, "effective jet velocity"}})
    check(value, which, name);
  const Sizing& z = result.sizing;
  for (const auto& [value, name] : {std::pair{z.airMassFlow, "air mass flow"},
                                    {z.engineFaceArea, "face area"},
                                    {z.engineFaceDiameter, "face diameter"},
                                    {z.throatArea, "throat area"},
                                    {z.exitArea, "exit area"},
                                    {z.fuelFlow, "fuel flow"}})
    check(value, which, name);
  if (z.captureArea) check(*z.captureArea, which, "capture area");
  for (const Station& s : result.stations) {
    for (const auto& [value, name] : {std::pair{s.totalTemperature, "total temperature"},
                                      {s.totalPressure, "total pressure"},
                                      {s.totalEnthalpy, "total enthalpy"},
                                      {s.staticTemperature, "static temperature"},
                                      {s.staticPressure, "static pressure"},
                                      {s.mach, "Mach number"},
                                      {s.velocity, "velocity"},
                                      {s.massFlow, "mass flow"},
                                      {s.fuelAirRatio, "fuel-air ratio"},
                                      {s.entropy, "entropy"}})
      check(value, which, name, " at station ", s.id);
    if (s.area) check(*s.area, which, "area", " at station ", s.id);
  }
  for (const ComponentSummary& c : result.components) {
    check(c.power, which, "power", " of the ", c.component);
    check(c.entropyGeneration, which, "entropy generation", " of the ", c.component);
    if (c.efficiency) {
      check(c.efficiency->isentropic, which, "isentropic efficiency", " of the ", c.component);
      check(c.efficiency->polytropic, which, "polytropic efficiency", " of the ", c.component);
    }
  }
  for (const ProcessPath& path : result.paths)
    for (const PathState& state : path.states)
      for (double value : {state.temperature, state.entropy, state.pressure, state.specificVolume,
                           state.enthalpy, state.sensibleEnthalpy})
        check(value, which, "state", " on the path of the ", path.component);
  // What the network adds besides (finite whenever the above are).
  for (const NozzleSizing& n : z.nozzles) {
    check(n.throatArea, which, "throat area", " of the ", n.nozzle);
    check(n.exitArea, which, "exit area", " of the ", n.nozzle);
  }
  check(p.shaftPowerOfftake, which, "shaft power offtake");
  for (const ShaftBalance& s : result.shafts) {
    check(s.compressorPower, which, "compressor power", " of the ", s.name);
    check(s.turbinePower, which, "turbine power", " of the ", s.name);
  }
}

const Station& CycleResult::station(const std::string& id) const {
  for (const auto& s : stations)
    if (s.id == id) return s;
  throw std::out_of_range("no station " + id + " in this result");
}

const Station& CycleResult::anyStation(const std::string& id) const {
  for (const auto& s : internalStations)
    if (s.id == id) return s;
  return station(id);
}

}  // namespace cw::engine
