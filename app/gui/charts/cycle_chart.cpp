#include "charts/cycle_chart.h"
#include "charts/colours.h"
#include "charts/readout_picker.h"

#include "charts/isobar_labels.h"
#include "charts/log_scale_engine.h"
#include "document/case_fields.h"

#include "engine/isobars.h"

#include <qwt_legend.h>
#include <qwt_picker_machine.h>
#include <qwt_plot_canvas.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_layout.h>
#include <qwt_plot_legenditem.h>
#include <qwt_plot_marker.h>
#include <qwt_plot_panner.h>
#include <qwt_plot_picker.h>
#include <qwt_plot_textlabel.h>
#include <qwt_plot_zoomer.h>
#include <qwt_scale_engine.h>
#include <qwt_scale_map.h>
#include <qwt_scale_widget.h>
#include <qwt_symbol.h>
#include <qwt_text.h>

#include <QCoreApplication>
#include <QEvent>
#include <QScopedValueRollback>

#include <algorithm>
#include <cmath>
#include <limits>
#include <utility>

namespace cw::gui {

namespace {

// The Okabe-Ito palette (colours.h), under this file's short names.
const QColor& kBlue = kOkabeItoBlue;
const QColor& kOrange = kOkabeItoOrange;
constexpr qsizetype kBaselineTitleChars = 32;  ///< of the baseline's title in the legend
constexpr double kBelowLegendRatio = 0.5;      ///< of the chart's height, at most, for a legend below
constexpr double kStationPickPx = 6.0;         ///< a station is read within this of its marker [px]
constexpr int kBaselineMarkerPx = 5;           ///< the baseline's station markers [px]
const QColor& kVermillion = kOkabeItoVermillion;

QColor between(const QPalette& palette, double t) {
  return mixColours(palette.color(QPalette::Base), palette.color(QPalette::Text), t);
}

QColor isobarColour(const QPalette& palette) {
  return between(palette, 0.22);
}

QColor isobarLabelColour(const QPalette& palette) {
  return between(palette, 0.62);
}

QColor inkColour(const QPalette& palette) {
  return palette.color(QPalette::Text);
}

QString componentName(const std::string& component) {
  if (component == "closure") return QCoreApplication::translate("cw::gui::CycleChart", "Closure to ambient");
  // The strip's name of the section the network's component is named after (its role).
  for (const Section section : allSections())
    if (sectionComponent(section) == component) return sectionName(section);
  return QString::fromStdString(component);
}

}  // namespace

CycleChart::CycleChart(ChartKind kind, DisplayUnits& units, QWidget* parent)
    : ChartBase(parent), kind_(kind), units_(units) {
  setObjectName(kind == ChartKind::TemperatureEntropy ? "temperatureEntropyChart"
                : kind == ChartKind::PressureVolume   ? "pressureVolumeChart"
                                                      : "enthalpyEntropyChart");
  setMinimumSize(240, 180);

  // The legend: inside the canvas of the temperature-entropy and enthalpy-entropy charts, in
  // the corner the cycle leaves free (IsobarLabels::fitLegend at each draw), or below the plot
  // when none is (fitLegend); below the pressure-volume chart, whose corners it fills.
  if (kind != ChartKind::PressureVolume) {
    // The top left on both: on the sensible enthalpy scale the h-s cycle has the T-s cycle's shape.
    legendItem_ = makeLegendItem(Qt::AlignTop | Qt::AlignLeft, 1, 0.85);
    legendItem_->setMargin(4);
    legendItem_->setSpacing(2);
    legendItem_->attach(this);
  } else {
    // Three columns of short entries: two rows, so that the plot keeps most of the height.
    insertOuterLegend(QwtPlot::BottomLegend, 3, 0.8);
  }

  auto makeCurve = [this](const QPen& pen, double z) {
    auto* curve = new QwtPlotCurve;
    curve->setPen(pen);
    curve->setRenderHint(QwtPlotItem::RenderAntialiased, true);
    // The legend shows each line's style, so that it reads in greyscale too.
    curve->setLegendAttribute(QwtPlotCurve::LegendShowLine, true);
    curve->setLegendIconSize(QSize(28, 10));
    curve->setZ(z);
    curve->attach(this);
    return curve;
  };
  QPen highlightPen(kVermillion, 7.0);
  highlightPen.setCapStyle(Qt::RoundCap);
  // The selection's band lies behind every line, the isobars and the grid included, and is
  // translucent, so that no line under it is hidden (on the dark canvas too).
  highlight_ = makeCurve(highlightPen, 4);
  idealHighlight_ = makeCurve(highlightPen, 4);
  idealHighlight_->setItemAttribute(QwtPlotItem::Legend, false);
  isobarLegend_ = makeCurve(QPen(Qt::gray, 1.0), 5);
  // The markers mix states (stations 0, 8, 9 static, 2 to 7 total); their entry says so.
  stationLegend_ = makeCurve(QPen(Qt::NoPen), 5);
  stationLegend_->setLegendAttribute(QwtPlotCurve::LegendShowLine, false);
  stationLegend_->setLegendAttribute(QwtPlotCurve::LegendShowSymbol, true);
  // The entropy axis's reference, a legend entry without a line (not on the p-v chart).
  entropyNote_ = makeCurve(QPen(Qt::NoPen), 5);
  entropyNote_->setLegendAttribute(QwtPlotCurve::LegendShowLine, false);
  entropyNote_->setStyle(QwtPlotCurve::NoCurve);  // a blank icon: no line, no symbol, no fill
  entropyNote_->setItemAttribute(QwtPlotItem::Legend, kind != ChartKind::PressureVolume);
  actualClosure_ = makeCurve(QPen(kBlue, 1.0, Qt::DashDotLine), 18);
  idealClosure_ = makeCurve(QPen(kOrange, 1.0, Qt::DotLine), 18);
  QPen idealPen(kOrange, 2.0, Qt::DashLine);
  ideal_ = makeCurve(idealPen, 19);
  actual_ = makeCurve(QPen(kBlue, 2.0, Qt::SolidLine), 20);
  ideal_->setSymbol(new QwtSymbol(QwtSymbol::NoSymbol));
  // The baseline under both: neutral grey, dash-dot-dot (the closure with losses is dash-dot
  // already), in the legend only while there is one.
  baselineCurve_ = makeCurve(QPen(kOkabeItoGrey, 2.0, Qt::DashDotDotLine), 17);
  baselineCurve_->setItemAttribute(QwtPlotItem::Legend, false);

  isobarLabels_ = new IsobarLabels;
  isobarLabels_->setLegendAvoids({actual_, ideal_});
  isobarLabels_->setCurves({actual_, ideal_, actualClosure_, idealClosure_});
  isobarLabels_->attach(this);

  zoomer_ = new QwtPlotZoomer(QwtAxis::XBottom, QwtAxis::YLeft, canvas());
  zoomer_->setTrackerMode(QwtPicker::AlwaysOff);
  panner_ = new QwtPlotPanner(canvas());
  panner_->setMouseButton(Qt::MiddleButton);
  picker_ = new ReadoutPicker(this, [this](const QPoint& p) { return readoutAt(p); });

  applyPalette();
  retranslateUi();
  connect(&units_, &DisplayUnits::changed, this, [this] {
    retranslateUi();
    rebuild();
  });
  finishConstruction();
}

CycleChart::~CycleChart() = default;

void CycleChart::applyPalette() {
  const QPalette& p = palette();
  isobarLegend_->setPen(QPen(isobarColour(p), 1.0));
  const QColor ink = inkColour(p);
  stationLegend_->setSymbol(new QwtSymbol(QwtSymbol::Ellipse, QBrush(ink), QPen(ink, 1.0), QSize(7, 7)));
  zoomer_->setRubberBandPen(QPen(p.color(QPalette::Text), 1.0, Qt::DashLine));
}

void CycleChart::refresh() {
  applyPalette();
  retranslateUi();
  rebuild();
}

void CycleChart::beginExport(const ExportOptions& options) {
  exportLegend_ = options.legend;
  // Asked for inside: the chart's own legend, also where the screen has it below the plot.
  if (legendItem_ && options.legend == LegendPlacement::Inside) legendItem_->setVisible(true);
  // The selection belongs on screen; a figure shows it only when asked to.
  if (!options.selectionHighlight) {
    highlight_->setVisible(false);
    idealHighlight_->setVisible(false);
    highlight_->setItemAttribute(QwtPlotItem::Legend, false);
  }
}

void CycleChart::endExport() {
  updateHighlight();
}

void CycleChart::fitExportLegend(const std::function<void()>& drawOnce) {
  // The chart's own legend as shown: inside, in the corner the draw finds freest, or below the
  // plot when even that corner covers the cycle.
  if (!legendItem_ || exportLegend_ != LegendPlacement::AsShown) return;
  setLegendBelow(false);
  drawOnce();
  if (isobarLabels_->legendBlocked() && roomBelow(isobarLabels_->canvasRect())) setLegendBelow(true);
}

void CycleChart::replot() {
  fitLegend();
  ChartBase::replot();
}

void CycleChart::fitLegend() {
  if (!legendItem_ || fittingLegend_ || inExport()) return;
  if (!evaluation_ && !baseline_) {  // an empty chart: no line to explain, the hint stays clear
    setLegendBelow(false);
    legendItem_->setVisible(false);
    return;
  }
  // Judged on the canvas the legend would have inside: as now, or taller by the legend below
  // (the same canvas either way, so that it does not go back and forth).
  QRectF area = canvas()->contentsRect();
  QwtScaleMap xMap = canvasMap(QwtAxis::XBottom), yMap = canvasMap(QwtAxis::YLeft);
  if (legend()) {
    const double extra = legend()->height() + plotLayout()->spacing();
    area.setHeight(area.height() + extra);
    yMap.setPaintInterval(yMap.p1() + extra, yMap.p2());
  }
  if (area.width() < 1.0 || area.height() < 1.0) return;
  const bool blocked = isobarLabels_->fitLegend(legendItem_, xMap, yMap, area) > 0;
  setLegendBelow(blocked && roomBelow(area));
}

bool CycleChart::roomBelow(const QRectF& insideCanvas) const {
  // The legend below, in two columns as a small chart has them, takes at most this share of
  // the canvas it would have inside; on a smaller chart it stays inside (in its freest corner):
  // a plot squeezed to a strip shows nothing.
  constexpr double kMostBelow = 0.6;
  const uint columns = legendItem_->maxColumns();
  legendItem_->setMaxColumns(2);
  const double height = legendItem_->geometry(insideCanvas).height();
  legendItem_->setMaxColumns(columns);
  return height <= kMostBelow * insideCanvas.height();
}

void CycleChart::setLegendBelow(bool below) {
  legendItem_->setVisible(!below);
  if (below == (legend() != nullptr)) return;
  const QScopedValueRollback guard(fittingLegend_, true);
  // Three columns of short entries, as the pressure-volume chart's.
  if (below)
    insertOuterLegend(QwtPlot::BottomLegend, 3, 0.8);
  else
    insertLegend(nullptr);
}

void CycleChart::staleChanged() {
  updateStalePens();
}

StateValue CycleChart::xValue() const {
  return kind_ == ChartKind::PressureVolume ? StateValue::SpecificVolume : StateValue::Entropy;
}
StateValue CycleChart::yValue() const {
  switch (kind_) {
    case ChartKind::TemperatureEntropy:
      return StateValue::Temperature;
    case ChartKind::PressureVolume:
      return StateValue::Pressure;
    case ChartKind::EnthalpyEntropy:
      return StateValue::SensibleEnthalpy;
  }
  return StateValue::Temperature;
}
Quantity CycleChart::xQuantity() const {
  return kind_ == ChartKind::PressureVolume ? Quantity::SpecificVolume : Quantity::Entropy;
}
Quantity CycleChart::yQuantity() const {
  switch (kind_) {
    case ChartKind::TemperatureEntropy:
      return Quantity::Temperature;
    case ChartKind::PressureVolume:
      return Quantity::Pressure;
    case ChartKind::EnthalpyEntropy:
      return Quantity::SpecificEnergy;
  }
  return Quantity::Temperature;
}
double CycleChart::xScale() const {
  return units_.factor(xQuantity());
}
double CycleChart::yScale() const {
  return units_.factor(yQuantity());
}

void CycleChart::retranslateUi() {
  // Each axis title in full, and a brief form for an axis too short for it on one line.
  const QString entropy = units_.withUnit(tr("Specific entropy s"), Quantity::Entropy);
  const QString entropyBrief = units_.withUnit(tr("Entropy s"), Quantity::Entropy);
  if (kind_ == ChartKind::TemperatureEntropy) {
    setTitle(tr("Temperature–entropy"));
    xTitles_ = {entropy, entropyBrief};
    yTitles_ = {units_.withUnit(tr("Temperature T"), Quantity::Temperature)};
  } else if (kind_ == ChartKind::EnthalpyEntropy) {
    setTitle(tr("Enthalpy–entropy"));
    xTitles_ = {entropy, entropyBrief};
    yTitles_ = {units_.withUnit(tr("Sensible enthalpy h − h(298.15 K)"), Quantity::SpecificEnergy),
                units_.withUnit(tr("h − h(298.15 K)"), Quantity::SpecificEnergy)};
  } else {
    setTitle(tr("Pressure–volume"));
    xTitles_ = {units_.withUnit(tr("Specific volume v"), Quantity::SpecificVolume),
                units_.withUnit(QStringLiteral("v"), Quantity::SpecificVolume)};
    yTitles_ = {units_.withUnit(tr("Pressure p"), Quantity::Pressure)};
  }
  fitAxisTitles();
  actual_->setTitle(tr("Cycle with losses"));
  ideal_->setTitle(tr("Ideal cycle"));
  baselineCurve_->setTitle(tr("Baseline: %1").arg(baselineTitle_));
  // Short entries, so that the legend takes few rows (the p-v chart's lies below its plot).
  actualClosure_->setTitle(tr("Closure, with losses"));
  idealClosure_->setTitle(tr("Closure, ideal"));
  isobarLegend_->setTitle(tr("Station isobars"));
  stationLegend_->setTitle(tr("Stations: 0, 8, 9 static;\n2 to 7 total"));
  // The entropy axis's reference, said here so that the axis title stays on one line.
  entropyNote_->setTitle(tr("s = 0 at the free-stream\nstatic state"));
  highlight_->setTitle(tr("Selected: %1").arg(componentName(highlighted_)));
  showStaleBanner();
}

void CycleChart::updateLayout() {
  // A legend below may take up to half the height (Qwt's default, a third, hides its last
  // rows behind a scroll bar); roomBelow() keeps it from taking more than the plot can give.
  if (legendItem_) plotLayout()->setLegendRatio(kBelowLegendRatio);
  ChartBase::updateLayout();  // the axes' lengths first
  fitAxisTitles();            // a changed title asks for another layout, which keeps it
  fitLegend();                // inside while a corner is free, else below
}

void CycleChart::fitAxisTitles() {
  // Three charts beside each other on a laptop leave the axes too short for the full titles on
  // one line (a wrapped title takes a second line from the plot): ChartBase's one rule picks the
  // brief form then, drawn smaller where it must be.
  if (!xTitles_.isEmpty()) fitAxisTitle(QwtAxis::XBottom, xTitles_);
  if (!yTitles_.isEmpty()) fitAxisTitle(QwtAxis::YLeft, yTitles_);
}

void CycleChart::clearDynamicItems() {
  for (auto* c : isobars_) {
    c->detach();
    delete c;
  }
  isobars_.clear();
  for (auto* m : markers_) {
    m->detach();
    delete m;
  }
  markers_.clear();
  for (auto* m : baselineMarkers_) {
    m->detach();
    delete m;
  }
  baselineMarkers_.clear();
  isobarLabels_->setLabels({});
  isobarLabels_->setStations({});
}

void CycleChart::setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale) {
  evaluation_ = std::move(evaluation);
  assignStale(stale);
  showStaleBanner();
  rebuild();
}

