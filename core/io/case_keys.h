#pragma once
// The keys of the case-file format (docs/case-format.md, docs/case-schema.json) as the reader
// sees them: which keys each object takes, their JSON types, the choices of choice keys, the
// keys that apply only under a choice, and the "exactly one of" groups. Derived from the
// registry of parameters (engine/parameter_registry.h), plus the document's own keys (format,
// version). The reader (unknown keys, types, applicability), the writer (key order) and --set
// overrides (known paths) all work from it. Each version of the format has its table: version 1
// (the single-spool turbojet) and version 2 (adds the engine object with the architecture, and the
// two-spool roles); the objects of a role apply only to their architecture.

#include "engine/parameter_registry.h"
#include "io/case_file.h"

#include <nlohmann/json.hpp>

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace cw::io {

enum class CaseKeyType { Number, Integer, Boolean, String, Choice };

/// A key applies only while another key of the same object has a given value.
using CaseKeyCondition = engine::KeyCondition;

struct CaseKey {
  std::string_view name;
  CaseKeyType type;
  std::vector<std::string_view> choices;     ///< for Choice keys; the first is the default
  std::vector<CaseKeyCondition> conditions;  ///< all must hold for the key to apply
};

/// One alternative of an "exactly one of" group: its keys, of which `required` must be given.
struct CaseAlternative {
  std::vector<std::string_view> keys;
  std::vector<std::string_view> required;
};

/// Keys of at most one alternative may be given; if `required`, exactly one alternative must be.
struct CaseKeyGroup {
  std::vector<CaseAlternative> alternatives;
  bool required = false;
};

/// A component object of the case ("" for the document's top level).
struct CaseSection {
  std::string_view name;
  bool required = false;                             ///< the object must be present
  std::optional<engine::Architecture> architecture;  ///< a role: only this architecture has it
  std::vector<CaseKey> keys;                         ///< in the order the writer uses
  std::vector<std::string_view> requiredKeys;
  std::vector<CaseKeyGroup> groups;

  const CaseKey* find(std::string_view key) const;
};

/// The top level first, then the component objects in the order of the file, of `version`
/// (kOldestCaseVersion to kCaseVersion, case_file.h).
const std::vector<CaseSection>& caseSections(int version = kCaseVersion);

/// The section called name in `version`, or nullptr.
const CaseSection* findCaseSection(std::string_view name, int version = kCaseVersion);

/// The version a case document says it is, when it is one this build reads; else the newest.
int caseDocumentVersion(const nlohmann::json& document);

/// The architecture a case document gives (engine.architecture), when it is a known one; else a
/// single-spool turbojet (version 1 files, and version 2 files without it).
engine::Architecture caseDocumentArchitecture(const nlohmann::json& document);

/// Every key the newest format knows, as JSON pointers ("/format", "/compressor/pressure_ratio", ...).
std::vector<std::string> knownCaseKeyPaths();

/// The known name closest to `name` (at most two edits away), or "" if none is that close.
std::string closestName(std::string_view name, const std::vector<std::string_view>& candidates);

}  // namespace cw::io
