// The main window's layout holds: toolbar buttons keep their place whatever the undo text says;
// at 1280 x 800 and 1920 x 1080, with and without the docks, no control is below its minimum
// size or cut off, and the station and performance tables show every column (scrolling, if at
// all, only vertically; at 1280 x 800 without a dock every station); in German too, and there the
// component strip shows every item without scrolling sideways.
#include "charts/cycle_chart.h"
#include "charts/isobar_labels.h"
#include "charts/label_placer.h"
#include "document/case_document.h"
#include "document/case_fields.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"

#include <qwt_plot.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_legenditem.h>
#include <qwt_scale_map.h>
#include <qwt_scale_widget.h>
#include <qwt_text.h>

#include <QAbstractButton>
#include <QAbstractSpinBox>
#include <QAction>
#include <QComboBox>
#include <QDockWidget>
#include <QFontMetricsF>
#include <QHeaderView>
#include <QLineEdit>
#include <QListWidget>
#include <QScrollBar>
#include <QTabWidget>
#include <QTableView>
#include <QTest>
#include <QToolBar>
#include <QToolButton>
#include <QTranslator>
#include <QUndoStack>

namespace {

/// Each toolbar button's left edge and width, in toolbar order [px].
QList<QRect> buttonPlaces(QToolBar* bar) {
  QList<QRect> places;
  for (QAction* action : bar->actions())
    if (QWidget* button = bar->widgetForAction(action); button && !action->isSeparator())
      places << button->geometry();
  return places;
}

/// The smallest size a widget's layout would give it: its minimum size where set, else its
/// minimum size hint [px].
QSize smallestSize(const QWidget* w) {
  QSize min = w->minimumSizeHint();
  if (w->minimumWidth() > 0) min.setWidth(w->minimumWidth());
  if (w->minimumHeight() > 0) min.setHeight(w->minimumHeight());
  return min;
}

/// Whether every ancestor up to the window is visible (QWidget::isVisible() says so).
bool shown(const QWidget* w) {
  return w->isVisible() && !w->visibleRegion().isEmpty();
}

/// The controls that are smaller than their minimum or cut off by their parents, as text.
QStringList crampedControls(const QWidget& window) {
  QStringList out;
  for (QWidget* w : window.findChildren<QWidget*>()) {
    const bool control = qobject_cast<QLineEdit*>(w) || qobject_cast<QAbstractSpinBox*>(w) ||
                         qobject_cast<QComboBox*>(w) || qobject_cast<QAbstractButton*>(w) ||
                         qobject_cast<QwtPlot*>(w) || qobject_cast<QTableView*>(w);
    if (!control || !shown(w) || w->objectName().startsWith("qt_")) continue;
    if (qobject_cast<QAbstractButton*>(w) && w->parentWidget() &&
        qobject_cast<QHeaderView*>(w->parentWidget()))
      continue;
    const QSize min = smallestSize(w);
    const QRect seen = w->visibleRegion().boundingRect();
    if (w->width() < min.width() || w->height() < min.height() ||
        seen.width() < std::min(w->width(), min.width()))
      out << QStringLiteral("%1 (%2) %3x%4, seen %5x%6, minimum %7x%8")
                 .arg(w->objectName(), QString::fromLatin1(w->metaObject()->className()))
                 .arg(w->width())
                 .arg(w->height())
                 .arg(seen.width())
                 .arg(seen.height())
                 .arg(min.width())
                 .arg(min.height());
  }
  return out;
}

/// What is wrong with a table's fit: a horizontal scroll bar, or a column narrower than its text.
QString tableFit(QTableView* table) {
  if (table->horizontalScrollBar()->maximum() > 0)
    return QStringLiteral("%1 scrolls horizontally by %2 px")
        .arg(table->objectName())
        .arg(table->horizontalScrollBar()->maximum());
  for (int c = 0; c < table->model()->columnCount(); ++c) {
    const int needed = std::max(static_cast<QAbstractItemView*>(table)->sizeHintForColumn(c),
                                table->horizontalHeader()->sectionSizeHint(c));
    if (table->columnWidth(c) < needed)
      return QStringLiteral("%1 column %2 is %3 px, needs %4")
          .arg(table->objectName())
          .arg(c)
          .arg(table->columnWidth(c))
          .arg(needed);
  }
  return {};
}

/// Whether every row of a table is in view.
bool everyRowInView(QTableView* table) {
  const int last = table->model()->rowCount() - 1;
  return table->rowViewportPosition(last) + table->rowHeight(last) <= table->viewport()->height();
}

/// A legend inside the chart's canvas that covers a sample of the cycle with losses or the
/// ideal cycle (mapped to pixels), as text; empty when none does.
QString legendOverCycle(const cw::gui::CycleChart& chart) {
  const QwtScaleMap xMap = chart.canvasMap(QwtAxis::XBottom), yMap = chart.canvasMap(QwtAxis::YLeft);
  const QRectF canvas = chart.isobarLabels()->canvasRect();
  for (const QwtPlotItem* item : chart.itemList(QwtPlotItem::Rtti_PlotLegend)) {
    if (!item->isVisible()) continue;
    const QRectF legend = static_cast<const QwtPlotLegendItem*>(item)->geometry(canvas);
    for (const QwtPlotCurve* curve : {chart.actualCurve(), chart.idealCurve()})
      for (std::size_t k = 1; k < curve->dataSize(); ++k) {
        const QPointF a(xMap.transform(curve->sample(k - 1).x()), yMap.transform(curve->sample(k - 1).y()));
        const QPointF b(xMap.transform(curve->sample(k).x()), yMap.transform(curve->sample(k).y()));
        if (cw::gui::segmentMeetsRect(a, b, legend))
          return QStringLiteral("%1: the legend (%2, %3 %4 x %5) covers %6")
              .arg(chart.objectName())
              .arg(legend.x())
              .arg(legend.y())
              .arg(legend.width())
              .arg(legend.height())
              .arg(curve->title().text());
      }
  }
  return {};
}

void settle() {
  for (int i = 0; i < 4; ++i) QApplication::processEvents();
}

}  // namespace

