#pragma once
// User text quoted in messages: only well-formed UTF-8 reaches a message, and never more than a
// short excerpt of it, so that a hostile key or value (a megabyte of text, a stray 0xFF byte)
// cannot make a message huge, invalid or cut inside a multi-byte character.

#include <cstddef>
#include <string>
#include <string_view>

namespace cw {

/// Characters (code points) of user text that a message quotes by default.
inline constexpr std::size_t kExcerptCharacters = 48;

/// True when text is well-formed UTF-8 (RFC 3629: shortest forms only, no surrogates, at most U+10FFFF).
bool isValidUtf8(std::string_view text);

/// The byte offset of the first byte that is not part of well-formed UTF-8, or text.size().
std::size_t firstInvalidUtf8(std::string_view text);

/// Text for a message: well-formed characters as they are, every other byte as \xHH and control
/// characters as \uXXXX; after maxCharacters characters it is cut at a character boundary and
/// ends "... (N bytes)". A maxCharacters of 0 never cuts.
std::string excerpt(std::string_view text, std::size_t maxCharacters = kExcerptCharacters);

}  // namespace cw
