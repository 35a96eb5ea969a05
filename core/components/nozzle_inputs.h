#pragma once
// The inputs of the nozzle (components/nozzle.h): its geometry and its loss. Plain structs, SI units.

#include <variant>

namespace cw::components {

/// A convergent nozzle: exit at the throat, choked or expanded to ambient pressure.
struct ConvergentNozzle {
  bool operator==(const ConvergentNozzle&) const = default;
};

/// A convergent-divergent nozzle whose exit area expands the jet fully to ambient pressure.
struct FullyExpandingNozzle {
  bool operator==(const FullyExpandingNozzle&) const = default;
};

/// A convergent-divergent nozzle of fixed exit-to-throat area ratio.
struct FixedAreaRatioNozzle {
  double exitToThroatAreaRatio = 1.5;  ///< A9 / A8 [-]
  bool operator==(const FixedAreaRatioNozzle&) const = default;
};

/// How the nozzle's expansion loss is given.
enum class NozzleLossBasis {
  VelocityCoefficient,   ///< V9 / V9,ideal
  IsentropicEfficiency,  ///< (ht7 - h9) / (ht7 - h9,ideal)
};

struct NozzleInputs {
  std::variant<ConvergentNozzle, FullyExpandingNozzle, FixedAreaRatioNozzle> geometry;
  NozzleLossBasis lossBasis = NozzleLossBasis::VelocityCoefficient;
  double loss = 0.98;                  ///< velocity coefficient or isentropic efficiency [-]
  double dischargeCoefficient = 0.98;  ///< actual / ideal throat mass flow [-]
  bool operator==(const NozzleInputs&) const = default;
};

}  // namespace cw::components
