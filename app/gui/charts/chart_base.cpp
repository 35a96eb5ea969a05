#include "charts/chart_base.h"

#include "charts/colours.h"
#include "charts/stale_banner.h"
#include "document/caution.h"

#include <qwt_legend.h>
#include <qwt_plot_canvas.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_layout.h>
#include <qwt_plot_legenditem.h>
#include <qwt_plot_textlabel.h>
#include <qwt_scale_widget.h>

#include <QEvent>
#include <QFontMetricsF>

#include <QPen>
#include <algorithm>

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

double ChartBase::axisTitleRoom(QwtAxisId axis) const {
  const QwtScaleWidget* w = axisWidget(axis);
  const int along = QwtAxis::isYAxis(axis) ? w->height() : w->width();
  return along - std::max(0, w->startBorderDist()) - std::max(0, w->endBorderDist()) - 4.0;
}

QFont ChartBase::axisTitleFont(QwtAxisId axis) const {
  const QwtText title = axisWidget(axis)->title();
  return title.testPaintAttribute(QwtText::PaintUsingTextFont) ? title.font() : axisWidget(axis)->font();
}

void ChartBase::fitAxisTitle(QwtAxisId axis, const QStringList& titles, bool whole) {
  // A title longer than its axis is wrapped by Qwt and cut at both ends (in a low panel).
  if (titles.isEmpty()) return;
  double& fullSize = titleFontSizes_[static_cast<std::size_t>(axis)];
  QFont font = axisTitleFont(axis);
  if (fullSize <= 0.0) fullSize = font.pointSizeF();
  font.setPointSizeF(fullSize);
  const double room = axisTitleRoom(axis);
  auto fits = [&](const QString& text, const QFont& f) {
    return QFontMetricsF(f).horizontalAdvance(text) <= room;
  };
  QString chosen = titles.front();
  QFont chosenFont = font;
  bool found = whole;
  for (int i = 0; i < titles.size() && !found; ++i)
    for (const double scale : {1.0, 0.9, 0.8, 0.7}) {
      if (scale < 1.0 && i == 0) break;  // the whole title only at full size
      QFont f = font;
      f.setPointSizeF(fullSize * scale);
      if (fits(titles[i], f)) {
        chosen = titles[i];
        chosenFont = f;
        found = true;
        break;
      }
    }
  if (!found) {
    chosen = titles.back();
    chosenFont.setPointSizeF(fullSize * 0.7);
  }
  const QwtText current = axisTitle(axis);
  if (current.text() == chosen && current.font() == chosenFont) return;
  QwtText title(chosen);
  title.setFont(chosenFont);
  setAxisTitle(axis, title);
}

