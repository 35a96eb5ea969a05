#pragma once
// A turbomachine's efficiency as a case gives it: the basis and the value (components/efficiency.h).

namespace cw::components {

/// How a turbomachine's efficiency is given; the other one is derived.
enum class EfficiencyBasis { Isentropic, Polytropic };

struct Efficiency {
  EfficiencyBasis basis = EfficiencyBasis::Isentropic;
  double value = 0.85;  ///< [-]
  bool operator==(const Efficiency&) const = default;
};

}  // namespace cw::components
