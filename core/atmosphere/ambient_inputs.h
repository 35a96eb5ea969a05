#pragma once
// The two ways a case gives the ambient static state: the standard atmosphere at an altitude and
// temperature offset, or the state itself. Plain structs, SI units (engine::FlightInputs holds one).

namespace cw::atmosphere {

/// Ambient state from the U.S. Standard Atmosphere 1976 with a temperature offset.
struct StandardAtmosphereAmbient {
  double altitude = 0.0;           ///< [m], geopotential unless geometricAltitude
  bool geometricAltitude = false;  ///< altitude is geometric (true) or geopotential (false)
  double isaOffset = 0.0;          ///< added to the standard temperature, pressure unchanged [K]
  bool operator==(const StandardAtmosphereAmbient&) const = default;
};

/// Ambient static state given directly (e.g. a test-cell or measured day).
struct GivenAmbient {
  double temperature = 288.15;  ///< static temperature [K]
  double pressure = 101325.0;   ///< static pressure [Pa]
  bool operator==(const GivenAmbient&) const = default;
};

}  // namespace cw::atmosphere
