#include "startup/start_study.h"

#include "trade_study/study_inputs.h"
#include "trade_study/study_panel.h"

#include "common/error.h"
#include "io/case_keys.h"
#include "study/sweep_axis.h"

#include <QComboBox>
#include <QEventLoop>
#include <QPushButton>

#include <cmath>
#include <string>
#include <string_view>
#include <vector>

namespace cw::gui {

namespace {

std::string didYouMean(const std::string& name, const std::vector<std::string>& candidates) {
  const std::vector<std::string_view> views(candidates.begin(), candidates.end());
  const std::string closest = io::closestName(name, views);
  return closest.empty() ? std::string() : " (did you mean " + closest + "?)";
}

/// Throws unless `path` is a numeric input a study can vary on this case.
void requireInput(const engine::Case& inputs, const std::string& path, const std::string& option) {
  if (studyInput(inputs, path).field) return;
  std::vector<std::string> paths;
  for (const StudyInput& input : studyInputs(inputs)) paths.push_back(input.path);
  throw InvalidInput(option + " " + path, "not a numeric input of this case" + didYouMean(path, paths));
}

std::vector<study::SweepAxis> readAxes(const engine::Case& inputs, const QStringList& texts) {
  if (texts.size() > 2)
    throw InvalidInput("--study-vary", "expected once or twice (one or two inputs), got " +
                                           std::to_string(texts.size()) + " times");
  std::vector<study::SweepAxis> axes;
  for (const QString& text : texts) {
    axes.push_back(study::parseSweepAxis(text.toStdString(), "--study-vary"));
    requireInput(inputs, axes.back().path, "--study-vary");
  }
  return axes;
}

void setComparison(TradeStudyPanel& panel, const engine::Case& inputs, const QString& text) {
  if (text.isEmpty()) return;
  if (text == QLatin1String("ideal")) {
    panel.setComparison(StudyOverlay::IdealTwin);
    return;
  }
  const qsizetype equals = text.indexOf(QLatin1Char('='));
  if (equals <= 0)
    throw InvalidInput("--study-compare", "expected ideal or PATH=VALUE (VALUE in SI units), got \"" +
                                              text.toStdString() + "\"");
  const std::string path = text.left(equals).toStdString();
  requireInput(inputs, path, "--study-compare");
  bool ok = false;
  const double value = text.mid(equals + 1).toDouble(&ok);
  if (!ok || !std::isfinite(value))
    throw InvalidInput("--study-compare " + path, "expected a number in SI units after \"=\", got \"" +
                                                      text.mid(equals + 1).toStdString() + "\"");
  if (!panel.setChangedInput(path, value))
    throw InvalidInput("--study-compare " + path, "cannot be set differently on this case");
}

void setPlot(TradeStudyPanel& panel, const QString& column) {
  if (panel.setPlotColumn(column.toStdString())) return;
  std::vector<std::string> columns;
  for (int i = 0; i < panel.plotBox()->count(); ++i)
    if (const QString name = panel.plotBox()->itemData(i).toString(); !name.isEmpty())
      columns.push_back(name.toStdString());
  throw InvalidInput("--study-plot " + column.toStdString(),
                     "not an output column" + didYouMean(column.toStdString(), columns));
}

}  // namespace

void setUpStudy(TradeStudyPanel& panel, const engine::Case& inputs, const StartRequest& request) {
  if (!panel.setAxes(readAxes(inputs, request.studyVary)))
    throw InvalidInput("--study-vary", "give one or two numeric inputs of the case");
  setComparison(panel, inputs, request.studyCompare);
  if (request.studyPlot) setPlot(panel, *request.studyPlot);
}

void runStudyAndWait(TradeStudyPanel& panel) {
  QEventLoop loop;
  QObject::connect(&panel, &TradeStudyPanel::studyFinished, &loop, &QEventLoop::quit);
  if (!panel.run())
    throw InvalidInput(
        "--study-vary",
        panel.runButton()->toolTip().replace(QLatin1Char('\n'), QLatin1Char(' ')).toStdString());
  loop.exec();  // the study's end comes back as a queued call, so it cannot be missed
}

}  // namespace cw::gui
