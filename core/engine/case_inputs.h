#pragma once
// The inputs of one turbojet design-point case (single or two spools): plain structs, SI units, no behaviour.
//
// The defaults describe a sensible lossy single-spool turbojet at sea-level static on a
// standard day (invented round numbers, common practice, no source): pressure ratio 10,
// burner exit 1400 K, isentropic compressor and turbine efficiencies 0.85 and 0.88, 20 kg/s.
//
// "Exactly one of" choices are explicit in the types:
//   - between dimensionless loss figures (isentropic or polytropic efficiency, pressure
//     recovery or ram efficiency, velocity coefficient or nozzle efficiency): an enum basis
//     and one value;
//   - between alternatives with different quantities or fields (standard atmosphere or given
//     ambient state, mass flow or thrust, exit temperature or fuel-air ratio, gas model,
//     nozzle geometry): a std::variant of small structs.
//
// Every field is described once in the registry of parameters (parameter_registry.h): its
// case-file key (with the SI unit in its name), valid range, default, label and how it is read
// and set; validation (case_validation.h), the case file (core/io/case_file.h) and
// docs/case-format.md follow from it.

#include "atmosphere/ambient_inputs.h"
#include "components/compressor_inputs.h"
#include "components/duct_inputs.h"
#include "components/efficiency_inputs.h"
#include "components/heat_addition_inputs.h"
#include "components/inlet_inputs.h"
#include "components/nozzle_inputs.h"
#include "components/turbine_inputs.h"
#include "engine/gas_model_inputs.h"
#include "thermo/fuel_inputs.h"

#include <string>
#include <variant>

namespace cw::engine {

// The case's vocabulary in cw::engine: each part's inputs live beside what they describe (the
// components' in components/<name>_inputs.h, the ambient state beside the atmosphere, the fuel in
// thermo/fuel_inputs.h, the gas-model choice beside its factory) and are named here as well.
using atmosphere::GivenAmbient;
using atmosphere::StandardAtmosphereAmbient;
using components::AfterburnerInputs;
using components::BurnerInputs;
using components::CompressorInputs;
using components::ConvergentNozzle;
using components::DuctInputs;
using components::Efficiency;
using components::EfficiencyBasis;
using components::ExitTemperatureSetting;
using components::FixedAreaRatioNozzle;
using components::FuelAirRatioSetting;
using components::FullyExpandingNozzle;
using components::InletInputs;
using components::InletLossBasis;
using components::NozzleInputs;
using components::NozzleLossBasis;
using components::SupersonicRecoveryRule;
using components::TurbineInputs;
using thermo::FuelInputs;

// ---------------------------------------------------------------------------------------------
// Flight condition

struct FlightInputs {
  std::variant<StandardAtmosphereAmbient, GivenAmbient> ambient;
  double mach = 0.0;              ///< flight Mach number [-]
  double specificHumidity = 0.0;  ///< water vapour per unit mass of humid air [kg/kg]
  bool operator==(const FlightInputs&) const = default;
};

// ---------------------------------------------------------------------------------------------
// Design target: what fixes the engine's size

struct AirMassFlowTarget {
  double airMassFlow = 20.0;  ///< engine-face air mass flow [kg/s]
  bool operator==(const AirMassFlowTarget&) const = default;
};

struct NetThrustTarget {
  double netThrust = 10000.0;  ///< required net thrust; the air mass flow follows [N]
  bool operator==(const NetThrustTarget&) const = default;
};

struct DesignInputs {
  std::variant<AirMassFlowTarget, NetThrustTarget> target;
  bool operator==(const DesignInputs&) const = default;
};

// ---------------------------------------------------------------------------------------------

/// Inputs of the engine-face sizing (station 2 area and diameter).
struct SizingInputs {
  double engineFaceMach = 0.5;  ///< axial Mach number at the compressor face [-]
  double hubToTipRatio = 0.4;   ///< hub / tip radius at the face [-]
  bool operator==(const SizingInputs&) const = default;
};

// ---------------------------------------------------------------------------------------------
// Architecture: which network of components the case describes

/// The engine's architecture. Each names a topology (the components, streams, shafts and
/// nozzles); the case holds the inputs of every role a topology may use, and a role's inputs
/// apply only to the architectures that have it.
enum class Architecture {
  Turbojet,          ///< single spool: compressor and turbine on one shaft
  TwoSpoolTurbojet,  ///< LP compressor and turbine on the LP shaft, HP ones on the HP shaft
};

/// The roles of the case's compressor and turbine inputs by architecture (case_roles.h maps
/// each role to its member in one place; the registry of parameters describes them through it):
///   Turbojet:          compressor -> "compressor", turbine -> "turbine";
///   TwoSpoolTurbojet:  lowPressureCompressor -> "low_pressure_compressor",
///                      compressor -> "high_pressure_compressor",
///                      turbine -> "high_pressure_turbine",
///                      lowPressureTurbine -> "low_pressure_turbine".
/// Defaults of the low-pressure spool (invented round numbers, common practice, no source): a
/// new two-spool case splits an overall pressure ratio of 10 as 2.5 (LP) times 4 (HP), setting
/// the HP compressor's ratio where the case is created.
inline CompressorInputs defaultLowPressureCompressor() {
  CompressorInputs lp;
  lp.pressureRatio = 2.5;
  lp.efficiency = Efficiency{EfficiencyBasis::Isentropic, 0.87};
  return lp;
}
inline TurbineInputs defaultLowPressureTurbine() {
  TurbineInputs lp;
  lp.efficiency = Efficiency{EfficiencyBasis::Isentropic, 0.89};
  return lp;
}

// ---------------------------------------------------------------------------------------------

/// One design-point case of a turbojet (single or two spools, per architecture).
struct Case {
  std::string title;
  std::string notes;
  FlightInputs flight;
  DesignInputs design;
  FuelInputs fuel;
  GasModelInputs gasModel;
  InletInputs inlet;
  CompressorInputs compressor;
  BurnerInputs burner;
  TurbineInputs turbine;
  DuctInputs jetPipe;
  AfterburnerInputs afterburner;
  NozzleInputs nozzle;
  SizingInputs sizing;
  Architecture architecture = Architecture::Turbojet;
  /// Two-spool turbojet only: the LP compressor (pt25 / pt2) and the LP turbine; `compressor`
  /// and `turbine` are then the high-pressure ones.
  CompressorInputs lowPressureCompressor = defaultLowPressureCompressor();
  TurbineInputs lowPressureTurbine = defaultLowPressureTurbine();
  bool operator==(const Case&) const = default;
};

/// A new case of `architecture` with the defaults; a two-spool case's HP compressor at a ratio of
/// 4, so that with the LP compressor's 2.5 the overall ratio stays the single spool's 10. The
/// case reader starts from it, and File > New.
inline Case newCase(Architecture architecture) {
  Case c;
  c.architecture = architecture;
  if (architecture == Architecture::TwoSpoolTurbojet) c.compressor.pressureRatio = 4.0;
  return c;
}

}  // namespace cw::engine
