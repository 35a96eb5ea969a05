#pragma once
// Every input of a case as a field the forms can show: where it lives in the case, its
// case-file path (to match the core's problems), its quantity, label, tooltip and valid range.
// One field per entry of the core's registry of parameters (engine/parameter_registry.h), built
// from it: label, tooltip, quantity, range, visibility (the entry's "applies"), get and set. The
// texts are translated in the context "Parameters". The forms are built from this table; nothing
// here computes physics.

#include "document/units.h"
#include "engine/case_inputs.h"
#include "engine/parameter_registry.h"

#include <functional>
#include <optional>
#include <string>
#include <vector>

namespace cw::gui {

/// An item of the component strip: a section of the registry of parameters, named by its
/// case-file object ("" for the case's own title and notes; sizing is shown with the design).
/// Which items a case shows, and their order, come from the registry and the case's
/// architecture (stripSections): the operating inputs, then the components in flow order.
struct Section {
  std::string_view name;  ///< the registry section (case-file object)
  bool operator==(const Section&) const = default;

  // Names of the sections every architecture has, and of the single spool's compressor and
  // turbine roles (for callers that name one; the strip never lists them by hand).
  static const Section Case, Flight, Design, Fuel, GasModel, Inlet, Compressor, Burner, Turbine, JetPipe,
      Afterburner, Nozzle;
};
inline constexpr Section Section::Case{""};
inline constexpr Section Section::Flight{"flight"};
inline constexpr Section Section::Design{"design"};
inline constexpr Section Section::Fuel{"fuel"};
inline constexpr Section Section::GasModel{"gas_model"};
inline constexpr Section Section::Inlet{"inlet"};
inline constexpr Section Section::Compressor{"compressor"};
inline constexpr Section Section::Burner{"burner"};
inline constexpr Section Section::Turbine{"turbine"};
inline constexpr Section Section::JetPipe{"jet_pipe"};
inline constexpr Section Section::Afterburner{"afterburner"};
inline constexpr Section Section::Nozzle{"nozzle"};

/// The strip's items for a case of `architecture`, in the registry's order (flow order).
std::vector<Section> stripSections(engine::Architecture architecture);
/// The strip's items of every architecture (one form each), in the registry's order.
const std::vector<Section>& allSections();
/// The architecture a section belongs to, if it is a role of one.
std::optional<engine::Architecture> sectionArchitecture(Section section);

/// The component name the core uses for a section's process path ("inlet", ...); empty for
/// sections that are no component (case, flight, design, fuel, gas model).
std::string sectionComponent(Section section);
/// The section's translated display name.
QString sectionName(Section section);
/// A stable object name, e.g. "compressor", "lowPressureCompressor".
QString sectionKey(Section section);

/// Text: one line of free text; Notes: several lines.
enum class FieldKind { Number, Choice, Flag, Text, Notes };

struct FieldSpec {
  int id = 0;  ///< unique; the undo merge id
  Section section = Section::Flight;
  FieldKind kind = FieldKind::Number;
  const char* key = "";      ///< object name of the widget, e.g. "compressor.efficiency"
  const char* label = "";    ///< untranslated (context "Parameters")
  const char* toolTip = "";  ///< untranslated (context "Parameters")
  Quantity quantity = Quantity::Dimensionless;
  /// Valid range [SI] as the core checks it (docs/case-format.md), shown in the tooltip.
  double low = 0.0, high = 0.0;
  bool lowOpen = false, highOpen = false;
  std::vector<const char*> choices;                      ///< untranslated choice names (context "Parameters")
  std::function<std::string(const engine::Case&)> path;  ///< the case-file path the core reports
  std::function<bool(const engine::Case&)> visible;      ///< shown for the case's current choices
  std::function<double(const engine::Case&)> get;        ///< SI value, choice index or 0/1
  std::function<void(engine::Case&, double)> set;
  std::function<std::string(const engine::Case&)> getText;  ///< Text and Notes fields (UTF-8)
  std::function<void(engine::Case&, const std::string&)> setText;
  const engine::Parameter* parameter = nullptr;  ///< the registry entry it shows
};

/// The whole table, in form order.
const std::vector<FieldSpec>& caseFields();
/// The field with the given id, or nullptr.
const FieldSpec* caseField(int id);
/// The field whose key is given, or nullptr.
const FieldSpec* caseField(const QString& key);

/// Translated label and tooltip of a field, and of a choice field's alternative.
QString fieldLabel(const FieldSpec& spec);
QString fieldChoice(const FieldSpec& spec, std::size_t index);
QString fieldToolTip(const FieldSpec& spec, const DisplayUnits& units);
/// The valid range of a number field as the core states it (SI) and, in U.S. customary units,
/// converted: "[200, 2500] K = [360, 4500] °R".
QString fieldRangeText(const FieldSpec& spec, const QString& coreRange, const DisplayUnits& units);
/// "label = value unit is outside the valid range ..." for a number field, the value at display
/// precision in display units.
QString fieldRangeProblem(const FieldSpec& spec, double si, const QString& coreRange,
                          const DisplayUnits& units);

}  // namespace cw::gui
