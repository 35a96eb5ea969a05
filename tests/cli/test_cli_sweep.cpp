// cyclewright-cli sweep: CSV and JSON against the in-process core, columns, failed points, errors,
// and Ctrl+C stopping a long study.
#include "cli_run.h"
#include "common/error.h"
#include "common/version.h"
#include "io/case_file.h"
#include "study/study_export.h"
#include "study/trade_study.h"

#include <QJsonArray>
#include <QJsonObject>
#include <QProcess>
#include <QTest>

#include <algorithm>
#include <csignal>
#include <sstream>

namespace {
const std::string kDemo = CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json";

std::vector<std::string> lines(const std::string& text) {
  std::vector<std::string> result;
  std::istringstream in(text);
  for (std::string line; std::getline(in, line);) result.push_back(line);
  return result;
}
}  // namespace

class TestCliSweep : public QObject {
  Q_OBJECT
 private slots:
  void csvHasOneRowPerPointWithTheInputsFirst() {
    const auto run = cw::test::runCli({"sweep", kDemo, "--vary", "compressor.pressure_ratio=4:12:5", "--vary",
                                       "burner.exit_temperature_K=1300:1400:2", "--set", "flight.mach=0.7",
                                       "--output-columns", "tsfc_g_per_kN_s,specific_thrust_N_s_per_kg"});
    QCOMPARE(run.status, 0);
    QVERIFY2(run.err.empty(), run.err.c_str());
    const auto rows = lines(run.out);
    QCOMPARE(rows.size(), std::size_t(2 + 1 + 10));
    QCOMPARE(rows[0], "# caution: " + std::string(cw::kCaution));
    QCOMPARE(rows[2],
             std::string("compressor.pressure_ratio,burner.exit_temperature_K,status,tsfc_g_per_kN_s,"
                         "specific_thrust_N_s_per_kg,reason"));
    // The same numbers as the core, in the same order.
    cw::study::TradeStudySpec spec;
    spec.document = cw::io::readCaseDocument(kDemo);
    cw::io::applySetOverride(spec.document, "flight.mach=0.7");
    spec.axes = {{"compressor.pressure_ratio", 4, 12, 5}, {"burner.exit_temperature_K", 1300, 1400, 2}};
    const auto study = cw::study::runTradeStudy(spec);
    const std::string expected = cw::study::studyToCsv(
        study, cw::study::selectStudyColumns("tsfc_g_per_kN_s,specific_thrust_N_s_per_kg", false));
    QCOMPARE(run.out, expected);
    QCOMPARE(rows[3].substr(0, 14), std::string("4,1300,solved,"));
    QCOMPARE(rows[4].substr(0, 14), std::string("4,1400,solved,"));
    QCOMPARE(rows[5].substr(0, 14), std::string("6,1300,solved,"));
    QVERIFY(rows[3].find(cw::formatNumber(study.points[0].actual.specificThrust)) != std::string::npos);
  }

  void jsonHoldsTheGridAndEveryPointsStatus() {
    const auto run = cw::test::runCli({"sweep", kDemo, "--vary", "burner.exit_temperature_K=500:1500:3",
                                       "--format", "json", "--threads", "2"});
    QCOMPARE(run.status, 0);
    const QJsonObject j = cw::test::jsonOf(run);
    QCOMPARE(j["format"].toString(), QString("cyclewright-study"));
    QCOMPARE(j["version"].toInt(), 1);
    QCOMPARE(j["kind"].toString(), QString("sweep"));
    QCOMPARE(j["caution"].toString().toStdString(), std::string(cw::kCaution));
    QCOMPARE(j["axes"].toArray()[0].toObject()["values"].toArray().size(), 3);
    const QJsonArray points = j["points"].toArray();
    QCOMPARE(points.size(), 3);
    QCOMPARE(points[0].toObject()["status"].toString(), QString("no-cycle"));
    QVERIFY(points[0].toObject()["reason"].toString().contains("no solution"));
    QVERIFY(points[0].toObject()["values"].toObject()["net_thrust_N"].isNull());
    QCOMPARE(points[1].toObject()["status"].toString(), QString("solved"));
    QCOMPARE(points[1].toObject()["inputs"].toObject()["burner.exit_temperature_K"].toDouble(), 1000.0);
    QVERIFY(points[2].toObject()["values"].toObject()["specific_thrust_N_s_per_kg"].toDouble() >
            points[1].toObject()["values"].toObject()["specific_thrust_N_s_per_kg"].toDouble());
    QCOMPARE(j["counts"].toObject()["no-cycle"].toInt(), 1);
    QCOMPARE(j["design_point"].toObject()["inputs"].toObject()["burner.exit_temperature_K"].toDouble(),
             1350.0);
  }

