#include "thermo/two_gamma_model.h"

#include "common/error.h"

#include <cmath>
#include <string>

namespace cw::thermo {

namespace {

void checkPair(const std::string& section, double cp, double gamma) {
  if (!std::isfinite(cp) || cp <= 0.0)
    throw InvalidInput(section + " cp", cp, "J/(kg K)", "(0, inf) J/(kg K)");
  if (!std::isfinite(gamma) || gamma <= 1.0 || gamma > ConstantCpGas::kMaximumGamma)
    throw InvalidInput(section + " gamma", gamma, "", "(1, 5/3]");
}

}  // namespace

void TwoGammaModel::validate() const {
  checkPair("cold", coldCp, coldGamma);
  checkPair("hot", hotCp, hotGamma);
  const double T = enthalpyReferenceTemperature;
  if (!std::isfinite(T) || T < 0.0 || T > ConstantCpGas::kMaximumTemperature)
    throw InvalidInput("enthalpy reference temperature", T, "K", "[0, 10000] K");
}

std::shared_ptr<const ConstantCpGas> TwoGammaModel::coldGas() const {
  validate();
  return std::make_shared<const ConstantCpGas>(coldCp, coldGamma, "air (two-gamma, cold section)",
                                               enthalpyReferenceTemperature);
}

std::shared_ptr<const ConstantCpGas> TwoGammaModel::hotGas() const {
  validate();
  return std::make_shared<const ConstantCpGas>(hotCp, hotGamma, "products (two-gamma, hot section)",
                                               enthalpyReferenceTemperature);
}

}  // namespace cw::thermo
