#include "common/error.h"

#include <charconv>
#include <cmath>

namespace cw {

Error::Error(ErrorCode code, std::string where, std::string message)
    : std::runtime_error(std::move(message)), code_(code), where_(std::move(where)) {}

static std::string rangeMessage(const std::string& where, double value, const std::string& unit,
                                const std::string& validRange) {
  std::string text = where + " = " + formatNumber(value);
  if (!unit.empty()) text += " " + unit;
  return text + " is outside the valid range " + validRange;
}

InvalidInput::InvalidInput(std::string where, double value, std::string unit, std::string validRange)
    : Error(ErrorCode::InvalidInput, where, rangeMessage(where, value, unit, validRange)) {}

InvalidInput::InvalidInput(std::string where, std::string message)
    : Error(ErrorCode::InvalidInput, where, where + ": " + message) {}

OutOfRange::OutOfRange(std::string where, double value, std::string unit, std::string validRange)
    : Error(ErrorCode::OutOfRange, where, rangeMessage(where, value, unit, validRange)) {}

NotConverged::NotConverged(std::string where, int iterations, double residual)
    : Error(ErrorCode::NotConverged, where,
            where + ": solver did not converge after " + std::to_string(iterations) +
                " iterations (residual " + formatNumber(residual) + ")") {}

NoSolution::NoSolution(std::string where, std::string reason)
    : Error(ErrorCode::NoSolution, where, where + ": no solution: " + reason) {}

std::string formatNumber(double value) {
  if (std::isnan(value)) return "NaN";
  if (std::isinf(value)) return value > 0 ? "infinity" : "-infinity";
  char buffer[32];
  auto [end, ec] = std::to_chars(buffer, buffer + sizeof buffer, value);
  if (ec != std::errc()) return "?";
  return std::string(buffer, end);
}

}  // namespace cw
