#include "network/nozzle_element.h"

#include "engine/process_paths.h"

namespace cw::network {

void NozzleElement::design(DesignState& state) const {
  const StationState& in = state.at(entry());
  components::Nozzle::Result jet =
      within(name(), [&] { return nozzle_.expand(in.total, state.context.freeStream.pressure); });
  stream::Station throat = std::move(jet.throat), exit = std::move(jet.exit);
  throat.id = throat_;
  exit.id = this->exit();
  const double reference = state.context.entropyReference;
  throat.entropy = throat.gas->entropy(throat.staticTemperature, throat.staticPressure) - reference;
  exit.entropy = exit.gas->entropy(exit.staticTemperature, exit.staticPressure) - reference;
  state.summaries.push_back({name(), 0.0, jet.efficiency, entropyRate(in.station, exit)});
  state.nozzles.push_back({name(), throat_, this->exit(), jet.grossThrust, jet.choked});
  // The exit's total state: the stream's, adiabatic through the nozzle.
  stream::TotalState total = in.total;
  total.pressure = exit.totalPressure;
  state.put(std::move(throat), total);
  state.put(std::move(exit), total);
}

void NozzleElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()).station, &out = state.at(exit()).station;
  paths.push_back(engine::pressurePath(name(), entry(), exit(), *in.gas, in.totalTemperature,
                                       in.totalPressure, out.staticTemperature, out.staticPressure,
                                       state.context.entropyReference));
}

}  // namespace cw::network
