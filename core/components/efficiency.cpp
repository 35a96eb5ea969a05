#include "components/efficiency.h"

#include "common/error.h"

#include <cmath>

namespace cw::components {

namespace {

void checkEfficiency(double efficiency) {
  if (!(efficiency > 0.0 && efficiency <= 1.0)) throw InvalidInput("efficiency", efficiency, "", "(0, 1]");
}

/// True when the change is too small for efficiencies to mean anything (both are then 1).
bool negligibleChange(double lnRatio, double h1, double h2) {
  return std::abs(lnRatio) < 1e-14 || std::abs(h2 - h1) < 1e-12 * std::abs(h1) + 1e-9;
}

/// Exit temperature of a change on the isentropic basis, from the isentropic exit temperature.
double isentropicBasisExit(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
                           double efficiency, double isentropicT) {
  const double h1 = gas.enthalpy(temperature1);
  const double idealWork = gas.enthalpy(isentropicT) - h1;  // > 0 compression, < 0 expansion
  const double actualWork = (pressure2 > pressure1) ? idealWork / efficiency : idealWork * efficiency;
  return gas.temperatureFromEnthalpy(h1 + actualWork);
}

/// Both efficiencies, the isentropic exit temperature from `isentropicT()` (called only when needed).
template <typename IsentropicT>
EfficiencyPair efficienciesWith(const thermo::Gas& gas, double temperature1, double temperature2,
                                double lnRatio, IsentropicT isentropicT) {
  const double entropyRise = gas.standardEntropy(temperature2) - gas.standardEntropy(temperature1);
  const double h1 = gas.enthalpy(temperature1), h2 = gas.enthalpy(temperature2);
  if (negligibleChange(lnRatio, h1, h2)) return {};
  const double h2s = gas.enthalpy(isentropicT());
  EfficiencyPair pair;
  if (lnRatio > 0.0) {
    pair.isentropic = (h2s - h1) / (h2 - h1);
    pair.polytropic = gas.gasConstant() * lnRatio / entropyRise;
  } else {
    pair.isentropic = (h1 - h2) / (h1 - h2s);
    pair.polytropic = entropyRise / (gas.gasConstant() * lnRatio);
  }
  return pair;
}

/// p2 from the isentropic exit temperature: s°(T2s) = s°(T1) + R ln(p2/p1).
double pressureAtIsentropicTemperature(const thermo::Gas& gas, double s1, double pressure1,
                                       double isentropicT) {
  return pressure1 * std::exp((gas.standardEntropy(isentropicT) - s1) / gas.gasConstant());
}

/// T2s of an expansion on the isentropic basis: h1 - h2 = eta_t (h1 - h2s).
double isentropicExpansionTemperature(const thermo::Gas& gas, double temperature1, double temperature2,
                                      double efficiency) {
  const double h1 = gas.enthalpy(temperature1);
  const double h2s = h1 - (h1 - gas.enthalpy(temperature2)) / efficiency;
  return gas.temperatureFromEnthalpy(h2s);
}

}  // namespace

double exitTemperature(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
                       EfficiencyBasis basis, double efficiency) {
  checkEfficiency(efficiency);
  if (basis == EfficiencyBasis::Polytropic)
    return gas.polytropicTemperature(temperature1, pressure1, pressure2, efficiency);
  const double isentropicT = gas.isentropicTemperature(temperature1, pressure1, pressure2);
  return isentropicBasisExit(gas, temperature1, pressure1, pressure2, efficiency, isentropicT);
}

EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2) {
  return efficienciesWith(gas, temperature1, temperature2, std::log(pressure2 / pressure1),
                          [&] { return gas.isentropicTemperature(temperature1, pressure1, pressure2); });
}

EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2, double isentropicTemperature2) {
  return efficienciesWith(gas, temperature1, temperature2, std::log(pressure2 / pressure1),
                          [&] { return isentropicTemperature2; });
}

Change change(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
              EfficiencyBasis basis, double efficiency) {
  checkEfficiency(efficiency);
  if (basis == EfficiencyBasis::Polytropic) {
    const double T2 = gas.polytropicTemperature(temperature1, pressure1, pressure2, efficiency);
    return {T2, efficiencies(gas, temperature1, pressure1, T2, pressure2)};
  }
  const double isentropicT = gas.isentropicTemperature(temperature1, pressure1, pressure2);
  const double T2 = isentropicBasisExit(gas, temperature1, pressure1, pressure2, efficiency, isentropicT);
  return {T2, efficiencies(gas, temperature1, pressure1, T2, pressure2, isentropicT)};
}

double expansionExitPressure(const thermo::Gas& gas, double temperature1, double pressure1,
                             double temperature2, EfficiencyBasis basis, double efficiency) {
  checkEfficiency(efficiency);
  const double s1 = gas.standardEntropy(temperature1);
  if (basis == EfficiencyBasis::Polytropic) {
    // s°(T2) - s°(T1) = e_t R ln(p2/p1)
    return pressure1 * std::exp((gas.standardEntropy(temperature2) - s1) / (efficiency * gas.gasConstant()));
  }
  // h1 - h2 = eta_t (h1 - h2s): find T2s, then p2 from s°(T2s) = s°(T1) + R ln(p2/p1).
  return pressureAtIsentropicTemperature(
      gas, s1, pressure1, isentropicExpansionTemperature(gas, temperature1, temperature2, efficiency));
}

Expansion expansion(const thermo::Gas& gas, double temperature1, double pressure1, double temperature2,
                    EfficiencyBasis basis, double efficiency) {
  if (basis == EfficiencyBasis::Polytropic)
    return {expansionExitPressure(gas, temperature1, pressure1, temperature2, basis, efficiency),
            std::nullopt};
  checkEfficiency(efficiency);
  const double s1 = gas.standardEntropy(temperature1);
  const double isentropicT = isentropicExpansionTemperature(gas, temperature1, temperature2, efficiency);
  return {pressureAtIsentropicTemperature(gas, s1, pressure1, isentropicT), isentropicT};
}

}  // namespace cw::components
