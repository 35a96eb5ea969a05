#include "startup/start_options.h"

#include "startup/application.h"

#include "common/error.h"

#include <QCommandLineParser>
#include <QCoreApplication>
#include <QRegularExpression>

#include <cstring>
#include <string>

namespace cw::gui {

namespace {

constexpr int kMinWidth = 200, kMinHeight = 150, kMaxSide = 8000;  // [px]

[[noreturn]] void refuse(const char* option, const QString& message) {
  throw InvalidInput(option, message.toStdString());
}

QString quoted(const QString& text) {
  return QLatin1Char('"') + text + QLatin1Char('"');
}

void checkPalette(const QString& name) {
  if (name != QLatin1String("system") && name != QLatin1String("dark"))
    refuse("--palette", QStringLiteral("expected system or dark, got %1").arg(quoted(name)));
}

void checkLanguage(const QString& language) {
  if (language.isEmpty() || hasLanguage(language)) return;
  refuse("--language", QStringLiteral("no translation for %1; available: %2")
                           .arg(quoted(language), availableLanguages().join(QStringLiteral(", "))));
}

void checkScreenshotOf(const QString& what, bool withStudy) {
  if (what == QLatin1String("window") || (what == QLatin1String("trade-study") && withStudy)) return;
  refuse("--screenshot-of",
         QStringLiteral("expected window, or trade-study with --study-vary, got %1").arg(quoted(what)));
}

}  // namespace

StartOptions::StartOptions()
    : screenshot_("screenshot", "Render the main window offscreen to a PNG file and exit.", "FILE"),
      screenshotOf_("screenshot-of",
                    "What --screenshot renders: window (default) or trade-study (the trade-study "
                    "panel only, with --study-vary).",
                    "WHAT", "window"),
      size_("size",
            "Size of the --screenshot picture in pixels, from 200x150 to 8000x8000 (default 1600x1000).",
            "WxH", "1600x1000"),
      language_("language", "User-interface language, e.g. en or de (default: the system's).", "CODE"),
      palette_("palette", "Colour palette: system (default) or dark.", "NAME", "system"),
      studyVary_("study-vary",
                 "Show the trade-study panel in its dock and run a study varying PATH (as cyclewright-cli "
                 "sweep --vary; give it twice for a carpet), e.g. for a --screenshot.",
                 "PATH=START:STOP:COUNT"),
      studyCompare_("study-compare",
                    "With --study-vary: compare with the ideal twin (ideal) or with one input set "
                    "differently (PATH=VALUE, SI).",
                    "ideal|PATH=VALUE"),
      studyPlot_("study-plot",
                 "With --study-vary: plot this output column against the first input (default: "
                 "the carpet for two inputs).",
                 "COLUMN"),
      exportFigures_("export-figures",
                     "Write every chart of the case (temperature-entropy, pressure-volume, enthalpy-entropy, "
                     "loss audit) into --output-dir offscreen, and exit.",
                     "CASE"),
      outputDir_("output-dir", "With --export-figures: the folder for the figures (made when missing).",
                 "DIR"),
      format_("format", "With --export-figures: svg, pdf and/or png, comma-separated (default svg).", "LIST",
              "svg"),
      units_("units", "With --export-figures: si (default) or us.", "SYSTEM", "si") {}

void StartOptions::addTo(QCommandLineParser& parser) const {
  parser.setApplicationDescription("Gas-turbine cycle explorer for conceptual design.");
  parser.addHelpOption();
  parser.addVersionOption();
  for (const QCommandLineOption* option :
       {&screenshot_, &screenshotOf_, &studyVary_, &studyCompare_, &studyPlot_, &exportFigures_, &outputDir_,
        &format_, &units_, &palette_, &size_, &language_})
    parser.addOption(*option);
  parser.addPositionalArgument("case", "Case file to open (default: the demo case).", "[case.json]");
}

void StartOptions::parse(QCommandLineParser& parser) const {
  const bool parsed = parser.parse(QCoreApplication::arguments());
  if (parser.isSet(QStringLiteral("version"))) parser.showVersion();
  if (parsed && parser.isSet(QStringLiteral("help-all"))) parser.process(QCoreApplication::arguments());
  if (parser.isSet(QStringLiteral("help")) || parser.isSet(QStringLiteral("help-all"))) parser.showHelp(0);
  if (!parsed) throw InvalidInput("command line", parser.errorText().toStdString());
}

StartRequest StartOptions::read(const QCommandLineParser& parser) const {
  StartRequest request;
  const QStringList positional = parser.positionalArguments();
  if (positional.size() > 1)
    refuse("command line", QStringLiteral("expected at most one case file, got %1").arg(positional.size()));
  request.casePath = positional.value(0);
  request.screenshotPath = parser.value(screenshot_);
  request.studyVary = parser.values(studyVary_);
  request.studyCompare = parser.value(studyCompare_);
  if (parser.isSet(studyPlot_)) request.studyPlot = parser.value(studyPlot_);
  if (request.studyVary.isEmpty() && (parser.isSet(studyCompare_) || parser.isSet(studyPlot_)))
    refuse(parser.isSet(studyCompare_) ? "--study-compare" : "--study-plot",
           QStringLiteral("needs --study-vary"));
  request.screenshotOf = parser.value(screenshotOf_);
  checkScreenshotOf(request.screenshotOf, !request.studyVary.isEmpty());
  request.figures = readFigures(parser);
  if (!request.figures) request.pictureSize = parsePictureSize(parser.value(size_));
  request.language = parser.value(language_);
  checkLanguage(request.language);
  request.palette = parser.value(palette_);
  checkPalette(request.palette);
  return request;
}

std::optional<FigureRequest> StartOptions::readFigures(const QCommandLineParser& parser) const {
  if (!parser.isSet(exportFigures_)) {
    for (const QCommandLineOption* option : {&outputDir_, &format_, &units_})
      if (parser.isSet(*option))
        refuse(("--" + option->names().front().toStdString()).c_str(),
               QStringLiteral("needs --export-figures"));
    return std::nullopt;
  }
  if (parser.isSet(screenshot_))
    refuse("--export-figures", QStringLiteral("cannot be given with --screenshot"));
  if (!parser.positionalArguments().isEmpty())
    refuse("--export-figures", QStringLiteral("takes the case itself; no other case file is expected"));
  FigureRequest figures;
  figures.casePath = parser.value(exportFigures_);
  figures.outputDir = parser.value(outputDir_);
  if (figures.outputDir.isEmpty()) refuse("--output-dir", QStringLiteral("is needed with --export-figures"));
  figures.formats = parseFigureFormats(parser.value(format_));
  if (parser.isSet(size_)) figures.millimetres = parseFigureSize(parser.value(size_));
  figures.units = parseFigureUnits(parser.value(units_));
  return figures;
}

bool StartOptions::mentionsHelpOrVersion(int argc, char** argv) {
  for (int i = 1; i < argc && std::strcmp(argv[i], "--") != 0; ++i)
    for (const char* flag : {"-h", "--help", "-?", "--help-all", "-v", "--version"})
      if (std::strcmp(argv[i], flag) == 0) return true;
  return false;
}

void StartOptions::answerHelpOrVersion(int argc, char** argv) {
  const QCoreApplication core(argc, argv);  // no platform plugin, no display
  nameApplication();
  QCommandLineParser parser;
  const StartOptions options;
  options.addTo(parser);
  // Without a QApplication, Qt's own GUI options (-platform, -style) are unknown here: a parse
  // error does not stop --help or --version (the GUI start reports errors).
  parser.parse(QCoreApplication::arguments());
  for (const char* name : {"help", "help-all", "version"})
    if (parser.isSet(QString::fromLatin1(name))) options.parse(parser);  // prints and exits
}

QSize parsePictureSize(const QString& text) {
  static const QRegularExpression form(QStringLiteral("^([0-9]+)x([0-9]+)$"));
  const QRegularExpressionMatch match = form.match(text);
  if (!match.hasMatch())
    refuse("--size",
           QStringLiteral("expected WxH in pixels, e.g. 1600x1000, each from %1x%2 to %3x%3; got %4")
               .arg(kMinWidth)
               .arg(kMinHeight)
               .arg(kMaxSide)
               .arg(quoted(text)));
  bool okWidth = false, okHeight = false;
  const int width = match.captured(1).toInt(&okWidth), height = match.captured(2).toInt(&okHeight);
  if (!okWidth || !okHeight || width < kMinWidth || height < kMinHeight || width > kMaxSide ||
      height > kMaxSide)
    throw Error(ErrorCode::InvalidInput, "--size",
                QStringLiteral("--size = %1 is outside the valid range %2x%3 to %4x%4")
                    .arg(text)
                    .arg(kMinWidth)
                    .arg(kMinHeight)
                    .arg(kMaxSide)
                    .toStdString());
  return {width, height};
}

}  // namespace cw::gui