bool ChartBase::axisTitleFits(QwtAxisId axis) const {
  return QFontMetricsF(axisTitleFont(axis)).horizontalAdvance(axisTitle(axis).text()) <= axisTitleRoom(axis);
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

namespace {

/// The layout of an exported figure: the caution line below the legend (a plain layout puts the
/// footer between the canvas and a legend below it).
class CautionBelowLegendLayout : public QwtPlotLayout {
 public:
  void activate(const QwtPlot* plot, const QRectF& rect, Options options) override {
    QwtPlotLayout::activate(plot, rect, options);
    const QRectF footer = footerRect(), legend = legendRect();
    if (footer.isEmpty() || legend.isEmpty() || legend.top() < footer.top()) return;
    const double top = footer.top();
    setLegendRect(QRectF(legend.left(), top, legend.width(), legend.height()));
    setFooterRect(QRectF(footer.left(), legend.bottom() - footer.height() + (top - footer.top()),
                         footer.width(), footer.height()));
  }
};

}  // namespace

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

ExportScope::ExportScope(QwtPlot* plot, const ExportOptions& options)
    : plot_(plot),
      chart_(qobject_cast<ChartBase*>(plot)),
      options_(options),
      palette_(plot->palette()),
      ownPalette_(plot->testAttribute(Qt::WA_SetPalette)),
      font_(plot->font()),
      ownFont_(plot->testAttribute(Qt::WA_SetFont)),
      plainChartTitle_(plot->title().text()) {
  if (chart_) chart_->inExport_ = true;
  if (!options_.fontFamily.isEmpty() || options_.fontPointSize > 0.0) {
    QFont font = plot_->font();
    if (!options_.fontFamily.isEmpty()) font.setFamily(options_.fontFamily);
    if (options_.fontPointSize > 0.0) font.setPointSizeF(options_.fontPointSize);
    plot_->setFont(font);
  }
  plot_->setPalette(exportPalette());
  if (chart_) chart_->refresh();
  placeLegend(options_.legend);
  // The title and subtitle (rich text: the subtitle a line of its own, smaller).
  if (!options_.title.isEmpty() || !options_.subtitle.isEmpty()) {
    const QString title = options_.title.isEmpty() ? plot_->title().text() : options_.title;
    QString html = QStringLiteral("<div align=\"center\"><b>%1</b>").arg(title.toHtmlEscaped());
    if (!options_.subtitle.isEmpty())
      html += QStringLiteral("<br/><span style=\"font-size:small; font-weight:normal\">%1</span>")
                  .arg(options_.subtitle.toHtmlEscaped());
    html += QStringLiteral("</div>");
    QwtText text(html, QwtText::RichText);
    QFont titleFont = plot_->font();
    titleFont.setPointSizeF(titleFont.pointSizeF() * 1.15);
    text.setFont(titleFont);
    plot_->setTitle(text);
  }
  // The caution: below the legend, small.
  QwtText footer(cautionText());
  QFont font = plot_->font();
  font.setPointSizeF(font.pointSizeF() * 0.75);
  font.setItalic(true);
  footer.setFont(font);
  footer.setRenderFlags(Qt::AlignCenter | Qt::TextWordWrap);
  plot_->setFooter(footer);
  layoutBefore_ = plot_->plotLayout()->legendPosition();
  plot_->setPlotLayout(new CautionBelowLegendLayout);
  plot_->plotLayout()->setLegendPosition(layoutBefore_);
  if (chart_) chart_->beginExport(options_);
  if (options_.lineWidthScale != 1.0) scaleLines(options_.lineWidthScale);
  plot_->replot();
}

ExportScope::~ExportScope() {
  if (chart_) chart_->endExport();
  // Pens back on the items still there (the refresh below rebuilds the others).
  const QwtPlotItemList items = plot_->itemList();
  for (const auto& [item, pen] : pens_)
    if (items.contains(item) && item->rtti() == QwtPlotItem::Rtti_PlotCurve)
      static_cast<QwtPlotCurve*>(item)->setPen(pen);
  plot_->setFooter(QwtText());
  const QwtPlot::LegendPosition position = plot_->plotLayout()->legendPosition();
  plot_->setPlotLayout(new QwtPlotLayout);
  plot_->plotLayout()->setLegendPosition(position);
  if (ownFont_)
    plot_->setFont(font_);
  else {
    plot_->setFont(QFont());
    plot_->setAttribute(Qt::WA_SetFont, false);
  }
  restoreLegend();
  if (ownPalette_)
    plot_->setPalette(palette_);
  else {
    plot_->setPalette(QPalette());
    plot_->setAttribute(Qt::WA_SetPalette, false);
  }
  if (chart_) chart_->inExport_ = false;
  if (chart_) chart_->refresh();
  plot_->replot();
}

QString ExportScope::plainTitle() const {
  const QString title = options_.title.isEmpty() ? plainChartTitle_ : options_.title;
  return options_.subtitle.isEmpty() ? title : title + QStringLiteral(" - ") + options_.subtitle;
}

void ExportScope::scaleLines(double factor) {
  for (QwtPlotItem* item : plot_->itemList(QwtPlotItem::Rtti_PlotCurve)) {
    auto* curve = static_cast<QwtPlotCurve*>(item);
    pens_.emplace_back(item, curve->pen());
    QPen pen = curve->pen();
    pen.setWidthF(std::max(0.5, pen.widthF() * factor));
    curve->setPen(pen);
  }
}

void ExportScope::placeLegend(LegendPlacement placement) {
  if (placement == LegendPlacement::AsShown) return;
  if (auto* outer = qobject_cast<QwtLegend*>(plot_->legend())) {
    hadOuterLegend_ = true;
    outerPosition_ = plot_->plotLayout()->legendPosition();
    outerColumns_ = static_cast<int>(outer->maxColumns());
    outerName_ = outer->objectName();
  }
  plot_->insertLegend(nullptr);
  for (QwtPlotItem* item : plot_->itemList(QwtPlotItem::Rtti_PlotLegend)) {
    auto* legend = static_cast<QwtPlotLegendItem*>(item);
    attachedItems_.push_back(legend);
    legend->detach();
  }
  switch (placement) {
    case LegendPlacement::Inside:
      if (!attachedItems_.empty()) {
        attachedItems_.front()->attach(plot_);
      } else if (chart_) {
        extraItem_ = chart_->makeLegendItem(Qt::AlignTop | Qt::AlignRight, 1, 0.85);
        extraItem_->attach(plot_);
      }
      break;
    case LegendPlacement::OutsideRight:
    case LegendPlacement::Below: {
      const bool right = placement == LegendPlacement::OutsideRight;
      auto* legend = new QwtLegend;
      legend->setMaxColumns(right ? 1 : 3);
      QFont legendFont = plot_->font();
      legendFont.setPointSizeF(legendFont.pointSizeF() * 0.85);
      legend->setFont(legendFont);
      plot_->insertLegend(legend, right ? QwtPlot::RightLegend : QwtPlot::BottomLegend);
      break;
    }
    case LegendPlacement::AsShown:
    case LegendPlacement::None:
      break;
  }
}

void ExportScope::restoreLegend() {
  if (options_.legend == LegendPlacement::AsShown) return;
  plot_->insertLegend(nullptr);
  for (QwtPlotItem* item : plot_->itemList(QwtPlotItem::Rtti_PlotLegend)) item->detach();
  if (extraItem_) {
    auto& items = chart_->legendItems_;
    items.erase(std::remove(items.begin(), items.end(), extraItem_), items.end());
    delete extraItem_;
  }
  for (QwtPlotLegendItem* legend : attachedItems_) legend->attach(plot_);
  if (hadOuterLegend_) {
    auto* legend = new QwtLegend;
    legend->setMaxColumns(static_cast<uint>(outerColumns_));
    legend->setObjectName(outerName_);
    QFont legendFont = plot_->font();
    legendFont.setPointSizeF(legendFont.pointSizeF() * 0.85);
    legend->setFont(legendFont);
    plot_->insertLegend(legend, outerPosition_);
  }
}

}  // namespace cw::gui
