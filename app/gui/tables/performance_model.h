#pragma once
// The performance summary: each figure of the cycle with losses beside its ideal value and
// the difference (with losses minus ideal), in display units.

#include "engine/cycle_result.h"

#include <QAbstractTableModel>

#include <memory>

namespace cw::gui {

class DisplayUnits;

class PerformanceModel : public QAbstractTableModel {
  Q_OBJECT

 public:
  enum Row {
    NetThrust,
    SpecificThrust,
    Tsfc,
    FuelAirRatio,
    FuelFlow,
    ThermalEfficiency,
    PropulsiveEfficiency,
    OverallEfficiency,
    JetVelocity,
    RowCount
  };
  enum Column { Name, Actual, Ideal, Difference, Unit, ColumnCount };
  static constexpr int ValueRole = Qt::UserRole + 1;

  explicit PerformanceModel(DisplayUnits& units, QObject* parent = nullptr);

  void setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale);
  void setStale(bool stale);

  int rowCount(const QModelIndex& parent = {}) const override;
  int columnCount(const QModelIndex& parent = {}) const override;
  QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
  QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

  /// SI value of a row for one cycle.
  static double siValue(const engine::Performance& performance, int row);

 private:
  DisplayUnits& units_;
  std::shared_ptr<const engine::Evaluation> evaluation_;
  bool stale_ = false;
};

}  // namespace cw::gui
