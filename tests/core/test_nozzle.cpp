// The nozzle on its own: constructed directly, fed an entry state built by hand, its throat and
// exit against closed forms of the constant-cp gas and published tables.
//
// Sources:
//  [S]  Saravanamuttoo, Rogers, Cohen and Straznicky, Gas Turbine Theory, sec. 3.1 (the
//       propelling nozzle with a nozzle efficiency eta_j; the critical pressure ratio of a lossy
//       nozzle, pt/pc = 1 / [1 - (1/eta_j)(g-1)/(g+1)]^(g/(g-1))); edition and equation number from
//       memory, not read off the page. Derivation, repeated here so that the check stands on its
//       own: the throat of a choked nozzle is sonic in the actual flow, V8 = a(T8); energy
//       cp Tt = cp T8 + V8^2/2 with a^2 = g R T8 = (g-1) cp T8 gives T8 = 2 Tt/(g+1); the nozzle
//       efficiency eta = (Tt - T8)/(Tt - T8s) gives T8s = Tt - (Tt - T8)/eta
//       = Tt [1 - (1/eta)(g-1)/(g+1)], and the isentrope p8/pt = (T8s/Tt)^(g/(g-1)).
//  [N]  NACA Report 1135, Equations, Tables and Charts for Compressible Flow, 1953, Table I
//       (gamma = 1.4): A/A* = 1.176 at M 1.5, 1.688 at M 2, 4.235 at M 3 (typed from memory of the
//       table; the closed form A/A* = (1/M) [(2/(g+1))(1 + (g-1)/2 M^2)]^((g+1)/(2(g-1))) is
//       checked beside it to 1e-9).
//  [M]  Mattingly, Elements of Propulsion, 2006, eq. 7.1: F_g = W9 V9 + (p9 - p0) A9.
//  [E]  Energy of an adiabatic expansion to p with an isentropic efficiency eta = C_V^2
//       (definition in components/nozzle.h): V = C_V sqrt(2 cp Tt (1 - (p/pt)^((g-1)/g))),
//       T = Tt - V^2 / (2 cp).
#include "common/error.h"
#include "components/nozzle.h"
#include "thermo/constant_cp_gas.h"
#include "thermo/thermally_perfect_model.h"

#include <QTest>

#include <cmath>
#include <memory>
#include <variant>

using namespace cw;
using components::NozzleInputs;
using components::NozzleLossBasis;
using stream::TotalState;

namespace {

constexpr double kCp = 1148.0, kGamma = 4.0 / 3.0;  // a hot-section gas: R = 287 J/(kg K)
constexpr double kTt = 1100.0, kW = 20.0;

bool relNear(double actual, double expected, double relative) {
  return std::abs(actual - expected) <= relative * std::abs(expected);
}

QByteArray describe(const char* what, double actual, double expected) {
  return QByteArray(what) + ": got " + QByteArray::number(actual, 'g', 17) + ", expected " +
         QByteArray::number(expected, 'g', 17);
}

std::shared_ptr<const thermo::ConstantCpGas> gasOf(double cp, double gamma) {
  return std::make_shared<const thermo::ConstantCpGas>(cp, gamma, "test gas", 0.0);
}

TotalState entry(std::shared_ptr<const thermo::Gas> gas, double pt, double Tt = kTt) {
  TotalState t;
  t.gas = std::move(gas);
  t.temperature = Tt;
  t.pressure = pt;
  t.enthalpy = t.gas->enthalpy(Tt);
  t.massFlow = kW;
  return t;
}

NozzleInputs nozzle(std::variant<components::ConvergentNozzle, components::FullyExpandingNozzle,
                                 components::FixedAreaRatioNozzle>
                        geometry,
                    double velocityCoefficient, double discharge = 1.0) {
  return NozzleInputs{geometry, NozzleLossBasis::VelocityCoefficient, velocityCoefficient, discharge};
}

/// [S]: the throat pressure of a choked nozzle with efficiency eta.
double criticalPressure(double pt, double eta, double g = kGamma) {
  return pt * std::pow(1.0 - (1.0 / eta) * (g - 1.0) / (g + 1.0), g / (g - 1.0));
}

/// [E]: the exit velocity of an expansion to p with velocity coefficient C_V.
double exitVelocity(double pt, double p, double cv, double cp = kCp, double g = kGamma) {
  return cv * std::sqrt(2.0 * cp * kTt * (1.0 - std::pow(p / pt, (g - 1.0) / g)));
}

}  // namespace

