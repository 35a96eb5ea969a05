#pragma once
// A chart of the cycle in one thermodynamic plane, built like Qwt's own examples: the plot
// builds itself (grid, legend, axis titles with units), its items are attached and owned by
// it, data come from adapters over the core's result, redraws are batched (one replot per
// update), and a zoomer, a panner and a picker with a state readout handle the mouse.
//
// Items: the cycle with losses (blue #0072B2, solid, 2 px), its ideal twin (orange #E69F00,
// dashed, 2 px), each closure to ambient thin (dash-dot and dotted), isobars through the
// station pressures (thin, between the palette's base and text colours) with labels placed
// clear of each other (IsobarLabels), station markers with their SAE numbers, and the
// selected component's path in vermillion #D55E00 (a wide band under the curves). With a
// baseline (setBaseline), its cycle with losses in neutral grey #999999, dash-dot-dot, 2 px,
// labelled with the baseline's title: a third line style beside the solid and the dashed; its
// stations as small grey squares without numbers (no legend entry of their own).
//
// Canvas, grid, legend, markers and labels take their colours from the widget's palette
// (light or dark, and again when it changes); only the Okabe-Ito line colours are fixed.

#include "charts/chart_base.h"
#include "charts/isobar_labels.h"
#include "charts/path_series.h"
#include "document/units.h"
#include "engine/isobars.h"

#include <QStringList>

#include <functional>
#include <memory>
#include <string>
#include <vector>

class QwtPlotCurve;
class QwtPlotLegendItem;
class QwtPlotMarker;
class QwtPlotPanner;
class QwtPlotZoomer;
class QwtPlotPicker;

namespace cw::gui {

class ReadoutPicker;

/// The plane: T-s, p-v, or h-s (the turbomachinery engineer's view: the sensible enthalpy
/// h - h(298.15 K) at each state's composition, as the core gives it, so that heat added shows as
/// the rise it is and the compressor's and turbine's work as vertical distances).
enum class ChartKind { TemperatureEntropy, PressureVolume, EnthalpyEntropy };

class CycleChart : public ChartBase {
  Q_OBJECT

 public:
  CycleChart(ChartKind kind, DisplayUnits& units, QWidget* parent = nullptr);
  ~CycleChart() override;

  ChartKind kind() const { return kind_; }

  /// Shows an evaluation (null clears the chart); stale greys it and says so. One replot.
  void setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale);
  /// Overlays a baseline's cycle with losses (null: none), labelled "Baseline: title". One replot.
  void setBaseline(std::shared_ptr<const engine::Evaluation> baseline, const QString& title);
  /// Highlights a component's path ("compressor"; empty for none). One replot.
  void setHighlightedComponent(const std::string& component);
  const std::string& highlightedComponent() const { return highlighted_; }

  /// Logarithmic axes (the pressure-volume chart); rescales and resets the zoom.
  void setLogAxes(bool on);
  bool logAxes() const { return logAxes_; }

  /// Back to the whole cycle.
  void resetZoom();

  /// Places the legend (inside or below) before it replots.
  void replot() override;

  /// The readout for a point of the canvas (pixels): the nearest path state's T, s, p, v
  /// with units (first the station's number on a station's marker), or the cursor's
  /// coordinates when no state is near.
  QString readoutAt(const QPoint& canvasPosition) const;

  /// "Station 4" and a line break when the point is on a numbered station marker, else empty.
  QString stationAt(const QPoint& canvasPosition) const;

  /// Axis titles, legend and labels in the current language and units.
  void retranslateUi();

  // For tests and exports.
  const QwtPlotCurve* actualCurve() const { return actual_; }
  const QwtPlotCurve* idealCurve() const { return ideal_; }
  const QwtPlotCurve* actualClosureCurve() const { return actualClosure_; }
  const QwtPlotCurve* highlightCurve() const { return highlight_; }
  const QwtPlotCurve* baselineCurve() const { return baselineCurve_; }
  /// The legend entry of the station markers, which says which are static and which total states.
  const QwtPlotCurve* stationLegendEntry() const { return stationLegend_; }
  /// The legend entry that says where entropy is zero (T-s and h-s charts).
  const QwtPlotCurve* entropyNoteEntry() const { return entropyNote_; }
  int isobarCount() const { return static_cast<int>(isobars_.size()); }
  int markerCount() const { return static_cast<int>(markers_.size()); }
  /// The baseline's station markers, in the order of its stations (none without a baseline).
  const std::vector<QwtPlotMarker*>& baselineMarkers() const { return baselineMarkers_; }
  /// The legend inside the canvas (T-s, h-s; hidden while it stands below the plot), or null.
  const QwtPlotLegendItem* legendItem() const { return legendItem_; }
  const std::vector<QwtPlotMarker*>& markers() const { return markers_; }
  const IsobarLabels* isobarLabels() const { return isobarLabels_; }
  QwtPlotZoomer* zoomer() const { return zoomer_; }

