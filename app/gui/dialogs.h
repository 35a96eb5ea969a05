#pragma once
// The small dialogs of the main window: preferences and the PNG export size.

#include "settings.h"

#include <QDialog>
#include <QSize>

class QComboBox;
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
  int autosaveSeconds() const;
  void setAutosaveSeconds(int seconds);

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

}  // namespace cw::gui
