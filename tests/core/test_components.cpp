// Each component on its own: the component class constructed directly, an entry state built by
// hand, its exit against closed forms and published relations (never against its own code).
//
// Sources (equation numbers from memory of the books; none was read off the page for this suite):
//  [M]  Mattingly, Elements of Propulsion: Gas Turbines and Rockets, AIAA, 2006: ch. 2 (the
//       calorically perfect gas, sec. 2.3: gamma R = (gamma - 1) cp, isentrope
//       T2/T1 = (p2/p1)^((g-1)/g); total properties Tt/T = 1 + (g-1)/2 M^2,
//       pt/p = (Tt/T)^(g/(g-1))); sec. 4.3, eqs. 4.9-4.10 (isentropic and polytropic efficiency of
//       compressor and turbine, constant cp); ch. 7: pi_d = pt2/pt0, eq. 7.9 (burner energy
//       balance), eq. 7.13 (MIL-E-5008B intake recovery), eqs. 7.17 and 7.27 (turbine work with
//       mechanical efficiency and shaft power offtake).
//  [S]  Saravanamuttoo, Rogers and Cohen, Gas Turbine Theory, 5th ed., 2001: ch. 2 (the polytropic
//       efficiency as the isentropic efficiency of an infinitesimally small stage; section number
//       not checked) and sec. 3.1 (intake efficiency).
//  [W]  Walsh and Fletcher, Gas Turbine Performance, 2nd ed., 2004, sec. 5.2.3 (bleed leaves after
//       full compression) and sec. 5.11 (duct pressure loss); from memory.
//  [G]  The Gibbs relation of an ideal gas, ds = cp dT/T - R dp/p: at equal total temperature the
//       entropy rises by R ln(pt_in/pt_out) (common practice, no source).
// The nozzle is not tested here: its choked-throat treatment is being rewritten.
#include "common/error.h"
#include "components/compressor.h"
#include "components/duct.h"
#include "components/efficiency.h"
#include "components/heat_addition.h"
#include "components/inlet.h"
#include "components/turbine.h"
#include "thermo/calorically_perfect_model.h"
#include "thermo/constant_cp_gas.h"
#include "thermo/mixture.h"
#include "thermo/thermally_perfect_gas.h"
#include "thermo/thermally_perfect_model.h"

#include <QTest>

#include <algorithm>
#include <cmath>
#include <memory>
#include <random>
#include <string>
#include <vector>

using namespace cw;
using components::EfficiencyBasis;
using stream::Station;
using stream::TotalState;
using thermo::ConstantCpGas;

namespace {

bool relNear(double actual, double expected, double relative) {
  return std::abs(actual - expected) <= relative * std::abs(expected);
}

QByteArray describe(const char* what, double actual, double expected) {
  return QByteArray(what) + ": got " + QByteArray::number(actual, 'g', 17) + ", expected " +
         QByteArray::number(expected, 'g', 17);
}

/// A constant-cp gas on the 0 K enthalpy reference the engine uses (h = cp T).
std::shared_ptr<const ConstantCpGas> constantCp(double cp, double gamma) {
  return std::make_shared<const ConstantCpGas>(cp, gamma, "test gas", 0.0);
}

std::shared_ptr<const thermo::ThermallyPerfectGas> thermallyPerfectAir() {
  return std::make_shared<const thermo::ThermallyPerfectGas>(thermo::dryAir(), "dry air");
}

TotalState totalState(std::shared_ptr<const thermo::Gas> gas, double temperature, double pressure,
                      double massFlow, double fuelAirRatio = 0.0) {
  TotalState t;
  t.gas = gas;
  t.temperature = temperature;
  t.pressure = pressure;
  t.enthalpy = gas->enthalpy(temperature);
  t.massFlow = massFlow;
  t.fuelAirRatio = fuelAirRatio;
  return t;
}

/// The free stream on a constant-cp gas by the closed forms of [M] ch. 2:
/// V0 = M0 sqrt(g R T0), ht0 = h(T0) + V0^2/2, Tt0 = T0 (1 + (g-1)/2 M0^2),
/// pt0 = p0 (Tt0/T0)^(g/(g-1)).
Station freeStream(std::shared_ptr<const ConstantCpGas> gas, double T0, double p0, double mach) {
  const double g = gas->constantGamma();
  const double ratio = 1.0 + 0.5 * (g - 1.0) * mach * mach;
  const double velocity = mach * std::sqrt(g * gas->gasConstant() * T0);
  Station s;
  s.gas = gas;
  s.staticTemperature = T0;
  s.staticPressure = p0;
  s.mach = mach;
  s.velocity = velocity;
  s.totalTemperature = T0 * ratio;
  s.totalPressure = p0 * std::pow(ratio, g / (g - 1.0));
  s.totalEnthalpy = gas->enthalpy(T0) + 0.5 * velocity * velocity;
  s.massFlow = 40.0;
  return s;
}

/// Entropy rise between two total states of one gas [J/(kg K)].
double entropyRise(const TotalState& in, const TotalState& out) {
  return out.gas->entropy(out.temperature, out.pressure) - in.gas->entropy(in.temperature, in.pressure);
}

components::InletInputs inletInputs(
    components::InletLossBasis basis, double loss,
    components::SupersonicRecoveryRule rule = components::SupersonicRecoveryRule::None) {
  components::InletInputs inputs;
  inputs.lossBasis = basis;
  inputs.loss = loss;
  inputs.supersonicRecoveryRule = rule;
  return inputs;
}

components::CompressorInputs compressorInputs(double pressureRatio, EfficiencyBasis basis, double efficiency,
                                              double bleed = 0.0) {
  components::CompressorInputs inputs;
  inputs.pressureRatio = pressureRatio;
  inputs.efficiency = {basis, efficiency};
  inputs.bleedFraction = bleed;
  return inputs;
}

components::TurbineInputs turbineInputs(EfficiencyBasis basis, double efficiency, double mechanical = 1.0,
                                        double offtake = 0.0) {
  components::TurbineInputs inputs;
  inputs.efficiency = {basis, efficiency};
  inputs.mechanicalEfficiency = mechanical;
  inputs.powerOfftake = offtake;
  return inputs;
}

/// The constant-cp and two-gamma models as the engine builds them (0 K reference, h_fuel = LHV),
/// with h_PR = 42.8 MJ/kg and a stoichiometric fuel-air ratio of 0.0676 (values chosen here).
std::unique_ptr<thermo::CaloricallyPerfectModel> caloricallyPerfect(bool twoGamma, bool neglectFuelMass) {
  auto cold = constantCp(1004.0, 1.4);
  auto hot = twoGamma ? constantCp(1239.0, 4.0 / 3.0) : cold;
  return std::make_unique<thermo::CaloricallyPerfectModel>(twoGamma ? "two-gamma" : "constant-cp", cold, hot,
                                                           42.8e6, 0.0676, neglectFuelMass);
}

template <typename F>
std::string noSolutionMessage(F f) {
  try {
    f();
  } catch (const NoSolution& e) {
    return e.what();
  }
  return "(no NoSolution)";
}

}  // namespace

