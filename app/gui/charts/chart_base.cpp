#include "charts/chart_base.h"

#include "charts/colours.h"
#include "charts/stale_banner.h"
#include "document/caution.h"

#include <qwt_legend.h>
#include <qwt_plot_canvas.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_legenditem.h>
#include <qwt_plot_textlabel.h>

#include <QEvent>
#include <QPen>

namespace cw::gui {

ChartBase::ChartBase(QWidget* parent) : QwtPlot(parent) {
  setAutoReplot(false);
  if (auto* c = qobject_cast<QwtPlotCanvas*>(canvas())) c->setFrameStyle(QFrame::Box | QFrame::Plain);
  grid_ = new QwtPlotGrid;
  grid_->attach(this);
  staleLabel_ = new QwtPlotTextLabel;
  staleLabel_->setZ(100);
  staleLabel_->setVisible(false);
  staleLabel_->attach(this);
  applyBasePalette();
}

ChartBase::~ChartBase() = default;

void ChartBase::finishConstruction() {
  built_ = true;
}

QColor ChartBase::between(double t) const {
  return mixColours(palette().color(QPalette::Base), palette().color(QPalette::Text), t);
}

bool ChartBase::darkCanvas() const {
  return palette().color(QPalette::Base).lightness() <= 128;
}

void ChartBase::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  showStaleBanner();
  staleChanged();
  replot();
}

void ChartBase::assignStale(bool stale) {
  stale_ = stale;
}

void ChartBase::setStaleText(const QString& text) {
  staleText_ = text;
  showStaleBanner();
}

void ChartBase::showStaleBanner() {
  QwtText banner = staleBannerText(palette(), hasResult());
  if (!staleText_.isEmpty()) banner.setText(staleText_);
  staleLabel_->setText(banner);
  staleLabel_->setVisible(stale_ && wantsStaleBanner());
}

QwtPlotLegendItem* ChartBase::makeLegendItem(Qt::Alignment alignment, int columns, double fontScale) {
  auto* legend = new QwtPlotLegendItem;
  legend->setMaxColumns(static_cast<uint>(columns));
  legend->setAlignmentInCanvas(alignment);
  legend->setBorderRadius(3);
  legend->setMargin(3);
  legend->setSpacing(1);
  legend->setItemMargin(1);
  QFont legendFont = font();
  legendFont.setPointSizeF(legendFont.pointSizeF() * fontScale);
  legend->setFont(legendFont);
  legend->setZ(90);
  legendItems_.push_back(legend);
  styleLegendItem(legend);
  return legend;
}

QwtLegend* ChartBase::insertOuterLegend(QwtPlot::LegendPosition position, int columns, double fontScale) {
  auto* legend = new QwtLegend;
  legend->setMaxColumns(static_cast<uint>(columns));
  QFont legendFont = font();
  legendFont.setPointSizeF(legendFont.pointSizeF() * fontScale);
  legend->setFont(legendFont);
  insertLegend(legend, position);
  return legend;
}

void ChartBase::styleLegendItem(QwtPlotLegendItem* legend) const {
  QColor background = palette().color(QPalette::Base);
  background.setAlpha(215);
  legend->setBackgroundBrush(background);
  legend->setBorderPen(QPen(between(0.4), 1.0));
  legend->setTextPen(QPen(palette().color(QPalette::Text)));
}

void ChartBase::applyBasePalette() {
  setCanvasBackground(palette().color(QPalette::Base));
  grid_->setMajorPen(between(0.3), 0.0, Qt::DotLine);
  for (QwtPlotLegendItem* legend : legendItems_) styleLegendItem(legend);
  showStaleBanner();
}

void ChartBase::changeEvent(QEvent* event) {
  QwtPlot::changeEvent(event);
  if (event->type() != QEvent::PaletteChange || applyingPalette_ || !built_) return;
  applyingPalette_ = true;
  applyBasePalette();
  paletteChanged();
  applyingPalette_ = false;
}

QPalette ExportScope::exportPalette() {
  QPalette p;
  const QColor white(Qt::white), ink(0x1a, 0x1a, 0x1a);
  for (auto group : {QPalette::Active, QPalette::Inactive, QPalette::Disabled}) {
    for (auto role : {QPalette::Window, QPalette::Base, QPalette::AlternateBase, QPalette::Button,
                      QPalette::ToolTipBase, QPalette::Light, QPalette::Midlight})
      p.setColor(group, role, white);
    for (auto role : {QPalette::WindowText, QPalette::Text, QPalette::ButtonText, QPalette::ToolTipText,
                      QPalette::BrightText})
      p.setColor(group, role, ink);
    p.setColor(group, QPalette::Mid, QColor(0xa0, 0xa0, 0xa0));
    p.setColor(group, QPalette::Dark, QColor(0x60, 0x60, 0x60));
    p.setColor(group, QPalette::Shadow, ink);
  }
  return p;
}

ExportScope::ExportScope(QwtPlot* plot)
    : plot_(plot),
      chart_(qobject_cast<ChartBase*>(plot)),
      palette_(plot->palette()),
      ownPalette_(plot->testAttribute(Qt::WA_SetPalette)) {
  plot_->setPalette(exportPalette());
  QwtText footer(cautionText());
  QFont font = plot_->font();
  font.setPointSizeF(font.pointSizeF() * 0.75);
  font.setItalic(true);
  footer.setFont(font);
  footer.setRenderFlags(Qt::AlignCenter | Qt::TextWordWrap);
  plot_->setFooter(footer);
  if (chart_) chart_->beginExport();
  plot_->replot();
}

ExportScope::~ExportScope() {
  if (chart_) chart_->endExport();
  plot_->setFooter(QwtText());
  if (ownPalette_)
    plot_->setPalette(palette_);
  else {
    plot_->setPalette(QPalette());
    plot_->setAttribute(Qt::WA_SetPalette, false);
  }
  plot_->replot();
}

}  // namespace cw::gui
