#include "startup/export_figures.h"

#include "audit/audit_chart.h"
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"

#include "analysis/loss_audit.h"
#include "common/error.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <QDir>
#include <QFileInfo>
#include <QRegularExpression>
#include <QTemporaryFile>

#include <cmath>
#include <memory>
#include <vector>

namespace cw::gui {

namespace {

constexpr double kMinSide = 20.0, kMaxSide = 1000.0;  // [mm]

[[noreturn]] void refuse(const char* option, const QString& message) {
  throw InvalidInput(option, message.toStdString());
}

QString quoted(const QString& text) {
  return QLatin1Char('"') + text + QLatin1Char('"');
}

/// The folder, made when missing, and checked writable by writing a file into it.
void prepareFolder(const QString& folder) {
  if (folder.isEmpty()) refuse("--output-dir", QStringLiteral("is missing: give the folder for the figures"));
  if (!QDir().mkpath(folder))
    refuse("--output-dir", QStringLiteral("cannot make the folder %1").arg(quoted(folder)));
  QTemporaryFile probe(QDir(folder).filePath(QStringLiteral(".cyclewright-XXXXXX")));
  if (!probe.open()) refuse("--output-dir", QStringLiteral("cannot write into %1").arg(quoted(folder)));
}

/// The case and its evaluation; a case without a cycle is refused like an invalid one.
std::shared_ptr<const engine::Evaluation> evaluate(const QString& path, engine::Case& inputs) {
  inputs = io::readCaseFile(QDir::toNativeSeparators(path).toStdString());
  try {
    return std::make_shared<const engine::Evaluation>(engine::evaluateCase(inputs));
  } catch (const Error& e) {
    throw InvalidInput(path.toStdString(), std::string("has no cycle to draw: ") + e.what());
  }
}

bool write(QwtPlot* chart, const QString& file, const QString& format, QSizeF millimetres) {
  if (format != QLatin1String("png")) return exportChartDocument(chart, file, format, millimetres);
  const QSize pixels(static_cast<int>(std::lround(millimetres.width() / 25.4 * kFigurePngDotsPerInch)),
                     static_cast<int>(std::lround(millimetres.height() / 25.4 * kFigurePngDotsPerInch)));
  return exportChartPng(chart, file, pixels, kFigurePngDotsPerInch);
}

}  // namespace

QStringList parseFigureFormats(const QString& text) {
  QStringList formats;
  for (const QString& part : text.split(QLatin1Char(','))) {
    const QString format = part.trimmed().toLower();
    if (format != QLatin1String("svg") && format != QLatin1String("pdf") && format != QLatin1String("png"))
      refuse("--format",
             QStringLiteral("expected svg, pdf or png, comma-separated, got %1").arg(quoted(part)));
    if (!formats.contains(format)) formats << format;
  }
  return formats;
}

QSizeF parseFigureSize(const QString& text) {
  static const QRegularExpression form(QStringLiteral("^([0-9]+(?:\\.[0-9]+)?)x([0-9]+(?:\\.[0-9]+)?)mm$"));
  const QRegularExpressionMatch match = form.match(text);
  if (!match.hasMatch())
    refuse("--size",
           QStringLiteral("expected WxHmm with --export-figures, e.g. 160x100mm; got %1").arg(quoted(text)));
  const double width = match.captured(1).toDouble(), height = match.captured(2).toDouble();
  if (width < kMinSide || height < kMinSide || width > kMaxSide || height > kMaxSide)
    refuse("--size", QStringLiteral("--size = %1 is outside the valid range %2x%2mm to %3x%3mm")
                         .arg(text)
                         .arg(kMinSide)
                         .arg(kMaxSide));
  return {width, height};
}

UnitSystem parseFigureUnits(const QString& text) {
  if (text == QLatin1String("si")) return UnitSystem::SI;
  if (text == QLatin1String("us")) return UnitSystem::USCustomary;
  refuse("--units", QStringLiteral("expected si or us, got %1").arg(quoted(text)));
}

QStringList exportFigures(const FigureRequest& request) {
  engine::Case inputs;
  const auto evaluation = evaluate(request.casePath, inputs);
  prepareFolder(request.outputDir);
  DisplayUnits units;
  units.setSystem(request.units);
  CycleChart ts(ChartKind::TemperatureEntropy, units), pv(ChartKind::PressureVolume, units),
      hs(ChartKind::EnthalpyEntropy, units);
  for (CycleChart* chart : {&ts, &pv, &hs}) chart->setEvaluation(evaluation, false);
  AuditChart audit(units);
  audit.setAudit(std::make_shared<const analysis::LossAudit>(analysis::auditCase(inputs)), false);
  const std::vector<std::pair<QwtPlot*, QString>> charts{{&ts, QStringLiteral("temperature-entropy")},
                                                         {&pv, QStringLiteral("pressure-volume")},
                                                         {&hs, QStringLiteral("enthalpy-entropy")},
                                                         {&audit, QStringLiteral("loss-audit")}};
  QStringList written;
  for (const auto& [chart, name] : charts) {
    chart->resize(QSizeF(request.millimetres / 25.4 * 96.0).toSize());  // a screen's layout first
    for (const QString& format : request.formats) {
      const QString file = QDir(request.outputDir).filePath(name + QLatin1Char('.') + format);
      if (!write(chart, file, format, request.millimetres))
        refuse("--output-dir", QStringLiteral("cannot write %1").arg(quoted(file)));
      written << file;
    }
  }
  return written;
}

}  // namespace cw::gui
