#include "network/nozzle_element.h"

#include "engine/process_paths.h"

namespace cw::network {

void NozzleElement::design(DesignState& state) const {
  const stream::Station& in = state.at(entry());
  const stream::TotalState inflow = state.totalAt(entry());
  components::Nozzle::Result jet =
      within(name(), [&] { return nozzle_.expand(inflow, state.context.freeStream.pressure); });
  stream::Station throat = std::move(jet.throat), exit = std::move(jet.exit);
  throat.id = throat_;
  exit.id = this->exit();
  const double reference = state.context.entropyReference;
  throat.entropy = throat.gas->entropy(throat.staticTemperature, throat.staticPressure) - reference;
  exit.entropy = exit.gas->entropy(exit.staticTemperature, exit.staticPressure) - reference;
  state.summaries.push_back({std::string(name()), 0.0, jet.efficiency, entropyRate(in, exit)});
  state.nozzles.push_back({name(), throat_, this->exit(), jet.grossThrust, jet.choked, exit.massFlow,
                           exit.velocity, *throat.area, *exit.area});
  state.put(std::move(throat));
  state.put(std::move(exit));
}

void NozzleElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()), &out = state.at(exit());
  paths.push_back(engine::pressurePath(std::string(name()), std::string(entry()), std::string(exit()),
                                       *in.gas, in.totalTemperature, in.totalPressure, out.staticTemperature,
                                       out.staticPressure, state.context.entropyReference));
}

}  // namespace cw::network
