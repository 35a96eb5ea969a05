#include "components/efficiency.h"

#include "common/error.h"

#include <cmath>

namespace cw::components {

double exitTemperature(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
                       EfficiencyBasis basis, double efficiency) {
  if (!(efficiency > 0.0 && efficiency <= 1.0)) throw InvalidInput("efficiency", efficiency, "", "(0, 1]");
  if (basis == EfficiencyBasis::Polytropic)
    return gas.polytropicTemperature(temperature1, pressure1, pressure2, efficiency);
  const double isentropicT = gas.isentropicTemperature(temperature1, pressure1, pressure2);
  const double h1 = gas.enthalpy(temperature1);
  const double idealWork = gas.enthalpy(isentropicT) - h1;  // > 0 compression, < 0 expansion
  const double actualWork = (pressure2 > pressure1) ? idealWork / efficiency : idealWork * efficiency;
  return gas.temperatureFromEnthalpy(h1 + actualWork);
}

EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2) {
  const double lnRatio = std::log(pressure2 / pressure1);
  const double entropyRise = gas.standardEntropy(temperature2) - gas.standardEntropy(temperature1);
  const double h1 = gas.enthalpy(temperature1), h2 = gas.enthalpy(temperature2);
  if (std::abs(lnRatio) < 1e-14 || std::abs(h2 - h1) < 1e-12 * std::abs(h1) + 1e-9) return {};
  const double h2s = gas.enthalpy(gas.isentropicTemperature(temperature1, pressure1, pressure2));
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

double expansionExitPressure(const thermo::Gas& gas, double temperature1, double pressure1,
                             double temperature2, EfficiencyBasis basis, double efficiency) {
  if (!(efficiency > 0.0 && efficiency <= 1.0)) throw InvalidInput("efficiency", efficiency, "", "(0, 1]");
  const double R = gas.gasConstant();
  const double s1 = gas.standardEntropy(temperature1);
  if (basis == EfficiencyBasis::Polytropic) {
    // s°(T2) - s°(T1) = e_t R ln(p2/p1)
    return pressure1 * std::exp((gas.standardEntropy(temperature2) - s1) / (efficiency * R));
  }
  // h1 - h2 = eta_t (h1 - h2s): find T2s, then p2 from s°(T2s) = s°(T1) + R ln(p2/p1).
  const double h1 = gas.enthalpy(temperature1);
  const double h2s = h1 - (h1 - gas.enthalpy(temperature2)) / efficiency;
  const double isentropicT = gas.temperatureFromEnthalpy(h2s);
  return pressure1 * std::exp((gas.standardEntropy(isentropicT) - s1) / R);
}

}  // namespace cw::components
