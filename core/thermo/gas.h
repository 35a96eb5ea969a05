#pragma once
// A gas of fixed (frozen) composition: the property interface every gas model provides.
//
// All quantities are per unit mass, SI: T in K, p in Pa, h in J/kg, s and cp in J/(kg K).
// Enthalpy is absolute where the model carries enthalpies of formation (thermally
// perfect); simpler models measure it from their own reference temperature. Entropy
// is s(T, p) = s°(T) - R ln(p / p_ref) with p_ref = 1e5 Pa (the NASA/JANAF standard state).
//
// Inverses T(h) and T(s, p) converge to 1e-10 relative or throw cw::NotConverged;
// temperatures outside [minimumTemperature(), maximumTemperature()] throw cw::OutOfRange.
// No NaN or infinity is ever returned.

#include <string>

namespace cw::thermo {

/// Standard-state pressure of the NASA polynomials and JANAF tables: 1 bar.
inline constexpr double kReferencePressure = 1.0e5;  // Pa
/// Reference temperature of the sensible enthalpy h_s(T) = h(T) - h(298.15 K) (the JANAF tables'
/// H - H(298.15 K), per unit mass at fixed composition). [K]
inline constexpr double kSensibleEnthalpyReference = 298.15;  // K
/// Molar gas constant (CODATA 2018, exact).
inline constexpr double kMolarGasConstant = 8.314462618;  // J/(mol K)

class Gas {
 public:
  virtual ~Gas() = default;

  /// A short description, e.g. "air (thermally perfect)" or "products, f = 0.02".
  virtual std::string description() const = 0;

  /// Specific gas constant R = R_u / M. [J/(kg K)]
  virtual double gasConstant() const = 0;
  /// Molar mass M. [kg/mol]
  virtual double molarMass() const = 0;
  /// Specific heat at constant pressure. [J/(kg K)]
  virtual double cp(double temperature) const = 0;
  /// Specific enthalpy. [J/kg]
  virtual double enthalpy(double temperature) const = 0;
  /// Sensible specific enthalpy h(T) - h(298.15 K) at this gas's (fixed) composition: the part of
  /// h that temperature changes, free of formation enthalpies and of the model's h reference. [J/kg]
  virtual double sensibleEnthalpy(double temperature) const;
  /// Standard-state specific entropy s°(T) at p_ref. [J/(kg K)]
  virtual double standardEntropy(double temperature) const = 0;

  /// Lowest and highest temperature the model's data cover. [K]
  virtual double minimumTemperature() const = 0;
  virtual double maximumTemperature() const = 0;

  /// Specific entropy s(T, p) = s°(T) - R ln(p/p_ref). [J/(kg K)]
  double entropy(double temperature, double pressure) const;
  /// Ratio of specific heats cp / (cp - R). [-]
  double gamma(double temperature) const;
  /// Speed of sound sqrt(gamma R T). [m/s]
  double speedOfSound(double temperature) const;

  /// Temperature at which h(T) = enthalpy (Newton on h, bracketed). [K]
  virtual double temperatureFromEnthalpy(double enthalpy) const;
  /// Temperature at which s(T, p) = entropy. [K]
  virtual double temperatureFromEntropy(double entropy, double pressure) const;

  /// Exit temperature of an isentropic change from (T1, p1) to p2. [K]
  double isentropicTemperature(double temperature1, double pressure1, double pressure2) const;
  /// Exit temperature of a polytropic change from (T1, p1) to p2 with polytropic efficiency
  /// eta_p: compression ds = (1/eta_p - 1) R dp/p, expansion ds = (1 - eta_p) R (-dp/p)
  /// (Mattingly, Elements of Propulsion, 2006, sec. 4.3; the thermally perfect form
  /// integrates s°(T2) - s°(T1) = (R/eta_p) ln(p2/p1) for compression and
  /// eta_p R ln(p2/p1) for expansion). [K]
  double polytropicTemperature(double temperature1, double pressure1, double pressure2,
                               double polytropicEfficiency) const;

 protected:
  /// Throws cw::OutOfRange when T is outside the model's range (or not finite).
  void checkTemperature(double temperature, const char* where) const;
};

}  // namespace cw::thermo
