#pragma once
// The running state of one design point through a network: the stations reached so far (the
// stream's total state at each is the next component's entry), the shafts' work, the components'
// summaries and what the nozzles and heat additions gave. Components read their entry stations from it and
// put their exit stations, work and summary into it (network_component.h); the design sequence
// (design_point.h) adds up performance and sizing from it.

#include "common/error.h"
#include "engine/cycle_result.h"
#include "engine/free_stream.h"
#include "flow/flow_state.h"
#include "thermo/gas_model.h"

#include <string>
#include <string_view>
#include <vector>

namespace cw::network {

/// What does not depend on the air mass flow: found once per network and flight condition.
struct DesignContext {
  const thermo::GasModel& model;
  std::shared_ptr<const thermo::Gas> air;
  engine::FreeStream freeStream;
  flow::FlowState free;           ///< the free stream, static state (T0, p0) at M0
  double entropyReference = 0.0;  ///< s(T0, p0) of the air [J/(kg K)]
  bool withPaths = true;          ///< process paths for the charts
};

/// What one nozzle gave (views of the topology's static text).
struct NozzleRecord {
  std::string_view nozzle;  ///< its component name
  std::string_view throat;  ///< station ids
  std::string_view exit;
  double grossThrust = 0.0;  ///< [N]
  bool choked = false;
  double exitMassFlow = 0.0;  ///< W9 [kg/s]
  double exitVelocity = 0.0;  ///< V9 [m/s]
  double throatArea = 0.0;    ///< geometric A8 [m^2]
  double exitArea = 0.0;      ///< geometric A9 [m^2]
};

class DesignState {
 public:
  DesignState(const DesignContext& context, double airMassFlow) : context(context), airMassFlow(airMassFlow) {
    stations.reserve(kStations);
  }
  DesignState(const DesignState&) = delete;
  DesignState& operator=(const DesignState&) = delete;

  /// Stations reserved at once: more than a turbofan's (more are allocated as needed).
  static constexpr std::size_t kStations = 20;

  const DesignContext& context;
  double airMassFlow;  ///< W0 = W2 [kg/s]

  /// The station with the given id, reported or internal; throws std::out_of_range when it has
  /// not been reached.
  const stream::Station& at(std::string_view id) const;
  /// The stream's total state at a station: what the next component takes in.
  stream::TotalState totalAt(std::string_view id) const;
  /// Adds a station (its entropy on the result's datum, zero at the free stream's static state);
  /// an internal one lies inside a component and is not reported.
  void put(stream::Station station, bool reported = true);
  /// Adds a station at rest from a total state (no area known there).
  void putAtRest(std::string_view id, const stream::TotalState& total, bool reported = true);
  /// The station with the stream at rest, its entropy on the result's datum.
  stream::Station atRest(std::string_view id, const stream::TotalState& total) const;

  /// The named shaft's balance; throws std::out_of_range for a shaft the network lacks.
  engine::ShaftBalance& shaft(std::string_view name);

  std::vector<stream::Station> stations;          ///< reported, in the order reached: flow order
  std::vector<stream::Station> internalStations;  ///< inside components
  std::vector<engine::ShaftBalance> shafts;
  std::vector<engine::ComponentSummary> summaries;  ///< in flow order
  std::vector<NozzleRecord> nozzles;                ///< in flow order
  double fuelFlow = 0.0;                            ///< every heat addition's [kg/s]
};

/// S_gen = W_out (s_out - s_in) of an adiabatic passage between two stations. [W/K]
double entropyRate(const stream::Station& in, const stream::Station& out);

/// Runs one component: a state beyond the gas data found inside it is reported against the component.
template <typename Run>
auto within(std::string_view component, Run&& run) -> decltype(run()) {
  try {
    return run();
  } catch (const OutOfRange& e) {
    // The state's own parts when it has them (subject, value, range), for a front end's message.
    ErrorDetail detail;
    if (e.detail().reason == kReasonOutsideRange)
      detail = {kReasonBeyondGasData, e.where(), e.detail().quantities, e.detail().validRange};
    throw OutOfRange(std::string(component), std::string("a state beyond the gas data (") + e.what() + ")",
                     std::move(detail));
  }
}

}  // namespace cw::network
