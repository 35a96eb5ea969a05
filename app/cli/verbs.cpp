#include "verbs.h"

#include "common/error.h"
#include "common/text.h"
#include "common/version.h"
#include "io/case_keys.h"

#include <algorithm>
#include <new>
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
         "Exit status: 0 success, 1 internal error (out of memory, a fault; one line on\n"
         "stderr), 2 invalid input (one line on stderr names the argument or file, the\n"
         "value and the valid range), 3 no solution for the inputs (for sweep: no point\n"
         "has a cycle), 130 a sweep stopped by Ctrl+C (the points run are written).\n"
         "\n"
      << kCaution << '\n';
}

static std::string formatChoices(const Verb& verb) {
  std::string text;
  for (Format format : verb.formats) text += (text.empty() ? "" : "|") + formatName(format);
  return text;
}

static std::vector<OptionSpec> optionsOf(const Verb& verb) {
  std::vector<OptionSpec> options = verb.options;
  options.push_back({"format", true, verb.formatHelp});
  return options;
}

static void printVerbHelp(std::ostream& out, const Verb& verb) {
  out << "Usage: cyclewright-cli " << verb.name << ' ' << verb.usage << " [--format " << formatChoices(verb)
      << "]\n\n"
      << verb.summary << "\n\nOptions:\n";
  for (const auto& option : optionsOf(verb))
    out << "  --" << option.name << (option.takesValue ? " VALUE" : "") << "\n      " << option.help << '\n';
  out << "  --help\n      show this help\n";
}

/// One line on stderr, whatever the message holds: lines joined, invalid UTF-8 escaped.
static void printError(std::ostream& err, const std::string& verb, const std::string& message) {
  std::string line = message;
  for (std::size_t at = line.find('\n'); at != std::string::npos; at = line.find('\n', at))
    line.replace(at, 1, "; ");
  err << "cyclewright-cli" << (verb.empty() ? "" : " " + verb) << ": " << excerpt(line, 0) << '\n';
}

static int exitStatusOf(const Error& e) {
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

static int runVerb(const Verb& verb, const std::vector<std::string>& words, std::ostream& out) {
  const Arguments args(words, optionsOf(verb));
  const auto formatText = args.text("format");
  const Format format = formatText ? parseFormat(*formatText, verb.formats) : verb.formats.front();
  return verb.run(args, format, out);
}

int runCommandLine(const std::vector<std::string>& words, std::ostream& out, std::ostream& err) {
  std::string verbName;
  // Nothing escapes: input errors exit 2, failed solves 3, anything else (out of memory, a bug) 1.
  try {
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
      std::vector<std::string_view> names;
      for (const auto& v : allVerbs()) names.push_back(v.name);
      const std::string suggestion = io::closestName(words[0], names);
      err << "cyclewright-cli: unknown verb \"" << excerpt(words[0]) << "\""
          << (suggestion.empty() ? "" : " (did you mean " + suggestion + "?)")
          << " (see cyclewright-cli --help)\n";
      return kExitInvalidInput;
    }
    verbName = verb->name;
    std::vector<std::string> rest(words.begin() + 1, words.end());
    for (const auto& word : rest) {
      if (word == "--help" || word == "-h") {
        printVerbHelp(out, *verb);
        return kExitOk;
      }
    }
    return runVerb(*verb, rest, out);
  } catch (...) {
    return reportFailure(std::current_exception(), verbName, err);
  }
}

int reportFailure(std::exception_ptr failure, const std::string& verb, std::ostream& err) {
  try {
    std::rethrow_exception(failure);
  } catch (const Error& e) {
    printError(err, verb, e.what());
    return exitStatusOf(e);
  } catch (const std::bad_alloc&) {
    printError(err, verb, "out of memory");
  } catch (const std::exception& e) {
    printError(err, verb, std::string("internal error: ") + e.what());
  } catch (...) {
    printError(err, verb, "internal error (an exception of unknown type)");
  }
  return kExitInternal;
}

}  // namespace cw::cli
