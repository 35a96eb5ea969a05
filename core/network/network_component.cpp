#include "network/network_component.h"

namespace cw::network {

void NetworkComponent::describe(std::vector<engine::ControlVolume>& volumes) const {
  volumes.push_back({name_, engine::ControlVolume::Kind::Adiabatic, entry_, exit_, {}, 1.0});
}

}  // namespace cw::network
