#pragma once
// The one label placer of every chart: station numbers, isobar labels, a carpet's line-end
// labels and the waterfall's values are placed through it, against each other, against what the
// chart marks as taken (markers, the legend) and against the curves, inside the canvas.
//
// Labels are placed one at a time, most important first; each takes the first of its candidate
// rectangles (in the order of its own preference) that lies inside the bounds, keeps a small gap
// to every rectangle taken, and crosses no curve. A label that must be shown (a station's number)
// may fall back to a place that crosses a curve, but never one over another label. Everything
// in pixels of the surface drawn on (screen or export); placement only, no data.

#include <QFont>
#include <QPointF>
#include <QRectF>
#include <QSizeF>

#include <vector>

class QPainter;

namespace cw::gui {

class LabelPlacer {
 public:
  /// Gap kept between a label and anything taken [px].
  static constexpr double kGap = 3.0;

  explicit LabelPlacer(const QRectF& bounds) : bounds_(bounds) {}

  /// Something labels keep clear of (a marker's symbol, the legend).
  void addObstacle(const QRectF& rect) { taken_.push_back(rect); }
  /// A curve labels do not cross, as consecutive points [px].
  void addCurve(std::vector<QPointF> points);

  /// Places one label: the index of the chosen candidate, or -1 when none fits. With
  /// `mayCrossCurves`, a label that fits nowhere clear of the curves takes the first place that
  /// is clear of everything else.
  int place(const std::vector<QRectF>& candidates, bool mayCrossCurves = false);

  /// Whether a rectangle lies inside the bounds, clear of what is taken and of the curves.
  bool isFree(const QRectF& rect) const;
  bool crossesCurve(const QRectF& rect) const;
  /// Whether a rectangle keeps the gap to everything taken (curves aside).
  bool clearOfTaken(const QRectF& rect) const;
  const std::vector<QRectF>& taken() const { return taken_; }
  const QRectF& bounds() const { return bounds_; }

  /// The eight places around a point for a label of `size`, `gap` from it: right, left, above,
  /// below, then the corners (above right, above left, below right, below left).
  static std::vector<QRectF> around(const QPointF& point, const QSizeF& size, double gap);
  /// The same around a box (a marker's symbol), `gap` from its edges.
  static std::vector<QRectF> around(const QRectF& box, const QSizeF& size, double gap);

 private:
  QRectF bounds_;
  std::vector<QRectF> taken_;
  struct Segment {
    QPointF a, b;
    QRectF box;
  };
  std::vector<Segment> segments_;
  /// The segments by cell of a coarse grid over the bounds, so that a candidate is tested only
  /// against the segments near it (placement runs at every draw: edit-to-redraw stays fast).
  static constexpr double kCell = 32.0;  ///< [px]
  int columns_ = 1, rows_ = 1;
  std::vector<std::vector<int>> cells_;
  void cellRange(const QRectF& r, int& c0, int& c1, int& r0, int& r1) const;
};

/// The size of a text as QwtText draws it in `font` through `painter` [painter's logical px]:
/// the same on screen and on any export's surface (a 200 dpi image, an 85 dpi PDF). Text placed
/// by this size is drawn with QwtText::draw, never QPainter::drawText (which a renderer's
/// scaled painter on a high-resolution image draws larger again).
QSizeF textSizeOn(const QPainter* painter, const QFont& font, const QString& text);

/// True when the segment from a to b meets the rectangle.
bool segmentMeetsRect(const QPointF& a, const QPointF& b, const QRectF& rect);

/// Chooses a place for each label in turn through a LabelPlacer (no curves): the first of its
/// candidate rectangles that lies inside `bounds` and overlaps neither `occupied` nor a label
/// placed before it. Returns the index of the chosen candidate per label, -1 where none fits.
std::vector<int> placeLabels(const std::vector<std::vector<QRectF>>& candidates, std::vector<QRectF> occupied,
                             const QRectF& bounds);

}  // namespace cw::gui
