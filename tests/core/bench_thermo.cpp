// Benchmarks of the thermally perfect gas: h(T) and T(h) of combustion products at f = 0.02.
// Each QBENCHMARK iteration makes 1000 calls, so "msecs per iteration" x 1000 = ns per call
// (goals: h(T) under 50 ns, T(h) under 300 ns). Run: build/tests/bench_thermo [-iterations N]
// [-callgrind]. Registered with CTest under the label "benchmark"; it also checks the results.
#include "thermo/combustion.h"
#include "thermo/fuel.h"
#include "thermo/mixture.h"
#include "thermo/thermally_perfect_gas.h"

#include <QTest>

#include <array>
#include <cmath>

using namespace cw::thermo;

namespace {

constexpr int kCalls = 1000;

const ThermallyPerfectGas& products() {
  static const ThermallyPerfectGas gas(
      completeCombustionProducts(dryAir(), HydrocarbonFuel::keroseneLike(), 0.02), "products, f = 0.02");
  return gas;
}

}  // namespace

class BenchThermo : public QObject {
  Q_OBJECT
 private slots:
  void enthalpyOfTemperature() {
    const Gas& gas = products();  // through the interface, as the components call it
    std::array<double, kCalls> t{};
    for (int i = 0; i < kCalls; ++i) t[i] = 250.0 + 2.5 * i;  // 250 to 2747.5 K
    double sum = 0.0;
    QBENCHMARK {
      for (double x : t) sum += gas.enthalpy(x);
    }
    QVERIFY(std::isfinite(sum));
  }

  void temperatureOfEnthalpy() {
    const Gas& gas = products();
    std::array<double, kCalls> h{};
    for (int i = 0; i < kCalls; ++i) h[i] = gas.enthalpy(250.0 + 2.5 * i);
    double sum = 0.0;
    QBENCHMARK {
      for (double x : h) sum += gas.temperatureFromEnthalpy(x);
    }
    QVERIFY(std::isfinite(sum));
    QVERIFY(std::abs(gas.temperatureFromEnthalpy(h[100]) - 500.0) <= 1e-10 * 500.0);
  }

  void temperatureOfEntropy() {
    const Gas& gas = products();
    std::array<double, kCalls> s{};
    for (int i = 0; i < kCalls; ++i) s[i] = gas.entropy(250.0 + 2.5 * i, 2.0e5);
    double sum = 0.0;
    QBENCHMARK {
      for (double x : s) sum += gas.temperatureFromEntropy(x, 2.0e5);
    }
    QVERIFY(std::isfinite(sum));
  }
};

QTEST_GUILESS_MAIN(BenchThermo)  // an application object, for -callgrind
#include "bench_thermo.moc"
