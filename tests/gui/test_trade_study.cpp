// The trade-study panel, offscreen: a study run through the panel (in its background thread)
// draws the same numbers as cw::study::runTradeStudy on the same spec; a carpet has one line per
// value of each input, labelled at its end without overlaps; the design point marker sits at the
// case's own figures; the ideal-twin overlay is the study's ideal figures and the "one input set
// differently" overlay a second study with that override, both dashed; Cancel stops a large study
// with "stopped after N of M points", a new Run replaces a running one and closing the window
// joins its thread; points without a cycle leave gaps and are counted; the CSV and JSON exports
// are the core's; invalid entries mark their field and disable Run; the unit system converts
// axes, curves and fields; an edit of the case marks the study stale until Run; the panel starts
// as a tab and moves into its dock; its choices are remembered; --study-vary with --screenshot-of
// renders it; it reads on the dark palette.
#include "charts/chart_export.h"
#include "charts/line_end_labels.h"
#include "document/case_document.h"
#include "document/selection_router.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"
#include "trade_study/study_axis_editor.h"
#include "trade_study/study_change_editor.h"
#include "trade_study/study_chart.h"
#include "trade_study/study_panel.h"
#include "trade_study/study_table_model.h"

#include "common/version.h"
#include "io/case_file.h"
#include "study/study_columns.h"
#include "study/study_export.h"
#include "study/trade_study.h"

#include <qwt_plot_curve.h>
#include <qwt_plot_marker.h>
#include <qwt_scale_widget.h>
#include <qwt_symbol.h>
#include <qwt_text.h>

#include <QAction>
#include <QApplication>
#include <QCheckBox>
#include <QClipboard>
#include <QComboBox>
#include <QDockWidget>
#include <QFile>
#include <QFontMetricsF>
#include <QHeaderView>
#include <QImage>
#include <QLabel>
#include <QLineEdit>
#include <QProcess>
#include <QProgressBar>
#include <QPushButton>
#include <QSettings>
#include <QSignalSpy>
#include <QSpinBox>
#include <QTabWidget>
#include <QTableView>
#include <QTemporaryDir>
#include <QTest>
#include <QUndoStack>

#include <algorithm>
#include <cmath>
#include <memory>

using cw::gui::MainWindow;
using cw::gui::StudyChart;
using cw::gui::TradeStudyPanel;
using cw::study::PointStatus;
using cw::study::StudyPoint;
using cw::study::SweepAxis;
using cw::study::TradeStudy;
using Family = StudyChart::Family;

using cw::test::typeInto;

namespace {

const QString kDemo = QStringLiteral(":/demo/demo-turbojet.json");
constexpr int kLong = 300000;  // [ms] an upper bound for a background study on a busy machine, not a goal

bool near(double a, double b, double relative = 1e-12) {
  return std::fabs(a - b) <= relative * std::max(1.0, std::fabs(b));
}

/// Runs the panel's study and waits for it to come back from its thread.
bool runAndWait(TradeStudyPanel* panel) {
  QSignalSpy finished(panel, &TradeStudyPanel::studyFinished);
  if (!panel->run()) return false;
  return QTest::qWaitFor([&] { return finished.count() == 1; }, kLong) && !panel->isRunning();
}

/// The core's study on the open case, as the panel builds its spec (one thread: the output does
/// not depend on the number, trade_study.h).
TradeStudy reference(const MainWindow& window, const std::vector<SweepAxis>& axes,
                     const std::string& assignment = {}) {
  cw::study::TradeStudySpec spec;
  spec.document = cw::io::caseToJson(window.document().currentCase());
  if (!assignment.empty()) cw::io::applySetOverride(spec.document, assignment);
  spec.axes = axes;
  spec.threads = 1;
  return cw::study::runTradeStudy(spec);
}

const cw::study::StudyColumn& column(const std::string& name) {
  static const std::vector<cw::study::StudyColumn> all = cw::study::studyColumns(true);
  for (const auto& c : all)
    if (c.name == name) return c;
  qFatal("no column %s", name.c_str());
}

std::vector<const StudyChart::Line*> linesOf(const StudyChart* chart, Family family, bool overlay) {
  std::vector<const StudyChart::Line*> out;
  for (const auto& l : chart->lines())
    if (l.family == family && l.overlay == overlay) out.push_back(&l);
  return out;
}

/// The points of a line, segments joined, in SI.
std::vector<QPointF> pointsOf(const StudyChart::Line& line) {
  std::vector<QPointF> out;
  for (const auto& s : line.segments) out.insert(out.end(), s.begin(), s.end());
  return out;
}

/// The carpet's (TSFC, F_s) of the points along a line, where they have both [SI].
std::vector<QPointF> expected(const TradeStudy& s, bool ideal, int fixed, bool fixedIsFirst) {
  const auto& tsfc = column(ideal ? "ideal.tsfc_g_per_kN_s" : "tsfc_g_per_kN_s");
  const auto& fs = column(ideal ? "ideal.specific_thrust_N_s_per_kg" : "specific_thrust_N_s_per_kg");
  std::vector<QPointF> out;
  const int n = fixedIsFirst ? s.axes[1].count : s.axes[0].count;
  for (int k = 0; k < n; ++k) {
    const StudyPoint& p = fixedIsFirst ? s.at(fixed, k) : s.at(k, fixed);
    const auto x = tsfc.value(p), y = fs.value(p);
    if (x && y) out.emplace_back(*x, *y);
  }
  return out;
}

void compareCarpet(const StudyChart* chart, const TradeStudy& s, bool overlay, bool ideal) {
  const auto first = linesOf(chart, Family::ConstantFirst, overlay);
  const auto second = linesOf(chart, Family::ConstantSecond, overlay);
  QCOMPARE(static_cast<int>(first.size()), s.axes[0].count);
  QCOMPARE(static_cast<int>(second.size()), s.axes[1].count);
  for (int i = 0; i < s.axes[0].count; ++i) {
    const auto want = expected(s, ideal, i, true);
    const auto got = pointsOf(*first[static_cast<std::size_t>(i)]);
    QCOMPARE(got.size(), want.size());
    for (std::size_t k = 0; k < got.size(); ++k) {
      QVERIFY(near(got[k].x(), want[k].x()));
      QVERIFY(near(got[k].y(), want[k].y()));
    }
  }
  for (int j = 0; j < s.axes[1].count; ++j) {
    const auto want = expected(s, ideal, j, false);
    const auto got = pointsOf(*second[static_cast<std::size_t>(j)]);
    QCOMPARE(got.size(), want.size());
    for (std::size_t k = 0; k < got.size(); ++k) {
      QVERIFY(near(got[k].x(), want[k].x()));
      QVERIFY(near(got[k].y(), want[k].y()));
    }
  }
}

const std::vector<SweepAxis> kCarpet = {{"compressor.pressure_ratio", 4.0, 24.0, 6},
                                        {"burner.exit_temperature_K", 1100.0, 1700.0, 4}};

}  // namespace

