#pragma once
// The command line of cyclewright, defined once: StartOptions adds every option to a
// QCommandLineParser, both for the GUI start and for answering --help and --version on a plain
// QCoreApplication (no display needed), and reads the parsed line into a StartRequest, checking
// the form of each value. Options the case decides (the trade study's inputs and columns) are
// checked by start_study.h once the case is open.
//
// Errors are cw::Error (InvalidInput) naming the option, the value and the form or range it
// expects; main() prints them as one line "cyclewright: ..." and exits with status 2. Like
// cyclewright-cli they are English: the language is itself an option.

#include "startup/export_figures.h"

#include <QCommandLineOption>
#include <QSize>
#include <QString>
#include <QStringList>

#include <optional>

class QCommandLineParser;

namespace cw::gui {

/// What a start asks for.
struct StartRequest {
  QString casePath;                                 ///< the case to open; empty for the demo case
  QString screenshotPath;                           ///< when set: render to this PNG and exit
  QString screenshotOf = QStringLiteral("window");  ///< "window" or "trade-study"
  QSize pictureSize{1600, 1000};                    ///< [px]
  QString language;                                 ///< e.g. "de"; the system's when empty
  QString palette = QStringLiteral("system");       ///< "system" or "dark"
  QStringList studyVary;                            ///< PATH=START:STOP:COUNT, once or twice
  QString studyCompare;                             ///< "ideal", PATH=VALUE or empty
  std::optional<QString> studyPlot;                 ///< a study column; unset for the default
  std::optional<FigureRequest> figures;             ///< --export-figures: write the charts and exit
};

class StartOptions {
 public:
  StartOptions();

  /// Adds --help, --version, every option and the case argument to a parser.
  void addTo(QCommandLineParser& parser) const;

  /// Parses the application's arguments: answers --help and --version (printing them and
  /// exiting with status 0); throws cw::InvalidInput "command line: ..." for an unknown option
  /// or a missing value.
  void parse(QCommandLineParser& parser) const;

  /// The request of a parsed command line. Throws cw::InvalidInput for a value of the wrong form
  /// or out of range (--size, --language, --palette, --screenshot-of).
  StartRequest read(const QCommandLineParser& parser) const;

  /// Whether argv names --help, --help-all or --version (-h, -?, -v) before any "--": then
  /// answerHelpOrVersion() answers on a QCoreApplication, before a display is needed.
  static bool mentionsHelpOrVersion(int argc, char** argv);

  /// Answers --help or --version on a QCoreApplication of its own (exits with status 0). Returns
  /// only when argv did not ask for them after all (e.g. "-v" was the value of another option).
  static void answerHelpOrVersion(int argc, char** argv);

 private:
  QCommandLineOption screenshot_;
  QCommandLineOption screenshotOf_;
  QCommandLineOption size_;
  QCommandLineOption language_;
  QCommandLineOption palette_;
  QCommandLineOption studyVary_;
  QCommandLineOption studyCompare_;
  QCommandLineOption studyPlot_;
  QCommandLineOption exportFigures_;
  QCommandLineOption outputDir_;
  QCommandLineOption format_;
  QCommandLineOption units_;

  std::optional<FigureRequest> readFigures(const QCommandLineParser& parser) const;
};

/// "WxH" in pixels, each from 200x150 to 8000x8000. Throws cw::InvalidInput naming --size: the
/// expected form for text that is not WxH, the valid range for a size outside it [px].
QSize parsePictureSize(const QString& text);

}  // namespace cw::gui
