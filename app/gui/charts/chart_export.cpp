#include "charts/chart_export.h"

#include "charts/chart_base.h"

#include <qwt_plot.h>
#include <qwt_plot_renderer.h>
#include <qwt_text.h>

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QPainter>

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
  renderer.render(plot, &painter, QRectF(QPointF(0, 0), QSizeF(options.pixels)));
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
    renderer.renderDocument(plot, path, format, options.millimetres(), 85);
    return true;  // writeThroughTemporary checks that something was written
  });
}

bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format, QSizeF millimetres) {
  ExportOptions options;
  options.paperSize = millimetres;
  options.paperUnit = PaperUnit::Millimetres;
  return exportChartDocument(plot, fileName, format, options);
}

}  // namespace cw::gui
