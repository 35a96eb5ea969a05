// cyclewright-cli properties: thermally perfect properties of one species, air or combustion
// products at one temperature and pressure (NASA TM-4513 species data).
#include "common/error.h"
#include "output.h"
#include "thermo/combustion.h"
#include "thermo/fuel.h"
#include "thermo/mixture.h"
#include "thermo/species_table.h"
#include "thermo/thermally_perfect_gas.h"
#include "verbs.h"

#include <cmath>
#include <ostream>
#include <string>

namespace cw::cli {

namespace {

constexpr double kDefaultPressure = 101325.0;  // Pa, one standard atmosphere
// The pressures the verb accepts: wide enough for any engine or flight condition (the standard
// atmosphere reaches 0.37 Pa at 86 km), narrow enough that the entropy s = s° - R ln(p / p_ref)
// is finite and the gas still ideal (well below 1 GPa). [Pa]
constexpr double kMinimumPressure = 1e-3;
constexpr double kMaximumPressure = 1e9;

std::string gasNames() {
  return thermo::SpeciesTable::standard().namesList() + ", air, products";
}

int runProperties(const Arguments& args, Format format, std::ostream& out) {
  using thermo::Composition;
  const auto name = args.text("gas");
  if (!name) throw InvalidInput("--gas", "is required (one of " + gasNames() + ")");
  const thermo::SpeciesTable& table = thermo::SpeciesTable::standard();
  const bool isProducts = *name == "products";
  if (*name != "air" && !isProducts && !table.find(*name))
    throw InvalidInput("--gas", "unknown gas '" + *name + "' (valid: " + gasNames() + ")");
  if (args.has("fuel-air-ratio") && !isProducts)
    throw InvalidInput("--fuel-air-ratio", "applies only to --gas products, not to '" + *name + "'");

  const double temperature = args.number("temperature-K");
  const double pressure = args.number("pressure-Pa", kDefaultPressure);
  if (!(pressure >= kMinimumPressure && pressure <= kMaximumPressure))
    throw InvalidInput("--pressure-Pa", pressure, "Pa", "[0.001, 1e9] Pa");

  nlohmann::json record;
  record["gas"] = *name;
  Composition composition = Composition::pure(table[0].name());
  if (isProducts) {
    const auto fuel = thermo::HydrocarbonFuel::keroseneLike();
    const double f = args.number("fuel-air-ratio", 0.0);
    composition = thermo::completeCombustionProducts(thermo::dryAir(), fuel, f, "--fuel-air-ratio");
    record["fuel_air_ratio"] = f;
    record["fuel_hydrogen_carbon_ratio"] = fuel.hydrogenCarbonRatio();
    record["fuel_lower_heating_value_J_per_kg"] = fuel.lowerHeatingValue();
  } else {
    composition = (*name == "air") ? thermo::dryAir() : Composition::pure(*name);
  }
  const thermo::ThermallyPerfectGas gas(composition, *name);
  if (!(temperature >= gas.minimumTemperature() && temperature <= gas.maximumTemperature()))
    throw InvalidInput(
        "--temperature-K", temperature, "K",
        "[" + formatNumber(gas.minimumTemperature()) + ", " + formatNumber(gas.maximumTemperature()) + "] K");

  const auto p = gas.properties(temperature);
  const double R = gas.gasConstant();
  record["T_K"] = temperature;
  record["p_Pa"] = pressure;
  record["cp_J_per_kg_K"] = p.cp;
  record["h_J_per_kg"] = p.enthalpy;
  // s(T, p) = s°(T) - R ln(p / p_ref), p_ref = 1 bar.
  record["s_J_per_kg_K"] = p.standardEntropy - R * std::log(pressure / thermo::kReferencePressure);
  record["gamma"] = p.cp / (p.cp - R);
  record["R_J_per_kg_K"] = R;
  record["molar_mass_kg_per_mol"] = gas.molarMass();
  record["a_m_per_s"] = gas.speedOfSound(temperature);
  printRecord(out, record, format);
  return kExitOk;
}

}  // namespace

Verb propertiesVerb() {
  return {
      "properties",
      "thermally perfect properties of a species, dry air or combustion products (NASA TM-4513 data)",
      "--gas NAME --temperature-K T [--pressure-Pa P] [--fuel-air-ratio F]",
      {
          {"gas", true,
           "N2, O2, Ar, CO2, H2O, CO, H2, OH, H, O, NO, N; air (dry, U.S. Standard Atmosphere 1976); or "
           "products (complete combustion in dry air of a kerosene-like fuel, H/C = 1.9, LHV = 43 MJ/kg)"},
          {"temperature-K", true,
           "temperature in K, [100, 6000] for air, its species and products, [200, 6000] for the others"},
          {"pressure-Pa", true, "pressure in Pa, [0.001, 1e9], for the entropy (default 101325)"},
          {"fuel-air-ratio", true,
           "kg fuel per kg air for --gas products, [0, stoichiometric = 0.0683] (default 0)"},
      },
      {Format::Text, Format::Json, Format::Csv},
      "text (default), json or csv: one record of the properties",
      &runProperties};
}

}  // namespace cw::cli
