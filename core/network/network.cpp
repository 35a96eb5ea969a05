#include "network/network.h"

#include "network/nozzle_element.h"

namespace cw::network {

Network::Network() {
  components_.reserve(12);
}

Network::~Network() {
  for (NetworkComponent* component : components_) component->~NetworkComponent();
}

Network& Network::addShaft(const ShaftSpec& shaft) {
  shafts_.push_back(shaft);
  return *this;
}

const std::shared_ptr<const engine::NetworkDescription>& Network::description() const {
  if (description_) return description_;
  auto d = std::make_shared<engine::NetworkDescription>();
  d->freeStream = roles_.freeStream;
  d->engineFace = roles_.engineFace;
  d->burnerEntry = roles_.burnerEntry;
  d->burnerExit = roles_.burnerExit;
  d->staticStations.push_back(roles_.freeStream);
  d->volumes.reserve(2 * components_.size());
  for (const auto& component : components_) {
    component->describe(d->volumes);
    if (const auto* nozzle = dynamic_cast<const NozzleElement*>(component)) {
      d->throats.emplace_back(nozzle->throat());
      d->nozzleExits.emplace_back(nozzle->exit());
      d->staticStations.emplace_back(nozzle->exit());
    }
  }
  description_ = std::move(d);
  return description_;
}

}  // namespace cw::network
