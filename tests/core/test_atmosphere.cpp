// U.S. Standard Atmosphere 1976 against its published tables.
//
// Sources:
//  [T1] U.S. Standard Atmosphere, 1976, NOAA-S/T 76-1562 (NOAA, NASA, USAF, 1976), Table I
//       (geometric altitude, metric units). Values from memory of Table I; the tolerance is one
//       unit in the last tabulated digit (the table's rounding plus its own arithmetic).
//  [T4] Same document, Table 4 and sec. 1.3: the layer-base geopotential altitudes, lapse rates and
//       base pressures (values from memory of NOAA-S/T 76-1562).
//  [E18] Same document, eq. 18: H = r0 Z / (r0 + Z), r0 = 6 356 766 m (closed form).
#include "atmosphere/standard_atmosphere.h"
#include "common/error.h"

#include <QTest>

#include <cmath>
#include <limits>
#include <string>
#include <utility>

using cw::atmosphere::AtmosphereState;
using cw::atmosphere::StandardAtmosphere;

namespace {

bool near(double actual, double expected, double tolerance) {
  return std::abs(actual - expected) <= tolerance;
}

QByteArray describe(const char* what, double z, double actual, double expected, double tolerance) {
  return QByteArray(what) + " at " + QByteArray::number(z) + " m: got " +
         QByteArray::number(actual, 'g', 10) + ", table " + QByteArray::number(expected, 'g', 10) + " +/- " +
         QByteArray::number(tolerance, 'g', 3);
}

template <typename F>
std::string messageOf(F f) {
  try {
    f();
  } catch (const cw::InvalidInput& e) {
    return e.what();
  }
  return "(no exception)";
}

}  // namespace

