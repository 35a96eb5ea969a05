#include "thermo/constant_cp_gas.h"

#include "common/error.h"

#include <cmath>
#include <utility>

namespace cw::thermo {

namespace {

// Pulls a closed-form inverse that rounding put a few ulps outside the range back onto its edge.
double snapToRange(double T) {
  constexpr double kSlack = 1e-12;
  if (T < ConstantCpGas::kMinimumTemperature && T >= ConstantCpGas::kMinimumTemperature * (1.0 - kSlack))
    return ConstantCpGas::kMinimumTemperature;
  if (T > ConstantCpGas::kMaximumTemperature && T <= ConstantCpGas::kMaximumTemperature * (1.0 + kSlack))
    return ConstantCpGas::kMaximumTemperature;
  return T;
}

std::string temperatureRangeText() {
  return "[" + messageNumber(ConstantCpGas::kMinimumTemperature) + ", " +
         messageNumber(ConstantCpGas::kMaximumTemperature) + "] K";
}

}  // namespace

ConstantCpGas::ConstantCpGas(double cp, double gamma, std::string description,
                             double enthalpyReferenceTemperature, double entropyOffset)
    : cp_(cp),
      gamma_(gamma),
      gasConstant_(0.0),
      enthalpyReference_(enthalpyReferenceTemperature),
      entropyOffset_(entropyOffset),
      description_(std::move(description)) {
  if (!std::isfinite(entropyOffset))
    throw InvalidInput("entropy offset", entropyOffset, "J/(kg K)", "finite");
  if (!std::isfinite(cp) || cp <= 0.0) throw InvalidInput("cp", cp, "J/(kg K)", "(0, inf) J/(kg K)");
  if (!std::isfinite(gamma) || gamma <= 1.0 || gamma > kMaximumGamma)
    throw InvalidInput("gamma", gamma, "", "(1, 5/3]");
  if (!std::isfinite(enthalpyReferenceTemperature) || enthalpyReferenceTemperature < 0.0 ||
      enthalpyReferenceTemperature > kMaximumTemperature)
    throw InvalidInput("enthalpy reference temperature", enthalpyReferenceTemperature, "K", "[0, 10000] K");
  // R = cp - cv = cp (gamma - 1) / gamma.
  gasConstant_ = cp * (gamma - 1.0) / gamma;
}

double ConstantCpGas::cp(double temperature) const {
  checkTemperature(temperature, "temperature");
  return cp_;
}

double ConstantCpGas::enthalpy(double temperature) const {
  checkTemperature(temperature, "temperature");
  return cp_ * (temperature - enthalpyReference_);
}

double ConstantCpGas::sensibleEnthalpy(double temperature) const {
  checkTemperature(temperature, "temperature");
  return cp_ * (temperature - kSensibleEnthalpyReference);
}

double ConstantCpGas::standardEntropy(double temperature) const {
  checkTemperature(temperature, "temperature");
  return cp_ * std::log(temperature / kReferenceTemperature) + entropyOffset_;
}

std::shared_ptr<const ConstantCpGas> ConstantCpGas::withEntropyAt(double temperature, double pressure,
                                                                  double entropy) const {
  const double offset = entropyOffset_ + entropy - this->entropy(temperature, pressure);
  return std::make_shared<const ConstantCpGas>(cp_, gamma_, description_, enthalpyReference_, offset);
}

double ConstantCpGas::temperatureFromEnthalpy(double h) const {
  // T = T_ref + h / cp.
  const double T = snapToRange(enthalpyReference_ + h / cp_);
  if (!std::isfinite(h) || !(T >= kMinimumTemperature && T <= kMaximumTemperature))
    throw OutOfRange("temperature from enthalpy", h, "J/kg",
                     "[" + messageNumber(enthalpy(kMinimumTemperature)) + ", " +
                         messageNumber(enthalpy(kMaximumTemperature)) + "] J/kg (temperatures " +
                         temperatureRangeText() + ")");
  return T;
}

double ConstantCpGas::temperatureFromEntropy(double s, double pressure) const {
  if (!std::isfinite(pressure) || pressure <= 0.0)
    throw InvalidInput("pressure", pressure, "Pa", "(0, inf) Pa");
  // s = cp ln(T/298.15) + s_0 - R ln(p/p_ref)  =>  T = 298.15 K exp((s - s_0 + R ln(p/p_ref)) / cp).
  const double exponent = (s - entropyOffset_ + gasConstant_ * std::log(pressure / kReferencePressure)) / cp_;
  const double T = snapToRange(kReferenceTemperature * std::exp(exponent));
  if (!std::isfinite(s) || !std::isfinite(T) || !(T >= kMinimumTemperature && T <= kMaximumTemperature))
    throw OutOfRange("temperature from entropy", s, "J/(kg K)",
                     "the entropies of " + temperatureRangeText() + " at " + messageNumber(pressure) + " Pa");
  return T;
}

}  // namespace cw::thermo
