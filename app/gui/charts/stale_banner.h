#pragma once
// The "stale" banner that every chart shows over its canvas while the case is invalid.

#include <qwt_text.h>

class QPalette;

namespace cw::gui {

/// Bold vermillion text on the palette's base colour, centred at the top of the canvas: "showing
/// the last valid result", or, when there is none to show (a case opened without a cycle),
/// that the chart is empty for that reason.
QwtText staleBannerText(const QPalette& palette, bool hasResult = true);

}  // namespace cw::gui
