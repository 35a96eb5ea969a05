// Command-line overrides of case documents: applySetOverride (declared in io/case_file.h).
#include "common/error.h"
#include "common/number_text.h"
#include "common/text.h"
#include "io/case_file.h"
#include "io/case_keys.h"

#include <algorithm>
#include <charconv>

namespace cw::io {

using nlohmann::json;

namespace {

std::vector<std::string> split(const std::string& text, char separator) {
  std::vector<std::string> parts;
  std::string::size_type start = 0;
  while (true) {
    const auto end = text.find(separator, start);
    parts.push_back(text.substr(start, end == std::string::npos ? std::string::npos : end - start));
    if (end == std::string::npos) return parts;
    start = end + 1;
  }
}

std::string dotted(const CaseSection& section, std::string_view key) {
  return section.name.empty() ? std::string(key) : std::string(section.name) + "." + std::string(key);
}

std::string unknownPathMessage(const std::string& path) {
  std::vector<std::string> names;
  for (const CaseSection& section : caseSections())
    for (const CaseKey& key : section.keys) names.push_back(dotted(section, key.name));
  std::vector<std::string_view> views(names.begin(), names.end());
  const std::string suggestion = closestName(path, views);
  return "unknown case key" + (suggestion.empty() ? std::string() : " (did you mean " + suggestion + "?)");
}

json valueFor(const CaseKey& key, const std::string& path, const std::string& text) {
  switch (key.type) {
    case CaseKeyType::Number:
      return cw::parseNumber(text, path);
    case CaseKeyType::Integer: {
      long long value = 0;
      const auto [stop, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
      if (ec != std::errc() || stop != text.data() + text.size() || text.empty())
        throw InvalidInput(path, "expected an integer, got \"" + excerpt(text) + "\"");
      return value;
    }
    case CaseKeyType::Boolean:
      if (text == "true") return true;
      if (text == "false") return false;
      throw InvalidInput(path, "expected true or false, got \"" + excerpt(text) + "\"");
    case CaseKeyType::String:
    case CaseKeyType::Choice:
      return text;
  }
  return text;
}

/// After setting `name`, drop the keys it excludes: the other alternatives of its group, and
/// keys that apply only under another value of it (when it is a selector).
void dropExcluded(const CaseSection& section, std::string_view name, const json& value, json& object) {
  for (const CaseKeyGroup& group : section.groups) {
    for (const CaseAlternative& alternative : group.alternatives) {
      if (std::find(alternative.keys.begin(), alternative.keys.end(), name) == alternative.keys.end())
        continue;
      for (const CaseAlternative& other : group.alternatives)
        if (&other != &alternative)
          for (std::string_view key : other.keys) object.erase(std::string(key));
    }
  }
  const std::string valueText = value.is_string() ? value.get<std::string>() : value.dump();
  for (const CaseKey& key : section.keys)
    for (const CaseKeyCondition& condition : key.conditions)
      if (condition.selector == name && condition.value != valueText) object.erase(std::string(key.name));
}

/// Refuses a key of a role the document's architecture does not have.
void requireArchitecture(const CaseSection& section, const std::string& path, const json& document) {
  const engine::Architecture architecture = caseDocumentArchitecture(document);
  if (!section.architecture || *section.architecture == architecture) return;
  throw InvalidInput(path, "applies only when engine.architecture is \"" +
                               std::string(engine::architectureName(*section.architecture)) +
                               "\" (this case's is \"" + std::string(engine::architectureName(architecture)) +
                               "\"; set engine.architecture first)");
}

/// A key of a newer version than the document's: a version 1 document is a version 2 turbojet
/// as it stands, so it becomes version 2.
void raiseVersionFor(const CaseSection& section, std::string_view key, json& document) {
  const int version = caseDocumentVersion(document);
  const CaseSection* old = findCaseSection(section.name, version);
  if (old && old->find(key)) return;
  if (version < kCaseVersion && document.contains("version")) document["version"] = kCaseVersion;
}

/// After setting the architecture, drop the objects of the roles it does not have.
void dropOtherRoles(json& document) {
  const engine::Architecture architecture = caseDocumentArchitecture(document);
  for (const CaseSection& section : caseSections())
    if (section.architecture && *section.architecture != architecture)
      document.erase(std::string(section.name));
}

}  // namespace

void applySetOverride(json& document, const std::string& assignment) {
  if (const std::size_t bad = firstInvalidUtf8(assignment); bad != assignment.size())
    throw InvalidInput("--set " + excerpt(assignment), "is not valid UTF-8 text (byte " +
                                                           std::to_string(bad + 1) + " of " +
                                                           std::to_string(assignment.size()) + ")");
  const auto equals = assignment.find('=');
  if (equals == std::string::npos || equals == 0)
    throw InvalidInput(assignment, "expected path.to.key=VALUE, e.g. compressor.pressure_ratio=12");
  const std::string path = assignment.substr(0, equals);
  const std::string text = assignment.substr(equals + 1);
  if (!document.is_object()) throw InvalidInput(path, "the case document is not a JSON object");

  const std::vector<std::string> parts = split(path, '.');
  const CaseSection* section = nullptr;
  std::string keyName;
  if (parts.size() == 1) {
    section = &caseSections().front();
    keyName = parts[0];
  } else if (parts.size() == 2 && !parts[0].empty()) {
    section = findCaseSection(parts[0]);
    keyName = parts[1];
  }
  const CaseKey* key = section ? section->find(keyName) : nullptr;
  if (!key) {
    if (parts.size() == 1 && findCaseSection(parts[0]))
      throw InvalidInput(path, "names a component object, not a key (e.g. " + path + ".<key>)");
    throw InvalidInput(path, unknownPathMessage(path));
  }

  const json value = valueFor(*key, path, text);
  requireArchitecture(*section, path, document);
  raiseVersionFor(*section, keyName, document);
  json* object = &document;
  if (!section->name.empty()) {
    const std::string name(section->name);
    if (!document.contains(name)) document[name] = json::object();
    object = &document[name];
    if (!object->is_object()) throw InvalidInput(path, "\"" + name + "\" in the case is not an object");
  }
  (*object)[keyName] = value;
  dropExcluded(*section, keyName, value, *object);
  if (section->name == "engine" && keyName == "architecture") dropOtherRoles(document);
}

}  // namespace cw::io
