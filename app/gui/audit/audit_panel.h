#pragma once
// The loss-audit panel: the waterfall chart (specific thrust or TSFC) over a table of the
// audit's four views. It runs cw::analysis::auditCase once per new valid evaluation of the
// document (about 0.25 ms on the demo case, against 0.04 ms for evaluateCase, so on the edit
// path), keeps the last audit while the inputs are invalid and marks it stale. The waterfall's
// order is the user's (setOrder, or the "Order…" dialog); the panel passes it to auditCase.

#include "analysis/loss_audit.h"
#include "engine/case_inputs.h"
#include "engine/cycle_result.h"

#include <QStringList>
#include <QWidget>

#include <memory>

class QComboBox;
class QLabel;
class QPushButton;
class QSplitter;
class QTableView;

namespace cw::gui {

class AuditChart;
class AuditTableModel;
class DisplayUnits;
class SelectionRouter;

class AuditPanel : public QWidget {
  Q_OBJECT

 public:
  AuditPanel(DisplayUnits& units, SelectionRouter& router, QWidget* parent = nullptr);

  /// After a change of the document's result: audits the case when its evaluation is new.
  void update(const engine::Case& inputs, const std::shared_ptr<const engine::Evaluation>& evaluation,
              bool stale);

  std::shared_ptr<const analysis::LossAudit> audit() const { return audit_; }
  bool isStale() const { return stale_; }
  AuditChart* chart() const { return chart_; }
  AuditTableModel* model() const { return model_; }
  QComboBox* figureBox() const { return figure_; }
  QComboBox* viewBox() const { return view_; }
  QPushButton* orderButton() const { return orderButton_; }
  QLabel* orderNote() const { return note_; }

  /// The waterfall order asked for (loss keys; empty for the flow order). The audit puts these
  /// first and the remaining losses after them in flow order (analysis::waterfallOrderOf).
  QStringList order() const { return order_; }
  /// Sets the order (unknown and repeated keys are dropped) and re-audits at once.
  void setOrder(const QStringList& keys);
  /// The order in the dialog (LossOrderDialog), applied when accepted.
  void editOrder();

  /// Chart beside the table (a wide, low place) or above it.
  void setSideBySide(bool sideBySide);

  /// The whole audit as CSV (SI, with the caution). False when there is none or it cannot be written.
  bool exportCsv(const QString& path) const;

 signals:
  void orderChanged(const QStringList& keys);

 private:
  void runAudit();

  SelectionRouter& router_;
  AuditChart* chart_ = nullptr;
  AuditTableModel* model_ = nullptr;
  QComboBox* figure_ = nullptr;
  QComboBox* view_ = nullptr;
  QTableView* table_ = nullptr;
  QSplitter* split_ = nullptr;
  QPushButton* orderButton_ = nullptr;
  QLabel* note_ = nullptr;
  QStringList order_;
  engine::Case inputs_;  ///< the inputs of the audited evaluation
  std::shared_ptr<const engine::Evaluation> audited_;
  std::shared_ptr<const analysis::LossAudit> audit_;
  bool stale_ = false;
  bool documentStale_ = false;  ///< the document's result is stale
  bool failed_ = false;         ///< the audit of the shown evaluation threw
};

}  // namespace cw::gui
