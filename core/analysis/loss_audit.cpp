#include "analysis/loss_audit.h"

#include "analysis/loss_catalogue.h"
#include "common/error.h"

#include <algorithm>

namespace cw::analysis {

std::vector<std::string> waterfallOrderOf(const engine::Case& actual, const std::vector<std::string>& given) {
  std::vector<std::string> order;
  for (const auto& key : given) {
    lossByKey(key, actual);  // throws for an unknown key
    if (std::find(order.begin(), order.end(), key) != order.end())
      throw InvalidInput("--order", "loss '" + key + "' is given twice; each loss may appear once");
    order.push_back(key);
  }
  for (const LossDefinition* loss : lossesOf(actual.architecture))
    if (std::find(order.begin(), order.end(), loss->key) == order.end()) order.push_back(loss->key);
  std::erase_if(order, [&](const std::string& key) { return !lossByKey(key, actual).applies(actual); });
  return order;
}

std::vector<LossDelta> oneAtATime(const AuditPoint& point) {
  const AuditFigures actual = AuditPoint::figuresOf(point.baseCase());
  std::vector<LossDelta> deltas;
  for (const LossDefinition* loss : lossesOf(point.baseCase().architecture)) {
    if (!loss->applies(point.baseCase())) continue;
    engine::Case removed = point.baseCase();
    loss->remove(removed);
    const AuditFigures r = AuditPoint::figuresOf(removed);
    deltas.push_back({loss->key, r.specificThrust - actual.specificThrust,
                      r.thrustSpecificFuelConsumption - actual.thrustSpecificFuelConsumption});
  }
  return deltas;
}

std::vector<LossDelta> waterfall(const AuditPoint& point, const std::vector<std::string>& order) {
  // Start from the actual cycle with every loss of the order removed (the ideal twin, at the
  // audit point), then put the losses back one by one: the last case is the base case itself.
  engine::Case current = point.baseCase();
  for (const auto& key : order) lossByKey(key, current).remove(current);
  AuditFigures before = AuditPoint::figuresOf(current);
  std::vector<LossDelta> steps;
  for (std::size_t k = 0; k < order.size(); ++k) {
    // The case with losses 1..k: the base case with the remaining losses removed.
    engine::Case next = point.baseCase();
    for (std::size_t j = k + 1; j < order.size(); ++j) lossByKey(order[j], next).remove(next);
    const AuditFigures after = AuditPoint::figuresOf(next);
    steps.push_back({order[k], after.specificThrust - before.specificThrust,
                     after.thrustSpecificFuelConsumption - before.thrustSpecificFuelConsumption});
    before = after;
  }
  return steps;
}

LossAudit auditCase(const engine::Case& actual, const std::vector<std::string>& order) {
  const std::vector<std::string> checkedOrder = waterfallOrderOf(actual, order);
  const AuditPoint point(actual);
  LossAudit audit;
  audit.actual = AuditPoint::figuresOf(point.baseCase());
  audit.ideal = AuditPoint::figuresOf(point.idealCase());
  audit.oneAtATime = oneAtATime(point);
  audit.waterfallOrder = checkedOrder;
  audit.waterfall = waterfall(point, checkedOrder);
  audit.sensitivities = sensitivities(point);
  audit.exergy = exergyBalanceOf(point);
  return audit;
}

}  // namespace cw::analysis
