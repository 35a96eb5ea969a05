#include "tables/station_table_model.h"

#include "charts/colours.h"

#include "document/caution.h"
#include "document/units.h"

#include <QApplication>
#include <QBrush>
#include <QFont>
#include <QPalette>

namespace cw::gui {

namespace {

Quantity columnQuantity(int column) {
  switch (column) {
    case StationTableModel::Tt:
    case StationTableModel::Ts:
      return Quantity::Temperature;
    case StationTableModel::Pt:
    case StationTableModel::Ps:
      return Quantity::Pressure;
    case StationTableModel::Velocity:
      return Quantity::Velocity;
    case StationTableModel::MassFlow:
      return Quantity::MassFlow;
    case StationTableModel::Entropy:
      return Quantity::Entropy;
    case StationTableModel::Area:
      return Quantity::Area;
    default:
      return Quantity::Dimensionless;
  }
}

}  // namespace

StationTableModel::StationTableModel(DisplayUnits& units, QObject* parent)
    : QAbstractTableModel(parent), units_(units) {
  connect(&units_, &DisplayUnits::changed, this, [this] {
    beginResetModel();
    endResetModel();
  });
}

void StationTableModel::setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale) {
  beginResetModel();
  evaluation_ = std::move(evaluation);
  stale_ = stale;
  endResetModel();
}

void StationTableModel::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  if (rowCount() > 0) emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
}

void StationTableModel::setMode(TableMode mode) {
  if (mode == mode_) return;
  beginResetModel();
  mode_ = mode;
  endResetModel();
}

void StationTableModel::setBaseline(std::shared_ptr<const engine::Evaluation> baseline) {
  beginResetModel();
  baseline_ = std::move(baseline);
  endResetModel();
}

void StationTableModel::setHighlightedStations(const QSet<QString>& stations) {
  if (stations == highlighted_) return;
  highlighted_ = stations;
  if (rowCount() > 0) emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
}

int StationTableModel::rowCount(const QModelIndex& parent) const {
  if (parent.isValid() || !evaluation_) return 0;
  return static_cast<int>(
      (mode_ == TableMode::Ideal ? evaluation_->ideal : evaluation_->actual).stations.size());
}

int StationTableModel::columnCount(const QModelIndex& parent) const {
  return parent.isValid() ? 0 : ColumnCount;
}

bool StationTableModel::siValue(const engine::Station& s, int column, double& value) {
  switch (column) {
    case Tt:
      value = s.totalTemperature;
      return true;
    case Pt:
      value = s.totalPressure;
      return true;
    case Ts:
      value = s.staticTemperature;
      return true;
    case Ps:
      value = s.staticPressure;
      return true;
    case Mach:
      value = s.mach;
      return true;
    case Velocity:
      value = s.velocity;
      return true;
    case MassFlow:
      value = s.massFlow;
      return true;
    case FuelAir:
      value = s.fuelAirRatio;
      return true;
    case Entropy:
      value = s.entropy;
      return true;
    case Area:
      if (!s.area) return false;
      value = *s.area;
      return true;
    default:
      return false;
  }
}

const engine::Station* StationTableModel::idealStation(const std::string& id) const {
  for (const auto& s : evaluation_->ideal.stations)
    if (s.id == id) return &s;
  return nullptr;
}

const engine::Station* StationTableModel::baselineStation(const std::string& id) const {
  if (!baseline_) return nullptr;
  for (const auto& s : baseline_->actual.stations)
    if (s.id == id) return &s;
  return nullptr;
}

bool StationTableModel::displayValue(int row, int column, double& value) const {
  const auto& cycle = mode_ == TableMode::Ideal ? evaluation_->ideal : evaluation_->actual;
  const engine::Station& station = cycle.stations[static_cast<size_t>(row)];
  double si = 0.0;
  if (!siValue(station, column, si)) return false;
  if (mode_ == TableMode::Difference) {
    const engine::Station* twin = idealStation(station.id);
    double other = 0.0;
    if (!twin || !siValue(*twin, column, other)) return false;
    si -= other;
  } else if (mode_ == TableMode::BaselineDifference) {
    const engine::Station* base = baselineStation(station.id);
    double other = 0.0;
    if (!base || !siValue(*base, column, other)) return false;  // no such station in the baseline
    si -= other;
  }
  value = units_.toDisplay(si, columnQuantity(column));
  return true;
}

