#pragma once
// A gas model: the choice, per case, of how the working fluid's properties are computed.
//
// It hands out frozen-composition gases (cw::thermo::Gas) for the engine's streams:
// the incoming air, and the products of burning the case's fuel in that air at a
// given fuel-air ratio. It also gives the fuel's enthalpy on the same reference as its
// gases, so that every model's burner energy balance is the single equation
//
//   W_air h_air(T_in) + W_fuel h_fuel(T_fuel) - (1 - eta_b) W_fuel LHV = (W_air + W_fuel) h_products(T_out)
//
// (an energy balance on the control volume with complete combustion, the fraction
// 1 - eta_b of the heating value unreleased; Mattingly, Elements of Propulsion, 2006,
// eq. 7.9 in its constant-cp form). Kinds:
//   constant-cp        one cp and gamma everywhere; h = cp T (0 K reference), h_fuel = LHV
//   two-gamma          air values before the burner, product values after; as constant-cp
//   thermally-perfect  NASA species data, absolute enthalpies with formation enthalpies

#include "thermo/gas.h"

#include <memory>
#include <string>

namespace cw::thermo {

class GasModel {
 public:
  virtual ~GasModel() = default;

  /// The model's kind as written in case files: "constant-cp", "two-gamma", "thermally-perfect".
  virtual std::string kind() const = 0;

  /// The incoming (possibly humid) air.
  virtual std::shared_ptr<const Gas> air() const = 0;

  /// Products of complete lean combustion of the fuel at fuel-air ratio f (kg fuel per kg air);
  /// throws cw::InvalidInput for f < 0 or above stoichiometric.
  virtual std::shared_ptr<const Gas> products(double fuelAirRatio) const = 0;

  /// Enthalpy of the fuel at its delivery temperature, on the gases' reference. [J/kg]
  virtual double fuelEnthalpy() const = 0;

  /// The fuel's lower heating value at 298.15 K. [J/kg]
  virtual double lowerHeatingValue() const = 0;

  /// Stoichiometric fuel-air ratio of the fuel in this air. [-]
  virtual double stoichiometricFuelAirRatio() const = 0;

  /// The products of burning at fuel-air ratio f in a stream of gas `entering` at (T, p): products(f)
  /// on a model with absolute entropies (thermally perfect). On the two-gamma model, whose air and
  /// products are two separate approximations of one working fluid with unrelated entropy scales,
  /// the products' scale is joined to the entering gas's at (T, p): the switch of gas at the burner
  /// entry then generates no entropy, and the burner's entropy generation is that of its heating
  /// and pressure loss on the product gas, cp_t ln(Tt4/Tt3) - R_t ln(pt4/pt3) per unit mass, the
  /// heat added at the log-mean temperature (Tt4 - Tt3) / ln(Tt4/Tt3) (own definition, no source).
  virtual std::shared_ptr<const Gas> productsEntering(double fuelAirRatio, const Gas& /*entering*/,
                                                      double /*temperature*/, double /*pressure*/) const {
    return products(fuelAirRatio);
  }

  /// The entropy per unit mass of fuel that the fuel brings into a burner whose stream enters at
  /// entropy s_in: the model's own fuel entropy (absolute models); on the constant-cp and
  /// two-gamma models, where the fuel is heat, s_in when its mass joins the stream (at the
  /// stream's entry state) and 0 when its mass is neglected (own convention, no source). [J/(kg K)]
  virtual double fuelEntropy(double enteringEntropy) const = 0;

  /// True when the fuel's mass is left out of the flow (textbook idealisation; simple models only).
  virtual bool neglectsFuelMass() const { return false; }

  /// Enthalpy of the products per unit mass of their air, (1 + f) h_p(T; f), or h_p(T; f) when
  /// the fuel's mass is neglected: the right-hand side of the burner balance. Models whose
  /// products are a mass blend of air and stoichiometric products override it with the blend,
  /// which needs no new gas per call. [J/kg of air]
  virtual double productEnthalpyPerUnitAir(double temperature, double fuelAirRatio) const {
    return (neglectsFuelMass() ? 1.0 : 1.0 + fuelAirRatio) * products(fuelAirRatio)->enthalpy(temperature);
  }
};

}  // namespace cw::thermo
