#include "audit/audit_csv.h"

#include "common/error.h"
#include "common/version.h"

#include <sstream>

namespace cw::gui {

namespace {

constexpr double kTsfcToOutput = 1e6;  // kg/(N s) to g/(kN s)

std::string quoted(const std::string& text) {
  if (text.find_first_of(",\"\n") == std::string::npos) return text;
  std::string out = "\"";
  for (char c : text) {
    if (c == '"') out += '"';
    out += c;
  }
  return out + '"';
}

}  // namespace

std::string lossAuditCsv(const analysis::LossAudit& a) {
  std::ostringstream out;
  out << "# caution: " << kCaution << '\n'
      << "# every evaluation keeps the actual cycle's air mass flow W2 and burner exit temperature Tt4; "
         "waterfall steps depend on the order and sum to actual minus ideal\n";
  out << "view,item,specific_thrust_N_s_per_kg,tsfc_g_per_kN_s,per,scheme,exergy_W,entropy_generation_W_per_"
         "K,"
         "closure\n";
  auto row = [&](const std::string& view, const std::string& item, const std::string& fs,
                 const std::string& tsfc, const std::string& per, const std::string& scheme,
                 const std::string& exergy, const std::string& sgen, const std::string& closure) {
    out << view << ',' << quoted(item) << ',' << fs << ',' << tsfc << ',' << quoted(per) << ',' << scheme
        << ',' << exergy << ',' << sgen << ',' << closure << '\n';
  };
  auto figures = [&](const std::string& item, const analysis::AuditFigures& f) {
    row("figures", item, formatNumber(f.specificThrust),
        formatNumber(f.thrustSpecificFuelConsumption * kTsfcToOutput), "", "", "", "", "");
  };
  figures("ideal", a.ideal);
  figures("actual", a.actual);
  for (const auto& d : a.oneAtATime)
    row("one_at_a_time", d.loss, formatNumber(d.deltaSpecificThrust),
        formatNumber(d.deltaTsfc * kTsfcToOutput), "", "", "", "", "");
  for (const auto& d : a.waterfall)
    row("waterfall", d.loss, formatNumber(d.deltaSpecificThrust), formatNumber(d.deltaTsfc * kTsfcToOutput),
        "", "", "", "", "");
  for (const auto& s : a.sensitivities)
    row("sensitivity", s.loss, formatNumber(s.specificThrustPerUnit),
        formatNumber(s.tsfcPerUnit * kTsfcToOutput), s.unit, analysis::toString(s.scheme), "", "", "");
  const analysis::ExergyBalance& e = a.exergy;
  for (const auto& c : e.components)
    row("exergy", c.component, "", "", "", "", formatNumber(c.exergyDestroyed),
        formatNumber(c.entropyGeneration), "");
  row("exergy", "destroyed_total", "", "", "", "", formatNumber(e.destroyed), "", "");
  row("exergy", "fuel_exergy", "", "", "", "", formatNumber(e.fuelExergy), "", "");
  row("exergy", "residual", "", "", "", "", formatNumber(e.residual), "", formatNumber(e.closure));
  return out.str();
}

}  // namespace cw::gui
