#pragma once
// Process paths between stations, for the temperature-entropy and pressure-volume charts.

#include <string>
#include <vector>

namespace cw::engine {

/// One thermodynamic state on a path. Units: T [K], s [J/(kg K)] (zero at the free-stream
/// static state), p [Pa], v [m^3/kg], h [J/kg] (on the gas model's reference, absolute for the
/// thermally perfect model), h_s = h - h(298.15 K) at the gas's composition [J/kg] (the h-s chart's).
struct PathState {
  double temperature = 0.0;
  double entropy = 0.0;
  double pressure = 0.0;
  double specificVolume = 0.0;
  double enthalpy = 0.0;
  double sensibleEnthalpy = 0.0;
};

/// The states a process passes through, from its entry station to its exit station.
struct ProcessPath {
  std::string component;  ///< "inlet", "compressor", "burner", "turbine", "jet_pipe", "afterburner",
                          ///< "nozzle", "closure"
  std::string fromStation;
  std::string toStation;
  bool closure = false;  ///< true for the open-cycle closure from exhaust to ambient (drawn dashed)
  std::vector<PathState> states;
};

}  // namespace cw::engine
