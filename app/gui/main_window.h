#pragma once
// The main window of Cyclewright: menu bar, central explorer and status bar.

#include <QMainWindow>
#include <QString>

class QwtPlot;

namespace cw::gui {

class MainWindow : public QMainWindow {
  Q_OBJECT

public:
  explicit MainWindow(QWidget* parent = nullptr);

  /// Opens a case file (a path or a Qt resource such as ":/demo/demo-turbojet.json").
  /// Returns false and shows why in the status bar when it cannot be read.
  bool openCase(const QString& path);

  /// The file name of the open case, empty when none.
  QString casePath() const { return casePath_; }

  /// The caution text shown in the About box (translated).
  static QString cautionText();

public slots:
  void showAbout();

private:
  void createMenus();
  QwtPlot* createTemperatureEntropyChart();

  QString casePath_;
  QwtPlot* temperatureEntropyChart_ = nullptr;
};

}  // namespace cw::gui
