#include "application.h"

#include <QApplication>
#include <QLocale>
#include <QTranslator>

#include <cstring>

namespace cw::gui {

bool wantsScreenshot(int argc, char** argv) {
  for (int i = 1; i < argc; ++i)
    if (std::strcmp(argv[i], "--screenshot") == 0 || std::strncmp(argv[i], "--screenshot=", 13) == 0)
      return true;
  return false;
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
