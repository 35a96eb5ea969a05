#include "study/study_export.h"

#include "common/error.h"
#include "common/version.h"

#include <sstream>

namespace cw::study {

namespace {

using nlohmann::json;

/// A CSV field: quoted (with doubled quotes) when it holds a comma, quote or line break.
std::string csvField(const std::string& text) {
  if (text.find_first_of(",\"\n\r") == std::string::npos) return text;
  std::string quoted = "\"";
  for (const char c : text) {
    if (c == '"') quoted += '"';
    quoted += c;
  }
  return quoted + '"';
}

json pointValues(const StudyPoint& point, const std::vector<StudyColumn>& columns) {
  json values = json::object();
  for (const StudyColumn& column : columns) {
    const auto value = column.value(point);
    values[column.name] = value ? json(*value * column.fileScale) : json(nullptr);
  }
  return values;
}

json pointJson(const TradeStudy& s, const StudyPoint& point, const std::vector<StudyColumn>& columns,
               const std::array<bool, 2>& known) {
  json j;
  json inputs = json::object();
  for (std::size_t k = 0; k < s.axes.size(); ++k)
    inputs[s.axes[k].path] = known[k] ? json(point.inputs[k]) : json(nullptr);
  j["inputs"] = inputs;
  j["status"] = std::string(toString(point.status));
  if (!point.reason.empty()) j["reason"] = point.reason;
  j["values"] = pointValues(point, columns);
  return j;
}

}  // namespace

std::string describeStudy(const TradeStudy& s) {
  std::ostringstream text;
  text << (s.axes.size() > 1 ? "carpet: " : "sweep: ");
  for (std::size_t k = 0; k < s.axes.size(); ++k) {
    const auto& a = s.axes[k];
    if (k > 0) text << " x ";
    text << a.path << ' ' << formatNumber(a.start) << " to " << formatNumber(a.stop) << " (" << a.count
         << (a.count == 1 ? " value)" : " values)");
  }
  text << ", " << s.points.size() << " points, " << s.count(PointStatus::Solved) << " solved";
  if (s.stopped) text << ", stopped before the end";
  return text.str();
}

std::string studyToCsv(const TradeStudy& s, const std::vector<StudyColumn>& columns) {
  std::ostringstream out;
  out << "# caution: " << kCaution << '\n' << "# " << describeStudy(s) << '\n';
  for (const auto& axis : s.axes) out << csvField(axis.path) << ',';
  out << "status";
  for (const StudyColumn& column : columns) out << ',' << csvField(column.name);
  out << ",reason\n";
  for (const StudyPoint& point : s.points) {
    for (std::size_t k = 0; k < s.axes.size(); ++k) out << formatNumber(point.inputs[k]) << ',';
    out << toString(point.status);
    for (const StudyColumn& column : columns) {
      out << ',';
      if (const auto value = column.value(point)) out << formatNumber(*value * column.fileScale);
    }
    out << ',' << csvField(point.reason) << '\n';
  }
  return out.str();
}

json studyToJson(const TradeStudy& s, const std::vector<StudyColumn>& columns) {
  json j;
  j["format"] = kStudyFormat;
  j["version"] = kStudyVersion;
  j["caution"] = kCaution;
  j["kind"] = s.axes.size() > 1 ? "carpet" : "sweep";
  j["description"] = describeStudy(s);
  j["grid_order"] = "first axis outer, second inner: point index = i * count2 + j";
  j["axes"] = json::array();
  for (const auto& a : s.axes)
    j["axes"].push_back(
        {{"path", a.path}, {"start", a.start}, {"stop", a.stop}, {"count", a.count}, {"values", a.values()}});
  j["with_audit"] = s.withAudit;
  j["stopped"] = s.stopped;
  j["columns"] = json::array();
  for (const StudyColumn& c : columns) j["columns"].push_back(c.name);
  json counts = json::object();
  for (const auto status : {PointStatus::Solved, PointStatus::InvalidInput, PointStatus::NoCycle,
                            PointStatus::NotConverged, PointStatus::OutOfRange, PointStatus::NotRun})
    counts[std::string(toString(status))] = s.count(status);
  j["counts"] = counts;
  j["design_point"] = pointJson(s, s.designPoint, columns, s.designPointOnAxis);
  j["design_point"]["note"] = "the case as given, before any input is varied";
  j["points"] = json::array();
  for (const StudyPoint& point : s.points) {
    json p = pointJson(s, point, columns, {true, true});
    p["index"] =
        s.axes.size() > 1 ? json::array({point.index[0], point.index[1]}) : json::array({point.index[0]});
    j["points"].push_back(std::move(p));
  }
  return j;
}

}  // namespace cw::study
