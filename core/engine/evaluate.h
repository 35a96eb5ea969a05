#pragma once
// One call from a case to its evaluation: validate, evaluate the cycle with losses, then
// its ideal twin at the same burner exit temperature and air mass flow.

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"

namespace cw::engine {

/// Throws cw::engine::CaseValidationError (invalid input) or cw::NoSolution / cw::NotConverged.
/// withPaths = false skips the process paths (only the charts draw them).
Evaluation evaluateCase(const Case& inputs, bool withPaths = true);

}  // namespace cw::engine
