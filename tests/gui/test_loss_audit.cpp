// The loss-audit panel, offscreen: its waterfall bars are cw::analysis::auditCase's steps on the
// same case (and telescope from the ideal twin to the actual figure), an edit changes them, an
// invalid value keeps the last bars marked stale, a click on a bar selects its component in the
// strip, and the chart and table exports write a PNG, an SVG and a CSV that read back. The
// waterfall follows an order set through the panel or its dialog; the audit starts as a tab
// beside the tables and View › Loss Audit moves it into its dock and back.
#include "audit/audit_chart.h"
#include "audit/audit_panel.h"
#include "audit/audit_table_model.h"
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"
#include "dialogs/dialogs.h"
#include "document/case_document.h"
#include "document/selection_router.h"
#include "document/settings.h"
#include "gui_test_support.h"
#include "main_window.h"

#include "analysis/loss_audit.h"
#include "common/version.h"
#include "evaluation/evaluate.h"

#include <qwt_scale_widget.h>
#include <qwt_text.h>

#include <QApplication>
#include <QCheckBox>
#include <QComboBox>
#include <QDockWidget>
#include <QFile>
#include <QImage>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QSettings>
#include <QStandardPaths>
#include <QSvgRenderer>
#include <QTabWidget>
#include <QTemporaryDir>
#include <QTest>
#include <QTimer>

#include <algorithm>
#include <cmath>

using cw::gui::AuditChart;
using cw::gui::MainWindow;

using cw::test::typeInto;

namespace {

const QString kDemo = QStringLiteral(":/demo/demo-turbojet.json");

bool near(double a, double b) {
  return std::fabs(a - b) <= 1e-9 * std::max(1.0, std::fabs(b));
}

std::vector<std::string> keysOf(const QStringList& keys) {
  std::vector<std::string> out;
  for (const QString& key : keys) out.push_back(key.toStdString());
  return out;
}

bool near12(double a, double b) {
  return std::fabs(a - b) <= 1e-12 * std::max(1.0, std::fabs(b));
}

// A chart's bars (the current or the baseline's) against the core's audit: the totals and each
// step to 1e-12, each loss in the slot named by the axis (the chart's slot of that loss).
void checkBarsEqual(const std::vector<AuditChart::Bar>& bars, const cw::analysis::LossAudit& reference,
                    bool tsfc) {
  QCOMPARE(bars.size(), reference.waterfall.size() + 2);
  QVERIFY(bars.front().loss.empty() && bars.back().loss.empty());
  QVERIFY(near12(bars.front().to,
                 tsfc ? reference.ideal.thrustSpecificFuelConsumption : reference.ideal.specificThrust));
  QVERIFY(near12(bars.back().to,
                 tsfc ? reference.actual.thrustSpecificFuelConsumption : reference.actual.specificThrust));
  for (size_t i = 0; i < reference.waterfall.size(); ++i) {
    QCOMPARE(bars[i + 1].loss, reference.waterfall[i].loss);
    const double step = tsfc ? reference.waterfall[i].deltaTsfc : reference.waterfall[i].deltaSpecificThrust;
    QVERIFY2(near12(bars[i + 1].to - bars[i + 1].from, step), bars[i + 1].loss.c_str());
    QVERIFY(bars[i + 1].slot > bars[i].slot);  // left to right in the audit's order
  }
}

// The chart's loss bars are the core's waterfall in that order, and telescope.
void checkBarsFollow(const AuditChart* chart, const cw::analysis::LossAudit& reference,
                     const std::vector<std::string>& order) {
  const auto& bars = chart->bars();
  QCOMPARE(bars.size(), order.size() + 2);
  QCOMPARE(reference.waterfallOrder, order);
  double sum = 0.0;
  for (size_t i = 0; i < order.size(); ++i) {
    QCOMPARE(bars[i + 1].loss, order[i]);
    QCOMPARE(reference.waterfall[i].loss, order[i]);
    QVERIFY(near(bars[i + 1].to - bars[i + 1].from, reference.waterfall[i].deltaSpecificThrust));
    sum += bars[i + 1].to - bars[i + 1].from;
  }
  QVERIFY(std::fabs(sum - (reference.actual.specificThrust - reference.ideal.specificThrust)) <
          1e-9 * 1000.0);
  QVERIFY(near(bars.back().to, reference.actual.specificThrust));
}

}  // namespace

