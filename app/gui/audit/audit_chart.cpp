#include "audit/audit_chart.h"
#include "charts/colours.h"
#include "charts/label_placer.h"

#include "document/loss_names.h"

#include <qwt_graphic.h>
#include <qwt_plot_canvas.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_item.h>
#include <qwt_plot_legenditem.h>
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
#include <QStringList>

#include <algorithm>
#include <cmath>

namespace cw::gui {

namespace {

// The Okabe-Ito palette (colours.h), under this file's short names.
const QColor& kBlue = kOkabeItoBlue;
const QColor& kOrange = kOkabeItoOrange;
const QColor& kVermillion = kOkabeItoVermillion;
const QColor& kGreen = kOkabeItoGreen;
const QColor& kGrey = kOkabeItoGrey;

constexpr double kHalfWidth = 0.36;      // half a bar's width [bar pitch]
constexpr double kPairHalfWidth = 0.19;  // half of each bar of a pair (current, baseline)
constexpr double kPairOffset = 0.2;      // of each bar of a pair from the slot's centre
constexpr qsizetype kBaselineTitleChars =
    32;  ///< of the baseline's title in the legend, as on the cycle charts

/// The losses of two waterfall orders, each kept in its order: both are taken from one order
/// (the asked keys, then the flow order) with the losses that do not apply left out, so the
/// merge is consistent with both.
std::vector<std::string> mergedOrder(const std::vector<std::string>& a, const std::vector<std::string>& b) {
  std::vector<std::string> out;
  std::size_t i = 0, j = 0;
  auto in = [](const std::vector<std::string>& v, std::size_t from, const std::string& key) {
    return std::find(v.begin() + static_cast<std::ptrdiff_t>(from), v.end(), key) != v.end();
  };
  while (i < a.size() || j < b.size()) {
    if (i < a.size() && j < b.size() && a[i] == b[j]) {
      out.push_back(a[i++]);
      ++j;
    } else if (i < a.size() && (j >= b.size() || !in(b, j, a[i]))) {
      out.push_back(a[i++]);
    } else if (j < b.size() && (i >= a.size() || !in(a, i, b[j]))) {
      out.push_back(b[j++]);
    } else {
      out.push_back(a[i++]);  // not from one order (does not happen): the current's first
    }
  }
  std::vector<std::string> unique;
  for (auto& key : out)
    if (std::find(unique.begin(), unique.end(), key) == unique.end()) unique.push_back(key);
  return unique;
}

/// The loss names under the slots, at the integer positions.
class BarScaleDraw : public QwtScaleDraw {
 public:
  explicit BarScaleDraw(const std::vector<std::string>& names) : slots_(names) {}
  QwtText label(double value) const override {
    const long i = std::lround(value);
    if (i < 0 || i >= static_cast<long>(slots_.size()) || std::abs(value - static_cast<double>(i)) > 1e-6)
      return {};
    const auto& loss = slots_[static_cast<size_t>(i)];
    if (!loss.empty()) return lossShortName(loss);
    return i == 0 ? QCoreApplication::translate("cw::gui::AuditChart", "Ideal twin")
                  : QCoreApplication::translate("cw::gui::AuditChart", "With losses");
  }

