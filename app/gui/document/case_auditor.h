#pragma once
// The loss audit of the document's shown evaluation: cw::analysis::auditCase (about 0.25 ms on
// the demo case, six times an evaluateCase) on the GUI thread while it is quick, on a worker
// thread once an audit has taken longer than a frame. Each request has a generation; a result
// is applied only when it is still that of the newest request, so a slow audit of an older edit
// never overwrites a newer one. At most one audit runs; requests made meanwhile collapse into
// the newest, started when the running one ends.

#include "analysis/loss_audit.h"
#include "engine/case_inputs.h"
#include "engine/cycle_result.h"

#include <QFutureWatcher>
#include <QObject>

#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace cw::gui {

class CaseAuditor : public QObject {
  Q_OBJECT

 public:
  /// Where an audit runs: adaptively (the GUI thread until one takes longer than a frame),
  /// always on a worker thread, or always on the GUI thread.
  enum class Threading { Adaptive, Worker, GuiThread };
  /// An audit longer than this moves the next ones off the GUI thread [ms].
  static constexpr double kFrameMilliseconds = 16.0;

  explicit CaseAuditor(QObject* parent = nullptr);
  /// Waits for a running audit (its result is dropped).
  ~CaseAuditor() override;

  /// Audits the inputs of an evaluation (null: no audit) in the given waterfall order. Nothing
  /// happens when that evaluation and order are already audited or being audited.
  void request(const engine::Case& inputs, std::shared_ptr<const engine::Evaluation> evaluation,
               const std::vector<std::string>& order);

  /// The newest applied audit (null before the first, or when its evaluation had none).
  std::shared_ptr<const analysis::LossAudit> audit() const { return audit_; }
  /// The evaluation audit() belongs to.
  std::shared_ptr<const engine::Evaluation> auditedEvaluation() const { return audited_; }
  /// The audit of the newest request threw (a variant had no cycle); audit() is the last good one.
  bool failed() const { return failed_; }
  /// The newest request is not applied yet (running on the worker thread).
  bool isPending() const { return appliedGeneration_ != generation_; }

  void setThreading(Threading threading) { threading_ = threading; }
  Threading threading() const { return threading_; }
  /// The threading a new auditor starts with: Adaptive in the application. The GUI test suites
  /// choose GuiThread, so that an edit's audit is applied before the edit returns whatever the
  /// machine's speed (a sanitizer build on a busy machine takes longer than a frame); the suites
  /// that test the threading set it on their auditor.
  static void setDefaultThreading(Threading threading) { defaultThreading_ = threading; }
  static Threading defaultThreading() { return defaultThreading_; }
  /// True when the next audit runs on a worker thread.
  bool runsOnWorker() const;
  /// How long the last finished audit took [ms] (0 before the first).
  double lastMilliseconds() const { return lastMilliseconds_; }

 signals:
  /// A result was applied (audit(), failed() or auditedEvaluation() changed).
  void auditChanged();

 private:
  struct Request {
    quint64 generation = 0;
    engine::Case inputs;
    std::shared_ptr<const engine::Evaluation> evaluation;
    std::vector<std::string> order;
  };
  struct Outcome {
    std::shared_ptr<const analysis::LossAudit> audit;  ///< null when it threw
    double milliseconds = 0.0;
  };
  static Outcome run(const engine::Case& inputs, const std::vector<std::string>& order);
  void start(Request request);
  void apply(const Request& request, const Outcome& outcome);
  void workerFinished();

  static inline Threading defaultThreading_ = Threading::Adaptive;
  Threading threading_ = defaultThreading_;
  double lastMilliseconds_ = 0.0;
  quint64 generation_ = 0;
  quint64 appliedGeneration_ = 0;
  std::shared_ptr<const engine::Evaluation> requested_;
  std::vector<std::string> requestedOrder_;
  std::shared_ptr<const engine::Evaluation> audited_;
  std::shared_ptr<const analysis::LossAudit> audit_;
  bool failed_ = false;
  QFutureWatcher<Outcome>* watcher_ = nullptr;
  std::optional<Request> running_;
  std::optional<Request> queued_;
};

}  // namespace cw::gui
