#include "network/compressor_element.h"

#include "engine/process_paths.h"

namespace cw::network {

void CompressorElement::design(DesignState& state) const {
  const StationState& in = state.at(entry());
  const components::Compressor::Result compression =
      within(name(), [&] { return compressor_.exit(in.total); });
  stream::Station out = state.atRest(exit(), compression.exit);
  state.shaft(shaft()).compressorPower += compression.power;
  state.summaries.push_back({name(), compression.power, compression.efficiency,
                             in.station.massFlow * (out.entropy - in.station.entropy)});
  state.put(std::move(out), compression.exit);
}

void CompressorElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()).station, &out = state.at(exit()).station;
  paths.push_back(engine::pressurePath(name(), entry(), exit(), *in.gas, in.totalTemperature,
                                       in.totalPressure, out.totalTemperature, out.totalPressure,
                                       state.context.entropyReference));
}

void CompressorElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  volumes.push_back({name(), engine::ControlVolume::Kind::Bleeding, entry(), exit(), {}, 1.0});
}

}  // namespace cw::network
