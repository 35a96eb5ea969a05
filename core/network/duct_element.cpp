#include "network/duct_element.h"

#include "engine/process_paths.h"

namespace cw::network {

void DuctElement::design(DesignState& state) const {
  stream::TotalState t = state.at(entry()).total;
  for (std::size_t k = 0; k + 1 < sections_.size(); ++k) {
    t = components::Duct(sections_[k].pressureLossFraction).exit(t);
    state.putAtRest(sections_[k].exit, t, /*reported=*/false);
  }
  t = components::Duct(sections_.back().pressureLossFraction).exit(t);
  stream::Station out = state.atRest(exit(), t);
  state.summaries.push_back({name(), 0.0, std::nullopt, entropyRate(state.at(entry()).station, out)});
  state.put(std::move(out), t);
}

void DuctElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()).station, &out = state.at(exit()).station;
  paths.push_back(engine::pressurePath(name(), entry(), exit(), *in.gas, in.totalTemperature,
                                       in.totalPressure, out.totalTemperature, out.totalPressure,
                                       state.context.entropyReference));
}

void DuctElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  std::string from = entry();
  for (const Section& s : sections_) {
    volumes.push_back({s.name, engine::ControlVolume::Kind::Adiabatic, from, s.exit, {}, 1.0});
    from = s.exit;
  }
}

}  // namespace cw::network
