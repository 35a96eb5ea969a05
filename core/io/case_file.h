#pragma once
// Case files: JSON documents of the format "cyclewright-case", versions 1 and 2
// (docs/case-format.md; JSON Schema in docs/case-schema.json). Version 2 names the engine's
// architecture (engine.architecture) and gives one object per component role; a version 1 file
// is read unchanged as a single-spool turbojet. The writer writes version 2.
//
// Reading reports every problem of a document at once, as one CaseValidationError whose
// problems each name their JSON path, the value found and the valid range or form:
// unknown keys, wrong JSON types, unknown choices, keys that do not apply to the chosen
// kind, "exactly one of" violations, missing required keys, values out of range, a wrong
// format or version. Missing optional objects and keys take the defaults of
// cw::engine::Case. Writing then reading a valid case gives the same case.

#include "engine/case_inputs.h"

#include <nlohmann/json.hpp>

#include <string>
#include <string_view>

namespace cw::io {

inline constexpr std::string_view kCaseFormat = "cyclewright-case";
/// The version written, and the newest read.
inline constexpr int kCaseVersion = 2;
/// The oldest version read.
inline constexpr int kOldestCaseVersion = 1;

/// The case a document describes; throws engine::CaseValidationError (where() = source, the
/// file the document came from, or "case").
engine::Case parseCase(const nlohmann::json& document, const std::string& source = "case");

/// The case a document describes, checked for structure only (unknown keys, types, choices,
/// applicability, "exactly one of", required keys; every problem as one CaseValidationError)
/// but not for value ranges: a trade study checks the ranges of each of its points on its own.
engine::Case parseCaseStructure(const nlohmann::json& document, const std::string& source = "case");

/// The case the text of a case file describes, checked as readCaseFile checks a file's text
/// (io/json_document.h: nesting, NUL bytes, anything after the document; duplicate keys; every
/// problem of parseCase); source names it in messages. For files held in memory (the GUI's
/// resources) and for the fuzz harness.
engine::Case parseCaseText(std::string_view text, const std::string& source);

/// Reads and parses a case file. A file that cannot be read or is not JSON throws
/// cw::InvalidInput naming the path; duplicate keys and every problem of parseCase throw
/// one engine::CaseValidationError (where() = the path).
engine::Case readCaseFile(const std::string& path);

/// Reads a case file's JSON document without interpreting it (for --set overrides before
/// parseCase). A file that cannot be read or is not JSON throws cw::InvalidInput naming the path;
/// keys given twice in one object throw engine::CaseValidationError (where() = the path).
nlohmann::json readCaseDocument(const std::string& path);

/// The document of a case: format, version, title, notes and every component object with
/// every key that applies to the case's choices (defaults included).
nlohmann::json caseToJson(const engine::Case& inputs);

/// Writes caseToJson(inputs), keys in the documented order, two-space indented, atomically:
/// a temporary file in the same folder is written, flushed and synced, then renamed over the
/// target (whose permissions it keeps). On failure throws cw::InvalidInput naming the path;
/// the target is left as it was and no temporary file is left behind. The case is written
/// as given, valid or not.
void writeCaseFile(const std::string& path, const engine::Case& inputs);

/// Applies one command-line override "path.to.key=VALUE" (e.g. "compressor.pressure_ratio=12")
/// to a case document before it is parsed. The path must name a key of the format (present
/// or not); an unknown path throws cw::InvalidInput naming it. VALUE is read by the key's
/// type: a number in the C locale ("1.5e6"; never "1,5"), true or false, or text for choices
/// and strings; a malformed number or boolean throws cw::InvalidInput. Setting one member of
/// an "exactly one of" group removes the others (compressor.polytropic_efficiency replaces
/// compressor.isentropic_efficiency); setting a kind removes the keys that do not apply to it.
void applySetOverride(nlohmann::json& document, const std::string& assignment);

}  // namespace cw::io
