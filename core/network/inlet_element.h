#pragma once
// The inlet in a network: from the free stream to the engine face, where the stream's static state
// follows from the face's axial Mach number (the face's sizing).

#include "components/inlet.h"
#include "network/network_component.h"

namespace cw::network {

class InletElement : public NetworkComponent {
 public:
  InletElement(std::string_view name, std::string_view entry, std::string_view exit,
               const components::InletInputs& inputs, double faceMach)
      : NetworkComponent(name, entry, exit), inlet_(inputs), faceMach_(faceMach) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;

 private:
  components::Inlet inlet_;
  double faceMach_;  ///< axial Mach number at the face [-]
};

}  // namespace cw::network
