#pragma once
// Builds the gas model a case selects (constant-cp, two-gamma or thermally-perfect).

#include "engine/case_inputs.h"
#include "thermo/gas_model.h"

#include <memory>

namespace cw::thermo {

/// The case's gas model for its fuel and the air's specific humidity [kg/kg].
std::unique_ptr<GasModel> makeGasModel(const engine::GasModelInputs& gasModel, const engine::FuelInputs& fuel,
                                       double specificHumidity);

}  // namespace cw::thermo
