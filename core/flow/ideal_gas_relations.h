#pragma once
// Closed-form one-dimensional flow relations of a calorically perfect gas (constant gamma),
// after NACA Report 1135, "Equations, Tables, and Charts for Compressible Flow" (Ames
// Research Staff, 1953). Equation numbers are those of the report (numbering from memory
// of NACA Report 1135; docs/theory.md lists them).
//
// Valid inputs: gamma in (1, 5/3] (5/3: a monatomic gas, kinetic theory), Mach number in
// [0, 50] (an engineering bound, common practice, no source), normal-shock upstream Mach
// number in [1, 50]. Outside them, cw::InvalidInput names the field, the value and the range.

#include <string>

namespace cw::flow::ideal {

inline constexpr double kMaximumMach = 50.0;
inline constexpr double kMaximumGamma = 5.0 / 3.0;

/// Throw cw::InvalidInput named `where` unless the value is in its valid range.
void checkGamma(double gamma, const std::string& where = "gamma");
void checkMach(double mach, const std::string& where = "Mach number");
void checkShockMach(double upstreamMach, const std::string& where = "upstream Mach number");

// Isentropic flow, static over total (eqs. 43-45).
double temperatureRatio(double gamma, double mach);  ///< T/Tt = (1 + (g-1)/2 M^2)^-1
double pressureRatio(double gamma, double mach);     ///< p/pt = (T/Tt)^(g/(g-1))
double densityRatio(double gamma, double mach);      ///< rho/rhot = (T/Tt)^(1/(g-1))
/// A/A* = (1/M) [2/(g+1) (1 + (g-1)/2 M^2)]^((g+1)/(2(g-1))) (eq. 80); M > 0.
double areaRatio(double gamma, double mach);

/// Mach number from the total-to-static pressure ratio pt/p >= 1 (eq. 44 inverted):
/// M = sqrt(2/(g-1) ((pt/p)^((g-1)/g) - 1)).
double machFromPressureRatio(double gamma, double totalToStaticPressureRatio);

enum class Branch { Subsonic, Supersonic };
/// Mach number on the chosen branch from A/A* >= 1 (eq. 80 solved with Brent's method).
double machFromAreaRatio(double gamma, double areaRatio, Branch branch);

// Normal shock, downstream (2) over upstream (1), M1 >= 1 (eqs. 93-99).
double normalShockMach(double gamma, double upstreamMach);                ///< M2 (eq. 96)
double normalShockPressureRatio(double gamma, double upstreamMach);       ///< p2/p1 (eq. 93)
double normalShockDensityRatio(double gamma, double upstreamMach);        ///< rho2/rho1 (eq. 94)
double normalShockTemperatureRatio(double gamma, double upstreamMach);    ///< T2/T1 (eq. 95)
double normalShockTotalPressureRatio(double gamma, double upstreamMach);  ///< pt2/pt1 (eq. 99)

}  // namespace cw::flow::ideal
