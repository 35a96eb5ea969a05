#include "audit/audit_chart.h"
#include "charts/colours.h"
#include "charts/label_placer.h"

#include "document/loss_names.h"

#include <qwt_plot_canvas.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_item.h>
#include <qwt_plot_textlabel.h>
#include <qwt_scale_div.h>
#include <qwt_scale_draw.h>
#include <qwt_scale_map.h>
#include <qwt_scale_widget.h>
#include <qwt_text.h>

#include <QCoreApplication>
#include <QEvent>
#include <QFontMetricsF>
#include <QMouseEvent>
#include <QPainter>

#include <algorithm>
#include <cmath>

namespace cw::gui {

namespace {

// The Okabe-Ito palette (colours.h), under this file's short names.
const QColor& kBlue = kOkabeItoBlue;
const QColor& kOrange = kOkabeItoOrange;
const QColor& kVermillion = kOkabeItoVermillion;
const QColor& kGreen = kOkabeItoGreen;

constexpr double kHalfWidth = 0.36;  // half a bar's width [bar pitch]

/// The loss names under the bars, at the integer positions.
class BarScaleDraw : public QwtScaleDraw {
 public:
  explicit BarScaleDraw(const std::vector<AuditChart::Bar>& bars) : bars_(bars) {}
  QwtText label(double value) const override {
    const long i = std::lround(value);
    if (i < 0 || i >= static_cast<long>(bars_.size()) || std::abs(value - static_cast<double>(i)) > 1e-6)
      return {};
    const auto& bar = bars_[static_cast<size_t>(i)];
    if (!bar.loss.empty()) return lossShortName(bar.loss);
    return i == 0 ? QCoreApplication::translate("cw::gui::AuditChart", "Ideal twin")
                  : QCoreApplication::translate("cw::gui::AuditChart", "With losses");
  }

 private:
  const std::vector<AuditChart::Bar>& bars_;
};

}  // namespace

class AuditChart::WaterfallItem : public QwtPlotItem {
 public:
  explicit WaterfallItem(const AuditChart& chart) : chart_(chart) {
    setZ(20);
    setItemAttribute(QwtPlotItem::AutoScale, false);
  }
  int rtti() const override { return QwtPlotItem::Rtti_PlotUserItem + 7; }

  void draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
            const QRectF& canvasRect) const override {
    labelRects_.clear();
    const auto& bars = chart_.bars_;
    const QPalette& p = chart_.palette();
    const double factor = chart_.figureFactor();
    const bool tsfc = chart_.figure_ == AuditFigure::Tsfc;
    const double bottom = yMap.s1();
    QFont font = chart_.font();
    font.setPointSizeF(font.pointSizeF() * 0.8);
    painter->setFont(font);
    std::vector<QString> texts;
    std::vector<std::vector<QRectF>> candidates;
    std::vector<QRectF> barRects;
    for (size_t i = 0; i < bars.size(); ++i) {
      const auto& bar = bars[i];
      const bool total = bar.loss.empty();
      const double x = static_cast<double>(i);
      const double y0 = total ? bottom : bar.from / factor, y1 = bar.to / factor;
      const QRectF r(QPointF(xMap.transform(x - kHalfWidth), yMap.transform(std::max(y0, y1))),
                     QPointF(xMap.transform(x + kHalfWidth), yMap.transform(std::min(y0, y1))));
      QColor fill;
      if (chart_.isStale())
        fill = chart_.between(0.4);
      else if (total)
        fill = i == 0 ? kOrange : kBlue;
      else {
        const double step = bar.to - bar.from;
        const bool costs = tsfc ? step > 0.0 : step < 0.0;
        fill = std::abs(step) <= 1e-9 * std::abs(bar.to) ? chart_.between(0.5) : costs ? kVermillion : kGreen;
      }
      const bool selected =
          !total && !chart_.exportingWithoutSelection_ && lossSection(bar.loss) == chart_.highlighted_;
      painter->setPen(selected ? QPen(p.color(QPalette::Text), 2.5) : QPen(fill.darker(130), 1.0));
      painter->setBrush(fill);
      painter->drawRect(r.height() < 1.0 ? r.adjusted(0, -0.5, 0, 0.5) : r);
      // Connector to the next bar at the running figure.
      if (i + 1 < bars.size()) {
        painter->setPen(QPen(chart_.between(0.5), 1.0, Qt::DotLine));
        const double yc = yMap.transform(y1);
        painter->drawLine(QPointF(xMap.transform(x + kHalfWidth), yc),
                          QPointF(xMap.transform(x + 1 - kHalfWidth), yc));
      }
      // The bar's value: the total, or the step with its sign.
      const double shown = (total ? bar.to : bar.to - bar.from) / factor;
      QString text = formatNumber(shown, total ? 4 : 3);
      if (!total && shown > 0) text.prepend(QLatin1Char('+'));
      // Sized and drawn as QwtText (a fixed box and QPainter::drawText cut the value in half on
      // a 200 dpi export, where the renderer's scaled painter drew it larger); above the bar,
      // clear of the bars and of each other.
      const QSizeF size = textSizeOn(painter, painter->font(), text);
      const double lift = size.height() + 1.0;
      std::vector<QRectF> options;
      for (int row = 0; row < 3; ++row)  // above the bar, then staggered a line or two higher
        options.emplace_back(
            QPointF(r.center().x() - size.width() / 2.0, r.top() - 2.0 - size.height() - row * lift), size);
      texts.push_back(text);
      candidates.push_back(std::move(options));
      barRects.push_back(r);
    }
    // The values: clear of every bar and of each other, inside the canvas; one that fits nowhere
    // goes where it prefers, moved inside the canvas.
    LabelPlacer placer(canvasRect.adjusted(1, 1, -1, -1));
    for (const QRectF& r : barRects) placer.addObstacle(r);
    painter->setPen(p.color(QPalette::Text));
    for (std::size_t i = 0; i < candidates.size(); ++i) {
      const int k = placer.place(candidates[i]);
      QRectF textRect = candidates[i][static_cast<std::size_t>(std::max(k, 0))];
      if (k < 0) {
        textRect.moveTop(std::max(textRect.top(), canvasRect.top() + 1.0));
        textRect.moveLeft(std::max(textRect.left(), canvasRect.left() + 1.0));
        textRect.moveRight(std::min(textRect.right(), canvasRect.right() - 1.0));
        placer.addObstacle(textRect);
      }
      QwtText value(texts[i]);
      value.setFont(font);
      value.setColor(p.color(QPalette::Text));
      value.setRenderFlags(Qt::AlignCenter);
      value.draw(painter, textRect);
      labelRects_.push_back(textRect);
    }
    lastCanvas_ = canvasRect;
  }

