#pragma once
// A duct in a network (the jet pipe, a bypass duct): adiabatic, with a total-pressure loss. It may
// be two ducts in series reported as one component (the jet pipe followed by an unlit
// afterburner's duct): each section ends at a station, the inner ones internal (not reported),
// and is a control volume of its own in the second-law balance.

#include "components/duct.h"
#include "network/network_component.h"

#include <array>

namespace cw::network {

class DuctElement : public NetworkComponent {
 public:
  struct Section {
    std::string_view name;              ///< its control volume's name ("jet_pipe", "afterburner")
    double pressureLossFraction = 0.0;  ///< 1 - pt_out / pt_in [-]
    std::string_view exit;              ///< the station it ends at (the last: the duct's exit)
  };

  /// One section: the duct itself from entry to exit.
  DuctElement(std::string_view name, std::string_view entry, std::string_view exit,
              double pressureLossFraction)
      : NetworkComponent(name, entry, exit),
        sections_{Section{name, pressureLossFraction, exit}, Section{}},
        sectionCount_(1) {}
  /// Two sections in series from entry; the duct's exit is the second's.
  DuctElement(std::string_view name, std::string_view entry, const Section& first, const Section& second)
      : NetworkComponent(name, entry, second.exit), sections_{first, second}, sectionCount_(2) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;
  void describe(std::vector<engine::ControlVolume>& volumes) const override;

 private:
  std::array<Section, 2> sections_;
  std::size_t sectionCount_;
};

}  // namespace cw::network
