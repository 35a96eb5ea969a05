// The constant-cp gas and the two-gamma model.
//
// Sources:
//  [M] Mattingly, Elements of Propulsion: Gas Turbines and Rockets, AIAA, 2006, sec. 2.3
//      (calorically perfect gas: R = cp - cv, gamma = cp/cv, h = cp dT, ds = cp dT/T - R dp/p) and
//      ch. 7 (the two-gamma pair cp_c = 1004 J/(kg K), gamma_c = 1.4, cp_t = 1239 J/(kg K),
//      gamma_t = 4/3, the usual textbook values; from memory of the book).
//  [U] U.S. Standard Atmosphere, 1976, NOAA-S/T 76-1562: R* = 8.31432 J/(mol K), M0 = 28.9644
//      kg/kmol, and Table I, speed of sound 340.294 m/s at sea level (288.15 K); values from memory.
//  Identities (no source beyond their definitions): cp = dh/dT, ds°/dT = cp/T, T(h(T)) = T.
#include "common/error.h"
#include "thermo/constant_cp_gas.h"
#include "thermo/two_gamma_model.h"

#include <QTest>

#include <cmath>
#include <limits>
#include <string>

using cw::thermo::ConstantCpGas;
using cw::thermo::TwoGammaModel;

namespace {

bool relNear(double actual, double expected, double relative) {
  return std::abs(actual - expected) <= relative * std::abs(expected);
}

template <typename F>
std::string invalidMessage(F f) {
  try {
    f();
  } catch (const cw::InvalidInput& e) {
    return e.what();
  }
  return "(no InvalidInput)";
}

}  // namespace

class TestConstantCpGas : public QObject {
  Q_OBJECT
 private slots:
  void propertiesFollowTheCaloricallyPerfectModel() {
    const ConstantCpGas gas(1004.0, 1.4, "air");
    QCOMPARE(gas.description(), std::string("air"));
    // [M] R = cp - cv = cp (gamma - 1) / gamma; by hand 1004 x 0.4 / 1.4 = 401.6 / 1.4
    // = 286.857142857 J/(kg K); and gamma = cp / (cp - R) gives 1.4 back (Gas::gamma).
    QVERIFY(std::abs(gas.gasConstant() - 286.857142857) < 1e-9);
    QVERIFY(relNear(gas.gamma(500.0), 1.4, 1e-14));
    // A gas with air's cp and gamma has about air's molar mass: R_u / R = 8.314462618 / 286.857
    // = 28.985 kg/kmol against [U] M0 = 28.9644 kg/kmol (0.07 %; the textbook cp is rounded).
    QVERIFY(relNear(gas.molarMass(), 0.0289644, 1e-3));
    QCOMPARE(gas.cp(2000.0), 1004.0);
    // The references of h and s° (thermo/constant_cp_gas.h): both zero at 298.15 K.
    QCOMPARE(gas.enthalpy(298.15), 0.0);
    QCOMPARE(gas.standardEntropy(298.15), 0.0);
    // cp = dh/dT and ds°/dT = cp/T, by central differences of step d = 1e-5 T (h is linear in T, so
    // the first is exact to rounding; the second has a truncation error of (d/T)^2 / 3 = 3e-11 and a
    // rounding error of about eps |s°| / (2 d cp / T) = 1e-11).
    for (double t : {50.0, 298.15, 1234.5, 5000.0}) {
      const double d = 1e-5 * t;
      const double dhdt = (gas.enthalpy(t + d) - gas.enthalpy(t - d)) / (2.0 * d);
      const double dsdt = (gas.standardEntropy(t + d) - gas.standardEntropy(t - d)) / (2.0 * d);
      QVERIFY(relNear(dhdt, 1004.0, 1e-9));
      QVERIFY(relNear(dsdt, 1004.0 / t, 1e-8));
    }
    // [M] isentropic change: T2/T1 = (p2/p1)^((gamma-1)/gamma).
    QVERIFY(relNear(gas.isentropicTemperature(300.0, 1e5, 2e6), 300.0 * std::pow(20.0, 0.4 / 1.4), 1e-9));
    // Speed of sound against [U] Table I: 340.294 m/s at 288.15 K for R = R*/M0 = 287.0531 J/(kg K),
    // gamma = 1.4, i.e. cp = 3.5 R = 1004.686 J/(kg K).
    const ConstantCpGas ussa(3.5 * 8.31432 / 28.9644e-3, 1.4, "air, U.S. Standard Atmosphere constants");
    QVERIFY(std::abs(ussa.speedOfSound(288.15) - 340.294) <= 1e-3);
  }