 private:
  const std::vector<std::string>& slots_;
};

}  // namespace

/// The baseline's entry in the legend: a grey bar; it draws nothing on the canvas.
class AuditChart::BaselineKeyItem : public QwtPlotItem {
 public:
  BaselineKeyItem() {
    setItemAttribute(QwtPlotItem::AutoScale, false);
    setItemAttribute(QwtPlotItem::Legend, false);
    setLegendIconSize(QSize(10, 10));
  }
  int rtti() const override { return QwtPlotItem::Rtti_PlotUserItem + 8; }
  void draw(QPainter*, const QwtScaleMap&, const QwtScaleMap&, const QRectF&) const override {}
  QwtGraphic legendIcon(int, const QSizeF& size) const override {
    QwtGraphic icon;
    icon.setDefaultSize(size);
    icon.setRenderHint(QwtGraphic::RenderPensUnscaled, true);
    QPainter painter(&icon);
    painter.setPen(QPen(kGrey.darker(130), 1.0));
    painter.setBrush(kGrey);
    painter.drawRect(QRectF(QPointF(1, 1), size - QSizeF(2, 2)));
    return icon;
  }
};

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
    baselineLabelRects_.clear();
    const QPalette& p = chart_.palette();
    const bool paired = !chart_.baselineBars_.empty();
    QFont font = chart_.font();
    font.setPointSizeF(font.pointSizeF() * 0.8);
    painter->setFont(font);
    Labels current, baseline;
    drawBars(painter, xMap, yMap, chart_.bars_, false, paired, current);
    if (paired) drawBars(painter, xMap, yMap, chart_.baselineBars_, true, paired, baseline);
    // The values: clear of every bar, the legend and each other, inside the canvas. The current
    // case's first: one that fits nowhere goes where it prefers, moved inside the canvas; a
    // baseline's value that fits nowhere is left out (its bar and the table still tell it).
    LabelPlacer placer(canvasRect.adjusted(1, 1, -1, -1));
    for (const QRectF& r : current.bars) placer.addObstacle(r);
    for (const QRectF& r : baseline.bars) placer.addObstacle(r);
    if (paired && chart_.legend_ && chart_.legend_->plot())
      placer.addObstacle(chart_.legend_->geometry(canvasRect).adjusted(-2, -2, 2, 2));
    painter->setPen(p.color(QPalette::Text));
    auto drawValue = [&](const QString& text, const QRectF& textRect) {
      QwtText value(text);
      value.setFont(font);
      value.setColor(p.color(QPalette::Text));
      value.setRenderFlags(Qt::AlignCenter);
      value.draw(painter, textRect);
    };
    for (std::size_t i = 0; i < current.candidates.size(); ++i) {
      const int k = placer.place(current.candidates[i]);
      QRectF textRect = current.candidates[i][static_cast<std::size_t>(std::max(k, 0))];
      if (k < 0) {
        textRect.moveTop(std::max(textRect.top(), canvasRect.top() + 1.0));
        textRect.moveLeft(std::max(textRect.left(), canvasRect.left() + 1.0));
        textRect.moveRight(std::min(textRect.right(), canvasRect.right() - 1.0));
        placer.addObstacle(textRect);
      }
      drawValue(current.texts[i], textRect);
      labelRects_.push_back(textRect);
    }
    for (std::size_t i = 0; i < baseline.candidates.size(); ++i) {
      const int k = placer.place(baseline.candidates[i]);
      if (k < 0) continue;
      const QRectF& textRect = baseline.candidates[i][static_cast<std::size_t>(k)];
      drawValue(baseline.texts[i], textRect);
      baselineLabelRects_.push_back(textRect);
    }
    lastCanvas_ = canvasRect;
  }

  /// From the last draw [canvas px], for tests: the value labels and the canvas.
  mutable std::vector<QRectF> labelRects_;
  mutable std::vector<QRectF> baselineLabelRects_;
  mutable QRectF lastCanvas_;

 private:
  /// The bars drawn and their value labels' candidate places.
  struct Labels {
    std::vector<QString> texts;
    std::vector<std::vector<QRectF>> candidates;
    std::vector<QRectF> bars;
  };

  /// Draws one audit's bars and connectors (the baseline's in grey, on the right of each slot).
  void drawBars(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                const std::vector<Bar>& bars, bool baseline, bool paired, Labels& labels) const {
    const QPalette& p = chart_.palette();
    const double factor = chart_.figureFactor();
    const bool tsfc = chart_.figure_ == AuditFigure::Tsfc;
    const double bottom = yMap.s1();
    const double half = paired ? kPairHalfWidth : kHalfWidth;
    const double offset = paired ? (baseline ? kPairOffset : -kPairOffset) : 0.0;
    for (size_t i = 0; i < bars.size(); ++i) {
      const auto& bar = bars[i];
      const bool total = bar.loss.empty();
      const double x = static_cast<double>(bar.slot) + offset;
      const double y0 = total ? bottom : bar.from / factor, y1 = bar.to / factor;
      const QRectF r(QPointF(xMap.transform(x - half), yMap.transform(std::max(y0, y1))),
                     QPointF(xMap.transform(x + half), yMap.transform(std::min(y0, y1))));
      QColor fill;
      if (baseline)
        fill = kGrey;
      else if (chart_.isStale())
        fill = chart_.between(paired ? 0.25 : 0.4);  // lighter than the baseline's grey beside it
      else if (total)
        fill = i == 0 ? kOrange : kBlue;
      else {
        const double step = bar.to - bar.from;
        const bool costs = tsfc ? step > 0.0 : step < 0.0;
        fill = std::abs(step) <= 1e-9 * std::abs(bar.to) ? chart_.between(0.5) : costs ? kVermillion : kGreen;
      }
      const bool selected = !baseline && !total && !chart_.exportingWithoutSelection_ &&
                            lossSection(bar.loss) == chart_.highlighted_;
      painter->setPen(selected ? QPen(p.color(QPalette::Text), 2.5) : QPen(fill.darker(130), 1.0));
      painter->setBrush(fill);
      painter->drawRect(r.height() < 1.0 ? r.adjusted(0, -0.5, 0, 0.5) : r);
      // Connector to the next bar at the running figure.
      if (i + 1 < bars.size()) {
        painter->setPen(QPen(baseline ? kGrey : chart_.between(0.5), 1.0, Qt::DotLine));
        const double yc = yMap.transform(y1);
        const double next = static_cast<double>(bars[i + 1].slot) + offset;
        painter->drawLine(QPointF(xMap.transform(x + half), yc), QPointF(xMap.transform(next - half), yc));
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
      labels.texts.push_back(text);
      labels.candidates.push_back(std::move(options));
      labels.bars.push_back(r);
    }
  }

  const AuditChart& chart_;
};

