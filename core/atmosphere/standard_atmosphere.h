#pragma once
// U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562, "USSA76") from -5 km to 86 km geometric
// altitude: the seven layers of linear molecular-scale temperature in geopotential
// altitude up to 84.852 km, with an optional temperature offset (ISA + dT).
//
// Valid inputs (chosen here, documented in docs/theory.md):
//   geometric altitude     Z in [-5000, 86000] m (USSA76 Table I starts at -5 km and its
//                          lower-atmosphere model ends at 86 km)
//   geopotential altitude  H in [H(-5000 m), H(86000 m)] = [-5003.9, 84852.0] m
//   temperature offset     dT in [-100, 100] K (an engineering bound, common practice, no
//                          source; it keeps T above 86 K everywhere)
// Outside these, cw::InvalidInput names the field, the value and the range.
//
// With an offset, T = T_std(H) + dT, the pressure stays the standard pressure p_std(H), and
// the density and speed of sound follow from the ideal-gas law at the offset temperature.

#include <string>

namespace cw::atmosphere {

/// The atmosphere at one altitude. SI units.
struct AtmosphereState {
  double geopotentialAltitude = 0.0;  ///< H [m']
  double geometricAltitude = 0.0;     ///< Z [m]
  double temperature = 0.0;           ///< kinetic temperature T (offset included) [K]
  double pressure = 0.0;              ///< p [Pa]
  double density = 0.0;               ///< rho [kg/m^3]
  double speedOfSound = 0.0;          ///< a [m/s]
  double dynamicViscosity = 0.0;      ///< mu [Pa s]
};

class StandardAtmosphere {
 public:
  // USSA76 constants (NOAA-S/T 76-1562, Table 2 and sec. 1.2).
  static constexpr double kEarthRadius = 6356766.0;                       ///< r0 [m]
  static constexpr double kStandardGravity = 9.80665;                     ///< g0 [m/s^2]
  static constexpr double kMolarGasConstant = 8.31432;                    ///< R* [J/(mol K)] (USSA76 value)
  static constexpr double kMolarMass = 28.9644e-3;                        ///< M0 [kg/mol]
  static constexpr double kGasConstant = kMolarGasConstant / kMolarMass;  ///< R = R*/M0 = 287.0531 J/(kg K)
  static constexpr double kGamma = 1.4;                                   ///< ratio of specific heats
  static constexpr double kSutherlandBeta = 1.458e-6;                     ///< beta [kg/(m s K^0.5)]
  static constexpr double kSutherlandConstant = 110.4;                    ///< S [K]
  static constexpr double kSeaLevelTemperature = 288.15;                  ///< T0 [K]
  static constexpr double kSeaLevelPressure = 101325.0;                   ///< p0 [Pa]

  static constexpr double kMinimumGeometricAltitude = -5000.0;  ///< [m]
  static constexpr double kMaximumGeometricAltitude = 86000.0;  ///< [m]
  static constexpr double kMaximumTemperatureOffset = 100.0;    ///< |dT| limit [K]

  /// H = r0 Z / (r0 + Z) (USSA76 eq. 18). [m]
  static double geopotentialFromGeometric(double geometricAltitude);
  /// Z = r0 H / (r0 - H), the inverse of eq. 18. [m]
  static double geometricFromGeopotential(double geopotentialAltitude);
  static double minimumGeopotentialAltitude();
  static double maximumGeopotentialAltitude();

  /// Throw cw::InvalidInput named `where` when the value is outside its valid range.
  static void checkGeometricAltitude(double geometricAltitude, const std::string& where);
  static void checkGeopotentialAltitude(double geopotentialAltitude, const std::string& where);
  static void checkTemperatureOffset(double temperatureOffset, const std::string& where);

  /// The standard day (dT = 0) or ISA + dT; throws InvalidInput for |dT| > 100 K.
  explicit StandardAtmosphere(double temperatureOffset = 0.0);

  double temperatureOffset() const { return temperatureOffset_; }

  /// Properties at a geopotential altitude H [m'].
  AtmosphereState atGeopotentialAltitude(double geopotentialAltitude) const;
  /// Properties at a geometric altitude Z [m].
  AtmosphereState atGeometricAltitude(double geometricAltitude) const;

 private:
  double temperatureOffset_;
};

}  // namespace cw::atmosphere
