#include "io/case_keys.h"

#include "engine/parameter_registry.h"

#include <algorithm>
#include <cstdint>
#include <numeric>

namespace cw::io {

namespace {

using engine::Parameter;
using engine::ParameterKind;
using T = CaseKeyType;

CaseKey keyOf(const Parameter& p) {
  CaseKey key{p.key, T::Number, {}, p.conditions};
  switch (p.kind) {
    case ParameterKind::Number:
      key.type = T::Number;
      break;
    case ParameterKind::Flag:
      key.type = T::Boolean;
      break;
    case ParameterKind::Text:
      key.type = T::String;
      break;
    case ParameterKind::Choice:
      key.type = T::Choice;
      for (const engine::ParameterChoice& choice : p.choices) key.choices.push_back(choice.value);
      break;
  }
  return key;
}

/// The "exactly one of" group a group choice (a choice the file gives by its keys) stands for.
CaseKeyGroup groupOf(const Parameter& choice, const std::vector<const Parameter*>& section) {
  CaseKeyGroup group{std::vector<CaseAlternative>(choice.choices.size()), choice.groupRequired};
  for (const Parameter* p : section) {
    if (p->group != choice.key || p->alternative < 0) continue;
    CaseAlternative& alternative = group.alternatives[static_cast<std::size_t>(p->alternative)];
    alternative.keys.push_back(p->key);
    if (p->requiredInAlternative) alternative.required.push_back(p->key);
  }
  // An alternative without required keys is chosen by its first key.
  for (CaseAlternative& alternative : group.alternatives)
    if (alternative.required.empty() && !alternative.keys.empty())
      alternative.required.push_back(alternative.keys.front());
  return group;
}

/// The format's objects of `version`, from the registry of parameters.
std::vector<CaseSection> makeSections(int version) {
  std::vector<CaseSection> sections;
  for (const engine::ParameterSection& s : engine::parameterSections()) {
    if (s.sinceVersion > version) continue;
    std::vector<const Parameter*> parameters;
    for (const Parameter& p : engine::parameterRegistry())
      if (p.section == s.name && p.sinceVersion <= version) parameters.push_back(&p);
    CaseSection section{s.name, s.required, s.architecture, {}, {}, {}};
    if (s.name.empty()) {
      // The document's own keys, before the case's.
      section.keys = {{"format", T::String, {}, {}}, {"version", T::Integer, {}, {}}};
      section.requiredKeys = {"format", "version"};
    }
    for (const Parameter* p : parameters) {
      if (p->inFile) section.keys.push_back(keyOf(*p));
      if (p->inFile && p->required) section.requiredKeys.push_back(p->key);
      if (!p->inFile && p->kind == ParameterKind::Choice) section.groups.push_back(groupOf(*p, parameters));
    }
    sections.push_back(std::move(section));
  }
  return sections;
}

}  // namespace

const CaseKey* CaseSection::find(std::string_view key) const {
  for (const CaseKey& k : keys)
    if (k.name == key) return &k;
  return nullptr;
}

const std::vector<CaseSection>& caseSections(int version) {
  static const std::vector<std::vector<CaseSection>> versions = [] {
    std::vector<std::vector<CaseSection>> list;
    for (int v = kOldestCaseVersion; v <= kCaseVersion; ++v) list.push_back(makeSections(v));
    return list;
  }();
  const int index = std::clamp(version, kOldestCaseVersion, kCaseVersion) - kOldestCaseVersion;
  return versions[static_cast<std::size_t>(index)];
}

const CaseSection* findCaseSection(std::string_view name, int version) {
  for (const CaseSection& s : caseSections(version))
    if (s.name == name) return &s;
  return nullptr;
}

int caseDocumentVersion(const nlohmann::json& document) {
  if (document.is_object()) {
    const auto it = document.find("version");
    if (it != document.end() && it->is_number_integer()) {
      const auto version = it->get<std::int64_t>();
      if (version >= kOldestCaseVersion && version <= kCaseVersion) return static_cast<int>(version);
    }
  }
  return kCaseVersion;
}

engine::Architecture caseDocumentArchitecture(const nlohmann::json& document) {
  if (caseDocumentVersion(document) < 2 || !document.is_object()) return engine::Architecture::Turbojet;
  const auto engine = document.find("engine");
  if (engine == document.end() || !engine->is_object()) return engine::Architecture::Turbojet;
  const auto value = engine->find("architecture");
  if (value == engine->end() || !value->is_string()) return engine::Architecture::Turbojet;
  const engine::Parameter& entry = *engine::findParameter("engine", "architecture");
  for (std::size_t i = 0; i < entry.choices.size(); ++i)
    if (entry.choices[i].value == value->get<std::string>()) return static_cast<engine::Architecture>(i);
  return engine::Architecture::Turbojet;
}

std::vector<std::string> knownCaseKeyPaths() {
  std::vector<std::string> paths;
  for (const CaseSection& s : caseSections()) {
    if (!s.name.empty()) paths.push_back("/" + std::string(s.name));
    for (const CaseKey& k : s.keys)
      paths.push_back((s.name.empty() ? "" : "/" + std::string(s.name)) + "/" + std::string(k.name));
  }
  return paths;
}

static std::size_t editDistance(std::string_view a, std::string_view b) {
  std::vector<std::size_t> row(b.size() + 1);
  std::iota(row.begin(), row.end(), std::size_t{0});
  for (std::size_t i = 1; i <= a.size(); ++i) {
    std::size_t diagonal = row[0];
    row[0] = i;
    for (std::size_t j = 1; j <= b.size(); ++j) {
      const std::size_t above = row[j];
      row[j] = std::min({row[j] + 1, row[j - 1] + 1, diagonal + (a[i - 1] == b[j - 1] ? 0 : 1)});
      diagonal = above;
    }
  }
  return row[b.size()];
}

std::string closestName(std::string_view name, const std::vector<std::string_view>& candidates) {
  std::string best;
  std::size_t bestDistance = 3;
  for (std::string_view candidate : candidates) {
    // At most two edits apart means at most two characters longer or shorter: skip the rest
    // unmeasured (a megabyte-long unknown key must not cost a megabyte times every name).
    const std::size_t longer = std::max(name.size(), candidate.size());
    if (longer - std::min(name.size(), candidate.size()) >= bestDistance) continue;
    const std::size_t d = editDistance(name, candidate);
    if (d < bestDistance) {
      bestDistance = d;
      best = candidate;
    }
  }
  return best;
}

}  // namespace cw::io
