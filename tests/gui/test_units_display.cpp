// U.S. customary display precision: an input converted from SI shows as many significant digits
// as its SI text has, at least DisplayUnits::kInputDigits, never the raw conversion
// ("19685.0393701"); fields are wide enough for their text; tables round per quantity.
// Conversions: NIST SP 811 (2008) appendix B.8 (1 ft = 0.3048 m, 1 lbm = 0.45359237 kg,
// 1 Btu/lbm = 2326 J/kg); 6000 m = 19685.039 ft, 4 kg/s = 8.8184905 lbm/s, 43 MJ/kg = 18486.672 Btu/lbm.
#include "document/case_document.h"
#include "document/selection_router.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"

#include <QLineEdit>
#include <QTest>

using cw::gui::DisplayUnits;
using cw::gui::MainWindow;
using cw::gui::Quantity;
using cw::gui::UnitSystem;

class TestUnitsDisplay : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestUnits"); }

  void inputTextAtDisplayPrecision() {
    DisplayUnits units;
    // SI: the value as typed.
    QCOMPARE(units.inputText(6000.0, Quantity::Length), QStringLiteral("6000"));
    QCOMPARE(units.inputText(43.0e6, Quantity::SpecificEnergy), QStringLiteral("43"));
    QCOMPARE(units.inputText(0.84, Quantity::Dimensionless), QStringLiteral("0.84"));
    units.setSystem(UnitSystem::USCustomary);
    QCOMPARE(units.inputText(6000.0, Quantity::Length), QStringLiteral("19685"));
    QCOMPARE(units.inputText(4.0, Quantity::MassFlow), QStringLiteral("8.8185"));
    QCOMPARE(units.inputText(43.0e6, Quantity::SpecificEnergy), QStringLiteral("18487"));
    QCOMPARE(units.inputText(1350.0, Quantity::Temperature), QStringLiteral("2430"));  // x 1.8, exact
    QCOMPARE(units.inputText(208.8, Quantity::Length), QStringLiteral("685.04"));      // not 685.0393701
    // More digits typed in SI, more digits shown: 6123.4567 m (8 digits) = 20090.081037 ft.
    QCOMPARE(units.inputText(6123.4567, Quantity::Length), QStringLiteral("20090.081"));
    // A dimensionless input is the same in both systems.
    QCOMPARE(units.inputText(0.84, Quantity::Dimensionless), QStringLiteral("0.84"));
    QCOMPARE(units.inputTextWithUnit(4.0, Quantity::MassFlow), QStringLiteral("8.8185 lbm/s"));
  }

  void usFieldsShowDisplayPrecisionAndFitTheirText() {
    MainWindow window;
    window.units().setSystem(UnitSystem::USCustomary);  // not kept in the settings
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    window.resize(1280, 800);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    const std::pair<const char*, QString> expected[] = {{"flight.altitude", QStringLiteral("19685")},
                                                        {"design.airMassFlow", QStringLiteral("8.8185")},
                                                        {"fuel.lhv", QStringLiteral("18487")}};
    const cw::gui::Section sections[] = {cw::gui::Section::Flight, cw::gui::Section::Design,
                                         cw::gui::Section::Fuel};
    for (int i = 0; i < 3; ++i) {
      window.selection().select(sections[i]);
      auto* field = window.findChild<QLineEdit*>(expected[i].first);
      QVERIFY(field);
      QCOMPARE(field->text(), expected[i].second);
      QVERIFY2(field->fontMetrics().horizontalAdvance(field->text()) < field->contentsRect().width(),
               expected[i].first);
    }
    // The model keeps the exact SI value: 6000 m, not the rounded 19685 ft.
    QCOMPARE(std::get<cw::engine::StandardAtmosphereAmbient>(window.document().currentCase().flight.ambient)
                 .altitude,
             6000.0);
  }

  void tablesRoundPerQuantity() {
    MainWindow window;
    window.units().setSystem(UnitSystem::USCustomary);
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    auto* stations = window.stationModel();
    // Station 0: the free stream, 4 kg/s of air = 8.8185 lbm/s (5 significant digits).
    QCOMPARE(stations->index(0, cw::gui::StationTableModel::MassFlow).data().toString(),
             QStringLiteral("8.8185"));
    using P = cw::gui::PerformanceModel;
    const QString fuelFlow = window.performanceModel()->index(P::FuelFlow, P::Actual).data().toString();
    QCOMPARE(fuelFlow.size(), QStringLiteral("0.00000").size());  // lbm/s, 5 significant digits
  }
};

QTEST_MAIN(TestUnitsDisplay)
#include "test_units_display.moc"
