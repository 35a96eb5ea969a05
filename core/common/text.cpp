#include "common/text.h"

#include <cstdint>

namespace cw {

namespace {

/// Length of the well-formed UTF-8 sequence starting at text[at], or 0 when it is not one
/// (RFC 3629, sec. 4: the byte ranges of the well-formed sequences).
std::size_t sequenceLength(std::string_view text, std::size_t at) {
  const auto byte = [&](std::size_t i) { return static_cast<std::uint8_t>(text[i]); };
  const std::uint8_t lead = byte(at);
  if (lead < 0x80) return 1;
  std::size_t length = 0;
  std::uint8_t low = 0x80, high = 0xBF;  // the range of the second byte
  if (lead >= 0xC2 && lead <= 0xDF) {
    length = 2;
  } else if (lead >= 0xE0 && lead <= 0xEF) {
    length = 3;
    if (lead == 0xE0) low = 0xA0;   // no overlong forms
    if (lead == 0xED) high = 0x9F;  // no surrogates
  } else if (lead >= 0xF0 && lead <= 0xF4) {
    length = 4;
    if (lead == 0xF0) low = 0x90;   // no overlong forms
    if (lead == 0xF4) high = 0x8F;  // nothing above U+10FFFF
  } else {
    return 0;
  }
  if (at + length > text.size()) return 0;
  if (byte(at + 1) < low || byte(at + 1) > high) return 0;
  for (std::size_t i = 2; i < length; ++i)
    if (byte(at + i) < 0x80 || byte(at + i) > 0xBF) return 0;
  return length;
}

void appendHex(std::string& out, const char* prefix, unsigned value, int digits) {
  static constexpr char kDigits[] = "0123456789ABCDEF";
  out += prefix;
  for (int shift = 4 * (digits - 1); shift >= 0; shift -= 4) out += kDigits[(value >> shift) & 0xF];
}

}  // namespace

std::size_t firstInvalidUtf8(std::string_view text) {
  for (std::size_t at = 0; at < text.size();) {
    const std::size_t length = sequenceLength(text, at);
    if (length == 0) return at;
    at += length;
  }
  return text.size();
}

bool isValidUtf8(std::string_view text) {
  return firstInvalidUtf8(text) == text.size();
}

std::string excerpt(std::string_view text, std::size_t maxCharacters) {
  std::string out;
  std::size_t characters = 0, at = 0;
  while (at < text.size()) {
    if (maxCharacters != 0 && characters == maxCharacters) {
      out += "... (" + std::to_string(text.size()) + " bytes)";
      return out;
    }
    const std::size_t length = sequenceLength(text, at);
    const auto lead = static_cast<unsigned char>(text[at]);
    if (length == 0)
      appendHex(out, "\\x", lead, 2);
    else if (lead < 0x20 || lead == 0x7F)
      appendHex(out, "\\u", lead, 4);
    else
      out.append(text.substr(at, length));
    at += length == 0 ? 1 : length;
    ++characters;
  }
  return out;
}

}  // namespace cw
