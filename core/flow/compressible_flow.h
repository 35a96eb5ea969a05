#pragma once
// One-dimensional adiabatic, isentropic flow relations on any frozen-composition gas
// (cw::thermo::Gas), calorically imperfect allowed. With h(T), s°(T) and a(T) from the gas:
//
//   energy      ht = h(T) + V^2 / 2                       (steady adiabatic flow, no work)
//   Mach        V = M a(T),  a^2 = gamma(T) R T           (frozen speed of sound)
//   isentrope   s°(T) - R ln(p / p_ref) = s°(Tt) - R ln(pt / p_ref)
//               =>  p = pt exp((s°(T) - s°(Tt)) / R)
//
// (Mattingly, Elements of Propulsion, 2006, secs. 2.8 and 3.2, for the energy equation and the
// isentropic relation of a thermally perfect gas.) For a constant-cp gas they reduce to the
// closed forms of flow/ideal_gas_relations.h. The maximum mass flow per unit area of an
// isentropic stream, rho V, occurs at M = 1 because d(rho V)/dV = rho (1 - V^2 / a^2) along
// an isentrope (d p = a^2 d rho); the choked state is the sonic state.
//
// Valid inputs: Tt and T inside the gas's temperature range, pressures in (0, inf) Pa, Mach
// number in [0, 50] (and such that the static temperature stays inside the gas's range).
// Solvers converge to better than 1e-10 relative or throw cw::NotConverged.

#include "flow/flow_state.h"
#include "thermo/gas.h"

namespace cw::flow {

/// Static state from the total state (Tt, pt) and the Mach number.
FlowState fromTotal(const thermo::Gas& gas, double totalTemperature, double totalPressure, double mach);

/// Total state from the static state (T, p) and the Mach number.
FlowState fromStatic(const thermo::Gas& gas, double staticTemperature, double staticPressure, double mach);

/// Mach number of an isentropic stream of total temperature Tt whose total-to-static
/// pressure ratio is pt/p >= 1.
double machFromPressureRatio(const thermo::Gas& gas, double totalTemperature,
                             double totalToStaticPressureRatio);

/// Mass flow per unit area rho V at (Tt, pt, M). [kg/(s m^2)]
double massFlowPerArea(const thermo::Gas& gas, double totalTemperature, double totalPressure, double mach);

/// The sonic (choked) state at (Tt, pt): T*, p*, rho*, a* = V*.
FlowState sonicState(const thermo::Gas& gas, double totalTemperature, double totalPressure);

/// Mass flow per unit throat area at choking, rho* a*: the largest rho V of the stream. [kg/(s m^2)]
double chokedMassFlowPerArea(const thermo::Gas& gas, double totalTemperature, double totalPressure);

}  // namespace cw::flow
