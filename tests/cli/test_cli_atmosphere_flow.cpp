// cyclewright-cli atmosphere and flow: keys, values and every bad input.
//
// Sources:
//  [T1] U.S. Standard Atmosphere, 1976, NOAA-S/T 76-1562, Table I (values from memory; tolerance one
//       unit in the last tabulated digit).
//  [N1] NACA Report 1135 (Ames Research Staff, 1953), Table I, gamma = 1.4; [N2] Table II (values from
//       memory, four significant digits; tolerance half a unit in the last digit).
#include "verbs.h"

#include <QJsonDocument>
#include <QJsonObject>
#include <QProcess>
#include <QTest>

#include "cli_run.h"

#include <cmath>
#include <sstream>
#include <string>
#include <vector>

namespace {

using Run = cw::test::CliRun;
Run run(const std::vector<std::string>& words) {
  return cw::test::runCli(words);
}
QJsonObject json(const Run& r) {
  return cw::test::jsonOf(r);
}

bool near(double actual, double expected, double tolerance) {
  return std::abs(actual - expected) <= tolerance;
}

}  // namespace

class TestCliAtmosphereFlow : public QObject {
  Q_OBJECT
 private slots:
  void atmosphereJsonHasTheKeysAndTableValues() {
    // [T1] Z = 11 000 m: T = 216.774 K, p = 2.2700E+4 Pa, rho = 3.6480E-1 kg/m^3, Cs = 295.154 m/s,
    // mu = 1.4223E-5 Pa s.
    const Run r = run({"atmosphere", "--altitude-m", "11000", "--geometric", "--format", "json"});
    QCOMPARE(r.status, 0);
    QVERIFY(r.err.empty());
    const QJsonObject o = json(r);
    for (const char* key : {"T_K", "p_Pa", "rho_kg_per_m3", "a_m_per_s", "mu_Pa_s", "geopotential_altitude_m",
                            "geometric_altitude_m", "isa_offset_K"})
      QVERIFY2(o.contains(key), key);
    QVERIFY(near(o["T_K"].toDouble(), 216.774, 1e-3));
    QVERIFY(near(o["p_Pa"].toDouble(), 2.2700e4, 1.0));
    QVERIFY(near(o["rho_kg_per_m3"].toDouble(), 3.6480e-1, 1e-5));
    QVERIFY(near(o["a_m_per_s"].toDouble(), 295.154, 1e-3));
    QVERIFY(near(o["mu_Pa_s"].toDouble(), 1.4223e-5, 1e-9));
    QVERIFY(near(o["geopotential_altitude_m"].toDouble(), 10981.0, 0.5));  // [T1] H column
  }

  void atmosphereDefaultsToGeopotentialAndText() {
    // NOAA-S/T 76-1562, Table 4: P_b = 22632.06 Pa at H = 11 km' (value from memory).
    const Run r = run({"atmosphere", "--altitude-m", "11000"});
    QCOMPARE(r.status, 0);
    QVERIFY(r.out.find("p_Pa") != std::string::npos);
    QVERIFY(r.out.find("22632.0") != std::string::npos);
    QVERIFY(r.out.find("T_K") != std::string::npos);
    // ISA + 10 K keeps the standard pressure.
    const QJsonObject hot =
        json(run({"atmosphere", "--altitude-m", "11000", "--isa-offset-K", "10", "--format", "json"}));
    QVERIFY(near(hot["p_Pa"].toDouble(), 22632.06, 0.01));
    QVERIFY(near(hot["T_K"].toDouble(), 226.65, 1e-9));
  }

  void flowJsonHasTheKeysAndTableValues() {
    // [N1] M = 2.0: p/pt = 0.1278, rho/rhot = 0.2300, T/Tt = 0.5556, A/A* = 1.688.
    // [N2] M1 = 2.0: M2 = 0.5774, p2/p1 = 4.500, T2/T1 = 1.6875 (exact, NACA Report 1135 eq. 95), pt2/pt1 =
    // 0.7209.
    const Run r = run({"flow", "--gamma", "1.4", "--mach", "2", "--normal-shock", "--format", "json"});
    QCOMPARE(r.status, 0);
    const QJsonObject o = json(r);
    QVERIFY(near(o["p_over_pt"].toDouble(), 0.1278, 5e-5));
    QVERIFY(near(o["rho_over_rhot"].toDouble(), 0.2300, 5e-5));
    QVERIFY(near(o["T_over_Tt"].toDouble(), 0.5556, 5e-5));
    QVERIFY(near(o["area_over_sonic_area"].toDouble(), 1.688, 5e-4));
    QVERIFY(near(o["mach_downstream"].toDouble(), 0.5774, 5e-5));
    QVERIFY(near(o["p2_over_p1"].toDouble(), 4.500, 5e-4));
    QVERIFY(near(o["T2_over_T1"].toDouble(), 1.6875, 1e-12));
    QVERIFY(near(o["pt2_over_pt1"].toDouble(), 0.7209, 5e-5));
  }

  void flowWithoutShockOmitsShockKeys() {
    // [N1] M = 0.5: p/pt = 0.8430, A/A* = 1.340.
    const Run r = run({"flow", "--gamma", "1.4", "--mach", "0.5", "--format", "json"});
    QCOMPARE(r.status, 0);
    const QJsonObject o = json(r);
    QVERIFY(near(o["p_over_pt"].toDouble(), 0.8430, 5e-5));
    QVERIFY(near(o["area_over_sonic_area"].toDouble(), 1.340, 5e-4));
    QVERIFY(!o.contains("mach_downstream"));
    // At M = 0 the area ratio is infinite and left out; the rest are exactly 1.
    const QJsonObject still = json(run({"flow", "--gamma", "1.4", "--mach", "0", "--format", "json"}));
    QVERIFY(!still.contains("area_over_sonic_area"));
    QCOMPARE(still["p_over_pt"].toDouble(), 1.0);
  }

