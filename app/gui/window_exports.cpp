#include "window_exports.h"

#include "main_window.h"

#include "audit/audit_panel.h"
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"
#include "dialogs/dialogs.h"
#include "document/case_document.h"
#include "document/settings.h"
#include "tables/station_table_model.h"
#include "trade_study/study_panel.h"

#include "io/result_export.h"

#include <QApplication>
#include <QClipboard>
#include <QDir>
#include <QFileDialog>
#include <QSaveFile>
#include <QStatusBar>

namespace cw::gui {

namespace {

bool writeFile(const QString& path, const QByteArray& bytes) {
  QSaveFile file(path);
  if (!file.open(QIODevice::WriteOnly)) return false;
  file.write(bytes);
  return file.commit();
}

}  // namespace

WindowExports::WindowExports(MainWindow& window) : QObject(&window), window_(window) {}

void WindowExports::showStatus(const QString& message) {
  window_.statusBar()->showMessage(message);
}

QString WindowExports::askForFile(const QString& title, const QString& fileName, const QString& filter) {
  return QFileDialog::getSaveFileName(&window_, title, QDir::home().filePath(fileName), filter);
}

bool WindowExports::stationCsv(const QString& path) {
  const auto evaluation = window_.document().evaluation();
  if (!evaluation) return false;
  // The table as shown: with losses, ideal twin, their difference, or the difference from the
  // baseline (the note after the caution names it).
  const TableMode mode = window_.stationModel()->mode();
  const auto baseline = window_.document().baselineEvaluation();
  std::string csv;
  if (mode == TableMode::BaselineDifference && baseline)
    csv = io::stationDifferenceCsv(evaluation->actual, baseline->actual,
                                   " Values: with losses minus the baseline (" +
                                       window_.document().baselineTitle().toStdString() + "), with losses.");
  else if (mode == TableMode::Difference)
    csv = io::stationDifferenceCsv(evaluation->actual, evaluation->ideal);
  else
    csv = io::stationTableCsv(mode == TableMode::Ideal ? evaluation->ideal : evaluation->actual);
  return writeFile(path, QByteArray::fromStdString(csv));
}

bool WindowExports::resultJson(const QString& path) {
  const auto evaluation = window_.document().evaluation();
  if (!evaluation) return false;
  nlohmann::json json = io::evaluationToJson(*evaluation);
  if (const auto baseline = window_.document().baselineEvaluation()) {
    // The baseline beside the result, so that the file holds both sides of the comparison.
    nlohmann::json base = io::evaluationToJson(*baseline, false);
    base["title"] = window_.document().baselineTitle().toStdString();
    json["baseline"] = base;
  }
  return writeFile(path, QByteArray::fromStdString(json.dump(2)) + "\n");
}

bool WindowExports::auditCsv(const QString& path) {
  return window_.auditPanel()->exportCsv(path);
}

bool WindowExports::studyCsv(const QString& path) {
  return window_.tradeStudyPanel()->exportCsv(path);
}

bool WindowExports::studyJson(const QString& path) {
  return window_.tradeStudyPanel()->exportJson(path);
}

void WindowExports::chart(QwtPlot* chart, const QString& base, const QString& format) {
  // The options last used for this chart; the title is the case's, the subtitle the chart's own.
  AppSettings settings;
  ExportOptions options = settings.exportOptions(base);
  options.title = QString::fromStdString(window_.document().currentCase().title);
  options.subtitle = chart->title().text();
  ImageExportDialog dialog(format, options, &window_);
  if (dialog.exec() != QDialog::Accepted) return;
  options = dialog.options();
  ExportOptions remembered = options;
  remembered.title.clear();
  remembered.subtitle.clear();
  settings.setExportOptions(base, remembered);
  const bool png = format == QLatin1String("png");
  const QString filter = png                              ? tr("PNG images (*.png)")
                         : format == QLatin1String("svg") ? tr("SVG drawings (*.svg)")
                                                          : tr("PDF documents (*.pdf)");
  const QString path = askForFile(tr("Export Chart"), base + QLatin1Char('.') + format, filter);
  if (path.isEmpty()) return;
  const bool ok =
      png ? exportChartPng(chart, path, options) : exportChartDocument(chart, path, format, options);
  showStatus(ok ? tr("Exported %1").arg(path) : tr("Cannot write %1").arg(path));
}

void WindowExports::stationTable() {
  const QString path =
      askForFile(tr("Export Station Table"), QStringLiteral("stations.csv"), tr("CSV files (*.csv)"));
  if (path.isEmpty()) return;
  showStatus(stationCsv(path) ? tr("Exported %1 (SI units)").arg(path) : tr("Cannot write %1").arg(path));
}

void WindowExports::results() {
  const QString path =
      askForFile(tr("Export Results"), QStringLiteral("results.json"), tr("JSON files (*.json)"));
  if (path.isEmpty()) return;
  showStatus(resultJson(path) ? tr("Exported %1 (SI units)").arg(path) : tr("Cannot write %1").arg(path));
}

void WindowExports::auditTable() {
  const QString path =
      askForFile(tr("Export Loss Audit"), QStringLiteral("loss-audit.csv"), tr("CSV files (*.csv)"));
  if (path.isEmpty()) return;
  showStatus(auditCsv(path) ? tr("Exported %1 (SI units)").arg(path) : tr("Cannot write %1").arg(path));
}

void WindowExports::study(bool csv) {
  TradeStudyPanel* panel = window_.tradeStudyPanel();
  if (!panel->study()) {
    showStatus(tr("There is no trade study to export yet: run one first."));
    return;
  }
  const QString path = askForFile(
      tr("Export Trade Study"), csv ? QStringLiteral("trade-study.csv") : QStringLiteral("trade-study.json"),
      csv ? tr("CSV files (*.csv)") : tr("JSON files (*.json)"));
  if (path.isEmpty()) return;
  QString error;
  const bool ok = csv ? panel->exportCsv(path, &error) : panel->exportJson(path, &error);
  showStatus(ok ? tr("Exported %1 (the units are in the column names)").arg(path)
                : tr("Cannot write %1: %2").arg(path, error));
}

void WindowExports::copyChart(CycleChart* chart) {
  QApplication::clipboard()->setImage(renderChartImage(chart, chart->size() * 2, 192));
  showStatus(tr("Chart copied to the clipboard"));
}

void WindowExports::copyStationTable() {
  QApplication::clipboard()->setText(window_.stationModel()->toTabSeparated());
  showStatus(tr("Station table copied as tab-separated text"));
}

void WindowExports::copyPerformanceTable() {
  QApplication::clipboard()->setText(window_.performanceTableText());
  showStatus(tr("Performance table copied as tab-separated text"));
}

void WindowExports::copyStudyTable() {
  const QString text = window_.tradeStudyPanel()->tableAsTabSeparated();
  if (text.isEmpty()) {
    showStatus(tr("There is no trade study to copy yet: run one first."));
    return;
  }
  QApplication::clipboard()->setText(text);
  showStatus(tr("Trade-study table copied as tab-separated text"));
}

}  // namespace cw::gui
