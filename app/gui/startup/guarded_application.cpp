#include "startup/guarded_application.h"

#include <QMainWindow>
#include <QMessageBox>
#include <QStatusBar>

#include <cstdio>
#include <exception>
#include <new>

namespace cw::gui {

GuardedApplication::GuardedApplication(int& argc, char** argv) : QApplication(argc, argv) {}

bool GuardedApplication::notify(QObject* receiver, QEvent* event) {
  try {
    return QApplication::notify(receiver, event);
  } catch (const std::bad_alloc&) {
    reportInterruption(receiver, tr("out of memory"));
  } catch (const std::exception& e) {
    reportInterruption(receiver, QString::fromLocal8Bit(e.what()));
  }
  return false;
}

void GuardedApplication::reportInterruption(QObject* receiver, const QString& what) {
  const QString line = what.simplified();
  std::fprintf(stderr, "cyclewright: internal error: %s\n", line.toLocal8Bit().constData());
  QMainWindow* window = mainWindowFor(receiver);
  if (!window) return;
  const QString text = tr("An internal error interrupted the last action: %1").arg(line);
  window->statusBar()->showMessage(text);
  if (showingDialog_ || !window->isVisible()) return;
  auto* box = new QMessageBox(QMessageBox::Warning, tr("Internal error"), text, QMessageBox::Ok, window);
  box->setObjectName("internalErrorBox");
  box->setInformativeText(
      tr("Cyclewright keeps running. Save your case under a new name to be safe, and please report what "
         "you did."));
  box->setAttribute(Qt::WA_DeleteOnClose);
  connect(box, &QObject::destroyed, this, [this] { showingDialog_ = false; });
  showingDialog_ = true;
  box->open();  // window-modal, without a nested event loop inside notify()
}

QMainWindow* GuardedApplication::mainWindowFor(QObject* receiver) {
  if (auto* widget = qobject_cast<QWidget*>(receiver))
    if (auto* window = qobject_cast<QMainWindow*>(widget->window())) return window;
  if (auto* window = qobject_cast<QMainWindow*>(activeWindow())) return window;
  for (QWidget* widget : topLevelWidgets())
    if (auto* window = qobject_cast<QMainWindow*>(widget); window && window->isVisible()) return window;
  return nullptr;
}

}  // namespace cw::gui