  void auditAddsItsColumns() {
    const auto run =
        cw::test::runCli({"sweep", kDemo, "--vary", "compressor.pressure_ratio=6:10:2", "--audit",
                          "--output-columns", "audit.bleed.delta_specific_thrust_N_s_per_kg"});
    QCOMPARE(run.status, 0);
    const auto rows = lines(run.out);
    QCOMPARE(
        rows[2],
        std::string("compressor.pressure_ratio,status,audit.bleed.delta_specific_thrust_N_s_per_kg,reason"));
    const double gain = std::stod(rows[3].substr(rows[3].find("solved,") + 7));
    QVERIFY2(gain > 0.0 && gain < 50.0, rows[3].c_str());  // removing a 1 % bleed gains a little thrust
  }

  void aTwoSpoolStudyHasTheLowPressureSpoolsAuditColumns() {
    // The audit's columns are the losses of the case's architecture: a two-spool case adds the LP
    // spool's; the same column is refused on a single-spool case, naming the option.
    const std::string twoSpool = CYCLEWRIGHT_SOURCE_DIR "/resources/examples/two-spool-cruise.json";
    const std::string column = "audit.low_pressure_turbine_efficiency.delta_specific_thrust_N_s_per_kg";
    const auto run =
        cw::test::runCli({"sweep", twoSpool, "--vary", "low_pressure_compressor.pressure_ratio=2:3:2",
                          "--audit", "--output-columns", column});
    QCOMPARE(run.status, 0);
    const auto rows = lines(run.out);
    QCOMPARE(rows[2], "low_pressure_compressor.pressure_ratio,status," + column + ",reason");
    for (const std::size_t row : {std::size_t(3), std::size_t(4)}) {
      // Removing the LP turbine's loss (efficiency below 1) gains specific thrust (common
      // practice, no source: a lossless turbine needs less of the jet's energy).
      const double gain = std::stod(rows[row].substr(rows[row].find("solved,") + 7));
      QVERIFY2(gain > 0.0 && gain < 200.0, rows[row].c_str());
    }
    const auto refused = cw::test::runCli({"sweep", kDemo, "--vary", "compressor.pressure_ratio=6:10:2",
                                           "--audit", "--output-columns", column});
    QCOMPARE(refused.status, 2);
    QVERIFY2(refused.err.find("--output-columns") != std::string::npos, refused.err.c_str());
  }

  void errorsExitTwoWithOneLine_data() {
    QTest::addColumn<QStringList>("words");
    QTest::addColumn<QString>("message");
    QTest::newRow("no vary") << QStringList{} << "--vary: give --vary PATH=START:STOP:COUNT once";
    QTest::newRow("bad axis") << QStringList{"--vary", "compressor.pressure_ratio=4:40"}
                              << "expected PATH=START:STOP:COUNT";
    QTest::newRow("unknown input") << QStringList{"--vary", "compressor.ratio=4:40:3"}
                                   << "not a numeric case input";
    QTest::newRow("unknown column") << QStringList{"--vary", "flight.mach=0:1:3", "--output-columns",
                                                   "thrust"}
                                    << "unknown column \"thrust\"";
    QTest::newRow("text format") << QStringList{"--vary", "flight.mach=0:1:3", "--format", "text"}
                                 << "--format: expected one of csv, json, got \"text\"";
    QTest::newRow("threads") << QStringList{"--vary", "flight.mach=0:1:3", "--threads", "1.5"}
                             << "--threads: expected a whole number from 0 to 256, got \"1.5\"";
    QTest::newRow("fixed input") << QStringList{"--vary", "flight.mach=0:1:3", "--set",
                                                "turbine.mechanical_efficiency=2"}
                                 << "/turbine/mechanical_efficiency = 2";
  }
  void errorsExitTwoWithOneLine() {
    QFETCH(QStringList, words);
    QFETCH(QString, message);
    std::vector<std::string> args{"sweep", kDemo};
    for (const QString& w : words) args.push_back(w.toStdString());
    const auto run = cw::test::runCli(args);
    QCOMPARE(run.status, 2);
    QVERIFY(run.out.empty());
    QVERIFY2(QString::fromStdString(run.err).contains(message), run.err.c_str());
    QCOMPARE(std::count(run.err.begin(), run.err.end(), '\n'), 1L);
  }

