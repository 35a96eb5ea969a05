#include "document/core_failure.h"

#include "document/case_fields.h"

#include <QCoreApplication>
#include <QLocale>
#include <QRegularExpression>

#include <cmath>
#include <functional>
#include <map>

namespace cw::gui {

namespace {

/// The translation context of the interface's failure texts.
struct Words {
  Q_DECLARE_TR_FUNCTIONS(cw::gui::CoreFailure)
};

/// Significant digits of a computed number in a message (the tables' precision).
constexpr int kMessageDigits = 5;

/// A computed number at display precision, trailing zeros dropped ("2.5", not "2.5000").
QString trimmedNumber(double shown) {
  QString text = formatNumber(shown, kMessageDigits);
  const QString point = QLocale().decimalPoint();
  if (text.contains(point)) {
    while (text.endsWith(QLatin1Char('0'))) text.chop(1);
    if (text.endsWith(point)) text.chop(point.size());
  }
  return text;
}

/// One quoted number in the display units, with the unit.
QString quantityText(const ErrorQuantity& q, const DisplayUnits& units) {
  const std::optional<Quantity> quantity = quantityOfUnit(q.unit);
  if (!quantity) {  // a unit the interface does not show: SI, as the core gives it
    return QStringLiteral("%1 %2").arg(QLocale().toString(q.value, 'g', 6), QString::fromStdString(q.unit));
  }
  const QString number = trimmedNumber(units.toDisplay(q.value, *quantity));
  return *quantity == Quantity::Dimensionless ? number
                                              : QStringLiteral("%1 %2").arg(number, units.symbol(*quantity));
}

/// The i-th quoted number, or "?" when the core quoted fewer.
QString number(const CoreFailure& f, std::size_t i, const DisplayUnits& units) {
  return i < f.detail.quantities.size() ? quantityText(f.detail.quantities[i], units) : QStringLiteral("?");
}

/// A pure count (iterations), as a whole number.
QString count(const CoreFailure& f, std::size_t i) {
  return i < f.detail.quantities.size() ? QLocale().toString(std::llround(f.detail.quantities[i].value))
                                        : QStringLiteral("?");
}

/// A residual: three significant digits, exponent allowed.
QString residual(const CoreFailure& f, std::size_t i) {
  return i < f.detail.quantities.size() ? QLocale().toString(f.detail.quantities[i].value, 'g', 3)
                                        : QStringLiteral("?");
}

/// A component's display name (the strip's) for the core's name of it ("turbine"), from the
/// start of a where such as "nozzle: exit pressure for the area ratio"; empty when none.
QString componentName(const std::string& where) {
  const std::string head = where.substr(0, where.find(':'));
  for (const Section section : allSections())
    if (!sectionComponent(section).empty() && sectionComponent(section) == head) return sectionName(section);
  return {};
}

/// The names the core gives the values it checks on the way, translated.
const std::map<std::string, const char*>& subjectNames() {
  static const std::map<std::string, const char*> names{
      {"temperature", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the temperature")},
      {"temperature from enthalpy", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the enthalpy")},
      {"temperature from entropy", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the entropy")},
      {"pressure", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the pressure")},
      {"Mach number", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the Mach number")},
      {"total-to-static pressure ratio",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the total-to-static pressure ratio")},
      {"fuel-air ratio", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the fuel-air ratio")},
      {"efficiency", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the efficiency")},
      {"polytropic efficiency", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the polytropic efficiency")},
      {"area ratio A/A*", QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the area ratio A/A*")},
  };
  return names;
}

/// What a range error concerns, in the interface's words: a case input (named by its case-file
/// path or its key) by its strip section and label, a value the core checks on the way by its
/// translated name, a component by its name; else the core's own name of it.
QString subjectName(const std::string& subject) {
  if (!subject.empty() && subject.front() == '/') {
    const std::string path = subject.substr(0, subject.find(' '));
    const engine::Case reference;
    for (const auto& spec : caseFields())
      if (spec.path && spec.path(reference) == path)
        return sectionName(spec.section) + QStringLiteral(" › ") + fieldLabel(spec);
    if (path == "/flight") return Words::tr("the ambient temperature");
  }
  const auto known = subjectNames().find(subject);
  if (known != subjectNames().end())
    return QCoreApplication::translate("cw::gui::CoreFailure", known->second);
  // An input named by its key, with a remark ("flight.mach (MIL-E-5008B recovery)").
  const QString key = QString::fromStdString(subject.substr(0, subject.find(' ')));
  if (const FieldSpec* spec = caseField(key))
    return sectionName(spec->section) + QStringLiteral(" › ") + fieldLabel(*spec);
  const QString component = componentName(subject);
  return component.isEmpty() ? QString::fromStdString(subject) : component;
}

/// What the core's solvers look for, by the names they give it, translated.
const std::map<std::string, const char*>& soughtNames() {
  static const std::map<std::string, const char*> names{
      {"temperature from enthalpy",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the temperature at an enthalpy")},
      {"temperature from entropy",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the temperature at an entropy")},
      {"static temperature from total temperature and Mach number",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure",
                         "the static temperature at a total temperature and Mach number")},
      {"subsonic Mach number from area ratio",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the subsonic Mach number of an area ratio")},
      {"supersonic Mach number from area ratio",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the supersonic Mach number of an area ratio")},
      {"normal shock: downstream velocity",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the velocity behind a normal shock")},
      {"nozzle: exit pressure for the area ratio",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the nozzle exit pressure of its area ratio")},
      {"design.required_net_thrust_N: air mass flow",
       QT_TRANSLATE_NOOP("cw::gui::CoreFailure", "the air mass flow of the required net thrust")},
  };
  return names;
}

/// What a solver looked for (its where), in the interface's words.
QString soughtName(const std::string& where) {
  const auto known = soughtNames().find(where);
  return known != soughtNames().end() ? QCoreApplication::translate("cw::gui::CoreFailure", known->second)
                                      : subjectName(where);
}

/// "subject = value is outside the valid range range", in display units.
QString outsideRange(const CoreFailure& f, const DisplayUnits& units) {
  const std::string& subject = f.detail.subject.empty() ? f.where : f.detail.subject;
  const std::string unit = f.detail.quantities.empty() ? std::string() : f.detail.quantities.front().unit;
  const std::optional<Quantity> quantity = quantityOfUnit(unit);
  const QString range = quantity ? displayRange(f.detail.validRange, *quantity, units)
                                 : QString::fromStdString(f.detail.validRange);
  return Words::tr("%1 = %2 is outside the valid range %3")
      .arg(subjectName(subject), number(f, 0, units), range);
}

/// The component a failure names (its where), or a neutral word when it names none.
QString componentOf(const CoreFailure& f) {
  const QString name = componentName(f.where);
  return name.isEmpty() ? QString::fromStdString(f.where) : name;
}

using CauseWriter = std::function<QString(const CoreFailure&, const DisplayUnits&)>;

const std::map<std::string, CauseWriter>& causeWriters() {
  static const std::map<std::string, CauseWriter> writers{
      {kReasonOutsideRange, outsideRange},
      {kReasonBeyondGasData,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr("%1 meets a state beyond the gas data: %2").arg(componentOf(f), outsideRange(f, u));
       }},
      {kReasonEngineFaceState,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr("%1 cannot be reached at the engine face: %2")
             .arg(subjectName(f.where), outsideRange(f, u));
       }},
      {kReasonNotConverged,
       [](const CoreFailure& f, const DisplayUnits&) {
         return Words::tr("%1 was not found after %2 iterations (residual %3)")
             .arg(soughtName(f.where), count(f, 0), residual(f, 1));
       }},
      {kReasonTurbineCannotDrive,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "the turbine cannot drive the compressor: it would need a specific work of %1, more "
                    "than the gas at %2 holds")
             .arg(number(f, 0, u), number(f, 1, u));
       }},
      {kReasonTurbineExpansion,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "the turbine cannot drive the compressor: the expansion for a specific work of %1 "
                    "leaves the range of the gas data")
             .arg(number(f, 0, u));
       }},
      {kReasonTurbineNoExitPressure,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "the turbine cannot drive the compressor: no exit pressure gives a specific work of %1")
             .arg(number(f, 0, u));
       }},
      {kReasonNoOxygenLeft,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr("%1: the entering gas holds no oxygen left to burn (fuel-air ratio %2)")
             .arg(componentOf(f), number(f, 0, u));
       }},
      {kReasonExitBelowEntry,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "%1: the exit temperature %2 is below what the entering gas already has; no fuel can be "
                    "burnt")
             .arg(componentOf(f), number(f, 0, u));
       }},
      {kReasonRichBeyondStoichiometric,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "%1: the exit temperature %2 needs more fuel than the stoichiometric fuel-air ratio %3 "
                    "allows")
             .arg(componentOf(f), number(f, 0, u), number(f, 1, u));
       }},
      {kReasonFuelAirAboveStoichiometric,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr("%1: the fuel-air ratio %2 is above the stoichiometric %3")
             .arg(componentOf(f), number(f, 0, u), number(f, 1, u));
       }},
      {kReasonOnlyHeats,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "%1: the exit temperature %2 is not above the entry temperature %3; it only heats the "
                    "stream")
             .arg(componentOf(f), number(f, 0, u), number(f, 1, u));
       }},
      {kReasonNozzleBelowGasData,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "the nozzle's exit-to-throat area ratio %1 expands the jet below %2, the lowest "
                    "temperature of the gas data")
             .arg(number(f, 0, u), number(f, 1, u));
       }},
      {kReasonNozzleShockAtExit,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::
             tr("the ambient pressure %1 is above %2, the pressure behind a normal shock at the "
                "exit of the nozzle's exit-to-throat area ratio %3: a shock would stand inside the nozzle, "
                "which the model does not cover (choose a smaller area ratio, full expansion or a "
                "convergent nozzle)")
                 .arg(number(f, 0, u), number(f, 1, u), number(f, 2, u));
       }},
      {kReasonNozzleNoJet,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "the nozzle entry total pressure %1 is not above the ambient pressure %2, so there is "
                    "no jet")
             .arg(number(f, 0, u), number(f, 1, u));
       }},
      {kReasonNozzleJetTooSlow,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr(
                    "the nozzle's velocity coefficient %1 leaves the jet too slow for a finite nozzle area")
             .arg(number(f, 0, u));
       }},
      {kReasonNozzleNotChoked,
       [](const CoreFailure&, const DisplayUnits&) {
         return Words::tr(
             "the nozzle's losses keep its throat from choking, so its divergent part cannot run "
             "supersonic; the model does not cover that regime");
       }},
      {kReasonThrustNotPositive,
       [](const CoreFailure& f, const DisplayUnits& u) {
         return Words::tr("the net thrust %1 is not positive: the jet is slower than the flight speed")
             .arg(number(f, 0, u));
       }},
      {kReasonResultNotFinite,
       [](const CoreFailure&, const DisplayUnits&) {
         return Words::tr(
             "a result is not a finite number: the inputs are beyond what the model can evaluate");
       }},
      {kReasonNoBracket,
       [](const CoreFailure& f, const DisplayUnits&) {
         return Words::tr("the search for %1 found no solution in its interval").arg(soughtName(f.where));
       }},
      {kReasonFunctionNotFinite,
       [](const CoreFailure& f, const DisplayUnits&) {
         return Words::tr("the equations for %1 are not finite on the way to a solution")
             .arg(soughtName(f.where));
       }},
      {kReasonNewtonStopped,
       [](const CoreFailure& f, const DisplayUnits&) {
         return Words::tr(
                    "the search for %1 stopped after %2 iterations (scaled residual %3): there is no "
                    "solution near its start")
             .arg(soughtName(f.where), count(f, 0), residual(f, 1));
       }},
      {kReasonNormalShock,
       [](const CoreFailure&, const DisplayUnits&) {
         return Words::tr("a normal shock has no downstream state below the sonic velocity");
       }},
  };
  return writers;
}

