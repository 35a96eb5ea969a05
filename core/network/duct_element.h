#pragma once
// A duct in a network (the jet pipe, a bypass duct): adiabatic, with a total-pressure loss. It may
// be several ducts in series reported as one component (the jet pipe followed by an unlit
// afterburner's duct): each section ends at a station, the inner ones internal (not reported),
// and is a control volume of its own in the second-law balance.

#include "components/duct.h"
#include "network/network_component.h"

namespace cw::network {

class DuctElement : public NetworkComponent {
 public:
  struct Section {
    std::string name;                   ///< its control volume's name ("jet_pipe", "afterburner")
    double pressureLossFraction = 0.0;  ///< 1 - pt_out / pt_in [-]
    std::string exit;                   ///< the station it ends at (the last: the duct's exit)
  };

  /// One section: the duct itself from entry to exit.
  DuctElement(std::string name, std::string entry, std::string exit, double pressureLossFraction)
      : DuctElement(name, entry, {Section{name, pressureLossFraction, exit}}) {}
  /// Sections in series from entry; the duct's exit is the last section's.
  DuctElement(std::string name, std::string entry, std::vector<Section> sections)
      : NetworkComponent(std::move(name), std::move(entry), sections.back().exit),
        sections_(std::move(sections)) {}

  void design(DesignState& state) const override;
  void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const override;
  void describe(std::vector<engine::ControlVolume>& volumes) const override;

 private:
  std::vector<Section> sections_;
};

}  // namespace cw::network
