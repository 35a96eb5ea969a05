// The loss audit: one at a time, waterfall, sensitivities and the exergy balance.
#include "analysis/ideal_twin.h"
#include "analysis/loss_audit.h"
#include "analysis/loss_catalogue.h"
#include "common/error.h"
#include "engine/case_validation_error.h"
#include "engine/free_stream.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"
#include "network/engine.h"

#include <QTest>

#include <cmath>
#include <map>

using namespace cw::engine;
using namespace cw::analysis;

namespace {

const std::string kSupersonic =
    CYCLEWRIGHT_SOURCE_DIR "/resources/examples/supersonic-afterburning-two-gamma.json";

/// The default case (thermally perfect, sea-level static, convergent nozzle) with every loss
/// present: bleed, offtake and an unlit afterburner duct loss added.
Case lossyThermallyPerfectCase() {
  Case c;
  c.compressor.bleedFraction = 0.03;
  c.turbine.powerOfftake = 150e3;
  c.afterburner.pressureLossFractionUnlit = 0.02;
  return c;
}

/// A lossy two-spool turbojet: LP pressure ratio 2.5, HP 4, both spools with their efficiencies,
/// shaft losses, bleeds and offtakes (every LP loss of the catalogue present).
Case lossyTwoSpoolCase() {
  Case c;
  c.architecture = Architecture::TwoSpoolTurbojet;
  c.flight.ambient = StandardAtmosphereAmbient{8000.0, false, 0.0};
  c.flight.mach = 0.8;
  c.lowPressureCompressor = CompressorInputs{2.5, Efficiency{EfficiencyBasis::Polytropic, 0.9}, 0.01};
  c.compressor = CompressorInputs{4.0, Efficiency{EfficiencyBasis::Isentropic, 0.85}, 0.02};
  c.burner.setting = ExitTemperatureSetting{1450.0};
  c.turbine = TurbineInputs{Efficiency{EfficiencyBasis::Isentropic, 0.88}, 0.985, 60e3};
  c.lowPressureTurbine = TurbineInputs{Efficiency{EfficiencyBasis::Polytropic, 0.9}, 0.99, 30e3};
  return c;
}

/// The same case in flight at Mach 0.8, 10 km, set by thrust and by fuel-air ratio.
Case cruiseByThrustAndFuelAirRatio() {
  Case c = lossyThermallyPerfectCase();
  c.flight.ambient = StandardAtmosphereAmbient{10000.0, false, 0.0};
  c.flight.mach = 0.8;
  c.design.target = NetThrustTarget{12000.0};
  c.burner.setting = FuelAirRatioSetting{0.018};
  c.nozzle.geometry = FixedAreaRatioNozzle{1.3};
  return c;
}

std::map<std::string, LossDelta> byKey(const std::vector<LossDelta>& list) {
  std::map<std::string, LossDelta> m;
  for (const auto& d : list) m[d.loss] = d;
  return m;
}

double relative(double a, double b) {
  return std::abs(a - b) / std::max(std::abs(b), 1e-300);
}

void checkWaterfallSums(const LossAudit& a) {
  double sumF = 0.0, sumS = 0.0;
  for (const auto& step : a.waterfall) {
    sumF += step.deltaSpecificThrust;
    sumS += step.deltaTsfc;
  }
  // By construction (a telescoping sum; no source needed).
  const double dF = a.actual.specificThrust - a.ideal.specificThrust;
  const double dS = a.actual.thrustSpecificFuelConsumption - a.ideal.thrustSpecificFuelConsumption;
  QVERIFY2(std::abs(sumF - dF) <= 1e-9 * std::abs(dF), qPrintable(QString::number(sumF - dF)));
  QVERIFY2(std::abs(sumS - dS) <= 1e-9 * std::abs(dS), qPrintable(QString::number(sumS - dS)));
}

}  // namespace

class TestLossAudit : public QObject {
  Q_OBJECT
 private slots:
  void catalogueRemovesEverythingTheIdealTwinRemoves() {
    // Removing every loss of the catalogue that applies gives the ideal twin (analysis/ideal_twin.h).
    const Case actual = lossyThermallyPerfectCase();
    Case removed = actual;
    for (const auto& loss : lossCatalogue())
      if (loss.applies(actual)) loss.remove(removed);
    Case twin = idealTwinOf(actual, 1400.0, 20.0);
    twin.title = removed.title;
    QVERIFY(removed == twin);
    QCOMPARE(lossesOf(Architecture::Turbojet).size(), std::size_t{13});
    QCOMPARE(lossCatalogue().front().key, std::string("inlet_recovery"));
  }