class TestAtmosphere : public QObject {
  Q_OBJECT
 private slots:
  void tableOneGeometric_data() {
    QTest::addColumn<double>("z");
    QTest::addColumn<double>("T");
    QTest::addColumn<double>("tolT");
    QTest::addColumn<double>("p");
    QTest::addColumn<double>("tolP");
    QTest::addColumn<double>("rho");
    QTest::addColumn<double>("tolRho");
    QTest::addColumn<double>("a");
    QTest::addColumn<double>("tolA");
    QTest::addColumn<double>("mu");
    QTest::addColumn<double>("tolMu");
    // [T1] Z (m): T (K), p (Pa), rho (kg/m^3), Cs (m/s), mu (kg/(m s)); tolerance one unit in the last digit.
    QTest::newRow("Z = 0 m") << 0.0 << 288.150 << 1e-3 << 1.01325e5 << 1.0 << 1.2250 << 1e-4 << 340.294
                             << 1e-3 << 1.7894e-5 << 1e-9;
    QTest::newRow("Z = 1000 m") << 1000.0 << 281.651 << 1e-3 << 8.9876e4 << 1.0 << 1.1117 << 1e-4 << 336.435
                                << 1e-3 << 1.7579e-5 << 1e-9;
    QTest::newRow("Z = 5000 m") << 5000.0 << 255.676 << 1e-3 << 5.4048e4 << 1.0 << 7.3643e-1 << 1e-5
                                << 320.545 << 1e-3 << 1.6282e-5 << 1e-9;
    QTest::newRow("Z = 11000 m") << 11000.0 << 216.774 << 1e-3 << 2.2700e4 << 1.0 << 3.6480e-1 << 1e-5
                                 << 295.154 << 1e-3 << 1.4223e-5 << 1e-9;
    QTest::newRow("Z = 15000 m") << 15000.0 << 216.650 << 1e-3 << 1.2111e4 << 1.0 << 1.9476e-1 << 1e-5
                                 << 295.070 << 1e-3 << 1.4216e-5 << 1e-9;
    QTest::newRow("Z = 20000 m") << 20000.0 << 216.650 << 1e-3 << 5.5293e3 << 0.1 << 8.8910e-2 << 1e-6
                                 << 295.070 << 1e-3 << 1.4216e-5 << 1e-9;
    QTest::newRow("Z = 32000 m") << 32000.0 << 228.490 << 1e-3 << 8.8906e2 << 0.01 << 1.3555e-2 << 1e-6
                                 << 303.025 << 1e-3 << 1.4859e-5 << 1e-9;
    QTest::newRow("Z = 50000 m") << 50000.0 << 270.650 << 1e-3 << 7.9779e1 << 1e-3 << 1.0269e-3 << 1e-7
                                 << 329.799 << 1e-3 << 1.7037e-5 << 1e-9;
    QTest::newRow("Z = 51000 m") << 51000.0 << 270.650 << 1e-3 << 7.0458e1 << 1e-3 << 9.0690e-4 << 1e-8
                                 << 329.799 << 1e-3 << 1.7037e-5 << 1e-9;
    QTest::newRow("Z = 71000 m") << 71000.0 << 216.846 << 1e-3 << 4.4796 << 1e-4 << 7.1965e-5 << 1e-9
                                 << 295.203 << 1e-3 << 1.4227e-5 << 1e-9;
    QTest::newRow("Z = 80000 m") << 80000.0 << 198.639 << 1e-3 << 1.0524 << 1e-4 << 1.8458e-5 << 1e-9
                                 << 282.538 << 1e-3 << 1.3208e-5 << 1e-9;
    // At 86 km Table I prints fewer digits; T includes the molecular-weight ratio M/M0 = 0.999579.
    QTest::newRow("Z = 86000 m") << 86000.0 << 186.87 << 1e-2 << 3.7338e-1 << 1e-5 << 6.958e-6 << 1e-9
                                 << 274.10 << 1e-2 << 1.2529e-5 << 1e-9;
  }
  void tableOneGeometric() {
    QFETCH(double, z);
    const AtmosphereState s = StandardAtmosphere().atGeometricAltitude(z);
    QFETCH(double, T);
    QFETCH(double, tolT);
    QVERIFY2(near(s.temperature, T, tolT), describe("T", z, s.temperature, T, tolT));
    QFETCH(double, p);
    QFETCH(double, tolP);
    QVERIFY2(near(s.pressure, p, tolP), describe("p", z, s.pressure, p, tolP));
    QFETCH(double, rho);
    QFETCH(double, tolRho);
    QVERIFY2(near(s.density, rho, tolRho), describe("rho", z, s.density, rho, tolRho));
    QFETCH(double, a);
    QFETCH(double, tolA);
    QVERIFY2(near(s.speedOfSound, a, tolA), describe("a", z, s.speedOfSound, a, tolA));
    QFETCH(double, mu);
    QFETCH(double, tolMu);
    QVERIFY2(near(s.dynamicViscosity, mu, tolMu), describe("mu", z, s.dynamicViscosity, mu, tolMu));
  }

  void layerBasePressures_data() {
    QTest::addColumn<double>("h");
    QTest::addColumn<double>("T");
    QTest::addColumn<double>("p");
    QTest::addColumn<double>("tolP");
    // [T4] H_b (m'), T_M,b (K), P_b (Pa) to the digits of the report; tolerance one unit in the last digit.
    QTest::newRow("H = 11 km") << 11000.0 << 216.65 << 22632.06 << 0.01;
    QTest::newRow("H = 20 km") << 20000.0 << 216.65 << 5474.889 << 1e-3;
    QTest::newRow("H = 32 km") << 32000.0 << 228.65 << 868.0187 << 1e-4;
    QTest::newRow("H = 47 km") << 47000.0 << 270.65 << 110.9063 << 1e-4;
    QTest::newRow("H = 51 km") << 51000.0 << 270.65 << 66.93887 << 1e-5;
    QTest::newRow("H = 71 km") << 71000.0 << 214.65 << 3.956420 << 1e-6;
  }
  void layerBasePressures() {
    QFETCH(double, h);
    QFETCH(double, T);
    QFETCH(double, p);
    QFETCH(double, tolP);
    const AtmosphereState s = StandardAtmosphere().atGeopotentialAltitude(h);
    QVERIFY2(near(s.temperature, T, 1e-9), describe("T", h, s.temperature, T, 1e-9));
    QVERIFY2(near(s.pressure, p, tolP), describe("p", h, s.pressure, p, tolP));
  }