void CycleChart::setBaseline(std::shared_ptr<const engine::Evaluation> baseline, const QString& title) {
  baseline_ = std::move(baseline);
  // A long case title would widen the legend over the plot: it is cut, the full one is in the
  // tables' header tooltip.
  baselineTitle_ =
      title.size() > kBaselineTitleChars ? title.left(kBaselineTitleChars - 1) + QChar(0x2026) : title;
  baselineCurve_->setTitle(tr("Baseline: %1").arg(baselineTitle_));
  baselineCurve_->setItemAttribute(QwtPlotItem::Legend, baseline_ != nullptr);
  // The labels keep clear of the baseline's line too, while there is one.
  if (baseline_)
    isobarLabels_->setCurves({actual_, ideal_, actualClosure_, idealClosure_, baselineCurve_});
  else
    isobarLabels_->setCurves({actual_, ideal_, actualClosure_, idealClosure_});
  rebuild();
}

void CycleChart::rebuild() {
  clearDynamicItems();
  std::vector<IsobarLabels::Station> stations = showBaseline();
  if (!showCycles()) {
    isobarLabels_->setStations(std::move(stations));
    updateStalePens();
    replot();
    return;
  }
  showIsobars();
  std::vector<IsobarLabels::Station> own = showStationMarkers();
  stations.insert(stations.begin(), own.begin(), own.end());
  isobarLabels_->setStations(std::move(stations));
  updateHighlight();
  updateStalePens();
  if (!zoomer_ || zoomer_->zoomRectIndex() == 0) rescale();
  replot();
}

