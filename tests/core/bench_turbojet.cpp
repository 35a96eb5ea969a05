// Benchmark: one design point with its ideal twin (goal: at most 7 us for the thermally perfect
// model without paths on the development machine, so that a 100x100 carpet reaches 100 000 points
// per second per core; the with-paths row must not get slower; the two-spool row, the same case
// with its pressure ratio split 2.5 x pi_c / 2.5 over two spools, under 10 us). Run with -callgrind
// for stable counts (which is why it has a core application object: QTEST_GUILESS_MAIN).
#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <QTest>

class BenchTurbojet : public QObject {
  Q_OBJECT
 private slots:
  void designPointWithIdealTwin_data() {
    QTest::addColumn<QString>("kind");
    QTest::addColumn<bool>("withPaths");
    QTest::newRow("thermally-perfect") << "thermally-perfect" << false;
    QTest::newRow("thermally-perfect with chart paths") << "thermally-perfect" << true;
    QTest::newRow("two-gamma") << "two-gamma" << false;
    QTest::newRow("thermally-perfect two-spool") << "two-spool" << false;
  }
  void designPointWithIdealTwin() {
    QFETCH(QString, kind);
    QFETCH(bool, withPaths);
    cw::engine::Case c = cw::io::readCaseFile(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");
    if (kind == "two-gamma") c.gasModel.model = cw::engine::TwoGammaGasModel{};
    if (kind == "two-spool") {
      c.architecture = cw::engine::Architecture::TwoSpoolTurbojet;
      c.compressor.pressureRatio /= c.lowPressureCompressor.pressureRatio;
    }
    double netThrust = 0.0;
    QBENCHMARK {
      netThrust = cw::engine::evaluateCase(c, withPaths).actual.performance.netThrust;
    }
    QVERIFY(netThrust > 0.0);
  }
};

QTEST_GUILESS_MAIN(BenchTurbojet)
#include "bench_turbojet.moc"
