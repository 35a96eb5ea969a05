#pragma once
// Heat addition by burning fuel: the burner (combustor, stations 3 -> 4) and the lit
// afterburner (6 -> 7) are both this class.
//
// Energy balance per unit of the stream's air, entry fuel-air ratio f1, fuel added df:
//   (1 + f1) h_in(T_in) + df [h_fuel - (1 - eta_b) LHV] = (1 + f1 + df) h_p(T_out; f1 + df)
// with absolute enthalpies on the gas model's reference (thermo/gas_model.h); the factors
// (1 + f) become 1 when the model neglects the fuel's mass (Mattingly, Elements of
// Propulsion, 2006, eq. 7.9 and, for the ideal cycle, eq. 5.19). Given T_out the equation
// is solved for df; it is linear in df for every model here, and the solve is checked and
// refined by secant steps. Given f, it is solved for T_out through T(h).
// Pressure: pt_out = pt_in (1 - dp/p).

#include "stream/station.h"
#include "thermo/gas_model.h"

namespace cw::components {

class HeatAddition {
 public:
  struct Result {
    stream::TotalState exit;
    double fuelMassFlow = 0.0;       ///< fuel added here [kg/s]
    double addedFuelAirRatio = 0.0;  ///< df, per unit of the stream's air [-]
  };

  /// `name` prefixes error messages ("burner", "afterburner").
  HeatAddition(std::string name, const thermo::GasModel& model, double pressureLossFraction,
               double combustionEfficiency);

  /// Heats the stream to the exit temperature; NoSolution when that needs a rich mixture
  /// or would take heat out. [K]
  Result toExitTemperature(const stream::TotalState& entry, double exitTemperature) const;
  /// Burns the given fuel-air ratio df (per unit of the stream's air).
  Result withFuelAirRatio(const stream::TotalState& entry, double addedFuelAirRatio) const;

 private:
  double residual(const stream::TotalState& entry, double df, double exitTemperature) const;
  /// Throws cw::NoSolution unless the exit is hotter than the entry.
  void requireHeating(const stream::TotalState& entry, double exitTemperature) const;
  Result finish(const stream::TotalState& entry, double df, double exitTemperature) const;

  std::string name_;
  const thermo::GasModel& model_;
  double pressureLossFraction_;
  double combustionEfficiency_;
};

}  // namespace cw::components
