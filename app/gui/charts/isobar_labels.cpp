#include "charts/isobar_labels.h"

#include <qwt_plot_legenditem.h>
#include <qwt_scale_map.h>

#include <QPainter>

#include <algorithm>
#include <cmath>
#include <optional>

namespace cw::gui {

namespace {

/// Gap between a label and what it labels, and between neighbouring labels [px].
constexpr double kGap = 3.0;

/// Where QwtPlotMarker puts a point marker's label (its drawLabel: the symbol's half size plus
/// the spacing, on the aligned side) [px].
QRectF stationLabelRect(const IsobarLabels::Station& s, const QPointF& pixel) {
  const double xOff = std::max(0.5, (s.symbol.width() + 1.0) / 2.0);
  const double yOff = std::max(0.5, (s.symbol.height() + 1.0) / 2.0);
  double x = pixel.x() - s.label.width() / 2.0;
  if (s.align & Qt::AlignLeft) x = pixel.x() - xOff - s.spacing - s.label.width();
  if (s.align & Qt::AlignRight) x = pixel.x() + xOff + s.spacing;
  double y = pixel.y() - s.label.height() / 2.0;
  if (s.align & Qt::AlignTop) y = pixel.y() - yOff - s.spacing - s.label.height();
  if (s.align & Qt::AlignBottom) y = pixel.y() + yOff + s.spacing;
  return {QPointF(x, y), s.label};
}

}  // namespace

std::vector<int> placeLabels(const std::vector<std::vector<QRectF>>& candidates, std::vector<QRectF> occupied,
                             const QRectF& bounds) {
  std::vector<int> chosen;
  chosen.reserve(candidates.size());
  for (const auto& options : candidates) {
    int pick = -1;
    for (std::size_t k = 0; k < options.size() && pick < 0; ++k) {
      const QRectF& r = options[k];
      if (!bounds.contains(r)) continue;
      const QRectF padded = r.adjusted(-kGap / 2, -kGap / 2, kGap / 2, kGap / 2);
      if (std::none_of(occupied.begin(), occupied.end(),
                       [&](const QRectF& o) { return o.intersects(padded); }))
        pick = static_cast<int>(k);
    }
    if (pick >= 0) occupied.push_back(options[static_cast<std::size_t>(pick)]);
    chosen.push_back(pick);
  }
  return chosen;
}

IsobarLabels::IsobarLabels() {
  setItemAttribute(QwtPlotItem::Legend, false);
  setItemAttribute(QwtPlotItem::AutoScale, false);
  setZ(6);
}

void IsobarLabels::setLabels(std::vector<Label> labels) {
  labels_ = std::move(labels);
  itemChanged();
}

void IsobarLabels::setStations(std::vector<Station> stations) {
  stations_ = std::move(stations);
  itemChanged();
}

QColor IsobarLabels::textColour() const {
  return labels_.empty() ? QColor() : labels_.front().text.color();
}

void IsobarLabels::draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                        const QRectF& canvasRect) const {
  placed_.clear();
  placedTexts_.clear();
  obstacles_.clear();
  moved_ = 0;
  skipped_ = 0;
  auto toPixel = [&](const QPointF& p) { return QPointF(xMap.transform(p.x()), yMap.transform(p.y())); };

  for (const auto& s : stations_) {
    const QPointF pixel = toPixel(s.at);
    obstacles_.push_back(QRectF(pixel - QPointF(s.symbol.width(), s.symbol.height()) / 2.0, s.symbol));
    if (!s.label.isEmpty()) obstacles_.push_back(stationLabelRect(s, pixel));
  }
  if (legend_ && legend_->isVisible()) obstacles_.push_back(QRectF(legend_->geometry(canvasRect)));

  const QRectF bounds = canvasRect.adjusted(1, 1, -1, -1);
  std::vector<std::vector<QRectF>> candidates;
  candidates.reserve(labels_.size());
  for (const auto& label : labels_) {
    const QSizeF size = label.text.textSize(painter->font());
    std::vector<QRectF> options;
    if (label.horizontal && !label.along.empty()) {
      // Above the line, from the left edge rightwards in steps of a third of the label.
      const double y = toPixel(label.along.front()).y() - size.height() - 1.0;
      const double step = std::max(8.0, size.width() / 3.0);
      for (double x = bounds.left() + kGap; x + size.width() <= bounds.right(); x += step)
        options.emplace_back(QPointF(x, y), size);
    } else if (!label.along.empty()) {
      // Right of a point of the isobar: the preferred one, then its neighbours outwards. When
      // the preferred point is off the canvas (zoomed in), the nearest visible one stands in.
      // No farther than a quarter of the canvas height from it: a label far down its isobar
      // would sit among the cycle's own lines.
      const std::size_t n = label.along.size();
      const long first = static_cast<long>(std::min(label.preferred, n - 1));
      std::vector<std::size_t> order;
      order.reserve(n);
      for (long d = 0; d < static_cast<long>(n); ++d)
        for (long k : {first - d, first + d})
          if (k >= 0 && k < static_cast<long>(n) && (d > 0 || k == first - d) &&
              (order.empty() || order.back() != static_cast<std::size_t>(k)))
            order.push_back(static_cast<std::size_t>(k));
      std::optional<QPointF> home;
      const double reach = 0.25 * canvasRect.height();
      for (std::size_t k : order) {
        const QPointF p = toPixel(label.along[k]);
        if (!home) {
          if (!bounds.contains(p)) continue;
          home = p;
        }
        if (std::hypot(p.x() - home->x(), p.y() - home->y()) > reach) continue;
        options.emplace_back(QPointF(p.x() + kGap, p.y() - size.height() / 2.0), size);
      }
    }
    candidates.push_back(std::move(options));
  }

  const std::vector<int> chosen = placeLabels(candidates, obstacles_, bounds);
  for (std::size_t i = 0; i < labels_.size(); ++i) {
    if (chosen[i] < 0) {
      ++skipped_;
      continue;
    }
    if (chosen[i] > 0) ++moved_;
    const QRectF& r = candidates[i][static_cast<std::size_t>(chosen[i])];
    placed_.push_back(r);
    placedTexts_.push_back(labels_[i].text.text());
    labels_[i].text.draw(painter, r);
  }
}

}  // namespace cw::gui