class TestComponents : public QObject {
  Q_OBJECT
 private slots:
  // ---- inlet ---------------------------------------------------------------------------------

  // Pressure recovery pi_d = pt2/pt0 (its definition, [M] ch. 7 and inlet.h); adiabatic, so
  // ht2 = ht0 and Tt2 = Tt0; the entropy rises by R ln(1/pi_d) [G].
  void inletPressureRecovery_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("recovery");
    QTest::newRow("static, 0.99") << 0.0 << 0.99;
    QTest::newRow("M0.85, 0.97") << 0.85 << 0.97;
    QTest::newRow("M2, 0.9") << 2.0 << 0.9;
    QTest::newRow("M2, lossless") << 2.0 << 1.0;
  }
  void inletPressureRecovery() {
    QFETCH(double, mach);
    QFETCH(double, recovery);
    const auto air = constantCp(1004.0, 1.4);
    const Station s0 = freeStream(air, 216.7, 19330.0, mach);
    const TotalState t2 =
        components::Inlet(inletInputs(components::InletLossBasis::PressureRecovery, recovery)).exit(s0);
    QVERIFY2(relNear(t2.pressure, recovery * s0.totalPressure, 1e-14),
             describe("pt2", t2.pressure, recovery * s0.totalPressure));
    QCOMPARE(t2.enthalpy, s0.totalEnthalpy);
    QCOMPARE(t2.temperature, s0.totalTemperature);
    QCOMPARE(t2.massFlow, s0.massFlow);
    QCOMPARE(t2.fuelAirRatio, 0.0);
    const double rise =
        air->entropy(t2.temperature, t2.pressure) - air->entropy(s0.totalTemperature, s0.totalPressure);
    QVERIFY(std::abs(rise - air->gasConstant() * std::log(1.0 / recovery)) <= 1e-9 * air->constantCp());
  }

  // Ram efficiency, closed form derived here from the definition in inlet.h,
  //   eta_r = (h(T2s) - h0) / (ht0 - h0),  T2s on the isentrope through (T0, p0) at pt2.
  // Constant cp: h(T2s) - h0 = cp (T2s - T0) and ht0 - h0 = V0^2/2 = M0^2 g R T0 / 2
  // = cp T0 (g-1)/2 M0^2 (g R = (g-1) cp, [M] sec. 2.3). Hence T2s/T0 = 1 + eta_r (g-1)/2 M0^2 and,
  // along the isentrope, pt2/p0 = (T2s/T0)^(g/(g-1)):
  //   pt2/p0 = (1 + eta_r (g-1)/2 M0^2)^(g/(g-1))
  // (eta_r = 1 gives back the isentropic pt0/p0; [S] sec. 3.1 defines the intake efficiency the
  // same way in temperatures).
  void inletRamEfficiencyClosedForm_data() {
    QTest::addColumn<double>("gamma");
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("efficiency");
    QTest::newRow("g1.4, M0.8, 0.95") << 1.4 << 0.8 << 0.95;
    QTest::newRow("g1.4, M2, 0.9") << 1.4 << 2.0 << 0.9;
    QTest::newRow("g1.3, M3, 0.85") << 1.3 << 3.0 << 0.85;
    QTest::newRow("g1.4, M2, 1") << 1.4 << 2.0 << 1.0;
  }
  void inletRamEfficiencyClosedForm() {
    QFETCH(double, gamma);
    QFETCH(double, mach);
    QFETCH(double, efficiency);
    const auto air = constantCp(1004.0, gamma);
    const double T0 = 216.7, p0 = 19330.0;
    const Station s0 = freeStream(air, T0, p0, mach);
    const TotalState t2 =
        components::Inlet(inletInputs(components::InletLossBasis::RamEfficiency, efficiency)).exit(s0);
    const double expected =
        p0 * std::pow(1.0 + efficiency * 0.5 * (gamma - 1.0) * mach * mach, gamma / (gamma - 1.0));
    QVERIFY2(relNear(t2.pressure, expected, 1e-12), describe("pt2", t2.pressure, expected));
    QCOMPARE(t2.enthalpy, s0.totalEnthalpy);
    if (efficiency == 1.0) QVERIFY(relNear(t2.pressure, s0.totalPressure, 1e-12));
  }

  // MIL-E-5008B: eta = 1 - 0.075 (M0 - 1)^1.35 for 1 < M0 < 5, 1 at or below Mach 1 ([M] eq. 7.13,
  // from memory). Values worked out by hand (ln 2 = 0.693147181):
  //   M0 = 1.5: 0.5^1.35 = 1 / 2^1.35; 2^1.35 = 2 exp(0.35 ln 2) = 2 exp(0.242601513)
  //             = 2 x 1.274560627 = 2.549121255; 0.5^1.35 = 0.392292049;
  //             eta = 1 - 0.075 x 0.392292049 = 1 - 0.029421904 = 0.970578096
  //   M0 = 2:   1^1.35 = 1; eta = 1 - 0.075 = 0.925 exactly
  //   M0 = 3:   2^1.35 = 2.549121255; eta = 1 - 0.075 x 2.549121255 = 1 - 0.191184094 = 0.808815906
  // (a coefficient of 0.085 would give 0.966655, 0.915 and 0.783325).
  void milE5008BRecovery_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("expected");
    QTest::newRow("M1.5") << 1.5 << 0.970578096;
    QTest::newRow("M2") << 2.0 << 0.925;
    QTest::newRow("M3") << 3.0 << 0.808815906;
  }
  void milE5008BRecovery() {
    QFETCH(double, mach);
    QFETCH(double, expected);
    const double eta = components::Inlet::supersonicRecovery(mach);
    QVERIFY2(std::abs(eta - expected) <= 1e-9, describe("MIL-E-5008B", eta, expected));
    // Through the inlet: it multiplies the given recovery.
    const auto air = constantCp(1004.0, 1.4);
    const Station s0 = freeStream(air, 216.7, 19330.0, mach);
    const TotalState t2 = components::Inlet(inletInputs(components::InletLossBasis::PressureRecovery, 0.97,
                                                        components::SupersonicRecoveryRule::MilE5008B))
                              .exit(s0);
    QVERIFY(std::abs(t2.pressure / s0.totalPressure - 0.97 * expected) <= 1e-9);
  }

  void milE5008BIsOneAtOrBelowMachOne() {
    for (double mach : {0.0, 0.5, 0.999, 1.0}) QCOMPARE(components::Inlet::supersonicRecovery(mach), 1.0);
    // At Mach 5 and beyond the rule does not apply ([M] eq. 7.13 gives it for 1 < M0 < 5).
    QVERIFY_THROWS_EXCEPTION(InvalidInput, components::Inlet::supersonicRecovery(5.0));
    const auto air = constantCp(1004.0, 1.4);
    const Station s0 = freeStream(air, 288.15, 101325.0, 0.9);
    const TotalState t2 = components::Inlet(inletInputs(components::InletLossBasis::PressureRecovery, 0.98,
                                                        components::SupersonicRecoveryRule::MilE5008B))
                              .exit(s0);
    QVERIFY(relNear(t2.pressure, 0.98 * s0.totalPressure, 1e-14));
  }

  // ---- compressor ----------------------------------------------------------------------------

  // Constant cp, [M] eqs. 4.9 (from memory): tau_c = 1 + (pi^((g-1)/g) - 1)/eta_c (definition of
  // eta_c with h = cp T), tau_c = pi^((g-1)/(g e_c)) (polytropic), so
  //   eta_c = (pi^((g-1)/g) - 1) / (pi^((g-1)/(g e_c)) - 1)
  // and, solved for e_c (derived here), e_c = ((g-1)/g) ln pi / ln(1 + (pi^((g-1)/g) - 1)/eta_c).
  // Work w = cp (Tt3 - Tt2), power W2 w; pt3 = pi pt2. On a constant-cp gas the code derives the
  // other efficiency by these same closed forms (efficiency.cpp, for their accuracy as gamma -> 1);
  // the exit temperature, found through h and s°, is the check independent of them, and
  // polytropicIsTheSmallStageLimit the one independent of both.
  void compressorEfficiencyClosedForms_data() {
    QTest::addColumn<double>("pressureRatio");
    QTest::addColumn<int>("basis");
    QTest::addColumn<double>("efficiency");
    for (double pi : {1.5, 4.0, 12.0, 30.0}) {
      QTest::addRow("pi %g, eta_c 0.84", pi) << pi << int(EfficiencyBasis::Isentropic) << 0.84;
      QTest::addRow("pi %g, e_c 0.9", pi) << pi << int(EfficiencyBasis::Polytropic) << 0.9;
    }
  }
  void compressorEfficiencyClosedForms() {
    QFETCH(double, pressureRatio);
    QFETCH(int, basis);
    QFETCH(double, efficiency);
    const double g = 1.4, cp = 1004.0, T2 = 288.15, p2 = 101325.0, W2 = 20.0;
    const double k = (g - 1.0) / g, ideal = std::pow(pressureRatio, k) - 1.0;
    const bool isentropic = EfficiencyBasis(basis) == EfficiencyBasis::Isentropic;
    const double eta = isentropic ? efficiency : ideal / (std::pow(pressureRatio, k / efficiency) - 1.0);
    const double e =
        isentropic ? k * std::log(pressureRatio) / std::log(1.0 + ideal / efficiency) : efficiency;
    const double T3 = T2 * (1.0 + ideal / eta);

    const auto air = constantCp(cp, g);
    const auto r = components::Compressor(compressorInputs(pressureRatio, EfficiencyBasis(basis), efficiency))
                       .exit(totalState(air, T2, p2, W2));
    QVERIFY2(relNear(r.exit.temperature, T3, 1e-12), describe("Tt3", r.exit.temperature, T3));
    QVERIFY(relNear(r.exit.pressure, pressureRatio * p2, 1e-15));
    QVERIFY(relNear(r.specificWork, cp * (T3 - T2), 1e-11));
    QVERIFY(relNear(r.power, W2 * cp * (T3 - T2), 1e-11));
    QVERIFY2(relNear(r.efficiency.isentropic, eta, 1e-11), describe("eta_c", r.efficiency.isentropic, eta));
    QVERIFY2(relNear(r.efficiency.polytropic, e, 1e-11), describe("e_c", r.efficiency.polytropic, e));
    // Second law: a lossy compression generates entropy.
    QVERIFY(entropyRise(totalState(air, T2, p2, W2), r.exit) > 1e-6 * cp);
  }

  // Thermally perfect air, independent of the efficiency formulas: a compression in N small steps,
  // each at isentropic efficiency e, tends to the polytropic compression of efficiency e as
  // N -> infinity ([S] ch. 2: the polytropic efficiency is the small-stage efficiency). The gap
  // falls like 1/N (the stage efficiency differs from e by O(ln of the stage ratio)).
  void polytropicIsTheSmallStageLimit_data() {
    QTest::addColumn<double>("pressureRatio");
    QTest::newRow("compression 20") << 20.0;
    QTest::newRow("expansion 1/8") << 0.125;
  }
  void polytropicIsTheSmallStageLimit() {
    QFETCH(double, pressureRatio);
    const auto air = thermallyPerfectAir();
    const double T1 = pressureRatio > 1.0 ? 288.15 : 1500.0, p1 = 101325.0 * 8.0, e = 0.88;
    auto staged = [&](int n) {
      double T = T1, p = p1;
      const double stage = std::pow(pressureRatio, 1.0 / n);
      for (int i = 0; i < n; ++i, p *= stage)
        T = components::exitTemperature(*air, T, p, p * stage, EfficiencyBasis::Isentropic, e);
      return T;
    };
    const double polytropic =
        components::exitTemperature(*air, T1, p1, p1 * pressureRatio, EfficiencyBasis::Polytropic, e);
    const double span = std::abs(polytropic - T1);
    const double gap400 = std::abs(staged(400) - polytropic) / span;
    const double gap1600 = std::abs(staged(1600) - polytropic) / span;
    QVERIFY2(gap1600 < 1e-4, describe("gap at 1600 steps", gap1600, 0.0));
    QVERIFY2(gap1600 > 0.2 * gap400 && gap1600 < 0.3 * gap400, describe("gap ratio", gap1600 / gap400, 0.25));
    // And the derived polytropic efficiency of the staged change tends to e with it.
    const auto pair = components::efficiencies(*air, T1, p1, staged(1600), p1 * pressureRatio);
    QVERIFY2(std::abs(pair.polytropic - e) < 1e-4, describe("e of the staged change", pair.polytropic, e));
  }

  // Thermally perfect air: the derived efficiency fed back on its own basis reproduces the exit
  // temperature (both bases describe one change; common practice, no source).
  void derivedEfficiencyReproducesTheExit_data() {
    QTest::addColumn<double>("pressureRatio");
    QTest::addColumn<int>("basis");
    for (double pi : {1.2, 6.0, 40.0}) {
      QTest::addRow("pi %g isentropic", pi) << pi << int(EfficiencyBasis::Isentropic);
      QTest::addRow("pi %g polytropic", pi) << pi << int(EfficiencyBasis::Polytropic);
    }
  }
  void derivedEfficiencyReproducesTheExit() {
    QFETCH(double, pressureRatio);
    QFETCH(int, basis);
    const auto air = thermallyPerfectAir();
    const auto given = EfficiencyBasis(basis);
    const auto r = components::Compressor(compressorInputs(pressureRatio, given, 0.86))
                       .exit(totalState(air, 288.15, 101325.0, 10.0));
    const auto other =
        given == EfficiencyBasis::Isentropic ? EfficiencyBasis::Polytropic : EfficiencyBasis::Isentropic;
    const double derived =
        given == EfficiencyBasis::Isentropic ? r.efficiency.polytropic : r.efficiency.isentropic;
    const double back =
        components::exitTemperature(*air, 288.15, 101325.0, 101325.0 * pressureRatio, other, derived);
    QVERIFY2(relNear(back, r.exit.temperature, 1e-9),
             describe("Tt3 from the derived efficiency", back, r.exit.temperature));
    // Compression: the polytropic efficiency is above the isentropic one ([M] sec. 4.3).
    QVERIFY(r.efficiency.polytropic > r.efficiency.isentropic);
  }

  // Bleed beta taken at compressor exit after full compression [W] sec. 5.2.3:
  // W3 = (1 - beta) W2, bleed = beta W2, P_c = W2 (ht3 - ht2).
  void compressorBleed() {
    const auto air = constantCp(1004.0, 1.4);
    const double beta = 0.04, W2 = 25.0, T2 = 300.0;
    const TotalState t2 = totalState(air, T2, 1.0e5, W2);
    const auto r =
        components::Compressor(compressorInputs(8.0, EfficiencyBasis::Isentropic, 1.0, beta)).exit(t2);
    QVERIFY(relNear(r.exit.massFlow, (1.0 - beta) * W2, 1e-15));
    QVERIFY(relNear(r.bleedMassFlow, beta * W2, 1e-15));
    // Isentropic: Tt3 = Tt2 pi^((g-1)/g) [M] sec. 2.3; work on the whole entry flow.
    const double T3 = T2 * std::pow(8.0, 0.4 / 1.4);
    QVERIFY(relNear(r.exit.temperature, T3, 1e-12));
    QVERIFY(relNear(r.power, W2 * 1004.0 * (T3 - T2), 1e-11));
    QVERIFY(relNear(r.power, r.specificWork * W2, 1e-15));
    // The ideal compression generates no entropy.
    QVERIFY(std::abs(entropyRise(t2, r.exit)) < 1e-9 * 1004.0);
  }

  // ---- turbine -------------------------------------------------------------------------------

  // Shaft balance eta_m W4 (ht4 - ht5) = P_c + P_x ([M] eqs. 7.17, 7.27), so the specific work is
  // (P_c + P_x) / (eta_m W4) and, at constant cp, Tt5 = Tt4 - w / cp.
  void turbineWorkWithMechanicalEfficiencyAndOfftake() {
    const auto hot = constantCp(1239.0, 4.0 / 3.0);
    const double W4 = 20.4, T4 = 1600.0, Pc = 7.5e6, Px = 3.0e5, etaM = 0.985;
    const TotalState t4 = totalState(hot, T4, 1.6e6, W4, 0.02);
    const auto r =
        components::Turbine(turbineInputs(EfficiencyBasis::Polytropic, 0.9, etaM, Px)).exit(t4, Pc);
    const double w = (Pc + Px) / (etaM * W4);
    QVERIFY(relNear(r.specificWork, w, 1e-15));
    QVERIFY(relNear(r.power, W4 * w, 1e-15));
    QVERIFY(relNear(etaM * r.power, Pc + Px, 1e-14));
    QVERIFY2(relNear(r.exit.temperature, T4 - w / 1239.0, 1e-13),
             describe("Tt5", r.exit.temperature, T4 - w / 1239.0));
    QVERIFY(relNear(r.exit.enthalpy, t4.enthalpy - w, 1e-15));
    QCOMPARE(r.exit.massFlow, W4);
    QCOMPARE(r.exit.fuelAirRatio, 0.02);
  }

  // Constant cp, [M] eq. 4.10 (from memory): polytropic pi_t = tau_t^(g/((g-1) e_t)); isentropic
  // tau_ts = 1 - (1 - tau_t)/eta_t and pi_t = tau_ts^(g/(g-1)); between them
  //   eta_t = (1 - tau_t) / (1 - tau_t^(1/e_t))
  // and, solved for e_t (derived here: tau_ts = pi_t^((g-1)/g) = tau_t^(1/e_t)), e_t = ln tau_t / ln tau_ts.
  // The exit pressure, found through s°, is independent of the code's derived-efficiency forms.
  void turbineEfficiencyClosedForms_data() {
    QTest::addColumn<double>("tau");
    QTest::addColumn<int>("basis");
    for (double tau : {0.97, 0.85, 0.7, 0.55}) {
      QTest::addRow("tau %g, e_t 0.9", tau) << tau << int(EfficiencyBasis::Polytropic);
      QTest::addRow("tau %g, eta_t 0.9", tau) << tau << int(EfficiencyBasis::Isentropic);
    }
  }
  void turbineEfficiencyClosedForms() {
    QFETCH(double, tau);
    QFETCH(int, basis);
    const double g = 4.0 / 3.0, cp = 1239.0, T4 = 1500.0, p4 = 1.5e6, W4 = 20.0, given = 0.9;
    const auto hot = constantCp(cp, g);
    const double work = W4 * cp * T4 * (1.0 - tau);  // compressor power that sets tau_t
    const auto r = components::Turbine(turbineInputs(EfficiencyBasis(basis), given))
                       .exit(totalState(hot, T4, p4, W4), work);
    const bool polytropic = EfficiencyBasis(basis) == EfficiencyBasis::Polytropic;
    const double tauS = polytropic ? std::pow(tau, 1.0 / given) : 1.0 - (1.0 - tau) / given;
    const double eta = polytropic ? (1.0 - tau) / (1.0 - tauS) : given;
    const double e = polytropic ? given : std::log(tau) / std::log(tauS);
    const double p5 = p4 * std::pow(tauS, g / (g - 1.0));
    QVERIFY(relNear(r.exit.temperature, tau * T4, 1e-12));
    QVERIFY2(relNear(r.exit.pressure, p5, 1e-11), describe("pt5", r.exit.pressure, p5));
    QVERIFY2(relNear(r.efficiency.isentropic, eta, 1e-11), describe("eta_t", r.efficiency.isentropic, eta));
    QVERIFY2(relNear(r.efficiency.polytropic, e, 1e-11), describe("e_t", r.efficiency.polytropic, e));
    // Expansion: the isentropic efficiency is above the polytropic one ([M] sec. 4.3).
    QVERIFY(r.efficiency.isentropic > r.efficiency.polytropic);
    QVERIFY(entropyRise(totalState(hot, T4, p4, W4), r.exit) > 1e-6 * cp);
  }

  // More work than the gas holds: the turbine cannot drive the compressor (turbine.h).
  void turbineAskedForTooMuchWorkHasNoSolution() {
    const auto hot = constantCp(1239.0, 4.0 / 3.0);
    const TotalState t4 = totalState(hot, 1200.0, 1.0e6, 20.0);
    const double everything = 20.0 * 1239.0 * (1200.0 - 1.0);  // down to the gas's 1 K floor
    const std::string m = noSolutionMessage([&] {
      components::Turbine(turbineInputs(EfficiencyBasis::Isentropic, 0.9)).exit(t4, 1.01 * everything);
    });
    QVERIFY2(m.find("cannot drive the compressor") != std::string::npos, m.c_str());
    // Also on thermally perfect products, whose data end at 100 K.
    const thermo::ThermallyPerfectModel model(thermo::HydrocarbonFuel::keroseneLike());
    const auto products = model.products(0.02);
    const TotalState hotProducts = totalState(products, 1400.0, 1.0e6, 20.0, 0.02);
    const double tooMuch = 1.01 * 20.0 * (products->enthalpy(1400.0) - products->enthalpy(100.0));
    const std::string tp = noSolutionMessage([&] {
      components::Turbine(turbineInputs(EfficiencyBasis::Polytropic, 0.9)).exit(hotProducts, tooMuch);
    });
    QVERIFY2(tp.find("cannot drive the compressor") != std::string::npos, tp.c_str());
  }

  // ---- burner and afterburner -----------------------------------------------------------------

  // [M] eq. 7.9 with the sign conventions of calorically_perfect_model.h (h = cp T from 0 K,
  // h_fuel = LHV = h_PR, so the fuel term h_fuel - (1 - eta_b) LHV is eta_b h_PR):
  //   (1 + f) cp_t Tt4 = cp_c Tt3 + eta_b f h_PR  =>  f = (cp_t Tt4 - cp_c Tt3) / (eta_b h_PR - cp_t Tt4)
  // and with the fuel's mass neglected, cp_t Tt4 = cp_c Tt3 + eta_b f h_PR
  //   =>  f = (cp_t Tt4 - cp_c Tt3) / (eta_b h_PR)   (derived here, the same balance without 1 + f).
  void burnerEnergyBalance_data() {
    QTest::addColumn<bool>("twoGamma");
    QTest::addColumn<bool>("neglectFuelMass");
    QTest::addColumn<double>("efficiency");
    for (bool twoGamma : {false, true})
      for (bool neglect : {false, true})
        for (double eta : {1.0, 0.97})
          QTest::addRow("%s%s, eta_b %g", twoGamma ? "two-gamma" : "constant-cp",
                        neglect ? ", fuel mass neglected" : "", eta)
              << twoGamma << neglect << eta;
  }
  void burnerEnergyBalance() {
    QFETCH(bool, twoGamma);
    QFETCH(bool, neglectFuelMass);
    QFETCH(double, efficiency);
    const auto model = caloricallyPerfect(twoGamma, neglectFuelMass);
    const double cpc = 1004.0, cpt = twoGamma ? 1239.0 : 1004.0, hPR = 42.8e6;
    const double T3 = 700.0, T4 = 1650.0, p3 = 2.0e6, W3 = 30.0, loss = 0.04;
    const TotalState t3 = totalState(model->air(), T3, p3, W3);
    const components::HeatAddition burner("burner", *model, loss, efficiency);
    const auto r = burner.toExitTemperature(t3, T4);
    const double f = neglectFuelMass ? (cpt * T4 - cpc * T3) / (efficiency * hPR)
                                     : (cpt * T4 - cpc * T3) / (efficiency * hPR - cpt * T4);
    QVERIFY2(relNear(r.addedFuelAirRatio, f, 1e-12), describe("f", r.addedFuelAirRatio, f));
    QVERIFY(relNear(r.fuelMassFlow, f * W3, 1e-12));
    QVERIFY(relNear(r.exit.massFlow, neglectFuelMass ? W3 : W3 * (1.0 + f), 1e-14));
    QCOMPARE(r.exit.temperature, T4);
    QVERIFY(relNear(r.exit.enthalpy, cpt * T4, 1e-15));
    QVERIFY(relNear(r.exit.fuelAirRatio, f, 1e-12));
    QVERIFY(relNear(r.exit.pressure, p3 * (1.0 - loss), 1e-15));  // pt4 = pt3 (1 - dp/p)
    // The product gas (cp_t, gamma_t), its entropy scale joined to the air's at the burner entry
    // (thermo/gas_model.h): the entropy rise is that of heating and pressure loss on the product
    // gas, cp_t ln(Tt4/Tt3) - R_t ln(pt4/pt3) (Gibbs relation of a calorically perfect gas).
    const double gammaT = twoGamma ? 4.0 / 3.0 : 1.4, Rt = cpt * (gammaT - 1.0) / gammaT;
    QVERIFY(relNear(r.exit.gas->cp(T4), cpt, 1e-15));
    QVERIFY(relNear(r.exit.gas->gamma(T4), gammaT, 1e-15));
    const double rise = r.exit.gas->entropy(T4, r.exit.pressure) - t3.gas->entropy(T3, p3);
    QVERIFY2(std::abs(rise - (cpt * std::log(T4 / T3) - Rt * std::log(1.0 - loss))) < 1e-9 * cpt,
             describe("s4 - s3", rise, cpt * std::log(T4 / T3) - Rt * std::log(1.0 - loss)));
  }

  // Given f, the same balance solved for Tt4 (derived here from eq. 7.9):
  //   Tt4 = (cp_c Tt3 + eta_b f h_PR) / ((1 + f) cp_t);
  // and the given-temperature mode at that Tt4 gives the same f back.
  void givenFuelAirRatioAgreesWithGivenTemperature() {
    const auto model = caloricallyPerfect(true, false);
    const double f = 0.025, eta = 0.985, T3 = 800.0;
    const TotalState t3 = totalState(model->air(), T3, 3.0e6, 25.0);
    const components::HeatAddition burner("burner", *model, 0.05, eta);
    const auto byRatio = burner.withFuelAirRatio(t3, f);
    const double T4 = (1004.0 * T3 + eta * f * 42.8e6) / ((1.0 + f) * 1239.0);
    QVERIFY2(relNear(byRatio.exit.temperature, T4, 1e-12), describe("Tt4", byRatio.exit.temperature, T4));
    const auto byTemperature = burner.toExitTemperature(t3, T4);
    QVERIFY(relNear(byTemperature.addedFuelAirRatio, f, 1e-11));
    QVERIFY(relNear(byTemperature.exit.massFlow, byRatio.exit.massFlow, 1e-12));
    QVERIFY(relNear(byRatio.exit.pressure, 0.95 * 3.0e6, 1e-15));
  }

  // An afterburner on a stream that already holds fuel f1, per unit of its air (the first law on the
  // control volume, derived here): (1 + f1) cp_t Tt6 + eta df h_PR = (1 + f1 + df) cp_t Tt7, so
  //   df = (1 + f1) cp_t (Tt7 - Tt6) / (eta h_PR - cp_t Tt7),  W7 = W6 (1 + f1 + df) / (1 + f1).
  void afterburnerOnAVitiatedStream() {
    const auto model = caloricallyPerfect(true, false);
    const double f1 = 0.02, T6 = 1000.0, T7 = 2000.0, eta = 0.95, cpt = 1239.0, W6 = 20.4;
    const TotalState t6 = totalState(model->products(f1), T6, 3.0e5, W6, f1);
    const auto r = components::HeatAddition("afterburner", *model, 0.05, eta).toExitTemperature(t6, T7);
    const double df = (1.0 + f1) * cpt * (T7 - T6) / (eta * 42.8e6 - cpt * T7);
    QVERIFY2(relNear(r.addedFuelAirRatio, df, 1e-12), describe("df", r.addedFuelAirRatio, df));
    QVERIFY(relNear(r.exit.fuelAirRatio, f1 + df, 1e-12));
    QVERIFY(relNear(r.exit.massFlow, W6 * (1.0 + f1 + df) / (1.0 + f1), 1e-13));
    QVERIFY(relNear(r.fuelMassFlow, df * W6 / (1.0 + f1), 1e-12));
  }

  // Thermally perfect burner: the products carry every atom of the air and the fuel
  // (conservation of atoms; the fuel C H_y brings 1/M_f mol of C and y/M_f of H per kg), and the
  // balance in sensible enthalpies holds: with the heating value defined as the enthalpy of
  // reaction at T0 = 298.15 K, h_a(T0) + f h_fuel(T0) - (1 + f) h_p(T0) = f LHV, the absolute
  // balance becomes (1 + f)(h_p(T4) - h_p(T0)) = h_a(T3) - h_a(T0) + eta_b f LHV (derived here;
  // fuel delivered at T0).
  void thermallyPerfectBurnerConservesAtomsAndEnergy() {
    const auto fuel = thermo::HydrocarbonFuel::keroseneLike();
    const thermo::ThermallyPerfectModel model(fuel, 0.01);
    const double T3 = 750.0, T4 = 1650.0, eta = 0.98, W3 = 30.0;
    const TotalState t3 = totalState(model.air(), T3, 2.5e6, W3);
    const auto r = components::HeatAddition("burner", model, 0.05, eta).toExitTemperature(t3, T4);
    const double f = r.addedFuelAirRatio;
    QVERIFY(f > 0.0 && f < model.stoichiometricFuelAirRatio());
    const auto& air = dynamic_cast<const thermo::ThermallyPerfectGas&>(*model.air()).composition();
    const auto& products = dynamic_cast<const thermo::ThermallyPerfectGas&>(*r.exit.gas).composition();
    const double fuelMoles = f / fuel.molarMass();
    const double fromFuel[] = {fuelMoles, fuel.hydrogenCarbonRatio() * fuelMoles, 0.0, 0.0, 0.0};
    const char* elements[] = {"C", "H", "O", "N", "Ar"};
    for (int i = 0; i < 5; ++i) {
      const double in = air.elementMolesPerKilogram(elements[i]) + fromFuel[i];
      QVERIFY2(relNear((1.0 + f) * products.elementMolesPerKilogram(elements[i]), in, 1e-12), elements[i]);
    }
    const double t0 = 298.15;
    const double lhs = (1.0 + f) * (r.exit.gas->enthalpy(T4) - r.exit.gas->enthalpy(t0));
    const double rhs =
        model.air()->enthalpy(T3) - model.air()->enthalpy(t0) + eta * f * fuel.lowerHeatingValue();
    QVERIFY2(relNear(lhs, rhs, 1e-9), describe("sensible balance", lhs, rhs));
    QVERIFY(relNear(r.exit.massFlow, W3 * (1.0 + f), 1e-14));
  }

  // No more fuel than the oxygen can burn: a rich mixture has no solution (heat_addition.h).
  void stoichiometricLimitIsNoSolution() {
    const auto model = caloricallyPerfect(true, false);
    const TotalState t3 = totalState(model->air(), 700.0, 2.0e6, 30.0);
    const components::HeatAddition burner("burner", *model, 0.05, 0.99);
    // At f_st = 0.0676: Tt4 = (1004 x 700 + 0.99 x 0.0676 x 42.8e6) / (1.0676 x 1239) = 2707 K.
    const std::string hot = noSolutionMessage([&] { burner.toExitTemperature(t3, 3000.0); });
    QVERIFY2(hot.find("stoichiometric") != std::string::npos, hot.c_str());
    QVERIFY2(noSolutionMessage([&] { burner.withFuelAirRatio(t3, 0.07); }).find("stoichiometric") !=
                 std::string::npos,
             "given f above f_st");
    // Heat taken out: an exit colder than the entry (500 K against 700 K) is refused.
    QVERIFY(noSolutionMessage([&] { burner.toExitTemperature(t3, 500.0); }).find("not above the entry") !=
            std::string::npos);
    // Two-gamma: 720 K holds more energy as products (1239 x 720) than the air at 750 K (1004 x 750),
    // so the balance alone would "burn" fuel to a colder exit; a burner only heats.
    const TotalState warm = totalState(model->air(), 750.0, 2.0e6, 30.0);
    QVERIFY(noSolutionMessage([&] { burner.toExitTemperature(warm, 720.0); }).find("only heats") !=
            std::string::npos);
    QVERIFY(noSolutionMessage([&] { burner.withFuelAirRatio(warm, 0.001); }).find("only heats") !=
            std::string::npos);
    const TotalState spent = totalState(model->products(0.0676), 1500.0, 2.0e6, 30.0, 0.0676);
    QVERIFY(noSolutionMessage([&] { burner.toExitTemperature(spent, 1800.0); }).find("no oxygen") !=
            std::string::npos);
    // Thermally perfect: stoichiometric kerosene from 750 K reaches about 2600 K (complete
    // combustion, no dissociation; common practice, no source), so 3300 K is out of reach.
    const thermo::ThermallyPerfectModel tp(thermo::HydrocarbonFuel::keroseneLike());
    const TotalState air = totalState(tp.air(), 750.0, 2.0e6, 30.0);
    const std::string rich = noSolutionMessage(
        [&] { components::HeatAddition("burner", tp, 0.05, 1.0).toExitTemperature(air, 3300.0); });
    QVERIFY2(rich.find("stoichiometric") != std::string::npos, rich.c_str());
  }

  // ---- duct ----------------------------------------------------------------------------------

  // ht_out = ht_in, pt_out = pt_in (1 - dp/p) [W] sec. 5.11; the entropy rises by R ln(1/(1 - dp/p)) [G].
  void ductKeepsTotalEnthalpyAndLosesPressure() {
    const auto hot = constantCp(1239.0, 4.0 / 3.0);
    const TotalState in = totalState(hot, 900.0, 2.0e5, 20.4, 0.02);
    const TotalState out = components::Duct(0.03).exit(in);
    QVERIFY(relNear(out.pressure, 0.97 * in.pressure, 1e-15));
    QCOMPARE(out.enthalpy, in.enthalpy);
    QCOMPARE(out.temperature, in.temperature);
    QCOMPARE(out.massFlow, in.massFlow);
    QCOMPARE(out.fuelAirRatio, in.fuelAirRatio);
    QVERIFY(std::abs(entropyRise(in, out) - hot->gasConstant() * std::log(1.0 / 0.97)) < 1e-9 * 1239.0);
    QCOMPARE(components::Duct(0.0).exit(in).pressure, in.pressure);
  }

  // ---- derived efficiencies stay physical ------------------------------------------------------

  // The second law bounds both efficiencies by 1, and a unit efficiency on either basis is the
  // isentropic change (efficiency.h), so the other is exactly 1. Random constant-cp gases with
  // gamma in (1, 5/3] (half of them within 1e-6 to 1e-1 of 1, where the temperature change is
  // tiny), pressure ratios from 1.0001 to 60, both bases, compression and expansion, through the
  // compressor's route (change), the turbine's (expansion, then efficiencies) and the endpoint form.
  void derivedEfficienciesStayAtOrBelowOne() {
    std::mt19937 rng(20250611);
    auto uniform = [&](double a, double b) { return std::uniform_real_distribution<double>(a, b)(rng); };
    int checked = 0;
    for (int i = 0; i < 20000; ++i) {
      const double gamma = (i % 2) ? 1.0 + std::pow(10.0, uniform(-6.0, -1.0))
                                   : std::min(5.0 / 3.0, 1.0 + uniform(1e-9, 2.0 / 3.0));
      const ConstantCpGas gas(uniform(300.0, 5000.0), gamma, "random", (i % 3) ? 0.0 : 298.15);
      const bool compression = (i / 2) % 2 == 0;
      const auto basis = (i / 4) % 2 ? EfficiencyBasis::Isentropic : EfficiencyBasis::Polytropic;
      const double given = (i % 5 == 0) ? 1.0 : uniform(0.6, 1.0);
      const double ratio = std::exp(uniform(std::log(1.0001), std::log(60.0)));
      const double T1 = compression ? uniform(200.0, 350.0) : uniform(300.0, 2000.0);
      const double p1 = uniform(1e4, 4e6), p2 = compression ? p1 * ratio : p1 / ratio;
      const auto c = components::change(gas, T1, p1, p2, basis, given);
      QCOMPARE(basis == EfficiencyBasis::Isentropic ? c.efficiency.isentropic : c.efficiency.polytropic,
               given);
      std::vector<components::EfficiencyPair> pairs = {c.efficiency};
      pairs.push_back(components::efficiencies(gas, T1, p1, c.exitTemperature, p2));
      if (!compression) {
        const auto e = components::expansion(gas, T1, p1, c.exitTemperature, basis, given);
        pairs.push_back(e.isentropicTemperature
                            ? components::efficiencies(gas, T1, p1, c.exitTemperature, e.exitPressure,
                                                       *e.isentropicTemperature)
                            : components::efficiencies(gas, T1, p1, c.exitTemperature, e.exitPressure));
      }
      for (const auto& pair : pairs) {
        const QByteArray where = QByteArray("gamma ") + QByteArray::number(gamma, 'g', 17) + ", ratio " +
                                 QByteArray::number(ratio, 'g', 17) + (compression ? " up" : " down") +
                                 ", given " + QByteArray::number(given, 'g', 17) + ": eta " +
                                 QByteArray::number(pair.isentropic, 'g', 17) + ", e " +
                                 QByteArray::number(pair.polytropic, 'g', 17);
        for (double v : {pair.isentropic, pair.polytropic}) QVERIFY2(v > 0.0 && v <= 1.0 + 1e-12, where);
        if (given == 1.0) QVERIFY2(pair.isentropic == 1.0 && pair.polytropic == 1.0, where);
        ++checked;
      }
    }
    QVERIFY(checked > 40000);
  }
};

QTEST_APPLESS_MAIN(TestComponents)
#include "test_components.moc"
