// Mixtures, fuel, combustion products and the thermally perfect gas: identities and balances.
//
// Sources:
//  [U] U.S. Standard Atmosphere, 1976, NOAA-S/T 76-1562: sea-level dry-air mole fractions N2 0.78084,
//      O2 0.209476, Ar 0.00934, CO2 0.000314, and the sea-level molar mass M0 = 28.9644 kg/kmol
//      (values from memory of the document).
//  [K] A kerosene-like fuel, H/C = 1.9, LHV = 43.0 MJ/kg, burns stoichiometrically at f of about
//      0.068 (common practice, no source).
//  [J] NIST-JANAF Thermochemical Tables, 4th ed., M.W. Chase, 1998: H - H(298.15 K) of N2, O2, Ar and
//      CO2 in kJ/mol, the rows of tests/core/test_species.cpp (values from memory of the printed
//      tables, as said there).
//  Identities (no source needed beyond their definitions): cp = dh/dT, ds°/dT = cp/T, T(h(T)) = T,
//  T(s(T, p), p) = T, conservation of atoms, the LHV as the enthalpy of reaction at 298.15 K.
#include "common/error.h"
#include "thermo/combustion.h"
#include "thermo/fuel.h"
#include "thermo/mixture.h"
#include "thermo/thermally_perfect_gas.h"
#include "thermo/thermally_perfect_model.h"

#include <QTest>

#include <cmath>
#include <limits>
#include <string>
#include <vector>

using namespace cw::thermo;

namespace {

bool relNear(double actual, double expected, double relative) {
  return std::abs(actual - expected) <= relative * std::abs(expected);
}

std::vector<double> sweep() {
  std::vector<double> t;
  for (double x = 200.0; x <= 6000.0; x += 37.3) t.push_back(x);
  for (double x :
       {200.0, 200.0000001, 298.15, 999.999, 999.9999999, 1000.0, 1000.0000001, 1000.001, 5999.9999, 6000.0})
    t.push_back(x);
  return t;
}

std::vector<ThermallyPerfectGas> gases() {
  const auto fuel = HydrocarbonFuel::keroseneLike();
  const auto air = dryAir();
  const double fst = stoichiometricFuelAirRatio(air, fuel);
  return {ThermallyPerfectGas(air, "air"),
          ThermallyPerfectGas(humidAir(0.02), "humid air"),
          ThermallyPerfectGas(completeCombustionProducts(air, fuel, 0.02), "products 0.02"),
          ThermallyPerfectGas(completeCombustionProducts(air, fuel, fst), "products stoichiometric"),
          ThermallyPerfectGas(Composition::pure("N2"), "N2"),
          ThermallyPerfectGas(Composition::pure("CO2"), "CO2"),
          ThermallyPerfectGas(Composition::pure("H2O"), "H2O"),
          ThermallyPerfectGas(Composition::pure("H"), "H")};
}

}  // namespace

class TestMixtures : public QObject {
  Q_OBJECT
 private slots:
  void dryAirComposition() {
    // [U] renormalised over the four gases (they sum to 0.99997).
    const Composition air = dryAir();
    const double sum = 0.78084 + 0.209476 + 0.00934 + 0.000314;
    QVERIFY(relNear(air.moleFraction("N2"), 0.78084 / sum, 1e-14));
    QVERIFY(relNear(air.moleFraction("O2"), 0.209476 / sum, 1e-14));
    QVERIFY(relNear(air.moleFraction("Ar"), 0.00934 / sum, 1e-14));
    QVERIFY(relNear(air.moleFraction("CO2"), 0.000314 / sum, 1e-14));
    // [U] M0 = 28.9644 kg/kmol; ours is 0.0004 kg/kmol heavier because the light traces (Ne, He) are left
    // out.
    QVERIFY(std::abs(air.molarMass() - 0.0289644) <= 1e-6);
  }

