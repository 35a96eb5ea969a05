#pragma once
// The ideal-gas thermodynamic functions of one species: two NASA 7-coefficient ranges
// [T_low, T_mid] and [T_mid, T_high] (McBride, Gordon and Reno, NASA TM-4513, 1993), held as
// two thermo::NasaPolynomial objects, and optionally a third, cold range [T_cold, T_low] below
// the tabulated ones (the air species: core/thermo/data/cold-extension.json). T <= T_mid uses
// the low range, T < T_low the cold one.
//
// Molar basis, SI: cp in J/(mol K), h in J/mol (absolute, formation enthalpy at 298.15 K
// included), s° in J/(mol K) at 1 bar; cp = R_u cp/R etc. with R_u = kMolarGasConstant.
//
// Validation at construction: the ranges must meet at T_mid, and cp/R, h/(RT) and s/R may
// jump there by at most kContinuityTolerance (the TM-4513 fits are constrained to match at
// T_mid; the twelve embedded species jump by less than 1e-7).

#include "thermo/nasa_polynomial.h"

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace cw::thermo {

class SpeciesThermo {
 public:
  /// Largest accepted jump of cp/R, h/(RT) or s/R at T_mid. [-]
  static constexpr double kContinuityTolerance = 1.0e-5;

  /// Jumps (high range minus low range) of the dimensionless functions at T_mid. [-]
  struct Jumps {
    double cpOverR;
    double enthalpyOverRT;
    double entropyOverR;
  };

  /// Throws cw::InvalidInput naming the species when the molar mass is not positive, an element
  /// count is not positive, the ranges do not meet, or a function jumps at T_mid.
  SpeciesThermo(std::string name, double molarMass, std::map<std::string, int> elements, NasaPolynomial low,
                NasaPolynomial high);

  const std::string& name() const { return name_; }
  /// Molar mass. [kg/mol]
  double molarMass() const { return molarMass_; }
  /// Atoms per molecule, by element symbol.
  const std::map<std::string, int>& elements() const { return elements_; }
  /// Atoms of one element per molecule (0 when absent). [-]
  int atoms(const std::string& element) const;

  /// Adds the cold range [T_cold, T_low]; throws cw::InvalidInput unless it ends at T_low and
  /// cp/R, h/(RT) and s/R are continuous there to kContinuityTolerance.
  void extendBelow(NasaPolynomial cold);

  double minimumTemperature() const {
    return cold_ ? cold_->minimumTemperature() : low_.minimumTemperature();
  }
  double midTemperature() const { return low_.maximumTemperature(); }
  double maximumTemperature() const { return high_.maximumTemperature(); }
  /// The temperatures inside the range where one polynomial hands over to the next, ascending. [K]
  std::vector<double> breakTemperatures() const;
  const NasaPolynomial& low() const { return low_; }
  const NasaPolynomial& high() const { return high_; }
  /// The cold range below T_low, when there is one.
  const std::optional<NasaPolynomial>& cold() const { return cold_; }
  /// The range used at T (low for T <= T_mid, cold below T_low); does not check T.
  const NasaPolynomial& rangeAt(double temperature) const {
    if (temperature > midTemperature()) return high_;
    return cold_ && temperature < low_.minimumTemperature() ? *cold_ : low_;
  }

  /// Dimensionless kernels; throw cw::OutOfRange outside [T_low, T_high]. [-]
  double cpOverR(double temperature) const;
  double enthalpyOverRT(double temperature) const;
  double entropyOverR(double temperature) const;

  /// Molar heat capacity cp°. [J/(mol K)]
  double cp(double temperature) const;
  /// Absolute molar enthalpy h°. [J/mol]
  double enthalpy(double temperature) const;
  /// Molar standard entropy s° at 1 bar. [J/(mol K)]
  double standardEntropy(double temperature) const;

  /// Jumps at T_mid (checked at construction). [-]
  Jumps jumpsAtMidTemperature() const;

 private:
  void checkTemperature(double temperature) const;

  std::string name_;
  double molarMass_;
  std::map<std::string, int> elements_;
  NasaPolynomial low_;
  NasaPolynomial high_;
  std::optional<NasaPolynomial> cold_;
};

}  // namespace cw::thermo
