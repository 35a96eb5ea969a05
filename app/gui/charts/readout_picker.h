#pragma once
// A mouse tracker for the charts: while the cursor is over the canvas it shows a readout (text
// from the chart: the state or study point nearest the cursor, with units) in a tooltip-coloured
// box. An empty readout shows nothing. The box stays inside the canvas: near an edge it moves to
// the other side of the cursor, never cut off.

#include <qwt_plot_picker.h>
#include <QString>

#include <functional>

class QwtPlot;

namespace cw::gui {

class ReadoutPicker : public QwtPlotPicker {
 public:
  using Readout = std::function<QString(const QPoint&)>;
  ReadoutPicker(QwtPlot* plot, Readout readout);

  /// The readout's box at the cursor, inside the canvas.
  QRect trackerRect(const QFont& font) const override;
  /// A box of `size` beside `cursor` (above right, or mirrored where that leaves `area`),
  /// moved inside `area` where it is larger than the room on either side.
  static QRect placeInside(const QSize& size, const QPoint& cursor, const QRect& area);

 protected:
  QwtText trackerText(const QPoint& position) const override;

 private:
  QwtPlot* plot_;
  Readout readout_;
};

}  // namespace cw::gui
