// Under a dark system palette everything on the charts, the table and the banner reads: the
// canvas is the palette's base, labels and markers are light, the Okabe-Ito lines keep their
// colours. A suite of its own because it changes the application's palette.
#include "charts/cycle_chart.h"
#include "charts/isobar_labels.h"
#include "document/case_document.h"
#include "document/selection_router.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"
#include "tables/station_table_model.h"

#include <qwt_plot_curve.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_legenditem.h>
#include <qwt_plot_marker.h>
#include <qwt_scale_widget.h>
#include <qwt_text.h>

#include <QApplication>
#include <QLabel>
#include <QLineEdit>
#include <QStandardPaths>
#include <QTest>

#include <cstdlib>

using cw::gui::CycleChart;
using cw::gui::MainWindow;

namespace {

/// Contrast in lightness between two colours (0 to 255).
int contrast(const QColor& a, const QColor& b) {
  return std::abs(a.lightness() - b.lightness());
}

}  // namespace

class TestDarkPalette : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestDark"); }

  void everythingReadsOnADarkPalette() {
    auto* app = qobject_cast<QApplication*>(QCoreApplication::instance());
    const QPalette original = QApplication::palette();
    QVERIFY(cw::gui::applyPaletteNamed(*app, "dark"));
    const QPalette dark = QApplication::palette();
    QCOMPARE(dark.color(QPalette::Window), QColor("#202124"));
    QCOMPARE(dark.color(QPalette::Base), QColor("#2b2b2b"));
    QCOMPARE(dark.color(QPalette::Text), QColor(Qt::white));
    {
      MainWindow window;
      QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
      window.resize(1400, 900);
      window.show();
      QVERIFY(QTest::qWaitForWindowExposed(&window));
      window.grab();  // one full paint, so that the isobar labels are placed
      const QColor base = dark.color(QPalette::Base);
      for (CycleChart* chart : {window.temperatureEntropyChart(), window.pressureVolumeChart()}) {
        const QString name = chart->objectName();
        QCOMPARE(chart->canvasBackground().color(), base);
        // Station numbers: light text; the symbols too.
        int labelled = 0;
        for (const QwtPlotMarker* marker : chart->markers()) {
          if (marker->label().isEmpty()) continue;
          ++labelled;
          QVERIFY2(marker->label().color().lightness() > 128, qPrintable(name));
        }
        QVERIFY(labelled >= 8);
        // Isobar labels: light, and drawn.
        QVERIFY(chart->isobarLabels()->labelCount() > 0);
        QVERIFY2(chart->isobarLabels()->textColour().lightness() > 128, qPrintable(name));
        QVERIFY(!chart->isobarLabels()->placedRects().empty());
        // Grid and isobars stand out from the canvas, but less than the text.
        for (const QwtPlotItem* item : chart->itemList(QwtPlotItem::Rtti_PlotGrid)) {
          const QColor grid = static_cast<const QwtPlotGrid*>(item)->majorPen().color();
          QVERIFY2(contrast(grid, base) > 30, qPrintable(name));
        }
        // The legend inside the T-s canvas: light text on the dark base.
        for (const QwtPlotItem* item : chart->itemList(QwtPlotItem::Rtti_PlotLegend)) {
          const auto* legend = static_cast<const QwtPlotLegendItem*>(item);
          QVERIFY(legend->textPen().color().lightness() > 128);
          QVERIFY(legend->backgroundBrush().color().lightness() < 128);
        }
        // Axis titles and tick labels from the palette.
        QVERIFY(chart->axisWidget(QwtAxis::YLeft)->palette().color(QPalette::Text).lightness() > 128);
        QVERIFY(chart->axisWidget(QwtAxis::XBottom)->palette().color(QPalette::WindowText).lightness() > 128);
        // The Okabe-Ito lines keep their colours: lossy solid blue, ideal dashed orange.
        QCOMPARE(chart->actualCurve()->pen().color().rgb(), QColor(0x00, 0x72, 0xB2).rgb());
        QCOMPARE(chart->actualCurve()->pen().style(), Qt::SolidLine);
        QCOMPARE(chart->idealCurve()->pen().color().rgb(), QColor(0xE6, 0x9F, 0x00).rgb());
        QCOMPARE(chart->idealCurve()->pen().style(), Qt::DashLine);
      }
      // The station table's highlight stays dark under the light text.
      window.selection().select(cw::gui::Section::Compressor);
      const auto* table = window.stationModel();
      int highlightedRows = 0;
      for (int r = 0; r < table->rowCount(); ++r) {
        const QVariant background = table->index(r, 1).data(Qt::BackgroundRole);
        if (!background.isValid()) continue;
        ++highlightedRows;
        const QColor colour = background.value<QBrush>().color();
        QVERIFY(colour.lightness() < 110);
        QVERIFY(colour != base);
      }
      QCOMPARE(highlightedRows, 2);  // stations 2 and 3
      // The stale banner: dark background, light text.
      auto* efficiency = window.findChild<QLineEdit*>("compressor.efficiency");
      efficiency->setFocus();
      efficiency->selectAll();
      QTest::keyClicks(efficiency, "0");  // outside (0, 1]
      QVERIFY(window.document().isStale());
      QLabel* banner = window.staleBanner();
      QVERIFY(banner->isVisible());
      QVERIFY(banner->palette().color(QPalette::Window).lightness() < 100);
      QVERIFY(banner->palette().color(QPalette::WindowText).lightness() > 128);
      QVERIFY(contrast(banner->palette().color(QPalette::Window), dark.color(QPalette::Window)) > 5);
      // Input fields stand out from the window and the canvases: WCAG 2 contrast ratios, 1 for
      // equal colours; the old base #2b2b2b gave 1.1 against the window.
      auto* ratio = window.findChild<QLineEdit*>("compressor.pressureRatio");  // a valid field
      QVERIFY(ratio);
      const QColor field = ratio->palette().color(QPalette::Base);
      QCOMPARE(field, QColor("#404349"));
      QVERIFY2(cw::gui::contrastRatio(field, dark.color(QPalette::Window)) >= 1.6,
               qPrintable(QString::number(cw::gui::contrastRatio(field, dark.color(QPalette::Window)))));
      QVERIFY(cw::gui::contrastRatio(field, base) >= 1.4);
      QVERIFY(cw::gui::contrastRatio(ratio->palette().color(QPalette::Text), field) >= 7.0);  // WCAG AAA
      // The ratio itself: black on white is 21 (WCAG 2 definition), a colour on itself 1.
      QCOMPARE(cw::gui::contrastRatio(Qt::black, Qt::white), 21.0);
      QCOMPARE(cw::gui::contrastRatio(field, field), 1.0);
    }
    QApplication::setPalette(original);
  }

  void chartFollowsAPaletteChange() {
    MainWindow window;
    QPalette light = window.palette();
    light.setColor(QPalette::Base, Qt::white);
    light.setColor(QPalette::Text, Qt::black);
    light.setColor(QPalette::Window, QColor(0xEF, 0xEF, 0xEF));
    window.setPalette(light);
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    CycleChart* chart = window.temperatureEntropyChart();
    QCOMPARE(chart->canvasBackground().color(), QColor(Qt::white));
    QVERIFY(chart->isobarLabels()->textColour().lightness() < 128);
    QVERIFY(window.staleBanner()->palette().color(QPalette::Window).lightness() > 128);
    // The palette changes while the window is open (the system switched to dark).
    window.setPalette(cw::gui::darkPalette());
    QCOMPARE(chart->canvasBackground().color(), QColor("#2b2b2b"));
    QVERIFY(chart->isobarLabels()->textColour().lightness() > 128);
    for (const QwtPlotMarker* marker : chart->markers())
      if (!marker->label().isEmpty()) QVERIFY(marker->label().color().lightness() > 128);
    QVERIFY(window.staleBanner()->palette().color(QPalette::Window).lightness() < 100);
    QVERIFY(window.staleBanner()->palette().color(QPalette::WindowText).lightness() > 128);
  }
};

QTEST_MAIN(TestDarkPalette)
#include "test_dark_palette.moc"
