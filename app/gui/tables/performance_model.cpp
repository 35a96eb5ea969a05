#include "tables/performance_model.h"

#include "document/caution.h"
#include "document/units.h"

#include <QApplication>
#include <QPalette>

namespace cw::gui {

namespace {

Quantity rowQuantity(int row) {
  switch (row) {
    case PerformanceModel::NetThrust:
      return Quantity::Force;
    case PerformanceModel::SpecificThrust:
      return Quantity::SpecificThrust;
    case PerformanceModel::Tsfc:
      return Quantity::Tsfc;
    case PerformanceModel::FuelFlow:
      return Quantity::MassFlow;
    case PerformanceModel::JetVelocity:
      return Quantity::Velocity;
    default:
      return Quantity::Dimensionless;
  }
}

}  // namespace

PerformanceModel::PerformanceModel(DisplayUnits& units, QObject* parent)
    : QAbstractTableModel(parent), units_(units) {
  connect(&units_, &DisplayUnits::changed, this, [this] {
    beginResetModel();
    endResetModel();
  });
}

void PerformanceModel::setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale) {
  evaluation_ = std::move(evaluation);
  stale_ = stale;
  emit dataChanged(index(0, 0), index(RowCount - 1, columnCount() - 1));
}

void PerformanceModel::setBaseline(std::shared_ptr<const engine::Evaluation> baseline, const QString& title) {
  beginResetModel();
  baseline_ = std::move(baseline);
  baselineTitle_ = title;
  endResetModel();
}

QString PerformanceModel::toTabSeparated() const {
  QString text = QStringLiteral("# ") + cautionText() + QLatin1Char('\n');
  QStringList header;
  // The baseline's columns under their whole names (on screen: short, "Δ" and "Δ [%]").
  for (int c = 0; c < columnCount(); ++c)
    header << (c == BaselineChange    ? tr("Change from baseline")
               : c == BaselinePercent ? tr("Change [%]")
                                      : headerData(c, Qt::Horizontal).toString());
  text += header.join(QLatin1Char('\t')) + QLatin1Char('\n');
  for (int r = 0; r < rowCount(); ++r) {
    QStringList cells;
    for (int c = 0; c < columnCount(); ++c) {
      const QVariant v = data(index(r, c), ValueRole);
      cells << (v.isValid() ? QString::number(v.toDouble(), 'g', 10) : data(index(r, c)).toString());
    }
    text += cells.join(QLatin1Char('\t')) + QLatin1Char('\n');
  }
  return text;
}

void PerformanceModel::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  emit dataChanged(index(0, 0), index(RowCount - 1, columnCount() - 1));
}

int PerformanceModel::rowCount(const QModelIndex& parent) const {
  return parent.isValid() ? 0 : RowCount;
}
int PerformanceModel::columnCount(const QModelIndex& parent) const {
  return parent.isValid() ? 0 : baseline_ ? ColumnCount : kColumnsWithoutBaseline;
}

double PerformanceModel::siValue(const engine::Performance& p, int row) {
  switch (row) {
    case NetThrust:
      return p.netThrust;
    case SpecificThrust:
      return p.specificThrust;
    case Tsfc:
      return p.thrustSpecificFuelConsumption;
    case FuelAirRatio:
      return p.fuelAirRatio;
    case FuelFlow:
      return p.fuelFlow;
    case ThermalEfficiency:
      return p.thermalEfficiency;
    case PropulsiveEfficiency:
      return p.propulsiveEfficiency;
    case OverallEfficiency:
      return p.overallEfficiency;
    case JetVelocity:
      return p.jetVelocity;
    default:
      return 0.0;
  }
}

