#pragma once
// Adapters from the core's process paths to Qwt samples: they serve points straight from the
// shared evaluation (no copy of the states) in display units. No thermodynamics here.

#include "engine/cycle_result.h"

#include <qwt_series_data.h>

#include <QPointF>
#include <QRectF>

#include <memory>
#include <vector>

namespace cw::gui {

/// Which value of a path state an axis shows.
/// SensibleEnthalpy: h - h(298.15 K) at the state's composition, as the core gives it (the h-s chart's).
enum class StateValue { Temperature, Entropy, Pressure, SpecificVolume, Enthalpy, SensibleEnthalpy };

double stateValue(const engine::PathState& state, StateValue value);

/// The states of one or more consecutive paths of a cycle, as (x, y) points.
class PathSeries : public QwtSeriesData<QPointF> {
 public:
  /// paths: indices into cycle.paths, drawn in this order; xScale and yScale divide the SI
  /// values (display unit factors).
  PathSeries(std::shared_ptr<const engine::Evaluation> evaluation, bool ideal, std::vector<int> paths,
             StateValue x, StateValue y, double xScale, double yScale);

  size_t size() const override { return size_; }
  QPointF sample(size_t i) const override;
  QRectF boundingRect() const override { return bounds_; }

  /// The path state behind sample i.
  const engine::PathState& state(size_t i) const;
  /// The path (index into cycle.paths) behind sample i.
  int pathOf(size_t i) const;

 private:
  const engine::CycleResult& cycle() const { return ideal_ ? evaluation_->ideal : evaluation_->actual; }

  std::shared_ptr<const engine::Evaluation> evaluation_;
  bool ideal_;
  std::vector<int> paths_;
  std::vector<size_t> offsets_;  ///< first sample of each path
  size_t size_ = 0;
  StateValue x_, y_;
  double xScale_, yScale_;
  QRectF bounds_;
};

/// Indices of a cycle's paths: the open cycle (in flow order) or the closure.
std::vector<int> cyclePaths(const engine::CycleResult& cycle, bool closure);
/// Index of the path of a component ("compressor"), or -1.
int componentPath(const engine::CycleResult& cycle, const std::string& component);

/// A station's state for markers: the end state of the path that enters it (the start of the
/// inlet for station 0); station 8 lies on the nozzle path, placed at its static pressure by
/// interpolation in ln p between the path's states. False when the station has no state.
bool stationState(const engine::CycleResult& cycle, const engine::Station& station, engine::PathState& state);

}  // namespace cw::gui
