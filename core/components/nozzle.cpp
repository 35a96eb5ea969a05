#include "components/nozzle.h"

#include "common/error.h"
#include "flow/compressible_flow.h"
#include "flow/root_finder.h"

#include <algorithm>
#include <cmath>
#include <variant>

namespace cw::components {

namespace {

/// The ideal (isentropic) static state reached from the entry total state at pressure p.
struct IdealExpansion {
  double temperature;  ///< [K]
  double velocity;     ///< [m/s]
  double density;      ///< [kg/m^3]
};

IdealExpansion idealExpansion(const engine::TotalState& entry, double pressure) {
  const thermo::Gas& gas = *entry.gas;
  const double T = gas.isentropicTemperature(entry.temperature, entry.pressure, pressure);
  const double kinetic = std::max(0.0, entry.enthalpy - gas.enthalpy(T));
  return {T, std::sqrt(2.0 * kinetic), pressure / (gas.gasConstant() * T)};
}

}  // namespace

Nozzle::Result Nozzle::expand(const engine::TotalState& entry, double ambientPressure) const {
  const thermo::Gas& gas = *entry.gas;
  if (!(entry.pressure > ambientPressure))
    throw NoSolution("nozzle", "the nozzle entry total pressure " + messageNumber(entry.pressure) +
                                   " Pa is not above the ambient pressure " + messageNumber(ambientPressure) +
                                   " Pa, so there is no jet");
  Result result;
  result.velocityCoefficient = inputs_.lossBasis == engine::NozzleLossBasis::VelocityCoefficient
                                   ? inputs_.loss
                                   : std::sqrt(inputs_.loss);
  const double cv = result.velocityCoefficient;
  const double pStar = flow::sonicState(gas, entry.temperature, entry.pressure).local.pressure;
  result.choked = ambientPressure < pStar;

  // Static pressures at throat and exit.
  double throatPressure = result.choked ? pStar : ambientPressure;
  double exitPressure = throatPressure;
  if (result.choked) {
    if (std::holds_alternative<engine::FullyExpandingNozzle>(inputs_.geometry)) {
      exitPressure = ambientPressure;
    } else if (const auto* fixed = std::get_if<engine::FixedAreaRatioNozzle>(&inputs_.geometry)) {
      // Supersonic branch: rho V (p9) = rho V (p*) / (A9/A8), p9 in (0, p*).
      const IdealExpansion sonic = idealExpansion(entry, pStar);
      const double target = sonic.density * sonic.velocity / fixed->exitToThroatAreaRatio;
      auto flux = [&](double p) {
        const IdealExpansion e = idealExpansion(entry, p);
        return e.density * e.velocity - target;
      };
      // The lowest exit pressure the gas data allow: the ideal expansion down to their lowest temperature.
      const double coldest = gas.minimumTemperature() * (1.0 + 1e-9);
      const double lowest = std::max(
          pStar * 1e-6,
          entry.pressure * std::exp((gas.standardEntropy(coldest) - gas.standardEntropy(entry.temperature)) /
                                    gas.gasConstant()));
      if (fixed->exitToThroatAreaRatio > 1.0 && flux(lowest) > 0.0)
        throw NoSolution("nozzle", "the exit-to-throat area ratio " +
                                       messageNumber(fixed->exitToThroatAreaRatio) +
                                       " expands the jet below " + messageNumber(gas.minimumTemperature()) +
                                       " K, the lowest temperature of the gas data");
      exitPressure = fixed->exitToThroatAreaRatio == 1.0
                         ? pStar
                         : flow::findRoot(flux, lowest, pStar, "nozzle: exit pressure for the area ratio");
    }
  }

  struct Section {
    engine::Station station;
    double effectiveArea;          ///< W / (rho V) [m^2]
    double isentropicTemperature;  ///< of the ideal expansion to the section's pressure [K]
  };
  auto makeSection = [&](const char* id, double pressure) {
    const IdealExpansion ideal = idealExpansion(entry, pressure);
    engine::Station st;
    st.id = id;
    st.gas = entry.gas;
    st.totalTemperature = entry.temperature;
    st.totalEnthalpy = entry.enthalpy;
    st.staticPressure = pressure;
    st.velocity = cv * ideal.velocity;
    st.staticTemperature = gas.temperatureFromEnthalpy(entry.enthalpy - 0.5 * st.velocity * st.velocity);
    // The total pressure that the actual static state and velocity stand for (isentropic stagnation).
    st.totalPressure =
        pressure *
        std::exp((gas.standardEntropy(entry.temperature) - gas.standardEntropy(st.staticTemperature)) /
                 gas.gasConstant());
    st.mach = st.velocity / gas.speedOfSound(st.staticTemperature);
    st.massFlow = entry.massFlow;
    st.fuelAirRatio = entry.fuelAirRatio;
    const double density = pressure / (gas.gasConstant() * st.staticTemperature);
    const double effectiveArea = entry.massFlow / (density * st.velocity);
    st.area = effectiveArea / inputs_.dischargeCoefficient;
    return Section{std::move(st), effectiveArea, ideal.temperature};
  };
  // A convergent nozzle (or an unchoked one) exits at its throat: the same state, computed once.
  Section exit = makeSection("9", exitPressure);
  if (exitPressure == throatPressure) {
    result.throat = exit.station;
    result.throat.id = "8";
  } else {
    result.throat = makeSection("8", throatPressure).station;
  }
  result.exit = std::move(exit.station);
  result.grossThrust = result.exit.massFlow * result.exit.velocity +
                       (result.exit.staticPressure - ambientPressure) * exit.effectiveArea;
  // The isentropic exit state of the efficiencies is the ideal expansion to p9.
  result.efficiency = efficiencies(gas, entry.temperature, entry.pressure, result.exit.staticTemperature,
                                   exitPressure, exit.isentropicTemperature);
  return result;
}

}  // namespace cw::components
