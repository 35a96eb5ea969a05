#pragma once
// When to autosave: a pause after the last edit (restarted by every edit), but never later than
// a limit after the first edit not yet autosaved, so that continuous typing is saved too.

#include <QObject>

class QTimer;

namespace cw::gui {

class AutosaveTimer : public QObject {
  Q_OBJECT

 public:
  /// The pause after the last edit [ms].
  static constexpr int kPauseMs = 2000;

  explicit AutosaveTimer(QObject* parent = nullptr);

  /// The limit after the first edit not yet autosaved [ms]; the pause is never longer.
  void setLimit(int limitMs);
  int limit() const;
  int pause() const;

  /// An edit: restarts the pause, and starts the limit unless it is already running.
  void edited();
  /// After an autosave, a save or a discard: nothing is due any more.
  void stop();
  bool isPending() const;

 signals:
  /// Time to autosave.
  void due();

 private:
  void fire();

  QTimer* pause_ = nullptr;
  QTimer* limit_ = nullptr;
};

}  // namespace cw::gui
