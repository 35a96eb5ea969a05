#pragma once
// Every problem of a case at once: thrown by the case reader and by requireValidCase.

#include "common/error.h"
#include "engine/case_problem.h"

#include <string>
#include <vector>

namespace cw::engine {

/// A case with one or more problems. code() is ErrorCode::InvalidInput, where() names the
/// source (a file path, or "case"), what() gives the problems' messages one per line, the
/// first prefixed with "<source>: " when the source is a file (the first 40 problems, then a count
/// of the rest; problems() holds them all).
class CaseValidationError : public Error {
 public:
  CaseValidationError(std::string where, std::vector<CaseProblem> problems);

  const std::vector<CaseProblem>& problems() const noexcept { return problems_; }

 private:
  std::vector<CaseProblem> problems_;
};

}  // namespace cw::engine
