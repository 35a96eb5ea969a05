#pragma once
// The open case: its inputs, the last valid evaluation and its loss audit (the one evaluation
// pipeline per edit), the problems of the current inputs, the undo stack, the file it came from
// and the baseline it is compared with. One evaluateCase per change of the inputs.
//
// Live and committed results: every edit is evaluated at once and shown while valid (the live
// result), but only a committed result becomes "the last valid result" that stays on screen,
// marked stale, when later inputs are invalid. A result is committed when its edit is: Enter or
// focus out in a number field (commit()), the edit standing unchanged for kSettleMilliseconds,
// or any edit that is not typing (a choice, a flag, undo, redo, a file loaded). So the "1" on the
// way to "1.2" never becomes the stale result. A case loaded without a cycle has no committed
// result: charts and tables stay empty and the banner says why.
//
// Undo follows small swap commands: an edit pushes a SetCaseCommand holding the case before
// and after; consecutive edits of one field merge (the command id is the field id). A
// ScopedUndoDisabler turns recording off, e.g. while a file loads.

#include "document/core_failure.h"
#include "document/units.h"

#include "analysis/loss_audit.h"
#include "engine/case_inputs.h"
#include "engine/case_problem.h"
#include "engine/cycle_result.h"

#include <QHash>
#include <QObject>
#include <QString>
#include <QStringList>
#include <QUndoCommand>

#include <memory>
#include <optional>
#include <vector>

class QTimer;
class QUndoStack;

namespace cw::gui {

class CaseAuditor;

class CaseDocument : public QObject {
  Q_OBJECT

 public:
  explicit CaseDocument(QObject* parent = nullptr);

  const engine::Case& currentCase() const { return case_; }
  /// How long a typed value must stand unchanged before its result is committed [ms].
  static constexpr int kSettleMilliseconds = 400;

  /// The evaluation on screen: that of the current inputs while they are valid, else the last
  /// committed one (null when there is none, e.g. a case loaded without a cycle), marked stale.
  std::shared_ptr<const engine::Evaluation> evaluation() const;
  /// The last committed evaluation (what stays on screen while the inputs are invalid).
  std::shared_ptr<const engine::Evaluation> committedEvaluation() const { return committed_; }
  /// The inputs of evaluation() (the current case while it is valid, else the committed one's).
  const engine::Case& evaluatedCase() const { return isStale() ? committedCase_ : case_; }
  /// True while a typed edit waits to be committed (Enter, focus out, or the settle time).
  bool hasPendingCommit() const;
  /// True when the displayed evaluation is not that of the current inputs.
  bool isStale() const;
  /// The core's problems with the current inputs (each names its case-file path).
  const std::vector<engine::CaseProblem>& problems() const { return problems_; }
  /// The problem for a case-file path, or nullptr.
  const engine::CaseProblem* problemAt(const std::string& path) const;
  /// True when the current inputs have no result for a reason beyond per-field problems.
  bool hasFailure() const { return coreFailure_.has_value() || !failure_.isEmpty(); }
  /// Why the current inputs have no result, beyond per-field problems: translated, its numbers in
  /// `units` at display precision (failureText); empty if none.
  QString failure(const DisplayUnits& units) const;
  /// The core's failure behind failure(), when the core failed.
  const std::optional<CoreFailure>& coreFailure() const { return coreFailure_; }
  /// Fields whose text is not a number (field id -> translated message); they make the result stale.
  const QHash<int, QString>& entryProblems() const { return entryProblems_; }

  /// The loss audit of evaluation() (the pipeline's last step; CaseAuditor runs it, off the GUI
  /// thread once it takes longer than a frame). Null before the first, or with no evaluation.
  std::shared_ptr<const analysis::LossAudit> audit() const;
  /// True when audit() is not that of the current inputs: the result is stale, the audit of the
  /// shown evaluation failed, or it is still running.
  bool isAuditStale() const;
  CaseAuditor& auditor() const { return *auditor_; }
  /// The loss audit of the baseline in the same waterfall order (the audit panel shows it beside
  /// the current one), by its own CaseAuditor; null without a baseline or before it is done.
  std::shared_ptr<const analysis::LossAudit> baselineAudit() const;
  CaseAuditor& baselineAuditor() const { return *baselineAuditor_; }
  /// The waterfall order asked for (loss keys; empty for the flow order). The audit puts these
  /// first and the remaining losses after them in flow order (analysis::waterfallOrderOf).
  QStringList auditOrder() const { return auditOrder_; }
  /// Sets the order (unknown and repeated keys dropped) and re-audits. False when unchanged.
  bool setAuditOrder(const QStringList& keys);

