// The charts on their own, offscreen: the base they share (palette, stale banner, exports on
// white), the stations' states and the closure, labels that neither overlap nor cross the
// curves nor leave the canvas at any export size, the h-s chart against the core's stations.
#include "audit/audit_chart.h"
#include "charts/chart_base.h"
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"
#include "charts/isobar_labels.h"
#include "charts/label_placer.h"
#include "charts/line_end_labels.h"
#include "charts/path_series.h"
#include "charts/readout_picker.h"
#include "dialogs/dialogs.h"
#include "document/settings.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"
#include "trade_study/study_chart.h"

#include "analysis/loss_audit.h"
#include "engine/process_paths.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"
#include "study/trade_study.h"

#include <nlohmann/json.hpp>

#include <qwt_abstract_legend.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_legenditem.h>
#include <qwt_plot_marker.h>
#include <qwt_plot_textlabel.h>
#include <qwt_scale_map.h>
#include <qwt_symbol.h>

#include <QAction>
#include <QApplication>
#include <QComboBox>
#include <QDir>
#include <QDoubleSpinBox>
#include <QFile>
#include <QFontMetricsF>
#include <QImage>
#include <QPen>
#include <QTabWidget>
#include <QTemporaryDir>
#include <QTest>

#include <memory>

using namespace cw::gui;

using cw::test::demoCase;