AuditChart::AuditChart(DisplayUnits& units, QWidget* parent) : ChartBase(parent), units_(units) {
  setObjectName("auditChart");
  canvas()->installEventFilter(this);
  canvas()->setCursor(Qt::PointingHandCursor);

  gridItem()->enableX(false);
  item_ = new WaterfallItem(*this);
  item_->attach(this);

  key_ = new BaselineKeyItem;
  key_->attach(this);
  legend_ = makeLegendItem(Qt::AlignTop | Qt::AlignRight, 1, 0.8);
  legend_->attach(this);

  auto* draw = new BarScaleDraw(slots_);
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
  fitValueAxisTitle(true);  // a figure has the room for the whole title
}

void AuditChart::endExport() {
  exportingWithoutSelection_ = false;
  fitValueAxisTitle();
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
  fitValueAxisTitle();
  showStaleBanner();
}

QStringList AuditChart::valueAxisTitles() const {
  if (figure_ == AuditFigure::Tsfc) return {units_.withUnit(tr("TSFC"), Quantity::Tsfc)};
  return {units_.withUnit(tr("Specific thrust F_s"), Quantity::SpecificThrust),
          units_.withUnit(tr("F_s"), Quantity::SpecificThrust)};
}

void AuditChart::fitValueAxisTitle(bool whole) {
  // In the low bottom tab of a laptop screen the whole title is longer than the axis; the unit
  // alone comes last (the chart's title names the figure).
  QStringList titles = valueAxisTitles();
  titles << units_
                .withUnit(QString(), figure_ == AuditFigure::Tsfc ? Quantity::Tsfc : Quantity::SpecificThrust)
                .trimmed();
  fitAxisTitle(QwtAxis::YLeft, titles, whole);
}

bool AuditChart::valueAxisTitleFits() const {
  return axisTitleFits(QwtAxis::YLeft);
}

void AuditChart::setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale) {
  audit_ = std::move(audit);
  assignStale(stale);
  showStaleBanner();
  rebuild();
}

void AuditChart::setBaseline(std::shared_ptr<const analysis::LossAudit> baseline, const QString& title) {
  if (baseline == baseline_ && title == baselineTitle_) return;
  baseline_ = std::move(baseline);
  baselineTitle_ = title;
  key_->setTitle(baselineLegendText());
  key_->setItemAttribute(QwtPlotItem::Legend, baseline_ != nullptr);
  rebuild();
}

