#pragma once
// One component placed in a network: the small interface through which the network runs it.
//
// A network component sits on a stream between named stations (SAE AS755 ids), and may give work
// to or take work from a shaft. It describes itself by
//   design     how it turns its entry state(s) into exit state(s) at the design point, the work it
//              gives to or takes from its shaft (a compressor adds its power to the shaft's
//              demand, a turbine delivers that demand), and its summary (shaft power,
//              efficiencies, entropy generated);
//   addPath    its process path(s) for the charts, once every station is known;
//   describe   its control volume(s) for the second-law balance (analysis/exergy_balance.h).
// Each kind is a small adapter around one class of components/ (inlet_element.h, ...), holding no
// physics of its own. Off-design later adds to this interface (the component's unknowns, such as
// a map's operating point, and its residuals, such as the flow a map admits against the flow that
// arrives) without changing what is here.

#include "engine/cycle_result.h"
#include "network/design_state.h"

#include <string>
#include <string_view>
#include <vector>

namespace cw::network {

class NetworkComponent {
 public:
  /// name: the component's role ("compressor", "high_pressure_turbine", ...); entry and exit:
  /// station ids; shaft: the shaft it works on, empty for none. All four are a topology's static
  /// text (string literals): the component keeps views of them.
  NetworkComponent(std::string_view name, std::string_view entry, std::string_view exit,
                   std::string_view shaft = {})
      : name_(name), entry_(entry), exit_(exit), shaft_(shaft) {}
  virtual ~NetworkComponent() = default;
  NetworkComponent(const NetworkComponent&) = delete;
  NetworkComponent& operator=(const NetworkComponent&) = delete;

  std::string_view name() const { return name_; }
  std::string_view entry() const { return entry_; }
  std::string_view exit() const { return exit_; }
  std::string_view shaft() const { return shaft_; }

  /// The design point: reads the entry station from the state, puts the exit station(s), the
  /// shaft work and the component's summary.
  virtual void design(DesignState& state) const = 0;
  /// Appends the component's process path(s) between its stations.
  virtual void addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const = 0;
  /// Appends the component's control volume(s): by default one adiabatic passage entry -> exit.
  virtual void describe(std::vector<engine::ControlVolume>& volumes) const;

 private:
  std::string_view name_, entry_, exit_, shaft_;
};

}  // namespace cw::network
