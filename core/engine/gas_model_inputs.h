#pragma once
// The gas model a case chooses; engine/gas_model_factory.h builds it. Plain structs, SI units.

#include <variant>

namespace cw::engine {

/// One cp and gamma everywhere.
struct ConstantCpGasModel {
  double cp = 1004.0;  ///< [J/(kg K)]
  double gamma = 1.4;  ///< [-]
  bool operator==(const ConstantCpGasModel&) const = default;
};

/// Air values up to the burner, product values after it (the textbook model).
struct TwoGammaGasModel {
  double coldCp = 1004.0;    ///< [J/(kg K)]
  double coldGamma = 1.4;    ///< [-]
  double hotCp = 1239.0;     ///< [J/(kg K)]
  double hotGamma = 1.3333;  ///< [-]
  bool operator==(const TwoGammaGasModel&) const = default;
};

/// NASA 7-coefficient species data, air plus complete-combustion products, frozen.
struct ThermallyPerfectGasModel {
  bool operator==(const ThermallyPerfectGasModel&) const = default;
};

struct GasModelInputs {
  std::variant<ThermallyPerfectGasModel, ConstantCpGasModel, TwoGammaGasModel> model;
  /// Leave the fuel's mass out of the flow; allowed only for the constant-cp and two-gamma models.
  bool neglectFuelMass = false;
  bool operator==(const GasModelInputs&) const = default;
};

}  // namespace cw::engine
