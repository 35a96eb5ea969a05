#pragma once
// A station of the gas path (SAE AS755 numbering): its total and static state, flow and gas; and
// a stream's total state, what a component takes in and gives out. Below components/ and engine/,
// which both speak of them; engine/cycle_result.h names them in cw::engine as well.

#include "thermo/gas.h"

#include <memory>
#include <optional>
#include <string>

namespace cw::stream {

struct Station {
  std::string id;  ///< SAE AS755 station number, e.g. "0", "2", "3", "4", "5", "7", "8", "9"
  std::shared_ptr<const thermo::Gas> gas;  ///< the gas of the stream at this station
  double totalTemperature = 0.0;           ///< Tt [K]
  double totalPressure = 0.0;              ///< pt [Pa]
  double totalEnthalpy = 0.0;              ///< ht [J/kg], on the gas model's reference
  double staticTemperature = 0.0;          ///< Ts [K]
  double staticPressure = 0.0;             ///< ps [Pa]
  double mach = 0.0;                       ///< M [-]
  double velocity = 0.0;                   ///< V [m/s]
  double massFlow = 0.0;                   ///< W [kg/s], air plus fuel unless the model neglects fuel mass
  double fuelAirRatio = 0.0;               ///< f [-], fuel per unit of the stream's air
  double entropy = 0.0;                    ///< s [J/(kg K)], zero at the free-stream static state
  std::optional<double> area;              ///< flow area [m^2] where defined (capture, face, throat, exit)

  /// cp and gamma at the total temperature. [J/(kg K)], [-]
  double cp() const { return gas->cp(totalTemperature); }
  double gamma() const { return gas->gamma(totalTemperature); }
  /// Sensible enthalpy h - h(298.15 K) at the station's composition, of the total and of the
  /// static state (thermo::Gas::sensibleEnthalpy). [J/kg]
  double totalSensibleEnthalpy() const { return gas->sensibleEnthalpy(totalTemperature); }
  double staticSensibleEnthalpy() const { return gas->sensibleEnthalpy(staticTemperature); }
};

/// A stream's total state: the part of a station that a component changes.
struct TotalState {
  std::shared_ptr<const thermo::Gas> gas;
  double temperature = 0.0;   ///< Tt [K]
  double pressure = 0.0;      ///< pt [Pa]
  double enthalpy = 0.0;      ///< ht [J/kg]
  double massFlow = 0.0;      ///< W [kg/s]
  double fuelAirRatio = 0.0;  ///< f [-]
};

}  // namespace cw::stream