bool CycleChart::showCycles() {
  if (!evaluation_) {
    for (auto* c : {actual_, ideal_, actualClosure_, idealClosure_, highlight_, idealHighlight_})
      c->setSamples(QVector<QPointF>());
    return false;
  }
  const double xs = xScale(), ys = yScale();
  const StateValue xv = xValue(), yv = yValue();
  const auto& actual = evaluation_->actual;
  const auto& ideal = evaluation_->ideal;
  actual_->setData(new PathSeries(evaluation_, false, cyclePaths(actual, false), xv, yv, xs, ys));
  ideal_->setData(new PathSeries(evaluation_, true, cyclePaths(ideal, false), xv, yv, xs, ys));
  actualClosure_->setData(new PathSeries(evaluation_, false, cyclePaths(actual, true), xv, yv, xs, ys));
  idealClosure_->setData(new PathSeries(evaluation_, true, cyclePaths(ideal, true), xv, yv, xs, ys));
  return true;
}

void CycleChart::showIsobars() {
  // Isobars: curves on the T-s and h-s charts, horizontal lines on the p-v chart.
  double tLow = std::numeric_limits<double>::max(), tHigh = 0.0;
  for (const auto* cycle : {&evaluation_->actual, &evaluation_->ideal})
    for (const auto& path : cycle->paths)
      for (const auto& s : path.states) {
        tLow = std::min(tLow, s.temperature);
        tHigh = std::max(tHigh, s.temperature);
      }
  const std::vector<engine::Isobar> isobars =
      engine::stationIsobars(evaluation_->actual, 0.85 * tLow, 1.08 * tHigh);
  std::vector<IsobarLabels::Label> labels;
  for (const auto& isobar : isobars) {
    // Every isobar gets a label; IsobarLabels places them on screen clear of each other.
    IsobarLabels::Label label = isobarLabel(isobar);
    if (kind_ == ChartKind::PressureVolume)
      addPressureLine(isobar, label);
    else if (!addIsobarCurve(isobar, tHigh, label))
      continue;
    labels.push_back(std::move(label));
  }
  isobarLabels_->setLabels(std::move(labels));
}

