#include "audit/audit_table_model.h"

#include "document/loss_names.h"

#include <QApplication>
#include <QLocale>
#include <QPalette>

namespace cw::gui {

AuditTableModel::AuditTableModel(DisplayUnits& units, QObject* parent)
    : QAbstractTableModel(parent), units_(units) {
  connect(&units_, &DisplayUnits::changed, this, [this] {
    beginResetModel();
    endResetModel();
  });
}

void AuditTableModel::setAudit(std::shared_ptr<const analysis::LossAudit> audit, bool stale) {
  beginResetModel();
  audit_ = std::move(audit);
  stale_ = stale;
  endResetModel();
}

void AuditTableModel::setStale(bool stale) {
  if (stale == stale_) return;
  stale_ = stale;
  if (rowCount() > 0) emit dataChanged(index(0, 0), index(rowCount() - 1, columnCount() - 1));
}

void AuditTableModel::setView(AuditView view) {
  if (view == view_) return;
  beginResetModel();
  view_ = view;
  endResetModel();
}

int AuditTableModel::rowCount(const QModelIndex& parent) const {
  if (parent.isValid() || !audit_) return 0;
  switch (view_) {
    case AuditView::OneAtATime:
      return static_cast<int>(audit_->oneAtATime.size());
    case AuditView::Waterfall:
      return static_cast<int>(audit_->waterfall.size()) + 3;  // ideal, steps, sum, actual
    case AuditView::Sensitivities:
      return static_cast<int>(audit_->sensitivities.size());
    case AuditView::Exergy:
      return static_cast<int>(audit_->exergy.components.size()) + 3;  // components, total, fuel, closure
  }
  return 0;
}

int AuditTableModel::columnCount(const QModelIndex& parent) const {
  if (parent.isValid()) return 0;
  switch (view_) {
    case AuditView::OneAtATime:
      return 3;
    case AuditView::Waterfall:
      return 4;
    case AuditView::Sensitivities:
      return 5;
    case AuditView::Exergy:
      return 3;
  }
  return 0;
}

QVariant AuditTableModel::headerData(int section, Qt::Orientation orientation, int role) const {
  // The tooltip the whole header, where a narrow dock elides it.
  if (orientation != Qt::Horizontal || (role != Qt::DisplayRole && role != Qt::ToolTipRole)) return {};
  const QString fs = units_.symbol(Quantity::SpecificThrust), tsfc = units_.symbol(Quantity::Tsfc);
  switch (view_) {
    case AuditView::OneAtATime: {
      const QString h[] = {tr("Loss removed alone"), tr("ΔF_s [%1]").arg(fs), tr("ΔTSFC [%1]").arg(tsfc)};
      return h[section];
    }
    case AuditView::Waterfall: {
      const QString h[] = {tr("Step"), tr("Loss added"), tr("F_s step [%1]").arg(fs),
                           tr("TSFC step [%1]").arg(tsfc)};
      return h[section];
    }
    case AuditView::Sensitivities: {
      const QString h[] = {tr("Loss"), tr("Per"), tr("F_s per unit [%1]").arg(fs),
                           tr("TSFC per unit [%1]").arg(tsfc), tr("Difference")};
      return h[section];
    }
    case AuditView::Exergy: {
      const QString h[] = {tr("Component"), tr("Exergy destroyed [%1]").arg(units_.symbol(Quantity::Power)),
                           tr("Share of fuel exergy [%]")};
      return h[section];
    }
  }
  return {};
}

QString AuditTableModel::text(int row, int column) const {
  const analysis::LossAudit& a = *audit_;
  auto fs = [&](double si) { return formatNumber(units_.toDisplay(si, Quantity::SpecificThrust), 4); };
  auto tsfc = [&](double si) { return formatNumber(units_.toDisplay(si, Quantity::Tsfc), 4); };
  auto power = [&](double si) { return formatNumber(units_.toDisplay(si, Quantity::Power), 4); };
  auto share = [&](double watts) { return formatNumber(100.0 * watts / a.exergy.fuelExergy, 3); };
  const auto r = static_cast<size_t>(row);
  switch (view_) {
    case AuditView::OneAtATime: {
      const auto& d = a.oneAtATime[r];
      return column == 0 ? lossName(d.loss) : column == 1 ? fs(d.deltaSpecificThrust) : tsfc(d.deltaTsfc);
    }
    case AuditView::Waterfall: {
      const int steps = static_cast<int>(a.waterfall.size());
      if (row == 0 || row == steps + 2) {
        const auto& f = row == 0 ? a.ideal : a.actual;
        const QString name = row == 0 ? tr("Ideal twin") : tr("With losses");
        const QString columns[] = {QString(), name, fs(f.specificThrust),
                                   tsfc(f.thrustSpecificFuelConsumption)};
        return columns[column];
      }
      if (row == steps + 1) {
        const QString columns[] = {
            QString(), tr("Sum of the steps (with losses − ideal)"),
            fs(a.actual.specificThrust - a.ideal.specificThrust),
            tsfc(a.actual.thrustSpecificFuelConsumption - a.ideal.thrustSpecificFuelConsumption)};
        return columns[column];
      }
      const auto& d = a.waterfall[r - 1];
      const QString columns[] = {QString::number(row), lossName(d.loss), fs(d.deltaSpecificThrust),
                                 tsfc(d.deltaTsfc)};
      return columns[column];
    }
    case AuditView::Sensitivities: {
      const auto& s = a.sensitivities[r];
      const QString scheme = s.scheme == analysis::DifferenceScheme::Central   ? tr("central")
                             : s.scheme == analysis::DifferenceScheme::Forward ? tr("forward")
                                                                               : tr("backward");
      const QString columns[] = {lossName(s.loss), sensitivityUnitText(s.unit), fs(s.specificThrustPerUnit),
                                 tsfc(s.tsfcPerUnit), scheme};
      return columns[column];
    }
    case AuditView::Exergy: {
      const auto& e = a.exergy;
      const int n = static_cast<int>(e.components.size());
      if (row < n) {
        const auto& c = e.components[r];
        const QString columns[] = {exergyComponentName(c.component), power(c.exergyDestroyed),
                                   share(c.exergyDestroyed)};
        return columns[column];
      }
      if (row == n) {
        const QString columns[] = {tr("All components"), power(e.destroyed), share(e.destroyed)};
        return columns[column];
      }
      if (row == n + 1) {
        const QString columns[] = {tr("Fuel exergy"), power(e.fuelExergy), share(e.fuelExergy)};
        return columns[column];
      }
      const QString columns[] = {tr("Closure (residual / fuel exergy)"), power(e.residual),
                                 QLocale().toString(100.0 * e.closure, 'g', 2)};
      return columns[column];
    }
  }
  return {};
}

QVariant AuditTableModel::data(const QModelIndex& index, int role) const {
  if (!index.isValid() || !audit_) return {};
  switch (role) {
    case Qt::DisplayRole:
      return text(index.row(), index.column());
    case Qt::ToolTipRole:  // the whole name where a narrow dock elides it
      return index.column() == nameColumn() ? QVariant(text(index.row(), index.column())) : QVariant();
    case Qt::TextAlignmentRole: {
      const bool numeric =
          (view_ == AuditView::Sensitivities && index.column() >= 2 && index.column() <= 3) ||
          (view_ != AuditView::Sensitivities && index.column() >= (view_ == AuditView::Waterfall ? 2 : 1));
      return QVariant::fromValue(numeric ? Qt::AlignRight | Qt::AlignVCenter
                                         : Qt::AlignLeft | Qt::AlignVCenter);
    }
    case Qt::ForegroundRole:
      if (stale_) return QApplication::palette().brush(QPalette::Disabled, QPalette::Text);
      return {};
    default:
      return {};
  }
}

}  // namespace cw::gui
