#include "window_actions.h"

#include "main_window.h"
#include "window_exports.h"
#include "window_files.h"

#include "audit/audit_chart.h"
#include "audit/audit_panel.h"
#include "charts/cycle_chart.h"
#include "document/case_document.h"
#include "trade_study/study_chart.h"
#include "trade_study/study_panel.h"

#include "engine/parameter_registry.h"

#include <QAction>
#include <QActionGroup>
#include <QFileInfo>
#include <QMenuBar>
#include <QToolBar>
#include <QUndoStack>

#include <functional>

namespace cw::gui {

WindowActions::WindowActions(MainWindow& window) : QObject(&window), window_(window) {
  createFileActions();
  createEditActions();
  createViewActions();
  createFileMenu();
  createEditMenu();
  createViewMenu();
  QMenu* helpMenu = window_.menuBar()->addMenu(tr("&Help"));
  helpMenu->setObjectName("helpMenu");
  helpMenu->addAction(about_);
}

QAction* WindowActions::make(const QString& text, const char* name) {
  auto* action = new QAction(text, &window_);
  action->setObjectName(QString::fromLatin1(name));
  return action;
}

void WindowActions::createFileActions() {
  WindowFiles& files = window_.files();
  // File › New: one action per architecture of the registry (engine.architecture); the first,
  // the single-spool turbojet, is the toolbar's New and has the standard shortcut.
  const engine::Parameter& architecture = *engine::findParameter("engine", "architecture");
  for (std::size_t i = 0; i < architecture.choices.size(); ++i) {
    const auto which = static_cast<engine::Architecture>(i);
    QAction* action = make(WindowFiles::architectureText(which), i == 0 ? "newAction" : "newTwoSpoolAction");
    action->setData(QString::fromLatin1(architecture.choices[i].value.data()));
    connect(action, &QAction::triggered, &files, [&files, which] { files.newCase(which); });
    newArchitecture_.push_back(action);
  }
  newCase_ = newArchitecture_.front();
  newCase_->setShortcut(QKeySequence::New);
  newCase_->setIconText(tr("New"));
  newCase_->setToolTip(tr("New turbojet case"));
  open_ = make(tr("&Open…"), "openAction");
  open_->setShortcut(QKeySequence::Open);
  connect(open_, &QAction::triggered, &files, &WindowFiles::open);
  save_ = make(tr("&Save"), "saveAction");
  save_->setShortcut(QKeySequence::Save);
  connect(save_, &QAction::triggered, &files, &WindowFiles::save);
  saveAs_ = make(tr("Save &As…"), "saveAsAction");
  saveAs_->setShortcut(QKeySequence::SaveAs);
  connect(saveAs_, &QAction::triggered, &files, &WindowFiles::saveAs);
  preferences_ = make(tr("&Preferences…"), "preferencesAction");
  preferences_->setShortcut(QKeySequence::Preferences);
  connect(preferences_, &QAction::triggered, &window_, &MainWindow::showPreferences);
  quit_ = make(tr("&Quit"), "quitAction");
  quit_->setShortcut(QKeySequence::Quit);
  connect(quit_, &QAction::triggered, &window_, &QWidget::close);
  about_ = make(tr("&About Cyclewright"), "aboutAction");
  connect(about_, &QAction::triggered, &window_, &MainWindow::showAbout);
}

void WindowActions::createEditActions() {
  QUndoStack* stack = window_.document().undoStack();
  undo_ = stack->createUndoAction(&window_, tr("&Undo"));
  undo_->setObjectName("undoAction");
  undo_->setShortcut(QKeySequence::Undo);
  redo_ = stack->createRedoAction(&window_, tr("&Redo"));
  redo_->setObjectName("redoAction");
  redo_->setShortcut(QKeySequence::Redo);

  WindowExports& exports = window_.exports();
  copyTs_ = make(tr("Copy &Temperature–Entropy Chart"), "copyTsAction");
  connect(copyTs_, &QAction::triggered, this,
          [this] { window_.exports().copyChart(window_.temperatureEntropyChart()); });
  copyPv_ = make(tr("Copy &Pressure–Volume Chart"), "copyPvAction");
  connect(copyPv_, &QAction::triggered, this,
          [this] { window_.exports().copyChart(window_.pressureVolumeChart()); });
  copyTable_ = make(tr("Copy Station &Table"), "copyTableAction");
  connect(copyTable_, &QAction::triggered, &exports, &WindowExports::copyStationTable);
  copyPerformance_ = make(tr("Copy &Performance Table"), "copyPerformanceAction");
  connect(copyPerformance_, &QAction::triggered, &exports, &WindowExports::copyPerformanceTable);
  pinBaseline_ = make(tr("&Pin as Baseline"), "pinBaselineAction");
  pinBaseline_->setToolTip(tr("Keep the shown result as the baseline the tables compare against"));
  connect(pinBaseline_, &QAction::triggered, &window_, &MainWindow::pinBaseline);
  clearBaseline_ = make(tr("&Clear Baseline"), "clearBaselineAction");
  clearBaseline_->setEnabled(false);  // until there is a baseline
  connect(clearBaseline_, &QAction::triggered, this, [this] { window_.document().clearBaseline(); });
  openBaseline_ = make(tr("Open &Baseline…"), "openBaselineAction");
  connect(openBaseline_, &QAction::triggered, &window_.files(), &WindowFiles::chooseBaseline);
  copyStudyTable_ = make(tr("Copy Trade &Study Table"), "copyStudyTableAction");
  connect(copyStudyTable_, &QAction::triggered, &exports, &WindowExports::copyStudyTable);
}

void WindowActions::createViewActions() {
  resetZoom_ = make(tr("&Reset Zoom"), "resetZoomAction");
  resetZoom_->setShortcut(Qt::CTRL | Qt::Key_0);
  resetZoom_->setToolTip(tr("Show the whole cycle on both charts"));
  connect(resetZoom_, &QAction::triggered, this, [this] {
    window_.temperatureEntropyChart()->resetZoom();
    window_.pressureVolumeChart()->resetZoom();
    window_.enthalpyEntropyChart()->resetZoom();
  });
  logAxes_ = make(tr("&Logarithmic Pressure–Volume Axes"), "logAxesAction");
  logAxes_->setCheckable(true);
  logAxes_->setIconText(tr("Log p–v"));
  connect(logAxes_, &QAction::toggled, &window_, &MainWindow::setPressureVolumeLogAxes);

  layoutGroup_ = new QActionGroup(this);
  sideBySide_ = make(tr("Charts &Side by Side"), "sideBySideAction");
  sideBySide_->setIconText(tr("Side by Side"));
  tabbed_ = make(tr("Charts in &Tabs"), "tabbedAction");
  tabbed_->setIconText(tr("Tabs"));
  for (QAction* action : {sideBySide_, tabbed_}) {
    action->setCheckable(true);
    layoutGroup_->addAction(action);
  }
  connect(sideBySide_, &QAction::triggered, this,
          [this] { window_.setChartLayout(ChartLayout::SideBySide); });
  connect(tabbed_, &QAction::triggered, this, [this] { window_.setChartLayout(ChartLayout::Tabbed); });
}

void WindowActions::createFileMenu() {
  QMenu* fileMenu = window_.menuBar()->addMenu(tr("&File"));
  fileMenu->setObjectName("fileMenu");
  QMenu* newMenu = fileMenu->addMenu(tr("&New"));
  newMenu->setObjectName("newMenu");
  for (QAction* action : newArchitecture_) newMenu->addAction(action);
  fileMenu->addAction(open_);
  recentMenu_ = fileMenu->addMenu(tr("Open &Recent"));
  recentMenu_->setObjectName("recentMenu");
  connect(recentMenu_, &QMenu::aboutToShow, this, &WindowActions::updateRecentMenu);
  fileMenu->addAction(save_);
  fileMenu->addAction(saveAs_);
  fileMenu->addSeparator();
  fileMenu->addAction(openBaseline_);
  fileMenu->addSeparator();
  createExportMenu(fileMenu);
  fileMenu->addSeparator();
  fileMenu->addAction(preferences_);
  fileMenu->addSeparator();
  fileMenu->addAction(quit_);
}

void WindowActions::createExportMenu(QMenu* fileMenu) {
  QMenu* exportMenu = fileMenu->addMenu(tr("&Export"));
  exportMenu->setObjectName("exportMenu");
  const std::pair<QString, QString> formats[] = {
      {"png", tr("PNG Image…")}, {"svg", tr("SVG Drawing…")}, {"pdf", tr("PDF Document…")}};
  // Each chart in each format; the chart is looked up when chosen (the panels may move).
  const std::pair<QString, std::function<QwtPlot*()>> charts[] = {
      {tr("Temperature–Entropy Chart as %1"),
       [this]() -> QwtPlot* { return window_.temperatureEntropyChart(); }},
      {tr("Pressure–Volume Chart as %1"), [this]() -> QwtPlot* { return window_.pressureVolumeChart(); }},
      {tr("Enthalpy–Entropy Chart as %1"), [this]() -> QwtPlot* { return window_.enthalpyEntropyChart(); }},
      {tr("Loss Audit Chart as %1"), [this]() -> QwtPlot* { return window_.auditPanel()->chart(); }},
      {tr("Trade Study Chart as %1"), [this]() -> QwtPlot* { return window_.tradeStudyPanel()->chart(); }}};
  const QString baseNames[] = {QStringLiteral("temperature-entropy"), QStringLiteral("pressure-volume"),
                               QStringLiteral("enthalpy-entropy"), QStringLiteral("loss-audit"),
                               QStringLiteral("trade-study")};
  for (std::size_t c = 0; c < std::size(charts); ++c) {
    for (const auto& [format, text] : formats) {
      const QString f = format, base = baseNames[c];
      const auto chart = charts[c].second;
      exportMenu->addAction(charts[c].first.arg(text), this,
                            [this, f, base, chart] { window_.exports().chart(chart(), base, f); });
    }
  }
  WindowExports& exports = window_.exports();
  exportMenu->addSeparator();
  exportMenu->addAction(tr("Station Table as CSV…"), &exports, &WindowExports::stationTable);
  exportMenu->addAction(tr("Results as JSON…"), &exports, &WindowExports::results);
  exportMenu->addAction(tr("Loss Audit Table as CSV…"), &exports, &WindowExports::auditTable);
  exportMenu->addAction(tr("Trade Study as CSV…"), &exports, [&exports] { exports.study(true); });
  exportMenu->addAction(tr("Trade Study as JSON…"), &exports, [&exports] { exports.study(false); });
}

void WindowActions::createEditMenu() {
  QMenu* editMenu = window_.menuBar()->addMenu(tr("&Edit"));
  editMenu->setObjectName("editMenu");
  editMenu->addAction(undo_);
  editMenu->addAction(redo_);
  editMenu->addSeparator();
  editMenu->addAction(copyTs_);
  editMenu->addAction(copyPv_);
  editMenu->addAction(copyTable_);
  editMenu->addAction(copyPerformance_);
  editMenu->addAction(copyStudyTable_);
  editMenu->addSeparator();
  editMenu->addAction(pinBaseline_);
  editMenu->addAction(clearBaseline_);
}

void WindowActions::createViewMenu() {
  viewMenu_ = window_.menuBar()->addMenu(tr("&View"));
  viewMenu_->setObjectName("viewMenu");
  viewMenu_->addAction(sideBySide_);
  viewMenu_->addAction(tabbed_);
  viewMenu_->addSeparator();
  viewMenu_->addAction(logAxes_);
  viewMenu_->addAction(resetZoom_);
}

void WindowActions::createToolBar() {
  QToolBar* bar = window_.addToolBar(tr("Main"));
  bar->setObjectName("mainToolBar");
  bar->setToolButtonStyle(Qt::ToolButtonTextOnly);
  bar->addAction(newCase_);
  bar->addAction(open_);
  bar->addAction(save_);
  bar->addSeparator();
  bar->addAction(undo_);
  bar->addAction(redo_);
  bar->addSeparator();
  bar->addAction(resetZoom_);
  bar->addAction(logAxes_);
  bar->addSeparator();
  bar->addAction(sideBySide_);
  bar->addAction(tabbed_);
  fixButtonWidths(bar);
}

void WindowActions::fixButtonWidths(QToolBar* bar) {
  // The undo stack renames its actions after every edit ("Undo Change Efficiency"): the buttons
  // say only "Undo" and "Redo" and the tooltip the whole text, and no button changes its width,
  // so that none of them moves under the pointer.
  undo_->setIconText(tr("Undo"));
  redo_->setIconText(tr("Redo"));
  for (QAction* action : bar->actions()) {
    QWidget* button = bar->widgetForAction(action);
    if (button && !action->isSeparator()) button->setFixedWidth(button->sizeHint().width());
  }
}

void WindowActions::updateRecentMenu() {
  recentMenu_->clear();
  const QStringList files = window_.files().recentFiles();
  for (const QString& file : files) {
    QAction* action = recentMenu_->addAction(QFileInfo(file).fileName(), this,
                                             [this, file] { window_.files().openRecent(file); });
    action->setToolTip(file);
  }
  if (files.isEmpty()) recentMenu_->addAction(tr("No recent files"))->setEnabled(false);
}

}  // namespace cw::gui
