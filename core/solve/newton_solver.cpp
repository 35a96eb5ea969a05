#include "solve/newton_solver.h"

#include "common/error.h"

#include <Eigen/LU>

#include <cmath>
#include <limits>

namespace cw::solve {

namespace {

constexpr double kArmijo = 1e-4;        // sufficient decrease (Dennis and Schnabel, A6.3.1)
constexpr double kMinimumStep = 1e-10;  // smallest fraction of the Newton step tried

Eigen::VectorXd orOnes(const Eigen::VectorXd& v, Eigen::Index n) {
  return v.size() == n ? v : Eigen::VectorXd::Ones(n);
}

double scaledMax(const Eigen::VectorXd& f, const Eigen::VectorXd& scale) {
  return f.size() == 0 ? 0.0 : f.cwiseAbs().cwiseQuotient(scale).maxCoeff();
}

double merit(const Eigen::VectorXd& f, const Eigen::VectorXd& scale) {
  return 0.5 * f.cwiseQuotient(scale).squaredNorm();
}

/// Forward differences, one column per unknown (Dennis and Schnabel, sec. 5.4).
Eigen::MatrixXd differenceJacobian(const NonlinearSystem& system, const Eigen::VectorXd& x,
                                   const Eigen::VectorXd& fx, const Eigen::VectorXd& typicalX) {
  const double root = std::sqrt(std::numeric_limits<double>::epsilon());
  Eigen::MatrixXd jacobian(fx.size(), x.size());
  for (Eigen::Index j = 0; j < x.size(); ++j) {
    Eigen::VectorXd shifted = x;
    const double h0 = root * std::max(std::abs(x(j)), std::abs(typicalX(j)));
    shifted(j) += h0;
    const double h = shifted(j) - x(j);  // the step actually taken, exact in binary
    jacobian.col(j) = (system.residuals(shifted) - fx) / h;
  }
  return jacobian;
}

}  // namespace

NewtonResult solveNewton(const NonlinearSystem& system, const Eigen::VectorXd& x0,
                         const NewtonOptions& options) {
  NewtonResult result;
  result.x = x0;
  result.residuals = system.residuals(x0);
  const Eigen::VectorXd scale = orOnes(options.residualScale, result.residuals.size());
  const Eigen::VectorXd typicalX = orOnes(options.typicalX, x0.size());
  if (!result.residuals.allFinite()) {
    result.status = NewtonStatus::NotFinite;
    result.scaledResidual = std::numeric_limits<double>::max();
    return result;
  }
  result.scaledResidual = scaledMax(result.residuals, scale);
  for (result.iterations = 0; result.iterations < options.maxIterations; ++result.iterations) {
    if (result.scaledResidual <= options.residualTolerance) {
      result.status = NewtonStatus::Converged;
      return result;
    }
    const Eigen::MatrixXd jacobian = system.jacobian
                                         ? system.jacobian(result.x)
                                         : differenceJacobian(system, result.x, result.residuals, typicalX);
    const Eigen::FullPivLU<Eigen::MatrixXd> lu(jacobian);
    if (!jacobian.allFinite() || !lu.isInvertible()) {
      result.status = NewtonStatus::SingularJacobian;
      return result;
    }
    const Eigen::VectorXd step = lu.solve(-result.residuals);
    // The merit's slope along the step is -|F|^2 (scaled), so Armijo asks for a fall of
    // kArmijo * lambda * 2 * merit.
    const double meritNow = merit(result.residuals, scale);
    bool accepted = false, anyFinite = false;
    for (double lambda = 1.0; lambda >= kMinimumStep; lambda *= 0.5) {
      Eigen::VectorXd trial = result.x + lambda * step;
      Eigen::VectorXd f = system.residuals(trial);
      if (!f.allFinite()) continue;
      anyFinite = true;
      if (merit(f, scale) <= (1.0 - 2.0 * kArmijo * lambda) * meritNow) {
        result.x = std::move(trial);
        result.residuals = std::move(f);
        accepted = true;
        break;
      }
    }
    if (!accepted) {
      result.status = anyFinite ? NewtonStatus::NoDescent : NewtonStatus::NotFinite;
      return result;
    }
    result.scaledResidual = scaledMax(result.residuals, scale);
  }
  result.status = result.scaledResidual <= options.residualTolerance ? NewtonStatus::Converged
                                                                     : NewtonStatus::IterationLimit;
  return result;
}

std::string describe(NewtonStatus status) {
  switch (status) {
    case NewtonStatus::Converged:
      return "converged";
    case NewtonStatus::SingularJacobian:
      return "the Jacobian is singular (no unique Newton step)";
    case NewtonStatus::NoDescent:
      return "no step reduces the residuals (no root near the start)";
    case NewtonStatus::NotFinite:
      return "the residuals are not finite along the step";
    case NewtonStatus::IterationLimit:
      return "the iteration limit was reached";
  }
  return "unknown status";
}

Eigen::VectorXd solveNewtonOrThrow(const NonlinearSystem& system, const Eigen::VectorXd& x0,
                                   const std::string& where, const NewtonOptions& options) {
  NewtonResult result = solveNewton(system, x0, options);
  if (result.converged()) return std::move(result.x);
  if (result.status == NewtonStatus::IterationLimit)
    throw NotConverged(where, result.iterations, result.scaledResidual);
  throw NoSolution(
      where,
      "Newton's method stopped: " + describe(result.status) + " after " + std::to_string(result.iterations) +
          " iterations (scaled residual " + messageNumber(result.scaledResidual) + ")",
      {kReasonNewtonStopped, {}, {{double(result.iterations), ""}, {result.scaledResidual, ""}}, {}});
}

}  // namespace cw::solve