  /// From the last draw [canvas px], for tests: the value labels and the canvas.
  mutable std::vector<QRectF> labelRects_;
  mutable QRectF lastCanvas_;

 private:
  const AuditChart& chart_;
};

AuditChart::AuditChart(DisplayUnits& units, QWidget* parent) : ChartBase(parent), units_(units) {
  setObjectName("auditChart");
  canvas()->installEventFilter(this);
  canvas()->setCursor(Qt::PointingHandCursor);

  gridItem()->enableX(false);
  item_ = new WaterfallItem(*this);
  item_->attach(this);

  auto* draw = new BarScaleDraw(bars_);
  draw->setLabelRotation(-40.0);
  draw->setLabelAlignment(Qt::AlignLeft | Qt::AlignBottom);
  draw->enableComponent(QwtAbstractScaleDraw::Ticks, false);
  setAxisScaleDraw(QwtAxis::XBottom, draw);

  retranslateUi();
  connect(&units_, &DisplayUnits::changed, this, [this] {
    retranslateUi();
    rebuild();
  });
  rebuild();
  finishConstruction();
}

AuditChart::~AuditChart() = default;

double AuditChart::figureFactor() const {
  return units_.factor(figure_ == AuditFigure::Tsfc ? Quantity::Tsfc : Quantity::SpecificThrust);
}

void AuditChart::refresh() {
  retranslateUi();
  rebuild();
}

void AuditChart::beginExport(const ExportOptions& options) {
  exportingWithoutSelection_ = !options.selectionHighlight;
}

void AuditChart::endExport() {
  exportingWithoutSelection_ = false;
}

void AuditChart::paletteChanged() {
  retranslateUi();
  replot();
}

void AuditChart::retranslateUi() {
  QwtText title(figure_ == AuditFigure::Tsfc ? tr("Waterfall of TSFC") : tr("Waterfall of specific thrust"));
  QFont titleFont = font();
  titleFont.setBold(true);
  titleFont.setPointSizeF(font().pointSizeF() * 1.1);
  title.setFont(titleFont);
  setTitle(title);
  setAxisTitle(QwtAxis::YLeft, figure_ == AuditFigure::Tsfc
                                   ? units_.withUnit(tr("TSFC"), Quantity::Tsfc)
                                   : units_.withUnit(tr("Specific thrust F_s"), Quantity::SpecificThrust));
  showStaleBanner();
}

void AuditChart::setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale) {
  audit_ = std::move(audit);
  assignStale(stale);
  showStaleBanner();
  rebuild();
}

