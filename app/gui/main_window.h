#pragma once
// The main window of Cyclewright: the component strip, the form of the selected section, the
// temperature-entropy and pressure-volume charts, the station table and the performance
// summary, and the docks. The window lays them out; its actions, menus and toolbar
// (WindowActions), files (WindowFiles), autosave and recovery (WindowAutosave) and exports
// (WindowExports) are classes of their own.

#include "document/case_fields.h"
#include "document/settings.h"

#include <QMainWindow>
#include <QSet>
#include <QSize>
#include <QString>

#include <array>
#include <memory>
#include <optional>
#include <vector>

class QComboBox;
class QDockWidget;
class QLabel;
class QVBoxLayout;
class QListWidget;
class QSplitter;
class QStackedWidget;
class QTabWidget;
class QTableView;
class QwtPlot;

namespace cw::engine {
struct Evaluation;
}

namespace cw::gui {

class AuditPanel;
class AutosaveTimer;
class TradeStudyPanel;
class CaseDocument;
class CaseForm;
class CycleChart;
class DisplayUnits;
class PerformanceModel;
class SelectionRouter;
class StationTableModel;
class TablePair;
class WindowActions;
class WindowAutosave;
class WindowExports;
class WindowFiles;

/// The smallest a cycle chart gets in the window (legend, ticks and labels still readable) [px].
inline constexpr QSize kChartMinimum{300, 240};
/// The station and performance tables show at least this many rows.
inline constexpr int kMinimumTableRows = 3;

class MainWindow : public QMainWindow {
  Q_OBJECT

 public:
  explicit MainWindow(QWidget* parent = nullptr);
  ~MainWindow() override;

  /// Opens a case file (a path or a Qt resource such as ":/demo/demo-turbojet.json") and removes
  /// the temporaries interrupted saves left beside it. When it cannot be opened, returns false,
  /// keeps the open case and says why: the core reader's message naming the file (in *error,
  /// in the status bar and, while the window is visible, in a dialog named "openFailedBox").
  bool openCase(const QString& path, QString* error = nullptr);
  /// Saves to a path (SI, atomically). Returns false and says why when it cannot.
  bool saveCaseAs(const QString& path);

  /// The file name of the open case, empty when none.
  QString casePath() const;

  CaseDocument& document() const { return *document_; }
  DisplayUnits& units() const { return *units_; }
  SelectionRouter& selection() const { return *router_; }
  CycleChart* temperatureEntropyChart() const { return tsChart_; }
  CycleChart* pressureVolumeChart() const { return pvChart_; }
  CycleChart* enthalpyEntropyChart() const { return hsChart_; }
  StationTableModel* stationModel() const { return stationModel_; }
  PerformanceModel* performanceModel() const { return performanceModel_; }
  /// The loss-audit panel: a tab beside the station table and performance summary, or in its
  /// dock beside the charts when the user shows that (View › Loss Audit; kept with the window
  /// state).
  AuditPanel* auditPanel() const { return auditPanel_; }
  QDockWidget* auditDock() const { return auditDock_; }
  /// The trade-study panel: a tab beside the loss audit, or in its dock (View › Trade Study; kept
  /// with the window state).
  TradeStudyPanel* tradeStudyPanel() const { return tradeStudyPanel_; }
  QDockWidget* tradeStudyDock() const { return tradeStudyDock_; }
  /// The tabs of the bottom area: the station table with the performance summary and, while
  /// not in their docks, the audit and the trade study.
  QTabWidget* bottomTabs() const { return bottomTabs_; }
  /// The banner that says the result is stale and why.
  QLabel* staleBanner() const { return banner_; }

  void setChartLayout(ChartLayout layout);
  ChartLayout chartLayout() const { return chartLayout_; }
  void setUnitSystem(UnitSystem system);
  /// Logarithmic axes on the pressure-volume chart (kept in the settings).
  void setPressureVolumeLogAxes(bool on);
  /// Puts the audit panel in its dock when the dock is shown, else in the bottom tabs.
  void placeAudit();
  /// Puts the trade-study panel in its dock when the dock is shown, else in the bottom tabs.
  void placeTradeStudy();

  // Exports without dialogs (tests and the menu actions).
  bool exportStationCsv(const QString& path);
  /// The performance table as tab-separated text, as shown (with the baseline's columns when set).
  QString performanceTableText() const;
  /// Makes a saved case the baseline (WindowFiles::openBaseline).
  bool openBaseline(const QString& path, QString* error = nullptr);
  bool exportResultJson(const QString& path);
  bool exportAuditCsv(const QString& path);
  bool exportStudyCsv(const QString& path);
  bool exportStudyJson(const QString& path);

