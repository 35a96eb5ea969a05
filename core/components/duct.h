#pragma once
// A duct (the jet pipe, 5 -> 7): adiabatic, with a total-pressure loss.
//   ht_out = ht_in,  pt_out = pt_in (1 - dp/p)
// (Walsh and Fletcher, Gas Turbine Performance, 2nd ed., 2004, sec. 5.11; common practice.)

#include "stream/station.h"

namespace cw::components {

class Duct {
 public:
  explicit Duct(double pressureLossFraction) : pressureLossFraction_(pressureLossFraction) {}

  stream::TotalState exit(const stream::TotalState& entry) const {
    stream::TotalState out = entry;
    out.pressure = entry.pressure * (1.0 - pressureLossFraction_);
    return out;
  }

 private:
  double pressureLossFraction_;
};

}  // namespace cw::components
