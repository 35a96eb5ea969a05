#include "network/turbine_element.h"

#include "components/turbine.h"
#include "engine/process_paths.h"

namespace cw::network {

void TurbineElement::design(DesignState& state) const {
  const stream::Station& in = state.at(entry());
  const stream::TotalState inflow = state.totalAt(entry());
  engine::ShaftBalance& shaft = state.shaft(this->shaft());
  const components::Turbine turbine({efficiency_, shaft.mechanicalEfficiency, shaft.powerOfftake});
  const components::Turbine::Result expansion =
      within(name(), [&] { return turbine.exit(inflow, shaft.compressorPower); });
  shaft.turbinePower += expansion.power;
  stream::Station out = state.atRest(exit(), expansion.exit);
  state.summaries.push_back(
      {std::string(name()), -expansion.power, expansion.efficiency, entropyRate(in, out)});
  state.put(std::move(out));
}

void TurbineElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()), &out = state.at(exit());
  paths.push_back(engine::pressurePath(std::string(name()), std::string(entry()), std::string(exit()),
                                       *in.gas, in.totalTemperature, in.totalPressure, out.totalTemperature,
                                       out.totalPressure, state.context.entropyReference));
}

void TurbineElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  NetworkComponent::describe(volumes);
  volumes.push_back({std::string(shaft()), engine::ControlVolume::Kind::Shaft, {}, {}, std::string(shaft())});
}

}  // namespace cw::network