QString AuditChart::baselineLegendText() const {
  if (!baseline_) return {};
  const QString title = baselineTitle_.size() > kBaselineTitleChars
                            ? baselineTitle_.left(kBaselineTitleChars - 1) + QChar(0x2026)
                            : baselineTitle_;
  return tr("Baseline: %1").arg(title);
}

std::vector<AuditChart::Bar> AuditChart::barsOf(const analysis::LossAudit& audit) const {
  const bool tsfc = figure_ == AuditFigure::Tsfc;
  auto value = [tsfc](const analysis::AuditFigures& f) {
    return tsfc ? f.thrustSpecificFuelConsumption : f.specificThrust;
  };
  std::vector<Bar> bars;
  double running = value(audit.ideal);
  bars.push_back({std::string(), 0.0, running, 0});
  for (const auto& d : audit.waterfall) {
    const double step = tsfc ? d.deltaTsfc : d.deltaSpecificThrust;
    const auto at = std::find(slots_.begin() + 1, slots_.end() - 1, d.loss);
    bars.push_back({d.loss, running, running + step, static_cast<int>(at - slots_.begin())});
    running += step;
  }
  bars.push_back({std::string(), 0.0, value(audit.actual), static_cast<int>(slots_.size()) - 1});
  return bars;
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
  baselineBars_.clear();
  slots_.clear();
  if (audit_) {
    const std::vector<std::string> none;
    slots_.push_back(std::string());
    for (auto& key : mergedOrder(audit_->waterfallOrder, baseline_ ? baseline_->waterfallOrder : none))
      slots_.push_back(key);
    slots_.push_back(std::string());
    bars_ = barsOf(*audit_);
    if (baseline_) baselineBars_ = barsOf(*baseline_);
  }
  // The legend's corner: the one the bars leave free (specific thrust falls to the right, TSFC
  // rises to it).
  legend_->setAlignmentInCanvas(Qt::AlignTop |
                                (figure_ == AuditFigure::Tsfc ? Qt::AlignLeft : Qt::AlignRight));
  // The value axis spans the running figures with a margin (the totals start at its foot),
  // so that steps of a fraction of a percent stay visible.
  const double factor = figureFactor();
  double low = 0.0, high = 1.0;
  if (!bars_.empty()) {
    low = high = bars_.front().to;
    for (const auto* set : {&bars_, &baselineBars_})
      for (const auto& b : *set) {
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
  for (size_t i = 0; i < slots_.size(); ++i) ticks << static_cast<double>(i);
  const double n = static_cast<double>(std::max<size_t>(slots_.size(), 1));
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

const std::vector<QRectF>& AuditChart::baselineValueLabelRects() const {
  return item_->baselineLabelRects_;
}

QRectF AuditChart::lastCanvasRect() const {
  return item_->lastCanvas_;
}

int AuditChart::barAt(const QPoint& position) const {
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom);
  const double x = xMap.invTransform(position.x());
  const bool paired = !baselineBars_.empty();
  const double half = paired ? kPairHalfWidth : kHalfWidth;
  const double offset = paired ? -kPairOffset : 0.0;
  for (size_t i = 0; i < bars_.size(); ++i)
    if (std::abs(x - (bars_[i].slot + offset)) <= half) return static_cast<int>(i);
  return -1;
}

QPoint AuditChart::barCentre(int index) const {
  const auto& bar = bars_.at(static_cast<size_t>(index));
  const double factor = figureFactor();
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom), yMap = canvasMap(QwtAxis::YLeft);
  const double from = bar.loss.empty() ? yMap.s1() : bar.from / factor;
  const double offset = baselineBars_.empty() ? 0.0 : -kPairOffset;
  return QPoint(qRound(xMap.transform(bar.slot + offset)),
                qRound(yMap.transform(0.5 * (from + bar.to / factor))));
}

void AuditChart::resizeEvent(QResizeEvent* event) {
  ChartBase::resizeEvent(event);
  fitValueAxisTitle();
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