QVariant StationTableModel::data(const QModelIndex& index, int role) const {
  if (!index.isValid() || !evaluation_) return {};
  const auto& cycle = mode_ == TableMode::Ideal ? evaluation_->ideal : evaluation_->actual;
  const engine::Station& station = cycle.stations[static_cast<size_t>(index.row())];
  const bool highlighted = highlighted_.contains(QString::fromStdString(station.id));
  switch (role) {
    case Qt::DisplayRole: {
      if (index.column() == Id) return QString::fromStdString(station.id);
      double value = 0.0;
      if (!displayValue(index.row(), index.column(), value)) return QStringLiteral("—");
      const int digits = index.column() == FuelAir ? 4 : 5;
      return formatNumber(value, digits);
    }
    case ValueRole: {
      double value = 0.0;
      if (index.column() == Id || !displayValue(index.row(), index.column(), value)) return {};
      return value;
    }
    case Qt::TextAlignmentRole:
      return index.column() == Id ? int(Qt::AlignCenter) : int(Qt::AlignRight | Qt::AlignVCenter);
    case Qt::FontRole:
      if (highlighted) {
        QFont font;
        font.setBold(true);
        return font;
      }
      return {};
    case Qt::BackgroundRole:
      if (highlighted) {
        // The selected component's vermillion, mixed into the palette's base (light or dark), so
        // that the palette's text colour stays readable on it.
        return QBrush(mixColours(QApplication::palette().color(QPalette::Base), kOkabeItoVermillion, 0.28));
      }
      return {};
    case Qt::ForegroundRole:
      if (stale_) return QApplication::palette().brush(QPalette::Disabled, QPalette::Text);
      return {};
    default:
      return {};
  }
}

QVariant StationTableModel::headerData(int section, Qt::Orientation orientation, int role) const {
  if (orientation != Qt::Horizontal || role != Qt::DisplayRole)
    return QAbstractTableModel::headerData(section, orientation, role);
  const QString prefix =
      (mode_ == TableMode::Difference || mode_ == TableMode::BaselineDifference) && section != Id
          ? QStringLiteral("Δ")
          : QString();
  auto withUnit = [&](const QString& name) {
    return units_.withUnit(prefix + name, columnQuantity(section));
  };
  switch (section) {
    case Id:
      return tr("Station");
    case Tt:
      return withUnit(tr("Tt"));
    case Pt:
      return withUnit(tr("pt"));
    case Ts:
      return withUnit(tr("Ts"));
    case Ps:
      return withUnit(tr("ps"));
    case Mach:
      return withUnit(tr("M"));
    case Velocity:
      return withUnit(tr("V"));
    case MassFlow:
      return withUnit(tr("W"));
    case FuelAir:
      return withUnit(tr("f"));
    case Entropy:
      return withUnit(tr("s"));
    case Area:
      return withUnit(tr("A"));
    default:
      return {};
  }
}

QString StationTableModel::toTabSeparated() const {
  QString text = QStringLiteral("# ") + cautionText() + QLatin1Char('\n');
  const QString title = mode_ == TableMode::Actual  ? tr("Stations, cycle with losses")
                        : mode_ == TableMode::Ideal ? tr("Stations, ideal cycle")
                        : mode_ == TableMode::Difference
                            ? tr("Stations, difference (with losses − ideal)")
                            : tr("Stations, difference from the baseline (with losses − baseline)");
  text += QStringLiteral("# ") + title + QLatin1Char('\n');
  QStringList header;
  for (int c = 0; c < ColumnCount; ++c) header << headerData(c, Qt::Horizontal).toString();
  text += header.join(QLatin1Char('\t')) + QLatin1Char('\n');
  for (int r = 0; r < rowCount(); ++r) {
    QStringList cells;
    for (int c = 0; c < ColumnCount; ++c) {
      const QVariant v = data(index(r, c), ValueRole);
      cells << (c == Id       ? data(index(r, c)).toString()
                : v.isValid() ? QString::number(v.toDouble(), 'g', 8)
                              : QString());
    }
    text += cells.join(QLatin1Char('\t')) + QLatin1Char('\n');
  }
  return text;
}

}  // namespace cw::gui
