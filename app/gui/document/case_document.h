#pragma once
// The open case: its inputs, the last valid evaluation, the problems of the current inputs,
// the undo stack and the file it came from. One evaluateCase per change of the inputs.
//
// Undo follows small swap commands: an edit pushes a SetCaseCommand holding the case before
// and after; consecutive edits of one field merge (the command id is the field id). A
// ScopedUndoDisabler turns recording off, e.g. while a file loads.

#include "engine/case_inputs.h"
#include "engine/case_problem.h"
#include "engine/cycle_result.h"

#include <QHash>
#include <QObject>
#include <QString>
#include <QUndoCommand>

#include <memory>
#include <vector>

class QUndoStack;

namespace cw::gui {

class CaseDocument : public QObject {
  Q_OBJECT

 public:
  explicit CaseDocument(QObject* parent = nullptr);

  const engine::Case& currentCase() const { return case_; }
  /// The last valid evaluation (null before the first valid case). It stays displayed, marked
  /// stale, while the current inputs are invalid or have no solution.
  std::shared_ptr<const engine::Evaluation> evaluation() const { return evaluation_; }
  /// True when the displayed evaluation is not that of the current inputs.
  bool isStale() const;
  /// The core's problems with the current inputs (each names its case-file path).
  const std::vector<engine::CaseProblem>& problems() const { return problems_; }
  /// The problem for a case-file path, or nullptr.
  const engine::CaseProblem* problemAt(const std::string& path) const;
  /// Why the current inputs have no result, beyond per-field problems (translated); empty if none.
  QString failure() const { return failure_; }
  /// Fields whose text is not a number (field id -> translated message); they make the result stale.
  const QHash<int, QString>& entryProblems() const { return entryProblems_; }

  QUndoStack* undoStack() const { return undoStack_; }
  bool undoEnabled() const { return undoDisabled_ == 0; }

  /// A user's edit of one field: pushes an undoable command (merging with the previous one of
  /// the same field id >= 0) or, while undo is disabled, applies the case directly.
  void applyEdit(int fieldId, const QString& description, const engine::Case& edited);
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

 private:
  friend class ScopedUndoDisabler;
  void evaluate();

  engine::Case case_;
  std::shared_ptr<const engine::Evaluation> evaluation_;
  std::vector<engine::CaseProblem> problems_;
  QString failure_;
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
