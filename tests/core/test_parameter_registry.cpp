// The registry of parameters (core/engine/parameter_registry.h) against its consumers: each key
// of the schema, of the reader and each setter is exactly one registry entry, and each entry
// appears in each of them; the roles of a two-spool case come from one description.
#include "analysis/ideal_twin.h"
#include "engine/case_roles.h"
#include "engine/case_validation.h"
#include "engine/parameter_registry.h"
#include "io/case_field_setter.h"
#include "io/case_file.h"
#include "io/case_format_docs.h"
#include "io/case_keys.h"
#include "io/json_document.h"

#include <QtTest/QtTest>

#include <algorithm>
#include <cmath>
#include <set>

using namespace cw;
using engine::Parameter;
using engine::ParameterKind;
using nlohmann::json;

namespace {

const std::string kSource = CYCLEWRIGHT_SOURCE_DIR;

/// Every entry that is a key of the case file (of the newest version), as "section.key".
std::multiset<std::string> registryKeys(bool numbersOnly = false) {
  std::multiset<std::string> keys;
  for (const Parameter& p : engine::parameterRegistry())
    if (p.inFile && (!numbersOnly || p.kind == ParameterKind::Number)) keys.insert(p.dottedPath());
  return keys;
}

std::string dotted(std::string_view section, std::string_view key) {
  return section.empty() ? std::string(key) : std::string(section) + "." + std::string(key);
}

/// The document's own keys: no input of the case, so no registry entry.
bool isDocumentKey(const std::string& path) {
  return path == "format" || path == "version";
}

/// Chooses, through the registry's choices, the architecture, kinds and alternative under which
/// `p` applies.
const engine::ParameterSection& sectionOf(const Parameter& p) {
  return *std::find_if(engine::parameterSections().begin(), engine::parameterSections().end(),
                       [&p](const engine::ParameterSection& s) { return s.name == p.section; });
}

void chooseWhereItApplies(const Parameter& p, engine::Case& c) {
  if (sectionOf(p).sinceVersion > 1) engine::findParameter("engine", "architecture")->set(c, 1.0);
  for (const engine::KeyCondition& condition : p.conditions) {
    const Parameter& selector = *engine::findParameter(p.section, condition.selector);
    for (std::size_t i = 0; i < selector.choices.size(); ++i)
      if (selector.choices[i].value == condition.value) selector.set(c, double(i));
  }
  if (!p.group.empty()) engine::findParameter(p.section, p.group)->set(c, double(p.alternative));
}

}  // namespace

class TestParameterRegistry : public QObject {
  Q_OBJECT

 private slots:
  void everyReaderKeyIsOneEntryAndEveryEntryAReaderKey() {
    std::multiset<std::string> reader;
    for (const io::CaseSection& section : io::caseSections())
      for (const io::CaseKey& key : section.keys)
        if (!isDocumentKey(dotted(section.name, key.name))) reader.insert(dotted(section.name, key.name));
    QCOMPARE(reader, registryKeys());
    // Version 2: 17 objects (the engine and four two-spool roles besides the 12 of version 1), 58
    // numbers (42 of version 1, 16 of the roles; docs/case-format.md).
    QCOMPARE(io::caseSections().size(), std::size_t(18));
    QCOMPARE(registryKeys(true).size(), std::size_t(58));
    // Version 1: its 12 objects and 42 numbers, none of version 2.
    std::size_t numbers = 0;
    for (const io::CaseSection& section : io::caseSections(1))
      for (const io::CaseKey& key : section.keys) {
        QVERIFY(engine::findParameter(section.name, key.name) || isDocumentKey(std::string(key.name)));
        if (const Parameter* p = engine::findParameter(section.name, key.name)) {
          QCOMPARE(p->sinceVersion, 1);
          numbers += p->kind == ParameterKind::Number;
        }
      }
    QCOMPARE(io::caseSections(1).size(), std::size_t(13));
    QCOMPARE(numbers, std::size_t(42));
  }

  void everySchemaParameterIsOneEntryAndEveryEntryInTheSchema() {
    const std::string path = kSource + "/docs/case-schema.json";
    const json schema = io::parseDocumentText(io::readDocumentFile(path, "schema"), path);
    std::multiset<std::string> fromSchema;
    for (const auto& [name, property] : schema["properties"].items()) {
      if (property.value("type", "") != "object") {
        if (!isDocumentKey(name)) fromSchema.insert(name);
        continue;
      }
      for (const auto& [key, inner] : property["properties"].items()) fromSchema.insert(name + "." + key);
    }
    QCOMPARE(fromSchema, registryKeys());
  }

  void everySetterIsOneNumberAndEveryNumberHasASetter() {
    const std::vector<std::string> paths = io::numericCaseFieldPaths();
    QCOMPARE(std::multiset<std::string>(paths.begin(), paths.end()), registryKeys(true));
    for (const std::string& path : paths) QVERIFY2(io::numericCaseFieldSetter(path), path.c_str());
  }

