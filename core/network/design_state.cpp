#include "network/design_state.h"

#include <stdexcept>

namespace cw::network {

const StationState& DesignState::at(const std::string& id) const {
  for (const StationState& s : stations)
    if (s.station.id == id) return s;
  throw std::out_of_range("station " + id + " is not reached before it is needed");
}

void DesignState::put(stream::Station station, const stream::TotalState& total, bool reported) {
  stations.push_back({std::move(station), total, reported});
}

stream::Station DesignState::atRest(const std::string& id, const stream::TotalState& t) const {
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

void DesignState::putAtRest(const std::string& id, const stream::TotalState& total, bool reported) {
  put(atRest(id, total), total, reported);
}

engine::ShaftBalance& DesignState::shaft(const std::string& name) {
  for (engine::ShaftBalance& s : shafts)
    if (s.name == name) return s;
  throw std::out_of_range("no shaft " + name + " in this network");
}

double entropyRate(const stream::Station& in, const stream::Station& out) {
  return out.massFlow * (out.entropy - in.entropy);
}

}  // namespace cw::network
