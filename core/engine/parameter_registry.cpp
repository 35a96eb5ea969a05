#include "engine/parameter_registry.h"

#include "common/error.h"
#include "engine/case_roles.h"
#include "engine/parameter_text.h"

#include <utility>

namespace cw::engine {

namespace {

using K = ParameterKind;
using Q = ParameterQuantity;

constexpr ValidRange closed(double low, double high) {
  return {low, true, high, true};
}
constexpr ValidRange openClosed(double low, double high) {
  return {low, false, high, true};
}
constexpr ValidRange closedOpen(double low, double high) {
  return {low, true, high, false};
}
constexpr ValidRange open(double low, double high) {
  return {low, false, high, false};
}

/// (0, 1]: efficiencies, recoveries, coefficients.
constexpr ValidRange kUnitFraction = openClosed(0.0, 1.0);
constexpr std::string_view kUnitFractionReason =
    "efficiencies, recoveries and coefficients: above 0, and 1 for no loss";
/// [0, 0.3]: pressure-loss fractions of ducts and burners.
constexpr ValidRange kLossFraction = closed(0.0, 0.3);
constexpr std::string_view kLossFractionReason =
    "pressure-loss and bleed fractions: 0 for none, up to beyond any real duct, burner or bleed";
/// Specific heat and ratio of specific heats of the simple gas models.
constexpr ValidRange kCp = open(0.0, 1.0e5);
constexpr ValidRange kGamma = openClosed(1.0, 5.0 / 3.0);
constexpr std::string_view kGasReason =
    "positive, finite specific heats, and a ratio between 1 and that of a monatomic gas";
/// The two-gamma model's hot gas: combustion products are never stiffer than air (gamma of
/// diatomic air 1.4; products about 1.3; common practice, no source).
constexpr ValidRange kHotGamma = openClosed(1.0, 1.4);
/// Burner and afterburner exit temperatures.
constexpr ValidRange kExitTemperature = closed(300.0, 2500.0);
constexpr std::string_view kExitTemperatureReason =
    "up to beyond the stoichiometric flame of kerosene in hot compressed air";

template <class T, class Variant>
bool holds(const Variant& v) {
  return std::holds_alternative<T>(v);
}

/// The alternative T of a variant, selected (default-constructed) if it was not.
template <class T, class Variant>
T& select(Variant& v) {
  if (!std::holds_alternative<T>(v)) v = T{};
  return std::get<T>(v);
}

using Applies = std::function<bool(const Case&)>;

bool always(const Case&) {
  return true;
}

Applies both(Applies a, Applies b) {
  return [a = std::move(a), b = std::move(b)](const Case& c) { return a(c) && b(c); };
}

/// Builds the table section by section; each entry starts from the section's condition.
class Table {
 public:
  std::vector<Parameter> list;

  void section(std::string_view name, Applies applies = always) {
    section_ = name;
    applies_ = std::move(applies);
  }

  Parameter& number(std::string_view key, std::string_view label, std::string_view toolTip,
                    std::string_view fieldKey, Q quantity, ValidRange range, std::string_view reason,
                    double defaultValue, std::function<double(const Case&)> get,
                    std::function<void(Case&, double)> set) {
    Parameter p = base(key, K::Number, label, toolTip, fieldKey);
    p.quantity = quantity;
    p.range = range;
    p.rangeReason = reason;
    p.defaultValue = defaultValue;
    p.get = std::move(get);
    p.set = std::move(set);
    return add(std::move(p));
  }

  Parameter& choice(std::string_view key, std::string_view label, std::string_view toolTip,
                    std::string_view fieldKey, std::vector<ParameterChoice> choices,
                    std::function<double(const Case&)> get, std::function<void(Case&, double)> set) {
    Parameter p = base(key, K::Choice, label, toolTip, fieldKey);
    p.choices = std::move(choices);
    p.get = std::move(get);
    p.set = std::move(set);
    return add(std::move(p));
  }

  Parameter& flag(std::string_view key, std::string_view label, std::string_view toolTip,
                  std::string_view fieldKey, std::function<bool(const Case&)> get,
                  std::function<void(Case&, bool)> set) {
    Parameter p = base(key, K::Flag, label, toolTip, fieldKey);
    p.get = [get = std::move(get)](const Case& c) { return get(c) ? 1.0 : 0.0; };
    p.set = [set = std::move(set)](Case& c, double v) { set(c, v > 0.5); };
    return add(std::move(p));
  }

  Parameter& text(std::string_view key, std::string_view label, std::string_view toolTip,
                  std::string_view fieldKey, std::function<std::string(const Case&)> get,
                  std::function<void(Case&, const std::string&)> set) {
    Parameter p = base(key, K::Text, label, toolTip, fieldKey);
    p.get = [](const Case&) { return 0.0; };
    p.set = [](Case&, double) {};
    p.getText = std::move(get);
    p.setText = std::move(set);
    return add(std::move(p));
  }

 private:
  Parameter base(std::string_view key, K kind, std::string_view label, std::string_view toolTip,
                 std::string_view fieldKey) const {
    Parameter p;
    p.section = section_;
    p.key = key;
    p.kind = kind;
    p.label = label;
    p.toolTip = toolTip;
    p.fieldKey = fieldKey;
    p.applies = applies_;
    return p;
  }
  Parameter& add(Parameter p) {
    list.push_back(std::move(p));
    return list.back();
  }

