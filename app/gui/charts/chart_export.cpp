#include "charts/chart_export.h"

#include "charts/chart_base.h"

#include <qwt_plot.h>
#include <qwt_plot_renderer.h>
#include <qwt_text.h>

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QPageSize>
#include <QPainter>
#include <QPdfWriter>
#include <QSvgGenerator>

#include <atomic>
#include <cstdio>
#include <functional>

namespace cw::gui {

namespace {

/// Writes a figure through a temporary file beside the target, renamed over it once whole, so a
/// crash or a full disk never leaves a half-written figure under the user's file name. The
/// temporary's name is that of io::writeFileAtomically (".<name>.tmp-<pid>-<n>"), so
/// io::removeStaleTemporaries clears one a killed process left.
bool writeThroughTemporary(const QString& fileName, const std::function<bool(const QString&)>& write) {
  static std::atomic<int> counter{0};
  const QFileInfo target(fileName);
  const QString temporary = target.absoluteDir().filePath(QStringLiteral(".%1.tmp-%2-%3")
                                                              .arg(target.fileName())
                                                              .arg(QCoreApplication::applicationPid())
                                                              .arg(counter++));
  const bool written = write(temporary) && QFileInfo(temporary).size() > 0;
  // POSIX rename() replaces the target in one step; QFile::rename would refuse an existing one.
  if (!written || std::rename(QFile::encodeName(temporary).constData(),
                              QFile::encodeName(target.absoluteFilePath()).constData()) != 0) {
    QFile::remove(temporary);
    return false;
  }
  return true;
}

/// The resolution of an SVG's or PDF's raster parts and of its coordinates [dots per inch].
constexpr int kDocumentDotsPerInch = 85;

/// Lets the chart place its legend for the surface: one draw on a one-pixel image of the
/// surface's resolution (the layout is that of the whole figure; nothing is kept).
void fitLegendTo(QwtPlot* plot, const QwtPlotRenderer& renderer, const QRectF& area, int dotsPerInch) {
  auto* chart = qobject_cast<ChartBase*>(plot);
  if (!chart) return;
  chart->fitExportLegend([&] {
    QImage probe(1, 1, QImage::Format_ARGB32);
    const int dotsPerMetre = qRound(dotsPerInch / 0.0254);
    probe.setDotsPerMeterX(dotsPerMetre);
    probe.setDotsPerMeterY(dotsPerMetre);
    QPainter painter(&probe);
    renderer.render(plot, &painter, area);
  });
}

/// An SVG or a PDF of the plot at `millimetres`, titled in plain text (QwtPlotRenderer's own
/// renderDocument would put the rich-text title's markup into the metadata).
bool renderDocument(QwtPlot* plot, const QwtPlotRenderer& renderer, const QString& path,
                    const QString& format, QSizeF millimetres, const QString& title) {
  const QSizeF size = millimetres / 25.4 * kDocumentDotsPerInch;
  const QRectF area(QPointF(0, 0), size);
  fitLegendTo(plot, renderer, area, kDocumentDotsPerInch);
  if (format == QLatin1String("svg")) {
    QSvgGenerator generator;
    generator.setTitle(title);
    generator.setFileName(path);
    generator.setResolution(kDocumentDotsPerInch);
    generator.setViewBox(area);
    QPainter painter(&generator);
    renderer.render(plot, &painter, area);
    return painter.end();
  }
  if (format == QLatin1String("pdf")) {
    QPdfWriter writer(path);
    writer.setPageSize(QPageSize(millimetres, QPageSize::Millimeter));
    writer.setTitle(title);
    writer.setPageMargins(QMarginsF());
    writer.setResolution(kDocumentDotsPerInch);
    QPainter painter(&writer);
    if (!painter.isActive()) return false;
    renderer.render(plot, &painter, area);
    return painter.end();
  }
  return false;
}

}  // namespace

QImage renderChartImage(QwtPlot* plot, const ExportOptions& options) {
  QImage image(options.pixels, QImage::Format_ARGB32);
  const int dotsPerMetre = qRound(options.dotsPerInch / 0.0254);
  image.setDotsPerMeterX(dotsPerMetre);
  image.setDotsPerMeterY(dotsPerMetre);
  // On white or transparent, never the window's grey.
  image.fill(options.transparent ? Qt::transparent : Qt::white);
  ExportScope scope(plot, options);
  QPainter painter(&image);
  QwtPlotRenderer renderer;
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardBackground, options.transparent);
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardCanvasBackground, options.transparent);
  const QRectF area(QPointF(0, 0), QSizeF(options.pixels));
  fitLegendTo(plot, renderer, area, options.dotsPerInch);
  renderer.render(plot, &painter, area);
  painter.end();
  return image;
}

QImage renderChartImage(QwtPlot* plot, QSize pixels, int dotsPerInch) {
  ExportOptions options;
  options.pixels = pixels;
  options.dotsPerInch = dotsPerInch;
  return renderChartImage(plot, options);
}

bool exportChartPng(QwtPlot* plot, const QString& fileName, const ExportOptions& options) {
  const QImage image = renderChartImage(plot, options);
  return writeThroughTemporary(fileName, [&](const QString& path) { return image.save(path, "PNG"); });
}

bool exportChartPng(QwtPlot* plot, const QString& fileName, QSize pixels, int dotsPerInch) {
  const QImage image = renderChartImage(plot, pixels, dotsPerInch);
  return writeThroughTemporary(fileName, [&](const QString& path) { return image.save(path, "PNG"); });
}

bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format,
                         const ExportOptions& options) {
  ExportScope scope(plot, options);
  QwtPlotRenderer renderer;
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardBackground, options.transparent);
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardCanvasBackground, options.transparent);
  return writeThroughTemporary(fileName, [&](const QString& path) {
    return renderDocument(plot, renderer, path, format, options.millimetres(), scope.plainTitle());
  });
}

bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format, QSizeF millimetres) {
  ExportOptions options;
  options.paperSize = millimetres;
  options.paperUnit = PaperUnit::Millimetres;
  return exportChartDocument(plot, fileName, format, options);
}

}  // namespace cw::gui