class TestWindowLayout : public QObject {
  Q_OBJECT
 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestWindowLayout"); }

  void toolbarButtonsKeepTheirWidthAfterAnEdit() {
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    window.resize(1280, 800);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    auto* bar = window.findChild<QToolBar*>("mainToolBar");
    QVERIFY(bar);
    const QList<QRect> before = buttonPlaces(bar);
    QCOMPARE(before.size(), 9);

    cw::engine::Case edited = window.document().currentCase();
    edited.compressor.pressureRatio = 9.5;
    window.document().applyEdit(-1, QStringLiteral("Change Pressure ratio pt3/pt2"), edited);
    QApplication::processEvents();

    auto* undo = window.findChild<QAction*>("undoAction");
    QVERIFY(undo->isEnabled());
    QVERIFY2(undo->text().contains("Change Pressure ratio pt3/pt2"), qPrintable(undo->text()));
    auto* undoButton = qobject_cast<QToolButton*>(bar->widgetForAction(undo));
    QCOMPARE(undoButton->text(), QString("Undo"));
    QVERIFY2(undo->toolTip().contains("Change Pressure ratio pt3/pt2"), qPrintable(undo->toolTip()));
    QCOMPARE(buttonPlaces(bar), before);

    window.document().undoStack()->undo();  // now Redo carries the text
    QApplication::processEvents();
    QCOMPARE(buttonPlaces(bar), before);
  }

