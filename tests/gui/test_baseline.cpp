// Baseline against variant: pin the shown case or open a saved one as the baseline; the
// performance table's "Baseline" and "Change from baseline" columns (Δ and Δ [%] on screen) and the station
// table's difference from the baseline equal the core's results of the two cases (each evaluated here with
// cw::engine::evaluateCase) to 1e-12; the exports carry them.
#include "charts/cycle_chart.h"
#include "document/case_document.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"

#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <qwt_plot_curve.h>
#include <qwt_text.h>

#include <QComboBox>
#include <QFile>
#include <QPen>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>

#include <cmath>

using cw::gui::MainWindow;
using P = cw::gui::PerformanceModel;
using S = cw::gui::StationTableModel;

using cw::test::demoCase;

namespace {

bool near(double a, double b) {
  return std::fabs(a - b) <= 1e-12 * std::max(1.0, std::fabs(b));
}

const cw::engine::Station& stationOf(const cw::engine::CycleResult& r, const QString& id) {
  return r.station(id.toStdString());
}

/// Checks the tables against the core's evaluations of the variant (shown) and the baseline.
void checkAgainstCore(MainWindow& window, const cw::engine::Evaluation& variant,
                      const cw::engine::Evaluation& baseline) {
  auto* performance = window.performanceModel();
  QCOMPARE(performance->columnCount(), static_cast<int>(P::ColumnCount));
  for (int row = 0; row < P::RowCount; ++row) {
    // In SI display units; TSFC is shown in g/(kN s), 1e6 per kg/(N s).
    const double shown = row == P::Tsfc ? 1e6 : 1.0;
    const double v = shown * P::siValue(variant.actual.performance, row);
    const double b = shown * P::siValue(baseline.actual.performance, row);
    QVERIFY(near(performance->index(row, P::Baseline).data(P::ValueRole).toDouble(), b));
    QVERIFY(near(performance->index(row, P::BaselineChange).data(P::ValueRole).toDouble(), v - b));
    const QVariant percent = performance->index(row, P::BaselinePercent).data(P::ValueRole);
    const bool efficiency =
        row == P::ThermalEfficiency || row == P::PropulsiveEfficiency || row == P::OverallEfficiency;
    QCOMPARE(percent.isValid(), !efficiency);
    if (!efficiency) QVERIFY(near(percent.toDouble(), 100.0 * (v - b) / b));
  }
  auto* tableMode = window.findChild<QComboBox*>("tableMode");
  tableMode->setCurrentIndex(static_cast<int>(cw::gui::TableMode::BaselineDifference));
  auto* stations = window.stationModel();
  QCOMPARE(stations->mode(), cw::gui::TableMode::BaselineDifference);
  QCOMPARE(stations->rowCount(), static_cast<int>(variant.actual.stations.size()));
  for (int r = 0; r < stations->rowCount(); ++r) {
    const QString id = stations->index(r, S::Id).data().toString();
    const auto& a = stationOf(variant.actual, id);
    const auto& b = stationOf(baseline.actual, id);
    QVERIFY(near(stations->index(r, S::Tt).data(S::ValueRole).toDouble(),
                 a.totalTemperature - b.totalTemperature));
    // kPa on screen.
    QVERIFY(near(stations->index(r, S::Pt).data(S::ValueRole).toDouble(),
                 (a.totalPressure - b.totalPressure) / 1000.0));
    QVERIFY(near(stations->index(r, S::Entropy).data(S::ValueRole).toDouble(), a.entropy - b.entropy));
  }
  QVERIFY(stations->headerData(S::Tt, Qt::Horizontal).toString().startsWith(QStringLiteral("ΔTt")));
}

}  // namespace

