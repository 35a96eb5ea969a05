// The engine as a network: the two-spool turbojet against the single spool and the closed-form
// ideal turbojet, each shaft's work balance, the second-law balance over two shafts, and a
// separate-flow turbofan described in this file alone (a topology needs no change elsewhere).
#include "analysis/audit_point.h"
#include "analysis/exergy_balance.h"
#include "analysis/ideal_twin.h"
#include "engine/gas_model_factory.h"
#include "engine/isobars.h"
#include "evaluation/evaluate.h"
#include "ideal_turbojet.h"
#include "network/compressor_element.h"
#include "network/design_point.h"
#include "network/duct_element.h"
#include "network/engine.h"
#include "network/heat_addition_element.h"
#include "network/inlet_element.h"
#include "network/nozzle_element.h"
#include "network/turbine_element.h"

#include <QTest>

#include <cmath>

using namespace cw::engine;
using cw::test::relative;

namespace {

/// |a - b| <= tol max(|a|, |b|), and exactly equal where both are zero.
bool close(double a, double b, double tol) {
  return std::abs(a - b) <= tol * std::max(std::abs(a), std::abs(b));
}

/// The single-spool case as a two-spool one whose LP spool does nothing and loses nothing:
/// LP compressor ratio 1, efficiency 1, LP turbine efficiency 1, LP shaft eta_m 1, no offtake.
Case asTwoSpoolWithIdleLowPressureSpool(Case c) {
  c.architecture = Architecture::TwoSpoolTurbojet;
  c.lowPressureCompressor = CompressorInputs{1.0, Efficiency{EfficiencyBasis::Isentropic, 1.0}, 0.0};
  c.lowPressureTurbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 1.0}, 1.0, 0.0};
  return c;
}

/// A lossy two-spool case: both compressors bleed, both shafts have an offtake and losses.
Case lossyTwoSpoolCase() {
  Case c;
  c.architecture = Architecture::TwoSpoolTurbojet;
  c.flight.ambient = StandardAtmosphereAmbient{8000.0, false, 0.0};
  c.flight.mach = 0.8;
  c.lowPressureCompressor = CompressorInputs{3.0, Efficiency{EfficiencyBasis::Polytropic, 0.9}, 0.01};
  c.compressor = CompressorInputs{6.0, Efficiency{EfficiencyBasis::Isentropic, 0.84}, 0.03};
  c.burner.setting = ExitTemperatureSetting{1500.0};
  c.turbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 0.88}, 0.985, 80e3};
  c.lowPressureTurbine = TurbineInputs{Efficiency{EfficiencyBasis::Polytropic, 0.9}, 0.99, 40e3};
  return c;
}

const ComponentSummary& summary(const CycleResult& r, const std::string& name) {
  for (const auto& c : r.components)
    if (c.component == name) return c;
  throw std::out_of_range(name);
}

const ShaftBalance& shaft(const CycleResult& r, const std::string& name) {
  for (const auto& s : r.shafts)
    if (s.name == name) return s;
  throw std::out_of_range(name);
}

// ---------------------------------------------------------------------------------------------
// A separate-flow turbofan, described here alone: a fan on the LP shaft, a splitter, the core as
// the two-spool turbojet's, a bypass duct and nozzle.
//
//   0 -inlet- 2 -fan- 21 -splitter- 24 (core) -HPC- 3 -burner- 4 -HPT- 45 -LPT- 5 -jet pipe- 7 -nozzle- 8, 9
//                                    13 (bypass) -bypass duct- 17 -bypass nozzle- 18, 19

/// Divides a stream by the bypass ratio (W13 / W24), both at the entry's total state.
class SplitterElement : public cw::network::NetworkComponent {
 public:
  SplitterElement(std::string_view name, std::string_view entry, std::string_view core,
                  std::string_view bypass, double bypassRatio)
      : NetworkComponent(name, entry, core), bypass_(bypass), bypassRatio_(bypassRatio) {}

