#include "flow/normal_shock.h"

#include "common/error.h"
#include "flow/compressible_flow.h"
#include "flow/ideal_gas_relations.h"
#include "flow/root_finder.h"

#include <cmath>

namespace cw::flow {

NormalShock normalShock(const thermo::Gas& gas, double T1, double p1, double M1) {
  ideal::checkShockMach(M1);
  NormalShock shock;
  shock.upstream = fromStatic(gas, T1, p1, M1);
  const FlowState& up = shock.upstream;
  if (M1 == 1.0) {
    shock.downstream = up;  // a sonic stream: the shock has vanished
    return shock;
  }
  const double R = gas.gasConstant();
  const double V1 = up.velocity;
  const double m = up.density * V1;  // mass flux
  const double ht = up.totalEnthalpy;
  // Momentum and energy with the state equation, as F(V2) above.
  auto F = [&](double V) {
    return p1 + m * (V1 - V) - m * R * gas.temperatureFromEnthalpy(ht - 0.5 * V * V) / V;
  };

  // The sonic velocity of the stream's total enthalpy, where F is largest.
  const double aStar = sonicState(gas, up.total.temperature, up.total.pressure).velocity;
  double V2;
  if (F(aStar) <= 0.0) {
    // So weak a shock that F(a*) is lost in rounding: Prandtl's relation V1 V2 = a*^2 (exact for a
    // calorically perfect gas; Anderson, Modern Compressible Flow, 3rd ed., 2003, eq. 3.47, from
    // memory) is then accurate to second order in (M1 - 1).
    V2 = aStar * aStar / V1;
  } else {
    double lo = 0.5 * aStar;
    for (int i = 0; F(lo) >= 0.0; ++i) {
      if (i >= 60)
        throw NoSolution("normal shock", "no downstream state below the sonic velocity",
                         {kReasonNormalShock, {}, {}, {}});
      lo *= 0.5;
    }
    V2 = findRoot(F, lo, aStar, "normal shock: downstream velocity");
  }
  const double T2 = gas.temperatureFromEnthalpy(ht - 0.5 * V2 * V2);
  const double p2 = p1 + m * (V1 - V2);  // momentum
  shock.downstream = fromStatic(gas, T2, p2, V2 / gas.speedOfSound(T2));
  return shock;
}

}  // namespace cw::flow
