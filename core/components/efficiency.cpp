#include "components/efficiency.h"

#include "common/error.h"
#include "thermo/constant_cp_gas.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace cw::components {

namespace {

constexpr double kEpsilon = std::numeric_limits<double>::epsilon();
/// Safety factor on the first-order rounding bounds below (chosen here: a factor of 1 already
/// held over five million random constant-cp and thermally perfect changes).
constexpr double kRoundingMargin = 8.0;
/// Values below 1 are taken for 1 only this close to it, whatever their bounds (on a change so small
/// that its rounding reaches further, an efficiency means little, but it should not become 1).
constexpr double kNearUnit = 1e-6;

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

/// A state of the change: its temperature, enthalpy and standard entropy.
struct Point {
  double temperature;  ///< [K]
  double enthalpy;     ///< [J/kg]
  double entropy;      ///< s° [J/(kg K)]
};

Point pointAt(const thermo::Gas& gas, double temperature) {
  return {temperature, gas.enthalpy(temperature), gas.standardEntropy(temperature)};
}

/// Rounding of a temperature that came out of T(h) or T(s, p): a few units of eps in T itself,
/// plus the rounding of the h or s° it was solved from, eps |h| / cp or eps T |s°| / cp. [K]
double temperatureRounding(const Point& p, double cp) {
  return kEpsilon * (p.temperature + (std::abs(p.enthalpy) + p.temperature * std::abs(p.entropy)) / cp);
}

/// Bounds on the relative rounding error of both efficiencies computed from the points 1, 2 and
/// 2s of a change with ln(p2/p1) = lnRatio. The differences h2 - h1, h2s - h1 and s°2 - s°1 lose
/// the rounding of their terms, eps |h| and eps |s°|, and of the temperatures, cp dT and cp dT / T;
/// ln(p2/p1) carries eps (2 + |ln(p2/p1)|). As gamma -> 1 or p2/p1 -> 1 the differences shrink
/// while the roundings do not, so the bounds grow.
EfficiencyPair roundingBounds(const thermo::Gas& gas, const Point& p1, const Point& p2, const Point& p2s,
                              double lnRatio) {
  const double cp = gas.cp(p2.temperature);
  const double dT1 = temperatureRounding(p1, cp), dT2 = temperatureRounding(p2, cp),
               dT2s = temperatureRounding(p2s, cp);
  const double tiny = std::numeric_limits<double>::min();
  const double work = std::max(std::abs(p2.enthalpy - p1.enthalpy), tiny);
  const double idealWork = std::max(std::abs(p2s.enthalpy - p1.enthalpy), tiny);
  const double rise = std::max(std::abs(p2.entropy - p1.entropy), tiny);
  const double workError = kEpsilon * (std::abs(p1.enthalpy) + std::abs(p2.enthalpy)) + cp * (dT1 + dT2);
  const double idealError = kEpsilon * (std::abs(p1.enthalpy) + std::abs(p2s.enthalpy)) + cp * (dT1 + dT2s);
  const double riseError = kEpsilon * (std::abs(p1.entropy) + std::abs(p2.entropy) + std::abs(p2s.entropy)) +
                           cp * (dT1 / p1.temperature + dT2 / p2.temperature + dT2s / p2s.temperature);
  const double lnError = kEpsilon * (2.0 + std::abs(lnRatio));
  return {kRoundingMargin * (workError / work + idealError / idealWork),
          kRoundingMargin * (riseError / rise + lnError / std::abs(lnRatio))};
}

/// A derived efficiency within its rounding of 1 is 1: the second law bounds the exact value by 1,
/// so anything above it within the rounding of the states is rounding, and it must not show as
/// 1.00000000001; below 1, only within kNearUnit.
double unitWithinRounding(double efficiency, double rounding) {
  const double reach = efficiency > 1.0 ? rounding : std::min(rounding, kNearUnit);
  return std::abs(efficiency - 1.0) <= reach ? 1.0 : efficiency;
}

/// Values above 1 - kNearUnit are checked against their rounding bounds (the bounds are not
/// needed elsewhere, and cost a few property evaluations).
bool nearUnit(const EfficiencyPair& pair) {
  return pair.isentropic >= 1.0 - kNearUnit || pair.polytropic >= 1.0 - kNearUnit;
}

/// Both efficiencies of a change that is not negligible, from its points 1, 2 and 2s.
EfficiencyPair efficienciesOf(const thermo::Gas& gas, const Point& p1, const Point& p2, const Point& p2s,
                              double lnRatio) {
  const double entropyRise = p2.entropy - p1.entropy;
  EfficiencyPair pair;
  if (lnRatio > 0.0) {
    pair.isentropic = (p2s.enthalpy - p1.enthalpy) / (p2.enthalpy - p1.enthalpy);
    pair.polytropic = gas.gasConstant() * lnRatio / entropyRise;
  } else {
    pair.isentropic = (p1.enthalpy - p2.enthalpy) / (p1.enthalpy - p2s.enthalpy);
    pair.polytropic = entropyRise / (gas.gasConstant() * lnRatio);
  }
  if (!nearUnit(pair)) return pair;
  const EfficiencyPair rounding = roundingBounds(gas, p1, p2, p2s, lnRatio);
  return {unitWithinRounding(pair.isentropic, rounding.isentropic),
          unitWithinRounding(pair.polytropic, rounding.polytropic)};
}

/// Both efficiencies, the isentropic exit temperature from `isentropicT()` (called only when
/// needed); nothing when the change is negligible.
template <typename IsentropicT>
std::optional<EfficiencyPair> efficienciesWith(const thermo::Gas& gas, double temperature1,
                                               double temperature2, double lnRatio, IsentropicT isentropicT) {
  const Point p1 = pointAt(gas, temperature1), p2 = pointAt(gas, temperature2);
  if (negligibleChange(lnRatio, p1.enthalpy, p2.enthalpy)) return std::nullopt;
  return efficienciesOf(gas, p1, p2, pointAt(gas, isentropicT()), lnRatio);
}

/// The efficiency on the other basis of a change on a constant-cp gas, from the given one alone,
/// with x = (R/cp) ln(p2/p1) = ((gamma - 1)/gamma) ln(p2/p1). Mattingly, Elements of Propulsion,
/// 2006, eqs. 4.9-4.10 (from memory), with tau = T2/T1, tau_s = e^x:
///   compression  eta_c given: tau - 1 = (e^x - 1)/eta_c,  e_c = x / ln tau
///                e_c given:   tau = e^(x/e_c),           eta_c = (e^x - 1) / (e^(x/e_c) - 1)
///   expansion    eta_t given: tau - 1 = eta_t (e^x - 1),  e_t = ln tau / x
///                e_t given:   tau = e^(e_t x),           eta_t = (e^(e_t x) - 1) / (e^x - 1)
/// e^x - 1 and ln tau come from expm1 and log1p, exact to rounding however small x is (gamma -> 1,
/// p2/p1 -> 1), where differences of h and s° at two temperatures keep only the rounding of the
/// exit temperature. Each form is below 1 for a given efficiency below 1; a few eps of rounding
/// are then kept at 1.
double constantCpDerivedEfficiency(double x, EfficiencyBasis given, double efficiency) {
  const double ideal = std::expm1(x);  // tau_s - 1
  double derived = 0.0;
  if (x > 0.0)
    derived = given == EfficiencyBasis::Isentropic ? x / std::log1p(ideal / efficiency)
                                                   : ideal / std::expm1(x / efficiency);
  else
    derived = given == EfficiencyBasis::Isentropic ? std::log1p(efficiency * ideal) / x
                                                   : std::expm1(efficiency * x) / ideal;
  return unitWithinRounding(derived, 16.0 * kEpsilon);
}

/// The given efficiency as given, the other derived (on a constant-cp gas by the closed forms).
EfficiencyPair withGiven(const thermo::Gas& gas, EfficiencyPair pair, double lnRatio, EfficiencyBasis basis,
                         double efficiency) {
  const auto* constantCp = dynamic_cast<const thermo::ConstantCpGas*>(&gas);
  const bool isentropic = basis == EfficiencyBasis::Isentropic;
  (isentropic ? pair.isentropic : pair.polytropic) = efficiency;
  if (constantCp)
    (isentropic ? pair.polytropic : pair.isentropic) = constantCpDerivedEfficiency(
        constantCp->gasConstant() / constantCp->constantCp() * lnRatio, basis, efficiency);
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
  if (efficiency == 1.0) return isentropicT;
  return isentropicBasisExit(gas, temperature1, pressure1, pressure2, efficiency, isentropicT);
}

EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2) {
  return efficienciesWith(gas, temperature1, temperature2, std::log(pressure2 / pressure1),
                          [&] { return gas.isentropicTemperature(temperature1, pressure1, pressure2); })
      .value_or(EfficiencyPair{});
}

EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2, double isentropicTemperature2) {
  return efficienciesWith(gas, temperature1, temperature2, std::log(pressure2 / pressure1),
                          [&] { return isentropicTemperature2; })
      .value_or(EfficiencyPair{});
}

Change change(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
              EfficiencyBasis basis, double efficiency) {
  checkEfficiency(efficiency);
  const double isentropicT = gas.isentropicTemperature(temperature1, pressure1, pressure2);
  // A unit efficiency on either basis is the isentropic change: the other is exactly 1.
  if (efficiency == 1.0) return {isentropicT, EfficiencyPair{}};
  const double T2 =
      basis == EfficiencyBasis::Polytropic
          ? gas.polytropicTemperature(temperature1, pressure1, pressure2, efficiency)
          : isentropicBasisExit(gas, temperature1, pressure1, pressure2, efficiency, isentropicT);
  const double lnRatio = std::log(pressure2 / pressure1);
  const auto pair = efficienciesWith(gas, temperature1, T2, lnRatio, [&] { return isentropicT; });
  if (!pair) return {T2, EfficiencyPair{}};
  return {T2, withGiven(gas, *pair, lnRatio, basis, efficiency)};
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
