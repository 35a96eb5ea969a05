// Case files: parsing, validation (every problem at once), round trips, --set overrides,
// atomic writes, and agreement of the parser with docs/case-schema.json.
#include "common/error.h"
#include "engine/case_inputs.h"
#include "engine/case_validation.h"
#include "engine/case_validation_error.h"
#include "io/atomic_file.h"
#include "io/case_file.h"
#include "io/case_keys.h"

#include <QTest>

#include <sys/resource.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <cmath>
#include <csignal>
#include <filesystem>
#include <fstream>
#include <map>
#include <sstream>

using nlohmann::json;
using namespace cw::engine;
using cw::io::applySetOverride;
using cw::io::parseCase;

namespace fs = std::filesystem;

namespace {

const std::string kSource = CYCLEWRIGHT_SOURCE_DIR;

/// The smallest valid document: only the required keys.
json minimalDocument() {
  return {{"format", "cyclewright-case"},
          {"version", 1},
          {"flight", {{"altitude_m", 0.0}, {"mach", 0.0}}},
          {"design", {{"air_mass_flow_kg_per_s", 20.0}}}};
}

std::vector<CaseProblem> problemsOf(const json& document) {
  try {
    parseCase(document);
  } catch (const CaseValidationError& e) {
    return e.problems();
  }
  return {};
}

std::string describe(const std::vector<CaseProblem>& problems) {
  std::string text;
  for (const CaseProblem& p : problems) text += "\n  " + p.message;
  return text.empty() ? " (no problems)" : text;
}

bool hasProblemAt(const std::vector<CaseProblem>& problems, const std::string& path,
                  const std::string& part = "") {
  return std::any_of(problems.begin(), problems.end(), [&](const CaseProblem& p) {
    return p.path == path && p.message.find(part) != std::string::npos;
  });
}

json readJson(const std::string& path) {
  std::ifstream stream(path);
  return json::parse(stream);
}

std::string readText(const std::string& path) {
  std::ifstream stream(path);
  std::ostringstream text;
  text << stream.rdbuf();
  return text.str();
}

std::string dotted(const std::string& pointer) {
  std::string path = pointer.substr(1);
  std::replace(path.begin(), path.end(), '/', '.');
  return path;
}

/// --set lines that make a key apply (its kind), for keys that apply only under a choice.
std::vector<std::string> prerequisites(const std::string& pointer) {
  static const std::map<std::string, std::vector<std::string>> table{
      {"/gas_model/cp_J_per_kg_K", {"gas_model.kind=constant-cp"}},
      {"/gas_model/gamma", {"gas_model.kind=constant-cp"}},
      {"/gas_model/cold_cp_J_per_kg_K", {"gas_model.kind=two-gamma"}},
      {"/gas_model/cold_gamma", {"gas_model.kind=two-gamma"}},
      {"/gas_model/hot_cp_J_per_kg_K", {"gas_model.kind=two-gamma"}},
      {"/gas_model/hot_gamma", {"gas_model.kind=two-gamma"}},
      {"/gas_model/neglect_fuel_mass", {"gas_model.kind=constant-cp"}},
      {"/nozzle/expansion", {"nozzle.kind=convergent-divergent"}},
      {"/nozzle/exit_to_throat_area_ratio",
       {"nozzle.kind=convergent-divergent", "nozzle.expansion=area-ratio"}},
      {"/flight/ambient_temperature_K",
       {"flight.ambient_temperature_K=288.15", "flight.ambient_pressure_Pa=101325"}},
      {"/flight/ambient_pressure_Pa",
       {"flight.ambient_temperature_K=288.15", "flight.ambient_pressure_Pa=101325"}},
      // 86000 m is the bound of geometric altitudes (geopotential ones stop at 84852 m).
      {"/flight/altitude_m", {"flight.geometric_altitude=true"}},
  };
  const auto it = table.find(pointer);
  std::vector<std::string> lines = it == table.end() ? std::vector<std::string>{} : it->second;
  // The objects of the two-spool roles apply only to that architecture.
  for (const char* role : {"/low_pressure_compressor/", "/high_pressure_compressor/",
                           "/high_pressure_turbine/", "/low_pressure_turbine/"})
    if (pointer.rfind(role, 0) == 0) lines.insert(lines.begin(), "engine.architecture=two-spool-turbojet");
  return lines;
}

/// A two-spool case with its own values in every role (invented round numbers).
Case twoSpoolSample() {
  Case c = newCase(Architecture::TwoSpoolTurbojet);
  c.title = "two spools";
  c.lowPressureCompressor = {3.0, {EfficiencyBasis::Polytropic, 0.9}, 0.01};
  c.compressor = {5.5, {EfficiencyBasis::Isentropic, 0.84}, 0.03};
  c.turbine = {{EfficiencyBasis::Isentropic, 0.9}, 0.985, 20000.0};
  c.lowPressureTurbine = {{EfficiencyBasis::Polytropic, 0.91}, 0.99, 5000.0};
  c.burner.setting = ExitTemperatureSetting{1500.0};
  return c;
}

json documentFor(const std::string& pointer) {
  json document = minimalDocument();
  for (const std::string& line : prerequisites(pointer)) applySetOverride(document, line);
  return document;
}

/// Every property of the schema as (JSON pointer, property schema): top level and component objects.
std::vector<std::pair<std::string, json>> schemaProperties() {
  const json schema = readJson(kSource + "/docs/case-schema.json");
  std::vector<std::pair<std::string, json>> result;
  for (const auto& [name, property] : schema["properties"].items()) {
    if (property.value("type", "") == "object") {
      for (const auto& [key, inner] : property["properties"].items())
        result.push_back({"/" + name + "/" + key, inner});
    } else {
      result.push_back({"/" + name, property});
    }
  }
  return result;
}

/// The cases of the round-trip test: together they use every basis and every kind.
std::vector<std::pair<std::string, Case>> sampleCases() {
  std::vector<std::pair<std::string, Case>> cases;
  cases.push_back({"defaults", Case{}});

  Case a;
  a.title = "Ideal \"textbook\" case, 100 % ideal — ü";
  a.notes = "line one\nline two";
  a.flight.ambient = GivenAmbient{250.5, 54000.25};
  a.flight.mach = 0.85;
  a.flight.specificHumidity = 0.004;
  a.design.target = NetThrustTarget{12345.678};
  a.fuel = {1.2e8, 0.0, 400.0};
  a.gasModel = {ConstantCpGasModel{1100.0, 1.35}, true};
  a.inlet = {InletLossBasis::RamEfficiency, 0.93, SupersonicRecoveryRule::MilE5008B};
  a.compressor = {22.0, {EfficiencyBasis::Polytropic, 0.91}, 0.05};
  a.burner = {FuelAirRatioSetting{0.0234}, 0.04, 0.995};
  a.turbine = {{EfficiencyBasis::Polytropic, 0.9}, 0.98, 120000.0};
  a.jetPipe.pressureLossFraction = 0.0;
  a.nozzle = {FullyExpandingNozzle{}, NozzleLossBasis::IsentropicEfficiency, 0.96, 0.99};
  a.sizing = {0.6, 0.0};
  cases.push_back({"given ambient, constant cp, polytropic, fuel-air ratio", a});

  Case b;
  b.flight.ambient = StandardAtmosphereAmbient{15000.0, true, -12.5};
  b.flight.mach = 2.4;
  b.gasModel = {TwoGammaGasModel{1005.0, 1.399, 1250.0, 1.31}, false};
  b.inlet.supersonicRecoveryRule = SupersonicRecoveryRule::MilE5008B;
  b.burner.setting = ExitTemperatureSetting{1750.0};
  b.afterburner = {true, 2100.0, 0.07, 0.03, 0.92};
  b.nozzle = {FixedAreaRatioNozzle{2.75}, NozzleLossBasis::VelocityCoefficient, 0.975, 0.97};
  cases.push_back({"standard atmosphere, two gamma, afterburner, area ratio", b});

  Case c;
  c.gasModel = {TwoGammaGasModel{}, true};
  c.flight.ambient = StandardAtmosphereAmbient{-400.0, false, 30.0};
  c.design.target = AirMassFlowTarget{0.1 + 0.2};  // a value with no short decimal form
  c.compressor.pressureRatio = 1.0 / 3.0 + 10.0;
  cases.push_back({"two gamma without fuel mass, awkward doubles", c});

  cases.push_back({"two-spool, every role its own values", twoSpoolSample()});
  Case d = newCase(Architecture::TwoSpoolTurbojet);
  d.gasModel = {ConstantCpGasModel{1004.5, 1.4}, false};
  d.design.target = NetThrustTarget{5000.0};
  cases.push_back({"two-spool defaults, constant cp, thrust target", d});
  return cases;
}

class TemporaryFolder {
 public:
  TemporaryFolder() {
    std::string pattern = (fs::temp_directory_path() / "cw-case-test-XXXXXX").string();
    path = mkdtemp(pattern.data());
  }
  ~TemporaryFolder() {
    std::error_code ec;
    fs::permissions(path, fs::perms::owner_all, fs::perm_options::add, ec);
    fs::remove_all(path, ec);
  }
  std::vector<std::string> entries() const {
    std::vector<std::string> names;
    for (const auto& entry : fs::directory_iterator(path)) names.push_back(entry.path().filename().string());
    std::sort(names.begin(), names.end());
    return names;
  }
  fs::path path;
};

}  // namespace

