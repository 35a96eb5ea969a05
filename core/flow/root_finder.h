#pragma once
// A bracketed scalar root finder for the flow solvers: Brent's method (inverse quadratic
// interpolation, secant and bisection steps kept inside the bracket; R. P. Brent,
// Algorithms for Minimization without Derivatives, Prentice-Hall, 1973, ch. 4).

#include <algorithm>
#include <cmath>
#include <limits>
#include <string_view>

namespace cw::flow {

namespace detail {
// The error paths, out of line: they build the messages only when thrown.
[[noreturn]] void throwNotBracketed(std::string_view where, double lo, double hi);
[[noreturn]] void throwNotFinite(std::string_view where, double x);
[[noreturn]] void throwNotConverged(std::string_view where, int iterations, double residual);
}  // namespace detail

/// Finds x in [lo, hi] with f(x) = 0, given f(lo) and f(hi) of opposite signs (or one zero).
/// Converges until the bracket is narrower than relativeTolerance * |x| (default 1e-14, well
/// inside the 1e-10 the core promises); throws cw::NotConverged after 200 iterations and
/// cw::NoSolution naming `where` when the ends do not bracket a root. A template, so that the
/// solvers' function calls are inlined (no std::function in the loop).
template <typename F>
double findRoot(F&& f, double lo, double hi, std::string_view where, double relativeTolerance = 1e-14) {
  constexpr int kMaxIterations = 200;
  constexpr double kEpsilon = std::numeric_limits<double>::epsilon();
  double a = lo, b = hi;
  double fa = f(a), fb = f(b);
  if (!std::isfinite(fa) || !std::isfinite(fb) || (fa > 0.0 && fb > 0.0) || (fa < 0.0 && fb < 0.0))
    detail::throwNotBracketed(where, lo, hi);
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
    if (!std::isfinite(fb)) detail::throwNotFinite(where, b);
  }
  detail::throwNotConverged(where, kMaxIterations, fb);
}

}  // namespace cw::flow