  std::string_view section_;
  Applies applies_ = always;
};

/// A number that belongs to alternative `index` of the group choice `group`, and applies only
/// while that alternative is chosen.
Parameter& inAlternative(Parameter& p, std::string_view group, int index, Applies chosen,
                         bool required = false) {
  p.group = group;
  p.alternative = index;
  p.requiredInAlternative = required;
  p.applies = both(p.applies, std::move(chosen));
  return p;
}

Parameter& loss(Parameter& p, double lossless) {
  p.lossless = lossless;
  return p;
}

// ---------------------------------------------------------------------------------------------

void addTopLevel(Table& t) {
  t.section("");
  t.text(
      "title", CW_PARAMETER_TEXT("Parameters", "Title"),
      CW_PARAMETER_TEXT("Parameters", "A short name for the case; saved in the case file."), "case.title",
      [](const Case& c) { return c.title; }, [](Case& c, const std::string& v) { c.title = v; });
  Parameter& notes = t.text(
      "notes", CW_PARAMETER_TEXT("Parameters", "Notes"),
      CW_PARAMETER_TEXT("Parameters",
                        "Free text about the case: what it is for, where its inputs come from; "
                        "saved in the case file."),
      "case.notes", [](const Case& c) { return c.notes; },
      [](Case& c, const std::string& v) { c.notes = v; });
  notes.multiLine = true;
}

void addEngine(Table& t) {
  t.section("engine");
  Parameter& architecture = t.choice(
      "architecture", CW_PARAMETER_TEXT("Parameters", "Architecture"),
      CW_PARAMETER_TEXT("Parameters",
                        "Single-spool turbojet, or two-spool turbojet (a low-pressure compressor and "
                        "turbine on their own shaft)."),
      "engine.architecture",
      {{"turbojet", CW_PARAMETER_TEXT("Parameters", "Turbojet")},
       {"two-spool-turbojet", CW_PARAMETER_TEXT("Parameters", "Two-spool turbojet")}},
      [](const Case& c) { return double(static_cast<int>(c.architecture)); },
      [](Case& c, double v) {
        c.architecture = v < 0.5 ? Architecture::Turbojet : Architecture::TwoSpoolTurbojet;
      });
  architecture.sinceVersion = 2;
}

void addFlight(Table& t) {
  t.section("flight");
  auto standard = [](const Case& c) { return holds<StandardAtmosphereAmbient>(c.flight.ambient); };
  auto given = [](const Case& c) { return holds<GivenAmbient>(c.flight.ambient); };
  Parameter& ambient = t.choice(
      "ambient", CW_PARAMETER_TEXT("Parameters", "Ambient state"),
      CW_PARAMETER_TEXT("Parameters",
                        "Take the free-stream static state from the U.S. Standard Atmosphere "
                        "1976, or give its temperature and pressure directly."),
      "flight.ambient",
      {{"standard-atmosphere", CW_PARAMETER_TEXT("Parameters", "Standard atmosphere")},
       {"given", CW_PARAMETER_TEXT("Parameters", "Given ambient")}},
      [](const Case& c) { return double(c.flight.ambient.index()); },
      [](Case& c, double v) {
        if (v < 0.5)
          select<StandardAtmosphereAmbient>(c.flight.ambient);
        else
          select<GivenAmbient>(c.flight.ambient);
      });
  ambient.inFile = false;
  ambient.groupRequired = true;

  Parameter& altitude = inAlternative(
      t.number(
          "altitude_m", CW_PARAMETER_TEXT("Parameters", "Altitude"),
          CW_PARAMETER_TEXT("Parameters", "Flight altitude; geopotential unless marked geometric."),
          "flight.altitude", Q::Length, closed(-5000.0, 86000.0),
          "the span of the U.S. Standard Atmosphere 1976, -5 km to 86 km geometric; a geopotential "
          "altitude (the default) may reach 84852 m, which is 86 km geometric",
          0.0, [](const Case& c) { return std::get<StandardAtmosphereAmbient>(c.flight.ambient).altitude; },
          [](Case& c, double v) { select<StandardAtmosphereAmbient>(c.flight.ambient).altitude = v; }),
      "ambient", 0, standard, true);
  // U.S. Standard Atmosphere 1976: -5 km to 86 km geometric; 86 km is 84852 m geopotential.
  altitude.narrower = ConditionalRange{{"geometric_altitude", "true"}, closed(-5000.0, 84852.0)};
  altitude.hasDefault = false;
  inAlternative(
      t.flag(
          "geometric_altitude", CW_PARAMETER_TEXT("Parameters", "Geometric altitude"),
          CW_PARAMETER_TEXT("Parameters", "The altitude is geometric (checked) or geopotential (unchecked)."),
          "flight.geometric",
          [](const Case& c) {
            return std::get<StandardAtmosphereAmbient>(c.flight.ambient).geometricAltitude;
          },
          [](Case& c, bool v) { select<StandardAtmosphereAmbient>(c.flight.ambient).geometricAltitude = v; }),
      "ambient", 0, standard);
  inAlternative(
      t.number(
          "isa_offset_K", CW_PARAMETER_TEXT("Parameters", "Temperature offset from standard"),
          CW_PARAMETER_TEXT("Parameters",
                            "Added to the standard-day temperature; the pressure is unchanged."),
          "flight.isaOffset", Q::TemperatureChange, closed(-100.0, 100.0),
          "hot and cold days well beyond the design standards' extremes", 0.0,
          [](const Case& c) { return std::get<StandardAtmosphereAmbient>(c.flight.ambient).isaOffset; },
          [](Case& c, double v) { select<StandardAtmosphereAmbient>(c.flight.ambient).isaOffset = v; }),
      "ambient", 0, standard);
  constexpr std::string_view kAmbientReason =
      "every atmosphere an engine meets, with margin (the standard atmosphere's coldest is 186.9 K; "
      "sea-level pressure 101325 Pa); the thermally perfect model covers 100 K to 6000 K (docs/theory.md, "
      "\"Below 200 K\"), so every ambient temperature the format admits has a cycle";
  inAlternative(
      t.number(
          "ambient_temperature_K", CW_PARAMETER_TEXT("Parameters", "Ambient static temperature"),
          CW_PARAMETER_TEXT("Parameters", "Free-stream static temperature, e.g. of a test cell."),
          "flight.ambientTemperature", Q::Temperature, openClosed(150.0, 350.0), kAmbientReason, 288.15,
          [](const Case& c) { return std::get<GivenAmbient>(c.flight.ambient).temperature; },
          [](Case& c, double v) { select<GivenAmbient>(c.flight.ambient).temperature = v; }),
      "ambient", 1, given, true)
      .hasDefault = false;
  inAlternative(t.number(
                    "ambient_pressure_Pa", CW_PARAMETER_TEXT("Parameters", "Ambient static pressure"),
                    CW_PARAMETER_TEXT("Parameters", "Free-stream static pressure."), "flight.ambientPressure",
                    Q::Pressure, openClosed(0.0, 2.0e5), kAmbientReason, 101325.0,
                    [](const Case& c) { return std::get<GivenAmbient>(c.flight.ambient).pressure; },
                    [](Case& c, double v) { select<GivenAmbient>(c.flight.ambient).pressure = v; }),
                "ambient", 1, given, true)
      .hasDefault = false;
  Parameter& mach = t.number(
      "mach", CW_PARAMETER_TEXT("Parameters", "Flight Mach number"),
      CW_PARAMETER_TEXT("Parameters", "Free-stream Mach number M0."), "flight.mach", Q::Dimensionless,
      closed(0.0, 5.0), "the range of turbojet operation and of the MIL-E-5008B recovery rule's first branch",
      0.0, [](const Case& c) { return c.flight.mach; }, [](Case& c, double v) { c.flight.mach = v; });
  mach.required = true;
  mach.hasDefault = false;
  t.number(
      "specific_humidity_kg_per_kg", CW_PARAMETER_TEXT("Parameters", "Specific humidity"),
      CW_PARAMETER_TEXT("Parameters", "Water vapour per unit mass of humid air."), "flight.humidity",
      Q::MassRatio, closed(0.0, 0.05), "saturated air at about 40 °C at sea level holds some 0.047 kg/kg",
      0.0, [](const Case& c) { return c.flight.specificHumidity; },
      [](Case& c, double v) { c.flight.specificHumidity = v; });
}

void addDesign(Table& t) {
  t.section("design");
  Parameter& target = t.choice(
      "target", CW_PARAMETER_TEXT("Parameters", "Engine size set by"),
      CW_PARAMETER_TEXT("Parameters",
                        "Fix the engine-face air mass flow, or the net thrust (the mass flow follows)."),
      "design.target",
      {{"air-mass-flow", CW_PARAMETER_TEXT("Parameters", "Air mass flow")},
       {"net-thrust", CW_PARAMETER_TEXT("Parameters", "Net thrust")}},
      [](const Case& c) { return double(c.design.target.index()); },
      [](Case& c, double v) {
        if (v < 0.5)
          select<AirMassFlowTarget>(c.design.target);
        else
          select<NetThrustTarget>(c.design.target);
      });
  target.inFile = false;
  target.groupRequired = true;
  constexpr std::string_view kSizeReason = "from model engines to beyond the largest";
  inAlternative(
      t.number(
          "air_mass_flow_kg_per_s", CW_PARAMETER_TEXT("Parameters", "Air mass flow W2"),
          CW_PARAMETER_TEXT("Parameters", "Engine-face air mass flow."), "design.airMassFlow", Q::MassFlow,
          openClosed(0.0, 2000.0), kSizeReason, 20.0,
          [](const Case& c) { return std::get<AirMassFlowTarget>(c.design.target).airMassFlow; },
          [](Case& c, double v) { select<AirMassFlowTarget>(c.design.target).airMassFlow = v; }),
      "target", 0, [](const Case& c) { return holds<AirMassFlowTarget>(c.design.target); }, true)
      .hasDefault = false;
  inAlternative(
      t.number(
          "required_net_thrust_N", CW_PARAMETER_TEXT("Parameters", "Required net thrust"),
          CW_PARAMETER_TEXT("Parameters",
                            "Net thrust at the design point; the air mass flow is sized to give it."),
          "design.netThrust", Q::Force, openClosed(0.0, 2.0e6), kSizeReason, 10000.0,
          [](const Case& c) { return std::get<NetThrustTarget>(c.design.target).netThrust; },
          [](Case& c, double v) { select<NetThrustTarget>(c.design.target).netThrust = v; }),
      "target", 1, [](const Case& c) { return holds<NetThrustTarget>(c.design.target); }, true)
      .hasDefault = false;
}

void addFuel(Table& t) {
  t.section("fuel");
  t.number(
      "lower_heating_value_J_per_kg", CW_PARAMETER_TEXT("Parameters", "Lower heating value"),
      CW_PARAMETER_TEXT("Parameters", "Fuel's lower heating value at 298.15 K."), "fuel.lhv",
      Q::SpecificEnergy, closed(1.0e6, 1.5e8), "kerosene is about 43e6, hydrogen about 1.2e8", 43.0e6,
      [](const Case& c) { return c.fuel.lowerHeatingValue; },
      [](Case& c, double v) { c.fuel.lowerHeatingValue = v; });
  t.number(
      "hydrogen_carbon_ratio", CW_PARAMETER_TEXT("Parameters", "Hydrogen-carbon ratio"),
      CW_PARAMETER_TEXT("Parameters", "Molar H/C ratio y of the fuel CHy."), "fuel.hc", Q::Dimensionless,
      closed(0.0, 4.0), "from carbon alone to methane", 1.9,
      [](const Case& c) { return c.fuel.hydrogenCarbonRatio; },
      [](Case& c, double v) { c.fuel.hydrogenCarbonRatio = v; });
  t.number(
      "temperature_K", CW_PARAMETER_TEXT("Parameters", "Fuel temperature"),
      CW_PARAMETER_TEXT("Parameters", "Delivery temperature of the fuel at the burner."), "fuel.temperature",
      Q::Temperature, closed(200.0, 1000.0), "from cold-soaked fuel to beyond any fuel-cooled heat sink",
      298.15, [](const Case& c) { return c.fuel.temperature; },
      [](Case& c, double v) { c.fuel.temperature = v; });
}

void addGasModel(Table& t) {
  t.section("gas_model");
  t.choice(
      "kind", CW_PARAMETER_TEXT("Parameters", "Gas model"),
      CW_PARAMETER_TEXT("Parameters",
                        "Thermally perfect: species data with variable composition. Constant cp: "
                        "one cp and ratio of specific heats. Two-gamma: air values before the "
                        "burner, product values after it."),
      "gas.kind",
      {{"thermally-perfect", CW_PARAMETER_TEXT("Parameters", "Thermally perfect")},
       {"constant-cp", CW_PARAMETER_TEXT("Parameters", "Constant cp")},
       {"two-gamma", CW_PARAMETER_TEXT("Parameters", "Two-gamma")}},
      [](const Case& c) { return double(c.gasModel.model.index()); },
      [](Case& c, double v) {
        const auto index = static_cast<std::size_t>(v + 0.5);
        if (index == c.gasModel.model.index()) return;
        if (index == 0) c.gasModel.model = ThermallyPerfectGasModel{};
        if (index == 1) c.gasModel.model = ConstantCpGasModel{};
        if (index == 2) c.gasModel.model = TwoGammaGasModel{};
        if (index == 0) c.gasModel.neglectFuelMass = false;
      });
  const Applies constantCp = [](const Case& c) { return holds<ConstantCpGasModel>(c.gasModel.model); };
  const Applies twoGamma = [](const Case& c) { return holds<TwoGammaGasModel>(c.gasModel.model); };
  auto onlyFor = [](Parameter& p, const Applies& kind, std::string_view value) -> Parameter& {
    p.applies = both(p.applies, kind);
    p.conditions = {{"kind", value}};
    return p;
  };
  constexpr std::string_view kHotGasReason =
      "the two-gamma model's hot gas stands for the products of burning in its cold gas, which are never "
      "stiffer than air and hold more heat per kelvin (otherwise the model's energy books give an exhaust "
      "colder than the intake and a thermal efficiency above 1)";
  onlyFor(t.number(
              "cp_J_per_kg_K", CW_PARAMETER_TEXT("Parameters", "Specific heat cp"),
              CW_PARAMETER_TEXT("Parameters", "Specific heat at constant pressure, everywhere."), "gas.cp",
              Q::SpecificHeat, kCp, kGasReason, 1004.0,
              [](const Case& c) { return std::get<ConstantCpGasModel>(c.gasModel.model).cp; },
              [](Case& c, double v) { select<ConstantCpGasModel>(c.gasModel.model).cp = v; }),
          constantCp, "constant-cp");
  onlyFor(
      t.number(
          "gamma", CW_PARAMETER_TEXT("Parameters", "Ratio of specific heats γ"),
          CW_PARAMETER_TEXT("Parameters", "cp/cv, everywhere."), "gas.gamma", Q::Dimensionless, kGamma,
          kGasReason, 1.4, [](const Case& c) { return std::get<ConstantCpGasModel>(c.gasModel.model).gamma; },
          [](Case& c, double v) { select<ConstantCpGasModel>(c.gasModel.model).gamma = v; }),
      constantCp, "constant-cp");
  onlyFor(t.number(
              "cold_cp_J_per_kg_K", CW_PARAMETER_TEXT("Parameters", "Cold-section cp"),
              CW_PARAMETER_TEXT("Parameters", "Specific heat of air up to the burner."), "gas.coldCp",
              Q::SpecificHeat, kCp, kGasReason, 1004.0,
              [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).coldCp; },
              [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).coldCp = v; }),
          twoGamma, "two-gamma");
  onlyFor(t.number(
              "cold_gamma", CW_PARAMETER_TEXT("Parameters", "Cold-section γ"),
              CW_PARAMETER_TEXT("Parameters", "Ratio of specific heats of air up to the burner."),
              "gas.coldGamma", Q::Dimensionless, kGamma, kGasReason, 1.4,
              [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).coldGamma; },
              [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).coldGamma = v; }),
          twoGamma, "two-gamma");
  onlyFor(t.number(
              "hot_cp_J_per_kg_K", CW_PARAMETER_TEXT("Parameters", "Hot-section cp"),
              CW_PARAMETER_TEXT("Parameters", "Specific heat of the combustion products after the burner."),
              "gas.hotCp", Q::SpecificHeat, kCp, kHotGasReason, 1239.0,
              [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).hotCp; },
              [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).hotCp = v; }),
          twoGamma, "two-gamma")
      .rangeNote = "and at least `cold_cp_J_per_kg_K`";
  onlyFor(t.number(
              "hot_gamma", CW_PARAMETER_TEXT("Parameters", "Hot-section γ"),
              CW_PARAMETER_TEXT("Parameters", "Ratio of specific heats of the products after the burner."),
              "gas.hotGamma", Q::Dimensionless, kHotGamma, kHotGasReason, 1.3333,
              [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).hotGamma; },
              [](Case& c, double v) { select<TwoGammaGasModel>(c.gasModel.model).hotGamma = v; }),
          twoGamma, "two-gamma")
      .rangeNote = "and at most `cold_gamma`";
  t.flag(
      "neglect_fuel_mass", CW_PARAMETER_TEXT("Parameters", "Neglect fuel mass"),
      CW_PARAMETER_TEXT("Parameters",
                        "Leave the fuel's mass out of the flow (constant-cp and two-gamma only)."),
      "gas.neglectFuelMass", [](const Case& c) { return c.gasModel.neglectFuelMass; },
      [](Case& c, bool v) { c.gasModel.neglectFuelMass = v; });
}

