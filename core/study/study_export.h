#pragma once
// Trade-study results as files: CSV (one row per point: the varied inputs, the status, the chosen
// columns, the reason) and JSON (format "cyclewright-study", version 1: the grid, every point's
// status and values). Values are in the units their names carry (study/study_columns.h), numbers
// in the shortest form that reads back to the same double, in the C locale. The output does not
// depend on the number of threads that ran the study.

#include "study/study_columns.h"
#include "study/trade_study.h"

#include <nlohmann/json.hpp>

#include <string>
#include <vector>

namespace cw::study {

inline constexpr const char* kStudyFormat = "cyclewright-study";
inline constexpr int kStudyVersion = 1;

/// CSV text, caution and a description of the grid first as '#' comment lines.
std::string studyToCsv(const TradeStudy& study, const std::vector<StudyColumn>& columns);

/// The JSON document of a study.
nlohmann::json studyToJson(const TradeStudy& study, const std::vector<StudyColumn>& columns);

/// One line describing the grid, e.g. "carpet: compressor.pressure_ratio 4 to 40 (10 values) x ...".
std::string describeStudy(const TradeStudy& study);

}  // namespace cw::study