class TestLossAudit : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTest"); }

  void barsEqualTheCoreAudit() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    const cw::analysis::LossAudit reference = cw::analysis::auditCase(window.document().currentCase());
    const AuditChart* chart = window.auditPanel()->chart();
    const auto& bars = chart->bars();
    QCOMPARE(bars.size(), reference.waterfall.size() + 2);
    QVERIFY(bars.front().loss.empty() && bars.back().loss.empty());
    QVERIFY(near(bars.front().to, reference.ideal.specificThrust));
    QVERIFY(near(bars.back().to, reference.actual.specificThrust));
    double sum = 0.0;
    for (size_t i = 0; i < reference.waterfall.size(); ++i) {
      const auto& bar = bars[i + 1];
      QCOMPARE(bar.loss, reference.waterfall[i].loss);  // in the audit's order
      QVERIFY(near(bar.to - bar.from, reference.waterfall[i].deltaSpecificThrust));
      sum += bar.to - bar.from;
    }
    // The steps telescope: actual minus ideal (loss_audit.h).
    QVERIFY(std::fabs(sum - (reference.actual.specificThrust - reference.ideal.specificThrust)) <
            1e-9 * 1000.0);
    QVERIFY(std::fabs(bars[bars.size() - 2].to - reference.actual.specificThrust) < 1e-9 * 1000.0);

    // The same waterfall in TSFC.
    window.auditPanel()->figureBox()->setCurrentIndex(1);
    QCOMPARE(chart->figure(), cw::gui::AuditFigure::Tsfc);
    for (size_t i = 0; i < reference.waterfall.size(); ++i)
      QVERIFY(near(chart->bars()[i + 1].to - chart->bars()[i + 1].from, reference.waterfall[i].deltaTsfc));
    QVERIFY(near(chart->bars().back().to, reference.actual.thrustSpecificFuelConsumption));
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("g/(kN·s)"));

    // The table's views: waterfall rows are ideal, steps, sum, actual; the exergy view ends with the closure.
    auto* model = window.auditPanel()->model();
    model->setView(cw::gui::AuditView::Waterfall);
    QCOMPARE(model->rowCount(), static_cast<int>(reference.waterfall.size()) + 3);
    QVERIFY(model->headerData(2, Qt::Horizontal).toString().contains("N·s/kg"));
    model->setView(cw::gui::AuditView::Sensitivities);
    QCOMPARE(model->rowCount(), static_cast<int>(reference.sensitivities.size()));
    model->setView(cw::gui::AuditView::Exergy);
    QCOMPARE(model->rowCount(), static_cast<int>(reference.exergy.components.size()) + 3);
    QVERIFY(model->index(model->rowCount() - 1, 0).data().toString().contains("Closure"));
  }

  void editChangesTheBarsAndInvalidKeepsThemStale() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    const auto before = window.auditPanel()->chart()->bars();
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    QVERIFY(field);
    typeInto(field, "0.9");
    const auto after = window.auditPanel()->chart()->bars();
    QCOMPARE(after.size(), before.size());
    QVERIFY(!near(after.back().to, before.back().to));
    const auto reference = cw::analysis::auditCase(window.document().currentCase());
    QVERIFY(near(after.back().to, reference.actual.specificThrust));
    QVERIFY(!window.auditPanel()->isStale());
    QTest::keyClick(field, Qt::Key_Return);  // committed: now the result kept while invalid

    typeInto(field, "0");  // outside (0, 1]
    QVERIFY(window.document().isStale());
    QVERIFY(window.auditPanel()->isStale());
    QVERIFY(window.auditPanel()->chart()->isStale());
    QVERIFY(window.auditPanel()->model()->isStale());
    const auto kept = window.auditPanel()->chart()->bars();
    QCOMPARE(kept.size(), after.size());
    for (size_t i = 0; i < kept.size(); ++i) QCOMPARE(kept[i].to, after[i].to);

    typeInto(field, "0.88");
    QVERIFY(!window.auditPanel()->isStale());
  }

  void clickingABarSelectsItsComponent() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1600, 1000);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    window.selection().select(cw::gui::Section::Flight);
    AuditChart* chart = window.auditPanel()->chart();
    chart->replot();
    int turbine = -1;
    for (size_t i = 0; i < chart->bars().size(); ++i)
      if (chart->bars()[i].loss == "turbine_efficiency") turbine = static_cast<int>(i);
    QVERIFY(turbine > 0);
    const QPoint centre = chart->barCentre(turbine);
    QCOMPARE(chart->barAt(centre), turbine);
    QTest::mouseClick(chart->canvas(), Qt::LeftButton, Qt::NoModifier, centre);
    QCOMPARE(window.selection().current(), cw::gui::Section::Turbine);
    auto* strip = window.findChild<QListWidget*>("componentStrip");
    QCOMPARE(strip->currentItem()->data(Qt::UserRole).toString(), QString("turbine"));
    // A total bar selects nothing.
    QTest::mouseClick(chart->canvas(), Qt::LeftButton, Qt::NoModifier, chart->barCentre(0));
    QCOMPARE(window.selection().current(), cw::gui::Section::Turbine);
  }

  void baselineWaterfallBesideTheCurrentOne() {
    QSettings().remove("audit/baseline_beside");
    MainWindow window;
    window.units().setSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(kDemo));
    cw::gui::AuditPanel* panel = window.auditPanel();
    AuditChart* chart = panel->chart();
    QCheckBox* beside = panel->baselineBox();
    QVERIFY(beside);
    QVERIFY(!beside->isEnabled());  // no baseline yet
    QVERIFY(chart->baselineBars().empty());

    // The baseline: the demo with an unlit afterburner's loss, a loss the current case lacks.
    cw::engine::Case baseline = window.document().currentCase();
    baseline.afterburner.pressureLossFractionUnlit = 0.03;
    QVERIFY(window.document().setBaseline(baseline, QStringLiteral("Review A")));
    QVERIFY(beside->isEnabled());
    QVERIFY(!beside->isChecked());
    QVERIFY(chart->baselineBars().empty());  // only when asked
    beside->setChecked(true);
    QTRY_VERIFY(window.document().baselineAudit() != nullptr);
    QVERIFY(chart->hasBaseline());

    // A variant in the window; both waterfalls are the core's audits of their cases.
    cw::engine::Case variant = window.document().currentCase();
    variant.compressor.pressureRatio = 11.0;
    window.document().applyEdit(-1, QStringLiteral("edit"), variant);
    QTRY_VERIFY(!window.document().isAuditStale());
    const auto currentReference = cw::analysis::auditCase(variant);
    const auto baselineReference = cw::analysis::auditCase(baseline);
    for (const bool tsfc : {false, true}) {
      panel->figureBox()->setCurrentIndex(tsfc ? 1 : 0);
      checkBarsEqual(chart->bars(), currentReference, tsfc);
      if (QTest::currentTestFailed()) return;
      checkBarsEqual(chart->baselineBars(), baselineReference, tsfc);
      if (QTest::currentTestFailed()) return;
    }
    // The slots: a loss of both cases shares one; the afterburner's loss has the baseline's bar alone.
    const auto& bars = chart->bars();
    const auto& base = chart->baselineBars();
    QCOMPARE(base.size(), bars.size() + 1);
    QVERIFY(
        std::none_of(bars.begin(), bars.end(), [](const auto& b) { return b.loss == "afterburner_loss"; }));
    QVERIFY(
        std::any_of(base.begin(), base.end(), [](const auto& b) { return b.loss == "afterburner_loss"; }));
    for (const auto& b : base)
      for (const auto& c : bars)
        if (b.loss == c.loss && !b.loss.empty()) QCOMPARE(b.slot, c.slot);
    QCOMPARE(base.back().slot, bars.back().slot);
    // Named in the legend in neutral grey, with the baseline's title.
    QCOMPARE(chart->baselineLegendText(), QStringLiteral("Baseline: Review A"));

    // Drawn (an export at 1400 x 700 px): every value label inside the canvas, none over another.
    panel->figureBox()->setCurrentIndex(0);
    QTemporaryDir dir;
    const QString png = dir.filePath("baseline.png");
    QVERIFY(cw::gui::exportChartPng(chart, png, QSize(1400, 700), 96));
    if (!qEnvironmentVariableIsEmpty("CYCLEWRIGHT_LAYOUT_PICTURES"))
      QFile::copy(png, qEnvironmentVariable("CYCLEWRIGHT_LAYOUT_PICTURES") + "/audit-baseline.png");
    const QRectF canvas = chart->lastCanvasRect();
    std::vector<QRectF> labels = chart->valueLabelRects();
    QCOMPARE(labels.size(), bars.size());
    for (const QRectF& r : chart->baselineValueLabelRects()) labels.push_back(r);
    QVERIFY(chart->baselineValueLabelRects().size() >= base.size() / 2);  // most fit at this size
    for (size_t i = 0; i < labels.size(); ++i) {
      QVERIFY(canvas.contains(labels[i]));
      for (size_t j = i + 1; j < labels.size(); ++j) QVERIFY(!labels[i].intersects(labels[j]));
    }

    // Unticked, or the baseline cleared: the current waterfall alone.
    beside->setChecked(false);
    QVERIFY(chart->baselineBars().empty());
    QVERIFY(chart->baselineLegendText().isEmpty());
    beside->setChecked(true);
    QVERIFY(!chart->baselineBars().empty());
    window.document().clearBaseline();
    QVERIFY(chart->baselineBars().empty());
    QVERIFY(!beside->isEnabled());
    checkBarsEqual(chart->bars(), currentReference, false);
  }

  void baselineBesideRememberedInANewWindow() {
    // "Baseline beside" is kept in the settings (audit/baseline_beside, through AppSettings) and
    // restored by the next window, also before it has a baseline (the box is then disabled).
    QSettings().remove("audit/baseline_beside");
    cw::engine::Case baseline = cw::test::demoCase();
    baseline.compressor.pressureRatio = 11.0;
    {
      MainWindow window;
      QVERIFY(!window.auditPanel()->baselineBox()->isChecked());  // off by default
      QVERIFY(window.document().setBaseline(baseline, QStringLiteral("Review A")));
      window.auditPanel()->baselineBox()->click();  // as a user ticks it
      QVERIFY(window.auditPanel()->baselineBox()->isChecked());
      QCOMPARE(cw::gui::AppSettings().auditBaselineBeside(), true);
    }
    {
      MainWindow again;
      QCheckBox* beside = again.auditPanel()->baselineBox();
      QVERIFY(beside->isChecked());
      QVERIFY(!beside->isEnabled());  // no baseline in the new window yet
      QVERIFY(again.auditPanel()->chart()->baselineBars().empty());
      QVERIFY(again.document().setBaseline(baseline, QStringLiteral("Review A")));
      QTRY_VERIFY(!again.auditPanel()->chart()->baselineBars().empty());  // shown without a tick
      beside->setChecked(false);
      QCOMPARE(cw::gui::AppSettings().auditBaselineBeside(), false);
    }
    MainWindow third;
    QVERIFY(!third.auditPanel()->baselineBox()->isChecked());
  }

  void valueAxisTitleFitsInTheBottomTab() {
    // At 1280 x 800 the audit's tab is low: the whole title "Specific thrust F_s [N·s/kg]" is
    // longer than the axis and was cut at both ends; the chart takes the short one that fits.
    MainWindow window;
    window.units().setSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(kDemo));
    window.resize(1280, 800);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    auto* tabs = window.findChild<QTabWidget*>("bottomTabs");
    tabs->setCurrentWidget(window.auditPanel());
    for (int i = 0; i < 4; ++i) QApplication::processEvents();
    AuditChart* chart = window.auditPanel()->chart();
    QVERIFY(chart->isVisible());
    const auto* axis = chart->axisWidget(QwtAxis::YLeft);
    if (!qEnvironmentVariableIsEmpty("CYCLEWRIGHT_LAYOUT_PICTURES"))
      window.grab().save(qEnvironmentVariable("CYCLEWRIGHT_LAYOUT_PICTURES") + "/audit-tab-1280x800.png");
    QVERIFY2(
        chart->valueAxisTitleFits(),
        qPrintable(QString("%1 on %2 px").arg(chart->axisTitle(QwtAxis::YLeft).text()).arg(axis->height())));
    QCOMPARE(chart->axisTitle(QwtAxis::YLeft).text(), QString("F_s [N·s/kg]"));
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).font().pointSizeF() >=
            0.7 * 12.0);  // Qwt's 12 pt at most 30 % smaller
    window.auditPanel()->figureBox()->setCurrentIndex(1);
    QVERIFY(chart->valueAxisTitleFits());
    QVERIFY(chart->axisTitle(QwtAxis::YLeft).text().contains("[g/(kN·s)]"));  // the unit at least
    window.auditPanel()->figureBox()->setCurrentIndex(0);
    // In the dock, as tall as the window: the whole title.
    window.auditDock()->show();
    window.placeAudit();
    for (int i = 0; i < 4; ++i) QApplication::processEvents();
    QVERIFY(chart->valueAxisTitleFits());
    QCOMPARE(chart->axisTitle(QwtAxis::YLeft).text(), QString("Specific thrust F_s [N·s/kg]"));
    // An export has the whole title too.
    QTemporaryDir dir;
    window.auditDock()->hide();
    window.placeAudit();
    tabs->setCurrentWidget(window.auditPanel());
    for (int i = 0; i < 4; ++i) QApplication::processEvents();
    QCOMPARE(chart->axisTitle(QwtAxis::YLeft).text(), QString("F_s [N·s/kg]"));
    {
      cw::gui::ExportScope scope(chart);
      QCOMPARE(chart->axisTitle(QwtAxis::YLeft).text(), QString("Specific thrust F_s [N·s/kg]"));
    }
    QCOMPARE(chart->axisTitle(QwtAxis::YLeft).text(), QString("F_s [N·s/kg]"));
  }

  void exportsReadBack() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    QTemporaryDir dir;
    QVERIFY(dir.isValid());
    AuditChart* chart = window.auditPanel()->chart();
    const QString png = dir.filePath("audit.png"), svg = dir.filePath("audit.svg"),
                  csv = dir.filePath("audit.csv");
    QVERIFY(cw::gui::exportChartPng(chart, png, QSize(900, 600), 96));
    const QImage image(png);
    QCOMPARE(image.size(), QSize(900, 600));
    QVERIFY(cw::gui::exportChartDocument(chart, svg, "svg", QSizeF(180.0, 120.0)));
    QSvgRenderer renderer(svg);
    QVERIFY(renderer.isValid());
    QFile svgFile(svg);
    QVERIFY(svgFile.open(QIODevice::ReadOnly));
    QVERIFY(svgFile.readAll().contains("conceptual-design estimates"));  // the caution footer

    QVERIFY(window.exportAuditCsv(csv));
    QFile file(csv);
    QVERIFY(file.open(QIODevice::ReadOnly | QIODevice::Text));
    const QStringList lines = QString::fromUtf8(file.readAll()).split('\n', Qt::SkipEmptyParts);
    QVERIFY(lines.front().startsWith("# caution: "));
    QVERIFY(lines.front().contains(QString::fromLatin1(cw::kCaution)));
    int header = -1;
    for (int i = 0; i < lines.size(); ++i)
      if (!lines[i].startsWith('#')) {
        header = i;
        break;
      }
    QVERIFY(header > 0);
    const QStringList columns = lines[header].split(',');
    QCOMPARE(columns.front(), QString("view"));
    const auto reference = cw::analysis::auditCase(window.document().currentCase());
    double sum = 0.0;
    int waterfallRows = 0;
    for (int i = header + 1; i < lines.size(); ++i) {
      QVERIFY2(!lines[i].contains('"'), qPrintable(lines[i]));  // no cell here needs quoting
      const QStringList cells = lines[i].split(',');
      QCOMPARE(cells.size(), columns.size());
      if (cells[0] == "waterfall") {
        bool ok = false;
        sum += cells[2].toDouble(&ok);
        QVERIFY(ok);
        ++waterfallRows;
      }
    }
    QCOMPARE(waterfallRows, static_cast<int>(reference.waterfall.size()));
    QVERIFY(std::fabs(sum - (reference.actual.specificThrust - reference.ideal.specificThrust)) < 1e-6);
  }

  void dockIsListedInTheViewMenuAndRemembered() {
    MainWindow window;
    QDockWidget* dock = window.auditDock();
    QVERIFY(dock);
    QCOMPARE(dock->objectName(), QString("auditDock"));  // saveState needs the name
    QVERIFY(window.findChild<QAction*>("auditDockAction"));
  }

  void orderSetThroughThePanelAndItsDialog() {
    QSettings().remove("audit/waterfall_order");
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    cw::gui::AuditPanel* panel = window.auditPanel();
    const AuditChart* chart = panel->chart();
    QVERIFY(panel->orderButton()->isEnabled());
    QVERIFY(panel->orderNote()->text().contains("order"));
    const auto& c = window.document().currentCase();
    const std::vector<std::string> flow = cw::analysis::auditCase(c).waterfallOrder;
    QVERIFY(flow.size() >= 4);

    // Through the public API: the reversed flow order.
    QStringList reversed;
    for (auto it = flow.rbegin(); it != flow.rend(); ++it) reversed << QString::fromStdString(*it);
    QStringList emitted;
    connect(panel, &cw::gui::AuditPanel::orderChanged, this, [&](const QStringList& k) { emitted = k; });
    panel->setOrder(reversed);
    QCOMPARE(panel->order(), reversed);
    QCOMPARE(emitted, reversed);
    checkBarsFollow(chart, cw::analysis::auditCase(c, keysOf(reversed)), keysOf(reversed));
    QCOMPARE(panel->audit()->waterfallOrder, keysOf(reversed));
    // The table follows too: its first step row is the first loss of the order.
    panel->model()->setView(cw::gui::AuditView::Waterfall);
    QCOMPARE(panel->model()->rowCount(), static_cast<int>(flow.size()) + 3);
    // The order is remembered.
    QCOMPARE(QSettings().value("audit/waterfall_order").toStringList(), reversed);
    {
      MainWindow again;
      QCOMPARE(again.auditPanel()->order(), reversed);
      QVERIFY(again.openCase(kDemo));
      QCOMPARE(again.auditPanel()->audit()->waterfallOrder, keysOf(reversed));
    }

    // Unknown and repeated keys are dropped; a partial order puts the rest in flow order.
    panel->setOrder({"no_such_loss", "nozzle_expansion", "nozzle_expansion"});
    QCOMPARE(panel->order(), QStringList{"nozzle_expansion"});
    std::vector<std::string> partial{"nozzle_expansion"};
    for (const auto& key : flow)
      if (key != "nozzle_expansion") partial.push_back(key);
    checkBarsFollow(chart, cw::analysis::auditCase(c, {"nozzle_expansion"}), partial);

    // Through the dialog's list: move the last loss to the top.
    std::vector<std::string> moved = partial;
    std::rotate(moved.rbegin(), moved.rbegin() + 1, moved.rend());
    bool seen = false;
    QTimer::singleShot(0, [&] {
      auto* dialog = panel->findChild<cw::gui::LossOrderDialog*>("lossOrderDialog");
      QVERIFY(dialog);
      QListWidget* list = dialog->list();
      QCOMPARE(list->dragDropMode(), QAbstractItemView::InternalMove);
      QCOMPARE(keysOf(dialog->order()), partial);  // opens on the order shown
      list->insertItem(0, list->takeItem(list->count() - 1));
      QCOMPARE(keysOf(dialog->order()), moved);
      seen = true;
      dialog->accept();
    });
    QTest::mouseClick(panel->orderButton(), Qt::LeftButton);
    QVERIFY(seen);
    QCOMPARE(keysOf(panel->order()), moved);
    checkBarsFollow(chart, cw::analysis::auditCase(c, moved), moved);

    // "Flow order" in the dialog puts the losses back, stored as the default (empty) order.
    seen = false;
    QTimer::singleShot(0, [&] {
      auto* dialog = panel->findChild<cw::gui::LossOrderDialog*>("lossOrderDialog");
      QVERIFY(dialog);
      auto* reset = dialog->findChild<QPushButton*>("flowOrderButton");
      QVERIFY(reset);
      QTest::mouseClick(reset, Qt::LeftButton);
      QCOMPARE(keysOf(dialog->order()), flow);
      seen = true;
      dialog->accept();
    });
    panel->editOrder();
    QVERIFY(seen);
    QVERIFY(panel->order().isEmpty());
    checkBarsFollow(chart, cw::analysis::auditCase(c), flow);
    QVERIFY(QSettings().value("audit/waterfall_order").toStringList().isEmpty());
  }

  void auditStartsAsATabAndMovesIntoItsDock() {
    QSettings().remove("window/state");
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1600, 1000);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    QTabWidget* tabs = window.bottomTabs();
    QVERIFY(tabs);
    QVERIFY(window.auditDock()->isHidden());
    QCOMPARE(tabs->count(), 3);         // tables, loss audit, trade study
    QCOMPARE(tabs->currentIndex(), 0);  // the tables first, the audit in sight
    QCOMPARE(tabs->widget(1), static_cast<QWidget*>(window.auditPanel()));
    QCOMPARE(tabs->tabText(1), QString("Loss audit"));
    // Showing the audit costs the cycle charts nothing: they keep their size, and the audit tab
    // does not raise the bottom area's minimum height (which squeezes the charts in a small window).
    QVERIFY(window.auditPanel()->minimumSizeHint().height() <= tabs->widget(0)->minimumSizeHint().height());
    const QSize ts = window.temperatureEntropyChart()->size(), pv = window.pressureVolumeChart()->size();
    tabs->setCurrentIndex(1);
    QVERIFY(window.auditPanel()->chart()->isVisible());
    QVERIFY(window.auditPanel()->orderNote()->isVisible());
    QCOMPARE(window.temperatureEntropyChart()->size(), ts);
    QCOMPARE(window.pressureVolumeChart()->size(), pv);

    QAction* toggle = window.findChild<QAction*>("auditDockAction");
    toggle->trigger();
    QVERIFY(!window.auditDock()->isHidden());
    QCOMPARE(window.auditDock()->widget(), static_cast<QWidget*>(window.auditPanel()));
    QCOMPARE(tabs->count(), 2);
    QVERIFY(window.auditPanel()->chart()->isVisible());
    window.auditDock()->close();  // its close button
    QVERIFY(window.auditDock()->isHidden());
    QVERIFY(!toggle->isChecked());
    QCOMPARE(tabs->count(), 3);
    QCOMPARE(tabs->widget(1), static_cast<QWidget*>(window.auditPanel()));
  }
};

QTEST_MAIN(TestLossAudit)
#include "test_loss_audit.moc"
