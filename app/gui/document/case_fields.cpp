#include "document/case_fields.h"

#include "document/units.h"

#include <QCoreApplication>

#include <utility>

namespace cw::gui {

using namespace engine;

namespace {

/// The strip item of a registry section (sizing is shown with the design target).
Section sectionOf(std::string_view name) {
  static const std::pair<std::string_view, Section> sections[] = {
      {"", Section::Case},
      {"flight", Section::Flight},
      {"design", Section::Design},
      {"sizing", Section::Design},
      {"fuel", Section::Fuel},
      {"gas_model", Section::GasModel},
      {"inlet", Section::Inlet},
      {"compressor", Section::Compressor},
      {"burner", Section::Burner},
      {"turbine", Section::Turbine},
      {"jet_pipe", Section::JetPipe},
      {"afterburner", Section::Afterburner},
      {"nozzle", Section::Nozzle},
  };
  for (const auto& [key, section] : sections)
    if (key == name) return section;
  return Section::Case;
}

Quantity quantityOf(ParameterQuantity quantity) {
  switch (quantity) {
    case ParameterQuantity::Dimensionless:
      return Quantity::Dimensionless;
    case ParameterQuantity::Length:
      return Quantity::Length;
    case ParameterQuantity::Temperature:
      return Quantity::Temperature;
    case ParameterQuantity::TemperatureChange:
      return Quantity::TemperatureChange;
    case ParameterQuantity::Pressure:
      return Quantity::Pressure;
    case ParameterQuantity::MassFlow:
      return Quantity::MassFlow;
    case ParameterQuantity::Force:
      return Quantity::Force;
    case ParameterQuantity::SpecificEnergy:
      return Quantity::SpecificEnergy;
    case ParameterQuantity::SpecificHeat:
      return Quantity::SpecificHeat;
    case ParameterQuantity::Power:
      return Quantity::Power;
    case ParameterQuantity::MassRatio:
      return Quantity::MassRatio;
  }
  return Quantity::Dimensionless;
}

FieldKind kindOf(const Parameter& p) {
  switch (p.kind) {
    case ParameterKind::Number:
      return FieldKind::Number;
    case ParameterKind::Choice:
      return FieldKind::Choice;
    case ParameterKind::Flag:
      return FieldKind::Flag;
    case ParameterKind::Text:
      return p.multiLine ? FieldKind::Notes : FieldKind::Text;
  }
  return FieldKind::Number;
}

/// One field per registry entry of the single-spool case (the registry's texts are literals, so
/// their data() are NUL-terminated); in form order, i.e. registry order within each section.
std::vector<FieldSpec> buildFields() {
  std::vector<FieldSpec> f;
  int nextId = 1;
  for (int section = 0; section < kSectionCount; ++section) {
    for (const Parameter& p : parameterRegistry()) {
      if (p.sinceVersion > 1 || static_cast<int>(sectionOf(p.section)) != section) continue;
      FieldSpec s;
      s.id = nextId++;
      s.section = sectionOf(p.section);
      s.kind = kindOf(p);
      s.key = p.fieldKey.data();
      s.label = p.label.data();
      s.toolTip = p.toolTip.data();
      s.quantity = quantityOf(p.quantity);
      const ValidRange range = p.rangeFor(Case{});
      s.low = range.low;
      s.high = range.high;
      s.lowOpen = !range.lowClosed;
      s.highOpen = !range.highClosed;
      for (const ParameterChoice& choice : p.choices) s.choices.push_back(choice.label.data());
      s.path = [pointer = p.pointer()](const Case&) { return pointer; };
      s.visible = p.applies;
      s.get = p.get;
      s.set = p.set;
      s.getText = p.getText;
      s.setText = p.setText;
      s.parameter = &p;
      f.push_back(std::move(s));
    }
  }
  return f;
}

}  // namespace

std::string sectionComponent(Section section) {
  switch (section) {
    case Section::Inlet:
      return "inlet";
    case Section::Compressor:
      return "compressor";
    case Section::Burner:
      return "burner";
    case Section::Turbine:
      return "turbine";
    case Section::JetPipe:
      return "jet_pipe";
    case Section::Afterburner:
      return "afterburner";
    case Section::Nozzle:
      return "nozzle";
    default:
      return {};
  }
}

QString sectionName(Section section) {
  switch (section) {
    case Section::Case:
      return QCoreApplication::translate("CaseFields", "Case");
    case Section::Flight:
      return QCoreApplication::translate("CaseFields", "Flight");
    case Section::Design:
      return QCoreApplication::translate("CaseFields", "Design and sizing");
    case Section::Fuel:
      return QCoreApplication::translate("CaseFields", "Fuel");
    case Section::GasModel:
      return QCoreApplication::translate("CaseFields", "Gas model");
    case Section::Inlet:
      return QCoreApplication::translate("CaseFields", "Inlet");
    case Section::Compressor:
      return QCoreApplication::translate("CaseFields", "Compressor");
    case Section::Burner:
      return QCoreApplication::translate("CaseFields", "Burner");
    case Section::Turbine:
      return QCoreApplication::translate("CaseFields", "Turbine");
    case Section::JetPipe:
      return QCoreApplication::translate("CaseFields", "Jet pipe");
    case Section::Afterburner:
      return QCoreApplication::translate("CaseFields", "Afterburner");
    case Section::Nozzle:
      return QCoreApplication::translate("CaseFields", "Nozzle");
  }
  return {};
}

QString sectionKey(Section section) {
  static const char* keys[] = {"case",       "flight", "design",  "fuel",    "gasModel",    "inlet",
                               "compressor", "burner", "turbine", "jetPipe", "afterburner", "nozzle"};
  return QString::fromLatin1(keys[static_cast<int>(section)]);
}

const std::vector<FieldSpec>& caseFields() {
  static const std::vector<FieldSpec> fields = buildFields();
  return fields;
}

const FieldSpec* caseField(int id) {
  for (const auto& f : caseFields())
    if (f.id == id) return &f;
  return nullptr;
}

const FieldSpec* caseField(const QString& key) {
  for (const auto& f : caseFields())
    if (key == QLatin1String(f.key)) return &f;
  return nullptr;
}

QString fieldLabel(const FieldSpec& spec) {
  return QCoreApplication::translate("Parameters", spec.label);
}

QString fieldChoice(const FieldSpec& spec, std::size_t index) {
  return QCoreApplication::translate("Parameters", spec.choices.at(index));
}

QString fieldToolTip(const FieldSpec& spec, const DisplayUnits& units) {
  QString tip = QCoreApplication::translate("Parameters", spec.toolTip);
  if (spec.kind != FieldKind::Number) return tip;
  const QString unit = spec.quantity == Quantity::Dimensionless
                           ? QString()
                           : QStringLiteral(" ") + units.symbol(spec.quantity);
  const QString range =
      QStringLiteral("%1%2, %3%4%5")
          .arg(spec.lowOpen ? "(" : "[", formatNumber(units.toDisplay(spec.low, spec.quantity), 6),
               formatNumber(units.toDisplay(spec.high, spec.quantity), 6), spec.highOpen ? ")" : "]", unit);
  return QCoreApplication::translate("CaseFields", "%1\nValid range: %2").arg(tip, range);
}

QString fieldRangeText(const FieldSpec& spec, const QString& coreRange, const DisplayUnits& units) {
  if (units.system() == UnitSystem::SI || spec.quantity == Quantity::Dimensionless ||
      spec.quantity == Quantity::MassRatio)
    return coreRange;
  return coreRange + QStringLiteral(" = %1%2, %3%4 %5")
                         .arg(spec.lowOpen ? "(" : "[", units.inputText(spec.low, spec.quantity),
                              units.inputText(spec.high, spec.quantity), spec.highOpen ? ")" : "]",
                              units.symbol(spec.quantity));
}

QString fieldRangeProblem(const FieldSpec& spec, double si, const QString& coreRange,
                          const DisplayUnits& units) {
  // The form's message (its context, so one translation serves form and banner).
  return QCoreApplication::translate("cw::gui::CaseForm", "%1 = %2 is outside the valid range %3.")
      .arg(fieldLabel(spec), units.inputTextWithUnit(si, spec.quantity),
           fieldRangeText(spec, coreRange, units));
}

}  // namespace cw::gui