void addInlet(Table& t) {
  t.section("inlet");
  loss(t.choice(
           "loss_basis", CW_PARAMETER_TEXT("Parameters", "Loss given as"),
           CW_PARAMETER_TEXT("Parameters",
                             "Pressure recovery pt2/pt0, or ram efficiency: the fraction of the ram "
                             "enthalpy rise kept as pressure."),
           "inlet.basis",
           {{"pressure-recovery", CW_PARAMETER_TEXT("Parameters", "Pressure recovery")},
            {"ram-efficiency", CW_PARAMETER_TEXT("Parameters", "Ram efficiency")}},
           [](const Case& c) { return double(static_cast<int>(c.inlet.lossBasis)); },
           [](Case& c, double v) {
             c.inlet.lossBasis = v < 0.5 ? InletLossBasis::PressureRecovery : InletLossBasis::RamEfficiency;
           }),
       0.0)
      .inFile = false;
  auto basis = [](InletLossBasis b) { return [b](const Case& c) { return c.inlet.lossBasis == b; }; };
  loss(inAlternative(t.number(
                         "pressure_recovery", CW_PARAMETER_TEXT("Parameters", "Pressure recovery pt2/pt0"),
                         CW_PARAMETER_TEXT("Parameters", "pt2/pt0 of the inlet; 1 is loss-free."),
                         "inlet.recovery", Q::Dimensionless, kUnitFraction, kUnitFractionReason, 0.98,
                         [](const Case& c) { return c.inlet.loss; },
                         [](Case& c, double v) {
                           c.inlet.lossBasis = InletLossBasis::PressureRecovery;
                           c.inlet.loss = v;
                         }),
                     "loss_basis", 0, basis(InletLossBasis::PressureRecovery)),
       1.0);
  loss(inAlternative(t.number(
                         "ram_efficiency", CW_PARAMETER_TEXT("Parameters", "Ram efficiency"),
                         CW_PARAMETER_TEXT("Parameters",
                                           "The fraction of the ram enthalpy rise kept as pressure; 1 is "
                                           "loss-free."),
                         "inlet.ramEfficiency", Q::Dimensionless, kUnitFraction, kUnitFractionReason, 0.98,
                         [](const Case& c) { return c.inlet.loss; },
                         [](Case& c, double v) {
                           c.inlet.lossBasis = InletLossBasis::RamEfficiency;
                           c.inlet.loss = v;
                         }),
                     "loss_basis", 1, basis(InletLossBasis::RamEfficiency)),
       1.0)
      .hasDefault = false;
  loss(t.choice(
           "supersonic_recovery_rule", CW_PARAMETER_TEXT("Parameters", "Supersonic shock loss"),
           CW_PARAMETER_TEXT("Parameters",
                             "A multiplier on the recovery above Mach 1: none, or the military "
                             "specification rule 1 − 0.075 (M0 − 1)^1.35."),
           "inlet.supersonicRule",
           {{"none", CW_PARAMETER_TEXT("Parameters", "None")},
            {"mil-e-5008b", CW_PARAMETER_TEXT("Parameters", "MIL-E-5008B")}},
           [](const Case& c) { return double(static_cast<int>(c.inlet.supersonicRecoveryRule)); },
           [](Case& c, double v) {
             c.inlet.supersonicRecoveryRule =
                 v < 0.5 ? SupersonicRecoveryRule::None : SupersonicRecoveryRule::MilE5008B;
           }),
       0.0);
}

