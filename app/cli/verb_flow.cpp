// cyclewright-cli flow: closed-form isentropic and normal-shock ratios of a constant-gamma gas.
#include "flow/ideal_gas_relations.h"
#include "output.h"
#include "verbs.h"

#include <ostream>

namespace cw::cli {

namespace {

int runFlow(const Arguments& args, Format format, std::ostream& out) {
  namespace ideal = flow::ideal;
  const double gamma = args.number("gamma");
  const double mach = args.number("mach");
  const bool shock = args.has("normal-shock");
  // Check here so that the message names the command line's arguments.
  ideal::checkGamma(gamma, "--gamma");
  if (shock)
    ideal::checkShockMach(mach, "--mach");  // a normal shock needs a supersonic (or sonic) stream
  else
    ideal::checkMach(mach, "--mach");

  nlohmann::json record;
  record["gamma"] = gamma;
  record["mach"] = mach;
  record["p_over_pt"] = ideal::pressureRatio(gamma, mach);
  record["T_over_Tt"] = ideal::temperatureRatio(gamma, mach);
  record["rho_over_rhot"] = ideal::densityRatio(gamma, mach);
  if (mach > 0.0) record["area_over_sonic_area"] = ideal::areaRatio(gamma, mach);  // infinite at M = 0
  if (shock) {
    record["mach_downstream"] = ideal::normalShockMach(gamma, mach);
    record["p2_over_p1"] = ideal::normalShockPressureRatio(gamma, mach);
    record["T2_over_T1"] = ideal::normalShockTemperatureRatio(gamma, mach);
    record["pt2_over_pt1"] = ideal::normalShockTotalPressureRatio(gamma, mach);
  }
  printRecord(out, record, format);
  return kExitOk;
}

}  // namespace

Verb flowVerb() {
  return {"flow",
          "isentropic and normal-shock ratios of a constant-gamma gas (NACA Report 1135)",
          "--gamma G --mach M [--normal-shock]",
          {
              {"gamma", true, "ratio of specific heats, (1, 5/3]"},
              {"mach", true, "Mach number, [0, 50] ([1, 50] with --normal-shock); A/A* is left out at M = 0"},
              {"normal-shock", false, "also print the normal-shock ratios for upstream Mach number M"},
          },
          {Format::Text, Format::Json, Format::Csv},
          "text (default), json or csv: one record of the ratios",
          &runFlow};
}

}  // namespace cw::cli
