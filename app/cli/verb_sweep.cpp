// cyclewright-cli sweep CASE.json --vary PATH=START:STOP:COUNT [--vary ...] [--set ...]
//                                 [--output-columns a,b,c] [--audit] [--threads N] [--progress]
//                                 [--format csv|json]
//
// A trade study (core/study/trade_study.h): one varied input is a sweep, two a carpet. Points
// without a cycle are kept with their status and reason. Ctrl+C stops the study: the points
// already run are printed, the rest are marked not-run, and the exit status is 130.
#include "common/error.h"
#include "io/case_file.h"
#include "io/study_export.h"
#include "output.h"
#include "study/study_columns.h"
#include "study/trade_study.h"
#include "verbs.h"

#include <pthread.h>
#include <signal.h>
#include <atomic>
#include <chrono>
#include <csignal>
#include <iostream>
#include <mutex>
#include <ostream>
#include <thread>

namespace cw::cli {

namespace {

constexpr int kExitStopped = 130;  // 128 + SIGINT, the shell's convention

// Set by the handler, read by the watcher thread: a lock-free atomic is safe in both roles
// (a volatile sig_atomic_t would only be safe within the interrupted thread).
std::atomic<bool> interrupted{false};
static_assert(std::atomic<bool>::is_always_lock_free);

extern "C" void onInterrupt(int) {
  interrupted.store(true, std::memory_order_relaxed);
}

/// Turns Ctrl+C into a stop request while it lives (a signal handler may only set a flag).
class InterruptToStop {
 public:
  InterruptToStop() : previous_(std::signal(SIGINT, onInterrupt)) {
    interrupted.store(false);
    // A parent may start us with SIGINT blocked (the mask is inherited); we handle it, so take it.
    sigset_t interrupt;
    sigemptyset(&interrupt);
    sigaddset(&interrupt, SIGINT);
    pthread_sigmask(SIG_UNBLOCK, &interrupt, nullptr);
    watcher_ = std::jthread([this](std::stop_token done) {
      while (!done.stop_requested()) {
        if (interrupted.load(std::memory_order_relaxed)) source_.request_stop();
        std::this_thread::sleep_for(std::chrono::milliseconds(50));
      }
    });
  }
  ~InterruptToStop() {
    watcher_.request_stop();
    watcher_.join();
    std::signal(SIGINT, previous_);
  }
  std::stop_token token() const { return source_.get_token(); }

 private:
  void (*previous_)(int);
  std::stop_source source_;
  std::jthread watcher_;
};

int runSweep(const Arguments& args, std::ostream& out) {
  if (args.positional().size() != 1) throw InvalidInput("CASE", "give exactly one case file");
  const Format format = parseFormat(args.text("format").value_or("csv"));
  if (format == Format::Text) throw InvalidInput("--format", "sweep writes csv or json, not text");
  study::TradeStudySpec spec;
  for (const auto& text : args.all("vary")) spec.axes.push_back(study::parseSweepAxis(text));
  if (spec.axes.empty())
    throw InvalidInput("--vary", "give --vary PATH=START:STOP:COUNT once (a sweep) or twice (a carpet)");
  spec.withAudit = args.has("audit");
  if (args.has("threads")) {
    const double threads = args.number("threads");
    if (threads != static_cast<int>(threads) || threads < 0 || threads > 256)
      throw InvalidInput("--threads", threads, "",
                         "0 (one per hardware thread) or a whole number in [1, 256]");
    spec.threads = static_cast<unsigned>(threads);
  }
  const auto columns = args.has("output-columns")
                           ? study::selectStudyColumns(*args.text("output-columns"), spec.withAudit)
                           : study::defaultStudyColumns(spec.withAudit);
  spec.document = io::readCaseDocument(args.positional().front());
  for (const auto& assignment : args.all("set")) io::applySetOverride(spec.document, assignment);

  // --progress: a line on stderr about every 1 % (the callback runs on worker threads).
  std::mutex progressMutex;
  study::StudyProgress progress;
  if (args.has("progress"))
    progress = [&](std::size_t done, std::size_t total) {
      const std::lock_guard lock(progressMutex);
      std::cerr << "cyclewright-cli sweep: " << done << " of " << total << " points\n" << std::flush;
    };

  study::TradeStudy result;
  {
    InterruptToStop interrupt;
    result = study::runTradeStudy(spec, interrupt.token(), progress);
  }
  if (format == Format::Json)
    out << io::studyToJson(result, columns).dump(2) << '\n';
  else
    out << io::studyToCsv(result, columns);
  out.flush();
  if (result.stopped) return kExitStopped;
  if (result.count(study::PointStatus::Solved) == 0)
    throw NoSolution("sweep", "no point of the study has a cycle (each point's reason is in the output)");
  return kExitOk;
}

}  // namespace

Verb sweepVerb() {
  return {
      "sweep",
      "trade study: vary one input (a sweep) or two (a carpet); every point with its ideal twin",
      "CASE.json --vary PATH=START:STOP:COUNT [--vary PATH=START:STOP:COUNT] [--set path.to.key=VALUE ...] "
      "[--output-columns a,b,c] [--audit] [--threads N] [--progress] [--format csv|json]",
      {{"vary", true,
        "a numeric input and its range, e.g. --vary compressor.pressure_ratio=4:40:37 (COUNT values from "
        "START to "
        "STOP, both included); once for a sweep, twice for a carpet"},
       {"set", true,
        "override one input of the case before the study, e.g. --set flight.mach=0.8 (repeatable)"},
       {"output-columns", true,
        "comma-separated output columns, in order (the varied inputs and the status always come first); "
        "see docs/cli.md for the list"},
       {"audit", false, "add each point's one-at-a-time loss audit (audit.<loss>.* columns)"},
       {"progress", false, "report progress on stderr (a line about every 1 % of the points)"},
       {"threads", true, "worker threads, 0 (default) for one per hardware thread"},
       {"format", true, "csv (default: one row per point) or json (the grid and every point's status)"}},
      &runSweep};
}

}  // namespace cw::cli
