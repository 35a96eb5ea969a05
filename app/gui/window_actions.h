#pragma once
// Every action of the main window, its menus and its toolbar: one owner, so that the window
// itself only lays out its views. The actions call the window's public slots and views.

#include <QObject>

#include <vector>

class QAction;
class QActionGroup;
class QMenu;
class QToolBar;

namespace cw::gui {

class MainWindow;

class WindowActions : public QObject {
  Q_OBJECT

 public:
  /// Creates the actions and the menu bar of window (the toolbar comes with createToolBar()).
  explicit WindowActions(MainWindow& window);

  /// Adds the main toolbar; its buttons keep their width whatever the undo text says.
  void createToolBar();

  QAction* undo() const { return undo_; }
  QAction* redo() const { return redo_; }
  QAction* logAxes() const { return logAxes_; }
  QAction* sideBySide() const { return sideBySide_; }
  QAction* tabbed() const { return tabbed_; }
  /// The View menu, where the window adds its docks' toggles.
  QMenu* viewMenu() const { return viewMenu_; }
  QAction* clearBaseline() const { return clearBaseline_; }

 private:
  QAction* make(const QString& text, const char* name);
  void createFileActions();
  void createEditActions();
  void createViewActions();
  void createFileMenu();
  void createExportMenu(QMenu* fileMenu);
  void createEditMenu();
  void createViewMenu();
  void updateRecentMenu();
  void fixButtonWidths(QToolBar* bar);

  MainWindow& window_;
  QAction *newCase_ = nullptr, *open_ = nullptr, *save_ = nullptr, *saveAs_ = nullptr,
          *preferences_ = nullptr, *quit_ = nullptr, *about_ = nullptr;
  QAction *undo_ = nullptr, *redo_ = nullptr, *copyTs_ = nullptr, *copyPv_ = nullptr, *copyTable_ = nullptr,
          *copyStudyTable_ = nullptr, *copyPerformance_ = nullptr, *pinBaseline_ = nullptr,
          *openBaseline_ = nullptr, *clearBaseline_ = nullptr;
  QAction *resetZoom_ = nullptr, *logAxes_ = nullptr, *sideBySide_ = nullptr, *tabbed_ = nullptr;
  std::vector<QAction*> newArchitecture_;  ///< File › New: one per architecture, in the registry's order
  QActionGroup* layoutGroup_ = nullptr;
  QMenu* recentMenu_ = nullptr;
  QMenu* viewMenu_ = nullptr;
};

}  // namespace cw::gui
