// cyclewright-cli audit: JSON keys and values against the in-process core, CSV, text, bad --order.
#include "analysis/loss_audit.h"
#include "cli_run.h"
#include "common/version.h"
#include "io/case_file.h"

#include <QJsonArray>
#include <QJsonObject>
#include <QTest>

#include <cmath>

namespace {
const std::string kExample =
    CYCLEWRIGHT_SOURCE_DIR "/resources/examples/supersonic-afterburning-two-gamma.json";
const std::string kDemo = CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json";
}  // namespace

class TestCliAudit : public QObject {
  Q_OBJECT
 private slots:
  void jsonHoldsEveryViewWithTheCoresValues() {
    const auto run = cw::test::runCli({"audit", kExample, "--format", "json"});
    QCOMPARE(run.status, 0);
    QVERIFY(run.err.empty());
    const QJsonObject j = cw::test::jsonOf(run);
    for (const char* key :
         {"one_at_a_time", "waterfall", "sensitivities", "exergy", "exergy_balance_closure", "caution"})
      QVERIFY2(j.contains(key), key);
    QCOMPARE(j["caution"].toString().toStdString(), std::string(cw::kCaution));
    // The same numbers as the in-process core (the CLI is a thin front).
    const auto audit = cw::analysis::auditCase(cw::io::readCaseFile(kExample));
    const QJsonArray steps = j["waterfall"].toArray();
    QCOMPARE(steps.size(), qsizetype(audit.waterfall.size()));
    for (qsizetype i = 0; i < steps.size(); ++i) {
      const QJsonObject s = steps[i].toObject();
      QCOMPARE(s["loss"].toString().toStdString(), audit.waterfall[i].loss);
      QCOMPARE(s["delta_specific_thrust_N_s_per_kg"].toDouble(), audit.waterfall[i].deltaSpecificThrust);
      QCOMPARE(s["delta_tsfc_g_per_kN_s"].toDouble(), audit.waterfall[i].deltaTsfc * 1e6);
    }
    const QJsonArray one = j["one_at_a_time"].toArray();
    QCOMPARE(one.size(), qsizetype(audit.oneAtATime.size()));
    QCOMPARE(one[1].toObject()["delta_specific_thrust_N_s_per_kg"].toDouble(),
             audit.oneAtATime[1].deltaSpecificThrust);
    const QJsonArray sens = j["sensitivities"].toArray();
    QCOMPARE(sens.size(), qsizetype(audit.sensitivities.size()));
    QCOMPARE(sens[0].toObject()["specific_thrust_N_s_per_kg_per_unit"].toDouble(),
             audit.sensitivities[0].specificThrustPerUnit);
    QCOMPARE(j["exergy"].toObject()["fuel_exergy_W"].toDouble(), audit.exergy.fuelExergy);
    QCOMPARE(j["exergy_balance_closure"].toDouble(), audit.exergy.closure);
    QVERIFY(std::abs(j["exergy_balance_closure"].toDouble()) < 1e-3);
  }

  void orderAndSetAreHonoured() {
    const auto run = cw::test::runCli({"audit", kDemo, "--format", "json", "--order", "bleed, power_offtake",
                                       "--set", "compressor.bleed_fraction=0.05"});
    QCOMPARE(run.status, 0);
    const QJsonArray steps = cw::test::jsonOf(run)["waterfall"].toArray();
    QCOMPARE(steps[0].toObject()["loss"].toString(), QString("bleed"));
    QCOMPARE(steps[1].toObject()["loss"].toString(), QString("power_offtake"));
    QCOMPARE(steps[2].toObject()["loss"].toString(), QString("inlet_recovery"));
    QVERIFY(steps[0].toObject()["delta_specific_thrust_N_s_per_kg"].toDouble() < 0.0);
  }

  void csvIsTheWaterfallWithACaution() {
    const auto run = cw::test::runCli({"audit", kDemo, "--format", "csv"});
    QCOMPARE(run.status, 0);
    const QStringList lines = QString::fromStdString(run.out).split('\n', Qt::SkipEmptyParts);
    QVERIFY(lines[0].startsWith("# caution"));
    QCOMPARE(lines[2], QString("step,loss,delta_specific_thrust_N_s_per_kg,delta_tsfc_g_per_kN_s"));
    QVERIFY(lines[3].startsWith("1,inlet_recovery,"));
  }

  void textHasTablesWithUnits() {
    const auto run = cw::test::runCli({"audit", kDemo});
    QCOMPARE(run.status, 0);
    for (const char* text : {"N s/kg", "g/(kN s)", "waterfall", "depend on the order", "closure", "[kW]"})
      QVERIFY2(run.out.find(text) != std::string::npos, text);
  }

  void badOrderExitsTwoWithOneLine() {
    const auto run = cw::test::runCli({"audit", kDemo, "--order", "bleed,compresor_efficiency"});
    QCOMPARE(run.status, 2);
    QVERIFY(run.out.empty());
    QCOMPARE(std::count(run.err.begin(), run.err.end(), '\n'), 1);
    QVERIFY2(run.err.find("compresor_efficiency") != std::string::npos, run.err.c_str());
    QVERIFY2(run.err.find("compressor_efficiency") != std::string::npos, run.err.c_str());
    const auto twice = cw::test::runCli({"audit", kDemo, "--order", "bleed,bleed"});
    QCOMPARE(twice.status, 2);
    QVERIFY(twice.err.find("bleed") != std::string::npos);
  }

  void noCycleExitsThree() {
    // Too little turbine-entry temperature to drive the compressor: no cycle.
    const auto run = cw::test::runCli({"audit", kDemo, "--set", "burner.exit_temperature_K=600"});
    QCOMPARE(run.status, 3);
  }
};

QTEST_APPLESS_MAIN(TestCliAudit)
#include "test_cli_audit.moc"
