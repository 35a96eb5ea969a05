#pragma once
// The main window's files: new (of an architecture), open, save, save as, the recent files, and
// the questions before unsaved changes are lost and before a version 1 file is overwritten with
// version 2. The window's title names the open file and the case's architecture.

#include "engine/case_inputs.h"

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

  /// A new case of the architecture (engine::newCase), after asking about unsaved changes.
  void newCase(engine::Architecture architecture = engine::Architecture::Turbojet);
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
  /// The window's title: the file's name, the modified mark and the case's architecture.
  void updateTitle();
  /// The case-file version of the open file (the version written for a new case).
  int fileVersion() const { return fileVersion_; }
  /// The architecture's translated name ("Two-spool turbojet").
  static QString architectureText(engine::Architecture architecture);
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
  /// Asks before a version 1 file is overwritten with version 2 (objectName "versionOneSaveBox").
  bool confirmVersionUpgrade(const QString& path);

  QMainWindow& window_;
  CaseDocument& document_;
  AppSettings& settings_;
  const DisplayUnits& units_;
  int fileVersion_;        ///< of the open file
  QString fileOfVersion_;  ///< the file fileVersion_ was read from
};

}  // namespace cw::gui
