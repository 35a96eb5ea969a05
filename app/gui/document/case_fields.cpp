#include "document/case_fields.h"

#include "document/units.h"

#include <QCoreApplication>

namespace cw::gui {

using namespace engine;

namespace {

std::string efficiencyPath(const char* section, const Efficiency& e) {
  return std::string("/") + section +
         (e.basis == EfficiencyBasis::Isentropic ? "/isentropic_efficiency" : "/polytropic_efficiency");
}

bool always(const Case&) {
  return true;
}

template <class T>
bool holds(const auto& variant) {
  return std::holds_alternative<T>(variant);
}

std::vector<FieldSpec> buildFields() {
  std::vector<FieldSpec> f;
  int nextId = 1;
  auto number = [&](Section section, const char* key, const char* label, const char* tip, Quantity q,
                    double low, bool lowOpen, double high, bool highOpen,
                    std::function<std::string(const Case&)> path, std::function<double(const Case&)> get,
                    std::function<void(Case&, double)> set,
                    std::function<bool(const Case&)> visible = always) {
    FieldSpec s;
    s.id = nextId++;
    s.section = section;
    s.kind = FieldKind::Number;
    s.key = key;
    s.label = label;
    s.toolTip = tip;
    s.quantity = q;
    s.low = low;
    s.lowOpen = lowOpen;
    s.high = high;
    s.highOpen = highOpen;
    s.path = std::move(path);
    s.get = std::move(get);
    s.set = std::move(set);
    s.visible = std::move(visible);
    f.push_back(std::move(s));
  };
  auto choice = [&](Section section, const char* key, const char* label, const char* tip,
                    std::vector<const char*> choices, std::function<std::string(const Case&)> path,
                    std::function<double(const Case&)> get, std::function<void(Case&, double)> set,
                    std::function<bool(const Case&)> visible = always) {
    FieldSpec s;
    s.id = nextId++;
    s.section = section;
    s.kind = choices.empty() ? FieldKind::Flag : FieldKind::Choice;
    s.key = key;
    s.label = label;
    s.toolTip = tip;
    s.choices = std::move(choices);
    s.path = std::move(path);
    s.get = std::move(get);
    s.set = std::move(set);
    s.visible = std::move(visible);
    f.push_back(std::move(s));
  };
  auto fixed = [](const char* p) { return [p](const Case&) { return std::string(p); }; };
  auto text = [&](FieldKind kind, const char* key, const char* label, const char* tip, const char* path,
                  std::function<std::string(const Case&)> get,
                  std::function<void(Case&, const std::string&)> set) {
    FieldSpec s;
    s.id = nextId++;
    s.section = Section::Case;
    s.kind = kind;
    s.key = key;
    s.label = label;
    s.toolTip = tip;
    s.path = [path](const Case&) { return std::string(path); };
    s.visible = always;
    s.get = [](const Case&) { return 0.0; };
    s.set = [](Case&, double) {};
    s.getText = std::move(get);
    s.setText = std::move(set);
    f.push_back(std::move(s));
  };
  auto stdAtm = [](const Case& c) { return holds<StandardAtmosphereAmbient>(c.flight.ambient); };
  auto givenAtm = [](const Case& c) { return holds<GivenAmbient>(c.flight.ambient); };

  // The case's own description: inputs too, saved in the file, no effect on the cycle.
  text(
      FieldKind::Text, "case.title", QT_TRANSLATE_NOOP("CaseFields", "Title"),
      QT_TRANSLATE_NOOP("CaseFields", "A short name for the case; saved in the case file."), "/title",
      [](const Case& c) { return c.title; }, [](Case& c, const std::string& v) { c.title = v; });
  text(
      FieldKind::Notes, "case.notes", QT_TRANSLATE_NOOP("CaseFields", "Notes"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Free text about the case: what it is for, where its inputs come from; "
                        "saved in the case file."),
      "/notes", [](const Case& c) { return c.notes; }, [](Case& c, const std::string& v) { c.notes = v; });

  // Flight condition.
  choice(
      Section::Flight, "flight.ambient", QT_TRANSLATE_NOOP("CaseFields", "Ambient state"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Take the free-stream static state from the U.S. Standard Atmosphere "
                        "1976, or give its temperature and pressure directly."),
      {QT_TRANSLATE_NOOP("CaseFields", "Standard atmosphere"),
       QT_TRANSLATE_NOOP("CaseFields", "Given ambient")},
      fixed("/flight/ambient"), [](const Case& c) { return double(c.flight.ambient.index()); },
      [](Case& c, double v) {
        if (v < 0.5 && !holds<StandardAtmosphereAmbient>(c.flight.ambient))
          c.flight.ambient = StandardAtmosphereAmbient{};
        else if (v >= 0.5 && !holds<GivenAmbient>(c.flight.ambient))
          c.flight.ambient = GivenAmbient{};
      });
  number(
      Section::Flight, "flight.altitude", QT_TRANSLATE_NOOP("CaseFields", "Altitude"),
      QT_TRANSLATE_NOOP("CaseFields", "Flight altitude; geopotential unless marked geometric."),
      Quantity::Length, -5000.0, false, 84852.0, false, fixed("/flight/altitude_m"),
      [](const Case& c) { return std::get<StandardAtmosphereAmbient>(c.flight.ambient).altitude; },
      [](Case& c, double v) { std::get<StandardAtmosphereAmbient>(c.flight.ambient).altitude = v; }, stdAtm);
  choice(
      Section::Flight, "flight.geometric", QT_TRANSLATE_NOOP("CaseFields", "Geometric altitude"),
      QT_TRANSLATE_NOOP("CaseFields", "The altitude is geometric (checked) or geopotential (unchecked)."), {},
      fixed("/flight/geometric_altitude"),
      [](const Case& c) {
        return std::get<StandardAtmosphereAmbient>(c.flight.ambient).geometricAltitude ? 1.0 : 0.0;
      },
      [](Case& c, double v) {
        std::get<StandardAtmosphereAmbient>(c.flight.ambient).geometricAltitude = v > 0.5;
      },
      stdAtm);
  number(
      Section::Flight, "flight.isaOffset",
      QT_TRANSLATE_NOOP("CaseFields", "Temperature offset from standard"),
      QT_TRANSLATE_NOOP("CaseFields", "Added to the standard-day temperature; the pressure is unchanged."),
      Quantity::TemperatureChange, -100.0, false, 100.0, false, fixed("/flight/isa_offset_K"),
      [](const Case& c) { return std::get<StandardAtmosphereAmbient>(c.flight.ambient).isaOffset; },
      [](Case& c, double v) { std::get<StandardAtmosphereAmbient>(c.flight.ambient).isaOffset = v; }, stdAtm);
  number(
      Section::Flight, "flight.ambientTemperature",
      QT_TRANSLATE_NOOP("CaseFields", "Ambient static temperature"),
      QT_TRANSLATE_NOOP("CaseFields", "Free-stream static temperature, e.g. of a test cell."),
      Quantity::Temperature, 150.0, true, 350.0, false, fixed("/flight/ambient_temperature_K"),
      [](const Case& c) { return std::get<GivenAmbient>(c.flight.ambient).temperature; },
      [](Case& c, double v) { std::get<GivenAmbient>(c.flight.ambient).temperature = v; }, givenAtm);
  number(
      Section::Flight, "flight.ambientPressure", QT_TRANSLATE_NOOP("CaseFields", "Ambient static pressure"),
      QT_TRANSLATE_NOOP("CaseFields", "Free-stream static pressure."), Quantity::Pressure, 0.0, true, 2.0e5,
      false, fixed("/flight/ambient_pressure_Pa"),
      [](const Case& c) { return std::get<GivenAmbient>(c.flight.ambient).pressure; },
      [](Case& c, double v) { std::get<GivenAmbient>(c.flight.ambient).pressure = v; }, givenAtm);
  number(
      Section::Flight, "flight.mach", QT_TRANSLATE_NOOP("CaseFields", "Flight Mach number"),
      QT_TRANSLATE_NOOP("CaseFields", "Free-stream Mach number M0."), Quantity::Dimensionless, 0.0, false,
      5.0, false, fixed("/flight/mach"), [](const Case& c) { return c.flight.mach; },
      [](Case& c, double v) { c.flight.mach = v; });
  number(
      Section::Flight, "flight.humidity", QT_TRANSLATE_NOOP("CaseFields", "Specific humidity"),
      QT_TRANSLATE_NOOP("CaseFields", "Water vapour per unit mass of humid air."), Quantity::MassRatio, 0.0,
      false, 0.05, false, fixed("/flight/specific_humidity_kg_per_kg"),
      [](const Case& c) { return c.flight.specificHumidity; },
      [](Case& c, double v) { c.flight.specificHumidity = v; });

  // Design and sizing.
  choice(
      Section::Design, "design.target", QT_TRANSLATE_NOOP("CaseFields", "Engine size set by"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Fix the engine-face air mass flow, or the net thrust (the mass flow follows)."),
      {QT_TRANSLATE_NOOP("CaseFields", "Air mass flow"), QT_TRANSLATE_NOOP("CaseFields", "Net thrust")},
      fixed("/design"), [](const Case& c) { return double(c.design.target.index()); },
      [](Case& c, double v) {
        if (v < 0.5 && !holds<AirMassFlowTarget>(c.design.target))
          c.design.target = AirMassFlowTarget{};
        else if (v >= 0.5 && !holds<NetThrustTarget>(c.design.target))
          c.design.target = NetThrustTarget{};
      });
  number(
      Section::Design, "design.airMassFlow", QT_TRANSLATE_NOOP("CaseFields", "Air mass flow W2"),
      QT_TRANSLATE_NOOP("CaseFields", "Engine-face air mass flow."), Quantity::MassFlow, 0.0, true, 2000.0,
      false, fixed("/design/air_mass_flow_kg_per_s"),
      [](const Case& c) { return std::get<AirMassFlowTarget>(c.design.target).airMassFlow; },
      [](Case& c, double v) { std::get<AirMassFlowTarget>(c.design.target).airMassFlow = v; },
      [](const Case& c) { return holds<AirMassFlowTarget>(c.design.target); });
  number(
      Section::Design, "design.netThrust", QT_TRANSLATE_NOOP("CaseFields", "Required net thrust"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Net thrust at the design point; the air mass flow is sized to give it."),
      Quantity::Force, 0.0, true, 2.0e6, false, fixed("/design/required_net_thrust_N"),
      [](const Case& c) { return std::get<NetThrustTarget>(c.design.target).netThrust; },
      [](Case& c, double v) { std::get<NetThrustTarget>(c.design.target).netThrust = v; },
      [](const Case& c) { return holds<NetThrustTarget>(c.design.target); });
  number(
      Section::Design, "sizing.faceMach", QT_TRANSLATE_NOOP("CaseFields", "Engine-face Mach number"),
      QT_TRANSLATE_NOOP("CaseFields", "Axial Mach number at the compressor face, for the face area."),
      Quantity::Dimensionless, 0.0, true, 0.8, false, fixed("/sizing/engine_face_mach"),
      [](const Case& c) { return c.sizing.engineFaceMach; },
      [](Case& c, double v) { c.sizing.engineFaceMach = v; });
  number(
      Section::Design, "sizing.hubToTip", QT_TRANSLATE_NOOP("CaseFields", "Hub-to-tip radius ratio"),
      QT_TRANSLATE_NOOP("CaseFields", "Hub radius over tip radius at the engine face."),
      Quantity::Dimensionless, 0.0, false, 0.9, true, fixed("/sizing/hub_to_tip_ratio"),
      [](const Case& c) { return c.sizing.hubToTipRatio; },
      [](Case& c, double v) { c.sizing.hubToTipRatio = v; });

  // Fuel.
  number(
      Section::Fuel, "fuel.lhv", QT_TRANSLATE_NOOP("CaseFields", "Lower heating value"),
      QT_TRANSLATE_NOOP("CaseFields", "Fuel's lower heating value at 298.15 K."), Quantity::SpecificEnergy,
      1.0e6, false, 1.5e8, false, fixed("/fuel/lower_heating_value_J_per_kg"),
      [](const Case& c) { return c.fuel.lowerHeatingValue; },
      [](Case& c, double v) { c.fuel.lowerHeatingValue = v; });
  number(
      Section::Fuel, "fuel.hc", QT_TRANSLATE_NOOP("CaseFields", "Hydrogen-carbon ratio"),
      QT_TRANSLATE_NOOP("CaseFields", "Molar H/C ratio y of the fuel CHy."), Quantity::Dimensionless, 0.0,
      false, 4.0, false, fixed("/fuel/hydrogen_carbon_ratio"),
      [](const Case& c) { return c.fuel.hydrogenCarbonRatio; },
      [](Case& c, double v) { c.fuel.hydrogenCarbonRatio = v; });
  number(
      Section::Fuel, "fuel.temperature", QT_TRANSLATE_NOOP("CaseFields", "Fuel temperature"),
      QT_TRANSLATE_NOOP("CaseFields", "Delivery temperature of the fuel at the burner."),
      Quantity::Temperature, 200.0, false, 1000.0, false, fixed("/fuel/temperature_K"),
      [](const Case& c) { return c.fuel.temperature; }, [](Case& c, double v) { c.fuel.temperature = v; });

  // Gas model.
  auto constantCp = [](const Case& c) { return holds<ConstantCpGasModel>(c.gasModel.model); };
  auto twoGamma = [](const Case& c) { return holds<TwoGammaGasModel>(c.gasModel.model); };
  choice(
      Section::GasModel, "gas.kind", QT_TRANSLATE_NOOP("CaseFields", "Gas model"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Thermally perfect: species data with variable composition. Constant cp: "
                        "one cp and ratio of specific heats. Two-gamma: air values before the "
                        "burner, product values after it."),
      {QT_TRANSLATE_NOOP("CaseFields", "Thermally perfect"), QT_TRANSLATE_NOOP("CaseFields", "Constant cp"),
       QT_TRANSLATE_NOOP("CaseFields", "Two-gamma")},
      fixed("/gas_model/kind"), [](const Case& c) { return double(c.gasModel.model.index()); },
      [](Case& c, double v) {
        const auto index = static_cast<std::size_t>(v + 0.5);
        if (index == c.gasModel.model.index()) return;
        if (index == 0) c.gasModel.model = ThermallyPerfectGasModel{};
        if (index == 1) c.gasModel.model = ConstantCpGasModel{};
        if (index == 2) c.gasModel.model = TwoGammaGasModel{};
        if (index == 0) c.gasModel.neglectFuelMass = false;
      });
  number(
      Section::GasModel, "gas.cp", QT_TRANSLATE_NOOP("CaseFields", "Specific heat cp"),
      QT_TRANSLATE_NOOP("CaseFields", "Specific heat at constant pressure, everywhere."),
      Quantity::SpecificHeat, 0.0, true, 1.0e5, true, fixed("/gas_model/cp_J_per_kg_K"),
      [](const Case& c) { return std::get<ConstantCpGasModel>(c.gasModel.model).cp; },
      [](Case& c, double v) { std::get<ConstantCpGasModel>(c.gasModel.model).cp = v; }, constantCp);
  number(
      Section::GasModel, "gas.gamma", QT_TRANSLATE_NOOP("CaseFields", "Ratio of specific heats γ"),
      QT_TRANSLATE_NOOP("CaseFields", "cp/cv, everywhere."), Quantity::Dimensionless, 1.0, true, 5.0 / 3.0,
      false, fixed("/gas_model/gamma"),
      [](const Case& c) { return std::get<ConstantCpGasModel>(c.gasModel.model).gamma; },
      [](Case& c, double v) { std::get<ConstantCpGasModel>(c.gasModel.model).gamma = v; }, constantCp);
  number(
      Section::GasModel, "gas.coldCp", QT_TRANSLATE_NOOP("CaseFields", "Cold-section cp"),
      QT_TRANSLATE_NOOP("CaseFields", "Specific heat of air up to the burner."), Quantity::SpecificHeat, 0.0,
      true, 1.0e5, true, fixed("/gas_model/cold_cp_J_per_kg_K"),
      [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).coldCp; },
      [](Case& c, double v) { std::get<TwoGammaGasModel>(c.gasModel.model).coldCp = v; }, twoGamma);
  number(
      Section::GasModel, "gas.coldGamma", QT_TRANSLATE_NOOP("CaseFields", "Cold-section γ"),
      QT_TRANSLATE_NOOP("CaseFields", "Ratio of specific heats of air up to the burner."),
      Quantity::Dimensionless, 1.0, true, 5.0 / 3.0, false, fixed("/gas_model/cold_gamma"),
      [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).coldGamma; },
      [](Case& c, double v) { std::get<TwoGammaGasModel>(c.gasModel.model).coldGamma = v; }, twoGamma);
  number(
      Section::GasModel, "gas.hotCp", QT_TRANSLATE_NOOP("CaseFields", "Hot-section cp"),
      QT_TRANSLATE_NOOP("CaseFields", "Specific heat of the combustion products after the burner."),
      Quantity::SpecificHeat, 0.0, true, 1.0e5, true, fixed("/gas_model/hot_cp_J_per_kg_K"),
      [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).hotCp; },
      [](Case& c, double v) { std::get<TwoGammaGasModel>(c.gasModel.model).hotCp = v; }, twoGamma);
  number(
      Section::GasModel, "gas.hotGamma", QT_TRANSLATE_NOOP("CaseFields", "Hot-section γ"),
      QT_TRANSLATE_NOOP("CaseFields", "Ratio of specific heats of the products after the burner."),
      Quantity::Dimensionless, 1.0, true, 1.4, false, fixed("/gas_model/hot_gamma"),
      [](const Case& c) { return std::get<TwoGammaGasModel>(c.gasModel.model).hotGamma; },
      [](Case& c, double v) { std::get<TwoGammaGasModel>(c.gasModel.model).hotGamma = v; }, twoGamma);
  choice(
      Section::GasModel, "gas.neglectFuelMass", QT_TRANSLATE_NOOP("CaseFields", "Neglect fuel mass"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Leave the fuel's mass out of the flow (constant-cp and two-gamma only)."),
      {}, fixed("/gas_model/neglect_fuel_mass"),
      [](const Case& c) { return c.gasModel.neglectFuelMass ? 1.0 : 0.0; },
      [](Case& c, double v) { c.gasModel.neglectFuelMass = v > 0.5; },
      [](const Case& c) { return !holds<ThermallyPerfectGasModel>(c.gasModel.model); });

  // Inlet.
  auto inletPath = [](const Case& c) {
    return std::string(c.inlet.lossBasis == InletLossBasis::PressureRecovery ? "/inlet/pressure_recovery"
                                                                             : "/inlet/ram_efficiency");
  };
  choice(
      Section::Inlet, "inlet.basis", QT_TRANSLATE_NOOP("CaseFields", "Loss given as"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Pressure recovery pt2/pt0, or ram efficiency: the fraction of the ram "
                        "enthalpy rise kept as pressure."),
      {QT_TRANSLATE_NOOP("CaseFields", "Pressure recovery"),
       QT_TRANSLATE_NOOP("CaseFields", "Ram efficiency")},
      fixed("/inlet/basis"), [](const Case& c) { return double(static_cast<int>(c.inlet.lossBasis)); },
      [](Case& c, double v) {
        c.inlet.lossBasis = v < 0.5 ? InletLossBasis::PressureRecovery : InletLossBasis::RamEfficiency;
      });
  number(
      Section::Inlet, "inlet.loss", QT_TRANSLATE_NOOP("CaseFields", "Recovery or ram efficiency"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Pressure recovery pt2/pt0 or ram efficiency, per the basis above; "
                        "1 is loss-free."),
      Quantity::Dimensionless, 0.0, true, 1.0, false, inletPath, [](const Case& c) { return c.inlet.loss; },
      [](Case& c, double v) { c.inlet.loss = v; });
  choice(
      Section::Inlet, "inlet.supersonicRule", QT_TRANSLATE_NOOP("CaseFields", "Supersonic shock loss"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "A multiplier on the recovery above Mach 1: none, or the military "
                        "specification rule 1 − 0.075 (M0 − 1)^1.35."),
      {QT_TRANSLATE_NOOP("CaseFields", "None"), QT_TRANSLATE_NOOP("CaseFields", "MIL-E-5008B")},
      fixed("/inlet/supersonic_recovery_rule"),
      [](const Case& c) { return double(static_cast<int>(c.inlet.supersonicRecoveryRule)); },
      [](Case& c, double v) {
        c.inlet.supersonicRecoveryRule =
            v < 0.5 ? SupersonicRecoveryRule::None : SupersonicRecoveryRule::MilE5008B;
      });

  // Compressor.
  const std::vector<const char*> efficiencyBases = {QT_TRANSLATE_NOOP("CaseFields", "Isentropic"),
                                                    QT_TRANSLATE_NOOP("CaseFields", "Polytropic")};
  number(
      Section::Compressor, "compressor.pressureRatio",
      QT_TRANSLATE_NOOP("CaseFields", "Pressure ratio pt3/pt2"),
      QT_TRANSLATE_NOOP("CaseFields", "Compressor total-pressure ratio."), Quantity::Dimensionless, 1.0,
      false, 60.0, false, fixed("/compressor/pressure_ratio"),
      [](const Case& c) { return c.compressor.pressureRatio; },
      [](Case& c, double v) { c.compressor.pressureRatio = v; });
  choice(
      Section::Compressor, "compressor.basis", QT_TRANSLATE_NOOP("CaseFields", "Efficiency basis"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Give the isentropic or the polytropic efficiency; the other is derived."),
      efficiencyBases, fixed("/compressor/basis"),
      [](const Case& c) { return double(static_cast<int>(c.compressor.efficiency.basis)); },
      [](Case& c, double v) {
        c.compressor.efficiency.basis = v < 0.5 ? EfficiencyBasis::Isentropic : EfficiencyBasis::Polytropic;
      });
  number(
      Section::Compressor, "compressor.efficiency", QT_TRANSLATE_NOOP("CaseFields", "Efficiency"),
      QT_TRANSLATE_NOOP("CaseFields", "Compressor efficiency on the basis above; 1 is isentropic."),
      Quantity::Dimensionless, 0.0, true, 1.0, false,
      [](const Case& c) { return efficiencyPath("compressor", c.compressor.efficiency); },
      [](const Case& c) { return c.compressor.efficiency.value; },
      [](Case& c, double v) { c.compressor.efficiency.value = v; });
  number(
      Section::Compressor, "compressor.bleed", QT_TRANSLATE_NOOP("CaseFields", "Bleed fraction"),
      QT_TRANSLATE_NOOP("CaseFields", "Air bled off at compressor exit, per unit of inlet air."),
      Quantity::Dimensionless, 0.0, false, 0.3, false, fixed("/compressor/bleed_fraction"),
      [](const Case& c) { return c.compressor.bleedFraction; },
      [](Case& c, double v) { c.compressor.bleedFraction = v; });

  // Burner.
  choice(
      Section::Burner, "burner.setting", QT_TRANSLATE_NOOP("CaseFields", "Burner set by"),
      QT_TRANSLATE_NOOP("CaseFields", "Fix the burner exit temperature Tt4, or the fuel-air ratio."),
      {QT_TRANSLATE_NOOP("CaseFields", "Exit temperature"),
       QT_TRANSLATE_NOOP("CaseFields", "Fuel-air ratio")},
      fixed("/burner/setting"), [](const Case& c) { return double(c.burner.setting.index()); },
      [](Case& c, double v) {
        if (v < 0.5 && !holds<ExitTemperatureSetting>(c.burner.setting))
          c.burner.setting = ExitTemperatureSetting{};
        else if (v >= 0.5 && !holds<FuelAirRatioSetting>(c.burner.setting))
          c.burner.setting = FuelAirRatioSetting{};
      });
  number(
      Section::Burner, "burner.exitTemperature", QT_TRANSLATE_NOOP("CaseFields", "Exit temperature Tt4"),
      QT_TRANSLATE_NOOP("CaseFields", "Burner exit (turbine entry) total temperature."),
      Quantity::Temperature, 300.0, false, 2500.0, false, fixed("/burner/exit_temperature_K"),
      [](const Case& c) { return std::get<ExitTemperatureSetting>(c.burner.setting).exitTemperature; },
      [](Case& c, double v) { std::get<ExitTemperatureSetting>(c.burner.setting).exitTemperature = v; },
      [](const Case& c) { return holds<ExitTemperatureSetting>(c.burner.setting); });
  number(
      Section::Burner, "burner.fuelAirRatio", QT_TRANSLATE_NOOP("CaseFields", "Fuel-air ratio"),
      QT_TRANSLATE_NOOP("CaseFields", "Fuel per unit of burner air."), Quantity::Dimensionless, 0.0, true,
      0.1, false, fixed("/burner/fuel_air_ratio"),
      [](const Case& c) { return std::get<FuelAirRatioSetting>(c.burner.setting).fuelAirRatio; },
      [](Case& c, double v) { std::get<FuelAirRatioSetting>(c.burner.setting).fuelAirRatio = v; },
      [](const Case& c) { return holds<FuelAirRatioSetting>(c.burner.setting); });
  number(
      Section::Burner, "burner.pressureLoss", QT_TRANSLATE_NOOP("CaseFields", "Pressure-loss fraction"),
      QT_TRANSLATE_NOOP("CaseFields", "1 − pt4/pt3."), Quantity::Dimensionless, 0.0, false, 0.3, false,
      fixed("/burner/pressure_loss_fraction"), [](const Case& c) { return c.burner.pressureLossFraction; },
      [](Case& c, double v) { c.burner.pressureLossFraction = v; });
  number(
      Section::Burner, "burner.combustionEfficiency",
      QT_TRANSLATE_NOOP("CaseFields", "Combustion efficiency"),
      QT_TRANSLATE_NOOP("CaseFields", "Fraction of the fuel's heating value released."),
      Quantity::Dimensionless, 0.0, true, 1.0, false, fixed("/burner/combustion_efficiency"),
      [](const Case& c) { return c.burner.combustionEfficiency; },
      [](Case& c, double v) { c.burner.combustionEfficiency = v; });

  // Turbine.
  choice(
      Section::Turbine, "turbine.basis", QT_TRANSLATE_NOOP("CaseFields", "Efficiency basis"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Give the isentropic or the polytropic efficiency; the other is derived."),
      efficiencyBases, fixed("/turbine/basis"),
      [](const Case& c) { return double(static_cast<int>(c.turbine.efficiency.basis)); },
      [](Case& c, double v) {
        c.turbine.efficiency.basis = v < 0.5 ? EfficiencyBasis::Isentropic : EfficiencyBasis::Polytropic;
      });
  number(
      Section::Turbine, "turbine.efficiency", QT_TRANSLATE_NOOP("CaseFields", "Efficiency"),
      QT_TRANSLATE_NOOP("CaseFields", "Turbine efficiency on the basis above; 1 is isentropic."),
      Quantity::Dimensionless, 0.0, true, 1.0, false,
      [](const Case& c) { return efficiencyPath("turbine", c.turbine.efficiency); },
      [](const Case& c) { return c.turbine.efficiency.value; },
      [](Case& c, double v) { c.turbine.efficiency.value = v; });
  number(
      Section::Turbine, "turbine.mechanical", QT_TRANSLATE_NOOP("CaseFields", "Mechanical efficiency"),
      QT_TRANSLATE_NOOP("CaseFields", "Compressor power over turbine power (shaft losses)."),
      Quantity::Dimensionless, 0.0, true, 1.0, false, fixed("/turbine/mechanical_efficiency"),
      [](const Case& c) { return c.turbine.mechanicalEfficiency; },
      [](Case& c, double v) { c.turbine.mechanicalEfficiency = v; });
  number(
      Section::Turbine, "turbine.offtake", QT_TRANSLATE_NOOP("CaseFields", "Power offtake"),
      QT_TRANSLATE_NOOP("CaseFields", "Shaft power taken for accessories."), Quantity::Power, 0.0, false,
      5.0e7, false, fixed("/turbine/power_offtake_W"), [](const Case& c) { return c.turbine.powerOfftake; },
      [](Case& c, double v) { c.turbine.powerOfftake = v; });

  // Jet pipe.
  number(
      Section::JetPipe, "jetPipe.pressureLoss", QT_TRANSLATE_NOOP("CaseFields", "Pressure-loss fraction"),
      QT_TRANSLATE_NOOP("CaseFields", "1 − pt_out/pt_in of the duct from turbine exit to nozzle entry."),
      Quantity::Dimensionless, 0.0, false, 0.3, false, fixed("/jet_pipe/pressure_loss_fraction"),
      [](const Case& c) { return c.jetPipe.pressureLossFraction; },
      [](Case& c, double v) { c.jetPipe.pressureLossFraction = v; });

  // Afterburner.
  choice(
      Section::Afterburner, "afterburner.enabled", QT_TRANSLATE_NOOP("CaseFields", "Afterburner lit"),
      QT_TRANSLATE_NOOP("CaseFields", "Light the afterburner (reheat) between jet pipe and nozzle."), {},
      fixed("/afterburner/enabled"), [](const Case& c) { return c.afterburner.enabled ? 1.0 : 0.0; },
      [](Case& c, double v) { c.afterburner.enabled = v > 0.5; });
  number(
      Section::Afterburner, "afterburner.exitTemperature",
      QT_TRANSLATE_NOOP("CaseFields", "Exit temperature Tt7"),
      QT_TRANSLATE_NOOP("CaseFields", "Afterburner exit total temperature when lit."), Quantity::Temperature,
      300.0, false, 2500.0, false, fixed("/afterburner/exit_temperature_K"),
      [](const Case& c) { return c.afterburner.exitTemperature; },
      [](Case& c, double v) { c.afterburner.exitTemperature = v; });
  number(
      Section::Afterburner, "afterburner.lossLit",
      QT_TRANSLATE_NOOP("CaseFields", "Pressure-loss fraction, lit"),
      QT_TRANSLATE_NOOP("CaseFields", "1 − pt_out/pt_in when lit."), Quantity::Dimensionless, 0.0, false, 0.3,
      false, fixed("/afterburner/pressure_loss_fraction_lit"),
      [](const Case& c) { return c.afterburner.pressureLossFractionLit; },
      [](Case& c, double v) { c.afterburner.pressureLossFractionLit = v; });
  number(
      Section::Afterburner, "afterburner.lossUnlit",
      QT_TRANSLATE_NOOP("CaseFields", "Pressure-loss fraction, unlit"),
      QT_TRANSLATE_NOOP("CaseFields", "1 − pt_out/pt_in when not lit; 0 for an engine without afterburner."),
      Quantity::Dimensionless, 0.0, false, 0.3, false, fixed("/afterburner/pressure_loss_fraction_unlit"),
      [](const Case& c) { return c.afterburner.pressureLossFractionUnlit; },
      [](Case& c, double v) { c.afterburner.pressureLossFractionUnlit = v; });
  number(
      Section::Afterburner, "afterburner.combustionEfficiency",
      QT_TRANSLATE_NOOP("CaseFields", "Combustion efficiency"),
      QT_TRANSLATE_NOOP("CaseFields", "Fraction of the heating value released when lit."),
      Quantity::Dimensionless, 0.0, true, 1.0, false, fixed("/afterburner/combustion_efficiency"),
      [](const Case& c) { return c.afterburner.combustionEfficiency; },
      [](Case& c, double v) { c.afterburner.combustionEfficiency = v; });

  // Nozzle.
  choice(
      Section::Nozzle, "nozzle.kind", QT_TRANSLATE_NOOP("CaseFields", "Nozzle"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Convergent (exit at the throat), convergent-divergent expanding fully to "
                        "ambient pressure, or convergent-divergent of fixed area ratio."),
      {QT_TRANSLATE_NOOP("CaseFields", "Convergent"),
       QT_TRANSLATE_NOOP("CaseFields", "Convergent-divergent, full expansion"),
       QT_TRANSLATE_NOOP("CaseFields", "Convergent-divergent, fixed area ratio")},
      fixed("/nozzle/kind"), [](const Case& c) { return double(c.nozzle.geometry.index()); },
      [](Case& c, double v) {
        const auto index = static_cast<std::size_t>(v + 0.5);
        if (index == c.nozzle.geometry.index()) return;
        if (index == 0) c.nozzle.geometry = ConvergentNozzle{};
        if (index == 1) c.nozzle.geometry = FullyExpandingNozzle{};
        if (index == 2) c.nozzle.geometry = FixedAreaRatioNozzle{};
      });
  number(
      Section::Nozzle, "nozzle.areaRatio", QT_TRANSLATE_NOOP("CaseFields", "Exit-to-throat area ratio A9/A8"),
      QT_TRANSLATE_NOOP("CaseFields", "Geometric area ratio of the divergent part."), Quantity::Dimensionless,
      1.0, false, 50.0, false, fixed("/nozzle/exit_to_throat_area_ratio"),
      [](const Case& c) { return std::get<FixedAreaRatioNozzle>(c.nozzle.geometry).exitToThroatAreaRatio; },
      [](Case& c, double v) { std::get<FixedAreaRatioNozzle>(c.nozzle.geometry).exitToThroatAreaRatio = v; },
      [](const Case& c) { return holds<FixedAreaRatioNozzle>(c.nozzle.geometry); });
  choice(
      Section::Nozzle, "nozzle.basis", QT_TRANSLATE_NOOP("CaseFields", "Loss given as"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Velocity coefficient V9/V9,ideal, or isentropic efficiency of the "
                        "expansion."),
      {QT_TRANSLATE_NOOP("CaseFields", "Velocity coefficient"),
       QT_TRANSLATE_NOOP("CaseFields", "Nozzle efficiency")},
      fixed("/nozzle/basis"), [](const Case& c) { return double(static_cast<int>(c.nozzle.lossBasis)); },
      [](Case& c, double v) {
        c.nozzle.lossBasis =
            v < 0.5 ? NozzleLossBasis::VelocityCoefficient : NozzleLossBasis::IsentropicEfficiency;
      });
  number(
      Section::Nozzle, "nozzle.loss", QT_TRANSLATE_NOOP("CaseFields", "Coefficient or efficiency"),
      QT_TRANSLATE_NOOP("CaseFields",
                        "Velocity coefficient or nozzle efficiency, per the basis above; 1 is "
                        "loss-free."),
      Quantity::Dimensionless, 0.0, true, 1.0, false,
      [](const Case& c) {
        return std::string(c.nozzle.lossBasis == NozzleLossBasis::VelocityCoefficient
                               ? "/nozzle/velocity_coefficient"
                               : "/nozzle/isentropic_efficiency");
      },
      [](const Case& c) { return c.nozzle.loss; }, [](Case& c, double v) { c.nozzle.loss = v; });
  number(
      Section::Nozzle, "nozzle.discharge", QT_TRANSLATE_NOOP("CaseFields", "Discharge coefficient"),
      QT_TRANSLATE_NOOP("CaseFields", "Actual over ideal throat mass flow; sizes the geometric throat."),
      Quantity::Dimensionless, 0.0, true, 1.0, false, fixed("/nozzle/discharge_coefficient"),
      [](const Case& c) { return c.nozzle.dischargeCoefficient; },
      [](Case& c, double v) { c.nozzle.dischargeCoefficient = v; });
  return f;
}

}  // namespace

std::string sectionComponent(Section section) {
  switch (section) {
    case Section::Inlet:
      return "inlet";
    case Section::Compressor:
      return "compressor";
    case Section::Burner:
      return "burner";
    case Section::Turbine:
      return "turbine";
    case Section::JetPipe:
      return "jet_pipe";
    case Section::Afterburner:
      return "afterburner";
    case Section::Nozzle:
      return "nozzle";
    default:
      return {};
  }
}

QString sectionName(Section section) {
  switch (section) {
    case Section::Case:
      return QCoreApplication::translate("CaseFields", "Case");
    case Section::Flight:
      return QCoreApplication::translate("CaseFields", "Flight");
    case Section::Design:
      return QCoreApplication::translate("CaseFields", "Design and sizing");
    case Section::Fuel:
      return QCoreApplication::translate("CaseFields", "Fuel");
    case Section::GasModel:
      return QCoreApplication::translate("CaseFields", "Gas model");
    case Section::Inlet:
      return QCoreApplication::translate("CaseFields", "Inlet");
    case Section::Compressor:
      return QCoreApplication::translate("CaseFields", "Compressor");
    case Section::Burner:
      return QCoreApplication::translate("CaseFields", "Burner");
    case Section::Turbine:
      return QCoreApplication::translate("CaseFields", "Turbine");
    case Section::JetPipe:
      return QCoreApplication::translate("CaseFields", "Jet pipe");
    case Section::Afterburner:
      return QCoreApplication::translate("CaseFields", "Afterburner");
    case Section::Nozzle:
      return QCoreApplication::translate("CaseFields", "Nozzle");
  }
  return {};
}

QString sectionKey(Section section) {
  static const char* keys[] = {"case",       "flight", "design",  "fuel",    "gasModel",    "inlet",
                               "compressor", "burner", "turbine", "jetPipe", "afterburner", "nozzle"};
  return QString::fromLatin1(keys[static_cast<int>(section)]);
}

const std::vector<FieldSpec>& caseFields() {
  static const std::vector<FieldSpec> fields = buildFields();
  return fields;
}

const FieldSpec* caseField(int id) {
  for (const auto& f : caseFields())
    if (f.id == id) return &f;
  return nullptr;
}

const FieldSpec* caseField(const QString& key) {
  for (const auto& f : caseFields())
    if (key == QLatin1String(f.key)) return &f;
  return nullptr;
}

QString fieldLabel(const FieldSpec& spec) {
  return QCoreApplication::translate("CaseFields", spec.label);
}

QString fieldToolTip(const FieldSpec& spec, const DisplayUnits& units) {
  QString tip = QCoreApplication::translate("CaseFields", spec.toolTip);
  if (spec.kind != FieldKind::Number) return tip;
  const QString unit = spec.quantity == Quantity::Dimensionless
                           ? QString()
                           : QStringLiteral(" ") + units.symbol(spec.quantity);
  const QString range =
      QStringLiteral("%1%2, %3%4%5")
          .arg(spec.lowOpen ? "(" : "[", formatNumber(units.toDisplay(spec.low, spec.quantity), 6),
               formatNumber(units.toDisplay(spec.high, spec.quantity), 6), spec.highOpen ? ")" : "]", unit);
  return QCoreApplication::translate("CaseFields", "%1\nValid range: %2").arg(tip, range);
}

QString fieldRangeText(const FieldSpec& spec, const QString& coreRange, const DisplayUnits& units) {
  if (units.system() == UnitSystem::SI || spec.quantity == Quantity::Dimensionless ||
      spec.quantity == Quantity::MassRatio)
    return coreRange;
  return coreRange + QStringLiteral(" = %1%2, %3%4 %5")
                         .arg(spec.lowOpen ? "(" : "[", units.inputText(spec.low, spec.quantity),
                              units.inputText(spec.high, spec.quantity), spec.highOpen ? ")" : "]",
                              units.symbol(spec.quantity));
}

QString fieldRangeProblem(const FieldSpec& spec, double si, const QString& coreRange,
                          const DisplayUnits& units) {
  // The form's message (its context, so one translation serves form and banner).
  return QCoreApplication::translate("cw::gui::CaseForm", "%1 = %2 is outside the valid range %3.")
      .arg(fieldLabel(spec), units.inputTextWithUnit(si, spec.quantity),
           fieldRangeText(spec, coreRange, units));
}

}  // namespace cw::gui
