#pragma once
// Nozzle, stations 7 -> 8 (throat) -> 9 (exit). Adiabatic: ht9 = ht8 = ht7.
//
// Ideal expansion from (Tt7, pt7) to a static pressure p: T_s(p) from s(T_s, p) = s(Tt7, pt7),
// V_s = sqrt(2 (ht7 - h(T_s))). The throat chokes when the ideal velocity reaches the speed
// of sound, V_s(p*) = a(T_s(p*)), i.e. when p0 < p* (Anderson, Modern Compressible Flow,
// 3rd ed., sec. 5.4, in its general energy-equation form).
//   convergent            choked: p9 = p8 = p*; unchoked: p9 = p0
//   convergent-divergent  full expansion p9 = p0, or the exit pressure of the given A9/A8 on
//                         the supersonic branch of the ideal expansion (over- or under-expanded);
//                         unchoked, it expands to p0 like a convergent nozzle
// Losses: velocity coefficient C_V = V9 / V9s; a nozzle isentropic efficiency eta_n =
// (ht7 - h9) / (ht7 - h9s) is the same as C_V = sqrt(eta_n). The static pressures stay those
// of the ideal expansion and the exit temperature follows from h9 = ht7 - V9^2 / 2
// (Walsh and Fletcher, Gas Turbine Performance, 2nd ed., 2004, sec. 5.13; common practice).
// Areas: the flow areas W / (rho V) are effective areas; the geometric areas are effective / C_D.
// Gross thrust F_g = W9 V9 + (p9 - p0) A9,eff (Mattingly, Elements of Propulsion, 2006, eq. 7.1).

#include "components/efficiency.h"
#include "engine/case_inputs.h"
#include "engine/station.h"

namespace cw::components {

class Nozzle {
 public:
  struct Result {
    engine::Station throat;    ///< station 8, area = geometric throat area
    engine::Station exit;      ///< station 9, area = geometric exit area
    double grossThrust = 0.0;  ///< [N]
    bool choked = false;
    double velocityCoefficient = 1.0;  ///< C_V [-]
    EfficiencyPair efficiency;         ///< eta_n on both bases (polytropic over the expansion) [-]
  };

  explicit Nozzle(const engine::NozzleInputs& inputs) : inputs_(inputs) {}

  /// Expands the stream at station 7 against the ambient static pressure p0. [Pa]
  Result expand(const engine::TotalState& entry, double ambientPressure) const;

 private:
  engine::NozzleInputs inputs_;
};

}  // namespace cw::components
