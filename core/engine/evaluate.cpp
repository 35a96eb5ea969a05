#include "engine/evaluate.h"

#include "analysis/ideal_twin.h"
#include "engine/case_validation.h"
#include "engine/turbojet.h"

namespace cw::engine {

Evaluation evaluateCase(const Case& inputs, bool withPaths) {
  requireValidCase(inputs);
  Evaluation evaluation;
  evaluation.actual = Turbojet(inputs, withPaths).evaluate();
  const double burnerExitTemperature = evaluation.actual.station("4").totalTemperature;
  const Case twin =
      analysis::idealTwinOf(inputs, burnerExitTemperature, evaluation.actual.sizing.airMassFlow);
  evaluation.ideal = Turbojet(twin, withPaths).evaluate();
  return evaluation;
}

}  // namespace cw::engine
