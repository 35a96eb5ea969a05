#pragma once
// Builders of the process paths that the charts draw between stations.
//
//   pressurePath  s linear in ln p between the end states: for a thermally perfect gas this
//                 is exactly a polytropic change of constant efficiency (ds° = (R/e) d ln p,
//                 Mattingly, Elements of Propulsion, 2006, sec. 4.3.4); used for the inlet,
//                 compressor, turbine, ducts and nozzle.
//   heatingPath   the burner: pressure falling linearly from entry to exit, temperature rising
//                 linearly, and the properties blended linearly from those of the entry gas to
//                 those of the exit gas at the same (T, p) (a drawing convention, exact at both ends).
//   closurePath   the open cycle's return from exhaust to the free-stream static state: the
//                 constant-pressure heat rejection it stands for, an isobar at the ambient
//                 pressure p0 (temperature linear, the gas blended from exhaust to air, exact
//                 at both ends), after an expansion at constant entropy from p9 to p0 where
//                 the exhaust is not at ambient pressure (drawn dashed).

#include "engine/process_path.h"
#include "thermo/gas.h"

namespace cw::engine {

inline constexpr int kPathStates = 24;
/// States of the closure's expansion from p9 to p0 (when they differ), its end included.
inline constexpr int kClosureExpansionStates = 8;

ProcessPath pressurePath(std::string component, std::string from, std::string to, const thermo::Gas& gas,
                         double t1, double p1, double t2, double p2, double entropyReference);

ProcessPath heatingPath(std::string component, std::string from, std::string to, const thermo::Gas& entryGas,
                        const thermo::Gas& exitGas, double t1, double p1, double t2, double p2,
                        double entropyReference);

/// The closure from a nozzle's exit (station `from`) to the free stream (station `to`).
ProcessPath closurePath(const thermo::Gas& exhaustGas, double t9, double p9, double t0, double p0,
                        double entropyReference, const thermo::Gas& air, std::string from = {},
                        std::string to = {});

}  // namespace cw::engine