class TestCaseFile : public QObject {
  Q_OBJECT
 private slots:
  void demoCaseParses() {
    const Case demo = cw::io::readCaseFile(kSource + "/resources/demo/demo-turbojet.json");
    const auto& ambient = std::get<StandardAtmosphereAmbient>(demo.flight.ambient);
    QCOMPARE(ambient.altitude, 6000.0);
    QVERIFY(!ambient.geometricAltitude);
    QCOMPARE(demo.flight.mach, 0.8);
    QCOMPARE(std::get<AirMassFlowTarget>(demo.design.target).airMassFlow, 4.0);
    QVERIFY(std::holds_alternative<ThermallyPerfectGasModel>(demo.gasModel.model));
    QCOMPARE(demo.compressor.pressureRatio, 8.0);
    QCOMPARE(demo.compressor.efficiency, (Efficiency{EfficiencyBasis::Isentropic, 0.84}));
    QCOMPARE(std::get<ExitTemperatureSetting>(demo.burner.setting).exitTemperature, 1350.0);
    QCOMPARE(demo.turbine.powerOfftake, 15000.0);
    QVERIFY(std::holds_alternative<ConvergentNozzle>(demo.nozzle.geometry));
    QCOMPARE(demo.nozzle.dischargeCoefficient, 0.97);
    QVERIFY(!demo.afterburner.enabled);
  }

  void examplesParse() {
    int count = 0;
    for (const auto& entry : fs::directory_iterator(kSource + "/resources/examples")) {
      if (entry.path().extension() != ".json") continue;
      try {
        cw::io::readCaseFile(entry.path().string());
      } catch (const cw::Error& e) {
        QFAIL((entry.path().string() + ": " + e.what()).c_str());
      }
      ++count;
    }
    QVERIFY(count >= 3);
  }

  void minimalDocumentGivesTheDefaults() {
    QCOMPARE(parseCase(minimalDocument()), Case{});
    QVERIFY(validateCase(Case{}).empty());
  }

  void roundTrip() {
    const TemporaryFolder folder;
    for (const auto& [name, inputs] : sampleCases()) {
      QVERIFY2(validateCase(inputs).empty(), (name + describe(validateCase(inputs))).c_str());
      QVERIFY2(parseCase(cw::io::caseToJson(inputs)) == inputs, name.c_str());
      const std::string path = (folder.path / "case.json").string();
      cw::io::writeCaseFile(path, inputs);
      QVERIFY2(cw::io::readCaseFile(path) == inputs, name.c_str());
      // Written again, the file is byte for byte the same.
      const std::string first = readText(path);
      cw::io::writeCaseFile(path, cw::io::readCaseFile(path));
      QCOMPARE(readText(path), first);
    }
  }

