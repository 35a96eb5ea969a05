#pragma once
// A bracketed scalar root finder for the flow solvers: Brent's method (inverse quadratic
// interpolation, secant and bisection steps kept inside the bracket; R. P. Brent,
// Algorithms for Minimization without Derivatives, Prentice-Hall, 1973, ch. 4).

#include <functional>
#include <string>

namespace cw::flow {

/// Finds x in [lo, hi] with f(x) = 0, given f(lo) and f(hi) of opposite signs (or one zero).
/// Converges until the bracket is narrower than relativeTolerance * |x| (default 1e-14, well
/// inside the 1e-10 the core promises); throws cw::NotConverged after 200 iterations and
/// cw::NoSolution naming `where` when the ends do not bracket a root.
double findRoot(const std::function<double(double)>& f, double lo, double hi, const std::string& where,
                double relativeTolerance = 1e-14);

}  // namespace cw::flow