/// The efficiency of a turbomachine: the basis (a group choice) and its two numbers.
template <class Inputs>
void addEfficiency(Table& t, Inputs Case::*member, std::string_view basisKey, std::string_view isentropicKey,
                   std::string_view polytropicKey, double defaultValue) {
  loss(t.choice(
           "efficiency_basis", CW_PARAMETER_TEXT("Parameters", "Efficiency basis"),
           CW_PARAMETER_TEXT("Parameters",
                             "Give the isentropic or the polytropic efficiency; the other is derived."),
           basisKey,
           {{"isentropic", CW_PARAMETER_TEXT("Parameters", "Isentropic")},
            {"polytropic", CW_PARAMETER_TEXT("Parameters", "Polytropic")}},
           [member](const Case& c) { return double(static_cast<int>((c.*member).efficiency.basis)); },
           [member](Case& c, double v) {
             (c.*member).efficiency.basis =
                 v < 0.5 ? EfficiencyBasis::Isentropic : EfficiencyBasis::Polytropic;
           }),
       0.0)
      .inFile = false;
  auto basis = [member](EfficiencyBasis b) {
    return [member, b](const Case& c) { return (c.*member).efficiency.basis == b; };
  };
  auto get = [member](const Case& c) { return (c.*member).efficiency.value; };
  loss(inAlternative(
           t.number("isentropic_efficiency", CW_PARAMETER_TEXT("Parameters", "Isentropic efficiency"),
                    CW_PARAMETER_TEXT("Parameters", "Isentropic efficiency; 1 is loss-free."), isentropicKey,
                    Q::Dimensionless, kUnitFraction, kUnitFractionReason, defaultValue, get,
                    [member](Case& c, double v) {
                      (c.*member).efficiency = {EfficiencyBasis::Isentropic, v};
                    }),
           "efficiency_basis", 0, basis(EfficiencyBasis::Isentropic)),
       1.0);
  loss(inAlternative(
           t.number("polytropic_efficiency", CW_PARAMETER_TEXT("Parameters", "Polytropic efficiency"),
                    CW_PARAMETER_TEXT("Parameters",
                                      "Small-stage efficiency, the same through the machine; 1 is "
                                      "loss-free."),
                    polytropicKey, Q::Dimensionless, kUnitFraction, kUnitFractionReason, defaultValue, get,
                    [member](Case& c, double v) {
                      (c.*member).efficiency = {EfficiencyBasis::Polytropic, v};
                    }),
           "efficiency_basis", 1, basis(EfficiencyBasis::Polytropic)),
       1.0)
      .hasDefault = false;
}

