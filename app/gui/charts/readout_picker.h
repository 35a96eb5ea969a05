#pragma once
// A mouse tracker for the charts: while the cursor is over the canvas it shows a readout (text
// from the chart: the state or study point nearest the cursor, with units) in a tooltip-coloured
// box. An empty readout shows nothing.

#include <qwt_plot_picker.h>
#include <QString>

#include <functional>

class QwtPlot;

namespace cw::gui {

class ReadoutPicker : public QwtPlotPicker {
 public:
  using Readout = std::function<QString(const QPoint&)>;
  ReadoutPicker(QwtPlot* plot, Readout readout);

 protected:
  QwtText trackerText(const QPoint& position) const override;

 private:
  QwtPlot* plot_;
  Readout readout_;
};

}  // namespace cw::gui