class TestNozzle : public QObject {
  Q_OBJECT
 private slots:
  // A choked convergent nozzle: sonic throat at T8 = 2 Tt/(g+1), p8 by [S], thrust by [M].
  void chokedConvergentThroatIsSonic_data() {
    QTest::addColumn<double>("efficiency");
    QTest::newRow("eta_n 1") << 1.0;
    QTest::newRow("eta_n 0.97") << 0.97;
    QTest::newRow("eta_n 0.9") << 0.9;
    QTest::newRow("eta_n 0.8") << 0.8;
  }
  void chokedConvergentThroatIsSonic() {
    QFETCH(double, efficiency);
    const auto gas = gasOf(kCp, kGamma);
    const double R = kCp * (kGamma - 1) / kGamma, pt = 300e3, p0 = 50e3, discharge = 0.97;
    const components::Nozzle n(nozzle(components::ConvergentNozzle{}, std::sqrt(efficiency), discharge));
    const auto r = n.expand(entry(gas, pt), p0);
    QVERIFY(r.choked);
    QCOMPARE(r.throat.mach, 1.0);  // exactly: V8 = a(T8)
    const double T8 = 2.0 * kTt / (kGamma + 1.0), p8 = criticalPressure(pt, efficiency);
    const double V8 = std::sqrt(kGamma * R * T8), area = kW * R * T8 / (p8 * V8);
    QVERIFY2(relNear(r.throat.staticTemperature, T8, 1e-12), describe("T8", r.throat.staticTemperature, T8));
    QVERIFY2(relNear(r.throat.staticPressure, p8, 1e-12), describe("p8", r.throat.staticPressure, p8));
    QVERIFY(relNear(r.throat.velocity, V8, 1e-12));
    QVERIFY(relNear(*r.throat.area, area / discharge, 1e-12));  // geometric = effective / C_D
    QVERIFY(relNear(r.grossThrust, kW * V8 + (p8 - p0) * area, 1e-12));
    // The exit is the throat; the stagnation pressure of the actual state is lower by the loss.
    QCOMPARE(r.exit.staticPressure, r.throat.staticPressure);
    QVERIFY(relNear(r.exit.totalPressure, p8 * std::pow(kTt / T8, kGamma / (kGamma - 1)), 1e-12));
    QVERIFY(r.exit.totalPressure <= pt * (1 + 1e-15));
    QVERIFY(relNear(r.efficiency.isentropic, efficiency, 1e-12));
  }

  // Unchoked (pt/p0 = 1.6, below the critical 1.85): the exit expands to p0 by [E].
  void unchokedConvergentExpandsToAmbient() {
    const auto gas = gasOf(kCp, kGamma);
    const double R = kCp * (kGamma - 1) / kGamma, pt = 80e3, p0 = 50e3, cv = 0.97;
    const auto r = components::Nozzle(nozzle(components::ConvergentNozzle{}, cv)).expand(entry(gas, pt), p0);
    QVERIFY(!r.choked);
    const double V9 = exitVelocity(pt, p0, cv), T9 = kTt - V9 * V9 / (2 * kCp);
    QCOMPARE(r.exit.staticPressure, p0);
    QVERIFY2(relNear(r.exit.velocity, V9, 1e-12), describe("V9", r.exit.velocity, V9));
    QVERIFY(relNear(r.exit.staticTemperature, T9, 1e-12));
    QVERIFY(relNear(r.exit.mach, V9 / std::sqrt(kGamma * R * T9), 1e-12));
    QVERIFY(r.exit.mach < 1.0);
    QVERIFY(relNear(r.grossThrust, kW * V9, 1e-12));  // no pressure thrust at p9 = p0
    QCOMPARE(r.throat.staticPressure, r.exit.staticPressure);
  }

  // The choking criterion uses the actual critical pressure ratio: at pt/p0 = 1.88 the isentropic
  // nozzle chokes (critical 1.8526) but one with eta_n = 0.95 does not (critical 1.9191, [S]).
  void chokingUsesTheActualCriticalPressure() {
    const auto gas = gasOf(kCp, kGamma);
    const double pt = 1.88 * 50e3;
    QVERIFY(std::abs(pt / criticalPressure(pt, 1.0) - 1.8526) < 1e-4);
    QVERIFY(std::abs(pt / criticalPressure(pt, 0.95) - 1.9191) < 1e-4);
    const auto ideal =
        components::Nozzle(nozzle(components::ConvergentNozzle{}, 1.0)).expand(entry(gas, pt), 50e3);
    const auto lossy = components::Nozzle(nozzle(components::ConvergentNozzle{}, std::sqrt(0.95)))
                           .expand(entry(gas, pt), 50e3);
    QVERIFY(ideal.choked);
    QVERIFY(!lossy.choked);
    QVERIFY(lossy.exit.mach < 1.0);
  }

