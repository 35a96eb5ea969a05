#include "audit/audit_panel.h"

#include "audit/audit_chart.h"
#include "audit/audit_csv.h"
#include "audit/audit_table_model.h"
#include "dialogs/dialogs.h"
#include "document/loss_names.h"
#include "document/selection_router.h"

#include "analysis/loss_catalogue.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPushButton>
#include <QSaveFile>
#include <QSplitter>
#include <QTableView>
#include <QVBoxLayout>

#include <algorithm>
#include <exception>
#include <string>
#include <vector>

namespace cw::gui {

AuditPanel::AuditPanel(DisplayUnits& units, SelectionRouter& router, QWidget* parent)
    : QWidget(parent), router_(router) {
  setObjectName("auditPanel");
  auto* layout = new QVBoxLayout(this);
  layout->setContentsMargins(4, 4, 4, 4);

  auto* controls = new QHBoxLayout;
  auto* figureLabel = new QLabel(tr("Figure:"), this);
  figure_ = new QComboBox(this);
  figure_->setObjectName("auditFigure");
  figure_->addItems({tr("Specific thrust"), tr("TSFC")});
  figureLabel->setBuddy(figure_);
  auto* viewLabel = new QLabel(tr("Table:"), this);
  view_ = new QComboBox(this);
  view_->setObjectName("auditView");
  view_->addItems({tr("Each loss removed alone"), tr("Waterfall steps"), tr("Sensitivities per unit"),
                   tr("Exergy destroyed")});
  view_->setCurrentIndex(static_cast<int>(AuditView::Waterfall));
  // Narrower than its longest entry when docked on a laptop screen (the list shows them whole).
  view_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
  view_->setMinimumContentsLength(14);
  viewLabel->setBuddy(view_);
  controls->addWidget(figureLabel);
  controls->addWidget(figure_);
  controls->addSpacing(12);
  controls->addWidget(viewLabel);
  controls->addWidget(view_, 1);
  orderButton_ = new QPushButton(tr("&Order…"), this);
  orderButton_->setObjectName("auditOrderButton");
  orderButton_->setEnabled(false);  // until there is an audit
  orderButton_->setToolTip(tr("The order in which the waterfall adds the losses to the ideal cycle"));
  controls->addWidget(orderButton_);
  layout->addLayout(controls);

  split_ = new QSplitter(Qt::Vertical, this);
  auto* split = split_;
  auto* chartBox = new QWidget(split);
  auto* chartLayout = new QVBoxLayout(chartBox);
  chartLayout->setContentsMargins(0, 0, 0, 0);
  chartLayout->setSpacing(2);
  chart_ = new AuditChart(units, chartBox);
  chart_->setMinimumSize(260, 200);  // a docked waterfall on a laptop screen; its labels wrap
  note_ = new QLabel(tr("The waterfall steps depend on the order in which the losses are added, because "
                        "the losses interact; their sum does not."),
                     chartBox);
  note_->setObjectName("auditOrderNote");
  note_->setWordWrap(true);
  note_->setMinimumWidth(240);  // a wrapped label would ask for a long line: it wraps in a narrow dock
  chartLayout->addWidget(chart_, 1);
  chartLayout->addWidget(note_);
  model_ = new AuditTableModel(units, this);
  model_->setView(AuditView::Waterfall);
  table_ = new QTableView(split);
  table_->setObjectName("auditTable");
  table_->setModel(model_);
  table_->verticalHeader()->hide();
  table_->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
  table_->horizontalHeader()->setStretchLastSection(true);
  table_->setAlternatingRowColors(true);
  table_->verticalHeader()->setDefaultSectionSize(QFontMetrics(table_->font()).height() + 6);
  split->addWidget(chartBox);
  split->addWidget(table_);
  split->setStretchFactor(0, 3);
  split->setStretchFactor(1, 2);
  layout->addWidget(split, 1);

  connect(figure_, &QComboBox::currentIndexChanged, this, [this](int index) {
    chart_->setFigure(index == 1 ? AuditFigure::Tsfc : AuditFigure::SpecificThrust);
  });
  connect(view_, &QComboBox::currentIndexChanged, this,
          [this](int index) { model_->setView(static_cast<AuditView>(index)); });
  connect(orderButton_, &QPushButton::clicked, this, &AuditPanel::editOrder);
  connect(chart_, &AuditChart::lossClicked, this,
          [this](const QString& loss) { router_.select(lossSection(loss.toStdString())); });
  connect(&router_, &SelectionRouter::selected, chart_, &AuditChart::setHighlightedSection);
  chart_->setHighlightedSection(router_.current());
}

void AuditPanel::update(const engine::Case& inputs,
                        const std::shared_ptr<const engine::Evaluation>& evaluation, bool stale) {
  if (evaluation != audited_) {
    audited_ = evaluation;
    inputs_ = inputs;
    documentStale_ = stale;
    runAudit();
    return;
  }
  documentStale_ = stale;
  stale_ = stale || failed_;
  chart_->setStale(stale_);
  model_->setStale(stale_);
}

void AuditPanel::runAudit() {
  failed_ = false;
  if (!audited_) {
    audit_.reset();
  } else {
    std::vector<std::string> order;
    for (const QString& key : order_) order.push_back(key.toStdString());
    try {
      audit_ = std::make_shared<const analysis::LossAudit>(analysis::auditCase(inputs_, order));
    } catch (const std::exception&) {
      failed_ = true;  // a variant had no cycle: keep the last audit, marked stale
    }
  }
  stale_ = documentStale_ || failed_;
  orderButton_->setEnabled(audited_ != nullptr);
  chart_->setAudit(audit_, stale_);
  model_->setAudit(audit_, stale_);
}

void AuditPanel::setOrder(const QStringList& keys) {
  QStringList known;
  for (const QString& key : keys) {
    const bool valid =
        std::any_of(analysis::lossCatalogue().begin(), analysis::lossCatalogue().end(),
                    [&](const analysis::LossDefinition& l) { return l.key == key.toStdString(); });
    if (valid && !known.contains(key)) known << key;
  }
  if (known == order_) return;
  order_ = known;
  if (audited_) runAudit();
  emit orderChanged(order_);
}

void AuditPanel::editOrder() {
  // The losses of this case: as audited now, and in flow order.
  QStringList current, flow;
  std::vector<std::string> asked;
  for (const QString& key : order_) asked.push_back(key.toStdString());
  try {
    for (const auto& key : analysis::waterfallOrderOf(inputs_, asked)) current << QString::fromStdString(key);
    for (const auto& key : analysis::waterfallOrderOf(inputs_, {})) flow << QString::fromStdString(key);
  } catch (const std::exception&) {
    return;  // setOrder keeps only valid keys, so this does not happen
  }
  LossOrderDialog dialog(current, flow, this);
  if (dialog.exec() != QDialog::Accepted) return;
  const QStringList chosen = dialog.order();
  setOrder(chosen == flow ? QStringList() : chosen);
}

void AuditPanel::setSideBySide(bool sideBySide) {
  split_->setOrientation(sideBySide ? Qt::Horizontal : Qt::Vertical);
  chart_->setMinimumHeight(sideBySide ? 40 : 200);  // low: it must not squeeze the cycle charts
}

bool AuditPanel::exportCsv(const QString& path) const {
  if (!audit_) return false;
  QSaveFile file(path);
  if (!file.open(QIODevice::WriteOnly)) return false;
  file.write(QByteArray::fromStdString(lossAuditCsv(*audit_)));
  return file.commit();
}

}  // namespace cw::gui
