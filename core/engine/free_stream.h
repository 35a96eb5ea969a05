#pragma once
// The free stream of a case's flight condition: its static state and Mach number.

#include "engine/case_inputs.h"

namespace cw::engine {

/// The free-stream static state and speed of the case's flight condition.
struct FreeStream {
  double temperature = 0.0;  ///< T0 [K]
  double pressure = 0.0;     ///< p0 [Pa]
  double mach = 0.0;         ///< M0 [-]
};

/// The standard atmosphere at the case's altitude, or the given ambient state. [K], [Pa], [-]
FreeStream freeStreamOf(const FlightInputs& flight);

}  // namespace cw::engine
