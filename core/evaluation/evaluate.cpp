#include "evaluation/evaluate.h"

#include "analysis/ideal_twin.h"
#include "engine/case_validation.h"
#include "engine/gas_model_factory.h"
#include "network/engine.h"

namespace cw::engine {

Evaluation evaluateCase(const Case& inputs, bool withPaths) {
  requireValidCase(inputs);
  // The twin changes only losses, so it shares the case's gas model; neither case is copied again.
  const auto gasModel = makeGasModel(inputs.gasModel, inputs.fuel, inputs.flight.specificHumidity);
  Evaluation evaluation;
  evaluation.actual = network::evaluateEngine(inputs, *gasModel, withPaths);
  const double burnerExitTemperature = evaluation.actual.burnerExitTemperature();
  const Case twin =
      analysis::idealTwinOf(inputs, burnerExitTemperature, evaluation.actual.sizing.airMassFlow);
  evaluation.ideal = network::evaluateEngine(twin, *gasModel, withPaths);
  requireFinite(evaluation.actual, "cycle with losses");
  requireFinite(evaluation.ideal, "ideal twin");
  return evaluation;
}

}  // namespace cw::engine
