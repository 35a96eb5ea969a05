#include "charts/chart_export.h"

#include "charts/chart_base.h"

#include <qwt_plot.h>
#include <qwt_plot_renderer.h>
#include <qwt_text.h>

#include <QFileInfo>
#include <QPainter>

namespace cw::gui {

QImage renderChartImage(QwtPlot* plot, QSize pixels, int dotsPerInch) {
  QImage image(pixels, QImage::Format_ARGB32);
  const int dotsPerMetre = qRound(dotsPerInch / 0.0254);
  image.setDotsPerMeterX(dotsPerMetre);
  image.setDotsPerMeterY(dotsPerMetre);
  image.fill(Qt::white);  // exported figures on white, never the window's grey
  ExportScope scope(plot);
  QPainter painter(&image);
  QwtPlotRenderer renderer;
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardBackground, false);
  renderer.render(plot, &painter, QRectF(QPointF(0, 0), QSizeF(pixels)));
  painter.end();
  return image;
}

bool exportChartPng(QwtPlot* plot, const QString& fileName, QSize pixels, int dotsPerInch) {
  return renderChartImage(plot, pixels, dotsPerInch).save(fileName, "PNG");
}

bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format, QSizeF millimetres) {
  ExportScope scope(plot);
  QwtPlotRenderer renderer;
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardBackground, false);
  renderer.renderDocument(plot, fileName, format, millimetres, 85);
  const QFileInfo info(fileName);
  return info.exists() && info.size() > 0;
}

}  // namespace cw::gui
