#include "document/case_document.h"

#include "document/case_auditor.h"

#include "analysis/loss_catalogue.h"

#include "common/error.h"
#include "engine/case_validation_error.h"
#include "evaluation/evaluate.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QTimer>
#include <QUndoStack>

#include <QScopeGuard>

#include <algorithm>

#include <cmath>

namespace cw::gui {

namespace {

bool finite(const engine::CycleResult& r) {
  const auto& p = r.performance;
  for (double x : {p.netThrust, p.specificThrust, p.thrustSpecificFuelConsumption, p.fuelFlow, p.fuelAirRatio,
                   p.thermalEfficiency, p.propulsiveEfficiency, p.overallEfficiency})
    if (!std::isfinite(x)) return false;
  for (const auto& s : r.stations)
    for (double x : {s.totalTemperature, s.totalPressure, s.staticTemperature, s.staticPressure, s.mach,
                     s.velocity, s.massFlow, s.entropy})
      if (!std::isfinite(x)) return false;
  for (const auto& path : r.paths)
    for (const auto& st : path.states)
      for (double x : {st.temperature, st.entropy, st.pressure, st.specificVolume})
        if (!std::isfinite(x)) return false;
  return true;
}

}  // namespace

CaseDocument::CaseDocument(QObject* parent) : QObject(parent), undoStack_(new QUndoStack(this)) {
  settle_ = new QTimer(this);
  auditor_ = new CaseAuditor(this);
  connect(auditor_, &CaseAuditor::auditChanged, this, &CaseDocument::auditChanged);
  baselineAuditor_ = new CaseAuditor(this);
  connect(baselineAuditor_, &CaseAuditor::auditChanged, this, &CaseDocument::baselineAuditChanged);
  connect(undoStack_, &QUndoStack::cleanChanged, this, [this] { emit modifiedChanged(isModified()); });
  settle_->setSingleShot(true);
  settle_->setInterval(kSettleMilliseconds);
  connect(settle_, &QTimer::timeout, this, &CaseDocument::commit);
  evaluate();
  commit();
}

bool CaseDocument::isStale() const {
  return !live_ || !problems_.empty() || hasFailure() || !entryProblems_.isEmpty();
}

QString CaseDocument::failure(const DisplayUnits& units) const {
  return coreFailure_ ? failureText(*coreFailure_, units) : failure_;
}

std::shared_ptr<const engine::Evaluation> CaseDocument::evaluation() const {
  return isStale() ? committed_ : live_;
}

std::shared_ptr<const analysis::LossAudit> CaseDocument::audit() const {
  return auditor_->audit();
}

bool CaseDocument::isAuditStale() const {
  return isStale() || auditor_->failed() || auditor_->isPending() ||
         auditor_->auditedEvaluation() != evaluation();
}

bool CaseDocument::setAuditOrder(const QStringList& keys) {
  QStringList known;
  for (const QString& key : keys) {
    const bool valid = analysis::isLossKey(key.toStdString());
    if (valid && !known.contains(key)) known << key;
  }
  if (known == auditOrder_) return false;
  auditOrder_ = known;
  resultUpdated();
  return true;
}

std::vector<std::string> CaseDocument::auditOrderKeys() const {
  std::vector<std::string> order;
  for (const QString& key : auditOrder_) order.push_back(key.toStdString());
  return order;
}

void CaseDocument::resultUpdated() {
  auditor_->request(evaluatedCase(), evaluation(), auditOrderKeys());
  requestBaselineAudit();
  emit resultChanged();
}

std::shared_ptr<const analysis::LossAudit> CaseDocument::baselineAudit() const {
  if (!baseline_ || baselineAuditor_->auditedEvaluation() != baseline_ || baselineAuditor_->failed())
    return nullptr;
  return baselineAuditor_->audit();
}

void CaseDocument::requestBaselineAudit() {
  // The same order as the current audit, so that the two waterfalls compare step by step
  // (a loss that does not apply to one of the cases is left out of its waterfall).
  baselineAuditor_->request(baselineCase_, baseline_, auditOrderKeys());
}

bool CaseDocument::pinBaseline() {
  const auto shown = evaluation();
  if (!shown) return false;
  const engine::Case& inputs = evaluatedCase();
  QString title = QString::fromStdString(inputs.title);
  if (title.isEmpty()) title = filePath_.isEmpty() ? tr("Untitled case") : QFileInfo(filePath_).fileName();
  baseline_ = shown;
  baselineCase_ = inputs;
  baselineTitle_ = title;
  requestBaselineAudit();
  emit baselineChanged();
  return true;
}

bool CaseDocument::setBaseline(const engine::Case& inputs, const QString& title, QString* error,
                               const DisplayUnits* units) {
  QString why;
  try {
    auto result = std::make_shared<engine::Evaluation>(engine::evaluateCase(inputs));
    if (finite(result->actual) && finite(result->ideal)) {
      baseline_ = std::move(result);
      baselineCase_ = inputs;
      baselineTitle_ = title;
      requestBaselineAudit();
      emit baselineChanged();
      return true;
    }
    why = tr("The evaluation gave a value that is not a finite number; the inputs are probably extreme.");
  } catch (const engine::CaseValidationError& e) {
    QStringList lines;
    for (const auto& p : e.problems()) lines << QString::fromStdString(p.message);
    why = lines.join(QLatin1Char('\n'));
  } catch (const Error& e) {
    const DisplayUnits si;
    why = failureText(gui::coreFailure(e), units ? *units : si);
  } catch (const std::exception& e) {
    why = tr("Evaluation failed: %1").arg(QString::fromStdString(e.what()));
  }
  if (error) *error = why;
  return false;
}

void CaseDocument::clearBaseline() {
  if (!baseline_) return;
  baseline_.reset();
  baselineCase_ = engine::Case{};
  baselineTitle_.clear();
  requestBaselineAudit();
  emit baselineChanged();
}

bool CaseDocument::hasPendingCommit() const {
  return settle_->isActive();
}

void CaseDocument::commit() {
  settle_->stop();
  if (isStale() || committed_ == live_) return;
  committed_ = live_;
  committedCase_ = case_;
  emit committed();
}

const engine::CaseProblem* CaseDocument::problemAt(const std::string& path) const {
  for (const auto& p : problems_)
    if (p.path == path) return &p;
  return nullptr;
}

void CaseDocument::applyEdit(int fieldId, const QString& description, const engine::Case& edited,
                             Commit commit) {
  if (edited == case_) {
    // Back to the inputs already held (e.g. "0.9" after "0.9x"): commit as that edit would.
    if (commit == Commit::Later && !isStale() && live_ != committed_)
      settle_->start();
    else if (commit == Commit::Now)
      this->commit();
    return;
  }
  // setCase, reached directly or through the command's redo, reads how to commit.
  typing_ = commit == Commit::Later;
  const auto done = qScopeGuard([this] { typing_ = false; });
  if (undoDisabled_ > 0) {
    const bool wasModified = isModified();
    modifiedWithoutUndo_ = true;
    setCase(edited);
    if (!wasModified) emit modifiedChanged(true);
    return;
  }
  undoStack_->push(new SetCaseCommand(*this, fieldId, description, case_, edited));
}

void CaseDocument::setCase(const engine::Case& inputs) {
  case_ = inputs;
  emit caseChanged();
  evaluate();
  if (typing_)
    settle_->start();  // committed by Enter, focus out or when it stands for the settle time
  else
    commit();
}

void CaseDocument::load(const engine::Case& inputs, const QString& filePath, bool modified) {
  ScopedUndoDisabler guard(*this);
  undoStack_->clear();
  entryProblems_.clear();
  filePath_ = filePath;
  modifiedWithoutUndo_ = modified;
  undoStack_->setClean();
  // Another case: its own result or none, never the previous case's.
  settle_->stop();
  committed_.reset();
  setCase(inputs);
  emit modifiedChanged(isModified());
}

void CaseDocument::setEntryProblem(int fieldId, const QString& message) {
  if (entryProblems_.value(fieldId) == message && entryProblems_.contains(fieldId)) return;
  settle_->stop();  // nothing valid to commit while a field holds no number
  entryProblems_.insert(fieldId, message);
  resultUpdated();
}

void CaseDocument::clearEntryProblem(int fieldId) {
  if (entryProblems_.remove(fieldId) > 0) resultUpdated();
}

bool CaseDocument::isModified() const {
  return modifiedWithoutUndo_ || !undoStack_->isClean();
}

void CaseDocument::markSaved(const QString& path) {
  filePath_ = path;
  modifiedWithoutUndo_ = false;
  undoStack_->setClean();
  emit modifiedChanged(false);
}

void CaseDocument::evaluate() {
  problems_.clear();
  failure_.clear();
  coreFailure_.reset();
  live_.reset();
  try {
    auto result = std::make_shared<engine::Evaluation>(engine::evaluateCase(case_));
    if (finite(result->actual) && finite(result->ideal))
      live_ = std::move(result);
    else
      failure_ =
          tr("The evaluation gave a value that is not a finite number; the inputs are probably extreme.");
  } catch (const engine::CaseValidationError& e) {
    problems_ = e.problems();
  } catch (const Error& e) {
    coreFailure_ = gui::coreFailure(e);
  } catch (const std::exception& e) {
    failure_ = tr("Evaluation failed: %1").arg(QString::fromStdString(e.what()));
  }
  resultUpdated();
}

SetCaseCommand::SetCaseCommand(CaseDocument& document, int fieldId, const QString& text, engine::Case before,
                               engine::Case after)
    : QUndoCommand(text),
      document_(document),
      fieldId_(fieldId),
      before_(std::move(before)),
      after_(std::move(after)) {}

void SetCaseCommand::redo() {
  document_.setCase(after_);
}
void SetCaseCommand::undo() {
  document_.setCase(before_);
}

bool SetCaseCommand::mergeWith(const QUndoCommand* other) {
  if (other->id() != id() || id() < 0) return false;
  after_ = static_cast<const SetCaseCommand*>(other)->after_;
  setObsolete(after_ == before_);
  return true;
}

}  // namespace cw::gui
