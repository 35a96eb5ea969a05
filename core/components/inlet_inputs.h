#pragma once
// The inputs of the inlet (components/inlet.h). Plain struct, SI units.

namespace cw::components {

/// How the inlet's total-pressure loss is given.
enum class InletLossBasis {
  PressureRecovery,  ///< pt2 / pt0
  RamEfficiency,     ///< (h(T at pt2, s0) - h0) / (ht0 - h0): the fraction of the ram rise kept
};

/// A multiplier on the inlet's recovery above flight Mach 1.
enum class SupersonicRecoveryRule {
  None,       ///< no shock loss beyond the given recovery
  MilE5008B,  ///< 1 - 0.075 (M0 - 1)^1.35 for 1 < M0 < 5 (military specification MIL-E-5008B)
};

struct InletInputs {
  InletLossBasis lossBasis = InletLossBasis::PressureRecovery;
  double loss = 0.98;  ///< pressure recovery or ram efficiency, per lossBasis [-]
  SupersonicRecoveryRule supersonicRecoveryRule = SupersonicRecoveryRule::None;
  bool operator==(const InletInputs&) const = default;
};

}  // namespace cw::components