  void dryAirMassFractions() {
    // The mass composition of dry air usually quoted, N2 75.52 %, O2 23.14 %, Ar 1.29 %, CO2 0.05 %
    // (common practice, from memory), to half a unit in the last digit: the mole fractions of [U]
    // converted through the molar masses.
    const Composition air = dryAir();
    QVERIFY(std::abs(air.massFraction("N2") - 0.7552) <= 5e-5);
    QVERIFY(std::abs(air.massFraction("O2") - 0.2314) <= 5e-5);
    QVERIFY(std::abs(air.massFraction("Ar") - 0.0129) <= 5e-5);
    QVERIFY(std::abs(air.massFraction("CO2") - 0.0005) <= 5e-5);
  }

  void precombinedCoefficientsEqualTheSpeciesSums() {
    // h = sum y_i h_i / M_i, s° = sum y_i (s°_i - R_i ln x_i) / ..., cp = sum y_i cp_i / M_i (mass basis).
    for (const auto& gas : gases()) {
      const Composition& c = gas.composition();
      for (double t : {250.0, 800.0, 1000.0, 1700.0, 4000.0}) {
        double h = 0.0, s = 0.0, cp = 0.0;
        for (std::size_t i = 0; i < c.size(); ++i) {
          if (c.moleFractions()[i] <= 0.0) continue;
          const auto& sp = c.table()[i];
          const double y = c.massFractions()[i] / sp.molarMass();
          h += y * sp.enthalpy(t);
          cp += y * sp.cp(t);
          s += y * (sp.standardEntropy(t) - kMolarGasConstant * std::log(c.moleFractions()[i]));
        }
        // Above T_mid the gas shifts h and s° by the data's jump there (< 1e-7 R T, < 1e-7 R).
        const double r = gas.gasConstant();
        const double hTolerance = 1e-12 * (std::abs(h) + 1e3 * t) + (t > 1000.0 ? 1e-7 * r * 1000.0 : 0.0);
        const double sTolerance = 1e-12 * std::abs(s) + (t > 1000.0 ? 1e-7 * r : 0.0);
        QVERIFY(std::abs(gas.enthalpy(t) - h) <= hTolerance);
        QVERIFY(relNear(gas.cp(t), cp, 1e-12));
        QVERIFY(std::abs(gas.standardEntropy(t) - s) <= sTolerance);
      }
    }
  }

  void temperatureFromEnthalpyRoundTrips() {
    for (const auto& gas : gases())
      for (double t : sweep()) {
        const double back = gas.temperatureFromEnthalpy(gas.enthalpy(t));
        QVERIFY2(std::abs(back - t) <= 1e-10 * t,
                 qPrintable(QString::fromStdString(gas.description()) +
                            QString(" T=%1 back=%2").arg(t, 0, 'g', 17).arg(back, 0, 'g', 17)));
      }
  }

  void temperatureFromEntropyRoundTrips() {
    for (const auto& gas : gases())
      for (double p : {1.0e3, 1.0e5, 101325.0, 4.0e6})
        for (double t : sweep()) {
          const double s = gas.entropy(t, p);
          double back = 0.0;
          try {
            back = gas.temperatureFromEntropy(s, p);
          } catch (const cw::Error& e) {
            QFAIL(e.what());
          }
          QVERIFY2(std::abs(back - t) <= 1e-10 * t, qPrintable(QString::fromStdString(gas.description()) +
                                                               QString(" T=%1 p=%2").arg(t).arg(p)));
        }
  }

  void continuousAtTheMidTemperature() {
    // h and s° continuous at T_mid = 1000 K (the gas removes the data's ~1e-8 relative jumps).
    for (const auto& gas : gases()) {
      const double below = 1000.0, above = 1000.0 * (1.0 + 1e-15);
      QVERIFY(std::abs(gas.enthalpy(above) - gas.enthalpy(below)) <=
              1e-12 * (std::abs(gas.enthalpy(below)) + 1e6));
      QVERIFY(std::abs(gas.standardEntropy(above) - gas.standardEntropy(below)) <=
              1e-12 * gas.standardEntropy(below));
      QVERIFY(relNear(gas.cp(above), gas.cp(below), 1e-7));
    }
  }

