#include "analysis/audit_point.h"

#include "analysis/ideal_twin.h"
#include "engine/case_validation.h"
#include "engine/turbojet.h"

namespace cw::analysis {

AuditPoint::AuditPoint(const engine::Case& actual) : base_(actual) {
  engine::requireValidCase(actual);
  actual_ = engine::Turbojet(actual, false).evaluate();
  base_.design.target = engine::AirMassFlowTarget{actual_.sizing.airMassFlow};
  base_.burner.setting = engine::ExitTemperatureSetting{actual_.station("4").totalTemperature};
}

engine::Case AuditPoint::idealCase() const {
  return idealTwinOf(base_, actual_.station("4").totalTemperature, actual_.sizing.airMassFlow);
}

AuditFigures AuditPoint::figuresOf(const engine::Case& variant) {
  const engine::CycleResult r = engine::Turbojet(variant, false).evaluate();
  return {r.performance.specificThrust, r.performance.thrustSpecificFuelConsumption};
}

}  // namespace cw::analysis
