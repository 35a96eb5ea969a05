#pragma once
// Command-line arguments of one verb: "--name value" options and "--flag" switches.
//
// Parsing is strict: an unknown option, a missing value or a value that is not a
// finite number is an InvalidInput naming the argument, so the CLI can print one
// line and exit with status 2.

#include <map>
#include <optional>
#include <set>
#include <string>
#include <vector>

namespace cw::cli {

struct OptionSpec {
  std::string name;  ///< without the leading "--"
  bool takesValue;   ///< false for a switch
  std::string help;  ///< one line for --help
};

class Arguments {
 public:
  /// Parses argv-style words against the specs; throws cw::InvalidInput on any problem.
  Arguments(const std::vector<std::string>& words, const std::vector<OptionSpec>& specs);

  bool has(const std::string& name) const;
  /// The option's text, or nullopt when absent.
  std::optional<std::string> text(const std::string& name) const;
  /// The option as a finite number; throws InvalidInput when absent or not a number, saying
  /// which ("expected a number", "too large", "too close to zero").
  double number(const std::string& name) const;
  /// The option as a finite number, or the fallback when absent.
  double number(const std::string& name, double fallback) const;
  /// The option as a whole number in [minimum, maximum], or the fallback when absent; throws
  /// InvalidInput "expected a whole number from MIN to MAX" otherwise.
  long long wholeNumber(const std::string& name, long long minimum, long long maximum,
                        long long fallback) const;
  /// Every value given for a repeatable option, in order (e.g. several --set).
  std::vector<std::string> all(const std::string& name) const;
  /// Words that are not options (e.g. a case file).
  const std::vector<std::string>& positional() const { return positional_; }

 private:
  std::map<std::string, std::vector<std::string>> values_;
  std::set<std::string> switches_;
  std::vector<std::string> positional_;
};

}  // namespace cw::cli
