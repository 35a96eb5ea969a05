#pragma once
// Isentropic and polytropic efficiency of a compression or expansion on any gas model.
//
// Compression from (T1, p1) to p2 with exit T2 on a gas with standard entropy s°(T):
//   isentropic   eta_c = (h(T2s) - h(T1)) / (h(T2) - h(T1)),  s°(T2s) = s°(T1) + R ln(p2/p1)
//   polytropic   e_c   = R ln(p2/p1) / (s°(T2) - s°(T1))        (dh = v dp / e_c along the path)
// Expansion from (T1, p1) to p2 < p1:
//   isentropic   eta_t = (h(T1) - h(T2)) / (h(T1) - h(T2s))
//   polytropic   e_t   = (s°(T2) - s°(T1)) / (R ln(p2/p1))      (dh = e_t v dp along the path)
// Mattingly, Elements of Propulsion: Gas Turbines and Rockets, AIAA 2006, sec. 4.3.4
// (constant-cp forms eqs. 4.9a-4.10b); the forms above are the same definitions for a
// thermally perfect gas. A unit efficiency on either basis is the isentropic change.
//
// Derived efficiencies: change() reports the given efficiency as given and derives the other.
// A given 1 is the isentropic change, so the other is exactly 1. On a constant-cp gas the other
// comes from the given one by the closed forms of eqs. 4.9-4.10 with expm1 and log1p (exact to
// rounding as gamma -> 1 or p2/p1 -> 1, where differences of h and s° at two temperatures keep
// little but the rounding of the exit temperature); otherwise from the states as above. Either
// way a derived efficiency within the rounding of its states of 1 is 1 (the second law bounds
// it by 1), so derived efficiencies stay in (0, 1].

#include "components/efficiency_inputs.h"
#include "thermo/gas.h"

#include <optional>

namespace cw::components {

/// The efficiency of a change on both bases.
struct EfficiencyPair {
  double isentropic = 1.0;  ///< [-]
  double polytropic = 1.0;  ///< [-]
};

/// Exit temperature of a compression or expansion (p2 > p1 compresses) with the given efficiency. [K]
double exitTemperature(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
                       EfficiencyBasis basis, double efficiency);

/// Both efficiencies of a change from (T1, p1) to (T2, p2); unit efficiencies for p2 = p1.
EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2);
/// As above, given the isentropic exit temperature T2s at p2 that the caller has already found
/// (saves the inversion s°(T2s) = s°(T1) + R ln(p2/p1)). [K]
EfficiencyPair efficiencies(const thermo::Gas& gas, double temperature1, double pressure1,
                            double temperature2, double pressure2, double isentropicTemperature2);

/// A compression or expansion to p2: its exit temperature and both efficiencies, as
/// exitTemperature() and efficiencies() give them, with the isentropic exit state found once.
struct Change {
  double exitTemperature = 0.0;  ///< T2 [K]
  EfficiencyPair efficiency;     ///< [-]
};
Change change(const thermo::Gas& gas, double temperature1, double pressure1, double pressure2,
              EfficiencyBasis basis, double efficiency);

/// Exit pressure of an expansion from (T1, p1) that ends at temperature T2 < T1. [Pa]
double expansionExitPressure(const thermo::Gas& gas, double temperature1, double pressure1,
                             double temperature2, EfficiencyBasis basis, double efficiency);

/// An expansion from (T1, p1) to T2 < T1: expansionExitPressure() and, on the isentropic basis,
/// the isentropic exit temperature T2s it found on the way (for efficiencies()).
struct Expansion {
  double exitPressure = 0.0;                    ///< p2 [Pa]
  std::optional<double> isentropicTemperature;  ///< T2s at p2 (isentropic basis only) [K]
};
Expansion expansion(const thermo::Gas& gas, double temperature1, double pressure1, double temperature2,
                    EfficiencyBasis basis, double efficiency);

}  // namespace cw::components
