#pragma once
// Fast setters of the numeric inputs of a case, named by their --set paths
// ("compressor.pressure_ratio"), for trade studies that change one or two inputs thousands of
// times without going through a JSON document.
//
// A setter writes the value into the member the path names, selecting the alternative that
// member belongs to, as applySetOverride (case_file.h) then parseCase would: setting
// compressor.polytropic_efficiency makes the compressor's efficiency polytropic, setting
// burner.fuel_air_ratio sets the burner by fuel-air ratio. When a setter selects an alternative
// the case did not have, that alternative's other members take their defaults; apply the
// override once through the document first (as the trade study does) so that a path that does
// not apply to the case is reported as the case reader reports it.

#include "engine/case_inputs.h"

#include <functional>
#include <string>
#include <string_view>
#include <vector>

namespace cw::io {

/// The registry entry's setter (engine/parameter_registry.h).
using CaseFieldSetter = std::function<void(engine::Case&, double)>;

/// The setter of the numeric input at `path`, or an empty one when the path names no numeric input.
CaseFieldSetter numericCaseFieldSetter(std::string_view path);

/// Every numeric input's path, in the order of the case file.
std::vector<std::string> numericCaseFieldPaths();

}  // namespace cw::io
