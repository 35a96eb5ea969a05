#pragma once
// A trade study as a table, one row per point in grid order: the varied inputs, the point's
// status, its specific thrust and TSFC, the output chosen for the chart (when another), and for
// a point without a cycle the core's reason. Display units from DisplayUnits, each value at its
// quantity's display precision (DisplayUnits::displayText), the unit in the header; greyed when
// stale. Copies keep full precision (toTabSeparated).
// A figure a point does not have is an empty cell, never a zero.

#include "document/units.h"
#include "trade_study/study_chart.h"

#include "study/study_columns.h"
#include "study/trade_study.h"

#include <QAbstractTableModel>

#include <array>
#include <memory>
#include <string>
#include <vector>

namespace cw::gui {

class StudyTableModel : public QAbstractTableModel {
  Q_OBJECT

 public:
  /// The SI value of a cell (a number) for copying; invalid for text cells and missing figures.
  static constexpr int ValueRole = Qt::UserRole + 1;

  explicit StudyTableModel(DisplayUnits& units, QObject* parent = nullptr);

  void setStudy(std::shared_ptr<const study::TradeStudy> study, std::array<StudyAxisName, 2> axes,
                bool stale);
  void setStale(bool stale);
  bool isStale() const { return stale_; }
  /// The output shown beside specific thrust and TSFC (a study column's name; empty for none).
  void setExtraColumn(const std::string& name);

  int rowCount(const QModelIndex& parent = QModelIndex()) const override;
  int columnCount(const QModelIndex& parent = QModelIndex()) const override;
  QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
  QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

  /// The table as tab-separated text for a spreadsheet: the caution and the grid first as '#'
  /// lines, then the header (units in it) and one line per point, numbers in display units at
  /// full precision (the shortest text that reads back to the same double, C locale:
  /// cw::formatNumber, as the core's exporters write).
  QString toTabSeparated() const;

 private:
  enum class Kind { Input, Status, Figure, Reason };
  struct Column {
    Kind kind;
    int axis = 0;                                ///< Input
    const study::StudyColumn* figure = nullptr;  ///< Figure
  };
  void rebuildColumns();
  QVariant siValue(int row, const Column& column) const;

  DisplayUnits& units_;
  std::vector<study::StudyColumn> all_;
  std::shared_ptr<const study::TradeStudy> study_;
  std::array<StudyAxisName, 2> axes_{};
  std::string extra_;
  std::vector<Column> columns_;
  bool stale_ = false;
};

}  // namespace cw::gui
