#include "document/case_auditor.h"

#include <QElapsedTimer>
#include <QtConcurrent/QtConcurrentRun>

#include <exception>

namespace cw::gui {

CaseAuditor::CaseAuditor(QObject* parent) : QObject(parent), watcher_(new QFutureWatcher<Outcome>(this)) {
  connect(watcher_, &QFutureWatcher<Outcome>::finished, this, &CaseAuditor::workerFinished);
}

CaseAuditor::~CaseAuditor() {
  watcher_->disconnect(this);
  watcher_->waitForFinished();
}

bool CaseAuditor::runsOnWorker() const {
  switch (threading_) {
    case Threading::Worker:
      return true;
    case Threading::GuiThread:
      return false;
    case Threading::Adaptive:
      break;
  }
  return lastMilliseconds_ > kFrameMilliseconds;
}

void CaseAuditor::request(const engine::Case& inputs, std::shared_ptr<const engine::Evaluation> evaluation,
                          const std::vector<std::string>& order) {
  if (evaluation == requested_ && order == requestedOrder_ && generation_ > 0) return;
  requested_ = evaluation;
  requestedOrder_ = order;
  Request next{++generation_, inputs, std::move(evaluation), order};
  if (!next.evaluation) {
    queued_.reset();
    apply(next, Outcome{});
    return;
  }
  if (running_) {
    queued_ = std::move(next);  // replaces an older queued request: only the newest matters
    return;
  }
  start(std::move(next));
}

CaseAuditor::Outcome CaseAuditor::run(const engine::Case& inputs, const std::vector<std::string>& order) {
  QElapsedTimer clock;
  clock.start();
  Outcome out;
  try {
    out.audit = std::make_shared<const analysis::LossAudit>(analysis::auditCase(inputs, order));
  } catch (const std::exception&) {
    out.audit.reset();  // a variant had no cycle
  }
  out.milliseconds = static_cast<double>(clock.nsecsElapsed()) * 1e-6;
  return out;
}

void CaseAuditor::start(Request request) {
  if (!runsOnWorker()) {
    const Outcome outcome = run(request.inputs, request.order);
    lastMilliseconds_ = outcome.milliseconds;
    apply(request, outcome);
    return;
  }
  running_ = std::move(request);
  // The worker gets copies: the core is re-entrant and the request outlives nothing it uses.
  watcher_->setFuture(QtConcurrent::run(&CaseAuditor::run, running_->inputs, running_->order));
}

void CaseAuditor::workerFinished() {
  const Outcome outcome = watcher_->result();
  lastMilliseconds_ = outcome.milliseconds;
  const Request finished = std::move(*running_);
  running_.reset();
  if (finished.generation == generation_) apply(finished, outcome);  // else an older edit: dropped
  if (queued_) {
    Request next = std::move(*queued_);
    queued_.reset();
    start(std::move(next));
  }
}

void CaseAuditor::apply(const Request& request, const Outcome& outcome) {
  appliedGeneration_ = request.generation;
  if (!request.evaluation) {
    audit_.reset();
    audited_.reset();
    failed_ = false;
  } else if (outcome.audit) {
    audit_ = outcome.audit;
    audited_ = request.evaluation;
    failed_ = false;
  } else {
    failed_ = true;  // keep the last good audit, shown stale
  }
  emit auditChanged();
}

}  // namespace cw::gui
