#pragma once
// An engine as a network: named stations (SAE AS755 ids), streams along which components sit in
// flow order, shafts joining the components that give and take work, and a nozzle at the end of
// each stream. A topology (topologies.h) builds one from a case in a few lines; the design-point
// sequence (design_point.h) runs it.
//
// Each shaft has a mechanical efficiency and a power offtake; its compressors run before its
// turbine in flow order, so the turbine delivers what they took (eta_m P_t = P_c + P_x).

#include "engine/case_inputs.h"
#include "engine/cycle_result.h"
#include "network/network_component.h"
#include "thermo/gas_model.h"

#include <array>
#include <cstddef>
#include <memory>
#include <memory_resource>
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

/// A network lives where it is built (a topology fills one in place, topologies.h): its
/// components sit in storage of its own, so that building one costs no allocation per component.
class Network {
 public:
  Network();
  ~Network();
  Network(const Network&) = delete;
  Network& operator=(const Network&) = delete;

  void setRoles(StationRoles roles) { roles_ = std::move(roles); }

  /// Places a component after the ones placed before (flow order).
  template <typename Component, typename... Arguments>
  Network& add(Arguments&&... arguments) {
    void* place = arena_.allocate(sizeof(Component), alignof(Component));
    components_.push_back(new (place) Component(std::forward<Arguments>(arguments)...));
    return *this;
  }
  Network& addShaft(const ShaftSpec& shaft);

  /// The description of the stations and control volumes, built from the components when first
  /// asked (the nozzles give the throats and the static exits), unless shared.
  const std::shared_ptr<const engine::NetworkDescription>& description() const;
  /// Shares the description of a network of the same shape (the same components between the
  /// same stations), which a topology keeps once per shape: it does not depend on the inputs.
  void shareDescription(std::shared_ptr<const engine::NetworkDescription> description) {
    description_ = std::move(description);
  }

  /// The components in flow order.
  const std::pmr::vector<NetworkComponent*>& components() const { return components_; }
  const std::pmr::vector<ShaftSpec>& shafts() const { return shafts_; }
  const StationRoles& roles() const { return roles_; }

 private:
  alignas(std::max_align_t) std::array<std::byte, 4096> storage_;
  std::pmr::monotonic_buffer_resource arena_{storage_.data(), storage_.size()};
  StationRoles roles_;
  std::pmr::vector<NetworkComponent*> components_{&arena_};  ///< owned: destroyed with the network
  std::pmr::vector<ShaftSpec> shafts_{&arena_};
  mutable std::shared_ptr<const engine::NetworkDescription> description_;
};

/// A topology: fills a network with the components of a case, in flow order.
using Topology = void (*)(Network& network, const engine::Case& inputs, const thermo::GasModel& model);

}  // namespace cw::network
