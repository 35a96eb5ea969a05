#pragma once
// A hydrocarbon fuel C H_y given by its molar hydrogen-to-carbon ratio y and its lower heating
// value LHV at 298.15 K (water in the products as vapour). Quantities per kilogram of fuel.
//
// Complete combustion of one mole of C H_y (mass M_f = M_C + y M_H, standard atomic weights as
// in the species data):
//
//   C H_y + (1 + y/4) O2  ->  CO2 + (y/2) H2O
//
// The fuel's enthalpy of formation follows from the energy balance of that reaction at
// 298.15 K, so that burning the fuel on the absolute (NASA) enthalpy scale gives back the LHV:
//
//   M_f LHV = h_f,fuel + (1 + y/4) h_O2(T0) - h_CO2(T0) - (y/2) h_H2O(T0),   T0 = 298.15 K
//   =>  h_f,fuel = M_f LHV + h_CO2(T0) + (y/2) h_H2O(T0) - (1 + y/4) h_O2(T0)     [J/mol]
//
// (the definition of the heating value as the enthalpy of reaction with reactants and products
// at the same temperature; e.g. Cengel and Boles, Thermodynamics: An Engineering Approach,
// ch. 15), with h_i(T0) the absolute species enthalpies of thermo/species_thermo.h.
//
// Sensible enthalpy of the fuel: the fuel is delivered as a liquid of constant specific heat,
//   h_fuel(T) = h_f,fuel / M_f + cp_fuel (T - T0),  cp_fuel = 2000 J/(kg K) by default
// (a liquid kerosene-like value, common practice, no source), for delivery temperatures in
// [200, 1000] K. The LHV is taken as that of the fuel in the delivered (liquid) state.

#include "thermo/species_table.h"

namespace cw::thermo {

class HydrocarbonFuel {
 public:
  /// Reference temperature of the heating value and of the formation enthalpy. [K]
  static constexpr double kReferenceTemperature = 298.15;
  /// Default specific heat of the (liquid) fuel: common practice, no source. [J/(kg K)]
  static constexpr double kDefaultCp = 2000.0;
  /// Range of the fuel's delivery temperature. [K]
  static constexpr double kMinimumTemperature = 200.0;
  static constexpr double kMaximumTemperature = 1000.0;
  /// Valid ranges of the inputs (as the case files).
  static constexpr double kMaximumHydrogenCarbonRatio = 4.0;  ///< methane, the most hydrogen-rich alkane
  static constexpr double kMinimumHeatingValue = 1.0e6;       ///< [J/kg]
  static constexpr double kMaximumHeatingValue = 1.5e8;       ///< [J/kg]

  /// Throws cw::InvalidInput unless 0 <= y <= 4, 1e6 <= LHV <= 1.5e8 J/kg and 0 < cp_fuel <= 1e4 J/(kg K).
  HydrocarbonFuel(double hydrogenCarbonRatio, double lowerHeatingValue, double cp = kDefaultCp,
                  const SpeciesTable& table = SpeciesTable::standard());

  /// A kerosene-like fuel: y = 1.9, LHV = 43.0 MJ/kg (typical of aviation kerosene, common
  /// practice, no source).
  static HydrocarbonFuel keroseneLike();

  /// Molar H/C ratio y. [-]
  double hydrogenCarbonRatio() const { return y_; }
  /// Lower heating value at 298.15 K. [J/kg]
  double lowerHeatingValue() const { return lowerHeatingValue_; }
  /// Specific heat of the fuel. [J/(kg K)]
  double cp() const { return cp_; }
  /// Molar mass of one C H_y unit. [kg/mol]
  double molarMass() const { return molarMass_; }
  /// Enthalpy of formation at 298.15 K on the absolute species scale (see above). [J/kg]
  double formationEnthalpy() const { return formationEnthalpy_; }
  /// Enthalpy at the delivery temperature; throws cw::OutOfRange outside [200, 1000] K. [J/kg]
  double enthalpy(double temperature) const;

  /// Absolute (third-law) standard entropy of the liquid fuel at 298.15 K: that of liquid
  /// n-dodecane, 490.7 J/(mol K) / 0.17034 kg/mol (NIST Chemistry WebBook, from memory), for any
  /// C H_y. [J/(kg K)]
  static constexpr double kStandardEntropy = 2880.0;
  /// Entropy at the delivery temperature, kStandardEntropy + cp ln(T / 298.15 K). [J/(kg K)]
  double entropy(double temperature) const;
  /// Moles of O2 for complete combustion of one kilogram of fuel, (1 + y/4) / M_f. [mol/kg]
  double oxygenDemand() const { return (1.0 + y_ / 4.0) / molarMass_; }
  /// The species table whose enthalpies define the formation enthalpy.
  const SpeciesTable& table() const { return *table_; }

 private:
  double y_;
  double lowerHeatingValue_;
  double cp_;
  double molarMass_;
  double formationEnthalpy_;
  const SpeciesTable* table_;
};

}  // namespace cw::thermo
