#pragma once
// One varied input of a trade study as the panel edits it: the input (a choice among the case's
// numeric inputs, labelled with units), its start and stop (display units; SI kept inside) and
// its number of values. The range is the one last typed for the input (kept in the settings per
// input), else its default (a practitioner's starting range, or -50 % to +50 % of the case's
// value, clipped to the valid range), which follows the case until the user types one. An entry that is no
// number, outside the input's valid range, or inconsistent with the count turns its field red and says why,
// naming the valid range; axis() is then empty and the panel's Run button is disabled.

#include "trade_study/study_input_choice.h"
#include "trade_study/study_inputs.h"

#include "engine/case_inputs.h"
#include "study/sweep_axis.h"

#include <QWidget>

#include <optional>
#include <string>

class QComboBox;
class QLabel;
class QLineEdit;
class QSpinBox;

namespace cw::gui {

class DisplayUnits;

class StudyAxisEditor : public QWidget {
  Q_OBJECT

 public:
  /// `name` prefixes the widgets' object names (e.g. "studyAxis1" gives "studyAxis1.start").
  StudyAxisEditor(const QString& name, int defaultCount, DisplayUnits& units, QWidget* parent = nullptr);

  /// The case changed: the inputs it offers, their values (for the default range).
  void setCase(const engine::Case& inputs);
  /// Chooses an input by path when the case has it (settings, tests); its default range follows.
  bool setPath(const std::string& path);
  /// Sets the range [SI] and count as if typed (tests, the demo picture).
  void setRange(double start, double stop, int count);
  void setCount(int count);

  std::string path() const;
  StudyInput input() const { return choice_.input(); }
  double start() const { return start_; }  ///< [SI]
  double stop() const { return stop_; }    ///< [SI]
  int count() const;
  /// The axis, or nothing while an entry is invalid (own checks and conflicts set by the panel).
  std::optional<study::SweepAxis> axis() const;
  bool isValid() const { return axis().has_value(); }
  /// Why the entries are invalid (translated, one line per problem); empty when valid.
  QString problems() const;

  /// A problem the panel finds across inputs (the same input twice, too many points); empty clears it.
  void setInputConflict(const QString& message);
  void setCountConflict(const QString& message);

  QComboBox* inputBox() const { return inputBox_; }
  QLineEdit* startEdit() const { return startEdit_; }
  QLineEdit* stopEdit() const { return stopEdit_; }
  QSpinBox* countBox() const { return countBox_; }
  QLabel* errorLabel() const { return error_; }

  /// Labels and numbers in the current language and unit system.
  void retranslateUi();

 signals:
  void changed();

 protected:
  void changeEvent(QEvent* event) override;

 private:
  void inputChosen(int index);
  /// The range typed for this input, else its default range (practitionerRange, else +/-50 %).
  void applyDefaultRange();
  /// Keeps a valid typed range in the settings, per input, for the next start.
  void keepTypedRange();
  void textEdited();
  void validate();
  void writeRange();

  DisplayUnits& units_;
  engine::Case case_;
  QComboBox* inputBox_;  // before choice_, which works on it
  StudyInputChoice choice_;
  double start_ = 0.0, stop_ = 0.0;
  bool startOk_ = true, stopOk_ = true;
  bool userRange_ = false;  ///< the user typed a range: it no longer follows the case
  QString startText_, stopText_;
  QStringList ownProblems_;
  QString inputConflict_, countConflict_;

  QLineEdit* startEdit_ = nullptr;
  QLineEdit* stopEdit_ = nullptr;
  QSpinBox* countBox_ = nullptr;
  QLabel* fromLabel_ = nullptr;
  QLabel* toLabel_ = nullptr;
  QLabel* countLabel_ = nullptr;
  QLabel* error_ = nullptr;
};

/// The red of a message under an invalid field, readable on the palette (light or dark).
QColor studyErrorColour(const QPalette& palette);
/// A value as typed, with its unit: "0.5", "2600 K".
QString typedWithUnit(double si, Quantity quantity, const DisplayUnits& units);

}  // namespace cw::gui
