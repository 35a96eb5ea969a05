// Writing case files: caseToJson and writeCaseFile (declared in io/case_file.h).
#include "io/atomic_file.h"
#include "io/case_file.h"
#include "io/case_keys.h"

#include "engine/parameter_registry.h"

namespace cw::io {

using nlohmann::json;
using namespace cw::engine;

namespace {

/// The parameter's value in the case, as the file writes it.
json valueOf(const Parameter& p, const Case& inputs) {
  switch (p.kind) {
    case ParameterKind::Number:
      return p.get(inputs);
    case ParameterKind::Flag:
      return p.get(inputs) > 0.5;
    case ParameterKind::Text:
      return p.getText(inputs);
    case ParameterKind::Choice:
      return std::string(p.choices.at(static_cast<std::size_t>(p.get(inputs) + 0.5)).value);
  }
  return nullptr;
}

/// The document with its keys in the order of the format's key table.
nlohmann::ordered_json ordered(const json& document) {
  nlohmann::ordered_json result = nlohmann::ordered_json::object();
  const CaseSection& top = caseSections().front();
  for (const CaseKey& key : top.keys)
    if (document.contains(std::string(key.name)))
      result[std::string(key.name)] = document[std::string(key.name)];
  for (const CaseSection& section : caseSections()) {
    const std::string name(section.name);
    if (name.empty() || !document.contains(name)) continue;
    nlohmann::ordered_json object = nlohmann::ordered_json::object();
    for (const CaseKey& key : section.keys)
      if (document[name].contains(std::string(key.name)))
        object[std::string(key.name)] = document[name][std::string(key.name)];
    result[name] = std::move(object);
  }
  return result;
}

}  // namespace

json caseToJson(const Case& inputs) {
  // Every key of the newest version that applies to the case (defaults included; the roles of
  // its architecture), from the registry.
  json d = json::object();
  d["format"] = std::string(kCaseFormat);
  d["version"] = kCaseVersion;
  for (const Parameter& p : parameterRegistry()) {
    if (!p.inFile || !p.applies(inputs)) continue;
    json& object = p.section.empty() ? d : d[std::string(p.section)];
    object[std::string(p.key)] = valueOf(p, inputs);
  }
  return d;
}

void writeCaseFile(const std::string& path, const Case& inputs) {
  writeFileAtomically(path, ordered(caseToJson(inputs)).dump(2) + "\n");
}

}  // namespace cw::io
