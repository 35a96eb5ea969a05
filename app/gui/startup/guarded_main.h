#pragma once
// The work of main() with no exception escaping it: each becomes one line on stderr and an exit
// status, as cyclewright-cli reports its errors.

#include <functional>
#include <ostream>

namespace cw::gui {

/// Runs `work` and returns its status; an exception that escapes it is written to `err` as one
/// line and gives the status: cw::Error with code InvalidInput or OutOfRange "cyclewright:
/// <what>", 2; std::bad_alloc "cyclewright: out of memory", 1; any other exception
/// "cyclewright: internal error: <what>", 1.
int runGuarded(const std::function<int()>& work, std::ostream& err);

}  // namespace cw::gui
