// cyclewright-cli sweep CASE.json --vary PATH=START:STOP:COUNT [--vary ...] [--set ...]
//                                 [--output-columns a,b,c] [--audit] [--threads N] [--progress]
//                                 [--format csv|json]
//
// A trade study (core/study/trade_study.h): one varied input is a sweep, two a carpet. Points
// without a cycle are kept with their status and reason. Ctrl+C stops the study: the points
// already run are printed, the rest are marked not-run, and the exit status is 130.
#include "common/error.h"
#include "io/case_file.h"
#include "io/case_keys.h"
#include "output.h"
#include "study/study_columns.h"
#include "study/study_export.h"
#include "study/trade_study.h"
#include "verbs.h"

#include <pthread.h>
#include <semaphore.h>
#include <signal.h>
#include <atomic>
#include <csignal>
#include <iostream>
#include <mutex>
#include <ostream>
#include <thread>

namespace cw::cli {

namespace {

constexpr int kExitStopped = 130;  // 128 + SIGINT, the shell's convention

// Set by the handler, read by the watcher thread: a lock-free atomic is safe in both roles
// (a volatile sig_atomic_t would only be safe within the interrupted thread). The handler wakes the
// watcher with sem_post, which POSIX lists as async-signal-safe.
std::atomic<bool> interrupted{false};
static_assert(std::atomic<bool>::is_always_lock_free);
sem_t wakeWatcher;

extern "C" void onInterrupt(int) {
  interrupted.store(true, std::memory_order_relaxed);
  sem_post(&wakeWatcher);
}

/// Turns Ctrl+C into a stop request while it lives (a signal handler may only set a flag and
/// post a semaphore; a watcher thread turns that into the stop request). Keep it alive until the
/// output is written: a Ctrl+C during the output then leaves the output whole, and the run ends
/// with status 130 after it.
class InterruptToStop {
 public:
  InterruptToStop() {
    interrupted.store(false);
    sem_init(&wakeWatcher, 0, 0);
    watcher_ = std::jthread([this] {
      while (!finished_.load()) {
        if (sem_wait(&wakeWatcher) != 0) continue;  // EINTR: wait again
        if (interrupted.load(std::memory_order_relaxed)) source_.request_stop();
      }
    });
    previous_ = std::signal(SIGINT, onInterrupt);
    // A parent may start us with SIGINT blocked (the mask is inherited); we handle it, so take it.
    sigset_t interrupt;
    sigemptyset(&interrupt);
    sigaddset(&interrupt, SIGINT);
    pthread_sigmask(SIG_UNBLOCK, &interrupt, nullptr);
  }
  ~InterruptToStop() {
    std::signal(SIGINT, previous_);
    finished_.store(true);
    sem_post(&wakeWatcher);  // wakes the watcher at once: no polling delay at the end of a study
    watcher_.join();
    sem_destroy(&wakeWatcher);
  }
  InterruptToStop(const InterruptToStop&) = delete;
  InterruptToStop& operator=(const InterruptToStop&) = delete;

  std::stop_token token() const { return source_.get_token(); }
  bool wasInterrupted() const { return interrupted.load(std::memory_order_relaxed); }

 private:
  void (*previous_)(int) = SIG_DFL;
  std::atomic<bool> finished_{false};
  std::stop_source source_;
  std::jthread watcher_;
};

int runSweep(const Arguments& args, Format format, std::ostream& out) {
  if (args.positional().size() != 1) throw InvalidInput("CASE", "give exactly one case file");
  study::TradeStudySpec spec;
  for (const auto& text : args.all("vary")) spec.axes.push_back(study::parseSweepAxis(text));
  if (spec.axes.empty())
    throw InvalidInput("--vary", "give --vary PATH=START:STOP:COUNT once (a sweep) or twice (a carpet)");
  spec.withAudit = args.has("audit");
  spec.threads = static_cast<unsigned>(args.wholeNumber("threads", 0, 256, 0));
  spec.source = args.positional().front();
  spec.document = io::readCaseDocument(spec.source);
  for (const auto& assignment : args.all("set")) io::applySetOverride(spec.document, assignment);
  // The audit's columns are the losses of the case's architecture (a two-spool case adds the LP ones).
  const engine::Architecture architecture = io::caseDocumentArchitecture(spec.document);
  const auto columns = args.has("output-columns")
                           ? study::selectStudyColumns(*args.text("output-columns"), spec.withAudit,
                                                       "--output-columns", architecture)
                           : study::defaultStudyColumns(spec.withAudit, architecture);

  // --progress: a line on stderr about every 1 % (the callback runs on worker threads).
  std::mutex progressMutex;
  study::StudyProgress progress;
  if (args.has("progress"))
    progress = [&](std::size_t done, std::size_t total) {
      const std::lock_guard lock(progressMutex);
      std::cerr << "cyclewright-cli sweep: " << done << " of " << total << " points\n" << std::flush;
    };

  study::TradeStudy result;
  bool interrupted = false;
  {
    const InterruptToStop interrupt;
    result = study::runTradeStudy(spec, interrupt.token(), progress);
    if (format == Format::Json)
      out << study::studyToJson(result, columns).dump(2) << '\n';
    else
      out << study::studyToCsv(result, columns);
    out.flush();
    interrupted = interrupt.wasInterrupted();
  }
  if (result.stopped || interrupted) return kExitStopped;
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
      "[--output-columns a,b,c] [--audit] [--threads N] [--progress]",
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
       {"threads", true, "worker threads, 0 (default) for one per hardware thread"}},
      {Format::Csv, Format::Json},
      "csv (default: one row per point) or json (the grid and every point's status)",
      &runSweep};
}

}  // namespace cw::cli
