#include "network/compressor_element.h"

#include "engine/process_paths.h"

namespace cw::network {

void CompressorElement::design(DesignState& state) const {
  const stream::Station& in = state.at(entry());
  const stream::TotalState inflow = state.totalAt(entry());
  const components::Compressor::Result compression = within(name(), [&] { return compressor_.exit(inflow); });
  stream::Station out = state.atRest(exit(), compression.exit);
  state.shaft(shaft()).compressorPower += compression.power;
  state.summaries.push_back({std::string(name()), compression.power, compression.efficiency,
                             in.massFlow * (out.entropy - in.entropy)});
  state.put(std::move(out));
}

void CompressorElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()), &out = state.at(exit());
  paths.push_back(engine::pressurePath(std::string(name()), std::string(entry()), std::string(exit()),
                                       *in.gas, in.totalTemperature, in.totalPressure, out.totalTemperature,
                                       out.totalPressure, state.context.entropyReference));
}

void CompressorElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  volumes.push_back({std::string(name()),
                     engine::ControlVolume::Kind::Bleeding,
                     std::string(entry()),
                     std::string(exit()),
                     {}});
}

}  // namespace cw::network
