#pragma once
// Display names of the loss audit's loss keys (core/analysis/loss_catalogue.h) and the strip
// section each loss belongs to. Names only; nothing here computes physics.

#include "document/case_fields.h"

#include <QString>

#include <string>

namespace cw::gui {

/// The translated name of a loss, e.g. "Compressor efficiency"; the key itself when unknown.
QString lossName(const std::string& key);
/// A short translated name for a chart axis, e.g. "Compressor".
QString lossShortName(const std::string& key);
/// The strip section whose inputs set the loss.
Section lossSection(const std::string& key);
/// The translated "per" unit of a sensitivity (the core's English text when unknown).
QString sensitivityUnitText(const std::string& coreText);
/// The translated name of a component in the exergy balance ("inlet", "shaft", ...).
QString exergyComponentName(const std::string& component);

}  // namespace cw::gui
