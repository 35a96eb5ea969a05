#include "analysis/loss_sensitivity.h"

#include "analysis/loss_catalogue.h"
#include "common/error.h"

namespace cw::analysis {

std::string toString(DifferenceScheme scheme) {
  switch (scheme) {
    case DifferenceScheme::Central:
      return "central";
    case DifferenceScheme::Forward:
      return "forward";
    case DifferenceScheme::Backward:
      return "backward";
  }
  return "central";
}

namespace {
/// The range over which the relative step is taken: 1 for fractions, 1 MW for the offtake
/// (a representative accessory load scale, common practice, no source). [-] or [W]
double unitRange(const LossParameter& p) {
  return p.unitSize >= 1.0 ? 1.0e6 : 1.0;
}
}  // namespace

LossSensitivity sensitivityOf(const AuditPoint& point, const std::string& key, double relativeStep) {
  const LossDefinition& loss = lossByKey(key, point.baseCase(), "sensitivity");
  if (!loss.parameter) throw InvalidInput("sensitivity", "loss '" + key + "' has no continuous parameter");
  const LossParameter& p = *loss.parameter;
  LossSensitivity s;
  s.loss = key;
  s.field = p.field;
  s.unit = p.unit;
  s.unitSize = p.unitSize;
  s.value = p.get(point.baseCase());
  s.step = relativeStep * unitRange(p);
  const double h = s.step;
  auto at = [&](double x) {
    engine::Case c = point.baseCase();
    p.set(c, x);
    return AuditPoint::figuresOf(c);
  };
  double dF = 0.0, dS = 0.0;
  if (s.value - h >= p.lowerBound && s.value + h <= p.upperBound) {
    s.scheme = DifferenceScheme::Central;
    const AuditFigures up = at(s.value + h), down = at(s.value - h);
    dF = (up.specificThrust - down.specificThrust) / (2.0 * h);
    dS = (up.thrustSpecificFuelConsumption - down.thrustSpecificFuelConsumption) / (2.0 * h);
  } else {
    const double sign = s.value + 2.0 * h <= p.upperBound ? 1.0 : -1.0;
    s.scheme = sign > 0.0 ? DifferenceScheme::Forward : DifferenceScheme::Backward;
    const AuditFigures f0 = at(s.value), f1 = at(s.value + sign * h), f2 = at(s.value + 2.0 * sign * h);
    dF = (-3.0 * f0.specificThrust + 4.0 * f1.specificThrust - f2.specificThrust) / (2.0 * sign * h);
    dS = (-3.0 * f0.thrustSpecificFuelConsumption + 4.0 * f1.thrustSpecificFuelConsumption -
          f2.thrustSpecificFuelConsumption) /
         (2.0 * sign * h);
  }
  s.specificThrustPerUnit = dF * p.unitSize;
  s.tsfcPerUnit = dS * p.unitSize;
  return s;
}

std::vector<LossSensitivity> sensitivities(const AuditPoint& point, double relativeStep) {
  std::vector<LossSensitivity> list;
  for (const LossDefinition* loss : lossesOf(point.baseCase().architecture))
    if (loss->parameter && loss->applies(point.baseCase()))
      list.push_back(sensitivityOf(point, loss->key, relativeStep));
  return list;
}

}  // namespace cw::analysis
