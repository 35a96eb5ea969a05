#include "analysis/ideal_twin.h"

namespace cw::analysis {

engine::Case idealTwinOf(const engine::Case& actual, double burnerExitTemperature, double airMassFlow) {
  using namespace engine;
  Case twin = actual;
  twin.title = actual.title.empty() ? "ideal twin" : actual.title + " (ideal twin)";
  twin.design.target = AirMassFlowTarget{airMassFlow};
  twin.inlet = InletInputs{InletLossBasis::PressureRecovery, 1.0, SupersonicRecoveryRule::None};
  twin.compressor.efficiency = Efficiency{EfficiencyBasis::Isentropic, 1.0};
  twin.compressor.bleedFraction = 0.0;
  twin.burner.setting = ExitTemperatureSetting{burnerExitTemperature};
  twin.burner.pressureLossFraction = 0.0;
  twin.burner.combustionEfficiency = 1.0;
  twin.turbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 1.0}, 1.0, 0.0};
  if (actual.architecture == Architecture::TwoSpoolTurbojet) {  // its LP spool likewise
    twin.lowPressureCompressor.efficiency = Efficiency{EfficiencyBasis::Isentropic, 1.0};
    twin.lowPressureCompressor.bleedFraction = 0.0;
    twin.lowPressureTurbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 1.0}, 1.0, 0.0};
  }
  twin.jetPipe.pressureLossFraction = 0.0;
  twin.afterburner.pressureLossFractionLit = 0.0;
  twin.afterburner.pressureLossFractionUnlit = 0.0;
  twin.afterburner.combustionEfficiency = 1.0;
  twin.nozzle = NozzleInputs{FullyExpandingNozzle{}, NozzleLossBasis::VelocityCoefficient, 1.0, 1.0};
  return twin;
}

}  // namespace cw::analysis
