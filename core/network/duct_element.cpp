#include "network/duct_element.h"

#include "engine/process_paths.h"

namespace cw::network {

void DuctElement::design(DesignState& state) const {
  stream::TotalState t = state.totalAt(entry());
  for (std::size_t k = 0; k + 1 < sectionCount_; ++k) {
    t = components::Duct(sections_[k].pressureLossFraction).exit(t);
    state.putAtRest(sections_[k].exit, t, /*reported=*/false);
  }
  t = components::Duct(sections_[sectionCount_ - 1].pressureLossFraction).exit(t);
  stream::Station out = state.atRest(exit(), t);
  state.summaries.push_back({std::string(name()), 0.0, std::nullopt, entropyRate(state.at(entry()), out)});
  state.put(std::move(out));
}

void DuctElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()), &out = state.at(exit());
  paths.push_back(engine::pressurePath(std::string(name()), std::string(entry()), std::string(exit()),
                                       *in.gas, in.totalTemperature, in.totalPressure, out.totalTemperature,
                                       out.totalPressure, state.context.entropyReference));
}

void DuctElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  std::string_view from = entry();
  for (std::size_t k = 0; k < sectionCount_; ++k) {
    const Section& s = sections_[k];
    volumes.push_back({std::string(s.name),
                       engine::ControlVolume::Kind::Adiabatic,
                       std::string(from),
                       std::string(s.exit),
                       {}});
    from = s.exit;
  }
}

}  // namespace cw::network
