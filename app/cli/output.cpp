#include "output.h"

#include "common/error.h"
#include "common/text.h"

#include <algorithm>
#include <ostream>
#include <vector>

namespace cw::cli {

std::string formatName(Format format) {
  switch (format) {
    case Format::Text:
      return "text";
    case Format::Json:
      return "json";
    case Format::Csv:
      return "csv";
  }
  return "";
}

Format parseFormat(const std::string& text, const std::vector<Format>& formats) {
  std::string names;
  for (Format format : formats) {
    if (text == formatName(format)) return format;
    names += (names.empty() ? "" : ", ") + formatName(format);
  }
  throw InvalidInput("--format", "expected one of " + names + ", got \"" + excerpt(text) + "\"");
}

static void flatten(const nlohmann::json& value, const std::string& prefix,
                    std::vector<std::pair<std::string, std::string>>& rows) {
  if (value.is_object()) {
    for (const auto& [key, item] : value.items())
      flatten(item, prefix.empty() ? key : prefix + "." + key, rows);
  } else if (value.is_number_float()) {
    rows.emplace_back(prefix, formatNumber(value.get<double>()));
  } else if (value.is_string()) {
    rows.emplace_back(prefix, value.get<std::string>());
  } else {
    rows.emplace_back(prefix, value.dump());
  }
}

void printRecord(std::ostream& out, const nlohmann::json& record, Format format) {
  if (format == Format::Json) {
    out << record.dump(2) << '\n';
    return;
  }
  std::vector<std::pair<std::string, std::string>> rows;
  flatten(record, "", rows);
  if (format == Format::Csv) {
    for (std::size_t i = 0; i < rows.size(); ++i) out << (i ? "," : "") << rows[i].first;
    out << '\n';
    for (std::size_t i = 0; i < rows.size(); ++i) out << (i ? "," : "") << rows[i].second;
    out << '\n';
    return;
  }
  std::size_t width = 0;
  for (const auto& row : rows) width = std::max(width, row.first.size());
  for (const auto& [key, text] : rows) out << key << std::string(width - key.size() + 2, ' ') << text << '\n';
}

}  // namespace cw::cli
