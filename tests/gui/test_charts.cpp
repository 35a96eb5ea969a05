// The charts on their own, offscreen: the base they share (palette, stale banner, exports on
// white), the stations' states and the closure, labels that neither overlap nor cross the
// curves nor leave the canvas at any export size, the h-s chart against the core's stations.
#include "audit/audit_chart.h"
#include "charts/chart_base.h"
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"
#include "charts/readout_picker.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"
#include "trade_study/study_chart.h"

#include "analysis/loss_audit.h"
#include "engine/evaluate.h"
#include "engine/process_paths.h"
#include "io/case_file.h"

#include <qwt_plot_curve.h>
#include <qwt_plot_marker.h>
#include <qwt_plot_textlabel.h>

#include <QAction>
#include <QApplication>
#include <QFile>
#include <QImage>
#include <QPen>
#include <QTabWidget>
#include <QTemporaryDir>
#include <QTest>

#include <memory>

using namespace cw::gui;

namespace {

const QString kDemo = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");

cw::engine::Case demoCase() {
  QFile file(kDemo);
  if (!file.open(QIODevice::ReadOnly)) qFatal("cannot read the demo case");
  return cw::io::parseCaseText(file.readAll().toStdString(), "demo");
}

std::shared_ptr<const cw::engine::Evaluation> demoEvaluation() {
  return std::make_shared<const cw::engine::Evaluation>(cw::engine::evaluateCase(demoCase()));
}

std::shared_ptr<const cw::analysis::LossAudit> demoAudit() {
  return std::make_shared<const cw::analysis::LossAudit>(cw::analysis::auditCase(demoCase()));
}

/// The share of an image's pixels in a border strip that are exactly `colour`.
double borderShare(const QImage& image, QColor colour) {
  int same = 0, all = 0;
  for (int x = 0; x < image.width(); x += 3)
    for (int y : {1, image.height() - 2}) {
      ++all;
      same += image.pixelColor(x, y).rgba() == colour.rgba();
    }
  return double(same) / all;
}

}  // namespace

