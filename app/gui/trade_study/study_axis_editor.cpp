#include "trade_study/study_axis_editor.h"

#include "document/settings.h"
#include "document/units.h"
#include "forms/case_form.h"

#include <QComboBox>
#include <QEvent>
#include <QGridLayout>
#include <QLabel>
#include <QLineEdit>
#include <QSignalBlocker>
#include <QSpinBox>

#include <algorithm>
#include <cmath>

namespace cw::gui {

QString typedWithUnit(double si, Quantity q, const DisplayUnits& units) {
  const QString number = studyFieldText(si, q, units);
  return q == Quantity::Dimensionless ? number : number + QLatin1Char(' ') + units.symbol(q);
}

QColor studyErrorColour(const QPalette& palette) {
  return palette.color(QPalette::Base).lightness() > 128 ? QColor(0xB0, 0x00, 0x00)
                                                         : QColor(0xFF, 0x80, 0x80);
}

StudyAxisEditor::StudyAxisEditor(const QString& name, int defaultCount, DisplayUnits& units, QWidget* parent)
    : QWidget(parent),
      units_(units),
      inputBox_(new QComboBox(this)),
      choice_(inputBox_, units, [](const std::vector<StudyInput>& offered) { return offered.front(); }) {
  setObjectName(name);
  auto* grid = new QGridLayout(this);
  grid->setContentsMargins(0, 0, 0, 0);
  grid->setHorizontalSpacing(4);
  grid->setVerticalSpacing(2);
  inputBox_->setObjectName(name + QStringLiteral(".input"));
  inputBox_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
  inputBox_->setMinimumContentsLength(16);
  startEdit_ = new QLineEdit(this);
  startEdit_->setObjectName(name + QStringLiteral(".start"));
  stopEdit_ = new QLineEdit(this);
  stopEdit_->setObjectName(name + QStringLiteral(".stop"));
  for (QLineEdit* e : {startEdit_, stopEdit_}) {
    e->setAlignment(Qt::AlignRight);
    e->setMinimumWidth(QFontMetrics(e->font()).horizontalAdvance(QStringLiteral("0000.000")) + 12);
  }
  countBox_ = new QSpinBox(this);
  countBox_->setObjectName(name + QStringLiteral(".count"));
  countBox_->setRange(1, study::kMaxAxisCount);
  countBox_->setValue(defaultCount);
  fromLabel_ = new QLabel(this);
  toLabel_ = new QLabel(this);
  countLabel_ = new QLabel(this);
  fromLabel_->setBuddy(startEdit_);
  toLabel_->setBuddy(stopEdit_);
  countLabel_->setBuddy(countBox_);
  error_ = new QLabel(this);
  error_->setObjectName(name + QStringLiteral(".error"));
  error_->setWordWrap(true);
  QPalette palette = error_->palette();
  palette.setColor(QPalette::WindowText, studyErrorColour(palette));
  error_->setPalette(palette);
  error_->hide();

  grid->addWidget(inputBox_, 0, 0, 1, 6);
  grid->addWidget(fromLabel_, 1, 0);
  grid->addWidget(startEdit_, 1, 1);
  grid->addWidget(toLabel_, 1, 2);
  grid->addWidget(stopEdit_, 1, 3);
  grid->addWidget(countLabel_, 1, 4);
  grid->addWidget(countBox_, 1, 5);
  grid->addWidget(error_, 2, 0, 1, 6);
  grid->setColumnStretch(1, 1);
  grid->setColumnStretch(3, 1);

  connect(inputBox_, &QComboBox::activated, this, &StudyAxisEditor::inputChosen);
  connect(startEdit_, &QLineEdit::textEdited, this, &StudyAxisEditor::textEdited);
  connect(stopEdit_, &QLineEdit::textEdited, this, &StudyAxisEditor::textEdited);
  connect(countBox_, &QSpinBox::valueChanged, this, [this] {
    validate();
    emit changed();
  });
  connect(&units_, &DisplayUnits::changed, this, &StudyAxisEditor::retranslateUi);
  retranslateUi();
}

void StudyAxisEditor::retranslateUi() {
  fromLabel_->setText(tr("from"));
  toLabel_->setText(tr("to"));
  countLabel_->setText(tr("values"));
  countBox_->setToolTip(tr("Number of evenly spaced values from start to stop, both included (1 to %1)")
                            .arg(study::kMaxAxisCount));
  choice_.fill();
  writeRange();
  validate();
}

void StudyAxisEditor::setCase(const engine::Case& inputs) {
  case_ = inputs;
  if (choice_.setCase(case_)) userRange_ = false;  // another input: its own default range
  if (!userRange_) applyDefaultRange();
  validate();
}

bool StudyAxisEditor::setPath(const std::string& path) {
  if (!choice_.ask(path)) return false;
  userRange_ = false;
  applyDefaultRange();
  validate();
  emit changed();
  return true;
}

void StudyAxisEditor::setRange(double start, double stop, int count) {
  start_ = start;
  stop_ = stop;
  startOk_ = stopOk_ = true;
  userRange_ = true;
  {
    const QSignalBlocker blocker(countBox_);
    countBox_->setValue(count);
  }
  writeRange();
  keepTypedRange();
  validate();
  emit changed();
}

void StudyAxisEditor::setCount(int count) {
  countBox_->setValue(count);
}

std::string StudyAxisEditor::path() const {
  return choice_.input().path;
}

int StudyAxisEditor::count() const {
  return countBox_->value();
}

void StudyAxisEditor::inputChosen(int index) {
  if (!choice_.pick(index)) return;
  userRange_ = false;
  applyDefaultRange();
  validate();
  emit changed();
}

void StudyAxisEditor::applyDefaultRange() {
  const StudyInput input = choice_.input();
  if (!input.field) return;
  // The range the user last typed for this input (kept in the settings), while it is valid.
  const auto typed = AppSettings().studyRange(QString::fromStdString(input.path));
  if (typed && inValidRange(*input.field, typed->first) && inValidRange(*input.field, typed->second)) {
    start_ = typed->first;
    stop_ = typed->second;
    userRange_ = true;
  } else {
    const StudyRange range = defaultStudyRange(*input.field, input.field->get(case_), input.path);
    start_ = range.start;
    stop_ = range.stop;
  }
  startOk_ = stopOk_ = true;
  writeRange();
}

void StudyAxisEditor::keepTypedRange() {
  const StudyInput input = choice_.input();
  if (!input.field || !startOk_ || !stopOk_ || !inValidRange(*input.field, start_) ||
      !inValidRange(*input.field, stop_))
    return;
  AppSettings().setStudyRange(QString::fromStdString(input.path), start_, stop_);
}

void StudyAxisEditor::writeRange() {
  const Quantity q = choice_.input().field ? choice_.input().field->quantity : Quantity::Dimensionless;
  // A field whose text is no number keeps the user's text.
  if (startOk_) startEdit_->setText(studyFieldText(start_, q, units_));
  if (stopOk_) stopEdit_->setText(studyFieldText(stop_, q, units_));
  const QString unit = q == Quantity::Dimensionless ? QString() : units_.symbol(q);
  startEdit_->setPlaceholderText(unit);
  stopEdit_->setPlaceholderText(unit);
  const QString range = choice_.input().field
                            ? tr("Valid range: %1").arg(validRangeText(*choice_.input().field, units_))
                            : QString();
  startEdit_->setToolTip(tr("First value [%1]. %2").arg(unit.isEmpty() ? QStringLiteral("–") : unit, range));
  stopEdit_->setToolTip(tr("Last value [%1]. %2").arg(unit.isEmpty() ? QStringLiteral("–") : unit, range));
}

void StudyAxisEditor::textEdited() {
  const Quantity q = choice_.input().field ? choice_.input().field->quantity : Quantity::Dimensionless;
  double shown = 0.0;
  startOk_ = parseTypedNumber(startEdit_->text(), shown);
  if (startOk_) start_ = units_.fromDisplay(shown, q);
  stopOk_ = parseTypedNumber(stopEdit_->text(), shown);
  if (stopOk_) stop_ = units_.fromDisplay(shown, q);
  userRange_ = true;
  keepTypedRange();
  validate();
  emit changed();
}

void StudyAxisEditor::validate() {
  ownProblems_.clear();
  bool badStart = !startOk_, badStop = !stopOk_, badCount = false;
  if (!startOk_) ownProblems_ << tr("Start: “%1” is not a number.").arg(startEdit_->text());
  if (!stopOk_) ownProblems_ << tr("Stop: “%1” is not a number.").arg(stopEdit_->text());
  if (!choice_.input().field) {
    ownProblems_ << tr("The case has no numeric input to vary here.");
  } else {
    const FieldSpec& f = *choice_.input().field;
    const QString name = studyInputName(choice_.input());
    if (startOk_ && !inValidRange(f, start_)) {
      badStart = true;
      ownProblems_ << tr("Start = %1 is outside the valid range %2 of %3.")
                          .arg(typedWithUnit(start_, f.quantity, units_), validRangeText(f, units_), name);
    }
    if (stopOk_ && !inValidRange(f, stop_)) {
      badStop = true;
      ownProblems_ << tr("Stop = %1 is outside the valid range %2 of %3.")
                          .arg(typedWithUnit(stop_, f.quantity, units_), validRangeText(f, units_), name);
    }
    if (startOk_ && stopOk_ && count() == 1 && start_ != stop_) {
      badCount = true;
      ownProblems_ << tr("One value takes the same start and stop; give 2 values or more for a range.");
    }
    if (startOk_ && stopOk_ && count() > 1 && start_ == stop_) {
      badStop = true;
      ownProblems_ << tr("Start and stop are the same: give a different stop, or 1 value.");
    }
  }
  markInvalid(startEdit_, badStart);
  markInvalid(stopEdit_, badStop);
  markInvalid(countBox_, badCount || !countConflict_.isEmpty());
  markInvalid(inputBox_, !inputConflict_.isEmpty());
  const QString text = problems();
  error_->setText(text);
  error_->setVisible(!text.isEmpty() && isEnabled());
}

void StudyAxisEditor::changeEvent(QEvent* event) {
  QWidget::changeEvent(event);
  if (event->type() == QEvent::EnabledChange) error_->setVisible(!problems().isEmpty() && isEnabled());
}

void StudyAxisEditor::setInputConflict(const QString& message) {
  if (message == inputConflict_) return;
  inputConflict_ = message;
  validate();
}

void StudyAxisEditor::setCountConflict(const QString& message) {
  if (message == countConflict_) return;
  countConflict_ = message;
  validate();
}

QString StudyAxisEditor::problems() const {
  QStringList all = ownProblems_;
  if (!inputConflict_.isEmpty()) all << inputConflict_;
  if (!countConflict_.isEmpty()) all << countConflict_;
  return all.join(QLatin1Char('\n'));
}

std::optional<study::SweepAxis> StudyAxisEditor::axis() const {
  if (!problems().isEmpty() || !choice_.input().field) return std::nullopt;
  return study::SweepAxis{choice_.input().path, start_, stop_, count()};
}

}  // namespace cw::gui
