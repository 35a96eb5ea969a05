#pragma once
// The station table: every station of the evaluation in display units, as the cycle with
// losses, its ideal twin, their difference (with losses minus ideal), or, with a baseline, the
// difference from the baseline's cycle with losses (station by station id). The selected
// component's stations are highlighted; a stale result is greyed.

#include "engine/cycle_result.h"

#include <QAbstractTableModel>
#include <QSet>

#include <memory>

namespace cw::gui {

class DisplayUnits;

enum class TableMode { Actual, Ideal, Difference, BaselineDifference };

class StationTableModel : public QAbstractTableModel {
  Q_OBJECT

 public:
  enum Column { Id, Tt, Pt, Ts, Ps, Mach, Velocity, MassFlow, FuelAir, Entropy, Area, ColumnCount };
  /// The value in display units (a double), for tests and copying.
  static constexpr int ValueRole = Qt::UserRole + 1;

  explicit StationTableModel(DisplayUnits& units, QObject* parent = nullptr);

  void setEvaluation(std::shared_ptr<const engine::Evaluation> evaluation, bool stale);
  void setStale(bool stale);
  void setMode(TableMode mode);
  /// The baseline's evaluation (null: none) for TableMode::BaselineDifference.
  void setBaseline(std::shared_ptr<const engine::Evaluation> baseline);
  TableMode mode() const { return mode_; }
  void setHighlightedStations(const QSet<QString>& stations);
  const QSet<QString>& highlightedStations() const { return highlighted_; }

  int rowCount(const QModelIndex& parent = {}) const override;
  int columnCount(const QModelIndex& parent = {}) const override;
  QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
  QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

  /// The table as tab-separated text (headers with units, then the rows), caution first.
  QString toTabSeparated() const;

 private:
  /// SI value of a column at a station; false when undefined (an area not defined there).
  static bool siValue(const engine::Station& station, int column, double& value);
  bool displayValue(int row, int column, double& value) const;
  const engine::Station* idealStation(const std::string& id) const;
  const engine::Station* baselineStation(const std::string& id) const;

  DisplayUnits& units_;
  std::shared_ptr<const engine::Evaluation> evaluation_;
  std::shared_ptr<const engine::Evaluation> baseline_;
  bool stale_ = false;
  TableMode mode_ = TableMode::Actual;
  QSet<QString> highlighted_;
};

}  // namespace cw::gui