IsobarLabels::Label CycleChart::isobarLabel(const engine::Isobar& isobar) const {
  QFont small = font();
  small.setPointSizeF(small.pointSizeF() * 0.8);
  QColor halo = palette().color(QPalette::Base);
  halo.setAlpha(170);
  IsobarLabels::Label label;
  label.text = QwtText(QStringLiteral("p%1 = %2")
                           .arg(QString::fromStdString(isobar.station),
                                units_.format(isobar.pressure, Quantity::Pressure, 4)));
  label.text.setFont(small);
  label.text.setColor(isobarLabelColour(palette()));
  label.text.setBackgroundBrush(halo);
  return label;
}

void CycleChart::addPressureLine(const engine::Isobar& isobar, IsobarLabels::Label& label) {
  // An isobar is a horizontal line; its label sits above it, from the left edge.
  const double ys = yScale();
  auto* line = new QwtPlotMarker;
  line->setLineStyle(QwtPlotMarker::HLine);
  line->setLinePen(QPen(isobarColour(palette()), 1.0, Qt::SolidLine));
  line->setYValue(isobar.pressure / ys);
  line->setItemAttribute(QwtPlotItem::AutoScale, false);
  line->setZ(5);
  line->attach(this);
  markers_.push_back(line);
  label.horizontal = true;
  label.along = {QPointF(0.0, isobar.pressure / ys)};
}

