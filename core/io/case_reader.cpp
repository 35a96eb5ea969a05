// Reading case files: parseCase and readCaseFile (declared in io/case_file.h).
#include "common/error.h"
#include "common/text.h"
#include "engine/case_validation.h"
#include "engine/case_validation_error.h"
#include "io/case_builder.h"
#include "io/case_file.h"
#include "io/case_structure_check.h"
#include "io/json_document.h"

#include <functional>
#include <set>

namespace cw::io {

using nlohmann::json;

namespace {

/// Structural check, build, range check: every problem, and the case when there are none.
engine::Case parseWithProblems(const json& document, std::vector<engine::CaseProblem> problems,
                               const std::string& where) {
  const CaseStructureCheck structure(document);
  problems.insert(problems.end(), structure.problems().begin(), structure.problems().end());
  engine::Case inputs = buildCase(structure.clean());
  std::vector<engine::CaseProblem> ranges = engine::validateCase(inputs);
  problems.insert(problems.end(), ranges.begin(), ranges.end());
  if (!problems.empty()) throw engine::CaseValidationError(where, std::move(problems));
  return inputs;
}

/// Remembers the path of the parser's position to report keys given twice in one object
/// (nlohmann::json keeps the last silently; a typo'd file must not pass like that).
class DuplicateKeyFinder {
 public:
  bool operator()(int /*depth*/, json::parse_event_t event, json& parsed) {
    switch (event) {
      case json::parse_event_t::object_start:
        frames_.push_back({true, {}, {}, 0});
        break;
      case json::parse_event_t::array_start:
        frames_.push_back({false, {}, {}, 0});
        break;
      case json::parse_event_t::object_end:
      case json::parse_event_t::array_end:
        frames_.pop_back();
        if (!frames_.empty()) ++frames_.back().count;
        break;
      case json::parse_event_t::key: {
        Frame& frame = frames_.back();
        frame.key = parsed.get<std::string>();
        if (!frame.keys.insert(frame.key).second)
          problems.push_back({path(), "", "each key once", excerpt(path()) + ": duplicate key"});
        break;
      }
      case json::parse_event_t::value:
        if (!frames_.empty()) ++frames_.back().count;
        break;
    }
    return true;
  }

  std::vector<engine::CaseProblem> problems;

 private:
  struct Frame {
    bool isObject;
    std::set<std::string> keys;
    std::string key;
    std::size_t count;
  };
  std::string path() const {
    std::string text;
    for (const Frame& frame : frames_)
      text += frame.isObject ? casePointer("", frame.key) : "/" + std::to_string(frame.count);
    return text;
  }
  std::vector<Frame> frames_;
};

/// The document of a case file's text, and the keys it gives twice.
json documentOf(std::string_view text, const std::string& where,
                std::vector<engine::CaseProblem>& duplicateProblems) {
  DuplicateKeyFinder duplicates;
  json document = parseDocumentText(text, where, std::ref(duplicates));
  duplicateProblems = std::move(duplicates.problems);
  return document;
}

json loadDocument(const std::string& path, std::vector<engine::CaseProblem>& duplicateProblems) {
  return documentOf(readDocumentFile(path, "case file"), path, duplicateProblems);
}

}  // namespace

engine::Case parseCaseText(std::string_view text, const std::string& source) {
  std::vector<engine::CaseProblem> duplicates;
  const json document = documentOf(text, source, duplicates);
  return parseWithProblems(document, std::move(duplicates), source);
}

engine::Case parseCase(const json& document, const std::string& source) {
  return parseWithProblems(document, {}, source);
}

engine::Case parseCaseStructure(const json& document, const std::string& source) {
  const CaseStructureCheck structure(document);
  if (!structure.problems().empty()) throw engine::CaseValidationError(source, structure.problems());
  return buildCase(structure.clean());
}

json readCaseDocument(const std::string& path) {
  std::vector<engine::CaseProblem> duplicates;
  json document = loadDocument(path, duplicates);
  if (!duplicates.empty()) throw engine::CaseValidationError(path, std::move(duplicates));
  return document;
}

engine::Case readCaseFile(const std::string& path) {
  std::vector<engine::CaseProblem> duplicates;
  const json document = loadDocument(path, duplicates);
  return parseWithProblems(document, std::move(duplicates), path);
}

}  // namespace cw::io
