#include "engine/process_paths.h"

#include <cmath>

namespace cw::engine {

namespace {

PathState stateOf(const thermo::Gas& gas, double T, double p, double entropyReference) {
  return {T,
          gas.entropy(T, p) - entropyReference,
          p,
          gas.gasConstant() * T / p,
          gas.enthalpy(T),
          gas.sensibleEnthalpy(T)};
}

double lerp(double a, double b, double x) {
  return a + (b - a) * x;
}

}  // namespace

ProcessPath pressurePath(std::string component, std::string from, std::string to, const thermo::Gas& gas,
                         double t1, double p1, double t2, double p2, double entropyReference) {
  ProcessPath path{std::move(component), std::move(from), std::move(to), false, {}};
  path.states.reserve(kPathStates);
  const double s1 = gas.entropy(t1, p1), s2 = gas.entropy(t2, p2);
  const double ln1 = std::log(p1), ln2 = std::log(p2);
  for (int i = 0; i < kPathStates; ++i) {
    const double x = double(i) / (kPathStates - 1);
    double T = (i == 0) ? t1 : (i == kPathStates - 1) ? t2 : 0.0;
    const double p = (i == 0) ? p1 : (i == kPathStates - 1) ? p2 : std::exp(lerp(ln1, ln2, x));
    if (T == 0.0) T = gas.temperatureFromEntropy(lerp(s1, s2, x), p);
    path.states.push_back(stateOf(gas, T, p, entropyReference));
  }
  return path;
}

ProcessPath heatingPath(std::string component, std::string from, std::string to, const thermo::Gas& entryGas,
                        const thermo::Gas& exitGas, double t1, double p1, double t2, double p2,
                        double entropyReference) {
  ProcessPath path{std::move(component), std::move(from), std::move(to), false, {}};
  path.states.reserve(kPathStates);
  for (int i = 0; i < kPathStates; ++i) {
    const double x = double(i) / (kPathStates - 1);
    const double T = lerp(t1, t2, x), p = lerp(p1, p2, x);
    const PathState a = stateOf(entryGas, T, p, entropyReference),
                    b = stateOf(exitGas, T, p, entropyReference);
    path.states.push_back({T, lerp(a.entropy, b.entropy, x), p, lerp(a.specificVolume, b.specificVolume, x),
                           lerp(a.enthalpy, b.enthalpy, x), lerp(a.sensibleEnthalpy, b.sensibleEnthalpy, x)});
  }
  return path;
}

ProcessPath closurePath(const thermo::Gas& exhaustGas, double t9, double p9, double t0, double p0,
                        double entropyReference, const thermo::Gas& air, std::string from, std::string to) {
  ProcessPath path{"closure", std::move(from), std::move(to), true, {}};
  path.states.reserve(kClosureExpansionStates + kPathStates);
  // An exhaust not at ambient pressure (a choked convergent nozzle) first expands to it at its
  // own entropy; the isobar then starts at the end of that expansion.
  double tStart = t9;
  if (std::fabs(p9 - p0) > 1e-9 * p0) {
    const double s9 = exhaustGas.entropy(t9, p9);
    for (int i = 0; i < kClosureExpansionStates; ++i) {
      const double x = double(i) / (kClosureExpansionStates - 1);
      const double p = i == kClosureExpansionStates - 1 ? p0 : std::exp(lerp(std::log(p9), std::log(p0), x));
      const double T = i == 0 ? t9 : exhaustGas.temperatureFromEntropy(s9, p);
      path.states.push_back(stateOf(exhaustGas, T, p, entropyReference));
    }
    tStart = path.states.back().temperature;
  }
  // The isobar at p0: temperature linear; the properties blended from the exhaust gas's to the
  // air's at the same (T, p0), exact at both ends (the same convention as heatingPath).
  for (int i = path.states.empty() ? 0 : 1; i < kPathStates; ++i) {
    const double x = double(i) / (kPathStates - 1);
    const double T = i == kPathStates - 1 ? t0 : lerp(tStart, t0, x);
    const PathState a = stateOf(exhaustGas, T, p0, entropyReference),
                    b = stateOf(air, T, p0, entropyReference);
    path.states.push_back({T, lerp(a.entropy, b.entropy, x), p0, lerp(a.specificVolume, b.specificVolume, x),
                           lerp(a.enthalpy, b.enthalpy, x), lerp(a.sensibleEnthalpy, b.sensibleEnthalpy, x)});
  }
  return path;
}

}  // namespace cw::engine
