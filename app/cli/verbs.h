#pragma once
// The verbs of cyclewright-cli. Each verb lives in its own verb_<name>.cpp and is
// listed once in verbs.cpp. A verb reads its arguments, calls the core, prints the
// result and returns; it throws cw::Error for bad input or a failed solve, and the
// dispatcher turns that into one line on stderr and an exit status.

#include "arguments.h"

#include <iosfwd>
#include <string>
#include <vector>

namespace cw::cli {

/// Exit statuses of cyclewright-cli (documented in --help and docs/cli.md).
enum ExitStatus : int {
  kExitOk = 0,
  kExitInvalidInput = 2,  ///< bad argument, out-of-range value, invalid case file
  kExitNoSolution = 3,    ///< no cycle (or no converged solution) exists for the inputs
};

struct Verb {
  std::string name;
  std::string summary;  ///< one line for the top-level --help
  std::string usage;    ///< e.g. "--gas NAME --temperature-K T [--pressure-Pa P]"
  std::vector<OptionSpec> options;
  int (*run)(const Arguments& args, std::ostream& out);
};

/// All verbs, in the order --help lists them.
const std::vector<Verb>& allVerbs();

/// Runs cyclewright-cli with argv-style words (without the program name).
/// Writes results to out and diagnostics to err; returns the exit status.
int runCommandLine(const std::vector<std::string>& words, std::ostream& out, std::ostream& err);

}  // namespace cw::cli
