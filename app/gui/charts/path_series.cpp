#include "charts/path_series.h"

#include <qwt_series_data.h>

#include <algorithm>
#include <cmath>

namespace cw::gui {

double stateValue(const engine::PathState& s, StateValue value) {
  switch (value) {
    case StateValue::Temperature:
      return s.temperature;
    case StateValue::Entropy:
      return s.entropy;
    case StateValue::Pressure:
      return s.pressure;
    case StateValue::SpecificVolume:
      return s.specificVolume;
    case StateValue::Enthalpy:
      return s.enthalpy;
    case StateValue::SensibleEnthalpy:
      return s.sensibleEnthalpy;
  }
  return 0.0;
}

PathSeries::PathSeries(std::shared_ptr<const engine::Evaluation> evaluation, bool ideal,
                       std::vector<int> paths, StateValue x, StateValue y, double xScale, double yScale)
    : evaluation_(std::move(evaluation)),
      ideal_(ideal),
      paths_(std::move(paths)),
      x_(x),
      y_(y),
      xScale_(xScale),
      yScale_(yScale) {
  if (!evaluation_) paths_.clear();
  for (int p : paths_) {
    offsets_.push_back(size_);
    size_ += cycle().paths[static_cast<size_t>(p)].states.size();
  }
  bounds_ = size_ > 0 ? qwtBoundingRect(*this) : QRectF(1.0, 1.0, -2.0, -2.0);
}

QPointF PathSeries::sample(size_t i) const {
  const engine::PathState& s = state(i);
  return {stateValue(s, x_) / xScale_, stateValue(s, y_) / yScale_};
}

int PathSeries::pathOf(size_t i) const {
  const auto it = std::upper_bound(offsets_.begin(), offsets_.end(), i);
  return paths_[static_cast<size_t>(it - offsets_.begin() - 1)];
}

const engine::PathState& PathSeries::state(size_t i) const {
  const auto it = std::upper_bound(offsets_.begin(), offsets_.end(), i);
  const auto k = static_cast<size_t>(it - offsets_.begin() - 1);
  return cycle().paths[static_cast<size_t>(paths_[k])].states[i - offsets_[k]];
}

std::vector<int> cyclePaths(const engine::CycleResult& cycle, bool closure) {
  std::vector<int> out;
  for (size_t i = 0; i < cycle.paths.size(); ++i)
    if (cycle.paths[i].closure == closure && !cycle.paths[i].states.empty())
      out.push_back(static_cast<int>(i));
  return out;
}

int componentPath(const engine::CycleResult& cycle, const std::string& component) {
  for (size_t i = 0; i < cycle.paths.size(); ++i)
    if (cycle.paths[i].component == component && !cycle.paths[i].states.empty()) return static_cast<int>(i);
  return -1;
}

bool stationState(const engine::CycleResult& cycle, const engine::Station& station,
                  engine::PathState& state) {
  for (const auto& path : cycle.paths) {
    if (path.closure || path.states.empty()) continue;
    if (path.toStation == station.id) {
      state = path.states.back();
      return true;
    }
  }
  for (const auto& path : cycle.paths) {
    if (path.closure || path.states.empty()) continue;
    if (path.fromStation == station.id) {
      state = path.states.front();
      return true;
    }
  }
  // A station inside a path (the throat inside the nozzle's 7 -> 9 path).
  for (const auto& path : cycle.paths) {
    if (path.closure || path.states.size() < 2) continue;
    const double target = station.staticPressure;
    for (size_t i = 1; i < path.states.size(); ++i) {
      const auto& a = path.states[i - 1];
      const auto& b = path.states[i];
      const double lo = std::min(a.pressure, b.pressure), hi = std::max(a.pressure, b.pressure);
      if (path.component != "nozzle" || target < lo || target > hi || a.pressure <= 0 || b.pressure <= 0)
        continue;
      const double t = hi > lo ? std::log(target / a.pressure) / std::log(b.pressure / a.pressure) : 0.0;
      auto mix = [t](double x, double y) { return x + (y - x) * t; };
      state.temperature = mix(a.temperature, b.temperature);
      state.entropy = mix(a.entropy, b.entropy);
      state.pressure = target;
      state.specificVolume = a.specificVolume * std::pow(b.specificVolume / a.specificVolume, t);
      state.enthalpy = mix(a.enthalpy, b.enthalpy);
      state.sensibleEnthalpy = mix(a.sensibleEnthalpy, b.sensibleEnthalpy);
      return true;
    }
  }
  return false;
}

}  // namespace cw::gui
