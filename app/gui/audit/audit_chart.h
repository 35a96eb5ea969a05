#pragma once
// The loss audit's waterfall: from the ideal twin's figure (orange #E69F00, as the ideal cycle
// on the cycle charts) down to the actual one (blue #0072B2), one floating bar per loss in the
// audit's order; a loss that costs is vermillion #D55E00, one that gains bluish green #009E73.
// Specific thrust [N s/kg] or TSFC [g/(kN s)] (in the display units). Canvas, text and grid
// from the palette; greyed and labelled when stale. Clicking a loss's bar emits lossClicked.
// With a baseline's audit (setBaseline), each slot holds a pair: the current bar on the left,
// the baseline's on the right in neutral grey #999999 (as the baseline's cycle on the cycle
// charts), named "Baseline: title" in a legend; the slots are the losses of both audits.
// Draws only the core's audit (core/analysis/loss_audit.h); it computes nothing.

#include "analysis/loss_audit.h"
#include "charts/chart_base.h"
#include "document/case_fields.h"
#include "document/units.h"

#include <QRectF>

class QwtPlotLegendItem;

#include <memory>
#include <string>
#include <vector>

namespace cw::gui {

enum class AuditFigure { SpecificThrust, Tsfc };

class AuditChart : public ChartBase {
  Q_OBJECT

 public:
  /// One bar: from one running figure to the next [SI: N s/kg or kg/(N s)]. The first and last
  /// bars are the ideal and actual totals (loss empty, from = 0).
  struct Bar {
    std::string loss;
    double from = 0.0;
    double to = 0.0;
    int slot = 0;  ///< its place on the x axis (the baseline's bar shares it with the current one)
  };

  explicit AuditChart(DisplayUnits& units, QWidget* parent = nullptr);
  ~AuditChart() override;

  /// Shows an audit (null clears the chart). One replot.
  void setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale);
  /// Shows a baseline's audit beside the current one (null: none), named "Baseline: title".
  void setBaseline(std::shared_ptr<const analysis::LossAudit> baseline, const QString& title);
  bool hasBaseline() const { return baseline_ != nullptr; }
  void setFigure(AuditFigure figure);
  AuditFigure figure() const { return figure_; }
  /// Outlines the bars of the losses set in a section.
  void setHighlightedSection(Section section);

  const std::vector<Bar>& bars() const { return bars_; }
  /// The baseline's bars (empty without one), in the same slots as bars().
  const std::vector<Bar>& baselineBars() const { return baselineBars_; }
  /// The baseline's name in the legend (empty without one).
  QString baselineLegendText() const;
  /// The bar under a canvas position [px], or -1.
  int barAt(const QPoint& canvasPosition) const;
  /// The centre of a bar on the canvas [px] (tests).
  QPoint barCentre(int index) const;
  /// From the last draw (on screen or an export, in its pixels): each bar's value label and the canvas.
  const std::vector<QRectF>& valueLabelRects() const;
  /// The baseline's value labels drawn (one that fits nowhere is left out).
  const std::vector<QRectF>& baselineValueLabelRects() const;
  QRectF lastCanvasRect() const;

  void retranslateUi();
  /// Whether the value axis's title fits along the axis on one line (tests).
  bool valueAxisTitleFits() const;

 signals:
  void lossClicked(const QString& loss);

 protected:
  void resizeEvent(QResizeEvent* event) override;
  void paletteChanged() override;
  void refresh() override;
  void beginExport(const ExportOptions& options) override;
  void endExport() override;
  bool hasResult() const override { return audit_ != nullptr; }
  bool eventFilter(QObject* object, QEvent* event) override;

 private:
  class WaterfallItem;
  class BaselineKeyItem;
  void rebuild();
  /// The bars of an audit in the slots (the keys of slots_; empty for the two totals).
  std::vector<Bar> barsOf(const analysis::LossAudit& audit) const;
  double figureFactor() const;
  /// The value axis's titles, longest first (with the unit).
  QStringList valueAxisTitles() const;
  /// The longest title that fits the axis's length (whole: the longest, for an export).
  void fitValueAxisTitle(bool whole = false);

  DisplayUnits& units_;
  std::shared_ptr<const analysis::LossAudit> audit_;
  AuditFigure figure_ = AuditFigure::SpecificThrust;
  Section highlighted_ = Section::Case;
  bool exportingWithoutSelection_ = false;
  std::vector<Bar> bars_;
  std::shared_ptr<const analysis::LossAudit> baseline_;
  QString baselineTitle_;
  std::vector<Bar> baselineBars_;
  std::vector<std::string> slots_;  ///< the loss of each slot ("": the ideal twin, the actual total)
  WaterfallItem* item_ = nullptr;
  BaselineKeyItem* key_ = nullptr;
  QwtPlotLegendItem* legend_ = nullptr;
};

}  // namespace cw::gui
