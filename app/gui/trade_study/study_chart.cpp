#include "trade_study/study_chart.h"

#include "charts/colours.h"
#include "charts/line_end_labels.h"
#include "charts/readout_picker.h"
#include "trade_study/study_names.h"

#include <qwt_legend.h>
#include <qwt_picker_machine.h>
#include <qwt_plot_canvas.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_grid.h>
#include <qwt_plot_legenditem.h>
#include <qwt_plot_marker.h>
#include <qwt_plot_picker.h>
#include <qwt_plot_textlabel.h>
#include <qwt_scale_map.h>
#include <qwt_symbol.h>
#include <qwt_text.h>

#include <QEvent>
#include <QLocale>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>

namespace cw::gui {

namespace {

using study::StudyPoint;
using study::TradeStudy;

const char* const kSpecificThrust = "specific_thrust_N_s_per_kg";
const char* const kTsfc = "tsfc_g_per_kN_s";

/// A value for a line's label: up to five significant digits, no trailing zeros, the locale's
/// decimal point, never NaN (the study's inputs are finite).
QString compactNumber(double shown) {
  QLocale locale;
  locale.setNumberOptions(QLocale::OmitGroupSeparator);
  if (!std::isfinite(shown)) return locale.toString(0);
  if (std::fabs(shown) < 1e-12) shown = 0.0;  // no "-0" or "1e-17" at a computed zero
  return locale.toString(shown, 'g', 5);
}

/// The order in which labels are placed: both ends first, then the middles of the gaps between
/// those placed, so that on a crowded chart the labels left are spread over the lines.
std::vector<int> spreadOrder(int n) {
  std::vector<int> order;
  if (n <= 0) return order;
  order.push_back(n - 1);
  if (n > 1) order.push_back(0);
  std::vector<std::pair<int, int>> gaps{{0, n - 1}};
  while (!gaps.empty()) {
    std::vector<std::pair<int, int>> next;
    for (const auto& [a, b] : gaps) {
      if (b - a < 2) continue;
      const int m = (a + b) / 2;
      order.push_back(m);
      next.emplace_back(a, m);
      next.emplace_back(m, b);
    }
    gaps = std::move(next);
  }
  return order;
}

/// The range an axis scales to: all the values, but no farther than half the span of the middle
/// nine tenths beyond it on either side, so that a few points at the edge of having a cycle
/// (thrust near zero, TSFC in the thousands) do not squeeze the rest into a corner.
std::pair<double, double> bulkRange(std::vector<double> values) {
  if (values.empty()) return {0.0, -1.0};
  std::sort(values.begin(), values.end());
  const auto at = [&](double q) {
    return values[static_cast<std::size_t>(q * double(values.size() - 1) + 0.5)];
  };
  const double q05 = at(0.05), q95 = at(0.95), reach = 0.5 * std::max(q95 - q05, 1e-12 * std::fabs(q95));
  return {std::max(values.front(), q05 - reach), std::min(values.back(), q95 + reach)};
}

QPen linePen(StudyChart::Family family, bool overlay, StudyOverlay kind, StudyPlot plot) {
  if (overlay) {
    const QColor colour = kind == StudyOverlay::IdealTwin ? kOkabeItoOrange : kOkabeItoReddishPurple;
    const bool second = family == StudyChart::Family::ConstantSecond && plot == StudyPlot::Carpet;
    return QPen(colour, second ? 1.3 : 1.8, second ? Qt::DashDotLine : Qt::DashLine);
  }
  if (family == StudyChart::Family::ConstantSecond && plot == StudyPlot::Carpet)
    return QPen(kOkabeItoGreen, 2.0, Qt::DotLine);
  return QPen(kOkabeItoBlue, 2.0, Qt::SolidLine);
}

}  // namespace

StudyChart::StudyChart(DisplayUnits& units, QWidget* parent)
    : ChartBase(parent), units_(units), columns_(study::everyStudyColumn()) {
  setObjectName("studyChart");
  setMinimumSize(240, 180);

  insertStudyLegend();
  legendItem_ = makeLegendItem(Qt::AlignTop | Qt::AlignHCenter, 2, 0.8);
  legendItem_->setMargin(2);
  legendItem_->setItemMargin(0);

  design_ = new QwtPlotMarker;
  design_->setZ(50);
  design_->setItemAttribute(QwtPlotItem::AutoScale, false);
  design_->setItemAttribute(QwtPlotItem::Legend, true);
  design_->setLegendIconSize(QSize(14, 14));
  design_->setLabelAlignment(Qt::AlignRight | Qt::AlignTop);
  design_->setSpacing(3);

  labels_ = new LineEndLabels;
  labels_->setLegend(legendItem_);
  labels_->attach(this);

  hintLabel_ = new QwtPlotTextLabel;
  hintLabel_->setZ(99);
  hintLabel_->attach(this);

  picker_ = new ReadoutPicker(this, [this](const QPoint& p) { return readoutAt(p); });

  applyPalette();
  retranslateUi();
  connect(&units_, &DisplayUnits::changed, this, [this] {
    retranslateUi();
    rebuild();
  });
  rebuild();
  finishConstruction();
}

StudyChart::~StudyChart() {
  clearLines();
  design_->detach();
  delete design_;
  if (!compact_) delete legendItem_;  // attached (and so deleted by the plot) only when compact
}

void StudyChart::insertStudyLegend() {
  insertOuterLegend(QwtPlot::BottomLegend, 2, 0.85)->setObjectName("studyLegend");
}

void StudyChart::setCompact(bool compact) {
  if (compact == compact_) return;
  compact_ = compact;
  if (compact_) {
    insertLegend(nullptr);
    legendItem_->attach(this);
  } else {
    legendItem_->detach();
    insertStudyLegend();
  }
  retranslateUi();
  rebuild();
}

void StudyChart::applyPalette() {
  const QColor ink = palette().color(QPalette::Text);
  design_->setSymbol(new QwtSymbol(QwtSymbol::Star2, QBrush(kOkabeItoYellow), QPen(ink, 1.2), QSize(15, 15)));
}

void StudyChart::refresh() {
  applyPalette();
  retranslateUi();
  rebuild();
}

const study::StudyColumn* StudyChart::columnNamed(const std::string& name) const {
  for (const auto& c : columns_)
    if (c.name == name) return &c;
  return nullptr;
}

Quantity StudyChart::xQuantity() const {
  return plot_ == StudyPlot::Carpet ? Quantity::Tsfc : axes_[0].quantity;
}

Quantity StudyChart::yQuantity() const {
  if (plot_ == StudyPlot::Carpet) return Quantity::SpecificThrust;
  const auto* c = columnNamed(column_);
  return c ? displayQuantity(c->quantity) : Quantity::Dimensionless;
}

QString StudyChart::legendName(int axis) const {
  // The short names (the legend also gives the step), unless they would not tell the two
  // inputs apart.
  const auto& a = axes_[static_cast<std::size_t>(axis)];
  const bool distinct = axes_[0].shortName != axes_[1].shortName;
  return distinct && !a.shortName.isEmpty() ? a.shortName : a.name;
}

QString StudyChart::overlayTitle() const {
  if (overlay_ == StudyOverlay::IdealTwin) return tr("Ideal twin, no losses (dashed)");
  return tr("With %1 (dashed)").arg(changedDescription_);
}

void StudyChart::retranslateUi() {
  const auto* c = columnNamed(column_);
  const QString title = plot_ == StudyPlot::Carpet
                            ? tr("Carpet: specific thrust against TSFC")
                            : tr("%1 against %2").arg(c ? studyColumnLabel(*c) : QString(), axes_[0].name);
  setTitle(compact_ ? QString() : title);  // compact: the panel's plot choice names it
  fitAxisTitles();
  setStaleText(tr("Stale: the case has changed since this study ran; press Run to redo it"));
  showStaleBanner();
  QwtText designLabel(tr("Design point"));
  QFont bold = font();
  bold.setBold(true);
  designLabel.setFont(bold);
  designLabel.setColor(palette().color(QPalette::Text));
  QColor background = palette().color(QPalette::Base);
  background.setAlpha(200);
  designLabel.setBackgroundBrush(background);
  design_->setLabel(designLabel);
  design_->setTitle(tr("Design point (the case as it is)"));
}

QStringList StudyChart::axisTitles(QwtAxisId axis) const {
  // Longest first; the unit alone last (for a quantity that has one).
  const bool x = axis == QwtAxis::XBottom;
  QStringList names;
  Quantity q = x ? xQuantity() : yQuantity();
  if (plot_ == StudyPlot::Carpet) {
    names = x ? QStringList{tr("TSFC")} : QStringList{tr("Specific thrust F_s"), tr("F_s")};
  } else if (x) {
    names << axes_[0].name;
    if (!axes_[0].shortName.isEmpty() && axes_[0].shortName != axes_[0].name) names << axes_[0].shortName;
  } else {
    const auto* c = columnNamed(column_);
    names << (c ? studyColumnLabel(*c) : QString());
  }
  QStringList titles;
  for (const QString& name : names) titles << units_.withUnit(name, q);
  if (q != Quantity::Dimensionless) titles << units_.withUnit(QString(), q).trimmed();
  return titles;
}

void StudyChart::fitAxisTitles(bool whole) {
  // The value axis first: its title's width sets the room left for the other.
  fitAxisTitle(QwtAxis::YLeft, axisTitles(QwtAxis::YLeft), whole);
  updateLayout();
  fitAxisTitle(QwtAxis::XBottom, axisTitles(QwtAxis::XBottom), whole);
}

void StudyChart::beginExport(const ExportOptions& options) {
  Q_UNUSED(options);
  fitAxisTitles(true);  // a figure has the room for the whole titles
}

void StudyChart::endExport() {
  fitAxisTitles();
}

void StudyChart::setStudy(std::shared_ptr<const study::TradeStudy> s, std::array<StudyAxisName, 2> axes,
                          bool stale) {
  study_ = std::move(s);
  axes_ = std::move(axes);
  assignStale(stale);
  if (study_ && study_->axes.size() < 2 && plot_ == StudyPlot::Carpet) plot_ = StudyPlot::Output;
  retranslateUi();
  rebuild();
}

void StudyChart::setOverlay(StudyOverlay overlay, std::shared_ptr<const study::TradeStudy> changed,
                            const QString& description) {
  overlay_ = overlay;
  changed_ = std::move(changed);
  changedDescription_ = description;
  rebuild();
}

void StudyChart::setPlot(StudyPlot plot, const std::string& column) {
  plot_ = plot;
  if (!column.empty() && columnNamed(column)) column_ = column;
  retranslateUi();
  rebuild();
}

int StudyChart::lineCount(Family family, bool overlay) const {
  return static_cast<int>(std::count_if(lines_.begin(), lines_.end(), [&](const Line& l) {
    return l.family == family && l.overlay == overlay;
  }));
}

const QwtPlotMarker* StudyChart::designMarker() const {
  return designShown_ ? design_ : nullptr;
}

void StudyChart::clearLines() {
  for (Line& line : lines_)
    for (QwtPlotCurve* curve : line.curves) {
      curve->detach();
      delete curve;
    }
  lines_.clear();
}

void StudyChart::addLines(const TradeStudy& s, bool overlay, const std::string& xColumn,
                          const std::string& yColumn) {
  const study::StudyColumn* xc = xColumn.empty() ? nullptr : columnNamed(xColumn);
  const study::StudyColumn* yc = columnNamed(yColumn);
  if (!yc || (!xColumn.empty() && !xc) || s.axes.empty()) return;
  const int n0 = s.axes[0].count;
  const int n1 = s.axes.size() > 1 ? s.axes[1].count : 1;
  if (static_cast<long>(s.points.size()) != static_cast<long>(n0) * n1) return;
  // Only points that have a cycle (with losses) are drawn and scaled to: a failed point, or an
  // overlay's point where the study itself has no cycle, leaves a gap.
  auto figures = [&](const StudyPoint& p) -> std::optional<QPointF> {
    if (!p.solved()) return std::nullopt;
    const std::size_t index = static_cast<std::size_t>(&p - s.points.data());
    if (overlay && study_ && index < study_->points.size() && !study_->points[index].solved())
      return std::nullopt;
    const std::optional<double> x = xc ? xc->value(p) : std::optional<double>(p.inputs[0]);
    const std::optional<double> y = yc->value(p);
    if (!x || !y || !std::isfinite(*x) || !std::isfinite(*y)) return std::nullopt;
    return QPointF(*x, *y);
  };
  // One line through the points (i, j) = at(k) for k along the line, split at the gaps.
  auto line = [&](Family family, double value, int count, auto at) {
    Line l;
    l.family = family;
    l.overlay = overlay;
    l.value = value;
    std::vector<QPointF> run;
    for (int k = 0; k < count; ++k) {
      if (const auto xy = figures(at(k))) {
        run.push_back(*xy);
      } else if (!run.empty()) {
        l.segments.push_back(std::move(run));
        run.clear();
      }
    }
    if (!run.empty()) l.segments.push_back(std::move(run));
    lines_.push_back(std::move(l));
  };
  if (s.axes.size() == 1) {
    line(Family::Sweep, 0.0, n0, [&](int i) -> const StudyPoint& { return s.at(i); });
    return;
  }
  const std::vector<double> first = s.axes[0].values(), second = s.axes[1].values();
  if (plot_ == StudyPlot::Carpet)
    for (int i = 0; i < n0; ++i)
      line(Family::ConstantFirst, first[static_cast<std::size_t>(i)], n1,
           [&](int j) -> const StudyPoint& { return s.at(i, j); });
  for (int j = 0; j < n1; ++j)
    line(Family::ConstantSecond, second[static_cast<std::size_t>(j)], n0,
         [&](int i) -> const StudyPoint& { return s.at(i, j); });
}

void StudyChart::rebuild() {
  clearLines();
  overlayNote_.clear();
  designShown_ = false;
  design_->detach();
  collectLines();
  DrawnPoints drawn;
  const int legendGroups = attachCurves(drawn);
  std::vector<LineEndLabels::Obstacle> obstacles;
  showDesignPoint(drawn, obstacles);
  updateLineLabels(std::move(obstacles));
  fitBounds(drawn, legendGroups);
  rescale();
  showHint();
  showStaleBanner();
  replot();
}

std::string StudyChart::xColumn() const {
  return plot_ == StudyPlot::Carpet ? kTsfc : std::string();
}

std::string StudyChart::yColumn() const {
  return plot_ == StudyPlot::Carpet ? kSpecificThrust : column_;
}

void StudyChart::collectLines() {
  if (!study_) return;
  const bool carpet = plot_ == StudyPlot::Carpet;
  addLines(*study_, false, xColumn(), yColumn());
  if (overlay_ == StudyOverlay::IdealTwin) {
    const bool hasIdeal = carpet || (column_.rfind("ideal.", 0) != 0 && column_.rfind("audit.", 0) != 0 &&
                                     columnNamed("ideal." + column_));
    if (hasIdeal)
      addLines(*study_, true, carpet ? "ideal." + xColumn() : std::string(), "ideal." + yColumn());
    else
      overlayNote_ = tr("The ideal twin has no figure of its own for this output.");
  } else if (overlay_ == StudyOverlay::OneInputChanged) {
    if (changed_ && changed_->axes == study_->axes)
      addLines(*changed_, true, xColumn(), yColumn());
    else
      overlayNote_ = tr("Press Run to compute the comparison.");
  }
}

QString StudyChart::legendTitle(const Line& line) const {
  if (line.overlay) return overlayTitle();
  if (line.family == Family::Sweep) return tr("Cycle with losses");
  const int axis = line.family == Family::ConstantFirst ? 0 : 1;
  const QString name = tr("Constant %1").arg(legendName(axis));
  // The step between the lines, which tells the unlabelled ones of a dense family.
  if (!study_ || static_cast<int>(study_->axes.size()) <= axis) return name;
  const study::SweepAxis& a = study_->axes[static_cast<std::size_t>(axis)];
  if (a.count < 3) return name;
  const Quantity q = axes_[static_cast<std::size_t>(axis)].quantity;
  const QString step = compactNumber(units_.toDisplay(std::fabs(a.stop - a.start) / (a.count - 1), q));
  return tr("%1, step %2")
      .arg(name, q == Quantity::Dimensionless ? step : step + QLatin1Char(' ') + units_.symbol(q));
}

QwtPlotCurve* StudyChart::makeCurve(const Line& line, const QVector<QPointF>& shown, bool inLegend) const {
  const QPen pen = linePen(line.family, line.overlay, overlay_, plot_);
  auto* curve = new QwtPlotCurve;
  curve->setPen(pen);
  curve->setRenderHint(QwtPlotItem::RenderAntialiased, true);
  curve->setLegendAttribute(QwtPlotCurve::LegendShowLine, true);
  curve->setLegendIconSize(QSize(28, 10));
  curve->setZ(line.overlay ? 18 : 20);
  // A sweep's points, and any point standing alone between gaps, get a dot of their own.
  if (line.family == Family::Sweep || shown.size() == 1)
    curve->setSymbol(new QwtSymbol(QwtSymbol::Ellipse, QBrush(pen.color()), QPen(pen.color()), QSize(5, 5)));
  curve->setSamples(shown);
  curve->setItemAttribute(QwtPlotItem::Legend, inLegend);
  if (inLegend) curve->setTitle(legendTitle(line));
  return curve;
}

int StudyChart::attachCurves(DrawnPoints& drawn) {
  // One curve per segment; the legend shows each group (family, overlay) once.
  const double xf = units_.factor(xQuantity()), yf = units_.factor(yQuantity());
  std::vector<std::pair<Family, bool>> inLegend;
  for (Line& l : lines_) {
    for (const auto& segment : l.segments) {
      QVector<QPointF> shown;
      shown.reserve(static_cast<qsizetype>(segment.size()));
      for (const QPointF& q : segment) {
        shown.push_back(QPointF(q.x() / xf, q.y() / yf));
        drawn.xs.push_back(shown.back().x());
        drawn.ys.push_back(shown.back().y());
      }
      const std::pair<Family, bool> group{l.overlay ? Family::Sweep : l.family, l.overlay};
      const bool first = std::find(inLegend.begin(), inLegend.end(), group) == inLegend.end();
      if (first) inLegend.push_back(group);
      QwtPlotCurve* curve = makeCurve(l, shown, first);
      curve->attach(this);
      l.curves.push_back(curve);
    }
  }
  return static_cast<int>(inLegend.size());
}

void StudyChart::showDesignPoint(DrawnPoints& drawn, std::vector<LineEndLabels::Obstacle>& obstacles) {
  // The case as it is, where the study knows its inputs.
  if (!study_) return;
  const StudyPoint& d = study_->designPoint;
  bool known = d.solved();
  for (std::size_t k = 0; k < study_->axes.size() && k < 2; ++k)
    known = known && study_->designPointOnAxis[k];
  const bool carpet = plot_ == StudyPlot::Carpet;
  const auto* xc = carpet ? columnNamed(xColumn()) : nullptr;
  const auto* yc = columnNamed(yColumn());
  if (!known || !yc) return;
  std::optional<double> x(d.inputs[0]);
  if (carpet) x = xc ? xc->value(d) : std::nullopt;
  const std::optional<double> y = yc->value(d);
  if (!x || !y || !std::isfinite(*x) || !std::isfinite(*y)) return;
  const double xf = units_.factor(xQuantity()), yf = units_.factor(yQuantity());
  design_->setValue(*x / xf, *y / yf);
  design_->setItemAttribute(QwtPlotItem::Legend, !compact_);  // compact: its label says it
  design_->attach(this);
  designShown_ = true;
  drawn.xs.push_back(*x / xf);
  drawn.ys.push_back(*y / yf);
  // Its symbol and label (right of and above it), to be kept clear.
  const QSizeF label = design_->label().textSize(font());
  obstacles.push_back({design_->value(), QSizeF(17, 17), {}});
  obstacles.push_back({design_->value(), label + QSizeF(4, 4),
                       QPointF(8.5 + 3 + label.width() / 2, -(8.5 + 3 + label.height() / 2))});
}

std::vector<StudyChart::Line*> StudyChart::labelOrder() {
  // Both families take turns, so that neither takes every place at a corner they share; the
  // overlay's lines (the ideal twin, the comparison) after the lines with losses, so that on a
  // crowded chart theirs are the labels left out. Within a family, spread (spreadOrder).
  std::vector<Line*> turns;
  for (const bool overlay : {false, true}) {
    std::array<std::vector<Line*>, 2> groups;
    for (Line& l : lines_)
      if (l.overlay == overlay) groups[l.family == Family::ConstantFirst ? 0 : 1].push_back(&l);
    std::array<std::vector<int>, 2> orders{spreadOrder(static_cast<int>(groups[0].size())),
                                           spreadOrder(static_cast<int>(groups[1].size()))};
    for (std::size_t k = 0; k < std::max(orders[0].size(), orders[1].size()); ++k)
      for (std::size_t g = 0; g < 2; ++g)
        if (k < orders[g].size()) turns.push_back(groups[g][static_cast<std::size_t>(orders[g][k])]);
  }
  return turns;
}

QString StudyChart::lineLabelText(const Line& line) const {
  if (line.family == Family::Sweep) {
    // One curve each: named at its end, as the legend names it.
    return !line.overlay                         ? tr("with losses")
           : overlay_ == StudyOverlay::IdealTwin ? tr("ideal twin")
                                                 : tr("comparison");
  }
  const int axis = line.family == Family::ConstantFirst ? 0 : 1;
  const Quantity q = axes_[static_cast<std::size_t>(axis)].quantity;
  const QString unit = q == Quantity::Dimensionless ? QString() : units_.symbol(q);
  const QString number = compactNumber(units_.toDisplay(line.value, q));
  return unit.isEmpty() ? number : number + QLatin1Char(' ') + unit;
}

LineEndLabels::Label StudyChart::endLabel(const Line& line) const {
  QFont labelFont = font();
  labelFont.setPointSizeF(labelFont.pointSizeF() * 0.85);
  QColor colour = linePen(line.family, line.overlay, overlay_, plot_).color();
  if (darkCanvas()) colour = colour.lighter(150);
  LineEndLabels::Label label;
  label.text = QwtText(line.label);
  label.text.setFont(labelFont);
  label.text.setColor(colour);
  QColor background = palette().color(QPalette::Base);
  background.setAlpha(190);
  label.text.setBackgroundBrush(background);
  const double xf = units_.factor(xQuantity()), yf = units_.factor(yQuantity());
  const auto& last = line.segments.back();
  for (auto it = last.rbegin(); it != last.rend(); ++it)
    label.anchors.push_back(QPointF(it->x() / xf, it->y() / yf));
  for (const QPointF& q : line.segments.front())
    label.startAnchors.push_back(QPointF(q.x() / xf, q.y() / yf));
  // Its family (per overlay) and its place in it; lines_ holds each family in grid order.
  const int family = static_cast<int>(line.family);
  label.group = family + (line.overlay ? 3 : 0);
  label.id = static_cast<int>(&line - lines_.data());
  label.groupSize = 0;
  for (const Line& l : lines_)
    if (l.family == line.family && l.overlay == line.overlay) {
      if (&l == &line) label.rank = label.groupSize;
      ++label.groupSize;
    }
  return label;
}

void StudyChart::updateLineLabels(std::vector<LineEndLabels::Obstacle> obstacles) {
  // A carpet's lines both ways, an output's curves per second input; spread first.
  std::vector<LineEndLabels::Label> labels;
  for (Line* line : labelOrder()) {
    line->label = lineLabelText(*line);
    if (!line->segments.empty()) labels.push_back(endLabel(*line));
  }
  labels_->setLabels(std::move(labels));
  labels_->setObstacles(std::move(obstacles));
  std::vector<const QwtPlotCurve*> curves;
  for (const Line& l : lines_) curves.insert(curves.end(), l.curves.begin(), l.curves.end());
  labels_->setCurves(std::move(curves));
}

void StudyChart::fitBounds(const DrawnPoints& drawn, int legendGroups) {
  const auto [x0, x1] = bulkRange(drawn.xs);
  const auto [y0, y1] = bulkRange(drawn.ys);
  hasBounds_ = !drawn.xs.empty() && x0 <= x1;
  if (hasBounds_) bounds_ = QRectF(QPointF(x0, y0), QPointF(x1, y1));
  legendEntries_ = legendGroups + (designShown_ && !compact_ ? 1 : 0);
}

void StudyChart::showHint() {
  // A hint on an empty chart.
  QString hint;
  if (!study_)
    hint = tr("No study yet: choose the inputs to vary and press Run.");
  else if (std::all_of(lines_.begin(), lines_.end(),
                       [](const Line& l) { return l.overlay || l.segments.empty(); }))
    hint = tr("No point of this study has this figure.");
  QwtText hintText(hint);
  hintText.setColor(between(0.7));
  hintText.setRenderFlags(Qt::AlignCenter | Qt::TextWordWrap);
  hintLabel_->setText(hintText);
  hintLabel_->setVisible(!hint.isEmpty());
}

void StudyChart::rescale() {
  // The figures with a margin, wider on the right for the end labels.
  double x0 = 0.0, x1 = 1.0, y0 = 0.0, y1 = 1.0;
  if (hasBounds_) {
    x0 = bounds_.left();
    x1 = bounds_.right();
    y0 = bounds_.top();
    y1 = bounds_.bottom();
  }
  const double dx = std::max(x1 - x0, 1e-6 * std::max(1.0, std::fabs(x1)));
  const double dy = std::max(y1 - y0, 1e-6 * std::max(1.0, std::fabs(y1)));
  // Compact: a band on top for the legend inside the canvas, its rows' share of the canvas:
  // with the data's span dy and margins of 0.07 dy below and `top` dy above, the band takes
  // top / (1.07 + top) of the height.
  double top = 0.1;
  if (compact_ && legendEntries_ > 0) {
    const double band = ((legendEntries_ + 1) / 2) * (QFontMetrics(legendItem_->font()).height() + 3) + 10;
    const double share = std::min(0.6, band / std::max(60.0, double(canvas()->height())));
    top = 0.1 + 1.17 * share / (1.0 - share);
  }
  setAxisScale(QwtAxis::XBottom, x0 - 0.05 * dx, x1 + 0.14 * dx);
  setAxisScale(QwtAxis::YLeft, y0 - 0.07 * dy, y1 + top * dy);
}

void StudyChart::resizeEvent(QResizeEvent* event) {
  QwtPlot::resizeEvent(event);
  fitAxisTitles();
  if (compact_) {
    rescale();
    replot();
  }
}

QString StudyChart::readoutAt(const QPoint& position) const {
  if (!study_) return {};
  const bool carpet = plot_ == StudyPlot::Carpet;
  const auto* xc = carpet ? columnNamed(kTsfc) : nullptr;
  const auto* yc = columnNamed(carpet ? kSpecificThrust : column_);
  if (!yc) return {};
  const double xf = units_.factor(xQuantity()), yf = units_.factor(yQuantity());
  const QwtScaleMap xMap = canvasMap(QwtAxis::XBottom), yMap = canvasMap(QwtAxis::YLeft);
  const StudyPoint* nearest = nullptr;
  double best = 12.0;  // [px]
  for (const StudyPoint& p : study_->points) {
    const std::optional<double> y = yc->value(p);
    double x = p.inputs[0];
    if (carpet) {
      const std::optional<double> tsfc = xc->value(p);
      if (!tsfc) continue;
      x = *tsfc;
    }
    if (!y) continue;
    const double d =
        std::hypot(xMap.transform(x / xf) - position.x(), yMap.transform(*y / yf) - position.y());
    if (d < best) {
      best = d;
      nearest = &p;
    }
  }
  if (!nearest) return {};
  QStringList lines;
  for (std::size_t k = 0; k < study_->axes.size() && k < 2; ++k)
    lines << QStringLiteral("%1 = %2").arg(axes_[k].name,
                                           units_.format(nearest->inputs[k], axes_[k].quantity, 5));
  const auto* fs = columnNamed(kSpecificThrust);
  const auto* tsfc = columnNamed(kTsfc);
  if (const auto v = fs->value(*nearest))
    lines << QStringLiteral("%1 = %2").arg(tr("Specific thrust F_s"),
                                           units_.format(*v, Quantity::SpecificThrust, 5));
  if (const auto v = tsfc->value(*nearest))
    lines << QStringLiteral("%1 = %2").arg(tr("TSFC"), units_.format(*v, Quantity::Tsfc, 5));
  if (!carpet && yc != fs && yc != tsfc)
    if (const auto v = yc->value(*nearest))
      lines << QStringLiteral("%1 = %2").arg(studyColumnLabel(*yc), units_.format(*v, yQuantity(), 5));
  return lines.join(QLatin1Char('\n'));
}

}  // namespace cw::gui