  void sensibleEnthalpyOfAirAgainstJanaf() {
    // Dry air's h(T) - h(298.15 K) per kg: the mole-fraction sum of [J]'s H - H(298.15 K) over the
    // molar mass (ideal mixture). At 1000 K: N2 21.463, O2 22.703, Ar 14.589, CO2 33.397 kJ/mol;
    // at 1500 K: 38.405, 40.599, 24.982, 61.705 kJ/mol. Tolerance 0.5 %, as test_species allows
    // the species fits against [J].
    const Composition composition = dryAir();
    const ThermallyPerfectGas air(composition, "air");
    struct Row {
      double t, n2, o2, ar, co2;  // K, kJ/mol
    };
    for (const Row& r :
         {Row{1000.0, 21.463, 22.703, 14.589, 33.397}, Row{1500.0, 38.405, 40.599, 24.982, 61.705}}) {
      const double molar = composition.moleFraction("N2") * r.n2 + composition.moleFraction("O2") * r.o2 +
                           composition.moleFraction("Ar") * r.ar + composition.moleFraction("CO2") * r.co2;
      const double expected = 1e3 * molar / composition.molarMass();  // J/kg
      QVERIFY2(
          relNear(air.sensibleEnthalpy(r.t), expected, 0.005),
          qPrintable(QString("%1 K: %2 vs %3 J/kg").arg(r.t).arg(air.sensibleEnthalpy(r.t)).arg(expected)));
    }
    // By hand from the 1000 K row: 21.662 kJ/mol / 28.9644 g/mol = 0.7479 MJ/kg, the rise the h-s
    // chart shows from 298.15 K to 1000 K.
    QVERIFY(std::abs(air.sensibleEnthalpy(1000.0) - 0.7479e6) < 0.004e6);
  }

  void sensibleEnthalpyIsZeroAtTheReferenceForEveryComposition() {
    // h_s(298.15 K) = 0 by definition at every composition, while the absolute h of the products is
    // far below zero there (their CO2 and H2O); h_s differences equal h differences at one composition.
    for (const auto& gas : gases()) {
      QVERIFY(std::abs(gas.sensibleEnthalpy(298.15)) < 1e-9);
      QVERIFY(std::abs((gas.sensibleEnthalpy(1700.0) - gas.sensibleEnthalpy(600.0)) -
                       (gas.enthalpy(1700.0) - gas.enthalpy(600.0))) < 1e-6);
      QVERIFY(gas.sensibleEnthalpy(1000.0) > 0.0 && gas.sensibleEnthalpy(250.0) < 0.0);
    }
    const auto all = gases();
    QVERIFY(all[3].enthalpy(298.15) < -1e5);  // stoichiometric products: formation enthalpies
  }

  void cpIsTheDerivativeOfEnthalpy() {
    // Central differences, step 0.01 K; kept away from T_mid. Rounding ~1e-9, truncation ~1e-11.
    for (const auto& gas : gases())
      for (double t : {210.0, 300.0, 650.0, 990.0, 1010.0, 1800.0, 3000.0, 5900.0}) {
        const double d = 0.01;
        const double dhdt = (gas.enthalpy(t + d) - gas.enthalpy(t - d)) / (2 * d);
        const double dsdt = (gas.standardEntropy(t + d) - gas.standardEntropy(t - d)) / (2 * d);
        QVERIFY2(relNear(dhdt, gas.cp(t), 1e-7), qPrintable(QString::fromStdString(gas.description())));
        QVERIFY2(relNear(dsdt, gas.cp(t) / t, 1e-7), qPrintable(QString::fromStdString(gas.description())));
      }
  }

