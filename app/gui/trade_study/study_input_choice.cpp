#include "trade_study/study_input_choice.h"

#include "document/case_fields.h"
#include "document/units.h"

#include <QComboBox>
#include <QSignalBlocker>

#include <algorithm>

namespace cw::gui {

StudyInputChoice::StudyInputChoice(QComboBox* box, const DisplayUnits& units, Fallback fallback)
    : box_(box), units_(units), fallback_(fallback) {}

bool StudyInputChoice::setCase(const engine::Case& inputs) {
  std::vector<StudyInput> offered = studyInputs(inputs);
  // Most edits leave the inputs on offer as they are: then the box is not rebuilt.
  const bool same = std::equal(
      offered.begin(), offered.end(), inputs_.begin(), inputs_.end(),
      [](const StudyInput& a, const StudyInput& b) { return a.field == b.field && a.path == b.path; });
  inputs_ = std::move(offered);
  const std::string shown = input_.path;
  input_ = {};
  for (const StudyInput& i : inputs_)
    if (i.path == shown) input_ = i;
  for (const StudyInput& i : inputs_)
    if (i.path == asked_) input_ = i;
  if (!input_.field && !inputs_.empty()) input_ = fallback_(inputs_);
  if (!same || box_->currentIndex() < 0) fill();
  return input_.path != shown || !input_.field;
}

bool StudyInputChoice::ask(const std::string& path) {
  asked_ = path;  // also when this case does not have it: a later one may
  for (const StudyInput& i : inputs_)
    if (i.path == path) {
      input_ = i;
      fill();
      return true;
    }
  return false;
}

bool StudyInputChoice::pick(int index) {
  if (index < 0 || index >= static_cast<int>(inputs_.size())) return false;
  input_ = inputs_[static_cast<std::size_t>(index)];
  asked_ = input_.path;
  box_->setToolTip(fieldToolTip(*input_.field, units_));
  return true;
}

void StudyInputChoice::fill() {
  const QSignalBlocker blocker(box_);
  box_->clear();
  for (const StudyInput& i : inputs_) {
    box_->addItem(studyInputLabel(i, units_), QString::fromStdString(i.path));
    box_->setItemData(box_->count() - 1, fieldToolTip(*i.field, units_), Qt::ToolTipRole);
  }
  box_->setCurrentIndex(box_->findData(QString::fromStdString(input_.path)));
  box_->setToolTip(input_.field ? fieldToolTip(*input_.field, units_) : QString());
}

}  // namespace cw::gui
