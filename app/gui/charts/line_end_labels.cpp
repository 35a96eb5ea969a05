#include "charts/line_end_labels.h"

#include "charts/isobar_labels.h"
#include "charts/label_placer.h"

#include <qwt_plot.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_legenditem.h>
#include <qwt_scale_map.h>

#include <QPainter>

#include <algorithm>
#include <array>
#include <cmath>
#include <functional>
#include <limits>

namespace cw::gui {

namespace {

constexpr double kGap = 4.0;                       // between a label and its line's end [px]
constexpr std::size_t kMaxAnchors = 12;            // points tried along a line, the end included
constexpr std::size_t kMaxStartAnchors = 3;        // points tried from the line's other end
constexpr std::array<double, 2> kLeaders{14, 26};  // a leader line's length [px]
constexpr double kOwnMargin = 1.0;                 // a label's own line nearer by this [px]

double distanceToSegment(const QPointF& p, const QPointF& a, const QPointF& b) {
  const QPointF d = b - a;
  const double length2 = QPointF::dotProduct(d, d);
  const double t = length2 > 1e-12 ? std::clamp(QPointF::dotProduct(p - a, d) / length2, 0.0, 1.0) : 0.0;
  const QPointF q = a + t * d - p;
  return std::hypot(q.x(), q.y());
}

double distanceToRun(const QPointF& p, const std::vector<QPointF>& line) {
  if (line.empty()) return std::numeric_limits<double>::infinity();
  double best = distanceToSegment(p, line.front(), line.front());
  for (std::size_t k = 1; k < line.size(); ++k)
    best = std::min(best, distanceToSegment(p, line[k - 1], line[k]));
  return best;
}

/// The places around one point of a line for a label of `size`: beyond the line's end (at the
/// end only), then right, left, above, below, above right, below right. `inner` is the next
/// point inwards (or the previous one at the line's start); the label goes the way the line leaves.
void addAround(std::vector<QRectF>& out, const QPointF& p, const QPointF* inner, bool atEnd, bool innerIsNext,
               const QSizeF& size) {
  const double w = size.width(), h = size.height();
  if (atEnd) {
    QPointF dir(1.0, 0.0);
    if (inner) {
      const QPointF d = innerIsNext ? p - *inner : *inner - p;
      const double length = std::hypot(d.x(), d.y());
      if (length > 1e-6) dir = d / length;
    }
    out.emplace_back(
        QPointF(p.x() + dir.x() * (kGap + w / 2) - w / 2, p.y() + dir.y() * (kGap + h / 2) - h / 2), size);
  }
  out.emplace_back(QPointF(p.x() + kGap, p.y() - h / 2), size);      // right
  out.emplace_back(QPointF(p.x() - kGap - w, p.y() - h / 2), size);  // left
  out.emplace_back(QPointF(p.x() - w / 2, p.y() - kGap - h), size);  // above
  out.emplace_back(QPointF(p.x() - w / 2, p.y() + kGap), size);      // below
  out.emplace_back(QPointF(p.x() + kGap, p.y() - kGap - h), size);   // above right
  out.emplace_back(QPointF(p.x() + kGap, p.y() + kGap), size);       // below right
}

/// The point of a rectangle nearest to p (where a leader line from p meets it).
QPointF nearestOn(const QRectF& r, const QPointF& p) {
  return QPointF(std::clamp(p.x(), r.left(), r.right()), std::clamp(p.y(), r.top(), r.bottom()));
}

}  // namespace

LineEndLabels::LineEndLabels() {
  setItemAttribute(QwtPlotItem::Legend, false);
  setItemAttribute(QwtPlotItem::AutoScale, false);
  setZ(40);
}

void LineEndLabels::setLabels(std::vector<Label> labels) {
  labels_ = std::move(labels);
  itemChanged();
}

void LineEndLabels::setObstacles(std::vector<Obstacle> obstacles) {
  obstacles_ = std::move(obstacles);
  itemChanged();
}

std::vector<LineEndLabels::Candidate> LineEndLabels::candidatesFor(std::size_t label,
                                                                   const QSizeF& size) const {
  const std::vector<QPointF>& end = linePixels_[label];
  const std::vector<QPointF>& start = startPixels_[label];
  std::vector<QRectF> rects;
  // Around the end, then staggered inwards along the line.
  for (std::size_t k = 0; k < std::min(end.size(), kMaxAnchors); ++k) {
    const QPointF* inner = k + 1 < end.size() ? &end[k + 1] : (k > 0 ? &end[k - 1] : nullptr);
    addAround(rects, end[k], inner, k == 0, k + 1 < end.size(), size);
  }
  // Around the other end, when the line has one apart from its end.
  for (std::size_t k = 0; k < std::min(start.size(), kMaxStartAnchors); ++k) {
    if (!end.empty() && QLineF(start[k], end.front()).length() < 1.0) break;
    const QPointF* inner = k + 1 < start.size() ? &start[k + 1] : nullptr;
    addAround(rects, start[k], inner, k == 0, true, size);
  }
  std::vector<Candidate> out;
  out.reserve(rects.size() + 16);
  for (const QRectF& r : rects) out.push_back({r, false, {}});
  // A little away from the end, with a leader line.
  if (!end.empty())
    for (const double reach : kLeaders)
      for (const QRectF& r : LabelPlacer::around(end.front(), size, reach))
        out.push_back({r, true, end.front()});
  return out;
}

bool LineEndLabels::nearestIsOwn(std::size_t label, const QRectF& rect) const {
  const QPointF c = rect.center();
  auto distance = [&](std::size_t j) {
    return std::min(distanceToRun(c, linePixels_[j]), distanceToRun(c, startPixels_[j]));
  };
  const double own = distance(label);
  const int group = labels_[label].group;
  for (std::size_t j = 0; j < labels_.size(); ++j)
    if (j != label && labels_[j].group == group && distance(j) < own + kOwnMargin) return false;
  return true;
}

int LineEndLabels::placeOne(LabelPlacer& placer, std::size_t label, bool mayCrossCurves) const {
  const std::vector<Candidate>& options = candidates_[label];
  auto leaderClear = [&](const Candidate& c) {
    const QPointF to = nearestOn(c.rect, c.from);
    return std::none_of(placer.taken().begin(), placer.taken().end(),
                        [&](const QRectF& t) { return segmentMeetsRect(c.from, to, t); });
  };
  // Clear of the lines first (beside the line, then with a leader), then crossing a line.
  for (const bool crossing : {false, true}) {
    if (crossing && !mayCrossCurves) break;
    for (const bool leader : {false, true})
      for (std::size_t k = 0; k < options.size(); ++k) {
        const Candidate& c = options[k];
        if (c.leader != leader) continue;
        const bool fits = crossing ? placer.bounds().contains(c.rect) && placer.clearOfTaken(c.rect)
                                   : placer.isFree(c.rect);
        if (!fits || (leader ? !leaderClear(c) : !nearestIsOwn(label, c.rect))) continue;
        placer.addObstacle(c.rect);
        if (leader) placer.addCurve({c.from, nearestOn(c.rect, c.from)});
        return static_cast<int>(k);
      }
  }
  return -1;
}

void LineEndLabels::placeGroup(LabelPlacer& placer, int group, std::vector<int>& choices) const {
  // The lines between the first and last: every k-th, the smallest k for which all of them fit.
  std::vector<std::size_t> inner;
  int size = 0;
  for (std::size_t i = 0; i < labels_.size(); ++i)
    if (labels_[i].group == group) {
      size = labels_[i].groupSize;
      if (labels_[i].rank > 0 && labels_[i].rank < labels_[i].groupSize - 1) inner.push_back(i);
    }
  std::sort(inner.begin(), inner.end(),
            [&](std::size_t a, std::size_t b) { return labels_[a].rank < labels_[b].rank; });
  for (int step = 1; step < size - 1; ++step) {
    LabelPlacer trial = placer;
    std::vector<std::pair<std::size_t, int>> chosen;
    bool all = true;
    for (const std::size_t i : inner) {
      if (labels_[i].rank % step != 0) continue;
      const int pick = placeOne(trial, i, true);
      if (pick < 0) {
        all = false;
        break;
      }
      chosen.emplace_back(i, pick);
    }
    if (!all) continue;
    placer = std::move(trial);
    for (const auto& [i, pick] : chosen) choices[i] = pick;
    return;
  }
}

void LineEndLabels::draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                         const QRectF& canvasRect) const {
  auto toPixel = [&](const QPointF& p) { return QPointF(xMap.transform(p.x()), yMap.transform(p.y())); };
  canvas_ = canvasRect;
  LabelPlacer placer(canvasRect.adjusted(1, 1, -1, -1));
  keepClear(placer, toPixel, canvasRect);
  linePixels_.assign(labels_.size(), {});
  startPixels_.assign(labels_.size(), {});
  candidates_.clear();
  for (std::size_t i = 0; i < labels_.size(); ++i) {
    for (const QPointF& a : labels_[i].anchors) linePixels_[i].push_back(toPixel(a));
    for (const QPointF& a : labels_[i].startAnchors) startPixels_[i].push_back(toPixel(a));
    candidates_.push_back(candidatesFor(i, textSizeOn(painter, labels_[i].text)));
  }
  drawPlaced(painter, placeAll(placer));
}