  void holdsAtLaptopAndDesktopSizes_data() {
    QTest::addColumn<QSize>("size");
    QTest::addColumn<QString>("dock");   // "", "audit" or "study"
    QTest::addColumn<bool>("baseline");  // pinned after the window is shown: three more columns
    for (const bool baseline : {false, true})
      for (const QSize size : {QSize(1280, 800), QSize(1920, 1080)})
        for (const QString dock : {"", "audit", "study"})
          QTest::addRow("%dx%d %s%s", size.width(), size.height(),
                        dock.isEmpty() ? "no dock" : qPrintable(dock), baseline ? ", baseline" : "")
              << size << dock << baseline;
  }
  void holdsAtLaptopAndDesktopSizes() {
    QFETCH(QSize, size);
    QFETCH(QString, dock);
    QFETCH(bool, baseline);
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    window.resize(size);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    if (baseline) {
      settle();
      QVERIFY(window.document().pinBaseline());
      QCOMPARE(window.findChild<QTableView*>("performanceTable")->model()->columnCount(), 8);
    }
    if (dock == "audit") {
      window.auditDock()->show();
      window.placeAudit();
    } else if (dock == "study") {
      window.tradeStudyDock()->show();
      window.placeTradeStudy();
    }
    settle();
    // The window keeps its size: with a baseline pinned and the trade-study dock open the window
    // once grew to 1294 px at 1280 x 800 (the study's table beside its controls set the dock's
    // minimum width).
    QCOMPARE(window.size(), size);
    // The component strip never scrolls sideways, with a dock beside it too (its widest names
    // then give way, elided, whole in their tooltips).
    auto* strip = window.findChild<QListWidget*>("componentStrip");
    QCOMPARE(strip->horizontalScrollBar()->maximum(), 0);
    for (int i = 0; i < strip->count(); ++i)
      QVERIFY2(strip->viewport()->rect().contains(strip->visualItemRect(strip->item(i))),
               qPrintable(strip->item(i)->text()));
    if (dock == "study") {
      // The study's results the dock's width, at least three rows high (once a sliver).
      auto* table = window.findChild<QTableView*>("studyTable");
      QVERIFY(table && shown(table));
      QVERIFY2(table->viewport()->width() >= 400, qPrintable(QString::number(table->viewport()->width())));
      QVERIFY2(table->viewport()->height() >= 3 * table->verticalHeader()->defaultSectionSize(),
               qPrintable(QString::number(table->viewport()->height())));
    } else if (dock == "audit") {
      // The audit's table never scrolls sideways; the loss names keep a readable width.
      auto* table = window.findChild<QTableView*>("auditTable");
      QVERIFY(table && shown(table));
      QCOMPARE(table->horizontalScrollBar()->maximum(), 0);
      QVERIFY2(table->columnWidth(1) >= 120, qPrintable(QString::number(table->columnWidth(1))));
      for (int c = 2; c < table->model()->columnCount(); ++c)
        QVERIFY(table->columnWidth(c) >= table->horizontalHeader()->sectionSizeHint(c));
    }
    // Without a dock both tables side by side, at the laptop size too (with a baseline's three
    // columns more at the desktop size).
    if (dock.isEmpty() && (!baseline || size.width() >= 1920))
      QVERIFY(window.findChild<QTabWidget*>("tablePairTabs")->isHidden());
    if (!qEnvironmentVariableIsEmpty("CYCLEWRIGHT_LAYOUT_PICTURES"))
      window.grab().save(QStringLiteral("%1/layout-%2x%3-%4.png")
                             .arg(qEnvironmentVariable("CYCLEWRIGHT_LAYOUT_PICTURES"))
                             .arg(size.width())
                             .arg(size.height())
                             .arg((dock.isEmpty() ? QString("none") : dock) + (baseline ? "-baseline" : "")));

    const QStringList cramped = crampedControls(window);
    QVERIFY2(cramped.isEmpty(), qPrintable(cramped.join("\n")));
    // No legend inside a chart covers the cycle with losses or the ideal one (at 1280 x 800
    // the T-s chart's once covered the heat addition, 3 to 4): it moves to a free corner or
    // below the plot.
    for (cw::gui::CycleChart* chart : window.findChildren<cw::gui::CycleChart*>()) {
      if (!shown(chart)) continue;
      chart->grab();
      QCOMPARE(legendOverCycle(*chart), QString());
    }
    // Side by side, or in two tabs when the room is less: each table in view fits.
    for (const char* name : {"stationTable", "performanceTable"}) {
      auto* table = window.findChild<QTableView*>(name);
      QVERIFY(table);
      if (!shown(table)) {
        auto* tabs = window.findChild<QTabWidget*>("tablePairTabs");
        QVERIFY2(tabs && tabs->isVisible(), name);
        for (int i = 0; i < tabs->count(); ++i)
          if (tabs->widget(i)->isAncestorOf(table)) tabs->setCurrentIndex(i);
        settle();
        QVERIFY(crampedControls(window).isEmpty());
      }
      QVERIFY2(shown(table), name);
      QCOMPARE(tableFit(table), QString());
      // Stations 8 and 9 in view at the laptop size too; the performance summary in one view.
      QVERIFY2(everyRowInView(table), name);
    }
  }

