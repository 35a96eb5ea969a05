#include "study/sweep_axis.h"

#include "common/error.h"

#include <charconv>
#include <cmath>

namespace cw::study {

namespace {

bool parseDouble(const std::string& text, double& value) {
  const char* begin = text.data();
  const char* end = begin + text.size();
  if (begin != end && *begin == '+') ++begin;
  const auto [stop, ec] = std::from_chars(begin, end, value);
  return ec == std::errc() && stop == end && begin != end && std::isfinite(value);
}

bool parseInt(const std::string& text, int& value) {
  const char* begin = text.data();
  const char* end = begin + text.size();
  const auto [stop, ec] = std::from_chars(begin, end, value);
  return ec == std::errc() && stop == end && begin != end;
}

}  // namespace

std::vector<double> SweepAxis::values() const {
  std::vector<double> v;
  if (count < 1) return v;
  v.reserve(static_cast<std::size_t>(count));
  if (count == 1) {
    v.push_back(start);
    return v;
  }
  const double step = (stop - start) / (count - 1);
  for (int i = 0; i < count - 1; ++i) v.push_back(start + i * step);
  v.push_back(stop);
  return v;
}

void checkSweepAxis(const SweepAxis& axis, const std::string& where) {
  const std::string name = where + " " + axis.path;
  if (!std::isfinite(axis.start) || !std::isfinite(axis.stop))
    throw InvalidInput(name, "START and STOP must be finite numbers");
  if (axis.count < 1 || axis.count > kMaxAxisCount)
    throw InvalidInput(name + " COUNT", axis.count, "", "[1, " + std::to_string(kMaxAxisCount) + "]");
  if (axis.count == 1 && axis.start != axis.stop)
    throw InvalidInput(name, "COUNT 1 takes one value: give START = STOP, or COUNT of 2 or more");
  if (axis.count > 1 && axis.start == axis.stop)
    throw InvalidInput(name, "START = STOP gives one value: give COUNT 1, or a STOP different from START");
}

SweepAxis parseSweepAxis(const std::string& text, const std::string& where) {
  const std::string form = "expected PATH=START:STOP:COUNT, e.g. compressor.pressure_ratio=4:40:37";
  const auto equals = text.find('=');
  if (equals == std::string::npos || equals == 0) throw InvalidInput(where, form + ", got \"" + text + "\"");
  SweepAxis axis;
  axis.path = text.substr(0, equals);
  const std::string range = text.substr(equals + 1);
  const auto first = range.find(':');
  const auto second = first == std::string::npos ? std::string::npos : range.find(':', first + 1);
  if (second == std::string::npos || range.find(':', second + 1) != std::string::npos)
    throw InvalidInput(where + " " + axis.path, form + ", got \"" + range + "\"");
  const std::string startText = range.substr(0, first);
  const std::string stopText = range.substr(first + 1, second - first - 1);
  const std::string countText = range.substr(second + 1);
  if (!parseDouble(startText, axis.start))
    throw InvalidInput(where + " " + axis.path, "START is not a number: \"" + startText + "\"");
  if (!parseDouble(stopText, axis.stop))
    throw InvalidInput(where + " " + axis.path, "STOP is not a number: \"" + stopText + "\"");
  if (!parseInt(countText, axis.count))
    throw InvalidInput(where + " " + axis.path, "COUNT is not a whole number: \"" + countText + "\"");
  checkSweepAxis(axis, where);
  return axis;
}

}  // namespace cw::study
