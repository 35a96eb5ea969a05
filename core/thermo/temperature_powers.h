#pragma once
// Powers of the temperature shared by the NASA-polynomial kernels cp/R, h/(RT) and s/R,
// computed once per state (T, T^2, T^3, T^4, 1/T, ln T).

#include <cmath>

namespace cw::thermo {

struct TemperaturePowers {
  explicit TemperaturePowers(double temperature)
      : t(temperature),
        t2(temperature * temperature),
        t3(t2 * temperature),
        t4(t3 * temperature),
        inverse(1.0 / temperature),
        logarithm(std::log(temperature)) {}

  double t;          ///< [K]
  double t2;         ///< [K^2]
  double t3;         ///< [K^3]
  double t4;         ///< [K^4]
  double inverse;    ///< [1/K]
  double logarithm;  ///< ln(T / 1 K) [-]
};

}  // namespace cw::thermo
