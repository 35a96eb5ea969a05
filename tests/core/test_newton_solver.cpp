// The damped Newton solver (core/solve) on standard test problems with known roots.
//
// Sources:
//  [MGH] J. J. More, B. S. Garbow and K. E. Hillstrom, "Testing unconstrained optimization
//        software", ACM Transactions on Mathematical Software 7(1), 1981, pp. 17-41: problems
//        (1) Rosenbrock, (3) Powell badly scaled, (7) helical valley, (13) Powell singular and
//        (30) Broyden tridiagonal, with their standard starting points. Roots of (1), (7), (13)
//        are exact in the paper; the root of (3) is quoted from memory of its table to four
//        significant digits; (30) has no closed-form root, so the check is F(x) = 0.
//  [DS]  J. E. Dennis and R. B. Schnabel, Numerical Methods for Unconstrained Optimization and
//        Nonlinear Equations, SIAM 1996: x*x = -1 has no real root (closed form).
#include "common/error.h"
#include "solve/newton_solver.h"

#include <QTest>

#include <cmath>
#include <numbers>

using cw::solve::NewtonOptions;
using cw::solve::NewtonStatus;
using cw::solve::NonlinearSystem;
using Eigen::MatrixXd;
using Eigen::VectorXd;

namespace {

VectorXd vec(std::initializer_list<double> values) {
  VectorXd v(static_cast<Eigen::Index>(values.size()));
  Eigen::Index i = 0;
  for (double x : values) v(i++) = x;
  return v;
}

NonlinearSystem rosenbrock() {  // [MGH] (1)
  return {[](const VectorXd& x) { return vec({10.0 * (x(1) - x(0) * x(0)), 1.0 - x(0)}); }, {}};
}

NonlinearSystem powellBadlyScaled() {  // [MGH] (3)
  return {[](const VectorXd& x) {
            return vec({1e4 * x(0) * x(1) - 1.0, std::exp(-x(0)) + std::exp(-x(1)) - 1.0001});
          },
          {}};
}

NonlinearSystem helicalValley() {  // [MGH] (7)
  return {[](const VectorXd& x) {
            const double theta = std::atan(x(1) / x(0)) / (2.0 * std::numbers::pi) + (x(0) < 0.0 ? 0.5 : 0.0);
            return vec({10.0 * (x(2) - 10.0 * theta), 10.0 * (std::hypot(x(0), x(1)) - 1.0), x(2)});
          },
          {}};
}

NonlinearSystem powellSingular() {  // [MGH] (13)
  return {[](const VectorXd& x) {
            return vec({x(0) + 10.0 * x(1), std::sqrt(5.0) * (x(2) - x(3)), std::pow(x(1) - 2.0 * x(2), 2),
                        std::sqrt(10.0) * std::pow(x(0) - x(3), 2)});
          },
          {}};
}

VectorXd broydenTridiagonalResiduals(const VectorXd& x) {  // [MGH] (30)
  const Eigen::Index n = x.size();
  VectorXd f(n);
  for (Eigen::Index i = 0; i < n; ++i) {
    const double before = i > 0 ? x(i - 1) : 0.0, after = i + 1 < n ? x(i + 1) : 0.0;
    f(i) = (3.0 - 2.0 * x(i)) * x(i) - before - 2.0 * after + 1.0;
  }
  return f;
}

}  // namespace

class TestNewtonSolver : public QObject {
  Q_OBJECT

 private slots:
  void rosenbrockFromTheStandardStart() {
    const auto r = cw::solve::solveNewton(rosenbrock(), vec({-1.2, 1.0}));
    QVERIFY(r.converged());
    QVERIFY(std::abs(r.x(0) - 1.0) < 1e-12);
    QVERIFY(std::abs(r.x(1) - 1.0) < 1e-12);
  }

  void rosenbrockWithAnAnalyticJacobian() {
    NonlinearSystem system = rosenbrock();
    int calls = 0;
    system.jacobian = [&calls](const VectorXd& x) {
      ++calls;
      MatrixXd j(2, 2);
      j << -20.0 * x(0), 10.0, -1.0, 0.0;
      return j;
    };
    const auto r = cw::solve::solveNewton(system, vec({-1.2, 1.0}));
    QVERIFY(r.converged());
    QVERIFY(calls > 0);
    QVERIFY(std::abs(r.x(0) - 1.0) < 1e-12 && std::abs(r.x(1) - 1.0) < 1e-12);
  }

  void powellBadlyScaledFromTheStandardStart() {
    const auto r = cw::solve::solveNewton(powellBadlyScaled(), vec({0.0, 1.0}));
    QVERIFY(r.converged());
    // [MGH] (3): x* = (1.098e-5, 9.106), from memory to four digits.
    QVERIFY2(std::abs(r.x(0) / 1.098e-5 - 1.0) < 5e-4, qPrintable(QString::number(r.x(0), 'g', 12)));
    QVERIFY2(std::abs(r.x(1) / 9.106 - 1.0) < 5e-4, qPrintable(QString::number(r.x(1), 'g', 12)));
    QVERIFY(r.residuals.cwiseAbs().maxCoeff() <= 1e-12);
  }

