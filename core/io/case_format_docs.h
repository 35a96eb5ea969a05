#pragma once
// The case format's reference, generated from the registry of parameters
// (engine/parameter_registry.h): the JSON Schema (docs/case-schema.json) and the reference tables
// of docs/case-format.md (the blocks between "<!-- generated: NAME -->" and
// "<!-- end generated: NAME -->"). The CMake target case_format_docs writes them into docs/;
// tests/core/test_parameter_registry.cpp fails when the committed files differ.

#include <string>
#include <string_view>
#include <vector>

namespace cw::io {

/// The JSON Schema (draft 2020-12) of case files version 1, as the file's text.
std::string caseSchemaText();

/// A generated block of docs/case-format.md: its name and its text (Markdown, ending in a newline).
struct GeneratedBlock {
  std::string name;
  std::string text;
};

/// The blocks: "alternatives" (the "exactly one of" table), "conditions" (keys that depend on a
/// choice), "keys" (one table per object, then why the ranges are what they are).
std::vector<GeneratedBlock> caseFormatBlocks();

/// `document` with each generated block's text replaced by `blocks`; throws cw::InvalidInput
/// when a block's markers are missing.
std::string withGeneratedBlocks(const std::string& document, const std::vector<GeneratedBlock>& blocks);

}  // namespace cw::io
