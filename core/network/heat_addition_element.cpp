#include "network/heat_addition_element.h"

#include "engine/process_paths.h"

#include <cmath>

namespace cw::network {

void HeatAdditionElement::design(DesignState& state) const {
  const StationState& in = state.at(entry());
  const components::HeatAddition::Result combustion = within(name(), [&] {
    return std::holds_alternative<components::ExitTemperatureSetting>(setting_)
               ? heating_.toExitTemperature(
                     in.total, std::get<components::ExitTemperatureSetting>(setting_).exitTemperature)
               : heating_.withFuelAirRatio(in.total,
                                           std::get<components::FuelAirRatioSetting>(setting_).fuelAirRatio);
  });
  stream::Station out = state.atRest(exit(), combustion.exit);
  // The entropy of the pressure loss alone, W R ln(pt_in / pt_out): the heating's own is the
  // cycle's, not a loss.
  const double lossEntropy =
      out.massFlow * out.gas->gasConstant() * std::log(in.total.pressure / out.totalPressure);
  state.summaries.push_back({name(), 0.0, std::nullopt, lossEntropy});
  state.fuelFlow += combustion.fuelMassFlow;
  state.put(std::move(out), combustion.exit);
}

void HeatAdditionElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()).station, &out = state.at(exit()).station;
  paths.push_back(engine::heatingPath(name(), entry(), exit(), *in.gas, *out.gas, in.totalTemperature,
                                      in.totalPressure, out.totalTemperature, out.totalPressure,
                                      state.context.entropyReference));
}

void HeatAdditionElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  volumes.push_back(
      {name(), engine::ControlVolume::Kind::HeatAddition, entry(), exit(), {}, combustionEfficiency_});
}

}  // namespace cw::network
