// cyclewright-cli evaluate: JSON, CSV and text output, --set overrides and exit statuses.
#include "evaluation/evaluate.h"
#include "io/case_file.h"
#include "io/result_export.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QProcess>
#include <QTemporaryDir>
#include <QTest>

#include <cmath>
#include <map>

namespace {

const QString kExample =
    QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/examples/supersonic-afterburning-two-gamma.json");

struct Run {
  int status;
  QByteArray out, err;
};

Run runCli(const QStringList& arguments) {
  QProcess cli;
  cli.start(CYCLEWRIGHT_CLI_PATH, arguments);
  cli.waitForFinished(60000);
  return {cli.exitCode(), cli.readAllStandardOutput(), cli.readAllStandardError()};
}

}  // namespace

class TestCliEvaluate : public QObject {
  Q_OBJECT
 private slots:
  void jsonHoldsStationsPerformanceSizingIdealAndPaths() {
    const Run run = runCli({"evaluate", kExample, "--format", "json"});
    QCOMPARE(run.status, 0);
    QVERIFY(run.err.isEmpty());
    const QJsonObject j = QJsonDocument::fromJson(run.out).object();
    for (const char* key : {"stations", "performance", "sizing", "ideal", "paths", "caution"})
      QVERIFY2(j.contains(key), key);
    const QJsonArray stations = j["stations"].toArray();
    QStringList ids;
    for (const auto& s : stations) ids << s.toObject()["id"].toString();
    QCOMPARE(ids, QStringList({"0", "2", "3", "4", "5", "6", "7", "8", "9"}));
    for (const char* key : {"Tt_K", "pt_Pa", "Ts_K", "ps_Pa", "mach", "V_m_per_s", "W_kg_per_s",
                            "fuel_air_ratio", "ht_J_per_kg", "s_J_per_kg_K", "cp_J_per_kg_K", "gamma"})
      QVERIFY2(stations[3].toObject().contains(key), key);
    // The in-process core gives the same numbers (the CLI is a thin front).
    const auto evaluation = cw::engine::evaluateCase(cw::io::readCaseFile(kExample.toStdString()));
    const QJsonObject perf = j["performance"].toObject();
    QCOMPARE(perf["net_thrust_N"].toDouble(), evaluation.actual.performance.netThrust);
    QCOMPARE(perf["tsfc_g_per_kN_s"].toDouble(),
             evaluation.actual.performance.thrustSpecificFuelConsumption * 1e6);
    // The case asks for 60 kN; the air mass flow follows.
    QVERIFY(std::abs(perf["net_thrust_N"].toDouble() - 60000.0) < 1e-6);
    QCOMPARE(j["sizing"].toObject()["air_mass_flow_kg_per_s"].toDouble(),
             evaluation.actual.sizing.airMassFlow);
    QCOMPARE(j["ideal"].toObject()["stations"].toArray()[3].toObject()["Tt_K"].toDouble(), 1500.0);
    for (const auto& path : j["paths"].toArray()) QVERIFY(path.toObject()["states"].toArray().size() >= 20);
  }
  void csvIsTheStationTable() {
    const Run run = runCli({"evaluate", kExample, "--format", "csv"});
    QCOMPARE(run.status, 0);
    const QList<QByteArray> lines = run.out.trimmed().split('\n');
    QVERIFY(lines[0].startsWith("# Cyclewright results are conceptual-design estimates"));
    QVERIFY(lines[1].startsWith("id,Tt_K,pt_Pa,Ts_K,ps_Pa,mach,V_m_per_s,W_kg_per_s"));
    QCOMPARE(lines.size(), 2 + 9);
    QVERIFY(lines[5].startsWith("4,1500,"));
  }
  void differenceTableIsActualMinusIdeal() {
    const auto e = cw::engine::evaluateCase(cw::io::readCaseFile(kExample.toStdString()));
    const QList<QByteArray> lines =
        QByteArray::fromStdString(cw::io::stationDifferenceCsv(e.actual, e.ideal)).trimmed().split('\n');
    QVERIFY(lines[0].contains("with losses minus ideal twin"));
    // One row per station that both cycles have (here all nine: both burn in the afterburner).
    QCOMPARE(lines.size(), 2 + int(e.ideal.stations.size()));
    const QList<QByteArray> row4 = lines[5].split(',');
    QCOMPARE(row4[0], QByteArray("4"));
    QCOMPARE(row4[1].toDouble(), 0.0);  // same Tt4 by construction of the twin
    const double dpt4 = e.actual.station("4").totalPressure - e.ideal.station("4").totalPressure;
    QCOMPARE(row4[2].toDouble(), dpt4);
  }
  void setOverridesAnInput() {
    const Run base = runCli({"evaluate", kExample, "--format", "json"});
    const Run more = runCli({"evaluate", kExample, "--format", "json", "--set",
                             "compressor.pressure_ratio=12", "--set", "burner.exit_temperature_K=1600"});
    QCOMPARE(more.status, 0);
    const QJsonObject a = QJsonDocument::fromJson(base.out).object(),
                      b = QJsonDocument::fromJson(more.out).object();
    const double pt2 = b["stations"].toArray()[1].toObject()["pt_Pa"].toDouble();
    const double pt3 = b["stations"].toArray()[2].toObject()["pt_Pa"].toDouble();
    QVERIFY(std::abs(pt3 / pt2 - 12.0) < 1e-12);
    QCOMPARE(b["stations"].toArray()[3].toObject()["Tt_K"].toDouble(), 1600.0);
    QVERIFY(a["performance"].toObject()["tsfc_g_per_kN_s"].toDouble() !=
            b["performance"].toObject()["tsfc_g_per_kN_s"].toDouble());
  }
  void textShowsUnitsAndCaution() {
    const Run run = runCli({"evaluate", kExample});
    QCOMPARE(run.status, 0);
    const QString text = QString::fromUtf8(run.out);
    QVERIFY(text.contains("N s/kg") && text.contains("g/(kN s)") && text.contains("Tt [K]"));
    QVERIFY(text.contains("conceptual-design estimates"));
  }
  void invalidInputExitsTwoWithOneLine() {
    const Run run = runCli({"evaluate", kExample, "--set", "compressor.pressure_ratio=0.5"});
    QCOMPARE(run.status, 2);
    QVERIFY(run.out.isEmpty());
    QCOMPARE(run.err.count('\n'), 1);
    QVERIFY2(run.err.contains("/compressor/pressure_ratio = 0.5"), run.err.constData());
    const Run unknown = runCli({"evaluate", kExample, "--set", "compressor.ratio=3"});
    QCOMPARE(unknown.status, 2);
    const Run missing = runCli({"evaluate", "/no/such/case.json"});
    QCOMPARE(missing.status, 2);
    QVERIFY(missing.err.contains("/no/such/case.json"));
  }
  void versionOneAndTwoGiveTheSameOutput() {
    // A version 1 file is a version 2 single-spool turbojet: the same document raised to version
    // 2 (by setting its architecture) prints byte for byte the same.
    const Run v1 = runCli({"evaluate", kExample, "--format", "json"});
    const Run v2 =
        runCli({"evaluate", kExample, "--format", "json", "--set", "engine.architecture=turbojet"});
    QCOMPARE(v1.status, 0);
    QCOMPARE(v2.status, 0);
    QCOMPARE(v2.out, v1.out);
  }
  void twoSpoolCaseIsReadEvaluatedAndSet() {
    // The invented two-spool example (version 2): stations after SAE AS755, 25 and 45 where the
    // spools split; each compressor's ratio as given, and as --set gives it.
    const QString twoSpool =
        QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/examples/two-spool-cruise.json");
    const Run run = runCli(
        {"evaluate", twoSpool, "--format", "json", "--set", "low_pressure_compressor.pressure_ratio=4"});
    QCOMPARE(run.status, 0);
    QVERIFY2(run.err.isEmpty(), run.err.constData());
    const QJsonArray stations = QJsonDocument::fromJson(run.out).object()["stations"].toArray();
    QStringList ids;
    std::map<QString, double> pt;
    for (const auto& s : stations) {
      ids << s.toObject()["id"].toString();
      pt[ids.back()] = s.toObject()["pt_Pa"].toDouble();
    }
    QCOMPARE(ids, QStringList({"0", "2", "25", "3", "4", "45", "5", "7", "8", "9"}));
    QVERIFY(std::abs(pt["25"] / pt["2"] - 4.0) < 1e-12);
    QVERIFY(std::abs(pt["3"] / pt["25"] - 5.0) < 1e-12);
  }
  void twoSpoolKeysAreRefusedOnATurbojet() {
    const Run run = runCli({"evaluate", kExample, "--set", "low_pressure_compressor.pressure_ratio=3"});
    QCOMPARE(run.status, 2);
    QVERIFY(run.out.isEmpty());
    QCOMPARE(run.err.count('\n'), 1);
    QVERIFY2(
        run.err.contains("low_pressure_compressor.pressure_ratio: applies only when engine.architecture is "
                         "\"two-spool-turbojet\" (this case's is \"turbojet\""),
        run.err.constData());
  }
  void noCycleExitsThree() {
    // Burner exit barely above compressor exit at Mach 2: the jet is slower than flight (no useful cycle).
    const Run run = runCli({"evaluate", kExample, "--set", "burner.exit_temperature_K=700", "--set",
                            "afterburner.enabled=false", "--set", "design.air_mass_flow_kg_per_s=50"});
    QCOMPARE(run.status, 3);
    QCOMPARE(run.err.count('\n'), 1);
    QVERIFY2(run.err.contains("no solution"), run.err.constData());
  }
};

QTEST_APPLESS_MAIN(TestCliEvaluate)
#include "test_cli_evaluate.moc"
