#include "engine/free_stream.h"

#include "atmosphere/standard_atmosphere.h"

namespace cw::engine {

FreeStream freeStreamOf(const FlightInputs& flight) {
  FreeStream fs;
  fs.mach = flight.mach;
  if (const auto* standard = std::get_if<StandardAtmosphereAmbient>(&flight.ambient)) {
    const atmosphere::StandardAtmosphere atmosphere(standard->isaOffset);
    const atmosphere::AtmosphereState state = standard->geometricAltitude
                                                  ? atmosphere.atGeometricAltitude(standard->altitude)
                                                  : atmosphere.atGeopotentialAltitude(standard->altitude);
    fs.temperature = state.temperature;
    fs.pressure = state.pressure;
  } else {
    const auto& given = std::get<GivenAmbient>(flight.ambient);
    fs.temperature = given.temperature;
    fs.pressure = given.pressure;
  }
  return fs;
}

}  // namespace cw::engine
