#pragma once
// A warning the user must acknowledge: a file that cannot be opened, an autosave that cannot be
// recovered. Shown only while the window is visible (tests and screenshots run without them).

#include <QString>

class QWidget;

namespace cw::gui {

/// Shows a modal warning named objectName (tests find it by that name) over a visible window.
void showProblemBox(QWidget* window, const QString& objectName, const QString& title, const QString& text,
                    const QString& detail);

}  // namespace cw::gui