Applies ofArchitecture(Architecture architecture) {
  return [architecture](const Case& c) { return c.architecture == architecture; };
}

/// One description of a compressor's parameters, for every compressor role.
void addCompressor(Table& t, const CompressorRole& role, const std::vector<std::string_view>& fieldKeys) {
  t.section(role.name, ofArchitecture(role.architecture));
  const auto m = role.member;
  const CompressorInputs defaults = newCase(role.architecture).*m;
  t.number(
      "pressure_ratio", role.pressureRatioLabel,
      CW_PARAMETER_TEXT("Parameters", "Compressor total-pressure ratio."), fieldKeys[0], Q::Dimensionless,
      closed(1.0, 60.0), "no compression up to beyond any single-spool compressor", defaults.pressureRatio,
      [m](const Case& c) { return (c.*m).pressureRatio; },
      [m](Case& c, double v) { (c.*m).pressureRatio = v; });
  addEfficiency(t, m, fieldKeys[1], fieldKeys[2], fieldKeys[3], defaults.efficiency.value);
  loss(t.number(
           "bleed_fraction", CW_PARAMETER_TEXT("Parameters", "Bleed fraction"),
           CW_PARAMETER_TEXT("Parameters", "Air bled off at compressor exit, per unit of inlet air."),
           fieldKeys[4], Q::Dimensionless, kLossFraction, kLossFractionReason, defaults.bleedFraction,
           [m](const Case& c) { return (c.*m).bleedFraction; },
           [m](Case& c, double v) { (c.*m).bleedFraction = v; }),
       0.0);
}

/// One description of a turbine's parameters, for every turbine role.
void addTurbine(Table& t, const TurbineRole& role, const std::vector<std::string_view>& fieldKeys) {
  t.section(role.name, ofArchitecture(role.architecture));
  const auto m = role.member;
  const TurbineInputs defaults = newCase(role.architecture).*m;
  addEfficiency(t, m, fieldKeys[0], fieldKeys[1], fieldKeys[2], defaults.efficiency.value);
  loss(t.number(
           "mechanical_efficiency", CW_PARAMETER_TEXT("Parameters", "Mechanical efficiency"),
           CW_PARAMETER_TEXT("Parameters", "Compressor power over turbine power (shaft losses)."),
           fieldKeys[3], Q::Dimensionless, kUnitFraction, kUnitFractionReason, defaults.mechanicalEfficiency,
           [m](const Case& c) { return (c.*m).mechanicalEfficiency; },
           [m](Case& c, double v) { (c.*m).mechanicalEfficiency = v; }),
       1.0);
  loss(t.number(
           "power_offtake_W", CW_PARAMETER_TEXT("Parameters", "Power offtake"),
           CW_PARAMETER_TEXT("Parameters", "Shaft power taken for accessories."), fieldKeys[4], Q::Power,
           closed(0.0, 5.0e7), "from model engines to beyond the largest", defaults.powerOfftake,
           [m](const Case& c) { return (c.*m).powerOfftake; },
           [m](Case& c, double v) { (c.*m).powerOfftake = v; }),
       0.0);
}

void addBurner(Table& t) {
  t.section("burner");
  Parameter& setting = t.choice(
      "setting", CW_PARAMETER_TEXT("Parameters", "Burner set by"),
      CW_PARAMETER_TEXT("Parameters", "Fix the burner exit temperature Tt4, or the fuel-air ratio."),
      "burner.setting",
      {{"exit-temperature", CW_PARAMETER_TEXT("Parameters", "Exit temperature")},
       {"fuel-air-ratio", CW_PARAMETER_TEXT("Parameters", "Fuel-air ratio")}},
      [](const Case& c) { return double(c.burner.setting.index()); },
      [](Case& c, double v) {
        if (v < 0.5)
          select<ExitTemperatureSetting>(c.burner.setting);
        else
          select<FuelAirRatioSetting>(c.burner.setting);
      });
  setting.inFile = false;
  inAlternative(
      t.number(
          "exit_temperature_K", CW_PARAMETER_TEXT("Parameters", "Exit temperature Tt4"),
          CW_PARAMETER_TEXT("Parameters", "Burner exit (turbine entry) total temperature."),
          "burner.exitTemperature", Q::Temperature, kExitTemperature, kExitTemperatureReason, 1400.0,
          [](const Case& c) { return std::get<ExitTemperatureSetting>(c.burner.setting).exitTemperature; },
          [](Case& c, double v) { select<ExitTemperatureSetting>(c.burner.setting).exitTemperature = v; }),
      "setting", 0, [](const Case& c) { return holds<ExitTemperatureSetting>(c.burner.setting); });
  inAlternative(
      t.number(
          "fuel_air_ratio", CW_PARAMETER_TEXT("Parameters", "Fuel-air ratio"),
          CW_PARAMETER_TEXT("Parameters", "Fuel per unit of burner air."), "burner.fuelAirRatio",
          Q::Dimensionless, openClosed(0.0, 0.1),
          // Above stoichiometric (0.058 to 0.087 for H/C 4 to 0) the burner itself refuses.
          "the evaluation also refuses ratios above stoichiometric for the case's fuel and humidity "
          "(0.058 for H/C 4 up to 0.087 for H/C 0; 0.068 for H/C 1.9)",
          0.02, [](const Case& c) { return std::get<FuelAirRatioSetting>(c.burner.setting).fuelAirRatio; },
          [](Case& c, double v) { select<FuelAirRatioSetting>(c.burner.setting).fuelAirRatio = v; }),
      "setting", 1, [](const Case& c) { return holds<FuelAirRatioSetting>(c.burner.setting); })
      .hasDefault = false;
  loss(t.number(
           "pressure_loss_fraction", CW_PARAMETER_TEXT("Parameters", "Pressure-loss fraction"),
           CW_PARAMETER_TEXT("Parameters", "1 − pt4/pt3."), "burner.pressureLoss", Q::Dimensionless,
           kLossFraction, kLossFractionReason, 0.05,
           [](const Case& c) { return c.burner.pressureLossFraction; },
           [](Case& c, double v) { c.burner.pressureLossFraction = v; }),
       0.0);
  loss(t.number(
           "combustion_efficiency", CW_PARAMETER_TEXT("Parameters", "Combustion efficiency"),
           CW_PARAMETER_TEXT("Parameters", "Fraction of the fuel's heating value released."),
           "burner.combustionEfficiency", Q::Dimensionless, kUnitFraction, kUnitFractionReason, 0.99,
           [](const Case& c) { return c.burner.combustionEfficiency; },
           [](Case& c, double v) { c.burner.combustionEfficiency = v; }),
       1.0);
}

