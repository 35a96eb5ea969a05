#include "common/error.h"

#include "common/text.h"

#include <charconv>
#include <cmath>

namespace cw {

Error::Error(ErrorCode code, std::string where, std::string message, ErrorDetail detail)
    : std::runtime_error(std::move(message)),
      code_(code),
      where_(std::move(where)),
      detail_(std::move(detail)) {}

// A where() longer than this (a user's huge unknown key) is cut in the message; where() keeps it all.
static constexpr std::size_t kWhereCharacters = 200;

static std::string rangeMessage(const std::string& where, double value, const std::string& unit,
                                const std::string& validRange) {
  std::string text = excerpt(where, kWhereCharacters) + " = " + messageNumber(value);
  if (!unit.empty()) text += " " + unit;
  return text + " is outside the valid range " + validRange;
}

static ErrorDetail rangeDetail(double value, const std::string& unit, const std::string& validRange) {
  return {kReasonOutsideRange, {}, {{value, unit}}, validRange};
}

InvalidInput::InvalidInput(std::string where, double value, std::string unit, std::string validRange)
    : Error(ErrorCode::InvalidInput, where, rangeMessage(where, value, unit, validRange),
            rangeDetail(value, unit, validRange)) {}

InvalidInput::InvalidInput(std::string where, std::string message, ErrorDetail detail)
    : Error(ErrorCode::InvalidInput, where, excerpt(where, kWhereCharacters) + ": " + message,
            std::move(detail)) {}

OutOfRange::OutOfRange(std::string where, std::string message, ErrorDetail detail)
    : Error(ErrorCode::OutOfRange, where, excerpt(where, kWhereCharacters) + ": " + message,
            std::move(detail)) {}

OutOfRange::OutOfRange(std::string where, double value, std::string unit, std::string validRange)
    : Error(ErrorCode::OutOfRange, where, rangeMessage(where, value, unit, validRange),
            rangeDetail(value, unit, validRange)) {}

NotConverged::NotConverged(std::string where, int iterations, double residual)
    : Error(ErrorCode::NotConverged, where,
            excerpt(where, kWhereCharacters) + ": solver did not converge after " +
                std::to_string(iterations) + " iterations (residual " + formatSignificant(residual) + ")",
            {kReasonNotConverged, {}, {{double(iterations), ""}, {residual, ""}}, {}}) {}

NoSolution::NoSolution(std::string where, std::string reason, ErrorDetail detail)
    : Error(ErrorCode::NoSolution, where, excerpt(where, kWhereCharacters) + ": no solution: " + reason,
            std::move(detail)) {}

std::string formatNumber(double value) {
  if (std::isnan(value)) return "NaN";
  if (std::isinf(value)) return value > 0 ? "infinity" : "-infinity";
  char buffer[32];
  auto [end, ec] = std::to_chars(buffer, buffer + sizeof buffer, value);
  if (ec != std::errc()) return "?";
  return std::string(buffer, end);
}

std::string messageNumber(double value) {
  const std::string shortest = formatNumber(value);
  int digits = 0;
  bool leading = true;
  for (char c : shortest) {
    if (c == 'e' || c == 'E') break;
    if (c < '0' || c > '9') continue;
    if (c == '0' && leading) continue;
    leading = false;
    ++digits;
  }
  return digits <= 12 ? shortest : formatSignificant(value, 6);
}

std::string formatSignificant(double value, int digits) {
  if (!std::isfinite(value)) return formatNumber(value);
  char buffer[64];
  auto [end, ec] = std::to_chars(buffer, buffer + sizeof buffer, value, std::chars_format::general, digits);
  if (ec != std::errc()) return "?";
  return std::string(buffer, end);
}

}  // namespace cw
