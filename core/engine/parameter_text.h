#pragma once
// Marks the English texts of the registry of parameters (labels, tooltips, choice names) for the
// GUI's translations: lupdate reads core/engine with CW_PARAMETER_TEXT as an alias of
// QT_TRANSLATE_NOOP (app/gui/CMakeLists.txt), context "Parameters". In the core it is the text.
#define CW_PARAMETER_TEXT(context, text) text
