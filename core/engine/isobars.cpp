#include "engine/isobars.h"

#include <algorithm>
#include <cmath>

namespace cw::engine {

namespace {

bool among(const std::vector<std::string>& ids, const std::string& id) {
  return std::find(ids.begin(), ids.end(), id) != ids.end();
}

}  // namespace

std::vector<Isobar> stationIsobars(const CycleResult& cycle, double tLow, double tHigh, int samples) {
  std::vector<Isobar> out;
  if (!cycle.network) return out;
  const NetworkDescription& network = *cycle.network;
  for (const auto& station : cycle.stations) {
    if (!station.gas || among(network.throats, station.id)) continue;
    const bool statics = among(network.staticStations, station.id);
    const double p = statics ? station.staticPressure : station.totalPressure;
    const double t = statics ? station.staticTemperature : station.totalTemperature;
    if (!(p > 0.0)) continue;
    const bool seen = std::any_of(out.begin(), out.end(),
                                  [p](const Isobar& i) { return std::fabs(i.pressure - p) <= 0.01 * p; });
    if (seen) continue;
    try {
      const thermo::Gas& gas = *station.gas;
      const double offset = station.entropy - gas.entropy(t, p);
      const double lo = std::max(tLow, gas.minimumTemperature());
      const double hi = std::min(tHigh, gas.maximumTemperature());
      if (!(hi > lo)) continue;
      Isobar isobar{station.id, p, {}};
      for (int k = 0; k < samples; ++k) {
        const double tk = lo + (hi - lo) * k / (samples - 1);
        PathState s;
        s.temperature = tk;
        s.pressure = p;
        s.entropy = gas.entropy(tk, p) + offset;
        s.specificVolume = gas.gasConstant() * tk / p;
        s.enthalpy = gas.enthalpy(tk);
        s.sensibleEnthalpy = gas.sensibleEnthalpy(tk);
        isobar.states.push_back(s);
      }
      out.push_back(std::move(isobar));
    } catch (const std::exception&) {
      // A gas whose data do not cover the range draws no isobar.
    }
  }
  return out;
}

}  // namespace cw::engine