  void turbojetCatalogueKeepsItsKeysAndOrder() {
    // A turbojet's losses are the keys case files' audit orders, the settings and --order name,
    // in the flow order the waterfall has always had (docs/cli.md): none of the two-spool's LP
    // losses, and the single-spool fields (the command line's "field" of each loss).
    const std::vector<std::string> expected = {"inlet_recovery",
                                               "compressor_efficiency",
                                               "burner_pressure_loss",
                                               "combustion_efficiency",
                                               "turbine_efficiency",
                                               "mechanical_efficiency",
                                               "jet_pipe_loss",
                                               "afterburner_loss",
                                               "nozzle_velocity_coefficient",
                                               "nozzle_discharge_coefficient",
                                               "nozzle_expansion",
                                               "bleed",
                                               "power_offtake"};
    std::vector<std::string> keys;
    for (const LossDefinition* loss : lossesOf(Architecture::Turbojet)) keys.push_back(loss->key);
    QCOMPARE(keys, expected);
    const Case c = lossyThermallyPerfectCase();
    QCOMPARE(auditCase(c).waterfallOrder, expected);  // the unlit afterburner loss applies here
    QCOMPARE(lossByKey("compressor_efficiency", c).field,
             std::string("/compressor/isentropic_efficiency or /compressor/polytropic_efficiency"));
    QCOMPARE(lossByKey("bleed", c).field, std::string("/compressor/bleed_fraction"));
    QCOMPARE(lossByKey("power_offtake", c).field, std::string("/turbine/power_offtake_W"));
    // An LP key is known (an order kept in the settings from a two-spool case is no error) but
    // does not apply to a turbojet: it is left out of the waterfall.
    QVERIFY(isLossKey("low_pressure_bleed"));
    QVERIFY(!lossByKey("low_pressure_bleed", c).applies(c));
    QCOMPARE(auditCase(c, {"low_pressure_bleed", "bleed"}).waterfallOrder.front(), std::string("bleed"));
  }

  // ---- the two-spool turbojet ------------------------------------------------------------------

  void twoSpoolCatalogueRemovesEverythingTheIdealTwinRemoves() {
    // Every loss that applies removed, one by one from the catalogue: the ideal twin itself
    // (engine::removeEveryLoss, both spools), and its figures at the same W2 and Tt4 to 1e-12.
    const Case actual = lossyTwoSpoolCase();
    const AuditPoint point(actual);
    Case removed = point.baseCase();
    for (const LossDefinition* loss : lossesOf(Architecture::TwoSpoolTurbojet))
      if (loss->applies(removed)) loss->remove(removed);
    Case twin = point.idealCase();
    twin.title = removed.title;  // the twin's title says what it is
    // The case has no afterburner (unlit, no unlit loss), so afterburner_loss does not apply; the
    // twin sets the absent afterburner's parameters lossless all the same, which changes nothing.
    QVERIFY(!removed.afterburner.enabled && removed.afterburner.pressureLossFractionUnlit == 0.0);
    twin.afterburner = removed.afterburner;
    QVERIFY(removed == twin);
    const AuditFigures r = AuditPoint::figuresOf(removed), t = AuditPoint::figuresOf(twin);
    QVERIFY(relative(r.specificThrust, t.specificThrust) <= 1e-12);
    QVERIFY(relative(r.thrustSpecificFuelConsumption, t.thrustSpecificFuelConsumption) <= 1e-12);
    // Without the LP losses the single spool's catalogue falls short of the twin: each LP loss
    // is one the audit must remove (the reason for their keys).
    Case singleSpoolOnly = point.baseCase();
    for (const LossDefinition* loss : lossesOf(Architecture::TwoSpoolTurbojet))
      if (loss->applies(singleSpoolOnly) && !loss->key.starts_with("low_pressure_"))
        loss->remove(singleSpoolOnly);
    QVERIFY(relative(AuditPoint::figuresOf(singleSpoolOnly).specificThrust, t.specificThrust) > 1e-3);
  }

