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
  const bool plain = field.quantity == Quantity::Dimensionless;
  QLocale locale;
  locale.setNumberOptions(QLocale::OmitGroupSeparator);
  auto compact = [&](double si) { return locale.toString(units.toDisplay(si, field.quantity), 'g', 7); };
  return QStringLiteral("%1%2, %3%4%5")
      .arg(field.lowOpen ? "(" : "[", compact(field.low), compact(field.high), field.highOpen ? ")" : "]",
           plain ? QString() : QStringLiteral(" ") + units.symbol(field.quantity));
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

QString typedNumberText(double shown) {
  QLocale locale;
  locale.setNumberOptions(QLocale::OmitGroupSeparator);
  if (std::fabs(shown) < 1e-12) shown = 0.0;
  return locale.toString(shown, 'g', 10);
}

StudyRange defaultStudyRange(const FieldSpec& field, double value) {
  // Just inside an open bound: a thousandth of the valid range.
  const double margin = 1e-3 * (field.high - field.low);
  const double low = field.lowOpen ? field.low + margin : field.low;
  const double high = field.highOpen ? field.high - margin : field.high;
  double start = std::clamp(std::min(0.5 * value, 1.5 * value), low, high);
  double stop = std::clamp(std::max(0.5 * value, 1.5 * value), low, high);
  if (!(stop - start > 1e-9 * std::max(1.0, std::fabs(value)))) {
    start = low;
    stop = high;
  }
  return {start, stop};
}

}  // namespace cw::gui
