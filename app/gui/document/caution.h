#pragma once

#include <QString>

namespace cw::gui {

/// The caution every export, report and the About box carries: results are conceptual-design
/// estimates; for anything that affects flight safety the engine maker's data, the organisation's
/// procedures and licensed practice decide.
[[nodiscard]] QString cautionText();

}  // namespace cw::gui