  void geometricAndGeopotentialAltitudes() {
    // [E18] closed form; [T1] lists H = 4996, 9984, 10981 m' at Z = 5, 10, 11 km (whole metres).
    QVERIFY(near(StandardAtmosphere::geopotentialFromGeometric(5000.0), 4996.0, 0.5));
    QVERIFY(near(StandardAtmosphere::geopotentialFromGeometric(10000.0), 9984.0, 0.5));
    QVERIFY(near(StandardAtmosphere::geopotentialFromGeometric(11000.0), 10981.0, 0.5));
    // [T4] 86 km geometric is 84.852 km geopotential.
    QVERIFY(near(StandardAtmosphere::geopotentialFromGeometric(86000.0), 84852.0, 0.5));
    for (double z : {-5000.0, 0.0, 1234.5, 47000.0, 86000.0}) {
      const double h = StandardAtmosphere::geopotentialFromGeometric(z);
      QVERIFY(near(StandardAtmosphere::geometricFromGeopotential(h), z, 1e-9 * (1.0 + std::abs(z))));
      const StandardAtmosphere atmosphere;
      const AtmosphereState byZ = atmosphere.atGeometricAltitude(z);
      const AtmosphereState byH = atmosphere.atGeopotentialAltitude(h);
      QVERIFY(near(byZ.pressure, byH.pressure, 1e-12 * byH.pressure));
      QVERIFY(near(byZ.temperature, byH.temperature, 1e-9));
      QVERIFY(near(byZ.geopotentialAltitude, h, 1e-9 * (1.0 + std::abs(h))));
    }
  }

  void isaOffsetKeepsPressure() {
    // ISA + dT: T = T_std + dT at the standard pressure (the offset convention: common practice, no
    // source). Then the ideal-gas law at equal pressure scales the [T1] density by T_std / T and the
    // speed of sound by sqrt(T / T_std) (a = sqrt(gamma R T)); tolerance 2e-5, above the table's
    // rounding (five digits).
    struct Row {
      double z, t, rho, a;  // [T1] Z (m), T (K), rho (kg/m^3), Cs (m/s)
    };
    const Row rows[] = {{0.0, 288.150, 1.2250, 340.294},
                        {5000.0, 255.676, 7.3643e-1, 320.545},
                        {20000.0, 216.650, 8.8910e-2, 295.070}};
    const StandardAtmosphere standard, hot(15.0), cold(-30.0);
    for (const Row& row : rows) {
      const AtmosphereState s = standard.atGeometricAltitude(row.z);
      for (const auto* model : {&hot, &cold}) {
        const AtmosphereState o = model->atGeometricAltitude(row.z);
        const double t = row.t + model->temperatureOffset();
        QCOMPARE(o.pressure, s.pressure);
        QVERIFY(near(o.temperature, s.temperature + model->temperatureOffset(), 1e-12));
        QVERIFY2(near(o.density, row.rho * row.t / t, 2e-5 * o.density),
                 describe("rho", row.z, o.density, row.rho * row.t / t, 2e-5 * o.density));
        QVERIFY2(near(o.speedOfSound, row.a * std::sqrt(t / row.t), 2e-5 * o.speedOfSound),
                 describe("a", row.z, o.speedOfSound, row.a * std::sqrt(t / row.t), 2e-5 * o.speedOfSound));
      }
    }
  }