  void entriesAreWellFormed() {
    std::set<std::string> fieldKeys, paths;
    std::set<std::string_view> sections;
    for (const engine::ParameterSection& s : engine::parameterSections()) sections.insert(s.name);
    for (const Parameter& p : engine::parameterRegistry()) {
      const std::string where = p.pointer();
      QVERIFY2(sections.count(p.section), where.c_str());
      QVERIFY2(fieldKeys.insert(std::string(p.fieldKey)).second, ("field key twice: " + where).c_str());
      QVERIFY2(paths.insert(where).second, ("path twice: " + where).c_str());
      QVERIFY2(!p.label.empty() && !p.toolTip.empty(), where.c_str());
      QVERIFY2(p.applies && p.get && p.set, where.c_str());
      if (p.kind == ParameterKind::Choice) QVERIFY2(p.choices.size() >= 2, where.c_str());
      if (p.kind == ParameterKind::Number) {
        QVERIFY2(p.range.low < p.range.high, where.c_str());
        QVERIFY2(!p.rangeReason.empty(), where.c_str());
      }
      if (p.lossless && p.kind == ParameterKind::Number)
        QVERIFY2(p.range.contains(*p.lossless), where.c_str());
      if (!p.inFile) {
        // A group choice: each alternative has keys of its own.
        for (int i = 0; i < int(p.choices.size()); ++i) {
          int members = 0;
          for (const Parameter& q : engine::parameterRegistry())
            members += q.section == p.section && q.group == p.key && q.alternative == i;
          QVERIFY2(members > 0, where.c_str());
        }
      }
    }
  }

  void defaultsAreTheDefaultCasesValues() {
    // Each number's default against the default case (case_inputs.h and the parts' structs), its
    // alternative, kind or architecture chosen first through the registry's own choices.
    int checked = 0;
    for (const Parameter& p : engine::parameterRegistry()) {
      if (p.kind != ParameterKind::Number || !p.hasDefault) continue;
      // A new case of the architecture that has the entry (File > New and the reader start there).
      engine::Case c = engine::newCase(sectionOf(p).architecture.value_or(engine::Architecture::Turbojet));
      chooseWhereItApplies(p, c);
      QVERIFY2(p.applies(c), p.pointer().c_str());
      QVERIFY2(p.get(c) == p.defaultValue, p.pointer().c_str());
      ++checked;
    }
    QCOMPARE(checked, 43);  // 31 of the single-spool case, 12 of the two-spool roles
  }

  void twoSpoolRolesComeFromOneDescription() {
    // Each compressor role has the compressor's keys, each turbine role the turbine's.
    auto keysOf = [](std::string_view section) {
      std::vector<std::string_view> keys;
      for (const Parameter& p : engine::parameterRegistry())
        if (p.section == section) keys.push_back(p.key);
      return keys;
    };
    for (const engine::CompressorRole& role : engine::kCompressorRoles)
      QCOMPARE(keysOf(role.name), keysOf("compressor"));
    for (const engine::TurbineRole& role : engine::kTurbineRoles)
      QCOMPARE(keysOf(role.name), keysOf("turbine"));

    engine::Case single;
    engine::Case twoSpool;
    twoSpool.architecture = engine::Architecture::TwoSpoolTurbojet;
    const Parameter& lp = *engine::findParameter("low_pressure_compressor", "pressure_ratio");
    const Parameter& hp = *engine::findParameter("high_pressure_compressor", "pressure_ratio");
    const Parameter& only = *engine::findParameter("compressor", "pressure_ratio");
    QVERIFY(!lp.applies(single) && !hp.applies(single) && only.applies(single));
    QVERIFY(lp.applies(twoSpool) && hp.applies(twoSpool) && !only.applies(twoSpool));
    QCOMPARE(lp.sinceVersion, 2);
    // The new two-spool case's split, 2.5 times 4 (case_inputs.h): the LP ratio is the LP member,
    // the HP ratio the case's compressor.
    QCOMPARE(lp.get(twoSpool), 2.5);
    // A new two-spool case's HP ratio, and the default the documents give for it.
    QCOMPARE(hp.get(engine::newCase(engine::Architecture::TwoSpoolTurbojet)), 4.0);
    QCOMPARE(hp.defaultValue, 4.0);
    QCOMPARE(only.defaultValue, 10.0);
    hp.set(twoSpool, 4.0);
    QCOMPARE(twoSpool.compressor.pressureRatio, 4.0);
    QCOMPARE(twoSpool.lowPressureCompressor.pressureRatio, 2.5);
    const Parameter& lpt = *engine::findParameter("low_pressure_turbine", "power_offtake_W");
    lpt.set(twoSpool, 1000.0);
    QCOMPARE(twoSpool.lowPressureTurbine.powerOfftake, 1000.0);
    QCOMPARE(twoSpool.turbine.powerOfftake, 0.0);
  }

