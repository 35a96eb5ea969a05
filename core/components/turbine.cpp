#include "components/turbine.h"

#include "common/error.h"

#include <cmath>

namespace cw::components {

Turbine::Result Turbine::exit(const stream::TotalState& entry, double compressorPower) const {
  const thermo::Gas& gas = *entry.gas;
  const double shaftPower = compressorPower + inputs_.powerOfftake;
  const double specificWork = shaftPower / (inputs_.mechanicalEfficiency * entry.massFlow);
  const double exitEnthalpy = entry.enthalpy - specificWork;
  const char* why = "the turbine cannot drive the compressor";
  if (!(exitEnthalpy > gas.enthalpy(gas.minimumTemperature())))
    throw NoSolution("turbine",
                     std::string(why) + ": it would need " + messageNumber(specificWork) +
                         " J/kg, more than the gas at " + messageNumber(entry.temperature) + " K holds",
                     {kReasonTurbineCannotDrive, {}, {{specificWork, "J/kg"}, {entry.temperature, "K"}}, {}});
  Result result;
  stream::TotalState& out = result.exit;
  out.gas = entry.gas;
  out.enthalpy = exitEnthalpy;
  out.temperature = gas.temperatureFromEnthalpy(exitEnthalpy);
  std::optional<double> isentropicTemperature;  // T5s, when the basis finds it on the way
  try {
    const Expansion e = expansion(gas, entry.temperature, entry.pressure, out.temperature,
                                  inputs_.efficiency.basis, inputs_.efficiency.value);
    out.pressure = e.exitPressure;
    isentropicTemperature = e.isentropicTemperature;
  } catch (const OutOfRange&) {
    throw NoSolution("turbine",
                     std::string(why) + ": the isentropic expansion for " + messageNumber(specificWork) +
                         " J/kg leaves the range of the gas data",
                     {kReasonTurbineExpansion, {}, {{specificWork, "J/kg"}}, {}});
  }
  if (!(out.pressure > 0.0) || !std::isfinite(out.pressure))
    throw NoSolution("turbine",
                     std::string(why) + ": no exit pressure gives " + messageNumber(specificWork) + " J/kg",
                     {kReasonTurbineNoExitPressure, {}, {{specificWork, "J/kg"}}, {}});
  out.massFlow = entry.massFlow;
  out.fuelAirRatio = entry.fuelAirRatio;
  result.specificWork = specificWork;
  result.power = entry.massFlow * specificWork;
  result.efficiency =
      isentropicTemperature
          ? efficiencies(gas, entry.temperature, entry.pressure, out.temperature, out.pressure,
                         *isentropicTemperature)
          : efficiencies(gas, entry.temperature, entry.pressure, out.temperature, out.pressure);
  return result;
}

}  // namespace cw::components
