#pragma once
// A thermally perfect gas of frozen composition: an ideal-gas mixture of NASA-polynomial
// species (thermo/species_thermo.h) whose cp depends on temperature only.
//
// Because the NASA form is linear in its coefficients, the mixture's mass-basis functions are
// polynomials of the same form, with coefficients precombined once at construction
// (y_i mass fractions, R_i = R_u / M_i, a_{i,k} the species coefficients of the range at T):
//
//   c_k    = sum_i y_i R_i a_{i,k}                       k = 1..6
//   c_7    = sum_i y_i R_i (a_{i,7} - ln x_i)            (x_i > 0; ideal mixing entropy folded in)
//   cp(T)  = c1 + c2 T + c3 T^2 + c4 T^3 + c5 T^4                           [J/(kg K)]
//   h(T)   = c1 T + c2 T^2/2 + c3 T^3/3 + c4 T^4/4 + c5 T^5/5 + c6           [J/kg]
//   s°(T)  = c1 ln T + c2 T + c3 T^2/2 + c4 T^3/3 + c5 T^4/4 + c7            [J/(kg K)]
//
// The last line is the entropy of the mixture with every species at its partial pressure
// x_i p_ref: s = sum_i y_i (s°_i - R_i ln x_i) at p = p_ref (Dalton's law; e.g. Cengel and
// Boles, Thermodynamics: An Engineering Approach, ch. 13). h is absolute (formation
// enthalpies included), so a burner's energy balance is one equation across compositions.
//
// The temperature axis splits at every species' T_mid (1000 K for the embedded data). The data
// leave tiny jumps in h and s° there (below 1e-7 R T and 1e-7 R for the embedded species); the
// constants c6 and c7 of each upper interval are shifted by the jump so that h(T) and s°(T) are
// continuous and the inverses have exactly one root (a change far below the data's accuracy). The
// mixture is valid on the intersection of its species' ranges (200 K to 6000 K here) and throws
// cw::OutOfRange outside it. T(h) and T(s, p) are safeguarded Newton iterations on the
// precombined polynomials, converging to 1e-10 relative in T or throwing cw::NotConverged.

#include "thermo/composition.h"
#include "thermo/gas.h"

#include <array>
#include <cmath>
#include <string>
#include <vector>

namespace cw::thermo {

class ThermallyPerfectGas : public Gas {
 public:
  /// cp, h and s° at one temperature, from one set of powers of T.
  struct Properties {
    double cp;               ///< [J/(kg K)]
    double enthalpy;         ///< [J/kg]
    double standardEntropy;  ///< [J/(kg K)] at p_ref
  };

  explicit ThermallyPerfectGas(Composition composition, std::string description = "thermally perfect gas");

  std::string description() const override { return description_; }
  double gasConstant() const override { return gasConstant_; }
  double molarMass() const override { return composition_.molarMass(); }
  double cp(double temperature) const override;
  double enthalpy(double temperature) const override;
  double standardEntropy(double temperature) const override;
  double minimumTemperature() const override { return minimumTemperature_; }
  double maximumTemperature() const override { return maximumTemperature_; }

  double temperatureFromEnthalpy(double enthalpy) const override;
  double temperatureFromEntropy(double entropy, double pressure) const override;

  /// cp, h and s° together. [SI, see Properties]
  Properties properties(double temperature) const;
  const Composition& composition() const { return composition_; }

 private:
  // One interval of the temperature axis, (previous upper, upper], with the precombined
  // coefficients c1..c7 arranged for Horner evaluation.
  struct Interval {
    double upper;              ///< [K]
    std::array<double, 5> cp;  ///< c1, c2, c3, c4, c5
    std::array<double, 6> h;   ///< c6, c1, c2/2, c3/3, c4/4, c5/5
    std::array<double, 6> s;   ///< c7, c1 (of ln T), c2, c3/2, c4/3, c5/4
  };
  // Number of equal steps of the table of h and s° that brackets the inverses.
  static constexpr int kNodes = 64;

  const Interval& intervalAt(double temperature) const {
    for (const Interval& in : intervals_)
      if (temperature <= in.upper) return in;
    return intervals_.back();
  }
  static double cpOf(const Interval& in, double t);
  static double enthalpyOf(const Interval& in, double t);
  static double entropyOf(const Interval& in, double t) { return entropyOf(in, t, std::log(t)); }
  static double entropyOf(const Interval& in, double t, double logT);
  void requireTemperature(double temperature) const {
    if (!(temperature >= minimumTemperature_ && temperature <= maximumTemperature_))
      checkTemperature(temperature, "temperature");  // throws cw::OutOfRange (also for NaN)
  }
  // Safeguarded Newton for value(T) = target on [lo, hi] from guess, slope(T) = d value / dT.
  template <typename Value, typename Slope>
  double solve(Value value, Slope slope, double target, double lo, double hi, double guess,
               const char* where) const;

  Composition composition_;
  std::string description_;
  double gasConstant_;
  double minimumTemperature_;
  double maximumTemperature_;
  std::vector<Interval> intervals_;
  double nodeStep_;                               ///< [K]
  std::array<double, kNodes + 1> enthalpyNodes_;  ///< h at T_min + k nodeStep_ [J/kg]
  std::array<double, kNodes + 1> entropyNodes_;   ///< s° at the same temperatures [J/(kg K)]
};

}  // namespace cw::thermo
