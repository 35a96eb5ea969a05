#include "network/inlet_element.h"

#include "engine/process_paths.h"
#include "flow/compressible_flow.h"

namespace cw::network {

void InletElement::design(DesignState& state) const {
  const stream::Station& free = state.at(entry());
  const stream::TotalState t2 = within(name(), [&] { return inlet_.exit(free); });
  stream::Station s2 = state.atRest(exit(), t2);
  flow::FlowState face;
  try {
    face = flow::fromTotal(*t2.gas, t2.temperature, t2.pressure, faceMach_);
  } catch (const Error& e) {
    ErrorDetail detail;
    if (e.detail().reason == kReasonOutsideRange)
      detail = {kReasonEngineFaceState, e.where(), e.detail().quantities, e.detail().validRange};
    throw InvalidInput("/sizing/engine_face_mach", std::string("at the engine face: ") + e.what(),
                       std::move(detail));
  }
  s2.staticTemperature = face.local.temperature;
  s2.staticPressure = face.local.pressure;
  s2.mach = face.mach;
  s2.velocity = face.velocity;
  s2.area = t2.massFlow / face.massFlux();
  state.summaries.push_back({std::string(name()), 0.0, std::nullopt, entropyRate(free, s2)});
  state.put(std::move(s2));
}

void InletElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &s0 = state.at(entry()), &s2 = state.at(exit());
  paths.push_back(engine::pressurePath(std::string(name()), std::string(entry()), std::string(exit()),
                                       *s0.gas, s0.staticTemperature, s0.staticPressure, s2.totalTemperature,
                                       s2.totalPressure, state.context.entropyReference));
}

}  // namespace cw::network
