#pragma once
// Reading the JSON documents Cyclewright takes in (case files today): the file's bytes and the
// parse, both hardened against hostile input. Every problem is a cw::InvalidInput naming the
// file (or source) and saying what is wrong in one line; nothing recurses or allocates without
// a bound, nothing blocks on a FIFO, and no exception of the JSON library passes through.

#include <nlohmann/json.hpp>

#include <cstddef>
#include <string>
#include <string_view>

namespace cw::io {

/// The largest document file read: 4 MiB (a case file is a few kB).
inline constexpr std::size_t kMaxDocumentBytes = std::size_t{4} << 20;
/// The deepest nesting of arrays and objects a document may have (a case file uses 2).
inline constexpr int kMaxDocumentNesting = 16;

/// The bytes of a document file. Refuses, as cw::InvalidInput(path, "cannot read <kind>: ..."),
/// a path that is missing or unreadable, anything that is not a regular file (a folder, a FIFO,
/// a device, a socket; a FIFO is never waited on), a file larger than kMaxDocumentBytes, and read
/// errors. kind names the document in messages, e.g. "case file".
std::string readDocumentFile(const std::string& path, std::string_view kind);

/// Parses text as exactly one JSON document. Before any recursion over it, refuses a NUL byte and
/// nesting deeper than kMaxDocumentNesting (naming line and column); then every error of the JSON
/// library (syntax, anything after the document, a number beyond the range of a double, invalid
/// UTF-8) becomes cw::InvalidInput(where, "not valid JSON: ..."), its quoted text cut to a short,
/// well-formed excerpt. callback is passed to the parser (e.g. to find duplicate keys).
nlohmann::json parseDocumentText(std::string_view text, const std::string& where,
                                 const nlohmann::json::parser_callback_t& callback = nullptr);

/// A JSON value as short, well-formed text for messages (at most about 60 characters).
std::string shortJson(const nlohmann::json& value);

}  // namespace cw::io