class TestBaseline : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestBaseline"); }

  void pinnedBaselineAgainstAnEditedVariant() {
    MainWindow window;
    window.units().setSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    QCOMPARE(window.performanceModel()->columnCount(), P::kColumnsWithoutBaseline);
    QSignalSpy changed(&window.document(), &cw::gui::CaseDocument::baselineChanged);
    QVERIFY(window.document().pinBaseline());
    QCOMPARE(changed.count(), 1);
    QCOMPARE(window.document().baselineTitle(), QString::fromStdString(demoCase().title));
    QVERIFY(window.performanceModel()
                ->headerData(P::Baseline, Qt::Horizontal, Qt::ToolTipRole)
                .toString()
                .contains(window.document().baselineTitle()));

    cw::engine::Case variant = demoCase();
    variant.compressor.pressureRatio = 11.0;
    variant.turbine.efficiency.value = 0.9;
    window.document().applyEdit(-1, QStringLiteral("edit"), variant);
    checkAgainstCore(window, cw::engine::evaluateCase(variant), cw::engine::evaluateCase(demoCase()));
    if (QTest::currentTestFailed()) return;

    // The charts overlay the baseline's cycle with losses: its states, in T-s (SI on screen).
    const cw::engine::Evaluation base = cw::engine::evaluateCase(demoCase());
    const QwtPlotCurve* overlay = window.temperatureEntropyChart()->baselineCurve();
    std::vector<QPointF> wanted;
    for (const auto& path : base.actual.paths)
      if (!path.closure)
        for (const auto& st : path.states) wanted.push_back({st.entropy, st.temperature});
    QCOMPARE(overlay->dataSize(), wanted.size());
    for (size_t i = 0; i < wanted.size(); ++i) {
      QVERIFY(near(overlay->sample(i).x(), wanted[i].x()));
      QVERIFY(near(overlay->sample(i).y(), wanted[i].y()));
    }
    // "Baseline: " and the title, cut to 32 characters for the legend.
    QVERIFY2(overlay->title().text().startsWith("Baseline: " + window.document().baselineTitle().left(31)),
             qPrintable(overlay->title().text()));
    QVERIFY(overlay->title().text().size() <= QStringLiteral("Baseline: ").size() + 32);
    QVERIFY(overlay->testItemAttribute(QwtPlotItem::Legend));
    QCOMPARE(overlay->pen().color(), QColor(0x99, 0x99, 0x99));
    QVERIFY(overlay->pen().style() != window.temperatureEntropyChart()->actualCurve()->pen().style());
    QVERIFY(overlay->pen().style() != window.temperatureEntropyChart()->idealCurve()->pen().style());
    QVERIFY(overlay->pen().style() != window.temperatureEntropyChart()->actualClosureCurve()->pen().style());
    QVERIFY(window.pressureVolumeChart()->baselineCurve()->dataSize() > 0);
    QVERIFY(window.enthalpyEntropyChart()->baselineCurve()->dataSize() > 0);

    // The exports carry the comparison: the station CSV of the difference from the baseline.
    QTemporaryDir dir;
    const QString csv = dir.filePath("stations.csv");
    QVERIFY(window.exportStationCsv(csv));
    QFile file(csv);
    QVERIFY(file.open(QIODevice::ReadOnly));
    const QString text = QString::fromUtf8(file.readAll());
    QVERIFY2(text.contains("minus the baseline"), qPrintable(text.left(300)));
    QVERIFY(text.contains(window.document().baselineTitle()));
    // The performance table's text has the baseline's columns.
    const QString table = window.performanceTableText();
    QVERIFY(table.contains("Baseline\tChange from baseline\tChange [%]"));
    // On screen the headers are short (the table fits beside the station table); tooltips say them whole.
    QCOMPARE(window.performanceModel()->headerData(P::BaselineChange, Qt::Horizontal).toString(),
             QString("Δ"));
    QCOMPARE(window.performanceModel()->headerData(P::BaselinePercent, Qt::Horizontal).toString(),
             QString("Δ [%]"));
    QVERIFY(window.performanceModel()
                ->headerData(P::BaselineChange, Qt::Horizontal, Qt::ToolTipRole)
                .toString()
                .startsWith("Change from the baseline"));
    // The results JSON holds the baseline beside the result.
    const QString json = dir.filePath("results.json");
    QVERIFY(window.exportResultJson(json));
    QFile jsonFile(json);
    QVERIFY(jsonFile.open(QIODevice::ReadOnly));
    QVERIFY(jsonFile.readAll().contains("\"baseline\""));

    // Cleared: the columns and the difference mode go.
    window.document().clearBaseline();
    QCOMPARE(window.performanceModel()->columnCount(), P::kColumnsWithoutBaseline);
    QCOMPARE(window.stationModel()->mode(), cw::gui::TableMode::Actual);
    QCOMPARE(window.temperatureEntropyChart()->baselineCurve()->dataSize(), size_t(0));
    QVERIFY(!window.temperatureEntropyChart()->baselineCurve()->testItemAttribute(QwtPlotItem::Legend));
  }

  void openedBaselineFromASavedCase() {
    cw::engine::Case baseline = demoCase();
    baseline.title = "Review A";
    baseline.compressor.pressureRatio = 7.0;
    QTemporaryDir dir;
    const QString path = dir.filePath("review-a.json");
    cw::io::writeCaseFile(path.toStdString(), baseline);

    MainWindow window;
    window.units().setSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    QVERIFY(window.openBaseline(path));
    QCOMPARE(window.document().baselineTitle(), QStringLiteral("Review A"));
    checkAgainstCore(window, cw::engine::evaluateCase(demoCase()), cw::engine::evaluateCase(baseline));
    if (QTest::currentTestFailed()) return;
    // Opening another case keeps the baseline: the comparison is across cases.
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    QVERIFY(window.document().hasBaseline());
  }

  void aBaselineWithoutACycleIsRefused() {
    cw::engine::Case weak = demoCase();
    weak.turbine.efficiency.value = 0.3;
    QTemporaryDir dir;
    const QString path = dir.filePath("weak.json");
    cw::io::writeCaseFile(path.toStdString(), weak);
    MainWindow window;
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    QString error;
    QVERIFY(!window.openBaseline(path, &error));
    QVERIFY2(error.contains("nozzle"), qPrintable(error));
    QVERIFY(!window.document().hasBaseline());
  }
};

QTEST_MAIN(TestBaseline)
#include "test_baseline.moc"
