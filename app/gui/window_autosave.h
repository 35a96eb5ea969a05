#pragma once
// The main window's autosave and the recovery of autosaves nobody holds (document/autosave_store.h
// keeps the files, document/autosave_timer.h says when).

#include <QObject>
#include <QString>

#include <memory>

class QMainWindow;

namespace cw::gui {

class AutosaveStore;
class AutosaveTimer;
class CaseDocument;
struct Autosave;
struct OrphanAutosave;

class WindowAutosave : public QObject {
  Q_OBJECT

 public:
  WindowAutosave(QMainWindow& window, CaseDocument& document, int limitSeconds);
  ~WindowAutosave() override;

  /// This window's autosave file; empty before its first autosave.
  QString ownFile() const;
  AutosaveTimer* timer() const { return timer_; }
  /// At most this long after the first edit [s].
  void setLimitSeconds(int seconds);
  /// Writes the autosave now (when modified). Returns true when written.
  bool writeNow();
  /// Removes this window's autosave (saved or closed: nothing to recover).
  void remove();
  /// See MainWindow::offerRecovery.
  bool offerRecovery();
  /// See MainWindow::recoverFrom.
  bool recoverFrom(const QString& autosaveFile);

 signals:
  /// A recovered case replaced the open one.
  void recovered();

 private:
  void scheduleAfterEdit();
  bool askToRecover(const Autosave& autosave);
  void recover(const Autosave& autosave);
  bool readAutosave(OrphanAutosave& orphan, Autosave& autosave);
  void showStatus(const QString& message);

  QMainWindow& window_;
  CaseDocument& document_;
  AutosaveTimer* timer_ = nullptr;
  std::unique_ptr<AutosaveStore> store_;
};

}  // namespace cw::gui
