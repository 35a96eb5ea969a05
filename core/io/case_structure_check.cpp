#include "io/case_structure_check.h"

#include "common/text.h"
#include "io/case_file.h"
#include "io/case_keys.h"
#include "io/json_document.h"

#include <algorithm>

namespace cw::io {

using nlohmann::json;

namespace {

std::string escapePointerToken(std::string_view token) {
  std::string escaped;
  for (char c : token) {
    if (c == '~')
      escaped += "~0";
    else if (c == '/')
      escaped += "~1";
    else
      escaped += c;
  }
  return escaped;
}

std::string joinNames(const std::vector<std::string_view>& names, std::string_view separator) {
  std::string text;
  for (std::string_view name : names) {
    if (!text.empty()) text += separator;
    text += name;
  }
  return text;
}

std::string expected(const CaseKey& key) {
  switch (key.type) {
    case CaseKeyType::Number:
      return "a number";
    case CaseKeyType::Integer:
      return "an integer";
    case CaseKeyType::Boolean:
      return "true or false";
    case CaseKeyType::String:
      return "a string";
    case CaseKeyType::Choice:
      return "one of: " + joinNames(key.choices, ", ");
  }
  return "";
}

bool hasType(const json& value, CaseKeyType type) {
  switch (type) {
    case CaseKeyType::Number:
      return value.is_number();
    case CaseKeyType::Integer:
      return value.is_number_integer();
    case CaseKeyType::Boolean:
      return value.is_boolean();
    case CaseKeyType::String:
    case CaseKeyType::Choice:
      return value.is_string();
  }
  return false;
}

/// The value a selector has in the clean object, or its default when absent.
std::string selectorValue(const CaseSection& section, const json& clean, std::string_view selector) {
  const std::string name(selector);
  if (clean.contains(name)) {
    const json& v = clean[name];
    return v.is_string() ? v.get<std::string>() : v.dump();
  }
  const CaseKey* key = section.find(selector);
  if (key && key->type == CaseKeyType::Choice && !key->choices.empty())
    return std::string(key->choices.front());
  return "false";
}

}  // namespace

std::string casePointer(std::string_view section, std::string_view key) {
  std::string pointer;
  if (!section.empty()) pointer = "/" + escapePointerToken(section);
  if (!key.empty()) pointer += "/" + escapePointerToken(key);
  return pointer;
}

CaseStructureCheck::CaseStructureCheck(const json& document) {
  if (!document.is_object()) {
    add("", shortJson(document), "an object", "expected a JSON object, got " + shortJson(document));
    return;
  }
  checkTopLevel(document);
}

void CaseStructureCheck::add(std::string path, std::string value, std::string valid,
                             const std::string& message) {
  const std::string line = (path.empty() ? std::string("the case document") : excerpt(path)) + ": " + message;
  problems_.push_back({std::move(path), std::move(value), std::move(valid), line});
}

void CaseStructureCheck::checkTopLevel(const json& document) {
  // The document's version chooses the table of keys (a version this build does not read is
  // checked against the newest, so that its other problems are reported too); the architecture
  // chooses the component roles that apply.
  const int version = caseDocumentVersion(document);
  const engine::Architecture architecture = caseDocumentArchitecture(document);
  const std::vector<CaseSection>& sections = caseSections(version);
  const CaseSection& top = sections.front();
  std::vector<std::string_view> topNames;
  for (const CaseKey& key : top.keys) topNames.push_back(key.name);
  for (const CaseSection& section : sections)
    if (!section.name.empty() && (!section.architecture || *section.architecture == architecture))
      topNames.push_back(section.name);

  for (const auto& [name, value] : document.items()) {
    const CaseSection* section = name.empty() ? nullptr : findCaseSection(name, version);
    if (top.find(name)) {
      if (checkValue(top, name, value)) clean_[name] = value;
    } else if (section && section->architecture && *section->architecture != architecture) {
      add(casePointer(name, ""), "", "",
          "applies only when engine.architecture is \"" +
              std::string(engine::architectureName(*section->architecture)) + "\" (this case's is \"" +
              std::string(engine::architectureName(architecture)) + "\")");
    } else if (section) {
      json clean = json::object();
      checkSection(*section, value, clean);
      if (value.is_object()) clean_[name] = std::move(clean);
    } else if (!name.empty() && findCaseSection(name, kCaseVersion)) {
      add(casePointer("", name), "", "",
          "belongs to version " + std::to_string(kCaseVersion) + " of the format (this file is version " +
              std::to_string(version) + ")");
    } else {
      const std::string suggestion = closestName(name, topNames);
      add(casePointer("", name), "", "",
          "unknown key" + (suggestion.empty() ? std::string() : " (did you mean \"" + suggestion + "\"?)"));
    }
  }

  for (std::string_view key : top.requiredKeys)
    if (!document.contains(std::string(key))) add(casePointer("", key), "", "required", "required");
  for (const CaseSection& section : sections)
    if (section.required && !section.name.empty() && !document.contains(std::string(section.name)))
      add(casePointer(section.name, ""), "", "required", "required");

  if (clean_.contains("format") && clean_["format"] != std::string(kCaseFormat)) {
    add("/format", shortJson(clean_["format"]), "\"" + std::string(kCaseFormat) + "\"",
        shortJson(clean_["format"]) + " is not a Cyclewright case format (expected \"" +
            std::string(kCaseFormat) + "\")");
    clean_.erase("format");
  }
  if (clean_.contains("version") &&
      (clean_["version"] < kOldestCaseVersion || clean_["version"] > kCaseVersion)) {
    const std::string versions = std::to_string(kOldestCaseVersion) + " and " + std::to_string(kCaseVersion);
    add("/version", shortJson(clean_["version"]), versions,
        "unsupported version " + shortJson(clean_["version"]) + " (this build reads versions " + versions +
            ")");
    clean_.erase("version");
  }
}

bool CaseStructureCheck::checkValue(const CaseSection& section, const std::string& name, const json& value) {
  const CaseKey& key = *section.find(name);
  const std::string path = casePointer(section.name, name);
  if (!hasType(value, key.type)) {
    add(path, shortJson(value), expected(key), "expected " + expected(key) + ", got " + shortJson(value));
    return false;
  }
  if (key.type == CaseKeyType::Choice &&
      std::find(key.choices.begin(), key.choices.end(), value.get<std::string>()) == key.choices.end()) {
    add(path, shortJson(value), expected(key), shortJson(value) + " is not " + expected(key));
    return false;
  }
  return true;
}

void CaseStructureCheck::checkSection(const CaseSection& section, const json& object, json& clean) {
  const std::string base = casePointer(section.name, "");
  if (!object.is_object()) {
    add(base, shortJson(object), "an object", "expected an object, got " + shortJson(object));
    return;
  }
  std::vector<std::string_view> names;
  for (const CaseKey& key : section.keys) names.push_back(key.name);
  for (const auto& [name, value] : object.items()) {
    if (!section.find(name)) {
      const std::string suggestion = closestName(name, names);
      add(casePointer(section.name, name), "", "",
          "unknown key" + (suggestion.empty() ? std::string() : " (did you mean \"" + suggestion + "\"?)"));
    } else if (checkValue(section, name, value)) {
      clean[name] = value;
    }
  }
  for (std::string_view key : section.requiredKeys)
    if (!object.contains(std::string(key))) add(casePointer(section.name, key), "", "required", "required");
  checkConditions(section, clean);
  checkGroups(section, object, clean);
}

void CaseStructureCheck::checkConditions(const CaseSection& section, json& clean) {
  for (const CaseKey& key : section.keys) {
    const std::string name(key.name);
    if (!clean.contains(name)) continue;
    for (const CaseKeyCondition& condition : key.conditions) {
      if (selectorValue(section, clean, condition.selector) == condition.value) continue;
      add(casePointer(section.name, name), shortJson(clean[name]), "",
          "applies only when " + std::string(condition.selector) + " is \"" + std::string(condition.value) +
              "\"");
      clean.erase(name);
      break;
    }
  }
}

void CaseStructureCheck::checkGroups(const CaseSection& section, const json& object, json& clean) {
  const std::string base = casePointer(section.name, "");
  for (const CaseKeyGroup& group : section.groups) {
    std::vector<std::string_view> given;  // the first given key of each alternative given
    const CaseAlternative* chosen = nullptr;
    for (const CaseAlternative& alternative : group.alternatives) {
      for (std::string_view key : alternative.keys) {
        if (object.contains(std::string(key))) {
          given.push_back(key);
          chosen = &alternative;
          break;
        }
      }
    }
    if (given.size() > 1) {
      add(base, "", "exactly one of the alternatives",
          joinNames(given, " and ") + " exclude each other; give only one");
      for (const CaseAlternative& alternative : group.alternatives)
        for (std::string_view key : alternative.keys) clean.erase(std::string(key));
    } else if (given.empty() && group.required) {
      std::vector<std::string> options;
      for (const CaseAlternative& alternative : group.alternatives)
        options.push_back(joinNames(alternative.required, " with "));
      std::string text;
      for (const std::string& option : options) text += (text.empty() ? "" : " or ") + option;
      add(base, "", "exactly one of the alternatives", "exactly one of " + text + " is required");
    } else if (chosen) {
      for (std::string_view key : chosen->required) {
        if (object.contains(std::string(key))) continue;
        add(casePointer(section.name, key), "", "required", "required with " + std::string(given.front()));
        for (std::string_view k : chosen->keys) clean.erase(std::string(k));
      }
    }
  }
}

}  // namespace cw::io
