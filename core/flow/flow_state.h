#pragma once
// One-dimensional flow states: a total (stagnation) state, a static state, and the two
// tied together by a velocity. SI units: T [K], p [Pa], h [J/kg], rho [kg/m^3], V and a [m/s].

namespace cw::flow {

/// The state a stream reaches when brought to rest adiabatically and isentropically.
struct TotalState {
  double temperature = 0.0;  ///< Tt [K]
  double pressure = 0.0;     ///< pt [Pa]
};

/// The thermodynamic state moving with the stream.
struct StaticState {
  double temperature = 0.0;  ///< T [K]
  double pressure = 0.0;     ///< p [Pa]
};

/// A moving stream: its static and total states, velocity and Mach number.
struct FlowState {
  TotalState total;
  StaticState local;           ///< the static state
  double totalEnthalpy = 0.0;  ///< ht = h + V^2/2 [J/kg]
  double enthalpy = 0.0;       ///< static h [J/kg]
  double density = 0.0;        ///< static rho = p / (R T) [kg/m^3]
  double speedOfSound = 0.0;   ///< a(T) [m/s]
  double velocity = 0.0;       ///< V [m/s]
  double mach = 0.0;           ///< M = V / a [-]

  /// Mass flow per unit area rho V. [kg/(s m^2)]
  double massFlux() const { return density * velocity; }
};

}  // namespace cw::flow