bool CycleChart::addIsobarCurve(const engine::Isobar& isobar, double tHigh, IsobarLabels::Label& label) {
  auto* curve = new QwtPlotCurve;
  curve->setPen(QPen(isobarColour(palette()), 1.0, Qt::SolidLine));
  curve->setZ(5);
  curve->setItemAttribute(QwtPlotItem::Legend, false);
  curve->setItemAttribute(QwtPlotItem::AutoScale, false);
  QVector<QPointF> points;
  for (const auto& st : isobar.states) points.append(chartPoint(st));
  curve->setSamples(points);
  curve->attach(this);
  isobars_.push_back(curve);
  if (points.isEmpty()) return false;
  // The label prefers where the isobar reaches the cycle's highest temperature.
  label.along.assign(points.begin(), points.end());
  label.preferred = label.along.size() - 1;
  for (std::size_t k = 0; k < isobar.states.size(); ++k)
    if (isobar.states[k].temperature >= tHigh) {
      label.preferred = k;
      break;
    }
  return true;
}

QPointF CycleChart::chartPoint(const engine::PathState& state) const {
  return {stateValue(state, xValue()) / xScale(), stateValue(state, yValue()) / yScale()};
}

std::vector<IsobarLabels::Station> CycleChart::showStationMarkers() {
  // Station markers: labelled with their SAE numbers (cycle with losses), plain for the ideal cycle.
  std::vector<IsobarLabels::Station> stations;
  for (const auto* cycle : {&evaluation_->actual, &evaluation_->ideal}) {
    const bool isIdeal = cycle == &evaluation_->ideal;
    for (const auto& station : cycle->stations) {
      engine::PathState state;
      if (!stationState(*cycle, station, state)) continue;
      auto* marker = new StationMarker(isobarLabels_);
      marker->setValue(chartPoint(state));
      stations.push_back(isIdeal ? styleIdealMarker(marker) : styleStationMarker(marker, station.id));
      marker->setItemAttribute(QwtPlotItem::AutoScale, false);
      marker->attach(this);
      markers_.push_back(marker);
    }
  }
  return stations;
}