void addJetPipe(Table& t) {
  t.section("jet_pipe");
  loss(t.number(
           "pressure_loss_fraction", CW_PARAMETER_TEXT("Parameters", "Pressure-loss fraction"),
           CW_PARAMETER_TEXT("Parameters", "1 − pt_out/pt_in of the duct from turbine exit to nozzle entry."),
           "jetPipe.pressureLoss", Q::Dimensionless, kLossFraction, kLossFractionReason, 0.02,
           [](const Case& c) { return c.jetPipe.pressureLossFraction; },
           [](Case& c, double v) { c.jetPipe.pressureLossFraction = v; }),
       0.0);
}

void addAfterburner(Table& t) {
  t.section("afterburner");
  t.flag(
      "enabled", CW_PARAMETER_TEXT("Parameters", "Afterburner lit"),
      CW_PARAMETER_TEXT("Parameters", "Light the afterburner (reheat) between jet pipe and nozzle."),
      "afterburner.enabled", [](const Case& c) { return c.afterburner.enabled; },
      [](Case& c, bool v) { c.afterburner.enabled = v; });
  t.number(
      "exit_temperature_K", CW_PARAMETER_TEXT("Parameters", "Exit temperature Tt7"),
      CW_PARAMETER_TEXT("Parameters", "Afterburner exit total temperature when lit."),
      "afterburner.exitTemperature", Q::Temperature, kExitTemperature, kExitTemperatureReason, 2000.0,
      [](const Case& c) { return c.afterburner.exitTemperature; },
      [](Case& c, double v) { c.afterburner.exitTemperature = v; });
  loss(t.number(
           "pressure_loss_fraction_lit", CW_PARAMETER_TEXT("Parameters", "Pressure-loss fraction, lit"),
           CW_PARAMETER_TEXT("Parameters", "1 − pt_out/pt_in when lit."), "afterburner.lossLit",
           Q::Dimensionless, kLossFraction, kLossFractionReason, 0.05,
           [](const Case& c) { return c.afterburner.pressureLossFractionLit; },
           [](Case& c, double v) { c.afterburner.pressureLossFractionLit = v; }),
       0.0);
  loss(t.number(
           "pressure_loss_fraction_unlit", CW_PARAMETER_TEXT("Parameters", "Pressure-loss fraction, unlit"),
           CW_PARAMETER_TEXT("Parameters",
                             "1 − pt_out/pt_in when not lit; 0 for an engine without afterburner."),
           "afterburner.lossUnlit", Q::Dimensionless, kLossFraction, kLossFractionReason, 0.0,
           [](const Case& c) { return c.afterburner.pressureLossFractionUnlit; },
           [](Case& c, double v) { c.afterburner.pressureLossFractionUnlit = v; }),
       0.0);
  loss(t.number(
           "combustion_efficiency", CW_PARAMETER_TEXT("Parameters", "Combustion efficiency"),
           CW_PARAMETER_TEXT("Parameters", "Fraction of the heating value released when lit."),
           "afterburner.combustionEfficiency", Q::Dimensionless, kUnitFraction, kUnitFractionReason, 0.95,
           [](const Case& c) { return c.afterburner.combustionEfficiency; },
           [](Case& c, double v) { c.afterburner.combustionEfficiency = v; }),
       1.0);
}

