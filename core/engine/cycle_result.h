#pragma once
// The result of one design-point evaluation: stations, performance, sizing, process paths
// and what each component did. SI throughout; the command line and GUI convert for display.

#include "components/efficiency.h"
#include "engine/process_path.h"
#include "stream/station.h"

#include <optional>
#include <string>
#include <vector>

namespace cw::engine {

// The gas path's stations and total states (stream/station.h), named in the engine's results.
using stream::Station;
using stream::TotalState;

struct Performance {
  double netThrust = 0.0;                      ///< F_n = F_g - D_ram [N]
  double grossThrust = 0.0;                    ///< W9 V9 + (p9 - p0) A9 [N]
  double ramDrag = 0.0;                        ///< W0 V0 [N]
  double specificThrust = 0.0;                 ///< F_n / W2, per unit inlet air flow [N s/kg]
  double thrustSpecificFuelConsumption = 0.0;  ///< W_f / F_n [kg/(N s)]; 0 when F_n <= 0
  double fuelFlow = 0.0;                       ///< burner plus afterburner [kg/s]
  double fuelAirRatio = 0.0;                   ///< total fuel per unit of burner air flow W3 [-]
  /// Earth frame, P_u = F_n V0 + P_x, E_w = (W9/2)(V_e - V0)^2, input W_f (LHV + V0^2/2):
  double thermalEfficiency = 0.0;     ///< (P_u + E_w) / input [-]
  double propulsiveEfficiency = 0.0;  ///< P_u / (P_u + E_w), in [0, 1] [-]
  double overallEfficiency = 0.0;     ///< P_u / input = thermal x propulsive [-]
  double jetVelocity = 0.0;           ///< V9 [m/s]
  double effectiveJetVelocity = 0.0;  ///< F_g / W9 [m/s]
  bool nozzleChoked = false;
};

struct Sizing {
  double airMassFlow = 0.0;           ///< W2 [kg/s]
  std::optional<double> captureArea;  ///< A0 = W2 / (rho0 V0); undefined at V0 = 0 [m^2]
  double engineFaceArea = 0.0;        ///< annulus area at the face Mach number [m^2]
  double engineFaceDiameter = 0.0;    ///< tip diameter of that annulus [m]
  double throatArea = 0.0;            ///< geometric A8 = effective / C_d [m^2]
  double exitArea = 0.0;              ///< geometric A9 [m^2]
  double fuelFlow = 0.0;              ///< [kg/s]
};

/// What each component did, for reports and the loss audit.
struct ComponentSummary {
  std::string component;  ///< "inlet", "compressor", ...
  double power = 0.0;     ///< shaft power absorbed (+) or delivered (-) [W]; 0 if none
  std::optional<components::EfficiencyPair> efficiency;  ///< turbomachines and nozzle [-]
  double entropyGeneration = 0.0;  ///< S_gen [W/K], rate of entropy generated in the component
};

struct CycleResult {
  std::vector<Station> stations;  ///< in flow order: 0, 2, 3, 4, 5, (6), 7, 8, 9
  Performance performance;
  Sizing sizing;
  std::vector<ProcessPath> paths;  ///< one per process, plus the closure
  std::vector<ComponentSummary> components;

  /// The station with the given SAE number; throws std::out_of_range when absent.
  const Station& station(const std::string& id) const;
};

/// Throws cw::NoSolution naming the quantity when any number of the result (performance, sizing,
/// stations, components, paths) is not finite: no NaN or infinity leaves the core. which names the
/// result in the message ("cycle with losses", "ideal twin").
void requireFinite(const CycleResult& result, const std::string& which);

/// An evaluation: the cycle with losses and its ideal twin.
struct Evaluation {
  CycleResult actual;
  CycleResult ideal;
};

}  // namespace cw::engine
