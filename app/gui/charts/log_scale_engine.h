#pragma once
// A logarithmic scale that labels 1, 2 and 5 in every decade, so that a chart spanning less
// than a decade (typical of cycle pressures and volumes) still carries readable numbers.

#include <qwt_scale_engine.h>

namespace cw::gui {

class OneTwoFiveLogScaleEngine : public QwtLogScaleEngine {
 public:
  QwtScaleDiv divideScale(double x1, double x2, int maxMajorSteps, int maxMinorSteps,
                          double stepSize = 0.0) const override;
};

}  // namespace cw::gui
