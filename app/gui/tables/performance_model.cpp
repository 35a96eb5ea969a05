#include "tables/performance_model.h"

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
  emit dataChanged(index(0, 0), index(RowCount - 1, ColumnCount - 1));
}

void PerformanceModel::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  emit dataChanged(index(0, 0), index(RowCount - 1, ColumnCount - 1));
}

int PerformanceModel::rowCount(const QModelIndex& parent) const {
  return parent.isValid() ? 0 : RowCount;
}
int PerformanceModel::columnCount(const QModelIndex& parent) const {
  return parent.isValid() ? 0 : ColumnCount;
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
  double si = 0.0;
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
  const bool efficiency = row == ThermalEfficiency || row == PropulsiveEfficiency || row == OverallEfficiency;
  QString text = formatNumber(shown, efficiency || row == FuelAirRatio ? 4 : 5);
  if (index.column() == Difference && shown > 0) text.prepend(QLatin1Char('+'));
  return text;
}

QVariant PerformanceModel::headerData(int section, Qt::Orientation orientation, int role) const {
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
    default:
      return {};
  }
}

}  // namespace cw::gui
