#include "components/nozzle.h"

#include "common/error.h"
#include "flow/compressible_flow.h"
#include "flow/normal_shock.h"
#include "flow/root_finder.h"

#include <algorithm>
#include <cmath>
#include <variant>

namespace cw::components {

namespace {

/// The static state reached from the entry total state at pressure p with the nozzle efficiency:
/// h = ht - eta_n (ht - h_s(p)), V = C_V V_s(p).
struct SectionState {
  double isentropicTemperature;  ///< T_s [K]
  double temperature;            ///< T [K]
  double velocity;               ///< V [m/s]
  double density;                ///< [kg/m^3]
};

class Expander {
 public:
  Expander(const stream::TotalState& entry, double velocityCoefficient)
      : entry_(entry), gas_(*entry.gas), cv_(velocityCoefficient) {}

  SectionState at(double pressure) const {
    const double Ts = gas_.isentropicTemperature(entry_.temperature, entry_.pressure, pressure);
    const double idealKinetic = std::max(0.0, entry_.enthalpy - gas_.enthalpy(Ts));  // V_s^2 / 2
    const double velocity = cv_ * std::sqrt(2.0 * idealKinetic);
    const double T = gas_.temperatureFromEnthalpy(entry_.enthalpy - 0.5 * velocity * velocity);
    return {Ts, T, velocity, pressure / (gas_.gasConstant() * T)};
  }

  /// The actual sonic state (see nozzle.h): T* from energy alone, p* from the efficiency. When the
  /// losses are so large that T*_s lies below the gas data, the nozzle cannot choke at any
  /// ambient pressure the data cover: p* = 0.
  struct Sonic {
    double pressure, temperature, isentropicTemperature, velocity, density;
  };
  Sonic sonic() const {
    const double T = flow::sonicState(gas_, entry_.temperature, entry_.pressure).local.temperature;
    const double velocity = gas_.speedOfSound(T);
    const double efficiency = cv_ * cv_;
    const double hs = entry_.enthalpy - (entry_.enthalpy - gas_.enthalpy(T)) / efficiency;
    if (!(hs > gas_.enthalpy(gas_.minimumTemperature()))) return {0.0, T, 0.0, velocity, 0.0};
    const double Ts = gas_.temperatureFromEnthalpy(hs);
    const double p =
        entry_.pressure *
        std::exp((gas_.standardEntropy(Ts) - gas_.standardEntropy(entry_.temperature)) / gas_.gasConstant());
    return {p, T, Ts, velocity, p / (gas_.gasConstant() * T)};
  }

