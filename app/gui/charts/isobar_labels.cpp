#include "charts/isobar_labels.h"

#include "charts/label_placer.h"

#include <qwt_plot.h>
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

/// Rings of places around a station's symbol, each a label's height further out than the one
/// before; the first beside the symbol, the others with a leader line.
constexpr int kStationRings = 4;

/// The side a station prefers first, then the other seven around its symbol; then the same
/// eight again on each ring further out.
std::vector<QRectF> stationCandidates(const IsobarLabels::Station& s, const QPointF& pixel,
                                      const QSizeF& size) {
  const QRectF symbol(pixel - QPointF(s.symbol.width(), s.symbol.height()) / 2.0, s.symbol);
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
  std::vector<QRectF> all;
  for (int ring = 0; ring < kStationRings; ++ring) {
    std::vector<QRectF> places = LabelPlacer::around(symbol, size, s.spacing + ring * size.height());
    std::rotate(places.begin(), places.begin() + first, places.begin() + first + 1);
    all.insert(all.end(), places.begin(), places.end());
  }
  return all;
}

/// A thin line from a symbol's edge to the nearest point of its label's rectangle [px].
QLineF leaderLine(const QPointF& centre, double radius, const QRectF& label) {
  const QPointF nearest(std::clamp(centre.x(), label.left(), label.right()),
                        std::clamp(centre.y(), label.top(), label.bottom()));
  const QPointF d = nearest - centre;
  const double length = std::hypot(d.x(), d.y());
  if (length <= radius + 2.0) return {};
  return {centre + d * ((radius + 1.0) / length), nearest - d * (1.0 / length)};
}

/// How many segments of the curves meet the rectangle [px].
int segmentsMeeting(const QRectF& rect, const std::vector<std::vector<QPointF>>& curves) {
  int n = 0;
  for (const auto& c : curves)
    for (std::size_t k = 1; k < c.size(); ++k) n += segmentMeetsRect(c[k - 1], c[k], rect) ? 1 : 0;
  return n;
}

std::vector<std::vector<QPointF>> toPixels(const std::vector<const QwtPlotCurve*>& curves,
                                           const QwtScaleMap& xMap, const QwtScaleMap& yMap) {
  std::vector<std::vector<QPointF>> out;
  for (const QwtPlotCurve* curve : curves) {
    if (!curve || !curve->isVisible()) continue;
    std::vector<QPointF> pixels;
    pixels.reserve(curve->dataSize());
    for (size_t i = 0; i < curve->dataSize(); ++i) {
      const QPointF p = curve->sample(i);
      pixels.emplace_back(xMap.transform(p.x()), yMap.transform(p.y()));
    }
    out.push_back(std::move(pixels));
  }
  return out;
}

/// A horizontal isobar's label (p-v): above the line, from the left edge rightwards in steps
/// of a third of the label; then below.
std::vector<QRectF> lineLabelCandidates(const IsobarLabels::Label& label, const QSizeF& size,
                                        const QRectF& bounds, const QwtScaleMap& yMap) {
  std::vector<QRectF> options;
  if (label.along.empty()) return options;
  const double y = yMap.transform(label.along.front().y());
  const double step = std::max(8.0, size.width() / 3.0);
  for (double top : {y - size.height() - 1.0, y + 2.0})
    for (double x = bounds.left() + LabelPlacer::kGap; x + size.width() <= bounds.right(); x += step)
      options.emplace_back(QPointF(x, top), size);
  return options;
}

/// The points of an isobar in the order its label tries them: the preferred one, then its
/// neighbours outwards.
std::vector<std::size_t> outwardsFrom(std::size_t preferred, std::size_t n) {
  const long first = static_cast<long>(std::min(preferred, n - 1));
  std::vector<std::size_t> order;
  order.reserve(n);
  for (long d = 0; d < static_cast<long>(n); ++d)
    for (long k : {first - d, first + d})
      if (k >= 0 && k < static_cast<long>(n) && (d > 0 || k == first - d) &&
          (order.empty() || order.back() != static_cast<std::size_t>(k)))
        order.push_back(static_cast<std::size_t>(k));
  return order;
}

