#include "flow/ideal_gas_relations.h"

#include "common/error.h"
#include "flow/root_finder.h"

#include <cmath>

namespace cw::flow::ideal {

namespace {

// Largest natural logarithm whose exponential is still a finite double (about 709.78).
constexpr double kMaximumLog = 709.0;

double finiteExp(double logValue, const char* what, double gamma, double mach) {
  if (!(logValue < kMaximumLog))
    throw OutOfRange(std::string(what) + ": Mach number", mach, "",
                     "values whose result fits in double precision for gamma = " + messageNumber(gamma));
  return std::exp(logValue);
}

}  // namespace

void checkGamma(double gamma, const std::string& where) {
  if (!std::isfinite(gamma) || gamma <= 1.0 || gamma > kMaximumGamma)
    throw InvalidInput(where, gamma, "", "(1, 5/3]");
}

void checkMach(double mach, const std::string& where) {
  if (!std::isfinite(mach) || mach < 0.0 || mach > kMaximumMach)
    throw InvalidInput(where, mach, "", "[0, 50]");
}

void checkShockMach(double upstreamMach, const std::string& where) {
  if (!std::isfinite(upstreamMach) || upstreamMach < 1.0 || upstreamMach > kMaximumMach)
    throw InvalidInput(where, upstreamMach, "", "[1, 50]");
}

// Eq. 43: Tt/T = 1 + (g-1)/2 M^2.
double temperatureRatio(double gamma, double mach) {
  checkGamma(gamma);
  checkMach(mach);
  return 1.0 / (1.0 + 0.5 * (gamma - 1.0) * mach * mach);
}

// Eq. 44: p/pt = (1 + (g-1)/2 M^2)^(-g/(g-1)); evaluated through logarithms (may underflow to 0, never NaN).
double pressureRatio(double gamma, double mach) {
  const double lnT = std::log(temperatureRatio(gamma, mach));
  return std::exp(gamma / (gamma - 1.0) * lnT);
}

// Eq. 45: rho/rhot = (1 + (g-1)/2 M^2)^(-1/(g-1)).
double densityRatio(double gamma, double mach) {
  const double lnT = std::log(temperatureRatio(gamma, mach));
  return std::exp(lnT / (gamma - 1.0));
}

// Eq. 80: A/A* = (1/M) [(2/(g+1)) (1 + (g-1)/2 M^2)]^((g+1)/(2(g-1))).
static double logAreaRatio(double gamma, double mach) {
  const double base = 2.0 / (gamma + 1.0) * (1.0 + 0.5 * (gamma - 1.0) * mach * mach);
  return -std::log(mach) + (gamma + 1.0) / (2.0 * (gamma - 1.0)) * std::log(base);
}

double areaRatio(double gamma, double mach) {
  checkGamma(gamma);
  checkMach(mach);
  if (mach <= 0.0) throw InvalidInput("Mach number", mach, "", "(0, 50] (A/A* is infinite at M = 0)");
  return finiteExp(logAreaRatio(gamma, mach), "area ratio", gamma, mach);
}

double machFromPressureRatio(double gamma, double ratio) {
  checkGamma(gamma);
  if (!std::isfinite(ratio) || ratio < 1.0)
    throw InvalidInput("total-to-static pressure ratio", ratio, "", "[1, inf)");
  // Eq. 44 inverted; expm1 keeps precision for ratios near 1.
  const double m2 = 2.0 / (gamma - 1.0) * std::expm1((gamma - 1.0) / gamma * std::log(ratio));
  const double mach = std::sqrt(m2);
  if (!std::isfinite(mach) || mach > kMaximumMach)
    throw InvalidInput(
        "total-to-static pressure ratio", ratio, "",
        "[1, " + messageNumber(1.0 / pressureRatio(gamma, kMaximumMach)) + "] (Mach number up to 50)");
  return mach;
}

double machFromAreaRatio(double gamma, double ratio, Branch branch) {
  checkGamma(gamma);
  if (!std::isfinite(ratio) || ratio < 1.0) throw InvalidInput("area ratio A/A*", ratio, "", "[1, inf)");
  if (ratio == 1.0) return 1.0;
  const double target = std::log(ratio);
  auto f = [gamma, target](double mach) { return logAreaRatio(gamma, mach) - target; };
  if (branch == Branch::Subsonic) {
    // A/A* > k/M with k = (2/(g+1))^((g+1)/(2(g-1))), so f > 0 at M = k / (A/A*).
    const double k = std::exp((gamma + 1.0) / (2.0 * (gamma - 1.0)) * std::log(2.0 / (gamma + 1.0)));
    return findRoot(f, k / ratio, 1.0, "subsonic Mach number from area ratio");
  }
  if (f(kMaximumMach) < 0.0)
    throw InvalidInput(
        "area ratio A/A*", ratio, "",
        "[1, " + messageNumber(areaRatio(gamma, kMaximumMach)) + "] on the supersonic branch (M <= 50)");
  return findRoot(f, 1.0, kMaximumMach, "supersonic Mach number from area ratio");
}

// Eq. 96: M2^2 = ((g-1) M1^2 + 2) / (2 g M1^2 - (g-1)).
double normalShockMach(double gamma, double m1) {
  checkGamma(gamma);
  checkShockMach(m1);
  return std::sqrt(((gamma - 1.0) * m1 * m1 + 2.0) / (2.0 * gamma * m1 * m1 - (gamma - 1.0)));
}

// Eq. 93: p2/p1 = (2 g M1^2 - (g-1)) / (g+1).
double normalShockPressureRatio(double gamma, double m1) {
  checkGamma(gamma);
  checkShockMach(m1);
  return (2.0 * gamma * m1 * m1 - (gamma - 1.0)) / (gamma + 1.0);
}

// Eq. 94: rho2/rho1 = V1/V2 = (g+1) M1^2 / ((g-1) M1^2 + 2).
double normalShockDensityRatio(double gamma, double m1) {
  checkGamma(gamma);
  checkShockMach(m1);
  return (gamma + 1.0) * m1 * m1 / ((gamma - 1.0) * m1 * m1 + 2.0);
}

// Eq. 95: T2/T1 = (2 g M1^2 - (g-1)) ((g-1) M1^2 + 2) / ((g+1)^2 M1^2), i.e. (p2/p1) / (rho2/rho1).
double normalShockTemperatureRatio(double gamma, double m1) {
  return normalShockPressureRatio(gamma, m1) / normalShockDensityRatio(gamma, m1);
}

// Eq. 99: pt2/pt1 = [(g+1) M1^2 / ((g-1) M1^2 + 2)]^(g/(g-1)) [(g+1) / (2 g M1^2 - (g-1))]^(1/(g-1)).
double normalShockTotalPressureRatio(double gamma, double m1) {
  const double lnDensity = std::log(normalShockDensityRatio(gamma, m1));
  const double lnPressure = std::log(normalShockPressureRatio(gamma, m1));
  return std::exp((gamma * lnDensity - lnPressure) / (gamma - 1.0));
}

}  // namespace cw::flow::ideal
