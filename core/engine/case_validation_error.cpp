#include "engine/case_validation_error.h"

#include "common/text.h"

namespace cw::engine {

static std::string joinMessages(const std::string& where, const std::vector<CaseProblem>& problems) {
  std::string text = where.empty() || where == "case" ? std::string() : excerpt(where, 200) + ": ";
  const std::size_t prefix = text.size();
  for (const CaseProblem& problem : problems) {
    if (text.size() > prefix) text += '\n';
    text += problem.message;
  }
  return text;
}

CaseValidationError::CaseValidationError(std::string where, std::vector<CaseProblem> problems)
    : Error(ErrorCode::InvalidInput, where, joinMessages(where, problems)), problems_(std::move(problems)) {}

}  // namespace cw::engine
