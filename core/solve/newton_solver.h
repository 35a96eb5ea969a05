#pragma once
// The one solver of nonlinear systems in the core: Newton's method with a backtracking line
// search on Eigen (dense LU; a forward-difference Jacobian unless the system gives its own).
//
// Method: J(x) dx = -F(x), then x + lambda dx with lambda halved (down to kMinimumStep) until
// the merit 0.5 |F|^2 falls by the Armijo condition with c = 1e-4 (J. E. Dennis and R. B.
// Schnabel, Numerical Methods for Unconstrained Optimization and Nonlinear Equations, SIAM
// 1996, sec. 6.3, algorithm A6.3.1, simplified to halving). The forward-difference step is
// sqrt(eps) * max(|x_j|, typical_j) (same book, sec. 5.4).
//
// Used by the design-point targets now and by off-design matching later: a system exposes its
// unknowns' count, F(x) and, when it has a cheap one, J(x).

#include <Eigen/Core>

#include <functional>
#include <optional>
#include <string>

namespace cw::solve {

/// A square system F(x) = 0 of n equations in n unknowns.
struct NonlinearSystem {
  std::function<Eigen::VectorXd(const Eigen::VectorXd&)> residuals;
  /// Optional analytic Jacobian dF_i/dx_j; a forward-difference one is used without it.
  std::function<Eigen::MatrixXd(const Eigen::VectorXd&)> jacobian;
};

struct NewtonOptions {
  int maxIterations = 100;
  /// Converged when every |F_i| / residualScale_i is at or below this.
  double residualTolerance = 1e-12;
  /// Scales of the residuals (empty: 1 each), so that one tolerance fits mixed units.
  Eigen::VectorXd residualScale;
  /// Typical magnitudes of the unknowns (empty: 1 each), for the difference steps.
  Eigen::VectorXd typicalX;
};

enum class NewtonStatus {
  Converged,
  SingularJacobian,  ///< the linearised system has no unique step (a stationary point of |F|)
  NoDescent,         ///< no step along the Newton direction reduces |F|: likely no root near
  NotFinite,         ///< F is not finite at the start or along every trial step
  IterationLimit,    ///< still short of the tolerance after maxIterations
};

struct NewtonResult {
  NewtonStatus status = NewtonStatus::IterationLimit;
  Eigen::VectorXd x;
  Eigen::VectorXd residuals;
  int iterations = 0;
  /// max_i |F_i| / residualScale_i at x.
  double scaledResidual = 0.0;

  bool converged() const noexcept { return status == NewtonStatus::Converged; }
};

/// Solves F(x) = 0 from x0. Never throws for a failed solve: the status says why.
NewtonResult solveNewton(const NonlinearSystem& system, const Eigen::VectorXd& x0,
                         const NewtonOptions& options = {});

/// The status in plain English ("the Jacobian is singular", ...), for messages.
std::string describe(NewtonStatus status);

/// solveNewton, then x; throws cw::NotConverged (iteration limit) or cw::NoSolution (any other
/// failure, with the reason) naming `where`.
Eigen::VectorXd solveNewtonOrThrow(const NonlinearSystem& system, const Eigen::VectorXd& x0,
                                   const std::string& where, const NewtonOptions& options = {});

}  // namespace cw::solve
