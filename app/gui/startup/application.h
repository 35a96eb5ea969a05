#pragma once
// Start-up of the Cyclewright application: its names, palette and translation (the command
// line's options are in start_options.h).

#include <QString>
#include <QStringList>

class QApplication;
class QColor;
class QPalette;

namespace cw::gui {

/// Names the application (organisation, name, version) for QSettings, QStandardPaths and --version.
void nameApplication();

/// Returns true when argv asks for an offscreen render (--screenshot, --export-figures), before
/// QApplication exists.
bool wantsScreenshot(int argc, char** argv);

/// A dark palette (window #202124, base #2b2b2b, white text), for `--palette dark` and tests.
QPalette darkPalette();

/// darkPalette() with the input fields' own base (#404349), so that line edits, spin boxes,
/// editable combo boxes and text fields stand out from the window and the chart canvases.
QPalette darkFieldPalette();

/// The WCAG 2 contrast ratio of two colours, (L1 + 0.05) / (L2 + 0.05) with L the relative
/// luminance of the sRGB colour, lighter over darker: 1 (equal) to 21 (black and white).
double contrastRatio(const QColor& a, const QColor& b);

/// Applies a named palette to the application: "dark" (Fusion style with darkPalette(), and
/// darkFieldPalette() for input fields) or "system" (left as it is). Returns false for any other
/// name.
bool applyPaletteNamed(QApplication& app, const QString& name);

/// The user-interface languages there are: "en" (the source texts) and one per translation
/// compiled into the resources (":/i18n/cyclewright_<code>.qm"), sorted.
QStringList availableLanguages();

/// Whether `language` (e.g. "de", "de_AT", "en_GB") can be shown: English, or a language with a
/// translation.
bool hasLanguage(const QString& language);

/// Installs the translator for `language` (or the system locale when empty). Returns the language used.
QString installTranslation(QApplication& app, const QString& language);

}  // namespace cw::gui
