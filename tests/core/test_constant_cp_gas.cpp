// The constant-cp gas and the two-gamma model.
//
// Sources:
//  [M] Mattingly, Elements of Propulsion: Gas Turbines and Rockets, AIAA, 2006, sec. 2.3
//      (calorically perfect gas: R = cp - cv, gamma = cp/cv, h = cp dT, ds = cp dT/T - R dp/p) and
//      ch. 7 (the two-gamma pair cp_c = 1004 J/(kg K), gamma_c = 1.4, cp_t = 1239 J/(kg K),
//      gamma_t = 4/3, the usual textbook values; from memory of the book).
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
    // [M] R = cp (gamma - 1) / gamma = 286.857... J/(kg K).
    QVERIFY(relNear(gas.gasConstant(), 1004.0 * 0.4 / 1.4, 1e-15));
    QVERIFY(relNear(gas.molarMass(), cw::thermo::kMolarGasConstant / gas.gasConstant(), 1e-15));
    QCOMPARE(gas.cp(2000.0), 1004.0);
    // [M] h = cp (T - 298.15 K); s° = cp ln(T / 298.15 K).
    QVERIFY(relNear(gas.enthalpy(1298.15), 1004.0 * 1000.0, 1e-14));
    QVERIFY(relNear(gas.standardEntropy(596.3), 1004.0 * std::log(2.0), 1e-14));
    // [M] isentropic change: T2/T1 = (p2/p1)^((gamma-1)/gamma).
    QVERIFY(relNear(gas.isentropicTemperature(300.0, 1e5, 2e6), 300.0 * std::pow(20.0, 0.4 / 1.4), 1e-9));
    // Speed of sound sqrt(gamma R T) (Gas::speedOfSound).
    QVERIFY(relNear(gas.speedOfSound(300.0), std::sqrt(1.4 * gas.gasConstant() * 300.0), 1e-14));
  }

  void enthalpyReferenceCanBeZeroKelvin() {
    // h = cp T, the 0 K convention of parametric cycle analysis ([M] ch. 5 and 7).
    const ConstantCpGas gas(1004.0, 1.4, "air", 0.0);
    QVERIFY(relNear(gas.enthalpy(300.0), 1004.0 * 300.0, 1e-15));
    QVERIFY(relNear(gas.temperatureFromEnthalpy(1004.0 * 1500.0), 1500.0, 1e-15));
    QCOMPARE(gas.standardEntropy(298.15), 0.0);  // the entropy reference stays at 298.15 K
    TwoGammaModel model;
    model.enthalpyReferenceTemperature = 0.0;
    QVERIFY(relNear(model.hotGas()->enthalpy(1000.0), 1239.0 * 1000.0, 1e-15));
    model.enthalpyReferenceTemperature = -1.0;
    QCOMPARE(invalidMessage([&] { model.validate(); }),
             std::string("enthalpy reference temperature = -1 K is outside the valid range [0, 10000] K"));
  }

  void constructorValidates() {
    QCOMPARE(invalidMessage([] { ConstantCpGas(0.0, 1.4); }),
             std::string("cp = 0 J/(kg K) is outside the valid range (0, inf) J/(kg K)"));
    QCOMPARE(invalidMessage([] { ConstantCpGas(1004.0, 1.0); }),
             std::string("gamma = 1 is outside the valid range (1, 5/3]"));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput,
                             ConstantCpGas(1004.0, std::numeric_limits<double>::quiet_NaN()));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, ConstantCpGas(1004.0, 1.67));
    const ConstantCpGas monatomic(520.0, 5.0 / 3.0);  // the upper limit is accepted
    QVERIFY(relNear(monatomic.constantGamma(), 5.0 / 3.0, 1e-15));
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
    QVERIFY(relNear(hot->gasConstant(), 1239.0 / 4.0, 1e-14));  // R = cp (g-1)/g = cp/4 at g = 4/3
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
