#include "document/case_fields.h"

#include "document/units.h"

#include <QCoreApplication>

#include <utility>

namespace cw::gui {

using namespace engine;

namespace {

/// The strip item of a registry section (sizing is shown with the design target).
Section sectionOf(std::string_view name) {
  return name == "sizing" ? Section::Design : Section{name};
}

/// Sections that are inputs of the case rather than a component of the engine.
bool isOperatingInput(Section section) {
  return section == Section::Case || section == Section::Flight || section == Section::Design ||
         section == Section::Fuel || section == Section::GasModel;
}

/// Whether a registry section is an item of the strip (the architecture is chosen by File >
/// New and shown in the title, the sizing with the design).
bool isStripItem(const ParameterSection& s) {
  return s.name != "engine" && s.name != "sizing";
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

/// One field per registry entry of every architecture (the registry's texts are literals, so
/// their data() are NUL-terminated); in form order, i.e. registry order within each section.
std::vector<FieldSpec> buildFields() {
  std::vector<FieldSpec> f;
  int nextId = 1;
  for (const Section section : allSections()) {
    for (const Parameter& p : parameterRegistry()) {
      if (p.section == "engine" || sectionOf(p.section) != section) continue;
      FieldSpec s;
      s.id = nextId++;
      s.section = section;
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

const ParameterSection* registrySection(Section section) {
  for (const ParameterSection& s : parameterSections())
    if (s.name == section.name) return &s;
  return nullptr;
}

}  // namespace

std::vector<Section> stripSections(Architecture architecture) {
  std::vector<Section> sections;
  for (const ParameterSection& s : parameterSections())
    if (isStripItem(s) && (!s.architecture || *s.architecture == architecture)) sections.push_back({s.name});
  return sections;
}

const std::vector<Section>& allSections() {
  static const std::vector<Section> sections = [] {
    std::vector<Section> list;
    for (const ParameterSection& s : parameterSections())
      if (isStripItem(s)) list.push_back({s.name});
    return list;
  }();
  return sections;
}

std::optional<Architecture> sectionArchitecture(Section section) {
  const ParameterSection* s = registrySection(section);
  return s ? s->architecture : std::nullopt;
}

std::string sectionComponent(Section section) {
  // The network names its components by their roles, i.e. the registry's sections.
  return isOperatingInput(section) ? std::string() : std::string(section.name);
}

QString sectionName(Section section) {
  if (section == Section::Case) return QCoreApplication::translate("CaseFields", "Case");
  if (section == Section::Flight) return QCoreApplication::translate("CaseFields", "Flight");
  if (section == Section::Design) return QCoreApplication::translate("CaseFields", "Design and sizing");
  if (section == Section::Fuel) return QCoreApplication::translate("CaseFields", "Fuel");
  if (section == Section::GasModel) return QCoreApplication::translate("CaseFields", "Gas model");
  if (section == Section::Inlet) return QCoreApplication::translate("CaseFields", "Inlet");
  if (section == Section::Burner) return QCoreApplication::translate("CaseFields", "Burner");
  if (section == Section::JetPipe) return QCoreApplication::translate("CaseFields", "Jet pipe");
  if (section == Section::Afterburner) return QCoreApplication::translate("CaseFields", "Afterburner");
  if (section == Section::Nozzle) return QCoreApplication::translate("CaseFields", "Nozzle");
  // A compressor or turbine role: its title in the registry.
  const ParameterSection* s = registrySection(section);
  return s ? QCoreApplication::translate("Parameters", s->title.data()) : QString();
}

QString sectionKey(Section section) {
  // camelCase of the case-file object: "low_pressure_compressor" -> "lowPressureCompressor".
  if (section == Section::Case) return QStringLiteral("case");
  QString key;
  bool upper = false;
  for (const char c : section.name) {
    if (c == '_') {
      upper = true;
      continue;
    }
    key += upper ? QChar(c).toUpper() : QChar(c);
    upper = false;
  }
  return key;
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
