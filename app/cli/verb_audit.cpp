// cyclewright-cli audit CASE.json [--set path.to.key=VALUE ...] [--order a,b,c] [--format json|csv|text]
//
// The loss audit of a case (core/analysis/loss_audit.h): each loss removed alone, the waterfall
// from the ideal twin, the sensitivities and the exergy balance. TSFC prints in g/(kN s).
#include "analysis/loss_audit.h"
#include "analysis/loss_catalogue.h"
#include "common/error.h"
#include "common/version.h"
#include "io/case_file.h"
#include "output.h"
#include "verbs.h"

#include <iomanip>
#include <ostream>

namespace cw::cli {

namespace {

/// kg/(N s) to g/(kN s).
constexpr double kTsfcToOutput = 1e6;

const char* kOrderNote =
    "waterfall steps depend on the order in which the losses are added; they sum to actual minus ideal";
const char* kFrameNote =
    "engine frame, dead state at the free-stream static state on each stream's own gas; exhaust_kinetic_W is "
    "the jet kinetic-energy gain not delivered as thrust power (W9 V9^2/2 - W2 V0^2/2 - F_n V0)";

std::vector<std::string> splitOrder(const std::string& text) {
  std::vector<std::string> keys;
  std::size_t start = 0;
  while (start <= text.size()) {
    const std::size_t end = std::min(text.find(',', start), text.size());
    std::string key = text.substr(start, end - start);
    const auto first = key.find_first_not_of(' '), last = key.find_last_not_of(' ');
    key = first == std::string::npos ? "" : key.substr(first, last - first + 1);
    if (key.empty())
      throw InvalidInput("--order", "an empty loss key; valid losses: " + analysis::lossKeyList());
    keys.push_back(key);
    start = end + 1;
  }
  return keys;
}

nlohmann::json deltaJson(const analysis::LossDelta& d) {
  return {{"loss", d.loss},
          {"delta_specific_thrust_N_s_per_kg", d.deltaSpecificThrust},
          {"delta_tsfc_g_per_kN_s", d.deltaTsfc * kTsfcToOutput}};
}

nlohmann::json figuresJson(const analysis::AuditFigures& f) {
  return {{"specific_thrust_N_s_per_kg", f.specificThrust},
          {"tsfc_g_per_kN_s", f.thrustSpecificFuelConsumption * kTsfcToOutput}};
}

nlohmann::json auditToJson(const analysis::LossAudit& a, const engine::Case& audited) {
  nlohmann::json j;
  j["caution"] = kCaution;
  j["actual"] = figuresJson(a.actual);
  j["ideal"] = figuresJson(a.ideal);
  j["audit_point_note"] =
      "every evaluation keeps the actual cycle's air mass flow W2 and burner exit temperature Tt4";
  j["one_at_a_time"] = nlohmann::json::array();
  for (const auto& d : a.oneAtATime) {
    nlohmann::json row = deltaJson(d);
    const auto& loss = analysis::lossByKey(d.loss, audited);
    row["field"] = loss.field;
    row["removed_to"] = loss.removedTo;
    j["one_at_a_time"].push_back(row);
  }
  j["waterfall_order"] = a.waterfallOrder;
  j["waterfall_note"] = kOrderNote;
  j["waterfall"] = nlohmann::json::array();
  for (const auto& d : a.waterfall) j["waterfall"].push_back(deltaJson(d));
  j["sensitivities"] = nlohmann::json::array();
  for (const auto& s : a.sensitivities) {
    const bool watts = s.unitSize >= 1.0;
    j["sensitivities"].push_back({{"loss", s.loss},
                                  {"field", s.field},
                                  {"per", s.unit},
                                  {"parameter_si_unit", watts ? "W" : "1"},
                                  {"parameter_value", s.value},
                                  {"unit_size", s.unitSize},
                                  {"step", s.step},
                                  {"scheme", analysis::toString(s.scheme)},
                                  {"specific_thrust_N_s_per_kg_per_unit", s.specificThrustPerUnit},
                                  {"tsfc_g_per_kN_s_per_unit", s.tsfcPerUnit * kTsfcToOutput}});
  }
  const analysis::ExergyBalance& e = a.exergy;
  nlohmann::json x;
  x["frame_note"] = kFrameNote;
  x["dead_state_T_K"] = e.deadStateTemperature;
  x["dead_state_p_Pa"] = e.deadStatePressure;
  x["fuel_exergy_W"] = e.fuelExergy;
  x["fuel_heating_power_W"] = e.fuelHeatingPower;
  x["fuel_exergy_over_heating_power"] = e.fuelExergy / e.fuelHeatingPower;
  x["fuel_entropy_J_per_kg_K"] = e.fuelEntropy;
  x["ram_exergy_W"] = e.ramExergy;
  x["thrust_power_W"] = e.thrustPower;
  x["shaft_offtake_W"] = e.shaftOfftake;
  x["bleed_air_W"] = e.bleedAir;
  x["unburnt_fuel_W"] = e.unburntFuel;
  x["destroyed_W"] = e.destroyed;
  x["exhaust_thermal_W"] = e.exhaustThermal;
  x["exhaust_kinetic_W"] = e.exhaustKinetic;
  x["residual_W"] = e.residual;
  x["components"] = nlohmann::json::array();
  for (const auto& c : e.components)
    x["components"].push_back({{"component", c.component},
                               {"entropy_generation_W_per_K", c.entropyGeneration},
                               {"exergy_destroyed_W", c.exergyDestroyed}});
  j["exergy"] = x;
  j["exergy_balance_closure"] = e.closure;
  return j;
}

void printCsv(std::ostream& out, const analysis::LossAudit& a) {
  out << "# caution: " << kCaution << '\n' << "# " << kOrderNote << '\n';
  out << "step,loss,delta_specific_thrust_N_s_per_kg,delta_tsfc_g_per_kN_s\n";
  int step = 0;
  for (const auto& d : a.waterfall)
    out << ++step << ',' << d.loss << ',' << formatNumber(d.deltaSpecificThrust) << ','
        << formatNumber(d.deltaTsfc * kTsfcToOutput) << '\n';
}

void printText(std::ostream& out, const analysis::LossAudit& a) {
  out << std::fixed;
  auto header = [&](const char* title, const char* third, const char* fourth) {
    out << std::left << std::setw(32) << title << std::right << std::setw(18) << third << std::setw(18)
        << fourth << '\n';
  };
  auto row = [&](const std::string& name, double f, double s, int digitsF = 3, int digitsS = 4) {
    out << std::left << std::setw(32) << name << std::right << std::setprecision(digitsF) << std::setw(18)
        << f << std::setprecision(digitsS) << std::setw(18) << s << '\n';
  };
  header("loss audit", "F_s [N s/kg]", "TSFC [g/(kN s)]");
  row("with losses", a.actual.specificThrust, a.actual.thrustSpecificFuelConsumption * kTsfcToOutput);
  row("ideal twin", a.ideal.specificThrust, a.ideal.thrustSpecificFuelConsumption * kTsfcToOutput);
  out << "(at the actual cycle's air mass flow and burner exit temperature)\n\n";
  header("each loss removed alone", "dF_s [N s/kg]", "dTSFC [g/(kN s)]");
  for (const auto& d : a.oneAtATime) row(d.loss, d.deltaSpecificThrust, d.deltaTsfc * kTsfcToOutput);
  out << '\n';
  header("waterfall from the ideal twin", "step [N s/kg]", "[g/(kN s)]");
  for (const auto& d : a.waterfall) row(d.loss, d.deltaSpecificThrust, d.deltaTsfc * kTsfcToOutput);
  out << '(' << kOrderNote << ")\n\n";
  header("sensitivity, per unit", "F_s [N s/kg]", "TSFC [g/(kN s)]");
  for (const auto& s : a.sensitivities) {
    row(s.loss, s.specificThrustPerUnit, s.tsfcPerUnit * kTsfcToOutput, 4, 5);
    out << "    per " << s.unit << ", " << analysis::toString(s.scheme) << " difference, step "
        << formatNumber(s.step) << (s.unitSize >= 1.0 ? " W" : "") << '\n';
  }
  out << '\n';
  const analysis::ExergyBalance& e = a.exergy;
  out << "exergy, dead state T0 = " << std::setprecision(2) << e.deadStateTemperature
      << " K, p0 = " << std::setprecision(0) << e.deadStatePressure << " Pa\n";
  header("", "[kW]", "");
  auto kw = [&](const std::string& name, double watts) {
    out << std::left << std::setw(32) << name << std::right << std::setprecision(2) << std::setw(18)
        << watts * 1e-3 << '\n';
  };
  kw("fuel exergy", e.fuelExergy);
  out << "    " << std::setprecision(4) << e.fuelExergy / e.fuelHeatingPower
      << " of the fuel's heating power\n";
  kw("thrust power F_n V0", e.thrustPower);
  kw("shaft offtake", e.shaftOfftake);
  kw("bleed air", e.bleedAir);
  kw("unburnt fuel", e.unburntFuel);
  for (const auto& c : e.components) kw("destroyed: " + c.component, c.exergyDestroyed);
  kw("exhaust, thermal", e.exhaustThermal);
  kw("exhaust, kinetic (wake)", e.exhaustKinetic);
  out << "closure (residual / fuel exergy)  " << formatNumber(e.closure) << '\n';
  out << '(' << kFrameNote << ")\n\n" << kCaution << '\n';
}

int runAudit(const Arguments& args, Format format, std::ostream& out) {
  if (args.positional().size() != 1) throw InvalidInput("CASE", "give exactly one case file");
  std::vector<std::string> order;
  if (const auto text = args.text("order")) order = splitOrder(*text);
  nlohmann::json document = io::readCaseDocument(args.positional().front());
  for (const auto& assignment : args.all("set")) io::applySetOverride(document, assignment);
  const engine::Case audited = io::parseCase(document);
  const analysis::LossAudit audit = analysis::auditCase(audited, order);
  switch (format) {
    case Format::Json:
      out << auditToJson(audit, audited).dump(2) << '\n';
      break;
    case Format::Csv:
      printCsv(out, audit);
      break;
    case Format::Text:
      printText(out, audit);
      break;
  }
  return kExitOk;
}

}  // namespace

Verb auditVerb() {
  return {"audit",
          "what each loss costs: removed alone, waterfall from the ideal twin, sensitivities, exergy",
          "CASE.json [--set path.to.key=VALUE ...] [--order a,b,c]",
          {{"set", true, "override one input, e.g. --set compressor.pressure_ratio=12 (repeatable)"},
           {"order", true,
            "waterfall order, comma-separated loss keys (the rest follow in flow order): " +
                analysis::lossKeyList()}},
          {Format::Text, Format::Json, Format::Csv},
          "text (default), json (all views) or csv (the waterfall table)",
          &runAudit};
}

}  // namespace cw::cli
