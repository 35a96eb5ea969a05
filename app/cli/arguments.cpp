#include "arguments.h"

#include "common/error.h"
#include "common/number_text.h"
#include "common/text.h"
#include "io/case_keys.h"

namespace cw::cli {

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
    if (!spec) {
      std::vector<std::string_view> names;
      for (const auto& s : specs) names.push_back(s.name);
      const std::string suggestion = io::closestName(name, names);
      throw InvalidInput("--" + name,
                         "unknown option" +
                             (suggestion.empty() ? std::string() : " (did you mean --" + suggestion + "?)") +
                             " (see --help)");
    }
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
  return parseNumber(*value, "--" + name);
}

long long Arguments::wholeNumber(const std::string& name, long long minimum, long long maximum,
                                 long long fallback) const {
  const auto value = text(name);
  return value ? parseWholeNumber(*value, "--" + name, minimum, maximum) : fallback;
}

double Arguments::number(const std::string& name, double fallback) const {
  return has(name) ? number(name) : fallback;
}

}  // namespace cw::cli
