#include "arguments.h"

#include "common/error.h"

#include <charconv>
#include <cmath>

namespace cw::cli {

std::optional<double> parseNumber(const std::string& text) {
  double value = 0.0;
  const char* first = text.data();
  const char* last = text.data() + text.size();
  if (first != last && *first == '+') ++first;
  auto [end, ec] = std::from_chars(first, last, value);
  if (ec != std::errc() || end != last || !std::isfinite(value)) return std::nullopt;
  return value;
}

Arguments::Arguments(const std::vector<std::string>& words, const std::vector<OptionSpec>& specs) {
  for (std::size_t i = 0; i < words.size(); ++i) {
    const std::string& word = words[i];
    if (word.rfind("--", 0) != 0 || word == "--") {
      positional_.push_back(word);
      continue;
    }
    std::string name = word.substr(2);
    std::optional<std::string> inlineValue;
    if (auto eq = name.find('='); eq != std::string::npos) {
      inlineValue = name.substr(eq + 1);
      name = name.substr(0, eq);
    }
    const OptionSpec* spec = nullptr;
    for (const auto& s : specs)
      if (s.name == name) spec = &s;
    if (!spec) throw InvalidInput("--" + name, "unknown option (see --help)");
    if (!spec->takesValue) {
      if (inlineValue) throw InvalidInput("--" + name, "is a switch and takes no value");
      switches_.insert(name);
    } else if (inlineValue) {
      values_[name].push_back(*inlineValue);
    } else {
      if (i + 1 >= words.size()) throw InvalidInput("--" + name, "needs a value");
      values_[name].push_back(words[++i]);
    }
  }
}

bool Arguments::has(const std::string& name) const {
  return switches_.count(name) > 0 || values_.count(name) > 0;
}

std::optional<std::string> Arguments::text(const std::string& name) const {
  auto it = values_.find(name);
  if (it == values_.end()) return std::nullopt;
  return it->second.back();
}

std::vector<std::string> Arguments::all(const std::string& name) const {
  auto it = values_.find(name);
  return it == values_.end() ? std::vector<std::string>{} : it->second;
}

double Arguments::number(const std::string& name) const {
  auto value = text(name);
  if (!value) throw InvalidInput("--" + name, "is required");
  auto parsed = parseNumber(*value);
  if (!parsed) throw InvalidInput("--" + name, "'" + *value + "' is not a finite number");
  return *parsed;
}

double Arguments::number(const std::string& name, double fallback) const {
  return has(name) ? number(name) : fallback;
}

}  // namespace cw::cli
