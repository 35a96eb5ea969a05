// The core's error messages name the input, the value and the valid range; each error carries
// the same parts (ErrorDetail: reason key, numbers in SI with their units, valid range) for a
// front end that writes its own message.
#include "common/error.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <QTest>

#include <cmath>
#include <limits>

class TestErrors : public QObject {
  Q_OBJECT
 private slots:
  void invalidInputNamesFieldValueAndRange() {
    const cw::InvalidInput e("compressor.pressure_ratio", 0.5, "", "[1, 100]");
    QCOMPARE(std::string(e.what()),
             std::string("compressor.pressure_ratio = 0.5 is outside the valid range [1, 100]"));
    QCOMPARE(e.where(), std::string("compressor.pressure_ratio"));
    QCOMPARE(e.code(), cw::ErrorCode::InvalidInput);
  }
  void outOfRangeCarriesUnit() {
    const cw::OutOfRange e("--temperature-K", 7000.0, "K", "[200, 6000] K");
    QCOMPARE(std::string(e.what()),
             std::string("--temperature-K = 7000 K is outside the valid range [200, 6000] K"));
    QCOMPARE(e.code(), cw::ErrorCode::OutOfRange);
  }
  void notConvergedAndNoSolution() {
    QCOMPARE(std::string(cw::NotConverged("T(h)", 50, 1e-3).what()),
             std::string("T(h): solver did not converge after 50 iterations (residual 0.001)"));
    QCOMPARE(std::string(cw::NoSolution("turbine", "the turbine cannot drive the compressor").what()),
             std::string("turbine: no solution: the turbine cannot drive the compressor"));
  }
  void rangeErrorsCarryTheirParts() {
    const cw::InvalidInput invalid("compressor.pressure_ratio", 0.5, "", "[1, 100]");
    QCOMPARE(invalid.detail().reason, std::string(cw::kReasonOutsideRange));
    QVERIFY(invalid.detail().subject.empty());
    QCOMPARE(invalid.detail().quantities, (std::vector<cw::ErrorQuantity>{{0.5, ""}}));
    QCOMPARE(invalid.detail().validRange, std::string("[1, 100]"));
    const cw::OutOfRange beyond("--temperature-K", 7000.0, "K", "[200, 6000] K");
    QCOMPARE(beyond.detail().quantities, (std::vector<cw::ErrorQuantity>{{7000.0, "K"}}));
    QCOMPARE(beyond.detail().validRange, std::string("[200, 6000] K"));
    // A message-only error has no parts unless given.
    QVERIFY(cw::InvalidInput("x", "not a number").detail().reason.empty());
  }
  void notConvergedCarriesIterationsAndResidual() {
    const cw::NotConverged e("T(h)", 50, 1e-3);
    QCOMPARE(e.detail().reason, std::string(cw::kReasonNotConverged));
    QCOMPARE(e.detail().quantities, (std::vector<cw::ErrorQuantity>{{50.0, ""}, {1e-3, ""}}));
  }
  void aCaseWithoutACycleSaysWhyInParts() {
    // The demo case (6000 m geopotential, standard day) with a turbine isentropic efficiency of
    // 0.3: the turbine takes so much pressure that none is left for a jet. The error gives its
    // reason key and both pressures; the ambient one is the U.S. Standard Atmosphere 1976 at
    // H = 6000 m: p = 101325 (1 - 0.0065 H / 288.15)^(g0 M0 / (R* 0.0065)) = 47181.03 Pa
    // (NOAA-S/T 76-1562, eq. 33a, constants of its table 2; worked out by hand).
    cw::engine::Case weak = cw::io::readCaseFile(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");
    weak.turbine.efficiency.value = 0.3;
    try {
      cw::engine::evaluateCase(weak);
      QFAIL("the weak turbine has a cycle");
    } catch (const cw::NoSolution& e) {
      QCOMPARE(e.where(), std::string("nozzle"));
      QCOMPARE(e.detail().reason, std::string(cw::kReasonNozzleNoJet));
      QCOMPARE(e.detail().quantities.size(), std::size_t(2));
      QCOMPARE(e.detail().quantities[0].unit, std::string("Pa"));
      QCOMPARE(e.detail().quantities[1].unit, std::string("Pa"));
      QVERIFY(std::fabs(e.detail().quantities[1].value - 47181.03) < 0.5);
      QVERIFY(e.detail().quantities[0].value < e.detail().quantities[1].value);
      QVERIFY(std::string(e.what()).find("no jet") != std::string::npos);  // the command line's text
    }
  }
  void numbersRoundTripWithoutLocale() {
    QCOMPARE(cw::formatNumber(101325.0), std::string("101325"));
    QCOMPARE(cw::formatNumber(0.1), std::string("0.1"));
    QCOMPARE(cw::formatNumber(std::numeric_limits<double>::quiet_NaN()), std::string("NaN"));
    QCOMPARE(cw::formatNumber(-std::numeric_limits<double>::infinity()), std::string("-infinity"));
  }
};

QTEST_APPLESS_MAIN(TestErrors)
#include "test_errors.moc"
