#include "trade_study/study_table_model.h"

#include "document/caution.h"
#include "trade_study/study_inputs.h"
#include "trade_study/study_names.h"

#include "common/error.h"
#include "study/study_export.h"

#include <QApplication>
#include <QPalette>

namespace cw::gui {

namespace {

const char* const kSpecificThrust = "specific_thrust_N_s_per_kg";
const char* const kTsfc = "tsfc_g_per_kN_s";

}  // namespace

StudyTableModel::StudyTableModel(DisplayUnits& units, QObject* parent)
    : QAbstractTableModel(parent), units_(units), all_(study::everyStudyColumn()) {
  connect(&units_, &DisplayUnits::changed, this, [this] {
    beginResetModel();
    endResetModel();
  });
  rebuildColumns();
}

void StudyTableModel::rebuildColumns() {
  columns_.clear();
  const std::size_t inputs = study_ ? std::min<std::size_t>(study_->axes.size(), 2) : 1;
  for (std::size_t k = 0; k < inputs; ++k) columns_.push_back({Kind::Input, static_cast<int>(k), nullptr});
  columns_.push_back({Kind::Status, 0, nullptr});
  for (const auto& c : all_)
    if (c.name == kSpecificThrust || c.name == kTsfc) columns_.push_back({Kind::Figure, 0, &c});
  if (extra_ != kSpecificThrust && extra_ != kTsfc)
    for (const auto& c : all_)
      if (c.name == extra_) columns_.push_back({Kind::Figure, 0, &c});
  columns_.push_back({Kind::Reason, 0, nullptr});
}

void StudyTableModel::setStudy(std::shared_ptr<const study::TradeStudy> study,
                               std::array<StudyAxisName, 2> axes, bool stale) {
  beginResetModel();
  study_ = std::move(study);
  axes_ = std::move(axes);
  stale_ = stale;
  rebuildColumns();
  endResetModel();
}

void StudyTableModel::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  if (rowCount() > 0) emit dataChanged(index(0, 0), index(rowCount() - 1, columnCount() - 1));
}

void StudyTableModel::setExtraColumn(const std::string& name) {
  if (name == extra_) return;
  beginResetModel();
  extra_ = name;
  rebuildColumns();
  endResetModel();
}

int StudyTableModel::rowCount(const QModelIndex& parent) const {
  return parent.isValid() || !study_ ? 0 : static_cast<int>(study_->points.size());
}

int StudyTableModel::columnCount(const QModelIndex& parent) const {
  return parent.isValid() ? 0 : static_cast<int>(columns_.size());
}

QVariant StudyTableModel::headerData(int section, Qt::Orientation orientation, int role) const {
  if (orientation != Qt::Horizontal || section < 0 || section >= static_cast<int>(columns_.size())) return {};
  const Column& c = columns_[static_cast<std::size_t>(section)];
  if (role == Qt::ToolTipRole && c.kind == Kind::Input)
    return units_.withUnit(axes_[static_cast<std::size_t>(c.axis)].name,
                           axes_[static_cast<std::size_t>(c.axis)].quantity);
  if (role != Qt::DisplayRole) return {};
  switch (c.kind) {
    case Kind::Input: {
      // The short name where it tells the inputs apart (the full one in the tooltip).
      const StudyAxisName& a = axes_[static_cast<std::size_t>(c.axis)];
      const bool distinct = axes_[0].shortName != axes_[1].shortName;
      return units_.withUnit(distinct && !a.shortName.isEmpty() ? a.shortName : a.name, a.quantity);
    }
    case Kind::Status:
      return tr("Status");
    case Kind::Figure:
      return units_.withUnit(studyColumnLabel(*c.figure), displayQuantity(c.figure->quantity));
    case Kind::Reason:
      return tr("Why there is no cycle");
  }
  return {};
}

QVariant StudyTableModel::siValue(int row, const Column& c) const {
  const study::StudyPoint& p = study_->points[static_cast<std::size_t>(row)];
  if (c.kind == Kind::Input) return p.inputs[static_cast<std::size_t>(c.axis)];
  if (c.kind == Kind::Figure)
    if (const auto v = c.figure->value(p)) return *v;
  return {};
}

QVariant StudyTableModel::data(const QModelIndex& index, int role) const {
  if (!study_ || !index.isValid() || index.row() >= rowCount() || index.column() >= columnCount()) return {};
  const Column& c = columns_[static_cast<std::size_t>(index.column())];
  const study::StudyPoint& p = study_->points[static_cast<std::size_t>(index.row())];
  const Quantity q = c.kind == Kind::Input    ? axes_[static_cast<std::size_t>(c.axis)].quantity
                     : c.kind == Kind::Figure ? displayQuantity(c.figure->quantity)
                                              : Quantity::Dimensionless;
  switch (role) {
    case ValueRole:
      return siValue(index.row(), c);
    case Qt::DisplayRole: {
      if (c.kind == Kind::Status) return pointStatusName(p.status);
      if (c.kind == Kind::Reason) return QString::fromStdString(p.reason);
      const QVariant v = siValue(index.row(), c);
      return v.isValid() ? units_.displayText(v.toDouble(), q) : QString();
    }
    case Qt::ToolTipRole:
      if (!p.reason.empty()) return QString::fromStdString(p.reason);
      return {};
    case Qt::TextAlignmentRole:
      return c.kind == Kind::Input || c.kind == Kind::Figure ? QVariant(Qt::AlignRight | Qt::AlignVCenter)
                                                             : QVariant(Qt::AlignLeft | Qt::AlignVCenter);
    case Qt::ForegroundRole:
      if (stale_ || !p.solved()) return QApplication::palette().brush(QPalette::Disabled, QPalette::Text);
      return {};
    default:
      return {};
  }
}

QString StudyTableModel::toTabSeparated() const {
  QString text = QStringLiteral("# ") + cautionText() + QLatin1Char('\n');
  if (study_)
    text += QStringLiteral("# ") + QString::fromStdString(study::describeStudy(*study_)) + QLatin1Char('\n');
  QStringList header;
  for (int c = 0; c < columnCount(); ++c) header << headerData(c, Qt::Horizontal).toString();
  text += header.join(QLatin1Char('\t')) + QLatin1Char('\n');
  for (int r = 0; r < rowCount(); ++r) {
    QStringList cells;
    for (int c = 0; c < columnCount(); ++c) {
      const Column& column = columns_[static_cast<std::size_t>(c)];
      const QVariant v = data(index(r, c), ValueRole);
      if (v.isValid()) {
        const Quantity q = column.kind == Kind::Input ? axes_[static_cast<std::size_t>(column.axis)].quantity
                                                      : displayQuantity(column.figure->quantity);
        cells << QString::fromStdString(cw::formatNumber(units_.toDisplay(v.toDouble(), q)));
      } else {
        cells << data(index(r, c)).toString().replace(QLatin1Char('\t'), QLatin1Char(' '));
      }
    }
    text += cells.join(QLatin1Char('\t')) + QLatin1Char('\n');
  }
  return text;
}

}  // namespace cw::gui
