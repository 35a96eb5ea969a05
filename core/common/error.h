#pragma once
// Errors of the Cyclewright core.
//
// Every error carries a stable code (for the GUI to translate), where it was raised
// (the input's name or JSON path), the offending value and the valid range, so that
// a message can name all three. The core never formats for display beyond the
// English what() text used by the command line.

#include <stdexcept>
#include <string>

namespace cw {

enum class ErrorCode {
  InvalidInput,  ///< a value outside its valid range, an unknown name, a malformed file
  OutOfRange,    ///< a property asked outside the range of the underlying data
  NotConverged,  ///< an iterative solver did not reach its tolerance
  NoSolution,    ///< the inputs admit no physical solution (e.g. turbine cannot drive compressor)
};

class Error : public std::runtime_error {
 public:
  Error(ErrorCode code, std::string where, std::string message);

  ErrorCode code() const noexcept { return code_; }
  /// The input, argument or JSON path the error concerns.
  const std::string& where() const noexcept { return where_; }

 private:
  ErrorCode code_;
  std::string where_;
};

/// A value outside its valid range: "<where> = <value> <unit> is outside the valid range <range>".
class InvalidInput : public Error {
 public:
  InvalidInput(std::string where, double value, std::string unit, std::string validRange);
  /// An input that is not a number (unknown name, wrong type): "<where>: <message>".
  InvalidInput(std::string where, std::string message);
};

/// A property asked outside the range of its data (e.g. a temperature beyond the polynomials).
class OutOfRange : public Error {
 public:
  OutOfRange(std::string where, double value, std::string unit, std::string validRange);
  /// A state beyond the data found on the way (e.g. in a component): "<where>: <message>".
  OutOfRange(std::string where, std::string message);
};

/// An iterative solver that stopped short of its tolerance.
class NotConverged : public Error {
 public:
  NotConverged(std::string where, int iterations, double residual);
};

/// Inputs that admit no physical solution; the message says why.
class NoSolution : public Error {
 public:
  NoSolution(std::string where, std::string reason);
};

/// Formats a double for messages: shortest form that round-trips, no locale. For values the user
/// gave (so that a message quotes them exactly).
std::string formatNumber(double value);

/// Formats a double for a message: its shortest round-trip form when that has at most 12
/// significant digits (every value a user types), else 6 significant digits (a computed value:
/// 15442.25285167574 -> "15442.3"). Every number in an error message goes through this.
std::string messageNumber(double value);

/// Formats a computed double for messages to `digits` significant digits (default 6), no
/// locale, no trailing zeros: 412345.678901 -> "412346", 0.000123456789 -> "0.000123457".
std::string formatSignificant(double value, int digits = 6);

}  // namespace cw
