#pragma once
// The performance summary: each figure of the cycle with losses beside its ideal value and
// the difference (with losses minus ideal), in display units. With a baseline (a pinned or
// opened case, CaseDocument::baselineEvaluation) three columns follow the unit: the baseline's
// value, the change from it (with losses minus baseline, in the row's unit) and, where a ratio
// says something (not for the efficiencies, whose change is in points), the change in percent.

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
  enum Column {
    Name,
    Actual,
    Ideal,
    Difference,
    Unit,
    Baseline,
    BaselineChange,
    BaselinePercent,
    ColumnCount
  };
  /// The columns without a baseline.
  static constexpr int kColumnsWithoutBaseline = Baseline;
  static constexpr int ValueRole = Qt::UserRole + 1;

  explicit PerformanceModel(DisplayUnits& units, QObject* parent = nullptr);

  void setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale);
  void setStale(bool stale);
  /// The baseline's evaluation (null: none; the baseline columns go).
  void setBaseline(std::shared_ptr<const engine::Evaluation> baseline, const QString& title = {});
  bool hasBaseline() const { return baseline_ != nullptr; }
  /// The table as tab-separated text (headers, then the rows), caution first.
  QString toTabSeparated() const;

  int rowCount(const QModelIndex& parent = {}) const override;
  int columnCount(const QModelIndex& parent = {}) const override;
  QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
  QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

  /// SI value of a row for one cycle.
  static double siValue(const engine::Performance& performance, int row);

 private:
  DisplayUnits& units_;
  std::shared_ptr<const engine::Evaluation> evaluation_;
  std::shared_ptr<const engine::Evaluation> baseline_;
  QString baselineTitle_;
  bool stale_ = false;
};

}  // namespace cw::gui
