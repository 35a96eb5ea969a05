#pragma once
// A nozzle in a network: expands its stream against the ambient pressure, from its entry through
// its throat to its exit station; its gross thrust joins the engine's.

#include "components/nozzle.h"
#include "network/network_component.h"

namespace cw::network {

class NozzleElement : public NetworkComponent {
 public:
  NozzleElement(std::string name, std::string entry, std::string throat, std::string exit,
                const components::NozzleInputs& inputs)
      : NetworkComponent(std::move(name), std::move(entry), std::move(exit)),
        throat_(std::move(throat)),
        nozzle_(inputs) {}

  const std::string& throat() const { return throat_; }

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;

 private:
  std::string throat_;
  components::Nozzle nozzle_;
};

}  // namespace cw::network
