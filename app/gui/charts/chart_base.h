#pragma once
// The base of every chart (CycleChart, AuditChart, StudyChart): what they share, so that each
// of them only draws its own items.
//
//   palette   the canvas, grid and legend colours from the widget's palette (light or dark),
//             applied again when the palette changes (then the chart's paletteChanged());
//   legend    a legend inside the canvas (QwtPlotLegendItem) or beside it (QwtLegend), in one
//             style: a smaller font, the palette's colours;
//   stale     the banner over the canvas while the chart shows a result that is no longer current;
//   titles    an axis title that fits its axis: the longest of its forms that fits on one line
//             (fitAxisTitle), the whole one on an export;
//   export    what an export changes for its duration (ExportScope): a light palette on white,
//             the caution line as the footer; the chart's beginExport() / endExport() hide what
//             belongs on screen only.

#include "document/export_options.h"

#include <qwt_plot.h>
#include <qwt_text.h>

#include <QColor>
#include <QFont>
#include <QPalette>
#include <QPen>
#include <QStringList>

#include <array>

#include <functional>
#include <vector>

class QwtLegend;
class QwtPlotGrid;
class QwtPlotItem;
class QwtPlotLegendItem;
class QwtPlotTextLabel;

namespace cw::gui {

class ChartBase : public QwtPlot {
  Q_OBJECT

 public:
  ~ChartBase() override;

  bool isStale() const { return stale_; }
  /// Marks the chart stale or current (the banner; the chart greys its items in staleChanged()).
  void setStale(bool stale);

  /// A colour between the canvas (Base) and the text on it: t = 0 is the canvas, 1 the text.
  QColor between(double t) const;
  /// True when the canvas is dark (the dark palette).
  bool darkCanvas() const;

  /// Called by ExportScope around an export, after the chart is redrawn in the export's palette
  /// and font: hide what belongs on screen only (the selection, unless asked for). The default
  /// does nothing.
  virtual void beginExport(const ExportOptions& options) { Q_UNUSED(options); }
  virtual void endExport() {}
  /// Within an export: the chart may place its legend for the export's surface; `drawOnce`
  /// renders the figure once on that surface (nowhere to be seen), so that the chart learns
  /// where its items land. The default does nothing.
  virtual void fitExportLegend(const std::function<void()>& drawOnce) { Q_UNUSED(drawOnce); }
  /// Rebuilds every item from the chart's data in the current palette, font and language.
  virtual void refresh() { replot(); }

  /// Whether an axis's title fits along the axis on one line (tests).
  bool axisTitleFits(QwtAxisId axis) const;

  // For tests.
  const QwtPlotTextLabel* staleBanner() const { return staleLabel_; }
  const QwtPlotGrid* grid() const { return grid_; }

 protected:
  explicit ChartBase(QWidget* parent = nullptr);

  /// Call at the end of the derived constructor: from then on a palette change reaches
  /// paletteChanged().
  void finishConstruction();
  /// The palette has changed (the base has recoloured the canvas, grid and legend already). The
  /// default rebuilds everything (refresh()); a chart with a lighter way overrides it.
  virtual void paletteChanged() { refresh(); }
  /// The stale state has changed (the base has shown or hidden the banner already).
  virtual void staleChanged() {}
  /// Sets the stale flag without notifying (setEvaluation-like calls that rebuild anyway).
  void assignStale(bool stale);
  /// A text of the chart's own for the banner (empty: staleBannerText's, by hasResult()).
  void setStaleText(const QString& text);
  /// Shows the banner when stale (and wanted), with the text for the result shown.
  void showStaleBanner();
  /// Whether the chart has a result to show: the banner says it shows the last valid one, or
  /// that there is none (a case opened without a cycle). The default: it has.
  virtual bool hasResult() const { return true; }
  /// Whether the banner is wanted while stale; the default: always.
  virtual bool wantsStaleBanner() const { return true; }

  /// Sets the longest of an axis's `titles` (longest first) that fits along the axis on one
  /// line: the first at its full size only, the others drawn down to 70 % of it, else the last
  /// at 70 %. With `whole` (an export, which has the room): the first at full size.
  void fitAxisTitle(QwtAxisId axis, const QStringList& titles, bool whole = false);

  QwtPlotGrid* gridItem() const { return grid_; }
  /// True while an ExportScope holds the chart (from before it changes anything to after it
  /// has put everything back but the last refresh).
  bool inExport() const { return inExport_; }
  /// A legend inside the canvas in the charts' style; the caller attaches it.
  QwtPlotLegendItem* makeLegendItem(Qt::Alignment alignment, int columns, double fontScale);
  /// A legend beside the canvas in the charts' style, inserted at `position`.
  QwtLegend* insertOuterLegend(QwtPlot::LegendPosition position, int columns, double fontScale);

  void changeEvent(QEvent* event) override;

 private:
  void applyBasePalette();
  /// The length along an axis that its title may take [px].
  double axisTitleRoom(QwtAxisId axis) const;
  QFont axisTitleFont(QwtAxisId axis) const;
  void styleLegendItem(QwtPlotLegendItem* legend) const;

  bool stale_ = false;
  bool built_ = false;
  bool applyingPalette_ = false;
  bool inExport_ = false;
  QString staleText_;
  QwtPlotGrid* grid_ = nullptr;
  QwtPlotTextLabel* staleLabel_ = nullptr;
  std::vector<QwtPlotLegendItem*> legendItems_;  ///< styled on every palette change (not owned)
  std::array<double, QwtAxis::AxisPositions> titleFontSizes_{};  ///< each title's full size [pt] (Qwt's)

  friend class ExportScope;
};

/// For its lifetime: the chart in a light palette on white with the caution line as its footer,
/// and the chart's beginExport() / endExport() around it. Every export goes through one.
class ExportScope {
 public:
  explicit ExportScope(QwtPlot* plot, const ExportOptions& options = {});
  ~ExportScope();
  ExportScope(const ExportScope&) = delete;
  ExportScope& operator=(const ExportScope&) = delete;

  /// The palette of exported figures: near-black on white.
  static QPalette exportPalette();
  /// The figure's title as plain text, for a document's metadata (an SVG's <title>, a PDF's
  /// title): the options' title and subtitle, or the chart's own title.
  QString plainTitle() const;

 private:
  void placeLegend(LegendPlacement placement);
  void restoreLegend();
  void scaleLines(double factor);

  QwtPlot* plot_;
  ChartBase* chart_;
  ExportOptions options_;
  QPalette palette_;
  bool ownPalette_;
  QFont font_;
  bool ownFont_;
  QString plainChartTitle_;  ///< the chart's own title, before the export's rich one
  // The legend as shown, to put back.
  bool hadOuterLegend_ = false;
  QwtPlot::LegendPosition outerPosition_ = QwtPlot::BottomLegend;
  int outerColumns_ = 1;
  QString outerName_;
  std::vector<QwtPlotLegendItem*> attachedItems_;
  QwtPlotLegendItem* extraItem_ = nullptr;  ///< an inside legend for a chart that has none
  QwtPlot::LegendPosition layoutBefore_ = QwtPlot::BottomLegend;
  std::vector<std::pair<QwtPlotItem*, QPen>> pens_;
};

}  // namespace cw::gui
