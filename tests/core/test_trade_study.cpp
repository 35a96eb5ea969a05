// Trade studies: sweeps and carpets (core/study), the case-field setters they use
// (core/io/case_field_setter.h), the thread pool (core/common/thread_pool.h) and the study files
// (core/study/study_export.h).
#include "analysis/ideal_twin.h"
#include "analysis/loss_audit.h"
#include "analysis/loss_catalogue.h"
#include "common/error.h"
#include "common/thread_pool.h"
#include "engine/case_validation_error.h"
#include "evaluation/evaluate.h"
#include "io/case_field_setter.h"
#include "io/case_file.h"
#include "io/case_keys.h"
#include "study/study_columns.h"
#include "study/study_export.h"
#include "study/trade_study.h"

#include <QTest>

#include <atomic>
#include <cmath>
#include <map>
#include <set>

using namespace cw;
using nlohmann::json;

namespace {

const std::string kDemo = CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json";

json demoDocument() {
  return io::readCaseDocument(kDemo);
}

double relative(double a, double b) {
  return std::abs(a - b) / std::max(std::abs(b), 1e-300);
}

/// Ideal constant-cp turbojet with the fuel mass neglected, at Mattingly's flight condition
/// (T0 = 216.7 K), as in test_turbojet.cpp.
engine::Case idealConstantCpCase(double mach, double burnerExitTemperature) {
  engine::Case c;
  c.flight.ambient = engine::GivenAmbient{216.7, 19330.0};
  c.flight.mach = mach;
  c.design.target = engine::AirMassFlowTarget{50.0};
  c.fuel.lowerHeatingValue = 42.8e6;
  c.gasModel.model = engine::ConstantCpGasModel{1004.0, 1.4};
  c.gasModel.neglectFuelMass = true;
  return analysis::idealTwinOf(c, burnerExitTemperature, 50.0);
}

/// The case of one point evaluated the slow way: the axis values applied through the document.
engine::Case caseThroughDocument(json document, const std::vector<study::SweepAxis>& axes,
                                 const study::StudyPoint& point) {
  for (std::size_t k = 0; k < axes.size(); ++k)
    io::applySetOverride(document, axes[k].path + "=" + formatNumber(point.inputs[k]));
  return io::parseCaseStructure(document);
}

bool samePerformance(const engine::Performance& a, const engine::Performance& b) {
  return a.netThrust == b.netThrust && a.grossThrust == b.grossThrust && a.ramDrag == b.ramDrag &&
         a.specificThrust == b.specificThrust &&
         a.thrustSpecificFuelConsumption == b.thrustSpecificFuelConsumption && a.fuelFlow == b.fuelFlow &&
         a.fuelAirRatio == b.fuelAirRatio && a.thermalEfficiency == b.thermalEfficiency &&
         a.propulsiveEfficiency == b.propulsiveEfficiency && a.overallEfficiency == b.overallEfficiency &&
         a.jetVelocity == b.jetVelocity && a.nozzleChoked == b.nozzleChoked;
}

template <typename F>
QString errorOf(F&& f) {
  try {
    f();
  } catch (const std::exception& e) {
    return QString::fromStdString(e.what());
  }
  return {};
}

}  // namespace

class TestTradeStudy : public QObject {
  Q_OBJECT
 private slots:
  // ---- trends that theory fixes --------------------------------------------------------------

