// The GUI's fields against the registry of parameters (core/engine/parameter_registry.h): each
// field is exactly one registry entry (of every architecture; the architecture itself is chosen
// by File › New), each such entry is one field, and the field shows the entry (path, range,
// visibility, get and set).
#include "document/case_document.h"
#include "document/case_fields.h"
#include "document/selection_router.h"
#include "gui_test_support.h"
#include "main_window.h"

#include <QComboBox>
#include <QLineEdit>
#include <QtTest/QtTest>

#include <map>

using namespace cw;
using engine::Parameter;

class TestCaseFields : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestCaseFields"); }

  void everyFieldIsOneEntryAndEveryEntryOneField() {
    std::map<const Parameter*, int> shown;
    for (const gui::FieldSpec& field : gui::caseFields()) {
      QVERIFY2(field.parameter, field.key);
      ++shown[field.parameter];
    }
    int entries = 0;
    for (const Parameter& p : engine::parameterRegistry()) {
      if (p.section == "engine") {
        QVERIFY2(!shown.count(&p), p.pointer().c_str());  // the architecture: File › New, no field
        continue;
      }
      ++entries;
      QVERIFY2(shown[&p] == 1, p.pointer().c_str());
    }
    QCOMPARE(int(gui::caseFields().size()), entries);
  }

  void fieldsShowTheirEntry() {
    const engine::Case c;
    for (const gui::FieldSpec& field : gui::caseFields()) {
      const Parameter& p = *field.parameter;
      QCOMPARE(field.path(c), p.pointer());
      QCOMPARE(field.visible(c), p.applies(c));
      QCOMPARE(QString::fromLatin1(field.key),
               QString::fromLatin1(p.fieldKey.data(), int(p.fieldKey.size())));
      QCOMPARE(field.choices.size(), p.choices.size());
      QVERIFY2(!gui::fieldLabel(field).isEmpty(), field.key);
    }
    // Ranges as the core checks them: the compressor's pressure ratio [1, 60] (docs/case-format.md),
    // the geopotential altitude up to 84852 m (U.S. Standard Atmosphere 1976: 86 km geometric).
    const gui::FieldSpec& ratio = *gui::caseField(QStringLiteral("compressor.pressureRatio"));
    QCOMPARE(ratio.low, 1.0);
    QCOMPARE(ratio.high, 60.0);
    QVERIFY(!ratio.lowOpen && !ratio.highOpen);
    QCOMPARE(gui::caseField(QStringLiteral("flight.altitude"))->high, 84852.0);
  }

  void setSelectsTheAlternativeAndVisibilityFollows() {
    engine::Case c;
    const gui::FieldSpec& basis = *gui::caseField(QStringLiteral("compressor.basis"));
    const gui::FieldSpec& isentropic = *gui::caseField(QStringLiteral("compressor.efficiency"));
    const gui::FieldSpec& polytropic = *gui::caseField(QStringLiteral("compressor.polytropicEfficiency"));
    QVERIFY(isentropic.visible(c) && !polytropic.visible(c));
    basis.set(c, 1.0);
    QVERIFY(!isentropic.visible(c) && polytropic.visible(c));
    polytropic.set(c, 0.9);
    QCOMPARE(c.compressor.efficiency.basis, engine::EfficiencyBasis::Polytropic);
    QCOMPARE(c.compressor.efficiency.value, 0.9);

    const gui::FieldSpec& kind = *gui::caseField(QStringLiteral("nozzle.kind"));
    const gui::FieldSpec& expansion = *gui::caseField(QStringLiteral("nozzle.expansion"));
    const gui::FieldSpec& areaRatio = *gui::caseField(QStringLiteral("nozzle.areaRatio"));
    QVERIFY(!expansion.visible(c) && !areaRatio.visible(c));
    kind.set(c, 1.0);
    QVERIFY(expansion.visible(c) && !areaRatio.visible(c));
    expansion.set(c, 1.0);
    QVERIFY(areaRatio.visible(c));
    QCOMPARE(areaRatio.get(c), 1.5);
  }

  /// The window with each form built from the registry whose fields changed shape (an
  /// alternative per field, the nozzle's kind and expansion), switched to its alternatives:
  /// CYCLEWRIGHT_FIELD_PICTURES=DIR saves each picture in DIR to look at.
  void formsShowTheChosenAlternative() {
    gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    window.resize(1280, 800);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    const QString folder = qEnvironmentVariable("CYCLEWRIGHT_FIELD_PICTURES");
    auto choose = [&](const char* key, int index) {  // as the user does: the combo's activation
      auto* combo = window.findChild<QComboBox*>(key);
      combo->setCurrentIndex(index);
      emit combo->activated(index);
    };
    auto picture = [&](const QString& name) {
      if (!folder.isEmpty()) QVERIFY(window.grab().save(folder + "/" + name + ".png"));
    };
    window.selection().select(gui::Section::Compressor);
    QVERIFY(window.findChild<QLineEdit*>("compressor.efficiency")->isVisibleTo(&window));
    QVERIFY(!window.findChild<QLineEdit*>("compressor.polytropicEfficiency")->isVisibleTo(&window));
    picture("compressor-isentropic");
    choose("compressor.basis", 1);
    QVERIFY(!window.findChild<QLineEdit*>("compressor.efficiency")->isVisibleTo(&window));
    QVERIFY(window.findChild<QLineEdit*>("compressor.polytropicEfficiency")->isVisibleTo(&window));
    QCOMPARE(window.document().currentCase().compressor.efficiency.basis,
             engine::EfficiencyBasis::Polytropic);
    picture("compressor-polytropic");
    window.selection().select(gui::Section::Nozzle);
    choose("nozzle.kind", 1);
    choose("nozzle.expansion", 1);
    QVERIFY(window.findChild<QLineEdit*>("nozzle.areaRatio")->isVisibleTo(&window));
    QVERIFY(std::holds_alternative<engine::FixedAreaRatioNozzle>(
        window.document().currentCase().nozzle.geometry));
    picture("nozzle-area-ratio");
    window.selection().select(gui::Section::Inlet);
    picture("inlet");
  }
};

QTEST_MAIN(TestCaseFields)
#include "test_case_fields.moc"
