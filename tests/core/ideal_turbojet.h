#pragma once
// The ideal turbojet of parametric cycle analysis in closed form, and a case that the model
// should evaluate to it: shared by test_turbojet (one spool) and test_engine_network (two spools).
//
// Mattingly, Elements of Propulsion: Gas Turbines and Rockets, AIAA 2006, sec. 5.6 (ideal
// turbojet), constant-cp model, fuel mass neglected: tau_r, tau_c, tau_lambda,
// tau_t = 1 - tau_r (tau_c - 1) / tau_lambda, V9/a0, F/m0, f = cp T0 (tau_lambda - tau_r tau_c) / h_PR,
// S = f / (F/m0), eta_T = 1 - 1/(tau_r tau_c) (eq. 5.24), eta_P = 2 M0 / (V9/a0 + M0).

#include "analysis/ideal_twin.h"
#include "engine/case_inputs.h"

#include <algorithm>
#include <cmath>

namespace cw::test {

/// The flight condition and gas of Mattingly's ideal turbojet examples (M0 = 2, T0 = 216.7 K).
inline constexpr double kIdealGamma = 1.4, kIdealCp = 1004.0, kIdealT0 = 216.7, kIdealP0 = 19330.0,
                        kIdealHeatingValue = 42.8e6;

/// A case on the constant-cp model with every component ideal and the fuel mass neglected,
/// at the flight condition of Mattingly's ideal turbojet examples.
inline engine::Case idealConstantCpCase(double pressureRatio, double burnerExitTemperature, double mach) {
  engine::Case c;
  c.flight.ambient = engine::GivenAmbient{kIdealT0, kIdealP0};
  c.flight.mach = mach;
  c.design.target = engine::AirMassFlowTarget{50.0};
  c.fuel.lowerHeatingValue = kIdealHeatingValue;
  c.gasModel.model = engine::ConstantCpGasModel{kIdealCp, kIdealGamma};
  c.gasModel.neglectFuelMass = true;
  c = analysis::idealTwinOf(c, burnerExitTemperature, 50.0);
  c.compressor.pressureRatio = pressureRatio;
  return c;
}

/// The closed-form ideal turbojet (Mattingly 2006, sec. 5.6).
struct IdealTurbojet {
  double tauR = 0.0, tauC = 0.0, tauLambda = 0.0, tauT = 0.0;
  double a0 = 0.0;                                               ///< [m/s]
  double jetVelocity = 0.0;                                      ///< V9 [m/s]
  double specificThrust = 0.0;                                   ///< F/m0 [N s/kg]
  double fuelAirRatio = 0.0;                                     ///< f [-]
  double thermalEfficiency = 0.0;                                ///< eta_T [-]
  double propulsiveEfficiency = 0.0;                             ///< eta_P [-]
  double tsfc() const { return fuelAirRatio / specificThrust; }  ///< S [kg/(N s)]
};

inline IdealTurbojet idealTurbojet(double mach, double pressureRatio, double burnerExitTemperature) {
  const double gamma = kIdealGamma, cp = kIdealCp, R = cp * (gamma - 1) / gamma, T0 = kIdealT0;
  IdealTurbojet j;
  j.a0 = std::sqrt(gamma * R * T0);
  j.tauR = 1 + 0.5 * (gamma - 1) * mach * mach;
  j.tauC = std::pow(pressureRatio, (gamma - 1) / gamma);
  j.tauLambda = burnerExitTemperature / T0;
  j.tauT = 1 - j.tauR / j.tauLambda * (j.tauC - 1);
  const double v9a0 =
      std::sqrt(2 / (gamma - 1) * j.tauLambda / (j.tauR * j.tauC) * (j.tauR * j.tauC * j.tauT - 1));
  j.jetVelocity = v9a0 * j.a0;
  j.specificThrust = j.a0 * (v9a0 - mach);
  j.fuelAirRatio = cp * T0 * (j.tauLambda - j.tauR * j.tauC) / kIdealHeatingValue;
  j.thermalEfficiency = 1 - 1 / (j.tauR * j.tauC);
  j.propulsiveEfficiency = 2 * mach / (v9a0 + mach);
  return j;
}

inline double relative(double a, double b) {
  return std::abs(a - b) / std::max(std::abs(b), 1e-300);
}

}  // namespace cw::test
