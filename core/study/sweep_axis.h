#pragma once
// One varied input of a trade study: a numeric case input (named by its --set path) over
// COUNT evenly spaced values from START to STOP, both included.

#include <string>
#include <vector>

namespace cw::study {

/// Limits of a study's size, so that a typing slip cannot ask for a billion evaluations.
inline constexpr int kMaxAxisCount = 1000;
inline constexpr long kMaxStudyPoints = 250000;

struct SweepAxis {
  std::string path;  ///< --set path of a numeric input, e.g. "compressor.pressure_ratio"
  double start = 0.0;
  double stop = 0.0;
  int count = 1;  ///< number of values, 1 to kMaxAxisCount; 1 means START only (START = STOP)

  /// The values, start + i (stop - start) / (count - 1); the last is exactly `stop`.
  std::vector<double> values() const;
  bool operator==(const SweepAxis&) const = default;
};

/// Parses "PATH=START:STOP:COUNT" (numbers in the C locale, e.g. "compressor.pressure_ratio=4:40:37").
/// Throws cw::InvalidInput (where = `where`, e.g. "--vary") naming the part that is wrong. The path
/// is checked by the trade study, which knows the case.
SweepAxis parseSweepAxis(const std::string& text, const std::string& where = "--vary");

/// Checks an axis on its own: count in range, finite bounds, START = STOP when COUNT is 1.
/// Throws cw::InvalidInput naming `where`.
void checkSweepAxis(const SweepAxis& axis, const std::string& where = "--vary");

}  // namespace cw::study
