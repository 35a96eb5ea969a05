#include "study_change_editor.h"

#include "case_form.h"
#include "study_axis_editor.h"
#include "units.h"

#include "common/error.h"

#include <QComboBox>
#include <QEvent>
#include <QGridLayout>
#include <QLabel>
#include <QLineEdit>
#include <QSignalBlocker>

#include <algorithm>

namespace cw::gui {

StudyChangeEditor::StudyChangeEditor(DisplayUnits& units, QWidget* parent) : QWidget(parent), units_(units) {
  setObjectName("studyChange");
  auto* grid = new QGridLayout(this);
  grid->setContentsMargins(0, 0, 0, 0);
  grid->setHorizontalSpacing(4);
  grid->setVerticalSpacing(2);
  inputBox_ = new QComboBox(this);
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
    if (index < 0 || index >= static_cast<int>(inputs_.size())) return;
    input_ = inputs_[static_cast<std::size_t>(index)];
    preferred_ = input_.path;
    userValue_ = false;
    applyDefault();
    validate();
    emit changed();
  });
  connect(valueEdit_, &QLineEdit::textEdited, this, [this](const QString& text) {
    double shown = 0.0;
    valueOk_ = parseTypedNumber(text, shown);
    if (valueOk_ && input_.field) value_ = units_.fromDisplay(shown, input_.field->quantity);
    userValue_ = true;
    validate();
    emit changed();
  });
  connect(&units_, &DisplayUnits::changed, this, &StudyChangeEditor::retranslateUi);
  retranslateUi();
}

void StudyChangeEditor::retranslateUi() {
  fillInputs();
  writeValue();
  validate();
}

void StudyChangeEditor::setCase(const engine::Case& inputs) {
  case_ = inputs;
  std::vector<StudyInput> offered = studyInputs(case_);
  const bool same = sameStudyInputs(offered, inputs_);
  inputs_ = std::move(offered);
  bool fresh = false;
  input_ = reselectStudyInput(inputs_, input_.path, preferred_, fresh);
  if (!input_.field && !inputs_.empty()) {
    // The compressor's efficiency first: the usual "what if this component were worse" question.
    input_ = inputs_.front();
    for (const StudyInput& i : inputs_)
      if (i.path.rfind("compressor.", 0) == 0 && i.path.find("efficiency") != std::string::npos) input_ = i;
  }
  if (fresh) userValue_ = false;
  if (!same || inputBox_->currentIndex() < 0) fillInputs();
  if (!userValue_) applyDefault();
  validate();
}

bool StudyChangeEditor::setPath(const std::string& path) {
  preferred_ = path;  // also when this case does not have it: a later one may
  for (const StudyInput& i : inputs_)
    if (i.path == path) {
      input_ = i;
      userValue_ = false;
      fillInputs();
      applyDefault();
      validate();
      emit changed();
      return true;
    }
  return false;
}

void StudyChangeEditor::setValue(double si) {
  value_ = si;
  valueOk_ = true;
  userValue_ = true;
  writeValue();
  validate();
  emit changed();
}

void StudyChangeEditor::fillInputs() {
  const QSignalBlocker blocker(inputBox_);
  inputBox_->clear();
  for (const StudyInput& i : inputs_)
    inputBox_->addItem(studyInputLabel(i, units_), QString::fromStdString(i.path));
  inputBox_->setCurrentIndex(inputBox_->findData(QString::fromStdString(input_.path)));
}

void StudyChangeEditor::applyDefault() {
  if (!input_.field) return;
  const FieldSpec& f = *input_.field;
  const double margin = 1e-3 * (f.high - f.low);
  const double low = f.lowOpen ? f.low + margin : f.low, high = f.highOpen ? f.high - margin : f.high;
  value_ = std::clamp(0.95 * f.get(case_), low, high);
  valueOk_ = true;
  writeValue();
}

void StudyChangeEditor::writeValue() {
  const Quantity q = input_.field ? input_.field->quantity : Quantity::Dimensionless;
  if (valueOk_) valueEdit_->setText(typedNumberText(units_.toDisplay(value_, q)));
  const QString unit = q == Quantity::Dimensionless ? QStringLiteral("–") : units_.symbol(q);
  valueEdit_->setToolTip(tr("The value of this input in the second study [%1]. %2")
                             .arg(unit, input_.field
                                            ? tr("Valid range: %1").arg(validRangeText(*input_.field, units_))
                                            : QString()));
}

void StudyChangeEditor::validate() {
  ownProblem_.clear();
  if (!valueOk_)
    ownProblem_ = tr("Value: “%1” is not a number.").arg(valueEdit_->text());
  else if (!input_.field)
    ownProblem_ = tr("The case has no numeric input to set.");
  else if (!inValidRange(*input_.field, value_))
    ownProblem_ = tr("%1 = %2 is outside the valid range %3.")
                      .arg(studyInputName(input_), typedWithUnit(value_, input_.field->quantity, units_),
                           validRangeText(*input_.field, units_));
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
  if (!problems().isEmpty() || !input_.field) return std::nullopt;
  return input_.path + "=" + cw::formatNumber(value_);
}

QString StudyChangeEditor::description() const {
  if (!input_.field) return {};
  return QStringLiteral("%1 = %2").arg(studyInputName(input_),
                                       typedWithUnit(value_, input_.field->quantity, units_));
}

}  // namespace cw::gui
