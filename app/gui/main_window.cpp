#include "main_window.h"

#include "document/caution.h"

#include "charts/colours.h"

#include "audit/audit_chart.h"
#include "audit/audit_panel.h"
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"
#include "charts/path_series.h"
#include "common/error.h"
#include "common/version.h"
#include "dialogs/dialogs.h"
#include "document/autosave_store.h"
#include "document/autosave_timer.h"
#include "document/case_document.h"
#include "document/selection_router.h"
#include "document/units.h"
#include "engine/case_validation_error.h"
#include "forms/case_form.h"
#include "io/atomic_file.h"
#include "io/case_file.h"
#include "io/result_export.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"
#include "trade_study/study_panel.h"

#include <QAction>
#include <QActionGroup>
#include <QApplication>
#include <QClipboard>
#include <QCloseEvent>
#include <QComboBox>
#include <QDir>
#include <QDockWidget>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QGroupBox>
#include <QHeaderView>
#include <QKeySequence>
#include <QLabel>
#include <QListWidget>
#include <QMenuBar>
#include <QMessageBox>
#include <QSaveFile>
#include <QScrollArea>
#include <QSplitter>
#include <QStackedWidget>
#include <QStandardPaths>
#include <QStatusBar>
#include <QTabWidget>
#include <QTableView>
#include <QToolBar>
#include <QUndoStack>
#include <QVBoxLayout>

#include <fstream>

// The resources live in a static library; register them once before first use.
static void initialiseResources() {
  Q_INIT_RESOURCE(resources);
}

