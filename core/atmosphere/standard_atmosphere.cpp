#include "atmosphere/standard_atmosphere.h"

#include "common/error.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <cstdio>

namespace cw::atmosphere {

namespace {

// The defining layers of USSA76 (NOAA-S/T 76-1562, Table 4): base geopotential altitude
// H_b [m'], molecular-scale temperature gradient L_b [K/m'].
struct LayerDefinition {
  double baseAltitude;
  double lapseRate;
};
constexpr std::array<LayerDefinition, 7> kLayers = {{
    {0.0, -0.0065},
    {11000.0, 0.0},
    {20000.0, 0.0010},
    {32000.0, 0.0028},
    {47000.0, 0.0},
    {51000.0, -0.0028},
    {71000.0, -0.0020},
}};

// g0 M0 / R* [K/m'], the hydrostatic constant of eqs. 33a and 33b.
constexpr double kHydrostaticConstant = StandardAtmosphere::kStandardGravity *
                                        StandardAtmosphere::kMolarMass /
                                        StandardAtmosphere::kMolarGasConstant;

struct LayerBase {
  double altitude;     // H_b [m']
  double lapseRate;    // L_b [K/m']
  double temperature;  // T_M,b [K]
  double pressure;     // P_b [Pa]
};

// Pressure at H within a layer from its base (USSA76 eqs. 33a, 33b):
//   L_b != 0: P = P_b [T_M,b / (T_M,b + L_b (H - H_b))]^(g0 M0 / (R* L_b))
//   L_b == 0: P = P_b exp(-g0 M0 (H - H_b) / (R* T_M,b))
double layerPressure(const LayerBase& base, double H) {
  if (base.lapseRate == 0.0)
    return base.pressure * std::exp(-kHydrostaticConstant * (H - base.altitude) / base.temperature);
  const double TM = base.temperature + base.lapseRate * (H - base.altitude);
  return base.pressure * std::pow(base.temperature / TM, kHydrostaticConstant / base.lapseRate);
}

// Base temperatures and pressures, built upward from sea level (T0 = 288.15 K, P0 = 101325 Pa)
// with eq. 23 (T_M = T_M,b + L_b (H - H_b)) and eqs. 33a/33b, so that every layer is continuous
// with the one below. They reproduce the USSA76 base pressures (22632.06, 5474.889, 868.0187,
// 110.9063, 66.93887, 3.956420 Pa, values from memory of USSA76 Table 4).
const std::array<LayerBase, 7>& layerBases() {
  static const std::array<LayerBase, 7> bases = [] {
    std::array<LayerBase, 7> b{};
    b[0] = {kLayers[0].baseAltitude, kLayers[0].lapseRate, StandardAtmosphere::kSeaLevelTemperature,
            StandardAtmosphere::kSeaLevelPressure};
    for (std::size_t i = 1; i < b.size(); ++i) {
      const double H = kLayers[i].baseAltitude;
      const double T = b[i - 1].temperature + b[i - 1].lapseRate * (H - b[i - 1].altitude);
      b[i] = {H, kLayers[i].lapseRate, T, layerPressure(b[i - 1], H)};
    }
    return b;
  }();
  return bases;
}

// Ratio M/M0 of the mean molecular weight to its sea-level value from 80 to 86 km geometric
// altitude, in steps of 0.5 km (values from memory of USSA76 Table 8); 1 below 80 km.
// The kinetic temperature is T = T_M (M / M0) (USSA76 eq. 21).
constexpr double kRatioStart = 80000.0;  // [m], geometric
constexpr double kRatioStep = 500.0;     // [m]
constexpr std::array<double, 13> kMolecularWeightRatio = {1.000000, 0.999996, 0.999989, 0.999971, 0.999941,
                                                          0.999909, 0.999870, 0.999829, 0.999786, 0.999741,
                                                          0.999694, 0.999641, 0.999579};

double molecularWeightRatio(double geometricAltitude) {
  if (geometricAltitude <= kRatioStart) return 1.0;
  const double x = (geometricAltitude - kRatioStart) / kRatioStep;
  const std::size_t last = kMolecularWeightRatio.size() - 1;
  const std::size_t i = std::min(static_cast<std::size_t>(x), last - 1);
  const double t = std::min(x - static_cast<double>(i), 1.0);
  return kMolecularWeightRatio[i] + t * (kMolecularWeightRatio[i + 1] - kMolecularWeightRatio[i]);
}

std::string metres(double value) {
  char buffer[32];
  std::snprintf(buffer, sizeof buffer, "%.1f", value);
  return buffer;
}

}  // namespace

double StandardAtmosphere::geopotentialFromGeometric(double Z) {
  return kEarthRadius * Z / (kEarthRadius + Z);
}

double StandardAtmosphere::geometricFromGeopotential(double H) {
  return kEarthRadius * H / (kEarthRadius - H);
}

double StandardAtmosphere::minimumGeopotentialAltitude() {
  return geopotentialFromGeometric(kMinimumGeometricAltitude);
}

double StandardAtmosphere::maximumGeopotentialAltitude() {
  return geopotentialFromGeometric(kMaximumGeometricAltitude);
}

void StandardAtmosphere::checkGeometricAltitude(double Z, const std::string& where) {
  if (!std::isfinite(Z) || Z < kMinimumGeometricAltitude || Z > kMaximumGeometricAltitude)
    throw InvalidInput(where, Z, "m",
                       "[" + metres(kMinimumGeometricAltitude) + ", " + metres(kMaximumGeometricAltitude) +
                           "] m (geometric)");
}

void StandardAtmosphere::checkGeopotentialAltitude(double H, const std::string& where) {
  if (!std::isfinite(H) || H < minimumGeopotentialAltitude() || H > maximumGeopotentialAltitude())
    throw InvalidInput(where, H, "m",
                       "[" + metres(minimumGeopotentialAltitude()) + ", " +
                           metres(maximumGeopotentialAltitude()) +
                           "] m (geopotential; -5 km to 86 km geometric)");
}

void StandardAtmosphere::checkTemperatureOffset(double dT, const std::string& where) {
  if (!std::isfinite(dT) || std::abs(dT) > kMaximumTemperatureOffset)
    throw InvalidInput(where, dT, "K", "[-100, 100] K");
}

StandardAtmosphere::StandardAtmosphere(double temperatureOffset) : temperatureOffset_(temperatureOffset) {
  checkTemperatureOffset(temperatureOffset, "temperature offset");
}

AtmosphereState StandardAtmosphere::atGeometricAltitude(double Z) const {
  checkGeometricAltitude(Z, "geometric altitude");
  // Clamp the round trip Z -> H -> Z inside the range so that the geopotential check cannot
  // reject a geometric altitude exactly at a limit.
  const double H =
      std::clamp(geopotentialFromGeometric(Z), minimumGeopotentialAltitude(), maximumGeopotentialAltitude());
  AtmosphereState state = atGeopotentialAltitude(H);
  state.geometricAltitude = Z;
  return state;
}

AtmosphereState StandardAtmosphere::atGeopotentialAltitude(double H) const {
  checkGeopotentialAltitude(H, "geopotential altitude");
  const auto& bases = layerBases();
  std::size_t layer = 0;
  while (layer + 1 < bases.size() && H >= bases[layer + 1].altitude) ++layer;
  const LayerBase& base = bases[layer];

  AtmosphereState state;
  state.geopotentialAltitude = H;
  state.geometricAltitude = geometricFromGeopotential(H);
  // Molecular-scale temperature (eq. 23) and pressure (eqs. 33a, 33b) of the standard day.
  const double standardTM = base.temperature + base.lapseRate * (H - base.altitude);
  state.pressure = layerPressure(base, H);
  // Kinetic temperature T = T_M M/M0 (eq. 21), then the offset: T = T_std + dT.
  const double ratio = molecularWeightRatio(state.geometricAltitude);
  state.temperature = standardTM * ratio + temperatureOffset_;
  const double TM = state.temperature / ratio;
  // Density rho = P M0 / (R* T_M) (eq. 42); speed of sound a = (gamma R* T_M / M0)^0.5 (eq. 50);
  // viscosity mu = beta T^1.5 / (T + S) (Sutherland, eq. 51).
  state.density = state.pressure / (kGasConstant * TM);
  state.speedOfSound = std::sqrt(kGamma * kGasConstant * TM);
  state.dynamicViscosity =
      kSutherlandBeta * std::pow(state.temperature, 1.5) / (state.temperature + kSutherlandConstant);
  return state;
}

}  // namespace cw::atmosphere
