// The stale rule, offscreen: while a value is typed, only a committed result (Enter, focus out,
// or one that stood for CaseDocument::kSettleMilliseconds) becomes the last valid result kept on
// screen; a case opened without a cycle shows empty charts and tables and says why, never the
// previous case's result; the banner states values in display units at display precision, and
// writes the core's failures itself: translated, their numbers in the display units.
#include "charts/cycle_chart.h"
#include "document/case_document.h"
#include "document/core_failure.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"

#include "common/error.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <qwt_plot_curve.h>
#include <qwt_plot_legenditem.h>

#include <QApplication>
#include <QFile>
#include <QLabel>
#include <QLineEdit>
#include <QRegularExpression>
#include <QScopeGuard>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QTranslator>
#include <QUndoStack>

#include <cmath>
#include <vector>

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

/// Pa per psi: 1 lbf / (0.0254 m)^2, NIST Special Publication 811 (2008), appendix B.8.
constexpr double kPaPerPsi = 6894.757293168;

/// The numbers directly before a unit in a text, e.g. every "123.45" of "123.45 psia".
std::vector<double> numbersBefore(const QString& text, const QString& unit) {
  std::vector<double> values;
  const QRegularExpression pattern(QStringLiteral("(-?\\d+(?:\\.\\d+)?) ") +
                                   QRegularExpression::escape(unit) + QStringLiteral("(?![\\w/])"));
  for (auto it = pattern.globalMatch(text); it.hasNext();) values.push_back(it.next().captured(1).toDouble());
  return values;
}

/// Every number in a text.
std::vector<double> numbersIn(const QString& text) {
  std::vector<double> values;
  const QRegularExpression pattern(QStringLiteral("\\d+(?:\\.\\d+)?"));
  for (auto it = pattern.globalMatch(text); it.hasNext();) values.push_back(it.next().captured(0).toDouble());
  return values;
}

/// Whether a shown value is the expected one at five significant digits (the display precision).
bool atDisplayPrecision(double shown, double expected) {
  return std::fabs(shown - expected) <= 5e-5 * std::fabs(expected);
}

