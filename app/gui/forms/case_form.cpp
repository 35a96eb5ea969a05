#include "forms/case_form.h"

#include "document/case_document.h"
#include "document/units.h"

#include <QApplication>
#include <QCheckBox>
#include <QComboBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QLocale>
#include <QPlainTextEdit>
#include <QSignalBlocker>
#include <QVBoxLayout>

#include <cmath>

namespace cw::gui {

namespace {

QColor errorColour(const QPalette& palette) {
  return palette.color(QPalette::Base).lightness() > 128 ? QColor(0xB0, 0x00, 0x00)
                                                         : QColor(0xFF, 0x80, 0x80);
}

QColor blend(const QColor& a, const QColor& b, double t) {
  return QColor::fromRgbF(a.redF() * (1 - t) + b.redF() * t, a.greenF() * (1 - t) + b.greenF() * t,
                          a.blueF() * (1 - t) + b.blueF() * t);
}

/// The value a field's text stands for, in display units; false when the text is no number.
bool parseNumber(const QString& text, double& value) {
  bool ok = false;
  QLocale locale;
  value = locale.toDouble(text.trimmed(), &ok);
  if (!ok) value = QLocale::c().toDouble(text.trimmed(), &ok);
  return ok && std::isfinite(value);
}

}  // namespace

void markInvalid(QWidget* editor, bool invalid) {
  if (editor->property("invalid").toBool() == invalid) return;
  editor->setProperty("invalid", invalid);
  QPalette palette = QApplication::palette(editor);
  if (invalid) {
    palette.setColor(QPalette::Base, blend(palette.color(QPalette::Base), QColor(0xE0, 0x20, 0x20), 0.35));
  }
  editor->setPalette(palette);
}

CaseForm::CaseForm(Section section, CaseDocument& document, DisplayUnits& units, QWidget* parent)
    : QWidget(parent), section_(section), document_(document), units_(units) {
  setObjectName(sectionKey(section) + QStringLiteral("Form"));
  auto* outer = new QVBoxLayout(this);
  title_ = new QLabel(this);
  QFont titleFont = title_->font();
  titleFont.setBold(true);
  titleFont.setPointSizeF(titleFont.pointSizeF() * 1.15);
  title_->setFont(titleFont);
  outer->addWidget(title_);
  layout_ = new QFormLayout;
  layout_->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
  layout_->setRowWrapPolicy(QFormLayout::WrapLongRows);
  outer->addLayout(layout_);
  outer->addStretch(1);

  for (const auto& spec : caseFields()) {
    if (spec.section != section) continue;
    Row row;
    row.spec = &spec;
    row.label = new QLabel(this);
    switch (spec.kind) {
      case FieldKind::Number: {
        auto* edit = new QLineEdit(this);
        edit->setObjectName(QString::fromLatin1(spec.key));
        edit->setAlignment(Qt::AlignRight);
        // Wide enough for a value at display precision with its sign and decimals.
        edit->setMinimumWidth(edit->fontMetrics().horizontalAdvance(QStringLiteral("-0000000.0000")) + 16);
        connect(edit, &QLineEdit::textEdited, this,
                [this, &spec](const QString& text) { numberEdited(spec, text); });
        // Enter or focus out commits the typed value's result (CaseDocument's stale rule).
        connect(edit, &QLineEdit::editingFinished, &document_, &CaseDocument::commit);
        row.editor = edit;
        row.error = new QLabel(this);
        row.error->setObjectName(QString::fromLatin1(spec.key) + QStringLiteral(".error"));
        row.error->setWordWrap(true);
        QPalette palette = row.error->palette();
        palette.setColor(QPalette::WindowText, errorColour(palette));
        row.error->setPalette(palette);
        row.error->hide();
        auto* box = new QWidget(this);
        auto* v = new QVBoxLayout(box);
        v->setContentsMargins(0, 0, 0, 0);
        v->setSpacing(2);
        v->addWidget(edit);
        v->addWidget(row.error);
        layout_->addRow(row.label, box);
        row.label->setBuddy(edit);
        break;
      }
      case FieldKind::Choice: {
        auto* combo = new QComboBox(this);
        combo->setObjectName(QString::fromLatin1(spec.key));
        for (std::size_t i = 0; i < spec.choices.size(); ++i) combo->addItem(QString());
        connect(combo, &QComboBox::activated, this,
                [this, &spec](int index) { choiceActivated(spec, index); });
        row.editor = combo;
        layout_->addRow(row.label, combo);
        row.label->setBuddy(combo);
        break;
      }
      case FieldKind::Flag: {
        auto* check = new QCheckBox(this);
        check->setObjectName(QString::fromLatin1(spec.key));
        connect(check, &QCheckBox::toggled, this, [this, &spec](bool on) { flagToggled(spec, on); });
        row.editor = check;
        layout_->addRow(row.label, check);
        row.label->setBuddy(check);
        break;
      }
      case FieldKind::Text: {
        auto* edit = new QLineEdit(this);
        edit->setObjectName(QString::fromLatin1(spec.key));
        connect(edit, &QLineEdit::textEdited, this,
                [this, &spec](const QString& text) { textEdited(spec, text); });
        row.editor = edit;
        layout_->addRow(row.label, edit);
        row.label->setBuddy(edit);
        break;
      }
      case FieldKind::Notes: {
        auto* edit = new QPlainTextEdit(this);
        edit->setObjectName(QString::fromLatin1(spec.key));
        edit->setTabChangesFocus(true);
        // Undo is the document's: one stack for every input.
        edit->setUndoRedoEnabled(false);
        edit->setMinimumHeight(QFontMetrics(edit->font()).height() * 6);
        connect(edit, &QPlainTextEdit::textChanged, this,
                [this, &spec, edit] { textEdited(spec, edit->toPlainText()); });
        row.editor = edit;
        layout_->addRow(row.label, edit);
        row.label->setBuddy(edit);
        break;
      }
    }
    rows_.push_back(row);
  }
  retranslateUi();
  connect(&document_, &CaseDocument::caseChanged, this, &CaseForm::refresh);
  connect(&document_, &CaseDocument::resultChanged, this, &CaseForm::refresh);
  connect(&units_, &DisplayUnits::changed, this, &CaseForm::retranslateUi);
}

void CaseForm::retranslateUi() {
  title_->setText(sectionName(section_));
  for (const auto& row : rows_) {
    const FieldSpec& spec = *row.spec;
    QString label = fieldLabel(spec);
    if (spec.kind == FieldKind::Number) label = units_.withUnit(label, spec.quantity);
    row.label->setText(label);
    row.label->setToolTip(fieldToolTip(spec, units_));
    row.editor->setToolTip(fieldToolTip(spec, units_));
    if (auto* combo = qobject_cast<QComboBox*>(row.editor))
      for (std::size_t i = 0; i < spec.choices.size(); ++i) combo->setItemText(int(i), fieldChoice(spec, i));
  }
  // The unit may have changed: rewrite every number.
  for (const auto& row : rows_)
    if (auto* edit = qobject_cast<QLineEdit*>(row.editor)) edit->setProperty("shownSi", QVariant());
  refresh();
}

void CaseForm::showEvent(QShowEvent* event) {
  QWidget::showEvent(event);
  if (behind_) refresh();
}

void CaseForm::refresh() {
  // Typing in the visible form: a form the stack hides is not on screen, so it skips its
  // widgets until it is shown (showEvent). Any other change (undo, a file, units) refreshes all.
  if (isHidden() && parentWidget() && document_.isApplyingTypedEdit()) {
    behind_ = true;
    return;
  }
  behind_ = false;
  const engine::Case& c = document_.currentCase();
  for (const auto& row : rows_) {
    const FieldSpec& spec = *row.spec;
    const bool visible = spec.visible(c);
    layout_->setRowVisible(row.label, visible);
    if (!visible) continue;
    const QSignalBlocker blocker(row.editor);
    const engine::CaseProblem* problem = document_.problemAt(spec.path(c));
    if (spec.kind == FieldKind::Text || spec.kind == FieldKind::Notes) {
      // Rewrite only when the model differs (undo, file load), so that the cursor stays put.
      const QString text = QString::fromStdString(spec.getText(c));
      if (auto* line = qobject_cast<QLineEdit*>(row.editor); line && line->text() != text)
        line->setText(text);
      if (auto* notes = qobject_cast<QPlainTextEdit*>(row.editor); notes && notes->toPlainText() != text)
        notes->setPlainText(text);
      markInvalid(row.editor, problem != nullptr);
    } else if (auto* edit = qobject_cast<QLineEdit*>(row.editor)) {
      const bool entryProblem = document_.entryProblems().contains(spec.id);
      const double si = spec.get(c);
      // Leave the user's text alone when it already stands for the model's value (typed) or is
      // the model's value at display precision (a U.S. customary conversion, rounded).
      const QString shown = units_.inputText(si, spec.quantity);
      double typed = 0.0;
      const bool same = edit->text() == shown || (parseNumber(edit->text(), typed) &&
                                                  std::fabs(units_.fromDisplay(typed, spec.quantity) - si) <=
                                                      1e-12 * std::max(1.0, std::fabs(si)));
      if (!entryProblem && !same) edit->setText(shown);
      QString message;
      if (entryProblem) {
        message = document_.entryProblems().value(spec.id);
      } else if (problem) {
        message = fieldRangeProblem(spec, si, QString::fromStdString(problem->valid), units_);
      }
      showProblem(row, message);
      if (problem)
        edit->setToolTip(fieldToolTip(spec, units_) + QStringLiteral("\n\n") +
                         QString::fromStdString(problem->message));
      else
        edit->setToolTip(fieldToolTip(spec, units_));
    } else if (auto* combo = qobject_cast<QComboBox*>(row.editor)) {
      combo->setCurrentIndex(static_cast<int>(spec.get(c) + 0.5));
      markInvalid(combo, problem != nullptr);
    } else if (auto* check = qobject_cast<QCheckBox*>(row.editor)) {
      check->setChecked(spec.get(c) > 0.5);
      markInvalid(check, problem != nullptr);
      check->setToolTip(problem ? fieldToolTip(spec, units_) + QStringLiteral("\n\n") +
                                      QString::fromStdString(problem->message)
                                : fieldToolTip(spec, units_));
    }
  }
}

void CaseForm::showProblem(const Row& row, const QString& message) {
  markInvalid(row.editor, !message.isEmpty());
  if (!row.error) return;
  row.error->setText(message);
  row.error->setVisible(!message.isEmpty());
}

void CaseForm::numberEdited(const FieldSpec& spec, const QString& text) {
  double shown = 0.0;
  if (!parseNumber(text, shown)) {
    document_.setEntryProblem(spec.id, tr("%1: “%2” is not a number.").arg(fieldLabel(spec), text));
    return;
  }
  engine::Case edited = document_.currentCase();
  spec.set(edited, units_.fromDisplay(shown, spec.quantity));
  // Typed: its result becomes the one kept on screen once committed, not at each keystroke.
  document_.applyEdit(spec.id, tr("Change %1").arg(fieldLabel(spec)), edited, CaseDocument::Commit::Later);
  // After the edit, so that the refresh it causes finds the model already holding the typed value
  // (before it, the refresh would write the old value back into the field).
  document_.clearEntryProblem(spec.id);
}

void CaseForm::choiceActivated(const FieldSpec& spec, int index) {
  engine::Case edited = document_.currentCase();
  spec.set(edited, index);
  document_.applyEdit(-1, tr("Change %1").arg(fieldLabel(spec)), edited);
}

void CaseForm::textEdited(const FieldSpec& spec, const QString& text) {
  engine::Case edited = document_.currentCase();
  spec.setText(edited, text.toStdString());
  // Merge id = field id: typing into one field is one undoable step.
  document_.applyEdit(spec.id, tr("Change %1").arg(fieldLabel(spec)), edited);
}

void CaseForm::flagToggled(const FieldSpec& spec, bool on) {
  engine::Case edited = document_.currentCase();
  spec.set(edited, on ? 1.0 : 0.0);
  document_.applyEdit(-1, tr("Change %1").arg(fieldLabel(spec)), edited);
}

}  // namespace cw::gui
