#include "trade_study/study_change_editor.h"

#include "document/units.h"
#include "forms/case_form.h"
#include "trade_study/study_axis_editor.h"

#include "common/error.h"

#include <QComboBox>
#include <QEvent>
#include <QGridLayout>
#include <QLabel>
#include <QLineEdit>
#include <QSignalBlocker>

#include <algorithm>

namespace cw::gui {

namespace {

/// The compressor's efficiency first: the usual "what if this component were worse" question.
StudyInput compressorEfficiencyFirst(const std::vector<StudyInput>& offered) {
  StudyInput chosen = offered.front();
  for (const StudyInput& i : offered)
    if (i.path.rfind("compressor.", 0) == 0 && i.path.find("efficiency") != std::string::npos) chosen = i;
  return chosen;
}

}  // namespace

StudyChangeEditor::StudyChangeEditor(DisplayUnits& units, QWidget* parent)
    : QWidget(parent),
      units_(units),
      inputBox_(new QComboBox(this)),
      choice_(inputBox_, units, &compressorEfficiencyFirst) {
  setObjectName("studyChange");
  auto* grid = new QGridLayout(this);
  grid->setContentsMargins(0, 0, 0, 0);
  grid->setHorizontalSpacing(4);
  grid->setVerticalSpacing(2);
  inputBox_->setObjectName("studyChange.input");
  inputBox_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
  inputBox_->setMinimumContentsLength(16);
  equals_ = new QLabel(QStringLiteral("="), this);
  valueEdit_ = new QLineEdit(this);
  valueEdit_->setObjectName("studyChange.value");
  valueEdit_->setAlignment(Qt::AlignRight);
  equals_->setBuddy(valueEdit_);
  error_ = new QLabel(this);
  error_->setObjectName("studyChange.error");
  error_->setWordWrap(true);
  QPalette palette = error_->palette();
  palette.setColor(QPalette::WindowText, studyErrorColour(palette));
  error_->setPalette(palette);
  error_->hide();
  grid->addWidget(inputBox_, 0, 0);
  grid->addWidget(equals_, 0, 1);
  grid->addWidget(valueEdit_, 0, 2);
  grid->addWidget(error_, 1, 0, 1, 3);
  grid->setColumnStretch(0, 3);
  grid->setColumnStretch(2, 1);

  connect(inputBox_, &QComboBox::activated, this, [this](int index) {
    if (!choice_.pick(index)) return;
    userValue_ = false;
    applyDefault();
    validate();
    emit changed();
  });
  connect(valueEdit_, &QLineEdit::textEdited, this, [this](const QString& text) {
    double shown = 0.0;
    valueOk_ = parseTypedNumber(text, shown);
    if (valueOk_ && choice_.input().field)
      value_ = units_.fromDisplay(shown, choice_.input().field->quantity);
    userValue_ = true;
    validate();
    emit changed();
  });
  connect(&units_, &DisplayUnits::changed, this, &StudyChangeEditor::retranslateUi);
  retranslateUi();
}

void StudyChangeEditor::retranslateUi() {
  choice_.fill();
  writeValue();
  validate();
}

void StudyChangeEditor::setCase(const engine::Case& inputs) {
  case_ = inputs;
  if (choice_.setCase(case_)) userValue_ = false;
  if (!userValue_) applyDefault();
  validate();
}

bool StudyChangeEditor::setPath(const std::string& path) {
  if (!choice_.ask(path)) return false;
  userValue_ = false;
  applyDefault();
  validate();
  emit changed();
  return true;
}

void StudyChangeEditor::setValue(double si) {
  value_ = si;
  valueOk_ = true;
  userValue_ = true;
  writeValue();
  validate();
  emit changed();
}

void StudyChangeEditor::applyDefault() {
  if (!choice_.input().field) return;
  const FieldSpec& f = *choice_.input().field;
  const double margin = 1e-3 * (f.high - f.low);
  const double low = f.lowOpen ? f.low + margin : f.low, high = f.highOpen ? f.high - margin : f.high;
  value_ = std::clamp(0.95 * f.get(case_), low, high);
  valueOk_ = true;
  writeValue();
}

void StudyChangeEditor::writeValue() {
  const Quantity q = choice_.input().field ? choice_.input().field->quantity : Quantity::Dimensionless;
  if (valueOk_) valueEdit_->setText(studyFieldText(value_, q, units_));
  const QString unit = q == Quantity::Dimensionless ? QStringLiteral("–") : units_.symbol(q);
  valueEdit_->setToolTip(
      tr("The value of this input in the second study [%1]. %2")
          .arg(unit, choice_.input().field
                         ? tr("Valid range: %1").arg(validRangeText(*choice_.input().field, units_))
                         : QString()));
}

void StudyChangeEditor::validate() {
  ownProblem_.clear();
  if (!valueOk_)
    ownProblem_ = tr("Value: “%1” is not a number.").arg(valueEdit_->text());
  else if (!choice_.input().field)
    ownProblem_ = tr("The case has no numeric input to set.");
  else if (!inValidRange(*choice_.input().field, value_))
    ownProblem_ = tr("%1 = %2 is outside the valid range %3.")
                      .arg(studyInputName(choice_.input()),
                           typedWithUnit(value_, choice_.input().field->quantity, units_),
                           validRangeText(*choice_.input().field, units_));
  markInvalid(valueEdit_, !ownProblem_.isEmpty());
  markInvalid(inputBox_, !conflict_.isEmpty());
  const QString text = problems();
  error_->setText(text);
  error_->setVisible(!text.isEmpty() && isEnabled());
}

void StudyChangeEditor::changeEvent(QEvent* event) {
  QWidget::changeEvent(event);
  if (event->type() == QEvent::EnabledChange) error_->setVisible(!problems().isEmpty() && isEnabled());
}

void StudyChangeEditor::setConflict(const QString& message) {
  if (message == conflict_) return;
  conflict_ = message;
  validate();
}

QString StudyChangeEditor::problems() const {
  QStringList all;
  if (!ownProblem_.isEmpty()) all << ownProblem_;
  if (!conflict_.isEmpty()) all << conflict_;
  return all.join(QLatin1Char('\n'));
}

std::optional<std::string> StudyChangeEditor::assignment() const {
  if (!problems().isEmpty() || !choice_.input().field) return std::nullopt;
  return choice_.input().path + "=" + cw::formatNumber(value_);
}

QString StudyChangeEditor::description() const {
  if (!choice_.input().field) return {};
  return QStringLiteral("%1 = %2").arg(studyInputName(choice_.input()),
                                       typedWithUnit(value_, choice_.input().field->quantity, units_));
}

}  // namespace cw::gui
