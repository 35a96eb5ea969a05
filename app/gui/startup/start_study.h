#pragma once
// The trade study a start asks for (--study-vary, --study-compare, --study-plot): the panel set
// up from the command line and run before the window is shown or rendered. An input or column
// the case does not offer is named with the closest one that it does (cw::io::closestName), the
// way cyclewright-cli --set names an unknown key.

#include "startup/start_options.h"

#include "engine/case_inputs.h"

namespace cw::gui {

class TradeStudyPanel;

/// Sets the panel's inputs (one or two), comparison and plotted column. Throws cw::InvalidInput
/// "--study-vary PATH: not a numeric input of this case (did you mean ...?)" and the like.
void setUpStudy(TradeStudyPanel& panel, const engine::Case& inputs, const StartRequest& request);

/// Runs the panel's study and waits for it (the event loop runs meanwhile). Throws
/// cw::InvalidInput "--study-vary: <why>" when the panel refuses to run it.
void runStudyAndWait(TradeStudyPanel& panel);

}  // namespace cw::gui
