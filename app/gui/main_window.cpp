#include "main_window.h"

#include "window_actions.h"
#include "window_autosave.h"
#include "window_exports.h"
#include "window_files.h"

#include "audit/audit_panel.h"
#include "charts/colours.h"
#include "charts/cycle_chart.h"
#include "charts/path_series.h"
#include "common/version.h"
#include "dialogs/dialogs.h"
#include "document/autosave_store.h"
#include "document/case_document.h"
#include "document/caution.h"
#include "document/selection_router.h"
#include "document/units.h"
#include "forms/case_form.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"
#include "tables/table_pair.h"
#include "trade_study/study_panel.h"

#include <QAction>
#include <QCheckBox>
#include <QCloseEvent>
#include <QComboBox>
#include <QDockWidget>
#include <QGroupBox>
#include <QHeaderView>
#include <QLabel>
#include <QListWidget>
#include <QMenu>
#include <QMessageBox>
#include <QScrollArea>
#include <QScrollBar>
#include <QSplitter>
#include <QStackedWidget>
#include <QStandardItemModel>
#include <QStatusBar>
#include <QTabBar>
#include <QTabWidget>
#include <QTableView>
#include <QVBoxLayout>

#include <algorithm>
#include <limits>
#include <vector>

// The resources live in a static library; register them once before first use.
static void initialiseResources() {
  Q_INIT_RESOURCE(resources);
}

