#include "engine/case_validation_error.h"

namespace cw::engine {

static std::string joinMessages(const std::vector<CaseProblem>& problems) {
  std::string text;
  for (const CaseProblem& problem : problems) {
    if (!text.empty()) text += '\n';
    text += problem.message;
  }
  return text;
}

CaseValidationError::CaseValidationError(std::string where, std::vector<CaseProblem> problems)
    : Error(ErrorCode::InvalidInput, std::move(where), joinMessages(problems)),
      problems_(std::move(problems)) {}

}  // namespace cw::engine