  void helicalValleyFromTheStandardStart() {
    const auto r = cw::solve::solveNewton(helicalValley(), vec({-1.0, 0.0, 0.0}));
    QVERIFY(r.converged());
    QVERIFY(std::abs(r.x(0) - 1.0) < 1e-12);
    QVERIFY(std::abs(r.x(1)) < 1e-12);
    QVERIFY(std::abs(r.x(2)) < 1e-12);
  }

  void powellSingularConvergesDespiteASingularRoot() {
    // The Jacobian is singular at the root (0, 0, 0, 0): Newton converges only linearly, and
    // the residuals (squares in two equations) reach 1e-12 with x near 1e-6.
    const auto r = cw::solve::solveNewton(powellSingular(), vec({3.0, -1.0, 0.0, 1.0}));
    QVERIFY2(r.converged(), cw::solve::describe(r.status).c_str());
    QVERIFY(r.x.cwiseAbs().maxCoeff() < 1e-4);
    QVERIFY(r.iterations > 10);  // linear, not quadratic, convergence
  }

  void broydenTridiagonalOfTenUnknowns() {
    const auto r = cw::solve::solveNewton({broydenTridiagonalResiduals, {}}, VectorXd::Constant(10, -1.0));
    QVERIFY(r.converged());
    QVERIFY(broydenTridiagonalResiduals(r.x).cwiseAbs().maxCoeff() <= 1e-12);
    QVERIFY(r.iterations < 10);  // quadratic convergence from a good start
  }

  void residualScalesSetTheTolerancePerEquation() {
    // F = (1e6 (x - 2), y - 3): with the first equation scaled by 1e6 both meet 1e-12 relative.
    NonlinearSystem system{[](const VectorXd& x) { return vec({1e6 * (x(0) - 2.0), x(1) - 3.0}); }, {}};
    NewtonOptions options;
    options.residualScale = vec({1e6, 1.0});
    const auto r = cw::solve::solveNewton(system, vec({0.0, 0.0}), options);
    QVERIFY(r.converged());
    QCOMPARE(r.x(0), 2.0);
    QCOMPARE(r.x(1), 3.0);
  }

  void noRealRootIsAPlainFailure() {
    // [DS] x*x = -1 has no real root: from x = 1 the first Newton step reaches x = 0, where dF/dx = 0.
    NonlinearSystem system{[](const VectorXd& x) { return vec({x(0) * x(0) + 1.0}); }, {}};
    const auto r = cw::solve::solveNewton(system, vec({1.0}));
    QVERIFY(!r.converged());
    QVERIFY(r.status == NewtonStatus::SingularJacobian || r.status == NewtonStatus::NoDescent);
    try {
      cw::solve::solveNewtonOrThrow(system, vec({1.0}), "test.no_root");
      QFAIL("expected cw::NoSolution");
    } catch (const cw::NoSolution& e) {
      QCOMPARE(e.where(), std::string("test.no_root"));
      QVERIFY2(std::string(e.what()).find("Newton") != std::string::npos, e.what());
    }
  }

  void noRealRootFromOtherStartsAlsoFails() {
    NonlinearSystem system{[](const VectorXd& x) { return vec({x(0) * x(0) + 1.0}); }, {}};
    for (double start : {0.3, -2.0, 7.0}) {
      const auto r = cw::solve::solveNewton(system, vec({start}));
      QVERIFY(!r.converged());
      QVERIFY(r.scaledResidual >= 1.0 - 1e-12);  // x*x + 1 >= 1 everywhere
    }
  }

  void iterationLimitThrowsNotConverged() {
    NewtonOptions options;
    options.maxIterations = 1;
    try {
      cw::solve::solveNewtonOrThrow(powellSingular(), vec({3.0, -1.0, 0.0, 1.0}), "test.limit", options);
      QFAIL("expected cw::NotConverged");
    } catch (const cw::NotConverged& e) {
      QCOMPARE(e.where(), std::string("test.limit"));
    }
  }

  void notFiniteAtTheStartIsReported() {
    NonlinearSystem system{[](const VectorXd& x) { return vec({std::log(x(0))}); }, {}};
    const auto r = cw::solve::solveNewton(system, vec({-1.0}));
    QCOMPARE(r.status, NewtonStatus::NotFinite);
  }

  void aStepIntoUndefinedGroundIsShortened() {
    // F = log(x) - log(2): from x = 10, the full Newton step x - x log(x/2) lands below zero,
    // where log is undefined; the halved steps stay positive and reach x = 2.
    NonlinearSystem system{[](const VectorXd& x) { return vec({std::log(x(0)) - std::log(2.0)}); }, {}};
    const auto r = cw::solve::solveNewton(system, vec({10.0}));
    QVERIFY(r.converged());
    QVERIFY(std::abs(r.x(0) - 2.0) < 1e-11);
  }
};

QTEST_APPLESS_MAIN(TestNewtonSolver)
#include "test_newton_solver.moc"
