// The turbojet design point against closed-form results, and its conservation laws.
#include "analysis/ideal_twin.h"
#include "common/error.h"
#include "engine/evaluate.h"
#include "engine/isobars.h"
#include "engine/turbojet.h"

#include <QTest>

#include <cmath>
#include <random>

using namespace cw::engine;

namespace {

/// A case on the constant-cp model with every component ideal and the fuel mass neglected,
/// at the flight condition of Mattingly's ideal turbojet examples (M0 = 2, T0 = 216.7 K).
Case idealConstantCpCase(double pressureRatio, double burnerExitTemperature, double mach) {
  Case c;
  c.flight.ambient = GivenAmbient{216.7, 19330.0};
  c.flight.mach = mach;
  c.design.target = AirMassFlowTarget{50.0};
  c.fuel.lowerHeatingValue = 42.8e6;
  c.gasModel.model = ConstantCpGasModel{1004.0, 1.4};
  c.gasModel.neglectFuelMass = true;
  c = cw::analysis::idealTwinOf(c, burnerExitTemperature, 50.0);
  c.compressor.pressureRatio = pressureRatio;
  return c;
}

double relative(double a, double b) {
  return std::abs(a - b) / std::max(std::abs(b), 1e-300);
}

}  // namespace

class TestTurbojet : public QObject {
  Q_OBJECT
 private slots:
  // Closed form: the ideal turbojet of parametric cycle analysis, Mattingly, Elements of
  // Propulsion: Gas Turbines and Rockets, AIAA 2006, sec. 5.6 (ideal turbojet), eqs. for
  // tau_r, tau_c, tau_lambda, tau_t = 1 - tau_r (tau_c - 1) / tau_lambda, V9/a0, F/m0,
  // f = cp T0 (tau_lambda - tau_r tau_c) / h_PR, S = f / (F/m0), eta_T = 1 - 1/(tau_r tau_c),
  // eta_P = 2 M0 / (V9/a0 + M0).
  void idealTurbojetMatchesClosedForm_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("pressureRatio");
    QTest::addColumn<double>("exitTemperature");
    QTest::newRow("M2, pi_c 10, 1800 K") << 2.0 << 10.0 << 1800.0;
    QTest::newRow("M0.8, pi_c 20, 1600 K") << 0.8 << 20.0 << 1600.0;
    QTest::newRow("M3, pi_c 2, 1900 K") << 3.0 << 2.0 << 1900.0;
    QTest::newRow("static, pi_c 12, 1400 K") << 0.0 << 12.0 << 1400.0;
  }
  void idealTurbojetMatchesClosedForm() {
    QFETCH(double, mach);
    QFETCH(double, pressureRatio);
    QFETCH(double, exitTemperature);
    const double gamma = 1.4, cp = 1004.0, R = cp * (gamma - 1) / gamma, T0 = 216.7, hPR = 42.8e6;
    const double a0 = std::sqrt(gamma * R * T0);
    const double tauR = 1 + 0.5 * (gamma - 1) * mach * mach;
    const double tauC = std::pow(pressureRatio, (gamma - 1) / gamma);
    const double tauL = exitTemperature / T0;
    const double tauT = 1 - tauR / tauL * (tauC - 1);
    const double v9a0 = std::sqrt(2 / (gamma - 1) * tauL / (tauR * tauC) * (tauR * tauC * tauT - 1));
    const double specificThrust = a0 * (v9a0 - mach);
    const double f = cp * T0 * (tauL - tauR * tauC) / hPR;

    const CycleResult r = Turbojet(idealConstantCpCase(pressureRatio, exitTemperature, mach)).evaluate();
    const double tol = 1e-9;
    QVERIFY2(relative(r.performance.specificThrust, specificThrust) < tol,
             qPrintable(QString::number(r.performance.specificThrust, 'g', 15) + " vs " +
                        QString::number(specificThrust, 'g', 15)));
    QVERIFY(relative(r.performance.fuelAirRatio, f) < tol);
    QVERIFY(relative(r.performance.thrustSpecificFuelConsumption, f / specificThrust) < tol);
    QVERIFY(relative(r.performance.jetVelocity, v9a0 * a0) < tol);
    // Ideal Brayton cycle thermal efficiency 1 - 1/(tau_r tau_c) (Mattingly, 2006, eq. 5.24).
    QVERIFY(relative(r.performance.thermalEfficiency, 1 - 1 / (tauR * tauC)) < tol);
    if (mach > 0) {
      QVERIFY(relative(r.performance.propulsiveEfficiency, 2 * mach / (v9a0 + mach)) < tol);
      QVERIFY(relative(r.performance.overallEfficiency,
                       r.performance.thermalEfficiency * r.performance.propulsiveEfficiency) < tol);
    }
    QVERIFY(relative(r.station("5").totalTemperature, tauT * exitTemperature) < tol);
  }

  // Closed form of the turbojet with losses in the two-gamma model: Mattingly, Elements of
  // Propulsion, 2006, sec. 7.3 (parametric analysis of the real turbojet; equations from memory
  // of the book): tau_c = pi_c^((gc-1)/(gc e_c)), f = (tau_l - tau_r tau_c) / (eta_b h_PR / (cpc T0)
  // - tau_l), tau_t = 1 - tau_r (tau_c - 1) / (eta_m (1 + f) tau_l), pi_t = tau_t^(gt/((gt-1) e_t)),
  // Pt9/P9 = (P0/P9) pi_r pi_d pi_c pi_b pi_t pi_n, M9, T9/T0, V9/a0 and
  // F/m0 = a0 ((1 + f) V9/a0 - M0) for full expansion (P0/P9 = 1). The nozzle's pi_n is the
  // jet pipe's total-pressure ratio ahead of an isentropic nozzle.
  void lossyTwoGammaTurbojetMatchesClosedForm_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("pressureRatio");
    QTest::addColumn<double>("exitTemperature");
    QTest::newRow("M2, pi_c 10, 1780 K") << 2.0 << 10.0 << 1780.0;
    QTest::newRow("M0.85, pi_c 24, 1650 K") << 0.85 << 24.0 << 1650.0;
    QTest::newRow("static, pi_c 6, 1300 K") << 0.0 << 6.0 << 1300.0;
  }
  void lossyTwoGammaTurbojetMatchesClosedForm() {
    QFETCH(double, mach);
    QFETCH(double, pressureRatio);
    QFETCH(double, exitTemperature);
    const double gc = 1.4, cpc = 1004.0, gt = 1.3, cpt = 1239.0, T0 = 216.7, p0 = 19330.0, hPR = 42.8e6;
    const double piD = 0.97, ec = 0.89, piB = 0.96, etaB = 0.98, et = 0.91, etaM = 0.99, piN = 0.98;
    const double Rc = (gc - 1) / gc * cpc, Rt = (gt - 1) / gt * cpt;
    const double a0 = std::sqrt(gc * Rc * T0);
    const double tauR = 1 + 0.5 * (gc - 1) * mach * mach, piR = std::pow(tauR, gc / (gc - 1));
    const double tauL = cpt * exitTemperature / (cpc * T0);
    const double tauC = std::pow(pressureRatio, (gc - 1) / (gc * ec));
    const double f = (tauL - tauR * tauC) / (etaB * hPR / (cpc * T0) - tauL);
    const double tauT = 1 - 1 / (etaM * (1 + f)) * tauR / tauL * (tauC - 1);
    const double piT = std::pow(tauT, gt / ((gt - 1) * et));
    const double pt9p9 = piR * piD * pressureRatio * piB * piT * piN;
    const double m9 = std::sqrt(2 / (gt - 1) * (std::pow(pt9p9, (gt - 1) / gt) - 1));
    const double t9t0 = tauL * tauT / std::pow(pt9p9, (gt - 1) / gt) * cpc / cpt;
    const double v9a0 = m9 * std::sqrt(gt * Rt * t9t0 / (gc * Rc));
    const double specificThrust = a0 * ((1 + f) * v9a0 - mach);

    Case c;
    c.flight.ambient = GivenAmbient{T0, p0};
    c.flight.mach = mach;
    c.design.target = AirMassFlowTarget{40.0};
    c.fuel.lowerHeatingValue = hPR;
    c.gasModel.model = TwoGammaGasModel{cpc, gc, cpt, gt};
    c.inlet = InletInputs{InletLossBasis::PressureRecovery, piD, SupersonicRecoveryRule::None};
    c.compressor = CompressorInputs{pressureRatio, Efficiency{EfficiencyBasis::Polytropic, ec}, 0.0};
    c.burner = BurnerInputs{ExitTemperatureSetting{exitTemperature}, 1 - piB, etaB};
    c.turbine = TurbineInputs{Efficiency{EfficiencyBasis::Polytropic, et}, etaM, 0.0};
    c.jetPipe.pressureLossFraction = 1 - piN;
    c.nozzle = NozzleInputs{FullyExpandingNozzle{}, NozzleLossBasis::VelocityCoefficient, 1.0, 1.0};
    const CycleResult r = Turbojet(c).evaluate();
    QVERIFY2(relative(r.performance.specificThrust, specificThrust) < 1e-9,
             qPrintable(QString::number(r.performance.specificThrust, 'g', 15) + " vs " +
                        QString::number(specificThrust, 'g', 15)));
    QVERIFY(relative(r.performance.fuelAirRatio, f) < 1e-9);
    QVERIFY(relative(r.performance.thrustSpecificFuelConsumption, f / specificThrust) < 1e-9);
    QVERIFY(relative(r.station("9").mach, m9) < 1e-9);
    QVERIFY(relative(r.station("9").staticTemperature, t9t0 * T0) < 1e-9);
    // Derived efficiencies: eta_c = (pi_c^((gc-1)/gc) - 1) / (tau_c - 1) (Mattingly, 2006, eq. 7.10).
    const auto& compressor = r.components[1];
    QCOMPARE(compressor.component, std::string("compressor"));
    QVERIFY(relative(compressor.efficiency->isentropic,
                     (std::pow(pressureRatio, (gc - 1) / gc) - 1) / (tauC - 1)) < 1e-9);
    QVERIFY(relative(compressor.efficiency->polytropic, ec) < 1e-12);
  }

  // Shaft and burner energy balances close (first law on each control volume; common practice).
  void energyBalancesClose_data() {
    QTest::addColumn<int>("model");
    QTest::newRow("constant-cp") << 0;
    QTest::newRow("two-gamma") << 1;
    QTest::newRow("thermally-perfect") << 2;
  }
  void energyBalancesClose() {
    QFETCH(int, model);
    Case c;  // the default lossy case
    if (model == 0) c.gasModel.model = ConstantCpGasModel{};
    if (model == 1) c.gasModel.model = TwoGammaGasModel{};
    c.turbine.powerOfftake = 150e3;
    c.compressor.bleedFraction = 0.03;
    const Turbojet engine(c);
    const CycleResult r = engine.evaluate();
    const Station &s2 = r.station("2"), &s3 = r.station("3"), &s4 = r.station("4"), &s5 = r.station("5");
    const double compressorPower = s2.massFlow * (s3.totalEnthalpy - s2.totalEnthalpy);
    const double turbinePower = s4.massFlow * (s4.totalEnthalpy - s5.totalEnthalpy);
    QVERIFY(relative(c.turbine.mechanicalEfficiency * turbinePower,
                     compressorPower + c.turbine.powerOfftake) < 1e-9);
    const auto& gm = engine.gasModel();
    const double fuel = r.performance.fuelFlow;
    const double in = s3.massFlow * s3.totalEnthalpy + fuel * gm.fuelEnthalpy() -
                      (1 - c.burner.combustionEfficiency) * fuel * gm.lowerHeatingValue();
    QVERIFY(relative(s4.massFlow * s4.totalEnthalpy, in) < 1e-9);
    QVERIFY(relative(s4.massFlow, s3.massFlow + fuel) < 1e-12);
    QVERIFY(relative(s3.massFlow, (1 - 0.03) * s2.massFlow) < 1e-12);
  }

  // Second law: each lossy component generates entropy; the ideal twin none.
  void lossyComponentsGenerateEntropyIdealNone() {
    Case c;
    c.gasModel.model = TwoGammaGasModel{};
    const Evaluation e = evaluateCase(c);
    for (const auto& component : e.actual.components)
      QVERIFY2(component.entropyGeneration > 0.0, component.component.c_str());
    for (const auto& component : e.ideal.components) {
      const double scale = e.ideal.sizing.airMassFlow * 1004.0;  // W cp: a natural scale of S_gen [W/K]
      QVERIFY2(std::abs(component.entropyGeneration) < 1e-9 * scale, component.component.c_str());
    }
  }

  // As every loss goes to zero together, the cycle tends to its ideal twin (common practice).
  void lossesToZeroApproachTheIdealTwin() {
    Case c;
    c.gasModel.model = TwoGammaGasModel{};
    c.nozzle.geometry = FullyExpandingNozzle{};
    const Evaluation reference = evaluateCase(c);
    double previous = 1e300;
    for (double scale : {1e-1, 1e-2, 1e-3, 1e-5}) {
      Case k = c;
      k.inlet.loss = 1 - scale * (1 - c.inlet.loss);
      k.compressor.efficiency.value = 1 - scale * (1 - c.compressor.efficiency.value);
      k.compressor.bleedFraction = scale * c.compressor.bleedFraction;
      k.burner.pressureLossFraction = scale * c.burner.pressureLossFraction;
      k.burner.combustionEfficiency = 1 - scale * (1 - c.burner.combustionEfficiency);
      k.turbine.efficiency.value = 1 - scale * (1 - c.turbine.efficiency.value);
      k.turbine.mechanicalEfficiency = 1 - scale * (1 - c.turbine.mechanicalEfficiency);
      k.jetPipe.pressureLossFraction = scale * c.jetPipe.pressureLossFraction;
      k.nozzle.loss = 1 - scale * (1 - c.nozzle.loss);
      k.nozzle.dischargeCoefficient = 1 - scale * (1 - c.nozzle.dischargeCoefficient);
      const Evaluation e = evaluateCase(k);
      const double gap =
          relative(e.actual.performance.specificThrust, reference.ideal.performance.specificThrust);
      QVERIFY(gap < previous);
      previous = gap;
    }
    QVERIFY(previous < 1e-4);
  }

  // A turbine that cannot drive the compressor is a NoSolution that says so.
  void turbineThatCannotDriveTheCompressor() {
    Case c;
    c.gasModel.model = TwoGammaGasModel{};
    c.compressor.pressureRatio = 40.0;
    c.burner.setting = ExitTemperatureSetting{900.0};
    try {
      Turbojet(c).evaluate();
      QFAIL("expected NoSolution");
    } catch (const cw::NoSolution& e) {
      QVERIFY2(std::string(e.what()).find("cannot drive the compressor") != std::string::npos ||
                   std::string(e.what()).find("no jet") != std::string::npos,
               e.what());
    }
  }

  // Isobars through the station pressures: p fixed, ds/dT = cp/T along them (Gibbs relation at
  // constant pressure; common practice), and the one through station 3 passes through its state.
  void isobarsThroughStations() {
    Case c;
    const CycleResult r = Turbojet(c).evaluate();
    const auto isobars = stationIsobars(r, 250.0, 1600.0, 40);
    QVERIFY(isobars.size() >= 5);
    const Station& s3 = r.station("3");
    bool foundStation3 = false;
    for (const auto& isobar : isobars) {
      for (std::size_t k = 1; k < isobar.states.size(); ++k) {
        const auto &a = isobar.states[k - 1], &b = isobar.states[k];
        QCOMPARE(b.pressure, isobar.pressure);
        QVERIFY(b.entropy > a.entropy);
      }
      if (isobar.station != "3") continue;
      foundStation3 = true;
      QCOMPARE(isobar.pressure, s3.totalPressure);
      // Trapezoidal integral of cp/T from 250 K to T3 on the station's gas against the isobar's entropy rise.
      const auto& first = isobar.states.front();
      double integral = 0.0;
      const int n = 4000;
      for (int i = 0; i < n; ++i) {
        const double t0 = first.temperature + (s3.totalTemperature - first.temperature) * i / n;
        const double t1 = first.temperature + (s3.totalTemperature - first.temperature) * (i + 1) / n;
        integral += 0.5 * (s3.gas->cp(t0) / t0 + s3.gas->cp(t1) / t1) * (t1 - t0);
      }
      QVERIFY(std::abs(first.entropy + integral - s3.entropy) < 1e-4);
    }
    QVERIFY(foundStation3);
  }

  // A thrust requirement fixes the air mass flow: F_n reached to 1e-9.
  void sizingToThrust() {
    Case c;
    c.gasModel.model = TwoGammaGasModel{};
    c.turbine.powerOfftake = 100e3;
    c.design.target = NetThrustTarget{25000.0};
    const CycleResult r = Turbojet(c).evaluate();
    QVERIFY(relative(r.performance.netThrust, 25000.0) < 1e-9);
    const CycleResult check = Turbojet(c).evaluateAt(r.sizing.airMassFlow);
    QVERIFY(relative(check.performance.netThrust, 25000.0) < 1e-9);
    // Face area: A2 = W2 / (rho2 V2); diameter from the annulus (common practice, no source).
    const double hub = c.sizing.hubToTipRatio;
    QVERIFY(relative(r.sizing.engineFaceArea,
                     M_PI / 4 * std::pow(r.sizing.engineFaceDiameter, 2) * (1 - hub * hub)) < 1e-12);
  }

  // Random valid cases across the input ranges: finite and physical, or a clear error.
  void randomCasesAreFiniteOrAClearError() {
    std::mt19937 rng(20261201);
    auto uniform = [&](double a, double b) { return std::uniform_real_distribution<double>(a, b)(rng); };
    int solved = 0, refused = 0;
    for (int i = 0; i < 10000; ++i) {
      Case c;
      if (i % 3 == 0)
        c.gasModel.model = ThermallyPerfectGasModel{};
      else if (i % 3 == 1)
        c.gasModel.model = TwoGammaGasModel{};
      else
        c.gasModel.model = ConstantCpGasModel{};
      c.flight.specificHumidity = (i % 5 == 0) ? uniform(0, 0.02) : 0.0;
      c.flight.ambient = StandardAtmosphereAmbient{uniform(0, 20000), false, uniform(-30, 30)};
      c.flight.mach = uniform(0, 3);
      c.compressor.pressureRatio = uniform(1.5, 40);
      c.compressor.efficiency =
          Efficiency{i % 3 ? EfficiencyBasis::Isentropic : EfficiencyBasis::Polytropic, uniform(0.7, 1.0)};
      c.compressor.bleedFraction = uniform(0, 0.1);
      c.burner.setting = ExitTemperatureSetting{uniform(900, 2200)};
      c.burner.pressureLossFraction = uniform(0, 0.1);
      c.burner.combustionEfficiency = uniform(0.9, 1.0);
      c.turbine.efficiency.value = uniform(0.7, 1.0);
      c.turbine.powerOfftake = uniform(0, 2e5);
      c.inlet.loss = uniform(0.85, 1.0);
      c.nozzle.loss = uniform(0.9, 1.0);
      if (i % 4 == 1) c.nozzle.geometry = FullyExpandingNozzle{};
      if (i % 4 == 2) c.nozzle.geometry = FixedAreaRatioNozzle{uniform(1.0, 3.0)};
      try {
        const Evaluation e = evaluateCase(c);
        for (const CycleResult* r : {&e.actual, &e.ideal}) {
          const auto& p = r->performance;
          for (double v : {p.netThrust, p.specificThrust, p.thrustSpecificFuelConsumption, p.fuelFlow,
                           p.thermalEfficiency, p.propulsiveEfficiency, p.jetVelocity})
            QVERIFY(std::isfinite(v));
          QVERIFY(p.netThrust > 0 && p.fuelFlow > 0);
          QVERIFY(p.thermalEfficiency > 0 && p.thermalEfficiency < 1);
          for (const auto& s : r->stations) {
            QVERIFY(std::isfinite(s.totalTemperature) && s.totalTemperature > 0);
            QVERIFY(std::isfinite(s.totalPressure) && s.totalPressure > 0);
            QVERIFY(std::isfinite(s.entropy));
          }
        }
        // Removing every loss never lowers specific thrust at the same Tt4 (second law).
        QVERIFY(e.ideal.performance.specificThrust >= e.actual.performance.specificThrust * (1 - 1e-12));
        ++solved;
      } catch (const cw::Error& e) {
        // No cycle, or an input that the gas data cannot follow (the thermally perfect data
        // start at 200 K), reported against the case path of that input.
        const bool namesAnInput = e.code() != cw::ErrorCode::NotConverged && e.where().rfind("/", 0) == 0;
        QVERIFY2(e.code() == cw::ErrorCode::NoSolution || namesAnInput, e.what());
        QVERIFY(!std::string(e.what()).empty());
        ++refused;
      }
    }
    QVERIFY(solved > 5000);
    qInfo("random cases: %d solved, %d refused with a clear error", solved, refused);
  }
};

QTEST_APPLESS_MAIN(TestTurbojet)
#include "test_turbojet.moc"