  void noPointWithACycleExitsThree() {
    const auto run = cw::test::runCli({"sweep", kDemo, "--vary", "burner.exit_temperature_K=400:500:2"});
    QCOMPARE(run.status, 3);
    QCOMPARE(lines(run.out).size(), std::size_t(5));  // the points are still written, with their reasons
    QVERIFY(run.err.find("no point of the study has a cycle") != std::string::npos);
  }

  // Ctrl+C: the binary stops, writes the points it ran and exits 130. The signal is sent once
  // the first progress line shows the study is running (no timing involved); one thread keeps
  // the study long enough (about 2 s) for the stop to land before its end.
  void interruptStopsTheStudyAndWritesWhatRan() {
    QProcess cli;
    cli.start(CYCLEWRIGHT_CLI_PATH,
              {"sweep", QString::fromStdString(kDemo), "--vary", "compressor.pressure_ratio=2:40:500",
               "--vary", "burner.exit_temperature_K=1200:1800:500", "--progress", "--threads", "1",
               "--output-columns", "net_thrust_N"});
    cli.setReadChannel(QProcess::StandardError);  // waitForReadyRead then wakes for stderr
    QVERIFY(cli.waitForStarted(10000));
    QByteArray err;
    while (!err.contains(" of 250000 points") && cli.state() == QProcess::Running) {
      cli.waitForReadyRead(1000);
      err += cli.readAllStandardError();
    }
    QVERIFY2(err.contains(" of 250000 points"), err.constData());
    ::kill(static_cast<pid_t>(cli.processId()), SIGINT);
    QVERIFY(cli.waitForFinished(60000));
    QCOMPARE(cli.exitStatus(), QProcess::NormalExit);
    QCOMPARE(cli.exitCode(), 130);
    const QString out = QString::fromUtf8(cli.readAllStandardOutput());
    QVERIFY(out.contains("stopped before the end"));
    QVERIFY(out.contains(",not-run,,"));
    QVERIFY(out.contains(",solved,"));
    QCOMPARE(out.count('\n'), 3 + 250000);
  }

  // Ctrl+C while the output is written (with --audit that is most of the run): the output stays
  // whole and the run ends with 130, rather than the process dying mid-row. The signal goes out
  // the moment the last progress line ("10000 of 10000") shows that the points are done and the
  // output has begun; the same again part-way through the points.
  void interruptDuringTheOutputLeavesItWhole_data() {
    QTest::addColumn<QByteArray>("progressLine");
    QTest::newRow("output phase") << QByteArray(" 10000 of 10000 points");
    QTest::newRow("half way") << QByteArray(" 5000 of 10000 points");
  }
  void interruptDuringTheOutputLeavesItWhole() {
    QFETCH(QByteArray, progressLine);
    QProcess cli;
    cli.start(CYCLEWRIGHT_CLI_PATH,
              {"sweep", QString::fromStdString(kDemo), "--vary", "compressor.pressure_ratio=4:40:100",
               "--vary", "burner.exit_temperature_K=1200:1800:100", "--audit", "--progress"});
    cli.setReadChannel(QProcess::StandardError);
    QVERIFY(cli.waitForStarted(10000));
    QByteArray err, out;
    while (!err.contains(progressLine) && cli.state() == QProcess::Running) {
      cli.waitForReadyRead(1000);
      err += cli.readAllStandardError();
      out += cli.readAllStandardOutput();
    }
    QVERIFY2(err.contains(progressLine), err.right(200).constData());
    ::kill(static_cast<pid_t>(cli.processId()), SIGINT);
    QVERIFY(cli.waitForFinished(60000));
    out += cli.readAllStandardOutput();
    QCOMPARE(cli.exitStatus(), QProcess::NormalExit);  // not killed by the signal
    QCOMPARE(cli.exitCode(), 130);
    // Well-formed: ends with a newline, and every row has as many fields as the column header.
    QVERIFY(out.endsWith('\n'));
    const std::vector<std::string> rows = lines(out.toStdString());
    std::size_t header = 0;
    while (header < rows.size() && rows[header].rfind("compressor.pressure_ratio,", 0) != 0) ++header;
    QVERIFY(header < rows.size());
    const auto fields = std::count(rows[header].begin(), rows[header].end(), ',');
    std::size_t points = 0;
    for (std::size_t k = header + 1; k < rows.size(); ++k, ++points)
      QVERIFY2(std::count(rows[k].begin(), rows[k].end(), ',') == fields, rows[k].c_str());
    QCOMPARE(points, std::size_t(10000));
  }
};

QTEST_GUILESS_MAIN(TestCliSweep)
#include "test_cli_sweep.moc"