  // The component strip in one row without a horizontal scroll bar: in German at 1280 x 800 its
  // names ("Auslegung und Größe", "Nachbrenner (nicht gezündet)") once made it scroll sideways;
  // now a name of several words goes on two lines, each item whole in view and its name whole in
  // its tooltip. In English at 1280 x 800 every name still stands on one line.
  void stripFitsWithoutScrolling_data() {
    QTest::addColumn<QString>("language");
    QTest::addColumn<QSize>("size");
    QTest::newRow("German 1280x800") << "de" << QSize(1280, 800);
    QTest::newRow("German 1920x1080") << "de" << QSize(1920, 1080);
    QTest::newRow("English 1280x800") << "en" << QSize(1280, 800);
  }
  void stripFitsWithoutScrolling() {
    QFETCH(QString, language);
    QFETCH(QSize, size);
    const cw::test::ScopedLanguage scoped(language);
    if (language == "de") QCOMPARE(scoped.installed(), QString("de_DE"));
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    QVERIFY(!window.document().currentCase().afterburner.enabled);  // the longest name: unlit
    window.resize(size);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    settle();
    if (!qEnvironmentVariableIsEmpty("CYCLEWRIGHT_LAYOUT_PICTURES"))
      window.grab().save(QStringLiteral("%1/strip-%2-%3x%4.png")
                             .arg(qEnvironmentVariable("CYCLEWRIGHT_LAYOUT_PICTURES"), language)
                             .arg(size.width())
                             .arg(size.height()));
    QCOMPARE(window.size(), size);
    auto* strip = window.findChild<QListWidget*>("componentStrip");
    QVERIFY(strip);
    const std::vector<cw::gui::Section> sections =
        cw::gui::stripSections(window.document().currentCase().architecture);
    QCOMPARE(strip->count(), int(sections.size()));
    QCOMPARE(strip->horizontalScrollBar()->maximum(), 0);
    QVERIFY(!strip->horizontalScrollBar()->isVisible());
    const QFontMetrics metrics(strip->font());
    const QRect view = strip->viewport()->rect();
    bool twoLines = false;
    for (int i = 0; i < strip->count(); ++i) {
      const QListWidgetItem* item = strip->item(i);
      const QRect place = strip->visualItemRect(item);
      QVERIFY2(view.contains(place), qPrintable(item->text()));
      // Each line of its text inside the item; at most two lines (the strip's height).
      const QStringList lines = item->text().split('\n');
      QVERIFY2(lines.size() <= 2, qPrintable(item->text()));
      twoLines = twoLines || lines.size() == 2;
      for (const QString& line : lines)
        QVERIFY2(metrics.horizontalAdvance(line) <= place.width(), qPrintable(line));
      QVERIFY2(lines.size() * metrics.height() <= place.height(), qPrintable(item->text()));
      // The whole name, on one line, in the tooltip.
      const cw::gui::Section section = sections[std::size_t(i)];
      const QString name = section == cw::gui::Section::Afterburner
                               ? QCoreApplication::translate("cw::gui::MainWindow", "%1 (unlit)")
                                     .arg(cw::gui::sectionName(cw::gui::Section::Afterburner))
                               : cw::gui::sectionName(section);
      QVERIFY2(item->toolTip().startsWith(name), qPrintable(item->toolTip()));
      QCOMPARE(QString(item->text()).replace('\n', ' '), name);
    }
    if (language == "de") {
      QCOMPARE(cw::gui::sectionName(cw::gui::Section::Afterburner), QStringLiteral("Nachbrenner"));
      if (size.width() == 1280) QVERIFY(twoLines);  // one line each would not fit
    } else if (size.width() == 1280) {
      QVERIFY(!twoLines);
    }
    const QStringList cramped = crampedControls(window);
    QVERIFY2(cramped.isEmpty(), qPrintable(cramped.join("\n")));
  }

  // Every cycle chart's axis titles stand on one line: the entropy axis's title once wrapped to
  // two at 1280 x 800 ("Specific entropy s (0 at the free-stream static state) [J/(kg·K)]").
  // With the h-s chart beside the others, the narrowest they get.
  void axisTitlesFitOnOneLine_data() {
    QTest::addColumn<QSize>("size");
    QTest::addColumn<bool>("beside");
    for (const QSize size : {QSize(1280, 800), QSize(1920, 1080)})
      for (const bool beside : {false, true})
        QTest::addRow("%dx%d %s", size.width(), size.height(), beside ? "three charts" : "two charts")
            << size << beside;
  }
  void axisTitlesFitOnOneLine() {
    QFETCH(QSize, size);
    QFETCH(bool, beside);
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    window.resize(size);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    auto* besideAction = window.findChild<QAction*>("enthalpyEntropyBesideAction");
    QVERIFY(besideAction);
    besideAction->setChecked(beside);
    settle();
    if (!qEnvironmentVariableIsEmpty("CYCLEWRIGHT_LAYOUT_PICTURES"))
      window.grab().save(QStringLiteral("%1/axes-%2x%3-%4.png")
                             .arg(qEnvironmentVariable("CYCLEWRIGHT_LAYOUT_PICTURES"))
                             .arg(size.width())
                             .arg(size.height())
                             .arg(beside ? "three" : "two"));
    int checked = 0;
    for (cw::gui::CycleChart* chart : window.findChildren<cw::gui::CycleChart*>()) {
      if (!chart->isVisible()) continue;
      for (const QwtAxisId axis : {QwtAxis::XBottom, QwtAxis::YLeft}) {
        const QwtText title = chart->axisTitle(axis);
        const QwtScaleWidget* scale = chart->axisWidget(axis);
        const double room =
            axis == QwtAxis::XBottom ? scale->contentsRect().width() : scale->contentsRect().height();
        const double needed = title.textSize(scale->font()).width();
        QVERIFY2(!title.text().contains('\n') && needed <= room,
                 qPrintable(QString("%1: \"%2\" needs %3 px of %4")
                                .arg(chart->objectName(), title.text())
                                .arg(needed)
                                .arg(room)));
        ++checked;
      }
      chart->grab();
      QCOMPARE(legendOverCycle(*chart), QString());  // three charts beside: the smallest canvases
    }
    QCOMPARE(checked, beside ? 6 : 4);
  }
};

QTEST_MAIN(TestWindowLayout)
#include "test_window_layout.moc"
