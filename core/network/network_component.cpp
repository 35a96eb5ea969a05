#include "network/network_component.h"

namespace cw::network {

void NetworkComponent::describe(std::vector<engine::ControlVolume>& volumes) const {
  volumes.push_back({std::string(name_),
                     engine::ControlVolume::Kind::Adiabatic,
                     std::string(entry_),
                     std::string(exit_),
                     {}});
}

}  // namespace cw::network
