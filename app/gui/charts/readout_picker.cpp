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

QRect ReadoutPicker::trackerRect(const QFont& font) const {
  const QRect rect = QwtPlotPicker::trackerRect(font);
  if (rect.isEmpty() || !parentWidget()) return rect;
  return placeInside(rect.size(), trackerPosition(), parentWidget()->contentsRect());
}

QRect ReadoutPicker::placeInside(const QSize& size, const QPoint& cursor, const QRect& area) {
  constexpr int kOffset = 6;  // from the cursor [px]
  QRect box(QPoint(cursor.x() + kOffset, cursor.y() - kOffset - size.height()), size);
  if (box.right() > area.right()) box.moveRight(cursor.x() - kOffset);
  if (box.top() < area.top()) box.moveTop(cursor.y() + kOffset);
  // Larger than the room on either side: inside the area all the same.
  if (box.right() > area.right()) box.moveRight(area.right());
  if (box.left() < area.left()) box.moveLeft(area.left());
  if (box.bottom() > area.bottom()) box.moveBottom(area.bottom());
  if (box.top() < area.top()) box.moveTop(area.top());
  return box;
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
