#include "dialogs/dialogs.h"

#include "document/loss_names.h"

#include <QCheckBox>
#include <QComboBox>
#include <QDialogButtonBox>
#include <QDoubleSpinBox>
#include <QFontComboBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
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

ImageExportDialog::ImageExportDialog(QWidget* parent) : ImageExportDialog("png", ExportOptions(), parent) {}

ImageExportDialog::ImageExportDialog(const QString& format, const ExportOptions& options, QWidget* parent)
    : QDialog(parent), format_(format) {
  setObjectName("imageExportDialog");
  const bool png = format == QLatin1String("png");
  setWindowTitle(png                              ? tr("Export as PNG")
                 : format == QLatin1String("svg") ? tr("Export as SVG")
                                                  : tr("Export as PDF"));
  auto* layout = new QVBoxLayout(this);
  auto* form = new QFormLayout;

  background_ = new QComboBox(this);
  background_->setObjectName("exportBackground");
  background_->addItem(tr("White"));
  background_->addItem(tr("Transparent"));
  background_->setCurrentIndex(options.transparent ? 1 : 0);
  form->addRow(tr("&Background:"), background_);
  highlight_ = new QCheckBox(tr("Show the selected component"), this);
  highlight_->setObjectName("exportSelection");
  highlight_->setChecked(options.selectionHighlight);
  form->addRow(tr("&Selection:"), highlight_);
  title_ = new QLineEdit(options.title, this);
  title_->setObjectName("exportTitle");
  title_->setPlaceholderText(tr("The chart's own title"));
  form->addRow(tr("&Title:"), title_);
  subtitle_ = new QLineEdit(options.subtitle, this);
  subtitle_->setObjectName("exportSubtitle");
  subtitle_->setPlaceholderText(tr("No subtitle"));
  form->addRow(tr("Subt&itle:"), subtitle_);
  legend_ = new QComboBox(this);
  legend_->setObjectName("exportLegend");
  legend_->addItems(
      {tr("As on screen"), tr("Inside the plot"), tr("Outside, right"), tr("Below"), tr("None")});
  legend_->setCurrentIndex(static_cast<int>(options.legend));
  form->addRow(tr("&Legend:"), legend_);
  fontFamily_ = new QFontComboBox(this);
  fontFamily_->setObjectName("exportFontFamily");
  if (!options.fontFamily.isEmpty()) fontFamily_->setCurrentFont(QFont(options.fontFamily));
  fontSize_ = new QDoubleSpinBox(this);
  fontSize_->setObjectName("exportFontSize");
  fontSize_->setRange(0.0, 72.0);
  fontSize_->setDecimals(1);
  fontSize_->setSuffix(tr(" pt"));
  fontSize_->setSpecialValueText(tr("As on screen"));
  fontSize_->setValue(options.fontPointSize);
  auto* fontRow = new QHBoxLayout;
  fontRow->addWidget(fontFamily_, 1);
  fontRow->addWidget(fontSize_);
  form->addRow(tr("&Font:"), fontRow);
  lineWidths_ = new QDoubleSpinBox(this);
  lineWidths_->setObjectName("exportLineWidths");
  lineWidths_->setRange(0.25, 5.0);
  lineWidths_->setSingleStep(0.25);
  lineWidths_->setPrefix(tr("× "));
  lineWidths_->setValue(options.lineWidthScale);
  lineWidths_->setToolTip(tr("The lines' widths as on screen times this factor"));
  form->addRow(tr("Li&ne widths:"), lineWidths_);

  if (png) {
    width_ = new QSpinBox(this);
    width_->setRange(200, 10000);
    width_->setValue(options.pixels.width());
    width_->setSuffix(tr(" px"));
    height_ = new QSpinBox(this);
    height_->setRange(150, 10000);
    height_->setValue(options.pixels.height());
    height_->setSuffix(tr(" px"));
    dpi_ = new QSpinBox(this);
    dpi_->setRange(50, 1200);
    dpi_->setValue(options.dotsPerInch);
    dpi_->setSuffix(tr(" dpi"));
    dpi_->setToolTip(tr("Resolution: sets the size of text and lines in pixels."));
    form->addRow(tr("&Width:"), width_);
    form->addRow(tr("&Height:"), height_);
    form->addRow(tr("&Resolution:"), dpi_);
  } else {
    paperUnit_ = new QComboBox(this);
    paperUnit_->setObjectName("exportPaperUnit");
    paperUnit_->addItem(tr("mm"));
    paperUnit_->addItem(tr("in"));
    paperWidth_ = new QDoubleSpinBox(this);
    paperWidth_->setObjectName("exportPaperWidth");
    paperHeight_ = new QDoubleSpinBox(this);
    paperHeight_->setObjectName("exportPaperHeight");
    shownUnit_ = options.paperUnit;
    paperUnit_->setCurrentIndex(shownUnit_ == PaperUnit::Inches ? 1 : 0);
    setPaperUnit(shownUnit_);
    paperWidth_->setValue(options.paperSize.width());
    paperHeight_->setValue(options.paperSize.height());
    connect(paperUnit_, &QComboBox::currentIndexChanged, this,
            [this](int index) { setPaperUnit(index == 1 ? PaperUnit::Inches : PaperUnit::Millimetres); });
    form->addRow(tr("&Width:"), paperWidth_);
    form->addRow(tr("&Height:"), paperHeight_);
    form->addRow(tr("&Unit:"), paperUnit_);
  }
  layout->addLayout(form);
  addButtons(this, layout);
}

void ImageExportDialog::setPaperUnit(PaperUnit unit) {
  // The size stays the same on paper: the numbers convert with the unit.
  const double factor = unit == shownUnit_ ? 1.0 : unit == PaperUnit::Inches ? 1.0 / 25.4 : 25.4;
  const double w = paperWidth_->value() * factor, h = paperHeight_->value() * factor;
  const bool inches = unit == PaperUnit::Inches;
  for (QDoubleSpinBox* box : {paperWidth_, paperHeight_}) {
    box->setDecimals(inches ? 2 : 1);
    box->setRange(inches ? 0.5 : 10.0, inches ? 40.0 : 1000.0);
    box->setSuffix(inches ? tr(" in") : tr(" mm"));
  }
  paperWidth_->setValue(w);
  paperHeight_->setValue(h);
  shownUnit_ = unit;
}

ExportOptions ImageExportDialog::options() const {
  ExportOptions o;
  o.transparent = background_->currentIndex() == 1;
  o.selectionHighlight = highlight_->isChecked();
  o.title = title_->text().trimmed();
  o.subtitle = subtitle_->text().trimmed();
  o.legend = static_cast<LegendPlacement>(legend_->currentIndex());
  o.fontFamily = fontFamily_->currentFont().family();
  o.fontPointSize = fontSize_->value();
  o.lineWidthScale = lineWidths_->value();
  if (width_) {
    o.pixels = pixels();
    o.dotsPerInch = dotsPerInch();
  } else {
    o.paperUnit = shownUnit_;
    o.paperSize = QSizeF(paperWidth_->value(), paperHeight_->value());
  }
  return o;
}

QSize ImageExportDialog::pixels() const {
  return width_ ? QSize(width_->value(), height_->value()) : ExportOptions().pixels;
}
int ImageExportDialog::dotsPerInch() const {
  return dpi_ ? dpi_->value() : ExportOptions().dotsPerInch;
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
