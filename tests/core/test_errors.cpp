// The core's error messages name the input, the value and the valid range.
#include "common/error.h"

#include <QTest>

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
  void numbersRoundTripWithoutLocale() {
    QCOMPARE(cw::formatNumber(101325.0), std::string("101325"));
    QCOMPARE(cw::formatNumber(0.1), std::string("0.1"));
    QCOMPARE(cw::formatNumber(std::numeric_limits<double>::quiet_NaN()), std::string("NaN"));
    QCOMPARE(cw::formatNumber(-std::numeric_limits<double>::infinity()), std::string("-infinity"));
  }
};

QTEST_APPLESS_MAIN(TestErrors)
#include "test_errors.moc"