QVariant PerformanceModel::data(const QModelIndex& index, int role) const {
  if (!index.isValid()) return {};
  const int row = index.row();
  if (role == Qt::DisplayRole && index.column() == Name) {
    switch (row) {
      case NetThrust:
        return tr("Net thrust");
      case SpecificThrust:
        return tr("Specific thrust");
      case Tsfc:
        return tr("Thrust-specific fuel consumption");
      case FuelAirRatio:
        return tr("Fuel-air ratio");
      case FuelFlow:
        return tr("Fuel flow");
      case ThermalEfficiency:
        return tr("Thermal efficiency");
      case PropulsiveEfficiency:
        return tr("Propulsive efficiency");
      case OverallEfficiency:
        return tr("Overall efficiency");
      case JetVelocity:
        return tr("Jet velocity");
      default:
        return {};
    }
  }
  if (role == Qt::DisplayRole && index.column() == Unit) return units_.symbol(rowQuantity(row));
  if (role == Qt::TextAlignmentRole)
    return index.column() == Name || index.column() == Unit ? int(Qt::AlignLeft | Qt::AlignVCenter)
                                                            : int(Qt::AlignRight | Qt::AlignVCenter);
  if (role == Qt::ForegroundRole && stale_)
    return QApplication::palette().brush(QPalette::Disabled, QPalette::Text);
  if ((role != Qt::DisplayRole && role != ValueRole) || !evaluation_) return {};
  const double actual = siValue(evaluation_->actual.performance, row);
  const double ideal = siValue(evaluation_->ideal.performance, row);
  const bool efficiency = row == ThermalEfficiency || row == PropulsiveEfficiency || row == OverallEfficiency;
  double si = 0.0;
  if (index.column() >= Baseline) {
    if (!baseline_) return {};
    const double base = siValue(baseline_->actual.performance, row);
    if (index.column() == BaselinePercent) {
      // A relative change of an efficiency says little (its change is in points already).
      if (efficiency || base == 0.0) return role == ValueRole ? QVariant() : QVariant(QStringLiteral("—"));
      const double percent = 100.0 * (actual - base) / base;
      if (role == ValueRole) return percent;
      QString text = formatNumber(percent, 3);
      if (percent > 0) text.prepend(QLatin1Char('+'));
      return text;
    }
    si = index.column() == Baseline ? base : actual - base;
    const double shown = units_.toDisplay(si, rowQuantity(row));
    if (role == ValueRole) return shown;
    QString text = formatNumber(shown, efficiency || row == FuelAirRatio ? 4 : 5);
    if (index.column() == BaselineChange && shown > 0) text.prepend(QLatin1Char('+'));
    return text;
  }
  switch (index.column()) {
    case Actual:
      si = actual;
      break;
    case Ideal:
      si = ideal;
      break;
    case Difference:
      si = actual - ideal;
      break;
    default:
      return {};
  }
  const double shown = units_.toDisplay(si, rowQuantity(row));
  if (role == ValueRole) return shown;
  QString text = formatNumber(shown, efficiency || row == FuelAirRatio ? 4 : 5);
  if (index.column() == Difference && shown > 0) text.prepend(QLatin1Char('+'));
  return text;
}

QVariant PerformanceModel::headerData(int section, Qt::Orientation orientation, int role) const {
  // Short headers (the table fits beside the station table without scrolling sideways); the
  // tooltips say them in full.
  if (orientation == Qt::Horizontal && role == Qt::ToolTipRole && section >= Baseline && baseline_) {
    if (section == BaselineChange)
      return tr("Change from the baseline: with losses minus the baseline, in the row's unit (baseline: %1)")
          .arg(baselineTitle_);
    if (section == BaselinePercent)
      return tr("Change from the baseline in percent of the baseline (baseline: %1)").arg(baselineTitle_);
    return tr("Baseline: %1").arg(baselineTitle_);
  }
  if (orientation != Qt::Horizontal || role != Qt::DisplayRole)
    return QAbstractTableModel::headerData(section, orientation, role);
  switch (section) {
    case Name:
      return tr("Performance");
    case Actual:
      return tr("With losses");
    case Ideal:
      return tr("Ideal");
    case Difference:
      return tr("Difference");
    case Unit:
      return tr("Unit");
    case Baseline:
      return tr("Baseline");
    case BaselineChange:
      return tr("Δ");
    case BaselinePercent:
      return tr("Δ [%]");
    default:
      return {};
  }
}

}  // namespace cw::gui
