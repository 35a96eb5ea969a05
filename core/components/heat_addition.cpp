#include "components/heat_addition.h"

#include "common/error.h"

#include <cmath>

namespace cw::components {

HeatAddition::HeatAddition(std::string name, const thermo::GasModel& model, double pressureLossFraction,
                           double combustionEfficiency)
    : name_(std::move(name)),
      model_(model),
      pressureLossFraction_(pressureLossFraction),
      combustionEfficiency_(combustionEfficiency) {}

namespace {
/// Mass of the stream per unit of its air: 1 + f, or 1 when the model neglects the fuel's mass.
double massPerAir(const thermo::GasModel& model, double f) {
  return model.neglectsFuelMass() ? 1.0 : 1.0 + f;
}
}  // namespace

double HeatAddition::residual(const stream::TotalState& entry, double df, double exitTemperature) const {
  const double f1 = entry.fuelAirRatio;
  const double fuelTerm = model_.fuelEnthalpy() - (1.0 - combustionEfficiency_) * model_.lowerHeatingValue();
  return massPerAir(model_, f1) * entry.enthalpy + df * fuelTerm -
         model_.productEnthalpyPerUnitAir(exitTemperature, f1 + df);
}

HeatAddition::Result HeatAddition::toExitTemperature(const stream::TotalState& entry,
                                                     double exitTemperature) const {
  const double f1 = entry.fuelAirRatio;
  requireHeating(entry, exitTemperature);
  const double available = model_.stoichiometricFuelAirRatio() - f1;
  if (available <= 0.0)
    throw NoSolution(
        name_, "the entering gas holds no oxygen left to burn (fuel-air ratio " + messageNumber(f1) + ")",
        {kReasonNoOxygenLeft, {}, {{f1, ""}}, {}});
  // Linear in df: two evaluations give the root; secant steps polish it.
  double a = 0.0, b = available;
  double ra = residual(entry, a, exitTemperature), rb = residual(entry, b, exitTemperature);
  double df = a - ra * (b - a) / (rb - ra);
  for (int i = 0; i < 8; ++i) {
    if (!(df >= 0.0)) {
      throw NoSolution(name_,
                       "the exit temperature " + messageNumber(exitTemperature) +
                           " K is below what the entering gas already has; no fuel can be burnt",
                       {kReasonExitBelowEntry, {}, {{exitTemperature, "K"}}, {}});
    }
    if (df > available) {
      throw NoSolution(name_,
                       "the exit temperature " + messageNumber(exitTemperature) +
                           " K needs more fuel than the stoichiometric fuel-air ratio " +
                           messageNumber(model_.stoichiometricFuelAirRatio()) + " allows",
                       {kReasonRichBeyondStoichiometric,
                        {},
                        {{exitTemperature, "K"}, {model_.stoichiometricFuelAirRatio(), ""}},
                        {}});
    }
    const double r = residual(entry, df, exitTemperature);
    if (std::abs(r) <= 1e-12 * (std::abs(entry.enthalpy) + model_.lowerHeatingValue() * df + 1.0)) break;
    a = b;
    ra = rb;
    b = df;
    rb = r;
    df = b - rb * (b - a) / (rb - ra);
  }
  return finish(entry, df, exitTemperature);
}

HeatAddition::Result HeatAddition::withFuelAirRatio(const stream::TotalState& entry, double df) const {
  const double f1 = entry.fuelAirRatio;
  if (f1 + df > model_.stoichiometricFuelAirRatio())
    throw NoSolution(name_,
                     "fuel-air ratio " + messageNumber(f1 + df) + " is above the stoichiometric " +
                         messageNumber(model_.stoichiometricFuelAirRatio()),
                     {kReasonFuelAirAboveStoichiometric,
                      {},
                      {{f1 + df, ""}, {model_.stoichiometricFuelAirRatio(), ""}},
                      {}});
  const double fuelTerm = model_.fuelEnthalpy() - (1.0 - combustionEfficiency_) * model_.lowerHeatingValue();
  const double exitEnthalpy =
      (massPerAir(model_, f1) * entry.enthalpy + df * fuelTerm) / massPerAir(model_, f1 + df);
  const double exitTemperature = model_.products(f1 + df)->temperatureFromEnthalpy(exitEnthalpy);
  requireHeating(entry, exitTemperature);
  return finish(entry, df, exitTemperature);
}

void HeatAddition::requireHeating(const stream::TotalState& entry, double exitTemperature) const {
  // Burning heats the stream. On the two-gamma model, whose product gas holds more heat per kelvin
  // than the air, a small fuel flow could otherwise "burn" to a lower temperature than the entry's.
  if (!(exitTemperature > entry.temperature))
    throw NoSolution(name_,
                     "the exit temperature " + messageNumber(exitTemperature) +
                         " K is not above the entry temperature " + messageNumber(entry.temperature) +
                         " K; a " + name_ + " only heats the stream",
                     {kReasonOnlyHeats, {}, {{exitTemperature, "K"}, {entry.temperature, "K"}}, {}});
}

HeatAddition::Result HeatAddition::finish(const stream::TotalState& entry, double df,
                                          double exitTemperature) const {
  const double f1 = entry.fuelAirRatio;
  const double airFlow = entry.massFlow / massPerAir(model_, f1);
  Result result;
  result.addedFuelAirRatio = df;
  result.fuelMassFlow = df * airFlow;
  stream::TotalState& out = result.exit;
  out.gas = model_.productsEntering(f1 + df, *entry.gas, entry.temperature, entry.pressure);
  out.temperature = exitTemperature;
  out.enthalpy = out.gas->enthalpy(exitTemperature);
  out.pressure = entry.pressure * (1.0 - pressureLossFraction_);
  out.fuelAirRatio = f1 + df;
  out.massFlow = airFlow * massPerAir(model_, f1 + df);
  return result;
}

}  // namespace cw::components
