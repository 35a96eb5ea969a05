#pragma once
// Errors of the Cyclewright core.
//
// Every error carries a stable code (for the GUI to translate), where it was raised
// (the input's name or JSON path), the offending value and the valid range, so that
// a message can name all three. The core never formats for display beyond the
// English what() text used by the command line.

#include <stdexcept>
#include <string>
#include <vector>

namespace cw {

enum class ErrorCode {
  InvalidInput,  ///< a value outside its valid range, an unknown name, a malformed file
  OutOfRange,    ///< a property asked outside the range of the underlying data
  NotConverged,  ///< an iterative solver did not reach its tolerance
  NoSolution,    ///< the inputs admit no physical solution (e.g. turbine cannot drive compressor)
};

/// One number an error quotes: SI, with its SI unit as the message writes it ("K", "Pa", "J/kg",
/// "N"; empty for a pure number).
struct ErrorQuantity {
  double value = 0.0;
  std::string unit;
  bool operator==(const ErrorQuantity&) const = default;
};

/// The parts of an error's message, for a front end that writes its own (translated, in its
/// units). `reason` is a stable key of the cause (one of the kReason constants below); empty
/// when only the English message says it.
struct ErrorDetail {
  std::string reason;
  /// What `quantities` and `validRange` concern when that is not where(): e.g. "temperature"
  /// inside the component where() names. Empty: where().
  std::string subject;
  /// The numbers the message quotes, in its order, SI.
  std::vector<ErrorQuantity> quantities;
  /// The valid range as the message gives it, SI ("[200, 6000] K", "(0, 1]"); empty when none.
  std::string validRange;
  bool operator==(const ErrorDetail&) const = default;
};

/// The stable reasons and the quantities each quotes, in order. The range constructors below set
/// the first two; the others are set where they are thrown. A front end that knows a key writes
/// its own message from the parts; for any other it falls back to what().
inline constexpr const char* kReasonOutsideRange = "outside_range";  ///< value; validRange
inline constexpr const char* kReasonNotConverged = "not_converged";  ///< iterations, residual
/// A component met a state beyond the gas data: subject, value and validRange of the state.
inline constexpr const char* kReasonBeyondGasData = "beyond_gas_data";
/// The engine-face Mach number cannot be reached: subject, value and validRange of the cause.
inline constexpr const char* kReasonEngineFaceState = "engine_face_state";
inline constexpr const char* kReasonTurbineCannotDrive = "turbine_cannot_drive_compressor";  ///< work, T4
inline constexpr const char* kReasonTurbineExpansion = "turbine_expansion_beyond_gas_data";  ///< work
inline constexpr const char* kReasonTurbineNoExitPressure = "turbine_no_exit_pressure";      ///< work
inline constexpr const char* kReasonNoOxygenLeft = "no_oxygen_left";                         ///< f
inline constexpr const char* kReasonExitBelowEntry = "exit_temperature_below_entry";         ///< T
inline constexpr const char* kReasonRichBeyondStoichiometric = "beyond_stoichiometric";      ///< T, f_st
inline constexpr const char* kReasonFuelAirAboveStoichiometric =
    "fuel_air_above_stoichiometric";                                                 ///< f, f_st
inline constexpr const char* kReasonOnlyHeats = "exit_temperature_not_above_entry";  ///< T, T_entry
inline constexpr const char* kReasonNozzleBelowGasData = "nozzle_below_gas_data";    ///< A9/A8, T_min
inline constexpr const char* kReasonNozzleShockAtExit = "nozzle_shock_at_exit";      ///< p0, p_shock, A9/A8
inline constexpr const char* kReasonNozzleNoJet = "nozzle_no_jet";                   ///< pt7, p0
inline constexpr const char* kReasonNozzleJetTooSlow = "nozzle_jet_too_slow";        ///< C_v
inline constexpr const char* kReasonNozzleNotChoked = "nozzle_not_choked";           ///< none
inline constexpr const char* kReasonThrustNotPositive = "thrust_not_positive";       ///< F_N
inline constexpr const char* kReasonResultNotFinite = "result_not_finite";           ///< none
inline constexpr const char* kReasonNoBracket = "no_bracket";                        ///< lo, hi
inline constexpr const char* kReasonFunctionNotFinite = "function_not_finite";       ///< x
inline constexpr const char* kReasonNewtonStopped = "newton_stopped";                ///< iterations, residual
inline constexpr const char* kReasonNormalShock = "normal_shock";                    ///< none

class Error : public std::runtime_error {
 public:
  Error(ErrorCode code, std::string where, std::string message, ErrorDetail detail = {});

  ErrorCode code() const noexcept { return code_; }
  /// The input, argument or JSON path the error concerns.
  const std::string& where() const noexcept { return where_; }
  /// The message's parts: its reason key, the numbers it quotes (SI) and the valid range.
  const ErrorDetail& detail() const noexcept { return detail_; }

 private:
  ErrorCode code_;
  std::string where_;
  ErrorDetail detail_;
};

/// A value outside its valid range: "<where> = <value> <unit> is outside the valid range <range>".
class InvalidInput : public Error {
 public:
  InvalidInput(std::string where, double value, std::string unit, std::string validRange);
  /// An input that is not a number (unknown name, wrong type): "<where>: <message>".
  InvalidInput(std::string where, std::string message, ErrorDetail detail = {});
};

/// A property asked outside the range of its data (e.g. a temperature beyond the polynomials).
class OutOfRange : public Error {
 public:
  OutOfRange(std::string where, double value, std::string unit, std::string validRange);
  /// A state beyond the data found on the way (e.g. in a component): "<where>: <message>".
  OutOfRange(std::string where, std::string message, ErrorDetail detail = {});
};

/// An iterative solver that stopped short of its tolerance.
class NotConverged : public Error {
 public:
  NotConverged(std::string where, int iterations, double residual);
};

/// Inputs that admit no physical solution; the message says why. `detail` gives the reason's
/// stable key and the numbers the reason quotes, in its order.
class NoSolution : public Error {
 public:
  NoSolution(std::string where, std::string reason, ErrorDetail detail = {});
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