class TestTradeStudy : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() {
    cw::test::isolateGuiTest("CyclewrightTestStudy");
    QSettings().clear();
  }
  void init() { QSettings().remove("study"); }  // each test starts from the default choices

  void sweepThroughThePanelEqualsTheCore() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    const std::vector<SweepAxis> axes = {{"compressor.pressure_ratio", 2.0, 30.0, 15}};
    QVERIFY(panel->setAxes(axes));
    QVERIFY(!panel->carpetBox()->isChecked());
    QVERIFY(runAndWait(panel));
    const TradeStudy want = reference(window, axes);
    QVERIFY(panel->study());
    QCOMPARE(panel->study()->points.size(), want.points.size());
    QVERIFY(panel->studiedSpec().document == cw::io::caseToJson(window.document().currentCase()));
    QCOMPARE(panel->studiedSpec().axes, axes);

    // Specific thrust against the pressure ratio: one line, every point (the demo has a cycle at each).
    const StudyChart* chart = panel->chart();
    QCOMPARE(chart->plot(), cw::gui::StudyPlot::Output);
    QCOMPARE(chart->column(), std::string("specific_thrust_N_s_per_kg"));
    const auto sweep = linesOf(chart, Family::Sweep, false);
    QCOMPARE(sweep.size(), std::size_t(1));
    QCOMPARE(want.count(PointStatus::Solved), want.points.size());
    const auto got = pointsOf(*sweep.front());
    QCOMPARE(got.size(), want.points.size());
    for (std::size_t i = 0; i < got.size(); ++i) {
      QVERIFY(near(got[i].x(), want.points[i].inputs[0]));
      QVERIFY(near(got[i].y(), want.points[i].actual.specificThrust));
    }
    // The curve as drawn: SI display units, the same numbers.
    const QwtPlotCurve* curve = sweep.front()->curves.front();
    QCOMPARE(curve->dataSize(), want.points.size());
    for (std::size_t i = 0; i < curve->dataSize(); ++i) {
      QVERIFY(near(curve->sample(i).x(), want.points[i].inputs[0]));
      QVERIFY(near(curve->sample(i).y(), want.points[i].actual.specificThrust));
    }

    // TSFC through the plot choice: shown in g/(kN s), 1e6 times the SI kg/(N s).
    QVERIFY(panel->setPlotColumn("tsfc_g_per_kN_s"));
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("g/(kN·s)"));
    const QwtPlotCurve* tsfc = linesOf(chart, Family::Sweep, false).front()->curves.front();
    for (std::size_t i = 0; i < tsfc->dataSize(); ++i)
      QVERIFY(near(tsfc->sample(i).y(), want.points[i].actual.thrustSpecificFuelConsumption * 1e6));
    // The table: one row per point, with the reason column last.
    QCOMPARE(panel->model()->rowCount(), static_cast<int>(want.points.size()));
    QVERIFY(near(panel->model()->index(3, 0).data(cw::gui::StudyTableModel::ValueRole).toDouble(),
                 want.points[3].inputs[0]));
    QVERIFY(panel->noteLabel()->text().contains("15"));
  }

  void carpetHasLabelledLinesOfConstantInput() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1600, 1000);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    window.bottomTabs()->setCurrentWidget(window.tradeStudyPanel());
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    const TradeStudy want = reference(window, kCarpet);
    StudyChart* chart = panel->chart();
    QCOMPARE(chart->plot(), cw::gui::StudyPlot::Carpet);
    QVERIFY(chart->axisTitle(QwtAxis::XBottom).text().contains("TSFC"));
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("N·s/kg"));
    compareCarpet(chart, want, false, false);

    // One line per value of each input, each labelled with its value and unit.
    const auto first = linesOf(chart, Family::ConstantFirst, false);
    const auto second = linesOf(chart, Family::ConstantSecond, false);
    QCOMPARE(first.size(), std::size_t(6));
    QCOMPARE(second.size(), std::size_t(4));
    QCOMPARE(first.front()->label, QString("4"));  // the pressure ratio has no unit
    QCOMPARE(first.back()->label, QString("24"));
    QCOMPARE(second.front()->label, QString("1100 K"));
    QCOMPARE(second.back()->label, QString("1700 K"));
    // Different colours and line styles for the two families; the legend names the inputs.
    const QPen a = first.front()->curves.front()->pen(), b = second.front()->curves.front()->pen();
    QVERIFY(a.color() != b.color());
    QVERIFY(a.style() != b.style());
    QVERIFY(first.front()->curves.front()->testItemAttribute(QwtPlotItem::Legend));
    QVERIFY(first.front()->curves.front()->title().text().contains("Pressure ratio"));
    QVERIFY(second.front()->curves.front()->title().text().contains("Exit temperature Tt4"));
    QVERIFY(!first.back()->curves.front()->testItemAttribute(QwtPlotItem::Legend));  // once per family

    // Drawn labels: inside the canvas, none over another; most of the ten fit.
    chart->grab();
    const cw::gui::LineEndLabels* labels = chart->lineLabels();
    QCOMPARE(labels->labelCount(), 10);
    const auto& rects = labels->placedRects();
    QVERIFY2(rects.size() >= 8, qPrintable(QString::number(rects.size())));
    for (std::size_t i = 0; i < rects.size(); ++i) {
      QVERIFY(QRectF(chart->canvas()->rect()).contains(rects[i]));
      for (std::size_t k = i + 1; k < rects.size(); ++k) QVERIFY(!rects[i].intersects(rects[k]));
    }
    for (const QString& text : labels->placedTexts()) {
      const bool known = std::any_of(chart->lines().begin(), chart->lines().end(),
                                     [&](const StudyChart::Line& l) { return l.label == text; });
      QVERIFY2(known, qPrintable(text));
    }
    QVERIFY(labels->placedTexts().size() + static_cast<std::size_t>(labels->skippedCount()) == 10);

    // Any output against the first input: one curve per value of the second.
    QVERIFY(panel->setPlotColumn("thermal_efficiency"));
    QCOMPARE(linesOf(chart, Family::ConstantSecond, false).size(), std::size_t(4));
    QCOMPARE(linesOf(chart, Family::ConstantFirst, false).size(), std::size_t(0));
    const auto curve = linesOf(chart, Family::ConstantSecond, false)[2];
    const auto pts = pointsOf(*curve);
    QCOMPARE(pts.size(), std::size_t(6));
    for (int i = 0; i < 6; ++i) {
      QVERIFY(near(pts[static_cast<std::size_t>(i)].x(), want.at(i, 2).inputs[0]));
      QVERIFY(near(pts[static_cast<std::size_t>(i)].y(), want.at(i, 2).actual.thermalEfficiency));
    }
    QCOMPARE(curve->label, QString("1500 K"));
  }

  void carpetLabelsStayClearAtSmallAndLargeSizes() {
    // The user guide's carpet (pressure ratio 4 to 24 in 11, Tt4 1100 to 1700 K in 7) with the
    // ideal twin, whose lines of constant pressure ratio converge at the top left: the panel
    // alone at 600 x 400 and 1800 x 1050. No two labels meet; none leaves the canvas or covers
    // the design point's star, its label or the legend; the first and last line of every
    // family, the ideal twin's too, are labelled; the legend gives each family's step.
    MainWindow window;
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(
        {{"compressor.pressure_ratio", 4.0, 24.0, 11}, {"burner.exit_temperature_K", 1100.0, 1700.0, 7}}));
    panel->setComparison(cw::gui::StudyOverlay::IdealTwin);
    QVERIFY(runAndWait(panel));
    QDockWidget* dock = window.tradeStudyDock();
    dock->setWidget(nullptr);
    panel->setParent(nullptr);
    StudyChart* chart = panel->chart();
    for (const QSize size : {QSize(600, 400), QSize(1800, 1050)}) {
      panel->resize(size);
      panel->show();
      QVERIFY(QTest::qWaitForWindowExposed(panel));
      for (int i = 0; i < 4; ++i) QApplication::processEvents();
      chart->grab();
      const QString at = QString("%1 x %2: ").arg(size.width()).arg(size.height());
      const cw::gui::LineEndLabels* labels = chart->lineLabels();
      QCOMPARE(labels->labelCount(), 2 * (11 + 7));
      const auto& rects = labels->placedRects();
      const QRectF canvas = labels->canvasRect();
      QVERIFY(!labels->obstacleRects().empty());  // the star and its label
      for (std::size_t i = 0; i < rects.size(); ++i) {
        QVERIFY2(canvas.contains(rects[i]), qPrintable(at + labels->placedTexts()[i]));
        for (std::size_t k = i + 1; k < rects.size(); ++k)
          QVERIFY2(!rects[i].intersects(rects[k]),
                   qPrintable(at + labels->placedTexts()[i] + " meets " + labels->placedTexts()[k]));
        for (const QRectF& o : labels->obstacleRects())
          QVERIFY2(!rects[i].intersects(o), qPrintable(at + labels->placedTexts()[i] + " covers a marker"));
      }
      const auto& ids = labels->placedIds();
      for (const Family family : {Family::ConstantFirst, Family::ConstantSecond})
        for (const bool overlay : {false, true}) {
          const auto lines = linesOf(chart, family, overlay);
          QVERIFY(lines.size() >= 2);
          for (const StudyChart::Line* line : {lines.front(), lines.back()}) {
            const int id = static_cast<int>(line - chart->lines().data());
            QVERIFY2(std::find(ids.begin(), ids.end(), id) != ids.end(),
                     qPrintable(at + line->label + (overlay ? " (ideal)" : "") + " not labelled"));
          }
        }
    }
    QVERIFY(linesOf(chart, Family::ConstantFirst, false)
                .front()
                ->curves.front()
                ->title()
                .text()
                .endsWith("step 2"));
    QVERIFY(linesOf(chart, Family::ConstantSecond, false)
                .front()
                ->curves.front()
                ->title()
                .text()
                .endsWith("step 100 K"));
    dock->setWidget(panel);
  }

  void designPointSitsAtTheCasesFigures() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    const auto evaluation = window.document().evaluation();
    QVERIFY(evaluation);
    const auto& p = evaluation->actual.performance;
    const QwtPlotMarker* marker = panel->chart()->designMarker();
    QVERIFY(marker);
    // The carpet's plane: TSFC in g/(kN s) (1e-6 kg/(N s) each), specific thrust in N s/kg.
    QVERIFY(near(marker->value().x(), p.thrustSpecificFuelConsumption * 1e6, 1e-9));
    QVERIFY(near(marker->value().y(), p.specificThrust, 1e-9));
    QCOMPARE(marker->label().text(), QString("Design point"));
    QVERIFY(marker->symbol() && marker->symbol()->style() == QwtSymbol::Star2);
    // Against the first input: at the case's own pressure ratio (8 in the demo case file).
    QVERIFY(panel->setPlotColumn("net_thrust_N"));
    marker = panel->chart()->designMarker();
    QVERIFY(marker);
    QCOMPARE(marker->value().x(), 8.0);
    QVERIFY(near(marker->value().y(), p.netThrust, 1e-9));
  }

  void idealTwinOverlayIsTheStudysIdealFiguresDashed() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    panel->setComparison(cw::gui::StudyOverlay::IdealTwin);  // no second run: the study has its ideal twin
    const StudyChart* chart = panel->chart();
    compareCarpet(chart, reference(window, kCarpet), true, true);
    const auto main = linesOf(chart, Family::ConstantFirst, false).front()->curves.front();
    const auto twin = linesOf(chart, Family::ConstantFirst, true).front()->curves.front();
    QCOMPARE(main->pen().style(), Qt::SolidLine);
    QCOMPARE(twin->pen().style(), Qt::DashLine);
    QVERIFY(twin->pen().color() != main->pen().color());
    QVERIFY(twin->testItemAttribute(QwtPlotItem::Legend));
    QVERIFY(twin->title().text().contains("Ideal twin"));

    // Against the first input: the ideal twin's own column of the same output.
    QVERIFY(panel->setPlotColumn("specific_thrust_N_s_per_kg"));
    const TradeStudy& s = *panel->study();
    const auto ideal = linesOf(chart, Family::ConstantSecond, true);
    QCOMPARE(ideal.size(), std::size_t(4));
    const auto pts = pointsOf(*ideal[1]);
    for (int i = 0; i < 6; ++i)
      QVERIFY(near(pts[static_cast<std::size_t>(i)].y(), s.at(i, 1).ideal.specificThrust));
    QCOMPARE(ideal[1]->curves.front()->pen().style(), Qt::DashLine);
    // A sizing figure has no ideal twin of its own: said, not drawn.
    QVERIFY(panel->setPlotColumn("nozzle_throat_area_m2"));
    QCOMPARE(linesOf(chart, Family::ConstantSecond, true).size(), std::size_t(0));
    QVERIFY(!chart->overlayNote().isEmpty());
    QVERIFY(panel->noteLabel()->text().contains(chart->overlayNote()));
  }

  void oneInputSetDifferentlyIsASecondStudy() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(panel->setChangedInput("compressor.isentropic_efficiency", 0.80));
    QCOMPARE(panel->compareBox()->currentIndex(), 2);
    QVERIFY(panel->changeEditor()->isEnabled());
    QCOMPARE(panel->changeEditor()->valueEdit()->text(), QString("0.8"));
    QVERIFY(runAndWait(panel));
    QVERIFY(panel->changedStudy());
    const TradeStudy changed = reference(window, kCarpet, "compressor.isentropic_efficiency=0.8");
    const StudyChart* chart = panel->chart();
    compareCarpet(chart, changed, true, false);
    // It differs from the study itself (a worse compressor), and it is dashed and named.
    const auto mine = pointsOf(*linesOf(chart, Family::ConstantFirst, false)[2]);
    const auto other = pointsOf(*linesOf(chart, Family::ConstantFirst, true)[2]);
    QVERIFY(other.front().y() < mine.front().y());
    const auto curve = linesOf(chart, Family::ConstantFirst, true).front()->curves.front();
    QCOMPARE(curve->pen().style(), Qt::DashLine);
    QVERIFY(curve->title().text().contains("Isentropic efficiency = 0.8"));

    // A different value is not this study: the chart says so until Run.
    panel->changeEditor()->setValue(0.75);
    QCOMPARE(linesOf(chart, Family::ConstantFirst, true).size(), std::size_t(0));
    QVERIFY(chart->overlayNote().contains("Run"));
    // The input set differently may not be one the study varies.
    QVERIFY(panel->changeEditor()->setPath("compressor.pressure_ratio"));
    QVERIFY(!panel->runButton()->isEnabled());
    QVERIFY(panel->changeEditor()->errorLabel()->text().contains("varied"));
  }

  void cancelStopsALargeStudy() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    const std::vector<SweepAxis> big = {{"compressor.pressure_ratio", 2.0, 40.0, 400},
                                        {"burner.exit_temperature_K", 1000.0, 1800.0, 400}};
    QVERIFY(panel->setAxes(big));
    QSignalSpy finished(panel, &TradeStudyPanel::studyFinished);
    QVERIFY(panel->run());
    QVERIFY(panel->isRunning());
    QVERIFY(panel->cancelButton()->isEnabled());
    QTRY_VERIFY_WITH_TIMEOUT(panel->progressBar()->value() > 0, kLong);  // some points have run
    QTest::mouseClick(panel->cancelButton(), Qt::LeftButton);
    QTRY_COMPARE_WITH_TIMEOUT(finished.count(), 1, kLong);
    QVERIFY(!panel->isRunning());
    const auto s = panel->study();
    QVERIFY(s);
    QVERIFY(s->stopped);
    const std::size_t ran = s->points.size() - s->count(PointStatus::NotRun);
    QVERIFY(ran > 0);
    QVERIFY(ran < s->points.size());
    QCOMPARE(s->points.size(), std::size_t(160000));
    QVERIFY2(panel->noteLabel()->text().contains(QString("Stopped after %1 of 160000 points").arg(ran)),
             qPrintable(panel->noteLabel()->text()));
    // The chart shows the points that ran, no more.
    std::size_t shown = 0;
    for (const auto* l : linesOf(panel->chart(), Family::ConstantFirst, false)) shown += pointsOf(*l).size();
    QVERIFY(shown <= ran);
    QVERIFY(shown > 0);

    // A new Run while one runs replaces it: one result, the new grid.
    QVERIFY(panel->run());
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    QCOMPARE(panel->study()->points.size(), std::size_t(24));
    QVERIFY(!panel->study()->stopped);
  }

  void closingTheWindowStopsAndJoins() {
    auto window = std::make_unique<MainWindow>();
    QVERIFY(window->openCase(kDemo));
    TradeStudyPanel* panel = window->tradeStudyPanel();
    QVERIFY(panel->setAxes(
        {{"compressor.pressure_ratio", 2.0, 40.0, 400}, {"burner.exit_temperature_K", 1000.0, 1800.0, 400}}));
    QVERIFY(panel->run());
    QTRY_VERIFY_WITH_TIMEOUT(panel->progressBar()->value() > 0, kLong);
    window->show();
    QVERIFY(window->close());  // the study is asked to stop
    window.reset();            // and its thread joined: no hang, no crash
    QVERIFY(!window);
  }

  void pointsWithoutACycleLeaveGapsAndAreCounted() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    // At 675 K the turbine cannot drive a compressor of pressure ratio 8 or more (the CLI gives the same).
    const std::vector<SweepAxis> axes = {{"compressor.pressure_ratio", 4.0, 12.0, 5},
                                         {"burner.exit_temperature_K", 675.0, 2025.0, 6}};
    QVERIFY(panel->setAxes(axes));
    QVERIFY(runAndWait(panel));
    const TradeStudy want = reference(window, axes);
    const std::size_t none = want.count(PointStatus::NoCycle);
    QVERIFY(none > 0);
    QCOMPARE(panel->study()->count(PointStatus::NoCycle), none);
    QVERIFY2(panel->noteLabel()->text().contains(QString("%1 of 30 points have no cycle").arg(none)),
             qPrintable(panel->noteLabel()->text()));
    const StudyPoint* failed = nullptr;
    for (const auto& p : want.points)
      if (p.status == PointStatus::NoCycle) failed = &p;
    QVERIFY(failed && !failed->reason.empty());
    QVERIFY(panel->noteLabel()->toolTip().contains(QString::fromStdString(failed->reason)));

    const StudyChart* chart = panel->chart();
    compareCarpet(chart, want, false, false);  // the points with figures, and only those
    // The line of 675 K keeps only its points with a cycle; no zero is drawn anywhere.
    const auto coldest = linesOf(chart, Family::ConstantSecond, false).front();
    QCOMPARE(pointsOf(*coldest).size(), std::size_t(5) - none);
    std::size_t drawn = 0;
    for (const auto* l : linesOf(chart, Family::ConstantFirst, false))
      for (const auto* curve : l->curves)
        for (std::size_t k = 0; k < curve->dataSize(); ++k) {
          QVERIFY(curve->sample(k).y() != 0.0 && curve->sample(k).x() != 0.0);
          QVERIFY(std::isfinite(curve->sample(k).x()) && std::isfinite(curve->sample(k).y()));
          ++drawn;
        }
    QCOMPARE(drawn, 30 - none);
    // The lines of pressure ratio 8 and more start after their gap at 675 K, in one piece.
    for (const auto* l : linesOf(chart, Family::ConstantFirst, false))
      if (l->value >= 8.0) {
        QCOMPARE(l->segments.size(), std::size_t(1));
        QCOMPARE(l->segments.front().size(), std::size_t(5));
        QVERIFY(near(l->segments.front().front().y(),
                     want.at(static_cast<int>(l->value / 2 - 2), 1).actual.specificThrust));
      }
    // A point missing inside a line splits it: the chart never connects across a gap. (The study
    // is the panel's with one point marked as without a cycle, as the core marks one.)
    {
      auto holed = std::make_shared<TradeStudy>(*panel->study());
      holed->points[static_cast<std::size_t>(2 * 6 + 3)].status = PointStatus::NoCycle;  // (i, j) = (2, 3)
      StudyChart chartOfHoled(window.units());
      chartOfHoled.setStudy(holed,
                            {cw::gui::StudyAxisName{"PR", cw::gui::Quantity::Dimensionless, {}},
                             cw::gui::StudyAxisName{"Tt4", cw::gui::Quantity::Temperature, {}}},
                            false);
      const auto line = linesOf(&chartOfHoled, Family::ConstantFirst, false)[2];  // pressure ratio 8
      QCOMPARE(line->segments.size(), std::size_t(2));
      QCOMPARE(line->segments[0].size(), std::size_t(2));  // 945 and 1215 K (675 K has no cycle)
      QCOMPARE(line->segments[1].size(), std::size_t(2));  // 1755 and 2025 K
      QCOMPARE(line->curves.size(), std::size_t(2));
    }
    // The table gives each reason.
    const auto* model = panel->model();
    const int status = 2, reason = model->columnCount() - 1;
    int rows = 0;
    for (int r = 0; r < model->rowCount(); ++r)
      if (model->index(r, status).data().toString() == "No cycle") {
        ++rows;
        QVERIFY(!model->index(r, reason).data().toString().isEmpty());
        QVERIFY(!model->index(r, 3).data(cw::gui::StudyTableModel::ValueRole).isValid());  // no value, not 0
        QVERIFY(model->index(r, 3).data().toString().isEmpty());
      }
    QCOMPARE(static_cast<std::size_t>(rows), none);
  }

  void exportsAreTheCoresFiles() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QTemporaryDir dir;
    QVERIFY(dir.isValid());
    QVERIFY(!window.exportStudyCsv(dir.filePath("none.csv")));  // nothing to export before a run
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    const QString csv = dir.filePath("study.csv"), json = dir.filePath("study.json");
    QVERIFY(window.exportStudyCsv(csv));
    QFile file(csv);
    QVERIFY(file.open(QIODevice::ReadOnly));
    const QByteArray written = file.readAll();
    QCOMPARE(written.toStdString(), cw::study::studyToCsv(*panel->study(), cw::study::studyColumns(false)));
    // The same as an independent run of the core on the same spec (one thread).
    QCOMPARE(written.toStdString(),
             cw::study::studyToCsv(reference(window, kCarpet), cw::study::studyColumns(false)));
    QVERIFY(written.startsWith("# caution: "));
    QVERIFY(written.contains(cw::kCaution));
    QVERIFY(window.exportStudyJson(json));
    QFile jsonFile(json);
    QVERIFY(jsonFile.open(QIODevice::ReadOnly));
    QVERIFY(nlohmann::json::parse(jsonFile.readAll().toStdString()) ==
            cw::study::studyToJson(*panel->study(), cw::study::studyColumns(false)));
    // A folder that does not exist: refused, nothing written.
    QVERIFY(!window.exportStudyCsv(dir.filePath("no/such/folder/study.csv")));

    // The chart, with the caution, and the table on the clipboard.
    QVERIFY(cw::gui::exportChartPng(panel->chart(), dir.filePath("study.png"), QSize(900, 600), 96));
    QCOMPARE(QImage(dir.filePath("study.png")).size(), QSize(900, 600));
    QVERIFY(
        cw::gui::exportChartDocument(panel->chart(), dir.filePath("study.svg"), "svg", QSizeF(180.0, 120.0)));
    QFile svg(dir.filePath("study.svg"));
    QVERIFY(svg.open(QIODevice::ReadOnly));
    QVERIFY(svg.readAll().contains("conceptual-design estimates"));
    window.findChild<QAction*>("copyStudyTableAction")->trigger();
    const QStringList lines = QApplication::clipboard()->text().split('\n', Qt::SkipEmptyParts);
    QVERIFY(lines[0].startsWith("# ") && lines[0].contains("conceptual-design estimates"));
    QVERIFY(lines[1].startsWith("# carpet: compressor.pressure_ratio"));
    QCOMPARE(lines.size(), 3 + 24);  // caution, grid, header, one line per point
    QVERIFY(lines[2].contains("[K]"));
    const QStringList cells = lines[3].split('\t');
    QCOMPARE(cells[0].toDouble(), 4.0);
    QCOMPARE(cells[1].toDouble(), 1100.0);
    QVERIFY(near(cells[3].toDouble(), panel->study()->points[0].actual.specificThrust, 1e-9));
  }

  void invalidEntriesMarkTheFieldAndDisableRun() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    TradeStudyPanel* panel = window.tradeStudyPanel();
    window.bottomTabs()->setCurrentWidget(panel);
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(panel->runButton()->isEnabled());
    cw::gui::StudyAxisEditor* axis = panel->firstAxis();
    QCOMPARE(axis->path(), std::string("compressor.pressure_ratio"));
    typeInto(axis->startEdit(), "0.5");  // below the valid range [1, 60]
    QVERIFY(axis->startEdit()->property("invalid").toBool());
    QVERIFY(!axis->stopEdit()->property("invalid").toBool());
    QVERIFY(axis->errorLabel()->isVisible());
    QVERIFY2(axis->errorLabel()->text().contains("Start = 0.5 is outside the valid range [1, 60]"),
             qPrintable(axis->errorLabel()->text()));
    QVERIFY(!panel->runButton()->isEnabled());
    QVERIFY(!panel->run());
    QVERIFY(!panel->study());
    typeInto(axis->startEdit(), "abc");
    QVERIFY(axis->errorLabel()->text().contains("not a number"));
    QVERIFY(!panel->runButton()->isEnabled());
    typeInto(axis->startEdit(), "2");
    QVERIFY(!axis->startEdit()->property("invalid").toBool());
    QVERIFY(!axis->errorLabel()->isVisible());
    QVERIFY(panel->runButton()->isEnabled());
    QCOMPARE(axis->start(), 2.0);
    typeInto(axis->stopEdit(), "61");
    QVERIFY(axis->stopEdit()->property("invalid").toBool());
    QVERIFY(!panel->runButton()->isEnabled());
    typeInto(axis->stopEdit(), "2");  // start = stop with 6 values
    QVERIFY(axis->errorLabel()->text().contains("the same"));
    QVERIFY(!panel->runButton()->isEnabled());
    typeInto(axis->stopEdit(), "30");
    QVERIFY(panel->runButton()->isEnabled());
    // The same input twice is refused on the second.
    QVERIFY(panel->secondAxis()->setPath("compressor.pressure_ratio"));
    QVERIFY(panel->secondAxis()->inputBox()->property("invalid").toBool());
    QVERIFY(!panel->runButton()->isEnabled());
    // A sweep does not use the second input: Run again.
    panel->carpetBox()->setChecked(false);
    QVERIFY(panel->runButton()->isEnabled());
    // An invalid comparison value, in its own field.
    QVERIFY(panel->setChangedInput("compressor.isentropic_efficiency", 0.8));
    typeInto(panel->changeEditor()->valueEdit(), "1.2");
    QVERIFY(panel->changeEditor()->valueEdit()->property("invalid").toBool());
    QVERIFY(panel->changeEditor()->errorLabel()->text().contains("(0, 1]"));
    QVERIFY(!panel->runButton()->isEnabled());
  }

  void unitSystemConvertsAxesAndFields() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    TradeStudyPanel* panel = window.tradeStudyPanel();
    const std::vector<SweepAxis> axes = {{"burner.exit_temperature_K", 1200.0, 1800.0, 4}};
    QVERIFY(panel->setAxes(axes));
    QVERIFY(runAndWait(panel));
    const StudyChart* chart = panel->chart();
    QVERIFY(chart->axisTitle(QwtAxis::XBottom).text().contains("[K]"));
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("[N·s/kg]"));
    QCOMPARE(panel->firstAxis()->startEdit()->text(), QString("1200"));
    const TradeStudy& s = *panel->study();
    window.setUnitSystem(cw::gui::UnitSystem::USCustomary);
    QVERIFY(chart->axisTitle(QwtAxis::XBottom).text().contains("[°R]"));
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("[lbf·s/lbm]"));
    QVERIFY(panel->firstAxis()->inputBox()->currentText().contains("[°R]"));
    QCOMPARE(panel->firstAxis()->startEdit()->text(), QString("2160"));  // 1200 K x 1.8 (units.h)
    QCOMPARE(panel->firstAxis()->stopEdit()->text(), QString("3240"));
    QCOMPARE(panel->firstAxis()->start(), 1200.0);  // SI inside, unchanged
    // lbf s/lbm = 4.4482216152605 N / 0.45359237 kg s (NIST SP 811, units.h).
    const double perLbfSPerLbm = 4.4482216152605 / 0.45359237;
    const QwtPlotCurve* curve = linesOf(chart, Family::Sweep, false).front()->curves.front();
    for (std::size_t i = 0; i < curve->dataSize(); ++i) {
      QVERIFY(near(curve->sample(i).x(), s.points[i].inputs[0] * 1.8, 1e-12));
      QVERIFY(near(curve->sample(i).y(), s.points[i].actual.specificThrust / perLbfSPerLbm, 1e-12));
    }
    QVERIFY(panel->model()->headerData(0, Qt::Horizontal).toString().contains("[°R]"));
    // A range typed in °R goes in as K.
    typeInto(panel->firstAxis()->stopEdit(), "3060");
    QVERIFY(near(panel->firstAxis()->stop(), 1700.0));
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    QCOMPARE(panel->firstAxis()->stopEdit()->text(), QString("1700"));
  }

  void rangeFieldsAtTheFormsDisplayPrecision() {
    // The start, stop and comparison fields and the valid range in the forms' precision
    // (DisplayUnits::inputText): in SI as the value is, in U.S. units the SI text's significant
    // digits, at least five (ft = 0.3048 m, lbm = 0.45359237 kg: NIST SP 811, units.h).
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    TradeStudyPanel* panel = window.tradeStudyPanel();
    auto* axis = panel->firstAxis();
    QVERIFY(axis->setPath("flight.altitude_m"));  // 0 to 11 000 m (practitionerRange)
    QCOMPARE(axis->startEdit()->text(), QString("0"));
    QCOMPARE(axis->stopEdit()->text(), QString("11000"));
    QVERIFY2(axis->stopEdit()->toolTip().contains("[-5000, 84852] m"),
             qPrintable(axis->stopEdit()->toolTip()));
    QVERIFY(panel->setChangedInput("flight.altitude_m", 6000.0));
    QCOMPARE(panel->changeEditor()->valueEdit()->text(), QString("6000"));

    window.setUnitSystem(cw::gui::UnitSystem::USCustomary);
    QCOMPARE(axis->startEdit()->text(), QString("0"));
    QCOMPARE(axis->stopEdit()->text(), QString("36089"));  // not 36089.23885
    QVERIFY2(axis->stopEdit()->toolTip().contains("[-16404, 278386] ft"),
             qPrintable(axis->stopEdit()->toolTip()));                       // not -16404.2, 278385.8
    QCOMPARE(panel->changeEditor()->valueEdit()->text(), QString("19685"));  // not 19685.03937
    typeInto(axis->startEdit(), "-20000");  // outside: the message says the range at that precision
    QVERIFY2(axis->errorLabel()->text().contains(
                 "Start = -20000 ft is outside the valid range [-16404, 278386] ft"),
             qPrintable(axis->errorLabel()->text()));

    // An input without a practitioner's range: the demo's 4 kg/s -50 % to +50 %.
    QVERIFY(axis->setPath("design.air_mass_flow_kg_per_s"));
    QCOMPARE(axis->startEdit()->text(), QString("4.4092"));  // 2 kg/s, not 4.409245244
    QCOMPARE(axis->stopEdit()->text(), QString("13.228"));   // 6 kg/s, not 13.22773573
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    QCOMPARE(axis->startEdit()->text(), QString("2"));
    QCOMPARE(axis->stopEdit()->text(), QString("6"));
  }

  void tableShowsValuesAtTheirDisplayPrecision() {
    // Inputs and outputs at their quantity's display precision (DisplayUnits::displayDigits: 4
    // significant digits for ratios, 5 for the rest), the unit in the header; the copy keeps
    // full precision. 1 K = 1.8 °R, lbf s/lbm = 4.4482216152605 N / 0.45359237 kg s (NIST SP 811,
    // units.h).
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    TradeStudyPanel* panel = window.tradeStudyPanel();
    const std::vector<SweepAxis> axes = {{"compressor.pressure_ratio", 4.0, 12.0, 4},
                                         {"burner.exit_temperature_K", 1100.0, 1750.0, 4}};
    QVERIFY(panel->setAxes(axes));
    QVERIFY(runAndWait(panel));
    const auto* model = panel->model();
    const TradeStudy& s = *panel->study();
    auto text = [&](int row, int column) { return model->index(row, column).data().toString(); };
    // Row 5 is (6.6667, 1316.6667 K): the grid's second values, the second input fastest.
    QVERIFY(near(s.points[5].inputs[0], 4.0 + 8.0 / 3.0) &&
            near(s.points[5].inputs[1], 1100.0 + 650.0 / 3.0));
    QCOMPARE(text(5, 0), QString("6.667"));   // not 6.666666667
    QCOMPARE(text(5, 1), QString("1316.7"));  // not 1316.6666667
    QCOMPARE(text(0, 0), QString("4.000"));
    QCOMPARE(text(0, 1), QString("1100.0"));
    QVERIFY(model->headerData(1, Qt::Horizontal).toString().endsWith("[K]"));
    QVERIFY(model->headerData(3, Qt::Horizontal).toString().endsWith("[N·s/kg]"));
    QVERIFY(model->headerData(4, Qt::Horizontal).toString().endsWith("[g/(kN·s)]"));
    // Specific thrust in the hundreds: two decimals; TSFC in the tens: three.
    const double fs = s.points[5].actual.specificThrust,
                 tsfc = s.points[5].actual.thrustSpecificFuelConsumption;
    QVERIFY(fs > 100.0 && fs < 1000.0 && tsfc * 1e6 > 10.0 && tsfc * 1e6 < 100.0);
    QCOMPARE(text(5, 3).section('.', 1).size(), 2);
    QVERIFY(std::fabs(text(5, 3).toDouble() - fs) <= 0.005 + 1e-9);
    QCOMPARE(text(5, 4).section('.', 1).size(), 3);
    QVERIFY(std::fabs(text(5, 4).toDouble() - tsfc * 1e6) <= 0.0005 + 1e-9);

    window.setUnitSystem(cw::gui::UnitSystem::USCustomary);
    QCOMPARE(text(5, 1), QString("2370.0"));  // 1316.6667 K x 1.8
    QCOMPARE(text(0, 1), QString("1980.0"));
    QCOMPARE(text(5, 0), QString("6.667"));  // a ratio is the same in both
    QVERIFY(model->headerData(1, Qt::Horizontal).toString().endsWith("[°R]"));
    QVERIFY(model->headerData(3, Qt::Horizontal).toString().endsWith("[lbf·s/lbm]"));
    const double fsUs = fs / (4.4482216152605 / 0.45359237);  // tens of lbf s/lbm: three decimals
    QVERIFY(fsUs > 10.0 && fsUs < 100.0);
    QCOMPARE(text(5, 3).section('.', 1).size(), 3);
    QVERIFY(std::fabs(text(5, 3).toDouble() - fsUs) <= 0.0005 + 1e-9);

    // The copy: display units, full precision (reads back to the same double).
    const QStringList lines = panel->model()->toTabSeparated().split('\n', Qt::SkipEmptyParts);
    QVERIFY(lines[2].contains("[°R]"));
    const QStringList cells = lines[3 + 5].split('\t');
    QVERIFY(near(cells[0].toDouble(), s.points[5].inputs[0], 1e-15));
    QVERIFY(near(cells[1].toDouble(), s.points[5].inputs[1] * 1.8, 1e-15));
    QVERIFY(near(cells[3].toDouble(), fsUs, 1e-14));
    window.setUnitSystem(cw::gui::UnitSystem::SI);
  }

  void axisTitlesFitASmallPanel() {
    // The panel alone at 600 x 400 (as --screenshot-of trade-study takes it): the value axis is
    // shorter than "Specific thrust F_s [N·s/kg]", which Qwt wrapped and cut; the chart takes the
    // longest form whose text is no longer than the axis.
    MainWindow window;
    window.setUnitSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(kCarpet));
    panel->setComparison(cw::gui::StudyOverlay::IdealTwin);
    QVERIFY(runAndWait(panel));
    QDockWidget* dock = window.tradeStudyDock();
    dock->setWidget(nullptr);
    panel->setParent(nullptr);
    panel->resize(600, 400);
    panel->show();
    QVERIFY(QTest::qWaitForWindowExposed(panel));
    for (int i = 0; i < 4; ++i) QApplication::processEvents();
    StudyChart* chart = panel->chart();
    for (const QwtAxisId axis : {QwtAxis::YLeft, QwtAxis::XBottom}) {
      const QwtText title = chart->axisTitle(axis);
      const QwtScaleWidget* scale = chart->axisWidget(axis);
      const double along = axis == QwtAxis::YLeft ? scale->height() : scale->width();
      const double width = QFontMetricsF(title.font()).horizontalAdvance(title.text());
      QVERIFY2(width <= along,
               qPrintable(QString("%1: %2 px on %3 px").arg(title.text()).arg(width).arg(along)));
      QVERIFY(chart->axisTitleFits(axis));
    }
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("[N·s/kg]"));  // the unit at least
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).font().pointSizeF() >= 0.7 * 12.0 - 1e-9);
    QCOMPARE(chart->axisTitle(QwtAxis::XBottom).text(), QString("TSFC [g/(kN·s)]"));
    // Large: the whole titles.
    panel->resize(1400, 900);
    for (int i = 0; i < 4; ++i) QApplication::processEvents();
    QCOMPARE(chart->axisTitle(QwtAxis::YLeft).text(), QString("Specific thrust F_s [N·s/kg]"));
    dock->setWidget(panel);
  }

  void editingTheCaseMarksTheStudyStale() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    QVERIFY(!panel->isStale() && !panel->chart()->isStale());
    const auto before = panel->study();
    window.selection().select(cw::gui::Section::Compressor);
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    QVERIFY(field);
    typeInto(field, "0.9");
    QVERIFY(panel->isStale());
    QVERIFY(panel->chart()->isStale());
    QVERIFY(panel->model()->isStale());
    QCOMPARE(panel->study(), before);       // kept
    window.document().undoStack()->undo();  // back to the studied case
    QVERIFY(!panel->isStale());
    window.document().undoStack()->redo();
    QVERIFY(panel->isStale());
    QVERIFY(runAndWait(panel));  // Run redoes it
    QVERIFY(!panel->isStale() && !panel->chart()->isStale());
    QVERIFY(panel->study() != before);
    QCOMPARE(panel->studiedSpec().document["compressor"]["isentropic_efficiency"].get<double>(), 0.9);
  }

  void startsAsATabAndMovesIntoItsDock() {
    QSettings().remove("window/state");
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1600, 1000);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    QTabWidget* tabs = window.bottomTabs();
    QCOMPARE(tabs->count(), 3);
    QCOMPARE(tabs->widget(2), static_cast<QWidget*>(window.tradeStudyPanel()));
    QCOMPARE(tabs->tabText(2), QString("Trade study"));
    QVERIFY(window.tradeStudyPanel()->minimumSizeHint().height() <=
            tabs->widget(0)->minimumSizeHint().height());
    QDockWidget* dock = window.tradeStudyDock();
    QCOMPARE(dock->objectName(), QString("tradeStudyDock"));  // saveState needs the name
    QAction* toggle = window.findChild<QAction*>("tradeStudyDockAction");
    QVERIFY(toggle);
    toggle->trigger();
    QVERIFY(!dock->isHidden());
    QCOMPARE(dock->widget(), static_cast<QWidget*>(window.tradeStudyPanel()));
    QCOMPARE(tabs->count(), 2);
    dock->close();
    QVERIFY(dock->isHidden());
    QCOMPARE(tabs->count(), 3);
    QCOMPARE(tabs->widget(2), static_cast<QWidget*>(window.tradeStudyPanel()));
  }

  void choicesAreRemembered() {
    {
      MainWindow window;
      QVERIFY(window.openCase(kDemo));
      TradeStudyPanel* panel = window.tradeStudyPanel();
      QVERIFY(panel->setAxes({{"flight.mach", 0.2, 1.2, 11}, {"compressor.pressure_ratio", 4.0, 20.0, 5}}));
      panel->setComparison(cw::gui::StudyOverlay::IdealTwin);
      panel->auditBox()->setChecked(true);
    }
    MainWindow again;
    QVERIFY(again.openCase(kDemo));
    TradeStudyPanel* panel = again.tradeStudyPanel();
    QCOMPARE(panel->firstAxis()->path(), std::string("flight.mach"));
    QCOMPARE(panel->firstAxis()->count(), 11);
    QCOMPARE(panel->secondAxis()->path(), std::string("compressor.pressure_ratio"));
    QCOMPARE(panel->secondAxis()->count(), 5);
    QCOMPARE(panel->compareBox()->currentIndex(), 1);
    QVERIFY(panel->auditBox()->isChecked());
    // The ranges as they were set, per input (not the defaults: Mach 0 to 0.9, 4 to 16).
    QVERIFY(near(panel->firstAxis()->start(), 0.2));
    QVERIFY(near(panel->firstAxis()->stop(), 1.2));
    QVERIFY(near(panel->secondAxis()->start(), 4.0));
    QVERIFY(near(panel->secondAxis()->stop(), 20.0));
    QSettings().remove("study");
  }

  void typedRangesAreRememberedPerInput() {
    {
      MainWindow window;
      QVERIFY(window.openCase(kDemo));
      cw::gui::StudyAxisEditor* axis = window.tradeStudyPanel()->firstAxis();
      QVERIFY(axis->setPath("burner.exit_temperature_K"));
      typeInto(axis->startEdit(), "1250");
      typeInto(axis->stopEdit(), "1450");
      QVERIFY(axis->setPath("compressor.pressure_ratio"));  // another input: its own range
      QVERIFY(near(axis->start(), 4.0));
      typeInto(axis->stopEdit(), "14");
      typeInto(axis->startEdit(), "abc");  // not a number: the last valid range stays kept
    }
    MainWindow again;
    QVERIFY(again.openCase(kDemo));
    cw::gui::StudyAxisEditor* axis = again.tradeStudyPanel()->firstAxis();
    QVERIFY(axis->setPath("burner.exit_temperature_K"));
    QCOMPARE(axis->start(), 1250.0);
    QCOMPARE(axis->stop(), 1450.0);
    QVERIFY(axis->setPath("compressor.pressure_ratio"));
    QCOMPARE(axis->start(), 4.0);
    QCOMPARE(axis->stop(), 14.0);
  }

  void editingARangeMarksTheStudyStale() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QVERIFY(panel->setAxes({{"compressor.pressure_ratio", 4.0, 12.0, 5}}));
    QVERIFY(runAndWait(panel));
    QVERIFY(!panel->isStale());
    typeInto(panel->firstAxis()->stopEdit(), "14");
    QVERIFY(panel->isStale());
    typeInto(panel->firstAxis()->stopEdit(), "12");  // back to the study's range
    QVERIFY(!panel->isStale());
    panel->firstAxis()->setCount(6);
    QVERIFY(panel->isStale());
  }

  void tableHeadersAreNotClipped() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    auto* table = panel->findChild<QTableView*>("studyTable");
    QVERIFY(table);
    for (int round = 0; round < 2; ++round) {  // before the first study, then with one
      for (int c = 0; c < table->model()->columnCount(); ++c)
        QVERIFY2(table->columnWidth(c) >= table->horizontalHeader()->sectionSizeHint(c),
                 qPrintable(table->model()->headerData(c, Qt::Horizontal).toString()));
      QVERIFY(panel->setAxes({{"compressor.pressure_ratio", 4.0, 12.0, 3}}));
      QVERIFY(runAndWait(panel));
      QVERIFY(table->model()->columnCount() > 3);
    }
  }

  void defaultCarpetHasACycleAtEveryPoint() {
    // The default carpet on the demo (pressure ratio 4 to 16 against Tt4 1100 to 1700 K): every
    // point has a cycle (with -50 % to +50 %, 675 to 2025 K, 13 of 126 points had none).
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    QCOMPARE(panel->firstAxis()->path(), std::string("compressor.pressure_ratio"));
    QCOMPARE(panel->secondAxis()->path(), std::string("burner.exit_temperature_K"));
    QVERIFY(runAndWait(panel));
    QVERIFY(panel->study());
    QCOMPARE(panel->study()->points.size(), std::size_t(21 * 6));
    QCOMPARE(panel->study()->count(cw::study::PointStatus::Solved), panel->study()->points.size());
  }

  void defaultRangesFollowTheCaseWithinTheValidRange() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    // A practitioner's starting ranges (common practice, no source; docs/user-guide.md).
    QVERIFY(panel->firstAxis()->setPath("compressor.pressure_ratio"));
    QCOMPARE(panel->firstAxis()->start(), 4.0);
    QCOMPARE(panel->firstAxis()->stop(), 16.0);
    QVERIFY(panel->firstAxis()->setPath("compressor.isentropic_efficiency"));
    QCOMPARE(panel->firstAxis()->start(), 0.75);
    QCOMPARE(panel->firstAxis()->stop(), 0.90);
    QVERIFY(panel->secondAxis()->setPath("burner.exit_temperature_K"));
    QCOMPARE(panel->secondAxis()->start(), 1100.0);
    QCOMPARE(panel->secondAxis()->stop(), 1700.0);
    // An input without one: the case's value -50 % to +50 % (the demo's 4 kg/s of air).
    QVERIFY(panel->firstAxis()->setPath("design.air_mass_flow_kg_per_s"));
    QVERIFY(near(panel->firstAxis()->start(), 2.0));
    QVERIFY(near(panel->firstAxis()->stop(), 6.0));
    QCOMPARE(panel->secondAxis()->count(), 6);
    // Only inputs the case has: the demo sizes by air mass flow, not by thrust.
    QComboBox* box = panel->firstAxis()->inputBox();
    QVERIFY(box->findData("design.air_mass_flow_kg_per_s") >= 0);
    QCOMPARE(box->findData("design.required_net_thrust_N"), -1);
    QCOMPARE(box->findData("compressor.polytropic_efficiency"), -1);
  }

  void screenshotOfTheStudyPanel() {
    // --study-vary opens the panel, runs the study and --screenshot-of trade-study renders the panel.
    const cw::test::IsolatedHome home;  // its settings, not the user's
    const QString file = home.path("study.png");
    QProcess app;
    home.start(app, CYCLEWRIGHT_GUI_PATH,
               {"--screenshot", file, "--screenshot-of", "trade-study", "--size", "1400x900", "--study-vary",
                "compressor.pressure_ratio=4:12:5", "--study-vary", "burner.exit_temperature_K=1100:1500:3",
                "--study-compare", "ideal"});
    QVERIFY(app.waitForFinished(120000));
    QCOMPARE(app.exitCode(), 0);
    const QImage image(file);
    QVERIFY(!image.isNull());
    QCOMPARE(image.size(), QSize(1400, 900));  // the panel alone, at the size asked for
    QProcess wrong;
    home.start(wrong, CYCLEWRIGHT_GUI_PATH,
               {"--screenshot", file, "--study-vary", "compressor.pressure_ratio=4:12"});
    QVERIFY(wrong.waitForFinished(30000));
    QCOMPARE(wrong.exitCode(), 2);
    QVERIFY(QString::fromUtf8(wrong.readAllStandardError()).contains("--study-vary"));
    QProcess noStudy;
    home.start(noStudy, CYCLEWRIGHT_GUI_PATH, {"--screenshot", file, "--screenshot-of", "trade-study"});
    QVERIFY(noStudy.waitForFinished(30000));
    QCOMPARE(noStudy.exitCode(), 2);
  }

  // Last: it changes the application's palette (and style) for good.
  void followsTheDarkPalette() {
    auto* app = qobject_cast<QApplication*>(QCoreApplication::instance());
    QVERIFY(cw::gui::applyPaletteNamed(*app, "dark"));
    const QPalette dark = QApplication::palette();
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1600, 1000);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    TradeStudyPanel* panel = window.tradeStudyPanel();
    window.bottomTabs()->setCurrentWidget(panel);
    QVERIFY(panel->setAxes(kCarpet));
    QVERIFY(runAndWait(panel));
    StudyChart* chart = panel->chart();
    chart->grab();
    QCOMPARE(chart->canvasBackground().color(), dark.color(QPalette::Base));
    // The Okabe-Ito lines keep their colours; their labels are lightened to read on the dark canvas.
    QCOMPARE(linesOf(chart, Family::ConstantFirst, false).front()->curves.front()->pen().color(),
             QColor("#0072B2"));
    QVERIFY(!chart->lineLabels()->placedTexts().empty());
    const QwtPlotMarker* marker = chart->designMarker();
    QVERIFY(marker);
    QVERIFY(marker->label().color().lightness() > 128);  // the text colour of the palette
    QCOMPARE(marker->symbol()->pen().color(), dark.color(QPalette::Text));
  }
};

QTEST_MAIN(TestTradeStudy)
#include "test_trade_study.moc"
