#pragma once
// The small dialogs of the main window: preferences, a chart's export options and the order of
// the loss audit's waterfall.

#include "document/settings.h"

#include <QDialog>
#include <QSize>
#include <QStringList>

class QCheckBox;
class QComboBox;
class QDoubleSpinBox;
class QFontComboBox;
class QLineEdit;
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

/// A chart's export options: background, selection, title and subtitle, legend, font, lines,
/// and the size (PNG: pixels and resolution; SVG and PDF: width and height in mm or inches).
class ImageExportDialog : public QDialog {
  Q_OBJECT

 public:
  /// format: "png", "svg" or "pdf"; the fields start from `options`.
  ImageExportDialog(const QString& format, const ExportOptions& options, QWidget* parent = nullptr);
  /// The PNG dialog with the default options.
  explicit ImageExportDialog(QWidget* parent = nullptr);

  ExportOptions options() const;
  QSize pixels() const;
  int dotsPerInch() const;

 private:
  void setPaperUnit(PaperUnit unit);

  QString format_;
  QComboBox* background_ = nullptr;
  QCheckBox* highlight_ = nullptr;
  QLineEdit* title_ = nullptr;
  QLineEdit* subtitle_ = nullptr;
  QComboBox* legend_ = nullptr;
  QFontComboBox* fontFamily_ = nullptr;
  QDoubleSpinBox* fontSize_ = nullptr;
  QDoubleSpinBox* lineWidths_ = nullptr;
  QSpinBox* width_ = nullptr;
  QSpinBox* height_ = nullptr;
  QSpinBox* dpi_ = nullptr;
  QDoubleSpinBox* paperWidth_ = nullptr;
  QDoubleSpinBox* paperHeight_ = nullptr;
  QComboBox* paperUnit_ = nullptr;
  PaperUnit shownUnit_ = PaperUnit::Millimetres;
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
