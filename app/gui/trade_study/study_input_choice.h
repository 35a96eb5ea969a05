#pragma once
// The choice of one trade-study input in a combo box, shared by the axis editor and the
// comparison's "one input set differently": the inputs the case offers (study_inputs.h), the one
// shown, and the one asked for (by the user or the settings), which is chosen again whenever a
// later case offers it.

#include "trade_study/study_inputs.h"

#include "engine/case_inputs.h"

#include <string>
#include <vector>

class QComboBox;

namespace cw::gui {

class DisplayUnits;

class StudyInputChoice {
 public:
  /// The input to show when neither the one asked for nor the one shown is on offer.
  using Fallback = StudyInput (*)(const std::vector<StudyInput>& offered);

  StudyInputChoice(QComboBox* box, const DisplayUnits& units, Fallback fallback);

  /// The case changed: offer its inputs and choose the one asked for, else the one shown, else the
  /// fallback. True when the input shown changed (its defaults then apply).
  bool setCase(const engine::Case& inputs);
  /// Asks for the input at `path`, remembered for later cases too; true (and shown) when this case has it.
  bool ask(const std::string& path);
  /// The user picked entry `index` of the box; true when it is an input (then also asked for).
  bool pick(int index);
  /// The box's entries, labels with units and tooltips, in the current language and unit system.
  void fill();

  const StudyInput& input() const { return input_; }

 private:
  QComboBox* box_;
  const DisplayUnits& units_;
  Fallback fallback_;
  std::vector<StudyInput> inputs_;
  StudyInput input_;
  std::string asked_;
};

}  // namespace cw::gui
