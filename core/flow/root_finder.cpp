#include "flow/root_finder.h"

#include "common/error.h"

#include <string>

namespace cw::flow::detail {

void throwNotBracketed(std::string_view where, double lo, double hi) {
  throw NoSolution(
      std::string(where),
      "the search interval [" + messageNumber(lo) + ", " + messageNumber(hi) + "] does not bracket a root",
      {kReasonNoBracket, {}, {{lo, ""}, {hi, ""}}, {}});
}

void throwNotFinite(std::string_view where, double x) {
  throw NoSolution(std::string(where), "the function is not finite at " + messageNumber(x),
                   {kReasonFunctionNotFinite, {}, {{x, ""}}, {}});
}

void throwNotConverged(std::string_view where, int iterations, double residual) {
  throw NotConverged(std::string(where), iterations, residual);
}

}  // namespace cw::flow::detail