  void enthalpyReferenceCanBeZeroKelvin() {
    // h = cp T, the 0 K convention of parametric cycle analysis ([M] ch. 5 and 7). A reference is an
    // additive constant: against the 298.15 K one, h moves by cp x 298.15 K = 299342.6 J/kg (by
    // hand) at every temperature, and cp, h differences, s° and T(h(T)) = T are unchanged.
    const ConstantCpGas gas(1004.0, 1.4, "air", 0.0);
    const ConstantCpGas standard(1004.0, 1.4, "air");
    for (double t : {1.0, 300.0, 1500.0, 10000.0}) {
      QVERIFY(std::abs(gas.enthalpy(t) - standard.enthalpy(t) - 299342.6) < 1e-6);
      QCOMPARE(gas.standardEntropy(t), standard.standardEntropy(t));
      QVERIFY(relNear(gas.temperatureFromEnthalpy(gas.enthalpy(t)), t, 1e-15));
    }
    QCOMPARE(gas.standardEntropy(298.15), 0.0);  // the entropy reference stays at 298.15 K
    TwoGammaModel model;
    model.enthalpyReferenceTemperature = 0.0;
    // On the 0 K reference h(T) / T is the same at every temperature (h(0) = 0), and it is cp_t.
    const auto hot = model.hotGas();
    QVERIFY(relNear(hot->enthalpy(2000.0) / 2000.0, hot->enthalpy(300.0) / 300.0, 1e-15));
    QVERIFY(relNear((hot->enthalpy(1000.5) - hot->enthalpy(999.5)) / 1.0, 1239.0, 1e-9));
    model.enthalpyReferenceTemperature = -1.0;
    QCOMPARE(invalidMessage([&] { model.validate(); }),
             std::string("enthalpy reference temperature = -1 K is outside the valid range [0, 10000] K"));
  }

  void sensibleEnthalpyIsCpTimesTheRiseAboveTheReference() {
    // Closed form of the calorically perfect gas ([M] sec. 2.3): h(T) - h(298.15 K) = cp (T - 298.15 K),
    // whichever temperature the model measures h from. By hand: 1004 x (1000 - 298.15) = 704657.4 J/kg,
    // 1239 x (1600 - 298.15) = 1612992.15 J/kg.
    const ConstantCpGas zeroKelvin(1004.0, 1.4, "air", 0.0);
    const ConstantCpGas standard(1004.0, 1.4, "air");
    for (const ConstantCpGas* gas : {&zeroKelvin, &standard}) {
      QVERIFY(std::abs(gas->sensibleEnthalpy(1000.0) - 704657.4) < 1e-6);
      QCOMPARE(gas->sensibleEnthalpy(298.15), 0.0);
      QVERIFY(std::abs(gas->sensibleEnthalpy(200.0) - 1004.0 * (200.0 - 298.15)) < 1e-9);
      // The same as the base definition h(T) - h(298.15 K).
      QVERIFY(std::abs(gas->sensibleEnthalpy(1234.5) - (gas->enthalpy(1234.5) - gas->enthalpy(298.15))) <
              1e-6);
    }
    TwoGammaModel model;
    model.enthalpyReferenceTemperature = 0.0;
    QVERIFY(std::abs(model.hotGas()->sensibleEnthalpy(1600.0) - 1612992.15) < 1e-6);
    QVERIFY(std::abs(model.coldGas()->sensibleEnthalpy(1000.0) - 704657.4) < 1e-6);
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, standard.sensibleEnthalpy(0.5));
  }

  void constructorValidates() {
    QCOMPARE(invalidMessage([] { ConstantCpGas(0.0, 1.4); }),
             std::string("cp = 0 J/(kg K) is outside the valid range (0, inf) J/(kg K)"));
    QCOMPARE(invalidMessage([] { ConstantCpGas(1004.0, 1.0); }),
             std::string("gamma = 1 is outside the valid range (1, 5/3]"));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput,
                             ConstantCpGas(1004.0, std::numeric_limits<double>::quiet_NaN()));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, ConstantCpGas(1004.0, 1.67));
    const ConstantCpGas monatomic(520.0, 5.0 / 3.0);             // the upper limit is accepted
    QVERIFY(relNear(monatomic.gamma(300.0), 5.0 / 3.0, 1e-14));  // cp / (cp - R) from its R
  }

  void temperaturesOutsideTheRangeThrow() {
    const ConstantCpGas gas(1004.0, 1.4);
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.enthalpy(0.5));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.standardEntropy(10001.0));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.cp(std::numeric_limits<double>::infinity()));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.temperatureFromEntropy(1e6, 1e5));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, gas.temperatureFromEntropy(0.0, -1.0));
  }

  void twoGammaDefaultsAndValidation() {
    const TwoGammaModel model;
    // [M] the usual textbook pair.
    QCOMPARE(model.coldCp, 1004.0);
    QCOMPARE(model.coldGamma, 1.4);
    QCOMPARE(model.hotCp, 1239.0);
    QCOMPARE(model.hotGamma, 4.0 / 3.0);
    const auto cold = model.coldGas();
    const auto hot = model.hotGas();
    QVERIFY(relNear(cold->gamma(300.0), 1.4, 1e-14));
    QVERIFY(relNear(hot->gamma(1500.0), 4.0 / 3.0, 1e-14));
    // R = cp (g-1)/g = cp/4 at g = 4/3: by hand 1239 / 4 = 309.75 J/(kg K).
    QVERIFY(std::abs(hot->gasConstant() - 309.75) < 1e-11);
    TwoGammaModel bad;
    bad.hotGamma = 0.9;
    QCOMPARE(invalidMessage([&] { bad.validate(); }),
             std::string("hot gamma = 0.9 is outside the valid range (1, 5/3]"));
    bad = TwoGammaModel{};
    bad.coldCp = -1.0;
    QCOMPARE(invalidMessage([&] { bad.coldGas(); }),
             std::string("cold cp = -1 J/(kg K) is outside the valid range (0, inf) J/(kg K)"));
  }
};

QTEST_APPLESS_MAIN(TestConstantCpGas)
#include "test_constant_cp_gas.moc"