IsobarLabels::Station CycleChart::styleIdealMarker(QwtPlotMarker* marker) const {
  const QColor edge = darkCanvas() ? kOrange : kOrange.darker(130);
  marker->setSymbol(new QwtSymbol(QwtSymbol::Diamond, Qt::NoBrush, QPen(edge, 1.0), QSize(6, 6)));
  marker->setZ(21);
  return {marker->value(), QSizeF(6, 6), QSizeF(), Qt::AlignCenter, 0.0, marker};
}

IsobarLabels::Station CycleChart::styleStationMarker(QwtPlotMarker* marker, const std::string& id) const {
  const QColor ink = inkColour(palette());
  marker->setSymbol(new QwtSymbol(QwtSymbol::Ellipse, QBrush(ink), QPen(ink, 1.0), QSize(7, 7)));
  QwtText label(QString::fromStdString(id));
  QFont bold = font();
  bold.setBold(true);
  label.setFont(bold);
  label.setColor(ink);
  QColor halo = palette().color(QPalette::Base);
  halo.setAlpha(200);
  label.setBackgroundBrush(halo);
  marker->setLabel(label);
  // Alternate sides so that close stations (7, 8, 9) stay readable.
  const bool left = id == "0" || id == "3" || id == "8" || id == "6";
  const bool below = id == "5";
  marker->setLabelAlignment((left ? Qt::AlignLeft : Qt::AlignRight) |
                            (below ? Qt::AlignBottom : Qt::AlignTop));
  marker->setSpacing(4);
  marker->setZ(22);
  return {marker->value(),           QSizeF(7, 7), label.textSize(bold), marker->labelAlignment(),
          double(marker->spacing()), marker};
}

