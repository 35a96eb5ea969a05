#pragma once
// The labels of a chart's isobars ("p3 = 1434 kPa"), placed on screen at every draw so that
// none overlaps another label, a station's marker or label, or the legend. A label that does
// not fit where it prefers slides along its own isobar; one that fits nowhere on the canvas is
// left out (the isobar itself is always drawn, by its own item). Zooming in makes room again.
//
// Placement only: the isobars and their pressures come from the core.

#include <qwt_plot_item.h>
#include <qwt_text.h>

#include <QPointF>
#include <QRectF>
#include <QSizeF>

#include <vector>

class QwtPlotLegendItem;

namespace cw::gui {

class IsobarLabels : public QwtPlotItem {
 public:
  struct Label {
    QwtText text;
    /// Plot coordinates along the isobar; the label sits right of one of them.
    std::vector<QPointF> along;
    /// The point of `along` the label prefers (T-s: where the isobar reaches the cycle's top).
    std::size_t preferred = 0;
    /// A horizontal isobar (p-v): the label sits above the line, anywhere across the canvas.
    bool horizontal = false;
  };
  /// A station marker's symbol and label, to be kept clear.
  struct Station {
    QPointF at;           ///< plot coordinates
    QSizeF symbol;        ///< symbol size [px]
    QSizeF label;         ///< label size [px]
    Qt::Alignment align;  ///< the label's side, as given to the marker
    double spacing = 0.0;
  };

  IsobarLabels();
  int rtti() const override { return QwtPlotItem::Rtti_PlotUserItem + 1; }

  void setLabels(std::vector<Label> labels);
  void setStations(std::vector<Station> stations);
  /// The legend drawn inside the canvas, or nullptr.
  void setLegend(const QwtPlotLegendItem* legend) { legend_ = legend; }

  void draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
            const QRectF& canvasRect) const override;

  // From the last draw (canvas pixels), for tests.
  int labelCount() const { return static_cast<int>(labels_.size()); }
  const std::vector<QRectF>& placedRects() const { return placed_; }
  /// The texts of the labels drawn, in the order of placedRects().
  const std::vector<QString>& placedTexts() const { return placedTexts_; }
  /// Labels drawn away from their preferred place.
  int movedCount() const { return moved_; }
  /// Labels left out because they fit nowhere.
  int skippedCount() const { return skipped_; }
  /// Everything the labels kept clear of.
  const std::vector<QRectF>& obstacleRects() const { return obstacles_; }
  QColor textColour() const;

 private:
  std::vector<Label> labels_;
  std::vector<Station> stations_;
  const QwtPlotLegendItem* legend_ = nullptr;
  mutable std::vector<QRectF> placed_;
  mutable std::vector<QString> placedTexts_;
  mutable std::vector<QRectF> obstacles_;
  mutable int moved_ = 0;
  mutable int skipped_ = 0;
};

/// Chooses a place for each label in turn: the first of its candidate rectangles that lies inside
/// `bounds` and overlaps neither `occupied` nor a label placed before it. Returns the index of
/// the chosen candidate per label, -1 where none fits.
std::vector<int> placeLabels(const std::vector<std::vector<QRectF>>& candidates, std::vector<QRectF> occupied,
                             const QRectF& bounds);

}  // namespace cw::gui
