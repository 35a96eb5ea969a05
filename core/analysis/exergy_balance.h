#pragma once
// The second-law view of the actual cycle: entropy generated and exergy destroyed in each
// component, exergy leaving with the exhaust, against the fuel's exergy.
//
// Dead state: the free-stream static state (T0, p0), each stream on its own frozen gas (air for
// the air and the bleed, the exhaust gas for the exhaust). Flow exergy of a stream of mass flow W
// at (h, s, V), relative to its dead state (h0', s0'): W [(h - h0') - T0 (s - s0') + V^2/2]
// (Bejan, Advanced Engineering Thermodynamics, 3rd ed. 2006, ch. 3, flow availability; Kotas,
// The Exergy Method of Thermal Plant Analysis, 1985, ch. 2 (both from memory)). Engine frame.
//
// Entropy generated in each component by an entropy balance on its control volume (adiabatic):
//   S_gen = sum_out W s - sum_in W s  (fuel included: W_f s_f enters the burner and afterburner)
// with absolute entropies; the mechanical (shaft) loss P_m = P_t - P_c - P_x is dissipated and
// its S_gen = P_m / T0 (heat to the surroundings at T0). Exergy destroyed = T0 S_gen (the
// Gouy-Stodola theorem; Bejan 2006, ch. 3).
//
// Fuel exergy: the reversible work of burning the fuel with the core air at (T0, p0) to the
// frozen exhaust at (T0, p0), which is what the exhaust dead state leaves to the fuel:
//   E_f = W_f (h_f - T0 s_f) + W3 (h_a0' - T0 s_a0') - W9 (h_p0' - T0 s_p0')
// (W3 = W2 - W_bleed, core air; W9 = W3 + W_f unless the fuel's mass is neglected). Unlike a
// chemical exergy relative to the environment's composition (about 1.06 LHV for liquid
// hydrocarbons, Kotas 1985, table of fuels, from memory), it leaves out the work of diffusing
// the products into the atmosphere. The fuel's entropy (thermo::GasModel::fuelEntropy): on the
// thermally perfect model's absolute (third-law) scale that of a liquid hydrocarbon,
// s_f = s°_f + cp_f ln(T_f / 298.15 K) (thermo::HydrocarbonFuel::entropy); on the constant-cp and
// two-gamma models the fuel is heat whose mass joins the stream at the burner's (afterburner's)
// entry state, s_f = s_in, and the two-gamma product gas's entropy scale is joined to the air's at
// the burner entry (thermo/gas_model.h, productsEntering), so that the second law holds: each
// heat addition generates W_out (s_out - s_in) >= 0, its heating and its pressure loss.
//
// Unburnt fuel: the fraction 1 - eta_b of the heating value not released leaves the model's
// energy books; it is counted as exergy leaving at its heating value (an approximation).
//
// Balance (steady flow, adiabatic engine; ram exergy W2 V0^2/2 in, jet kinetic energy out):
//   E_f = F_n V0 + P_x + E_bleed + E_unburnt + sum E_destroyed + E_exhaust,thermal + E_wake
//   E_exhaust,thermal = W9 [(h9 - h_p0') - T0 (s9 - s_p0')]
//   E_wake = W9 V9^2/2 - W2 V0^2/2 - F_n V0
// E_wake is the jet's kinetic-energy gain not delivered as thrust power; with W9 = W2 and
// p9 = p0 it is W9 (V9 - V0)^2 / 2, the wake's kinetic energy in the earth frame (Froude's
// relation; common practice, no source). With a strongly underexpanded nozzle at speed it can
// be negative: the pressure thrust's power then comes out of the exhaust's thermal exergy.
// The closure (E_f - outputs) / E_f checks the model's energy conservation and this accounting.

#include "analysis/audit_point.h"

#include <string>
#include <vector>

namespace cw::analysis {

struct ComponentExergy {
  std::string component;           ///< "inlet", "compressor", "burner", "turbine", "shaft", ...
  double entropyGeneration = 0.0;  ///< S_gen [W/K]
  double exergyDestroyed = 0.0;    ///< T0 S_gen [W]
};

struct ExergyBalance {
  double deadStateTemperature = 0.0;  ///< T0 [K]
  double deadStatePressure = 0.0;     ///< p0 [Pa]
  double fuelExergy = 0.0;            ///< E_f [W]
  double fuelHeatingPower = 0.0;      ///< W_f LHV [W]
  double fuelEntropy = 0.0;           ///< s_f of the burner's fuel [J/(kg K)]
  double ramExergy = 0.0;             ///< W2 V0^2 / 2, entering in the engine frame [W]
  double thrustPower = 0.0;           ///< F_n V0 [W]
  double shaftOfftake = 0.0;          ///< P_x [W]
  double bleedAir = 0.0;              ///< exergy of the bleed at compressor exit [W]
  double unburntFuel = 0.0;           ///< (1 - eta_b) W_f LHV, burner and afterburner [W]
  std::vector<ComponentExergy> components;
  double destroyed = 0.0;       ///< sum of the components' exergy destroyed [W]
  double exhaustThermal = 0.0;  ///< W9 [(h9 - h0') - T0 (s9 - s0')] [W]
  double exhaustKinetic = 0.0;  ///< E_wake [W]
  double residual = 0.0;        ///< E_f - all outputs [W]
  double closure = 0.0;         ///< residual / E_f [-]
};

/// The balance of the audit point's actual cycle. [W]
ExergyBalance exergyBalanceOf(const AuditPoint& point);

}  // namespace cw::analysis
