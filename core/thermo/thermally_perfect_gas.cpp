#include "thermo/thermally_perfect_gas.h"

#include "common/error.h"

#include <algorithm>
#include <cmath>
#include <utility>

namespace cw::thermo {

ThermallyPerfectGas::ThermallyPerfectGas(Composition composition, std::string description)
    : composition_(std::move(composition)),
      description_(std::move(description)),
      gasConstant_(composition_.gasConstant()),
      minimumTemperature_(0.0),
      maximumTemperature_(0.0),
      nodeStep_(0.0),
      enthalpyNodes_{},
      entropyNodes_{} {
  const SpeciesTable& table = composition_.table();
  const std::vector<double>& x = composition_.moleFractions();
  const std::vector<double>& y = composition_.massFractions();

  // Range: the intersection of the present species' ranges; breaks at their T_mid.
  bool first = true;
  for (std::size_t i = 0; i < table.size(); ++i) {
    if (x[i] <= 0.0) continue;
    minimumTemperature_ =
        first ? table[i].minimumTemperature() : std::max(minimumTemperature_, table[i].minimumTemperature());
    maximumTemperature_ =
        first ? table[i].maximumTemperature() : std::min(maximumTemperature_, table[i].maximumTemperature());
    first = false;
  }
  if (!(maximumTemperature_ > minimumTemperature_))
    throw InvalidInput(description_,
                       "the species' temperature ranges do not overlap (" + composition_.summary() + ")");
  // Interval uppers: the present species' break temperatures inside the range (T_mid, and T_low
  // where a cold range lies below it), then the range's top, ascending.
  std::vector<double> uppers{maximumTemperature_};
  for (std::size_t i = 0; i < table.size(); ++i) {
    if (!(x[i] > 0.0)) continue;
    for (const double joint : table[i].breakTemperatures())
      if (joint > minimumTemperature_ && joint < maximumTemperature_ &&
          std::find(uppers.begin(), uppers.end(), joint) == uppers.end())
        uppers.push_back(joint);
  }
  std::sort(uppers.begin(), uppers.end());

  // c_k = sum_i y_i R_i a_{i,k};  c_7 = sum_i y_i R_i (a_{i,7} - ln x_i)   (see the header).
  struct Present {
    const SpeciesThermo* species;
    double weight;       ///< y_i R_i [J/(kg K)]
    double logFraction;  ///< ln x_i [-]
  };
  std::vector<Present> present;
  present.reserve(table.size());
  for (std::size_t i = 0; i < table.size(); ++i)
    if (x[i] > 0.0)
      present.push_back({&table[i], y[i] * kMolarGasConstant / table[i].molarMass(), std::log(x[i])});
  intervals_.reserve(uppers.size());
  double lower = minimumTemperature_;
  for (double upper : uppers) {
    std::array<double, 7> c{};
    for (const Present& p : present) {
      const auto& a = p.species->rangeAt(0.5 * (lower + upper)).coefficients();
      for (int k = 0; k < 6; ++k) c[k] += p.weight * a[k];
      c[6] += p.weight * (a[6] - p.logFraction);
    }
    intervals_.push_back({upper,
                          {c[0], c[1], c[2], c[3], c[4]},
                          {c[5], c[0], c[1] / 2.0, c[2] / 3.0, c[3] / 4.0, c[4] / 5.0},
                          {c[6], c[0], c[1], c[2] / 2.0, c[3] / 3.0, c[4] / 4.0}});
    lower = upper;
  }

  // Continuity: the data's h and s° jump at T_mid by < 1e-7 R T and < 1e-7 R (SpeciesThermo
  // checks 1e-5); shift each upper interval's constants c6, c7 by the jump so that h(T) and s°(T)
  // are continuous and increasing, and the inverses have one root.
  for (std::size_t i = 1; i < intervals_.size(); ++i) {
    const double t = intervals_[i - 1].upper;
    intervals_[i].h[0] += enthalpyOf(intervals_[i - 1], t) - enthalpyOf(intervals_[i], t);
    intervals_[i].s[0] += entropyOf(intervals_[i - 1], t) - entropyOf(intervals_[i], t);
  }

  // Table of h and s° that brackets the inverses. Every gas over the same range has the same node
  // temperatures: their logarithms are kept per thread for the next gas (a burner makes one per point).
  nodeStep_ = (maximumTemperature_ - minimumTemperature_) / kNodes;
  struct NodeLogarithms {
    double minimum = 0.0, maximum = 0.0;
    std::array<double, kNodes + 1> values{};
  };
  thread_local NodeLogarithms logs;
  const bool sameNodes = logs.minimum == minimumTemperature_ && logs.maximum == maximumTemperature_;
  std::size_t j = 0;  // intervalAt(t), stepped along with the ascending nodes
  for (int k = 0; k <= kNodes; ++k) {
    const double t = (k == kNodes) ? maximumTemperature_ : minimumTemperature_ + k * nodeStep_;
    if (!sameNodes) logs.values[k] = std::log(t);
    while (t > intervals_[j].upper && j + 1 < intervals_.size()) ++j;
    const Interval& in = intervals_[j];
    enthalpyNodes_[k] = enthalpyOf(in, t);
    entropyNodes_[k] = entropyOf(in, t, logs.values[k]);
  }
  logs.minimum = minimumTemperature_;
  logs.maximum = maximumTemperature_;
}

// cp = c1 + c2 T + c3 T^2 + c4 T^3 + c5 T^4.
double ThermallyPerfectGas::cpOf(const Interval& in, double t) {
  const auto& c = in.cp;
  return c[0] + t * (c[1] + t * (c[2] + t * (c[3] + t * c[4])));
}

// h = c1 T + c2 T^2/2 + c3 T^3/3 + c4 T^4/4 + c5 T^5/5 + c6.
double ThermallyPerfectGas::enthalpyOf(const Interval& in, double t) {
  const auto& c = in.h;
  return c[0] + t * (c[1] + t * (c[2] + t * (c[3] + t * (c[4] + t * c[5]))));
}

// s° = c1 ln T + c2 T + c3 T^2/2 + c4 T^3/3 + c5 T^4/4 + c7.
double ThermallyPerfectGas::entropyOf(const Interval& in, double t, double logT) {
  const auto& c = in.s;
  return c[0] + c[1] * logT + t * (c[2] + t * (c[3] + t * (c[4] + t * c[5])));
}

double ThermallyPerfectGas::cp(double temperature) const {
  requireTemperature(temperature);
  return cpOf(intervalAt(temperature), temperature);
}

double ThermallyPerfectGas::enthalpy(double temperature) const {
  requireTemperature(temperature);
  return enthalpyOf(intervalAt(temperature), temperature);
}

double ThermallyPerfectGas::standardEntropy(double temperature) const {
  requireTemperature(temperature);
  return entropyOf(intervalAt(temperature), temperature);
}

ThermallyPerfectGas::Properties ThermallyPerfectGas::properties(double temperature) const {
  requireTemperature(temperature);
  const Interval& in = intervalAt(temperature);
  return {cpOf(in, temperature), enthalpyOf(in, temperature), entropyOf(in, temperature)};
}

template <typename Value, typename Slope>
double ThermallyPerfectGas::solve(Value value, Slope slope, double target, double lo, double hi, double guess,
                                  const char* where) const {
  // Newton steps kept inside a shrinking bracket; a step that leaves the bracket or fails to
  // halve the previous one is replaced by bisection.
  constexpr int kMaxIterations = 100;
  constexpr double kTolerance = 1e-10;
  double t = guess;
  double previousStep = hi - lo;
  double residual = 0.0;
  for (int i = 0; i < kMaxIterations; ++i) {
    const Interval& in = intervalAt(t);
    residual = value(in, t) - target;
    if (residual > 0.0)
      hi = t;
    else
      lo = t;
    if (residual == 0.0) return t;
    const double derivative = slope(in, t);
    double next = t - residual / derivative;
    // A converged Newton step may land on a bracket end (t itself just became one): accept it
    // rather than fall back to bisection, which would stop at the tolerance, short of rounding.
    if (derivative > 0.0 && next >= lo && next <= hi && std::abs(next - t) <= kTolerance * t) return next;
    const bool inside = derivative > 0.0 && next > lo && next < hi;
    if (!inside || std::abs(next - t) > 0.5 * previousStep) next = 0.5 * (lo + hi);
    const double step = std::abs(next - t);
    if (step <= kTolerance * t) return next;
    previousStep = step;
    t = next;
  }
  throw NotConverged(where, kMaxIterations, residual);
}

double ThermallyPerfectGas::temperatureFromEnthalpy(double h) const {
  // Accept a target beyond an end by rounding only (e.g. h(T_max) recomputed elsewhere), as that end.
  const double hSlack = 1e-13 * (std::abs(enthalpyNodes_.front()) + std::abs(enthalpyNodes_.back()));
  if (h < enthalpyNodes_.front() && h >= enthalpyNodes_.front() - hSlack) h = enthalpyNodes_.front();
  if (h > enthalpyNodes_.back() && h <= enthalpyNodes_.back() + hSlack) h = enthalpyNodes_.back();
  if (!(h >= enthalpyNodes_.front() && h <= enthalpyNodes_.back()))
    throw OutOfRange("temperature from enthalpy", h, "J/kg",
                     "[" + messageNumber(enthalpyNodes_.front()) + ", " +
                         messageNumber(enthalpyNodes_.back()) + "] J/kg (the enthalpies of [" +
                         messageNumber(minimumTemperature_) + ", " + messageNumber(maximumTemperature_) +
                         "] K)");
  // Bracket from the table, first guess by linear interpolation in it.
  const auto k = std::clamp<std::ptrdiff_t>(
      std::upper_bound(enthalpyNodes_.begin(), enthalpyNodes_.end(), h) - enthalpyNodes_.begin() - 1, 0,
      kNodes - 1);
  const double lo = minimumTemperature_ + k * nodeStep_;
  const double hi = (k == kNodes - 1) ? maximumTemperature_ : lo + nodeStep_;
  const double span = enthalpyNodes_[k + 1] - enthalpyNodes_[k];
  const double guess = lo + (span > 0.0 ? (h - enthalpyNodes_[k]) / span : 0.5) * (hi - lo);
  return solve([](const Interval& in, double t) { return enthalpyOf(in, t); },
               [](const Interval& in, double t) { return cpOf(in, t); }, h, lo, hi, guess,
               "temperature from enthalpy");
}

double ThermallyPerfectGas::temperatureFromEntropy(double s, double pressure) const {
  if (!std::isfinite(pressure) || pressure <= 0.0)
    throw InvalidInput("pressure", pressure, "Pa", "(0, inf) Pa");
  // s°(T) = s + R ln(p / p_ref); ds°/dT = cp / T.
  const double shift = gasConstant_ * std::log(pressure / kReferencePressure);
  double target = s + shift;
  // Accept a target beyond an end by rounding only (s = s° - R ln(p/p_ref) and back), as that end.
  const double sSlack = 1e-13 * (std::abs(s) + std::abs(shift) + std::abs(entropyNodes_.back()));
  if (target < entropyNodes_.front() && target >= entropyNodes_.front() - sSlack)
    target = entropyNodes_.front();
  if (target > entropyNodes_.back() && target <= entropyNodes_.back() + sSlack) target = entropyNodes_.back();
  if (!(target >= entropyNodes_.front() && target <= entropyNodes_.back()))
    throw OutOfRange("temperature from entropy", s, "J/(kg K)",
                     "the entropies of [" + messageNumber(minimumTemperature_) + ", " +
                         messageNumber(maximumTemperature_) + "] K at " + messageNumber(pressure) + " Pa");
  const auto k = std::clamp<std::ptrdiff_t>(
      std::upper_bound(entropyNodes_.begin(), entropyNodes_.end(), target) - entropyNodes_.begin() - 1, 0,
      kNodes - 1);
  const double lo = minimumTemperature_ + k * nodeStep_;
  const double hi = (k == kNodes - 1) ? maximumTemperature_ : lo + nodeStep_;
  const double span = entropyNodes_[k + 1] - entropyNodes_[k];
  const double guess = lo + (span > 0.0 ? (target - entropyNodes_[k]) / span : 0.5) * (hi - lo);
  return solve([](const Interval& in, double t) { return entropyOf(in, t); },
               [](const Interval& in, double t) { return cpOf(in, t) / t; }, target, lo, hi, guess,
               "temperature from entropy");
}

}  // namespace cw::thermo
