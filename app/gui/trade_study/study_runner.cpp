#include "trade_study/study_runner.h"

#include "common/error.h"

#include <exception>

namespace cw::gui {

namespace {

long pointsOf(const study::TradeStudySpec& spec) {
  long n = 1;
  for (const study::SweepAxis& axis : spec.axes) n *= axis.count;
  return n;
}

}  // namespace

StudyRunner::StudyRunner(QObject* parent) : QObject(parent) {}

StudyRunner::~StudyRunner() {
  stopAndJoin();
}

void StudyRunner::stopAndJoin() {
  if (worker_.joinable()) {
    worker_.request_stop();
    worker_.join();
  }
  running_ = false;
}

void StudyRunner::cancel() {
  if (worker_.joinable()) worker_.request_stop();
}

void StudyRunner::start(StudyJob job) {
  stopAndJoin();
  const std::uint64_t generation = ++generation_;
  running_ = true;
  const qint64 first = pointsOf(job.spec);
  const qint64 total = first + (job.overlay ? pointsOf(*job.overlay) : 0);
  worker_ = std::jthread([this, job = std::move(job), generation, first, total](std::stop_token stop) {
    // Called on the core's workers: post to the GUI thread, where the generation is checked.
    auto reportFrom = [this, generation, total](qint64 offset) {
      return [this, generation, total, offset](std::size_t done, std::size_t) {
        const qint64 shown = offset + static_cast<qint64>(done);
        QMetaObject::invokeMethod(
            this,
            [this, generation, shown, total] {
              if (generation == generation_) emit progress(shown, total);
            },
            Qt::QueuedConnection);
      };
    };
    auto outcome = std::make_shared<StudyOutcome>();
    try {
      outcome->study =
          std::make_shared<const study::TradeStudy>(study::runTradeStudy(job.spec, stop, reportFrom(0)));
    } catch (const Error& e) {
      outcome->error = e.what();
      outcome->failure = coreFailure(e);
    } catch (const std::exception& e) {
      outcome->error = e.what();
    }
    if (outcome->study && !outcome->study->stopped && job.overlay && !stop.stop_requested()) {
      try {
        outcome->overlay = std::make_shared<const study::TradeStudy>(
            study::runTradeStudy(*job.overlay, stop, reportFrom(first)));
      } catch (const Error& e) {
        outcome->error = e.what();
        outcome->failure = coreFailure(e);
        outcome->overlayFailed = true;
      } catch (const std::exception& e) {
        outcome->error = e.what();
        outcome->overlayFailed = true;
      }
    }
    QMetaObject::invokeMethod(
        this,
        [this, generation, outcome] {
          if (generation != generation_) return;  // a newer job replaced this one
          running_ = false;
          emit finished(*outcome);
        },
        Qt::QueuedConnection);
  });
}

}  // namespace cw::gui