 private:
  const stream::TotalState& entry_;
  const thermo::Gas& gas_;
  double cv_;
};

/// The exit pressure of a fixed area ratio A9/A8 > 1 on the supersonic branch of the actual
/// expansion: rho9 V9 = rho* V* / (A9/A8), p9 in (p_lowest, p*). The actual mass flux falls
/// monotonically below p* (its maximum lies at or above p*, at p* only without losses).
double exitPressureOfAreaRatio(const Expander& expander, const Expander::Sonic& throat, double ratio,
                               const stream::TotalState& entry) {
  const thermo::Gas& gas = *entry.gas;
  const double target = throat.density * throat.velocity / ratio;
  auto flux = [&](double p) {
    const SectionState e = expander.at(p);
    return e.density * e.velocity - target;
  };
  // The lowest exit pressure the gas data allow: the isentropic expansion to their lowest temperature.
  const double coldest = gas.minimumTemperature() * (1.0 + 1e-9);
  const double lowest = std::max(
      throat.pressure * 1e-6,
      entry.pressure * std::exp((gas.standardEntropy(coldest) - gas.standardEntropy(entry.temperature)) /
                                gas.gasConstant()));
  if (flux(lowest) > 0.0)
    throw NoSolution("nozzle",
                     "the exit-to-throat area ratio " + messageNumber(ratio) + " expands the jet below " +
                         messageNumber(gas.minimumTemperature()) +
                         " K, the lowest temperature of the gas data",
                     {kReasonNozzleBelowGasData, {}, {{ratio, ""}, {gas.minimumTemperature(), "K"}}, {}});
  return flow::findRoot(flux, lowest, throat.pressure, "nozzle: exit pressure for the area ratio");
}

/// A fixed-area-ratio exit must stay supersonic: p0 at most the pressure behind a normal shock
/// standing at the exit plane (components/nozzle.h); beyond it a shock would stand inside.
void requireSupersonicExit(const thermo::Gas& gas, const SectionState& exit, double exitPressure,
                           double ambientPressure, double areaRatio) {
  const double mach = exit.velocity / gas.speedOfSound(exit.temperature);
  if (ambientPressure <= exitPressure) return;  // underexpanded (or matched): always supersonic
  const double behindShock =
      flow::normalShock(gas, exit.temperature, exitPressure, std::max(1.0, mach)).downstream.local.pressure;
  if (ambientPressure <= behindShock) return;  // overexpanded, any shocks outside the nozzle
  throw NoSolution(
      "nozzle",
      "the ambient pressure " + messageNumber(ambientPressure) + " Pa is above " +
          messageNumber(behindShock) +
          " Pa, the pressure behind a normal shock at the exit of the exit-to-throat "
          "area ratio " +
          messageNumber(areaRatio) +
          ": a shock would stand inside the nozzle, which the model does not cover "
          "(choose a smaller area ratio, full expansion or a convergent nozzle)",
      {kReasonNozzleShockAtExit, {}, {{ambientPressure, "Pa"}, {behindShock, "Pa"}, {areaRatio, ""}}, {}});
}

}  // namespace

Nozzle::Result Nozzle::expand(const stream::TotalState& entry, double ambientPressure) const {
  const thermo::Gas& gas = *entry.gas;
  if (!(entry.pressure > ambientPressure))
    throw NoSolution("nozzle",
                     "the nozzle entry total pressure " + messageNumber(entry.pressure) +
                         " Pa is not above the ambient pressure " + messageNumber(ambientPressure) +
                         " Pa, so there is no jet",
                     {kReasonNozzleNoJet, {}, {{entry.pressure, "Pa"}, {ambientPressure, "Pa"}}, {}});
  Result result;
  result.velocityCoefficient =
      inputs_.lossBasis == NozzleLossBasis::VelocityCoefficient ? inputs_.loss : std::sqrt(inputs_.loss);
  const Expander expander(entry, result.velocityCoefficient);
  const Expander::Sonic throat = expander.sonic();
  result.choked = ambientPressure < throat.pressure;

  auto makeStation = [&](const char* id, double pressure, double temperature, double velocity) {
    stream::Station st;
    st.id = id;
    st.gas = entry.gas;
    st.totalTemperature = entry.temperature;
    st.totalEnthalpy = entry.enthalpy;
    st.staticPressure = pressure;
    st.staticTemperature = temperature;
    st.velocity = velocity;
    // The total pressure that the actual static state and velocity stand for (isentropic stagnation).
    st.totalPressure =
        pressure * std::exp((gas.standardEntropy(entry.temperature) - gas.standardEntropy(temperature)) /
                            gas.gasConstant());
    st.mach = velocity / gas.speedOfSound(temperature);
    st.massFlow = entry.massFlow;
    st.fuelAirRatio = entry.fuelAirRatio;
    st.area = entry.massFlow / (pressure / (gas.gasConstant() * temperature) * velocity) /
              inputs_.dischargeCoefficient;  // geometric = effective / C_D
    if (!(velocity > 0.0) || !std::isfinite(*st.area))
      throw NoSolution("nozzle",
                       "the velocity coefficient " + messageNumber(result.velocityCoefficient) +
                           " leaves the jet too slow for a finite nozzle area",
                       {kReasonNozzleJetTooSlow, {}, {{result.velocityCoefficient, ""}}, {}});
    return st;
  };

  // Throat: sonic when choked (Mach 1 exactly: V* = a(T*)); else the exit at p0.
  double exitPressure = ambientPressure;
  SectionState exit{};
  const SectionState sonicExit{throat.isentropicTemperature, throat.temperature, throat.velocity,
                               throat.density};
  const auto* fixed = std::get_if<FixedAreaRatioNozzle>(&inputs_.geometry);
  if (fixed && fixed->exitToThroatAreaRatio > 1.0) {
    if (!(throat.pressure > 0.0))
      throw NoSolution("nozzle",
                       "the nozzle's losses keep its throat from choking, so its divergent part "
                       "cannot run supersonic; the model does not cover that regime",
                       {kReasonNozzleNotChoked, {}, {}, {}});
    result.choked = true;
    exitPressure = exitPressureOfAreaRatio(expander, throat, fixed->exitToThroatAreaRatio, entry);
    exit = expander.at(exitPressure);
    requireSupersonicExit(gas, exit, exitPressure, ambientPressure, fixed->exitToThroatAreaRatio);
  } else if (result.choked && !std::holds_alternative<FullyExpandingNozzle>(inputs_.geometry)) {
    exitPressure = throat.pressure;  // convergent, or an area ratio of 1
    exit = sonicExit;
  } else {
    exit = expander.at(ambientPressure);  // unchoked, or fully expanded to p0
  }
  if (result.choked) result.throat = makeStation("8", throat.pressure, throat.temperature, throat.velocity);
  result.exit = makeStation("9", exitPressure, exit.temperature, exit.velocity);
  if (!result.choked) {  // the throat is the exit
    result.throat = result.exit;
    result.throat.id = "8";
  }
  const double effectiveExitArea = *result.exit.area * inputs_.dischargeCoefficient;
  result.grossThrust = result.exit.massFlow * result.exit.velocity;
  if (exitPressure != ambientPressure)  // pressure thrust of an under- or overexpanded exit
    result.grossThrust += (exitPressure - ambientPressure) * effectiveExitArea;
  // The isentropic exit state of the efficiencies is the isentropic expansion to p9.
  result.efficiency = efficiencies(gas, entry.temperature, entry.pressure, result.exit.staticTemperature,
                                   exitPressure, exit.isentropicTemperature);
  return result;
}

}  // namespace cw::components
