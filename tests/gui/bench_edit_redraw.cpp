// One edit-to-redraw cycle: a compressor-efficiency edit as the user types it, one evaluation,
// the charts replotted and the station table and summary repainted. Goal: under 16 ms, also
// with a baseline pinned (its overlay on the charts, its columns in the summary) and with the
// h-s chart shown beside the T-s and p-v charts.
#include "charts/cycle_chart.h"
#include "document/case_document.h"
#include "gui_test_support.h"
#include "main_window.h"

#include <qwt_plot_canvas.h>

#include <QAction>
#include <QLineEdit>
#include <QTableView>
#include <QTest>

class BenchEditRedraw : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightBenchEditRedraw"); }

  void editToRedraw_data() {
    QTest::addColumn<bool>("baseline");
    QTest::addColumn<bool>("enthalpyEntropy");
    QTest::newRow("alone") << false << false;
    QTest::newRow("with baseline") << true << false;
    QTest::newRow("with baseline and h-s beside") << true << true;
  }

  void editToRedraw() {
    QFETCH(bool, baseline);
    QFETCH(bool, enthalpyEntropy);
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    window.resize(1600, 1000);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    auto* stations = window.findChild<QTableView*>("stationTable");
    auto* summary = window.findChild<QTableView*>("performanceTable");
    QVERIFY(field && stations && summary);
    if (baseline) QVERIFY(window.document().pinBaseline());
    auto* beside = window.findChild<QAction*>("enthalpyEntropyBesideAction");
    QVERIFY(beside);
    beside->setChecked(enthalpyEntropy);
    QCOMPARE(window.enthalpyEntropyChart()->isVisible(), enthalpyEntropy);
    int k = 0;
    QBENCHMARK {
      const QString text = (k++ % 2) ? QStringLiteral("0.85") : QStringLiteral("0.86");
      field->setText(text);
      emit field->textEdited(text);
      window.temperatureEntropyChart()->canvas()->repaint();
      window.pressureVolumeChart()->canvas()->repaint();
      if (enthalpyEntropy) window.enthalpyEntropyChart()->canvas()->repaint();
      stations->viewport()->repaint();
      summary->viewport()->repaint();
    }
    QVERIFY(!window.document().isStale());
  }
};

QTEST_MAIN(BenchEditRedraw)
#include "bench_edit_redraw.moc"
