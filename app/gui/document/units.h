#pragma once
// Display units: SI or U.S. customary, converted only at the user-interface boundary.
//
// Every factor below is the size of one display unit in SI, so that
//   SI value = display value * factor,   display value = SI value / factor.
// All units used here are absolute (K and degrees Rankine share the zero), so no offsets occur.
//
// Sources (exact definitions):
//   1 lbm  = 0.45359237 kg                  (international yard and pound agreement, 1959)
//   1 lbf  = 4.4482216152605 N              (1 lbm x standard gravity 9.80665 m/s^2)
//   1 psi  = 6894.757293168 Pa              (1 lbf / (0.0254 m)^2)
//   1 ft   = 0.3048 m                       (international yard and pound agreement, 1959)
//   1 degR = 1/1.8 K, i.e. T[degR] = T[K] x 1.8
//   1 Btu  = 1055.05585262 J                (International Table Btu; 1 Btu/lbm = 2326 J/kg exactly)
//   1 hp   = 745.69987158227022 W           (mechanical horsepower, 550 ft lbf/s)
// NIST Special Publication 811 (2008), appendix B.8, lists each of these.

#include <QObject>
#include <QString>

namespace cw::gui {

enum class UnitSystem { SI, USCustomary };

/// The physical quantities the interface shows or accepts.
enum class Quantity {
  Dimensionless,      ///< [-]
  Temperature,        ///< K or degR
  TemperatureChange,  ///< K or degR (a difference, e.g. the ISA offset)
  Pressure,           ///< kPa or psia
  MassFlow,           ///< kg/s or lbm/s
  Force,              ///< N or lbf
  Tsfc,               ///< g/(kN s) or lbm/(lbf h)
  SpecificThrust,     ///< N s/kg or lbf s/lbm
  Entropy,            ///< J/(kg K) or Btu/(lbm degR)
  SpecificHeat,       ///< J/(kg K) or Btu/(lbm degR)
  SpecificVolume,     ///< m^3/kg or ft^3/lbm
  SpecificEnergy,     ///< MJ/kg or Btu/lbm (heating value)
  Velocity,           ///< m/s or ft/s
  Area,               ///< m^2 or ft^2
  Length,             ///< m or ft
  Power,              ///< kW or hp
  MassRatio,          ///< kg/kg (the same in both systems)
};

namespace factors {
inline constexpr double kPoundMass = 0.45359237;           // kg per lbm
inline constexpr double kPoundForce = 4.4482216152605;     // N per lbf
inline constexpr double kPsi = 6894.757293168;             // Pa per psi
inline constexpr double kFoot = 0.3048;                    // m per ft
inline constexpr double kRankine = 1.0 / 1.8;              // K per degR
inline constexpr double kBtuPerPound = 2326.0;             // (J/kg) per (Btu/lbm)
inline constexpr double kBtuPerPoundRankine = 4186.8;      // (J/(kg K)) per (Btu/(lbm degR)) = 2326 x 1.8
inline constexpr double kHorsepower = 745.69987158227022;  // W per hp
inline constexpr double kHour = 3600.0;                    // s per h
}  // namespace factors

/// SI per display unit of a quantity (see the header comment).
double unitFactor(Quantity quantity, UnitSystem system);
/// The unit symbol, e.g. "kPa", "°R", "g/(kN·s)"; "–" for dimensionless quantities.
QString unitSymbol(Quantity quantity, UnitSystem system);

inline double toDisplay(double si, Quantity q, UnitSystem s) {
  return si / unitFactor(q, s);
}
inline double fromDisplay(double shown, Quantity q, UnitSystem s) {
  return shown * unitFactor(q, s);
}

/// A number in fixed notation with the given significant digits, in the current locale
/// (no group separators). Non-finite values never reach here; they print as 0.
QString formatNumber(double value, int significantDigits = 5);

/// The unit system the interface uses now; one object, shared by forms, charts and tables.
class DisplayUnits : public QObject {
  Q_OBJECT

 public:
  explicit DisplayUnits(QObject* parent = nullptr) : QObject(parent) {}

  UnitSystem system() const { return system_; }
  void setSystem(UnitSystem system);

  double factor(Quantity q) const { return unitFactor(q, system_); }
  double toDisplay(double si, Quantity q) const { return si / factor(q); }
  double fromDisplay(double shown, Quantity q) const { return shown * factor(q); }
  QString symbol(Quantity q) const { return unitSymbol(q, system_); }
  /// "label [unit]" for axis titles and headers.
  QString withUnit(const QString& label, Quantity q) const;
  /// A value formatted for display with its unit, in the current locale.
  QString format(double si, Quantity q, int significantDigits = 5) const;
  /// A value in tables at its quantity's display precision (displayDigits), without unit, in
  /// the current locale, fixed notation: 1316.6666667 K shows "1316.7", 2370 °R "2370.0".
  QString displayText(double si, Quantity q) const;
  /// The significant digits a value of a quantity is shown with in tables: 4 for ratios,
  /// fractions and efficiencies (dimensionless, kg/kg), 5 for the rest (as the performance and
  /// station tables show them).
  static int displayDigits(Quantity q);
  /// The text of an input value in its field, without unit, in the current locale: in SI the
  /// value as typed (shortest form up to 12 significant digits); in U.S. customary units the
  /// conversion at display precision, as many significant digits as the SI text has but at
  /// least kInputDigits, trailing zeros dropped (6000 m: "19685" ft, not "19685.0393701").
  QString inputText(double si, Quantity q) const;
  /// inputText with the unit symbol (none for a dimensionless quantity).
  QString inputTextWithUnit(double si, Quantity q) const;
  static constexpr int kInputDigits = 5;

 signals:
  void changed();

 private:
  UnitSystem system_ = UnitSystem::SI;
};

}  // namespace cw::gui
