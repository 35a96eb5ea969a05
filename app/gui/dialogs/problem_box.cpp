#include "dialogs/problem_box.h"

#include <QMessageBox>
#include <QWidget>

namespace cw::gui {

void showProblemBox(QWidget* window, const QString& objectName, const QString& title, const QString& text,
                    const QString& detail) {
  if (!window || !window->isVisible()) return;
  QMessageBox box(QMessageBox::Warning, title, text, QMessageBox::Ok, window);
  box.setObjectName(objectName);
  box.setInformativeText(detail);
  box.exec();
}

}  // namespace cw::gui