  void altitudeRangeIsTheStandardAtmospheresSpan() {
    // U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562), eq. 18: geopotential H = r0 Z / (r0 + Z),
    // r0 = 6356766 m; its top, Z = 86 km geometric, is H = 84852 m geopotential.
    const Parameter& altitude = *engine::findParameter("flight", "altitude_m");
    engine::Case c;
    const double r0 = 6356766.0;
    QCOMPARE(std::round(r0 * 86000.0 / (r0 + 86000.0)), altitude.rangeFor(c).high);
    std::get<engine::StandardAtmosphereAmbient>(c.flight.ambient).geometricAltitude = true;
    QCOMPARE(altitude.rangeFor(c).high, 86000.0);
    QCOMPARE(altitude.rangeFor(c).low, -5000.0);
  }

  void idealTwinHasEveryLossAtItsLosslessValue() {
    engine::Case lossy;
    lossy.inlet = {engine::InletLossBasis::RamEfficiency, 0.9, engine::SupersonicRecoveryRule::MilE5008B};
    lossy.compressor.efficiency = {engine::EfficiencyBasis::Polytropic, 0.9};
    lossy.compressor.bleedFraction = 0.05;
    lossy.turbine.powerOfftake = 1.0e5;
    lossy.afterburner.pressureLossFractionUnlit = 0.02;
    lossy.nozzle.geometry = engine::FixedAreaRatioNozzle{1.3};
    lossy.nozzle.lossBasis = engine::NozzleLossBasis::IsentropicEfficiency;
    const engine::Case twin = analysis::idealTwinOf(lossy, 1400.0, 20.0);
    int losses = 0;
    for (const Parameter& p : engine::parameterRegistry()) {
      if (!p.lossless || !p.applies(twin)) continue;
      ++losses;
      QVERIFY2(p.get(twin) == *p.lossless, p.pointer().c_str());
    }
    // Inlet 3 (basis, recovery, rule), compressor 3 (basis, efficiency, bleed), burner 2,
    // turbine 4, jet pipe 1, afterburner 3, nozzle 5 (kind, expansion, basis, coefficient,
    // discharge).
    QCOMPARE(losses, 21);
    QVERIFY(std::holds_alternative<engine::FullyExpandingNozzle>(twin.nozzle.geometry));
    QCOMPARE(twin.inlet.lossBasis, engine::InletLossBasis::PressureRecovery);
    QCOMPARE(twin.compressor.efficiency.basis, engine::EfficiencyBasis::Isentropic);
    QVERIFY(engine::validateCase(twin).empty());
  }

  void committedSchemaIsTheGeneratedOne() {
    const std::string path = kSource + "/docs/case-schema.json";
    QVERIFY2(io::readDocumentFile(path, "schema") == io::caseSchemaText(),
             "docs/case-schema.json is stale: cmake --build --preset default --target case_format_docs");
  }

  void committedTablesAreTheGeneratedOnes() {
    const std::string path = kSource + "/docs/case-format.md";
    const std::string committed = io::readDocumentFile(path, "case format");
    QVERIFY2(io::withGeneratedBlocks(committed, io::caseFormatBlocks()) == committed,
             "docs/case-format.md is stale: cmake --build --preset default --target case_format_docs");
    // The tables name every key of the format once per object it belongs to.
    for (const Parameter& p : engine::parameterRegistry())
      if (p.inFile && !p.section.empty())
        QVERIFY2(committed.find("| `" + std::string(p.key) + "` |") != std::string::npos,
                 p.pointer().c_str());
  }

  void writeThenReadGivesTheSameCase() {
    engine::Case c;
    c.title = "registry";
    c.flight.ambient = engine::GivenAmbient{250.0, 50000.0};
    c.design.target = engine::NetThrustTarget{12000.0};
    c.gasModel.model = engine::TwoGammaGasModel{1000.0, 1.39, 1200.0, 1.31};
    c.gasModel.neglectFuelMass = true;
    c.inlet.lossBasis = engine::InletLossBasis::RamEfficiency;
    c.turbine.efficiency = {engine::EfficiencyBasis::Polytropic, 0.91};
    c.burner.setting = engine::FuelAirRatioSetting{0.025};
    c.afterburner.enabled = true;
    c.nozzle.geometry = engine::FixedAreaRatioNozzle{1.7};
    c.nozzle.lossBasis = engine::NozzleLossBasis::IsentropicEfficiency;
    QVERIFY(engine::validateCase(c).empty());
    QVERIFY(io::parseCase(io::caseToJson(c)) == c);

    // The same case with two spools: the architecture and the four roles are written and read.
    c.architecture = engine::Architecture::TwoSpoolTurbojet;
    c.lowPressureCompressor.pressureRatio = 3.5;
    c.lowPressureTurbine.efficiency = {engine::EfficiencyBasis::Polytropic, 0.92};
    QVERIFY(engine::validateCase(c).empty());
    const json written = io::caseToJson(c);
    QVERIFY(written["engine"]["architecture"] == json("two-spool-turbojet"));
    QVERIFY(!written.contains("compressor") && !written.contains("turbine"));
    QVERIFY(written["low_pressure_compressor"]["pressure_ratio"] == json(3.5));
    QVERIFY(io::parseCase(written) == c);
  }
};

QTEST_APPLESS_MAIN(TestParameterRegistry)
#include "test_parameter_registry.moc"