  void twoSpoolWaterfallInFlowOrderSumsToActualMinusIdeal() {
    const Case c = lossyTwoSpoolCase();
    const LossAudit a = auditCase(c);
    // Flow order: inlet, LP compressor, HP compressor, burner, HP turbine and shaft, LP turbine
    // and shaft, jet pipe, nozzle, then the bleeds (LP, HP) and the offtakes (HP, LP); no
    // afterburner (neither lit nor with an unlit loss).
    const std::vector<std::string> flow = {"inlet_recovery",
                                           "low_pressure_compressor_efficiency",
                                           "compressor_efficiency",
                                           "burner_pressure_loss",
                                           "combustion_efficiency",
                                           "turbine_efficiency",
                                           "mechanical_efficiency",
                                           "low_pressure_turbine_efficiency",
                                           "low_pressure_mechanical_efficiency",
                                           "jet_pipe_loss",
                                           "nozzle_velocity_coefficient",
                                           "nozzle_discharge_coefficient",
                                           "nozzle_expansion",
                                           "low_pressure_bleed",
                                           "bleed",
                                           "power_offtake",
                                           "low_pressure_power_offtake"};
    QCOMPARE(a.waterfallOrder, flow);
    QCOMPARE(a.oneAtATime.size(), flow.size());
    checkWaterfallSums(a);
    checkWaterfallSums(auditCase(c, {"low_pressure_power_offtake", "low_pressure_bleed", "bleed"}));
    // The ideal twin's specific thrust from the audit is that of the network's own ideal twin.
    const cw::engine::Evaluation e = cw::engine::evaluateCase(c);
    QVERIFY(relative(a.ideal.specificThrust, e.ideal.performance.specificThrust) < 1e-9);
    // The shared keys act on the HP members of a two-spool case (the case file's names).
    QCOMPARE(lossByKey("bleed", c).field, std::string("/high_pressure_compressor/bleed_fraction"));
    QCOMPARE(lossByKey("low_pressure_bleed", c).field,
             std::string("/low_pressure_compressor/bleed_fraction"));
    QCOMPARE(lossByKey("mechanical_efficiency", c).field,
             std::string("/high_pressure_turbine/mechanical_efficiency"));
  }

  void eachLowPressureLossRemovedAloneRaisesSpecificThrust() {
    // At fixed W2 and Tt4, a better LP compressor or turbine, a loss-free LP shaft, no LP bleed and
    // no LP offtake each leave more of the gas's energy for the jet (common practice, no source).
    const LossAudit a = auditCase(lossyTwoSpoolCase());
    auto d = byKey(a.oneAtATime);
    for (const char* key :
         {"low_pressure_compressor_efficiency", "low_pressure_turbine_efficiency",
          "low_pressure_mechanical_efficiency", "low_pressure_bleed", "low_pressure_power_offtake"}) {
      QVERIFY2(d.count(key) == 1, key);
      QVERIFY2(d[key].deltaSpecificThrust > 0.0, key);
    }
    // Each acts on its own spool: a turbojet's copy of the case has none of them, and removing the
    // LP compressor's efficiency leaves the HP compressor's as given.
    const Case c = lossyTwoSpoolCase();
    Case lpRemoved = c;
    lossByKey("low_pressure_compressor_efficiency", c).remove(lpRemoved);
    QCOMPARE(lpRemoved.compressor.efficiency.value, c.compressor.efficiency.value);
    QCOMPARE(lpRemoved.lowPressureCompressor.efficiency.value, 1.0);
    // The sensitivities name them too, with the signs of one at a time: a higher efficiency raises
    // thrust, a larger offtake lowers it.
    std::map<std::string, LossSensitivity> s;
    for (const auto& x : a.sensitivities) s[x.loss] = x;
    QCOMPARE(s.size(), std::size_t{16});  // every loss that applies but the nozzle expansion
    QVERIFY(s.at("low_pressure_compressor_efficiency").specificThrustPerUnit > 0.0);
    QVERIFY(s.at("low_pressure_turbine_efficiency").specificThrustPerUnit > 0.0);
    QVERIFY(s.at("low_pressure_power_offtake").specificThrustPerUnit < 0.0);
    QCOMPARE(s.at("low_pressure_bleed").field, std::string("/low_pressure_compressor/bleed_fraction"));
  }