  void pressureFollowsTheHydrostaticEquation() {
    // The hydrostatic equation in geopotential altitude, dP/dH = -g0 rho ([T4], sec. 1.3, the
    // equation the layer formulas integrate; from memory), by central differences of 1 m' inside
    // each layer and 2 m' either side of each layer base: truncation (1 m / 6 km)^2 = 3e-8, rounding
    // eps P / 2 m below 1e-12. This holds however the layers are joined, unlike continuity at the
    // bases, which the construction of the bases guarantees.
    const StandardAtmosphere atmosphere;
    const double g0 = StandardAtmosphere::kStandardGravity;
    for (double base : {0.0, 11000.0, 20000.0, 32000.0, 47000.0, 51000.0, 71000.0}) {
      for (double h : {base - 2.0, base + 2.0, base + 2500.0}) {
        const double d = 1.0;
        const double slope = (atmosphere.atGeopotentialAltitude(h + d).pressure -
                              atmosphere.atGeopotentialAltitude(h - d).pressure) /
                             (2.0 * d);
        const double expected = -g0 * atmosphere.atGeopotentialAltitude(h).density;
        QVERIFY2(near(slope, expected, 1e-6 * std::abs(expected)),
                 describe("dP/dH", h, slope, expected, 1e-6));
      }
    }
    // Lapse rates of [T4], dT_M/dH in K/km', by differences inside each layer.
    const std::pair<double, double> lapse[] = {{5000.0, -6.5}, {15000.0, 0.0}, {25000.0, 1.0},
                                               {40000.0, 2.8}, {49000.0, 0.0}, {60000.0, -2.8},
                                               {75000.0, -2.0}};
    for (const auto& [h, rate] : lapse) {
      const double dT = atmosphere.atGeopotentialAltitude(h + 500.0).temperature -
                        atmosphere.atGeopotentialAltitude(h - 500.0).temperature;
      QVERIFY2(near(dT, rate, 1e-9), describe("dT/dH", h, dT, rate, 1e-9));
    }
    // Across 80 km geometric, where the molecular-weight ratio starts to fall below 1.
    const AtmosphereState a = atmosphere.atGeometricAltitude(79999.999);
    const AtmosphereState b = atmosphere.atGeometricAltitude(80000.001);
    QVERIFY(near(a.temperature, b.temperature, 1e-4));
  }

  void invalidInputsThrowNamingFieldValueAndRange() {
    const StandardAtmosphere atmosphere;
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, atmosphere.atGeometricAltitude(-5000.1));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, atmosphere.atGeometricAltitude(86000.1));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, atmosphere.atGeopotentialAltitude(84900.0));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, atmosphere.atGeopotentialAltitude(-5010.0));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput,
                             atmosphere.atGeometricAltitude(std::numeric_limits<double>::quiet_NaN()));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, StandardAtmosphere(100.5));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, StandardAtmosphere(-101.0));
    QCOMPARE(messageOf([&] { atmosphere.atGeometricAltitude(90000.0); }),
             std::string(
                 "geometric altitude = 90000 m is outside the valid range [-5000.0, 86000.0] m (geometric)"));
    QCOMPARE(messageOf([] { StandardAtmosphere(150.0); }),
             std::string("temperature offset = 150 K is outside the valid range [-100, 100] K"));
    const std::string h = messageOf([&] { atmosphere.atGeopotentialAltitude(90000.0); });
    QVERIFY2(
        h.find("geopotential altitude = 90000 m") == 0 && h.find("[-5003.9, 84852.0] m") != std::string::npos,
        h.c_str());
  }

  void extremesStayFinite() {
    for (double dT : {-100.0, 100.0}) {
      const StandardAtmosphere atmosphere(dT);
      for (double z : {-5000.0, 86000.0}) {
        const AtmosphereState s = atmosphere.atGeometricAltitude(z);
        for (double v : {s.temperature, s.pressure, s.density, s.speedOfSound, s.dynamicViscosity})
          QVERIFY(std::isfinite(v) && v > 0.0);
      }
    }
  }
};

QTEST_APPLESS_MAIN(TestAtmosphere)
#include "test_atmosphere.moc"
