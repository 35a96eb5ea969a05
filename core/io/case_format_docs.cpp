#include "io/case_format_docs.h"

#include "common/error.h"
#include "engine/parameter_registry.h"
#include "io/case_file.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <map>

namespace cw::io {

using engine::Parameter;
using engine::ParameterKind;
using engine::ParameterSection;
using json = nlohmann::ordered_json;

namespace {

/// Every section of the newest version (a version 1 file has those of version 1).
std::vector<const ParameterSection*> sectionsOfVersion() {
  std::vector<const ParameterSection*> sections;
  for (const ParameterSection& s : engine::parameterSections())
    if (s.sinceVersion <= kCaseVersion) sections.push_back(&s);
  return sections;
}

/// The parameters of a section that are keys of the file.
std::vector<const Parameter*> keysOf(std::string_view section) {
  std::vector<const Parameter*> keys;
  for (const Parameter& p : engine::parameterRegistry())
    if (p.section == section && p.inFile && p.sinceVersion <= kCaseVersion) keys.push_back(&p);
  return keys;
}

/// The group choices of a section (choices the file gives by which keys are present).
std::vector<const Parameter*> groupsOf(std::string_view section) {
  std::vector<const Parameter*> groups;
  for (const Parameter& p : engine::parameterRegistry())
    if (p.section == section && !p.inFile && p.sinceVersion <= kCaseVersion) groups.push_back(&p);
  return groups;
}

std::vector<const Parameter*> membersOf(const Parameter& group, int alternative) {
  std::vector<const Parameter*> members;
  for (const Parameter* p : keysOf(group.section))
    if (p->group == group.key && p->alternative == alternative) members.push_back(p);
  return members;
}

/// A number as the documents write it: messageNumber's form with a short exponent (2e5, 4.3e7).
std::string docNumber(double value) {
  std::string text = messageNumber(value);
  const std::size_t e = text.find('e');
  if (e == std::string::npos) return text;
  std::string exponent = text.substr(e + 1);
  const bool negative = !exponent.empty() && exponent.front() == '-';
  if (!exponent.empty() && (exponent.front() == '+' || exponent.front() == '-')) exponent.erase(0, 1);
  while (exponent.size() > 1 && exponent.front() == '0') exponent.erase(0, 1);
  return text.substr(0, e) + "e" + (negative ? "-" : "") + exponent;
}

std::string docRange(const engine::ValidRange& range) {
  return std::string(range.lowClosed ? "[" : "(") + docNumber(range.low) + ", " + docNumber(range.high) +
         (range.highClosed ? "]" : ")");
}

std::string code(std::string_view text) {
  return "`" + std::string(text) + "`";
}

std::string join(const std::vector<std::string>& parts, std::string_view separator) {
  std::string text;
  for (const std::string& part : parts) text += (text.empty() ? "" : std::string(separator)) + part;
  return text;
}

/// The default as JSON (only for entries that have one).
json defaultOf(const Parameter& p) {
  switch (p.kind) {
    case ParameterKind::Number:
      return p.defaultValue;
    case ParameterKind::Flag:
      return p.defaultValue > 0.5;
    case ParameterKind::Choice:
      return std::string(p.choices.at(static_cast<std::size_t>(p.defaultValue)).value);
    case ParameterKind::Text:
      return "";
  }
  return nullptr;
}

// ---------------------------------------------------------------------------------------------
// The schema

json propertyOf(const Parameter& p) {
  json o = json::object();
  std::string description(p.toolTip);
  switch (p.kind) {
    case ParameterKind::Number: {
      o["type"] = "number";
      o[p.range.lowClosed ? "minimum" : "exclusiveMinimum"] = p.range.low;
      o[p.range.highClosed ? "maximum" : "exclusiveMaximum"] = p.range.high;
      const std::string_view unit = engine::siUnit(p.quantity);
      if (!unit.empty()) description += " Unit: " + std::string(unit) + ".";
      break;
    }
    case ParameterKind::Flag:
      o["type"] = "boolean";
      break;
    case ParameterKind::Text:
      o["type"] = "string";
      break;
    case ParameterKind::Choice: {
      o["type"] = "string";
      json values = json::array();
      for (const engine::ParameterChoice& choice : p.choices) values.push_back(std::string(choice.value));
      o["enum"] = values;
      break;
    }
  }
  if (p.hasDefault) o["default"] = defaultOf(p);
  if (p.required) description += " Required.";
  o["description"] = description;
  return o;
}

/// "if selector is value then ... else these keys are not allowed", one per condition.
void addConditions(const std::vector<const Parameter*>& keys, json& constraints) {
  std::vector<engine::KeyCondition> conditions;
  for (const Parameter* p : keys)
    for (const engine::KeyCondition& c : p->conditions)
      if (std::none_of(conditions.begin(), conditions.end(), [&c](const engine::KeyCondition& d) {
            return d.selector == c.selector && d.value == c.value;
          }))
        conditions.push_back(c);
  for (const engine::KeyCondition& c : conditions) {
    json forbidden = json::object();
    for (const Parameter* p : keys)
      for (const engine::KeyCondition& d : p->conditions)
        if (d.selector == c.selector && d.value == c.value) forbidden[std::string(p->key)] = false;
    json rule = json::object();
    rule["if"] = {{"properties", {{std::string(c.selector), {{"const", std::string(c.value)}}}}},
                  {"required", {std::string(c.selector)}}};
    rule["else"] = {{"properties", forbidden}};
    constraints.push_back(rule);
  }
}

void addGroups(std::string_view section, json& constraints) {
  for (const Parameter* group : groupsOf(section)) {
    if (group->groupRequired) {
      json alternatives = json::array();
      for (int i = 0; i < int(group->choices.size()); ++i) {
        json alternative = json::object();
        json required = json::array();
        for (const Parameter* p : membersOf(*group, i))
          if (p->requiredInAlternative) required.push_back(std::string(p->key));
        alternative["required"] = required;
        json others = json::object();
        for (int j = 0; j < int(group->choices.size()); ++j)
          if (j != i)
            for (const Parameter* p : membersOf(*group, j)) others[std::string(p->key)] = false;
        if (!others.empty()) alternative["properties"] = others;
        alternatives.push_back(alternative);
      }
      constraints.push_back({{"oneOf", alternatives}});
    } else {
      // At most one: no two alternatives' keys together.
      json together = json::array();
      for (int i = 0; i < int(group->choices.size()); ++i)
        together.push_back(std::string(membersOf(*group, i).front()->key));
      constraints.push_back({{"not", {{"required", together}}}});
    }
  }
}

/// The named validation rule that the schema can state: neglect_fuel_mass only for the simple
/// gas models (engine/case_validation.cpp). The hot gas's bounds by the cold gas's cannot be
/// stated without comparing two values, which JSON Schema does not do.
void addRules(std::string_view section, json& constraints) {
  if (section != "gas_model") return;
  constraints.push_back(
      {{"if",
        {{"properties", {{"neglect_fuel_mass", {{"const", true}}}}}, {"required", {"neglect_fuel_mass"}}}},
       {"then",
        {{"required", {"kind"}}, {"properties", {{"kind", {{"enum", {"constant-cp", "two-gamma"}}}}}}}}});
}

/// The narrower ranges (the altitude's when not geometric).
void addNarrowerRanges(const std::vector<const Parameter*>& keys, json& constraints) {
  for (const Parameter* p : keys) {
    if (!p->narrower) continue;
    const engine::KeyCondition& c = p->narrower->unless;
    const json value = c.value == "true"    ? json(true)
                       : c.value == "false" ? json(false)
                                            : json(std::string(c.value));
    json range = json::object();
    range[p->narrower->range.lowClosed ? "minimum" : "exclusiveMinimum"] = p->narrower->range.low;
    range[p->narrower->range.highClosed ? "maximum" : "exclusiveMaximum"] = p->narrower->range.high;
    constraints.push_back({{"if",
                            {{"properties", {{std::string(c.selector), {{"const", value}}}}},
                             {"required", {std::string(c.selector)}}}},
                           {"else", {{"properties", {{std::string(p->key), range}}}}}});
  }
}

json sectionSchema(const ParameterSection& s) {
  const std::vector<const Parameter*> keys = keysOf(s.name);
  json o = json::object();
  o["type"] = "object";
  o["additionalProperties"] = false;
  o["description"] = std::string(s.description);
  json properties = json::object();
  json required = json::array();
  for (const Parameter* p : keys) {
    properties[std::string(p->key)] = propertyOf(*p);
    if (p->required) required.push_back(std::string(p->key));
  }
  o["properties"] = properties;
  if (!required.empty()) o["required"] = required;
  json constraints = json::array();
  addGroups(s.name, constraints);
  addNarrowerRanges(keys, constraints);
  addConditions(keys, constraints);
  addRules(s.name, constraints);
  if (constraints.size() == 1)
    for (const auto& [key, value] : constraints.front().items()) o[key] = value;
  else if (!constraints.empty())
    o["allOf"] = constraints;
  return o;
}

// ---------------------------------------------------------------------------------------------
// The tables

std::string rangeText(const Parameter& p) {
  switch (p.kind) {
    case ParameterKind::Number: {
      std::string text = docRange(p.range);
      if (p.narrower)
        text += " when " + code(p.narrower->unless.selector) + " is " + code(p.narrower->unless.value) +
                ", else " + docRange(p.narrower->range);
      if (!p.rangeNote.empty()) text += ", " + std::string(p.rangeNote);
      return text;
    }
    case ParameterKind::Flag:
      return "true, false";
    case ParameterKind::Text:
      return "text";
    case ParameterKind::Choice: {
      std::vector<std::string> values;
      for (const engine::ParameterChoice& choice : p.choices) values.push_back(code(choice.value));
      return join(values, ", ");
    }
  }
  return {};
}

std::string typeText(ParameterKind kind) {
  switch (kind) {
    case ParameterKind::Number:
      return "number";
    case ParameterKind::Flag:
      return "boolean";
    case ParameterKind::Text:
      return "string";
    case ParameterKind::Choice:
      return "choice";
  }
  return {};
}

std::string defaultText(const Parameter& p) {
  if (!p.hasDefault) return "—";
  const json value = defaultOf(p);
  if (p.kind == ParameterKind::Number) return code(docNumber(p.defaultValue));
  return code(value.dump());
}

std::string keysTable(const ParameterSection& s) {
  std::string text = "### " + code(s.name) + "\n\n" + std::string(s.description);
  if (s.sinceVersion > 1) text += " Version " + std::to_string(s.sinceVersion) + " only.";
  if (s.architecture)
    text += " Only when `engine.architecture` is " + code(engine::architectureName(*s.architecture)) +
            (s.sinceVersion > 1 ? "" : " (always in a version 1 file)") + ".";
  for (const Parameter* group : groupsOf(s.name)) {
    if (group->groupRequired) continue;
    const Parameter& first = *membersOf(*group, 0).front();
    std::vector<std::string> keys;
    for (int i = 0; i < int(group->choices.size()); ++i)
      keys.push_back(code(membersOf(*group, i).front()->key));
    text += " At most one of " + join(keys, " or ") + " (default: " + code(first.key) + " " +
            docNumber(first.defaultValue) + ").";
  }
  text += "\n\n";
  text += "| key | type | unit | default | valid |\n| --- | --- | --- | --- | --- |\n";
  for (const Parameter* p : keysOf(s.name)) {
    const std::string_view unit = engine::siUnit(p->quantity);
    text += "| " + code(p->key) + " | " + typeText(p->kind) + " | " +
            (p->kind == ParameterKind::Number && !unit.empty() ? std::string(unit) : "–") + " | " +
            defaultText(*p) + " | " + rangeText(*p) + " |\n";
  }
  return text + "\n";
}

std::string alternativeText(const Parameter& group, int i) {
  const std::vector<const Parameter*> members = membersOf(group, i);
  std::vector<std::string> required, optional;
  for (const Parameter* p : members) (p->requiredInAlternative ? required : optional).push_back(code(p->key));
  if (required.empty() && !optional.empty()) {
    required.push_back(optional.front());
    optional.erase(optional.begin());
  }
  std::string text = join(required, " with ");
  if (!optional.empty()) text += " (with optional " + join(optional, ", ") + ")";
  return text;
}

std::string alternativesBlock() {
  std::string text = "| object | alternatives | when none is given |\n| --- | --- | --- |\n";
  for (const ParameterSection* s : sectionsOfVersion()) {
    for (const Parameter* group : groupsOf(s->name)) {
      std::vector<std::string> alternatives;
      for (int i = 0; i < int(group->choices.size()); ++i) alternatives.push_back(alternativeText(*group, i));
      std::string none = "error: one is required";
      if (!group->groupRequired) {
        const Parameter& first = *membersOf(*group, 0).front();
        none = code(first.key) + " " + docNumber(first.defaultValue);
      }
      text += "| " + code(s->name) + " | " + join(alternatives, " **or** ") + " | " + none + " |\n";
    }
  }
  return text;
}

std::string conditionsBlock() {
  // One row per condition, with every key it governs.
  std::vector<std::pair<std::string, std::vector<std::string>>> rows;
  for (const ParameterSection* s : sectionsOfVersion()) {
    for (const Parameter* p : keysOf(s->name)) {
      if (p->conditions.empty()) continue;
      std::vector<std::string> conditions;
      for (const engine::KeyCondition& c : p->conditions)
        conditions.push_back(code(std::string(s->name) + "." + std::string(c.selector)) + " is " +
                             code(c.value));
      const std::string when = join(conditions, " and ");
      auto row = std::find_if(rows.begin(), rows.end(), [&when](const auto& r) { return r.first == when; });
      if (row == rows.end()) row = rows.insert(rows.end(), {when, {}});
      row->second.push_back(code(p->dottedPath()));
    }
  }
  std::string text = "| key | applies only when |\n| --- | --- |\n";
  for (const auto& [when, keys] : rows) text += "| " + join(keys, ", ") + " | " + when + " |\n";
  return text;
}

std::string reasonsText() {
  // One line per reason, with the keys (and their ranges) it explains, in file order.
  std::vector<std::string_view> reasons;
  std::map<std::string_view, std::vector<std::string>> keys;
  for (const ParameterSection* s : sectionsOfVersion()) {
    for (const Parameter* p : keysOf(s->name)) {
      if (p->kind != ParameterKind::Number) continue;
      if (!keys.count(p->rangeReason)) reasons.push_back(p->rangeReason);
      const std::string entry = code(p->key) + " " + docRange(p->range);
      std::vector<std::string>& list = keys[p->rangeReason];
      if (std::find(list.begin(), list.end(), entry) == list.end()) list.push_back(entry);
    }
  }
  std::string text = "Why these ranges:\n\n";
  for (std::string_view reason : reasons)
    text += "- " + join(keys[reason], ", ") + ": " + std::string(reason) + ".\n";
  return text;
}

std::string keysBlock() {
  std::string text;
  for (const ParameterSection* s : sectionsOfVersion())
    if (!s->name.empty()) text += keysTable(*s);
  return text + reasonsText();
}

/// "if the case is of architecture a": its engine.architecture is a (for the default architecture,
/// also when the file does not say).
json architectureIs(const Parameter& entry, std::size_t a) {
  const std::string value(entry.choices.at(a).value);
  json given = {
      {"required", {"engine"}},
      {"properties",
       {{"engine",
         {{"required", {"architecture"}}, {"properties", {{"architecture", {{"const", value}}}}}}}}}};
  if (a != static_cast<std::size_t>(entry.defaultValue)) return given;
  json notOther = {{"properties", {{"engine", {{"properties", {{"architecture", {{"const", value}}}}}}}}}};
  return notOther;
}

/// The document's rules across objects: a version 1 file has no key of version 2, and the
/// objects of a role apply only to their architecture.
json documentRules() {
  json rules = json::array();
  json newer = json::object();
  for (const ParameterSection* s : sectionsOfVersion())
    if (s->sinceVersion > kOldestCaseVersion && !s->name.empty()) newer[std::string(s->name)] = false;
  for (const Parameter* p : keysOf(""))
    if (p->sinceVersion > kOldestCaseVersion) newer[std::string(p->key)] = false;
  rules.push_back({{"if", {{"properties", {{"version", {{"const", kOldestCaseVersion}}}}}}},
                   {"then", {{"properties", newer}}}});
  const Parameter& architecture = *engine::findParameter("engine", "architecture");
  for (std::size_t a = 0; a < architecture.choices.size(); ++a) {
    json others = json::object();
    for (const ParameterSection* s : sectionsOfVersion())
      if (s->architecture && static_cast<std::size_t>(*s->architecture) != a)
        others[std::string(s->name)] = false;
    rules.push_back({{"if", architectureIs(architecture, a)}, {"then", {{"properties", others}}}});
  }
  return rules;
}

}  // namespace

std::string caseSchemaText() {
  json schema = json::object();
  schema["$schema"] = "https://json-schema.org/draft/2020-12/schema";
  schema["$id"] = "https://cyclewright.invalid/schemas/case-v2.json";
  schema["title"] = "Cyclewright case, format cyclewright-case versions 1 and 2";
  schema["description"] =
      "One design-point case of a turbojet, single-spool or two-spool. Version 2 names the architecture "
      "(engine.architecture) and has one object per component role; version 1 is a single-spool turbojet "
      "without the engine object. SI units; every dimensional key carries its unit in "
      "its name. Documented in docs/case-format.md; generated from the registry of parameters "
      "(core/engine/parameter_registry.cpp) by the target case_format_docs.";
  schema["type"] = "object";
  schema["additionalProperties"] = false;
  json required = {"format", "version"};
  json properties = json::object();
  properties["format"] = {{"const", std::string(kCaseFormat)},
                          {"description", "Always \"cyclewright-case\"."}};
  properties["version"] = {
      {"enum", {kOldestCaseVersion, kCaseVersion}},
      {"description",
       "Format version: 1 (a single-spool turbojet) or 2 (any architecture; written by this build)."}};
  for (const ParameterSection* s : sectionsOfVersion()) {
    if (s->name.empty()) {
      for (const Parameter* p : keysOf("")) properties[std::string(p->key)] = propertyOf(*p);
      continue;
    }
    properties[std::string(s->name)] = sectionSchema(*s);
    if (s->required) required.push_back(std::string(s->name));
  }
  schema["required"] = required;
  schema["properties"] = properties;
  schema["allOf"] = documentRules();
  return schema.dump(2) + "\n";
}

std::vector<GeneratedBlock> caseFormatBlocks() {
  return {{"alternatives", alternativesBlock()}, {"conditions", conditionsBlock()}, {"keys", keysBlock()}};
}

std::string withGeneratedBlocks(const std::string& document, const std::vector<GeneratedBlock>& blocks) {
  std::string text = document;
  for (const GeneratedBlock& block : blocks) {
    const std::string begin = "<!-- generated: " + block.name + " -->\n";
    const std::string end = "<!-- end generated: " + block.name + " -->";
    const std::size_t from = text.find(begin);
    const std::size_t to = from == std::string::npos ? from : text.find(end, from);
    if (to == std::string::npos)
      throw InvalidInput("docs/case-format.md",
                         "no generated block \"" + block.name + "\" (markers " + begin + " and " + end + ")");
    text.replace(from + begin.size(), to - from - begin.size(), block.text);
  }
  return text;
}

}  // namespace cw::io