/// The rows of a test run in both unit systems and both languages: columns "us" and "language".
void addUnitAndLanguageRows() {
  QTest::addColumn<bool>("us");
  QTest::addColumn<QString>("language");
  QTest::newRow("SI, English") << false << "en";
  QTest::newRow("U.S., English") << true << "en";
  QTest::newRow("SI, German") << false << "de";
  QTest::newRow("U.S., German") << true << "de";
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
    // An empty chart explains no line: no legend inside it (over its "No result" hint) or below
    // (the T-s chart's legend stands inside while a corner is free; the p-v chart's always below).
    const cw::gui::CycleChart* temperatureEntropy = window.temperatureEntropyChart();
    QVERIFY(temperatureEntropy->legendItem());
    QVERIFY(!temperatureEntropy->legendItem()->isVisible());
    QVERIFY(!temperatureEntropy->legend());
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
    // A case with a cycle brings the legend back (inside, or below where no corner is free).
    QVERIFY(window.openCase(kDemo));
    const cw::gui::CycleChart* chart = window.temperatureEntropyChart();
    QVERIFY(chart->legendItem()->isVisible() || chart->legend());
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

  // The demo case with a turbine isentropic efficiency of 0.3 has no cycle: the turbine takes so
  // much pressure to drive the compressor that the nozzle entry total pressure is below the
  // ambient pressure. The banner names that cause in the chosen language, its pressures in the
  // chosen units at display precision, and no SI number when U.S. customary units are on.
  void aCoreFailureInTheChosenUnitsAndLanguage_data() { addUnitAndLanguageRows(); }
  void aCoreFailureInTheChosenUnitsAndLanguage() {
    QFETCH(bool, us);
    QFETCH(QString, language);
    const cw::test::ScopedLanguage scoped(language);
    if (language == "de") QCOMPARE(scoped.installed(), QString("de_DE"));
    cw::engine::Case weak = cw::test::demoCase();
    weak.turbine.efficiency.value = 0.3;
    // What the core says: its reason key and the two pressures [Pa].
    double entry = 0.0, ambient = 0.0;
    try {
      cw::engine::evaluateCase(weak);
      QFAIL("the weak turbine has a cycle");
    } catch (const cw::Error& e) {
      QCOMPARE(e.code(), cw::ErrorCode::NoSolution);
      QCOMPARE(e.detail().reason, std::string(cw::kReasonNozzleNoJet));
      QCOMPARE(e.detail().quantities.size(), std::size_t(2));
      entry = e.detail().quantities[0].value;
      ambient = e.detail().quantities[1].value;
    }
    QVERIFY(entry > 1000.0 && ambient > entry);

    MainWindow window;
    window.units().setSystem(us ? cw::gui::UnitSystem::USCustomary : cw::gui::UnitSystem::SI);
    window.show();
    window.document().load(weak, QString());
    QVERIFY(window.staleBanner()->isVisible());
    const QString banner = window.staleBanner()->text();
    if (language == "de") {
      QVERIFY2(banner.contains(QStringLiteral("Keine Lösung für diese Eingaben")), qPrintable(banner));
      QVERIFY2(banner.contains(QStringLiteral("Totaldruck am Schubdüseneintritt")), qPrintable(banner));
      QVERIFY2(!banner.contains("no jet") && !banner.contains("nozzle"), qPrintable(banner));
    } else {
      QVERIFY2(banner.contains("No solution for these inputs"), qPrintable(banner));
      QVERIFY2(banner.contains("the nozzle entry total pressure"), qPrintable(banner));
      QVERIFY2(banner.contains("is not above the ambient pressure"), qPrintable(banner));
    }
    // Both pressures in the display unit, at five significant digits: kPa = 1000 Pa, psia as
    // above.
    const double perUnit = us ? kPaPerPsi : 1000.0;
    const std::vector<double> shown = numbersBefore(banner, us ? "psia" : "kPa");
    QVERIFY2(shown.size() == 2, qPrintable(banner));
    QVERIFY2(atDisplayPrecision(shown[0], entry / perUnit), qPrintable(banner));
    QVERIFY2(atDisplayPrecision(shown[1], ambient / perUnit), qPrintable(banner));
    if (us) {
      // No SI unit and no SI number (in Pa or kPa) anywhere in the banner.
      QVERIFY2(!banner.contains("kPa") && !banner.contains(" Pa"), qPrintable(banner));
      for (const double number : numbersIn(banner))
        for (const double si : {entry, ambient, entry / 1000.0, ambient / 1000.0})
          QVERIFY2(std::fabs(number - si) > 1e-3 * si, qPrintable(banner));
    }
  }

  // Every kind of core failure that reaches the banner, written by the interface from the
  // error's parts: out of range (in a component), invalid input, no solution, not converged. The
  // errors are the core's own classes; the values are chosen so that their conversions are
  // exact: 2000 K = 3600 °R (1 K = 1.8 °R), 1 163 000 J/kg = 500 Btu/lbm (1 Btu/lbm = 2326 J/kg
  // exactly, NIST SP 811 appendix B.8).
  void everyKindOfFailureInDisplayUnits_data() { addUnitAndLanguageRows(); }
  void everyKindOfFailureInDisplayUnits() {
    QFETCH(bool, us);
    QFETCH(QString, language);
    const cw::test::ScopedLanguage scoped(language);
    const bool de = language == "de";
    cw::gui::DisplayUnits units;
    units.setSystem(us ? cw::gui::UnitSystem::USCustomary : cw::gui::UnitSystem::SI);
    auto text = [&](const cw::Error& e) { return cw::gui::failureText(cw::gui::coreFailure(e), units); };

    // No solution: the turbine cannot drive the compressor.
    const QString drive =
        text(cw::NoSolution("turbine", "the turbine cannot drive the compressor",
                            {cw::kReasonTurbineCannotDrive, {}, {{1163000.0, "J/kg"}, {2000.0, "K"}}, {}}));
    QVERIFY2(drive.contains(de ? QStringLiteral("Die Turbine kann den Verdichter nicht antreiben")
                               : QStringLiteral("the turbine cannot drive the compressor")),
             qPrintable(drive));
    QVERIFY2(drive.contains(us ? "500 Btu/lbm" : "1.163 MJ/kg"), qPrintable(drive));
    QVERIFY2(drive.contains(us ? "3600 °R" : "2000 K"), qPrintable(drive));

    // Out of range in a component: the state's own value and range, converted.
    const cw::OutOfRange inner("temperature", 7000.0, "K", "[200, 6000] K");
    const QString beyond = text(cw::OutOfRange(
        "compressor", "a state beyond the gas data",
        {cw::kReasonBeyondGasData, inner.where(), inner.detail().quantities, inner.detail().validRange}));
    QVERIFY2(beyond.contains(de ? QStringLiteral("Verdichter") : QStringLiteral("Compressor")),
             qPrintable(beyond));
    QVERIFY2(beyond.contains(de ? QStringLiteral("die Temperatur = ") : QStringLiteral("the temperature = ")),
             qPrintable(beyond));
    QVERIFY2(beyond.contains(us ? "12600 °R" : "7000 K"), qPrintable(beyond));
    QVERIFY2(beyond.contains(us ? "[360, 10800] °R" : "[200, 6000] K"), qPrintable(beyond));

    // Invalid input with a valid range: the engine-face Mach number of the case.
    const QString invalid = text(cw::InvalidInput("/sizing/engine_face_mach", 0.95, "", "(0, 0.8]"));
    QVERIFY2(invalid.startsWith(de ? QStringLiteral("Ungültige Eingabe") : QStringLiteral("Invalid input")),
             qPrintable(invalid));
    QVERIFY2(invalid.contains(" = 0.95 ") && invalid.contains("(0, 0.8]"), qPrintable(invalid));
    QVERIFY2(!invalid.contains("/sizing"), qPrintable(invalid));  // the field's name, not its path
    QVERIFY2(invalid.contains(de ? QStringLiteral("Machzahl am Verdichtereintritt")
                                 : QStringLiteral("Engine-face Mach number")),
             qPrintable(invalid));
    // An input named by its key and a remark: the field's name too.
    const QString byKey = text(cw::InvalidInput("flight.mach (MIL-E-5008B recovery)", 5.2, "", "[0, 5)"));
    QVERIFY2(byKey.contains(de ? QStringLiteral("Flug-Machzahl = 5.2 ")
                               : QStringLiteral("Flight Mach number = 5.2 ")),
             qPrintable(byKey));
    QVERIFY2(!byKey.contains("MIL-E"), qPrintable(byKey));

    // Not converged: the iterations and the residual.
    const QString stalled = text(cw::NotConverged("temperature from enthalpy", 60, 2.5e-7));
    QVERIFY2(stalled.startsWith(de ? QStringLiteral("Der Löser ist nicht konvergiert")
                                   : QStringLiteral("The solver did not converge")),
             qPrintable(stalled));
    QVERIFY2(stalled.contains("60") && stalled.contains("2.5e-07"), qPrintable(stalled));
    QVERIFY2(!stalled.contains("solver did not converge after"), qPrintable(stalled));  // not the core's

    // A reason the interface does not know: the heading translated, the core's text kept.
    const QString unknown = text(cw::NoSolution("cycle", "something new", {"a_future_reason", {}, {}, {}}));
    QVERIFY2(unknown.contains("cycle: no solution: something new"), qPrintable(unknown));
    QVERIFY2(unknown.startsWith(de ? QStringLiteral("Keine Lösung") : QStringLiteral("No solution")),
             qPrintable(unknown));
    QVERIFY(!cw::gui::isKnownReason("a_future_reason"));
  }
};

QTEST_MAIN(TestStaleResult)
#include "test_stale_result.moc"
