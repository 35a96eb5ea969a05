#include "document/units.h"

#include <QLocale>

#include <algorithm>
#include <cmath>

namespace cw::gui {

using namespace factors;

double unitFactor(Quantity quantity, UnitSystem system) {
  const bool si = system == UnitSystem::SI;
  switch (quantity) {
    case Quantity::Dimensionless:
    case Quantity::MassRatio:
      return 1.0;
    case Quantity::Temperature:
    case Quantity::TemperatureChange:
      return si ? 1.0 : kRankine;
    case Quantity::Pressure:
      return si ? 1000.0 : kPsi;
    case Quantity::MassFlow:
      return si ? 1.0 : kPoundMass;
    case Quantity::Force:
      return si ? 1.0 : kPoundForce;
    case Quantity::Tsfc:
      // g/(kN s) = 1e-3 kg / (1e3 N s); lbm/(lbf h).
      return si ? 1.0e-6 : kPoundMass / (kPoundForce * kHour);
    case Quantity::SpecificThrust:
      return si ? 1.0 : kPoundForce / kPoundMass;
    case Quantity::Entropy:
    case Quantity::SpecificHeat:
      return si ? 1.0 : kBtuPerPoundRankine;
    case Quantity::SpecificVolume:
      return si ? 1.0 : kFoot * kFoot * kFoot / kPoundMass;
    case Quantity::SpecificEnergy:
      return si ? 1.0e6 : kBtuPerPound;
    case Quantity::Velocity:
    case Quantity::Length:
      return si ? 1.0 : kFoot;
    case Quantity::Area:
      return si ? 1.0 : kFoot * kFoot;
    case Quantity::Power:
      return si ? 1000.0 : kHorsepower;
  }
  return 1.0;
}

QString unitSymbol(Quantity quantity, UnitSystem system) {
  const bool si = system == UnitSystem::SI;
  switch (quantity) {
    case Quantity::Dimensionless:
      return QStringLiteral("–");
    case Quantity::MassRatio:
      return QStringLiteral("kg/kg");
    case Quantity::Temperature:
    case Quantity::TemperatureChange:
      return si ? QStringLiteral("K") : QStringLiteral("°R");
    case Quantity::Pressure:
      return si ? QStringLiteral("kPa") : QStringLiteral("psia");
    case Quantity::MassFlow:
      return si ? QStringLiteral("kg/s") : QStringLiteral("lbm/s");
    case Quantity::Force:
      return si ? QStringLiteral("N") : QStringLiteral("lbf");
    case Quantity::Tsfc:
      return si ? QStringLiteral("g/(kN·s)") : QStringLiteral("lbm/(lbf·h)");
    case Quantity::SpecificThrust:
      return si ? QStringLiteral("N·s/kg") : QStringLiteral("lbf·s/lbm");
    case Quantity::Entropy:
    case Quantity::SpecificHeat:
      return si ? QStringLiteral("J/(kg·K)") : QStringLiteral("Btu/(lbm·°R)");
    case Quantity::SpecificVolume:
      return si ? QStringLiteral("m³/kg") : QStringLiteral("ft³/lbm");
    case Quantity::SpecificEnergy:
      return si ? QStringLiteral("MJ/kg") : QStringLiteral("Btu/lbm");
    case Quantity::Velocity:
      return si ? QStringLiteral("m/s") : QStringLiteral("ft/s");
    case Quantity::Area:
      return si ? QStringLiteral("m²") : QStringLiteral("ft²");
    case Quantity::Length:
      return si ? QStringLiteral("m") : QStringLiteral("ft");
    case Quantity::Power:
      return si ? QStringLiteral("kW") : QStringLiteral("hp");
  }
  return {};
}

void DisplayUnits::setSystem(UnitSystem system) {
  if (system == system_) return;
  system_ = system;
  emit changed();
}

QString DisplayUnits::withUnit(const QString& label, Quantity q) const {
  return QStringLiteral("%1 [%2]").arg(label, symbol(q));
}

QString formatNumber(double value, int significantDigits) {
  QLocale locale;
  locale.setNumberOptions(QLocale::OmitGroupSeparator);
  if (value == 0.0 || !std::isfinite(value)) return locale.toString(0.0, 'f', 0);
  const int magnitude = static_cast<int>(std::floor(std::log10(std::fabs(value))));
  const int decimals = std::clamp(significantDigits - 1 - magnitude, 0, 9);
  return locale.toString(value, 'f', decimals);
}

QString DisplayUnits::format(double si, Quantity q, int significantDigits) const {
  const QString unit = symbol(q);
  const QString number = formatNumber(toDisplay(si, q), significantDigits);
  return q == Quantity::Dimensionless ? number : QStringLiteral("%1 %2").arg(number, unit);
}

int DisplayUnits::displayDigits(Quantity q) {
  return q == Quantity::Dimensionless || q == Quantity::MassRatio ? 4 : 5;
}

QString DisplayUnits::displayText(double si, Quantity q) const {
  double shown = toDisplay(si, q);
  if (std::fabs(shown) < 1e-12) shown = 0.0;  // a computed zero, not "-0"
  return formatNumber(shown, displayDigits(q));
}

namespace {

/// Significant digits of a number's text ("6000" 1, "0.845" 3, "1350.5" 5).
int significantDigits(const QString& text) {
  QString mantissa = text.section(QLatin1Char('e'), 0, 0, QString::SectionCaseInsensitiveSeps);
  QString digits;
  for (const QChar c : mantissa)
    if (c.isDigit()) digits += c;
  while (digits.startsWith(QLatin1Char('0'))) digits.remove(0, 1);
  const bool fraction = mantissa.contains(QLocale().decimalPoint()) || mantissa.contains(QLatin1Char('.'));
  if (!fraction)
    while (digits.endsWith(QLatin1Char('0'))) digits.chop(1);  // 6000: trailing zeros say nothing
  return static_cast<int>(digits.size());
}

}  // namespace

QString DisplayUnits::inputText(double si, Quantity q) const {
  QLocale locale;
  locale.setNumberOptions(QLocale::OmitGroupSeparator);
  if (!std::isfinite(si)) return locale.toString(0);
  const QString asTyped = locale.toString(si / unitFactor(q, UnitSystem::SI), 'g', 12);
  if (system_ == UnitSystem::SI || factor(q) == unitFactor(q, UnitSystem::SI)) return asTyped;
  const double shown = toDisplay(si, q);
  if (shown == 0.0) return locale.toString(0);
  const int digits = std::clamp(significantDigits(asTyped), kInputDigits, 12);
  const int magnitude = static_cast<int>(std::floor(std::log10(std::fabs(shown))));
  const int decimals = std::clamp(digits - 1 - magnitude, 0, 12);
  QString text = locale.toString(shown, 'f', decimals);
  if (decimals > 0) {
    while (text.endsWith(QLatin1Char('0'))) text.chop(1);
    if (text.endsWith(locale.decimalPoint())) text.chop(locale.decimalPoint().size());
  }
  return text;
}

QString DisplayUnits::inputTextWithUnit(double si, Quantity q) const {
  const QString number = inputText(si, q);
  return q == Quantity::Dimensionless ? number : QStringLiteral("%1 %2").arg(number, symbol(q));
}

}  // namespace cw::gui