QString heading(ErrorCode code) {
  switch (code) {
    case ErrorCode::NoSolution:
      return QCoreApplication::translate("cw::gui::CaseDocument", "No solution for these inputs: %1");
    case ErrorCode::NotConverged:
      return QCoreApplication::translate("cw::gui::CaseDocument", "The solver did not converge: %1");
    case ErrorCode::OutOfRange:
      return QCoreApplication::translate("cw::gui::CaseDocument", "A property is outside its data range: %1");
    case ErrorCode::InvalidInput:
      break;
  }
  return QCoreApplication::translate("cw::gui::CaseDocument", "Invalid input: %1");
}

/// A range limit as the core writes it ("6000", "inf", "-inf"); nullopt when it is none.
std::optional<double> limitValue(const QString& text) {
  if (text == QLatin1String("inf")) return HUGE_VAL;
  if (text == QLatin1String("-inf")) return -HUGE_VAL;
  bool ok = false;
  const double value = text.toDouble(&ok);  // the core's text is C-locale
  return ok ? std::optional<double>(value) : std::nullopt;
}

QString limitText(double si, Quantity quantity, const DisplayUnits& units) {
  if (std::isinf(si)) return si > 0 ? QStringLiteral("∞") : QStringLiteral("−∞");
  return units.inputText(si, quantity);
}

}  // namespace

