#include "components/compressor.h"

namespace cw::components {

Compressor::Result Compressor::exit(const stream::TotalState& entry) const {
  const thermo::Gas& gas = *entry.gas;
  Result result;
  stream::TotalState& out = result.exit;
  out.gas = entry.gas;
  out.pressure = entry.pressure * inputs_.pressureRatio;
  const Change compression = change(gas, entry.temperature, entry.pressure, out.pressure,
                                    inputs_.efficiency.basis, inputs_.efficiency.value);
  out.temperature = compression.exitTemperature;
  out.enthalpy = gas.enthalpy(out.temperature);
  out.fuelAirRatio = entry.fuelAirRatio;
  result.bleedMassFlow = inputs_.bleedFraction * entry.massFlow;
  out.massFlow = entry.massFlow - result.bleedMassFlow;
  result.specificWork = out.enthalpy - entry.enthalpy;
  result.power = entry.massFlow * result.specificWork;
  result.efficiency = compression.efficiency;
  return result;
}

}  // namespace cw::components
