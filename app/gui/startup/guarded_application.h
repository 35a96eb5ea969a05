#pragma once
// The application object of cyclewright: a QApplication whose notify() catches a
// std::exception thrown by an event handler or a slot (an exception must not pass through Qt's
// event loop, which would abort), reports it and keeps running.

#include <QApplication>

class QMainWindow;

namespace cw::gui {

class GuardedApplication : public QApplication {
  Q_OBJECT

 public:
  GuardedApplication(int& argc, char** argv);

  /// Delivers the event; a std::exception thrown while handling it is reported (stderr, the
  /// status bar of the main window and, while a window is visible, a warning dialog named
  /// "internalErrorBox") and the event counts as not handled.
  bool notify(QObject* receiver, QEvent* event) override;

  /// Reports an exception that interrupted the handling of an event for `receiver`.
  void reportInterruption(QObject* receiver, const QString& what);

 private:
  static QMainWindow* mainWindowFor(QObject* receiver);

  bool showingDialog_ = false;  ///< one dialog at a time, however often the handler throws
};

}  // namespace cw::gui
