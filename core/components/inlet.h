#pragma once
// Inlet (intake), stations 0 -> 2.
//
// Free stream: ht0 = h(T0) + V0^2 / 2, Tt0 = T(ht0), pt0 from s(Tt0, pt0) = s(T0, p0).
// The inlet is adiabatic, so ht2 = ht0. Its total-pressure loss is given either as
//   pressure recovery   pi_d = pt2 / pt0
//   ram efficiency      eta_r = (h(T2s) - h0) / (ht0 - h0), where T2s is the temperature
//                       reached isentropically from (T0, p0) to pt2 (the fraction of the ram
//                       enthalpy rise that is recovered as pressure; Saravanamuttoo, Rogers and
//                       Cohen, Gas Turbine Theory, 5th ed., sec. 3.1, eq. 3.2, in enthalpy form)
// optionally multiplied above Mach 1 by the MIL-E-5008B recovery of a supersonic intake,
//   eta_spec = 1 - 0.075 (M0 - 1)^1.35,  1 < M0 < 5
// (Mattingly, Elements of Propulsion, 2006, eq. 7.13, quoting MIL-E-5008B).

#include "components/inlet_inputs.h"
#include "stream/station.h"

namespace cw::components {

class Inlet {
 public:
  explicit Inlet(const InletInputs& inputs);

  /// Total state at the engine face (station 2) from the free stream (station 0).
  stream::TotalState exit(const stream::Station& freeStream) const;

  /// The MIL-E-5008B supersonic recovery at flight Mach number M0 (1 at or below Mach 1). [-]
  static double supersonicRecovery(double mach);

 private:
  InletInputs inputs_;
};

}  // namespace cw::components