namespace {

const QString kDemo = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");

std::shared_ptr<const cw::engine::Evaluation> demoEvaluation() {
  return std::make_shared<const cw::engine::Evaluation>(cw::engine::evaluateCase(demoCase()));
}

std::shared_ptr<const cw::analysis::LossAudit> demoAudit() {
  return std::make_shared<const cw::analysis::LossAudit>(cw::analysis::auditCase(demoCase()));
}

std::shared_ptr<const cw::study::TradeStudy> demoCarpet(double lowestBurnerExit = 1200.0) {
  QFile file(kDemo);
  if (!file.open(QIODevice::ReadOnly)) qFatal("cannot read the demo case");
  cw::study::TradeStudySpec spec;
  spec.document = nlohmann::json::parse(file.readAll().toStdString());
  spec.axes = {{"compressor.pressure_ratio", 4.0, 20.0, 9},
               {"burner.exit_temperature_K", lowestBurnerExit, 1500.0, 4}};
  spec.threads = 1;
  return std::make_shared<const cw::study::TradeStudy>(cw::study::runTradeStudy(spec));
}

/// With CYCLEWRIGHT_TEST_FIGURES set to a folder, the figures the suite renders are kept there
/// to be looked at.
void saveFigure(const QImage& image, const QString& name) {
  const QString folder = qEnvironmentVariable("CYCLEWRIGHT_TEST_FIGURES");
  if (!folder.isEmpty()) image.save(QDir(folder).filePath(name + ".png"));
}

/// Whether a rectangle meets any of the curves (pixels).
bool crossesAny(const QRectF& r, const std::vector<std::vector<QPointF>>& curves) {
  for (const auto& c : curves)
    for (std::size_t k = 1; k < c.size(); ++k)
      if (segmentMeetsRect(c[k - 1], c[k], r)) return true;
  return false;
}

QString describe(const QRectF& r) {
  return QString("(%1, %2 %3 x %4)").arg(r.x()).arg(r.y()).arg(r.width()).arg(r.height());
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
    saveFigure(image, QString("audit-%1x%2-%3dpi").arg(pixels.width()).arg(pixels.height()).arg(dpi));
    const QRectF canvas = chart.lastCanvasRect();
    QVERIFY(canvas.width() > 100);
    const auto& labels = chart.valueLabelRects();
    QCOMPARE(labels.size(), chart.bars().size());
    QFont font = chart.font();
    font.setPointSizeF(font.pointSizeF() * 0.8);
    // The renderer scales the painter to the image's resolution: rectangles are in the chart's
    // logical pixels, where the text is as tall as on screen.
    const double textHeight = 0.95 * QFontMetricsF(font).height();
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

  // The legend names the selection only while there is one (it showed "Selected component" with
  // nothing selected), and says where entropy is zero on the charts with an entropy axis, whose
  // title then fits one line ("Specific entropy s [J/(kg·K)]").
  void legendNamesOnlyWhatIsShown() {
    DisplayUnits units;
    for (ChartKind kind :
         {ChartKind::TemperatureEntropy, ChartKind::PressureVolume, ChartKind::EnthalpyEntropy}) {
      CycleChart chart(kind, units);
      chart.resize(900, 600);
      chart.setEvaluation(demoEvaluation(), false);
      chart.grab();
      QVERIFY(!chart.highlightCurve()->testItemAttribute(QwtPlotItem::Legend));
      chart.setHighlightedComponent("compressor");
      QVERIFY(chart.highlightCurve()->testItemAttribute(QwtPlotItem::Legend));
      QCOMPARE(chart.highlightCurve()->title().text(), QString("Selected: Compressor"));
      chart.setHighlightedComponent("");
      QVERIFY(!chart.highlightCurve()->testItemAttribute(QwtPlotItem::Legend));
      const bool entropyAxis = kind != ChartKind::PressureVolume;
      QCOMPARE(chart.entropyNoteEntry()->testItemAttribute(QwtPlotItem::Legend), entropyAxis);
      QVERIFY(chart.entropyNoteEntry()->title().text().contains("free-stream"));
      if (entropyAxis)
        QCOMPARE(chart.axisTitle(QwtAxis::XBottom).text(), QString("Specific entropy s [J/(kg·K)]"));
    }
  }

  // The p-v chart's legend below its plot: at the laptop size (the chart 430 x 380 px in the
  // 1280 x 800 window, beside the T-s chart)
  // its short entries take at most three rows, and the plot keeps most of the height.
  void pressureVolumeLegendIsCompact() {
    DisplayUnits units;
    CycleChart chart(ChartKind::PressureVolume, units);
    chart.resize(430, 380);
    chart.setEvaluation(demoEvaluation(), false);
    chart.setHighlightedComponent("compressor");  // the most entries: seven
    chart.grab();
    QVERIFY(chart.legend());
    const int legend = chart.legend()->height();
    const int canvas = chart.canvas()->height();
    QVERIFY2(
        legend * 3 < canvas * 2 && legend < 0.25 * chart.height(),
        qPrintable(
            QString("legend %1 px, canvas %2 px, chart %3 px").arg(legend).arg(canvas).arg(chart.height())));
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

  // The readout names the station whose marker is under the cursor (so a number the placer
  // had to leave out is still found), and only there.
  void readoutNamesTheStationUnderTheCursor() {
    DisplayUnits units;
    CycleChart chart(ChartKind::TemperatureEntropy, units);
    chart.resize(800, 560);
    chart.setEvaluation(demoEvaluation(), false);
    chart.grab();
    const QwtScaleMap xMap = chart.canvasMap(QwtAxis::XBottom), yMap = chart.canvasMap(QwtAxis::YLeft);
    int named = 0;
    for (const QwtPlotMarker* m : chart.markers()) {
      if (m->label().isEmpty()) continue;
      const QPoint at(qRound(xMap.transform(m->xValue())), qRound(yMap.transform(m->yValue())));
      const QString text = chart.readoutAt(at);
      // 7 and 8 lie within a few pixels of 5 and 9 (one pressure, nearly one state): the nearest
      // number is named, either of the pair.
      QVERIFY2(text.startsWith("Station "), qPrintable(text));
      named += text.startsWith("Station " + m->label().text() + "\n") ? 1 : 0;
    }
    QVERIFY2(named >= 6, qPrintable(QString::number(named)));
    const QPoint away(qRound(xMap.transform(600.0)), qRound(yMap.transform(1300.0)));
    QVERIFY(!chart.readoutAt(away).startsWith("Station "));
    // At the smallest size a chart is given, every station has its number or none at all (left
    // out where every place is taken by another label, never drawn over one).
    for (auto kind : {ChartKind::TemperatureEntropy, ChartKind::PressureVolume, ChartKind::EnthalpyEntropy}) {
      CycleChart small(kind, units);
      small.resize(small.minimumSize());
      small.setEvaluation(demoEvaluation(), false);
      saveFigure(small.grab().toImage(), QString("smallest-%1").arg(int(kind)));
      const IsobarLabels* labels = small.isobarLabels();
      QCOMPARE(int(labels->stationRects().size()) + labels->stationsLeftOut(), 8);
      const auto& rects = labels->stationRects();
      for (std::size_t i = 0; i < rects.size(); ++i)
        for (std::size_t j = i + 1; j < rects.size(); ++j)
          QVERIFY2(!rects[i].intersects(rects[j]),
                   qPrintable(describe(rects[i]) + " over " + describe(rects[j])));
    }
  }

  // The h-s chart draws the core's sensible enthalpies h - h(298.15 K) (engine::Station,
  // thermo::Gas::sensibleEnthalpy): its station markers at h_s of the total state (2 to 7) and
  // of the static state (0, 9) against s; lossy solid, ideal dashed. The absolute h with the
  // formation enthalpies ran the burner nearly level and the closure down to about -0.5 MJ/kg.
  void enthalpyEntropyChartShowsTheCoresSensibleEnthalpies() {
    DisplayUnits units;
    CycleChart chart(ChartKind::EnthalpyEntropy, units);
    const auto evaluation = demoEvaluation();
    chart.setEvaluation(evaluation, false);
    QCOMPARE(chart.actualCurve()->pen().style(), Qt::SolidLine);
    QCOMPARE(chart.idealCurve()->pen().style(), Qt::DashLine);
    QVERIFY(chart.idealCurve()->dataSize() > 0);  // the ideal twin stays
    QVERIFY(chart.isobarCount() >= 5);
    const double hf = units.factor(Quantity::SpecificEnergy), sf = units.factor(Quantity::Entropy);
    int checked = 0;
    for (const QwtPlotMarker* marker : chart.markers()) {
      const QString id = marker->label().text();
      // Station 8 lies on the nozzle's path by interpolation in ln p (path_series.h), not at its own state.
      if (id.isEmpty() || id == "8") continue;
      const auto& station = evaluation->actual.station(id.toStdString());
      const bool statics = id == "0" || id == "9";
      const double h = statics ? station.staticSensibleEnthalpy() : station.totalSensibleEnthalpy();
      QVERIFY2(std::abs(marker->yValue() * hf - h) < 1e-9 * std::max(1.0, std::abs(h)) + 1e-6,
               qPrintable(QString("station %1: %2 vs %3").arg(id).arg(marker->yValue() * hf).arg(h)));
      QVERIFY2(
          std::abs(marker->xValue() * sf - station.entropy) < 1e-6 * 1000.0,
          qPrintable(
              QString("station %1 s: %2 vs %3").arg(id).arg(marker->xValue() * sf).arg(station.entropy)));
      ++checked;
    }
    QVERIFY(checked >= 7);
    // What a turbomachinery engineer reads off: the burner a rise of hundreds of kJ/kg, the turbine's
    // drop the core's ht4 - ht5 (one composition: sensible and absolute differences agree), the
    // free stream near zero and nothing far below it.
    const auto& a = evaluation->actual;
    const double burnerRise = a.station("4").totalSensibleEnthalpy() - a.station("3").totalSensibleEnthalpy();
    QVERIFY2(burnerRise > 3e5, qPrintable(QString::number(burnerRise)));
    QVERIFY(std::abs((a.station("4").totalSensibleEnthalpy() - a.station("5").totalSensibleEnthalpy()) -
                     (a.station("4").totalEnthalpy - a.station("5").totalEnthalpy)) < 1e-6);
    QVERIFY(chart.actualClosureCurve()->boundingRect().top() * hf > -1e5);
    // The legend inside the canvas covers no station.
    chart.resize(900, 600);
    chart.grab();
    // The axis says what it shows: in full where it has the room on one line, the symbol alone
    // where not (three charts beside each other on a laptop).
    QVERIFY2(chart.axisTitle(QwtAxis::YLeft)
                 .text()
                 .startsWith(QString::fromUtf8("Sensible enthalpy h − h(298.15 K) [")),
             qPrintable(chart.axisTitle(QwtAxis::YLeft).text()));
    chart.resize(300, 240);
    chart.grab();
    QVERIFY2(chart.axisTitle(QwtAxis::YLeft).text().startsWith(QString::fromUtf8("h − h(298.15 K) [")),
             qPrintable(chart.axisTitle(QwtAxis::YLeft).text()));
    chart.resize(900, 600);
    chart.grab();
    for (const QwtPlotItem* item : chart.itemList(QwtPlotItem::Rtti_PlotLegend)) {
      const QRectF legend =
          static_cast<const QwtPlotLegendItem*>(item)->geometry(chart.isobarLabels()->canvasRect());
      for (const QwtPlotMarker* m : chart.markers()) {
        const QPointF at(chart.canvasMap(QwtAxis::XBottom).transform(m->xValue()),
                         chart.canvasMap(QwtAxis::YLeft).transform(m->yValue()));
        QVERIFY2(!legend.contains(at), qPrintable("the legend covers station " + m->label().text()));
      }
    }
    // h3 in particular, the compressor's exit: the core's sensible ht3.
    const QwtPlotMarker* three = nullptr;
    for (const QwtPlotMarker* m : chart.markers())
      if (m->label().text() == "3") three = m;
    QVERIFY(three);
    QVERIFY(std::abs(three->yValue() * hf - a.station("3").totalSensibleEnthalpy()) < 1e-3);
  }

  // A figure is written whole or not at all: through a temporary beside the target, renamed
  // over an existing file, nothing left behind; a folder that does not exist fails cleanly.
  void figuresAreWrittenAtomically() {
    DisplayUnits units;
    CycleChart chart(ChartKind::TemperatureEntropy, units);
    chart.resize(680, 454);
    chart.setEvaluation(demoEvaluation(), false);
    QTemporaryDir dir;
    const QString png = dir.filePath("ts.png"), svg = dir.filePath("ts.svg");
    {
      QFile old(png);
      QVERIFY(old.open(QIODevice::WriteOnly));
      old.write("an older figure");
    }
    QVERIFY(exportChartPng(&chart, png, QSize(600, 400), 96));
    QCOMPARE(QImage(png).size(), QSize(600, 400));  // replaced, not appended to
    QVERIFY(exportChartDocument(&chart, svg, "svg", QSizeF(120, 80)));
    QVERIFY(exportChartDocument(&chart, svg, "svg", QSizeF(120, 80)));
    QCOMPARE(QDir(dir.path()).entryList(QDir::Files | QDir::Hidden), (QStringList{"ts.png", "ts.svg"}));
    const QString missing = dir.filePath("no-such-folder/ts.png");
    QVERIFY(!exportChartPng(&chart, missing, QSize(600, 400), 96));
    QVERIFY(!exportChartDocument(&chart, dir.filePath("no-such-folder/ts.pdf"), "pdf", QSizeF(120, 80)));
    QCOMPARE(QDir(dir.path()).entryList(QDir::Files | QDir::Hidden), (QStringList{"ts.png", "ts.svg"}));
  }

  // The T-s chart's vector exports kept only one isobar label: every label placed on screen is
  // placed in the SVG and the PDF too, and in PNGs at several sizes, inside the canvas.
  void exportsKeepEveryIsobarLabel() {
    DisplayUnits units;
    CycleChart chart(ChartKind::TemperatureEntropy, units);
    // On screen at the exports' size: 180 x 120 mm at 96 px per inch.
    chart.resize(680, 454);
    chart.setEvaluation(demoEvaluation(), false);
    chart.grab();
    const std::size_t onScreen = chart.isobarLabels()->placedRects().size();
    QVERIFY2(onScreen >= 5, qPrintable(QString::number(onScreen)));
    QTemporaryDir dir;
    for (const QString& format : {QStringLiteral("svg"), QStringLiteral("pdf")}) {
      QVERIFY(exportChartDocument(&chart, dir.filePath("ts." + format), format, QSizeF(180, 120)));
      const auto& placed = chart.isobarLabels()->placedTexts();
      QVERIFY2(placed.size() >= onScreen,
               qPrintable(format + QString(": %1 of %2 on screen: ").arg(placed.size()).arg(onScreen) +
                          QStringList(placed.begin(), placed.end()).join(", ")));
    }
  }

  // One placer for station numbers and isobar labels: none overlaps another, the isobars' labels
  // cross none of the cycle's curves, the station numbers none at the larger size, all inside
  // the canvas; on screen at two sizes and in a PNG export.
  void cycleChartLabelsNeitherOverlapNorCrossCurves_data() {
    QTest::addColumn<int>("kind");
    QTest::addColumn<QSize>("size");
    QTest::addColumn<bool>("exported");
    for (int kind : {0, 1, 2})
      for (const QSize size : {QSize(900, 600), QSize(560, 420)})
        for (bool exported : {false, true})
          QTest::addRow("kind %d, %dx%d%s", kind, size.width(), size.height(), exported ? ", PNG" : "")
              << kind << size << exported;
  }
  void cycleChartLabelsNeitherOverlapNorCrossCurves() {
    QFETCH(int, kind);
    QFETCH(QSize, size);
    QFETCH(bool, exported);
    DisplayUnits units;
    CycleChart chart(static_cast<ChartKind>(kind), units);
    chart.resize(size);
    chart.setEvaluation(demoEvaluation(), false);
    const QString name = QString("cycle-%1-%2x%3%4")
                             .arg(kind)
                             .arg(size.width())
                             .arg(size.height())
                             .arg(exported ? "-png" : "");
    if (exported)
      saveFigure(renderChartImage(&chart, size * 2, 192), name);
    else
      saveFigure(chart.grab().toImage(), name);
    const IsobarLabels* labels = chart.isobarLabels();
    const QRectF canvas = labels->canvasRect();
    QVERIFY(labels->curvePixels().size() == 4);
    const auto& stations = labels->stationRects();
    QCOMPARE(int(stations.size()), 8);  // every station number shown: 0, 2, 3, 4, 5, 7, 8, 9
    const auto& isobars = labels->placedRects();
    QVERIFY2(isobars.size() >= 2, qPrintable(QString::number(isobars.size())));
    std::vector<QRectF> all(stations.begin(), stations.end());
    all.insert(all.end(), isobars.begin(), isobars.end());
    for (std::size_t i = 0; i < all.size(); ++i) {
      QVERIFY2(canvas.contains(all[i]), qPrintable(describe(all[i]) + " outside " + describe(canvas)));
      for (std::size_t j = i + 1; j < all.size(); ++j)
        QVERIFY2(!all[i].intersects(all[j]), qPrintable(describe(all[i]) + " overlaps " + describe(all[j])));
    }
    for (const QRectF& r : isobars)
      QVERIFY2(!crossesAny(r, labels->curvePixels()),
               qPrintable("isobar label " + describe(r) + " crosses a curve"));
    // A station number is never left out, and crosses no line: where no side of its marker is
    // clear (once the small h-s chart's 5 and 7, the h-s chart's 2 in the 900 x 600 PNG), it
    // stands further out with a leader line.
    QStringList crossers;
    for (const QRectF& r : stations)
      if (crossesAny(r, labels->curvePixels())) crossers << describe(r);
    QVERIFY2(crossers.isEmpty(),
             qPrintable(QString("station numbers cross a curve: %1").arg(crossers.join(", "))));
  }

  // The legend inside the canvas covers neither cycle: in the corner the curves leave free, or
  // below the plot when none is (the small T-s chart's top left once covered the heat addition,
  // 3 to 4). On screen and in PNG and SVG exports of several sizes, as shown.
  void legendCoversNoCycle_data() {
    QTest::addColumn<int>("kind");
    QTest::addColumn<QSize>("size");
    QTest::addColumn<QString>("surface");  // "screen", "png" or "svg"
    for (int kind : {0, 2})
      for (const QSize size : {QSize(900, 600), QSize(560, 420), QSize(400, 300)})
        for (const QString surface : {"screen", "png", "svg"})
          QTest::addRow("kind %d, %dx%d %s", kind, size.width(), size.height(), qPrintable(surface))
              << kind << size << surface;
  }
  void legendCoversNoCycle() {
    QFETCH(int, kind);
    QFETCH(QSize, size);
    QFETCH(QString, surface);
    DisplayUnits units;
    CycleChart chart(static_cast<ChartKind>(kind), units);
    chart.resize(size);
    chart.setEvaluation(demoEvaluation(), false);
    QTemporaryDir dir;
    if (surface == "screen")
      saveFigure(chart.grab().toImage(),
                 QString("legend-%1-%2x%3").arg(kind).arg(size.width()).arg(size.height()));
    else if (surface == "png")
      saveFigure(renderChartImage(&chart, size * 2, 192),
                 QString("legend-%1-%2x%3-png").arg(kind).arg(size.width()).arg(size.height()));
    else  // the size in millimetres at 96 px per inch
      QVERIFY(exportChartDocument(&chart, dir.filePath("f.svg"), "svg", QSizeF(size) * 25.4 / 96.0));
    const IsobarLabels* labels = chart.isobarLabels();
    QVERIFY(labels->curvePixels().size() >= 2);
    // The cycles with losses and ideal: the first two curves the labels keep clear of.
    const std::vector<std::vector<QPointF>> cycles(labels->curvePixels().begin(),
                                                   labels->curvePixels().begin() + 2);
    for (const QRectF& legend : labels->legendRects())
      QVERIFY2(!crossesAny(legend, cycles), qPrintable("the legend " + describe(legend) + " covers a cycle"));
    // On screen inside or below, never both, never neither.
    if (surface == "screen") {
      QCOMPARE(chart.legend() != nullptr, !chart.legendItem()->isVisible());
      QCOMPARE(labels->legendRects().size(), std::size_t(chart.legend() ? 0 : 1));
    }
  }

  // Labels keep clear of the legend wherever an export puts it: inside (the p-v chart's too,
  // which has none inside on screen), right, below or none; PNGs and SVGs at several sizes and
  // resolutions.
  void labelsKeepClearOfEveryLegend_data() {
    QTest::addColumn<int>("kind");
    QTest::addColumn<int>("placement");
    for (int kind : {0, 1, 2})
      for (auto placement : {LegendPlacement::AsShown, LegendPlacement::Inside, LegendPlacement::OutsideRight,
                             LegendPlacement::Below, LegendPlacement::None})
        QTest::addRow("kind %d, legend %d", kind, int(placement)) << kind << int(placement);
  }
  void labelsKeepClearOfEveryLegend() {
    QFETCH(int, kind);
    QFETCH(int, placement);
    DisplayUnits units;
    CycleChart chart(static_cast<ChartKind>(kind), units);
    chart.resize(800, 560);
    chart.setEvaluation(demoEvaluation(), false);
    QTemporaryDir dir;
    struct Figure {
      QSize pixels;
      int dpi;
      QSizeF millimetres;  // an SVG when not empty
    };
    for (const Figure& figure : {Figure{QSize(800, 560), 96, {}}, Figure{QSize(2400, 1600), 200, {}},
                                 Figure{QSize(1000, 700), 150, {}}, Figure{{}, 0, QSizeF(180, 120)},
                                 Figure{{}, 0, QSizeF(120, 90)}}) {
      ExportOptions options;
      options.legend = static_cast<LegendPlacement>(placement);
      QString name;
      if (figure.millimetres.isEmpty()) {
        options.pixels = figure.pixels;
        options.dotsPerInch = figure.dpi;
        const QImage image = renderChartImage(&chart, options);
        name =
            QString("%1x%2 at %3 dpi").arg(figure.pixels.width()).arg(figure.pixels.height()).arg(figure.dpi);
        saveFigure(image,
                   QString("legend-labels-%1-%2-%3").arg(kind).arg(placement).arg(figure.pixels.width()));
      } else {
        options.paperSize = figure.millimetres;
        QVERIFY(exportChartDocument(&chart, dir.filePath("f.svg"), "svg", options));
        name = QString("SVG %1 x %2 mm").arg(figure.millimetres.width()).arg(figure.millimetres.height());
      }
      const IsobarLabels* labels = chart.isobarLabels();
      // Inside when asked; as shown, the T-s and h-s charts' inside or below (by the room).
      if (options.legend == LegendPlacement::Inside)
        QCOMPARE(labels->legendRects().size(), std::size_t(1));
      else if (options.legend == LegendPlacement::AsShown && kind != 1)
        QVERIFY(labels->legendRects().size() <= 1);
      else
        QCOMPARE(labels->legendRects().size(), std::size_t(0));
      std::vector<QRectF> all(labels->stationRects());
      all.insert(all.end(), labels->placedRects().begin(), labels->placedRects().end());
      QVERIFY(all.size() >= 10);
      for (const QRectF& legend : labels->legendRects())
        for (const QRectF& r : all)
          QVERIFY2(!r.intersects(legend),
                   qPrintable(name + ": label " + describe(r) + " under the legend " + describe(legend)));
    }
  }

  // An SVG's <title> is plain text, whatever rich text the figure's title is drawn with.
  void documentTitleIsPlainText() {
    DisplayUnits units;
    CycleChart chart(ChartKind::TemperatureEntropy, units);
    chart.resize(800, 560);
    chart.setEvaluation(demoEvaluation(), false);
    QTemporaryDir dir;
    auto titleOf = [&](const ExportOptions& options) {
      const QString svg = dir.filePath("ts.svg");
      if (!exportChartDocument(&chart, svg, "svg", options)) return QString("(not written)");
      QFile file(svg);
      if (!file.open(QIODevice::ReadOnly)) return QString("(not read)");
      const QString text = QString::fromUtf8(file.readAll());
      const qsizetype begin = text.indexOf("<title>"), end = text.indexOf("</title>");
      return begin < 0 || end < begin ? QString("(no title)") : text.mid(begin + 7, end - begin - 7);
    };
    ExportOptions options;
    options.title = "Demo case";
    options.subtitle = "Design point";
    const QString title = titleOf(options);
    QCOMPARE(title, QString("Demo case - Design point"));
    QVERIFY2(!title.contains('<') && !title.contains("&lt;"), qPrintable(title));
    QCOMPARE(titleOf(ExportOptions()), QString::fromUtf8("Temperature–entropy"));
    options.subtitle.clear();
    QCOMPARE(titleOf(options), QString("Demo case"));
  }

  // A pinned baseline's stations are marked on each cycle chart, in its grey, as smaller squares
  // (the current cycle's are discs and diamonds), at the baseline evaluation's station states.
  void baselineStationsAreMarked() {
    cw::engine::Case variant = demoCase();
    variant.compressor.pressureRatio = 14.0;
    const auto baseline = std::make_shared<const cw::engine::Evaluation>(cw::engine::evaluateCase(variant));
    DisplayUnits units;
    for (auto kind : {ChartKind::TemperatureEntropy, ChartKind::PressureVolume, ChartKind::EnthalpyEntropy}) {
      CycleChart chart(kind, units);
      chart.resize(800, 560);
      chart.setEvaluation(demoEvaluation(), false);
      QVERIFY(chart.baselineMarkers().empty());
      const int items = int(chart.itemList().size());
      chart.setBaseline(baseline, "PR 14");
      const auto& markers = chart.baselineMarkers();
      const auto& stations = baseline->actual.stations;
      QCOMPARE(markers.size(), stations.size());
      // Markers only: the curve's entry is the baseline's one line in the legend.
      QCOMPARE(int(chart.itemList().size()), items + int(markers.size()));
      const StateValue x =
          kind == ChartKind::PressureVolume ? StateValue::SpecificVolume : StateValue::Entropy;
      const StateValue y = kind == ChartKind::TemperatureEntropy ? StateValue::Temperature
                           : kind == ChartKind::PressureVolume   ? StateValue::Pressure
                                                                 : StateValue::SensibleEnthalpy;
      const double xf =
          units.factor(kind == ChartKind::PressureVolume ? Quantity::SpecificVolume : Quantity::Entropy);
      const double yf = units.factor(kind == ChartKind::TemperatureEntropy ? Quantity::Temperature
                                     : kind == ChartKind::PressureVolume   ? Quantity::Pressure
                                                                           : Quantity::SpecificEnergy);
      for (std::size_t k = 0; k < markers.size(); ++k) {
        const QwtPlotMarker* m = markers[k];
        const auto& station = stations[k];
        const QString id = QString::fromStdString(station.id);
        QCOMPARE(m->symbol()->style(), QwtSymbol::Rect);
        QCOMPARE(m->symbol()->brush().color(), QColor(0x99, 0x99, 0x99));
        QVERIFY(m->symbol()->size().width() < 7);
        QVERIFY(m->label().isEmpty());
        // The baseline evaluation's state of the station, in the chart's coordinates.
        cw::engine::PathState state;
        QVERIFY(stationState(baseline->actual, station, state));
        QVERIFY2(
            std::abs(m->xValue() - stateValue(state, x) / xf) <= 1e-12 * std::abs(stateValue(state, x) / xf),
            qPrintable("station " + id + " x"));
        QVERIFY2(
            std::abs(m->yValue() - stateValue(state, y) / yf) <= 1e-12 * std::abs(stateValue(state, y) / yf),
            qPrintable("station " + id + " y"));
        // And the station table's values (the core's stations: 0 and 9 static, 2 to 7 total;
        // 8 lies on the nozzle's path by interpolation in ln p, path_series.h).
        if (id == "8") continue;
        const bool statics = id == "0" || id == "9";
        double expected = 0.0;
        if (kind == ChartKind::TemperatureEntropy)
          expected = statics ? station.staticTemperature : station.totalTemperature;
        else if (kind == ChartKind::PressureVolume)
          expected = statics ? station.staticPressure : station.totalPressure;
        else
          expected = statics ? station.staticSensibleEnthalpy() : station.totalSensibleEnthalpy();
        QVERIFY2(
            std::abs(m->yValue() * yf - expected) <= 1e-9 * std::abs(expected) + 1e-6,
            qPrintable(QString("station %1: %2 against %3").arg(id).arg(m->yValue() * yf).arg(expected)));
        if (kind != ChartKind::PressureVolume)
          QVERIFY2(
              std::abs(m->xValue() * xf - station.entropy) < 1e-3,
              qPrintable(
                  QString("station %1 s: %2 against %3").arg(id).arg(m->xValue() * xf).arg(station.entropy)));
      }
      // In exports too, and gone with the baseline.
      saveFigure(renderChartImage(&chart, QSize(1600, 1120), 192),
                 QString("baseline-markers-%1").arg(int(kind)));
      QCOMPARE(chart.baselineMarkers().size(), stations.size());
      chart.setBaseline(nullptr, QString());
      QVERIFY(chart.baselineMarkers().empty());
    }
  }

  // The carpet's end labels: inside the canvas, none over another; the lines' ends are labelled
  // clear of the lines where there is room (at most one in five crosses a line).
  void carpetLabelsNeitherOverlapNorLeaveTheCanvas() {
    DisplayUnits units;
    StudyChart chart(units);
    chart.resize(760, 520);
    chart.setStudy(demoCarpet(),
                   {StudyAxisName{"Compressor pressure ratio", Quantity::Dimensionless, {}},
                    StudyAxisName{"Burner exit temperature", Quantity::Temperature, {}}},
                   false);
    chart.setOverlay(StudyOverlay::IdealTwin);
    saveFigure(chart.grab().toImage(), "carpet-ideal");
    const LineEndLabels* labels = chart.lineLabels();
    const auto& placed = labels->placedRects();
    QVERIFY2(placed.size() >= 8, qPrintable(QString::number(placed.size())));
    int crossing = 0;
    for (std::size_t i = 0; i < placed.size(); ++i) {
      QVERIFY(labels->canvasRect().contains(placed[i]));
      for (std::size_t j = i + 1; j < placed.size(); ++j) QVERIFY(!placed[i].intersects(placed[j]));
      crossing += crossesAny(placed[i], labels->curvePixels()) ? 1 : 0;
    }
    QVERIFY2(crossing * 5 <= int(placed.size()),
             qPrintable(QString("%1 of %2 cross").arg(crossing).arg(placed.size())));
    // The ideal twin's lines are labelled too.
    int overlayLabels = 0;
    for (const auto& line : chart.lines()) overlayLabels += line.overlay && !line.label.isEmpty() ? 1 : 0;
    QVERIFY(overlayLabels > 0);
  }

  // A study with points that have no cycle (burner exit temperatures too low for the turbine
  // to drive the compressor) and some barely having one: the chart scales to the bulk of the
  // points that have a cycle, the ideal twin's overlay included.
  void studyScalesToThePointsThatHaveACycle() {
    const auto study = demoCarpet(700.0);
    int failed = 0;
    double low = 1e300, high = -1e300, tsfcHigh = 0.0;
    for (const auto& p : study->points) {
      if (!p.solved()) {
        ++failed;
        continue;
      }
      tsfcHigh = std::max(tsfcHigh, p.actual.thrustSpecificFuelConsumption);
      low = std::min(low, p.actual.specificThrust);
      high = std::max(high, p.actual.specificThrust);
    }
    QVERIFY2(failed >= 3, qPrintable(QString::number(failed)));
    DisplayUnits units;
    StudyChart chart(units);
    chart.resize(760, 520);
    chart.setStudy(study,
                   {StudyAxisName{"Compressor pressure ratio", Quantity::Dimensionless, {}},
                    StudyAxisName{"Burner exit temperature", Quantity::Temperature, {}}},
                   false);
    chart.setOverlay(StudyOverlay::IdealTwin);
    saveFigure(chart.grab().toImage(), "carpet-with-failed-points");
    const QwtInterval y = chart.axisInterval(QwtAxis::YLeft);
    const double span = high - low;
    // The design point (the case as it is) is among the solved points' range here.
    QVERIFY2(y.minValue() >= low - 0.1 * span && y.maxValue() <= high + 0.6 * span,
             qPrintable(QString("axis %1 to %2, solved points %3 to %4")
                            .arg(y.minValue())
                            .arg(y.maxValue())
                            .arg(low)
                            .arg(high)));
    // The few points at the edge of having a cycle (thrust near zero, TSFC some fifty times the
    // design point's) do not squeeze the rest: the TSFC axis ends well short of them.
    const double tsfcShown = chart.axisInterval(QwtAxis::XBottom).maxValue() * units.factor(Quantity::Tsfc);
    QVERIFY2(tsfcShown < 0.2 * tsfcHigh, qPrintable(QString("%1 against %2").arg(tsfcShown).arg(tsfcHigh)));
  }

  // The waterfall docked narrow: its values do not run together.
  void waterfallValuesDoNotRunTogether() {
    DisplayUnits units;
    AuditChart chart(units);
    chart.resize(380, 300);
    chart.setAudit(demoAudit(), false);
    saveFigure(chart.grab().toImage(), "audit-narrow");
    const auto& labels = chart.valueLabelRects();
    QCOMPARE(labels.size(), chart.bars().size());
    for (std::size_t i = 0; i < labels.size(); ++i) {
      QVERIFY(chart.lastCanvasRect().contains(labels[i]));
      for (std::size_t j = i + 1; j < labels.size(); ++j)
        QVERIFY2(!labels[i].intersects(labels[j]), qPrintable(QString("values %1 and %2: ").arg(i).arg(j) +
                                                              describe(labels[i]) + describe(labels[j])));
    }
  }

  // The selection's band lies behind every line (cycle, closures, isobars, grid) and is
  // translucent, on the light and the dark palette.
  void selectionBandIsBehindTheLinesAndTranslucent() {
    auto* app = qobject_cast<QApplication*>(QCoreApplication::instance());
    const QPalette original = QApplication::palette();
    for (const bool dark : {false, true}) {
      if (dark) QVERIFY(applyPaletteNamed(*app, "dark"));
      DisplayUnits units;
      CycleChart chart(ChartKind::TemperatureEntropy, units);
      chart.setEvaluation(demoEvaluation(), false);
      chart.setHighlightedComponent("compressor");
      const QwtPlotCurve* band = chart.highlightCurve();
      QVERIFY(band->isVisible());
      QVERIFY(band->pen().color().alpha() < 128);
      int lines = 0;
      for (const QwtPlotItem* item : chart.itemList()) {
        const bool curve = item->rtti() == QwtPlotItem::Rtti_PlotCurve;
        if (!curve && item->rtti() != QwtPlotItem::Rtti_PlotGrid) continue;
        // The ideal cycle's band is the other one of the same width.
        if (curve && static_cast<const QwtPlotCurve*>(item)->pen().widthF() == band->pen().widthF()) continue;
        ++lines;
        QVERIFY2(item->z() > band->z(), qPrintable(item->title().text()));
      }
      QVERIFY(lines >= 8);  // the cycle, its twin, two closures, the isobars, the grid
    }
    QApplication::setPalette(original);
  }

  // Export options: remembered per chart; a PNG on white (or transparent) at the chosen pixels
  // and resolution; the selection off by default; the SVG with the title, subtitle and the
  // caution; the legend where asked and back as shown afterwards.
  void exportOptionsShapeTheFigure() {
    {
      AppSettings settings;
      ExportOptions options;
      options.transparent = true;
      options.legend = LegendPlacement::OutsideRight;
      options.paperUnit = PaperUnit::Inches;
      options.paperSize = QSizeF(7.0, 5.0);
      options.lineWidthScale = 1.5;
      settings.setExportOptions("pressure-volume", options);
      const ExportOptions back = settings.exportOptions("pressure-volume");
      QVERIFY(back.transparent);
      QCOMPARE(back.legend, LegendPlacement::OutsideRight);
      QCOMPARE(back.paperUnit, PaperUnit::Inches);
      QCOMPARE(back.millimetres(), QSizeF(177.8, 127.0));
      QCOMPARE(back.lineWidthScale, 1.5);
      QVERIFY(!settings.exportOptions("temperature-entropy").transparent);  // per chart
    }
    DisplayUnits units;
    CycleChart chart(ChartKind::PressureVolume, units);
    chart.resize(800, 560);
    chart.setEvaluation(demoEvaluation(), false);
    chart.setHighlightedComponent("compressor");
    QVERIFY(chart.highlightCurve()->isVisible());
    ExportOptions options;
    options.pixels = QSize(1000, 700);
    options.dotsPerInch = 150;
    const QImage white = renderChartImage(&chart, options);
    QCOMPARE(white.size(), QSize(1000, 700));
    QCOMPARE(white.dotsPerMeterX(), qRound(150 / 0.0254));
    QCOMPARE(white.pixelColor(2, 2), QColor(Qt::white));
    QVERIFY(chart.highlightCurve()->isVisible());  // back on screen
    QVERIFY(chart.legend());                       // the legend below, as shown
    // The selection: off by default, on when asked (vermillion pixels of the band).
    auto vermillion = [](const QImage& image) {
      int n = 0;
      for (int y = 0; y < image.height(); y += 2)
        for (int x = 0; x < image.width(); x += 2) {
          const QColor c = image.pixelColor(x, y);
          n += c.red() > 200 && c.green() > 120 && c.green() < 200 && c.blue() < 150 ? 1 : 0;
        }
      return n;
    };
    options.selectionHighlight = true;
    const QImage selected = renderChartImage(&chart, options);
    QVERIFY2(vermillion(selected) > vermillion(white) + 50,
             qPrintable(QString("%1 against %2").arg(vermillion(selected)).arg(vermillion(white))));
    options.selectionHighlight = false;
    options.transparent = true;
    const QImage clear = renderChartImage(&chart, options);
    QCOMPARE(clear.pixelColor(2, 2).alpha(), 0);
    saveFigure(clear, "pv-transparent");
    // SVG: the title, the subtitle and the caution line; no legend when asked for none.
    QTemporaryDir dir;
    ExportOptions vector;
    vector.title = "Review figure A";
    vector.subtitle = "Demo & variant";
    vector.legend = LegendPlacement::None;
    vector.paperUnit = PaperUnit::Inches;
    vector.paperSize = QSizeF(7.0, 5.0);
    const QString svg = dir.filePath("pv.svg");
    QVERIFY(exportChartDocument(&chart, svg, "svg", vector));
    QFile file(svg);
    QVERIFY(file.open(QIODevice::ReadOnly));
    const QString text = QString::fromUtf8(file.readAll());
    QVERIFY(text.contains("Review figure A"));
    QVERIFY(text.contains("Demo &amp; variant"));
    QVERIFY(text.contains("Results are conceptual-design estimates"));
    QVERIFY(!text.contains("Station isobars"));  // no legend
    // 7 x 5 in at the renderer's 85 dpi.
    QVERIFY2(text.contains("viewBox=\"0 0 595 425\""), qPrintable(text.left(400)));
    QVERIFY(chart.legend());  // the legend back as shown
    QCOMPARE(chart.title().text(), QString("Pressure–volume"));
  }

  // The export dialog (the image-export dialog, extended) starts from the options given and
  // returns what is shown; switching mm to inches keeps the size on paper.
  void exportDialogKeepsTheOptions() {
    ExportOptions given;
    given.transparent = true;
    given.legend = LegendPlacement::Below;
    given.title = "Case A";
    given.paperSize = QSizeF(254.0, 127.0);
    ImageExportDialog dialog("pdf", given);
    ExportOptions shown = dialog.options();
    QVERIFY(shown.transparent);
    QCOMPARE(shown.legend, LegendPlacement::Below);
    QCOMPARE(shown.title, QString("Case A"));
    QVERIFY(!shown.selectionHighlight);
    QCOMPARE(shown.millimetres(), QSizeF(254.0, 127.0));
    dialog.findChild<QComboBox*>("exportPaperUnit")->setCurrentIndex(1);
    shown = dialog.options();
    QCOMPARE(shown.paperUnit, PaperUnit::Inches);
    QVERIFY(std::abs(dialog.findChild<QDoubleSpinBox*>("exportPaperWidth")->value() - 10.0) < 1e-9);
    QVERIFY(std::abs(shown.millimetres().width() - 254.0) < 1e-9);
    ImageExportDialog png("png", ExportOptions());
    QCOMPARE(png.pixels(), QSize(2400, 1600));
    QCOMPARE(png.dotsPerInch(), 200);
    QVERIFY(!png.options().transparent);
  }
};

QTEST_MAIN(TestCharts)
#include "test_charts.moc"
