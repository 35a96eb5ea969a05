#include "analysis/exergy_balance.h"

#include "engine/turbojet.h"
#include "thermo/thermally_perfect_model.h"

#include <cmath>

namespace cw::analysis {

namespace {

const engine::ComponentSummary& summaryOf(const engine::CycleResult& r, const std::string& name) {
  for (const auto& c : r.components)
    if (c.component == name) return c;
  throw std::out_of_range("no component " + name);
}

}  // namespace

ExergyBalance exergyBalanceOf(const AuditPoint& point) {
  const engine::Case& inputs = point.baseCase();
  const engine::Turbojet engine(inputs, false);
  const engine::CycleResult r = engine.evaluate();
  const thermo::GasModel& model = engine.gasModel();
  const engine::FreeStream fs = engine::freeStreamOf(inputs.flight);
  const double T0 = fs.temperature, p0 = fs.pressure;
  const auto air = model.air();
  const double sRef = air->entropy(T0, p0);  // station entropies are relative to this
  auto sAbs = [&](const engine::Station& s) { return s.entropy + sRef; };

  const engine::Station &s0 = r.station("0"), &s2 = r.station("2"), &s3 = r.station("3"),
                        &s4 = r.station("4"), &s5 = r.station("5"), &s7 = r.station("7"),
                        &s9 = r.station("9");
  const bool lit = inputs.afterburner.enabled;
  const double W2 = s2.massFlow, W3 = s3.massFlow, W9 = s9.massFlow, bleedFlow = W2 - W3;
  // Fuel flows per heat addition: f is per unit of core air W3 (f3 = 0).
  const double burnerFuel = s4.fuelAirRatio * W3;
  const double afterburnerFuel = (s7.fuelAirRatio - s4.fuelAirRatio) * W3;
  const double fuelFlow = burnerFuel + afterburnerFuel;
  const double lhv = model.lowerHeatingValue();

  ExergyBalance b;
  b.deadStateTemperature = T0;
  b.deadStatePressure = p0;
  // Fuel entropy: absolute (third-law) on the thermally perfect model; on the simple models the
  // entropy of the stream the fuel joins (exergy_balance.h).
  b.fuelEntropy = model.fuelEntropy(sAbs(s3));

  // Entropy balances, component by component [W/K].
  auto add = [&](const std::string& name, double sGen) { b.components.push_back({name, sGen, T0 * sGen}); };
  add("inlet", W2 * (sAbs(s2) - sAbs(s0)));
  add("compressor", W3 * sAbs(s3) + bleedFlow * sAbs(s3) - W2 * sAbs(s2));
  add("burner", s4.massFlow * sAbs(s4) - W3 * sAbs(s3) - burnerFuel * b.fuelEntropy);
  double afterburnerFuelEntropy = 0.0;
  add("turbine", s5.massFlow * (sAbs(s5) - sAbs(s4)));
  const double turbinePower = -summaryOf(r, "turbine").power;
  const double compressorPower = summaryOf(r, "compressor").power;
  const double mechanicalLoss = turbinePower - compressorPower - inputs.turbine.powerOfftake;
  add("shaft", mechanicalLoss / T0);
  if (lit) {
    const engine::Station& s6 = r.station("6");
    add("jet_pipe", s6.massFlow * (sAbs(s6) - sAbs(s5)));
    afterburnerFuelEntropy = model.fuelEntropy(sAbs(s6));
    add("afterburner",
        s7.massFlow * sAbs(s7) - s6.massFlow * sAbs(s6) - afterburnerFuel * afterburnerFuelEntropy);
  } else if (inputs.afterburner.pressureLossFractionUnlit > 0.0) {
    // The unlit afterburner's duct follows the jet pipe at the same total temperature.
    const double sAfterPipe =
        s5.gas->entropy(s5.totalTemperature, s5.totalPressure * (1.0 - inputs.jetPipe.pressureLossFraction));
    add("jet_pipe", s5.massFlow * (sAfterPipe - sAbs(s5)));
    add("afterburner", s7.massFlow * (sAbs(s7) - sAfterPipe));
  } else {
    add("jet_pipe", s5.massFlow * (sAbs(s7) - sAbs(s5)));
  }
  add("nozzle", W9 * (sAbs(s9) - sAbs(s7)));
  for (const auto& c : b.components) b.destroyed += c.exergyDestroyed;

  // Dead-state Gibbs functions g = h - T0 s of the air and of the exhaust gas [J/kg].
  const double gAir0 = air->enthalpy(T0) - T0 * sRef;
  const double gExhaust0 = s9.gas->enthalpy(T0) - T0 * s9.gas->entropy(T0, p0);
  b.fuelHeatingPower = fuelFlow * lhv;
  b.fuelExergy = fuelFlow * model.fuelEnthalpy() -
                 T0 * (burnerFuel * b.fuelEntropy + afterburnerFuel * afterburnerFuelEntropy) + W3 * gAir0 -
                 W9 * gExhaust0;

  const double V0 = s0.velocity, V9 = s9.velocity;
  b.ramExergy = 0.5 * W2 * V0 * V0;
  b.thrustPower = r.performance.netThrust * V0;
  b.shaftOfftake = inputs.turbine.powerOfftake;
  b.bleedAir = bleedFlow * ((s3.totalEnthalpy - air->enthalpy(T0)) - T0 * (sAbs(s3) - sRef));
  b.unburntFuel = (1.0 - inputs.burner.combustionEfficiency) * burnerFuel * lhv +
                  (lit ? (1.0 - inputs.afterburner.combustionEfficiency) * afterburnerFuel * lhv : 0.0);
  // h9 from the exit's static temperature on its gas: the balance then checks the nozzle's own
  // energy equation (ht9 = h9 + V9^2/2) instead of restating it.
  const double h9 = s9.gas->enthalpy(s9.staticTemperature);
  b.exhaustThermal = W9 * ((h9 - s9.gas->enthalpy(T0)) - T0 * (sAbs(s9) - s9.gas->entropy(T0, p0)));
  b.exhaustKinetic = 0.5 * W9 * V9 * V9 - b.ramExergy - b.thrustPower;

  const double outputs = b.thrustPower + b.shaftOfftake + b.bleedAir + b.unburntFuel + b.destroyed +
                         b.exhaustThermal + b.exhaustKinetic;
  b.residual = b.fuelExergy - outputs;
  b.closure = b.residual / b.fuelExergy;
  return b;
}

}  // namespace cw::analysis
