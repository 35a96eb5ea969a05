#include "network/engine.h"

#include "engine/gas_model_factory.h"
#include "network/design_point.h"
#include "network/topologies.h"

namespace cw::network {

Engine::Engine(const engine::Case& inputs, bool withPaths)
    : inputs_(inputs),
      withPaths_(withPaths),
      gasModel_(engine::makeGasModel(inputs.gasModel, inputs.fuel, inputs.flight.specificHumidity)) {}

engine::CycleResult Engine::evaluate() const {
  return evaluateEngine(inputs_, *gasModel_, withPaths_);
}

engine::CycleResult Engine::evaluateAt(double airMassFlow) const {
  return DesignPoint(inputs_, topologyOf(inputs_), *gasModel_, withPaths_).at(airMassFlow);
}

engine::CycleResult evaluateEngine(const engine::Case& inputs, const thermo::GasModel& gasModel,
                                   bool withPaths) {
  return DesignPoint(inputs, topologyOf(inputs), gasModel, withPaths).design();
}

}  // namespace cw::network
