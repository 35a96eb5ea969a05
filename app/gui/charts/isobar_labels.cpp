#include "charts/isobar_labels.h"

#include "charts/label_placer.h"

#include <qwt_plot_curve.h>
#include <qwt_plot_legenditem.h>
#include <qwt_scale_map.h>

#include <QFontMetricsF>
#include <QPainter>

#include <algorithm>
#include <cmath>
#include <optional>

namespace cw::gui {

namespace {

/// The side a station prefers first, then the other seven around its symbol.
std::vector<QRectF> stationCandidates(const IsobarLabels::Station& s, const QPointF& pixel,
                                      const QSizeF& size) {
  const QRectF symbol(pixel - QPointF(s.symbol.width(), s.symbol.height()) / 2.0, s.symbol);
  std::vector<QRectF> all = LabelPlacer::around(symbol, size, s.spacing);
  const bool left = s.align & Qt::AlignLeft, right = s.align & Qt::AlignRight;
  const bool top = s.align & Qt::AlignTop, bottom = s.align & Qt::AlignBottom;
  // around(): right, left, above, below, above right, above left, below right, below left.
  int first = 4;
  if (right && top)
    first = 4;
  else if (left && top)
    first = 5;
  else if (right && bottom)
    first = 6;
  else if (left && bottom)
    first = 7;
  else if (right)
    first = 0;
  else if (left)
    first = 1;
  else if (top)
    first = 2;
  else if (bottom)
    first = 3;
  std::rotate(all.begin(), all.begin() + first, all.begin() + first + 1);
  return all;
}

}  // namespace

QSizeF textSizeOn(const QPainter* painter, const QwtText& text) {
  return textSizeOn(painter, text.font(), text.text());
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

bool IsobarLabels::stationLabelRect(const QwtPlotMarker* marker, QRectF& rect) const {
  for (const auto& [m, r] : stationPlaces_)
    if (m == marker) {
      rect = r;
      return true;
    }
  return false;
}

void IsobarLabels::draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                        const QRectF& canvasRect) const {
  placed_.clear();
  placedTexts_.clear();
  obstacles_.clear();
  stationRects_.clear();
  stationPlaces_.clear();
  curvePixels_.clear();
  canvas_ = canvasRect;
  moved_ = 0;
  skipped_ = 0;
  auto toPixel = [&](const QPointF& p) { return QPointF(xMap.transform(p.x()), yMap.transform(p.y())); };

  const QRectF bounds = canvasRect.adjusted(1, 1, -1, -1);
  LabelPlacer placer(bounds);
  for (const QwtPlotCurve* curve : curves_) {
    if (!curve || !curve->isVisible()) continue;
    std::vector<QPointF> pixels;
    pixels.reserve(curve->dataSize());
    for (size_t i = 0; i < curve->dataSize(); ++i) pixels.push_back(toPixel(curve->sample(i)));
    placer.addCurve(pixels);
    curvePixels_.push_back(std::move(pixels));
  }
  // The markers' symbols and the legend first, then the station numbers, then the isobars'.
  for (const auto& s : stations_) {
    const QPointF pixel = toPixel(s.at);
    const QRectF symbol(pixel - QPointF(s.symbol.width(), s.symbol.height()) / 2.0, s.symbol);
    placer.addObstacle(symbol);
    obstacles_.push_back(symbol);
  }
  if (legend_ && legend_->isVisible() && legend_->plot()) {
    const QRectF legend(legend_->geometry(canvasRect));
    placer.addObstacle(legend);
    obstacles_.push_back(legend);
  }
  for (const auto& s : stations_) {
    if (!s.marker || s.marker->label().isEmpty()) continue;
    const QSizeF size = textSizeOn(painter, s.marker->label());
    const std::vector<QRectF> options = stationCandidates(s, toPixel(s.at), size);
    const int k = placer.place(options, true);
    // Crowded beyond every side: its preferred side all the same (a number is never left out).
    const QRectF r = k >= 0 ? options[static_cast<std::size_t>(k)] : options.front();
    if (k < 0) placer.addObstacle(r);
    stationPlaces_.emplace_back(s.marker, r);
    stationRects_.push_back(r);
    obstacles_.push_back(r);
  }

  for (const auto& label : labels_) {
    const QSizeF size = textSizeOn(painter, label.text);
    std::vector<QRectF> options;
    if (label.horizontal && !label.along.empty()) {
      // Above the line, from the left edge rightwards in steps of a third of the label; then below.
      const double y = toPixel(label.along.front()).y();
      const double step = std::max(8.0, size.width() / 3.0);
      for (double top : {y - size.height() - 1.0, y + 2.0})
        for (double x = bounds.left() + LabelPlacer::kGap; x + size.width() <= bounds.right(); x += step)
          options.emplace_back(QPointF(x, top), size);
    } else if (!label.along.empty()) {
      // Beside a point of the isobar (right, left, above, below): the preferred one, then its neighbours
      // outwards. When the preferred point is off the canvas (zoomed in), the nearest visible
      // one stands in. No farther than 45 % of the canvas height from it: a label far down
      // its isobar would sit among the cycle's own lines.
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
      const double reach = 0.45 * canvasRect.height();
      for (std::size_t k : order) {
        const QPointF p = toPixel(label.along[k]);
        if (!home) {
          if (!bounds.contains(p)) continue;
          home = p;
        }
        if (std::hypot(p.x() - home->x(), p.y() - home->y()) > reach) continue;
        options.emplace_back(QPointF(p.x() + LabelPlacer::kGap, p.y() - size.height() / 2.0), size);
        options.emplace_back(QPointF(p.x() - LabelPlacer::kGap - size.width(), p.y() - size.height() / 2.0),
                             size);
        options.emplace_back(QPointF(p.x() - size.width() / 2.0, p.y() - LabelPlacer::kGap - size.height()),
                             size);
        options.emplace_back(QPointF(p.x() - size.width() / 2.0, p.y() + LabelPlacer::kGap), size);
      }
    }
    const int chosen = placer.place(options);
    if (chosen < 0) {
      ++skipped_;
      continue;
    }
    if (chosen > 3) ++moved_;
    const QRectF& r = options[static_cast<std::size_t>(chosen)];
    placed_.push_back(r);
    placedTexts_.push_back(label.text.text());
    label.text.draw(painter, r);
  }
}

void StationMarker::drawLabel(QPainter* painter, const QRectF& canvasRect, const QPointF& position) const {
  QRectF rect;
  if (labels_ && labels_->stationLabelRect(this, rect)) {
    label().draw(painter, rect);
    return;
  }
  QwtPlotMarker::drawLabel(painter, canvasRect, position);
}

}  // namespace cw::gui