 protected:
  void staleChanged() override;
  void refresh() override;
  void beginExport(const ExportOptions& options) override;
  void endExport() override;
  bool hasResult() const override { return evaluation_ != nullptr; }
  void updateLayout() override;
  void fitExportLegend(const std::function<void()>& drawOnce) override;

 private:
  /// Colours of the canvas, grid, legend and rubber band from the palette.
  void applyPalette();
  StateValue xValue() const;
  StateValue yValue() const;
  Quantity xQuantity() const;
  Quantity yQuantity() const;
  double xScale() const;
  double yScale() const;
  /// Every item from the evaluation and the baseline, one replot.
  void rebuild();
  /// The cycles' curves and closures; false (and emptied) without an evaluation.
  bool showCycles();
  /// The isobars through the station pressures, and their labels.
  void showIsobars();
  IsobarLabels::Label isobarLabel(const engine::Isobar& isobar) const;
  /// The p-v chart's isobar: a horizontal line.
  void addPressureLine(const engine::Isobar& isobar, IsobarLabels::Label& label);
  /// The T-s or h-s chart's isobar: a curve; false when it has no point.
  bool addIsobarCurve(const engine::Isobar& isobar, double tHigh, IsobarLabels::Label& label);
  /// The station markers of both cycles (numbered: the cycle with losses).
  std::vector<IsobarLabels::Station> showStationMarkers();
  IsobarLabels::Station styleIdealMarker(QwtPlotMarker* marker) const;
  IsobarLabels::Station styleStationMarker(QwtPlotMarker* marker, const std::string& id) const;
  /// The baseline's cycle and its station markers (nothing without a baseline).
  std::vector<IsobarLabels::Station> showBaseline();
  /// A path state in the chart's coordinates (display units).
  QPointF chartPoint(const engine::PathState& state) const;
  /// The screen's legend: inside in the freest corner while one is free, else below the plot.
  void fitLegend();
  void setLegendBelow(bool below);
  /// Whether the plot keeps most of its height with the legend below it.
  bool roomBelow(const QRectF& insideCanvas) const;
  void updateHighlight();
  void updateStalePens();
  void rescale();
  void clearDynamicItems();
  /// Each axis's title in full where it fits along the axis on one line, else its brief form.
  void fitAxisTitles();

  ChartKind kind_;
  DisplayUnits& units_;
  std::shared_ptr<const engine::Evaluation> evaluation_;
  std::shared_ptr<const engine::Evaluation> baseline_;
  QString baselineTitle_;
  bool logAxes_ = false;
  std::string highlighted_;
  QStringList xTitles_, yTitles_;  ///< each axis's title, in full first, then brief

  QwtPlotCurve* actual_ = nullptr;
  QwtPlotCurve* ideal_ = nullptr;
  QwtPlotCurve* baselineCurve_ = nullptr;
  QwtPlotCurve* actualClosure_ = nullptr;
  QwtPlotCurve* idealClosure_ = nullptr;
  QwtPlotCurve* highlight_ = nullptr;
  QwtPlotCurve* idealHighlight_ = nullptr;
  QwtPlotCurve* isobarLegend_ = nullptr;   ///< an empty curve carrying the isobars' legend entry
  QwtPlotCurve* stationLegend_ = nullptr;  ///< an empty curve: the stations' marker and states
  QwtPlotCurve* entropyNote_ = nullptr;    ///< an empty curve: where s is zero (T-s, h-s)
  std::vector<QwtPlotCurve*> isobars_;
  std::vector<QwtPlotMarker*> markers_;
  std::vector<QwtPlotMarker*> baselineMarkers_;
  bool fittingLegend_ = false;  ///< while the legend moves (its layout calls back)
  LegendPlacement exportLegend_ = LegendPlacement::AsShown;
  IsobarLabels* isobarLabels_ = nullptr;
  QwtPlotLegendItem* legendItem_ = nullptr;  ///< the T-s chart's legend inside the canvas
  QwtPlotZoomer* zoomer_ = nullptr;
  QwtPlotPanner* panner_ = nullptr;
  ReadoutPicker* picker_ = nullptr;
};

}  // namespace cw::gui
