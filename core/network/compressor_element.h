#pragma once
// A compressor in a network: takes its power from its shaft; its bleed leaves at its exit.

#include "components/compressor.h"
#include "network/network_component.h"

namespace cw::network {

class CompressorElement : public NetworkComponent {
 public:
  CompressorElement(std::string_view name, std::string_view entry, std::string_view exit,
                    std::string_view shaft, const components::CompressorInputs& inputs)
      : NetworkComponent(name, entry, exit, shaft), compressor_(inputs) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;
  void describe(std::vector<engine::ControlVolume>& volumes) const override;

 private:
  components::Compressor compressor_;
};

}  // namespace cw::network
