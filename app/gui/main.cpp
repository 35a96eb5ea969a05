// cyclewright: the desktop application.
#include "application.h"
#include "main_window.h"

#include "common/version.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QPixmap>
#include <QTextStream>

#include <cstdio>
#include <cstdlib>

int main(int argc, char** argv) {
  // A screenshot needs no display: render offscreen unless a platform is chosen.
  if (cw::gui::wantsScreenshot(argc, argv) && std::getenv("QT_QPA_PLATFORM") == nullptr)
    setenv("QT_QPA_PLATFORM", "offscreen", 1);

  QApplication app(argc, argv);
  QApplication::setApplicationName("Cyclewright");
  QApplication::setOrganizationName("Cyclewright");
  QApplication::setApplicationVersion(QString::fromLatin1(cw::kVersion));

  QCommandLineParser parser;
  parser.setApplicationDescription("Gas-turbine cycle explorer for conceptual design.");
  parser.addHelpOption();
  parser.addVersionOption();
  QCommandLineOption screenshot("screenshot", "Render the main window offscreen to a PNG file and exit.",
                                "FILE");
  QCommandLineOption size("size", "Size of the --screenshot picture in pixels (default 1600x1000).", "WxH",
                          "1600x1000");
  QCommandLineOption language("language", "User-interface language, e.g. en or de (default: the system's).",
                              "CODE");
  QCommandLineOption palette("palette", "Colour palette: system (default) or dark.", "NAME", "system");
  parser.addOption(screenshot);
  parser.addOption(palette);
  parser.addOption(size);
  parser.addOption(language);
  parser.addPositionalArgument("case", "Case file to open (default: the demo case).", "[case.json]");
  parser.process(app);

  cw::gui::installTranslation(app, parser.value(language));
  if (!cw::gui::applyPaletteNamed(app, parser.value(palette))) {
    std::fprintf(stderr, "cyclewright: --palette = %s is not one of system, dark\n",
                 qPrintable(parser.value(palette)));
    return 2;
  }

  QSize pictureSize(1600, 1000);
  {
    const QStringList parts = parser.value(size).split('x');
    bool okW = false, okH = false;
    const int w = parts.value(0).toInt(&okW), h = parts.value(1).toInt(&okH);
    if (parts.size() != 2 || !okW || !okH || w < 200 || h < 150 || w > 8000 || h > 8000) {
      std::fprintf(stderr, "cyclewright: --size = %s is outside the valid range 200x150 to 8000x8000\n",
                   qPrintable(parser.value(size)));
      return 2;
    }
    pictureSize = QSize(w, h);
  }

  cw::gui::MainWindow window;
  const QStringList positional = parser.positionalArguments();
  const QString casePath =
      positional.isEmpty() ? QStringLiteral(":/demo/demo-turbojet.json") : positional.first();
  if (!window.openCase(casePath) && !positional.isEmpty()) {
    std::fprintf(stderr, "cyclewright: cannot open case %s\n", qPrintable(casePath));
  }

  if (parser.isSet(screenshot)) {
    window.resize(pictureSize);
    window.show();
    QApplication::processEvents();
    QApplication::processEvents();
    const QPixmap picture = window.grab();
    if (!picture.save(parser.value(screenshot), "PNG")) {
      std::fprintf(stderr, "cyclewright: cannot write screenshot %s\n", qPrintable(parser.value(screenshot)));
      return 1;
    }
    return 0;
  }

  window.resize(1280, 800);
  window.show();
  window.offerRecovery();
  return QApplication::exec();
}
