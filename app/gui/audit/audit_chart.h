#pragma once
// The loss audit's waterfall: from the ideal twin's figure (orange #E69F00, as the ideal cycle
// on the cycle charts) down to the actual one (blue #0072B2), one floating bar per loss in the
// audit's order; a loss that costs is vermillion #D55E00, one that gains bluish green #009E73.
// Specific thrust [N s/kg] or TSFC [g/(kN s)] (in the display units). Canvas, text and grid
// from the palette; greyed and labelled when stale. Clicking a loss's bar emits lossClicked.
// Draws only the core's audit (core/analysis/loss_audit.h); it computes nothing.

#include "analysis/loss_audit.h"
#include "charts/chart_base.h"
#include "document/case_fields.h"
#include "document/units.h"

#include <QRectF>

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
  };

  explicit AuditChart(DisplayUnits& units, QWidget* parent = nullptr);
  ~AuditChart() override;

  /// Shows an audit (null clears the chart). One replot.
  void setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale);
  void setFigure(AuditFigure figure);
  AuditFigure figure() const { return figure_; }
  /// Outlines the bars of the losses set in a section.
  void setHighlightedSection(Section section);

  const std::vector<Bar>& bars() const { return bars_; }
  /// The bar under a canvas position [px], or -1.
  int barAt(const QPoint& canvasPosition) const;
  /// The centre of a bar on the canvas [px] (tests).
  QPoint barCentre(int index) const;
  /// From the last draw (on screen or an export, in its pixels): each bar's value label and the canvas.
  const std::vector<QRectF>& valueLabelRects() const;
  QRectF lastCanvasRect() const;

  void retranslateUi();

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
  void rebuild();
  double figureFactor() const;

  DisplayUnits& units_;
  std::shared_ptr<const analysis::LossAudit> audit_;
  AuditFigure figure_ = AuditFigure::SpecificThrust;
  Section highlighted_ = Section::Case;
  bool exportingWithoutSelection_ = false;
  std::vector<Bar> bars_;
  WaterfallItem* item_ = nullptr;
};

}  // namespace cw::gui
