#pragma once
// The losses that the loss audit removes one at a time: each with a stable key, the case field it
// acts on, how it is removed (set to its ideal-twin value, analysis/ideal_twin.h) and, where the
// loss is one number, that number as the parameter of its sensitivity.
//
// A compressor's losses (efficiency, bleed) and a turbine's (efficiency, mechanical efficiency,
// power offtake) are described once and made for every role of engine/case_roles.h, each
// applying only where its role exists. The single spool's roles and the two-spool's
// high-pressure ones (the same member of Case) share the keys compressor_efficiency,
// turbine_efficiency, mechanical_efficiency, bleed and power_offtake, one entry per role; the
// low-pressure roles' keys begin "low_pressure_".
//
// Flow order (the waterfall's default), as a turbojet has them: inlet_recovery,
// compressor_efficiency, burner_pressure_loss, combustion_efficiency, turbine_efficiency,
// mechanical_efficiency, jet_pipe_loss, afterburner_loss, nozzle_velocity_coefficient,
// nozzle_discharge_coefficient, nozzle_expansion, bleed, power_offtake. A two-spool turbojet has
// low_pressure_compressor_efficiency before compressor_efficiency (the HP compressor's),
// low_pressure_turbine_efficiency and low_pressure_mechanical_efficiency after
// mechanical_efficiency (the HP shaft's), low_pressure_bleed before bleed and
// low_pressure_power_offtake after power_offtake. Removing every loss that applies to a case
// gives its ideal twin (at the same W2 and Tt4). A loss that is one number of the case is
// described by its entry in the registry of parameters (engine/parameter_registry.h): its path,
// range, lossless value, getter and setter.

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
  /// The architecture of the loss's role where only one has it (a two-spool's LP compressor);
  /// none where every architecture has the loss (the inlet's, the burner's, ...).
  std::optional<engine::Architecture> architecture = std::nullopt;
};

/// Every loss of every architecture, in flow order; a key shared by roles appears once per role.
const std::vector<LossDefinition>& lossCatalogue();

/// The losses an architecture has, in flow order (each key once); some may still not apply to a
/// given case (an afterburner neither lit nor with an unlit loss).
std::vector<const LossDefinition*> lossesOf(engine::Architecture architecture);

/// The loss with the given key as it acts on the case (the entry of the case's architecture; a
/// loss of another architecture's role, which does not apply to the case, when it has none).
/// Throws cw::InvalidInput (at `where`) naming an unknown key and listing the valid ones.
const LossDefinition& lossByKey(const std::string& key, const engine::Case& c,
                                const std::string& where = "--order");

/// Whether the key names a loss of any architecture.
bool isLossKey(const std::string& key);

/// Every key once, in flow order (a key shared by roles where the last of them stands: the
/// two-spool turbojet's order).
std::vector<std::string> lossKeys();

/// The valid keys (lossKeys), comma-separated.
std::string lossKeyList();

}  // namespace cw::analysis