/// An isobar's label beside a point of it (right, left, above, below): the preferred one, then
/// its neighbours outwards. When the preferred point is off the canvas (zoomed in), the nearest
/// visible one stands in. No farther than 45 % of the canvas height from it: a label far down
/// its isobar would sit among the cycle's own lines.
std::vector<QRectF> isobarLabelCandidates(const IsobarLabels::Label& label, const QSizeF& size,
                                          const QRectF& bounds, const QwtScaleMap& xMap,
                                          const QwtScaleMap& yMap) {
  std::vector<QRectF> options;
  if (label.along.empty()) return options;
  std::optional<QPointF> home;
  const double reach = 0.45 * (bounds.height() + 2.0);
  const double w = size.width(), h = size.height(), gap = LabelPlacer::kGap;
  for (std::size_t k : outwardsFrom(label.preferred, label.along.size())) {
    const QPointF p(xMap.transform(label.along[k].x()), yMap.transform(label.along[k].y()));
    if (!home) {
      if (!bounds.contains(p)) continue;
      home = p;
    }
    if (std::hypot(p.x() - home->x(), p.y() - home->y()) > reach) continue;
    options.emplace_back(QPointF(p.x() + gap, p.y() - h / 2.0), size);
    options.emplace_back(QPointF(p.x() - gap - w, p.y() - h / 2.0), size);
    options.emplace_back(QPointF(p.x() - w / 2.0, p.y() - gap - h), size);
    options.emplace_back(QPointF(p.x() - w / 2.0, p.y() + gap), size);
  }
  return options;
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
  for (const auto& place : stationPlaces_)
    if (place.marker == marker) {
      rect = place.rect;
      return true;
    }
  return false;
}

QLineF IsobarLabels::stationLeader(const QwtPlotMarker* marker) const {
  for (const auto& place : stationPlaces_)
    if (place.marker == marker) return place.leader;
  return {};
}

int IsobarLabels::fitLegend(QwtPlotLegendItem* legend, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                            const QRectF& canvasRect) const {
  const auto avoided = toPixels(legendAvoids_, xMap, yMap);
  const auto others = toPixels(curves_, xMap, yMap);
  std::vector<QPointF> symbols;
  for (const auto& s : stations_) symbols.emplace_back(xMap.transform(s.at.x()), yMap.transform(s.at.y()));
  // Blocked: the cycles' segments and the markers under it; then, among equals, the closures'.
  auto cost = [&](const QRectF& rect, int& blocked) {
    const QRectF r = rect.adjusted(-2, -2, 2, 2);
    blocked = segmentsMeeting(r, avoided);
    for (const QPointF& p : symbols) blocked += r.contains(p) ? 1 : 0;
    return 1000 * blocked + segmentsMeeting(r, others);
  };
  Qt::Alignment best = legend->alignmentInCanvas();
  uint bestColumns = legend->maxColumns();
  int bestCost = -1, bestBlocked = 0;
  // One column first; two or three (wider, lower) where a single one covers the cycle, as in
  // a small chart's corner below the cycle.
  for (const uint columns : {1u, 2u, 3u}) {
    legend->setMaxColumns(columns);
    for (const Qt::Alignment corner : {Qt::AlignTop | Qt::AlignLeft, Qt::AlignTop | Qt::AlignRight,
                                       Qt::AlignBottom | Qt::AlignRight, Qt::AlignBottom | Qt::AlignLeft}) {
      legend->setAlignmentInCanvas(corner);
      const QRectF rect(legend->geometry(canvasRect));
      int blocked = 0;
      int c = cost(rect, blocked);
      if (!canvasRect.contains(rect)) c += 1000000;  // wider or higher than the canvas
      if (bestCost < 0 || c < bestCost) {
        bestCost = c;
        bestBlocked = blocked + (canvasRect.contains(rect) ? 0 : 1);
        best = corner;
        bestColumns = columns;
      }
    }
  }
  legend->setMaxColumns(bestColumns);
  legend->setAlignmentInCanvas(best);
  return bestBlocked;
}

