#pragma once
// How a chart is exported: what the figure shows and how it looks, chosen in the export dialog
// and remembered per chart (AppSettings::exportOptions). A plain value; the charts apply it
// (charts/chart_base.h: ExportScope).

#include <QSize>
#include <QSizeF>
#include <QString>
#include <QVariantMap>

namespace cw::gui {

/// Where an exported figure's legend goes; AsShown keeps the chart's own (inside the T-s and h-s
/// canvas, below the p-v chart).
enum class LegendPlacement { AsShown, Inside, OutsideRight, Below, None };
enum class PaperUnit { Millimetres, Inches };

struct ExportOptions {
  bool transparent = false;         ///< a transparent background instead of white (never the window's grey)
  bool selectionHighlight = false;  ///< the selected component's band (off: the figure shows the cycle only)
  QString title;                    ///< empty: the chart's own title
  QString subtitle;                 ///< a second, smaller line under the title; empty for none
  LegendPlacement legend = LegendPlacement::AsShown;
  QString fontFamily;              ///< empty: the application's
  double fontPointSize = 0.0;      ///< [pt]; 0: the application's
  double lineWidthScale = 1.0;     ///< the lines' widths times this [-]
  QSizeF paperSize{180.0, 120.0};  ///< SVG and PDF, in `paperUnit`
  PaperUnit paperUnit = PaperUnit::Millimetres;
  QSize pixels{2400, 1600};  ///< PNG [px]
  int dotsPerInch = 200;     ///< PNG

  /// The SVG and PDF size [mm].
  QSizeF millimetres() const { return paperUnit == PaperUnit::Inches ? paperSize * 25.4 : paperSize; }

  QVariantMap toMap() const;
  /// Options from a map written by toMap; missing or invalid entries keep their defaults.
  static ExportOptions fromMap(const QVariantMap& map);
};

}  // namespace cw::gui