std::vector<IsobarLabels::Station> CycleChart::showBaseline() {
  std::vector<IsobarLabels::Station> stations;
  if (!baseline_) {
    baselineCurve_->setSamples(QVector<QPointF>());
    return stations;
  }
  baselineCurve_->setData(new PathSeries(baseline_, false, cyclePaths(baseline_->actual, false), xValue(),
                                         yValue(), xScale(), yScale()));
  // Its stations: small grey squares, unlabelled (the current cycle's numbers name the places),
  // under the current cycle's markers; the labels keep clear of them.
  for (const auto& station : baseline_->actual.stations) {
    engine::PathState state;
    if (!stationState(baseline_->actual, station, state)) continue;
    auto* marker = new QwtPlotMarker;
    marker->setValue(chartPoint(state));
    marker->setSymbol(new QwtSymbol(QwtSymbol::Rect, QBrush(kOkabeItoGrey), QPen(kOkabeItoGrey, 1.0),
                                    QSize(kBaselineMarkerPx, kBaselineMarkerPx)));
    marker->setItemAttribute(QwtPlotItem::AutoScale, false);
    marker->setZ(17.5);
    marker->attach(this);
    baselineMarkers_.push_back(marker);
    stations.push_back({marker->value(), QSizeF(kBaselineMarkerPx, kBaselineMarkerPx), QSizeF(),
                        Qt::AlignCenter, 0.0, marker});
  }
  return stations;
}

void CycleChart::rescale() {
  QRectF box;
  for (const QwtPlotCurve* c : {actual_, ideal_, actualClosure_, idealClosure_, baselineCurve_})
    if (c->dataSize() > 0) box = box.isNull() ? c->boundingRect() : box.united(c->boundingRect());
  if (box.isNull() || !box.isValid()) {
    if (box.width() <= 0 && box.height() <= 0) return;
  }
  double x0 = box.left(), x1 = box.right(), y0 = box.top(), y1 = box.bottom();
  if (logAxes_) {
    x0 = std::max(x0, 1e-12) / 1.25;
    x1 = x1 * 1.25;
    y0 = std::max(y0, 1e-12) / 1.25;
    y1 = y1 * 1.25;
  } else {
    const double dx = std::max(x1 - x0, 1e-9), dy = std::max(y1 - y0, 1e-9);
    x0 -= 0.06 * dx;
    x1 += 0.10 * dx;
    y0 -= 0.05 * dy;
    y1 += 0.08 * dy;
    if (kind_ == ChartKind::PressureVolume) {
      x0 = std::max(0.0, x0);
      y0 = std::max(0.0, y0);
    }
  }
  setAxisScale(QwtAxis::XBottom, x0, x1);
  setAxisScale(QwtAxis::YLeft, y0, y1);
  updateAxes();
  zoomer_->setZoomBase(false);
}

void CycleChart::updateStalePens() {
  const bool stale = isStale();
  const int alpha = stale ? 80 : 255;
  for (auto* c : {actual_, ideal_, actualClosure_, idealClosure_, highlight_, idealHighlight_}) {
    QPen pen = c->pen();
    QColor colour = pen.color();
    const int band = darkCanvas() ? 95 : 110;
    colour.setAlpha(c == highlight_ || c == idealHighlight_ ? (stale ? 40 : band) : alpha);
    pen.setColor(colour);
    c->setPen(pen);
  }
}

void CycleChart::setHighlightedComponent(const std::string& component) {
  if (component == highlighted_) return;
  highlighted_ = component;
  updateHighlight();
  retranslateUi();
  replot();
}

void CycleChart::updateHighlight() {
  highlight_->setVisible(false);
  idealHighlight_->setVisible(false);
  highlight_->setSamples(QVector<QPointF>());
  idealHighlight_->setSamples(QVector<QPointF>());
  // The legend names the selection only while there is one.
  highlight_->setItemAttribute(QwtPlotItem::Legend, !highlighted_.empty());
  if (!evaluation_ || highlighted_.empty()) return;
  const int a = componentPath(evaluation_->actual, highlighted_);
  const int i = componentPath(evaluation_->ideal, highlighted_);
  if (a >= 0) {
    highlight_->setData(new PathSeries(evaluation_, false, {a}, xValue(), yValue(), xScale(), yScale()));
    highlight_->setVisible(true);
  }
  if (i >= 0) {
    idealHighlight_->setData(new PathSeries(evaluation_, true, {i}, xValue(), yValue(), xScale(), yScale()));
    idealHighlight_->setVisible(true);
  }
}