  void design(cw::network::DesignState& state) const override {
    const TotalState in = state.totalAt(entry());
    TotalState core = in, bypass = in;
    core.massFlow = in.massFlow / (1.0 + bypassRatio_);
    bypass.massFlow = in.massFlow - core.massFlow;
    state.summaries.push_back({std::string(name()), 0.0, std::nullopt, 0.0});
    state.putAtRest(exit(), core);
    state.putAtRest(bypass_, bypass);
  }
  void addPath(const cw::network::DesignState&, std::vector<ProcessPath>&) const override {}
  void describe(std::vector<ControlVolume>&) const override {}

 private:
  std::string_view bypass_;
  double bypassRatio_;
};

constexpr double kBypassRatio = 4.0;

/// The fan is the case's LP compressor and the LP turbine drives it; the bypass nozzle is the
/// core's nozzle inputs.
void separateFlowTurbofan(cw::network::Network& net, const Case& c, const cw::thermo::GasModel& model) {
  using namespace cw::network;
  net.setRoles({"0", "2", "3", "4"});
  net.addShaft(
      {"low_pressure_shaft", c.lowPressureTurbine.mechanicalEfficiency, c.lowPressureTurbine.powerOfftake});
  net.addShaft({"high_pressure_shaft", c.turbine.mechanicalEfficiency, c.turbine.powerOfftake});
  net.add<InletElement>("inlet", "0", "2", c.inlet, c.sizing.engineFaceMach);
  net.add<CompressorElement>("fan", "2", "21", "low_pressure_shaft", c.lowPressureCompressor);
  net.add<SplitterElement>("splitter", "21", "24", "13", kBypassRatio);
  net.add<CompressorElement>("high_pressure_compressor", "24", "3", "high_pressure_shaft", c.compressor);
  net.add<HeatAdditionElement>("burner", "3", "4", model, c.burner.setting, c.burner.pressureLossFraction,
                               c.burner.combustionEfficiency);
  net.add<TurbineElement>("high_pressure_turbine", "4", "45", "high_pressure_shaft", c.turbine.efficiency);
  net.add<TurbineElement>("low_pressure_turbine", "45", "5", "low_pressure_shaft",
                          c.lowPressureTurbine.efficiency);
  net.add<DuctElement>("jet_pipe", "5", "7", c.jetPipe.pressureLossFraction);
  net.add<NozzleElement>("nozzle", "7", "8", "9", c.nozzle);
  net.add<DuctElement>("bypass_duct", "13", "17", c.jetPipe.pressureLossFraction);
  net.add<NozzleElement>("bypass_nozzle", "17", "18", "19", c.nozzle);
}

Case turbofanCase() {
  Case c;
  c.architecture = Architecture::TwoSpoolTurbojet;  // the roles' inputs: fan = LP compressor
  c.flight.ambient = StandardAtmosphereAmbient{10000.0, false, 0.0};
  c.flight.mach = 0.78;
  c.lowPressureCompressor = CompressorInputs{1.6, Efficiency{EfficiencyBasis::Isentropic, 0.9}, 0.0};
  c.compressor = CompressorInputs{18.0, Efficiency{EfficiencyBasis::Isentropic, 0.86}, 0.0};
  c.burner = BurnerInputs{ExitTemperatureSetting{1550.0}, 0.04, 1.0};
  c.turbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 0.89}, 1.0, 0.0};
  c.lowPressureTurbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 0.9}, 1.0, 0.0};
  c.nozzle = NozzleInputs{ConvergentNozzle{}, NozzleLossBasis::VelocityCoefficient, 0.98, 0.97};
  return c;
}

}  // namespace

