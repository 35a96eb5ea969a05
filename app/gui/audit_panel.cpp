#include "audit_panel.h"

#include "audit_csv.h"
#include "audit_table_model.h"
#include "charts/audit_chart.h"
#include "loss_names.h"
#include "selection_router.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QSaveFile>
#include <QSplitter>
#include <QTableView>
#include <QVBoxLayout>

#include <exception>

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
  viewLabel->setBuddy(view_);
  controls->addWidget(figureLabel);
  controls->addWidget(figure_);
  controls->addSpacing(12);
  controls->addWidget(viewLabel);
  controls->addWidget(view_, 1);
  layout->addLayout(controls);

  auto* split = new QSplitter(Qt::Vertical, this);
  chart_ = new AuditChart(units, split);
  chart_->setMinimumHeight(200);
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
  split->addWidget(chart_);
  split->addWidget(table_);
  split->setStretchFactor(0, 3);
  split->setStretchFactor(1, 2);
  layout->addWidget(split, 1);

  connect(figure_, &QComboBox::currentIndexChanged, this, [this](int index) {
    chart_->setFigure(index == 1 ? AuditFigure::Tsfc : AuditFigure::SpecificThrust);
  });
  connect(view_, &QComboBox::currentIndexChanged, this,
          [this](int index) { model_->setView(static_cast<AuditView>(index)); });
  connect(chart_, &AuditChart::lossClicked, this,
          [this](const QString& loss) { router_.select(lossSection(loss.toStdString())); });
  connect(&router_, &SelectionRouter::selected, chart_, &AuditChart::setHighlightedSection);
  chart_->setHighlightedSection(router_.current());
}

void AuditPanel::update(const engine::Case& inputs,
                        const std::shared_ptr<const engine::Evaluation>& evaluation, bool stale) {
  if (evaluation != audited_) {
    audited_ = evaluation;
    failed_ = false;
    if (!evaluation) {
      audit_.reset();
    } else {
      try {
        audit_ = std::make_shared<const analysis::LossAudit>(analysis::auditCase(inputs));
      } catch (const std::exception&) {
        failed_ = true;  // a variant had no cycle: keep the last audit, marked stale
      }
    }
    stale_ = stale || failed_;
    chart_->setAudit(audit_, stale_);
    model_->setAudit(audit_, stale_);
    return;
  }
  stale_ = stale || failed_;
  chart_->setStale(stale_);
  model_->setStale(stale_);
}

bool AuditPanel::exportCsv(const QString& path) const {
  if (!audit_) return false;
  QSaveFile file(path);
  if (!file.open(QIODevice::WriteOnly)) return false;
  file.write(QByteArray::fromStdString(lossAuditCsv(*audit_)));
  return file.commit();
}

}  // namespace cw::gui
