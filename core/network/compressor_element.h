#pragma once
// A compressor in a network: takes its power from its shaft; its bleed leaves at its exit.

#include "components/compressor.h"
#include "network/network_component.h"

namespace cw::network {

class CompressorElement : public NetworkComponent {
 public:
  CompressorElement(std::string name, std::string entry, std::string exit, std::string shaft,
                    const components::CompressorInputs& inputs)
      : NetworkComponent(std::move(name), std::move(entry), std::move(exit), std::move(shaft)),
        compressor_(inputs) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;
  void describe(std::vector<engine::ControlVolume>& volumes) const override;

 private:
  components::Compressor compressor_;
};

}  // namespace cw::network
