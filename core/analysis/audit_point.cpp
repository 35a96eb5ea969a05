#include "analysis/audit_point.h"

#include "analysis/ideal_twin.h"
#include "engine/case_validation.h"
#include "network/engine.h"

namespace cw::analysis {

AuditPoint::AuditPoint(const engine::Case& actual) : base_(actual) {
  engine::requireValidCase(actual);
  actual_ = network::Engine(actual, false).evaluate();
  base_.design.target = engine::AirMassFlowTarget{actual_.sizing.airMassFlow};
  base_.burner.setting = engine::ExitTemperatureSetting{actual_.burnerExitTemperature()};
}

engine::Case AuditPoint::idealCase() const {
  return idealTwinOf(base_, actual_.burnerExitTemperature(), actual_.sizing.airMassFlow);
}

AuditFigures AuditPoint::figuresOf(const engine::Case& variant) {
  const engine::CycleResult r = network::Engine(variant, false).evaluate();
  return {r.performance.specificThrust, r.performance.thrustSpecificFuelConsumption};
}

}  // namespace cw::analysis
