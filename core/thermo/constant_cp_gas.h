#pragma once
// A calorically perfect gas: one cp and one gamma at every temperature.
//
//   R     = cp (gamma - 1) / gamma                  (cp - cv = R, gamma = cp / cv)
//   h(T)  = cp (T - T_ref)                          (enthalpy measured from T_ref, default 298.15 K)
//   s°(T) = cp ln(T / 298.15 K) + s_0               (s_0 = 0 by default: zero at 298.15 K, p_ref)
//
// (Mattingly, Elements of Propulsion, 2006, sec. 2.3, the calorically perfect gas.)
// The inverses T(h) and T(s, p) are closed-form. The enthalpy reference T_ref may be set to
// 0 K for the h = cp T convention of parametric cycle analysis (see thermo/gas_model.h); the
// entropy reference stays at 298.15 K. The constant s_0 shifts the entropy scale: the two-gamma
// model joins its product gas's scale to the air's at the burner entry with it (gas_model.h).

#include "thermo/gas.h"

#include <memory>
#include <string>

namespace cw::thermo {

class ConstantCpGas : public Gas {
 public:
  /// Default reference temperature of h, and the reference of s°. [K]
  static constexpr double kReferenceTemperature = 298.15;
  /// Temperature range the model accepts. [K]
  static constexpr double kMinimumTemperature = 1.0;
  static constexpr double kMaximumTemperature = 10000.0;
  /// Valid gamma: above 1, at most 5/3 (a monatomic gas; kinetic theory).
  static constexpr double kMaximumGamma = 5.0 / 3.0;

  /// Throws cw::InvalidInput unless cp > 0 (finite), 1 < gamma <= 5/3 and the enthalpy
  /// reference is in [0, 10000] K.
  ConstantCpGas(double cp, double gamma, std::string description = "constant-cp gas",
                double enthalpyReferenceTemperature = kReferenceTemperature, double entropyOffset = 0.0);

  /// The same gas with its entropy scale shifted so that its entropy at (T, p) is `entropy`. [J/(kg K)]
  std::shared_ptr<const ConstantCpGas> withEntropyAt(double temperature, double pressure,
                                                     double entropy) const;

  std::string description() const override { return description_; }
  double gasConstant() const override { return gasConstant_; }
  double molarMass() const override { return kMolarGasConstant / gasConstant_; }
  double cp(double temperature) const override;
  double enthalpy(double temperature) const override;
  /// cp (T - 298.15 K), whatever the enthalpy reference. [J/kg]
  double sensibleEnthalpy(double temperature) const override;
  double standardEntropy(double temperature) const override;
  double minimumTemperature() const override { return kMinimumTemperature; }
  double maximumTemperature() const override { return kMaximumTemperature; }

  double temperatureFromEnthalpy(double enthalpy) const override;
  double temperatureFromEntropy(double entropy, double pressure) const override;

  /// The constant ratio of specific heats. [-]
  double constantGamma() const { return gamma_; }
  /// The constant cp. [J/(kg K)]
  double constantCp() const { return cp_; }
  /// The temperature at which h = 0. [K]
  double enthalpyReferenceTemperature() const { return enthalpyReference_; }
  /// The constant s_0 of s°(T). [J/(kg K)]
  double entropyOffset() const { return entropyOffset_; }

 private:
  double cp_;
  double gamma_;
  double gasConstant_;
  double enthalpyReference_;
  double entropyOffset_;
  std::string description_;
};

}  // namespace cw::thermo