void AuditChart::setFigure(AuditFigure figure) {
  if (figure == figure_) return;
  figure_ = figure;
  retranslateUi();
  rebuild();
}

void AuditChart::setHighlightedSection(Section section) {
  if (section == highlighted_) return;
  highlighted_ = section;
  replot();
}

void AuditChart::rebuild() {
  bars_.clear();
  if (audit_) {
    const bool tsfc = figure_ == AuditFigure::Tsfc;
    auto value = [tsfc](const analysis::AuditFigures& f) {
      return tsfc ? f.thrustSpecificFuelConsumption : f.specificThrust;
    };
    double running = value(audit_->ideal);
    bars_.push_back({std::string(), 0.0, running});
    for (const auto& d : audit_->waterfall) {
      const double step = tsfc ? d.deltaTsfc : d.deltaSpecificThrust;
      bars_.push_back({d.loss, running, running + step});
      running += step;
    }
    bars_.push_back({std::string(), 0.0, value(audit_->actual)});
  }
  // The value axis spans the running figures with a margin (the totals start at its foot),
  // so that steps of a fraction of a percent stay visible.
  const double factor = figureFactor();
  double low = 0.0, high = 1.0;
  if (!bars_.empty()) {
    low = high = bars_.front().to;
    for (const auto& b : bars_) {
      low = std::min({low, b.to, b.loss.empty() ? b.to : b.from});
      high = std::max({high, b.to, b.loss.empty() ? b.to : b.from});
    }
    const double span = std::max(high - low, 1e-9 * std::abs(high));
    low = std::max(0.0, low - 0.6 * span);
    // Room above the highest bar for three rows of values (they stagger where they would run
    // together), however small the canvas: a share k of the axis, (high' - high) = k (high' - low).
    QFont valueFont = font();
    valueFont.setPointSizeF(valueFont.pointSizeF() * 0.8);
    const double rows = 3.3 * QFontMetricsF(valueFont).height();
    const double k = std::min(0.6, std::max(0.15, rows / std::max(60.0, double(canvas()->height()))));
    high = std::max(high + 0.18 * span, (high - k * low) / (1.0 - k));
  }
  setAxisScale(QwtAxis::YLeft, low / factor, high / factor);
  QList<double> ticks;
  for (size_t i = 0; i < bars_.size(); ++i) ticks << static_cast<double>(i);
  const double n = static_cast<double>(std::max<size_t>(bars_.size(), 1));
  setAxisScaleDiv(QwtAxis::XBottom, QwtScaleDiv(-0.6, n - 0.4, QList<double>(), QList<double>(), ticks));
  // The ticks stay at 0..n while the losses under them change (another order, another case):
  // the scale draw's cached labels must go, or the names would stay those of the first audit.
  axisScaleDraw(QwtAxis::XBottom)->invalidateCache();
  axisWidget(QwtAxis::XBottom)->updateGeometry();
  axisWidget(QwtAxis::XBottom)->update();
  replot();
}

const std::vector<QRectF>& AuditChart::valueLabelRects() const {
  return item_->labelRects_;
}

QRectF AuditChart::lastCanvasRect() const {
  return item_->lastCanvas_;
}

int AuditChart::barAt(const QPoint& position) const {
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom);
  const double x = xMap.invTransform(position.x());
  const long i = std::lround(x);
  if (i < 0 || i >= static_cast<long>(bars_.size()) || std::abs(x - static_cast<double>(i)) > kHalfWidth)
    return -1;
  return static_cast<int>(i);
}

QPoint AuditChart::barCentre(int index) const {
  const auto& bar = bars_.at(static_cast<size_t>(index));
  const double factor = figureFactor();
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom), yMap = canvasMap(QwtAxis::YLeft);
  const double from = bar.loss.empty() ? yMap.s1() : bar.from / factor;
  return QPoint(qRound(xMap.transform(index)), qRound(yMap.transform(0.5 * (from + bar.to / factor))));
}

void AuditChart::resizeEvent(QResizeEvent* event) {
  ChartBase::resizeEvent(event);
  rebuild();  // the room for the values depends on the canvas's height
}

bool AuditChart::eventFilter(QObject* object, QEvent* event) {
  if (object == canvas() && event->type() == QEvent::MouseButtonPress) {
    auto* mouse = static_cast<QMouseEvent*>(event);
    if (mouse->button() == Qt::LeftButton) {
      const int i = barAt(mouse->position().toPoint());
      if (i >= 0 && !bars_[static_cast<size_t>(i)].loss.empty())
        emit lossClicked(QString::fromStdString(bars_[static_cast<size_t>(i)].loss));
    }
  }
  return QwtPlot::eventFilter(object, event);
}

}  // namespace cw::gui