  // Closed form: in the ideal constant-cp turbojet (fuel mass neglected) the specific thrust is
  // greatest at tau_c = sqrt(tau_lambda) / tau_r, i.e. pi_c = (sqrt(tau_lambda) / tau_r)^(gamma/(gamma-1)):
  // Mattingly, Elements of Propulsion: Gas Turbines and Rockets, AIAA 2006, sec. 5.6 (ideal
  // turbojet, compressor pressure ratio for maximum specific thrust). It follows from the closed
  // form of V9 checked in test_turbojet.cpp: d(V9^2)/d(tau_c) = 0 where tau_r = tau_lambda/(tau_r tau_c^2).
  void idealOptimumPressureRatioIsTheClosedForm_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("exitTemperature");
    QTest::newRow("M2, 1800 K") << 2.0 << 1800.0;
    QTest::newRow("M0.8, 1600 K") << 0.8 << 1600.0;
  }
  void idealOptimumPressureRatioIsTheClosedForm() {
    QFETCH(double, mach);
    QFETCH(double, exitTemperature);
    const double gamma = 1.4;
    const double tauR = 1 + 0.5 * (gamma - 1) * mach * mach;
    const double tauL = exitTemperature / 216.7;
    const double optimum = std::pow(std::sqrt(tauL) / tauR, gamma / (gamma - 1));

    study::TradeStudySpec spec;
    spec.document = io::caseToJson(idealConstantCpCase(mach, exitTemperature));
    spec.axes = {{"compressor.pressure_ratio", optimum * 0.8, optimum * 1.2, 401}};
    const study::TradeStudy s = study::runTradeStudy(spec);
    QCOMPARE(s.count(study::PointStatus::Solved), s.points.size());
    std::size_t best = 0;
    for (std::size_t i = 0; i < s.points.size(); ++i)
      if (s.points[i].actual.specificThrust > s.points[best].actual.specificThrust) best = i;
    QVERIFY(best > 0 && best + 1 < s.points.size());  // an interior maximum
    // Vertex of the parabola through the best point and its neighbours.
    const double h = s.points[1].inputs[0] - s.points[0].inputs[0];
    const double y0 = s.points[best - 1].actual.specificThrust, y1 = s.points[best].actual.specificThrust,
                 y2 = s.points[best + 1].actual.specificThrust;
    const double vertex = s.points[best].inputs[0] + 0.5 * h * (y0 - y2) / (y0 - 2 * y1 + y2);
    QVERIFY2(
        relative(vertex, optimum) < 1e-5,
        qPrintable(QString("optimum %1, closed form %2").arg(vertex, 0, 'g', 10).arg(optimum, 0, 'g', 10)));
    // The twin of an ideal case is itself.
    QCOMPARE(s.points[best].ideal.specificThrust, s.points[best].actual.specificThrust);
  }

  // As one loss goes to zero (all others removed), the cycle tends to its ideal twin, steadily.
  void lossSweptToZeroApproachesTheIdealTwin() {
    engine::Case c = io::readCaseFile(kDemo);
    for (const analysis::LossDefinition& loss : analysis::lossCatalogue())
      if (loss.key != "compressor_efficiency" && loss.applies(c)) loss.remove(c);
    study::TradeStudySpec spec;
    spec.document = io::caseToJson(c);
    spec.axes = {{"compressor.isentropic_efficiency", 0.80, 1.0, 11}};
    const study::TradeStudy s = study::runTradeStudy(spec);
    QCOMPARE(s.count(study::PointStatus::Solved), std::size_t(11));
    double previousGap = INFINITY;
    for (const study::StudyPoint& p : s.points) {
      const double gap = p.ideal.specificThrust - p.actual.specificThrust;
      QVERIFY2(gap >= -1e-9 * p.ideal.specificThrust && gap < previousGap,
               qPrintable(QString("eta_c %1: gap %2 N s/kg").arg(p.inputs[0]).arg(gap)));
      previousGap = gap;
    }
    const study::StudyPoint& last = s.points.back();
    QVERIFY(relative(last.actual.specificThrust, last.ideal.specificThrust) < 1e-9);
    QVERIFY(relative(last.actual.thrustSpecificFuelConsumption, last.ideal.thrustSpecificFuelConsumption) <
            1e-9);
    QVERIFY(s.points.front().ideal.specificThrust == last.ideal.specificThrust);  // the twin does not move
  }

  // ---- the same numbers whatever the thread count ---------------------------------------------

  void carpetEqualsPointsOneByOne() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    spec.axes = {{"compressor.pressure_ratio", 4.0, 24.0, 6},
                 {"burner.exit_temperature_K", 1200.0, 1600.0, 5}};
    std::string csvOfOne;
    for (const unsigned threads : {1u, 2u, 3u, 7u}) {
      spec.threads = threads;
      const study::TradeStudy s = study::runTradeStudy(spec);
      QCOMPARE(s.threads, threads);
      QCOMPARE(s.points.size(), std::size_t(30));
      QVERIFY(!s.stopped);
      for (const study::StudyPoint& p : s.points) {
        QCOMPARE(p.inputs[0], spec.axes[0].values()[p.index[0]]);
        QCOMPARE(p.inputs[1], spec.axes[1].values()[p.index[1]]);
        const engine::Evaluation one =
            engine::evaluateCase(caseThroughDocument(spec.document, spec.axes, p), false);
        QVERIFY(p.solved());
        QVERIFY(samePerformance(p.actual, one.actual.performance));
        QVERIFY(samePerformance(p.ideal, one.ideal.performance));
        QCOMPARE(&p, &s.at(p.index[0], p.index[1]));
      }
      const std::string csv = study::studyToCsv(s, study::studyColumns(false));
      if (threads == 1) csvOfOne = csv;
      QCOMPARE(csv, csvOfOne);
      QCOMPARE(study::studyToJson(s, study::studyColumns(false)).dump(), [&] {
        spec.threads = 1;
        return study::studyToJson(study::runTradeStudy(spec), study::studyColumns(false)).dump();
      }());
    }
  }

  void designPointIsTheCaseAsGiven() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    spec.axes = {{"compressor.pressure_ratio", 4.0, 12.0, 3},
                 {"compressor.polytropic_efficiency", 0.85, 0.9, 2}};
    const study::TradeStudy s = study::runTradeStudy(spec);
    const engine::Evaluation given = engine::evaluateCase(io::readCaseFile(kDemo), false);
    QVERIFY(samePerformance(s.designPoint.actual, given.actual.performance));
    QVERIFY(s.designPointOnAxis[0]);
    QCOMPARE(s.designPoint.inputs[0], 8.0);
    // The demo gives an isentropic efficiency: its polytropic one is not an input of the case.
    QVERIFY(!s.designPointOnAxis[1]);
    // Varying the polytropic efficiency made every point polytropic.
    const engine::Case point = caseThroughDocument(spec.document, spec.axes, s.at(0, 1));
    QVERIFY(point.compressor.efficiency.basis == engine::EfficiencyBasis::Polytropic);
  }

  // A case completed only by its axes (here the ambient pressure) still runs; it has no design point.
  void aCaseCompletedByItsAxesHasNoDesignPoint() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    spec.document["flight"] = {{"ambient_temperature_K", 250.0}, {"mach", 0.8}};
    spec.axes = {{"flight.ambient_pressure_Pa", 40000.0, 80000.0, 3}};
    const study::TradeStudy s = study::runTradeStudy(spec);
    QCOMPARE(s.count(study::PointStatus::Solved), std::size_t(3));
    QVERIFY(s.designPoint.status == study::PointStatus::InvalidInput);
    QVERIFY2(s.designPoint.reason.find("/flight/ambient_pressure_Pa") != std::string::npos,
             s.designPoint.reason.c_str());
    QVERIFY(!s.designPointOnAxis[0]);
  }

  void auditPerPointEqualsTheLossAudit() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    spec.axes = {{"burner.exit_temperature_K", 1300.0, 1500.0, 3}};
    spec.withAudit = true;
    const study::TradeStudy s = study::runTradeStudy(spec);
    for (const study::StudyPoint& p : s.points) {
      const auto expected =
          analysis::oneAtATime(analysis::AuditPoint(caseThroughDocument(spec.document, spec.axes, p)));
      QCOMPARE(p.audit.size(), expected.size());
      for (std::size_t k = 0; k < expected.size(); ++k) {
        QCOMPARE(p.audit[k].loss, expected[k].loss);
        QCOMPARE(p.audit[k].deltaSpecificThrust, expected[k].deltaSpecificThrust);
        QCOMPARE(p.audit[k].deltaTsfc, expected[k].deltaTsfc);
      }
    }
    const auto columns =
        study::selectStudyColumns("audit.compressor_efficiency.delta_specific_thrust_N_s_per_kg", true);
    QCOMPARE(*columns.front().value(s.points[1]), s.points[1].audit[1].deltaSpecificThrust);
    QCOMPARE(s.points[1].audit[1].loss, std::string("compressor_efficiency"));
  }

  // ---- points without a cycle ------------------------------------------------------------------

  void pointsWithoutACycleAreReportedAndTheStudyGoesOn() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    // Pressure ratio 0.5 is out of range; a burner exit at 500 K leaves no cycle (too little heat
    // for the turbine, or a burner exit below the compressor delivery temperature).
    spec.axes = {{"compressor.pressure_ratio", 0.5, 12.5, 5},
                 {"burner.exit_temperature_K", 500.0, 1500.0, 3}};
    const study::TradeStudy s = study::runTradeStudy(spec);
    QCOMPARE(s.points.size(), std::size_t(15));
    for (const study::StudyPoint& p : s.points) {
      if (p.inputs[0] < 1.0) {
        QVERIFY2(p.status == study::PointStatus::InvalidInput, p.reason.c_str());
        QVERIFY2(p.reason.find("/compressor/pressure_ratio = 0.5") != std::string::npos, p.reason.c_str());
      } else if (p.inputs[1] == 500.0) {
        QVERIFY2(p.status == study::PointStatus::NoCycle, p.reason.c_str());
        QVERIFY2(p.reason.find("no solution: ") != std::string::npos, p.reason.c_str());
      } else {
        QVERIFY2(p.solved(), p.reason.c_str());
        QVERIFY(std::isfinite(p.actual.specificThrust) && p.actual.specificThrust > 0.0);
      }
      QCOMPARE(p.reason.find('\n'), std::string::npos);
    }
    QCOMPARE(s.count(study::PointStatus::InvalidInput), std::size_t(3));
    QCOMPARE(s.count(study::PointStatus::NoCycle), std::size_t(4));
    // Files: no figures for failed points, never a NaN.
    const std::string csv = study::studyToCsv(s, study::defaultStudyColumns(false));
    QVERIFY(csv.find("nan") == std::string::npos && csv.find("inf") == std::string::npos);
    QVERIFY(csv.find("\n0.5,500,invalid-input,,") != std::string::npos);
    const json j = study::studyToJson(s, study::defaultStudyColumns(false));
    QCOMPARE(j["counts"]["no-cycle"].get<int>(), 4);
    QVERIFY(j["points"][0]["values"]["net_thrust_N"].is_null());
    QCOMPARE(j["points"][0]["status"].get<std::string>(), std::string("invalid-input"));
  }

  // ---- the spec's own errors --------------------------------------------------------------------

  void badSpecsAreRefusedBeforeAnyPointRuns_data() {
    QTest::addColumn<QStringList>("axes");
    QTest::addColumn<QString>("message");
    QTest::newRow("unknown path") << QStringList{"compressor.pressure_ration=4:8:3"}
                                  << "did you mean compressor.pressure_ratio?";
    QTest::newRow("choice key") << QStringList{"nozzle.kind=1:2:2"} << "not a numeric case input";
    QTest::newRow("twice") << QStringList{"flight.mach=0:1:3", "flight.mach=0:1:3"} << "varied twice";
    QTest::newRow("alternatives") << QStringList{"compressor.isentropic_efficiency=0.8:0.9:2",
                                                 "compressor.polytropic_efficiency=0.8:0.9:2"}
                                  << "alternative of the other varied input";
    QTest::newRow("does not apply") << QStringList{"gas_model.cp_J_per_kg_K=1000:1100:2"}
                                    << "/gas_model/cp_J_per_kg_K";
    QTest::newRow("too many") << QStringList{"flight.mach=0:1:1000", "compressor.pressure_ratio=2:40:1000"}
                              << "the grid has 1000000 points; a study may have at most 250000";
    QTest::newRow("three") << QStringList{"flight.mach=0:1:2", "compressor.pressure_ratio=2:4:2",
                                          "burner.exit_temperature_K=1200:1300:2"}
                           << "give one input to vary";
  }
  void badSpecsAreRefusedBeforeAnyPointRuns() {
    QFETCH(QStringList, axes);
    QFETCH(QString, message);
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    for (const QString& a : axes) spec.axes.push_back(study::parseSweepAxis(a.toStdString()));
    bool progressed = false;
    const QString error = errorOf(
        [&] { study::runTradeStudy(spec, {}, [&](std::size_t, std::size_t) { progressed = true; }); });
    QVERIFY2(error.contains(message), qPrintable(error));
    QVERIFY(!progressed);
  }

  void fixedInputsOutOfRangeAreTheCasesProblem() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    io::applySetOverride(spec.document, "turbine.mechanical_efficiency=1.5");
    spec.axes = {{"compressor.pressure_ratio", 4.0, 8.0, 2}};
    try {
      study::runTradeStudy(spec);
      QFAIL("expected a CaseValidationError");
    } catch (const engine::CaseValidationError& e) {
      QCOMPARE(e.problems().size(), std::size_t(1));
      QCOMPARE(e.problems().front().path, std::string("/turbine/mechanical_efficiency"));
    }
  }

  void axisTextIsParsedStrictly_data() {
    QTest::addColumn<QString>("text");
    QTest::addColumn<QString>("message");
    QTest::newRow("no equals") << "compressor.pressure_ratio"
                               << "expected PATH=START:STOP:COUNT";
    QTest::newRow("two parts") << "compressor.pressure_ratio=4:40"
                               << "expected PATH=START:STOP:COUNT";
    QTest::newRow("four parts") << "compressor.pressure_ratio=4:40:3:1"
                                << "expected PATH=START:STOP:COUNT";
    QTest::newRow("start") << "compressor.pressure_ratio=four:40:3"
                           << "START is not a number: \"four\"";
    QTest::newRow("comma") << "compressor.pressure_ratio=4:40,5:3"
                           << "STOP is not a number: \"40,5\"";
    QTest::newRow("count") << "compressor.pressure_ratio=4:40:2.5"
                           << "COUNT is not a whole number";
    QTest::newRow("zero") << "compressor.pressure_ratio=4:40:0"
                          << "COUNT = 0 is outside the valid range [1, 1000]";
    QTest::newRow("one") << "compressor.pressure_ratio=4:40:1"
                         << "COUNT 1 takes one value";
    QTest::newRow("flat") << "compressor.pressure_ratio=4:4:3"
                          << "START = STOP gives one value";
    QTest::newRow("nan") << "compressor.pressure_ratio=nan:4:3"
                         << "START is not a number";
  }
  void axisTextIsParsedStrictly() {
    QFETCH(QString, text);
    QFETCH(QString, message);
    const QString error = errorOf([&] { study::parseSweepAxis(text.toStdString()); });
    QVERIFY2(error.contains(message), qPrintable(error));
    QVERIFY(error.startsWith("--vary"));
  }

  void axisValuesAreEvenAndEndExactly() {
    const study::SweepAxis axis = study::parseSweepAxis("burner.exit_temperature_K=1200:1800.3:7");
    const std::vector<double> v = axis.values();
    QCOMPARE(v.size(), std::size_t(7));
    QCOMPARE(v.front(), 1200.0);
    QCOMPARE(v.back(), 1800.3);
    for (std::size_t i = 1; i < v.size(); ++i) QVERIFY(std::abs(v[i] - v[i - 1] - 100.05) < 1e-9);
    QCOMPARE(study::parseSweepAxis("flight.mach=0.8:0.8:1").values(), std::vector<double>{0.8});
    QCOMPARE(study::parseSweepAxis("flight.mach=+1e-1:-2E-1:2").values(), (std::vector<double>{0.1, -0.2}));
  }

  // ---- the setters agree with --set ----------------------------------------------------------------

  void everyNumericKeyHasASetterThatAgreesWithSet() {
    // Documents in which each key applies: the demo, plus the alternatives it does not select.
    std::map<std::string, std::vector<std::string>> prerequisites = {
        {"flight.ambient_temperature_K", {"flight.ambient_pressure_Pa=90000"}},
        {"flight.ambient_pressure_Pa", {"flight.ambient_temperature_K=250"}},
        {"gas_model.cp_J_per_kg_K", {"gas_model.kind=constant-cp"}},
        {"gas_model.gamma", {"gas_model.kind=constant-cp"}},
        {"gas_model.cold_cp_J_per_kg_K", {"gas_model.kind=two-gamma"}},
        {"gas_model.cold_gamma", {"gas_model.kind=two-gamma"}},
        {"gas_model.hot_cp_J_per_kg_K", {"gas_model.kind=two-gamma"}},
        {"gas_model.hot_gamma", {"gas_model.kind=two-gamma"}},
        {"nozzle.exit_to_throat_area_ratio",
         {"nozzle.kind=convergent-divergent", "nozzle.expansion=area-ratio"}},
    };
    const std::vector<std::string> paths = io::numericCaseFieldPaths();
    QCOMPARE(paths.size(), std::size_t(58));  // 42 of the single spool, 16 of the two-spool roles
    for (const std::string& path : paths)
      if (const io::CaseSection* section = io::findCaseSection(path.substr(0, path.find('.')));
          section && section->architecture == engine::Architecture::TwoSpoolTurbojet)
        prerequisites[path].insert(prerequisites[path].begin(), "engine.architecture=two-spool-turbojet");
    std::set<std::string> fromKeys;
    for (const io::CaseSection& section : io::caseSections())
      for (const io::CaseKey& key : section.keys)
        if (key.type == io::CaseKeyType::Number)
          fromKeys.insert(std::string(section.name) + "." + std::string(key.name));
    QCOMPARE(std::set<std::string>(paths.begin(), paths.end()), fromKeys);
    for (const std::string& path : paths) {
      const io::CaseFieldSetter set = io::numericCaseFieldSetter(path);
      QVERIFY2(set, path.c_str());
      json document = demoDocument();
      for (const std::string& p : prerequisites[path]) io::applySetOverride(document, p);
      json first = document, second = document;
      io::applySetOverride(first, path + "=0.625");
      io::applySetOverride(second, path + "=0.875");
      engine::Case c = io::parseCaseStructure(first);
      set(c, 0.875);
      QVERIFY2(c == io::parseCaseStructure(second), path.c_str());
      // ...and from a document where the path's alternative was not selected, where it applies.
      engine::Case fromDemo = io::parseCaseStructure(demoDocument());
      set(fromDemo, 0.875);
      json viaSet = demoDocument();
      // The demo is a single-spool turbojet: --set refuses the two-spool roles' keys.
      const auto refused = errorOf([&] { io::applySetOverride(viaSet, path + "=0.875"); });
      if (!refused.isEmpty()) {
        QVERIFY2(refused.contains("applies only when engine.architecture is \"two-spool-turbojet\""),
                 qPrintable(refused));
        continue;
      }
      const auto structure = errorOf([&] { io::parseCaseStructure(viaSet); });
      if (structure.isEmpty() && prerequisites[path].empty())
        QVERIFY2(fromDemo == io::parseCaseStructure(viaSet), path.c_str());
    }
    QVERIFY(io::numericCaseFieldSetter("nozzle.kind") == nullptr);
    QVERIFY(io::numericCaseFieldSetter("title") == nullptr);
    QVERIFY(io::numericCaseFieldSetter("compressor") == nullptr);
  }

  // ---- stopping ------------------------------------------------------------------------------------

  void aStopRequestEndsTheStudyEarly() {
    study::TradeStudySpec spec;
    spec.document = demoDocument();
    spec.axes = {{"compressor.pressure_ratio", 2.0, 40.0, 100},
                 {"burner.exit_temperature_K", 1200.0, 1800.0, 100}};
    spec.threads = 2;
    std::stop_source source;
    std::atomic<std::size_t> reports{0};
    const study::TradeStudy s =
        study::runTradeStudy(spec, source.get_token(), [&](std::size_t done, std::size_t total) {
          QCOMPARE(total, std::size_t(10000));
          if (reports++ == 0 && done < total) source.request_stop();
        });
    QVERIFY(s.stopped);
    const std::size_t notRun = s.count(study::PointStatus::NotRun);
    QVERIFY2(notRun > 5000, qPrintable(QString::number(notRun)));
    for (const study::StudyPoint& p : s.points) {
      QVERIFY(p.status == study::PointStatus::Solved || p.status == study::PointStatus::NotRun);
      if (p.solved()) {
        const auto one = engine::evaluateCase(caseThroughDocument(spec.document, spec.axes, p), false);
        QVERIFY(samePerformance(p.actual, one.actual.performance));
      }
    }
    QVERIFY(study::describeStudy(s).find("stopped before the end") != std::string::npos);
    // Stopped before it starts: nothing runs.
    std::stop_source early;
    early.request_stop();
    const study::TradeStudy none = study::runTradeStudy(spec, early.get_token());
    QCOMPARE(none.count(study::PointStatus::NotRun), std::size_t(10000));
  }

  // ---- columns -------------------------------------------------------------------------------------

  void columnsAreChosenByName() {
    const auto columns = study::selectStudyColumns("tsfc_g_per_kN_s, specific_thrust_N_s_per_kg", false);
    QCOMPARE(columns.size(), std::size_t(2));
    QCOMPARE(columns[0].name, std::string("tsfc_g_per_kN_s"));
    QCOMPARE(columns[0].fileScale, 1e6);
    QVERIFY(
        errorOf([] { study::selectStudyColumns("thrust", false); }).contains("unknown column \"thrust\""));
    QVERIFY(errorOf([] {
              study::selectStudyColumns("fuel_flow_kg_per_s,fuel_flow_kg_per_s", false);
            }).contains("given twice"));
    QVERIFY(errorOf([] {
              study::selectStudyColumns("audit.bleed.delta_tsfc_g_per_kN_s", false);
            }).contains("audit columns need --audit"));
    std::set<std::string> names;
    for (const auto& c : study::studyColumns(true)) QVERIFY2(names.insert(c.name).second, c.name.c_str());
    // TSFC has no value at zero net thrust (rather than a misleading 0).
    study::StudyPoint p;
    p.status = study::PointStatus::Solved;
    p.actual.netThrust = 0.0;
    QVERIFY(!study::selectStudyColumns("tsfc_g_per_kN_s", false).front().value(p).has_value());
  }

  void auditColumnsFollowTheArchitecture() {
    // A turbojet's study has the audit columns of its 13 losses, none of the LP spool's (the
    // command line's sweep --audit unchanged); a two-spool case's has the LP ones too (18 losses,
    // two columns each), and their values are the point's own audit.
    const auto turbojet = study::studyColumns(true);
    const auto twoSpool = study::studyColumns(true, engine::Architecture::TwoSpoolTurbojet);
    QCOMPARE(twoSpool.size() - turbojet.size(), std::size_t(2 * 5));
    const std::string lpBleed = "audit.low_pressure_bleed.delta_specific_thrust_N_s_per_kg";
    QVERIFY(std::none_of(turbojet.begin(), turbojet.end(), [&](const auto& c) { return c.name == lpBleed; }));
    QVERIFY(errorOf([&] { study::selectStudyColumns(lpBleed, true); }).contains("unknown column"));
    engine::Case c;
    c.architecture = engine::Architecture::TwoSpoolTurbojet;
    c.lowPressureCompressor.pressureRatio = 2.5;
    c.lowPressureCompressor.bleedFraction = 0.02;
    c.compressor.pressureRatio = 4.0;
    const study::StudyPoint p = study::evaluatePoint(c, true);
    const auto column =
        study::selectStudyColumns(lpBleed, true, "--output-columns", engine::Architecture::TwoSpoolTurbojet);
    const auto it = std::find_if(p.audit.begin(), p.audit.end(),
                                 [](const analysis::LossDelta& d) { return d.loss == "low_pressure_bleed"; });
    QVERIFY(it != p.audit.end());
    QCOMPARE(*column.front().value(p), it->deltaSpecificThrust);
    QVERIFY(it->deltaSpecificThrust >
            0.0);  // no LP bleed, more air through the core (common practice, no source)
  }

  // ---- the thread pool -----------------------------------------------------------------------------

  void threadPoolRunsEveryIndexOnce() {
    cw::ThreadPool pool(3);
    QCOMPARE(pool.threadCount(), 3u);
    for (int round = 0; round < 20; ++round) {
      std::vector<std::atomic<int>> hits(997);
      QCOMPARE(pool.parallelFor(hits.size(), [&](std::size_t i) { ++hits[i]; }), hits.size());
      for (const auto& h : hits) QCOMPARE(h.load(), 1);
    }
    QCOMPARE(pool.parallelFor(0, [](std::size_t) {}), std::size_t(0));
  }

  void threadPoolPassesTheFirstErrorOn() {
    // One worker: after the failing index no new index starts.
    cw::ThreadPool single(1);
    std::atomic<int> ran{0};
    const QString error = errorOf([&] {
      single.parallelFor(1000, [&](std::size_t i) {
        ++ran;
        if (i == 10) throw cw::NoSolution("point 10", "test");
      });
    });
    QCOMPARE(error, QString("point 10: no solution: test"));
    QCOMPARE(ran.load(), 11);
    // Several workers: the first error is the one passed on, and the pool stays usable.
    cw::ThreadPool pool(2);
    QCOMPARE(errorOf([&] {
               pool.parallelFor(1000, [&](std::size_t i) {
                 if (i == 10) throw cw::NoSolution("point 10", "test");
               });
             }),
             QString("point 10: no solution: test"));
    std::atomic<int> count{0};
    QCOMPARE(pool.parallelFor(50, [&](std::size_t) { ++count; }), std::size_t(50));
    QCOMPARE(count.load(), 50);
  }
};

QTEST_APPLESS_MAIN(TestTradeStudy)
#include "test_trade_study.moc"
