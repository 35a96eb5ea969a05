// Benchmark: a 100 x 100 carpet (compressor pressure ratio x burner exit temperature) of the demo
// case on the thermally perfect model, each point with its ideal twin. Goal: at least 100 000
// points per second per core on the development machine. Rows for one and two threads show the
// scaling. Run with -callgrind for stable instruction counts (one thread).
#include "io/case_file.h"
#include "study/trade_study.h"

#include <QElapsedTimer>
#include <QTest>

class BenchTradeStudy : public QObject {
  Q_OBJECT
 private slots:
  void carpet100x100_data() {
    QTest::addColumn<unsigned>("threads");
    QTest::newRow("1 thread") << 1u;
    QTest::newRow("2 threads") << 2u;
  }
  void carpet100x100() {
    QFETCH(unsigned, threads);
    cw::study::TradeStudySpec spec;
    spec.document = cw::io::readCaseDocument(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");
    spec.axes = {{"compressor.pressure_ratio", 4.0, 40.0, 100},
                 {"burner.exit_temperature_K", 1200.0, 1800.0, 100}};
    spec.threads = threads;
    std::size_t solved = 0;
    QElapsedTimer timer;
    qint64 nanoseconds = 0;
    int runs = 0;
    QBENCHMARK {
      timer.start();
      solved = cw::study::runTradeStudy(spec).count(cw::study::PointStatus::Solved);
      nanoseconds += timer.nsecsElapsed();
      ++runs;
    }
    QCOMPARE(solved, std::size_t(10000));
    const double pointsPerSecond = 10000.0 * runs / (nanoseconds * 1e-9);
    qInfo("%u thread(s): %.0f points per second, %.0f per second per thread", threads, pointsPerSecond,
          pointsPerSecond / threads);
  }
};

QTEST_GUILESS_MAIN(BenchTradeStudy)
#include "bench_trade_study.moc"
