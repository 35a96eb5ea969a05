#pragma once
// The inputs a trade study can vary, as the trade-study panel offers them: each numeric case input
// of io::numericCaseFieldPaths() that applies to the case's current choices, matched to its case
// field (case_fields.h) for its label, quantity and valid range. Also the default range of a
// study over an input. Names and ranges only; nothing here computes physics.

#include "document/case_fields.h"
#include "document/units.h"

#include "engine/case_inputs.h"

#include <QString>

#include <optional>
#include <string>
#include <vector>

namespace cw::gui {

struct StudyInput {
  std::string path;                  ///< --set path, e.g. "compressor.pressure_ratio"
  const FieldSpec* field = nullptr;  ///< its case field (label, quantity, valid range)
};

/// The inputs that can be varied on this case, in case-file order.
std::vector<StudyInput> studyInputs(const engine::Case& inputs);

/// The input at `path` among studyInputs(inputs), or an empty input (field null) when the case has none.
StudyInput studyInput(const engine::Case& inputs, const std::string& path);

/// "Compressor › Pressure ratio pt3/pt2" (translated; no unit).
QString studyInputName(const StudyInput& input);
/// The name without the component, e.g. "Pressure ratio pt3/pt2" (translated).
QString studyInputShortName(const StudyInput& input);
/// The name with the unit in the current unit system, e.g. "Burner › Exit temperature Tt4 [K]".
QString studyInputLabel(const StudyInput& input, const DisplayUnits& units);

/// Whether an SI value lies in the field's valid range.
bool inValidRange(const FieldSpec& field, double si);
/// The valid range in display units with its unit, e.g. "[300, 2500] K" or "(0, 1]".
QString validRangeText(const FieldSpec& field, const DisplayUnits& units);
/// An SI value with its unit for messages and chart labels, e.g. "1350 K"; no unit when dimensionless.
QString valueText(double si, Quantity quantity, const DisplayUnits& units, int significantDigits = 6);

/// A number typed in a study field, in the current locale or the C locale; false when the text is
/// no finite number.
bool parseTypedNumber(const QString& text, double& value);
/// The text of a study field (a range's start or stop, the overlay's value) for an SI value: the
/// case forms' display precision (DisplayUnits::inputText: in SI as typed, in U.S. customary
/// units the SI text's significant digits, at least five), e.g. "1100" K, "36089" ft.
QString studyFieldText(double si, Quantity quantity, const DisplayUnits& units);

struct StudyRange {
  double start = 0.0;  ///< [SI]
  double stop = 0.0;   ///< [SI]
};

/// The range a practitioner would start a study of this input from (docs/user-guide.md lists
/// them), e.g. 1100-1700 K for the burner exit temperature; none for an input without one [SI].
std::optional<StudyRange> practitionerRange(const std::string& path);

/// The practitioner's range of the input where it has one; else the case's value -50 % to +50 %;
/// either clipped to the valid range (just inside an open bound); the whole valid range when that
/// leaves nothing (a value of 0, or one at a bound) [SI].
StudyRange defaultStudyRange(const FieldSpec& field, double value, const std::string& path = {});

}  // namespace cw::gui
