#pragma once
// One call from a case to its evaluation: validate, evaluate the cycle with losses, then
// its ideal twin at the same burner exit temperature and air mass flow. It sits above analysis/
// (the ideal twin) and keeps the namespace cw::engine: it evaluates an engine case.

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"

namespace cw::engine {

/// Throws cw::engine::CaseValidationError (invalid input) or cw::NoSolution / cw::NotConverged.
/// withPaths = false skips the process paths (only the charts draw them).
Evaluation evaluateCase(const Case& inputs, bool withPaths = true);

}  // namespace cw::engine
