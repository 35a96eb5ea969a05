#pragma once
// The registry of parameters: one table that describes every input of a case (engine::Case).
//
// Each entry gives the input's case-file place (section, i.e. a role, and key), its kind
// (number, choice, flag, text), quantity and SI unit, default, valid range and why, the "exactly
// one of" group it belongs to, the condition under which it applies, whether it is a loss and its
// lossless value, its English label and tooltip (the GUI translates them in the context
// "Parameters"), and how to read it from and write it into a Case. The case reader, builder,
// writer, validation ranges, --set and the trade study's setters, the ideal twin, the loss
// catalogue's one-number parameters, the JSON Schema and the reference tables of
// docs/case-format.md, and the GUI's fields all come from this table.
//
// A choice that selects a std::variant alternative or an enum basis (e.g. isentropic or
// polytropic efficiency) is one entry with its alternatives. When the case file gives the choice by
// which keys are present (an "exactly one of" group), the entry is no key of the file
// (inFile false) and each alternative's numbers name it as their group.
//
// Cross-parameter rules that are no range (hot gamma at most cold gamma; neglect_fuel_mass only
// for the simple gas models) are named rules in case_validation.cpp.

#include "engine/case_inputs.h"

#include <functional>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace cw::engine {

enum class ParameterKind {
  Number,  ///< a real number [SI]
  Choice,  ///< one of a list; get and set take the alternative's index
  Flag,    ///< true or false; get and set take 1 or 0
  Text,    ///< free text (getText, setText)
};

/// The physical quantity of a number: its SI unit, and the GUI's unit conversion.
enum class ParameterQuantity {
  Dimensionless,
  Length,             ///< m
  Temperature,        ///< K
  TemperatureChange,  ///< K (a difference)
  Pressure,           ///< Pa
  MassFlow,           ///< kg/s
  Force,              ///< N
  SpecificEnergy,     ///< J/kg
  SpecificHeat,       ///< J/(kg K)
  Power,              ///< W
  MassRatio,          ///< kg/kg
};

/// The SI unit of a quantity as messages and documents write it ("" for dimensionless).
std::string_view siUnit(ParameterQuantity quantity);

/// An interval with open or closed ends.
struct ValidRange {
  double low = 0.0;
  bool lowClosed = true;
  double high = 0.0;
  bool highClosed = true;

  /// Written so that NaN is outside.
  bool contains(double x) const {
    const bool aboveLow = lowClosed ? x >= low : x > low;
    const bool belowHigh = highClosed ? x <= high : x < high;
    return aboveLow && belowHigh;
  }
  /// "[1, 60]", "(0, 1]": the numbers in their shortest round-trip form.
  std::string text() const;
};

/// One alternative of a choice.
struct ParameterChoice {
  std::string_view value;  ///< its text in the case file ("constant-cp"); for a group choice its name
  std::string_view label;  ///< English label
};

/// The reader's condition for a key: another key of the same object has a value.
struct KeyCondition {
  std::string_view selector;  ///< a choice or flag key of the same object
  std::string_view value;     ///< its value (JSON text for flags)
};

/// A narrower range that holds unless a condition does (the altitude's: up to 86 km when
/// geometric, else its geopotential equivalent).
struct ConditionalRange {
  KeyCondition unless;  ///< while this holds, the parameter's range; otherwise `range`
  ValidRange range;
};

struct Parameter {
  std::string_view section;  ///< case-file object (a role); "" for the top level
  std::string_view key;      ///< case-file key; for a group choice (inFile false), the group's name
  ParameterKind kind = ParameterKind::Number;
  std::string_view label;     ///< English (the GUI translates it in the context "Parameters")
  std::string_view toolTip;   ///< English, one or two sentences
  std::string_view fieldKey;  ///< the GUI field's object name, e.g. "compressor.pressureRatio"
  ParameterQuantity quantity = ParameterQuantity::Dimensionless;
  ValidRange range;                          ///< numbers: as validation checks it (the widest)
  std::optional<ConditionalRange> narrower;  ///< a narrower range unless a condition holds
  std::string_view rangeReason;              ///< why the range is what it is
  std::string_view rangeNote;  ///< a rule beyond the range, for the documents (checked in validation)
  double defaultValue = 0.0;   ///< the default case's value (number, choice index, flag 0/1)
  bool hasDefault = true;      ///< false: no default (required, or an alternative given explicitly)
  std::vector<ParameterChoice> choices;  ///< Choice: the alternatives, the default first
  bool inFile = true;                    ///< false: a choice the file gives by its group's keys
  bool multiLine = false;                ///< Text: several lines (the notes)
  std::string_view group;                ///< the "exactly one of" group (a group choice's key) it belongs to
  int alternative = -1;                  ///< which alternative of the group
  bool requiredInAlternative = false;    ///< must be given when its alternative is chosen
  bool groupRequired = false;            ///< a group choice: one alternative must be given
  bool required = false;                 ///< the key must be given
  std::vector<KeyCondition> conditions;  ///< the reader's: all must hold for the key to apply
  int sinceVersion = 1;                  ///< the case-file version that has it
  std::optional<double> lossless;        ///< a loss parameter's value in the ideal twin
  std::function<bool(const Case&)> applies;         ///< applies to the case (GUI: visible)
  std::function<double(const Case&)> get;           ///< value, choice index, or 1/0 (only where it applies)
  std::function<void(Case&, double)> set;           ///< sets it, selecting the alternative it belongs to
  std::function<std::string(const Case&)> getText;  ///< Text
  std::function<void(Case&, const std::string&)> setText;

  /// The JSON pointer of the key, e.g. "/compressor/pressure_ratio".
  std::string pointer() const;
  /// The --set path, e.g. "compressor.pressure_ratio" ("title" at the top level).
  std::string dottedPath() const;
  /// The valid range for this case (the narrower one unless its condition holds).
  ValidRange rangeFor(const Case& c) const;
  /// The value as the case file writes it, as text: a number's shortest round-trip form, a
  /// choice's value, "true" or "false", the text itself.
  std::string valueText(const Case& c) const;
};

/// A case-file object: a role (a component or the flight condition, design, ...).
struct ParameterSection {
  std::string_view name;   ///< "" for the top level
  std::string_view title;  ///< English, e.g. "LP compressor" (roles: the GUI's strip, context "Parameters")
  std::string_view description;  ///< one sentence for the documents
  bool required = false;         ///< the object must be present
  int sinceVersion = 1;
  std::optional<Architecture> architecture = std::nullopt;  ///< a role: only this architecture has it
};

/// The architecture's value in the case file ("two-spool-turbojet"), from the registry's
/// engine.architecture choice.
std::string_view architectureName(Architecture architecture);

/// Every section in the order of the file (the top level first).
const std::vector<ParameterSection>& parameterSections();
/// Every parameter, section by section in file order, keys in the order the writer uses.
const std::vector<Parameter>& parameterRegistry();
/// The parameter at `section`/`key`, or nullptr.
const Parameter* findParameter(std::string_view section, std::string_view key);

/// The case with every loss parameter that applies set to its lossless value (in table order,
/// so a basis is chosen before its value).
void removeEveryLoss(Case& c);

}  // namespace cw::engine
