#include "network/turbine_element.h"

#include "components/turbine.h"
#include "engine/process_paths.h"

namespace cw::network {

void TurbineElement::design(DesignState& state) const {
  const StationState& in = state.at(entry());
  engine::ShaftBalance& shaft = state.shaft(this->shaft());
  const components::Turbine turbine({efficiency_, shaft.mechanicalEfficiency, shaft.powerOfftake});
  const components::Turbine::Result expansion =
      within(name(), [&] { return turbine.exit(in.total, shaft.compressorPower); });
  shaft.turbinePower += expansion.power;
  stream::Station out = state.atRest(exit(), expansion.exit);
  state.summaries.push_back({name(), -expansion.power, expansion.efficiency, entropyRate(in.station, out)});
  state.put(std::move(out), expansion.exit);
}

void TurbineElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()).station, &out = state.at(exit()).station;
  paths.push_back(engine::pressurePath(name(), entry(), exit(), *in.gas, in.totalTemperature,
                                       in.totalPressure, out.totalTemperature, out.totalPressure,
                                       state.context.entropyReference));
}

void TurbineElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  NetworkComponent::describe(volumes);
  volumes.push_back({shaft(), engine::ControlVolume::Kind::Shaft, {}, {}, shaft(), 1.0});
}

}  // namespace cw::network