namespace cw::gui {

namespace {

/// The case at a path or a Qt resource; throws as io::readCaseFile does, naming the path.
engine::Case readCaseAt(const QString& path) {
  if (!path.startsWith(QLatin1Char(':')))
    return io::readCaseFile(QDir::toNativeSeparators(path).toStdString());
  QFile file(path);
  if (!file.open(QIODevice::ReadOnly))
    throw InvalidInput(path.toStdString(), "cannot read case file: " + file.errorString().toStdString());
  const QByteArray bytes = file.readAll();
  // The same checks as a file from disk (nesting, NUL, trailing text, every JSON-library error).
  return io::parseCaseText(std::string_view(bytes.constData(), static_cast<std::size_t>(bytes.size())),
                           path.toStdString());
}

/// Why a case cannot be opened: the core reader's message, naming the file first.
QString openFailureText(const QString& path, const std::exception& e) {
  const auto* invalid = dynamic_cast<const engine::CaseValidationError*>(&e);
  if (!invalid) return QString::fromStdString(e.what());
  QStringList lines;
  for (const auto& p : invalid->problems()) lines << QString::fromStdString(p.message);
  return path + QStringLiteral(": ") + lines.join(QLatin1Char('\n'));
}

/// Removes the temporaries interrupted atomic saves of a case file left beside it.
void removeStaleTemporariesOf(const QString& path) {
  if (path.isEmpty() || path.startsWith(QLatin1Char(':'))) return;
  const QFileInfo info(path);
  io::removeStaleTemporaries(info.absolutePath().toStdString(), info.fileName().toStdString());
}

}  // namespace

MainWindow::MainWindow(QWidget* parent) : QMainWindow(parent) {
  initialiseResources();
  setObjectName("mainWindow");
  units_ = new DisplayUnits(this);
  units_->setSystem(settings_.unitSystem());
  document_ = new CaseDocument(this);
  router_ = new SelectionRouter(this);

  createActions();
  createMenus();
  createCentralWidget();
  createToolBar();

  autosaves_ = std::make_unique<AutosaveStore>();
  autosaveTimer_ = new AutosaveTimer(this);
  autosaveTimer_->setLimit(settings_.autosaveWithinSeconds() * 1000);
  connect(autosaveTimer_, &AutosaveTimer::due, this, &MainWindow::autosaveNow);
  connect(document_, &CaseDocument::modifiedChanged, this, [this](bool modified) {
    if (!modified) removeAutosave();  // saved, or back to the file's state: nothing to recover
  });

  connect(document_, &CaseDocument::resultChanged, this, &MainWindow::refreshResult);
  connect(document_, &CaseDocument::caseChanged, this, &MainWindow::updateStrip);
  connect(document_, &CaseDocument::caseChanged, this, &MainWindow::scheduleAutosave);
  connect(document_, &CaseDocument::modifiedChanged, this, &MainWindow::updateTitle);
  connect(router_, &SelectionRouter::selected, this, &MainWindow::routeSelection);
  connect(units_, &DisplayUnits::changed, this, &MainWindow::updateBanner);

  setChartLayout(settings_.chartLayout());
  pvChart_->setLogAxes(settings_.pressureVolumeLogAxes());
  actions_.logAxes->setChecked(settings_.pressureVolumeLogAxes());
  restoreGeometry(settings_.windowGeometry());
  restoreState(settings_.windowState());
  placeAudit();
  auditPanel_->setOrder(settings_.auditOrder());
  connect(auditPanel_, &AuditPanel::orderChanged, this,
          [this](const QStringList& keys) { settings_.setAuditOrder(keys); });
  placeTradeStudy();
  tradeStudyPanel_->applySetup(settings_.studySetup());
  connect(tradeStudyPanel_, &TradeStudyPanel::setupChanged, this,
          [this] { settings_.setStudySetup(tradeStudyPanel_->setup()); });

  router_->select(Section::Compressor);
  refreshResult();
  updateStrip();
  updateTitle();
  statusBar()->showMessage(tr("Ready"));
}

MainWindow::~MainWindow() {
  // QWidget's destructor hides the docks after this destructor has run, which toggles their view
  // actions: their connections to this window must be gone by then (UBSan found the call).
  auditDock_->toggleViewAction()->disconnect(this);
  tradeStudyDock_->toggleViewAction()->disconnect(this);
}

// ---------------------------------------------------------------------------------------------
// Actions, menus, toolbar

void MainWindow::createActions() {
  auto make = [this](const QString& text, const char* name, auto slot, QKeySequence::StandardKey key) {
    auto* action = new QAction(text, this);
    action->setObjectName(QString::fromLatin1(name));
    if (key != QKeySequence::UnknownKey) action->setShortcut(key);
    connect(action, &QAction::triggered, this, slot);
    return action;
  };
  actions_.newCase = make(tr("&New"), "newAction", &MainWindow::newCase, QKeySequence::New);
  actions_.open = make(tr("&Open…"), "openAction", &MainWindow::open, QKeySequence::Open);
  actions_.save = make(tr("&Save"), "saveAction", &MainWindow::save, QKeySequence::Save);
  actions_.saveAs = make(tr("Save &As…"), "saveAsAction", &MainWindow::saveAs, QKeySequence::SaveAs);
  actions_.preferences =
      make(tr("&Preferences…"), "preferencesAction", &MainWindow::showPreferences, QKeySequence::Preferences);
  actions_.quit = new QAction(tr("&Quit"), this);
  actions_.quit->setObjectName("quitAction");
  actions_.quit->setShortcut(QKeySequence::Quit);
  connect(actions_.quit, &QAction::triggered, this, &QWidget::close);
  actions_.about =
      make(tr("&About Cyclewright"), "aboutAction", &MainWindow::showAbout, QKeySequence::UnknownKey);

  actions_.undo = document_->undoStack()->createUndoAction(this, tr("&Undo"));
  actions_.undo->setObjectName("undoAction");
  actions_.undo->setShortcut(QKeySequence::Undo);
  actions_.redo = document_->undoStack()->createRedoAction(this, tr("&Redo"));
  actions_.redo->setObjectName("redoAction");
  actions_.redo->setShortcut(QKeySequence::Redo);

  actions_.resetZoom = new QAction(tr("&Reset Zoom"), this);
  actions_.resetZoom->setObjectName("resetZoomAction");
  actions_.resetZoom->setShortcut(Qt::CTRL | Qt::Key_0);
  actions_.resetZoom->setToolTip(tr("Show the whole cycle on both charts"));
  connect(actions_.resetZoom, &QAction::triggered, this, [this] {
    tsChart_->resetZoom();
    pvChart_->resetZoom();
    hsChart_->resetZoom();
  });
  actions_.logAxes = new QAction(tr("&Logarithmic Pressure–Volume Axes"), this);
  actions_.logAxes->setObjectName("logAxesAction");
  actions_.logAxes->setCheckable(true);
  actions_.logAxes->setIconText(tr("Log p–v"));
  connect(actions_.logAxes, &QAction::toggled, this, [this](bool on) {
    pvChart_->setLogAxes(on);
    settings_.setPressureVolumeLogAxes(on);
  });
  actions_.layoutGroup = new QActionGroup(this);
  actions_.sideBySide = new QAction(tr("Charts &Side by Side"), actions_.layoutGroup);
  actions_.sideBySide->setObjectName("sideBySideAction");
  actions_.sideBySide->setCheckable(true);
  actions_.sideBySide->setIconText(tr("Side by Side"));
  actions_.tabbed = new QAction(tr("Charts in &Tabs"), actions_.layoutGroup);
  actions_.tabbed->setObjectName("tabbedAction");
  actions_.tabbed->setCheckable(true);
  actions_.tabbed->setIconText(tr("Tabs"));
  connect(actions_.sideBySide, &QAction::triggered, this,
          [this] { setChartLayout(ChartLayout::SideBySide); });
  connect(actions_.tabbed, &QAction::triggered, this, [this] { setChartLayout(ChartLayout::Tabbed); });

  actions_.copyTs = new QAction(tr("Copy &Temperature–Entropy Chart"), this);
  actions_.copyTs->setObjectName("copyTsAction");
  connect(actions_.copyTs, &QAction::triggered, this, [this] { copyChart(tsChart_); });
  actions_.copyPv = new QAction(tr("Copy &Pressure–Volume Chart"), this);
  actions_.copyPv->setObjectName("copyPvAction");
  connect(actions_.copyPv, &QAction::triggered, this, [this] { copyChart(pvChart_); });
  actions_.copyTable = new QAction(tr("Copy Station &Table"), this);
  actions_.copyTable->setObjectName("copyTableAction");
  connect(actions_.copyTable, &QAction::triggered, this, &MainWindow::copyTable);
  actions_.copyStudyTable = new QAction(tr("Copy Trade &Study Table"), this);
  actions_.copyStudyTable->setObjectName("copyStudyTableAction");
  connect(actions_.copyStudyTable, &QAction::triggered, this, &MainWindow::copyStudyTable);
}

void MainWindow::createMenus() {
  QMenu* fileMenu = menuBar()->addMenu(tr("&File"));
  fileMenu->setObjectName("fileMenu");
  fileMenu->addAction(actions_.newCase);
  fileMenu->addAction(actions_.open);
  recentMenu_ = fileMenu->addMenu(tr("Open &Recent"));
  recentMenu_->setObjectName("recentMenu");
  connect(recentMenu_, &QMenu::aboutToShow, this, &MainWindow::updateRecentMenu);
  fileMenu->addAction(actions_.save);
  fileMenu->addAction(actions_.saveAs);
  fileMenu->addSeparator();
  QMenu* exportMenu = fileMenu->addMenu(tr("&Export"));
  exportMenu->setObjectName("exportMenu");
  const std::pair<QString, QString> formats[] = {
      {"png", tr("PNG Image…")}, {"svg", tr("SVG Drawing…")}, {"pdf", tr("PDF Document…")}};
  for (const auto& [format, text] : formats) {
    const QString f = format;
    exportMenu->addAction(tr("Temperature–Entropy Chart as %1").arg(text), this,
                          [this, f] { exportChart(tsChart_, QStringLiteral("temperature-entropy"), f); });
  }
  for (const auto& [format, text] : formats) {
    const QString f = format;
    exportMenu->addAction(tr("Pressure–Volume Chart as %1").arg(text), this,
                          [this, f] { exportChart(pvChart_, QStringLiteral("pressure-volume"), f); });
  }
  for (const auto& [format, text] : formats) {
    const QString f = format;
    exportMenu->addAction(tr("Enthalpy–Entropy Chart as %1").arg(text), this,
                          [this, f] { exportChart(hsChart_, QStringLiteral("enthalpy-entropy"), f); });
  }
  for (const auto& [format, text] : formats) {
    const QString f = format;
    exportMenu->addAction(tr("Loss Audit Chart as %1").arg(text), this,
                          [this, f] { exportChart(auditPanel_->chart(), QStringLiteral("loss-audit"), f); });
  }
  for (const auto& [format, text] : formats) {
    const QString f = format;
    exportMenu->addAction(tr("Trade Study Chart as %1").arg(text), this, [this, f] {
      exportChart(tradeStudyPanel_->chart(), QStringLiteral("trade-study"), f);
    });
  }
  exportMenu->addSeparator();
  exportMenu->addAction(tr("Station Table as CSV…"), this, [this] { exportTable("csv"); });
  exportMenu->addAction(tr("Results as JSON…"), this, [this] { exportTable("json"); });
  exportMenu->addAction(tr("Loss Audit Table as CSV…"), this, [this] { exportTable("audit"); });
  exportMenu->addAction(tr("Trade Study as CSV…"), this, [this] { exportTable("study-csv"); });
  exportMenu->addAction(tr("Trade Study as JSON…"), this, [this] { exportTable("study-json"); });
  fileMenu->addSeparator();
  fileMenu->addAction(actions_.preferences);
  fileMenu->addSeparator();
  fileMenu->addAction(actions_.quit);

  QMenu* editMenu = menuBar()->addMenu(tr("&Edit"));
  editMenu->setObjectName("editMenu");
  editMenu->addAction(actions_.undo);
  editMenu->addAction(actions_.redo);
  editMenu->addSeparator();
  editMenu->addAction(actions_.copyTs);
  editMenu->addAction(actions_.copyPv);
  editMenu->addAction(actions_.copyTable);
  editMenu->addAction(actions_.copyStudyTable);

  QMenu* viewMenu = menuBar()->addMenu(tr("&View"));
  viewMenu->setObjectName("viewMenu");
  viewMenu_ = viewMenu;
  viewMenu->addAction(actions_.sideBySide);
  viewMenu->addAction(actions_.tabbed);
  // Side by side, a third chart leaves each canvas too narrow at a laptop's width: the h-s chart
  // joins the other two there on request, and is always a tab of its own.
  enthalpyEntropyBeside_ = viewMenu->addAction(tr("&Enthalpy–Entropy Chart Beside"));
  enthalpyEntropyBeside_->setObjectName("enthalpyEntropyBesideAction");
  enthalpyEntropyBeside_->setCheckable(true);
  connect(enthalpyEntropyBeside_, &QAction::toggled, this, [this] { setChartLayout(chartLayout_); });
  viewMenu->addSeparator();
  viewMenu->addAction(actions_.logAxes);
  viewMenu->addAction(actions_.resetZoom);

  QMenu* helpMenu = menuBar()->addMenu(tr("&Help"));
  helpMenu->setObjectName("helpMenu");
  helpMenu->addAction(actions_.about);
}

void MainWindow::createToolBar() {
  QToolBar* bar = addToolBar(tr("Main"));
  bar->setObjectName("mainToolBar");
  bar->setToolButtonStyle(Qt::ToolButtonTextOnly);
  bar->addAction(actions_.newCase);
  bar->addAction(actions_.open);
  bar->addAction(actions_.save);
  bar->addSeparator();
  bar->addAction(actions_.undo);
  bar->addAction(actions_.redo);
  bar->addSeparator();
  bar->addAction(actions_.resetZoom);
  bar->addAction(actions_.logAxes);
  bar->addSeparator();
  bar->addAction(actions_.sideBySide);
  bar->addAction(actions_.tabbed);
}

void MainWindow::createCentralWidget() {
  auto* central = new QWidget(this);
  auto* layout = new QVBoxLayout(central);
  layout->setContentsMargins(6, 6, 6, 6);

  // The component strip, in flow order after the operating inputs.
  strip_ = new QListWidget(central);
  strip_->setObjectName("componentStrip");
  strip_->setFlow(QListView::LeftToRight);
  strip_->setWrapping(false);
  strip_->setSelectionMode(QAbstractItemView::SingleSelection);
  strip_->setHorizontalScrollBarPolicy(Qt::ScrollBarAsNeeded);
  strip_->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  strip_->setSpacing(3);
  for (int i = 0; i < kSectionCount; ++i) {
    auto* item = new QListWidgetItem(sectionName(static_cast<Section>(i)), strip_);
    item->setTextAlignment(Qt::AlignCenter);
    item->setSizeHint(QSize(QFontMetrics(strip_->font()).horizontalAdvance(item->text()) + 28,
                            QFontMetrics(strip_->font()).height() * 2 + 8));
  }
  strip_->setFixedHeight(QFontMetrics(strip_->font()).height() * 2 + 22);
  connect(strip_, &QListWidget::currentRowChanged, this, [this](int row) {
    if (row >= 0) router_->select(static_cast<Section>(row));
  });
  layout->addWidget(strip_);

  banner_ = new QLabel(central);
  banner_->setObjectName("staleBanner");
  banner_->setWordWrap(true);
  banner_->setAutoFillBackground(true);
  banner_->setMargin(6);
  banner_->setTextFormat(Qt::PlainText);
  applyBannerPalette();
  banner_->hide();
  layout->addWidget(banner_);

  auto* vertical = new QSplitter(Qt::Vertical, central);
  vertical->setObjectName("verticalSplitter");
  auto* horizontal = new QSplitter(Qt::Horizontal, vertical);
  horizontal->setObjectName("horizontalSplitter");

  forms_ = new QStackedWidget;
  forms_->setObjectName("formStack");
  for (int i = 0; i < kSectionCount; ++i) {
    auto* form = new CaseForm(static_cast<Section>(i), *document_, *units_);
    formOf_[static_cast<size_t>(i)] = form;
    forms_->addWidget(form);
  }
  auto* scroll = new QScrollArea(horizontal);
  scroll->setWidgetResizable(true);
  scroll->setWidget(forms_);
  scroll->setMinimumWidth(200);
  horizontal->setSizes({340, 1200});
  horizontal->addWidget(scroll);

  tsChart_ = new CycleChart(ChartKind::TemperatureEntropy, *units_);
  pvChart_ = new CycleChart(ChartKind::PressureVolume, *units_);
  hsChart_ = new CycleChart(ChartKind::EnthalpyEntropy, *units_);
  chartHost_ = new QStackedWidget(horizontal);
  chartSplitter_ = new QSplitter(Qt::Horizontal);
  chartSplitter_->setObjectName("chartSplitter");
  chartTabs_ = new QTabWidget;
  chartTabs_->setObjectName("chartTabs");
  chartHost_->addWidget(chartSplitter_);
  chartHost_->addWidget(chartTabs_);
  horizontal->addWidget(chartHost_);
  horizontal->setStretchFactor(0, 0);
  horizontal->setStretchFactor(1, 1);

  auto* bottom = new QSplitter(Qt::Horizontal);
  auto* stationBox = new QGroupBox(tr("Stations"), bottom);
  auto* stationLayout = new QVBoxLayout(stationBox);
  tableMode_ = new QComboBox(stationBox);
  tableMode_->setObjectName("tableMode");
  tableMode_->addItems({tr("With losses"), tr("Ideal"), tr("Difference (with losses − ideal)")});
  stationLayout->addWidget(tableMode_);
  stationModel_ = new StationTableModel(*units_, this);
  stationView_ = new QTableView(stationBox);
  stationView_->setObjectName("stationTable");
  stationView_->setModel(stationModel_);
  stationView_->verticalHeader()->hide();
  stationView_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
  stationView_->setSelectionBehavior(QAbstractItemView::SelectRows);
  stationView_->setAlternatingRowColors(true);
  stationView_->verticalHeader()->setDefaultSectionSize(QFontMetrics(stationView_->font()).height() + 6);
  stationView_->setMinimumHeight(60);
  stationLayout->addWidget(stationView_);
  connect(tableMode_, &QComboBox::currentIndexChanged, this,
          [this](int index) { stationModel_->setMode(static_cast<TableMode>(index)); });

  auto* performanceBox = new QGroupBox(tr("Performance"), bottom);
  auto* performanceLayout = new QVBoxLayout(performanceBox);
  performanceModel_ = new PerformanceModel(*units_, this);
  performanceView_ = new QTableView(performanceBox);
  performanceView_->setObjectName("performanceTable");
  performanceView_->setModel(performanceModel_);
  performanceView_->verticalHeader()->hide();
  performanceView_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
  performanceView_->horizontalHeader()->setStretchLastSection(true);
  performanceView_->setAlternatingRowColors(true);
  performanceView_->verticalHeader()->setDefaultSectionSize(QFontMetrics(performanceView_->font()).height() +
                                                            6);
  performanceView_->setMinimumHeight(60);
  performanceLayout->addWidget(performanceView_);
  bottom->addWidget(stationBox);
  bottom->addWidget(performanceBox);
  bottom->setStretchFactor(0, 3);
  bottom->setStretchFactor(1, 2);

  // The tables and the loss audit share the bottom area, in tabs, so that the audit is in sight
  // from the start without taking room from the charts. View › Loss Audit moves it into a dock
  // of its own (placeAudit).
  bottomTabs_ = new QTabWidget(vertical);
  bottomTabs_->setObjectName("bottomTabs");
  bottomTabs_->setDocumentMode(true);
  bottomTabs_->addTab(bottom, tr("Stations and performance"));
  auditPanel_ = new AuditPanel(*units_, *router_);
  auditPanel_->setSideBySide(true);
  bottomTabs_->addTab(auditPanel_, tr("Loss audit"));
  tradeStudyPanel_ = new TradeStudyPanel(*document_, *units_);
  tradeStudyPanel_->setSideBySide(true);
  bottomTabs_->addTab(tradeStudyPanel_, tr("Trade study"));

  vertical->addWidget(horizontal);
  vertical->addWidget(bottomTabs_);
  vertical->setStretchFactor(0, 3);
  vertical->setStretchFactor(1, 2);
  vertical->setSizes({600, 330});
  layout->addWidget(vertical, 1);
  setCentralWidget(central);

  // The loss audit beside the charts, in a dock, when the user asks for it (View › Loss Audit):
  // its place and visibility are kept with the window state (settings). While the dock is
  // hidden the audit is a tab of the bottom area.
  auditDock_ = new QDockWidget(tr("Loss audit"), this);
  auditDock_->setObjectName("auditDock");
  auditDock_->setFeatures(QDockWidget::DockWidgetClosable | QDockWidget::DockWidgetMovable |
                          QDockWidget::DockWidgetFloatable);
  addDockWidget(Qt::RightDockWidgetArea, auditDock_);
  resizeDocks({auditDock_}, {440}, Qt::Horizontal);
  auditDock_->hide();  // until the user shows it (View › Loss Audit); the window state keeps it
  QAction* toggle = auditDock_->toggleViewAction();
  // Triggered: after the dock has shown or hidden itself; toggled: also its close button.
  connect(toggle, &QAction::triggered, this, &MainWindow::placeAudit);
  connect(toggle, &QAction::toggled, this, &MainWindow::placeAudit);
  toggle->setObjectName("auditDockAction");
  toggle->setText(tr("&Loss Audit"));
  viewMenu_->addSeparator();
  viewMenu_->addAction(toggle);

  // The trade study the same way (View › Trade Study), wider: its chart needs the room.
  tradeStudyDock_ = new QDockWidget(tr("Trade study"), this);
  tradeStudyDock_->setObjectName("tradeStudyDock");
  tradeStudyDock_->setFeatures(QDockWidget::DockWidgetClosable | QDockWidget::DockWidgetMovable |
                               QDockWidget::DockWidgetFloatable);
  addDockWidget(Qt::RightDockWidgetArea, tradeStudyDock_);
  resizeDocks({tradeStudyDock_}, {640}, Qt::Horizontal);
  tradeStudyDock_->hide();
  QAction* studyToggle = tradeStudyDock_->toggleViewAction();
  connect(studyToggle, &QAction::triggered, this, &MainWindow::placeTradeStudy);
  connect(studyToggle, &QAction::toggled, this, &MainWindow::placeTradeStudy);
  studyToggle->setObjectName("tradeStudyDockAction");
  studyToggle->setText(tr("Trade &Study"));
  viewMenu_->addAction(studyToggle);
}

void MainWindow::setChartLayout(ChartLayout chartLayout) {
  chartLayout_ = chartLayout;
  if (chartLayout == ChartLayout::Tabbed) {
    chartTabs_->addTab(tsChart_, tr("Temperature–entropy"));
    chartTabs_->addTab(pvChart_, tr("Pressure–volume"));
    chartTabs_->addTab(hsChart_, tr("Enthalpy–entropy"));
    chartHost_->setCurrentWidget(chartTabs_);
    // Only the current tab's chart is shown: a chart shown on a hidden page paints over the
    // current one until the tabs are switched.
    for (QWidget* chart :
         {static_cast<QWidget*>(tsChart_), static_cast<QWidget*>(pvChart_), static_cast<QWidget*>(hsChart_)})
      chart->setVisible(chart == chartTabs_->currentWidget());
    actions_.tabbed->setChecked(true);
  } else {
    chartSplitter_->addWidget(tsChart_);
    chartSplitter_->addWidget(pvChart_);
    chartSplitter_->addWidget(hsChart_);
    chartHost_->setCurrentWidget(chartSplitter_);
    tsChart_->show();  // a chart that was on a hidden tab page stays hidden in the splitter
    pvChart_->show();
    hsChart_->setVisible(enthalpyEntropyBeside_->isChecked());
    actions_.sideBySide->setChecked(true);
  }
  settings_.setChartLayout(chartLayout);
}

void MainWindow::placeAudit() {
  const bool docked = !auditDock_->isHidden();
  if (docked && auditDock_->widget() != auditPanel_) {
    bottomTabs_->removeTab(bottomTabs_->indexOf(auditPanel_));
    auditPanel_->setSideBySide(false);
    auditDock_->setWidget(auditPanel_);
  } else if (!docked && auditDock_->widget() == auditPanel_) {
    auditDock_->setWidget(nullptr);
    auditPanel_->setSideBySide(true);
    bottomTabs_->insertTab(1, auditPanel_, tr("Loss audit"));
  }
}

void MainWindow::placeTradeStudy() {
  const bool docked = !tradeStudyDock_->isHidden();
  if (docked && tradeStudyDock_->widget() != tradeStudyPanel_) {
    bottomTabs_->removeTab(bottomTabs_->indexOf(tradeStudyPanel_));
    tradeStudyPanel_->setSideBySide(false);
    tradeStudyDock_->setWidget(tradeStudyPanel_);
  } else if (!docked && tradeStudyDock_->widget() == tradeStudyPanel_) {
    tradeStudyDock_->setWidget(nullptr);
    tradeStudyPanel_->setSideBySide(true);
    bottomTabs_->addTab(tradeStudyPanel_, tr("Trade study"));
  }
}

void MainWindow::setUnitSystem(UnitSystem system) {
  units_->setSystem(system);
  settings_.setUnitSystem(system);
}

// ---------------------------------------------------------------------------------------------
// Selection and results

QSet<QString> MainWindow::stationsOf(Section section) const {
  QSet<QString> out;
  if (section == Section::Flight) out.insert("0");
  if (section == Section::Design) out.insert("2");
  const auto evaluation = document_->evaluation();
  const std::string component = sectionComponent(section);
  if (!evaluation || component.empty()) return out;
  const auto& cycle = evaluation->actual;
  const int p = componentPath(cycle, component);
  if (p < 0) return out;
  const auto& path = cycle.paths[static_cast<size_t>(p)];
  bool inside = false;
  for (const auto& s : cycle.stations) {
    if (s.id == path.fromStation) inside = true;
    if (inside) out.insert(QString::fromStdString(s.id));
    if (s.id == path.toStation) break;
  }
  return out;
}

void MainWindow::routeSelection(Section section) {
  const int row = static_cast<int>(section);
  {
    const QSignalBlocker blocker(strip_);
    strip_->setCurrentRow(row);
  }
  forms_->setCurrentIndex(row);
  tsChart_->setHighlightedComponent(sectionComponent(section));
  pvChart_->setHighlightedComponent(sectionComponent(section));
  hsChart_->setHighlightedComponent(sectionComponent(section));
  stationModel_->setHighlightedStations(stationsOf(section));
}

void MainWindow::refreshResult() {
  const auto evaluation = document_->evaluation();
  const bool stale = document_->isStale();
  if (evaluation != shown_) {
    shown_ = evaluation;
    tsChart_->setEvaluation(evaluation, stale);
    pvChart_->setEvaluation(evaluation, stale);
    hsChart_->setEvaluation(evaluation, stale);
    stationModel_->setEvaluation(evaluation, stale);
    performanceModel_->setEvaluation(evaluation, stale);
    stationModel_->setHighlightedStations(stationsOf(router_->current()));
  } else {
    tsChart_->setStale(stale);
    pvChart_->setStale(stale);
    hsChart_->setStale(stale);
    stationModel_->setStale(stale);
    performanceModel_->setStale(stale);
  }
  auditPanel_->update(document_->currentCase(), evaluation, stale);
  updateBanner();
}

void MainWindow::updateBanner() {
  if (!document_->isStale()) {
    banner_->hide();
    return;
  }
  QStringList lines;
  const engine::Case& c = document_->currentCase();
  for (const auto& message : document_->entryProblems()) lines << message;
  for (const auto& problem : document_->problems()) {
    QString where = QString::fromStdString(problem.path);
    for (const auto& spec : caseFields())
      if (spec.path(c) == problem.path)
        where = sectionName(spec.section) + QStringLiteral(" › ") + fieldLabel(spec);
    lines << tr("%1: %2 is outside the valid range %3")
                 .arg(where, QString::fromStdString(problem.value), QString::fromStdString(problem.valid));
  }
  if (!document_->failure().isEmpty()) lines << document_->failure();
  const QString tail = document_->evaluation() ? tr("Charts and tables show the last valid result (stale).")
                                               : tr("There is no valid result to show yet.");
  banner_->setText(tr("Stale result. %1\n%2").arg(tail, lines.join(QLatin1Char('\n'))));
  banner_->show();
}

void MainWindow::applyBannerPalette() {
  // Vermillion (the stale colour) mixed into the window colour; the window's text on it.
  QPalette p = palette();
  p.setColor(QPalette::Window, mixColours(p.color(QPalette::Window), kOkabeItoVermillion, 0.22));
  p.setColor(QPalette::WindowText, palette().color(QPalette::WindowText));
  banner_->setPalette(p);
}

void MainWindow::changeEvent(QEvent* event) {
  QMainWindow::changeEvent(event);
  if (event->type() == QEvent::PaletteChange && banner_) {
    applyBannerPalette();
    updateStrip();
  }
}

void MainWindow::updateStrip() {
  const bool lit = document_->currentCase().afterburner.enabled;
  QListWidgetItem* item = strip_->item(static_cast<int>(Section::Afterburner));
  item->setText(lit ? sectionName(Section::Afterburner)
                    : tr("%1 (unlit)").arg(sectionName(Section::Afterburner)));
  item->setSizeHint(
      QSize(QFontMetrics(strip_->font()).horizontalAdvance(item->text()) + 28, item->sizeHint().height()));
  item->setForeground(lit ? palette().brush(QPalette::Text)
                          : palette().brush(QPalette::Disabled, QPalette::Text));
  for (int i = 0; i < kSectionCount; ++i) {
    const auto section = static_cast<Section>(i);
    const QSet<QString> stations = stationsOf(section);
    QStringList ids(stations.begin(), stations.end());
    std::sort(ids.begin(), ids.end(),
              [](const QString& a, const QString& b) { return a.toInt() < b.toInt(); });
    strip_->item(i)->setToolTip(ids.isEmpty()
                                    ? sectionName(section)
                                    : tr("%1: stations %2").arg(sectionName(section), ids.join(", ")));
  }
}

// ---------------------------------------------------------------------------------------------
// Files

QString MainWindow::casePath() const {
  return document_->filePath();
}

bool MainWindow::openCase(const QString& path, QString* error) {
  engine::Case loaded;
  try {
    loaded = readCaseAt(path);
  } catch (const std::exception& e) {
    return refuseToOpen(openFailureText(path, e), error);
  }
  removeStaleTemporariesOf(path);
  document_->load(loaded, path);
  if (!path.startsWith(QLatin1Char(':'))) settings_.addRecentFile(QFileInfo(path).absoluteFilePath());
  updateTitle();
  const QString title = QString::fromStdString(loaded.title);
  statusBar()->showMessage(tr("Opened %1").arg(title.isEmpty() ? path : title));
  return true;
}

bool MainWindow::refuseToOpen(const QString& message, QString* error) {
  if (error) *error = message;
  statusBar()->showMessage(tr("Not opened: %1").arg(message.section(QLatin1Char('\n'), 0, 0)));
  showProblem(QStringLiteral("openFailedBox"), tr("Cannot open case"), message,
              tr("The case shown is unchanged."));
  return false;
}

void MainWindow::showProblem(const QString& objectName, const QString& title, const QString& text,
                             const QString& detail) {
  if (!isVisible()) return;
  QMessageBox box(QMessageBox::Warning, title, text, QMessageBox::Ok, this);
  box.setObjectName(objectName);
  box.setInformativeText(detail);
  box.exec();
}

bool MainWindow::saveCaseAs(const QString& path) {
  try {
    io::writeCaseFile(path.toStdString(), document_->currentCase());
  } catch (const std::exception& e) {
    statusBar()->showMessage(tr("Cannot save %1: %2").arg(path, QString::fromStdString(e.what())));
    if (isVisible()) QMessageBox::warning(this, tr("Cannot save"), QString::fromStdString(e.what()));
    return false;
  }
  document_->markSaved(path);
  removeStaleTemporariesOf(path);
  settings_.addRecentFile(QFileInfo(path).absoluteFilePath());
  removeAutosave();
  updateTitle();
  statusBar()->showMessage(tr("Saved %1").arg(path));
  return true;
}

void MainWindow::newCase() {
  if (!maybeSave()) return;
  document_->load(engine::Case{}, QString());
  updateTitle();
}

void MainWindow::open() {
  if (!maybeSave()) return;
  const QString path = QFileDialog::getOpenFileName(this, tr("Open Case"), QString(),
                                                    tr("Cyclewright cases (*.json);;All files (*)"));
  if (!path.isEmpty()) openCase(path);
}

bool MainWindow::save() {
  const QString path = document_->filePath();
  if (path.isEmpty() || path.startsWith(QLatin1Char(':'))) return saveAs();
  return saveCaseAs(path);
}

bool MainWindow::saveAs() {
  QString suggestion = document_->filePath();
  if (suggestion.isEmpty() || suggestion.startsWith(QLatin1Char(':')))
    suggestion = QDir::home().filePath(suggestion.isEmpty() ? QStringLiteral("case.json")
                                                            : QFileInfo(suggestion).fileName());
  const QString path =
      QFileDialog::getSaveFileName(this, tr("Save Case As"), suggestion, tr("Cyclewright cases (*.json)"));
  return !path.isEmpty() && saveCaseAs(path);
}

void MainWindow::updateRecentMenu() {
  recentMenu_->clear();
  const QStringList files = settings_.recentFiles();
  for (const QString& file : files) {
    QAction* action = recentMenu_->addAction(QFileInfo(file).fileName(), this, [this, file] {
      if (maybeSave()) openCase(file);
    });
    action->setToolTip(file);
  }
  if (files.isEmpty()) recentMenu_->addAction(tr("No recent files"))->setEnabled(false);
}

bool MainWindow::maybeSave() {
  if (!document_->isModified()) return true;
  const auto answer =
      QMessageBox::warning(this, tr("Unsaved changes"), tr("The case has unsaved changes. Save them first?"),
                           QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel);
  if (answer == QMessageBox::Save) return save();
  return answer == QMessageBox::Discard;
}

void MainWindow::updateTitle() {
  const QString path = document_->filePath();
  const QString name = path.isEmpty() ? tr("Untitled") : QFileInfo(path).fileName();
  setWindowTitle(tr("%1[*] — Cyclewright").arg(name));
  setWindowModified(document_->isModified());
}

void MainWindow::closeEvent(QCloseEvent* event) {
  if (!maybeSave()) {
    event->ignore();
    return;
  }
  tradeStudyPanel_->cancel();  // the panel's runner joins its thread when the window goes
  settings_.setWindowGeometry(saveGeometry());
  settings_.setWindowState(saveState());
  removeAutosave();
  event->accept();
}

QString MainWindow::autosaveFolder() {
  return AutosaveStore::defaultFolder();
}

QString MainWindow::autosaveFile() const {
  return autosaves_->ownFile();
}

void MainWindow::scheduleAutosave() {
  if (document_->isModified()) autosaveTimer_->edited();
}

bool MainWindow::autosaveNow() {
  autosaveTimer_->stop();
  if (!document_->isModified()) return false;
  try {
    autosaves_->write(document_->currentCase(), document_->filePath());
  } catch (const std::exception& e) {
    statusBar()->showMessage(tr("Autosave failed: %1").arg(QString::fromStdString(e.what())));
    return false;
  }
  return true;
}

void MainWindow::removeAutosave() {
  autosaveTimer_->stop();
  autosaves_->removeOwn();
}

bool MainWindow::recoverFrom(const QString& autosaveFile) {
  try {
    recover(AutosaveStore::read(autosaveFile));
  } catch (const std::exception& e) {
    const QString what = QString::fromStdString(e.what());
    statusBar()->showMessage(tr("Cannot recover: %1").arg(what));
    showProblem(QStringLiteral("unreadableAutosaveBox"), tr("Cannot recover case"), what, QString());
    return false;
  }
  return true;
}

void MainWindow::recover(const Autosave& autosave) {
  document_->load(autosave.inputs, autosave.origin, true);
  updateTitle();
  statusBar()->showMessage(tr("Recovered the autosaved case; save it to keep it."));
}

bool MainWindow::readAutosave(OrphanAutosave& orphan, Autosave& autosave) {
  try {
    autosave = AutosaveStore::read(orphan.file);
    return true;
  } catch (const std::exception& e) {
    const QString aside = AutosaveStore::setAside(orphan);
    const QString kept =
        aside.isEmpty() ? tr("It was left where it is.") : tr("It was kept as %1.").arg(aside);
    statusBar()->showMessage(tr("An autosaved case cannot be recovered. %1").arg(kept));
    showProblem(QStringLiteral("unreadableAutosaveBox"), tr("Cannot recover case"),
                tr("An autosaved case cannot be recovered: %1").arg(QString::fromStdString(e.what())), kept);
    return false;
  }
}

bool MainWindow::askToRecover(const Autosave& autosave) {
  const QString when = QLocale().toString(autosave.saved, QLocale::ShortFormat);
  const QString text =
      autosave.origin.isEmpty()
          ? tr("Cyclewright did not close normally. Recover the untitled case autosaved at %1?").arg(when)
          : tr("Cyclewright did not close normally. Recover the changes to %1 autosaved at %2?")
                .arg(QDir::toNativeSeparators(autosave.origin), when);
  QMessageBox box(QMessageBox::Question, tr("Recover case"), text, QMessageBox::Yes | QMessageBox::No, this);
  box.setObjectName("recoverBox");
  box.setDefaultButton(QMessageBox::Yes);
  box.setInformativeText(tr("No discards this autosave."));
  return box.exec() == QMessageBox::Yes;
}

bool MainWindow::offerRecovery() {
  autosaves_->removeStaleTemporaries();
  std::vector<OrphanAutosave> orphans = autosaves_->claimOrphans();
  for (OrphanAutosave& orphan : orphans) {
    Autosave autosave;
    if (!readAutosave(orphan, autosave)) continue;
    if (!askToRecover(autosave)) {
      AutosaveStore::discard(orphan);
      continue;
    }
    recover(autosave);
    // The orphan goes only once this window's own autosave holds the case.
    if (autosaveNow()) AutosaveStore::discard(orphan);
    return true;
  }
  return false;
}

// ---------------------------------------------------------------------------------------------
// Exports

bool MainWindow::exportStationCsv(const QString& path) {
  const auto evaluation = document_->evaluation();
  if (!evaluation) return false;
  // The table as shown: with losses, ideal twin, or their difference.
  const TableMode mode = stationModel_->mode();
  const std::string csv =
      mode == TableMode::Difference
          ? io::stationDifferenceCsv(evaluation->actual, evaluation->ideal)
          : io::stationTableCsv(mode == TableMode::Ideal ? evaluation->ideal : evaluation->actual);
  QSaveFile file(path);
  if (!file.open(QIODevice::WriteOnly)) return false;
  file.write(QByteArray::fromStdString(csv));
  return file.commit();
}

bool MainWindow::exportResultJson(const QString& path) {
  const auto evaluation = document_->evaluation();
  if (!evaluation) return false;
  QSaveFile file(path);
  if (!file.open(QIODevice::WriteOnly)) return false;
  file.write(QByteArray::fromStdString(io::evaluationToJson(*evaluation).dump(2)));
  file.write("\n");
  return file.commit();
}

bool MainWindow::exportAuditCsv(const QString& path) {
  return auditPanel_->exportCsv(path);
}

bool MainWindow::exportStudyCsv(const QString& path) {
  return tradeStudyPanel_->exportCsv(path);
}

bool MainWindow::exportStudyJson(const QString& path) {
  return tradeStudyPanel_->exportJson(path);
}

void MainWindow::exportChart(QwtPlot* chart, const QString& base, const QString& format) {
  QSize pixels;
  int dpi = 0;
  if (format == QLatin1String("png")) {
    ImageExportDialog dialog(this);
    if (dialog.exec() != QDialog::Accepted) return;
    pixels = dialog.pixels();
    dpi = dialog.dotsPerInch();
  }
  const QString filter = format == QLatin1String("png")   ? tr("PNG images (*.png)")
                         : format == QLatin1String("svg") ? tr("SVG drawings (*.svg)")
                                                          : tr("PDF documents (*.pdf)");
  const QString path = QFileDialog::getSaveFileName(
      this, tr("Export Chart"), QDir::home().filePath(base + QLatin1Char('.') + format), filter);
  if (path.isEmpty()) return;
  const bool ok = format == QLatin1String("png")
                      ? exportChartPng(chart, path, pixels, dpi)
                      : exportChartDocument(chart, path, format, QSizeF(180.0, 120.0));
  statusBar()->showMessage(ok ? tr("Exported %1").arg(path) : tr("Cannot write %1").arg(path));
}

void MainWindow::exportTable(const QString& format) {
  if (format == QLatin1String("audit")) {
    const QString path = QFileDialog::getSaveFileName(this, tr("Export Loss Audit"),
                                                      QDir::home().filePath(QStringLiteral("loss-audit.csv")),
                                                      tr("CSV files (*.csv)"));
    if (path.isEmpty()) return;
    const bool ok = exportAuditCsv(path);
    statusBar()->showMessage(ok ? tr("Exported %1 (SI units)").arg(path) : tr("Cannot write %1").arg(path));
    return;
  }
  if (format.startsWith(QLatin1String("study-"))) {
    if (!tradeStudyPanel_->study()) {
      statusBar()->showMessage(tr("There is no trade study to export yet: run one first."));
      return;
    }
    const bool csv = format == QLatin1String("study-csv");
    const QString path = QFileDialog::getSaveFileName(
        this, tr("Export Trade Study"),
        QDir::home().filePath(csv ? QStringLiteral("trade-study.csv") : QStringLiteral("trade-study.json")),
        csv ? tr("CSV files (*.csv)") : tr("JSON files (*.json)"));
    if (path.isEmpty()) return;
    QString error;
    const bool ok =
        csv ? tradeStudyPanel_->exportCsv(path, &error) : tradeStudyPanel_->exportJson(path, &error);
    statusBar()->showMessage(ok ? tr("Exported %1 (the units are in the column names)").arg(path)
                                : tr("Cannot write %1: %2").arg(path, error));
    return;
  }
  const bool csv = format == QLatin1String("csv");
  const QString path = QFileDialog::getSaveFileName(
      this, csv ? tr("Export Station Table") : tr("Export Results"),
      QDir::home().filePath(csv ? QStringLiteral("stations.csv") : QStringLiteral("results.json")),
      csv ? tr("CSV files (*.csv)") : tr("JSON files (*.json)"));
  if (path.isEmpty()) return;
  const bool ok = csv ? exportStationCsv(path) : exportResultJson(path);
  statusBar()->showMessage(ok ? tr("Exported %1 (SI units)").arg(path) : tr("Cannot write %1").arg(path));
}

void MainWindow::copyChart(CycleChart* chart) {
  QApplication::clipboard()->setImage(renderChartImage(chart, chart->size() * 2, 192));
  statusBar()->showMessage(tr("Chart copied to the clipboard"));
}

void MainWindow::copyTable() {
  QApplication::clipboard()->setText(stationModel_->toTabSeparated());
  statusBar()->showMessage(tr("Station table copied as tab-separated text"));
}

void MainWindow::copyStudyTable() {
  const QString text = tradeStudyPanel_->tableAsTabSeparated();
  if (text.isEmpty()) {
    statusBar()->showMessage(tr("There is no trade study to copy yet: run one first."));
    return;
  }
  QApplication::clipboard()->setText(text);
  statusBar()->showMessage(tr("Trade-study table copied as tab-separated text"));
}

// ---------------------------------------------------------------------------------------------

void MainWindow::showPreferences() {
  PreferencesDialog dialog(this);
  dialog.setUnitSystem(units_->system());
  dialog.setChartLayout(chartLayout_);
  dialog.setAutosaveWithinSeconds(settings_.autosaveWithinSeconds());
  if (dialog.exec() != QDialog::Accepted) return;
  setUnitSystem(dialog.unitSystem());
  setChartLayout(dialog.chartLayout());
  settings_.setAutosaveWithinSeconds(dialog.autosaveWithinSeconds());
  autosaveTimer_->setLimit(settings_.autosaveWithinSeconds() * 1000);
}

void MainWindow::showAbout() {
  QMessageBox box(this);
  box.setObjectName("aboutBox");
  box.setWindowTitle(tr("About Cyclewright"));
  box.setIcon(QMessageBox::Information);
  box.setText(tr("<b>Cyclewright %1</b><br>A gas-turbine cycle explorer for conceptual design.")
                  .arg(QString::fromLatin1(kVersion)));
  box.setInformativeText(cautionText());
  box.exec();
}

}  // namespace cw::gui
