#pragma once
// The verbs of cyclewright-cli. Each verb lives in its own verb_<name>.cpp and is
// listed once in verbs.cpp. A verb reads its arguments, calls the core, prints the
// result and returns; it throws cw::Error for bad input or a failed solve, and the
// dispatcher turns that into one line on stderr and an exit status.

#include "arguments.h"
#include "output.h"

#include <exception>
#include <iosfwd>
#include <string>
#include <vector>

namespace cw::cli {

/// Exit statuses of cyclewright-cli (documented in --help and docs/cli.md).
enum ExitStatus : int {
  kExitOk = 0,
  kExitInternal = 1,      ///< an internal error (out of memory, a bug): one line names it
  kExitInvalidInput = 2,  ///< bad argument, out-of-range value, invalid case file
  kExitNoSolution = 3,    ///< no cycle (or no converged solution) exists for the inputs
};

struct Verb {
  std::string name;
  std::string summary;  ///< one line for the top-level --help
  std::string usage;    ///< e.g. "--gas NAME --temperature-K T [--pressure-Pa P]", without --format
  std::vector<OptionSpec> options;  ///< without --format, which the dispatcher adds from `formats`
  std::vector<Format> formats;      ///< the output formats the verb writes; the first is the default
  std::string formatHelp;           ///< what each format holds, e.g. "csv (the station table)"
  int (*run)(const Arguments& args, Format format, std::ostream& out);
};

/// All verbs, in the order --help lists them.
const std::vector<Verb>& allVerbs();

/// Runs cyclewright-cli with argv-style words (without the program name).
/// Writes results to out and diagnostics to err; returns the exit status. Nothing escapes it.
int runCommandLine(const std::vector<std::string>& words, std::ostream& out, std::ostream& err);

/// Reports a failure of a verb on err in one line ("cyclewright-cli VERB: ...") and returns its
/// exit status: cw::Error by its code (2 invalid input or out of range, 3 no solution or not
/// converged), std::bad_alloc "out of memory" and anything else "internal error: ..." with 1.
int reportFailure(std::exception_ptr failure, const std::string& verb, std::ostream& err);

}  // namespace cw::cli
