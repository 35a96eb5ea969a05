#pragma once
// The result of one design-point evaluation: stations, performance, sizing, process paths
// and what each component did. SI throughout; the command line and GUI convert for display.

#include "components/efficiency.h"
#include "engine/process_path.h"
#include "stream/station.h"

#include <memory>
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
  double jetVelocity = 0.0;           ///< V9, of the core nozzle [m/s]
  double effectiveJetVelocity = 0.0;  ///< F_g / W9, over every nozzle [m/s]
  bool nozzleChoked = false;          ///< the core nozzle's throat is sonic
  double shaftPowerOfftake = 0.0;     ///< P_x, delivered by every shaft's offtake [W]
};

/// The areas of one nozzle (every nozzle of the network, in its order).
struct NozzleSizing {
  std::string nozzle;       ///< the nozzle's component name
  double throatArea = 0.0;  ///< geometric throat area [m^2]
  double exitArea = 0.0;    ///< geometric exit area [m^2]
};

struct Sizing {
  double airMassFlow = 0.0;           ///< W2 [kg/s]
  std::optional<double> captureArea;  ///< A0 = W2 / (rho0 V0); undefined at V0 = 0 [m^2]
  double engineFaceArea = 0.0;        ///< annulus area at the face Mach number [m^2]
  double engineFaceDiameter = 0.0;    ///< tip diameter of that annulus [m]
  double throatArea = 0.0;            ///< geometric A8 = effective / C_d, of the core nozzle [m^2]
  double exitArea = 0.0;              ///< geometric A9, of the core nozzle [m^2]
  double fuelFlow = 0.0;              ///< [kg/s]
  std::vector<NozzleSizing> nozzles;  ///< every nozzle, the core's first
};

/// What each component did, for reports and the loss audit.
struct ComponentSummary {
  std::string component;  ///< "inlet", "compressor", ...
  double power = 0.0;     ///< shaft power absorbed (+) or delivered (-) [W]; 0 if none
  std::optional<components::EfficiencyPair> efficiency;  ///< turbomachines and nozzle [-]
  double entropyGeneration = 0.0;     ///< S_gen [W/K], rate of entropy generated in the component
  double combustionEfficiency = 1.0;  ///< heat additions: the heating value's fraction released [-]
};

/// A control volume of the second-law balance (analysis/exergy_balance.h), as the network
/// describes it: a stream's passage through a component (or a part of one) from an entry to an
/// exit station, or a shaft's mechanical loss.
struct ControlVolume {
  enum class Kind {
    Adiabatic,     ///< no side stream: S_gen = W_exit (s_exit - s_entry)
    Bleeding,      ///< air leaves at the exit state (a compressor's bleed, W_entry - W_exit)
    HeatAddition,  ///< fuel joins the stream (burner, afterburner)
    Shaft,         ///< a shaft's mechanical loss, dissipated at T0
  };
  std::string name;  ///< "inlet", "compressor", ..., "shaft"
  Kind kind = Kind::Adiabatic;
  std::string entry;                  ///< station id (a stream's volumes)
  std::string exit;                   ///< station id, possibly an internal station (a stream's volumes)
  std::string shaft;                  ///< the shaft's name (Kind::Shaft)
  double combustionEfficiency = 1.0;  ///< Kind::HeatAddition [-]
};

/// One shaft's work balance: eta_m P_t = P_c + P_x.
struct ShaftBalance {
  std::string name;                   ///< "shaft", "low_pressure_shaft", ...
  double mechanicalEfficiency = 1.0;  ///< eta_m [-]
  double powerOfftake = 0.0;          ///< P_x [W]
  double compressorPower = 0.0;       ///< P_c, every compressor on it [W]
  double turbinePower = 0.0;          ///< P_t, every turbine on it [W]
};

/// What the network says about its stations and volumes, so that no code outside a topology
/// names a station id: the charts' isobars, the second-law balance, the burner exit of an audit.
/// It depends on the topology's shape alone, never on the inputs (networks of one shape share it).
struct NetworkDescription {
  std::string freeStream;                   ///< the free stream's station ("0")
  std::string engineFace;                   ///< the engine face ("2")
  std::string burnerEntry;                  ///< the main burner's entry ("3")
  std::string burnerExit;                   ///< the main burner's exit ("4")
  std::vector<std::string> staticStations;  ///< stations whose static state is on the cycle (0, 9)
  std::vector<std::string> throats;         ///< nozzle throats: no isobar of their own (8)
  std::vector<std::string> nozzleExits;     ///< every nozzle's exit, the core's first (9)
  std::vector<ControlVolume> volumes;       ///< in flow order
};

struct CycleResult {
  std::vector<Station> stations;  ///< in flow order, e.g. 0, 2, 3, 4, 5, (6), 7, 8, 9 (the topology's)
  Performance performance;
  Sizing sizing;
  std::vector<ProcessPath> paths;  ///< one per process, plus the closure
  std::vector<ComponentSummary> components;
  std::vector<ShaftBalance> shafts;                   ///< one per shaft, in the topology's order
  std::vector<Station> internalStations;              ///< states inside a component (not reported)
  std::shared_ptr<const NetworkDescription> network;  ///< the topology's description

  /// The station with the given SAE number; throws std::out_of_range when absent.
  const Station& station(const std::string& id) const;
  /// A reported or internal station; throws std::out_of_range when absent.
  const Station& anyStation(const std::string& id) const;
  /// Tt at the main burner's exit (Tt4). [K]
  double burnerExitTemperature() const { return station(network->burnerExit).totalTemperature; }
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
