#pragma once
// Labels at the ends of a chart's lines (a carpet's "1350 K", "12"), placed on screen at every
// draw so that none overlaps another, a marker or the legend, and each stays inside the canvas.
// Labels come in groups (a carpet's family of lines: the lines of constant first input, those of
// constant second input, each again for the overlay); in each group the first and last line are
// labelled first, then the lines between, every k-th with the smallest k for which all of those
// fit (a dense family keeps its first and last and every k-th label; the chart's legend gives
// the step between its lines). Each label tries, in turn: the places around its line's end
// (beyond it, then beside), the same around points further in along the line (staggered), the
// places around the line's other end, then places a little away from the end with a thin leader
// line to it. A label sits nearer its own line than any other line of its group (so that where
// the lines converge it cannot be read as a neighbour's), clear of the lines where there is
// room; a label that fits nowhere is left out (the line stays). Placed through the LabelPlacer
// (label_placer.h).
//
// Placement only: the lines and their values come from the core's study.

#include <qwt_plot_item.h>
#include <qwt_text.h>

#include <QLineF>
#include <QPointF>
#include <QRectF>
#include <QSizeF>

#include <functional>
#include <vector>

class QwtPlotCurve;
class QwtPlotLegendItem;

namespace cw::gui {

class LabelPlacer;

class LineEndLabels : public QwtPlotItem {
 public:
  struct Label {
    QwtText text;
    /// Plot coordinates: the line's end first, then its points inwards.
    std::vector<QPointF> anchors;
    /// Plot coordinates: the line's other end (its start) first, then its points inwards.
    std::vector<QPointF> startAnchors;
    int group = 0;  ///< the family of lines it belongs to
    int rank = 0;   ///< its line's place in the group, 0 to groupSize - 1
    int groupSize = 1;
    int id = -1;  ///< the caller's key of its line (placedIds)
  };
  /// Something to keep clear of: a box of `size` pixels centred `offset` pixels from a point in
  /// plot coordinates (a marker's symbol, its label).
  struct Obstacle {
    QPointF at;
    QSizeF size;
    QPointF offset{};
  };

  LineEndLabels();
  int rtti() const override { return QwtPlotItem::Rtti_PlotUserItem + 11; }

  void setLabels(std::vector<Label> labels);
  void setObstacles(std::vector<Obstacle> obstacles);
  /// The legend drawn inside the canvas, kept clear while it is attached and visible; or nullptr.
  void setLegend(const QwtPlotLegendItem* legend) { legend_ = legend; }
  /// The curves labels keep clear of where they can (not owned; must outlive the next draw).
  void setCurves(std::vector<const QwtPlotCurve*> curves) { curves_ = std::move(curves); }

  void draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
            const QRectF& canvasRect) const override;

  // From the last draw (canvas pixels), for tests.
  int labelCount() const { return static_cast<int>(labels_.size()); }
  const std::vector<QRectF>& placedRects() const { return placed_; }
  const std::vector<QString>& placedTexts() const { return placedTexts_; }
  /// The ids (Label::id) of the labels drawn, in the order of placedRects.
  const std::vector<int>& placedIds() const { return placedIds_; }
  /// The leader lines drawn (from a line's end to its label).
  const std::vector<QLineF>& leaders() const { return leaders_; }
  /// The obstacles as placed (markers, the legend), canvas pixels.
  const std::vector<QRectF>& obstacleRects() const { return obstacleRects_; }
  int skippedCount() const { return skipped_; }
  const std::vector<std::vector<QPointF>>& curvePixels() const { return curvePixels_; }
  const QRectF& canvasRect() const { return canvas_; }

 private:
  struct Candidate {
    QRectF rect;
    bool leader = false;
    QPointF from;  ///< the line's end a leader starts at
  };
  std::vector<Candidate> candidatesFor(std::size_t label, const QSizeF& size) const;
  bool nearestIsOwn(std::size_t label, const QRectF& rect) const;
  int placeOne(LabelPlacer& placer, std::size_t label, bool mayCrossCurves) const;
  /// The candidate chosen per label (-1: left out) into `choices`, for one group's lines between.
  void placeGroup(LabelPlacer& placer, int group, std::vector<int>& choices) const;
  /// The markers, the legend and the curves into the placer (obstacleRects_, curvePixels_).
  void keepClear(LabelPlacer& placer, const std::function<QPointF(const QPointF&)>& toPixel,
                 const QRectF& canvasRect) const;
  std::vector<int> placeAll(LabelPlacer& placer) const;
  void drawPlaced(QPainter* painter, const std::vector<int>& choices) const;

  std::vector<Label> labels_;
  std::vector<Obstacle> obstacles_;
  const QwtPlotLegendItem* legend_ = nullptr;
  std::vector<const QwtPlotCurve*> curves_;
  // Per draw.
  mutable std::vector<std::vector<Candidate>> candidates_;
  mutable std::vector<std::vector<QPointF>> linePixels_;   ///< each label's line from its end
  mutable std::vector<std::vector<QPointF>> startPixels_;  ///< and from its start
  mutable std::vector<std::vector<QPointF>> curvePixels_;
  mutable std::vector<QRectF> obstacleRects_;
  mutable QRectF canvas_;
  mutable std::vector<QRectF> placed_;
  mutable std::vector<QString> placedTexts_;
  mutable std::vector<int> placedIds_;
  mutable std::vector<QLineF> leaders_;
  mutable int skipped_ = 0;
};

}  // namespace cw::gui