void IsobarLabels::draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                        const QRectF& canvasRect) const {
  forgetLastDraw(canvasRect);
  LabelPlacer placer(canvasRect.adjusted(1, 1, -1, -1));
  curvePixels_ = toPixels(curves_, xMap, yMap);
  for (const auto& pixels : curvePixels_) placer.addCurve(pixels);
  // The markers' symbols and the legend first, then the station numbers, then the isobars'.
  for (const auto& s : stations_) {
    const QPointF pixel(xMap.transform(s.at.x()), yMap.transform(s.at.y()));
    const QRectF symbol(pixel - QPointF(s.symbol.width(), s.symbol.height()) / 2.0, s.symbol);
    placer.addObstacle(symbol);
    obstacles_.push_back(symbol);
  }
  placeLegends(placer, xMap, yMap, canvasRect);
  placeStationNumbers(placer, painter, xMap, yMap);
  placeIsobarLabels(placer, painter, xMap, yMap);
}

void IsobarLabels::forgetLastDraw(const QRectF& canvasRect) const {
  placed_.clear();
  placedTexts_.clear();
  obstacles_.clear();
  stationRects_.clear();
  stationPlaces_.clear();
  curvePixels_.clear();
  legendRects_.clear();
  legendBlocked_ = false;
  stationsLeftOut_ = 0;
  canvas_ = canvasRect;
  moved_ = 0;
  skipped_ = 0;
}

void IsobarLabels::placeLegends(LabelPlacer& placer, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                                const QRectF& canvasRect) const {
  // Every legend inside the canvas, whichever placement put it there, into its freest corner.
  for (QwtPlotItem* item : plot() ? plot()->itemList(QwtPlotItem::Rtti_PlotLegend) : QwtPlotItemList()) {
    auto* legend = static_cast<QwtPlotLegendItem*>(item);
    if (!legend->isVisible()) continue;
    legendBlocked_ = fitLegend(legend, xMap, yMap, canvasRect) > 0 || legendBlocked_;
    const QRectF rect(legend->geometry(canvasRect));
    placer.addObstacle(rect);
    obstacles_.push_back(rect);
    legendRects_.push_back(rect);
  }
}

void IsobarLabels::placeStationNumbers(LabelPlacer& placer, const QPainter* painter, const QwtScaleMap& xMap,
                                       const QwtScaleMap& yMap) const {
  for (const auto& s : stations_) {
    if (!s.marker || s.marker->label().isEmpty()) continue;
    const QPointF pixel(xMap.transform(s.at.x()), yMap.transform(s.at.y()));
    const std::vector<QRectF> options = stationCandidates(s, pixel, textSizeOn(painter, s.marker->label()));
    const int k = placer.place(options, true);
    // Crowded beyond every place, even across a curve: left out (the readout names the
    // station under the cursor), never over another label.
    if (k < 0) {
      stationPlaces_.push_back({s.marker, QRectF(), QLineF()});
      ++stationsLeftOut_;
      continue;
    }
    const QRectF r = options[static_cast<std::size_t>(k)];
    const double radius = std::max(s.symbol.width(), s.symbol.height()) / 2.0;
    stationPlaces_.push_back({s.marker, r, k >= 8 ? leaderLine(pixel, radius, r) : QLineF()});
    stationRects_.push_back(r);
    obstacles_.push_back(r);
  }
}

void IsobarLabels::placeIsobarLabels(LabelPlacer& placer, QPainter* painter, const QwtScaleMap& xMap,
                                     const QwtScaleMap& yMap) const {
  for (const auto& label : labels_) {
    const QSizeF size = textSizeOn(painter, label.text);
    const std::vector<QRectF> options = label.horizontal
                                            ? lineLabelCandidates(label, size, placer.bounds(), yMap)
                                            : isobarLabelCandidates(label, size, placer.bounds(), xMap, yMap);
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
    if (rect.isEmpty()) return;  // left out: no room anywhere
    if (const QLineF leader = labels_->stationLeader(this); !leader.isNull()) {
      painter->save();
      painter->setPen(QPen(label().color(), 0.8));
      painter->setRenderHint(QPainter::Antialiasing, true);
      painter->drawLine(leader);
      painter->restore();
    }
    label().draw(painter, rect);
    return;
  }
  QwtPlotMarker::drawLabel(painter, canvasRect, position);
}

}  // namespace cw::gui