  void stoichiometricFuelAirRatioOfKerosene() {
    // [K] about 0.068; and the closed form f_st = (x_O2 / M_air) / ((1 + y/4) / M_f) for air whose
    // carbon is all in CO2 and which holds no hydrogen.
    const auto fuel = HydrocarbonFuel::keroseneLike();
    const Composition air = dryAir();
    const double fst = stoichiometricFuelAirRatio(air, fuel);
    QVERIFY(std::abs(fst - 0.068) <= 0.001);
    // M_f of C H_1.9 from the standard atomic weights of the species data (nasa7-tm4513.json), by hand:
    // 12.0107 + 1.9 x 1.00794 = 12.0107 + 1.915086 = 13.925786 g/mol.
    const double mf = 13.925786e-3;
    QVERIFY(relNear(fuel.molarMass(), mf, 1e-12));
    QVERIFY(relNear(fst, (air.moleFraction("O2") / air.molarMass()) / ((1.0 + 1.9 / 4.0) / mf), 1e-12));
    // At f_st the products hold no O2.
    QCOMPARE(completeCombustionProducts(air, fuel, fst).moleFraction("O2"), 0.0);
  }

  void lowerHeatingValueComesBackFromTheEnergyBalance() {
    // 1 kg air + f kg fuel at 298.15 K -> (1 + f) kg products at 298.15 K; heat released per kg fuel:
    // LHV = [h_air + f h_fuel - (1 + f) h_products] / f.
    for (double lhv : {43.0e6, 50.0e6}) {
      for (double y : {1.9, 4.0, 0.0}) {
        const HydrocarbonFuel fuel(y, lhv);
        for (double q : {0.0, 0.03}) {
          const Composition air = humidAir(q);
          const ThermallyPerfectGas airGas(air);
          const double fst = stoichiometricFuelAirRatio(air, fuel);
          for (double f : {0.001, 0.02, 0.05, fst}) {
            if (f > fst) continue;
            const ThermallyPerfectGas products(completeCombustionProducts(air, fuel, f));
            const double t0 = 298.15;
            const double released =
                (airGas.enthalpy(t0) + f * fuel.enthalpy(t0) - (1.0 + f) * products.enthalpy(t0)) / f;
            QVERIFY2(
                relNear(released, lhv, 1e-9),
                qPrintable(QString("y=%1 q=%2 f=%3: %4").arg(y).arg(q).arg(f).arg(released, 0, 'g', 15)));
          }
        }
      }
    }
  }

