#pragma once
// The loss audit as a table, one of its four views at a time: each loss removed alone, the
// waterfall steps (with their sum), the sensitivities per unit, the exergy destroyed per
// component (with the balance's closure). Display units from DisplayUnits; greyed when stale.

#include "analysis/loss_audit.h"
#include "document/units.h"

#include <QAbstractTableModel>

#include <memory>

namespace cw::gui {

enum class AuditView { OneAtATime, Waterfall, Sensitivities, Exergy };

class AuditTableModel : public QAbstractTableModel {
  Q_OBJECT

 public:
  explicit AuditTableModel(DisplayUnits& units, QObject* parent = nullptr);

  void setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale);
  void setStale(bool stale);
  bool isStale() const { return stale_; }
  void setView(AuditView view);
  /// The column of the loss's or component's name (the one that gives way in a narrow dock).
  int nameColumn() const { return view_ == AuditView::Waterfall ? 1 : 0; }
  AuditView view() const { return view_; }

  int rowCount(const QModelIndex& parent = QModelIndex()) const override;
  int columnCount(const QModelIndex& parent = QModelIndex()) const override;
  QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
  QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

 private:
  QString text(int row, int column) const;

  DisplayUnits& units_;
  std::shared_ptr<const analysis::LossAudit> audit_;
  bool stale_ = false;
  AuditView view_ = AuditView::Waterfall;
};

}  // namespace cw::gui
