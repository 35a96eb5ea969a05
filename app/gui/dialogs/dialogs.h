#pragma once
// The small dialogs of the main window: preferences, the PNG export size and the order of the
// loss audit's waterfall.

#include "document/settings.h"

#include <QDialog>
#include <QSize>
#include <QStringList>

class QComboBox;
class QListWidget;
class QSpinBox;

namespace cw::gui {

class PreferencesDialog : public QDialog {
  Q_OBJECT

 public:
  explicit PreferencesDialog(QWidget* parent = nullptr);

  UnitSystem unitSystem() const;
  void setUnitSystem(UnitSystem system);
  ChartLayout chartLayout() const;
  void setChartLayout(ChartLayout layout);
  /// The autosave's limit after the first unsaved edit [s].
  int autosaveWithinSeconds() const;
  void setAutosaveWithinSeconds(int seconds);

 private:
  QComboBox* units_ = nullptr;
  QComboBox* layout_ = nullptr;
  QSpinBox* autosave_ = nullptr;
};

class ImageExportDialog : public QDialog {
  Q_OBJECT

 public:
  explicit ImageExportDialog(QWidget* parent = nullptr);

  QSize pixels() const;
  int dotsPerInch() const;

 private:
  QSpinBox* width_ = nullptr;
  QSpinBox* height_ = nullptr;
  QSpinBox* dpi_ = nullptr;
};

/// Reorders the waterfall's losses by drag and drop (keys of core/analysis/loss_catalogue.h,
/// shown by their names); "Flow order" puts them back in the given flow order.
class LossOrderDialog : public QDialog {
  Q_OBJECT

 public:
  LossOrderDialog(const QStringList& order, const QStringList& flowOrder, QWidget* parent = nullptr);

  /// The keys in the order shown.
  QStringList order() const;
  QListWidget* list() const { return list_; }
  void resetToFlowOrder();

 private:
  void fill(const QStringList& keys);

  QListWidget* list_ = nullptr;
  QStringList flowOrder_;
};

}  // namespace cw::gui
