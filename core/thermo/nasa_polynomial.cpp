#include "thermo/nasa_polynomial.h"

#include "common/error.h"

#include <cmath>

namespace cw::thermo {

NasaPolynomial::NasaPolynomial(double minimumTemperature, double maximumTemperature,
                               const Coefficients& coefficients, const std::string& where)
    : minimumTemperature_(minimumTemperature), maximumTemperature_(maximumTemperature), a_(coefficients) {
  if (!std::isfinite(minimumTemperature) || minimumTemperature <= 0.0)
    throw InvalidInput(where + ": minimum temperature", minimumTemperature, "K", "(0, inf) K");
  if (!std::isfinite(maximumTemperature) || maximumTemperature <= minimumTemperature)
    throw InvalidInput(where + ": maximum temperature", maximumTemperature, "K",
                       "(" + messageNumber(minimumTemperature) + ", inf) K");
  for (std::size_t i = 0; i < a_.size(); ++i)
    if (!std::isfinite(a_[i]))
      throw InvalidInput(where + ": coefficient a" + std::to_string(i + 1), a_[i], "", "finite numbers");
}

// cp°/R, TM-4513 7-coefficient form.
double NasaPolynomial::cpOverR(const TemperaturePowers& t) const {
  return a_[0] + a_[1] * t.t + a_[2] * t.t2 + a_[3] * t.t3 + a_[4] * t.t4;
}

// h°/(RT), TM-4513 7-coefficient form.
double NasaPolynomial::enthalpyOverRT(const TemperaturePowers& t) const {
  return a_[0] + a_[1] * t.t / 2.0 + a_[2] * t.t2 / 3.0 + a_[3] * t.t3 / 4.0 + a_[4] * t.t4 / 5.0 +
         a_[5] * t.inverse;
}

// s°/R, TM-4513 7-coefficient form.
double NasaPolynomial::entropyOverR(const TemperaturePowers& t) const {
  return a_[0] * t.logarithm + a_[1] * t.t + a_[2] * t.t2 / 2.0 + a_[3] * t.t3 / 3.0 + a_[4] * t.t4 / 4.0 +
         a_[6];
}

}  // namespace cw::thermo