class TestEngineNetwork : public QObject {
  Q_OBJECT
 private slots:
  // A two-spool turbojet whose LP compressor has a pressure ratio of 1 and whose LP spool loses
  // nothing is the single-spool turbojet: every station the two share and every performance and
  // sizing figure to 1e-12, for the cycle with losses and its ideal twin (identity of the model;
  // common practice, no source). Its extra stations 25 and 45 repeat 2 and 5.
  void idleLowPressureSpoolIsTheSingleSpool_data() {
    QTest::addColumn<int>("variant");
    QTest::newRow("thermally perfect, static") << 0;
    QTest::newRow("two-gamma, afterburner lit, M 1.6") << 1;
    QTest::newRow("constant cp, thrust target, bleed and offtake") << 2;
    QTest::newRow("thermally perfect, unlit afterburner duct, fuel-air ratio") << 3;
  }
  void idleLowPressureSpoolIsTheSingleSpool() {
    QFETCH(int, variant);
    Case c;
    if (variant == 1) {
      c.gasModel.model = TwoGammaGasModel{};
      c.flight.mach = 1.6;
      c.afterburner.enabled = true;
      c.nozzle.geometry = FullyExpandingNozzle{};
    } else if (variant == 2) {
      c.gasModel.model = ConstantCpGasModel{};
      c.design.target = NetThrustTarget{15000.0};
      c.compressor.bleedFraction = 0.04;
      c.turbine.powerOfftake = 120e3;
    } else if (variant == 3) {
      c.flight.mach = 0.7;
      c.afterburner.pressureLossFractionUnlit = 0.02;
      c.burner.setting = FuelAirRatioSetting{0.019};
    }
    const Evaluation one = evaluateCase(c);
    const Evaluation two = evaluateCase(asTwoSpoolWithIdleLowPressureSpool(c));
    const double tol = 1e-12;
    for (const auto& [a, b] : {std::pair{&one.actual, &two.actual}, std::pair{&one.ideal, &two.ideal}}) {
      QCOMPARE(b->stations.size(), a->stations.size() + 2);
      for (const Station& s : a->stations) {
        const Station& t = b->station(s.id);
        for (const auto& [x, y, what] : {std::tuple{s.totalTemperature, t.totalTemperature, "Tt"},
                                         {s.totalPressure, t.totalPressure, "pt"},
                                         {s.totalEnthalpy, t.totalEnthalpy, "ht"},
                                         {s.staticTemperature, t.staticTemperature, "Ts"},
                                         {s.staticPressure, t.staticPressure, "ps"},
                                         {s.mach, t.mach, "M"},
                                         {s.velocity, t.velocity, "V"},
                                         {s.massFlow, t.massFlow, "W"},
                                         {s.fuelAirRatio, t.fuelAirRatio, "f"},
                                         {s.entropy, t.entropy, "s"}})
          QVERIFY2(close(x, y, tol), qPrintable(QString("station %1 %2: %3 vs %4")
                                                    .arg(QString::fromStdString(s.id), what)
                                                    .arg(x, 0, 'g', 17)
                                                    .arg(y, 0, 'g', 17)));
        QCOMPARE(bool(s.area), bool(t.area));
        if (s.area) QVERIFY(close(*s.area, *t.area, tol));
      }
      QVERIFY(close(b->station("25").totalPressure, b->station("2").totalPressure, tol));
      QVERIFY(close(b->station("45").totalTemperature, b->station("5").totalTemperature, tol));
      const Performance &p = a->performance, &q = b->performance;
      for (const auto& [x, y] : {std::pair{p.netThrust, q.netThrust},
                                 {p.grossThrust, q.grossThrust},
                                 {p.ramDrag, q.ramDrag},
                                 {p.specificThrust, q.specificThrust},
                                 {p.thrustSpecificFuelConsumption, q.thrustSpecificFuelConsumption},
                                 {p.fuelFlow, q.fuelFlow},
                                 {p.fuelAirRatio, q.fuelAirRatio},
                                 {p.thermalEfficiency, q.thermalEfficiency},
                                 {p.propulsiveEfficiency, q.propulsiveEfficiency},
                                 {p.overallEfficiency, q.overallEfficiency},
                                 {p.jetVelocity, q.jetVelocity},
                                 {p.effectiveJetVelocity, q.effectiveJetVelocity},
                                 {p.shaftPowerOfftake, q.shaftPowerOfftake}})
        QVERIFY2(close(x, y, tol), qPrintable(QString("%1 vs %2").arg(x, 0, 'g', 17).arg(y, 0, 'g', 17)));
      QCOMPARE(q.nozzleChoked, p.nozzleChoked);
      const Sizing &z = a->sizing, &w = b->sizing;
      for (const auto& [x, y] : {std::pair{z.airMassFlow, w.airMassFlow},
                                 {z.engineFaceArea, w.engineFaceArea},
                                 {z.engineFaceDiameter, w.engineFaceDiameter},
                                 {z.throatArea, w.throatArea},
                                 {z.exitArea, w.exitArea},
                                 {z.fuelFlow, w.fuelFlow}})
        QVERIFY(close(x, y, tol));
      // The HP spool's components are the single spool's.
      QVERIFY(close(summary(*b, "high_pressure_compressor").power, summary(*a, "compressor").power, tol));
      QVERIFY(close(summary(*b, "high_pressure_turbine").power, summary(*a, "turbine").power, tol));
      QVERIFY(std::abs(summary(*b, "low_pressure_turbine").power) <=
              1e-12 * std::abs(summary(*a, "turbine").power));
    }
  }

