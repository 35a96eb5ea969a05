#pragma once
// One temperature range of a NASA 7-coefficient polynomial, in the form of McBride, Gordon and
// Reno, Coefficients for Calculating Thermodynamic and Transport Properties of Individual
// Species, NASA TM-4513, 1993 (the form is also stated in core/thermo/data/nasa7-tm4513.json):
//
//   cp°/R     = a1 + a2 T + a3 T^2 + a4 T^3 + a5 T^4
//   h°/(R T)  = a1 + a2 T/2 + a3 T^2/3 + a4 T^3/4 + a5 T^4/5 + a6/T
//   s°/R      = a1 ln T + a2 T + a3 T^2/2 + a4 T^3/3 + a5 T^4/4 + a7
//
// with T in K, h° the absolute enthalpy (the enthalpy of formation at 298.15 K included) and
// s° the entropy at the standard pressure of 1 bar. The kernels are dimensionless and molar;
// units enter at the species and mixture level. The class does not check T against its
// range: thermo/species_thermo.h picks the range and checks.

#include "thermo/temperature_powers.h"

#include <array>
#include <string>

namespace cw::thermo {

class NasaPolynomial {
 public:
  using Coefficients = std::array<double, 7>;

  /// Throws cw::InvalidInput naming `where` unless 0 < tMin < tMax and every coefficient is finite.
  NasaPolynomial(double minimumTemperature, double maximumTemperature, const Coefficients& coefficients,
                 const std::string& where);

  /// cp°/R. [-]
  double cpOverR(const TemperaturePowers& t) const;
  /// h°/(R T). [-]
  double enthalpyOverRT(const TemperaturePowers& t) const;
  /// s°/R at 1 bar. [-]
  double entropyOverR(const TemperaturePowers& t) const;

  /// Range of validity. [K]
  double minimumTemperature() const { return minimumTemperature_; }
  double maximumTemperature() const { return maximumTemperature_; }
  /// a1..a7.
  const Coefficients& coefficients() const { return a_; }

 private:
  double minimumTemperature_;
  double maximumTemperature_;
  Coefficients a_;
};

}  // namespace cw::thermo
