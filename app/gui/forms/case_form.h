#pragma once
// The form of one section of the case (a component, the flight condition, ...), built from
// the field table. Its slots come in two groups: "changed by the user" (push an edit to the
// document) and "changed in the model" (refresh the widgets under a signal blocker), so that
// neither side echoes the other.

#include "document/case_fields.h"

#include <QHash>
#include <QWidget>

class QFormLayout;
class QLabel;
class QLineEdit;

namespace cw::gui {

class CaseDocument;
class DisplayUnits;

class CaseForm : public QWidget {
  Q_OBJECT

 public:
  CaseForm(Section section, CaseDocument& document, DisplayUnits& units, QWidget* parent = nullptr);

  Section section() const { return section_; }
  /// Labels, tooltips and units in the current language and unit system.
  void retranslateUi();

  /// Changed in the model: values, visibility and problem marks from the document. On a typed
  /// edit only the visible form (the stack's current one) rewrites its widgets; a hidden form
  /// remembers that it is behind and refreshes when it is shown. Other changes refresh all.
  void refresh();
  /// True when the widgets wait for a refresh (the form was hidden when the model changed).
  bool isBehind() const { return behind_; }

 protected:
  void showEvent(QShowEvent* event) override;

 private:
  struct Row {
    const FieldSpec* spec = nullptr;
    QLabel* label = nullptr;
    QWidget* editor = nullptr;
    QLabel* error = nullptr;  ///< number fields only
  };

  // Changed by the user.
  void numberEdited(const FieldSpec& spec, const QString& text);
  void choiceActivated(const FieldSpec& spec, int index);
  void flagToggled(const FieldSpec& spec, bool on);
  void textEdited(const FieldSpec& spec, const QString& text);

  void showProblem(const Row& row, const QString& message);

  Section section_;
  CaseDocument& document_;
  DisplayUnits& units_;
  QFormLayout* layout_ = nullptr;
  QLabel* title_ = nullptr;
  std::vector<Row> rows_;
  bool behind_ = false;
};

/// Marks an editor as holding an invalid value (a red-tinted base, "invalid" property true).
void markInvalid(QWidget* editor, bool invalid);

}  // namespace cw::gui
