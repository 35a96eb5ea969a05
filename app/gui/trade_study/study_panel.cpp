#include "trade_study/study_panel.h"

#include "document/case_document.h"
#include "document/units.h"
#include "trade_study/study_axis_editor.h"
#include "trade_study/study_change_editor.h"
#include "trade_study/study_inputs.h"
#include "trade_study/study_names.h"
#include "trade_study/study_table_model.h"

#include "io/atomic_file.h"
#include "io/case_file.h"
#include "study/study_columns.h"
#include "study/study_export.h"

#include <QCheckBox>
#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QScrollArea>
#include <QSignalBlocker>
#include <QSplitter>
#include <QTableView>
#include <QVBoxLayout>

#include <algorithm>
#include <exception>
#include <map>

namespace cw::gui {

namespace {

QLabel* errorStyled(QLabel* label) {
  QPalette palette = label->palette();
  palette.setColor(QPalette::WindowText, studyErrorColour(palette));
  label->setPalette(palette);
  return label;
}

}  // namespace

TradeStudyPanel::TradeStudyPanel(CaseDocument& document, DisplayUnits& units, QWidget* parent)
    : QWidget(parent), document_(document), units_(units) {
  setObjectName("tradeStudyPanel");
  runner_ = new StudyRunner(this);

  // --- the controls ---------------------------------------------------------------------------
  auto* controls = new QWidget;
  controls->setObjectName("studyControls");
  auto* form = form_ = new QVBoxLayout(controls);
  form->setContentsMargins(2, 2, 6, 2);
  form->setSpacing(4);
  varyLabel_ = new QLabel(controls);
  first_ = new StudyAxisEditor(QStringLiteral("studyAxis1"), 21, units_, controls);
  carpet_ = new QCheckBox(controls);
  carpet_->setObjectName("studyCarpet");
  carpet_->setChecked(true);
  second_ = new StudyAxisEditor(QStringLiteral("studyAxis2"), 6, units_, controls);
  audit_ = new QCheckBox(controls);
  audit_->setObjectName("studyAudit");
  compareLabel_ = new QLabel(controls);
  compare_ = new QComboBox(controls);
  compare_->setObjectName("studyCompare");
  for (int i = 0; i < 3; ++i) compare_->addItem(QString());
  compare_->setItemData(0, QStringLiteral("none"));
  compare_->setItemData(1, QStringLiteral("ideal"));
  compare_->setItemData(2, QStringLiteral("changed"));
  compareLabel_->setBuddy(compare_);
  change_ = new StudyChangeEditor(units_, controls);
  change_->setEnabled(false);
  runButton_ = new QPushButton(controls);
  runButton_->setObjectName("studyRun");
  runButton_->setDefault(true);
  cancelButton_ = new QPushButton(controls);
  cancelButton_->setObjectName("studyCancel");
  cancelButton_->setEnabled(false);
  progress_ = new QProgressBar(controls);
  progress_->setObjectName("studyProgress");
  progress_->setRange(0, 1);
  progress_->setValue(0);
  progress_->setTextVisible(true);
  status_ = new QLabel(controls);
  status_->setObjectName("studyStatus");
  status_->setWordWrap(true);

  form->addWidget(varyLabel_);
  form->addWidget(first_);
  form->addWidget(carpet_);
  form->addWidget(second_);
  form->addWidget(audit_);
  auto* compareRow = new QHBoxLayout;
  compareRow->addWidget(compareLabel_);
  compareRow->addWidget(compare_, 1);
  form->addLayout(compareRow);
  form->addWidget(change_);
  form->addWidget(status_);
  form->addStretch(1);
  controlsArea_ = new QScrollArea;
  controlsArea_->setWidget(controls);
  controlsArea_->setWidgetResizable(true);
  controlsArea_->setFrameShape(QFrame::NoFrame);
  controlsArea_->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  controlsArea_->setMinimumWidth(controls->sizeHint().width() + 16);
  // Run, Cancel and the progress below the scrolled controls: always in sight, never cut off.
  controlsPane_ = new QWidget;
  controlsPane_->setObjectName("studyControlsPane");
  auto* pane = new QVBoxLayout(controlsPane_);
  pane->setContentsMargins(0, 0, 0, 0);
  pane->setSpacing(2);
  pane->addWidget(controlsArea_, 1);
  auto* runRow = new QHBoxLayout;
  runRow->setContentsMargins(2, 0, 6, 2);
  runRow->addWidget(runButton_);
  runRow->addWidget(cancelButton_);
  runRow->addWidget(progress_, 1);
  pane->addLayout(runRow);

  // --- the chart, its plot choice and its note ------------------------------------------------
  auto* chartBox = chartBox_ = new QWidget;
  auto* chartLayout = chartLayout_ = new QVBoxLayout(chartBox);
  chartLayout->setContentsMargins(0, 0, 0, 0);
  chartLayout->setSpacing(2);
  plotRow_ = new QWidget(chartBox);
  auto* plotRow = new QHBoxLayout(plotRow_);
  plotRow->setContentsMargins(0, 0, 0, 0);
  plotLabel_ = new QLabel(plotRow_);
  plot_ = new QComboBox(plotRow_);
  plot_->setObjectName("studyPlot");
  plot_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
  plot_->setMinimumContentsLength(20);
  plotLabel_->setBuddy(plot_);
  plotRow->addWidget(plotLabel_);
  plotRow->addWidget(plot_, 1);
  chartLayout->addWidget(plotRow_);
  chart_ = new StudyChart(units_, chartBox);
  chart_->setMinimumHeight(200);
  chartLayout->addWidget(chart_, 1);
  note_ = new QLabel(chartBox);
  note_->setObjectName("studyNote");
  note_->setWordWrap(true);
  chartLayout->addWidget(note_);

  model_ = new StudyTableModel(units_, this);
  table_ = new QTableView;
  table_->setObjectName("studyTable");
  table_->setModel(model_);
  table_->verticalHeader()->hide();
  table_->horizontalHeader()->setSectionResizeMode(QHeaderView::Interactive);
  table_->horizontalHeader()->setStretchLastSection(true);
  table_->setAlternatingRowColors(true);
  table_->setSelectionBehavior(QAbstractItemView::SelectRows);
  table_->verticalHeader()->setDefaultSectionSize(QFontMetrics(table_->font()).height() + 6);
  // Every column as wide as its header and values whenever the columns change (before the first
  // study too), so that no header is clipped; the user may resize them after.
  connect(model_, &QAbstractItemModel::modelReset, table_, &QTableView::resizeColumnsToContents);
  connect(model_, &QAbstractItemModel::headerDataChanged, table_, &QTableView::resizeColumnsToContents);
  connect(model_, &QAbstractItemModel::layoutChanged, table_, &QTableView::resizeColumnsToContents);
  table_->resizeColumnsToContents();

  split_ = new QSplitter(Qt::Horizontal, this);
  split_->setObjectName("studySplitter");
  split_->setChildrenCollapsible(false);
  setSideBySide(true);
  auto* layout = new QVBoxLayout(this);
  layout->setContentsMargins(4, 4, 4, 4);
  layout->addWidget(split_);

  // --- wiring ---------------------------------------------------------------------------------
  connect(first_, &StudyAxisEditor::changed, this, &TradeStudyPanel::controlsChanged);
  connect(second_, &StudyAxisEditor::changed, this, &TradeStudyPanel::controlsChanged);
  connect(change_, &StudyChangeEditor::changed, this, [this] {
    controlsChanged();
    updateOverlay();
  });
  connect(carpet_, &QCheckBox::toggled, this, [this](bool on) {
    second_->setEnabled(on);
    if (!study_) fillPlotBox();
    controlsChanged();
  });
  connect(audit_, &QCheckBox::toggled, this, [this] {
    if (!study_) fillPlotBox();
    controlsChanged();
  });
  connect(compare_, &QComboBox::currentIndexChanged, this, [this](int index) {
    change_->setEnabled(index == 2);
    controlsChanged();
    updateOverlay();
  });
  connect(plot_, &QComboBox::activated, this,
          [this](int index) { setPlotColumn(plot_->itemData(index).toString().toStdString()); });
  connect(runButton_, &QPushButton::clicked, this, [this] { run(); });
  connect(cancelButton_, &QPushButton::clicked, this, &TradeStudyPanel::cancel);
  connect(runner_, &StudyRunner::progress, this, [this](qint64 done, qint64 total) {
    progress_->setRange(0, static_cast<int>(std::min<qint64>(total, 1 << 30)));
    progress_->setValue(static_cast<int>(std::min(done, total)));
  });
  connect(runner_, &StudyRunner::finished, this, &TradeStudyPanel::finished);
  connect(&document_, &CaseDocument::caseChanged, this, &TradeStudyPanel::caseChanged);
  connect(&units_, &DisplayUnits::changed, this, &TradeStudyPanel::retranslateUi);

  retranslateUi();
  caseChanged();
}

TradeStudyPanel::~TradeStudyPanel() = default;  // the runner stops and joins its thread

void TradeStudyPanel::retranslateUi() {
  varyLabel_->setText(tr("Vary:"));
  carpet_->setText(tr("And a second input (a carpet):"));
  carpet_->setToolTip(tr("Vary two inputs: every value of the first with every value of the second"));
  audit_->setText(tr("Loss audit at every point"));
  audit_->setToolTip(
      tr("Add each point's one-at-a-time loss audit (its outputs can then be plotted); slower"));
  compareLabel_->setText(tr("Compare with:"));
  compare_->setItemText(0, tr("Nothing"));
  compare_->setItemText(1, tr("Ideal twin (the same points without losses)"));
  compare_->setItemText(2, tr("One input set differently:"));
  runButton_->setText(tr("&Run"));
  runButton_->setToolTip(tr("Run the study in the background (a running one is cancelled)"));
  cancelButton_->setText(tr("Cancel"));
  cancelButton_->setToolTip(tr("Stop the running study; the points run so far are shown"));
  plotLabel_->setText(tr("Plot:"));
  fillPlotBox();
  updateNote();
  validateControls();
}

// ---------------------------------------------------------------------------------------------
// Controls

void TradeStudyPanel::caseChanged() {
  const engine::Case& c = document_.currentCase();
  first_->setCase(c);
  second_->setCase(c);
  change_->setCase(c);
  updateStale();
  validateControls();
}

std::vector<study::SweepAxis> TradeStudyPanel::editedAxes() const {
  std::vector<study::SweepAxis> axes;
  const std::optional<study::SweepAxis> first = first_->axis();
  if (!first) return {};
  axes.push_back(*first);
  if (!carpet_->isChecked()) return axes;
  const std::optional<study::SweepAxis> second = second_->axis();
  if (!second) return {};
  axes.push_back(*second);
  return axes;
}

bool TradeStudyPanel::studyIsStale() const {
  // The case changed since the study ran, or the inputs' ranges and counts were edited.
  return study_ && (comparable(io::caseToJson(document_.currentCase())) != studiedDocument_ ||
                    editedAxes() != study_->axes);
}

void TradeStudyPanel::updateStale() {
  const bool stale = studyIsStale();
  if (!study_ || stale == stale_) return;
  stale_ = stale;
  chart_->setStale(stale_);
  model_->setStale(stale_);
}

void TradeStudyPanel::controlsChanged() {
  validateControls();
  updateStale();
  emit setupChanged();
}

void TradeStudyPanel::validateControls() {
  const bool carpet = carpet_->isChecked();
  second_->setInputConflict(carpet && second_->path() == first_->path()
                                ? tr("The second input must differ from the first.")
                                : QString());
  const long points = static_cast<long>(first_->count()) * (carpet ? second_->count() : 1);
  second_->setCountConflict(carpet && points > study::kMaxStudyPoints
                                ? tr("%1 × %2 = %3 points is more than a study may have (%4).")
                                      .arg(first_->count())
                                      .arg(second_->count())
                                      .arg(points)
                                      .arg(study::kMaxStudyPoints)
                                : QString());
  const bool changed = compare_->currentIndex() == 2;
  const bool clash =
      changed && (change_->path() == first_->path() || (carpet && change_->path() == second_->path()));
  change_->setConflict(clash ? tr("This input is varied by the study; choose another one to set differently.")
                             : QString());
  QStringList problems;
  if (!first_->isValid()) problems << first_->problems();
  if (carpet && !second_->isValid()) problems << second_->problems();
  if (changed && !change_->assignment()) problems << change_->problems();
  runButton_->setEnabled(problems.isEmpty());
  runButton_->setToolTip(problems.isEmpty()
                             ? tr("Run the study in the background (a running one is cancelled)")
                             : tr("Cannot run:\n%1").arg(problems.join(QLatin1Char('\n'))));
}

bool TradeStudyPanel::setAxes(const std::vector<study::SweepAxis>& axes) {
  if (axes.empty() || axes.size() > 2) return false;
  carpet_->setChecked(axes.size() == 2);
  StudyAxisEditor* editors[] = {first_, second_};
  for (std::size_t k = 0; k < axes.size(); ++k) {
    if (!editors[k]->setPath(axes[k].path)) return false;
    editors[k]->setRange(axes[k].start, axes[k].stop, axes[k].count);
  }
  validateControls();
  return true;
}

void TradeStudyPanel::setComparison(StudyOverlay overlay) {
  compare_->setCurrentIndex(overlay == StudyOverlay::None ? 0 : overlay == StudyOverlay::IdealTwin ? 1 : 2);
}

bool TradeStudyPanel::setChangedInput(const std::string& path, double value) {
  if (!change_->setPath(path)) return false;
  change_->setValue(value);
  setComparison(StudyOverlay::OneInputChanged);
  return true;
}

StudySetup TradeStudyPanel::setup() const {
  StudySetup s;
  s.firstInput = QString::fromStdString(first_->path());
  s.firstCount = first_->count();
  s.carpet = carpet_->isChecked();
  s.secondInput = QString::fromStdString(second_->path());
  s.secondCount = second_->count();
  s.audit = audit_->isChecked();
  s.compare = compare_->currentData().toString();
  s.changedInput = QString::fromStdString(change_->path());
  s.plot = QString::fromStdString(plotColumn_);
  return s;
}

void TradeStudyPanel::applySetup(const StudySetup& s) {
  first_->setPath(s.firstInput.toStdString());
  first_->setCount(s.firstCount);
  second_->setPath(s.secondInput.toStdString());
  second_->setCount(s.secondCount);
  carpet_->setChecked(s.carpet);
  audit_->setChecked(s.audit);
  const int compare = compare_->findData(s.compare);
  compare_->setCurrentIndex(compare < 0 ? 0 : compare);
  if (!s.changedInput.isEmpty()) change_->setPath(s.changedInput.toStdString());
  plotColumn_ = s.plot.toStdString();
  fillPlotBox();
  validateControls();
}

void TradeStudyPanel::setSideBySide(bool sideBySide) {
  if (sideBySide) {
    // Low: the plot choice and the note go with the controls, the chart takes the whole height.
    form_->insertWidget(0, plotRow_);
    form_->insertWidget(form_->count() - 1, note_);  // before the stretch
    split_->setOrientation(Qt::Horizontal);
    split_->insertWidget(0, controlsPane_);
    split_->insertWidget(1, chartBox_);
    split_->insertWidget(2, table_);
    split_->setStretchFactor(0, 0);
    split_->setStretchFactor(1, 3);
    split_->setStretchFactor(2, 2);
    chart_->setMinimumHeight(40);  // low: it must not squeeze the cycle charts
    chart_->setCompact(true);
  } else {
    // In a dock: the chart, the controls and the results one above the other, each the dock's
    // whole width (beside the controls the table was a sliver on a laptop screen).
    chartLayout_->insertWidget(0, plotRow_);
    chartLayout_->addWidget(note_);
    split_->setOrientation(Qt::Vertical);
    split_->insertWidget(0, chartBox_);
    split_->insertWidget(1, controlsPane_);
    split_->insertWidget(2, table_);
    split_->setStretchFactor(0, 3);
    split_->setStretchFactor(1, 2);
    split_->setStretchFactor(2, 2);
    chart_->setMinimumHeight(220);
    chart_->setCompact(false);
  }
}

// ---------------------------------------------------------------------------------------------
// Running

nlohmann::json TradeStudyPanel::comparable(nlohmann::json document) {
  document.erase("title");
  document.erase("notes");
  return document;
}

std::array<StudyAxisName, 2> TradeStudyPanel::axisNames() const {
  std::array<StudyAxisName, 2> names{};
  const StudyAxisEditor* editors[] = {first_, second_};
  for (std::size_t k = 0; k < 2; ++k) {
    const StudyInput input = editors[k]->input();
    names[k] = {studyInputName(input), input.field ? input.field->quantity : Quantity::Dimensionless,
                studyInputShortName(input)};
  }
  return names;
}

bool TradeStudyPanel::run() {
  validateControls();
  if (!runButton_->isEnabled()) return false;
  StudyJob job;
  job.spec.document = io::caseToJson(document_.currentCase());
  job.spec.axes.push_back(*first_->axis());
  if (carpet_->isChecked()) job.spec.axes.push_back(*second_->axis());
  job.spec.withAudit = audit_->isChecked();
  pendingAssignment_.clear();
  pendingDescription_.clear();
  if (compare_->currentIndex() == 2) {
    study::TradeStudySpec changed = job.spec;
    try {
      io::applySetOverride(changed.document, *change_->assignment());
    } catch (const std::exception& e) {
      refusal_ = tr("The comparison cannot run: %1").arg(QString::fromStdString(e.what()));
      status_->setText(refusal_);
      errorStyled(status_);
      return false;
    }
    job.overlay = std::move(changed);
    pendingAssignment_ = *change_->assignment();
    pendingDescription_ = change_->description();
  }
  pendingSpec_ = job.spec;
  pendingNames_ = axisNames();
  refusal_.clear();
  status_->setPalette(palette());
  status_->setText(tr("Running…"));
  progress_->setRange(0, 1);
  progress_->setValue(0);
  cancelButton_->setEnabled(true);
  runner_->start(std::move(job));
  return true;
}

void TradeStudyPanel::cancel() {
  runner_->cancel();
}

bool TradeStudyPanel::isRunning() const {
  return runner_->isRunning();
}

QString TradeStudyPanel::outcomeError(const StudyOutcome& outcome) const {
  return outcome.failure ? failureText(*outcome.failure, units_) : QString::fromStdString(outcome.error);
}

void TradeStudyPanel::finished(const StudyOutcome& outcome) {
  cancelButton_->setEnabled(false);
  status_->setPalette(palette());
  status_->clear();
  if (!outcome.study) {
    refusal_ = tr("The study cannot run: %1").arg(outcomeError(outcome));
    status_->setText(refusal_);
    errorStyled(status_);
    progress_->setValue(0);
    emit studyFinished();
    return;
  }
  study_ = outcome.study;
  changed_ = outcome.overlay;
  studiedSpec_ = pendingSpec_;
  studiedDocument_ = comparable(studiedSpec_.document);
  studiedNames_ = pendingNames_;
  changedAssignment_ = outcome.overlay ? pendingAssignment_ : std::string();
  changedDescription_ = pendingDescription_;
  stale_ = studyIsStale();
  if (outcome.overlayFailed) {
    status_->setText(tr("The comparison cannot run: %1").arg(outcomeError(outcome)));
    errorStyled(status_);
  }
  // The bar says how far the study got: full, or the points run of a stopped one.
  const auto ran = static_cast<int>(study_->points.size() - study_->count(study::PointStatus::NotRun));
  if (study_->stopped) {
    progress_->setRange(0, static_cast<int>(study_->points.size()));
    progress_->setValue(ran);
  } else {
    progress_->setValue(progress_->maximum());
  }
  showStudy();
  emit studyFinished();
}

void TradeStudyPanel::showStudy() {
  fillPlotBox();
  model_->setStudy(study_, studiedNames_, stale_);
  chart_->setStudy(study_, studiedNames_, stale_);
  setPlotColumn(plotColumn_);
  updateOverlay();
  table_->resizeColumnsToContents();
}

bool TradeStudyPanel::setPlotColumn(const std::string& column) {
  const bool carpet = column.empty() && (study_ ? study_->axes.size() == 2 : carpet_->isChecked());
  const std::string shown = carpet ? std::string() : column.empty() ? "specific_thrust_N_s_per_kg" : column;
  const int index = plot_->findData(QString::fromStdString(shown));
  if (index < 0) return false;
  plotColumn_ = shown;
  plot_->setCurrentIndex(index);
  chart_->setPlot(carpet ? StudyPlot::Carpet : StudyPlot::Output, shown);
  model_->setExtraColumn(shown);
  updateNote();
  emit setupChanged();
  return true;
}

void TradeStudyPanel::fillPlotBox() {
  const QSignalBlocker blocker(plot_);
  const bool carpet = study_ ? study_->axes.size() == 2 : carpet_->isChecked();
  const bool withAudit = study_ ? study_->withAudit : audit_->isChecked();
  plot_->clear();
  if (carpet) plot_->addItem(tr("Carpet: specific thrust against TSFC"), QString());
  const engine::Architecture architecture =
      study_ ? study_->architecture : document_.currentCase().architecture;
  for (const study::StudyColumn& c : study::studyColumns(withAudit, architecture))
    plot_->addItem(studyColumnLabel(c), QString::fromStdString(c.name));
  int index = plot_->findData(QString::fromStdString(plotColumn_));
  if (index < 0) index = plot_->findData(QStringLiteral("specific_thrust_N_s_per_kg"));
  plot_->setCurrentIndex(index);
}

void TradeStudyPanel::updateOverlay() {
  const int kind = compare_->currentIndex();
  if (kind == 0) {
    chart_->setOverlay(StudyOverlay::None);
  } else if (kind == 1) {
    chart_->setOverlay(StudyOverlay::IdealTwin);
  } else {
    // The comparison study is shown while it matches the input set differently now.
    const auto asked = change_->assignment();
    const bool current = changed_ && asked && *asked == changedAssignment_;
    chart_->setOverlay(StudyOverlay::OneInputChanged, current ? changed_ : nullptr, changedDescription_);
  }
  updateNote();
}

void TradeStudyPanel::updateNote() {
  if (!note_) return;
  if (!study_) {
    note_->setText(tr("Choose one input to vary (a sweep) or two (a carpet) and press Run."));
    note_->setToolTip(QString());
    return;
  }
  const std::size_t total = study_->points.size();
  const std::size_t ran = total - study_->count(study::PointStatus::NotRun);
  const std::size_t without = ran - study_->count(study::PointStatus::Solved);
  QStringList parts;
  if (study_->stopped) parts << tr("Stopped after %1 of %2 points.").arg(ran).arg(total);
  if (without == 0)
    parts << tr("Every point run has a cycle (%1 points).").arg(ran);
  else
    parts << tr("%1 of %2 points have no cycle: they leave gaps in the lines; the table gives each reason.")
                 .arg(without)
                 .arg(ran);
  if (changed_ && compare_->currentIndex() == 2) {
    const std::size_t changedRan = changed_->points.size() - changed_->count(study::PointStatus::NotRun);
    const std::size_t changedWithout = changedRan - changed_->count(study::PointStatus::Solved);
    if (changedWithout > 0)
      parts << tr("Comparison: %1 of %2 points have no cycle.").arg(changedWithout).arg(changedRan);
  }
  if (!chart_->overlayNote().isEmpty()) parts << chart_->overlayNote();
  note_->setText(parts.join(QLatin1Char(' ')));
  // The reasons, each once with how many points give it.
  std::map<std::string, int> reasons;
  for (const study::StudyPoint& p : study_->points)
    if (!p.solved() && p.status != study::PointStatus::NotRun) ++reasons[p.reason];
  QStringList lines;
  for (const auto& [reason, n] : reasons) {
    if (lines.size() == 8) {
      lines << tr("… and %1 other reasons").arg(reasons.size() - 8);
      break;
    }
    lines << tr("%1 × %2").arg(n).arg(QString::fromStdString(reason));
  }
  note_->setToolTip(lines.join(QLatin1Char('\n')));
}

// ---------------------------------------------------------------------------------------------
// Exports

bool TradeStudyPanel::exportCsv(const QString& path, QString* error) const {
  if (!study_) return false;
  try {
    io::writeFileAtomically(
        path.toStdString(),
        study::studyToCsv(*study_, study::studyColumns(study_->withAudit, study_->architecture)));
  } catch (const std::exception& e) {
    if (error) *error = QString::fromStdString(e.what());
    return false;
  }
  return true;
}

bool TradeStudyPanel::exportJson(const QString& path, QString* error) const {
  if (!study_) return false;
  try {
    io::writeFileAtomically(
        path.toStdString(),
        study::studyToJson(*study_, study::studyColumns(study_->withAudit, study_->architecture)).dump(2) +
            "\n");
  } catch (const std::exception& e) {
    if (error) *error = QString::fromStdString(e.what());
    return false;
  }
  return true;
}

QString TradeStudyPanel::tableAsTabSeparated() const {
  return study_ ? model_->toTabSeparated() : QString();
}

}  // namespace cw::gui
