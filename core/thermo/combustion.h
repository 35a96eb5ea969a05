#pragma once
// Products of complete lean combustion of a hydrocarbon fuel in air, by element balance.
//
// Per kilogram of air (of any composition of the elements C, H, O, N, Ar, e.g. humid air) with
// f kilograms of C H_y fuel, the atoms available are b_e = b_e,air + f b_e,fuel [mol/kg air],
// with b_C,fuel = 1/M_f and b_H,fuel = y/M_f. Complete combustion puts every carbon atom in CO2,
// every hydrogen atom in H2O, nitrogen in N2, argon in Ar and the remaining oxygen in O2:
//
//   n_CO2 = b_C,  n_H2O = b_H / 2,  n_N2 = b_N / 2,  n_Ar = b_Ar,
//   n_O2  = (b_O - 2 b_C - b_H / 2) / 2                             [mol per kg of air]
//
// (conservation of atoms; e.g. Turns, An Introduction to Combustion, ch. 2). The stoichiometric
// fuel-air ratio makes n_O2 = 0:
//
//   f_st = (b_O,air - 2 b_C,air - b_H,air / 2) / ((2 + y/2) / M_f)
//
// A rich (f > f_st) or negative fuel-air ratio is a cw::InvalidInput.

#include "thermo/composition.h"
#include "thermo/fuel.h"

#include <cstddef>
#include <string>

namespace cw::thermo {

/// The element balance of one fuel burning in one air: the air's atoms per kilogram b_e,air and
/// f_st, worked out once, so that the products at each fuel-air ratio need no look-up by name.
class CompleteCombustion {
 public:
  /// Throws cw::InvalidInput when the air holds an element other than C, H, O, N, Ar or no free
  /// oxygen.
  CompleteCombustion(const Composition& air, const HydrocarbonFuel& fuel);

  /// Stoichiometric fuel-air ratio (kg fuel per kg air). [-]
  double stoichiometricFuelAirRatio() const { return stoichiometric_; }

  /// Products of burning fuelAirRatio kg of fuel per kg of air completely (CO2, H2O, N2, O2, Ar).
  /// Throws cw::InvalidInput naming `where` unless 0 <= f <= f_st.
  Composition products(double fuelAirRatio, const std::string& where = "fuel-air ratio") const;

 private:
  const SpeciesTable* table_;
  double fuelMolarMass_;                                  ///< [kg/mol]
  double hydrogenCarbonRatio_;                            ///< [-]
  double carbon_, hydrogen_, oxygen_, nitrogen_, argon_;  ///< b_e,air [mol/kg air]
  double stoichiometric_;                                 ///< [-]
  /// The products' table indices; kAbsent when the table lacks the species (products() throws).
  static constexpr std::size_t kAbsent = static_cast<std::size_t>(-1);
  std::size_t co2_, h2o_, n2_, o2_, ar_;
};

/// Stoichiometric fuel-air ratio (kg fuel per kg air) of the fuel in this air. [-]
double stoichiometricFuelAirRatio(const Composition& air, const HydrocarbonFuel& fuel);

/// Products of burning fuelAirRatio kg of fuel per kg of air completely (CO2, H2O, N2, O2, Ar).
/// Throws cw::InvalidInput naming `where` unless 0 <= f <= f_st, or when the air holds an element
/// other than C, H, O, N, Ar.
Composition completeCombustionProducts(const Composition& air, const HydrocarbonFuel& fuel,
                                       double fuelAirRatio, const std::string& where = "fuel-air ratio");

}  // namespace cw::thermo