class TestCharts : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestCharts"); }

  void everyChartSharesTheBase() {
    DisplayUnits units;
    CycleChart ts(ChartKind::TemperatureEntropy, units);
    AuditChart audit(units);
    StudyChart study(units);
    for (ChartBase* chart : std::initializer_list<ChartBase*>{&ts, &audit, &study}) {
      QVERIFY(chart->grid());
      QVERIFY(!chart->staleBanner()->isVisible());
    }
    ts.setEvaluation(demoEvaluation(), false);
    audit.setAudit(demoAudit(), false);
    for (ChartBase* chart : std::initializer_list<ChartBase*>{&ts, &audit}) {
      chart->setStale(true);
      QVERIFY(chart->isStale());
      QVERIFY(chart->staleBanner()->isVisible());
      QVERIFY(chart->staleBanner()->text().text().startsWith("Stale"));
      chart->setStale(false);
      QVERIFY(!chart->staleBanner()->isVisible());
    }
    // The study chart shows no banner without a study, stale or not.
    study.setStale(true);
    QVERIFY(study.isStale());
    QVERIFY(!study.staleBanner()->isVisible());
  }

  void exportsAreOnWhiteUnderTheDarkPalette() {
    auto* app = qobject_cast<QApplication*>(QCoreApplication::instance());
    const QPalette original = QApplication::palette();
    QVERIFY(applyPaletteNamed(*app, "dark"));
    {
      DisplayUnits units;
      CycleChart ts(ChartKind::TemperatureEntropy, units);
      AuditChart audit(units);
      ts.setEvaluation(demoEvaluation(), false);
      audit.setAudit(demoAudit(), false);
      for (QwtPlot* chart : std::initializer_list<QwtPlot*>{&ts, &audit}) {
        chart->resize(700, 460);
        const QColor base = chart->canvasBackground().color();
        QVERIFY(base.lightness() < 100);
        const QImage image = renderChartImage(chart, QSize(900, 600), 96);
        QCOMPARE(image.size(), QSize(900, 600));
        QVERIFY2(borderShare(image, Qt::white) > 0.9, qPrintable(chart->objectName()));
        // The canvas too: its middle is mostly white.
        int white = 0;
        for (int x = 300; x < 600; x += 10)
          white += image.pixelColor(x, 300).rgb() == QColor(Qt::white).rgb();
        QVERIFY2(white > 15, qPrintable(chart->objectName()));
        // The chart is back in the dark palette afterwards.
        QCOMPARE(chart->canvasBackground().color(), base);
        QVERIFY(chart->footer().isEmpty());
      }
    }
    QApplication::setPalette(original);
  }

  // The loss audit's PNG at its default 2400 x 1600 px and 200 dpi cut the top half of every
  // bar's value (a label box of a fixed 14 px). At every size and resolution each value's box
  // holds the text's height on that device and lies inside the canvas.
  void auditValueLabelsAreNeverClipped_data() {
    QTest::addColumn<QSize>("pixels");
    QTest::addColumn<int>("dpi");
    QTest::newRow("default 2400 x 1600 at 200 dpi") << QSize(2400, 1600) << 200;
    QTest::newRow("900 x 600 at 96 dpi") << QSize(900, 600) << 96;
    QTest::newRow("1200 x 800 at 300 dpi") << QSize(1200, 800) << 300;
    QTest::newRow("3600 x 1200 at 600 dpi") << QSize(3600, 1200) << 600;
    QTest::newRow("600 x 400 at 50 dpi") << QSize(600, 400) << 50;
  }
  void auditValueLabelsAreNeverClipped() {
    QFETCH(QSize, pixels);
    QFETCH(int, dpi);
    DisplayUnits units;
    AuditChart chart(units);
    chart.resize(800, 500);
    chart.setAudit(demoAudit(), false);
    const QImage image = renderChartImage(&chart, pixels, dpi);
    QCOMPARE(image.size(), pixels);
    const QRectF canvas = chart.lastCanvasRect();
    QVERIFY(canvas.width() > 100);
    const auto& labels = chart.valueLabelRects();
    QCOMPARE(labels.size(), chart.bars().size());
    QFont font = chart.font();
    font.setPointSizeF(font.pointSizeF() * 0.8);
    const double textHeight = font.pointSizeF() * dpi / 72.0;  // the cap-to-descent box exceeds this
    for (const QRectF& r : labels) {
      QVERIFY2(canvas.contains(r), qPrintable(QString("label %1,%2 %3x%4 outside the canvas %5,%6 %7x%8")
                                                  .arg(r.x())
                                                  .arg(r.y())
                                                  .arg(r.width())
                                                  .arg(r.height())
                                                  .arg(canvas.x())
                                                  .arg(canvas.y())
                                                  .arg(canvas.width())
                                                  .arg(canvas.height())));
      QVERIFY2(r.height() >= textHeight, qPrintable(QString("%1 < %2").arg(r.height()).arg(textHeight)));
    }
  }

  // Stations 0, 8 and 9 are static states, 2 to 7 total ones: the markers' legend entry says so
  // on every cycle chart.
  void stationStatesAreNamedInTheLegend() {
    DisplayUnits units;
    for (ChartKind kind :
         {ChartKind::TemperatureEntropy, ChartKind::PressureVolume, ChartKind::EnthalpyEntropy}) {
      CycleChart chart(kind, units);
      chart.setEvaluation(demoEvaluation(), false);
      const QwtPlotCurve* entry = chart.stationLegendEntry();
      QVERIFY(entry->testItemAttribute(QwtPlotItem::Legend));
      QVERIFY(entry->testLegendAttribute(QwtPlotCurve::LegendShowSymbol));
      const QString title = entry->title().text();
      QVERIFY2(title.contains("0, 8, 9 static") && title.contains("2 to 7 total"), qPrintable(title));
    }
  }

  // The p-v chart's closure is the isobar at p0 from the end of the exhaust's expansion to the
  // free-stream static state (no bulge), drawn dashed, with the core's values.
  void pressureVolumeClosureIsTheAmbientIsobar() {
    DisplayUnits units;
    CycleChart chart(ChartKind::PressureVolume, units);
    const auto evaluation = demoEvaluation();
    chart.setEvaluation(evaluation, false);
    const QwtPlotCurve* closure = chart.actualClosureCurve();
    QVERIFY(closure->pen().style() != Qt::SolidLine);
    const auto& s0 = evaluation->actual.station("0");
    const auto& s9 = evaluation->actual.station("9");
    QVERIFY(s9.staticPressure > 1.05 * s0.staticPressure);  // the demo's convergent nozzle is choked
    const double pf = units.factor(Quantity::Pressure), vf = units.factor(Quantity::SpecificVolume);
    const std::size_t n = closure->dataSize();
    QCOMPARE(n, std::size_t(cw::engine::kClosureExpansionStates - 1 + cw::engine::kPathStates));
    QVERIFY(std::abs(closure->sample(0).y() * pf - s9.staticPressure) < 1e-9 * s9.staticPressure);
    for (std::size_t k = n - cw::engine::kPathStates; k < n; ++k)
      QVERIFY(std::abs(closure->sample(k).y() * pf - s0.staticPressure) < 1e-9 * s0.staticPressure);
    // Along the isobar the volume falls monotonically to the free stream's.
    for (std::size_t k = n - cw::engine::kPathStates + 1; k < n; ++k)
      QVERIFY(closure->sample(k).x() < closure->sample(k - 1).x());
    const double v0 = s0.gas->gasConstant() * s0.staticTemperature / s0.staticPressure;
    QVERIFY(std::abs(closure->sample(n - 1).x() * vf - v0) < 1e-9 * v0);
  }

  // Charts in tabs: only the current tab's chart is visible, from the first paint on.
  void tabbedChartsShowOnlyTheCurrentTab() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1400, 900);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    window.setChartLayout(ChartLayout::Tabbed);
    QCoreApplication::processEvents();
    auto* tabs = window.findChild<QTabWidget*>("chartTabs");
    QVERIFY(tabs && tabs->isVisible());
    QCOMPARE(tabs->count(), 3);
    QCOMPARE(tabs->currentWidget(), window.temperatureEntropyChart());
    QVERIFY(window.temperatureEntropyChart()->isVisible());
    QVERIFY(!window.pressureVolumeChart()->isVisible());
    QVERIFY(!window.enthalpyEntropyChart()->isVisible());
    tabs->setCurrentIndex(1);
    QVERIFY(window.pressureVolumeChart()->isVisible());
    QVERIFY(!window.temperatureEntropyChart()->isVisible());
    window.setChartLayout(ChartLayout::SideBySide);
    QVERIFY(window.temperatureEntropyChart()->isVisible());
    QVERIFY(window.pressureVolumeChart()->isVisible());
    QVERIFY(!window.enthalpyEntropyChart()->isVisible());  // beside the others on request
    auto* beside = window.findChild<QAction*>("enthalpyEntropyBesideAction");
    QVERIFY(beside);
    beside->setChecked(true);
    for (CycleChart* chart :
         {window.temperatureEntropyChart(), window.pressureVolumeChart(), window.enthalpyEntropyChart()})
      QVERIFY2(chart->isVisible(), qPrintable(chart->objectName()));
    window.setChartLayout(ChartLayout::Tabbed);
    QVERIFY(!window.enthalpyEntropyChart()->isVisible());
    tabs->setCurrentIndex(2);
    QVERIFY(window.enthalpyEntropyChart()->isVisible());
    QVERIFY(!window.temperatureEntropyChart()->isVisible());
  }

  // The hover readout's box stays inside the canvas at every edge and corner.
  void readoutStaysInsideTheCanvas() {
    const QRect area(0, 0, 400, 300);
    const QSize box(150, 48);
    for (const QPoint cursor : {QPoint(395, 5), QPoint(5, 5), QPoint(395, 295), QPoint(5, 295),
                                QPoint(200, 150), QPoint(399, 150)}) {
      const QRect r = ReadoutPicker::placeInside(box, cursor, area);
      QVERIFY2(area.contains(r), qPrintable(QString("%1,%2").arg(cursor.x()).arg(cursor.y())));
      QCOMPARE(r.size(), box);
    }
    // A box larger than the room on either side of the cursor is still inside.
    QVERIFY(area.contains(ReadoutPicker::placeInside(QSize(380, 48), QPoint(200, 20), area)));
    // In the middle it sits above right of the cursor, clear of it.
    const QRect middle = ReadoutPicker::placeInside(box, QPoint(200, 150), area);
    QVERIFY(middle.left() > 200 && middle.bottom() < 150);
  }

  // The h-s chart draws the core's enthalpies: its station markers at the core's ht (2 to 7)
  // and h (0, 9 static) against s; lossy solid, ideal dashed.
  void enthalpyEntropyChartShowsTheCoresStations() {
    DisplayUnits units;
    CycleChart chart(ChartKind::EnthalpyEntropy, units);
    const auto evaluation = demoEvaluation();
    chart.setEvaluation(evaluation, false);
    QCOMPARE(chart.actualCurve()->pen().style(), Qt::SolidLine);
    QCOMPARE(chart.idealCurve()->pen().style(), Qt::DashLine);
    QVERIFY(chart.isobarCount() >= 5);
    const double hf = units.factor(Quantity::SpecificEnergy), sf = units.factor(Quantity::Entropy);
    int checked = 0;
    for (const QwtPlotMarker* marker : chart.markers()) {
      const QString id = marker->label().text();
      // Station 8 lies on the nozzle's path by interpolation in ln p (path_series.h), not at its own state.
      if (id.isEmpty() || id == "8") continue;
      const auto& station = evaluation->actual.station(id.toStdString());
      const bool statics = id == "0" || id == "9";
      const double h = statics ? station.gas->enthalpy(station.staticTemperature) : station.totalEnthalpy;
      QVERIFY2(std::abs(marker->yValue() * hf - h) < 1e-6 * std::max(1.0, std::abs(h)) + 1e-3,
               qPrintable(QString("station %1: %2 vs %3").arg(id).arg(marker->yValue() * hf).arg(h)));
      QVERIFY2(
          std::abs(marker->xValue() * sf - station.entropy) < 1e-6 * 1000.0,
          qPrintable(
              QString("station %1 s: %2 vs %3").arg(id).arg(marker->xValue() * sf).arg(station.entropy)));
      ++checked;
    }
    QVERIFY(checked >= 7);
    // h3 in particular, the compressor's exit: the core's ht3.
    const QwtPlotMarker* three = nullptr;
    for (const QwtPlotMarker* m : chart.markers())
      if (m->label().text() == "3") three = m;
    QVERIFY(three);
    QVERIFY(std::abs(three->yValue() * hf - evaluation->actual.station("3").totalEnthalpy) < 1e-3);
  }
};

QTEST_MAIN(TestCharts)
#include "test_charts.moc"
