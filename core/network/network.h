#pragma once
// An engine as a network: named stations (SAE AS755 ids), streams along which components sit in
// flow order, shafts joining the components that give and take work, and a nozzle at the end of
// each stream. A topology (topologies.h) builds one from a case in a few lines; the design-point
// sequence (design_point.h) runs it.
//
// Each shaft has a mechanical efficiency and a power offtake; its compressors run before its
// turbine in flow order, so the turbine delivers what they took (eta_m P_t = P_c + P_x).

#include "engine/cycle_result.h"
#include "network/network_component.h"

#include <memory>
#include <string>
#include <vector>

namespace cw::network {

struct ShaftSpec {
  std::string name;                   ///< "shaft", "low_pressure_shaft", ...
  double mechanicalEfficiency = 1.0;  ///< eta_m = (P_c + P_x) / P_t [-]
  double powerOfftake = 0.0;          ///< P_x, delivered to the aircraft [W]
};

/// The stations with a role of their own, named by the topology.
struct StationRoles {
  std::string freeStream;   ///< "0"
  std::string engineFace;   ///< "2": sized at the face Mach number
  std::string burnerEntry;  ///< "3": its flow is the burner air flow of the fuel-air ratio
  std::string burnerExit;   ///< "4"
};

class Network {
 public:
  explicit Network(StationRoles roles);

  /// Places a component after the ones placed before (flow order).
  template <typename Component, typename... Arguments>
  Network& add(Arguments&&... arguments) {
    components_.push_back(std::make_unique<Component>(std::forward<Arguments>(arguments)...));
    return *this;
  }
  Network& addShaft(const ShaftSpec& shaft);

  /// The description of the stations and control volumes, built from the components when first
  /// asked (the nozzles give the throats and the static exits).
  const std::shared_ptr<const engine::NetworkDescription>& description() const;

  const std::vector<std::unique_ptr<NetworkComponent>>& components() const { return components_; }
  const std::vector<ShaftSpec>& shafts() const { return shafts_; }
  const StationRoles& roles() const { return roles_; }

 private:
  StationRoles roles_;
  std::vector<std::unique_ptr<NetworkComponent>> components_;
  std::vector<ShaftSpec> shafts_;
  mutable std::shared_ptr<const engine::NetworkDescription> description_;
};

}  // namespace cw::network
