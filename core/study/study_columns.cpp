#include "study/study_columns.h"

#include "analysis/loss_catalogue.h"
#include "common/error.h"

#include <algorithm>
#include <set>

namespace cw::study {

namespace {

using engine::Performance;
using Figure = std::optional<double>;

/// kg/(N s) to g/(kN s).
constexpr double kTsfcToFile = 1e6;

Figure tsfcOf(const Performance& p) {
  if (!(p.netThrust > 0.0)) return std::nullopt;  // no TSFC without thrust
  return p.thrustSpecificFuelConsumption;
}

struct PerformanceFigure {
  const char* name;
  const char* label;
  Quantity quantity;
  double fileScale;
  Figure (*of)(const Performance&);
};

const PerformanceFigure kPerformance[] = {
    {"net_thrust_N", "net thrust", Quantity::Force, 1.0,
     [](const Performance& p) -> Figure { return p.netThrust; }},
    {"gross_thrust_N", "gross thrust", Quantity::Force, 1.0,
     [](const Performance& p) -> Figure { return p.grossThrust; }},
    {"ram_drag_N", "ram drag", Quantity::Force, 1.0,
     [](const Performance& p) -> Figure { return p.ramDrag; }},
    {"specific_thrust_N_s_per_kg", "specific thrust", Quantity::SpecificThrust, 1.0,
     [](const Performance& p) -> Figure { return p.specificThrust; }},
    {"tsfc_g_per_kN_s", "TSFC", Quantity::Tsfc, kTsfcToFile, &tsfcOf},
    {"fuel_flow_kg_per_s", "fuel flow", Quantity::MassFlow, 1.0,
     [](const Performance& p) -> Figure { return p.fuelFlow; }},
    {"fuel_air_ratio", "fuel-air ratio", Quantity::Dimensionless, 1.0,
     [](const Performance& p) -> Figure { return p.fuelAirRatio; }},
    {"thermal_efficiency", "thermal efficiency", Quantity::Dimensionless, 1.0,
     [](const Performance& p) -> Figure { return p.thermalEfficiency; }},
    {"propulsive_efficiency", "propulsive efficiency", Quantity::Dimensionless, 1.0,
     [](const Performance& p) -> Figure { return p.propulsiveEfficiency; }},
    {"overall_efficiency", "overall efficiency", Quantity::Dimensionless, 1.0,
     [](const Performance& p) -> Figure { return p.overallEfficiency; }},
    {"jet_velocity_m_per_s", "jet velocity", Quantity::Velocity, 1.0,
     [](const Performance& p) -> Figure { return p.jetVelocity; }},
    {"nozzle_choked", "nozzle choked (1 yes, 0 no)", Quantity::Dimensionless, 1.0,
     [](const Performance& p) -> Figure { return p.nozzleChoked ? 1.0 : 0.0; }},
};

StudyColumn performanceColumn(const PerformanceFigure& figure, bool ideal) {
  const auto of = figure.of;
  StudyColumn column{std::string(ideal ? "ideal." : "") + figure.name,
                     std::string(ideal ? "ideal " : "") + figure.label,
                     figure.quantity,
                     figure.fileScale,
                     {}};
  if (ideal)
    column.value = [of](const StudyPoint& p) -> Figure { return p.solved() ? of(p.ideal) : std::nullopt; };
  else
    column.value = [of](const StudyPoint& p) -> Figure { return p.solved() ? of(p.actual) : std::nullopt; };
  return column;
}

StudyColumn sizingColumn(const char* name, const char* label, Quantity quantity,
                         Figure (*of)(const StudyPoint&)) {
  return {name, label, quantity, 1.0,
          [of](const StudyPoint& p) -> Figure { return p.solved() ? of(p) : std::nullopt; }};
}

std::vector<StudyColumn> sizingColumns() {
  return {
      sizingColumn("air_mass_flow_kg_per_s", "air mass flow", Quantity::MassFlow,
                   [](const StudyPoint& p) -> Figure { return p.sizing.airMassFlow; }),
      sizingColumn("burner_exit_temperature_K", "burner exit temperature", Quantity::Temperature,
                   [](const StudyPoint& p) -> Figure { return p.burnerExitTemperature; }),
      sizingColumn("capture_area_m2", "inlet capture area", Quantity::Area,
                   [](const StudyPoint& p) -> Figure { return p.sizing.captureArea; }),
      sizingColumn("engine_face_diameter_m", "engine-face diameter", Quantity::Length,
                   [](const StudyPoint& p) -> Figure { return p.sizing.engineFaceDiameter; }),
      sizingColumn("nozzle_throat_area_m2", "nozzle throat area", Quantity::Area,
                   [](const StudyPoint& p) -> Figure { return p.sizing.throatArea; }),
      sizingColumn("nozzle_exit_area_m2", "nozzle exit area", Quantity::Area,
                   [](const StudyPoint& p) -> Figure { return p.sizing.exitArea; }),
  };
}

std::vector<StudyColumn> auditColumns(engine::Architecture architecture) {
  std::vector<StudyColumn> columns;
  for (const analysis::LossDefinition* loss : analysis::lossesOf(architecture)) {
    const std::string key = loss->key;
    auto find = [key](const StudyPoint& p) -> const analysis::LossDelta* {
      for (const analysis::LossDelta& d : p.audit)
        if (d.loss == key) return &d;
      return nullptr;
    };
    columns.push_back({"audit." + key + ".delta_specific_thrust_N_s_per_kg",
                       "specific thrust gained without " + key, Quantity::SpecificThrust, 1.0,
                       [find](const StudyPoint& p) -> Figure {
                         const auto* d = find(p);
                         return d ? Figure(d->deltaSpecificThrust) : std::nullopt;
                       }});
    columns.push_back({"audit." + key + ".delta_tsfc_g_per_kN_s", "TSFC change without " + key,
                       Quantity::Tsfc, kTsfcToFile, [find](const StudyPoint& p) -> Figure {
                         const auto* d = find(p);
                         return d ? Figure(d->deltaTsfc) : std::nullopt;
                       }});
  }
  return columns;
}

}  // namespace

std::vector<StudyColumn> studyColumns(bool withAudit, engine::Architecture architecture) {
  std::vector<StudyColumn> columns;
  for (const PerformanceFigure& figure : kPerformance) columns.push_back(performanceColumn(figure, false));
  for (StudyColumn& column : sizingColumns()) columns.push_back(std::move(column));
  for (const PerformanceFigure& figure : kPerformance) columns.push_back(performanceColumn(figure, true));
  if (withAudit)
    for (StudyColumn& column : auditColumns(architecture)) columns.push_back(std::move(column));
  return columns;
}

std::vector<StudyColumn> defaultStudyColumns(bool withAudit, engine::Architecture architecture) {
  std::vector<StudyColumn> columns;
  for (StudyColumn& column : studyColumns(withAudit, architecture)) {
    const bool idealOther = column.name.rfind("ideal.", 0) == 0 &&
                            column.name != "ideal.specific_thrust_N_s_per_kg" &&
                            column.name != "ideal.tsfc_g_per_kN_s";
    if (!idealOther) columns.push_back(std::move(column));
  }
  return columns;
}

std::vector<StudyColumn> selectStudyColumns(const std::string& names, bool withAudit,
                                            const std::string& where, engine::Architecture architecture) {
  std::vector<StudyColumn> all = studyColumns(withAudit, architecture);
  if (names.empty()) return all;
  std::vector<std::string> valid;
  for (const StudyColumn& c : all) valid.push_back(c.name);
  std::vector<StudyColumn> chosen;
  std::set<std::string> seen;
  std::size_t start = 0;
  while (start <= names.size()) {
    const std::size_t end = std::min(names.find(',', start), names.size());
    std::string name = names.substr(start, end - start);
    name.erase(0, name.find_first_not_of(' '));
    name.erase(name.find_last_not_of(' ') + 1);
    start = end + 1;
    const auto it =
        std::find_if(all.begin(), all.end(), [&](const StudyColumn& c) { return c.name == name; });
    if (it == all.end()) {
      std::string list;
      for (const std::string& v : valid) list += (list.empty() ? "" : ", ") + v;
      const bool auditName = name.rfind("audit.", 0) == 0 && !withAudit;
      throw InvalidInput(where, "unknown column \"" + name + "\"" +
                                    (auditName ? " (audit columns need --audit)" : "") +
                                    "; valid columns: " + list);
    }
    if (!seen.insert(name).second) throw InvalidInput(where, "column \"" + name + "\" is given twice");
    chosen.push_back(*it);
  }
  return chosen;
}

std::vector<StudyColumn> everyStudyColumn() {
  std::vector<StudyColumn> every;
  for (const engine::Architecture a :
       {engine::Architecture::Turbojet, engine::Architecture::TwoSpoolTurbojet})
    for (StudyColumn& c : studyColumns(true, a))
      if (std::none_of(every.begin(), every.end(), [&c](const StudyColumn& e) { return e.name == c.name; }))
        every.push_back(std::move(c));
  return every;
}

}  // namespace cw::study