  void badInputExitsTwoWithOneLine_data() {
    QTest::addColumn<QStringList>("words");
    QTest::addColumn<QString>("message");
    QTest::newRow("negative Mach") << QStringList{"flow", "--gamma", "1.4", "--mach", "-1"}
                                   << "cyclewright-cli flow: --mach = -1 is outside the valid range [0, 50]";
    QTest::newRow("Mach too high") << QStringList{"flow", "--gamma", "1.4", "--mach", "51"}
                                   << "cyclewright-cli flow: --mach = 51 is outside the valid range [0, 50]";
    QTest::newRow("gamma 1") << QStringList{"flow", "--gamma", "1", "--mach", "0.5"}
                             << "cyclewright-cli flow: --gamma = 1 is outside the valid range (1, 5/3]";
    QTest::newRow("gamma 0.9") << QStringList{"flow", "--gamma", "0.9", "--mach", "0.5"}
                               << "cyclewright-cli flow: --gamma = 0.9 is outside the valid range (1, 5/3]";
    QTest::newRow("subsonic shock")
        << QStringList{"flow", "--gamma", "1.4", "--mach", "0.8", "--normal-shock"}
        << "cyclewright-cli flow: --mach = 0.8 is outside the valid range [1, 50]";
    QTest::newRow("missing mach") << QStringList{"flow", "--gamma", "1.4"}
                                  << "cyclewright-cli flow: --mach: is required";
    QTest::newRow("missing gamma") << QStringList{"flow", "--mach", "2"}
                                   << "cyclewright-cli flow: --gamma: is required";
    QTest::newRow("mach not a number") << QStringList{"flow", "--gamma", "1.4", "--mach", "fast"}
                                       << "cyclewright-cli flow: --mach: expected a number, got \"fast\"";
    QTest::newRow("altitude too high") << QStringList{"atmosphere", "--altitude-m", "90000", "--geometric"}
                                       << "cyclewright-cli atmosphere: --altitude-m = 90000 m is outside the "
                                          "valid range [-5000.0, 86000.0] m "
                                          "(geometric)";
    QTest::newRow("altitude too low") << QStringList{"atmosphere", "--altitude-m", "-6000"}
                                      << "cyclewright-cli atmosphere: --altitude-m = -6000 m is outside the "
                                         "valid range [-5003.9, 84852.0] m "
                                         "(geopotential; -5 km to 86 km geometric)";
    QTest::newRow("geopotential above 84.852 km") << QStringList{"atmosphere", "--altitude-m", "85000"}
                                                  << "cyclewright-cli atmosphere: --altitude-m = 85000 m is "
                                                     "outside the valid range [-5003.9, 84852.0] m "
                                                     "(geopotential; -5 km to 86 km geometric)";
    QTest::newRow("offset too large")
        << QStringList{"atmosphere", "--altitude-m", "0", "--isa-offset-K", "150"}
        << "cyclewright-cli atmosphere: --isa-offset-K = 150 K is outside the valid range [-100, 100] K";
    QTest::newRow("missing altitude")
        << QStringList{"atmosphere"} << "cyclewright-cli atmosphere: --altitude-m: is required";
    QTest::newRow("bad format")
        << QStringList{"atmosphere", "--altitude-m", "0", "--format", "xml"}
        << "cyclewright-cli atmosphere: --format: expected one of text, json, csv, got \"xml\"";
  }
  void badInputExitsTwoWithOneLine() {
    QFETCH(QStringList, words);
    QFETCH(QString, message);
    std::vector<std::string> argv;
    for (const auto& w : words) argv.push_back(w.toStdString());
    const Run r = run(argv);
    QCOMPARE(r.status, 2);
    QVERIFY(r.out.empty());
    QCOMPARE(QString::fromStdString(r.err), message + "\n");
  }

  void binaryExitsTwoOnBadInput() {
    QProcess cli;
    cli.start(CYCLEWRIGHT_CLI_PATH, {"flow", "--gamma", "1.4", "--mach", "-1"});
    QVERIFY(cli.waitForFinished(10000));
    QCOMPARE(cli.exitCode(), 2);
    const QString err = QString::fromUtf8(cli.readAllStandardError());
    QCOMPARE(err.count('\n'), 1);
    QVERIFY(err.contains("--mach = -1 is outside the valid range [0, 50]"));
    QProcess ok;
    ok.start(CYCLEWRIGHT_CLI_PATH, {"atmosphere", "--altitude-m", "0", "--format", "json"});
    QVERIFY(ok.waitForFinished(10000));
    QCOMPARE(ok.exitCode(), 0);
    const QJsonObject o = QJsonDocument::fromJson(ok.readAllStandardOutput()).object();
    QVERIFY(near(o["rho_kg_per_m3"].toDouble(), 1.2250, 1e-4));  // [T1] Z = 0
  }

  void verbsAreListedInHelp() {
    const Run r = run({"--help"});
    QVERIFY(r.out.find("atmosphere") != std::string::npos);
    QVERIFY(r.out.find("flow") != std::string::npos);
  }
};

QTEST_APPLESS_MAIN(TestCliAtmosphereFlow)
#include "test_cli_atmosphere_flow.moc"
