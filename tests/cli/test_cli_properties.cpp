// cyclewright-cli properties: keys, values and every bad input (in-process and as a process).
//
// Sources:
//  [J] NIST-JANAF Thermochemical Tables, 4th ed., Chase, 1998 (values from memory of the tables):
//      N2 at 1000 K: cp = 32.697 J/(mol K), S° = 228.170 J/(mol K) (1 bar); CO2: Delta_f H°(298.15 K)
//      = -393.522 kJ/mol; Ar: cp = 20.786 J/(mol K). Tolerances as tests/core/test_species.cpp
//      (0.5 % in cp, 0.1 % in S°, 0.05 kJ/mol in h).
//  [K] kerosene-like fuel (H/C 1.9, LHV 43 MJ/kg): stoichiometric f about 0.068 (common practice, no source).
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

bool relNear(double actual, double expected, double relative) {
  return std::abs(actual - expected) <= relative * std::abs(expected);
}

int lines(const std::string& text) {
  int n = 0;
  for (char c : text) n += (c == '\n');
  return n;
}

}  // namespace

class TestCliProperties : public QObject {
  Q_OBJECT
 private slots:
  void nitrogenAt1000K() {
    const Run r = run({"properties", "--gas", "N2", "--temperature-K", "1000", "--pressure-Pa", "100000",
                       "--format", "json"});
    QCOMPARE(r.status, 0);
    QVERIFY(r.err.empty());
    const QJsonObject o = json(r);
    for (const char* key : {"cp_J_per_kg_K", "h_J_per_kg", "s_J_per_kg_K", "gamma", "R_J_per_kg_K",
                            "molar_mass_kg_per_mol", "T_K", "p_Pa"})
      QVERIFY2(o.contains(key) && o[key].isDouble(), key);
    const double m = 0.0280134;
    QCOMPARE(o["molar_mass_kg_per_mol"].toDouble(), m);
    QVERIFY(relNear(o["cp_J_per_kg_K"].toDouble(), 32.697 / m, 0.005));  // [J]
    QVERIFY(relNear(o["s_J_per_kg_K"].toDouble(), 228.170 / m, 0.001));  // [J], p = 1 bar
    QVERIFY(relNear(o["R_J_per_kg_K"].toDouble(), 8.314462618 / m, 1e-12));
    const double cp = o["cp_J_per_kg_K"].toDouble(), R = o["R_J_per_kg_K"].toDouble();
    QVERIFY(relNear(o["gamma"].toDouble(), cp / (cp - R), 1e-12));
  }

  void entropyFollowsThePressure() {
    // s(T, p) = s°(T) - R ln(p / 1 bar); the default pressure is 101325 Pa.
    const QJsonObject a =
        json(run({"properties", "--gas", "air", "--temperature-K", "500", "--format", "json"}));
    const QJsonObject b = json(run({"properties", "--gas", "air", "--temperature-K", "500", "--pressure-Pa",
                                    "1013250", "--format", "json"}));
    QCOMPARE(a["p_Pa"].toDouble(), 101325.0);
    const double R = a["R_J_per_kg_K"].toDouble();
    QVERIFY(std::abs(a["s_J_per_kg_K"].toDouble() - b["s_J_per_kg_K"].toDouble() - R * std::log(10.0)) <
            1e-9);
    QCOMPARE(a["h_J_per_kg"].toDouble(), b["h_J_per_kg"].toDouble());
  }

  void absoluteEnthalpyAndMonatomicGas() {
    const QJsonObject co2 =
        json(run({"properties", "--gas", "CO2", "--temperature-K", "298.15", "--format", "json"}));
    QVERIFY(std::abs(co2["h_J_per_kg"].toDouble() * 0.0440095 - (-393522.0)) <= 50.0);  // [J]
    const QJsonObject ar =
        json(run({"properties", "--gas", "Ar", "--temperature-K", "2000", "--format", "json"}));
    QVERIFY(relNear(ar["cp_J_per_kg_K"].toDouble(), 20.786 / 0.039948, 0.001));  // [J]
    QVERIFY(relNear(ar["gamma"].toDouble(), 5.0 / 3.0, 1e-6));                   // monatomic ideal gas
  }

  void productsWithFuel() {
    const Run r = run({"properties", "--gas", "products", "--temperature-K", "1500", "--fuel-air-ratio",
                       "0.02", "--format", "json"});
    QCOMPARE(r.status, 0);
    const QJsonObject o = json(r);
    QCOMPARE(o["fuel_air_ratio"].toDouble(), 0.02);
    QVERIFY(o["gamma"].toDouble() > 1.25 && o["gamma"].toDouble() < 1.35);
    // f = 0 gives the air itself.
    const QJsonObject p0 =
        json(run({"properties", "--gas", "products", "--temperature-K", "700", "--format", "json"}));
    const QJsonObject air =
        json(run({"properties", "--gas", "air", "--temperature-K", "700", "--format", "json"}));
    QVERIFY(relNear(p0["h_J_per_kg"].toDouble(), air["h_J_per_kg"].toDouble(), 1e-12));
    QVERIFY(relNear(p0["cp_J_per_kg_K"].toDouble(), air["cp_J_per_kg_K"].toDouble(), 1e-12));
  }

