#pragma once
// The colours of Cyclewright's views: the Okabe-Ito colour-blind-safe palette (Okabe and Ito,
// "Color Universal Design", 2008) and the one mixing rule used to set them into the system's
// light or dark palette.

#include <QColor>

namespace cw::gui {

inline const QColor kOkabeItoBlue(0x00, 0x72, 0xB2);           ///< the cycle with losses
inline const QColor kOkabeItoOrange(0xE6, 0x9F, 0x00);         ///< the ideal cycle
inline const QColor kOkabeItoVermillion(0xD5, 0x5E, 0x00);     ///< selection, stale, losses that cost
inline const QColor kOkabeItoGreen(0x00, 0x9E, 0x73);          ///< bluish green: losses that gain
inline const QColor kOkabeItoReddishPurple(0xCC, 0x79, 0xA7);  ///< a trade study's second loss level
inline const QColor kOkabeItoYellow(0xF0, 0xE4, 0x42);         ///< a trade study's design point marker
inline const QColor kOkabeItoGrey(0x99, 0x99, 0x99);           ///< the baseline's cycle (neutral)

/// The colour a fraction t of the way from a to b (t = 0 gives a, 1 gives b).
inline QColor mixColours(const QColor& a, const QColor& b, double t) {
  const auto lerp = [t](double x, double y) { return static_cast<float>(x * (1 - t) + y * t); };
  return QColor::fromRgbF(lerp(a.redF(), b.redF()), lerp(a.greenF(), b.greenF()), lerp(a.blueF(), b.blueF()));
}

}  // namespace cw::gui
