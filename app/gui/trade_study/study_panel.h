#pragma once
// The trade-study panel: vary one input of the open case (a sweep) or two (a carpet), run the
// core's trade study (core/study/trade_study.h) in the background, and show it as a chart
// (StudyChart) over a table of its points (StudyTableModel).
//
// Controls: the inputs with their ranges (StudyAxisEditor), the loss audit per point, the
// comparison ("none", the study's own ideal twin, or a second study with one input set
// differently: StudyChangeEditor), Run, Cancel and a progress bar. Run is disabled while an entry
// is invalid. A study runs on a StudyRunner thread; its progress comes back as queued calls.
// Cancel stops it: the points run so far are shown, with "stopped after N of M points". A new
// Run cancels a running study. The study shown is kept when the case changes, marked stale
// until Run redoes it. Exports: the chart (charts/chart_export.h), the data as CSV or JSON
// (io/study_export.h, written atomically) and the table as tab-separated text.

#include "document/settings.h"
#include "trade_study/study_chart.h"
#include "trade_study/study_runner.h"

#include "study/trade_study.h"

#include <nlohmann/json.hpp>

#include <QWidget>

#include <memory>
#include <optional>
#include <string>
#include <vector>

class QCheckBox;
class QComboBox;
class QLabel;
class QProgressBar;
class QPushButton;
class QScrollArea;
class QSplitter;
class QTableView;
class QVBoxLayout;

namespace cw::gui {

class CaseDocument;
class DisplayUnits;
class StudyAxisEditor;
class StudyChangeEditor;
class StudyTableModel;

class TradeStudyPanel : public QWidget {
  Q_OBJECT

 public:
  TradeStudyPanel(CaseDocument& document, DisplayUnits& units, QWidget* parent = nullptr);
  ~TradeStudyPanel() override;

  /// Runs the study the controls describe (cancelling a running one). False, with the reason in
  /// the status line, when an entry is invalid or the core refuses the spec before any point.
  bool run();
  /// Asks a running study to stop; its points so far are shown when it has stopped.
  void cancel();
  bool isRunning() const;

  /// The study shown (null before the first), and the comparison study of one input set differently.
  std::shared_ptr<const study::TradeStudy> study() const { return study_; }
  std::shared_ptr<const study::TradeStudy> changedStudy() const { return changed_; }
  /// The spec the shown study ran (the same one the core got).
  const study::TradeStudySpec& studiedSpec() const { return studiedSpec_; }
  /// The chart and table show a study of another case, or of other ranges than the ones entered.
  bool isStale() const { return stale_; }

  /// Sets the controls from a list of axes (one or two, as the command line's --vary gives them).
  /// False when an axis's input is not one the case offers.
  bool setAxes(const std::vector<study::SweepAxis>& axes);
  void setComparison(StudyOverlay overlay);
  /// The input set differently and its value [SI] (chooses the "one input set differently" comparison).
  bool setChangedInput(const std::string& path, double value);
  /// Plots the carpet (an empty name) or a study column against the first input.
  bool setPlotColumn(const std::string& column);

  StudySetup setup() const;
  void applySetup(const StudySetup& setup);

  /// Controls, chart and table side by side (a wide, low place: the bottom tabs), or the chart
  /// over the controls and the table (a dock).
  void setSideBySide(bool sideBySide);

  // Exports without dialogs. False when there is no study or the file cannot be written.
  bool exportCsv(const QString& path, QString* error = nullptr) const;
  bool exportJson(const QString& path, QString* error = nullptr) const;
  /// The table as tab-separated text (the caution first); empty when there is no study.
  QString tableAsTabSeparated() const;

