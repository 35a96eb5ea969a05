#pragma once
// Isobars through the station pressures, for the charts' faint background lines.
//
// An isobar is the line of states s(T, p), v = R T / p, h(T) at a station's fixed pressure, on
// the gas of the station's stream, with entropy on the result's datum (zero at the free-stream
// static state) through the station's own entropy.

#include "engine/cycle_result.h"

#include <vector>

namespace cw::engine {

struct Isobar {
  std::string station;            ///< SAE number of the station it passes through
  double pressure = 0.0;          ///< [Pa]
  std::vector<PathState> states;  ///< from tLow to tHigh
};

/// One isobar per distinct station pressure (static at the stations the network names static, the
/// free stream and nozzle exits, total elsewhere; none through a throat), each sampled
/// between temperatures tLow and tHigh [K] within its gas's data range. Pressures within 1 %
/// of one already drawn are skipped.
std::vector<Isobar> stationIsobars(const CycleResult& cycle, double tLow, double tHigh, int samples = 32);

}  // namespace cw::engine
