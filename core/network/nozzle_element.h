#pragma once
// A nozzle in a network: expands its stream against the ambient pressure, from its entry through
// its throat to its exit station; its gross thrust joins the engine's.

#include "components/nozzle.h"
#include "network/network_component.h"

namespace cw::network {

class NozzleElement : public NetworkComponent {
 public:
  NozzleElement(std::string_view name, std::string_view entry, std::string_view throat, std::string_view exit,
                const components::NozzleInputs& inputs)
      : NetworkComponent(name, entry, exit), throat_(throat), nozzle_(inputs) {}

  std::string_view throat() const { return throat_; }

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;

 private:
  std::string_view throat_;
  components::Nozzle nozzle_;
};

}  // namespace cw::network