  void writtenFileIsOrderedAndIndented() {
    const TemporaryFolder folder;
    const std::string path = (folder.path / "ordered.json").string();
    cw::io::writeCaseFile(path, Case{});
    const std::string text = readText(path);
    QVERIFY(text.rfind("{\n  \"format\": \"cyclewright-case\",\n  \"version\": 2,\n  \"title\": \"\",", 0) ==
            0);
    QVERIFY(text.find("\"engine\": {\n    \"architecture\": \"turbojet\"\n  },") != std::string::npos);
    QVERIFY(text.find("\"notes\"") < text.find("\"engine\""));
    QVERIFY(text.find("\"engine\"") < text.find("\"flight\""));
    QVERIFY(text.find("\"flight\"") < text.find("\"design\""));
    QVERIFY(text.find("\"nozzle\"") < text.find("\"sizing\""));
    QCOMPARE(text.back(), '\n');
  }

  void everyProblemAtOnce() {
    json document = minimalDocument();
    document["compressor"] = {{"pressure_ratio", 0.5}};
    document["burner"] = {{"exit_temperature_K", 3000.0}};
    document["nozzle"] = {{"discharge_coefficient", 1.2}};
    try {
      parseCase(document);
      QFAIL("no error");
    } catch (const CaseValidationError& e) {
      QCOMPARE(e.code(), cw::ErrorCode::InvalidInput);
      QCOMPARE(e.where(), std::string("case"));
      const std::vector<CaseProblem> expected{
          {"/compressor/pressure_ratio", "0.5", "[1, 60]",
           "/compressor/pressure_ratio = 0.5 is outside the valid range [1, 60]"},
          {"/burner/exit_temperature_K", "3000", "[300, 2500] K",
           "/burner/exit_temperature_K = 3000 K is outside the valid range [300, 2500] K"},
          {"/nozzle/discharge_coefficient", "1.2", "(0, 1]",
           "/nozzle/discharge_coefficient = 1.2 is outside the valid range (0, 1]"},
      };
      QCOMPARE(e.problems().size(), expected.size());
      for (std::size_t i = 0; i < expected.size(); ++i) QCOMPARE(e.problems()[i], expected[i]);
      QCOMPARE(std::string(e.what()),
               expected[0].message + "\n" + expected[1].message + "\n" + expected[2].message);
    }
  }

