#pragma once
// The "stale" banner that every chart shows over its canvas while the case is invalid.

#include <qwt_text.h>

class QPalette;

namespace cw::gui {

/// Bold vermillion text on the palette's base colour, centred at the top of the canvas.
QwtText staleBannerText(const QPalette& palette);

}  // namespace cw::gui
