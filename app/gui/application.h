#pragma once
// Start-up of the Cyclewright application: command-line options and translation.

#include <QSize>
#include <QString>
#include <QStringList>

class QApplication;
class QPalette;

namespace cw::gui {

struct StartOptions {
  QString casePath;        ///< case to open; the demo case when empty
  QString screenshotPath;  ///< when set: render the main window to this PNG and exit
  QSize screenshotSize{1600, 1000};
  QString language;  ///< e.g. "de"; the system locale when empty
};

/// Returns true when argv asks for an offscreen render (--screenshot), before QApplication exists.
bool wantsScreenshot(int argc, char** argv);

/// A dark palette (window #202124, base #2b2b2b, white text), for `--palette dark` and tests.
QPalette darkPalette();

/// Applies a named palette to the application: "dark" (Fusion style with darkPalette()) or
/// "system" (left as it is). Returns false for any other name.
bool applyPaletteNamed(QApplication& app, const QString& name);

/// Installs the translator for options.language (or the system locale). Returns the language used.
QString installTranslation(QApplication& app, const QString& language);

}  // namespace cw::gui