  void badInputExitsTwoWithOneLine_data() {
    QTest::addColumn<QStringList>("words");
    QTest::addColumn<QString>("expected");
    QTest::newRow("hot") << QStringList{"--gas", "N2", "--temperature-K", "7000"}
                         << "--temperature-K = 7000 K is outside the valid range [100, 6000] K";
    // Air reaches 100 K (the cold ranges of its species); NO keeps TM-4513's 200 K.
    QTest::newRow("cold") << QStringList{"--gas", "air", "--temperature-K", "90"}
                          << "--temperature-K = 90 K is outside the valid range [100, 6000] K";
    QTest::newRow("cold NO") << QStringList{"--gas", "NO", "--temperature-K", "150"}
                             << "--temperature-K = 150 K is outside the valid range [200, 6000] K";
    QTest::newRow("pressure zero") << QStringList{"--gas", "air",           "--temperature-K",
                                                  "300",   "--pressure-Pa", "0"}
                                   << "--pressure-Pa = 0 Pa is outside the valid range [0.001, 1e9] Pa";
    QTest::newRow("pressure negative")
        << QStringList{"--gas", "air", "--temperature-K", "300", "--pressure-Pa", "-5"}
        << "--pressure-Pa = -5 Pa is outside the valid range [0.001, 1e9] Pa";
    // 1e-320 Pa: p / p_ref underflows to zero and the entropy would be infinite (printed null).
    QTest::newRow("pressure subnormal")
        << QStringList{"--gas", "air", "--temperature-K", "300", "--pressure-Pa", "1e-320"}
        << "--pressure-Pa = 1e-320 Pa is outside the valid range [0.001, 1e9] Pa";
    QTest::newRow("unknown gas")
        << QStringList{"--gas", "Xe", "--temperature-K", "300"}
        << "--gas: unknown gas 'Xe' (valid: N2, O2, Ar, CO2, H2O, CO, H2, OH, H, O, NO, "
           "N, air, products)";
    QTest::newRow("rich") << QStringList{"--gas", "products",         "--temperature-K",
                                         "300",   "--fuel-air-ratio", "0.08"}
                          << "--fuel-air-ratio = 0.08 is outside the valid range [0, 0.0682";
    QTest::newRow("negative f") << QStringList{"--gas", "products",         "--temperature-K",
                                               "300",   "--fuel-air-ratio", "-0.01"}
                                << "--fuel-air-ratio = -0.01 is outside the valid range [0, 0.0682";
    QTest::newRow("f with species")
        << QStringList{"--gas", "N2", "--temperature-K", "300", "--fuel-air-ratio", "0.01"}
        << "--fuel-air-ratio: applies only to --gas products, not to 'N2'";
    QTest::newRow("f with air") << QStringList{"--gas", "air", "--temperature-K", "300", "--fuel-air-ratio",
                                               "0.01"}
                                << "--fuel-air-ratio: applies only to --gas products, not to 'air'";
    QTest::newRow("no gas") << QStringList{"--temperature-K", "300"} << "--gas: is required";
    QTest::newRow("no temperature") << QStringList{"--gas", "N2"} << "--temperature-K";
    QTest::newRow("not a number") << QStringList{"--gas", "N2", "--temperature-K", "hot"}
                                  << "--temperature-K";
  }

  void badInputExitsTwoWithOneLine() {
    QFETCH(QStringList, words);
    QFETCH(QString, expected);
    std::vector<std::string> args{"properties"};
    for (const auto& w : words) args.push_back(w.toStdString());
    const Run r = run(args);
    QCOMPARE(r.status, 2);
    QVERIFY(r.out.empty());
    QCOMPARE(lines(r.err), 1);
    const std::string prefix = "cyclewright-cli properties: " + expected.toStdString();
    QVERIFY2(r.err.rfind(prefix, 0) == 0, r.err.c_str());
  }

  void asAProcess() {
    QProcess process;
    process.start(CYCLEWRIGHT_CLI_PATH,
                  {"properties", "--gas", "N2", "--temperature-K", "1000", "--format", "json"});
    QVERIFY(process.waitForFinished(10000));
    QCOMPARE(process.exitCode(), 0);
    const QJsonObject o = QJsonDocument::fromJson(process.readAllStandardOutput()).object();
    QVERIFY(relNear(o["cp_J_per_kg_K"].toDouble(), 32.697 / 0.0280134, 0.005));  // [J]

    QProcess bad;
    bad.start(CYCLEWRIGHT_CLI_PATH, {"properties", "--gas", "N2", "--temperature-K", "7000"});
    QVERIFY(bad.waitForFinished(10000));
    QCOMPARE(bad.exitCode(), 2);
    QCOMPARE(QString::fromUtf8(bad.readAllStandardError()),
             QString("cyclewright-cli properties: --temperature-K = 7000 K is outside the valid range [100, "
                     "6000] K\n"));
    QVERIFY(bad.readAllStandardOutput().isEmpty());
  }

  void listedInHelp() {
    const Run r = run({"--help"});
    QVERIFY(r.out.find("properties") != std::string::npos);
    const Run h = run({"properties", "--help"});
    QCOMPARE(h.status, 0);
    QVERIFY(h.out.find("--fuel-air-ratio") != std::string::npos);
  }
};

QTEST_APPLESS_MAIN(TestCliProperties)
#include "test_cli_properties.moc"
