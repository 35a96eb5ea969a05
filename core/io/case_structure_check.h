#pragma once
// The structural check of a case document against the format's key table (case_keys.h):
// unknown keys, JSON types, choices, applicability, required keys, "exactly one of" groups.
// It collects every problem and keeps a clean copy of the document holding only the values
// that passed, from which the case is then built.

#include "engine/case_problem.h"

#include <nlohmann/json.hpp>

#include <string>
#include <vector>

namespace cw::io {

struct CaseSection;

class CaseStructureCheck {
 public:
  explicit CaseStructureCheck(const nlohmann::json& document);

  const std::vector<engine::CaseProblem>& problems() const { return problems_; }
  /// The document without the values that failed (an object, possibly empty).
  const nlohmann::json& clean() const { return clean_; }

 private:
  void checkTopLevel(const nlohmann::json& document);
  void checkSection(const CaseSection& section, const nlohmann::json& object, nlohmann::json& clean);
  bool checkValue(const CaseSection& section, const std::string& key, const nlohmann::json& value);
  void checkConditions(const CaseSection& section, nlohmann::json& clean);
  void checkGroups(const CaseSection& section, const nlohmann::json& object, nlohmann::json& clean);
  void add(std::string path, std::string value, std::string valid, const std::string& message);

  std::vector<engine::CaseProblem> problems_;
  nlohmann::json clean_ = nlohmann::json::object();
};

/// "/section/key" (or "/key" at the top level), escaped as RFC 6901 requires.
std::string casePointer(std::string_view section, std::string_view key);

}  // namespace cw::io
