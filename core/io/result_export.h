#pragma once
// Export of evaluation results: JSON (the command line's --format json, the GUI's JSON
// export) and the station table as CSV. Keys carry their SI unit in the name. Numbers are
// written in the C locale with round-trip precision; every export carries the caution.

#include "engine/cycle_result.h"

#include <nlohmann/json.hpp>

#include <string>

namespace cw::io {

/// One station as a JSON object (id, Tt_K, pt_Pa, Ts_K, ps_Pa, mach, V_m_per_s, W_kg_per_s,
/// fuel_air_ratio, ht_J_per_kg, s_J_per_kg_K, cp_J_per_kg_K, gamma and area_m2 where defined).
nlohmann::json stationToJson(const engine::Station& station);

/// A cycle result: stations, performance, sizing, components and (optionally) process paths.
nlohmann::json cycleToJson(const engine::CycleResult& result, bool withPaths = true);

/// An evaluation: the cycle with losses at the top level, its twin under "ideal", the caution.
nlohmann::json evaluationToJson(const engine::Evaluation& evaluation, bool withPaths = true);

/// The station table as CSV: a "# " caution line, a header with units, one row per station.
std::string stationTableCsv(const engine::CycleResult& result);

/// The station table of the difference actual - ideal, station by station (stations that only
/// one of the two has, such as 6, are left out; areas where either lacks one are empty). The
/// note after the caution says what was subtracted (the ideal twin unless told otherwise, e.g.
/// a baseline's cycle with losses).
std::string stationDifferenceCsv(const engine::CycleResult& actual, const engine::CycleResult& ideal,
                                 const std::string& note = " Values: with losses minus ideal twin.");

/// Column names of the station table, in order (the CSV header and the JSON keys).
const std::vector<std::string>& stationColumns();

}  // namespace cw::io
