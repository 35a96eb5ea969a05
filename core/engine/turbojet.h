#pragma once
// The single-spool turbojet: an assembly of components joined by stations.
//
//   0 free stream -> Inlet -> 2 -> Compressor -> 3 -> Burner -> 4 -> Turbine -> 5
//     -> Jet pipe -> 7 (or -> 6 -> Afterburner -> 7 when the afterburner is lit)
//     -> Nozzle -> 8 throat -> 9 exit
//
// The assembly only routes states between the components (components/*) and adds up
// performance; it holds no component physics of its own. A turbofan is another assembly
// of mostly the same components.

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"
#include "thermo/gas_model.h"

#include <memory>

namespace cw::engine {

class Turbojet {
 public:
  /// Builds the gas model and the components of a validated case. Without paths, the
  /// evaluation skips the process paths that only the charts need (sweeps, audits).
  explicit Turbojet(const Case& inputs, bool withPaths = true);

  /// Evaluates the design point: at the case's air mass flow, or at the air mass flow that
  /// gives the required net thrust. Throws cw::NoSolution when no cycle exists.
  CycleResult evaluate() const;

  /// Evaluates at a given engine-face air mass flow W2. [kg/s]
  CycleResult evaluateAt(double airMassFlow) const;

  const thermo::GasModel& gasModel() const { return *gasModel_; }

 private:
  Case inputs_;
  bool withPaths_;
  std::shared_ptr<const thermo::GasModel> gasModel_;
};

/// The design point of a validated case, as Turbojet(inputs, withPaths).evaluate() gives it, on a gas
/// model built for the case's gas model inputs, fuel and humidity (makeGasModel), without
/// a copy of the case: for callers that evaluate a case and its variants on one gas model.
CycleResult evaluateTurbojet(const Case& inputs, const thermo::GasModel& gasModel, bool withPaths = true);

/// The free-stream static state and speed of the case's flight condition.
struct FreeStream {
  double temperature = 0.0;  ///< T0 [K]
  double pressure = 0.0;     ///< p0 [Pa]
  double mach = 0.0;         ///< M0 [-]
};
FreeStream freeStreamOf(const FlightInputs& flight);

}  // namespace cw::engine
