#pragma once
// The inputs of one turbojet design-point case: plain structs, SI units, no behaviour.
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
// Valid ranges are checked by cw::engine::validateCase (case_validation.h) and listed in
// docs/case-format.md; the case file (core/io/case_file.h) maps every field to a JSON key
// that carries the SI unit in its name.

#include <string>
#include <variant>

namespace cw::engine {

// ---------------------------------------------------------------------------------------------
// Flight condition

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
// Fuel: a hydrocarbon C H_y, burnt completely

struct FuelInputs {
  double lowerHeatingValue = 43.0e6;  ///< at 298.15 K [J/kg]
  double hydrogenCarbonRatio = 1.9;   ///< molar H/C ratio y of C H_y [-]
  double temperature = 298.15;        ///< delivery temperature at the burner [K]
  bool operator==(const FuelInputs&) const = default;
};

// ---------------------------------------------------------------------------------------------
// Gas model

/// One cp and gamma everywhere.
struct ConstantCpGasModel {
  double cp = 1004.0;  ///< [J/(kg K)]
  double gamma = 1.4;  ///< [-]
  bool operator==(const ConstantCpGasModel&) const = default;
};

/// Air values up to the burner, product values after it (the textbook model).
struct TwoGammaGasModel {
  double coldCp = 1004.0;    ///< [J/(kg K)]
  double coldGamma = 1.4;    ///< [-]
  double hotCp = 1239.0;     ///< [J/(kg K)]
  double hotGamma = 1.3333;  ///< [-]
  bool operator==(const TwoGammaGasModel&) const = default;
};

/// NASA 7-coefficient species data, air plus complete-combustion products, frozen.
struct ThermallyPerfectGasModel {
  bool operator==(const ThermallyPerfectGasModel&) const = default;
};

struct GasModelInputs {
  std::variant<ThermallyPerfectGasModel, ConstantCpGasModel, TwoGammaGasModel> model;
  /// Leave the fuel's mass out of the flow; allowed only for the constant-cp and two-gamma models.
  bool neglectFuelMass = false;
  bool operator==(const GasModelInputs&) const = default;
};

// ---------------------------------------------------------------------------------------------
// Components

/// How the inlet's total-pressure loss is given.
enum class InletLossBasis {
  PressureRecovery,  ///< pt2 / pt0
  RamEfficiency,     ///< (h(T at pt2, s0) - h0) / (ht0 - h0): the fraction of the ram rise kept
};

/// A multiplier on the inlet's recovery above flight Mach 1.
enum class SupersonicRecoveryRule {
  None,       ///< no shock loss beyond the given recovery
  MilE5008B,  ///< 1 - 0.075 (M0 - 1)^1.35 for 1 < M0 < 5 (military specification MIL-E-5008B)
};

struct InletInputs {
  InletLossBasis lossBasis = InletLossBasis::PressureRecovery;
  double loss = 0.98;  ///< pressure recovery or ram efficiency, per lossBasis [-]
  SupersonicRecoveryRule supersonicRecoveryRule = SupersonicRecoveryRule::None;
  bool operator==(const InletInputs&) const = default;
};

/// How a turbomachine's efficiency is given; the other one is derived.
enum class EfficiencyBasis { Isentropic, Polytropic };

struct Efficiency {
  EfficiencyBasis basis = EfficiencyBasis::Isentropic;
  double value = 0.85;  ///< [-]
  bool operator==(const Efficiency&) const = default;
};

struct CompressorInputs {
  double pressureRatio = 10.0;  ///< pt3 / pt2 [-]
  Efficiency efficiency{EfficiencyBasis::Isentropic, 0.85};
  double bleedFraction = 0.0;  ///< bled off at compressor exit, per unit of inlet air [-]
  bool operator==(const CompressorInputs&) const = default;
};

struct ExitTemperatureSetting {
  double exitTemperature = 1400.0;  ///< Tt4 [K]
  bool operator==(const ExitTemperatureSetting&) const = default;
};

struct FuelAirRatioSetting {
  double fuelAirRatio = 0.02;  ///< fuel per unit of burner air [-]
  bool operator==(const FuelAirRatioSetting&) const = default;
};

struct BurnerInputs {
  std::variant<ExitTemperatureSetting, FuelAirRatioSetting> setting;
  double pressureLossFraction = 0.05;  ///< 1 - pt4 / pt3 [-]
  double combustionEfficiency = 0.99;  ///< fraction of the heating value released [-]
  bool operator==(const BurnerInputs&) const = default;
};

struct TurbineInputs {
  Efficiency efficiency{EfficiencyBasis::Isentropic, 0.88};
  double mechanicalEfficiency = 0.99;  ///< compressor power / turbine power, shaft losses [-]
  double powerOfftake = 0.0;           ///< shaft power taken for accessories [W]
  bool operator==(const TurbineInputs&) const = default;
};

/// A duct between components (the jet pipe from turbine exit to nozzle entry).
struct DuctInputs {
  double pressureLossFraction = 0.02;  ///< 1 - pt_out / pt_in [-]
  bool operator==(const DuctInputs&) const = default;
};

/// The afterburner: lit (enabled) or not. Unlit, its duct loses pressureLossFractionUnlit;
/// the default 0 describes an engine without afterburner hardware.
struct AfterburnerInputs {
  bool enabled = false;                    ///< lit
  double exitTemperature = 2000.0;         ///< Tt7 when lit [K]
  double pressureLossFractionLit = 0.05;   ///< 1 - pt_out / pt_in when lit [-]
  double pressureLossFractionUnlit = 0.0;  ///< 1 - pt_out / pt_in when not lit [-]
  double combustionEfficiency = 0.95;      ///< when lit [-]
  bool operator==(const AfterburnerInputs&) const = default;
};

/// A convergent nozzle: exit at the throat, choked or expanded to ambient pressure.
struct ConvergentNozzle {
  bool operator==(const ConvergentNozzle&) const = default;
};

/// A convergent-divergent nozzle whose exit area expands the jet fully to ambient pressure.
struct FullyExpandingNozzle {
  bool operator==(const FullyExpandingNozzle&) const = default;
};

/// A convergent-divergent nozzle of fixed exit-to-throat area ratio.
struct FixedAreaRatioNozzle {
  double exitToThroatAreaRatio = 1.5;  ///< A9 / A8 [-]
  bool operator==(const FixedAreaRatioNozzle&) const = default;
};

/// How the nozzle's expansion loss is given.
enum class NozzleLossBasis {
  VelocityCoefficient,   ///< V9 / V9,ideal
  IsentropicEfficiency,  ///< (ht7 - h9) / (ht7 - h9,ideal)
};

struct NozzleInputs {
  std::variant<ConvergentNozzle, FullyExpandingNozzle, FixedAreaRatioNozzle> geometry;
  NozzleLossBasis lossBasis = NozzleLossBasis::VelocityCoefficient;
  double loss = 0.98;                  ///< velocity coefficient or isentropic efficiency [-]
  double dischargeCoefficient = 0.98;  ///< actual / ideal throat mass flow [-]
  bool operator==(const NozzleInputs&) const = default;
};

/// Inputs of the engine-face sizing (station 2 area and diameter).
struct SizingInputs {
  double engineFaceMach = 0.5;  ///< axial Mach number at the compressor face [-]
  double hubToTipRatio = 0.4;   ///< hub / tip radius at the face [-]
  bool operator==(const SizingInputs&) const = default;
};

// ---------------------------------------------------------------------------------------------

/// One design-point case of a single-spool turbojet.
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
  bool operator==(const Case&) const = default;
};

}  // namespace cw::engine