  // The ideal two-spool turbojet is the ideal turbojet of the overall pressure ratio, however the
  // ratio is split between the spools: Mattingly, Elements of Propulsion, 2006, sec. 5.6
  // (constant cp, fuel mass neglected), through the ideal twin (which makes both spools lossless).
  // Each spool's turbine gives its compressor's work (the shaft power balance of sec. 5.6 per
  // spool): Tt25 = Tt2 tau_cL, Tt45 = Tt4 - (Tt3 - Tt25), Tt5 = tau_t Tt4.
  void idealTwoSpoolMatchesClosedForm_data() {
    QTest::addColumn<double>("mach");
    QTest::addColumn<double>("overallRatio");
    QTest::addColumn<double>("lowPressureRatio");
    QTest::addColumn<double>("exitTemperature");
    QTest::newRow("M2, pi 10 = 2 x 5, 1800 K") << 2.0 << 10.0 << 2.0 << 1800.0;
    QTest::newRow("M2, pi 10 = 5 x 2, 1800 K") << 2.0 << 10.0 << 5.0 << 1800.0;
    QTest::newRow("M0.8, pi 20 = 1.25 x 16, 1600 K") << 0.8 << 20.0 << 1.25 << 1600.0;
    QTest::newRow("M0.8, pi 20 = 4 x 5, 1600 K") << 0.8 << 20.0 << 4.0 << 1600.0;
    QTest::newRow("static, pi 12 = 3 x 4, 1400 K") << 0.0 << 12.0 << 3.0 << 1400.0;
  }
  void idealTwoSpoolMatchesClosedForm() {
    QFETCH(double, mach);
    QFETCH(double, overallRatio);
    QFETCH(double, lowPressureRatio);
    QFETCH(double, exitTemperature);
    const cw::test::IdealTurbojet j = cw::test::idealTurbojet(mach, overallRatio, exitTemperature);

    Case c = cw::test::idealConstantCpCase(overallRatio / lowPressureRatio, exitTemperature, mach);
    c.architecture = Architecture::TwoSpoolTurbojet;
    c.lowPressureCompressor =
        CompressorInputs{lowPressureRatio, Efficiency{EfficiencyBasis::Polytropic, 0.8}, 0.05};
    c.lowPressureTurbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 0.8}, 0.9, 50e3};
    c = cw::analysis::idealTwinOf(c, exitTemperature, 50.0);  // the LP spool lossless too
    const CycleResult r = cw::network::Engine(c).evaluate();
    const double tol = 1e-9;
    const Performance& p = r.performance;
    QVERIFY2(
        relative(p.specificThrust, j.specificThrust) < tol,
        qPrintable(QString("%1 vs %2").arg(p.specificThrust, 0, 'g', 15).arg(j.specificThrust, 0, 'g', 15)));
    QVERIFY(relative(p.fuelAirRatio, j.fuelAirRatio) < tol);
    QVERIFY(relative(p.thrustSpecificFuelConsumption, j.tsfc()) < tol);
    QVERIFY(relative(p.jetVelocity, j.jetVelocity) < tol);
    QVERIFY(relative(p.thermalEfficiency, j.thermalEfficiency) < tol);
    if (mach > 0) QVERIFY(relative(p.propulsiveEfficiency, j.propulsiveEfficiency) < tol);
    const double gamma = cw::test::kIdealGamma, Tt2 = cw::test::kIdealT0 * j.tauR;
    const double Tt25 = Tt2 * std::pow(lowPressureRatio, (gamma - 1) / gamma), Tt3 = Tt2 * j.tauC;
    QVERIFY(relative(r.station("25").totalTemperature, Tt25) < tol);
    QVERIFY(relative(r.station("45").totalTemperature, exitTemperature - (Tt3 - Tt25)) < tol);
    QVERIFY(relative(r.station("5").totalTemperature, j.tauT * exitTemperature) < tol);
  }

  // Each shaft's work balance closes: P_c = eta_m P_t - P_x per shaft (Mattingly, 2006, eq. 7.17
  // with the offtake of eq. 7.27, per spool), with P_c = W_in (ht_out - ht_in) of the shaft's
  // compressor (its bleed compressed fully) and P_t = W_in (ht_in - ht_out) of its turbine, from
  // the stations; and the shafts' records say the same.
  void eachShaftsWorkBalanceCloses_data() {
    QTest::addColumn<int>("model");
    QTest::newRow("constant-cp") << 0;
    QTest::newRow("two-gamma") << 1;
    QTest::newRow("thermally-perfect") << 2;
  }
  void eachShaftsWorkBalanceCloses() {
    QFETCH(int, model);
    Case c = lossyTwoSpoolCase();
    if (model == 0) c.gasModel.model = ConstantCpGasModel{};
    if (model == 1) c.gasModel.model = TwoGammaGasModel{};
    const CycleResult r = cw::network::Engine(c).evaluate();
    auto work = [&](const char* in, const char* out) {
      const Station &a = r.station(in), &b = r.station(out);
      return a.massFlow * std::abs(b.totalEnthalpy - a.totalEnthalpy);
    };
    struct Spool {
      const char* shaft;
      double compressor, turbine;
      const TurbineInputs& inputs;
    };
    for (const Spool& s :
         {Spool{"low_pressure_shaft", work("2", "25"), work("45", "5"), c.lowPressureTurbine},
          Spool{"high_pressure_shaft", work("25", "3"), work("4", "45"), c.turbine}}) {
      const double balance = s.inputs.mechanicalEfficiency * s.turbine - s.inputs.powerOfftake;
      QVERIFY2(
          relative(s.compressor, balance) < 1e-12,
          qPrintable(
              QString("%1: %2 vs %3").arg(s.shaft).arg(s.compressor, 0, 'g', 17).arg(balance, 0, 'g', 17)));
      const ShaftBalance& b = shaft(r, s.shaft);
      QVERIFY(relative(b.compressorPower, s.compressor) < 1e-12);
      QVERIFY(relative(b.turbinePower, s.turbine) < 1e-12);
      QVERIFY(relative(b.compressorPower, b.mechanicalEfficiency * b.turbinePower - b.powerOfftake) < 1e-12);
    }
    QVERIFY(relative(r.performance.shaftPowerOfftake, 120e3) < 1e-15);
  }

  // The second-law balance of a lossy two-spool case closes (analysis/exergy_balance.h: the fuel
  // exergy equals the outputs and the destruction, to 1e-9), with a mechanical loss per shaft,
  // P_t - P_c - P_x = (1 - eta_m) P_t dissipated at T0, and every component generating entropy.
  void twoSpoolExergyBalanceCloses() {
    const Case c = lossyTwoSpoolCase();
    const cw::analysis::ExergyBalance b = cw::analysis::exergyBalanceOf(cw::analysis::AuditPoint(c));
    QVERIFY2(std::abs(b.closure) < 1e-9, qPrintable(QString::number(b.closure)));
    const CycleResult r = cw::network::Engine(c, false).evaluate();
    std::vector<std::string> names;
    for (const auto& v : b.components) {
      names.push_back(v.component);
      QVERIFY2(v.entropyGeneration > 0.0, v.component.c_str());
    }
    const std::vector<std::string> expected{"inlet",
                                            "low_pressure_compressor",
                                            "high_pressure_compressor",
                                            "burner",
                                            "high_pressure_turbine",
                                            "high_pressure_shaft",
                                            "low_pressure_turbine",
                                            "low_pressure_shaft",
                                            "jet_pipe",
                                            "nozzle"};
    QCOMPARE(names, expected);
    for (const char* name : {"low_pressure_shaft", "high_pressure_shaft"}) {
      const ShaftBalance& s = shaft(r, name);
      for (const auto& v : b.components)
        if (v.component == name)
          QVERIFY(relative(v.entropyGeneration * b.deadStateTemperature,
                           (1 - s.mechanicalEfficiency) * s.turbinePower) < 1e-9);
    }
    QVERIFY(relative(b.shaftOfftake, 120e3) < 1e-15);
  }

  // The description says which stations are static and which are throats, so the isobars skip
  // the throat and take the static pressure at 0 and 9 without naming them (engine/isobars.h).
  void isobarsFollowTheDescription() {
    const CycleResult r = cw::network::Engine(lossyTwoSpoolCase()).evaluate();
    const auto isobars = stationIsobars(r, 250.0, 1600.0, 8);
    for (const auto& isobar : isobars) {
      QVERIFY(isobar.station != "8");
      const Station& s = r.station(isobar.station);
      const bool statics = isobar.station == "0" || isobar.station == "9";
      QCOMPARE(isobar.pressure, statics ? s.staticPressure : s.totalPressure);
    }
    QCOMPARE(r.network->staticStations, (std::vector<std::string>{"0", "9"}));
    QCOMPARE(r.network->throats, (std::vector<std::string>{"8"}));
  }

  // A separate-flow turbofan described in this file (fan, splitter, bypass duct and nozzle, the
  // core as the two-spool turbojet's) runs on the network unchanged. First law over the whole
  // engine (adiabatic, no offtake, eta_m = 1, complete combustion; common practice, no source):
  // the nozzles carry out what came in, sum W_n ht_n = W0 ht0 + W_f h_f (absolute enthalpies,
  // thermo/gas_model.h); the fan's work is the LP turbine's; the gross thrust is the nozzles'.
  void separateFlowTurbofanRunsOnTheNetwork() {
    const Case c = turbofanCase();
    const auto model = makeGasModel(c.gasModel, c.fuel, c.flight.specificHumidity);
    const cw::network::DesignPoint point(c, &separateFlowTurbofan, *model, true);
    const CycleResult r = point.design();
    const Station &s0 = r.station("0"), &s9 = r.station("9"), &s19 = r.station("19");
    QVERIFY(relative(r.station("13").massFlow, kBypassRatio * r.station("24").massFlow) < 1e-12);
    const double in = s0.massFlow * s0.totalEnthalpy + r.performance.fuelFlow * model->fuelEnthalpy();
    const double out = s9.massFlow * s9.totalEnthalpy + s19.massFlow * s19.totalEnthalpy;
    QVERIFY2(relative(out, in) < 1e-9,
             qPrintable(QString("%1 vs %2").arg(out, 0, 'g', 15).arg(in, 0, 'g', 15)));
    const ShaftBalance& lp = shaft(r, "low_pressure_shaft");
    QVERIFY(relative(lp.compressorPower, summary(r, "fan").power) < 1e-15);
    QVERIFY(relative(lp.turbinePower, lp.compressorPower) < 1e-12);
    QCOMPARE(r.sizing.nozzles.size(), std::size_t(2));
    QCOMPARE(r.sizing.nozzles[1].nozzle, std::string("bypass_nozzle"));
    QVERIFY(r.sizing.nozzles[1].exitArea > r.sizing.nozzles[0].exitArea);  // four times the flow, colder
    QCOMPARE(r.network->staticStations, (std::vector<std::string>{"0", "9", "19"}));
    QCOMPARE(r.paths.back().fromStation, std::string("19"));
    QVERIFY(r.paths.back().closure);
    // Gross thrust of each convergent nozzle: W V + (p - p0) A_eff (Mattingly 2006, eq. 7.1).
    double gross = 0.0;
    for (const auto& [exit, area] :
         {std::pair{&s9, r.sizing.nozzles[0].exitArea}, {&s19, r.sizing.nozzles[1].exitArea}})
      gross += exit->massFlow * exit->velocity + (exit->staticPressure - s0.staticPressure) * area * 0.97;
    QVERIFY(relative(r.performance.grossThrust, gross) < 1e-12);
    QVERIFY(r.performance.netThrust > 0.0);
    requireFinite(r, "turbofan");
  }
};

QTEST_APPLESS_MAIN(TestEngineNetwork)
#include "test_engine_network.moc"