  void mixedProblemsAreAllReported() {
    json document = minimalDocument();
    document["compresor"] = json::object();                  // unknown object
    document["turbine"] = {{"mechanical_eficiency", 0.99}};  // unknown key
    document["fuel"] = {{"temperature_K", "hot"}};           // wrong type
    document["design"]["required_net_thrust_N"] = 1000.0;    // exactly one of
    document["sizing"] = {{"hub_to_tip_ratio", 0.95}};       // out of range
    const auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{5});
    QVERIFY(hasProblemAt(problems, "/compresor", "unknown key (did you mean \"compressor\"?)"));
    QVERIFY(
        hasProblemAt(problems, "/turbine/mechanical_eficiency", "did you mean \"mechanical_efficiency\"?"));
    QVERIFY(hasProblemAt(problems, "/fuel/temperature_K", "expected a number, got \"hot\""));
    QVERIFY(hasProblemAt(problems, "/design", "exclude each other"));
    QVERIFY(hasProblemAt(problems, "/sizing/hub_to_tip_ratio", "[0, 0.9)"));
  }

  void unknownKeysAreRejectedWithTheirPath() {
    json document = minimalDocument();
    document["compresor"] = {{"pressure_ratio", 8.0}};
    document["nozzle"] = {{"knid", "convergent"}};
    document["extra"] = 1;
    document["a/b"] = 1;
    const auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{4});
    QVERIFY(hasProblemAt(problems, "/compresor", "/compresor: unknown key"));
    QVERIFY(hasProblemAt(problems, "/nozzle/knid", "did you mean \"kind\"?"));
    QVERIFY(hasProblemAt(problems, "/extra", "/extra: unknown key"));
    QVERIFY(hasProblemAt(problems, "/a~1b", "unknown key"));  // RFC 6901 escaping
  }

  void wrongTypesAreRejected() {
    json document = minimalDocument();
    document["compressor"] = {{"pressure_ratio", "eight"}};
    document["flight"]["geometric_altitude"] = 1;
    document["gas_model"] = {{"kind", 3}};
    document["nozzle"] = 5;
    document["title"] = json::array();
    const auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{5});
    const auto& first = *std::find_if(problems.begin(), problems.end(), [](const CaseProblem& p) {
      return p.path == "/compressor/pressure_ratio";
    });
    QCOMPARE(first.value, std::string("\"eight\""));
    QCOMPARE(first.valid, std::string("a number"));
    QVERIFY(hasProblemAt(problems, "/flight/geometric_altitude", "expected true or false, got 1"));
    QVERIFY(hasProblemAt(problems, "/gas_model/kind",
                         "expected one of: thermally-perfect, constant-cp, two-gamma"));
    QVERIFY(hasProblemAt(problems, "/nozzle", "expected an object, got 5"));
    QVERIFY(hasProblemAt(problems, "/title", "expected a string"));
  }

  void unknownChoicesAreRejected() {
    json document = minimalDocument();
    document["nozzle"] = {{"kind", "conical"}};
    document["inlet"] = {{"supersonic_recovery_rule", "MIL"}};
    const auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{2});
    QVERIFY(hasProblemAt(problems, "/nozzle/kind",
                         "\"conical\" is not one of: convergent, convergent-divergent"));
    QVERIFY(hasProblemAt(problems, "/inlet/supersonic_recovery_rule", "none, mil-e-5008b"));
  }

  void exactlyOneOfViolations() {
    struct Example {
      std::string section;
      json object;
      std::string path;
      std::string message;
    };
    const std::vector<Example> examples{
        {"compressor",
         {{"isentropic_efficiency", 0.85}, {"polytropic_efficiency", 0.9}},
         "/compressor",
         "/compressor: isentropic_efficiency and polytropic_efficiency exclude each other; give only one"},
        {"turbine", {{"isentropic_efficiency", 0.85}, {"polytropic_efficiency", 0.9}}, "/turbine", "exclude"},
        {"burner", {{"exit_temperature_K", 1400.0}, {"fuel_air_ratio", 0.02}}, "/burner", "exclude"},
        {"inlet", {{"pressure_recovery", 0.98}, {"ram_efficiency", 0.9}}, "/inlet", "exclude"},
        {"nozzle", {{"velocity_coefficient", 0.98}, {"isentropic_efficiency", 0.95}}, "/nozzle", "exclude"},
        {"design", json::object(), "/design",
         "/design: exactly one of air_mass_flow_kg_per_s or required_net_thrust_N is required"},
        {"design",
         {{"air_mass_flow_kg_per_s", 20.0}, {"required_net_thrust_N", 1000.0}},
         "/design",
         "exclude"},
        {"flight",
         {{"altitude_m", 0.0}, {"ambient_temperature_K", 288.0}, {"ambient_pressure_Pa", 1e5}, {"mach", 0.0}},
         "/flight",
         "altitude_m and ambient_temperature_K exclude each other"},
        {"flight",
         {{"ambient_temperature_K", 288.0}, {"mach", 0.0}},
         "/flight/ambient_pressure_Pa",
         "/flight/ambient_pressure_Pa: required with ambient_temperature_K"},
        {"flight",
         {{"isa_offset_K", 10.0}, {"mach", 0.0}},
         "/flight/altitude_m",
         "required with isa_offset_K"},
        {"flight",
         {{"mach", 0.0}},
         "/flight",
         "exactly one of altitude_m or ambient_temperature_K with ambient_pressure_Pa is required"},
        {"flight", {{"altitude_m", 0.0}}, "/flight/mach", "/flight/mach: required"},
    };
    for (const Example& example : examples) {
      json document = minimalDocument();
      document[example.section] = example.object;
      const auto problems = problemsOf(document);
      QVERIFY2(problems.size() == 1 && hasProblemAt(problems, example.path, example.message),
               (example.path + describe(problems)).c_str());
    }
  }

  void keysApplyOnlyToTheirKind() {
    json document = minimalDocument();
    document["gas_model"] = {{"cp_J_per_kg_K", 1004.0}, {"hot_gamma", 1.33}, {"neglect_fuel_mass", true}};
    document["nozzle"] = {{"kind", "convergent"}, {"exit_to_throat_area_ratio", 2.0}};
    const auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{4});
    QVERIFY(hasProblemAt(problems, "/gas_model/cp_J_per_kg_K", "applies only when kind is \"constant-cp\""));
    QVERIFY(hasProblemAt(problems, "/gas_model/hot_gamma", "applies only when kind is \"two-gamma\""));
    QVERIFY(hasProblemAt(problems, "/gas_model/neglect_fuel_mass",
                         "only with kind \"constant-cp\" or \"two-gamma\""));
    QVERIFY(hasProblemAt(problems, "/nozzle/exit_to_throat_area_ratio", "kind is \"convergent-divergent\""));

    json simple = minimalDocument();
    simple["gas_model"] = {{"kind", "two-gamma"}, {"neglect_fuel_mass", true}};
    QVERIFY(parseCase(simple).gasModel.neglectFuelMass);
    simple["nozzle"] = {{"kind", "convergent-divergent"}, {"exit_to_throat_area_ratio", 2.0}};
    QVERIFY(
        hasProblemAt(problemsOf(simple), "/nozzle/exit_to_throat_area_ratio", "expansion is \"area-ratio\""));
  }

  void formatAndVersionAreChecked() {
    json document = minimalDocument();
    document["format"] = "someone-elses-case";
    document["version"] = 3;
    auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{2});
    QVERIFY(hasProblemAt(problems, "/format", "is not a Cyclewright case format"));
    QVERIFY(hasProblemAt(problems, "/version", "unsupported version 3 (this build reads versions 1 and 2)"));

    document = minimalDocument();
    document["version"] = "1";
    QVERIFY(hasProblemAt(problemsOf(document), "/version", "expected an integer"));

    document = minimalDocument();
    document.erase("format");
    document.erase("version");
    document.erase("flight");
    problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{3});
    QVERIFY(hasProblemAt(problems, "/format", "required"));
    QVERIFY(hasProblemAt(problems, "/version", "required"));
    QVERIFY(hasProblemAt(problems, "/flight", "required"));

    QVERIFY(hasProblemAt(problemsOf(json::array()), "", "expected a JSON object"));
  }

  void versionOneIsReadAsASingleSpoolTurbojet() {
    // A version 1 file: no engine object; its compressor and turbine are the single spool's.
    json document = minimalDocument();
    document["compressor"] = {{"pressure_ratio", 12.0}};
    document["turbine"] = {{"power_offtake_W", 2000.0}};
    const Case c = parseCase(document);
    QCOMPARE(c.architecture, Architecture::Turbojet);
    QCOMPARE(c.compressor.pressureRatio, 12.0);
    QCOMPARE(c.turbine.powerOfftake, 2000.0);
    // Written, it is version 2 and reads back as the same case.
    const json written = cw::io::caseToJson(c);
    QVERIFY(written["version"] == json(2));
    QVERIFY(written["engine"]["architecture"] == json("turbojet"));
    QCOMPARE(parseCase(written), c);
    // The objects of version 2 are no part of version 1.
    document["engine"] = {{"architecture", "turbojet"}};
    document["low_pressure_compressor"] = {{"pressure_ratio", 2.0}};
    const auto problems = problemsOf(document);
    QCOMPARE(problems.size(), std::size_t{2});
    QVERIFY(hasProblemAt(problems, "/engine",
                         "/engine: belongs to version 2 of the format (this file is version 1)"));
    QVERIFY(hasProblemAt(problems, "/low_pressure_compressor", "belongs to version 2"));
  }

  void versionTwoTwoSpoolFileIsRead() {
    json document = minimalDocument();
    document["version"] = 2;
    document["engine"] = {{"architecture", "two-spool-turbojet"}};
    document["low_pressure_compressor"] = {{"pressure_ratio", 3.0}, {"polytropic_efficiency", 0.9}};
    document["high_pressure_compressor"] = {{"pressure_ratio", 5.0}, {"bleed_fraction", 0.02}};
    document["high_pressure_turbine"] = {{"power_offtake_W", 1000.0}};
    document["low_pressure_turbine"] = {{"isentropic_efficiency", 0.9}, {"mechanical_efficiency", 0.98}};
    Case c = parseCase(document);
    QCOMPARE(c.architecture, Architecture::TwoSpoolTurbojet);
    QCOMPARE(c.lowPressureCompressor.pressureRatio, 3.0);
    QCOMPARE(c.lowPressureCompressor.efficiency, (Efficiency{EfficiencyBasis::Polytropic, 0.9}));
    QCOMPARE(c.compressor.pressureRatio, 5.0);
    QCOMPARE(c.compressor.bleedFraction, 0.02);
    QCOMPARE(c.turbine.powerOfftake, 1000.0);
    QCOMPARE(c.lowPressureTurbine.efficiency, (Efficiency{EfficiencyBasis::Isentropic, 0.9}));
    QCOMPARE(c.lowPressureTurbine.mechanicalEfficiency, 0.98);
    // Roles not given take a new two-spool case's values: 2.5 times 4, an overall 10 (case_inputs.h).
    for (const char* role : {"low_pressure_compressor", "high_pressure_compressor", "high_pressure_turbine",
                             "low_pressure_turbine"})
      document.erase(role);
    c = parseCase(document);
    QCOMPARE(c, newCase(Architecture::TwoSpoolTurbojet));
    QCOMPARE(c.lowPressureCompressor.pressureRatio * c.compressor.pressureRatio, 10.0);
    // A version 2 file without the engine object is a single-spool turbojet.
    document.erase("engine");
    QCOMPARE(parseCase(document), Case{});
  }

  void rolesApplyOnlyToTheirArchitecture() {
    json twoSpool = minimalDocument();
    twoSpool["version"] = 2;
    twoSpool["engine"] = {{"architecture", "two-spool-turbojet"}};
    twoSpool["compressor"] = {{"pressure_ratio", 8.0}};
    twoSpool["turbine"] = {{"power_offtake_W", 0.0}};
    twoSpool["low_pressure_compressor"] = {{"pressure_ratio", 0.5}};
    auto problems = problemsOf(twoSpool);
    QCOMPARE(problems.size(), std::size_t{3});
    QVERIFY(hasProblemAt(problems, "/compressor",
                         "/compressor: applies only when engine.architecture is \"turbojet\" (this case's is "
                         "\"two-spool-turbojet\")"));
    QVERIFY(hasProblemAt(problems, "/turbine", "applies only when engine.architecture is \"turbojet\""));
    QVERIFY(
        hasProblemAt(problems, "/low_pressure_compressor/pressure_ratio", "outside the valid range [1, 60]"));

    json single = minimalDocument();
    single["version"] = 2;
    single["low_pressure_turbine"] = {{"power_offtake_W", 0.0}};
    QVERIFY(hasProblemAt(problemsOf(single), "/low_pressure_turbine",
                         "applies only when engine.architecture is \"two-spool-turbojet\" (this case's is "
                         "\"turbojet\")"));
    single["engine"] = {{"architecture", "turbojet"}};
    QCOMPARE(problemsOf(single).size(), std::size_t{1});
    single.erase("low_pressure_turbine");
    single["engine"] = {{"architekture", "three-spool"}};
    problems = problemsOf(single);
    QCOMPARE(problems.size(), std::size_t{1});
    QVERIFY(hasProblemAt(problems, "/engine/architekture", "unknown key (did you mean \"architecture\"?)"));
    single["engine"] = {{"architecture", "three-spool"}};
    QVERIFY(hasProblemAt(problemsOf(single), "/engine/architecture",
                         "\"three-spool\" is not one of: turbojet, two-spool-turbojet"));
  }

  void setOverridesFollowTheArchitecture() {
    json twoSpool = cw::io::caseToJson(twoSpoolSample());
    applySetOverride(twoSpool, "low_pressure_compressor.pressure_ratio=3.2");
    applySetOverride(twoSpool, "high_pressure_turbine.isentropic_efficiency=0.87");
    Case c = parseCase(twoSpool);
    QCOMPARE(c.lowPressureCompressor.pressureRatio, 3.2);
    QCOMPARE(c.turbine.efficiency, (Efficiency{EfficiencyBasis::Isentropic, 0.87}));

    json single = minimalDocument();
    const json before = single;
    try {
      applySetOverride(single, "low_pressure_compressor.pressure_ratio=3");
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      QCOMPARE(e.where(), std::string("low_pressure_compressor.pressure_ratio"));
      QVERIFY2(std::string(e.what()).find("applies only when engine.architecture is \"two-spool-turbojet\" "
                                          "(this case's is \"turbojet\"") != std::string::npos,
               e.what());
    }
    try {
      applySetOverride(twoSpool, "compressor.pressure_ratio=3");
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      QVERIFY2(std::string(e.what()).find("applies only when engine.architecture is \"turbojet\"") !=
                   std::string::npos,
               e.what());
    }
    QVERIFY(single == before);

    // Setting the architecture of a version 1 document makes it version 2 and drops the roles
    // the new architecture does not have, as setting a kind drops the keys of another kind.
    single["compressor"] = {{"pressure_ratio", 12.0}};
    applySetOverride(single, "engine.architecture=two-spool-turbojet");
    QVERIFY(single["version"] == json(2));
    QVERIFY(!single.contains("compressor"));
    applySetOverride(single, "low_pressure_compressor.pressure_ratio=2");
    c = parseCase(single);
    QCOMPARE(c.architecture, Architecture::TwoSpoolTurbojet);
    QCOMPARE(c.lowPressureCompressor.pressureRatio, 2.0);
    QCOMPARE(c.compressor.pressureRatio, 4.0);
  }

  void geopotentialAltitudeStopsAt84852() {
    json document = minimalDocument();
    document["flight"]["altitude_m"] = 85000.0;
    QVERIFY(hasProblemAt(problemsOf(document), "/flight/altitude_m", "[-5000, 84852] m"));
    document["flight"]["geometric_altitude"] = true;
    QVERIFY(problemsOf(document).empty());
  }

  void fileErrorsNameThePath() {
    const TemporaryFolder folder;
    const std::string missing = (folder.path / "missing.json").string();
    try {
      cw::io::readCaseFile(missing);
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      QCOMPARE(e.where(), missing);
      QVERIFY(std::string(e.what()).find(missing + ": cannot read case file") == 0);
    }
    const std::string broken = (folder.path / "broken.json").string();
    std::ofstream(broken) << "{ \"format\": \"cyclewright-case\", ";
    try {
      cw::io::readCaseFile(broken);
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      QCOMPARE(e.where(), broken);
      QVERIFY(std::string(e.what()).find("not valid JSON") != std::string::npos);
    }
  }

  void duplicateKeysInAFileAreProblems() {
    const TemporaryFolder folder;
    const std::string path = (folder.path / "twice.json").string();
    std::ofstream(path) << R"({"format": "cyclewright-case", "version": 1,
      "flight": {"altitude_m": 0, "mach": 0.5, "mach": 0.6},
      "design": {"air_mass_flow_kg_per_s": 20},
      "compressor": {"pressure_ratio": 0.5}})";
    try {
      cw::io::readCaseFile(path);
      QFAIL("no error");
    } catch (const CaseValidationError& e) {
      QCOMPARE(e.where(), path);
      QCOMPARE(e.problems().size(), std::size_t{2});
      QVERIFY(hasProblemAt(e.problems(), "/flight/mach", "duplicate key"));
      QVERIFY(hasProblemAt(e.problems(), "/compressor/pressure_ratio", "outside the valid range"));
    }
  }

  void documentsAreReadForOverrides() {
    const TemporaryFolder folder;
    const std::string path = (folder.path / "case.json").string();
    cw::io::writeCaseFile(path, Case{});
    json document = cw::io::readCaseDocument(path);
    applySetOverride(document, "compressor.pressure_ratio=20");
    QCOMPARE(parseCase(document).compressor.pressureRatio, 20.0);

    std::ofstream(path) << R"({"format": "cyclewright-case", "format": "cyclewright-case"})";
    try {
      cw::io::readCaseDocument(path);
      QFAIL("no error");
    } catch (const CaseValidationError& e) {
      QCOMPARE(e.where(), path);
      QCOMPARE(e.problems().size(), std::size_t{1});
      QCOMPARE(e.problems()[0].path, std::string("/format"));
    }
  }

  void setOverrides() {
    json document = minimalDocument();
    applySetOverride(document, "compressor.pressure_ratio=12.5");
    QVERIFY(document["compressor"]["pressure_ratio"].is_number());
    QCOMPARE(document["compressor"]["pressure_ratio"].get<double>(), 12.5);
    applySetOverride(document, "turbine.power_offtake_W=1.5e4");
    QCOMPARE(document["turbine"]["power_offtake_W"].get<double>(), 15000.0);
    applySetOverride(document, "flight.isa_offset_K=-7");
    QCOMPARE(document["flight"]["isa_offset_K"].get<double>(), -7.0);
    applySetOverride(document, "afterburner.enabled=true");
    QVERIFY(document["afterburner"]["enabled"] == json(true));
    applySetOverride(document, "gas_model.kind=constant-cp");
    QVERIFY(document["gas_model"]["kind"] == json("constant-cp"));
    applySetOverride(document, "title=Trade study: PR = 12.5");
    QVERIFY(document["title"] == json("Trade study: PR = 12.5"));
    applySetOverride(document, "version=1");
    QVERIFY(document["version"] == json(1));

    const Case parsed = parseCase(document);
    QCOMPARE(parsed.compressor.pressureRatio, 12.5);
    QVERIFY(parsed.afterburner.enabled);
    QVERIFY(std::holds_alternative<ConstantCpGasModel>(parsed.gasModel.model));
    QCOMPARE(std::get<StandardAtmosphereAmbient>(parsed.flight.ambient).isaOffset, -7.0);
  }

  void setReplacesTheOtherAlternatives() {
    json document = readJson(kSource + "/resources/demo/demo-turbojet.json");
    applySetOverride(document, "compressor.polytropic_efficiency=0.9");
    QVERIFY(!document["compressor"].contains("isentropic_efficiency"));
    applySetOverride(document, "design.required_net_thrust_N=3000");
    QVERIFY(!document["design"].contains("air_mass_flow_kg_per_s"));
    applySetOverride(document, "flight.ambient_temperature_K=250");
    applySetOverride(document, "flight.ambient_pressure_Pa=50000");
    QVERIFY(!document["flight"].contains("altitude_m"));
    QVERIFY(!document["flight"].contains("isa_offset_K"));
    applySetOverride(document, "nozzle.kind=convergent-divergent");
    applySetOverride(document, "nozzle.expansion=area-ratio");
    applySetOverride(document, "nozzle.exit_to_throat_area_ratio=1.4");
    const Case parsed = parseCase(document);
    QCOMPARE(parsed.compressor.efficiency, (Efficiency{EfficiencyBasis::Polytropic, 0.9}));
    QCOMPARE(std::get<NetThrustTarget>(parsed.design.target).netThrust, 3000.0);
    QCOMPARE(std::get<GivenAmbient>(parsed.flight.ambient), (GivenAmbient{250.0, 50000.0}));
    QCOMPARE(std::get<FixedAreaRatioNozzle>(parsed.nozzle.geometry).exitToThroatAreaRatio, 1.4);

    // Back to a convergent nozzle: the keys of the divergent part go with it.
    applySetOverride(document, "nozzle.kind=convergent");
    QVERIFY(!document["nozzle"].contains("expansion"));
    QVERIFY(!document["nozzle"].contains("exit_to_throat_area_ratio"));
    QVERIFY(std::holds_alternative<ConvergentNozzle>(parseCase(document).nozzle.geometry));
  }

  void setRejectsUnknownPathsAndBadValues() {
    json document = minimalDocument();
    const json before = document;
    const auto expectError = [&](const std::string& assignment, const std::string& where,
                                 const std::string& part) {
      try {
        applySetOverride(document, assignment);
        QFAIL(("no error for " + assignment).c_str());
      } catch (const cw::InvalidInput& e) {
        QCOMPARE(e.where(), where);
        QVERIFY2(std::string(e.what()).find(part) != std::string::npos, e.what());
      }
    };
    expectError("compresor.pressure_ratio=8", "compresor.pressure_ratio",
                "unknown case key (did you mean compressor.pressure_ratio?)");
    expectError("compressor.pressure_ration=8", "compressor.pressure_ration", "unknown case key");
    expectError("compressor.pressure_ratio.x=8", "compressor.pressure_ratio.x", "unknown case key");
    expectError("compressor=8", "compressor", "names a component object");
    expectError("compressor.pressure_ratio", "compressor.pressure_ratio", "expected path.to.key=VALUE");
    expectError("compressor.pressure_ratio=abc", "compressor.pressure_ratio",
                "expected a number, got \"abc\"");
    expectError("compressor.pressure_ratio=0,5", "compressor.pressure_ratio", "expected a number");
    expectError("compressor.pressure_ratio=", "compressor.pressure_ratio", "expected a number");
    expectError("compressor.pressure_ratio=nan", "compressor.pressure_ratio", "expected a number");
    expectError("afterburner.enabled=yes", "afterburner.enabled", "expected true or false");
    QVERIFY(document == before);

    // A choice's text is set as given; the reader names a bad one.
    applySetOverride(document, "nozzle.kind=conical");
    QVERIFY(hasProblemAt(problemsOf(document), "/nozzle/kind", "\"conical\" is not one of"));
  }

  // The temporaries of interrupted saves (".NAME.tmp-PID-N") of processes that have ended are
  // removed; a live writer's (this process's), other names and look-alikes are kept.
  void staleTemporariesOfEndedWritersAreRemoved() {
    const TemporaryFolder folder;
    const pid_t child = ::fork();
    if (child == 0) ::_exit(0);
    QVERIFY(child > 0);
    int status = 0;
    QCOMPARE(::waitpid(child, &status, 0), child);  // reaped: its pid names no process now
    const std::string dead = std::to_string(child), live = std::to_string(::getpid());
    const std::vector<std::string> names = {".case.json.tmp-" + dead + "-0",  ".case.json.tmp-" + live + "-3",
                                            ".other.json.tmp-" + dead + "-1", "case.json",
                                            ".case.json.tmp-" + dead + "-x",  "case.json.tmp-" + dead + "-0"};
    for (const std::string& name : names) std::ofstream(folder.path / name) << "{}";
    QCOMPARE(cw::io::removeStaleTemporaries(folder.path.string(), "case.json"), std::size_t(1));
    std::vector<std::string> expected = {".case.json.tmp-" + dead + "-x", ".case.json.tmp-" + live + "-3",
                                         ".other.json.tmp-" + dead + "-1", "case.json",
                                         "case.json.tmp-" + dead + "-0"};
    std::sort(expected.begin(), expected.end());
    QCOMPARE(folder.entries(), expected);
    QCOMPARE(cw::io::removeStaleTemporaries(folder.path.string()),
             std::size_t(1));  // any name: .other.json's
  }

  void atomicWriteLeavesNoTemporaryFile() {
    const TemporaryFolder folder;
    const std::string path = (folder.path / "case.json").string();
    cw::io::writeCaseFile(path, Case{});
    QCOMPARE(folder.entries(), std::vector<std::string>{"case.json"});
    ::chmod(path.c_str(), 0640);
    Case changed;
    changed.title = "second";
    cw::io::writeCaseFile(path, changed);
    QCOMPARE(folder.entries(), std::vector<std::string>{"case.json"});
    QCOMPARE(cw::io::readCaseFile(path).title, std::string("second"));
    struct stat status {};
    QCOMPARE(::stat(path.c_str(), &status), 0);
    QCOMPARE(status.st_mode & 0777, 0640u);  // the replaced file's permissions are kept
  }

  void failedWriteNamesThePathAndKeepsTheTarget() {
    const TemporaryFolder folder;
    // A folder that does not exist.
    const std::string nowhere = (folder.path / "no-such-folder" / "case.json").string();
    try {
      cw::io::writeCaseFile(nowhere, Case{});
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      QCOMPARE(e.where(), nowhere);
      QVERIFY(std::string(e.what()).find(nowhere + ": cannot write: ") == 0);
    }
    // A target that cannot be replaced (a folder with contents): the rename fails after the
    // temporary file was written; it must be gone and the target untouched.
    fs::create_directory(folder.path / "occupied.json");
    std::ofstream((folder.path / "occupied.json" / "inside").string()) << "keep";
    const std::string occupied = (folder.path / "occupied.json").string();
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, cw::io::writeCaseFile(occupied, Case{}));
    QCOMPARE(folder.entries(), std::vector<std::string>{"occupied.json"});
    QCOMPARE(readText((folder.path / "occupied.json" / "inside").string()), std::string("keep"));
  }

  void failedWriteKeepsTheExistingFile() {
    // The write itself fails (file-size limit: EFBIG, whoever runs the test) after the temporary
    // file was created: the existing case stays, and no temporary file is left.
    const TemporaryFolder folder;
    const std::string path = (folder.path / "kept.json").string();
    Case original;
    original.title = "original";
    cw::io::writeCaseFile(path, original);
    rlimit previous{};
    QCOMPARE(::getrlimit(RLIMIT_FSIZE, &previous), 0);
    const auto previousHandler = std::signal(SIGXFSZ, SIG_IGN);
    rlimit tiny = previous;
    tiny.rlim_cur = 16;
    QCOMPARE(::setrlimit(RLIMIT_FSIZE, &tiny), 0);
    bool thrown = false;
    try {
      cw::io::writeCaseFile(path, Case{});
    } catch (const cw::InvalidInput& e) {
      thrown = e.where() == path && std::string(e.what()).find(path + ": cannot write: ") == 0;
    }
    ::setrlimit(RLIMIT_FSIZE, &previous);
    std::signal(SIGXFSZ, previousHandler);
    QVERIFY(thrown);
    QCOMPARE(cw::io::readCaseFile(path).title, std::string("original"));
    QCOMPARE(folder.entries(), std::vector<std::string>{"kept.json"});
  }

  void unwritableFolderKeepsTheExistingFile() {
    // Permissions do not bind root.
    if (::geteuid() == 0) QSKIP("running as root: folder permissions cannot make a write fail");
    const TemporaryFolder folder;
    const std::string path = (folder.path / "kept.json").string();
    Case original;
    original.title = "original";
    cw::io::writeCaseFile(path, original);
    ::chmod(folder.path.c_str(), 0555);
    try {
      cw::io::writeCaseFile(path, Case{});
      QFAIL("no error");
    } catch (const cw::InvalidInput& e) {
      QCOMPARE(e.where(), path);
    }
    ::chmod(folder.path.c_str(), 0755);
    QCOMPARE(cw::io::readCaseFile(path).title, std::string("original"));
    QCOMPARE(folder.entries(), std::vector<std::string>{"kept.json"});
  }

  void everyNumericFieldRejectsValuesOutsideItsRange() {
    int fields = 0;
    for (const auto& [pointer, property] : schemaProperties()) {
      if (property.value("type", "") != "number") continue;
      ++fields;
      const bool lowClosed = property.contains("minimum");
      const bool highClosed = property.contains("maximum");
      const double low = property.value(lowClosed ? "minimum" : "exclusiveMinimum", 0.0);
      const double high = property.value(highClosed ? "maximum" : "exclusiveMaximum", 0.0);
      // Ranges print as messages do: shortest form, or 6 digits for a long one (5/3 as 1.66667).
      const std::string range = std::string(lowClosed ? "[" : "(") + cw::messageNumber(low) + ", " +
                                cw::messageNumber(high) + (highClosed ? "]" : ")");
      const double below = lowClosed ? low - 1e-9 * std::max(1.0, std::abs(low)) : low;
      const double above = highClosed ? high + 1e-9 * std::max(1.0, std::abs(high)) : high;
      for (const double value : {below, above}) {
        json document = documentFor(pointer);
        applySetOverride(document, dotted(pointer) + "=" + cw::formatNumber(value));
        const auto problems = problemsOf(document);
        const std::string context = pointer + " = " + cw::formatNumber(value) + describe(problems);
        QVERIFY2(problems.size() == 1, context.c_str());
        QVERIFY2(problems[0].path == pointer, context.c_str());
        QVERIFY2(problems[0].value == cw::formatNumber(value), context.c_str());
        QVERIFY2(problems[0].valid.rfind(range, 0) == 0, (context + "\n  expected range " + range).c_str());
      }
      // The closed ends themselves are valid.
      for (const auto& [closed, bound] : {std::pair{lowClosed, low}, std::pair{highClosed, high}}) {
        if (!closed) continue;
        json document = documentFor(pointer);
        applySetOverride(document, dotted(pointer) + "=" + cw::formatNumber(bound));
        const auto problems = problemsOf(document);
        QVERIFY2(problems.empty(), (pointer + " = " + cw::formatNumber(bound) + describe(problems)).c_str());
      }
    }
    QCOMPARE(fields,
             58);  // every numeric key of docs/case-format.md: 42 of version 1, 16 of the two-spool roles
  }

  void schemaAndParserKnowTheSameKeys() {
    std::vector<std::string> fromSchema;
    const json schema = readJson(kSource + "/docs/case-schema.json");
    for (const auto& [name, property] : schema["properties"].items()) {
      fromSchema.push_back("/" + name);
      if (property.value("type", "") == "object") {
        QVERIFY2(property.value("additionalProperties", true) == false, name.c_str());
        for (const auto& [key, inner] : property["properties"].items())
          fromSchema.push_back("/" + name + "/" + key);
      }
    }
    QVERIFY(schema.value("additionalProperties", true) == false);
    std::vector<std::string> fromParser = cw::io::knownCaseKeyPaths();
    std::sort(fromSchema.begin(), fromSchema.end());
    std::sort(fromParser.begin(), fromParser.end());
    QCOMPARE(fromSchema, fromParser);
  }

  void everySchemaKeyIsAcceptedAndItsDefaultIsTheParsersDefault() {
    for (const auto& [pointer, property] : schemaProperties()) {
      json document = documentFor(pointer);
      const json::json_pointer at(pointer);
      // A valid value of the key's type.
      const std::string type = property.value("type", "");
      json value;
      if (property.contains("const"))
        value = property["const"];
      else if (property.contains("default"))
        value = property["default"];
      else if (property.contains("enum"))
        value = property["enum"].front();
      else if (type == "number")
        value = property.contains("minimum")
                    ? property["minimum"].get<double>()
                    : 0.5 * (property.value("exclusiveMinimum", 0.0) +
                             property.value("maximum", property.value("exclusiveMaximum", 1.0)));
      else
        QFAIL((pointer + ": no sample value").c_str());
      applySetOverride(document,
                       dotted(pointer) + "=" + (value.is_string() ? value.get<std::string>() : value.dump()));
      const auto problems = problemsOf(document);
      QVERIFY2(problems.empty(), (pointer + describe(problems)).c_str());

      if (!property.contains("default")) continue;
      json withoutKey = documentFor(pointer);
      if (withoutKey.contains(at)) continue;  // required or set by a prerequisite
      const json written = cw::io::caseToJson(parseCase(withoutKey));
      QVERIFY2(written.contains(at), (pointer + ": not written").c_str());
      QVERIFY2(written[at] == property["default"], (pointer + ": default " + written[at].dump() +
                                                    " but the schema says " + property["default"].dump())
                                                       .c_str());
    }
  }
};

QTEST_APPLESS_MAIN(TestCaseFile)
#include "test_case_file.moc"