  void waterfallStepsSumToActualMinusIdeal() {
    for (const Case& c :
         {lossyThermallyPerfectCase(), cruiseByThrustAndFuelAirRatio(), cw::io::readCaseFile(kSupersonic)}) {
      checkWaterfallSums(auditCase(c));
      checkWaterfallSums(auditCase(c, {"power_offtake", "nozzle_expansion", "compressor_efficiency"}));
    }
  }

  void auditKeepsTheResolvedAirFlowAndBurnerExitTemperature() {
    // A case set by thrust and fuel-air ratio: its audited actual figures are its own.
    const Case c = cruiseByThrustAndFuelAirRatio();
    const CycleResult r = cw::network::Engine(c, false).evaluate();
    const LossAudit a = auditCase(c);
    QVERIFY(relative(a.actual.specificThrust, r.performance.specificThrust) < 1e-9);
    QVERIFY(relative(a.actual.thrustSpecificFuelConsumption, r.performance.thrustSpecificFuelConsumption) <
            1e-9);
    const AuditPoint point(c);
    QCOMPARE(std::get<AirMassFlowTarget>(point.baseCase().design.target).airMassFlow, r.sizing.airMassFlow);
    QCOMPARE(std::get<ExitTemperatureSetting>(point.baseCase().burner.setting).exitTemperature,
             r.station("4").totalTemperature);
  }

  void orderChangesStepsNotTheirSum() {
    const Case c = lossyThermallyPerfectCase();
    const LossAudit flow = auditCase(c);
    const LossAudit reversed = auditCase(c, {"power_offtake", "bleed", "nozzle_expansion"});
    QCOMPARE(reversed.waterfallOrder.front(), std::string("power_offtake"));
    QCOMPARE(reversed.waterfallOrder.size(), flow.waterfallOrder.size());
    // The losses interact: the offtake costs more when added first, to a lossless cycle with a
    // small turbine work margin, than last (common practice, no source); here only "differs".
    QVERIFY(std::abs(byKey(flow.waterfall)["power_offtake"].deltaSpecificThrust -
                     byKey(reversed.waterfall)["power_offtake"].deltaSpecificThrust) > 1e-6);
  }

