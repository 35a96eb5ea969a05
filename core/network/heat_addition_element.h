#pragma once
// A heat addition in a network (the burner, a lit afterburner): fuel joins the stream, heating it to
// an exit temperature or by a fuel-air ratio.

#include "components/heat_addition.h"
#include "components/heat_addition_inputs.h"
#include "network/network_component.h"

#include <variant>

namespace cw::network {

class HeatAdditionElement : public NetworkComponent {
 public:
  using Setting = std::variant<components::ExitTemperatureSetting, components::FuelAirRatioSetting>;

  HeatAdditionElement(std::string_view name, std::string_view entry, std::string_view exit,
                      const thermo::GasModel& model, Setting setting, double pressureLossFraction,
                      double combustionEfficiency)
      : NetworkComponent(name, entry, exit),
        heating_(std::string(name), model, pressureLossFraction, combustionEfficiency),
        setting_(setting),
        combustionEfficiency_(combustionEfficiency) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;
  void describe(std::vector<engine::ControlVolume>& volumes) const override;

 private:
  components::HeatAddition heating_;
  Setting setting_;
  double combustionEfficiency_;
};

}  // namespace cw::network
