#include "io/case_field_setter.h"

#include "engine/parameter_registry.h"

namespace cw::io {

/// The numbers of the format's version 1 (the registry's entries of version 1 that are keys).
static bool isNumericKey(const engine::Parameter& p) {
  return p.kind == engine::ParameterKind::Number && p.inFile && p.sinceVersion <= 1;
}

CaseFieldSetter numericCaseFieldSetter(std::string_view path) {
  for (const engine::Parameter& p : engine::parameterRegistry())
    if (isNumericKey(p) && p.dottedPath() == path) return p.set;
  return nullptr;
}

std::vector<std::string> numericCaseFieldPaths() {
  std::vector<std::string> paths;
  for (const engine::Parameter& p : engine::parameterRegistry())
    if (isNumericKey(p)) paths.push_back(p.dottedPath());
  return paths;
}

}  // namespace cw::io
