#include "charts/chart_export.h"

#include "document/caution.h"

#include <qwt_plot.h>
#include <qwt_plot_renderer.h>
#include <qwt_text.h>

#include <QFileInfo>
#include <QPainter>

namespace cw::gui {

CautionFooter::CautionFooter(QwtPlot* plot) : plot_(plot) {
  QwtText footer(cautionText());
  QFont font = plot_->font();
  font.setPointSizeF(font.pointSizeF() * 0.75);
  font.setItalic(true);
  footer.setFont(font);
  footer.setRenderFlags(Qt::AlignCenter | Qt::TextWordWrap);
  plot_->setFooter(footer);
}

CautionFooter::~CautionFooter() {
  plot_->setFooter(QwtText());
}

QImage renderChartImage(QwtPlot* plot, QSize pixels, int dotsPerInch) {
  QImage image(pixels, QImage::Format_ARGB32);
  const int dotsPerMetre = qRound(dotsPerInch / 0.0254);
  image.setDotsPerMeterX(dotsPerMetre);
  image.setDotsPerMeterY(dotsPerMetre);
  image.fill(plot->palette().color(QPalette::Window));
  CautionFooter footer(plot);
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
  CautionFooter footer(plot);
  QwtPlotRenderer renderer;
  renderer.setDiscardFlag(QwtPlotRenderer::DiscardBackground, false);
  renderer.renderDocument(plot, fileName, format, millimetres, 85);
  const QFileInfo info(fileName);
  return info.exists() && info.size() > 0;
}

}  // namespace cw::gui
