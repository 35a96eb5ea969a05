#include "charts/readout_picker.h"

#include <qwt_picker_machine.h>
#include <qwt_plot.h>
#include <qwt_text.h>

namespace cw::gui {

ReadoutPicker::ReadoutPicker(QwtPlot* plot, Readout readout)
    : QwtPlotPicker(QwtAxis::XBottom, QwtAxis::YLeft, QwtPicker::NoRubberBand, QwtPicker::AlwaysOn,
                    plot->canvas()),
      plot_(plot),
      readout_(std::move(readout)) {
  setStateMachine(new QwtPickerTrackerMachine);
}

QwtText ReadoutPicker::trackerText(const QPoint& position) const {
  QwtText text(readout_(position));
  if (text.isEmpty()) return text;
  QColor background = plot_->palette().color(QPalette::ToolTipBase);
  background.setAlpha(230);
  text.setBackgroundBrush(background);
  text.setColor(plot_->palette().color(QPalette::ToolTipText));
  text.setRenderFlags(Qt::AlignLeft);
  return text;
}

}  // namespace cw::gui
