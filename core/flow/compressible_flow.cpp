#include "flow/compressible_flow.h"

#include "common/error.h"
#include "flow/ideal_gas_relations.h"
#include "flow/root_finder.h"

#include <algorithm>
#include <cmath>
#include <string>

namespace cw::flow {

namespace {

void checkTemperatureIn(const thermo::Gas& gas, double temperature, const char* where) {
  if (!std::isfinite(temperature) || temperature < gas.minimumTemperature() ||
      temperature > gas.maximumTemperature())
    throw InvalidInput(where, temperature, "K",
                       "[" + messageNumber(gas.minimumTemperature()) + ", " +
                           messageNumber(gas.maximumTemperature()) + "] K (the range of " +
                           gas.description() + ")");
}

void checkPressure(double pressure, const char* where) {
  if (!std::isfinite(pressure) || pressure <= 0.0) throw InvalidInput(where, pressure, "Pa", "(0, inf) Pa");
}

// Completes a state from its static temperature and pressure, total temperature and pressure,
// and velocity.
FlowState assemble(const thermo::Gas& gas, double Tt, double pt, double ht, double T, double p, double V) {
  FlowState state;
  state.total = {Tt, pt};
  state.local = {T, p};
  state.totalEnthalpy = ht;
  state.enthalpy = gas.enthalpy(T);
  state.density = p / (gas.gasConstant() * T);  // ideal-gas law
  state.speedOfSound = gas.speedOfSound(T);
  state.velocity = V;
  state.mach = V / state.speedOfSound;
  return state;
}

}  // namespace

FlowState fromTotal(const thermo::Gas& gas, double Tt, double pt, double mach) {
  checkTemperatureIn(gas, Tt, "total temperature");
  checkPressure(pt, "total pressure");
  ideal::checkMach(mach);
  const double R = gas.gasConstant();
  const double ht = gas.enthalpy(Tt);
  double T = Tt;
  if (mach > 0.0) {
    // Energy with V = M a(T): f(T) = h(T) + M^2 gamma(T) R T / 2 - ht = 0, increasing in T.
    auto f = [&](double t) { return gas.enthalpy(t) + 0.5 * mach * mach * gas.gamma(t) * R * t - ht; };
    const double Tmin = gas.minimumTemperature();
    if (f(Tmin) > 0.0) {
      // The largest Mach number whose static temperature stays at or above Tmin.
      const double aMin = gas.speedOfSound(Tmin);
      const double maxMach = std::sqrt(2.0 * (ht - gas.enthalpy(Tmin))) / aMin;
      throw OutOfRange("Mach number", mach, "",
                       "[0, " + messageNumber(maxMach) + "] at Tt = " + messageNumber(Tt) +
                           " K (the static temperature would fall below " + messageNumber(Tmin) +
                           " K, the lower limit of " + gas.description() + ")");
    }
    T = findRoot(f, Tmin, Tt, "static temperature from total temperature and Mach number");
  }
  // Isentrope: p = pt exp((s°(T) - s°(Tt)) / R).
  const double p = pt * std::exp((gas.standardEntropy(T) - gas.standardEntropy(Tt)) / R);
  const double V = mach * gas.speedOfSound(T);
  FlowState state = assemble(gas, Tt, pt, ht, T, p, V);
  state.mach = mach;
  return state;
}

FlowState fromStatic(const thermo::Gas& gas, double T, double p, double mach) {
  checkTemperatureIn(gas, T, "static temperature");
  checkPressure(p, "static pressure");
  ideal::checkMach(mach);
  const double R = gas.gasConstant();
  const double V = mach * gas.speedOfSound(T);
  // Energy: ht = h(T) + V^2/2.
  const double ht = gas.enthalpy(T) + 0.5 * V * V;
  const double hMax = gas.enthalpy(gas.maximumTemperature());
  if (ht > hMax) {
    const double maxMach = std::sqrt(2.0 * (hMax - gas.enthalpy(T))) / gas.speedOfSound(T);
    throw OutOfRange("Mach number", mach, "",
                     "[0, " + messageNumber(maxMach) + "] at T = " + messageNumber(T) +
                         " K (the total temperature would exceed " + messageNumber(gas.maximumTemperature()) +
                         " K, the upper limit of " + gas.description() + ")");
  }
  const double Tt = (mach > 0.0) ? gas.temperatureFromEnthalpy(ht) : T;
  // Isentrope: pt = p exp((s°(Tt) - s°(T)) / R).
  const double pt = p * std::exp((gas.standardEntropy(Tt) - gas.standardEntropy(T)) / R);
  FlowState state = assemble(gas, Tt, pt, ht, T, p, V);
  state.mach = mach;
  return state;
}

double machFromPressureRatio(const thermo::Gas& gas, double Tt, double ratio) {
  checkTemperatureIn(gas, Tt, "total temperature");
  if (!std::isfinite(ratio) || ratio < 1.0)
    throw InvalidInput("total-to-static pressure ratio", ratio, "", "[1, inf)");
  const double R = gas.gasConstant();
  // Isentrope: s°(T) = s°(Tt) - R ln(pt/p); at p_ref the entropy equals s°.
  const double sTarget = gas.standardEntropy(Tt) - R * std::log(ratio);
  if (sTarget < gas.standardEntropy(gas.minimumTemperature())) {
    const double maxRatio =
        std::exp((gas.standardEntropy(Tt) - gas.standardEntropy(gas.minimumTemperature())) / R);
    throw OutOfRange("total-to-static pressure ratio", ratio, "",
                     "[1, " + messageNumber(maxRatio) + "] at Tt = " + messageNumber(Tt) +
                         " K (the static temperature would fall below the lower limit of " +
                         gas.description() + ")");
  }
  const double T = (ratio == 1.0) ? Tt : gas.temperatureFromEntropy(sTarget, thermo::kReferencePressure);
  // Energy: V = sqrt(2 (ht - h(T))), M = V / a(T).
  const double dh = gas.enthalpy(Tt) - gas.enthalpy(T);
  const double mach = std::sqrt(2.0 * std::max(dh, 0.0)) / gas.speedOfSound(T);
  if (mach > ideal::kMaximumMach)
    throw InvalidInput("total-to-static pressure ratio", ratio, "", "ratios giving a Mach number in [0, 50]");
  return mach;
}

double massFlowPerArea(const thermo::Gas& gas, double Tt, double pt, double mach) {
  return fromTotal(gas, Tt, pt, mach).massFlux();
}

FlowState sonicState(const thermo::Gas& gas, double Tt, double pt) {
  return fromTotal(gas, Tt, pt, 1.0);
}

double chokedMassFlowPerArea(const thermo::Gas& gas, double Tt, double pt) {
  return sonicState(gas, Tt, pt).massFlux();
}

}  // namespace cw::flow
