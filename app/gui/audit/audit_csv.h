#pragma once
// The loss audit as one CSV table (pure formatting of core/analysis/loss_audit.h, SI units in
// the column names, TSFC in g/(kN s) as the command line prints it). The first line is the
// caution (cw::kCaution) as a comment; then one row per item of the four views:
//   view = figures | one_at_a_time | waterfall | sensitivity | exergy
// with empty cells where a column does not apply.

#include "analysis/loss_audit.h"

#include <string>

namespace cw::gui {

std::string lossAuditCsv(const analysis::LossAudit& audit);

}  // namespace cw::gui
