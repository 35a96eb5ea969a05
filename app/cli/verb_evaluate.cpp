// cyclewright-cli evaluate CASE.json [--set path.to.key=VALUE ...] [--format json|csv|text]
#include "common/error.h"
#include "common/version.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"
#include "io/result_export.h"
#include "output.h"
#include "verbs.h"

#include <iomanip>
#include <ostream>

namespace cw::cli {

namespace {

void printText(std::ostream& out, const engine::Evaluation& e) {
  const auto& a = e.actual.performance;
  const auto& i = e.ideal.performance;
  out << std::fixed;
  auto row = [&](const char* name, const char* unit, double actual, double ideal, int digits) {
    out << std::left << std::setw(26) << name << std::right << std::setw(14) << std::setprecision(digits)
        << actual << std::setw(14) << ideal << std::setw(14) << (actual - ideal) << "  " << unit << '\n';
  };
  out << std::left << std::setw(26) << "performance" << std::right << std::setw(14) << "with losses"
      << std::setw(14) << "ideal" << std::setw(14) << "difference" << '\n';
  row("net thrust", "N", a.netThrust, i.netThrust, 1);
  row("specific thrust", "N s/kg", a.specificThrust, i.specificThrust, 2);
  row("TSFC", "g/(kN s)", a.thrustSpecificFuelConsumption * 1e6, i.thrustSpecificFuelConsumption * 1e6, 3);
  row("fuel flow", "kg/s", a.fuelFlow, i.fuelFlow, 5);
  row("fuel-air ratio", "-", a.fuelAirRatio, i.fuelAirRatio, 5);
  row("thermal efficiency", "-", a.thermalEfficiency, i.thermalEfficiency, 4);
  row("propulsive efficiency", "-", a.propulsiveEfficiency, i.propulsiveEfficiency, 4);
  row("overall efficiency", "-", a.overallEfficiency, i.overallEfficiency, 4);
  row("jet velocity", "m/s", a.jetVelocity, i.jetVelocity, 1);
  out << "nozzle choked             " << (a.nozzleChoked ? "yes" : "no") << '\n' << '\n';
  out << "station  " << std::setw(10) << "Tt [K]" << std::setw(13) << "pt [Pa]" << std::setw(10) << "Ts [K]"
      << std::setw(13) << "ps [Pa]" << std::setw(8) << "M [-]" << std::setw(10) << "V [m/s]" << std::setw(10)
      << "W [kg/s]" << std::setw(11) << "s [J/kg/K]" << std::setw(11) << "A [m^2]" << '\n';
  for (const auto& s : e.actual.stations) {
    out << std::left << std::setw(9) << s.id << std::right << std::setprecision(2) << std::setw(10)
        << s.totalTemperature << std::setprecision(0) << std::setw(13) << s.totalPressure
        << std::setprecision(2) << std::setw(10) << s.staticTemperature << std::setprecision(0)
        << std::setw(13) << s.staticPressure << std::setprecision(3) << std::setw(8) << s.mach
        << std::setprecision(1) << std::setw(10) << s.velocity << std::setprecision(3) << std::setw(10)
        << s.massFlow << std::setprecision(2) << std::setw(11) << s.entropy;
    if (s.area) out << std::setprecision(5) << std::setw(11) << *s.area;
    out << '\n';
  }
  out << '\n' << kCaution << '\n';
}

int runEvaluate(const Arguments& args, Format format, std::ostream& out) {
  if (args.positional().size() != 1) throw InvalidInput("CASE", "give exactly one case file");
  const std::string& path = args.positional().front();
  nlohmann::json document = io::readCaseDocument(path);
  for (const auto& assignment : args.all("set")) io::applySetOverride(document, assignment);
  const engine::Evaluation evaluation = engine::evaluateCase(io::parseCase(document, path));
  switch (format) {
    case Format::Json:
      out << io::evaluationToJson(evaluation).dump(2) << '\n';
      break;
    case Format::Csv:
      out << io::stationTableCsv(evaluation.actual);
      break;
    case Format::Text:
      printText(out, evaluation);
      break;
  }
  return kExitOk;
}

}  // namespace

Verb evaluateVerb() {
  return {"evaluate",
          "evaluate a design-point case file with losses and its ideal twin",
          "CASE.json [--set path.to.key=VALUE ...]",
          {{"set", true, "override one input, e.g. --set compressor.pressure_ratio=12 (repeatable)"}},
          {Format::Text, Format::Json, Format::Csv},
          "text (default: summary and station table), json (stations, performance, sizing, ideal, paths) or "
          "csv (the station table)",
          &runEvaluate};
}

}  // namespace cw::cli
