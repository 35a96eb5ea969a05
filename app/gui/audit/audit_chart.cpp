#include "audit/audit_chart.h"
#include "charts/colours.h"
#include "charts/stale_banner.h"

#include "document/loss_names.h"

#include <qwt_plot_canvas.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_item.h>
#include <qwt_plot_textlabel.h>
#include <qwt_scale_div.h>
#include <qwt_scale_draw.h>
#include <qwt_scale_map.h>
#include <qwt_text.h>

#include <QCoreApplication>
#include <QEvent>
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

QColor between(const QPalette& palette, double t) {
  return mixColours(palette.color(QPalette::Base), palette.color(QPalette::Text), t);
}

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
            const QRectF&) const override {
    const auto& bars = chart_.bars_;
    const QPalette& p = chart_.palette();
    const double factor = chart_.figureFactor();
    const bool tsfc = chart_.figure_ == AuditFigure::Tsfc;
    const double bottom = yMap.s1();
    QFont font = chart_.font();
    font.setPointSizeF(font.pointSizeF() * 0.8);
    painter->setFont(font);
    for (size_t i = 0; i < bars.size(); ++i) {
      const auto& bar = bars[i];
      const bool total = bar.loss.empty();
      const double x = static_cast<double>(i);
      const double y0 = total ? bottom : bar.from / factor, y1 = bar.to / factor;
      const QRectF r(QPointF(xMap.transform(x - kHalfWidth), yMap.transform(std::max(y0, y1))),
                     QPointF(xMap.transform(x + kHalfWidth), yMap.transform(std::min(y0, y1))));
      QColor fill;
      if (chart_.stale_)
        fill = between(p, 0.4);
      else if (total)
        fill = i == 0 ? kOrange : kBlue;
      else {
        const double step = bar.to - bar.from;
        const bool costs = tsfc ? step > 0.0 : step < 0.0;
        fill = std::abs(step) <= 1e-9 * std::abs(bar.to) ? between(p, 0.5) : costs ? kVermillion : kGreen;
      }
      const bool selected = !total && lossSection(bar.loss) == chart_.highlighted_;
      painter->setPen(selected ? QPen(p.color(QPalette::Text), 2.5) : QPen(fill.darker(130), 1.0));
      painter->setBrush(fill);
      painter->drawRect(r.height() < 1.0 ? r.adjusted(0, -0.5, 0, 0.5) : r);
      // Connector to the next bar at the running figure.
      if (i + 1 < bars.size()) {
        painter->setPen(QPen(between(p, 0.5), 1.0, Qt::DotLine));
        const double yc = yMap.transform(y1);
        painter->drawLine(QPointF(xMap.transform(x + kHalfWidth), yc),
                          QPointF(xMap.transform(x + 1 - kHalfWidth), yc));
      }
      // The bar's value: the total, or the step with its sign.
      const double shown = (total ? bar.to : bar.to - bar.from) / factor;
      QString text = formatNumber(shown, total ? 4 : 3);
      if (!total && shown > 0) text.prepend(QLatin1Char('+'));
      painter->setPen(p.color(QPalette::Text));
      const QRectF textRect(r.center().x() - 40, r.top() - 16, 80, 14);
      painter->drawText(textRect, Qt::AlignHCenter | Qt::AlignBottom, text);
    }
  }

 private:
  const AuditChart& chart_;
};

AuditChart::AuditChart(DisplayUnits& units, QWidget* parent) : QwtPlot(parent), units_(units) {
  setObjectName("auditChart");
  setAutoReplot(false);
  if (auto* c = qobject_cast<QwtPlotCanvas*>(canvas())) c->setFrameStyle(QFrame::Box | QFrame::Plain);
  canvas()->installEventFilter(this);
  canvas()->setCursor(Qt::PointingHandCursor);

  grid_ = new QwtPlotGrid;
  grid_->enableX(false);
  grid_->attach(this);
  item_ = new WaterfallItem(*this);
  item_->attach(this);
  staleLabel_ = new QwtPlotTextLabel;
  staleLabel_->setZ(100);
  staleLabel_->attach(this);

  auto* draw = new BarScaleDraw(bars_);
  draw->setLabelRotation(-40.0);
  draw->setLabelAlignment(Qt::AlignLeft | Qt::AlignBottom);
  draw->enableComponent(QwtAbstractScaleDraw::Ticks, false);
  setAxisScaleDraw(QwtAxis::XBottom, draw);

  applyPalette();
  retranslateUi();
  connect(&units_, &DisplayUnits::changed, this, [this] {
    retranslateUi();
    rebuild();
  });
  rebuild();
}

AuditChart::~AuditChart() = default;

double AuditChart::figureFactor() const {
  return units_.factor(figure_ == AuditFigure::Tsfc ? Quantity::Tsfc : Quantity::SpecificThrust);
}

void AuditChart::applyPalette() {
  const QPalette& p = palette();
  setCanvasBackground(p.color(QPalette::Base));
  grid_->setMajorPen(between(p, 0.3), 0.0, Qt::DotLine);
}

void AuditChart::changeEvent(QEvent* event) {
  QwtPlot::changeEvent(event);
  if (event->type() != QEvent::PaletteChange || applyingPalette_ || !grid_) return;
  applyingPalette_ = true;
  applyPalette();
  retranslateUi();
  replot();
  applyingPalette_ = false;
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
  staleLabel_->setText(staleBannerText(palette(), audit_ != nullptr));
  staleLabel_->setVisible(stale_);
}

void AuditChart::setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale) {
  audit_ = std::move(audit);
  stale_ = stale;
  staleLabel_->setText(staleBannerText(palette(), audit_ != nullptr));
  staleLabel_->setVisible(stale_);
  rebuild();
}

void AuditChart::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  staleLabel_->setVisible(stale_);
  replot();
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
    high += 0.18 * span;
  }
  setAxisScale(QwtAxis::YLeft, low / factor, high / factor);
  QList<double> ticks;
  for (size_t i = 0; i < bars_.size(); ++i) ticks << static_cast<double>(i);
  const double n = static_cast<double>(std::max<size_t>(bars_.size(), 1));
  setAxisScaleDiv(QwtAxis::XBottom, QwtScaleDiv(-0.6, n - 0.4, QList<double>(), QList<double>(), ticks));
  replot();
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
