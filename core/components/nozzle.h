#pragma once
// Nozzle, stations 7 -> 8 (throat) -> 9 (exit). Adiabatic: ht9 = ht8 = ht7.
//
// Losses: a nozzle isentropic efficiency eta_n = (ht7 - h) / (ht7 - h_s) at every section,
// where h_s = h(T_s) is the enthalpy of the isentropic expansion from (Tt7, pt7) to the section's
// static pressure p (s°(T_s) = s°(Tt7) + R ln(p / pt7)). Given instead as a velocity coefficient
// C_V = V / V_s with V_s = sqrt(2 (ht7 - h_s)); the two are the same input: eta_n = C_V^2.
// (Saravanamuttoo, Rogers, Cohen and Straznicky, Gas Turbine Theory, sec. 3.1, the nozzle
// efficiency of a propelling nozzle; edition and equation numbers from memory, not checked.)
//
// The throat of a choked nozzle is sonic in the actual flow. The sonic temperature follows from
// energy alone, ht7 - h(T*) = a(T*)^2 / 2 (for constant cp, T* = 2 Tt7 / (gamma + 1)); the loss
// lowers the throat's static pressure through the nozzle efficiency:
//   h(T*_s) = ht7 - (ht7 - h(T*)) / eta_n,   p* = pt7 exp((s°(T*_s) - s°(Tt7)) / R)
// which for constant cp is the textbook critical pressure ratio with a nozzle efficiency
//   pt7 / p* = 1 / [1 - (1 / eta_n) (gamma - 1) / (gamma + 1)]^(gamma / (gamma - 1))
// (Saravanamuttoo et al., sec. 3.1, from memory). The nozzle chokes when p0 < p* (the actual
// critical pressure; a lossy nozzle needs a higher pressure ratio to choke).
//   convergent            choked: exit = throat, sonic at p*; unchoked: p9 = p0
//   convergent-divergent, full expansion: the exit area is the one that expands to p9 = p0; when
//                         p0 >= p* the nozzle needs no divergent part and is a convergent one
//   convergent-divergent, fixed A9/A8 > 1 (the ratio of the effective areas): throat sonic, exit
//                         at the pressure where the actual mass flux rho9 V9 = rho* V* / (A9/A8)
//                         on the supersonic branch, whatever p0 is, as long as the exit flow
//                         stays supersonic: p0 at most the pressure behind a normal shock at the
//                         exit (under- or overexpanded, with any shocks outside the nozzle).
//                         At a higher p0 a normal shock would stand inside the divergent part,
//                         and higher still the flow would be subsonic throughout (Anderson,
//                         Modern Compressible Flow, 3rd ed., sec. 5.5, the regimes of a
//                         convergent-divergent nozzle, from memory): the model does not cover
//                         these and refuses them as NoSolution.
// At any section below the throat the velocity is C_V times the isentropic velocity to that
// section's pressure and the temperature follows from h = ht7 - V^2 / 2 (Walsh and Fletcher,
// Gas Turbine Performance, 2nd ed., 2004, sec. 5.13; common practice).
// Areas: the flow areas W / (rho V) are effective areas; the geometric areas are effective / C_D.
// Gross thrust F_g = W9 V9 + (p9 - p0) A9,eff (Mattingly, Elements of Propulsion, 2006, eq. 7.1).
// With the throat sonic, every loss lowers the thrust: at fixed (Tt7, pt7) the momentum W V* is
// fixed and the pressure thrust (p* - p0) W R T* / (p* V*) falls with p*.

#include "components/efficiency.h"
#include "components/nozzle_inputs.h"
#include "stream/station.h"

namespace cw::components {

class Nozzle {
 public:
  struct Result {
    stream::Station throat;    ///< station 8, area = geometric throat area
    stream::Station exit;      ///< station 9, area = geometric exit area
    double grossThrust = 0.0;  ///< [N]
    bool choked = false;
    double velocityCoefficient = 1.0;  ///< C_V [-]
    EfficiencyPair efficiency;         ///< eta_n on both bases (polytropic over the expansion) [-]
  };

  explicit Nozzle(const NozzleInputs& inputs) : inputs_(inputs) {}

  /// Expands the stream at station 7 against the ambient static pressure p0. [Pa]
  Result expand(const stream::TotalState& entry, double ambientPressure) const;

 private:
  NozzleInputs inputs_;
};

}  // namespace cw::components
