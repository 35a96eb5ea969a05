#include "dialogs/dialogs.h"

#include "document/loss_names.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLabel>
#include <QListWidget>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

namespace cw::gui {

namespace {
QDialogButtonBox* addButtons(QDialog* dialog, QVBoxLayout* layout) {
  auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, dialog);
  QObject::connect(buttons, &QDialogButtonBox::accepted, dialog, &QDialog::accept);
  QObject::connect(buttons, &QDialogButtonBox::rejected, dialog, &QDialog::reject);
  layout->addWidget(buttons);
  return buttons;
}
}  // namespace

PreferencesDialog::PreferencesDialog(QWidget* parent) : QDialog(parent) {
  setObjectName("preferencesDialog");
  setWindowTitle(tr("Preferences"));
  auto* layout = new QVBoxLayout(this);
  auto* form = new QFormLayout;
  units_ = new QComboBox(this);
  units_->setObjectName("unitSystem");
  units_->addItem(tr("SI (K, kPa, kg/s, N)"));
  units_->addItem(tr("U.S. customary (°R, psia, lbm/s, lbf)"));
  units_->setToolTip(tr("Units for display and entry. Case files always store SI values."));
  form->addRow(tr("&Units:"), units_);
  layout_ = new QComboBox(this);
  layout_->setObjectName("chartLayout");
  layout_->addItem(tr("Side by side"));
  layout_->addItem(tr("Tabbed"));
  form->addRow(tr("&Charts:"), layout_);
  autosave_ = new QSpinBox(this);
  autosave_->setObjectName("autosaveWithinSeconds");
  autosave_->setRange(AppSettings::kMinAutosaveWithin, AppSettings::kMaxAutosaveWithin);
  autosave_->setSuffix(tr(" s"));
  autosave_->setToolTip(
      tr("Unsaved edits are saved for recovery after a crash 2 s after the last edit, and at the latest "
         "this many seconds after the first, even while you keep typing."));
  form->addRow(tr("&Autosave edits within:"), autosave_);
  layout->addLayout(form);
  addButtons(this, layout);
}

UnitSystem PreferencesDialog::unitSystem() const {
  return units_->currentIndex() == 1 ? UnitSystem::USCustomary : UnitSystem::SI;
}
void PreferencesDialog::setUnitSystem(UnitSystem system) {
  units_->setCurrentIndex(system == UnitSystem::USCustomary ? 1 : 0);
}
ChartLayout PreferencesDialog::chartLayout() const {
  return layout_->currentIndex() == 1 ? ChartLayout::Tabbed : ChartLayout::SideBySide;
}
void PreferencesDialog::setChartLayout(ChartLayout layout) {
  layout_->setCurrentIndex(layout == ChartLayout::Tabbed ? 1 : 0);
}
int PreferencesDialog::autosaveWithinSeconds() const {
  return autosave_->value();
}
void PreferencesDialog::setAutosaveWithinSeconds(int seconds) {
  autosave_->setValue(seconds);
}

ImageExportDialog::ImageExportDialog(QWidget* parent) : QDialog(parent) {
  setObjectName("imageExportDialog");
  setWindowTitle(tr("Export as PNG"));
  auto* layout = new QVBoxLayout(this);
  auto* form = new QFormLayout;
  width_ = new QSpinBox(this);
  width_->setRange(200, 10000);
  width_->setValue(2400);
  width_->setSuffix(tr(" px"));
  height_ = new QSpinBox(this);
  height_->setRange(150, 10000);
  height_->setValue(1600);
  height_->setSuffix(tr(" px"));
  dpi_ = new QSpinBox(this);
  dpi_->setRange(50, 1200);
  dpi_->setValue(200);
  dpi_->setSuffix(tr(" dpi"));
  dpi_->setToolTip(tr("Resolution: sets the size of text and lines in pixels."));
  form->addRow(tr("&Width:"), width_);
  form->addRow(tr("&Height:"), height_);
  form->addRow(tr("&Resolution:"), dpi_);
  layout->addLayout(form);
  addButtons(this, layout);
}

QSize ImageExportDialog::pixels() const {
  return {width_->value(), height_->value()};
}
int ImageExportDialog::dotsPerInch() const {
  return dpi_->value();
}

LossOrderDialog::LossOrderDialog(const QStringList& order, const QStringList& flowOrder, QWidget* parent)
    : QDialog(parent), flowOrder_(flowOrder) {
  setObjectName("lossOrderDialog");
  setWindowTitle(tr("Waterfall Order"));
  auto* layout = new QVBoxLayout(this);
  auto* hint = new QLabel(tr("Drag the losses into the order in which the waterfall adds them to the ideal "
                             "cycle. The steps depend on the order; their sum does not."),
                          this);
  hint->setWordWrap(true);
  layout->addWidget(hint);
  list_ = new QListWidget(this);
  list_->setObjectName("lossOrderList");
  list_->setDragDropMode(QAbstractItemView::InternalMove);
  list_->setDefaultDropAction(Qt::MoveAction);
  list_->setSelectionMode(QAbstractItemView::SingleSelection);
  layout->addWidget(list_, 1);
  fill(order);
  auto* buttons = addButtons(this, layout);
  QPushButton* flow = buttons->addButton(tr("&Flow order"), QDialogButtonBox::ResetRole);
  flow->setObjectName("flowOrderButton");
  flow->setToolTip(tr("The losses in the order the flow meets them"));
  connect(flow, &QPushButton::clicked, this, &LossOrderDialog::resetToFlowOrder);
}

void LossOrderDialog::fill(const QStringList& keys) {
  list_->clear();
  for (const QString& key : keys) {
    auto* item = new QListWidgetItem(lossName(key.toStdString()), list_);
    item->setData(Qt::UserRole, key);
    item->setFlags(Qt::ItemIsEnabled | Qt::ItemIsSelectable | Qt::ItemIsDragEnabled);
  }
}

QStringList LossOrderDialog::order() const {
  QStringList keys;
  for (int i = 0; i < list_->count(); ++i) keys << list_->item(i)->data(Qt::UserRole).toString();
  return keys;
}

void LossOrderDialog::resetToFlowOrder() {
  fill(flowOrder_);
}

}  // namespace cw::gui
