#pragma once
// The losses of the turbojet that the loss audit removes one at a time: each with a stable key,
// the case field it acts on, how it is removed (set to its ideal-twin value, analysis/ideal_twin.h)
// and, where the loss is one number, that number as the parameter of its sensitivity.
//
// Flow order (the waterfall's default): inlet_recovery, compressor_efficiency,
// burner_pressure_loss, combustion_efficiency, turbine_efficiency, mechanical_efficiency,
// jet_pipe_loss, afterburner_loss, nozzle_velocity_coefficient, nozzle_discharge_coefficient,
// nozzle_expansion, bleed, power_offtake. Removing all of them from a case gives its ideal twin
// (at the same W2 and Tt4). A loss that is one number of the case is described by its entry in
// the registry of parameters (engine/parameter_registry.h): its path, range, lossless value,
// getter and setter.

#include "engine/case_inputs.h"

#include <functional>
#include <optional>
#include <string>
#include <vector>

namespace cw::analysis {

/// A loss that is one number: its value, how to set it, its practitioner's unit and bounds.
struct LossParameter {
  std::string field;  ///< the case path of the number, e.g. "/compressor/isentropic_efficiency"
  std::string unit;   ///< what "per unit" means, e.g. "point of efficiency (0.01)"
  double unitSize;    ///< that unit in the parameter's SI value: 0.01, or 1000 W [-] or [W]
  double lowerBound;  ///< lowest valid value (inclusive)
  double upperBound;  ///< highest valid value (inclusive)
  std::function<double(const engine::Case&)> get;
  std::function<void(engine::Case&, double)> set;
};

struct LossDefinition {
  std::string key;        ///< stable key, e.g. "compressor_efficiency"
  std::string field;      ///< the case path(s) the loss acts on
  std::string removedTo;  ///< its ideal value, in words, e.g. "isentropic efficiency 1"
  std::function<bool(const engine::Case&)> applies;  ///< false when the case has no such component
  std::function<void(engine::Case&)> remove;         ///< sets the loss to its ideal-twin value
  std::optional<LossParameter> parameter;            ///< none for nozzle_expansion (a geometry)
};

/// Every loss, in flow order.
const std::vector<LossDefinition>& lossCatalogue();

/// The loss with the given key; throws cw::InvalidInput naming the key and listing the valid ones.
const LossDefinition& lossByKey(const std::string& key, const std::string& where = "--order");

/// The valid keys, comma-separated, in flow order.
std::string lossKeyList();

}  // namespace cw::analysis
