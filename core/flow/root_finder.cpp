#include "flow/root_finder.h"

#include "common/error.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <utility>

namespace cw::flow {

double findRoot(const std::function<double(double)>& f, double lo, double hi, const std::string& where,
                double relativeTolerance) {
  constexpr int kMaxIterations = 200;
  constexpr double kEpsilon = std::numeric_limits<double>::epsilon();
  double a = lo, b = hi;
  double fa = f(a), fb = f(b);
  if (!std::isfinite(fa) || !std::isfinite(fb) || (fa > 0.0 && fb > 0.0) || (fa < 0.0 && fb < 0.0))
    throw NoSolution(where, "the search interval [" + formatNumber(lo) + ", " + formatNumber(hi) +
                                "] does not bracket a root");
  if (fa == 0.0) return a;
  if (fb == 0.0) return b;
  // b is the best estimate, a the previous one, c the other end of the bracket [b, c].
  double c = a, fc = fa;
  double d = b - a, e = d;
  for (int i = 0; i < kMaxIterations; ++i) {
    if ((fb > 0.0) == (fc > 0.0)) {
      c = a;
      fc = fa;
      d = e = b - a;
    }
    if (std::abs(fc) < std::abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const double tolerance = 2.0 * kEpsilon * std::abs(b) + 0.5 * relativeTolerance * std::abs(b) +
                             std::numeric_limits<double>::min();
    const double half = 0.5 * (c - b);
    if (std::abs(half) <= tolerance || fb == 0.0) return b;
    if (std::abs(e) >= tolerance && std::abs(fa) > std::abs(fb)) {
      // Interpolation: secant when only two points differ, inverse quadratic otherwise.
      const double s = fb / fa;
      double p, q;
      if (a == c) {
        p = 2.0 * half * s;
        q = 1.0 - s;
      } else {
        const double r = fb / fc, t = fa / fc;
        p = s * (2.0 * half * t * (t - r) - (b - a) * (r - 1.0));
        q = (t - 1.0) * (r - 1.0) * (s - 1.0);
      }
      if (p > 0.0)
        q = -q;
      else
        p = -p;
      if (2.0 * p < std::min(3.0 * half * q - std::abs(tolerance * q), std::abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = half;
        e = d;
      }
    } else {
      d = half;
      e = d;
    }
    a = b;
    fa = fb;
    b += (std::abs(d) > tolerance) ? d : (half > 0.0 ? tolerance : -tolerance);
    fb = f(b);
    if (!std::isfinite(fb)) throw NoSolution(where, "the function is not finite at " + formatNumber(b));
  }
  throw NotConverged(where, kMaxIterations, fb);
}

}  // namespace cw::flow
