#pragma once
// Display names of a trade study's output columns (core/study/study_columns.h) and point
// statuses, translated, and the display quantity of each column. Names only.

#include "document/units.h"

#include "study/study_columns.h"
#include "study/trade_study.h"

#include <QString>

namespace cw::gui {

/// The display quantity of a column's value (for its unit).
Quantity displayQuantity(study::Quantity quantity);

/// The translated label of a column, e.g. "Specific thrust", "Ideal TSFC",
/// "Specific thrust gained without Compressor"; the core's label when the column is unknown.
QString studyColumnLabel(const study::StudyColumn& column);

/// The translated status of a point, e.g. "No cycle".
QString pointStatusName(study::PointStatus status);

}  // namespace cw::gui
