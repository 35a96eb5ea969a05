#include "analysis/exergy_balance.h"

#include "engine/free_stream.h"
#include "network/engine.h"
#include "thermo/thermally_perfect_model.h"

#include <cmath>
#include <stdexcept>

namespace cw::analysis {

namespace {

using engine::ControlVolume;

const engine::ComponentSummary& summaryOf(const engine::CycleResult& r, const std::string& name) {
  for (const auto& c : r.components)
    if (c.component == name) return c;
  throw std::out_of_range("no component " + name);
}

const engine::ShaftBalance& shaftOf(const engine::CycleResult& r, const std::string& name) {
  for (const auto& s : r.shafts)
    if (s.name == name) return s;
  throw std::out_of_range("no shaft " + name);
}

}  // namespace

ExergyBalance exergyBalanceOf(const AuditPoint& point) {
  const engine::Case& inputs = point.baseCase();
  const network::Engine engine(inputs, false);
  const engine::CycleResult r = engine.evaluate();
  const engine::NetworkDescription& net = *r.network;
  const thermo::GasModel& model = engine.gasModel();
  const engine::FreeStream fs = engine::freeStreamOf(inputs.flight);
  const double T0 = fs.temperature, p0 = fs.pressure;
  const auto air = model.air();
  const double sRef = air->entropy(T0, p0);  // station entropies are relative to this
  // Absolute entropy: a reported station's from its entropy on the datum, an internal one's
  // (inside a component, no entropy reported) from its total state.
  auto sAbs = [&](const engine::Station& s) { return s.entropy + sRef; };
  auto sAbsAt = [&](const std::string& id) {
    for (const auto& s : r.internalStations)
      if (s.id == id) return s.gas->entropy(s.totalTemperature, s.totalPressure);
    return sAbs(r.station(id));
  };

  const engine::Station &s0 = r.station(net.freeStream), &face = r.station(net.engineFace);
  // The burner's air flow W3 (after any bleed); fuel flows are per unit of it (f3 = 0).
  const double W2 = face.massFlow, W3 = r.station(net.burnerEntry).massFlow;
  const double lhv = model.lowerHeatingValue();

  ExergyBalance b;
  b.deadStateTemperature = T0;
  b.deadStatePressure = p0;

  // Entropy balances, control volume by control volume in flow order [W/K]; the heat additions'
  // fuel and the bleeds on the way. Fuel entropy: absolute (third-law) on the thermally perfect
  // model; on the simple models the entropy of the stream the fuel joins (exergy_balance.h).
  auto add = [&](const std::string& name, double sGen) { b.components.push_back({name, sGen, T0 * sGen}); };
  double fuelFlow = 0.0, fuelEntropyFlow = 0.0;
  bool burner = true;
  for (const ControlVolume& v : net.volumes) {
    if (v.kind == ControlVolume::Kind::Shaft) {
      // The mechanical loss P_m = P_t - P_c - P_x, dissipated at T0.
      const engine::ShaftBalance& shaft = shaftOf(r, v.shaft);
      add(v.name, (shaft.turbinePower - shaft.compressorPower - shaft.powerOfftake) / T0);
      continue;
    }
    const engine::Station &in = r.anyStation(v.entry), &out = r.anyStation(v.exit);
    const double sIn = sAbsAt(v.entry), sOut = sAbsAt(v.exit);
    if (v.kind == ControlVolume::Kind::Bleeding) {
      const double bleedFlow = in.massFlow - out.massFlow;
      add(v.name, out.massFlow * sOut + bleedFlow * sOut - in.massFlow * sIn);
      b.bleedAir += bleedFlow * ((out.totalEnthalpy - air->enthalpy(T0)) - T0 * (sOut - sRef));
    } else if (v.kind == ControlVolume::Kind::HeatAddition) {
      const double fuel = (out.fuelAirRatio - in.fuelAirRatio) * W3;
      const double fuelEntropy = model.fuelEntropy(sIn);
      if (burner) b.fuelEntropy = fuelEntropy;
      burner = false;
      add(v.name, out.massFlow * sOut - in.massFlow * sIn - fuel * fuelEntropy);
      fuelFlow += fuel;
      fuelEntropyFlow += fuel * fuelEntropy;
      b.unburntFuel += (1.0 - summaryOf(r, v.name).combustionEfficiency) * fuel * lhv;
    } else {
      add(v.name, out.massFlow * (sOut - sIn));
    }
  }
  for (const auto& c : b.components) b.destroyed += c.exergyDestroyed;

  // Dead-state Gibbs functions g = h - T0 s of the air and of each exhaust gas [J/kg]; the air of
  // a stream that burnt no fuel leaves as air.
  const double gAir0 = air->enthalpy(T0) - T0 * sRef;
  b.fuelHeatingPower = fuelFlow * lhv;
  b.fuelExergy = fuelFlow * model.fuelEnthalpy() - T0 * fuelEntropyFlow;
  const double V0 = s0.velocity;
  double jetKinetic = 0.0;
  for (const std::string& id : net.nozzleExits) {
    const engine::Station& s9 = r.station(id);
    const double W9 = s9.massFlow, V9 = s9.velocity;
    const double gExhaust0 = s9.gas->enthalpy(T0) - T0 * s9.gas->entropy(T0, p0);
    b.fuelExergy += (s9.fuelAirRatio > 0.0 ? W3 : W9) * gAir0;
    b.fuelExergy -= W9 * gExhaust0;
    // h9 from the exit's static temperature on its gas: the balance then checks the nozzle's own
    // energy equation (ht9 = h9 + V9^2/2) instead of restating it.
    const double h9 = s9.gas->enthalpy(s9.staticTemperature);
    b.exhaustThermal += W9 * ((h9 - s9.gas->enthalpy(T0)) - T0 * (sAbs(s9) - s9.gas->entropy(T0, p0)));
    jetKinetic += 0.5 * W9 * V9 * V9;
  }

  b.ramExergy = 0.5 * W2 * V0 * V0;
  b.thrustPower = r.performance.netThrust * V0;
  for (const auto& shaft : r.shafts) b.shaftOfftake += shaft.powerOfftake;
  b.exhaustKinetic = jetKinetic - b.ramExergy - b.thrustPower;

  const double outputs = b.thrustPower + b.shaftOfftake + b.bleedAir + b.unburntFuel + b.destroyed +
                         b.exhaustThermal + b.exhaustKinetic;
  b.residual = b.fuelExergy - outputs;
  b.closure = b.residual / b.fuelExergy;
  return b;
}

}  // namespace cw::analysis
