// The stale rule, offscreen: while a value is typed, only a committed result (Enter, focus out,
// or one that stood for CaseDocument::kSettleMilliseconds) becomes the last valid result kept on
// screen; a case opened without a cycle shows empty charts and tables and says why, never the
// previous case's result; the banner states values in display units at display precision.
#include "charts/cycle_chart.h"
#include "document/case_document.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"

#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <qwt_plot_curve.h>

#include <QFile>
#include <QLabel>
#include <QLineEdit>
#include <QRegularExpression>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QUndoStack>

#include <cmath>

using cw::gui::CaseDocument;
using cw::gui::MainWindow;
using P = cw::gui::PerformanceModel;

using cw::test::typeInto;

namespace {

const QString kDemo = QStringLiteral(":/demo/demo-turbojet.json");

/// Types over a field's text: select all, then one key click per character, so the first key
/// replaces the old value directly (no empty field on the way).
void typeOver(QLineEdit* field, const QString& text) {
  field->setFocus();
  field->selectAll();
  QTest::keyClicks(field, text);
}

/// The demo case with one value changed, evaluated by the core directly.
cw::engine::Evaluation demoWith(double compressorEfficiency) {
  QFile file(kDemo);
  file.open(QIODevice::ReadOnly);
  const QByteArray bytes = file.readAll();
  cw::engine::Case c = cw::io::parseCaseText(
      std::string_view(bytes.constData(), static_cast<std::size_t>(bytes.size())), "demo");
  c.compressor.efficiency.value = compressorEfficiency;
  return cw::engine::evaluateCase(c);
}

double shownNetThrust(const MainWindow& window) {
  return window.performanceModel()->index(P::NetThrust, P::Actual).data(P::ValueRole).toDouble();
}

}  // namespace

class TestStaleResult : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestStale"); }

  void aKeystrokeOnTheWayIsNeverTheStaleResult() {
    MainWindow window;
    window.units().setSystem(cw::gui::UnitSystem::SI);
    QVERIFY(window.openCase(kDemo));
    window.show();
    const auto opened = window.document().evaluation();
    QVERIFY(opened);
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    // "1" is valid (eta = 1.0) on the way to "1.2", which is not.
    typeOver(field, "1.2");
    QVERIFY(window.document().isStale());
    QCOMPARE(window.document().evaluation(), opened);
    QCOMPARE(window.document().evaluation()->actual.performance.netThrust,
             demoWith(0.84).actual.performance.netThrust);
    QVERIFY(std::fabs(shownNetThrust(window) - demoWith(0.84).actual.performance.netThrust) < 1e-9);
    QVERIFY(std::fabs(shownNetThrust(window) - demoWith(1.0).actual.performance.netThrust) > 1.0);
    QVERIFY(window.temperatureEntropyChart()->isStale());
  }

  void aValueThatStoodIsTheStaleResult() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    QSignalSpy committed(&window.document(), &CaseDocument::committed);
    typeInto(field, "0.9");
    QVERIFY(!window.document().isStale());
    QVERIFY(window.document().hasPendingCommit());
    QCOMPARE(committed.count(), 0);
    // The typed value stands: after the settle time its result is committed.
    QVERIFY(committed.wait(10 * CaseDocument::kSettleMilliseconds));
    QVERIFY(!window.document().hasPendingCommit());
    typeInto(field, "1.2");
    QVERIFY(window.document().isStale());
    QCOMPARE(window.document().evaluation()->actual.performance.netThrust,
             demoWith(0.9).actual.performance.netThrust);
  }

  void enterCommitsAtOnce() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    typeInto(field, "0.88");
    QVERIFY(window.document().hasPendingCommit());
    QTest::keyClick(field, Qt::Key_Return);
    QVERIFY(!window.document().hasPendingCommit());
    QCOMPARE(window.document().committedEvaluation(), window.document().evaluation());
    typeInto(field, "1.2");
    QCOMPARE(window.document().evaluation()->actual.performance.netThrust,
             demoWith(0.88).actual.performance.netThrust);
    // Undo is a committed edit: its result is kept at once.
    window.document().undoStack()->undo();
    QVERIFY(!window.document().isStale());
    QCOMPARE(window.document().committedEvaluation(), window.document().evaluation());
    QCOMPARE(window.document().evaluation()->actual.performance.netThrust,
             demoWith(0.84).actual.performance.netThrust);
  }

  void aCaseOpenedWithoutACycleShowsNoOtherCasesResult() {
    QTemporaryDir dir;
    QFile demo(kDemo);
    QVERIFY(demo.open(QIODevice::ReadOnly));
    QByteArray text = demo.readAll();
    // The turbine cannot drive the compressor at this efficiency.
    text.replace("\"turbine\": { \"isentropic_efficiency\": 0.87",
                 "\"turbine\": { \"isentropic_efficiency\": 0.3");
    QVERIFY(text.contains("0.3,"));
    const QString path = dir.filePath("weak-turbine.json");
    QFile out(path);
    QVERIFY(out.open(QIODevice::WriteOnly));
    out.write(text);
    out.close();

    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    QVERIFY(window.document().evaluation());
    QVERIFY(window.openCase(path));
    QCOMPARE(window.document().currentCase().turbine.efficiency.value, 0.3);
    QVERIFY(window.document().isStale());
    QVERIFY(!window.document().evaluation());
    QCOMPARE(window.temperatureEntropyChart()->actualCurve()->dataSize(), size_t(0));
    QCOMPARE(window.pressureVolumeChart()->actualCurve()->dataSize(), size_t(0));
    QCOMPARE(window.stationModel()->rowCount(), 0);
    QVERIFY(!window.performanceModel()->index(P::NetThrust, P::Actual).data(P::ValueRole).isValid());
    QVERIFY(window.performanceModel()->index(P::NetThrust, P::Actual).data().toString().isEmpty());
    // The banner says why.
    QVERIFY(window.staleBanner()->isVisible());
    const QString banner = window.staleBanner()->text();
    QVERIFY2(banner.contains("no result for this case"), qPrintable(banner));
    // The turbine leaves the nozzle without pressure to make a jet: the core's reason, its
    // numbers at six significant digits at most (cw::messageNumber), never raw doubles.
    QVERIFY2(banner.contains("nozzle entry total pressure"), qPrintable(banner));
    const QRegularExpression number(QStringLiteral("\\d+(\\.\\d+)?"));
    for (auto it = number.globalMatch(banner); it.hasNext();) {
      QString digits = it.next().captured(0);
      digits.remove(QLatin1Char('.'));
      while (digits.startsWith(QLatin1Char('0'))) digits.remove(0, 1);
      QVERIFY2(digits.size() <= 6, qPrintable(banner));
    }
    QVERIFY2(!banner.contains("last valid result"), qPrintable(banner));
  }

  void theBannerStatesValuesAtDisplayPrecision() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.units().setSystem(cw::gui::UnitSystem::USCustomary);  // not kept in the settings
    window.show();
    auto* field = window.findChild<QLineEdit*>("flight.altitude");
    // 300000.7 ft = 91440.21336 m, above the standard atmosphere's 84852 m.
    typeInto(field, "300000.7");
    QVERIFY(window.document().isStale());
    const QString banner = window.staleBanner()->text();
    QVERIFY2(banner.contains("Altitude = 300000.7 ft is outside the valid range [-5000, 84852] m = "
                             "[-16404, 278386] ft"),
             qPrintable(banner));
    QVERIFY2(!banner.contains("91440"), qPrintable(banner));
  }
};

QTEST_MAIN(TestStaleResult)
#include "test_stale_result.moc"
