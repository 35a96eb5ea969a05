#pragma once
// The "one input set differently" of the trade study's comparison: a numeric input of the case
// and the value it takes in the second study (e.g. the compressor's isentropic efficiency at 0.80).
// The value starts at 95 % of the case's value, clipped to the valid range; an entry that is no
// number or outside the valid range turns the field red and says why.

#include "trade_study/study_input_choice.h"
#include "trade_study/study_inputs.h"

#include "engine/case_inputs.h"

#include <QWidget>

#include <optional>
#include <string>

class QComboBox;
class QLabel;
class QLineEdit;

namespace cw::gui {

class DisplayUnits;

class StudyChangeEditor : public QWidget {
  Q_OBJECT

 public:
  explicit StudyChangeEditor(DisplayUnits& units, QWidget* parent = nullptr);

  void setCase(const engine::Case& inputs);
  bool setPath(const std::string& path);
  /// Sets the value [SI] as if typed.
  void setValue(double si);

  std::string path() const { return choice_.input().path; }
  StudyInput input() const { return choice_.input(); }
  double value() const { return value_; }  ///< [SI]
  /// The --set assignment of the second study ("compressor.isentropic_efficiency=0.8"), or
  /// nothing while the entry is invalid.
  std::optional<std::string> assignment() const;
  /// "Compressor › Isentropic efficiency = 0.8" for the legend.
  QString description() const;
  QString problems() const;
  /// A problem the panel finds (the input is also varied); empty clears it.
  void setConflict(const QString& message);

  QComboBox* inputBox() const { return inputBox_; }
  QLineEdit* valueEdit() const { return valueEdit_; }
  QLabel* errorLabel() const { return error_; }

  void retranslateUi();

 signals:
  void changed();

 protected:
  void changeEvent(QEvent* event) override;

 private:
  void applyDefault();
  void validate();
  void writeValue();

  DisplayUnits& units_;
  engine::Case case_;
  QComboBox* inputBox_;  // before choice_, which works on it
  StudyInputChoice choice_;
  double value_ = 0.0;
  bool valueOk_ = true;
  bool userValue_ = false;
  QString ownProblem_, conflict_;

  QLineEdit* valueEdit_ = nullptr;
  QLabel* equals_ = nullptr;
  QLabel* error_ = nullptr;
};

}  // namespace cw::gui
