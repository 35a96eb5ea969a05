#include "io/case_field_setter.h"

#include "engine/parameter_registry.h"

namespace cw::io {

/// The numbers of the format (the registry's entries that are keys, of every architecture).
static bool isNumericKey(const engine::Parameter& p) {
  return p.kind == engine::ParameterKind::Number && p.inFile;
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
