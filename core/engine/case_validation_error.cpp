#include "engine/case_validation_error.h"

#include "common/text.h"

namespace cw::engine {

static std::string joinMessages(const std::string& where, const std::vector<CaseProblem>& problems) {
  std::string text = where.empty() || where == "case" ? std::string() : excerpt(where, 200) + ": ";
  const std::size_t prefix = text.size();
  // A hostile file can hold a million problems: the message names the first ones and counts the rest.
  constexpr std::size_t kMessagesShown = 40;
  for (std::size_t i = 0; i < problems.size() && i < kMessagesShown; ++i) {
    if (text.size() > prefix) text += '\n';
    text += problems[i].message;
  }
  if (problems.size() > kMessagesShown)
    text += "\nand " + std::to_string(problems.size() - kMessagesShown) + " more problems";
  return text;
}

CaseValidationError::CaseValidationError(std::string where, std::vector<CaseProblem> problems)
    : Error(ErrorCode::InvalidInput, where, joinMessages(where, problems)), problems_(std::move(problems)) {}

}  // namespace cw::engine
