#pragma once
// The loss-audit panel: the waterfall chart (specific thrust or TSFC) over a table of the
// audit's four views. It shows the document's audit (CaseDocument::audit(), the last step of
// the one evaluation pipeline per edit) and keeps no copy: while the inputs are invalid the
// document keeps the last audit, marked stale. With a baseline pinned, "Baseline beside" shows
// the document's audit of the baseline (CaseDocument::baselineAudit) beside the current one. The waterfall's
// order is the user's (setOrder, or the "Order…" dialog), kept in the document.

#include "analysis/loss_audit.h"

#include <QStringList>
#include <QWidget>

#include <memory>

class QCheckBox;
class QHBoxLayout;
class QComboBox;
class QLabel;
class QPushButton;
class QSplitter;
class QTableView;

namespace cw::gui {

class AuditChart;
class AuditTableModel;
class CaseDocument;
class DisplayUnits;
class SelectionRouter;

class AuditPanel : public QWidget {
  Q_OBJECT

 public:
  AuditPanel(CaseDocument& document, DisplayUnits& units, SelectionRouter& router, QWidget* parent = nullptr);

  std::shared_ptr<const analysis::LossAudit> audit() const;
  bool isStale() const;
  AuditChart* chart() const { return chart_; }
  AuditTableModel* model() const { return model_; }
  QComboBox* figureBox() const { return figure_; }
  QComboBox* viewBox() const { return view_; }
  QPushButton* orderButton() const { return orderButton_; }
  QLabel* orderNote() const { return note_; }
  /// "Baseline beside": the baseline's waterfall beside the current one (enabled while there is
  /// a baseline; the document audits it in the same order).
  QCheckBox* baselineBox() const { return baselineBox_; }

  /// The waterfall order asked for (loss keys; empty for the flow order). The audit puts these
  /// first and the remaining losses after them in flow order (analysis::waterfallOrderOf).
  QStringList order() const;
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
  /// The document's audit changed: chart, table and the order button follow.
  void refresh();
  /// The baseline or its audit changed, or the box was ticked: the chart shows it or not.
  void refreshBaseline();
  void fitColumns();

  CaseDocument& document_;
  SelectionRouter& router_;
  AuditChart* chart_ = nullptr;
  AuditTableModel* model_ = nullptr;
  QComboBox* figure_ = nullptr;
  QComboBox* view_ = nullptr;
  QTableView* table_ = nullptr;
  QSplitter* split_ = nullptr;
  QPushButton* orderButton_ = nullptr;
  QCheckBox* baselineBox_ = nullptr;
  QHBoxLayout* controls_ = nullptr;   ///< the figure, table and order controls (and the box beside)
  QHBoxLayout* secondRow_ = nullptr;  ///< the box, in a dock
  QLabel* note_ = nullptr;
  std::shared_ptr<const analysis::LossAudit> shown_;  ///< what the chart holds (to rebuild only on change)
};

}  // namespace cw::gui
