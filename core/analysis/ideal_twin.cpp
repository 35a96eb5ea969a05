#include "analysis/ideal_twin.h"

#include "engine/parameter_registry.h"

namespace cw::analysis {

engine::Case idealTwinOf(const engine::Case& actual, double burnerExitTemperature, double airMassFlow) {
  using namespace engine;
  Case twin = actual;
  twin.title = actual.title.empty() ? "ideal twin" : actual.title + " (ideal twin)";
  twin.design.target = AirMassFlowTarget{airMassFlow};
  twin.burner.setting = ExitTemperatureSetting{burnerExitTemperature};
  // Every loss parameter at its lossless value, from the registry of parameters.
  removeEveryLoss(twin);
  return twin;
}

}  // namespace cw::analysis