CoreFailure coreFailure(const Error& error) {
  return {error.code(), error.where(), error.detail(), error.what()};
}

bool isKnownReason(const std::string& reason) {
  return causeWriters().count(reason) > 0;
}

QString failureText(const CoreFailure& failure, const DisplayUnits& units) {
  const auto writer = causeWriters().find(failure.detail.reason);
  const QString cause = writer != causeWriters().end() ? writer->second(failure, units) + QLatin1Char('.')
                                                       : QString::fromStdString(failure.message);
  return heading(failure.code).arg(cause);
}

std::optional<Quantity> quantityOfUnit(const std::string& unit) {
  static const std::map<std::string, Quantity> quantities{
      {"", Quantity::Dimensionless},   {"K", Quantity::Temperature},
      {"Pa", Quantity::Pressure},      {"J/kg", Quantity::SpecificEnergy},
      {"N", Quantity::Force},          {"kg/s", Quantity::MassFlow},
      {"m", Quantity::Length},         {"m/s", Quantity::Velocity},
      {"J/(kg K)", Quantity::Entropy}, {"kg/kg", Quantity::MassRatio},
      {"m^2", Quantity::Area},         {"W", Quantity::Power},
  };
  const auto found = quantities.find(unit);
  return found == quantities.end() ? std::nullopt : std::optional<Quantity>(found->second);
}

QString displayRange(const std::string& coreRange, Quantity quantity, const DisplayUnits& units) {
  static const QRegularExpression interval(
      QStringLiteral(R"(^\s*([\[(])\s*([^,\s]+)\s*,\s*([^\])\s]+)\s*([\])]))"));
  const QString text = QString::fromStdString(coreRange);
  const QRegularExpressionMatch m = interval.match(text);
  const std::optional<double> low = m.hasMatch() ? limitValue(m.captured(2)) : std::nullopt;
  const std::optional<double> high = m.hasMatch() ? limitValue(m.captured(3)) : std::nullopt;
  if (!low || !high) return text;
  QString range = m.captured(1) + limitText(*low, quantity, units) + QStringLiteral(", ") +
                  limitText(*high, quantity, units) + m.captured(4);
  if (quantity != Quantity::Dimensionless) range += QLatin1Char(' ') + units.symbol(quantity);
  return range;
}

}  // namespace cw::gui
