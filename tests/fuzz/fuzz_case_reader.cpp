// libFuzzer harness of the case reader: any bytes as a case file's text (io/case_file.h,
// parseCaseText: the same checks as a file read from disk), then, for a valid case, the design
// point. Only cw::Error may come out; every message must be short, well-formed UTF-8 text.
// Build and run: scripts/fuzz.sh (DEVELOPERS.md, "Fuzzing").
#include "common/error.h"
#include "common/text.h"
#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string_view>

namespace {

/// A message a user could see: valid UTF-8 and bounded (40 problems of a few hundred bytes each).
void requireSaneMessage(const char* message) {
  const std::string_view text(message);
  if (!cw::isValidUtf8(text) || text.size() > 64 * 1024) {
    std::fprintf(stderr, "fuzz_case_reader: bad message (%zu bytes)\n", text.size());
    std::abort();
  }
}

void requireFinite(const cw::engine::CycleResult& result) {
  const auto& p = result.performance;
  for (double v : {p.netThrust, p.specificThrust, p.thrustSpecificFuelConsumption, p.fuelFlow,
                   p.thermalEfficiency, p.propulsiveEfficiency, p.overallEfficiency})
    if (!std::isfinite(v)) std::abort();
  for (const auto& s : result.stations)
    for (double v :
         {s.totalTemperature, s.totalPressure, s.staticTemperature, s.staticPressure, s.velocity, s.entropy})
      if (!std::isfinite(v)) std::abort();
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  try {
    const cw::engine::Case inputs = cw::io::parseCaseText(text, "fuzz.json");
    const cw::engine::Evaluation evaluation = cw::engine::evaluateCase(inputs, false);
    requireFinite(evaluation.actual);
    requireFinite(evaluation.ideal);
  } catch (const cw::Error& e) {
    requireSaneMessage(e.what());
  }
  return 0;
}
