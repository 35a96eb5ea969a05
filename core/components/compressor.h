#pragma once
// Compressor, stations 2 -> 3.
//
//   pt3 = pi_c pt2
//   T3 from the efficiency on its basis (components/efficiency.h); the other basis derived
//   w_c = ht3 - ht2                                   specific work per unit of entry flow
//   W3 = W2 (1 - beta)                                customer bleed beta taken at exit
// Compressor power P_c = W2 w_c: the bled air is compressed fully before it leaves
// (Walsh and Fletcher, Gas Turbine Performance, 2nd ed., 2004, sec. 5.2.3; common practice).

#include "components/compressor_inputs.h"
#include "components/efficiency.h"
#include "stream/station.h"

namespace cw::components {

class Compressor {
 public:
  struct Result {
    stream::TotalState exit;     ///< station 3, after the bleed
    double specificWork = 0.0;   ///< ht3 - ht2 [J/kg]
    double power = 0.0;          ///< W2 (ht3 - ht2) [W]
    double bleedMassFlow = 0.0;  ///< [kg/s]
    EfficiencyPair efficiency;   ///< both bases, one given and one derived [-]
  };

  explicit Compressor(const CompressorInputs& inputs) : inputs_(inputs) {}

  Result exit(const stream::TotalState& entry) const;

 private:
  CompressorInputs inputs_;
};

}  // namespace cw::components
