#include "engine/cycle_result.h"

#include <stdexcept>

namespace cw::engine {

const Station& CycleResult::station(const std::string& id) const {
  for (const auto& s : stations)
    if (s.id == id) return s;
  throw std::out_of_range("no station " + id + " in this result");
}

}  // namespace cw::engine
