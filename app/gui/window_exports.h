#pragma once
// The main window's exports and copies: the station table (CSV), the results (JSON), the loss
// audit (CSV), the trade study (CSV, JSON), every chart (PNG, SVG, PDF) and the clipboard.

#include <QObject>
#include <QString>

class QwtPlot;

namespace cw::gui {

class CycleChart;
class MainWindow;

class WindowExports : public QObject {
  Q_OBJECT

 public:
  explicit WindowExports(MainWindow& window);

  // Without dialogs (tests and the menu actions).
  bool stationCsv(const QString& path);
  bool resultJson(const QString& path);
  bool auditCsv(const QString& path);
  bool studyCsv(const QString& path);
  bool studyJson(const QString& path);

  // With a file dialog.
  /// format: "png" (asks for the size first), "svg" or "pdf".
  void chart(QwtPlot* chart, const QString& baseName, const QString& format);
  void stationTable();
  void results();
  void auditTable();
  /// csv true: CSV, else JSON.
  void study(bool csv);

  void copyChart(CycleChart* chart);
  void copyStationTable();
  /// The performance table as tab-separated text (with the baseline's columns when set).
  void copyPerformanceTable();
  void copyStudyTable();

 private:
  QString askForFile(const QString& title, const QString& fileName, const QString& filter);
  void showStatus(const QString& message);

  MainWindow& window_;
};

}  // namespace cw::gui
