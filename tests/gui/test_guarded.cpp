// No exception escapes: GuardedApplication::notify() catches one thrown by an event handler or
// a slot, shows it in the main window's status bar and a warning dialog and keeps running;
// runGuarded() turns one escaping main()'s work into one line on stderr and an exit status.
// The suite runs on a GuardedApplication of its own (see main() below).
#include "gui_test_support.h"
#include "startup/guarded_application.h"
#include "startup/guarded_main.h"

#include "common/error.h"

#include <QEvent>
#include <QLabel>
#include <QMainWindow>
#include <QMessageBox>
#include <QProcess>
#include <QStatusBar>
#include <QTest>
#include <QTimer>

#include <new>
#include <sstream>
#include <stdexcept>

namespace {

const QEvent::Type kThrowEvent = static_cast<QEvent::Type>(QEvent::User + 1);

/// A widget whose handler of kThrowEvent throws, as a bug in an event handler would.
class ThrowingWidget : public QLabel {
 public:
  using QLabel::QLabel;
  int handled = 0;

 protected:
  bool event(QEvent* event) override {
    if (event->type() != kThrowEvent) return QLabel::event(event);
    ++handled;
    throw std::runtime_error("the handler failed on purpose");
  }
};

QMessageBox* shownErrorBox(QMainWindow& window) {
  auto* box = window.findChild<QMessageBox*>("internalErrorBox");
  return box && box->isVisible() ? box : nullptr;
}

}  // namespace

class TestGuarded : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() {
    cw::test::isolateGuiTest("CyclewrightTestGuarded");
    QVERIFY(qobject_cast<cw::gui::GuardedApplication*>(QCoreApplication::instance()));
  }

  void anEventHandlerThatThrowsIsReportedAndTheApplicationRuns() {
    QMainWindow window;
    auto* widget = new ThrowingWidget(QStringLiteral("strip"), &window);
    window.setCentralWidget(widget);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    QEvent event(kThrowEvent);
    QVERIFY(!QCoreApplication::sendEvent(widget, &event));  // caught, not handled
    QCOMPARE(widget->handled, 1);
    const QString expected =
        QStringLiteral("An internal error interrupted the last action: the handler failed on purpose");
    QCOMPARE(window.statusBar()->currentMessage(), expected);
    QTRY_VERIFY(shownErrorBox(window));
    QCOMPARE(shownErrorBox(window)->text(), expected);
    QCOMPARE(shownErrorBox(window)->windowTitle(), QString("Internal error"));
    // A second failure while the dialog is up: reported in the status bar, no second dialog.
    QCoreApplication::postEvent(widget, new QEvent(kThrowEvent));
    QTRY_COMPARE(widget->handled, 2);
    QCOMPARE(window.findChildren<QMessageBox*>("internalErrorBox").size(), 1);
    shownErrorBox(window)->accept();
    QTRY_VERIFY(window.findChildren<QMessageBox*>("internalErrorBox").isEmpty());
    // Still running: events and timers keep coming.
    bool fired = false;
    QTimer::singleShot(10, &window, [&fired] { fired = true; });
    QTRY_VERIFY(fired);
    widget->setText(QStringLiteral("after"));
    QCOMPARE(widget->text(), QString("after"));
  }

  void aSlotThatThrowsIsReportedToo() {
    QMainWindow window;
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    int calls = 0;
    QTimer::singleShot(0, &window, [&calls] {
      ++calls;
      throw std::bad_alloc();
    });
    QTRY_COMPARE(calls, 1);
    QTRY_VERIFY(shownErrorBox(window));
    QCOMPARE(window.statusBar()->currentMessage(),
             QString("An internal error interrupted the last action: out of memory"));
    shownErrorBox(window)->accept();
  }

  void withoutAWindowOnlyStderrSaysIt() {
    QObject plain;
    QTimer::singleShot(0, &plain, [] { throw std::logic_error("no window"); });
    QTest::qWait(50);
    const auto boxes = QApplication::topLevelWidgets();
    for (QWidget* widget : boxes) QVERIFY(widget->objectName() != QLatin1String("internalErrorBox"));
  }

  void runGuardedTurnsEscapingExceptionsIntoOneLine_data() {
    QTest::addColumn<int>("kind");
    QTest::addColumn<int>("status");
    QTest::addColumn<QString>("line");
    QTest::newRow("returns") << 0 << 7 << "";
    QTest::newRow("invalid input")
        << 1 << 2 << "cyclewright: --size = 9x9 is outside the valid range 200x150 to 8000x8000\n";
    QTest::newRow("out of range") << 2 << 2
                                  << "cyclewright: T = 9000 K is outside the valid range [200, 6000]\n";
    QTest::newRow("several lines") << 3 << 2 << "cyclewright: case.json: first problem; second problem\n";
    QTest::newRow("not converged") << 4 << 1
                                   << "cyclewright: internal error: T(h): solver did not converge after 50 "
                                      "iterations (residual 0.5)\n";
    QTest::newRow("out of memory") << 5 << 1 << "cyclewright: out of memory\n";
    QTest::newRow("other") << 6 << 1 << "cyclewright: internal error: vector::at\n";
    QTest::newRow("unknown") << 7 << 1 << "cyclewright: internal error: an exception of unknown type\n";
  }
  void runGuardedTurnsEscapingExceptionsIntoOneLine() {
    QFETCH(int, kind);
    QFETCH(int, status);
    QFETCH(QString, line);
    std::ostringstream err;
    const int got = cw::gui::runGuarded(
        [kind]() -> int {
          switch (kind) {
            case 1:
              throw cw::Error(cw::ErrorCode::InvalidInput, "--size",
                              "--size = 9x9 is outside the valid range 200x150 to 8000x8000");
            case 2:
              throw cw::OutOfRange("T", 9000.0, "K", "[200, 6000]");
            case 3:
              throw cw::Error(cw::ErrorCode::InvalidInput, "case.json",
                              "case.json: first problem\nsecond problem");
            case 4:
              throw cw::NotConverged("T(h)", 50, 0.5);
            case 5:
              throw std::bad_alloc();
            case 6:
              throw std::out_of_range("vector::at");
            case 7:
              throw 42;
          }
          return 7;
        },
        err);
    QCOMPARE(got, status);
    QCOMPARE(QString::fromStdString(err.str()), line);
  }

  void mainExitsWithTwoAndOneLineForAnOptionOfTheWrongKind() {
    // main() itself: the option's error escapes its work and becomes status 2 and one line.
    const cw::test::IsolatedHome home;
    QProcess app;
    home.start(app, CYCLEWRIGHT_GUI_PATH, {"--screenshot", home.path("x.png"), "--size", "0x0"});
    QVERIFY(app.waitForFinished(60000));
    QCOMPARE(app.exitStatus(), QProcess::NormalExit);
    QCOMPARE(app.exitCode(), 2);
    QVERIFY(QString::fromUtf8(app.readAllStandardError())
                .contains("cyclewright: --size = 0x0 is outside the valid range 200x150 to 8000x8000\n"));
  }
};

int main(int argc, char** argv) {
  cw::gui::GuardedApplication app(argc, argv);
  TestGuarded suite;
  QTEST_SET_MAIN_SOURCE_PATH
  return QTest::qExec(&suite, argc, argv);
}

#include "test_guarded.moc"
