#pragma once
// The ideal twin of a case: the same flight condition, compressor pressure ratios, burner (and
// afterburner) exit temperature, gas model and air mass flow, with every loss removed:
// unit efficiencies (isentropic basis; both spools of a two-spool case), no pressure losses, no
// bleed, no power offtake, unit mechanical efficiencies,
// complete combustion, unit nozzle coefficients and full expansion to ambient pressure.
// It is the reference against which the loss audit measures each loss.

#include "engine/case_inputs.h"

namespace cw::analysis {

/// The lossless case; burnerExitTemperature and airMassFlow are those the actual cycle reached
/// (so a case set by fuel-air ratio or by thrust compares at the same Tt4 and W2). [K], [kg/s]
engine::Case idealTwinOf(const engine::Case& actual, double burnerExitTemperature, double airMassFlow);

}  // namespace cw::analysis
