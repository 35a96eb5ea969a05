// cyclewright: the desktop application.
#include "document/case_document.h"
#include "main_window.h"
#include "startup/application.h"
#include "startup/export_figures.h"
#include "startup/guarded_application.h"
#include "startup/guarded_main.h"
#include "startup/scratch_settings.h"
#include "startup/start_options.h"
#include "startup/start_study.h"
#include "trade_study/study_panel.h"

#include "common/error.h"

#include <QCommandLineParser>
#include <QDockWidget>
#include <QPixmap>

#include <cstdlib>
#include <iostream>
#include <optional>

namespace {

using cw::gui::MainWindow;
using cw::gui::StartRequest;

const QString kDemo = QStringLiteral(":/demo/demo-turbojet.json");

/// Opens the requested case (the demo when none); a case that cannot be opened stops a
/// screenshot. In the window, openCase() says why in a dialog and keeps the open case.
bool openRequestedCase(MainWindow& window, const StartRequest& request) {
  const QString path = request.casePath.isEmpty() ? kDemo : request.casePath;
  QString error;
  if (window.openCase(path, &error)) return true;
  if (!request.screenshotPath.isEmpty())
    throw cw::Error(cw::ErrorCode::InvalidInput, path.toStdString(), error.toStdString());
  return false;
}

void setUpRequestedStudy(MainWindow& window, const StartRequest& request) {
  if (request.studyVary.isEmpty()) return;
  cw::gui::TradeStudyPanel* panel = window.tradeStudyPanel();
  window.tradeStudyDock()->show();
  window.placeTradeStudy();
  cw::gui::setUpStudy(*panel, window.document().currentCase(), request);
  cw::gui::runStudyAndWait(*panel);
  if (!request.studyPlot) panel->setPlotColumn(std::string());
}

/// The trade-study panel alone at the picture's size: out of its dock for the picture, then back.
QPixmap grabStudyPanel(MainWindow& window, const QSize& size) {
  cw::gui::TradeStudyPanel* panel = window.tradeStudyPanel();
  QDockWidget* dock = window.tradeStudyDock();
  dock->setWidget(nullptr);
  panel->setParent(nullptr);
  panel->resize(size);
  panel->show();
  QApplication::processEvents();
  QApplication::processEvents();
  const QPixmap picture = panel->grab();
  dock->setWidget(panel);
  return picture;
}

int renderScreenshot(MainWindow& window, const StartRequest& request) {
  openRequestedCase(window, request);
  setUpRequestedStudy(window, request);
  const QSize size = request.pictureSize;
  window.resize(size);
  window.show();
  if (!request.studyVary.isEmpty())
    window.resizeDocks({window.tradeStudyDock()}, {size.width() * 11 / 20}, Qt::Horizontal);
  QApplication::processEvents();
  QApplication::processEvents();
  const bool wholeWindow = request.screenshotOf == QLatin1String("window");
  const QPixmap picture = wholeWindow ? window.grab() : grabStudyPanel(window, size);
  if (!picture.save(request.screenshotPath, "PNG"))
    throw cw::InvalidInput(request.screenshotPath.toStdString(), "cannot write the screenshot");
  return 0;
}

int runInteractive(MainWindow& window, const StartRequest& request) {
  window.resize(1280, 800);
  window.show();
  openRequestedCase(window, request);
  setUpRequestedStudy(window, request);
  window.offerRecovery();
  return QApplication::exec();
}

int runApplication(int argc, char** argv) {
  if (cw::gui::StartOptions::mentionsHelpOrVersion(argc, argv))
    cw::gui::StartOptions::answerHelpOrVersion(argc, argv);  // exits, unless they were values
  // A screenshot needs no display: render offscreen unless a platform is chosen.
  if (cw::gui::wantsScreenshot(argc, argv) && std::getenv("QT_QPA_PLATFORM") == nullptr)
    setenv("QT_QPA_PLATFORM", "offscreen", 1);

  cw::gui::GuardedApplication app(argc, argv);
  cw::gui::nameApplication();
  QCommandLineParser parser;
  const cw::gui::StartOptions options;
  options.addTo(parser);
  options.parse(parser);
  const StartRequest request = options.read(parser);
  cw::gui::installTranslation(app, request.language);
  cw::gui::applyPaletteNamed(app, request.palette);

  // A picture never changes the user's settings: it reads and writes a copy.
  std::optional<cw::gui::ScratchSettings> scratch;
  if (!request.screenshotPath.isEmpty() || request.figures) scratch.emplace();
  if (request.figures) {
    for (const QString& file : cw::gui::exportFigures(*request.figures))
      std::cout << file.toStdString() << '\n';
    return 0;
  }
  MainWindow window;
  return request.screenshotPath.isEmpty() ? runInteractive(window, request)
                                          : renderScreenshot(window, request);
}

}  // namespace

int main(int argc, char** argv) {
  return cw::gui::runGuarded([argc, argv]() mutable { return runApplication(argc, argv); }, std::cerr);
}