  void fuelEnthalpy() {
    // h_fuel(T) = h_f + cp_fuel (T - 298.15 K), cp_fuel = 2000 J/(kg K) (common practice, no source).
    const auto fuel = HydrocarbonFuel::keroseneLike();
    QVERIFY(relNear(fuel.enthalpy(400.0) - fuel.enthalpy(298.15), 2000.0 * (400.0 - 298.15), 1e-12));
    // Plausibility only (common practice, no source): liquid kerosene's formation enthalpy is a
    // small negative number of MJ/kg.
    QVERIFY(fuel.formationEnthalpy() < -1.0e6 && fuel.formationEnthalpy() > -2.5e6);
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, fuel.enthalpy(150.0));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, fuel.enthalpy(1200.0));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, HydrocarbonFuel(-0.1, 43e6));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, HydrocarbonFuel(4.5, 43e6));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, HydrocarbonFuel(1.9, 0.0));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, HydrocarbonFuel(1.9, std::nan("")));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, HydrocarbonFuel(1.9, 43e6, -5.0));
  }

  void productsConserveElements() {
    const auto fuel = HydrocarbonFuel::keroseneLike();
    for (double q : {0.0, 0.02}) {
      const Composition air = humidAir(q);
      for (double f : {0.0, 0.01, 0.03, 0.06}) {
        const Composition products = completeCombustionProducts(air, fuel, f);
        const double fuelMoles = f / fuel.molarMass();
        // Atoms per kg of air: products carry (1 + f) kg.
        const double c = air.elementMolesPerKilogram("C") + fuelMoles;
        const double h = air.elementMolesPerKilogram("H") + 1.9 * fuelMoles;
        QVERIFY(relNear((1 + f) * products.elementMolesPerKilogram("C"), c, 1e-12));
        QVERIFY(relNear((1 + f) * products.elementMolesPerKilogram("H"), h, 1e-12) || h == 0.0);
        for (const char* e : {"O", "N", "Ar"})
          QVERIFY2(
              relNear((1 + f) * products.elementMolesPerKilogram(e), air.elementMolesPerKilogram(e), 1e-12),
              e);
        for (const char* s : {"CO", "H2", "OH", "H", "O", "NO", "N"}) QCOMPARE(products.moleFraction(s), 0.0);
      }
    }
  }

  void humidityChangesTheGasConstant() {
    // Mass-weighted: R = (1 - q) R_dry + q R_H2O (R = sum y_i R_u / M_i); water is lighter than air.
    const double rDry = dryAir().gasConstant();
    const double rWater = kMolarGasConstant / 0.01801528;
    for (double q : {0.0, 0.005, 0.02, 0.05}) {
      const double r = humidAir(q).gasConstant();
      QVERIFY(relNear(r, (1 - q) * rDry + q * rWater, 1e-13));
      QVERIFY(relNear(humidAir(q).massFraction("H2O"), q, 1e-13) || q == 0.0);
    }
    QVERIFY(humidAir(0.02).gasConstant() > rDry * 1.01);
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, humidAir(-0.01));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, humidAir(0.2));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, humidAir(std::nan("")));
  }

  void richOrNegativeFuelAirRatioThrows() {
    const auto fuel = HydrocarbonFuel::keroseneLike();
    const Composition air = dryAir();
    try {
      completeCombustionProducts(air, fuel, 0.08);
      QFAIL("no exception");
    } catch (const cw::InvalidInput& e) {
      const std::string text = e.what();
      QVERIFY2(text.rfind("fuel-air ratio = 0.08 is outside the valid range [0, 0.0682", 0) == 0, e.what());
    }
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, completeCombustionProducts(air, fuel, -0.001));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, completeCombustionProducts(air, fuel, std::nan("")));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, completeCombustionProducts(air, fuel, 0.0683));
  }

  void outOfRangeThrows() {
    const ThermallyPerfectGas gas(
        completeCombustionProducts(dryAir(), HydrocarbonFuel::keroseneLike(), 0.02));
    QCOMPARE(gas.minimumTemperature(), 100.0);  // its species' cold ranges (cold-extension.json)
    QCOMPARE(gas.maximumTemperature(), 6000.0);
    const double inf = std::numeric_limits<double>::infinity();
    for (double t : {99.999, 6000.001, std::nan(""), inf, -inf, 0.0, -300.0}) {
      QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.cp(t));
      QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.enthalpy(t));
      QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.standardEntropy(t));
    }
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.temperatureFromEnthalpy(gas.enthalpy(6000.0) + 1.0));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.temperatureFromEnthalpy(gas.enthalpy(100.0) - 1.0));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.temperatureFromEnthalpy(std::nan("")));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.temperatureFromEntropy(gas.entropy(6000.0, 1e5) + 1.0, 1e5));
    QVERIFY_THROWS_EXCEPTION(cw::OutOfRange, gas.temperatureFromEntropy(std::nan(""), 1e5));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, gas.temperatureFromEntropy(7000.0, 0.0));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, gas.entropy(1000.0, -1.0));
    try {
      gas.enthalpy(7000.0);
    } catch (const cw::OutOfRange& e) {
      QCOMPARE(std::string(e.what()),
               std::string("temperature = 7000 K is outside the valid range [100, 6000] K"));
    }
  }

  void noNaNAnywhereInTheRange() {
    for (const auto& gas : gases())
      for (double t = 200.0; t <= 6000.0; t += 10.0) {
        QVERIFY(std::isfinite(gas.cp(t)) && gas.cp(t) > 0.0);
        QVERIFY(std::isfinite(gas.enthalpy(t)));
        QVERIFY(std::isfinite(gas.standardEntropy(t)));
        QVERIFY(std::isfinite(gas.gamma(t)) && gas.gamma(t) > 1.0 && gas.gamma(t) <= 5.0 / 3.0 + 1e-6);
        QVERIFY(std::isfinite(gas.speedOfSound(t)));
      }
    // The ends of the range invert to themselves.
    const ThermallyPerfectGas air(dryAir());
    QCOMPARE(air.temperatureFromEnthalpy(air.enthalpy(200.0)), 200.0);
    QVERIFY(std::abs(air.temperatureFromEnthalpy(air.enthalpy(6000.0)) - 6000.0) <= 6e-7);
  }

  void isentropicAndPolytropicChanges() {
    // Through the base class on the fast inverses: isentropic compression by 10 raises s° by R ln 10.
    const ThermallyPerfectGas air(dryAir());
    const double t2 = air.isentropicTemperature(288.15, 101325.0, 1013250.0);
    QVERIFY(relNear(air.standardEntropy(t2) - air.standardEntropy(288.15), air.gasConstant() * std::log(10.0),
                    1e-9));
    QVERIFY(air.polytropicTemperature(288.15, 101325.0, 1013250.0, 0.9) > t2);
  }

  void thermallyPerfectModelBalancesTheBurner() {
    // One equation across compositions: W_a h_air(T3) + W_f h_fuel = (W_a + W_f) h_products(T4).
    const ThermallyPerfectModel model(HydrocarbonFuel::keroseneLike(), 0.0, 298.15);
    QCOMPARE(model.kind(), std::string("thermally-perfect"));
    QCOMPARE(model.lowerHeatingValue(), 43.0e6);
    QVERIFY(std::abs(model.stoichiometricFuelAirRatio() - 0.068) <= 0.001);
    const double f = 0.02;
    const auto products = model.products(f);
    const double t3 = 800.0;
    const double t4 =
        products->temperatureFromEnthalpy((model.air()->enthalpy(t3) + f * model.fuelEnthalpy()) / (1 + f));
    // Sensible-enthalpy form of the same balance, referred to 298.15 K, with the heat release f LHV:
    // (1 + f) [h_p(T4) - h_p(T0)] = [h_a(T3) - h_a(T0)] + f LHV (fuel delivered at T0).
    const double t0 = 298.15;
    const double lhs = (1 + f) * (products->enthalpy(t4) - products->enthalpy(t0));
    const double rhs = model.air()->enthalpy(t3) - model.air()->enthalpy(t0) + f * 43.0e6;
    QVERIFY(relNear(lhs, rhs, 1e-9));
    // Plausibility (common practice, no source): about 1480 K for these inputs.
    QVERIFY(t4 > 1300.0 && t4 < 1700.0);
    QVERIFY(model.products(0.0) == model.air());
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, model.products(0.1));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, model.products(-0.01));
  }

  void compositionValidation() {
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, Composition::fromMoles({{"Xe", 1.0}}));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, Composition::fromMoles({{"N2", -1.0}}));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, Composition::fromMoles({{"N2", 0.0}}));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, Composition::fromMasses({{"N2", std::nan("")}}));
    const Composition c = Composition::fromMasses({{"N2", 1.0}, {"O2", 1.0}});
    QVERIFY(relNear(c.massFraction("N2"), 0.5, 1e-15));
    QVERIFY(relNear(c.moleFraction("N2") / c.moleFraction("O2"), 0.0319988 / 0.0280134, 1e-14));
  }
};

QTEST_APPLESS_MAIN(TestMixtures)
#include "test_mixtures.moc"
