#include "audit/audit_panel.h"

#include "audit/audit_chart.h"
#include "audit/audit_csv.h"
#include "audit/audit_table_model.h"
#include "dialogs/dialogs.h"
#include "document/case_document.h"
#include "document/loss_names.h"
#include "document/selection_router.h"

#include "analysis/loss_catalogue.h"

#include <QCheckBox>
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

AuditPanel::AuditPanel(CaseDocument& document, DisplayUnits& units, SelectionRouter& router, QWidget* parent)
    : QWidget(parent), document_(document), router_(router) {
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
  baselineBox_ = new QCheckBox(tr("&Baseline beside"), this);
  baselineBox_->setObjectName("auditBaselineBeside");
  baselineBox_->setToolTip(
      tr("Show the baseline's waterfall, in grey, beside the current one "
         "(Edit > Pin as Baseline)"));
  controls->addWidget(baselineBox_);
  layout->addLayout(controls);
  // In a dock the box goes to a row of its own (the dock must not be wider for it).
  secondRow_ = new QHBoxLayout;
  secondRow_->setContentsMargins(0, 0, 0, 0);
  secondRow_->addStretch(1);
  layout->addLayout(secondRow_);
  controls_ = controls;

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
  table_->setAlternatingRowColors(true);
  table_->verticalHeader()->setDefaultSectionSize(QFontMetrics(table_->font()).height() + 6);
  // Never sideways: the numbers as wide as they need, the name the rest (elided in a narrow
  // dock, whole in its tooltip).
  table_->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
  table_->setTextElideMode(Qt::ElideRight);
  table_->horizontalHeader()->setTextElideMode(Qt::ElideRight);
  fitColumns();
  connect(model_, &QAbstractItemModel::modelReset, this, &AuditPanel::fitColumns);
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
  connect(&document_, &CaseDocument::auditChanged, this, &AuditPanel::refresh);
  connect(&document_, &CaseDocument::resultChanged, this, &AuditPanel::refresh);
  connect(&document_, &CaseDocument::baselineChanged, this, &AuditPanel::refreshBaseline);
  connect(&document_, &CaseDocument::baselineAuditChanged, this, &AuditPanel::refreshBaseline);
  connect(baselineBox_, &QCheckBox::toggled, this, &AuditPanel::refreshBaseline);
  refresh();
  refreshBaseline();
}

std::shared_ptr<const analysis::LossAudit> AuditPanel::audit() const {
  return document_.audit();
}

bool AuditPanel::isStale() const {
  return document_.isAuditStale();
}

QStringList AuditPanel::order() const {
  return document_.auditOrder();
}

void AuditPanel::refresh() {
  const auto audit = document_.audit();
  const bool stale = document_.isAuditStale();
  orderButton_->setEnabled(document_.evaluation() != nullptr);
  if (audit != shown_) {
    shown_ = audit;
    chart_->setAudit(audit, stale);
    model_->setAudit(audit, stale);
  } else {
    chart_->setStale(stale);
    model_->setStale(stale);
  }
}

void AuditPanel::fitColumns() {
  QHeaderView* header = table_->horizontalHeader();
  header->setStretchLastSection(false);
  header->setSectionResizeMode(QHeaderView::ResizeToContents);
  header->setSectionResizeMode(model_->nameColumn(), QHeaderView::Stretch);
}

void AuditPanel::refreshBaseline() {
  baselineBox_->setEnabled(document_.hasBaseline());
  const bool shown = baselineBox_->isChecked() && document_.hasBaseline();
  chart_->setBaseline(shown ? document_.baselineAudit() : nullptr, document_.baselineTitle());
}

void AuditPanel::setOrder(const QStringList& keys) {
  if (document_.setAuditOrder(keys)) emit orderChanged(document_.auditOrder());
}

void AuditPanel::editOrder() {
  // The losses of this case: as audited now, and in flow order.
  QStringList current, flow;
  std::vector<std::string> asked;
  for (const QString& key : document_.auditOrder()) asked.push_back(key.toStdString());
  const engine::Case& inputs = document_.evaluatedCase();
  try {
    for (const auto& key : analysis::waterfallOrderOf(inputs, asked)) current << QString::fromStdString(key);
    for (const auto& key : analysis::waterfallOrderOf(inputs, {})) flow << QString::fromStdString(key);
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
  controls_->removeWidget(baselineBox_);
  secondRow_->removeWidget(baselineBox_);
  if (sideBySide) {
    controls_->addWidget(baselineBox_);
  } else {
    secondRow_->insertWidget(0, baselineBox_);
  }
  chart_->setMinimumHeight(sideBySide ? 40 : 200);  // low: it must not squeeze the cycle charts
}

bool AuditPanel::exportCsv(const QString& path) const {
  const auto audit_ = document_.audit();
  if (!audit_) return false;
  QSaveFile file(path);
  if (!file.open(QIODevice::WriteOnly)) return false;
  file.write(QByteArray::fromStdString(lossAuditCsv(*audit_)));
  return file.commit();
}

}  // namespace cw::gui
