#include "common/number_text.h"

#include "common/error.h"
#include "common/text.h"

#include <charconv>
#include <cmath>

namespace cw {

namespace {

std::string quoted(std::string_view text) {
  return "\"" + excerpt(text) + "\"";
}

/// True when the (syntactically valid) text has a negative decimal exponent: an underflow.
bool hasNegativeExponent(std::string_view text) {
  const auto e = text.find_first_of("eE");
  return e != std::string_view::npos && e + 1 < text.size() && text[e + 1] == '-';
}

}  // namespace

NumberText readNumber(std::string_view text) {
  if (!text.empty() && text.front() == '+') text.remove_prefix(1);
  if (text.empty() || text.front() == '+' || text.front() == ' ') return {0.0, NumberTextProblem::NotANumber};
  double value = 0.0;
  const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
  if (end != text.data() + text.size()) return {0.0, NumberTextProblem::NotANumber};
  if (ec == std::errc::result_out_of_range)
    return {0.0, hasNegativeExponent(text) ? NumberTextProblem::TooSmall : NumberTextProblem::TooLarge};
  if (ec != std::errc() || !std::isfinite(value)) return {0.0, NumberTextProblem::NotANumber};
  return {value, NumberTextProblem::None};
}

std::string numberProblemText(std::string_view text, NumberTextProblem problem) {
  switch (problem) {
    case NumberTextProblem::None:
      return "";
    case NumberTextProblem::NotANumber:
      return "expected a number, got " + quoted(text);
    case NumberTextProblem::TooLarge:
      return quoted(text) + " is too large (the largest magnitude is 1.8e308)";
    case NumberTextProblem::TooSmall:
      return quoted(text) + " is too close to zero (the smallest magnitude is 4.9e-324; write 0 for zero)";
  }
  return "";
}

double parseNumber(std::string_view text, const std::string& where) {
  const NumberText number = readNumber(text);
  if (number.problem != NumberTextProblem::None)
    throw InvalidInput(where, numberProblemText(text, number.problem));
  return number.value;
}

long long parseWholeNumber(std::string_view text, const std::string& where, long long minimum,
                           long long maximum) {
  long long value = 0;
  std::string_view digits = text;
  if (!digits.empty() && digits.front() == '+') digits.remove_prefix(1);
  const auto [end, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), value);
  if (ec != std::errc() || end != digits.data() + digits.size() || value < minimum || value > maximum)
    throw InvalidInput(where, "expected a whole number from " + std::to_string(minimum) + " to " +
                                  std::to_string(maximum) + ", got " + quoted(text));
  return value;
}

}  // namespace cw