void addNozzle(Table& t) {
  t.section("nozzle");
  auto divergent = [](const Case& c) { return !holds<ConvergentNozzle>(c.nozzle.geometry); };
  auto fixed = [](const Case& c) { return holds<FixedAreaRatioNozzle>(c.nozzle.geometry); };
  loss(t.choice(
           "kind", CW_PARAMETER_TEXT("Parameters", "Nozzle"),
           CW_PARAMETER_TEXT("Parameters",
                             "Convergent (exit at the throat), or convergent-divergent (expanding "
                             "fully to ambient pressure or of fixed area ratio)."),
           "nozzle.kind",
           {{"convergent", CW_PARAMETER_TEXT("Parameters", "Convergent")},
            {"convergent-divergent", CW_PARAMETER_TEXT("Parameters", "Convergent-divergent")}},
           [divergent](const Case& c) { return divergent(c) ? 1.0 : 0.0; },
           [divergent](Case& c, double v) {
             if (v < 0.5)
               c.nozzle.geometry = ConvergentNozzle{};
             else if (!divergent(c))
               c.nozzle.geometry = FullyExpandingNozzle{};
           }),
       1.0);
  Parameter& expansion =
      loss(t.choice(
               "expansion", CW_PARAMETER_TEXT("Parameters", "Expansion"),
               CW_PARAMETER_TEXT("Parameters",
                                 "Full expansion to ambient pressure, or a fixed exit-to-throat "
                                 "area ratio."),
               "nozzle.expansion",
               {{"full", CW_PARAMETER_TEXT("Parameters", "Full expansion")},
                {"area-ratio", CW_PARAMETER_TEXT("Parameters", "Fixed area ratio")}},
               [fixed](const Case& c) { return fixed(c) ? 1.0 : 0.0; },
               [fixed](Case& c, double v) {
                 if (v < 0.5)
                   c.nozzle.geometry = FullyExpandingNozzle{};
                 else if (!fixed(c))
                   c.nozzle.geometry = FixedAreaRatioNozzle{};
               }),
           0.0);
  expansion.applies = divergent;
  expansion.conditions = {{"kind", "convergent-divergent"}};
  Parameter& ratio = t.number(
      "exit_to_throat_area_ratio", CW_PARAMETER_TEXT("Parameters", "Exit-to-throat area ratio A9/A8"),
      CW_PARAMETER_TEXT("Parameters", "Geometric area ratio of the divergent part."), "nozzle.areaRatio",
      Q::Dimensionless, closed(1.0, 50.0),
      "a divergent nozzle never narrows; 50 covers full expansion at Mach 5", 1.5,
      [](const Case& c) { return std::get<FixedAreaRatioNozzle>(c.nozzle.geometry).exitToThroatAreaRatio; },
      [](Case& c, double v) { select<FixedAreaRatioNozzle>(c.nozzle.geometry).exitToThroatAreaRatio = v; });
  ratio.applies = fixed;
  ratio.conditions = {{"kind", "convergent-divergent"}, {"expansion", "area-ratio"}};
  loss(t.choice(
           "loss_basis", CW_PARAMETER_TEXT("Parameters", "Loss given as"),
           CW_PARAMETER_TEXT("Parameters",
                             "Velocity coefficient V9/V9,ideal, or isentropic efficiency of the expansion."),
           "nozzle.basis",
           {{"velocity-coefficient", CW_PARAMETER_TEXT("Parameters", "Velocity coefficient")},
            {"isentropic-efficiency", CW_PARAMETER_TEXT("Parameters", "Nozzle efficiency")}},
           [](const Case& c) { return double(static_cast<int>(c.nozzle.lossBasis)); },
           [](Case& c, double v) {
             c.nozzle.lossBasis =
                 v < 0.5 ? NozzleLossBasis::VelocityCoefficient : NozzleLossBasis::IsentropicEfficiency;
           }),
       0.0)
      .inFile = false;
  auto basis = [](NozzleLossBasis b) { return [b](const Case& c) { return c.nozzle.lossBasis == b; }; };
  loss(inAlternative(t.number(
                         "velocity_coefficient", CW_PARAMETER_TEXT("Parameters", "Velocity coefficient"),
                         CW_PARAMETER_TEXT("Parameters", "V9/V9,ideal; 1 is loss-free."),
                         "nozzle.velocityCoefficient", Q::Dimensionless, kUnitFraction, kUnitFractionReason,
                         0.98, [](const Case& c) { return c.nozzle.loss; },
                         [](Case& c, double v) {
                           c.nozzle.lossBasis = NozzleLossBasis::VelocityCoefficient;
                           c.nozzle.loss = v;
                         }),
                     "loss_basis", 0, basis(NozzleLossBasis::VelocityCoefficient)),
       1.0);
  loss(inAlternative(
           t.number(
               "isentropic_efficiency", CW_PARAMETER_TEXT("Parameters", "Nozzle efficiency"),
               CW_PARAMETER_TEXT("Parameters", "Isentropic efficiency of the expansion; 1 is loss-free."),
               "nozzle.efficiency", Q::Dimensionless, kUnitFraction, kUnitFractionReason, 0.98,
               [](const Case& c) { return c.nozzle.loss; },
               [](Case& c, double v) {
                 c.nozzle.lossBasis = NozzleLossBasis::IsentropicEfficiency;
                 c.nozzle.loss = v;
               }),
           "loss_basis", 1, basis(NozzleLossBasis::IsentropicEfficiency)),
       1.0)
      .hasDefault = false;
  loss(t.number(
           "discharge_coefficient", CW_PARAMETER_TEXT("Parameters", "Discharge coefficient"),
           CW_PARAMETER_TEXT("Parameters", "Actual over ideal throat mass flow; sizes the geometric throat."),
           "nozzle.discharge", Q::Dimensionless, kUnitFraction, kUnitFractionReason, 0.98,
           [](const Case& c) { return c.nozzle.dischargeCoefficient; },
           [](Case& c, double v) { c.nozzle.dischargeCoefficient = v; }),
       1.0);
}

void addSizing(Table& t) {
  t.section("sizing");
  constexpr std::string_view kReason = "axial flow at the face, subsonic, and an annulus that exists";
  t.number(
      "engine_face_mach", CW_PARAMETER_TEXT("Parameters", "Engine-face Mach number"),
      CW_PARAMETER_TEXT("Parameters", "Axial Mach number at the compressor face, for the face area."),
      "sizing.faceMach", Q::Dimensionless, openClosed(0.0, 0.8), kReason, 0.5,
      [](const Case& c) { return c.sizing.engineFaceMach; },
      [](Case& c, double v) { c.sizing.engineFaceMach = v; });
  t.number(
      "hub_to_tip_ratio", CW_PARAMETER_TEXT("Parameters", "Hub-to-tip radius ratio"),
      CW_PARAMETER_TEXT("Parameters", "Hub radius over tip radius at the engine face."), "sizing.hubToTip",
      Q::Dimensionless, closedOpen(0.0, 0.9), kReason, 0.4,
      [](const Case& c) { return c.sizing.hubToTipRatio; },
      [](Case& c, double v) { c.sizing.hubToTipRatio = v; });
}

/// The GUI field keys of each role's parameters (object names; the single-spool ones as before).
std::vector<std::string_view> compressorFieldKeys(std::string_view role) {
  if (role == "low_pressure_compressor")
    return {"lpc.pressureRatio", "lpc.basis", "lpc.efficiency", "lpc.polytropicEfficiency", "lpc.bleed"};
  if (role == "high_pressure_compressor")
    return {"hpc.pressureRatio", "hpc.basis", "hpc.efficiency", "hpc.polytropicEfficiency", "hpc.bleed"};
  return {"compressor.pressureRatio", "compressor.basis", "compressor.efficiency",
          "compressor.polytropicEfficiency", "compressor.bleed"};
}

std::vector<std::string_view> turbineFieldKeys(std::string_view role) {
  if (role == "high_pressure_turbine")
    return {"hpt.basis", "hpt.efficiency", "hpt.polytropicEfficiency", "hpt.mechanical", "hpt.offtake"};
  if (role == "low_pressure_turbine")
    return {"lpt.basis", "lpt.efficiency", "lpt.polytropicEfficiency", "lpt.mechanical", "lpt.offtake"};
  return {"turbine.basis", "turbine.efficiency", "turbine.polytropicEfficiency", "turbine.mechanical",
          "turbine.offtake"};
}

std::vector<Parameter> makeRegistry() {
  Table t;
  addTopLevel(t);
  addEngine(t);
  addFlight(t);
  addDesign(t);
  addFuel(t);
  addGasModel(t);
  addInlet(t);
  for (const CompressorRole& role : kCompressorRoles) addCompressor(t, role, compressorFieldKeys(role.name));
  addBurner(t);
  for (const TurbineRole& role : kTurbineRoles) addTurbine(t, role, turbineFieldKeys(role.name));
  addJetPipe(t);
  addAfterburner(t);
  addNozzle(t);
  addSizing(t);
  // The sections of version 2 only (the architecture and the two-spool roles).
  for (Parameter& p : t.list)
    for (const ParameterSection& s : parameterSections())
      if (s.name == p.section && s.sinceVersion > p.sinceVersion) p.sinceVersion = s.sinceVersion;
  return std::move(t.list);
}

