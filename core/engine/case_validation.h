#pragma once
// The valid ranges of a case's values (docs/case-format.md lists them).

#include "engine/case_inputs.h"
#include "engine/case_problem.h"

#include <vector>

namespace cw::engine {

/// Every value of the case outside its valid range, and every disallowed combination,
/// each named by its case-file path. Empty when the case is valid. Only the alternatives
/// a case selects are checked (e.g. a constant-cp gas's cp, not the two-gamma values).
std::vector<CaseProblem> validateCase(const Case& inputs);

/// Throws CaseValidationError (where = "case") listing every problem, if there are any.
void requireValidCase(const Case& inputs);

}  // namespace cw::engine
