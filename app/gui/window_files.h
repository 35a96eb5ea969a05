#pragma once
// The main window's files: open, save, save as, the recent files, and the question before
// unsaved changes are lost. The window's title names the open file.

#include <QObject>
#include <QString>
#include <QStringList>

class QMainWindow;

namespace cw::gui {

class AppSettings;
class CaseDocument;
class DisplayUnits;

class WindowFiles : public QObject {
  Q_OBJECT

 public:
  /// `units`: those of the window, for the numbers of a baseline's failure.
  WindowFiles(QMainWindow& window, CaseDocument& document, AppSettings& settings, const DisplayUnits& units);

  /// Opens a case file (a path or a Qt resource) and removes the temporaries interrupted saves
  /// left beside it; see MainWindow::openCase.
  bool openCase(const QString& path, QString* error = nullptr);
  /// Saves to a path (SI, atomically). Returns false and says why when it cannot.
  bool saveCaseAs(const QString& path);

  void newCase();
  /// Asks for a file, then opens it.
  void open();
  bool save();
  bool saveAs();
  /// Opens a recent file, after asking about unsaved changes.
  void openRecent(const QString& path);
  /// The recent files, newest first (absolute paths).
  QStringList recentFiles() const;
  /// Asks whether to save unsaved changes. Returns false when the user cancels.
  bool maybeSave();
  /// The window's title: the file's name and the modified mark.
  void updateTitle();
  /// Makes a saved case the baseline (File › Open Baseline…): its title is the case's title,
  /// else the file's name. Returns false and says why (in *error, the status bar and, while the
  /// window is visible, a dialog "baselineFailedBox") when it cannot be read or has no cycle.
  bool openBaseline(const QString& path, QString* error = nullptr);
  /// Asks for a file, then opens it as the baseline.
  void chooseBaseline();

 signals:
  /// The case was written to its file: nothing is left to recover.
  void saved();

 private:
  bool refuseToOpen(const QString& message, QString* error);

  QMainWindow& window_;
  CaseDocument& document_;
  AppSettings& settings_;
  const DisplayUnits& units_;
};

}  // namespace cw::gui
