#pragma once
// Batch figures: `cyclewright --export-figures CASE.json --output-dir DIR [--format svg,pdf,png]
// [--size WxHmm] [--units si|us]` renders every chart of a case offscreen (temperature-entropy,
// pressure-volume, enthalpy-entropy and the loss audit's waterfall) through the charts' own export
// (charts/chart_export.h, the caution included) and exits. No window is shown and no setting
// is written.

#include "document/units.h"

#include <QSizeF>
#include <QString>
#include <QStringList>

namespace cw::gui {

struct FigureRequest {
  QString casePath;                            ///< the case file
  QString outputDir;                           ///< made when missing
  QStringList formats{QStringLiteral("svg")};  ///< of "svg", "pdf", "png"
  QSizeF millimetres{160.0, 100.0};            ///< each figure's size [mm]
  UnitSystem units = UnitSystem::SI;
};

/// PNG figures are rendered at this resolution [dots per inch].
inline constexpr int kFigurePngDotsPerInch = 300;

/// "svg,pdf,png" (any of them, once or more). Throws cw::InvalidInput naming --format.
QStringList parseFigureFormats(const QString& text);
/// "WxHmm", each side from 20 to 1000 mm. Throws cw::InvalidInput naming --size [mm].
QSizeF parseFigureSize(const QString& text);
/// "si" or "us". Throws cw::InvalidInput naming --units.
UnitSystem parseFigureUnits(const QString& text);

/// Writes every chart in every format into the output folder as <chart>.<format>; returns the
/// files written. Throws cw::InvalidInput naming the case (unreadable, invalid, no cycle) or
/// --output-dir (cannot be made or written).
QStringList exportFigures(const FigureRequest& request);

}  // namespace cw::gui
