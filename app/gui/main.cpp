// cyclewright: the desktop application.
#include "application.h"
#include "main_window.h"

#include "common/error.h"
#include "common/version.h"
#include "study/sweep_axis.h"
#include "study_panel.h"

#include <QDockWidget>
#include <QEventLoop>

#include <QApplication>
#include <QCommandLineParser>
#include <QPixmap>
#include <QPushButton>
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
  QCommandLineOption studyVary(
      "study-vary",
      "Show the trade-study panel in its dock and run a study varying PATH (as cyclewright-cli sweep "
      "--vary; give it twice for a carpet), e.g. for a --screenshot.",
      "PATH=START:STOP:COUNT");
  QCommandLineOption studyCompare(
      "study-compare",
      "With --study-vary: compare with the ideal twin (ideal) or with one input set "
      "differently (PATH=VALUE, SI).",
      "ideal|PATH=VALUE");
  QCommandLineOption studyPlot("study-plot",
                               "With --study-vary: plot this output column against the first input (default: "
                               "the carpet for two inputs).",
                               "COLUMN");
  QCommandLineOption screenshotOf(
      "screenshot-of",
      "What --screenshot renders: window (default) or trade-study (the trade-study "
      "panel only, with --study-vary).",
      "WHAT", "window");
  parser.addOption(screenshot);
  parser.addOption(screenshotOf);
  parser.addOption(studyVary);
  parser.addOption(studyCompare);
  parser.addOption(studyPlot);
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

  const QString of = parser.value(screenshotOf);
  if (of != QLatin1String("window") && !(of == QLatin1String("trade-study") && parser.isSet(studyVary))) {
    std::fprintf(stderr,
                 "cyclewright: --screenshot-of = %s is not window, or trade-study with --study-vary\n",
                 qPrintable(of));
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

  if (parser.isSet(studyVary)) {
    std::vector<cw::study::SweepAxis> axes;
    try {
      for (const QString& text : parser.values(studyVary))
        axes.push_back(cw::study::parseSweepAxis(text.toStdString(), "--study-vary"));
    } catch (const cw::Error& e) {
      std::fprintf(stderr, "cyclewright: %s\n", e.what());
      return 2;
    }
    cw::gui::TradeStudyPanel* panel = window.tradeStudyPanel();
    window.tradeStudyDock()->show();
    window.placeTradeStudy();
    if (!panel->setAxes(axes)) {
      std::fprintf(stderr, "cyclewright: --study-vary: give one or two numeric inputs of the case\n");
      return 2;
    }
    const QString compare = parser.value(studyCompare);
    if (compare == QLatin1String("ideal")) {
      panel->setComparison(cw::gui::StudyOverlay::IdealTwin);
    } else if (!compare.isEmpty()) {
      const QStringList parts = compare.split(QLatin1Char('='));
      bool ok = false;
      const double value = parts.value(1).toDouble(&ok);
      if (parts.size() != 2 || !ok || !panel->setChangedInput(parts[0].toStdString(), value)) {
        std::fprintf(stderr,
                     "cyclewright: --study-compare = %s is not ideal or PATH=VALUE of a numeric input\n",
                     qPrintable(compare));
        return 2;
      }
    }
    if (parser.isSet(studyPlot) && !panel->setPlotColumn(parser.value(studyPlot).toStdString())) {
      std::fprintf(stderr, "cyclewright: --study-plot = %s is not an output column\n",
                   qPrintable(parser.value(studyPlot)));
      return 2;
    }
    QEventLoop loop;
    QObject::connect(panel, &cw::gui::TradeStudyPanel::studyFinished, &loop, &QEventLoop::quit);
    if (!panel->run()) {
      std::fprintf(stderr, "cyclewright: --study-vary: %s\n",
                   qPrintable(panel->runButton()->toolTip().replace(QLatin1Char('\n'), QLatin1Char(' '))));
      return 2;
    }
    loop.exec();
    if (!parser.isSet(studyPlot)) panel->setPlotColumn(std::string());
  }

  if (parser.isSet(screenshot)) {
    window.resize(pictureSize);
    window.show();
    if (parser.isSet(studyVary))
      window.resizeDocks({window.tradeStudyDock()}, {pictureSize.width() * 11 / 20}, Qt::Horizontal);
    QApplication::processEvents();
    QApplication::processEvents();
    if (of != QLatin1String("window")) QApplication::processEvents();  // the dock's new size
    const QPixmap picture = of == QLatin1String("window") ? window.grab() : window.tradeStudyPanel()->grab();
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
