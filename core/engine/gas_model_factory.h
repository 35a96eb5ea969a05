#pragma once
// Builds the gas model a case selects (constant-cp, two-gamma or thermally-perfect) from the
// models of thermo/: the choice is the case's, so the factory sits above thermo, in engine/.

#include "engine/gas_model_inputs.h"
#include "thermo/fuel_inputs.h"
#include "thermo/gas_model.h"

#include <memory>

namespace cw::engine {

/// The case's gas model for its fuel and the air's specific humidity [kg/kg]. Gas models are
/// immutable; the last thermally perfect model built on each thread is reused when the fuel
/// and humidity are the same (building one costs more than a design point), and so is the last
/// stoichiometric fuel-air ratio of the constant-cp and two-gamma models.
std::shared_ptr<const thermo::GasModel> makeGasModel(const GasModelInputs& gasModel,
                                                     const thermo::FuelInputs& fuel, double specificHumidity);

}  // namespace cw::engine
