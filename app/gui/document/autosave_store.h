#pragma once
// Autosaves for recovery after a crash, in the application's data folder
// (QStandardPaths::AppLocalDataLocation). Each running instance has one file of its own,
// "autosave-<pid>-<n>.json", replaced atomically (cw::io::writeFileAtomically) by one JSON
// document of our own that carries the case and the file it belongs to together:
//
//   {"format": "cyclewright-autosave", "version": 1,
//    "origin": "<absolute path of the case file, a resource path, or empty when untitled>",
//    "case": { the case document of cw::io::caseToJson }}
//
// While an instance runs it holds a lock file beside its autosave ("autosave-<pid>-<n>.lock",
// QLockFile: process id, program and host inside). An autosave whose lock nobody holds (its
// process ended, however it ended) is an orphan: the next start offers it for recovery. Reading
// checks everything and refuses a malformed file with a message that names it.

#include "engine/case_inputs.h"

#include <QByteArray>
#include <QDateTime>
#include <QString>

#include <cstddef>
#include <memory>
#include <vector>

class QLockFile;

namespace cw::gui {

/// An autosave read back.
struct Autosave {
  QString file;
  QString origin;  ///< the case file it belongs to; empty for an untitled case
  engine::Case inputs;
  QDateTime saved;  ///< when it was written (the file's time)
};

/// An orphaned autosave, claimed (its lock held) while it is offered; released when destroyed.
struct OrphanAutosave {
  QString file;
  std::shared_ptr<QLockFile> lock;
};

class AutosaveStore {
 public:
  /// The environment variable of the test seam: when set to a number of milliseconds, every
  /// autosave pauses that long (and says so on stderr) between writing its temporary file and
  /// renaming it, so that a test can kill the process at that moment.
  static constexpr const char* kTestDelayVariable = "CYCLEWRIGHT_TEST_AUTOSAVE_DELAY_MS";
  static constexpr const char* kFormat = "cyclewright-autosave";
  static constexpr int kVersion = 1;

  explicit AutosaveStore(const QString& folder = defaultFolder());
  ~AutosaveStore();
  AutosaveStore(const AutosaveStore&) = delete;
  AutosaveStore& operator=(const AutosaveStore&) = delete;

  /// QStandardPaths::AppLocalDataLocation.
  static QString defaultFolder();
  QString folder() const { return folder_; }
  /// This instance's autosave file; empty until the first write.
  QString ownFile() const { return ownFile_; }

  /// Replaces this instance's autosave with the case and its origin (made absolute). Throws
  /// cw::InvalidInput naming the file when it cannot be written.
  void write(const engine::Case& inputs, const QString& origin);
  /// Removes this instance's autosave (after a save, a discard or a clean close).
  void removeOwn();

  /// The orphans in the folder, newest first, each claimed.
  std::vector<OrphanAutosave> claimOrphans() const;
  /// Removes an orphan's file and its lock.
  static void discard(OrphanAutosave& orphan);
  /// Renames an orphan that cannot be read to "<file>.unreadable" (nothing the user typed is
  /// deleted) and releases it. Returns the new name, or empty when it could not be renamed.
  static QString setAside(OrphanAutosave& orphan);

  /// Reads and checks an autosave. Throws cw::InvalidInput "<file>: <what is wrong>" for a file
  /// that cannot be read, is not JSON, is not an autosave of this format and version, has an
  /// origin that is not an absolute path, or a case that is malformed (values out of range are
  /// kept: the user may have been typing).
  static Autosave read(const QString& file);
  /// The autosave document of a case and its origin.
  static QByteArray encode(const engine::Case& inputs, const QString& origin);

  /// Removes the temporary files of interrupted autosaves whose process is gone, and the locks
  /// of ended instances that left no autosave. Returns how many files it removed.
  std::size_t removeStaleTemporaries() const;

 private:
  bool claimOwnFile();

  QString folder_;
  QString ownFile_;
  std::unique_ptr<QLockFile> ownLock_;
};

}  // namespace cw::gui