  // For tests and the main window.
  StudyChart* chart() const { return chart_; }
  StudyTableModel* model() const { return model_; }
  StudyAxisEditor* firstAxis() const { return first_; }
  StudyAxisEditor* secondAxis() const { return second_; }
  StudyChangeEditor* changeEditor() const { return change_; }
  QCheckBox* carpetBox() const { return carpet_; }
  QCheckBox* auditBox() const { return audit_; }
  QComboBox* compareBox() const { return compare_; }
  QComboBox* plotBox() const { return plot_; }
  QPushButton* runButton() const { return runButton_; }
  QPushButton* cancelButton() const { return cancelButton_; }
  QProgressBar* progressBar() const { return progress_; }
  /// The line under the chart: points without a cycle, a stopped study, why a study cannot run.
  QLabel* noteLabel() const { return note_; }

  void retranslateUi();

 signals:
  /// A study (or its refusal) came back from the runner.
  void studyFinished();
  /// A choice kept in the settings changed.
  void setupChanged();

 private:
  /// The axes as entered (empty while an entry is invalid).
  std::vector<study::SweepAxis> editedAxes() const;
  bool studyIsStale() const;
  /// Marks the chart and table stale when the case or the entered axes differ from the study's.
  void updateStale();
  void caseChanged();
  void controlsChanged();
  void validateControls();
  void finished(const StudyOutcome& outcome);
  /// Why a study or its comparison was refused: the core's failure written by failureText.
  QString outcomeError(const StudyOutcome& outcome) const;
  void showStudy();
  void updateOverlay();
  void updateNote();
  void fillPlotBox();
  std::array<StudyAxisName, 2> axisNames() const;
  static nlohmann::json comparable(nlohmann::json document);

  CaseDocument& document_;
  DisplayUnits& units_;
  StudyRunner* runner_ = nullptr;

  StudyAxisEditor* first_ = nullptr;
  StudyAxisEditor* second_ = nullptr;
  StudyChangeEditor* change_ = nullptr;
  QCheckBox* carpet_ = nullptr;
  QCheckBox* audit_ = nullptr;
  QComboBox* compare_ = nullptr;
  QComboBox* plot_ = nullptr;
  QPushButton* runButton_ = nullptr;
  QPushButton* cancelButton_ = nullptr;
  QProgressBar* progress_ = nullptr;
  QLabel* varyLabel_ = nullptr;
  QLabel* compareLabel_ = nullptr;
  QLabel* plotLabel_ = nullptr;
  QLabel* status_ = nullptr;  ///< under the Run button: running, refused
  QLabel* note_ = nullptr;    ///< under the chart
  StudyChart* chart_ = nullptr;
  StudyTableModel* model_ = nullptr;
  QTableView* table_ = nullptr;
  QSplitter* split_ = nullptr;  ///< controls, chart, table side by side; or one above the other
  QWidget* chartBox_ = nullptr;
  QVBoxLayout* chartLayout_ = nullptr;  ///< the chart and, stacked, the plot choice and the note
  QVBoxLayout* form_ = nullptr;         ///< the controls and, side by side, the plot choice and the note
  QWidget* plotRow_ = nullptr;
  QScrollArea* controlsArea_ = nullptr;
  QWidget* controlsPane_ = nullptr;  ///< the scrolled controls above the Run row

  // The study shown and what it ran on.
  std::shared_ptr<const study::TradeStudy> study_;
  std::shared_ptr<const study::TradeStudy> changed_;
  study::TradeStudySpec studiedSpec_;
  nlohmann::json studiedDocument_;  ///< the case's document without title and notes
  std::array<StudyAxisName, 2> studiedNames_{};
  std::string changedAssignment_;  ///< of changed_
  QString changedDescription_;
  QString refusal_;  ///< why the last Run was refused (translated); empty if none
  bool stale_ = false;

  // The study running.
  study::TradeStudySpec pendingSpec_;
  std::array<StudyAxisName, 2> pendingNames_{};
  std::string pendingAssignment_;
  QString pendingDescription_;
  std::string plotColumn_;  ///< empty for the carpet
};

}  // namespace cw::gui