  void badOrderNamesTheKey() {
    const Case c = lossyThermallyPerfectCase();
    try {
      auditCase(c, {"bleed", "compressor_effciency"});
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      const std::string m = e.what();
      QVERIFY2(m.find("compressor_effciency") != std::string::npos, e.what());
      QVERIFY2(m.find("turbine_efficiency") != std::string::npos, e.what());  // lists the valid ones
    }
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, auditCase(c, {"bleed", "bleed"}));
  }

  void removingEachLossHelpsWithItsReason() {
    // Signs from the physics of each loss, at fixed W2 and Tt4 (common practice, no source).
    const LossAudit a = auditCase(lossyThermallyPerfectCase());
    auto d = byKey(a.oneAtATime);
    QCOMPARE(d.size(), std::size_t{13});  // the unlit afterburner loss applies
    for (const char* key : {"inlet_recovery", "compressor_efficiency", "burner_pressure_loss",
                            "turbine_efficiency", "mechanical_efficiency", "jet_pipe_loss",
                            "afterburner_loss", "nozzle_velocity_coefficient", "power_offtake"}) {
      // Each leaves more pressure (or more turbine exit enthalpy) for the nozzle at the same fuel
      // flow or less: more thrust, less fuel per thrust.
      QVERIFY2(d[key].deltaSpecificThrust > 0.0, key);
      QVERIFY2(d[key].deltaTsfc < 0.0, key);
    }
    // (Compressor efficiency at fixed Tt4: the cooler compressor exit needs more fuel, yet the
    // thrust rises more, so TSFC falls, checked above.)
    // Combustion efficiency at fixed Tt4 changes only the fuel needed: less fuel, so less fuel mass
    // through the nozzle (a slight fall in thrust) and a lower TSFC.
    QVERIFY(d["combustion_efficiency"].deltaSpecificThrust < 0.0);
    QVERIFY(d["combustion_efficiency"].deltaSpecificThrust > -0.01 * a.actual.specificThrust);
    QVERIFY(d["combustion_efficiency"].deltaTsfc < 0.0);
    // The discharge coefficient sizes only the geometric throat: no change at all.
    QCOMPARE(d["nozzle_discharge_coefficient"].deltaSpecificThrust, 0.0);
    QCOMPARE(d["nozzle_discharge_coefficient"].deltaTsfc, 0.0);
    // Full expansion of a choked convergent nozzle recovers the underexpansion loss.
    // Full expansion of the choked convergent nozzle: the velocity coefficient multiplies the jet
    // velocity but not the pressure thrust (components/nozzle.h), so at this small nozzle pressure
    // ratio expanding the rest of the way at C_V = 0.98 loses more than the underexpansion did and
    // the thrust falls; with C_V = 1 the removal recovers the underexpansion loss and thrust rises
    // (the fully expanded jet gives the most thrust, Hill and Peterson, Mechanics and
    // Thermodynamics of Propulsion, 2nd ed. 1992, sec. on nozzle thrust, from memory).
    QVERIFY(d["nozzle_expansion"].deltaSpecificThrust < 0.0);
    QVERIFY(d["nozzle_expansion"].deltaTsfc > 0.0);
    Case perfectCv = lossyThermallyPerfectCase();
    perfectCv.nozzle.loss = 1.0;
    auto e = byKey(auditCase(perfectCv).oneAtATime);
    QVERIFY(e["nozzle_expansion"].deltaSpecificThrust > 0.0);
    QVERIFY(e["nozzle_expansion"].deltaTsfc < 0.0);
    // Bleed removal at fixed Tt4: more air through burner, turbine and nozzle, burning more fuel in
    // proportion; thrust rises by more than the fuel, since the bleed's compression work was
    // already paid by the turbine.
    QVERIFY(d["bleed"].deltaSpecificThrust > 0.0);
    QVERIFY(d["bleed"].deltaTsfc < 0.0);
    // The sum of the one-at-a-time gains is not the total: losses interact (no source needed);
    // both are positive here.
    double sum = 0.0;
    for (const auto& x : a.oneAtATime) sum += x.deltaSpecificThrust;
    QVERIFY(sum > 0.0 && a.ideal.specificThrust - a.actual.specificThrust > 0.0);
    qInfo("one at a time, default lossy case: F_s %.3f N s/kg, ideal %.3f", a.actual.specificThrust,
          a.ideal.specificThrust);
    for (const auto& x : a.oneAtATime)
      qInfo("  %-30s %+9.4f N s/kg %+9.5f g/(kN s)", x.loss.c_str(), x.deltaSpecificThrust,
            x.deltaTsfc * 1e6);
  }

  void auditOfTheIdealTwinIsAllZeros() {
    const Case c = lossyThermallyPerfectCase();
    const Case twin = idealTwinOf(c, 1400.0, 20.0);
    const LossAudit a = auditCase(twin);
    for (const auto& x : a.oneAtATime) {
      QCOMPARE(x.deltaSpecificThrust, 0.0);
      QCOMPARE(x.deltaTsfc, 0.0);
    }
    for (const auto& x : a.waterfall) {
      QCOMPARE(x.deltaSpecificThrust, 0.0);
      QCOMPARE(x.deltaTsfc, 0.0);
    }
    // The lossless cycle destroys exergy only in the burner (combustion, heating at finite
    // temperature difference), nowhere else (second law, no source needed).
    for (const auto& comp : a.exergy.components)
      if (comp.component != "burner")
        QVERIFY2(std::abs(comp.exergyDestroyed) < 1e-6 * a.exergy.fuelExergy,
                 qPrintable(QString::fromStdString(comp.component)));
  }

  // Closed form: constant-cp turbojet, fuel mass neglected, every loss ideal but the compressor's
  // isentropic efficiency, fully expanding nozzle: Mattingly, Elements of Propulsion, 2006, ch. 7,
  // parametric analysis of the turbojet with losses (from memory): tau_c = 1 + (pi_c^((g-1)/g) - 1)
  // / eta_c, tau_t = 1 - tau_r (tau_c - 1) / tau_l, pi_t = tau_t^(g/(g-1)),
  // Pt9/P0 = pi_r pi_c pi_t, (V9/a0)^2 = 2/(g-1) tau_l tau_t (1 - (Pt9/P0)^(-(g-1)/g)),
  // F/m0 = a0 (V9/a0 - M0), f = cp T0 (tau_l - tau_r tau_c) / h_PR.
  void compressorEfficiencyAloneMatchesClosedForm() {
    const double g = 1.4, cp = 1004.0, R = cp * (g - 1) / g, T0 = 216.7, hPR = 42.8e6, M0 = 2.0;
    const double piC = 10.0, Tt4 = 1800.0, etaC = 0.85;
    Case c;
    c.flight.ambient = GivenAmbient{T0, 19330.0};
    c.flight.mach = M0;
    c.fuel.lowerHeatingValue = hPR;
    c.gasModel.model = ConstantCpGasModel{cp, g};
    c.gasModel.neglectFuelMass = true;
    c = idealTwinOf(c, Tt4, 50.0);
    c.compressor.pressureRatio = piC;
    c.compressor.efficiency = Efficiency{EfficiencyBasis::Isentropic, etaC};

    const double a0 = std::sqrt(g * R * T0), tauR = 1 + 0.5 * (g - 1) * M0 * M0,
                 piR = std::pow(tauR, g / (g - 1));
    const double tauL = Tt4 / T0;
    auto figures = [&](double eta) {
      const double tauC = 1 + (std::pow(piC, (g - 1) / g) - 1) / eta;
      const double tauT = 1 - tauR / tauL * (tauC - 1);
      const double pt9p0 = piR * piC * std::pow(tauT, g / (g - 1));
      const double v9a0 = std::sqrt(2 / (g - 1) * tauL * tauT * (1 - std::pow(pt9p0, -(g - 1) / g)));
      const double fs = a0 * (v9a0 - M0), f = cp * T0 * (tauL - tauR * tauC) / hPR;
      return std::pair{fs, f / fs};
    };
    const auto [fsLossy, sLossy] = figures(etaC);
    const auto [fsIdeal, sIdeal] = figures(1.0);
    const LossAudit a = auditCase(c);
    auto d = byKey(a.oneAtATime);
    QVERIFY(relative(d["compressor_efficiency"].deltaSpecificThrust, fsIdeal - fsLossy) < 1e-8);
    QVERIFY(relative(d["compressor_efficiency"].deltaTsfc, sIdeal - sLossy) < 1e-8);
    for (const auto& step : a.waterfall)
      if (step.loss != "compressor_efficiency") QCOMPARE(step.deltaSpecificThrust, 0.0);
    QVERIFY(relative(byKey(a.waterfall)["compressor_efficiency"].deltaSpecificThrust, fsLossy - fsIdeal) <
            1e-8);
    // The sensitivity: d(F/m0)/d(eta_c) per point, against the closed form differentiated
    // by a fine central difference (h = 1e-6).
    const double dClosed = (figures(etaC + 1e-6).first - figures(etaC - 1e-6).first) / 2e-6 * 0.01;
    for (const auto& s : a.sensitivities)
      if (s.loss == "compressor_efficiency") QVERIFY(relative(s.specificThrustPerUnit, dClosed) < 1e-5);
  }

  void sensitivitiesAgreeWithSmallLossesRemoved() {
    // Every loss small: derivative x (ideal - value) / unit against the one-at-a-time delta
    // (first-order Taylor; no source needed). Within 3 %.
    Case c = lossyThermallyPerfectCase();
    c.nozzle.geometry = FullyExpandingNozzle{};
    c.inlet.loss = 0.995;
    c.compressor.efficiency.value = 0.995;
    c.burner.pressureLossFraction = 0.005;
    c.burner.combustionEfficiency = 0.995;
    c.turbine.efficiency.value = 0.995;
    c.turbine.mechanicalEfficiency = 0.995;
    c.jetPipe.pressureLossFraction = 0.005;
    c.afterburner.pressureLossFractionUnlit = 0.005;
    c.nozzle.loss = 0.995;
    c.nozzle.dischargeCoefficient = 0.995;
    c.compressor.bleedFraction = 0.005;
    c.turbine.powerOfftake = 20e3;
    const LossAudit a = auditCase(c);
    auto d = byKey(a.oneAtATime);
    QCOMPARE(a.sensitivities.size(), std::size_t{12});
    for (const auto& s : a.sensitivities) {
      const LossDefinition& loss = lossByKey(s.loss, c);
      Case removed = c;
      loss.remove(removed);
      const double change = (loss.parameter->get(removed) - s.value) / s.unitSize;  // in units
      const double predictedF = s.specificThrustPerUnit * change, predictedS = s.tsfcPerUnit * change;
      const double tolF = 0.03 * std::abs(d[s.loss].deltaSpecificThrust) + 1e-9;
      const double tolS = 0.03 * std::abs(d[s.loss].deltaTsfc) + 1e-15;
      QVERIFY2(std::abs(predictedF - d[s.loss].deltaSpecificThrust) <= tolF,
               qPrintable(QString::fromStdString(s.loss) + ": " + QString::number(predictedF) + " vs " +
                          QString::number(d[s.loss].deltaSpecificThrust)));
      QVERIFY2(std::abs(predictedS - d[s.loss].deltaTsfc) <= tolS,
               qPrintable(QString::fromStdString(s.loss) + ": " + QString::number(predictedS) + " vs " +
                          QString::number(d[s.loss].deltaTsfc)));
      QCOMPARE(toString(s.scheme), std::string("central"));
    }
  }

  void sensitivitiesConvergeAsTheStepShrinks() {
    // With h = 1e-3, 2.5e-4 and 6.25e-5 of the unit range the central differences agree to 1e-4
    // relative: the O(h^2) truncation error and the solvers' noise (1e-10 relative over h) are
    // both small at the default h = 1e-4 (no source needed).
    const AuditPoint point(lossyThermallyPerfectCase());
    for (const char* key :
         {"compressor_efficiency", "turbine_efficiency", "burner_pressure_loss", "power_offtake"}) {
      const double s1 = sensitivityOf(point, key, 1e-3).specificThrustPerUnit;
      const double s2 = sensitivityOf(point, key, 2.5e-4).specificThrustPerUnit;
      const double s3 = sensitivityOf(point, key, 6.25e-5).specificThrustPerUnit;
      QVERIFY2(relative(s1, s3) < 1e-4, key);
      QVERIFY2(relative(s2, s3) < 1e-4, key);
    }
  }

  void sensitivityAtABoundIsOneSided() {
    // The ideal twin's efficiencies sit at 1 and its losses at 0.
    const Case twin = idealTwinOf(lossyThermallyPerfectCase(), 1400.0, 20.0);
    const AuditPoint point(twin);
    QCOMPARE(toString(sensitivityOf(point, "compressor_efficiency").scheme), std::string("backward"));
    QCOMPARE(toString(sensitivityOf(point, "burner_pressure_loss").scheme), std::string("forward"));
    QCOMPARE(toString(sensitivityOf(point, "power_offtake").scheme), std::string("forward"));
    // A better compressor and a smaller loss both raise thrust (signs as one at a time).
    QVERIFY(sensitivityOf(point, "compressor_efficiency").specificThrustPerUnit > 0.0);
    QVERIFY(sensitivityOf(point, "burner_pressure_loss").specificThrustPerUnit < 0.0);
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, sensitivityOf(point, "nozzle_expansion"));
  }

  // The balance closes to 1e-9 of the fuel exergy, and no component destroys negative exergy (the
  // second law). Why the closure is not a tautology: the entropy terms cancel by construction
  // (every S_gen is an entropy balance of the same station entropies), but what is left is the
  // engine's first law, W_f h_f + W2 ht0 = W9 ht9 + W_bleed ht3 + P_x + P_mech + E_unburnt, made of
  // numbers computed independently: the fuel flow from the burner's own balance, the shaft powers
  // from the compressor and the turbine, the exhaust's static enthalpy h(T9) from the temperature
  // the nozzle found (not from ht9 - V9^2/2), the jet's V9 and the ram's V0 from their flow states.
  // A component that lost or made energy, or a nozzle whose T9 disagreed with its V9, would open it.
  void exergyBalanceCloses() {
    Case twoGammaAtSixty;  // the stiffest hot gas the two-gamma model admits, at pi_c = 60, static
    twoGammaAtSixty.gasModel.model = TwoGammaGasModel{1004.0, 1.4, 1100.0, 1.4};
    twoGammaAtSixty.compressor.pressureRatio = 60.0;
    twoGammaAtSixty.burner.setting = ExitTemperatureSetting{2000.0};
    for (const Case& c : {lossyThermallyPerfectCase(), cruiseByThrustAndFuelAirRatio(),
                          cw::io::readCaseFile(kSupersonic), twoGammaAtSixty}) {
      const ExergyBalance b = exergyBalanceOf(AuditPoint(c));
      QVERIFY2(std::abs(b.closure) < 1e-9, qPrintable(QString::number(b.closure)));
      for (const auto& comp : b.components)
        QVERIFY2(comp.exergyDestroyed >= 0.0, qPrintable(QString::fromStdString(comp.component)));
      qInfo(
          "exergy: fuel %.4g W (%.4f LHV), destroyed %.4g W, thrust power %.4g W, exhaust %.4g + %.4g W, "
          "closure %.3g",
          b.fuelExergy, b.fuelExergy / b.fuelHeatingPower, b.destroyed, b.thrustPower, b.exhaustThermal,
          b.exhaustKinetic, b.closure);
      for (const auto& comp : b.components)
        qInfo("  %-12s %.5g W/K  %.5g W", comp.component.c_str(), comp.entropyGeneration,
              comp.exergyDestroyed);
    }
  }

  // The two-gamma burner once generated negative entropy (-1684 W/K with a hot gamma of 5/3 at
  // pi_c = 60, sea-level static): the hot gas's entropy scale was unrelated to the air's. Now the
  // scales are joined at the burner entry (thermo/gas_model.h), so the burner generates
  // W4 [cp_t ln(Tt4/Tt3) - R_t ln(pt4/pt3)] >= 0, and a hot gas stiffer than the air is refused.
  void twoGammaBurnerGeneratesEntropy() {
    Case c;
    c.gasModel.model = TwoGammaGasModel{1004.0, 1.4, 1239.0, 5.0 / 3.0};
    c.compressor.pressureRatio = 60.0;
    try {
      cw::engine::evaluateCase(c);
      QFAIL("expected a CaseValidationError");
    } catch (const cw::engine::CaseValidationError& e) {
      QVERIFY2(std::string(e.what()).find(
                   "/gas_model/hot_gamma = 1.66667 is outside the valid range (1, 1.4]") != std::string::npos,
               e.what());
    }
    c.gasModel.model = TwoGammaGasModel{1004.0, 1.4, 1239.0, 1.3};
    c.burner.setting = ExitTemperatureSetting{1900.0};
    const ExergyBalance b = exergyBalanceOf(AuditPoint(c));
    const CycleResult r = cw::network::Engine(c, false).evaluate();
    const Station &s3 = r.station("3"), &s4 = r.station("4");
    const double Rt = 1239.0 * 0.3 / 1.3;
    const double expected = s4.massFlow * (1239.0 * std::log(s4.totalTemperature / s3.totalTemperature) -
                                           Rt * std::log(s4.totalPressure / s3.totalPressure));
    QVERIFY2(relative(b.components[2].entropyGeneration, expected) < 1e-9,
             qPrintable(QString("%1 vs %2").arg(b.components[2].entropyGeneration).arg(expected)));
    QVERIFY(b.components[2].entropyGeneration > 0.0);
  }

  void exergyOfAnIdealStaticConstantCpCycle() {
    // Constant cp, fuel mass neglected, ideal components, full expansion, sea-level static:
    // the fuel is heat, E_f = W_f LHV exactly; the burner destroys T0 W (s4 - s3) (heating at
    // finite temperature, Bejan 2006, ch. 3, from memory), the exhaust leaves W [cp (T9 - T0) -
    // T0 cp ln(T9/T0)] (p9 = p0), the jet W V9^2/2 (closed forms of the constant-cp gas).
    Case c;
    c.gasModel.model = ConstantCpGasModel{1004.0, 1.4};
    c.gasModel.neglectFuelMass = true;
    c = idealTwinOf(c, 1400.0, 20.0);
    const ExergyBalance b = exergyBalanceOf(AuditPoint(c));
    const CycleResult r = cw::network::Engine(c, false).evaluate();
    const double T0 = 288.15, cp = 1004.0, W = 20.0;
    QVERIFY(relative(b.fuelExergy, b.fuelHeatingPower) < 1e-12);
    const double T3 = r.station("3").totalTemperature, T9 = r.station("9").staticTemperature;
    QVERIFY(relative(b.components[2].exergyDestroyed, T0 * W * cp * std::log(1400.0 / T3)) < 1e-9);
    QVERIFY(relative(b.exhaustThermal, W * (cp * (T9 - T0) - T0 * cp * std::log(T9 / T0))) < 1e-9);
    QVERIFY(relative(b.exhaustKinetic, 0.5 * W * r.performance.jetVelocity * r.performance.jetVelocity) <
            1e-9);
    QVERIFY(std::abs(b.closure) < 1e-9);
  }
};

QTEST_APPLESS_MAIN(TestLossAudit)
#include "test_loss_audit.moc"
