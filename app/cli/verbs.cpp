#include "verbs.h"

#include "common/error.h"
#include "common/version.h"

#include <algorithm>
#include <ostream>

namespace cw::cli {

// Each verb_<name>.cpp defines one of these.
// (Add a verb: declare its factory here and list it in allVerbs().)
Verb atmosphereVerb();
Verb flowVerb();
Verb evaluateVerb();
Verb propertiesVerb();
Verb auditVerb();
Verb sweepVerb();

const std::vector<Verb>& allVerbs() {
  static const std::vector<Verb> verbs = {atmosphereVerb(), flowVerb(),  evaluateVerb(),
                                          auditVerb(),      sweepVerb(), propertiesVerb()};
  return verbs;
}

static void printTopHelp(std::ostream& out) {
  out << "Usage: cyclewright-cli VERB [OPTIONS]\n"
         "       cyclewright-cli --version | --help\n"
         "\n"
         "Gas-turbine cycle calculations from the Cyclewright core. SI units throughout;\n"
         "output keys carry their unit in the name. Add --format json for JSON.\n"
         "\n"
         "Verbs:\n";
  for (const auto& verb : allVerbs())
    out << "  " << verb.name << std::string(14 - std::min<std::size_t>(13, verb.name.size()), ' ')
        << verb.summary << '\n';
  if (allVerbs().empty()) out << "  (none yet)\n";
  out << "\n"
         "Run 'cyclewright-cli VERB --help' for a verb's options.\n"
         "\n"
         "Exit status: 0 success, 2 invalid input (one line on stderr names the argument,\n"
         "the value and the valid range), 3 no solution for the inputs (for sweep: no point\n"
         "has a cycle), 130 a sweep stopped by Ctrl+C (the points run are written).\n"
         "\n"
      << kCaution << '\n';
}

static void printVerbHelp(std::ostream& out, const Verb& verb) {
  out << "Usage: cyclewright-cli " << verb.name << ' ' << verb.usage << "\n\n"
      << verb.summary << "\n\nOptions:\n";
  for (const auto& option : verb.options)
    out << "  --" << option.name << (option.takesValue ? " VALUE" : "") << "\n      " << option.help << '\n';
  out << "  --help\n      show this help\n";
}

int runCommandLine(const std::vector<std::string>& words, std::ostream& out, std::ostream& err) {
  if (words.empty() || words[0] == "--help" || words[0] == "-h" || words[0] == "help") {
    printTopHelp(out);
    return words.empty() ? kExitInvalidInput : kExitOk;
  }
  if (words[0] == "--version") {
    out << "cyclewright-cli " << kVersion << '\n';
    return kExitOk;
  }
  const Verb* verb = nullptr;
  for (const auto& v : allVerbs())
    if (v.name == words[0]) verb = &v;
  if (!verb) {
    err << "cyclewright-cli: unknown verb '" << words[0] << "' (see cyclewright-cli --help)\n";
    return kExitInvalidInput;
  }
  std::vector<std::string> rest(words.begin() + 1, words.end());
  for (const auto& word : rest) {
    if (word == "--help" || word == "-h") {
      printVerbHelp(out, *verb);
      return kExitOk;
    }
  }
  try {
    Arguments args(rest, verb->options);
    return verb->run(args, out);
  } catch (const Error& e) {
    // One line on stderr, even when a case file has several problems.
    std::string message = e.what();
    for (std::size_t at = message.find('\n'); at != std::string::npos; at = message.find('\n', at))
      message.replace(at, 1, "; ");
    err << "cyclewright-cli " << verb->name << ": " << message << '\n';
    switch (e.code()) {
      case ErrorCode::InvalidInput:
      case ErrorCode::OutOfRange:
        return kExitInvalidInput;
      case ErrorCode::NotConverged:
      case ErrorCode::NoSolution:
        return kExitNoSolution;
    }
    return kExitNoSolution;
  }
}

}  // namespace cw::cli
