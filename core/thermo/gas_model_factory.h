#pragma once
// Builds the gas model a case selects (constant-cp, two-gamma or thermally-perfect).

#include "engine/case_inputs.h"
#include "thermo/gas_model.h"

#include <memory>

namespace cw::thermo {

/// The case's gas model for its fuel and the air's specific humidity [kg/kg]. Gas models are
/// immutable; the last thermally perfect model built on each thread is reused when the fuel
/// and humidity are the same (building one costs more than a design point), and so is the last
/// stoichiometric fuel-air ratio of the constant-cp and two-gamma models.
std::shared_ptr<const GasModel> makeGasModel(const engine::GasModelInputs& gasModel,
                                             const engine::FuelInputs& fuel, double specificHumidity);

}  // namespace cw::thermo
