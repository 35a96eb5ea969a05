#include "io/case_builder.h"

#include "engine/parameter_registry.h"
#include "io/case_keys.h"

#include <algorithm>

namespace cw::io {

using nlohmann::json;
using namespace cw::engine;

namespace {

const json& object(const json& document, std::string_view section) {
  static const json empty = json::object();
  if (section.empty()) return document;
  const auto it = document.find(std::string(section));
  return it != document.end() ? *it : empty;
}

/// Sets the parameter from its (checked) JSON value.
void apply(const Parameter& p, const json& value, Case& inputs) {
  switch (p.kind) {
    case ParameterKind::Number:
      p.set(inputs, value.get<double>());
      break;
    case ParameterKind::Flag:
      p.set(inputs, value.get<bool>() ? 1.0 : 0.0);
      break;
    case ParameterKind::Text:
      p.setText(inputs, value.get<std::string>());
      break;
    case ParameterKind::Choice: {
      const std::string text = value.get<std::string>();
      const auto it = std::find_if(p.choices.begin(), p.choices.end(),
                                   [&text](const ParameterChoice& choice) { return choice.value == text; });
      if (it != p.choices.end()) p.set(inputs, double(it - p.choices.begin()));
      break;
    }
  }
}

}  // namespace

Case buildCase(const json& clean) {
  // A new case of the document's architecture, then every key in the order of the registry, so
  // that a choice is set before the numbers that depend on it; each setter selects the
  // alternative its key belongs to. The checked document holds only keys of its version and
  // the roles of its architecture.
  Case inputs = newCase(caseDocumentArchitecture(clean));
  for (const Parameter& p : parameterRegistry()) {
    if (!p.inFile) continue;
    const json& o = object(clean, p.section);
    const auto it = o.find(std::string(p.key));
    if (it != o.end()) apply(p, *it, inputs);
  }
  return inputs;
}

}  // namespace cw::io
