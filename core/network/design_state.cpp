#include "network/design_state.h"

#include <algorithm>
#include <stdexcept>

namespace cw::network {

namespace {

/// Station ids are a few characters: compared in line.
bool sameId(const std::string& a, std::string_view b) {
  if (a.size() != b.size()) return false;
  for (std::size_t k = 0; k < b.size(); ++k)
    if (a[k] != b[k]) return false;
  return true;
}

}  // namespace

const stream::Station& DesignState::at(std::string_view id) const {
  // Newest first: a component's entry is mostly the station reached last.
  for (auto s = stations.rbegin(); s != stations.rend(); ++s)
    if (sameId(s->id, id)) return *s;
  for (const stream::Station& s : internalStations)
    if (sameId(s.id, id)) return s;
  throw std::out_of_range("station " + std::string(id) + " is not reached before it is needed");
}

stream::TotalState DesignState::totalAt(std::string_view id) const {
  const stream::Station& s = at(id);
  return {s.gas, s.totalTemperature, s.totalPressure, s.totalEnthalpy, s.massFlow, s.fuelAirRatio};
}

void DesignState::put(stream::Station station, bool reported) {
  (reported ? stations : internalStations).push_back(std::move(station));
}

stream::Station DesignState::atRest(std::string_view id, const stream::TotalState& t) const {
  stream::Station s;
  s.id = id;
  s.gas = t.gas;
  s.totalTemperature = s.staticTemperature = t.temperature;
  s.totalPressure = s.staticPressure = t.pressure;
  s.totalEnthalpy = t.enthalpy;
  s.massFlow = t.massFlow;
  s.fuelAirRatio = t.fuelAirRatio;
  s.entropy = t.gas->entropy(t.temperature, t.pressure) - context.entropyReference;
  return s;
}

void DesignState::putAtRest(std::string_view id, const stream::TotalState& total, bool reported) {
  put(atRest(id, total), reported);
}

engine::ShaftBalance& DesignState::shaft(std::string_view name) {
  for (engine::ShaftBalance& s : shafts)
    if (s.name == name) return s;
  throw std::out_of_range("no shaft " + std::string(name) + " in this network");
}

double entropyRate(const stream::Station& in, const stream::Station& out) {
  return out.massFlow * (out.entropy - in.entropy);
}

}  // namespace cw::network
