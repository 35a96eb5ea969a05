#include "io/result_export.h"

#include "common/error.h"
#include "common/version.h"

#include <algorithm>
#include <sstream>

namespace cw::io {

const std::vector<std::string>& stationColumns() {
  static const std::vector<std::string> columns = {
      "id",         "Tt_K",           "pt_Pa",       "Ts_K",         "ps_Pa",         "mach",  "V_m_per_s",
      "W_kg_per_s", "fuel_air_ratio", "ht_J_per_kg", "s_J_per_kg_K", "cp_J_per_kg_K", "gamma", "area_m2"};
  return columns;
}

nlohmann::json stationToJson(const engine::Station& s) {
  nlohmann::json j = {{"id", s.id},
                      {"Tt_K", s.totalTemperature},
                      {"pt_Pa", s.totalPressure},
                      {"Ts_K", s.staticTemperature},
                      {"ps_Pa", s.staticPressure},
                      {"mach", s.mach},
                      {"V_m_per_s", s.velocity},
                      {"W_kg_per_s", s.massFlow},
                      {"fuel_air_ratio", s.fuelAirRatio},
                      {"ht_J_per_kg", s.totalEnthalpy},
                      {"s_J_per_kg_K", s.entropy},
                      {"cp_J_per_kg_K", s.cp()},
                      {"gamma", s.gamma()}};
  if (s.area) j["area_m2"] = *s.area;
  return j;
}

nlohmann::json cycleToJson(const engine::CycleResult& r, bool withPaths) {
  nlohmann::json j;
  j["stations"] = nlohmann::json::array();
  for (const auto& s : r.stations) j["stations"].push_back(stationToJson(s));
  const auto& p = r.performance;
  j["performance"] = {{"net_thrust_N", p.netThrust},
                      {"gross_thrust_N", p.grossThrust},
                      {"ram_drag_N", p.ramDrag},
                      {"specific_thrust_N_s_per_kg", p.specificThrust},
                      {"tsfc_g_per_kN_s", p.thrustSpecificFuelConsumption * 1e6},
                      {"fuel_flow_kg_per_s", p.fuelFlow},
                      {"fuel_air_ratio", p.fuelAirRatio},
                      {"thermal_efficiency", p.thermalEfficiency},
                      {"propulsive_efficiency", p.propulsiveEfficiency},
                      {"overall_efficiency", p.overallEfficiency},
                      {"jet_velocity_m_per_s", p.jetVelocity},
                      {"effective_jet_velocity_m_per_s", p.effectiveJetVelocity},
                      {"nozzle_choked", p.nozzleChoked}};
  const auto& z = r.sizing;
  j["sizing"] = {{"air_mass_flow_kg_per_s", z.airMassFlow},
                 {"engine_face_area_m2", z.engineFaceArea},
                 {"engine_face_diameter_m", z.engineFaceDiameter},
                 {"nozzle_throat_area_m2", z.throatArea},
                 {"nozzle_exit_area_m2", z.exitArea},
                 {"fuel_flow_kg_per_s", z.fuelFlow}};
  if (z.captureArea) j["sizing"]["inlet_capture_area_m2"] = *z.captureArea;
  j["components"] = nlohmann::json::array();
  for (const auto& c : r.components) {
    nlohmann::json cj = {{"component", c.component},
                         {"power_W", c.power},
                         {"entropy_generation_W_per_K", c.entropyGeneration}};
    if (c.efficiency) {
      cj["isentropic_efficiency"] = c.efficiency->isentropic;
      cj["polytropic_efficiency"] = c.efficiency->polytropic;
    }
    j["components"].push_back(cj);
  }
  if (withPaths) {
    j["paths"] = nlohmann::json::array();
    for (const auto& path : r.paths) {
      nlohmann::json pj = {{"component", path.component},
                           {"from", path.fromStation},
                           {"to", path.toStation},
                           {"closure", path.closure},
                           {"states", nlohmann::json::array()}};
      for (const auto& st : path.states)
        pj["states"].push_back({{"T_K", st.temperature},
                                {"s_J_per_kg_K", st.entropy},
                                {"p_Pa", st.pressure},
                                {"v_m3_per_kg", st.specificVolume},
                                {"h_J_per_kg", st.enthalpy}});
      j["paths"].push_back(pj);
    }
  }
  return j;
}

nlohmann::json evaluationToJson(const engine::Evaluation& e, bool withPaths) {
  nlohmann::json j = cycleToJson(e.actual, withPaths);
  j["ideal"] = cycleToJson(e.ideal, withPaths);
  j["caution"] = kCaution;
  j["generator"] = std::string("Cyclewright ") + kVersion;
  return j;
}

namespace {

/// The caution line and the header of a station table; `note` follows the caution.
void writeTableHead(std::ostringstream& out, const std::string& note) {
  out << "# " << kCaution << note << '\n';
  const auto& columns = stationColumns();
  for (std::size_t i = 0; i < columns.size(); ++i) out << (i ? "," : "") << columns[i];
  out << '\n';
}

/// One row from a station's JSON object (id first, an absent area as an empty cell).
void writeRow(std::ostringstream& out, const nlohmann::json& row) {
  const auto& columns = stationColumns();
  for (std::size_t i = 0; i < columns.size(); ++i) {
    if (i) out << ',';
    if (!row.contains(columns[i])) continue;
    const auto& v = row[columns[i]];
    out << (v.is_string() ? v.get<std::string>() : formatNumber(v.get<double>()));
  }
  out << '\n';
}

}  // namespace

std::string stationTableCsv(const engine::CycleResult& r) {
  std::ostringstream out;
  writeTableHead(out, "");
  for (const auto& s : r.stations) writeRow(out, stationToJson(s));
  return out.str();
}

std::string stationDifferenceCsv(const engine::CycleResult& actual, const engine::CycleResult& ideal,
                                 const std::string& note) {
  std::ostringstream out;
  writeTableHead(out, note);
  for (const auto& a : actual.stations) {
    const auto twin = std::find_if(ideal.stations.begin(), ideal.stations.end(),
                                   [&](const engine::Station& s) { return s.id == a.id; });
    if (twin == ideal.stations.end()) continue;
    const nlohmann::json ja = stationToJson(a), ji = stationToJson(*twin);
    nlohmann::json row = {{"id", a.id}};
    for (const auto& column : stationColumns())
      if (column != "id" && ja.contains(column) && ji.contains(column))
        row[column] = ja[column].get<double>() - ji[column].get<double>();
    writeRow(out, row);
  }
  return out.str();
}

}  // namespace cw::io