namespace cw::gui {

MainWindow::MainWindow(QWidget* parent) : QMainWindow(parent) {
  initialiseResources();
  setObjectName("mainWindow");
  units_ = new DisplayUnits(this);
  units_->setSystem(settings_.unitSystem());
  document_ = new CaseDocument(this);
  router_ = new SelectionRouter(this);
  files_ = new WindowFiles(*this, *document_, settings_, *units_);
  autosave_ = new WindowAutosave(*this, *document_, settings_.autosaveWithinSeconds());
  exports_ = new WindowExports(*this);
  actions_ = new WindowActions(*this);
  createCentralWidget();
  actions_->createToolBar();
  connectDocument();
  restoreFromSettings();

  router_->select(Section::Compressor);
  refreshBaseline();
  refreshResult();
  updateStrip();
  files_->updateTitle();
  statusBar()->showMessage(tr("Ready"));
}

MainWindow::~MainWindow() {
  // QWidget's destructor hides the docks after this destructor has run, which toggles their view
  // actions: their connections to this window must be gone by then (UBSan found the call).
  auditDock_->toggleViewAction()->disconnect(this);
  tradeStudyDock_->toggleViewAction()->disconnect(this);
}

void MainWindow::connectDocument() {
  connect(files_, &WindowFiles::saved, autosave_, &WindowAutosave::remove);
  connect(autosave_, &WindowAutosave::recovered, files_, &WindowFiles::updateTitle);
  connect(document_, &CaseDocument::resultChanged, this, &MainWindow::refreshResult);
  connect(document_, &CaseDocument::caseChanged, this, &MainWindow::updateStrip);
  connect(document_, &CaseDocument::baselineChanged, this, &MainWindow::refreshBaseline);
  connect(router_, &SelectionRouter::selected, this, &MainWindow::routeSelection);
  connect(units_, &DisplayUnits::changed, this, &MainWindow::updateBanner);
  connect(units_, &DisplayUnits::changed, this, &MainWindow::fitTables);
}

void MainWindow::restoreFromSettings() {
  setChartLayout(settings_.chartLayout());
  pvChart_->setLogAxes(settings_.pressureVolumeLogAxes());
  actions_->logAxes()->setChecked(settings_.pressureVolumeLogAxes());
  restoreGeometry(settings_.windowGeometry());
  restoreState(settings_.windowState());
  placeAudit();
  auditPanel_->setOrder(settings_.auditOrder());
  connect(auditPanel_, &AuditPanel::orderChanged, this,
          [this](const QStringList& keys) { settings_.setAuditOrder(keys); });
  // Kept while there is no baseline too (the box is then disabled): it applies to the next one.
  auditPanel_->baselineBox()->setChecked(settings_.auditBaselineBeside());
  connect(auditPanel_->baselineBox(), &QCheckBox::toggled, this,
          [this](bool on) { settings_.setAuditBaselineBeside(on); });
  placeTradeStudy();
  tradeStudyPanel_->applySetup(settings_.studySetup());
  connect(tradeStudyPanel_, &TradeStudyPanel::setupChanged, this,
          [this] { settings_.setStudySetup(tradeStudyPanel_->setup()); });
}

// ---------------------------------------------------------------------------------------------
// Layout

void MainWindow::createCentralWidget() {
  auto* central = new QWidget(this);
  auto* layout = new QVBoxLayout(central);
  layout->setContentsMargins(6, 6, 6, 6);
  createStrip(layout);
  createBanner(layout);

  auto* vertical = vertical_ = new QSplitter(Qt::Vertical, central);
  vertical->setObjectName("verticalSplitter");
  vertical->installEventFilter(this);
  vertical->addWidget(createFormsAndCharts());
  createBottomTabs(vertical);
  // The tables keep the height of their rows; the charts take the rest.
  vertical->setChildrenCollapsible(false);
  vertical->setStretchFactor(0, 1);
  vertical->setStretchFactor(1, 0);
  vertical->setSizes({2000, 1});
  layout->addWidget(vertical, 1);
  setCentralWidget(central);
  createDocks();
}

void MainWindow::createStrip(QVBoxLayout* layout) {
  // The component strip, in flow order after the operating inputs.
  strip_ = new QListWidget;
  strip_->setObjectName("componentStrip");
  strip_->setFlow(QListView::LeftToRight);
  strip_->setWrapping(false);
  strip_->setSelectionMode(QAbstractItemView::SingleSelection);
  strip_->setHorizontalScrollBarPolicy(Qt::ScrollBarAsNeeded);
  strip_->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  strip_->setSpacing(3);
  strip_->setTextElideMode(Qt::ElideRight);  // a name that gives way (fitStrip); whole in its tooltip
  const QFontMetrics metrics(strip_->font());
  strip_->setFixedHeight(metrics.height() * 2 + 22);
  strip_->installEventFilter(this);  // refitted to its width (fitStrip)
  fillStrip(document_->currentCase().architecture);
  connect(strip_, &QListWidget::currentRowChanged, this, [this](int row) {
    if (row >= 0 && row < int(stripSections_.size())) router_->select(stripSections_[size_t(row)]);
  });
  layout->addWidget(strip_);
}

void MainWindow::fillStrip(engine::Architecture architecture) {
  // The items of the architecture from the registry, in flow order (a two-spool case: inlet, LP
  // compressor, HP compressor, burner, HP turbine, LP turbine, jet pipe, afterburner, nozzle).
  if (stripArchitecture_ == architecture) return;
  stripArchitecture_ = architecture;
  stripSections_ = stripSections(architecture);
  const QSignalBlocker blocker(strip_);
  strip_->clear();
  for (const Section section : stripSections_) {  // texts and sizes: updateStrip and fitStrip
    auto* item = new QListWidgetItem(sectionName(section), strip_);
    item->setTextAlignment(Qt::AlignCenter);
    item->setData(Qt::UserRole, sectionKey(section));
  }
  // A section of another architecture is no longer shown: select the first role of this one.
  if (!forms_) return;  // the window is being built; its constructor selects
  const Section current = router_->current();
  if (std::find(stripSections_.begin(), stripSections_.end(), current) != stripSections_.end()) {
    routeSelection(current);
    return;
  }
  for (const Section section : stripSections_)
    if (sectionArchitecture(section) == architecture) return router_->select(section);
}

void MainWindow::createBanner(QVBoxLayout* layout) {
  banner_ = new QLabel;
  banner_->setObjectName("staleBanner");
  banner_->setWordWrap(true);
  banner_->setAutoFillBackground(true);
  banner_->setMargin(6);
  banner_->setTextFormat(Qt::PlainText);
  applyBannerPalette();
  banner_->hide();
  layout->addWidget(banner_);
}

QSplitter* MainWindow::createFormsAndCharts() {
  auto* horizontal = new QSplitter(Qt::Horizontal);
  horizontal->setObjectName("horizontalSplitter");
  forms_ = new QStackedWidget;
  forms_->setObjectName("formStack");
  for (const Section section : allSections()) {
    auto* form = new CaseForm(section, *document_, *units_);
    formOf_.push_back(form);
    forms_->addWidget(form);
  }
  auto* scroll = new QScrollArea(horizontal);
  scroll->setObjectName("formScroll");
  scroll->setWidgetResizable(true);
  scroll->setWidget(forms_);
  // Never narrower than the widest form: fields are never slivers, whatever the docks take.
  scroll->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  int formWidth = 0;
  for (const CaseForm* form : formOf_) formWidth = std::max(formWidth, form->minimumSizeHint().width());
  scroll->setMinimumWidth(formWidth + scroll->verticalScrollBar()->sizeHint().width() +
                          2 * scroll->frameWidth());
  horizontal->setChildrenCollapsible(false);
  horizontal->addWidget(scroll);

  tsChart_ = new CycleChart(ChartKind::TemperatureEntropy, *units_);
  pvChart_ = new CycleChart(ChartKind::PressureVolume, *units_);
  hsChart_ = new CycleChart(ChartKind::EnthalpyEntropy, *units_);
  for (CycleChart* chart : {tsChart_, pvChart_, hsChart_}) chart->setMinimumSize(kChartMinimum);
  chartHost_ = new QStackedWidget(horizontal);
  chartSplitter_ = new QSplitter(Qt::Horizontal);
  chartSplitter_->setObjectName("chartSplitter");
  chartSplitter_->setChildrenCollapsible(false);
  chartTabs_ = new QTabWidget;
  chartTabs_->setObjectName("chartTabs");
  chartHost_->addWidget(chartSplitter_);
  chartHost_->addWidget(chartTabs_);
  // One chart's width at least; narrower than two, the charts go into tabs (arrangeCharts).
  chartHost_->setMinimumSize(kChartMinimum.width(),
                             kChartMinimum.height() + chartTabs_->tabBar()->sizeHint().height());
  chartHost_->installEventFilter(this);
  horizontal->addWidget(chartHost_);
  horizontal->setStretchFactor(0, 0);
  horizontal->setStretchFactor(1, 1);
  horizontal->setSizes({scroll->minimumWidth(), 1200});
  return horizontal;
}

QWidget* MainWindow::createStationBox() {
  auto* stationBox = new QGroupBox(tr("Stations"));
  auto* stationLayout = new QVBoxLayout(stationBox);
  tableMode_ = new QComboBox(stationBox);
  tableMode_->setObjectName("tableMode");
  tableMode_->addItems({tr("With losses"), tr("Ideal"), tr("Difference (with losses − ideal)"),
                        tr("Difference from baseline (with losses − baseline)")});
  stationLayout->addWidget(tableMode_);
  stationModel_ = new StationTableModel(*units_, this);
  stationView_ = new QTableView(stationBox);
  stationView_->setObjectName("stationTable");
  stationView_->setModel(stationModel_);
  stationView_->verticalHeader()->hide();
  stationView_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
  stationView_->setSelectionBehavior(QAbstractItemView::SelectRows);
  stationView_->setAlternatingRowColors(true);
  stationView_->verticalHeader()->setDefaultSectionSize(QFontMetrics(stationView_->font()).height() + 4);
  stationView_->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  stationLayout->addWidget(stationView_);
  connect(tableMode_, &QComboBox::currentIndexChanged, this,
          [this](int index) { stationModel_->setMode(static_cast<TableMode>(index)); });
  return stationBox;
}

QWidget* MainWindow::createPerformanceBox() {
  auto* performanceBox = new QGroupBox(tr("Performance"));
  auto* performanceLayout = new QVBoxLayout(performanceBox);
  performanceModel_ = new PerformanceModel(*units_, this);
  performanceView_ = new QTableView(performanceBox);
  performanceView_->setObjectName("performanceTable");
  performanceView_->setModel(performanceModel_);
  performanceView_->verticalHeader()->hide();
  // The names take what the numbers leave (never less than their text: fitTables).
  performanceView_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
  performanceView_->horizontalHeader()->setSectionResizeMode(0, QHeaderView::Stretch);
  performanceView_->setAlternatingRowColors(true);
  performanceView_->verticalHeader()->setDefaultSectionSize(QFontMetrics(performanceView_->font()).height() +
                                                            4);
  performanceView_->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  performanceLayout->addWidget(performanceView_);
  return performanceBox;
}

void MainWindow::createBottomTabs(QSplitter* vertical) {
  // Side by side where both fit, else in two tabs (a laptop screen with a dock open).
  auto* bottom = tablePair_ =
      new TablePair(createStationBox(), tr("Stations"), createPerformanceBox(), tr("Performance"));
  bottom->setObjectName("tablePair");
  connect(bottom, &TablePair::arranged, this, [this] {
    if (vertical_->isVisible()) fitTableRows();
  });

  // The tables and the loss audit share the bottom area, in tabs, so that the audit is in sight
  // from the start without taking room from the charts. View › Loss Audit moves it into a dock
  // of its own (placeAudit).
  bottomTabs_ = new QTabWidget(vertical);
  bottomTabs_->setObjectName("bottomTabs");
  bottomTabs_->setDocumentMode(true);
  bottomTabs_->addTab(bottom, tr("Stations and performance"));
  auditPanel_ = new AuditPanel(*document_, *units_, *router_);
  auditPanel_->setSideBySide(true);
  bottomTabs_->addTab(auditPanel_, tr("Loss audit"));
  tradeStudyPanel_ = new TradeStudyPanel(*document_, *units_);
  tradeStudyPanel_->setSideBySide(true);
  bottomTabs_->addTab(tradeStudyPanel_, tr("Trade study"));
  vertical->addWidget(bottomTabs_);
}

QDockWidget* MainWindow::createDock(const QString& title, const char* name, int width) {
  auto* dock = new QDockWidget(title, this);
  dock->setObjectName(QString::fromLatin1(name));
  dock->setFeatures(QDockWidget::DockWidgetClosable | QDockWidget::DockWidgetMovable |
                    QDockWidget::DockWidgetFloatable);
  addDockWidget(Qt::RightDockWidgetArea, dock);
  resizeDocks({dock}, {width}, Qt::Horizontal);
  dock->hide();  // until the user shows it (View menu); the window state keeps it
  return dock;
}

void MainWindow::createDocks() {
  // The loss audit beside the charts, in a dock, when the user asks for it (View › Loss Audit):
  // its place and visibility are kept with the window state (settings). While the dock is
  // hidden the audit is a tab of the bottom area. The trade study the same way, wider: its
  // chart needs the room.
  auditDock_ = createDock(tr("Loss audit"), "auditDock", 440);
  tradeStudyDock_ = createDock(tr("Trade study"), "tradeStudyDock", 640);
  QAction* toggle = auditDock_->toggleViewAction();
  // Triggered: after the dock has shown or hidden itself; toggled: also its close button.
  connect(toggle, &QAction::triggered, this, &MainWindow::placeAudit);
  connect(toggle, &QAction::toggled, this, &MainWindow::placeAudit);
  toggle->setObjectName("auditDockAction");
  toggle->setText(tr("&Loss Audit"));
  QAction* studyToggle = tradeStudyDock_->toggleViewAction();
  connect(studyToggle, &QAction::triggered, this, &MainWindow::placeTradeStudy);
  connect(studyToggle, &QAction::toggled, this, &MainWindow::placeTradeStudy);
  studyToggle->setObjectName("tradeStudyDockAction");
  studyToggle->setText(tr("Trade &Study"));
  QMenu* viewMenu = actions_->viewMenu();
  // Side by side, a third chart leaves each canvas too narrow at a laptop's width: the h-s chart
  // joins the other two there on request, and is always a tab of its own.
  enthalpyEntropyBeside_ = new QAction(tr("&Enthalpy–Entropy Chart Beside"), this);
  enthalpyEntropyBeside_->setObjectName("enthalpyEntropyBesideAction");
  enthalpyEntropyBeside_->setCheckable(true);
  connect(enthalpyEntropyBeside_, &QAction::toggled, this, [this] { setChartLayout(chartLayout_); });
  const QList<QAction*> items = viewMenu->actions();
  const qsizetype after = items.indexOf(actions_->tabbed()) + 1;
  viewMenu->insertAction(after > 0 && after < items.size() ? items[after] : nullptr, enthalpyEntropyBeside_);
  viewMenu->addSeparator();
  viewMenu->addAction(toggle);
  viewMenu->addAction(studyToggle);
}

void MainWindow::setChartLayout(ChartLayout chartLayout) {
  chartLayout_ = chartLayout;
  (chartLayout == ChartLayout::Tabbed ? actions_->tabbed() : actions_->sideBySide())->setChecked(true);
  settings_.setChartLayout(chartLayout);
  arrangeCharts();
}

bool MainWindow::chartsInTabs() const {
  return chartHost_->currentWidget() == chartTabs_;
}

void MainWindow::arrangeCharts() {
  // Side by side as chosen while each chart shown there has its minimum width; in tabs when the
  // room is less (a dock beside them on a laptop screen), back side by side when it grows again.
  const int beside = hsBeside() ? 3 : 2;
  const int sideBySideWidth = beside * kChartMinimum.width() + (beside - 1) * chartSplitter_->handleWidth();
  const bool narrow = chartHost_->isVisible() && chartHost_->width() < sideBySideWidth;
  const std::array<QWidget*, 3> charts{tsChart_, pvChart_, hsChart_};
  if (chartLayout_ == ChartLayout::Tabbed || narrow) {
    if (!chartsInTabs() || chartTabs_->count() < 3) {
      chartTabs_->addTab(tsChart_, tr("Temperature–entropy"));
      chartTabs_->addTab(pvChart_, tr("Pressure–volume"));
      chartTabs_->addTab(hsChart_, tr("Enthalpy–entropy"));
      chartTabs_->setCurrentIndex(0);
      chartHost_->setCurrentWidget(chartTabs_);
    }
    // Only the current tab's chart is shown: a chart shown on a hidden page paints over the
    // current one until the tabs are switched.
    for (QWidget* chart : charts) chart->setVisible(chart == chartTabs_->currentWidget());
    return;
  }
  if (chartsInTabs() || chartSplitter_->count() < 3) {
    for (QWidget* chart : charts) chartSplitter_->addWidget(chart);
    chartHost_->setCurrentWidget(chartSplitter_);
  }
  tsChart_->show();  // a chart that was on a hidden tab page stays hidden in the splitter
  pvChart_->show();
  hsChart_->setVisible(hsBeside());
}

bool MainWindow::hsBeside() const {
  return enthalpyEntropyBeside_ && enthalpyEntropyBeside_->isChecked();
}

bool MainWindow::eventFilter(QObject* watched, QEvent* event) {
  if (watched == chartHost_ && (event->type() == QEvent::Resize || event->type() == QEvent::Show))
    arrangeCharts();
  if (watched == vertical_ && event->type() == QEvent::Show) fitTableRows();
  if (watched == strip_ && (event->type() == QEvent::Resize || event->type() == QEvent::Show)) fitStrip();
  return QMainWindow::eventFilter(watched, event);
}

void MainWindow::placeAudit() {
  const bool docked = !auditDock_->isHidden();
  if (docked && auditDock_->widget() != auditPanel_) {
    bottomTabs_->removeTab(bottomTabs_->indexOf(auditPanel_));
    auditPanel_->setSideBySide(false);
    auditDock_->setWidget(auditPanel_);
    fitDock(auditDock_, 440);
  } else if (!docked && auditDock_->widget() == auditPanel_) {
    auditDock_->setWidget(nullptr);
    auditPanel_->setSideBySide(true);
    bottomTabs_->insertTab(1, auditPanel_, tr("Loss audit"));
  }
}

void MainWindow::fitDock(QDockWidget* dock, int preferredWidth) {
  // At most 40 % of a laptop screen's width, so that the forms and charts keep theirs.
  resizeDocks({dock}, {std::min(preferredWidth, width() * 2 / 5)}, Qt::Horizontal);
}

void MainWindow::placeTradeStudy() {
  const bool docked = !tradeStudyDock_->isHidden();
  if (docked && tradeStudyDock_->widget() != tradeStudyPanel_) {
    bottomTabs_->removeTab(bottomTabs_->indexOf(tradeStudyPanel_));
    tradeStudyPanel_->setSideBySide(false);
    tradeStudyDock_->setWidget(tradeStudyPanel_);
    fitDock(tradeStudyDock_, 640);
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

void MainWindow::setPressureVolumeLogAxes(bool on) {
  pvChart_->setLogAxes(on);
  settings_.setPressureVolumeLogAxes(on);
}

// ---------------------------------------------------------------------------------------------
// Selection and results

QSet<QString> MainWindow::stationsOf(Section section) const {
  QSet<QString> out;
  const auto evaluation = document_->evaluation();
  if (!evaluation) return out;
  const auto& cycle = evaluation->actual;
  // The flight condition is the free stream's state, the design's sizing the engine face's: the
  // network's description names their stations.
  if (cycle.network && section == Section::Flight)
    out.insert(QString::fromStdString(cycle.network->freeStream));
  if (cycle.network && section == Section::Design)
    out.insert(QString::fromStdString(cycle.network->engineFace));
  const std::string component = sectionComponent(section);
  if (component.empty()) return out;
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
  const auto shown = std::find(stripSections_.begin(), stripSections_.end(), section);
  {
    const QSignalBlocker blocker(strip_);
    strip_->setCurrentRow(shown == stripSections_.end() ? -1 : int(shown - stripSections_.begin()));
  }
  const auto& all = allSections();
  const auto form = std::find(all.begin(), all.end(), section);
  if (form != all.end()) forms_->setCurrentIndex(int(form - all.begin()));
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
  fitTables();
  updateBanner();
}

void MainWindow::refreshBaseline() {
  const auto baseline = document_->baselineEvaluation();
  stationModel_->setBaseline(baseline);
  performanceModel_->setBaseline(baseline, document_->baselineTitle());
  // The station table's difference from the baseline only while there is one.
  const int baselineMode = static_cast<int>(TableMode::BaselineDifference);
  if (auto* model = qobject_cast<QStandardItemModel*>(tableMode_->model()))
    if (QStandardItem* item = model->item(baselineMode)) item->setEnabled(baseline != nullptr);
  if (!baseline && tableMode_->currentIndex() == baselineMode) tableMode_->setCurrentIndex(0);
  actions_->clearBaseline()->setEnabled(baseline != nullptr);
  // The charts overlay the baseline's cycle with losses (grey, dash-dot-dot, with its title).
  for (CycleChart* chart : {tsChart_, pvChart_, hsChart_})
    chart->setBaseline(baseline, document_->baselineTitle());
  // Three columns more or fewer: the performance table's width, and so the pair's arrangement.
  fitTables();
}

void MainWindow::pinBaseline() {
  if (document_->pinBaseline())
    statusBar()->showMessage(tr("Baseline: %1").arg(document_->baselineTitle()));
  else
    statusBar()->showMessage(tr("There is no result to pin as the baseline."));
}

bool MainWindow::openBaseline(const QString& path, QString* error) {
  return files_->openBaseline(path, error);
}

QString MainWindow::performanceTableText() const {
  return performanceModel_->toTabSeparated();
}

int MainWindow::rowsHeight(const QTableView* view, int rows) {
  return view->horizontalHeader()->sizeHint().height() + rows * view->verticalHeader()->defaultSectionSize() +
         2 * view->frameWidth();
}

void MainWindow::fitTables() {
  // Every column in view: a table is never narrower than its columns, so it never scrolls
  // sideways. At least three rows; every row when the window's height allows (fitTableRows).
  for (QTableView* view : {stationView_, performanceView_}) {
    const auto* asView = static_cast<const QAbstractItemView*>(view);
    int width = 2 * view->frameWidth() + view->verticalScrollBar()->sizeHint().width();
    for (int c = 0; c < view->model()->columnCount(); ++c)
      width += std::max(asView->sizeHintForColumn(c), view->horizontalHeader()->sectionSizeHint(c));
    view->setMinimumSize(width, rowsHeight(view, kMinimumTableRows));
  }
  const int rows = std::max(stationModel_->rowCount(), performanceModel_->rowCount());
  tablePair_->fit();  // the widths changed
  if (rows != tableRows_ && vertical_->isVisible()) fitTableRows();
  tableRows_ = rows;
}

void MainWindow::fitTableRows() {
  // The bottom area as high as the taller table's rows need, the charts the rest (at least their
  // minimum); later the user's splitter.
  int extra = 0;
  for (QTableView* view : {stationView_, performanceView_})
    extra = std::max(extra, rowsHeight(view, view->model()->rowCount()) - view->minimumHeight());
  const int wanted = bottomTabs_->minimumSizeHint().height() + extra;
  const int total = vertical_->height() - vertical_->handleWidth();
  const int top = std::max(total - wanted, vertical_->widget(0)->minimumSizeHint().height());
  vertical_->setSizes({top, total - top});
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
    const FieldSpec* field = nullptr;
    for (const auto& spec : caseFields())
      if (spec.kind == FieldKind::Number && spec.path(c) == problem.path) field = &spec;
    if (field) {
      // The field's value in display units at display precision, as the form says it.
      lines << sectionName(field->section) + QStringLiteral(" › ") +
                   fieldRangeProblem(*field, field->get(c), QString::fromStdString(problem.valid), *units_);
      continue;
    }
    QString where = QString::fromStdString(problem.path);
    for (const auto& spec : caseFields())
      if (spec.path(c) == problem.path)
        where = sectionName(spec.section) + QStringLiteral(" › ") + fieldLabel(spec);
    lines << tr("%1: %2 is outside the valid range %3")
                 .arg(where, QString::fromStdString(problem.value), QString::fromStdString(problem.valid));
  }
  if (document_->hasFailure()) lines << document_->failure(*units_);
  const QString tail = document_->evaluation()
                           ? tr("Charts and tables show the last valid result (stale).")
                           : tr("There is no result for this case: the charts and tables are empty.");
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

QString MainWindow::stripName(Section section) const {
  if (section == Section::Afterburner && !document_->currentCase().afterburner.enabled)
    return tr("%1 (unlit)").arg(sectionName(Section::Afterburner));
  return sectionName(section);
}

void MainWindow::updateStrip() {
  fillStrip(document_->currentCase().architecture);
  const bool lit = document_->currentCase().afterburner.enabled;
  const auto afterburner = std::find(stripSections_.begin(), stripSections_.end(), Section::Afterburner);
  strip_->item(int(afterburner - stripSections_.begin()))
      ->setForeground(lit ? palette().brush(QPalette::Text)
                          : palette().brush(QPalette::Disabled, QPalette::Text));
  for (int i = 0; i < int(stripSections_.size()); ++i) {
    const Section section = stripSections_[size_t(i)];
    const QSet<QString> stations = stationsOf(section);
    QStringList ids(stations.begin(), stations.end());
    std::sort(ids.begin(), ids.end(),
              [](const QString& a, const QString& b) { return a.toInt() < b.toInt(); });
    strip_->item(i)->setToolTip(
        ids.isEmpty() ? stripName(section) : tr("%1: stations %2").arg(stripName(section), ids.join(", ")));
  }
  fitStrip();
}

namespace {

/// The width of a strip item for its text (the widest line) [px].
int stripItemWidth(const QFontMetrics& metrics, const QString& text) {
  int widest = 0;
  for (const QString& line : text.split(QLatin1Char('\n')))
    widest = std::max(widest, metrics.horizontalAdvance(line));
  return widest + 28;
}

/// A name of several words on two lines, broken at the space that makes the longer line shortest
/// ("Nachbrenner (nicht gezündet)": "Nachbrenner" over "(nicht gezündet)"); one word as it is.
QString onTwoLines(const QFontMetrics& metrics, const QString& name) {
  QString best = name;
  int bestWidth = metrics.horizontalAdvance(name);
  for (qsizetype at = name.indexOf(QLatin1Char(' ')); at >= 0; at = name.indexOf(QLatin1Char(' '), at + 1)) {
    const int width =
        std::max(metrics.horizontalAdvance(name.left(at)), metrics.horizontalAdvance(name.mid(at + 1)));
    if (width < bestWidth) {
      bestWidth = width;
      best = name.left(at) + QLatin1Char('\n') + name.mid(at + 1);
    }
  }
  return best;
}

/// The largest width w at least `smallest` such that the widths, none above w, sum to at most
/// `room`; no cap (INT_MAX) when they fit as they are [px].
int widthCap(const std::vector<int>& widths, int room, int smallest) {
  auto total = [&](int cap) {
    int sum = 0;
    for (int w : widths) sum += std::min(w, cap);
    return sum;
  };
  if (total(std::numeric_limits<int>::max()) <= room) return std::numeric_limits<int>::max();
  int low = smallest, high = *std::max_element(widths.begin(), widths.end());
  while (low < high) {  // the largest cap in [smallest, widest] whose total fits
    const int mid = (low + high + 1) / 2;
    if (total(mid) <= room)
      low = mid;
    else
      high = mid - 1;
  }
  return low;
}

}  // namespace

void MainWindow::fitStrip() {
  const QFontMetrics metrics(strip_->font());
  const int height = metrics.height() * 2 + 8;
  // Each item takes its width and the spacing on both sides.
  int oneLine = 0;
  const int count = int(stripSections_.size());
  for (const Section section : stripSections_)
    oneLine += stripItemWidth(metrics, stripName(section)) + 2 * strip_->spacing();
  // The view's inner width from its own (an event filter sees a resize before the viewport's).
  const int room = strip_->width() - 2 * strip_->frameWidth();
  const bool twoLines = oneLine > room;
  std::vector<int> widths;
  QStringList texts;
  for (const Section section : stripSections_) {
    const QString name = stripName(section);
    texts << (twoLines ? onTwoLines(metrics, name) : name);
    widths.push_back(stripItemWidth(metrics, texts.back()));
  }
  // Still too wide (a dock beside at 1280 px): the widest items give way, elided, to the
  // same width, no narrower than four characters.
  const int cap =
      widthCap(widths, room - count * 2 * strip_->spacing() - 2, metrics.averageCharWidth() * 4 + 28);
  for (int i = 0; i < count; ++i) {
    QListWidgetItem* item = strip_->item(i);
    if (item->text() != texts[i]) item->setText(texts[i]);
    const QSize size(std::min(widths[static_cast<size_t>(i)], cap), height);
    if (item->sizeHint() != size) item->setSizeHint(size);
  }
}

// ---------------------------------------------------------------------------------------------
// Files, autosave and exports: the window's public interface, kept for its callers and tests

QString MainWindow::casePath() const {
  return document_->filePath();
}

bool MainWindow::openCase(const QString& path, QString* error) {
  return files_->openCase(path, error);
}

bool MainWindow::saveCaseAs(const QString& path) {
  return files_->saveCaseAs(path);
}

void MainWindow::newCase() {
  files_->newCase();
}

void MainWindow::open() {
  files_->open();
}

bool MainWindow::save() {
  return files_->save();
}

bool MainWindow::saveAs() {
  return files_->saveAs();
}

void MainWindow::closeEvent(QCloseEvent* event) {
  if (!files_->maybeSave()) {
    event->ignore();
    return;
  }
  tradeStudyPanel_->cancel();  // the panel's runner joins its thread when the window goes
  settings_.setWindowGeometry(saveGeometry());
  settings_.setWindowState(saveState());
  autosave_->remove();
  event->accept();
}

QString MainWindow::autosaveFolder() {
  return AutosaveStore::defaultFolder();
}

QString MainWindow::autosaveFile() const {
  return autosave_->ownFile();
}

AutosaveTimer* MainWindow::autosaveTimer() const {
  return autosave_->timer();
}

bool MainWindow::autosaveNow() {
  return autosave_->writeNow();
}

bool MainWindow::offerRecovery() {
  return autosave_->offerRecovery();
}

bool MainWindow::recoverFrom(const QString& autosaveFile) {
  return autosave_->recoverFrom(autosaveFile);
}

bool MainWindow::exportStationCsv(const QString& path) {
  return exports_->stationCsv(path);
}

bool MainWindow::exportResultJson(const QString& path) {
  return exports_->resultJson(path);
}

bool MainWindow::exportAuditCsv(const QString& path) {
  return exports_->auditCsv(path);
}

bool MainWindow::exportStudyCsv(const QString& path) {
  return exports_->studyCsv(path);
}

bool MainWindow::exportStudyJson(const QString& path) {
  return exports_->studyJson(path);
}

void MainWindow::showPreferences() {
  PreferencesDialog dialog(this);
  dialog.setUnitSystem(units_->system());
  dialog.setChartLayout(chartLayout_);
  dialog.setAutosaveWithinSeconds(settings_.autosaveWithinSeconds());
  if (dialog.exec() != QDialog::Accepted) return;
  setUnitSystem(dialog.unitSystem());
  setChartLayout(dialog.chartLayout());
  settings_.setAutosaveWithinSeconds(dialog.autosaveWithinSeconds());
  autosave_->setLimitSeconds(settings_.autosaveWithinSeconds());
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
