#pragma once
// A turbine in a network: delivers what its shaft's compressors take plus the shaft's offtake,
// through the shaft's mechanical efficiency (eta_m P_t = P_c + P_x, components/turbine.h). It runs
// after every compressor of its shaft in flow order; its shaft's mechanical loss is a control
// volume of its own, described after the turbine (one turbine per shaft).

#include "components/efficiency_inputs.h"
#include "network/network_component.h"

namespace cw::network {

class TurbineElement : public NetworkComponent {
 public:
  TurbineElement(std::string_view name, std::string_view entry, std::string_view exit, std::string_view shaft,
                 const components::Efficiency& efficiency)
      : NetworkComponent(name, entry, exit, shaft), efficiency_(efficiency) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;
  void describe(std::vector<engine::ControlVolume>& volumes) const override;

 private:
  components::Efficiency efficiency_;
};

}  // namespace cw::network
