#pragma once
// The constant-cp and two-gamma gas models: calorically perfect gases on a 0 K enthalpy
// reference (h = cp T), the convention of parametric cycle analysis (Mattingly, Elements of
// Propulsion, 2006, ch. 5 and 7). The fuel enters with its heating value as its enthalpy,
// h_fuel = LHV, so the burner balance of thermo/gas_model.h becomes Mattingly's
//   (1 + f) cp_t Tt4 = cp_c Tt3 + eta_b f h_PR                     (eq. 7.9)
// and, with the fuel's mass neglected, cp_t Tt4 = cp_c Tt3 + eta_b f h_PR (eq. 5.19 form).
//   constant-cp: one gas for air and products
//   two-gamma:   the cold gas for the air, the hot gas for products at every fuel-air ratio

#include "thermo/constant_cp_gas.h"
#include "thermo/gas_model.h"

#include <memory>

namespace cw::thermo {

class CaloricallyPerfectModel : public GasModel {
 public:
  /// kind is "constant-cp" or "two-gamma"; for constant-cp pass the same gas twice.
  CaloricallyPerfectModel(std::string kind, std::shared_ptr<const ConstantCpGas> cold,
                          std::shared_ptr<const ConstantCpGas> hot, double lowerHeatingValue,
                          double stoichiometricFuelAirRatio, bool neglectFuelMass);

  std::string kind() const override { return kind_; }
  std::shared_ptr<const Gas> air() const override { return cold_; }
  std::shared_ptr<const Gas> products(double fuelAirRatio) const override;
  /// The hot gas, its entropy scale joined to the entering gas's at (T, p) (gas_model.h).
  std::shared_ptr<const Gas> productsEntering(double fuelAirRatio, const Gas& entering, double temperature,
                                              double pressure) const override;
  double fuelEnthalpy() const override { return lowerHeatingValue_; }
  double fuelEntropy(double enteringEntropy) const override {
    return neglectFuelMass_ ? 0.0 : enteringEntropy;
  }
  double lowerHeatingValue() const override { return lowerHeatingValue_; }
  double stoichiometricFuelAirRatio() const override { return stoichiometric_; }
  bool neglectsFuelMass() const override { return neglectFuelMass_; }

 private:
  std::string kind_;
  std::shared_ptr<const ConstantCpGas> cold_, hot_;
  double lowerHeatingValue_;
  double stoichiometric_;
  bool neglectFuelMass_;
};

}  // namespace cw::thermo
