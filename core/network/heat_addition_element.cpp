#include "network/heat_addition_element.h"

#include "engine/process_paths.h"

#include <cmath>

namespace cw::network {

void HeatAdditionElement::design(DesignState& state) const {
  const stream::TotalState inflow = state.totalAt(entry());
  const components::HeatAddition::Result combustion = within(name(), [&] {
    return std::holds_alternative<components::ExitTemperatureSetting>(setting_)
               ? heating_.toExitTemperature(
                     inflow, std::get<components::ExitTemperatureSetting>(setting_).exitTemperature)
               : heating_.withFuelAirRatio(inflow,
                                           std::get<components::FuelAirRatioSetting>(setting_).fuelAirRatio);
  });
  stream::Station out = state.atRest(exit(), combustion.exit);
  // The entropy of the pressure loss alone, W R ln(pt_in / pt_out): the heating's own is the
  // cycle's, not a loss.
  const double lossEntropy =
      out.massFlow * out.gas->gasConstant() * std::log(inflow.pressure / out.totalPressure);
  state.summaries.push_back({std::string(name()), 0.0, std::nullopt, lossEntropy, combustionEfficiency_});
  state.fuelFlow += combustion.fuelMassFlow;
  state.put(std::move(out));
}

void HeatAdditionElement::addPath(const DesignState& state, std::vector<engine::ProcessPath>& paths) const {
  const stream::Station &in = state.at(entry()), &out = state.at(exit());
  paths.push_back(engine::heatingPath(std::string(name()), std::string(entry()), std::string(exit()), *in.gas,
                                      *out.gas, in.totalTemperature, in.totalPressure, out.totalTemperature,
                                      out.totalPressure, state.context.entropyReference));
}

void HeatAdditionElement::describe(std::vector<engine::ControlVolume>& volumes) const {
  volumes.push_back({std::string(name()),
                     engine::ControlVolume::Kind::HeatAddition,
                     std::string(entry()),
                     std::string(exit()),
                     {}});
}

}  // namespace cw::network
