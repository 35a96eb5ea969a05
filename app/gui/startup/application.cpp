#include "startup/application.h"

#include "charts/colours.h"

#include "common/version.h"

#include <QApplication>
#include <QDir>
#include <QLocale>
#include <QPalette>
#include <QStyleFactory>
#include <QTranslator>

#include <algorithm>
#include <cmath>
#include <cstring>

namespace cw::gui {

void nameApplication() {
  QCoreApplication::setApplicationName(QStringLiteral("Cyclewright"));
  QCoreApplication::setOrganizationName(QStringLiteral("Cyclewright"));
  QCoreApplication::setApplicationVersion(QString::fromLatin1(kVersion));
}

bool wantsScreenshot(int argc, char** argv) {
  for (int i = 1; i < argc; ++i)
    if (std::strcmp(argv[i], "--screenshot") == 0 || std::strncmp(argv[i], "--screenshot=", 13) == 0 ||
        std::strcmp(argv[i], "--export-figures") == 0 || std::strncmp(argv[i], "--export-figures=", 17) == 0)
      return true;
  return false;
}

QPalette darkPalette() {
  QPalette p;
  const QColor white(0xFF, 0xFF, 0xFF), dim(0x8A, 0x8F, 0x95);
  p.setColor(QPalette::Window, QColor(0x20, 0x21, 0x24));
  p.setColor(QPalette::WindowText, white);
  p.setColor(QPalette::Base, QColor(0x2B, 0x2B, 0x2B));
  p.setColor(QPalette::AlternateBase, QColor(0x33, 0x35, 0x38));
  p.setColor(QPalette::Text, white);
  p.setColor(QPalette::Button, QColor(0x30, 0x31, 0x34));
  p.setColor(QPalette::ButtonText, white);
  p.setColor(QPalette::BrightText, QColor(0xFF, 0x80, 0x80));
  p.setColor(QPalette::Light, QColor(0x4A, 0x4B, 0x4F));
  p.setColor(QPalette::Midlight, QColor(0x3C, 0x3D, 0x40));
  p.setColor(QPalette::Mid, QColor(0x5F, 0x63, 0x68));
  p.setColor(QPalette::Dark, QColor(0x14, 0x14, 0x16));
  p.setColor(QPalette::Shadow, QColor(0x00, 0x00, 0x00));
  p.setColor(QPalette::Highlight, kOkabeItoBlue);
  p.setColor(QPalette::HighlightedText, white);
  p.setColor(QPalette::Link, QColor(0x56, 0xB4, 0xE9));  // Okabe-Ito sky blue
  p.setColor(QPalette::ToolTipBase, QColor(0x30, 0x31, 0x34));
  p.setColor(QPalette::ToolTipText, white);
  p.setColor(QPalette::PlaceholderText, dim);
  for (auto role : {QPalette::WindowText, QPalette::Text, QPalette::ButtonText})
    p.setColor(QPalette::Disabled, role, dim);
  return p;
}

QPalette darkFieldPalette() {
  // On the window's #202124 the canvases' #2b2b2b base differs by a contrast ratio of 1.1: a field
  // of that colour hardly shows. #404349 is 1.6 against the window and leaves the white text
  // at 9.9 (WCAG AAA asks 7 for text).
  QPalette p = darkPalette();
  p.setColor(QPalette::Base, QColor(0x40, 0x43, 0x49));
  return p;
}

namespace {

/// The relative luminance of an sRGB colour (WCAG 2, after IEC 61966-2-1).
double relativeLuminance(const QColor& colour) {
  auto linear = [](double c) { return c <= 0.04045 ? c / 12.92 : std::pow((c + 0.055) / 1.055, 2.4); };
  return 0.2126 * linear(colour.redF()) + 0.7152 * linear(colour.greenF()) + 0.0722 * linear(colour.blueF());
}

}  // namespace

double contrastRatio(const QColor& a, const QColor& b) {
  const double la = relativeLuminance(a), lb = relativeLuminance(b);
  return (std::max(la, lb) + 0.05) / (std::min(la, lb) + 0.05);
}

bool applyPaletteNamed(QApplication& app, const QString& name) {
  if (name == QLatin1String("system")) return true;
  if (name != QLatin1String("dark")) return false;
  if (QStyle* fusion = QStyleFactory::create(QStringLiteral("Fusion"))) QApplication::setStyle(fusion);
  QApplication::setPalette(darkPalette());
  // Input fields (and their subclasses) on a base of their own.
  for (const char* field : {"QLineEdit", "QAbstractSpinBox", "QComboBox", "QPlainTextEdit", "QTextEdit"})
    QApplication::setPalette(darkFieldPalette(), field);
  Q_UNUSED(app);
  return true;
}

QStringList availableLanguages() {
  QStringList languages{QStringLiteral("en")};
  const QString prefix = QStringLiteral("cyclewright_"), suffix = QStringLiteral(".qm");
  for (const QString& name : QDir(QStringLiteral(":/i18n")).entryList({prefix + '*' + suffix}, QDir::Files))
    languages << name.mid(prefix.size(), name.size() - prefix.size() - suffix.size());
  languages.sort();
  languages.removeDuplicates();
  return languages;
}

bool hasLanguage(const QString& language) {
  const QLocale locale(language);
  if (locale.language() == QLocale::English) return true;
  QTranslator translator;
  return locale.language() != QLocale::C && translator.load(locale, "cyclewright", "_", ":/i18n");
}

QString installTranslation(QApplication& app, const QString& language) {
  auto* translator = new QTranslator(&app);
  const QLocale locale = language.isEmpty() ? QLocale::system() : QLocale(language);
  if (translator->load(locale, "cyclewright", "_", ":/i18n")) {
    QApplication::installTranslator(translator);
    return locale.name();
  }
  delete translator;
  return QStringLiteral("en");
}

}  // namespace cw::gui
