#pragma once
// Runs trade studies (core/study/trade_study.h) off the GUI thread: one std::jthread per job,
// whose stop source is the Cancel button. A job is the study and, optionally, a second study of
// the same grid with one input set differently (the chart's overlay), run one after the other.
//
// The core calls the progress callback on its worker threads; the runner posts each report to the
// GUI thread (a queued call), where it emits progress(). finished() comes the same way, once per
// job. Starting a job stops and joins the one running, whose results are then dropped; the
// destructor stops and joins too, so that closing the window never leaves a thread behind.

#include "document/core_failure.h"

#include "study/trade_study.h"

#include <QObject>
#include <QString>

#include <cstdint>
#include <memory>
#include <optional>
#include <thread>

namespace cw::gui {

struct StudyJob {
  study::TradeStudySpec spec;
  /// The same grid on a document with one input set differently; run after `spec` unless it stopped.
  std::optional<study::TradeStudySpec> overlay;
};

struct StudyOutcome {
  std::shared_ptr<const study::TradeStudy> study;    ///< null when the spec was refused
  std::shared_ptr<const study::TradeStudy> overlay;  ///< null when not asked for, refused or not run
  std::string error;                                 ///< the core's reason a spec was refused; empty if none
  std::optional<CoreFailure> failure;                ///< its parts, when a cw::Error said it
  bool overlayFailed = false;                        ///< the error is the overlay's
};

class StudyRunner : public QObject {
  Q_OBJECT

 public:
  explicit StudyRunner(QObject* parent = nullptr);
  ~StudyRunner() override;

  /// Stops and joins a running job, then starts this one.
  void start(StudyJob job);
  /// Asks the running job to stop; its points so far come with finished().
  void cancel();
  bool isRunning() const { return running_; }

 signals:
  /// Points done of the job's total (both studies of a job with an overlay).
  void progress(qint64 done, qint64 total);
  void finished(const cw::gui::StudyOutcome& outcome);

 private:
  void stopAndJoin();

  std::jthread worker_;
  std::uint64_t generation_ = 0;  ///< of the job whose reports count (GUI thread only)
  bool running_ = false;
};

}  // namespace cw::gui
