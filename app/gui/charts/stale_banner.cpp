#include "charts/stale_banner.h"

#include "charts/colours.h"

#include <QCoreApplication>
#include <QFont>
#include <QPalette>

namespace cw::gui {

QwtText staleBannerText(const QPalette& palette, bool hasResult) {
  QwtText stale(hasResult
                    ? QCoreApplication::translate("CycleChart", "Stale: showing the last valid result")
                    : QCoreApplication::translate("CycleChart", "No result:\nthese inputs have no cycle"));
  stale.setRenderFlags(Qt::AlignHCenter | Qt::AlignTop);
  QFont font = stale.font();
  font.setBold(true);
  stale.setFont(font);
  stale.setColor(kOkabeItoVermillion);
  QColor background = palette.color(QPalette::Base);
  background.setAlpha(220);
  stale.setBackgroundBrush(background);
  stale.setBorderRadius(3);
  return stale;
}

}  // namespace cw::gui
