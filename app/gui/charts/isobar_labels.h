#pragma once
// The labels of a cycle chart: the station numbers and the isobars' labels ("p3 = 1434 kPa"),
// placed on screen (and on every export's surface) at each draw through the LabelPlacer, so that
// none overlaps another label, a station's marker or the legend, and none crosses the cycle's
// curves. Station numbers come first: beside their marker, else further out with a thin leader
// line to it, crossing a curve only where no place of those is free, left out only where every
// place is taken by another label (the chart's readout names the station under the cursor); an
// isobar's label slides along its own isobar, to either side of it, and one that fits nowhere on
// the canvas is left out (the isobar itself is always drawn, by its own item). Zooming in makes
// room again.
//
// Every legend drawn inside the canvas (the chart's own, or an export's "inside" one) is placed
// here too, before the labels: in the corner whose rectangle the cycle's curves and markers
// cross least (fitLegend), and then kept clear like a marker. When even that corner is crossed,
// legendBlocked() says so and the chart puts its legend below the plot.
//
// A station's marker (StationMarker) draws its number where this item placed it; this item has
// the lower z, so it is drawn, and places, first.
//
// Placement only: the isobars and their pressures come from the core.

#include <qwt_plot_item.h>
#include <qwt_plot_marker.h>
#include <qwt_text.h>

#include <QLineF>
#include <QPointF>
#include <QRectF>
#include <QSizeF>

#include <vector>

class QwtPlotCurve;
class QwtPlotLegendItem;
class QwtScaleMap;

namespace cw::gui {

class LabelPlacer;

class IsobarLabels : public QwtPlotItem {
 public:
  struct Label {
    QwtText text;
    /// Plot coordinates along the isobar; the label sits beside one of them.
    std::vector<QPointF> along;
    /// The point of `along` the label prefers (T-s: where the isobar reaches the cycle's top).
    std::size_t preferred = 0;
    /// A horizontal isobar (p-v): the label sits above or below the line, anywhere across the canvas.
    bool horizontal = false;
  };
  /// A station marker's symbol and label, to be placed and kept clear.
  struct Station {
    QPointF at;                             ///< plot coordinates
    QSizeF symbol;                          ///< symbol size [px]
    QSizeF label;                           ///< label size [px] (empty: a marker without a number)
    Qt::Alignment align;                    ///< the side the label prefers
    double spacing = 0.0;                   ///< from the symbol's edge [px]
    const QwtPlotMarker* marker = nullptr;  ///< the marker that draws the label
  };

  IsobarLabels();
  int rtti() const override { return QwtPlotItem::Rtti_PlotUserItem + 1; }

  void setLabels(std::vector<Label> labels);
  void setStations(std::vector<Station> stations);
  /// The curves labels must not cross (the cycle's lines and closures).
  void setCurves(std::vector<const QwtPlotCurve*> curves) { curves_ = std::move(curves); }
  /// The curves a legend inside the canvas must not cover (the cycles with losses and ideal).
  void setLegendAvoids(std::vector<const QwtPlotCurve*> curves) { legendAvoids_ = std::move(curves); }

  /// Puts a legend inside the canvas into the corner it covers least of the curves and the
  /// station markers (top left, top right, bottom right, bottom left, the first of equals), in
  /// one column, else two or three where that covers less.
  /// Returns how many segments of the legend-avoided curves and markers that corner still
  /// covers (0: it is free).
  int fitLegend(QwtPlotLegendItem* legend, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                const QRectF& canvasRect) const;
  /// Whether a legend of the last draw covered a curve or marker in its best corner.
  bool legendBlocked() const { return legendBlocked_; }
  /// The rectangles of the legends inside the canvas at the last draw [px].
  const std::vector<QRectF>& legendRects() const { return legendRects_; }

  void draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
            const QRectF& canvasRect) const override;

  /// Where the last draw placed a marker's label (empty: left out); false when it has none.
  bool stationLabelRect(const QwtPlotMarker* marker, QRectF& rect) const;
  /// The leader line from a marker to its label when the label stands away from it (null
  /// line when it stands beside it).
  QLineF stationLeader(const QwtPlotMarker* marker) const;

  // From the last draw (canvas pixels), for tests.
  int labelCount() const { return static_cast<int>(labels_.size()); }
  const std::vector<QRectF>& placedRects() const { return placed_; }
  /// The texts of the labels drawn, in the order of placedRects().
  const std::vector<QString>& placedTexts() const { return placedTexts_; }
  /// The station numbers' rectangles.
  const std::vector<QRectF>& stationRects() const { return stationRects_; }
  /// Labels drawn away from their preferred place.
  int movedCount() const { return moved_; }
  /// Labels left out because they fit nowhere.
  int skippedCount() const { return skipped_; }
  /// Station numbers left out because every place was taken by another label.
  int stationsLeftOut() const { return stationsLeftOut_; }
  /// Everything the isobar labels kept clear of: the station markers and numbers, the legend.
  const std::vector<QRectF>& obstacleRects() const { return obstacles_; }
  /// The curves of the last draw in pixels.
  const std::vector<std::vector<QPointF>>& curvePixels() const { return curvePixels_; }
  const QRectF& canvasRect() const { return canvas_; }
  QColor textColour() const;

 private:
  void forgetLastDraw(const QRectF& canvasRect) const;
  void placeLegends(LabelPlacer& placer, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                    const QRectF& canvasRect) const;
  void placeStationNumbers(LabelPlacer& placer, const QPainter* painter, const QwtScaleMap& xMap,
                           const QwtScaleMap& yMap) const;
  void placeIsobarLabels(LabelPlacer& placer, QPainter* painter, const QwtScaleMap& xMap,
                         const QwtScaleMap& yMap) const;

  std::vector<Label> labels_;
  std::vector<Station> stations_;
  std::vector<const QwtPlotCurve*> curves_;
  std::vector<const QwtPlotCurve*> legendAvoids_;
  mutable std::vector<QRectF> legendRects_;
  mutable bool legendBlocked_ = false;
  mutable std::vector<QRectF> placed_;
  mutable std::vector<QString> placedTexts_;
  mutable std::vector<QRectF> obstacles_;
  mutable std::vector<QRectF> stationRects_;
  struct StationPlace {
    const QwtPlotMarker* marker;
    QRectF rect;
    QLineF leader;
  };
  mutable std::vector<StationPlace> stationPlaces_;
  mutable std::vector<std::vector<QPointF>> curvePixels_;
  mutable QRectF canvas_;
  mutable int moved_ = 0;
  mutable int skipped_ = 0;
  mutable int stationsLeftOut_ = 0;
};

/// A station's marker whose number is drawn where IsobarLabels placed it.
class StationMarker : public QwtPlotMarker {
 public:
  explicit StationMarker(const IsobarLabels* labels) : labels_(labels) {}

 protected:
  void drawLabel(QPainter* painter, const QRectF& canvasRect, const QPointF& position) const override;

 private:
  const IsobarLabels* labels_;
};

/// The size of a text as it is drawn by `painter` [painter's logical px]: measured on the
/// painter's device (a 200 dpi image, an 85 dpi PDF), through the painter's scale.
QSizeF textSizeOn(const QPainter* painter, const QwtText& text);

}  // namespace cw::gui
