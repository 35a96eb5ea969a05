#pragma once
// A normal shock on any frozen-composition gas: the conservation of mass, momentum and energy
// across a stationary normal shock (NACA Report 1135, eqs. 89-91 in their general form, numbering
// from memory),
//
//   rho1 V1 = rho2 V2 = m,   p1 + m V1 = p2 + m V2,   h1 + V1^2/2 = h2 + V2^2/2 = ht,
//
// closed by p2 = rho2 R T2 and h2 = h(T2). With the downstream velocity V2 as unknown,
//
//   F(V2) = p1 + m (V1 - V2) - m R T(ht - V2^2/2) / V2 = 0,
//
// which has the trivial root V2 = V1 and the shock root below the sonic velocity a* of ht
// (F'(V) = (m / gamma) (a^2/V^2 - 1) vanishes at M = 1, so F is largest at a* and the two
// roots lie on either side). The shock root is found with Brent's method on (0, a*).

#include "flow/flow_state.h"
#include "thermo/gas.h"

namespace cw::flow {

struct NormalShock {
  FlowState upstream;
  FlowState downstream;
};

/// The shock ahead of which the static state is (T1, p1) at Mach M1 in [1, 50];
/// throws cw::InvalidInput for M1 outside that range.
NormalShock normalShock(const thermo::Gas& gas, double upstreamTemperature, double upstreamPressure,
                        double upstreamMach);

}  // namespace cw::flow
