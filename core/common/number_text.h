#pragma once
// Numbers typed by a user (command-line options, --set values): read in the C locale, whole
// text only, and every way of being wrong told apart, so that a message can say what was
// expected ("expected a number", "too large") rather than that a value is out of range.

#include <string>
#include <string_view>

namespace cw {

enum class NumberTextProblem {
  None,
  NotANumber,  ///< empty, other characters, "1,5", "inf", "nan"
  TooLarge,    ///< beyond the largest finite double, e.g. 1e400
  TooSmall,    ///< not zero, but below the smallest positive double, e.g. 1e-400
};

struct NumberText {
  double value = 0.0;
  NumberTextProblem problem = NumberTextProblem::None;
};

/// Reads the whole text as a finite number in the C locale ("1.5e6", "+2", "-0.25"; never "1,5",
/// " 1", "inf", "nan" or "0x10").
NumberText readNumber(std::string_view text);

/// "expected a number, got \"abc\"", "\"1e400\" is too large (largest magnitude 1.8e308)" or
/// "\"1e-400\" is too close to zero (smallest magnitude 4.9e-324; write 0 for zero)"; the text
/// is quoted as an excerpt (common/text.h).
std::string numberProblemText(std::string_view text, NumberTextProblem problem);

/// The number the text holds; throws cw::InvalidInput(where, numberProblemText(...)) otherwise.
double parseNumber(std::string_view text, const std::string& where);

/// A whole number in [minimum, maximum]; throws cw::InvalidInput(where, "expected a whole number
/// from MIN to MAX, got \"TEXT\"") for anything else (1.5, abc, 1e400, 300 with a maximum of 256).
long long parseWholeNumber(std::string_view text, const std::string& where, long long minimum,
                           long long maximum);

}  // namespace cw
