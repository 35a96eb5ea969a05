#include "trade_study/study_inputs.h"

#include "io/case_field_setter.h"

#include <QCoreApplication>
#include <QLocale>

#include <algorithm>
#include <cmath>

namespace cw::gui {

namespace {

/// "compressor.pressure_ratio" -> "/compressor/pressure_ratio" (the fields' case-file paths).
std::string pointerOf(const std::string& path) {
  std::string pointer = "/" + path;
  std::replace(pointer.begin(), pointer.end(), '.', '/');
  return pointer;
}

/// Inputs whose case field stands for two alternatives ("Efficiency" on the basis chosen): the
/// study names the alternative itself.
struct AlternativeName {
  const char* path;
  const char* name;
};
constexpr AlternativeName kAlternatives[] = {
    {"inlet.pressure_recovery", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Pressure recovery pt2/pt0")},
    {"inlet.ram_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Ram efficiency")},
    {"compressor.isentropic_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Isentropic efficiency")},
    {"compressor.polytropic_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Polytropic efficiency")},
    {"turbine.isentropic_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Isentropic efficiency")},
    {"turbine.polytropic_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Polytropic efficiency")},
    {"nozzle.velocity_coefficient", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Velocity coefficient")},
    {"nozzle.isentropic_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyInputs", "Nozzle efficiency")},
};

}  // namespace

std::vector<StudyInput> studyInputs(const engine::Case& inputs) {
  std::vector<StudyInput> out;
  for (const std::string& path : io::numericCaseFieldPaths()) {
    const std::string pointer = pointerOf(path);
    for (const FieldSpec& field : caseFields()) {
      if (field.kind != FieldKind::Number || !field.visible(inputs) || field.path(inputs) != pointer)
        continue;
      out.push_back({path, &field});
      break;
    }
  }
  return out;
}

StudyInput studyInput(const engine::Case& inputs, const std::string& path) {
  for (const StudyInput& input : studyInputs(inputs))
    if (input.path == path) return input;
  return {path, nullptr};
}

QString studyInputShortName(const StudyInput& input) {
  if (!input.field) return QString::fromStdString(input.path);
  for (const AlternativeName& alternative : kAlternatives)
    if (input.path == alternative.path)
      return QCoreApplication::translate("cw::gui::StudyInputs", alternative.name);
  return fieldLabel(*input.field);
}

QString studyInputName(const StudyInput& input) {
  if (!input.field) return QString::fromStdString(input.path);
  return QStringLiteral("%1 › %2").arg(sectionName(input.field->section), studyInputShortName(input));
}

QString studyInputLabel(const StudyInput& input, const DisplayUnits& units) {
  if (!input.field) return studyInputName(input);
  return units.withUnit(studyInputName(input), input.field->quantity);
}

bool inValidRange(const FieldSpec& field, double si) {
  if (!std::isfinite(si)) return false;
  const bool aboveLow = field.lowOpen ? si > field.low : si >= field.low;
  const bool belowHigh = field.highOpen ? si < field.high : si <= field.high;
  return aboveLow && belowHigh;
}

QString validRangeText(const FieldSpec& field, const DisplayUnits& units) {
  // The ends at the forms' display precision (DisplayUnits::inputText), as the case forms say it.
  const bool plain = field.quantity == Quantity::Dimensionless;
  return QStringLiteral("%1%2, %3%4%5")
      .arg(field.lowOpen ? "(" : "[", units.inputText(field.low, field.quantity),
           units.inputText(field.high, field.quantity), field.highOpen ? ")" : "]",
           plain ? QString() : QStringLiteral(" ") + units.symbol(field.quantity));
}

QString studyFieldText(double si, Quantity quantity, const DisplayUnits& units) {
  if (std::fabs(si) < 1e-12) si = 0.0;  // a range's end computed as zero, not "1e-17"
  return units.inputText(si, quantity);
}

QString valueText(double si, Quantity quantity, const DisplayUnits& units, int significantDigits) {
  return units.format(si, quantity, significantDigits);
}

bool parseTypedNumber(const QString& text, double& value) {
  bool ok = false;
  value = QLocale().toDouble(text.trimmed(), &ok);
  if (!ok) value = QLocale::c().toDouble(text.trimmed(), &ok);
  return ok && std::isfinite(value);
}

std::optional<StudyRange> practitionerRange(const std::string& path) {
  // Where a conceptual study of a small turbojet usually starts; common practice, no source
  // (docs/user-guide.md, "Default ranges", lists the same). Inputs not listed take +/-50 %.
  struct Entry {
    const char* path;
    StudyRange range;
  };
  static constexpr Entry kRanges[] = {
      {"flight.altitude_m", {0.0, 11000.0}},
      {"flight.mach", {0.0, 0.9}},
      {"inlet.pressure_recovery", {0.90, 1.0}},
      {"inlet.ram_efficiency", {0.85, 1.0}},
      {"compressor.pressure_ratio", {4.0, 16.0}},
      {"compressor.isentropic_efficiency", {0.75, 0.90}},
      {"compressor.polytropic_efficiency", {0.80, 0.92}},
      {"compressor.bleed_fraction", {0.0, 0.05}},
      {"burner.exit_temperature_K", {1100.0, 1700.0}},
      {"burner.pressure_loss_fraction", {0.02, 0.08}},
      {"burner.combustion_efficiency", {0.95, 1.0}},
      {"turbine.isentropic_efficiency", {0.80, 0.92}},
      {"turbine.polytropic_efficiency", {0.82, 0.92}},
      {"turbine.mechanical_efficiency", {0.95, 1.0}},
      {"jet_pipe.pressure_loss_fraction", {0.0, 0.05}},
      {"afterburner.exit_temperature_K", {1600.0, 2200.0}},
      {"nozzle.velocity_coefficient", {0.95, 1.0}},
      {"nozzle.isentropic_efficiency", {0.90, 1.0}},
      {"nozzle.discharge_coefficient", {0.95, 1.0}},
  };
  for (const Entry& entry : kRanges)
    if (path == entry.path) return entry.range;
  return std::nullopt;
}

StudyRange defaultStudyRange(const FieldSpec& field, double value, const std::string& path) {
  // Just inside an open bound: a thousandth of the valid range.
  const double margin = 1e-3 * (field.high - field.low);
  const double low = field.lowOpen ? field.low + margin : field.low;
  const double high = field.highOpen ? field.high - margin : field.high;
  const std::optional<StudyRange> usual = practitionerRange(path);
  double start = std::clamp(usual ? usual->start : std::min(0.5 * value, 1.5 * value), low, high);
  double stop = std::clamp(usual ? usual->stop : std::max(0.5 * value, 1.5 * value), low, high);
  if (!(stop - start > 1e-9 * std::max(1.0, std::fabs(value)))) {
    start = low;
    stop = high;
  }
  return {start, stop};
}

}  // namespace cw::gui
