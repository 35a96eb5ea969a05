#include "components/inlet.h"

#include "common/error.h"

#include <cmath>

namespace cw::components {

Inlet::Inlet(const InletInputs& inputs) : inputs_(inputs) {}

double Inlet::supersonicRecovery(double mach) {
  if (mach <= 1.0) return 1.0;
  if (mach >= 5.0) throw InvalidInput("flight.mach (MIL-E-5008B recovery)", mach, "", "[0, 5)");
  return 1.0 - 0.075 * std::pow(mach - 1.0, 1.35);
}

stream::TotalState Inlet::exit(const stream::Station& freeStream) const {
  const thermo::Gas& gas = *freeStream.gas;
  double recoveredPressure = 0.0;
  if (inputs_.lossBasis == InletLossBasis::PressureRecovery) {
    recoveredPressure = inputs_.loss * freeStream.totalPressure;
  } else {
    const double h0 = gas.enthalpy(freeStream.staticTemperature);
    const double h2s = h0 + inputs_.loss * (freeStream.totalEnthalpy - h0);
    const double isentropicT = gas.temperatureFromEnthalpy(h2s);
    recoveredPressure =
        freeStream.staticPressure *
        std::exp((gas.standardEntropy(isentropicT) - gas.standardEntropy(freeStream.staticTemperature)) /
                 gas.gasConstant());
  }
  if (inputs_.supersonicRecoveryRule == SupersonicRecoveryRule::MilE5008B)
    recoveredPressure *= supersonicRecovery(freeStream.mach);

  stream::TotalState exit;
  exit.gas = freeStream.gas;
  exit.temperature = freeStream.totalTemperature;
  exit.enthalpy = freeStream.totalEnthalpy;
  exit.pressure = recoveredPressure;
  exit.massFlow = freeStream.massFlow;
  exit.fuelAirRatio = 0.0;
  return exit;
}

}  // namespace cw::components
