#include "thermo/gas.h"

#include "common/error.h"

#include <algorithm>
#include <cmath>
#include <string>

namespace cw::thermo {

namespace {

std::string temperatureRange(const Gas& gas) {
  return "[" + messageNumber(gas.minimumTemperature()) + ", " + messageNumber(gas.maximumTemperature()) +
         "] K";
}

/// Solves f(T) = target for T in [lo, hi], f increasing, with Newton steps kept inside
/// a shrinking bracket (falls back to bisection). Converges to 1e-10 relative in T.
template <typename F, typename DF>
double solveIncreasing(F f, DF dfdT, double target, double lo, double hi, double guess, const char* where) {
  constexpr int kMaxIterations = 100;
  constexpr double kTolerance = 1e-10;
  double T = (guess > lo && guess < hi) ? guess : 0.5 * (lo + hi);
  double residual = 0.0;
  for (int i = 0; i < kMaxIterations; ++i) {
    residual = f(T) - target;
    if (residual == 0.0) return T;
    if (residual > 0)
      hi = T;
    else
      lo = T;
    const double slope = dfdT(T);
    double next = (slope > 0) ? T - residual / slope : 0.5 * (lo + hi);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (std::abs(next - T) <= kTolerance * T) return next;
    T = next;
  }
  throw NotConverged(where, kMaxIterations, residual);
}

}  // namespace

void Gas::checkTemperature(double temperature, const char* where) const {
  if (!std::isfinite(temperature) || temperature < minimumTemperature() || temperature > maximumTemperature())
    throw OutOfRange(where, temperature, "K", temperatureRange(*this));
}

double Gas::sensibleEnthalpy(double temperature) const {
  return enthalpy(temperature) - enthalpy(kSensibleEnthalpyReference);
}

double Gas::entropy(double temperature, double pressure) const {
  if (!std::isfinite(pressure) || pressure <= 0.0)
    throw InvalidInput("pressure", pressure, "Pa", "(0, inf) Pa");
  return standardEntropy(temperature) - gasConstant() * std::log(pressure / kReferencePressure);
}

double Gas::gamma(double temperature) const {
  const double c = cp(temperature);
  return c / (c - gasConstant());
}

double Gas::speedOfSound(double temperature) const {
  return std::sqrt(gamma(temperature) * gasConstant() * temperature);
}

double Gas::temperatureFromEnthalpy(double h) const {
  const double lo = minimumTemperature(), hi = maximumTemperature();
  if (!std::isfinite(h) || h < enthalpy(lo) || h > enthalpy(hi))
    throw OutOfRange("temperature from enthalpy", h, "J/kg",
                     "[" + messageNumber(enthalpy(lo)) + ", " + messageNumber(enthalpy(hi)) + "] J/kg");
  // First guess from a constant cp at a temperature inside the range.
  const double base = std::clamp(300.0, lo, hi);
  const double guess = base + (h - enthalpy(base)) / cp(base);
  return solveIncreasing([this](double T) { return enthalpy(T); }, [this](double T) { return cp(T); }, h, lo,
                         hi, guess, "temperature from enthalpy");
}

double Gas::temperatureFromEntropy(double s, double pressure) const {
  if (!std::isfinite(pressure) || pressure <= 0.0)
    throw InvalidInput("pressure", pressure, "Pa", "(0, inf) Pa");
  // s°(T) = s + R ln(p/p_ref); ds°/dT = cp/T.
  const double target = s + gasConstant() * std::log(pressure / kReferencePressure);
  const double lo = minimumTemperature(), hi = maximumTemperature();
  if (!std::isfinite(target) || target < standardEntropy(lo) || target > standardEntropy(hi))
    throw OutOfRange(
        "temperature from entropy", s, "J/(kg K)",
        "the entropies of " + temperatureRange(*this) + " at " + messageNumber(pressure) + " Pa");
  return solveIncreasing([this](double T) { return standardEntropy(T); },
                         [this](double T) { return cp(T) / T; }, target, lo, hi, 0.5 * (lo + hi),
                         "temperature from entropy");
}

double Gas::isentropicTemperature(double temperature1, double pressure1, double pressure2) const {
  return polytropicTemperature(temperature1, pressure1, pressure2, 1.0);
}

double Gas::polytropicTemperature(double temperature1, double pressure1, double pressure2,
                                  double polytropicEfficiency) const {
  checkTemperature(temperature1, "polytropic change: entry temperature");
  if (!std::isfinite(pressure1) || pressure1 <= 0.0)
    throw InvalidInput("polytropic change: entry pressure", pressure1, "Pa", "(0, inf) Pa");
  if (!std::isfinite(pressure2) || pressure2 <= 0.0)
    throw InvalidInput("polytropic change: exit pressure", pressure2, "Pa", "(0, inf) Pa");
  if (!std::isfinite(polytropicEfficiency) || polytropicEfficiency <= 0.0 || polytropicEfficiency > 1.0)
    throw InvalidInput("polytropic efficiency", polytropicEfficiency, "", "(0, 1]");
  const double lnRatio = std::log(pressure2 / pressure1);
  // Compression (p2 > p1): s°2 - s°1 = R ln(p2/p1) / eta_p; expansion: eta_p R ln(p2/p1).
  const double factor = (lnRatio > 0.0) ? 1.0 / polytropicEfficiency : polytropicEfficiency;
  const double s2 = standardEntropy(temperature1) + factor * gasConstant() * lnRatio;
  return temperatureFromEntropy(s2, kReferencePressure);
}

}  // namespace cw::thermo
