// No exception escapes main(): runGuarded() turns one escaping main()'s work into one line on
// stderr and an exit status.
#include "guarded_main.h"
#include "gui_test_support.h"

#include "common/error.h"

#include <QProcess>
#include <QTest>

#include <new>
#include <sstream>
#include <stdexcept>

class TestGuarded : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestGuarded"); }

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

QTEST_MAIN(TestGuarded)
#include "test_guarded.moc"