void CycleChart::setLogAxes(bool on) {
  if (on == logAxes_) return;
  logAxes_ = on;
  for (auto axis : {QwtAxis::XBottom, QwtAxis::YLeft}) {
    if (on)
      setAxisScaleEngine(axis, new OneTwoFiveLogScaleEngine);
    else
      setAxisScaleEngine(axis, new QwtLinearScaleEngine);
  }
  rescale();
  zoomer_->setZoomBase(false);
  replot();
}

void CycleChart::resetZoom() {
  zoomer_->zoom(0);
  rescale();
  replot();
}

QString CycleChart::stationAt(const QPoint& position) const {
  // The numbered markers (the cycle with losses): its number names it also where the placer
  // had to leave the number out.
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom), yMap = canvasMap(QwtAxis::YLeft);
  for (const QwtPlotMarker* m : markers_) {
    if (m->label().isEmpty()) continue;
    const double dx = xMap.transform(m->xValue()) - position.x(),
                 dy = yMap.transform(m->yValue()) - position.y();
    if (dx * dx + dy * dy <= kStationPickPx * kStationPickPx)
      return tr("Station %1").arg(m->label().text()) + QLatin1Char('\n');
  }
  return {};
}

QString CycleChart::readoutAt(const QPoint& position) const {
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom);
  const QwtScaleMap yMap = canvasMap(QwtAxis::YLeft);
  const PathSeries* best = nullptr;
  size_t bestIndex = 0;
  double bestDistance = 30.0 * 30.0;  // pixels squared: a state must be this near to be read
  bool bestIdeal = false;
  for (const QwtPlotCurve* curve : {actual_, ideal_, actualClosure_, idealClosure_}) {
    const auto* series = dynamic_cast<const PathSeries*>(curve->data());
    if (!series) continue;
    for (size_t k = 0; k < series->size(); ++k) {
      const QPointF p = series->sample(k);
      const double dx = xMap.transform(p.x()) - position.x(), dy = yMap.transform(p.y()) - position.y();
      if (dx * dx + dy * dy < bestDistance) {
        bestDistance = dx * dx + dy * dy;
        best = series;
        bestIndex = k;
        bestIdeal = curve == ideal_ || curve == idealClosure_;
      }
    }
  }
  if (!best) {
    const double x = xMap.invTransform(position.x()), y = yMap.invTransform(position.y());
    const bool pv = kind_ == ChartKind::PressureVolume;
    return QStringLiteral("%1 = %2\n%3 = %4")
        .arg(pv ? QStringLiteral("v") : QStringLiteral("s"), units_.format(x * xScale(), xQuantity(), 4),
             pv                                    ? QStringLiteral("p")
             : kind_ == ChartKind::EnthalpyEntropy ? QStringLiteral("h − h(298.15 K)")
                                                   : QStringLiteral("T"),
             units_.format(y * yScale(), yQuantity(), 4));
  }
  const engine::PathState& s = best->state(bestIndex);
  const QString station = stationAt(position);
  const auto& cycle = bestIdeal ? evaluation_->ideal : evaluation_->actual;
  const auto& path = cycle.paths[static_cast<size_t>(best->pathOf(bestIndex))];
  const QString which = bestIdeal ? tr("Ideal") : tr("With losses");
  QString text =
      station + tr("%1, %2 (%3 → %4)\nT = %5   s = %6\np = %7   v = %8")
                    .arg(which, componentName(path.component), QString::fromStdString(path.fromStation),
                         QString::fromStdString(path.toStation),
                         units_.format(s.temperature, Quantity::Temperature, 5),
                         units_.format(s.entropy, Quantity::Entropy, 4),
                         units_.format(s.pressure, Quantity::Pressure, 5),
                         units_.format(s.specificVolume, Quantity::SpecificVolume, 4));
  if (kind_ == ChartKind::EnthalpyEntropy)
    text += QStringLiteral("\nh − h(298.15 K) = %1")
                .arg(units_.format(s.sensibleEnthalpy, Quantity::SpecificEnergy, 5));
  return text;
}

}  // namespace cw::gui
