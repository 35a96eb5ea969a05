#pragma once
// The "two-gamma" textbook gas model: a calorically perfect air before the burner and a
// calorically perfect product gas after it, each with its own cp and gamma
// (Mattingly, Elements of Propulsion, 2006, ch. 7, which uses the values below as its
// usual pair: cp_c = 1004 J/(kg K), gamma_c = 1.4; cp_t = 1239 J/(kg K), gamma_t = 4/3).
//
// It is just two ConstantCpGas; a gas-model factory builds them with coldGas() and hotGas().

#include "thermo/constant_cp_gas.h"

#include <memory>

namespace cw::thermo {

struct TwoGammaModel {
  /// Cold section (compressor side): cp [J/(kg K)] and gamma [-].
  double coldCp = 1004.0;
  double coldGamma = 1.4;
  /// Hot section (burner exit onwards): cp [J/(kg K)] and gamma [-].
  double hotCp = 1239.0;
  double hotGamma = 4.0 / 3.0;
  /// Temperature at which both gases' enthalpy is zero [K], in [0, 10000] K: 298.15 K by default,
  /// 0 K for the h = cp T convention of parametric cycle analysis (thermo/gas_model.h).
  double enthalpyReferenceTemperature = ConstantCpGas::kReferenceTemperature;

  /// Throws cw::InvalidInput naming "cold cp", "cold gamma", "hot cp" or "hot gamma" and the
  /// valid range (cp in (0, inf) J/(kg K), gamma in (1, 5/3]), or "enthalpy reference temperature".
  void validate() const;

  /// The air before the burner (validates first).
  std::shared_ptr<const ConstantCpGas> coldGas() const;
  /// The products after the burner (validates first).
  std::shared_ptr<const ConstantCpGas> hotGas() const;
};

}  // namespace cw::thermo
