#include "charts/label_placer.h"

#include <qwt_text.h>

#include <QPainter>

#include <algorithm>
#include <cmath>

namespace cw::gui {

QSizeF textSizeOn(const QPainter* painter, const QFont& font, const QString& text) {
  // QwtText draws on any surface at the size it has on screen (its text engines take the
  // painter's scale and the device's resolution out), so its own size is the one to place by.
  Q_UNUSED(painter);
  QwtText t(text);
  t.setFont(font);
  return t.textSize(font);
}

bool segmentMeetsRect(const QPointF& a, const QPointF& b, const QRectF& r) {
  // Both ends beyond one side: no meeting (most segments of a chart, decided in four comparisons).
  if ((a.x() < r.left() && b.x() < r.left()) || (a.x() > r.right() && b.x() > r.right()) ||
      (a.y() < r.top() && b.y() < r.top()) || (a.y() > r.bottom() && b.y() > r.bottom()))
    return false;
  if (r.contains(a) || r.contains(b)) return true;
  // Liang-Barsky clipping of the segment against the rectangle.
  double t0 = 0.0, t1 = 1.0;
  const double dx = b.x() - a.x(), dy = b.y() - a.y();
  const double p[4] = {-dx, dx, -dy, dy};
  const double q[4] = {a.x() - r.left(), r.right() - a.x(), a.y() - r.top(), r.bottom() - a.y()};
  for (int i = 0; i < 4; ++i) {
    if (std::fabs(p[i]) < 1e-12) {
      if (q[i] < 0) return false;
      continue;
    }
    const double t = q[i] / p[i];
    if (p[i] < 0)
      t0 = std::max(t0, t);
    else
      t1 = std::min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

void LabelPlacer::cellRange(const QRectF& r, int& c0, int& c1, int& r0, int& r1) const {
  auto clampTo = [](double v, int n) { return std::clamp(static_cast<int>(std::floor(v)), 0, n - 1); };
  c0 = clampTo((r.left() - bounds_.left()) / kCell, columns_);
  c1 = clampTo((r.right() - bounds_.left()) / kCell, columns_);
  r0 = clampTo((r.top() - bounds_.top()) / kCell, rows_);
  r1 = clampTo((r.bottom() - bounds_.top()) / kCell, rows_);
}

void LabelPlacer::addCurve(std::vector<QPointF> points) {
  if (cells_.empty()) {
    columns_ = std::max(1, static_cast<int>(std::ceil(bounds_.width() / kCell)));
    rows_ = std::max(1, static_cast<int>(std::ceil(bounds_.height() / kCell)));
    cells_.assign(static_cast<std::size_t>(columns_ * rows_), {});
  }
  const QRectF area = bounds_.adjusted(-kCell, -kCell, kCell, kCell);
  for (std::size_t k = 1; k < points.size(); ++k) {
    const QPointF& a = points[k - 1];
    const QPointF& b = points[k];
    if (!std::isfinite(a.x()) || !std::isfinite(a.y()) || !std::isfinite(b.x()) || !std::isfinite(b.y()))
      continue;
    const QRectF box = QRectF(a, b).normalized().adjusted(-0.5, -0.5, 0.5, 0.5);
    if (!box.intersects(area)) continue;  // off the canvas: no label can meet it
    const int index = static_cast<int>(segments_.size());
    segments_.push_back({a, b, box});
    int c0, c1, r0, r1;
    cellRange(box, c0, c1, r0, r1);
    for (int r = r0; r <= r1; ++r)
      for (int c = c0; c <= c1; ++c) cells_[static_cast<std::size_t>(r * columns_ + c)].push_back(index);
  }
}

bool LabelPlacer::clearOfTaken(const QRectF& rect) const {
  const QRectF padded = rect.adjusted(-kGap / 2, -kGap / 2, kGap / 2, kGap / 2);
  return std::none_of(taken_.begin(), taken_.end(), [&](const QRectF& o) { return o.intersects(padded); });
}

bool LabelPlacer::crossesCurve(const QRectF& rect) const {
  if (segments_.empty()) return false;
  const QRectF r = rect.adjusted(-1, -1, 1, 1);
  int c0, c1, r0, r1;
  cellRange(r, c0, c1, r0, r1);
  for (int row = r0; row <= r1; ++row)
    for (int c = c0; c <= c1; ++c)
      for (int index : cells_[static_cast<std::size_t>(row * columns_ + c)]) {
        const Segment& s = segments_[static_cast<std::size_t>(index)];
        // The box is widened a hair: a horizontal or vertical segment's own is empty.
        if (s.box.intersects(r) && segmentMeetsRect(s.a, s.b, r)) return true;
      }
  return false;
}

bool LabelPlacer::isFree(const QRectF& rect) const {
  return bounds_.contains(rect) && clearOfTaken(rect) && !crossesCurve(rect);
}

int LabelPlacer::place(const std::vector<QRectF>& candidates, bool mayCrossCurves) {
  int pick = -1;
  for (std::size_t k = 0; k < candidates.size() && pick < 0; ++k)
    if (isFree(candidates[k])) pick = static_cast<int>(k);
  if (pick < 0 && mayCrossCurves)
    for (std::size_t k = 0; k < candidates.size() && pick < 0; ++k)
      if (bounds_.contains(candidates[k]) && clearOfTaken(candidates[k])) pick = static_cast<int>(k);
  if (pick >= 0) taken_.push_back(candidates[static_cast<std::size_t>(pick)]);
  return pick;
}

std::vector<QRectF> LabelPlacer::around(const QPointF& point, const QSizeF& size, double gap) {
  return around(QRectF(point, QSizeF(0, 0)), size, gap);
}

std::vector<QRectF> LabelPlacer::around(const QRectF& box, const QSizeF& size, double gap) {
  const double w = size.width(), h = size.height();
  const double cx = box.center().x(), cy = box.center().y();
  return {
      QRectF(box.right() + gap, cy - h / 2, w, h),              // right
      QRectF(box.left() - gap - w, cy - h / 2, w, h),           // left
      QRectF(cx - w / 2, box.top() - gap - h, w, h),            // above
      QRectF(cx - w / 2, box.bottom() + gap, w, h),             // below
      QRectF(box.right() + gap, box.top() - gap - h, w, h),     // above right
      QRectF(box.left() - gap - w, box.top() - gap - h, w, h),  // above left
      QRectF(box.right() + gap, box.bottom() + gap, w, h),      // below right
      QRectF(box.left() - gap - w, box.bottom() + gap, w, h),   // below left
  };
}

std::vector<int> placeLabels(const std::vector<std::vector<QRectF>>& candidates, std::vector<QRectF> occupied,
                             const QRectF& bounds) {
  LabelPlacer placer(bounds);
  for (const QRectF& o : occupied) placer.addObstacle(o);
  std::vector<int> chosen;
  chosen.reserve(candidates.size());
  for (const auto& options : candidates) chosen.push_back(placer.place(options));
  return chosen;
}

}  // namespace cw::gui
