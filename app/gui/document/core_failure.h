#pragma once
// A failure of the core as the interface keeps and shows it. The core's errors carry a stable
// code, where they arose, a reason key, the numbers they quote (SI) and the valid range
// (cw::ErrorDetail, core/common/error.h); the interface writes its own sentence from those
// parts, translated, with the numbers in the display units at display precision, and falls back
// to the core's English text only for a reason it does not know.

#include "document/units.h"

#include "common/error.h"

#include <QString>

#include <optional>
#include <string>

namespace cw::gui {

/// The parts of a cw::Error, kept so that its text can be written again when the units change.
struct CoreFailure {
  ErrorCode code = ErrorCode::InvalidInput;
  std::string where;
  ErrorDetail detail;
  std::string message;  ///< the core's English what(): the fallback
  bool operator==(const CoreFailure&) const = default;
};

CoreFailure coreFailure(const Error& error);

/// The failure in the interface's language: a heading by its code ("No solution for these
/// inputs: ...") and the cause, with every number in the display units at display precision.
/// For a reason key this function does not know, the heading and the core's English text.
QString failureText(const CoreFailure& failure, const DisplayUnits& units);

/// True when failureText writes the failure's cause itself (its reason key is known).
bool isKnownReason(const std::string& reason);

/// The display quantity of an SI unit as the core writes it ("K", "Pa", "J/kg", "N", "kg/s",
/// "m", "m/s", "J/(kg K)"; Dimensionless for ""); none for a unit it does not know.
std::optional<Quantity> quantityOfUnit(const std::string& unit);

/// A valid range as the core writes it ("[200, 6000] K", "(0, inf) Pa", "[0, 5)"), its limits
/// in the display units of `quantity`; the text as given when it has another form.
QString displayRange(const std::string& coreRange, Quantity quantity, const DisplayUnits& units);

}  // namespace cw::gui
