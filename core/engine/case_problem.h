#pragma once
// One problem found in a case: where (a JSON pointer into the case file), what was there,
// what is allowed, and the English line that says so.

#include <string>

namespace cw::engine {

struct CaseProblem {
  std::string path;     ///< JSON pointer into the case file, e.g. "/compressor/pressure_ratio"
  std::string value;    ///< the offending value as JSON text; empty when the key is missing
  std::string valid;    ///< the valid range or form, e.g. "[1, 60]", "a number", "required"
  std::string message;  ///< one English line naming path, value and valid range
  bool operator==(const CaseProblem&) const = default;
};

}  // namespace cw::engine
