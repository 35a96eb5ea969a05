#pragma once
// Output of the command line: one flat record of named values, printed as JSON
// (--format json) or as aligned plain text. Keys carry their SI unit in the name
// (e.g. "T_K", "p_Pa"); numbers print in the C locale with round-trip precision.

#include <nlohmann/json.hpp>

#include <iosfwd>
#include <string>
#include <vector>

namespace cw::cli {

enum class Format { Text, Json, Csv };

/// "text", "json" or "csv".
std::string formatName(Format format);

/// The format named by text among those a verb writes; throws InvalidInput naming --format and
/// the verb's formats otherwise.
Format parseFormat(const std::string& text, const std::vector<Format>& formats);

/// Prints a JSON object: pretty JSON, or "key  value" lines for text (nested objects flattened with '.').
void printRecord(std::ostream& out, const nlohmann::json& record, Format format);

}  // namespace cw::cli
