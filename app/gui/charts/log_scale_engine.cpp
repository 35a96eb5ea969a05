#include "charts/log_scale_engine.h"

#include <qwt_scale_div.h>

#include <algorithm>
#include <cmath>

namespace cw::gui {

QwtScaleDiv OneTwoFiveLogScaleEngine::divideScale(double x1, double x2, int maxMajorSteps, int maxMinorSteps,
                                                  double stepSize) const {
  const double lo = std::min(x1, x2), hi = std::max(x1, x2);
  if (!(lo > 0.0) || !(hi > lo))
    return QwtLogScaleEngine::divideScale(x1, x2, maxMajorSteps, maxMinorSteps, stepSize);
  QList<double> major, minor;
  for (int decade = int(std::floor(std::log10(lo))); decade <= int(std::ceil(std::log10(hi))); ++decade) {
    const double base = std::pow(10.0, decade);
    for (int digit = 1; digit <= 9; ++digit) {
      const double tick = digit * base;
      if (tick < lo || tick > hi) continue;
      (digit == 1 || digit == 2 || digit == 5 ? major : minor).append(tick);
    }
  }
  if (major.size() < 2) return QwtLogScaleEngine::divideScale(x1, x2, maxMajorSteps, maxMinorSteps, stepSize);
  QwtScaleDiv div(lo, hi, minor, QList<double>(), major);
  if (x1 > x2) div.invert();
  return div;
}

}  // namespace cw::gui
