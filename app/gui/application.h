#pragma once
// Start-up of the Cyclewright application: command-line options and translation.

#include <QSize>
#include <QString>
#include <QStringList>

class QApplication;

namespace cw::gui {

struct StartOptions {
  QString casePath;        ///< case to open; the demo case when empty
  QString screenshotPath;  ///< when set: render the main window to this PNG and exit
  QSize screenshotSize{1600, 1000};
  QString language;  ///< e.g. "de"; the system locale when empty
};

/// Returns true when argv asks for an offscreen render (--screenshot), before QApplication exists.
bool wantsScreenshot(int argc, char** argv);

/// Installs the translator for options.language (or the system locale). Returns the language used.
QString installTranslation(QApplication& app, const QString& language);

}  // namespace cw::gui