  /// The folder of the autosaves (QStandardPaths::AppLocalDataLocation; autosave_store.h).
  static QString autosaveFolder();
  /// This window's autosave file; empty before its first autosave.
  QString autosaveFile() const;
  /// When the next autosave is due (after an edit: 2 s after the last, at most the Preferences'
  /// limit after the first).
  AutosaveTimer* autosaveTimer() const;
  /// Writes the autosave now (when modified). Returns true when written.
  bool autosaveNow();
  /// At start: removes the temporaries of interrupted autosaves whose process is gone, then
  /// offers the autosaves no running instance holds, newest first, until one is recovered (Yes)
  /// or none is left (No discards one). One that cannot be read is set aside with a message.
  /// Returns true when a case was recovered.
  bool offerRecovery();
  /// Loads an autosaved case as a modified, unsaved case of its origin file. Returns false, with
  /// a message naming the file and what is wrong, when it is not a valid autosave.
  bool recoverFrom(const QString& autosaveFile);

  WindowActions& actions() const { return *actions_; }
  WindowFiles& files() const { return *files_; }
  WindowExports& exports() const { return *exports_; }

 public slots:
  void showAbout();
  void newCase();
  void open();
  bool save();
  bool saveAs();
  void showPreferences();
  /// Pins the shown result as the baseline (Edit › Pin as Baseline).
  void pinBaseline();

 protected:
  void closeEvent(QCloseEvent* event) override;
  bool eventFilter(QObject* watched, QEvent* event) override;
  void changeEvent(QEvent* event) override;

 private:
  void createCentralWidget();
  void createStrip(QVBoxLayout* layout);
  void createBanner(QVBoxLayout* layout);
  QSplitter* createFormsAndCharts();
  QWidget* createStationBox();
  QWidget* createPerformanceBox();
  void createBottomTabs(QSplitter* vertical);
  QDockWidget* createDock(const QString& title, const char* name, int width);
  void createDocks();
  void connectDocument();
  void restoreFromSettings();
  void refreshResult();
  /// The station and performance tables' minimum sizes: every column, at least three rows.
  void fitTables();
  /// The bottom area's height for every row of the tables, where the window allows.
  void fitTableRows();
  static int rowsHeight(const QTableView* view, int rows);
  void fitDock(QDockWidget* dock, int preferredWidth);
  /// Puts the charts side by side or in tabs: as chosen, and in tabs while too narrow for two.
  void arrangeCharts();
  bool chartsInTabs() const;
  bool hsBeside() const;  ///< the h-s chart shown beside the others (View menu)
  void updateBanner();
  /// The tables follow the document's baseline (columns, difference mode, action states).
  void refreshBaseline();
  /// The stale banner's colours from the window's palette (light or dark).
  void applyBannerPalette();
  void updateStrip();
  /// Fills the strip with the items of the case's architecture (stripSections), when it changed.
  void fillStrip(engine::Architecture architecture);
  /// The strip's items in one row without a scroll bar: each name on one line while they all
  /// fit, else a name of several words on two (the strip is two lines high), the longer line
  /// as short as it can be. The tooltips give each name whole.
  void fitStrip();
  /// A section's name in the strip, on one line ("Afterburner (unlit)" while unlit).
  QString stripName(Section section) const;
  void routeSelection(Section section);
  QSet<QString> stationsOf(Section section) const;

  AppSettings settings_;
  DisplayUnits* units_ = nullptr;
  CaseDocument* document_ = nullptr;
  SelectionRouter* router_ = nullptr;
  std::shared_ptr<const engine::Evaluation> shown_;
  WindowFiles* files_ = nullptr;
  WindowAutosave* autosave_ = nullptr;
  WindowExports* exports_ = nullptr;
  WindowActions* actions_ = nullptr;

  QListWidget* strip_ = nullptr;
  QStackedWidget* forms_ = nullptr;
  std::vector<CaseForm*> formOf_;                          ///< one per allSections(), in its order
  std::vector<Section> stripSections_;                     ///< the strip's items, row by row
  std::optional<engine::Architecture> stripArchitecture_;  ///< the architecture the strip shows
  QLabel* banner_ = nullptr;
  CycleChart* tsChart_ = nullptr;
  CycleChart* pvChart_ = nullptr;
  CycleChart* hsChart_ = nullptr;
  QAction* enthalpyEntropyBeside_ = nullptr;  ///< View: the h-s chart beside the others (side by side)
  QStackedWidget* chartHost_ = nullptr;
  QSplitter* chartSplitter_ = nullptr;
  QTabWidget* chartTabs_ = nullptr;
  ChartLayout chartLayout_ = ChartLayout::SideBySide;
  QTableView* stationView_ = nullptr;
  StationTableModel* stationModel_ = nullptr;
  QComboBox* tableMode_ = nullptr;
  QTableView* performanceView_ = nullptr;
  PerformanceModel* performanceModel_ = nullptr;
  QTabWidget* bottomTabs_ = nullptr;
  QSplitter* vertical_ = nullptr;
  TablePair* tablePair_ = nullptr;
  int tableRows_ = -1;
  AuditPanel* auditPanel_ = nullptr;
  QDockWidget* auditDock_ = nullptr;
  TradeStudyPanel* tradeStudyPanel_ = nullptr;
  QDockWidget* tradeStudyDock_ = nullptr;
};

}  // namespace cw::gui
