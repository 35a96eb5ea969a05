#pragma once
// Labels at the ends of a chart's lines (a carpet's "1350 K", "12"), placed on screen at every
// draw so that none overlaps another, a marker or the legend: each label tries the places around
// its line's end first (beyond the end, then beside it), then the same around points further in
// along its line; one that fits nowhere on the canvas is left out (the line stays). The labels
// are placed in the order given, so the caller puts the ones that matter most first. Placed
// through the LabelPlacer (label_placer.h), clear of the chart's lines where there is room.
//
// Placement only: the lines and their values come from the core's study.

#include <qwt_plot_item.h>
#include <qwt_text.h>

#include <QPointF>
#include <QRectF>
#include <QSizeF>

#include <vector>

class QwtPlotCurve;
class QwtPlotLegendItem;

namespace cw::gui {

class LineEndLabels : public QwtPlotItem {
 public:
  struct Label {
    QwtText text;
    /// Plot coordinates: the line's end first, then its points inwards.
    std::vector<QPointF> anchors;
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
  int skippedCount() const { return skipped_; }
  const std::vector<std::vector<QPointF>>& curvePixels() const { return curvePixels_; }
  const QRectF& canvasRect() const { return canvas_; }

 private:
  std::vector<Label> labels_;
  std::vector<Obstacle> obstacles_;
  const QwtPlotLegendItem* legend_ = nullptr;
  std::vector<const QwtPlotCurve*> curves_;
  mutable std::vector<std::vector<QPointF>> curvePixels_;
  mutable QRectF canvas_;
  mutable std::vector<QRectF> placed_;
  mutable std::vector<QString> placedTexts_;
  mutable int skipped_ = 0;
};

}  // namespace cw::gui
