#include "network/topologies.h"

#include "network/compressor_element.h"
#include "network/duct_element.h"
#include "network/heat_addition_element.h"
#include "network/inlet_element.h"
#include "network/nozzle_element.h"
#include "network/turbine_element.h"

#include <array>

namespace cw::network {

namespace {

using engine::Case;

/// From the free stream to the engine face.
void addInlet(Network& net, const Case& c) {
  net.add<InletElement>("inlet", "0", "2", c.inlet, c.sizing.engineFaceMach);
}

void addBurner(Network& net, const Case& c, const thermo::GasModel& model) {
  net.add<HeatAdditionElement>("burner", "3", "4", model, c.burner.setting, c.burner.pressureLossFraction,
                               c.burner.combustionEfficiency);
}

/// From the last turbine's exit 5: the jet pipe, the afterburner (lit: a heat addition 6 -> 7;
/// unlit with a loss: a second duct section), the nozzle.
void addExhaust(Network& net, const Case& c, const thermo::GasModel& model) {
  const auto& ab = c.afterburner;
  if (ab.enabled) {
    net.add<DuctElement>("jet_pipe", "5", "6", c.jetPipe.pressureLossFraction);
    net.add<HeatAdditionElement>("afterburner", "6", "7", model,
                                 components::ExitTemperatureSetting{ab.exitTemperature},
                                 ab.pressureLossFractionLit, ab.combustionEfficiency);
  } else if (ab.pressureLossFractionUnlit > 0.0) {
    net.add<DuctElement>("jet_pipe", "5",
                         DuctElement::Section{"jet_pipe", c.jetPipe.pressureLossFraction, "6"},
                         DuctElement::Section{"afterburner", ab.pressureLossFractionUnlit, "7"});
  } else {
    net.add<DuctElement>("jet_pipe", "5", "7", c.jetPipe.pressureLossFraction);
  }
  net.add<NozzleElement>("nozzle", "7", "8", "9", c.nozzle);
}

ShaftSpec shaftOf(std::string name, const components::TurbineInputs& turbine) {
  return {std::move(name), turbine.mechanicalEfficiency, turbine.powerOfftake};
}

/// The shapes of the exhaust (addExhaust): plain, an unlit afterburner's duct, a lit afterburner.
int exhaustShape(const Case& c) {
  return c.afterburner.enabled ? 2 : c.afterburner.pressureLossFractionUnlit > 0.0 ? 1 : 0;
}

Case withExhaustShape(int shape) {
  Case c;
  c.afterburner.enabled = shape == 2;
  c.afterburner.pressureLossFractionUnlit = shape == 1 ? 0.01 : 0.0;
  return c;
}

/// A topology's network with its description shared: built once per exhaust shape, from the
/// network of a default case of that shape (the description does not depend on the inputs).
template <Topology build>
void withSharedDescription(Network& net, const Case& c, const thermo::GasModel& model) {
  static const auto descriptions = [&] {
    std::array<std::shared_ptr<const engine::NetworkDescription>, 3> d;
    for (int shape = 0; shape < 3; ++shape) {
      Network example;
      build(example, withExhaustShape(shape), model);
      d[shape] = example.description();
    }
    return d;
  }();
  build(net, c, model);
  net.shareDescription(descriptions[exhaustShape(c)]);
}

void buildTurbojet(Network& net, const Case& c, const thermo::GasModel& model) {
  net.setRoles({"0", "2", "3", "4"});
  net.addShaft(shaftOf("shaft", c.turbine));
  addInlet(net, c);
  net.add<CompressorElement>("compressor", "2", "3", "shaft", c.compressor);
  addBurner(net, c, model);
  net.add<TurbineElement>("turbine", "4", "5", "shaft", c.turbine.efficiency);
  addExhaust(net, c, model);
}

void buildTwoSpoolTurbojet(Network& net, const Case& c, const thermo::GasModel& model) {
  net.setRoles({"0", "2", "3", "4"});
  net.addShaft(shaftOf("low_pressure_shaft", c.lowPressureTurbine));
  net.addShaft(shaftOf("high_pressure_shaft", c.turbine));
  addInlet(net, c);
  net.add<CompressorElement>("low_pressure_compressor", "2", "25", "low_pressure_shaft",
                             c.lowPressureCompressor);
  net.add<CompressorElement>("high_pressure_compressor", "25", "3", "high_pressure_shaft", c.compressor);
  addBurner(net, c, model);
  net.add<TurbineElement>("high_pressure_turbine", "4", "45", "high_pressure_shaft", c.turbine.efficiency);
  net.add<TurbineElement>("low_pressure_turbine", "45", "5", "low_pressure_shaft",
                          c.lowPressureTurbine.efficiency);
  addExhaust(net, c, model);
}

}  // namespace

void turbojet(Network& net, const Case& c, const thermo::GasModel& model) {
  withSharedDescription<&buildTurbojet>(net, c, model);
}

void twoSpoolTurbojet(Network& net, const Case& c, const thermo::GasModel& model) {
  withSharedDescription<&buildTwoSpoolTurbojet>(net, c, model);
}

Topology topologyOf(const Case& c) {
  switch (c.architecture) {
    case engine::Architecture::TwoSpoolTurbojet:
      return &twoSpoolTurbojet;
    case engine::Architecture::Turbojet:
      break;
  }
  return &turbojet;
}

}  // namespace cw::network