std::vector<ParameterSection> makeSections() {
  std::vector<ParameterSection> s = {
      {"", "Case", "The document: its format and version, a title and notes.", true, 1},
      {"engine", "Engine", "The engine's architecture.", false, 2},
      {"flight", "Flight",
       "Flight condition. Give altitude_m (standard atmosphere) or ambient_temperature_K with "
       "ambient_pressure_Pa, not both; mach is required.",
       true, 1},
      {"design", "Design", "Design target: exactly one of air_mass_flow_kg_per_s or required_net_thrust_N.",
       true, 1},
      {"fuel", "Fuel", "The fuel, a hydrocarbon C H_y burnt completely.", false, 1},
      {"gas_model", "Gas model",
       "The gas model. cp_J_per_kg_K and gamma apply only to kind constant-cp; the cold_ and hot_ "
       "values only to two-gamma; neglect_fuel_mass may be true only for those two.",
       false, 1},
      {"inlet", "Inlet", "The inlet (stations 0 to 2).", false, 1},
  };
  const std::string_view compressorText[] = {
      "The compressor (stations 2 to 3).",
      "The low-pressure compressor of a two-spool turbojet (stations 2 to 25).",
      "The high-pressure compressor of a two-spool turbojet (stations 25 to 3).",
  };
  // The titles name the strip's items in the GUI (translated in the context "Parameters").
  const std::string_view compressorTitle[] = {CW_PARAMETER_TEXT("Parameters", "Compressor"),
                                              CW_PARAMETER_TEXT("Parameters", "LP compressor"),
                                              CW_PARAMETER_TEXT("Parameters", "HP compressor")};
  for (std::size_t i = 0; i < kCompressorRoles.size(); ++i)
    s.push_back({kCompressorRoles[i].name, compressorTitle[i], compressorText[i], false,
                 kCompressorRoles[i].architecture == Architecture::Turbojet ? 1 : 2,
                 kCompressorRoles[i].architecture});
  s.push_back({"burner", "Burner", "The burner (stations 3 to 4).", false, 1});
  const std::string_view turbineText[] = {
      "The turbine (stations 4 to 5).",
      "The high-pressure turbine of a two-spool turbojet (stations 4 to 45).",
      "The low-pressure turbine of a two-spool turbojet (stations 45 to 5).",
  };
  const std::string_view turbineTitle[] = {CW_PARAMETER_TEXT("Parameters", "Turbine"),
                                           CW_PARAMETER_TEXT("Parameters", "HP turbine"),
                                           CW_PARAMETER_TEXT("Parameters", "LP turbine")};
  for (std::size_t i = 0; i < kTurbineRoles.size(); ++i)
    s.push_back({kTurbineRoles[i].name, turbineTitle[i], turbineText[i], false,
                 kTurbineRoles[i].architecture == Architecture::Turbojet ? 1 : 2,
                 kTurbineRoles[i].architecture});
  s.push_back({"jet_pipe", "Jet pipe", "The jet pipe (turbine exit to nozzle entry).", false, 1});
  s.push_back({"afterburner", "Afterburner",
               "The afterburner. enabled means lit; unlit its duct loses pressure_loss_fraction_unlit "
               "(default 0: no afterburner fitted).",
               false, 1});
  s.push_back({"nozzle", "Nozzle",
               "The exhaust nozzle (stations 7 to 9). expansion applies only to kind convergent-divergent; "
               "exit_to_throat_area_ratio only to expansion area-ratio.",
               false, 1});
  s.push_back({"sizing", "Sizing", "Engine-face sizing.", false, 1});
  return s;
}

}  // namespace

std::string_view siUnit(ParameterQuantity quantity) {
  switch (quantity) {
    case Q::Dimensionless:
      return "";
    case Q::Length:
      return "m";
    case Q::Temperature:
    case Q::TemperatureChange:
      return "K";
    case Q::Pressure:
      return "Pa";
    case Q::MassFlow:
      return "kg/s";
    case Q::Force:
      return "N";
    case Q::SpecificEnergy:
      return "J/kg";
    case Q::SpecificHeat:
      return "J/(kg K)";
    case Q::Power:
      return "W";
    case Q::MassRatio:
      return "kg/kg";
  }
  return "";
}

std::string ValidRange::text() const {
  return std::string(lowClosed ? "[" : "(") + messageNumber(low) + ", " + messageNumber(high) +
         (highClosed ? "]" : ")");
}

std::string Parameter::pointer() const {
  return (section.empty() ? "" : "/" + std::string(section)) + "/" + std::string(key);
}

std::string Parameter::dottedPath() const {
  return section.empty() ? std::string(key) : std::string(section) + "." + std::string(key);
}

ValidRange Parameter::rangeFor(const Case& c) const {
  if (!narrower) return range;
  const Parameter* selector = findParameter(section, narrower->unless.selector);
  if (!selector) return narrower->range;
  // A flag compares without building its text (validation runs for every point of a study).
  const bool holds = selector->kind == K::Flag
                         ? (selector->get(c) > 0.5) == (narrower->unless.value == "true")
                         : selector->valueText(c) == narrower->unless.value;
  return holds ? range : narrower->range;
}

std::string Parameter::valueText(const Case& c) const {
  switch (kind) {
    case K::Number:
      return formatNumber(get(c));
    case K::Flag:
      return get(c) > 0.5 ? "true" : "false";
    case K::Choice:
      return std::string(choices.at(static_cast<std::size_t>(get(c) + 0.5)).value);
    case K::Text:
      return getText(c);
  }
  return {};
}

const std::vector<ParameterSection>& parameterSections() {
  static const std::vector<ParameterSection> sections = makeSections();
  return sections;
}

const std::vector<Parameter>& parameterRegistry() {
  static const std::vector<Parameter> registry = makeRegistry();
  return registry;
}

std::string_view architectureName(Architecture architecture) {
  static const Parameter* const entry = findParameter("engine", "architecture");
  return entry->choices.at(static_cast<std::size_t>(architecture)).value;
}

const Parameter* findParameter(std::string_view section, std::string_view key) {
  for (const Parameter& p : parameterRegistry())
    if (p.section == section && p.key == key) return &p;
  return nullptr;
}

void removeEveryLoss(Case& c) {
  // The loss parameters, found once (the ideal twin is built for every point of a trade study).
  static const std::vector<const Parameter*> losses = [] {
    std::vector<const Parameter*> list;
    for (const Parameter& p : parameterRegistry())
      if (p.lossless) list.push_back(&p);
    return list;
  }();
  for (const Parameter* p : losses)
    if (p->applies(c)) p->set(c, *p->lossless);
}

}  // namespace cw::engine
