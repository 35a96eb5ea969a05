#pragma once
// The topologies: each a short description of an engine as a network (network.h), built from a
// validated case. The case's roles by architecture are named in engine/case_inputs.h.
//
//   turbojet              0 -inlet- 2 -compressor- 3 -burner- 4 -turbine- 5 -jet pipe- [6 -afterburner-] 7
//                         -nozzle- 8, 9; one shaft ("shaft": compressor, turbine)
//   two-spool turbojet    0 -inlet- 2 -LP compressor- 25 -HP compressor- 3 -burner- 4 -HP turbine- 45
//                         -LP turbine- 5 -jet pipe- [6 -afterburner-] 7 -nozzle- 8, 9; the LP shaft
//                         (LP compressor, LP turbine), the HP shaft (HP compressor, HP turbine)
// The jet pipe of an unlit afterburner with a duct loss is one component of two sections, ending
// at an internal station 6.

#include "engine/case_inputs.h"
#include "network/network.h"
#include "thermo/gas_model.h"

namespace cw::network {

void turbojet(Network& network, const engine::Case& inputs, const thermo::GasModel& model);
void twoSpoolTurbojet(Network& network, const engine::Case& inputs, const thermo::GasModel& model);

/// The topology of the case's architecture.
Topology topologyOf(const engine::Case& inputs);

}  // namespace cw::network