  /// The baseline a design review compares against: a pinned or opened case, its evaluation
  /// and its title (null and empty when there is none). Kept until replaced or cleared; edits
  /// and loads of the current case leave it alone.
  std::shared_ptr<const engine::Evaluation> baselineEvaluation() const { return baseline_; }
  const engine::Case& baselineCase() const { return baselineCase_; }
  QString baselineTitle() const { return baselineTitle_; }
  bool hasBaseline() const { return baseline_ != nullptr; }
  /// Pins the shown result as the baseline (false when there is none to pin). The title is the
  /// case's title, else its file name.
  bool pinBaseline();
  /// Evaluates a case and makes it the baseline. Returns false and sets *error (translated, with
  /// the reason, its numbers in `units`, SI without) when it has no cycle; the baseline is then
  /// unchanged.
  bool setBaseline(const engine::Case& inputs, const QString& title, QString* error = nullptr,
                   const DisplayUnits* units = nullptr);
  void clearBaseline();

  QUndoStack* undoStack() const { return undoStack_; }
  bool undoEnabled() const { return undoDisabled_ == 0; }

  /// How an edit reaches the document: typed (committed later: commit() or the settle time) or
  /// committed at once (a choice, a flag, a command).
  enum class Commit { Now, Later };
  /// A user's edit of one field: pushes an undoable command (merging with the previous one of
  /// the same field id >= 0) or, while undo is disabled, applies the case directly.
  void applyEdit(int fieldId, const QString& description, const engine::Case& edited,
                 Commit commit = Commit::Now);
  /// Commits the current result when valid (Enter or focus out in a field; the settle timer).
  void commit();
  /// True while a typed edit (Commit::Later) is being applied: the signals it emits concern the
  /// visible form's field, so hidden forms may catch up later (CaseForm::refresh).
  bool isApplyingTypedEdit() const { return typing_; }
  /// Replaces the inputs without touching the undo stack (used by the commands). Evaluates once.
  void setCase(const engine::Case& inputs);
  /// Loads a case (file open, new, recovery): clears the undo stack, evaluates, marks clean.
  void load(const engine::Case& inputs, const QString& filePath, bool modified = false);

  void setEntryProblem(int fieldId, const QString& message);
  void clearEntryProblem(int fieldId);

  QString filePath() const { return filePath_; }
  void setFilePath(const QString& path) { filePath_ = path; }
  bool isModified() const;
  /// After a save: the undo stack's clean state is here.
  void markSaved(const QString& path);

 signals:
  /// The inputs changed (forms refresh).
  void caseChanged();
  /// The evaluation, the problems or the stale state changed (charts and tables refresh).
  void resultChanged();
  void modifiedChanged(bool modified);
  /// A result was committed: it is now the one kept while later inputs are invalid.
  void committed();
  /// audit() or isAuditStale() changed (the audit panel refreshes).
  void auditChanged();
  /// The baseline was pinned, opened or cleared (tables and chart overlays refresh).
  void baselineChanged();
  /// baselineAudit() changed.
  void baselineAuditChanged();

 private:
  friend class ScopedUndoDisabler;
  void evaluate();
  /// Emits resultChanged after asking for the audit of the evaluation now shown.
  void resultUpdated();
  /// Asks for the baseline's audit in the current order (none without a baseline).
  void requestBaselineAudit();
  /// The audit order as the core takes it.
  std::vector<std::string> auditOrderKeys() const;

  engine::Case case_;
  std::shared_ptr<const engine::Evaluation> live_;       ///< of the current inputs; null if none
  std::shared_ptr<const engine::Evaluation> committed_;  ///< the last committed live result
  engine::Case committedCase_;                           ///< its inputs
  QTimer* settle_ = nullptr;
  bool typing_ = false;  ///< the edit being applied is typed (commit later)
  CaseAuditor* auditor_ = nullptr;
  CaseAuditor* baselineAuditor_ = nullptr;
  QStringList auditOrder_;
  std::shared_ptr<const engine::Evaluation> baseline_;
  engine::Case baselineCase_;
  QString baselineTitle_;
  std::vector<engine::CaseProblem> problems_;
  QString failure_;                         ///< a failure that is not the core's (translated)
  std::optional<CoreFailure> coreFailure_;  ///< the core's failure, written when shown
  QHash<int, QString> entryProblems_;
  QUndoStack* undoStack_ = nullptr;
  int undoDisabled_ = 0;
  bool modifiedWithoutUndo_ = false;
  QString filePath_;
};

/// Turns undo recording off for its lifetime.
class ScopedUndoDisabler {
 public:
  explicit ScopedUndoDisabler(CaseDocument& document) : document_(document) { ++document_.undoDisabled_; }
  ~ScopedUndoDisabler() { --document_.undoDisabled_; }
  ScopedUndoDisabler(const ScopedUndoDisabler&) = delete;
  ScopedUndoDisabler& operator=(const ScopedUndoDisabler&) = delete;

 private:
  CaseDocument& document_;
};

/// Swaps the document's case between its state before and after one edit.
class SetCaseCommand : public QUndoCommand {
 public:
  SetCaseCommand(CaseDocument& document, int fieldId, const QString& text, engine::Case before,
                 engine::Case after);
  void redo() override;
  void undo() override;
  int id() const override { return fieldId_; }
  bool mergeWith(const QUndoCommand* other) override;

 private:
  CaseDocument& document_;
  int fieldId_;
  engine::Case before_;
  engine::Case after_;
};

}  // namespace cw::gui