void LineEndLabels::keepClear(LabelPlacer& placer, const std::function<QPointF(const QPointF&)>& toPixel,
                              const QRectF& canvasRect) const {
  // The markers, the legend inside the canvas and the curves.
  obstacleRects_.clear();
  for (const Obstacle& o : obstacles_) {
    const QPointF c = toPixel(o.at) + o.offset;
    obstacleRects_.emplace_back(c - QPointF(o.size.width(), o.size.height()) / 2.0, o.size);
  }
  if (legend_ && legend_->plot() && legend_->isVisible())
    obstacleRects_.emplace_back(legend_->geometry(canvasRect));
  for (const QRectF& r : obstacleRects_) placer.addObstacle(r);
  curvePixels_.clear();
  for (const QwtPlotCurve* curve : curves_) {
    if (!curve || !curve->isVisible() || !curve->plot()) continue;
    std::vector<QPointF> pixels;
    for (size_t i = 0; i < curve->dataSize(); ++i) pixels.push_back(toPixel(curve->sample(i)));
    placer.addCurve(pixels);
    curvePixels_.push_back(std::move(pixels));
  }
}

std::vector<int> LineEndLabels::placeAll(LabelPlacer& placer) const {
  // The first and last line of every group, in the order given; then each group's lines between.
  std::vector<int> choices(labels_.size(), -1);
  std::vector<int> groups;
  for (std::size_t i = 0; i < labels_.size(); ++i) {
    const Label& l = labels_[i];
    if (std::find(groups.begin(), groups.end(), l.group) == groups.end()) groups.push_back(l.group);
    if (l.rank == 0 || l.rank == l.groupSize - 1) choices[i] = placeOne(placer, i, true);
  }
  for (const int group : groups) placeGroup(placer, group, choices);
  return choices;
}

void LineEndLabels::drawPlaced(QPainter* painter, const std::vector<int>& choices) const {
  placed_.clear();
  placedTexts_.clear();
  placedIds_.clear();
  leaders_.clear();
  skipped_ = 0;
  for (std::size_t i = 0; i < labels_.size(); ++i) {
    if (choices[i] < 0) {
      ++skipped_;
      continue;
    }
    const Candidate& c = candidates_[i][static_cast<std::size_t>(choices[i])];
    if (c.leader) {
      const QLineF leader(c.from, nearestOn(c.rect, c.from));
      painter->save();
      painter->setRenderHint(QPainter::Antialiasing, true);
      painter->setPen(QPen(labels_[i].text.color(), 0.8));
      painter->drawLine(leader);
      painter->restore();
      leaders_.push_back(leader);
    }
    placed_.push_back(c.rect);
    placedTexts_.push_back(labels_[i].text.text());
    placedIds_.push_back(labels_[i].id);
    labels_[i].text.draw(painter, c.rect);
  }
}

}  // namespace cw::gui