  // Thrust is continuous through the choking point (both branches meet at M = 1, p = p*).
  void thrustIsContinuousAtChoking() {
    const auto gas = gasOf(kCp, kGamma);
    const double pt = 200e3, eta = 0.93, pStar = criticalPressure(pt, eta);
    const components::Nozzle n(nozzle(components::ConvergentNozzle{}, std::sqrt(eta)));
    const auto below = n.expand(entry(gas, pt), pStar * (1 - 1e-9));
    const auto above = n.expand(entry(gas, pt), pStar * (1 + 1e-9));
    QVERIFY(below.choked && !above.choked);
    QVERIFY2(relNear(below.grossThrust, above.grossThrust, 1e-7),
             describe("thrust", below.grossThrust, above.grossThrust));
    QVERIFY(std::abs(above.exit.mach - 1.0) < 1e-7);
  }

  // Convergent-divergent, full expansion, no loss: the exit Mach number and area ratio of the
  // isentropic expansion, against NACA 1135 [N] and its closed form.
  void fullExpansionAreaRatioMatchesNaca1135_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("tableAreaRatio");
    QTest::newRow("M 1.5") << 1.5 << 1.176;
    QTest::newRow("M 2") << 2.0 << 1.688;
    QTest::newRow("M 3") << 3.0 << 4.235;
  }
  void fullExpansionAreaRatioMatchesNaca1135() {
    QFETCH(double, mach);
    QFETCH(double, tableAreaRatio);
    const double g = 1.4, cp = 1004.0, p0 = 20e3;
    const double pt = p0 * std::pow(1 + 0.2 * mach * mach, 3.5);
    const auto r = components::Nozzle(nozzle(components::FullyExpandingNozzle{}, 1.0, 0.98))
                       .expand(entry(gasOf(cp, g), pt, 900.0), p0);
    QVERIFY(r.choked);
    QCOMPARE(r.throat.mach, 1.0);
    QVERIFY(relNear(r.exit.mach, mach, 1e-9));
    const double ratio = *r.exit.area / *r.throat.area;
    const double closedForm =
        (1 / mach) * std::pow((2 / (g + 1)) * (1 + 0.5 * (g - 1) * mach * mach), (g + 1) / (2 * (g - 1)));
    QVERIFY2(relNear(ratio, closedForm, 1e-9), describe("A9/A8", ratio, closedForm));
    QVERIFY(std::abs(ratio - tableAreaRatio) < 6e-4);  // the table's four digits
  }

  // Convergent-divergent with losses: sonic throat by [S], exit at p0 by [E].
  void lossyFullExpansion() {
    const auto gas = gasOf(kCp, kGamma);
    const double pt = 400e3, p0 = 30e3, eta = 0.94;
    const auto r = components::Nozzle(nozzle(components::FullyExpandingNozzle{}, std::sqrt(eta)))
                       .expand(entry(gas, pt), p0);
    QCOMPARE(r.throat.mach, 1.0);
    QVERIFY(relNear(r.throat.staticPressure, criticalPressure(pt, eta), 1e-12));
    QCOMPARE(r.exit.staticPressure, p0);
    const double V9 = exitVelocity(pt, p0, std::sqrt(eta));
    QVERIFY(relNear(r.exit.velocity, V9, 1e-12));
    QVERIFY(relNear(r.grossThrust, kW * V9, 1e-12));
    QVERIFY(r.exit.mach > 1.0);
  }

  // A fixed area ratio: without loss, A9/A8 = 1.6875 is the ratio of Mach 2 at gamma 1.4 (closed
  // form of [N]; 1.688 in its Table I): M9 = 2, p9 = pt / 1.8^3.5. With losses the exit still has
  // the given geometric area ratio, and is supersonic below the sonic throat.
  void fixedAreaRatio() {
    const double g = 1.4, cp = 1004.0, pt = 500e3, p0 = 40e3;
    const auto gas = gasOf(cp, g);
    const components::FixedAreaRatioNozzle geometry{1.6875};
    const auto ideal = components::Nozzle(nozzle(geometry, 1.0, 0.96)).expand(entry(gas, pt, 900.0), p0);
    QVERIFY(relNear(ideal.exit.mach, 2.0, 1e-9));
    QVERIFY(relNear(ideal.exit.staticPressure, pt / std::pow(1.8, 3.5), 1e-9));
    const double R = cp * (g - 1) / g, T9 = 900.0 / 1.8, V9 = 2.0 * std::sqrt(g * R * T9);
    const double area = kW * R * T9 / (ideal.exit.staticPressure * V9);
    QVERIFY(relNear(ideal.grossThrust, kW * V9 + (ideal.exit.staticPressure - p0) * area, 1e-9));
    for (double eta : {0.98, 0.9, 0.8}) {
      const auto lossy =
          components::Nozzle(nozzle(geometry, std::sqrt(eta), 0.96)).expand(entry(gas, pt, 900.0), p0);
      QCOMPARE(lossy.throat.mach, 1.0);
      QVERIFY(relNear(*lossy.exit.area / *lossy.throat.area, 1.6875, 1e-9));
      QVERIFY(lossy.exit.mach > 1.0);
      QVERIFY(lossy.exit.staticPressure < lossy.throat.staticPressure);
      QVERIFY(lossy.grossThrust < ideal.grossThrust);
    }
  }

  // The two ways of giving the loss are one input: eta_n = C_V^2.
  void efficiencyBasisIsTheSquaredVelocityCoefficient() {
    const auto gas = gasOf(kCp, kGamma);
    for (double pt : {80e3, 300e3}) {
      const auto byVelocity =
          components::Nozzle(nozzle(components::ConvergentNozzle{}, 0.96)).expand(entry(gas, pt), 50e3);
      const auto byEfficiency =
          components::Nozzle(NozzleInputs{components::ConvergentNozzle{},
                                          NozzleLossBasis::IsentropicEfficiency, 0.96 * 0.96, 1.0})
              .expand(entry(gas, pt), 50e3);
      QVERIFY(relNear(byEfficiency.grossThrust, byVelocity.grossThrust, 1e-14));
      QVERIFY(relNear(byEfficiency.exit.staticPressure, byVelocity.exit.staticPressure, 1e-14));
    }
  }

  // The discharge coefficient divides the effective areas into the geometric ones; it changes no
  // thrust (definition in components/nozzle.h; common practice, no source).
  void dischargeCoefficientEnlargesTheGeometricAreas() {
    const auto gas = gasOf(kCp, kGamma);
    for (const auto& geometry :
         {NozzleInputs{components::ConvergentNozzle{}, NozzleLossBasis::VelocityCoefficient, 0.97, 1.0},
          NozzleInputs{components::FixedAreaRatioNozzle{1.4}, NozzleLossBasis::VelocityCoefficient, 0.97,
                       1.0}}) {
      NozzleInputs withLoss = geometry;
      withLoss.dischargeCoefficient = 0.95;
      const auto one = components::Nozzle(geometry).expand(entry(gas, 300e3), 50e3);
      const auto cd = components::Nozzle(withLoss).expand(entry(gas, 300e3), 50e3);
      QVERIFY(relNear(*cd.throat.area, *one.throat.area / 0.95, 1e-14));
      QVERIFY(relNear(*cd.exit.area, *one.exit.area / 0.95, 1e-14));
      QVERIFY(relNear(cd.grossThrust, one.grossThrust, 1e-14));
    }
  }

  // Thrust rises monotonically with the velocity coefficient, through the choking point, for each
  // geometry (with a sonic throat every loss lowers the throat pressure, components/nozzle.h). A
  // fixed area ratio is refused where a shock would stand inside it; refusals come only at the
  // lossy end of the sweep (the valid coefficients are one interval reaching up to 1).
  void thrustRisesWithTheVelocityCoefficient() {
    const auto gas = gasOf(kCp, kGamma);
    for (double pt : {70e3, 95e3, 150e3, 600e3}) {
      for (const auto& geometry : {nozzle(components::ConvergentNozzle{}, 1.0, 0.97),
                                   nozzle(components::FullyExpandingNozzle{}, 1.0, 0.97),
                                   nozzle(components::FixedAreaRatioNozzle{1.3}, 1.0, 0.97)}) {
        const bool fixedRatio = std::holds_alternative<components::FixedAreaRatioNozzle>(geometry.geometry);
        double previous = 0.0;
        bool wasChoked = false, solved = false;
        for (int k = 1; k <= 200; ++k) {
          NozzleInputs inputs = geometry;
          inputs.loss = 0.05 + 0.95 * k / 200.0;
          const QString where =
              QString("pt %1, C_V %2, fixed ratio %3").arg(pt).arg(inputs.loss).arg(fixedRatio);
          try {
            const auto r = components::Nozzle(inputs).expand(entry(gas, pt), 50e3);
            QVERIFY2(r.grossThrust > previous, qPrintable(where));
            QVERIFY(r.throat.mach <= 1.0 + 1e-12);
            if (r.choked) QCOMPARE(r.throat.mach, 1.0);
            QVERIFY2(!wasChoked || r.choked, qPrintable(where));  // a smaller loss never unchokes it
            wasChoked = r.choked;
            previous = r.grossThrust;
            solved = true;
          } catch (const cw::NoSolution& e) {
            QVERIFY2(fixedRatio && !solved, qPrintable(where + ": " + e.what()));
          }
        }
        // At pt/p0 = 1.4 even the loss-free supersonic exit (M9 1.66, p9 0.22 pt) would be
        // overexpanded past a normal shock (3.0 p9 = 0.66 pt < p0 = 0.71 pt): refused throughout.
        QVERIFY(solved || (fixedRatio && pt == 70e3));
      }
    }
  }

  // A fixed area ratio at a pressure ratio that would put a normal shock inside the nozzle: a clear
  // refusal. A9/A8 = 1.6875 at gamma 1.4 without loss gives M9 = 2 and p9 = pt/7.8244; the pressure
  // behind a normal shock at M 2 is 4.5 p9 (NACA 1135, Table II, p2/p1 = 4.500): at p0 = 0.55 pt
  // (below 4.5 p9 = 0.5751 pt) the exit stays supersonic; at 0.6 pt a shock would stand inside.
  void shockInsideAFixedAreaRatioIsRefused() {
    const auto gas = gasOf(1004.0, 1.4);
    const components::Nozzle n(nozzle(components::FixedAreaRatioNozzle{1.6875}, 1.0));
    const double pt = 100e3, p9 = pt / std::pow(1.8, 3.5);
    QVERIFY(std::abs(4.5 * p9 / pt - 0.5751) < 1e-4);
    const auto outside = n.expand(entry(gas, pt, 900.0), 0.55 * pt);  // overexpanded, shocks outside
    QVERIFY(relNear(outside.exit.mach, 2.0, 1e-9));
    QVERIFY(outside.exit.staticPressure < 0.55 * pt);
    try {
      n.expand(entry(gas, pt, 900.0), 0.6 * pt);
      QFAIL("expected NoSolution");
    } catch (const cw::NoSolution& e) {
      QVERIFY2(std::string(e.what()).find("a shock would stand inside the nozzle") != std::string::npos,
               e.what());
    }
  }

  // A thermally perfect gas: the throat is still exactly sonic and its temperature satisfies the
  // energy equation ht - h(T8) = a(T8)^2 / 2 ([E] in its general form); the derived nozzle
  // efficiency is the one given.
  void thermallyPerfectThroatIsSonic() {
    const thermo::ThermallyPerfectModel model(thermo::HydrocarbonFuel::keroseneLike());
    const auto gas = model.products(0.02);
    for (double eta : {1.0, 0.95, 0.85}) {
      const auto r = components::Nozzle(nozzle(components::ConvergentNozzle{}, std::sqrt(eta)))
                         .expand(entry(gas, 250e3), 40e3);
      QVERIFY(r.choked);
      QCOMPARE(r.throat.mach, 1.0);
      const double T8 = r.throat.staticTemperature, a = gas->speedOfSound(T8);
      QVERIFY(std::abs(gas->enthalpy(kTt) - gas->enthalpy(T8) - 0.5 * a * a) < 1e-8 * gas->enthalpy(kTt));
      QVERIFY(relNear(r.efficiency.isentropic, eta, 1e-10));
    }
  }

  // No jet, or none worth a finite area: a clear NoSolution, never an infinite thrust.
  void noJetIsNoSolution() {
    const auto gas = gasOf(kCp, kGamma);
    QVERIFY_THROWS_EXCEPTION(
        cw::NoSolution,
        components::Nozzle(nozzle(components::ConvergentNozzle{}, 0.98)).expand(entry(gas, 50e3), 50e3));
    QVERIFY_THROWS_EXCEPTION(
        cw::NoSolution,
        components::Nozzle(nozzle(components::ConvergentNozzle{}, 5e-324)).expand(entry(gas, 300e3), 50e3));
    // A small but representable coefficient gives a small, finite thrust.
    const auto slow =
        components::Nozzle(nozzle(components::ConvergentNozzle{}, 1e-3)).expand(entry(gas, 300e3), 50e3);
    QVERIFY(std::isfinite(slow.grossThrust) && slow.grossThrust > 0.0 && !slow.choked);
    QVERIFY(relNear(slow.grossThrust, kW * exitVelocity(300e3, 50e3, 1e-3), 1e-9));
  }
};

QTEST_APPLESS_MAIN(TestNozzle)
#include "test_nozzle.moc"
