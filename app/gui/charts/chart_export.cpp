#include "charts/chart_export.h"

#include "charts/chart_base.h"

#include <qwt_plot.h>
#include <qwt_plot_renderer.h>
#include <qwt_text.h>

#include <QFileInfo>
#include <QPainter>

namespace cw::gui {

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
  return renderChartImage(plot, options).save(fileName, "PNG");
}

bool exportChartPng(QwtPlot* plot, const QString& fileName, QSize pixels, int dotsPerInch) {
  return renderChartImage(plot, pixels, dotsPerInch).save(fileName, "PNG");
}

bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format,
                         const ExportOptions& options) {
  ExportScope scope(plot, options);
  QwtPlotRenderer renderer;
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardBackground, options.transparent);
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardCanvasBackground, options.transparent);
  renderer.renderDocument(plot, fileName, format, options.millimetres(), 85);
  const QFileInfo info(fileName);
  return info.exists() && info.size() > 0;
}

bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format, QSizeF millimetres) {
  ExportOptions options;
  options.paperSize = millimetres;
  options.paperUnit = PaperUnit::Millimetres;
  return exportChartDocument(plot, fileName, format, options);
}

}  // namespace cw::gui
