// cyclewright-cli atmosphere: U.S. Standard Atmosphere 1976 at one altitude, ISA + dT.
#include "atmosphere/standard_atmosphere.h"
#include "output.h"
#include "verbs.h"

#include <ostream>

namespace cw::cli {

namespace {

int runAtmosphere(const Arguments& args, Format format, std::ostream& out) {
  using atmosphere::StandardAtmosphere;
  const double altitude = args.number("altitude-m");
  const bool geometric = args.has("geometric");
  const double offset = args.number("isa-offset-K", 0.0);
  // Check here so that the message names the command line's arguments.
  if (geometric)
    StandardAtmosphere::checkGeometricAltitude(altitude, "--altitude-m");
  else
    StandardAtmosphere::checkGeopotentialAltitude(altitude, "--altitude-m");
  StandardAtmosphere::checkTemperatureOffset(offset, "--isa-offset-K");

  const StandardAtmosphere atmosphere(offset);
  const auto state =
      geometric ? atmosphere.atGeometricAltitude(altitude) : atmosphere.atGeopotentialAltitude(altitude);
  nlohmann::json record;
  record["geopotential_altitude_m"] = state.geopotentialAltitude;
  record["geometric_altitude_m"] = state.geometricAltitude;
  record["isa_offset_K"] = offset;
  record["T_K"] = state.temperature;
  record["p_Pa"] = state.pressure;
  record["rho_kg_per_m3"] = state.density;
  record["a_m_per_s"] = state.speedOfSound;
  record["mu_Pa_s"] = state.dynamicViscosity;
  printRecord(out, record, format);
  return kExitOk;
}

}  // namespace

Verb atmosphereVerb() {
  return {
      "atmosphere",
      "U.S. Standard Atmosphere 1976 (-5 km to 86 km geometric), with an ISA temperature offset",
      "--altitude-m H [--geometric] [--isa-offset-K DT]",
      {
          {"altitude-m", true,
           "altitude in m, geopotential [-5003.9, 84852.0] unless --geometric ([-5000, 86000])"},
          {"geometric", false, "read --altitude-m as geometric altitude (default: geopotential)"},
          {"isa-offset-K", true,
           "temperature offset dT in K, [-100, 100]; T = T_std + dT at the standard pressure (default 0)"},
      },
      {Format::Text, Format::Json, Format::Csv},
      "text (default), json or csv: one record of the values",
      &runAtmosphere};
}

}  // namespace cw::cli
