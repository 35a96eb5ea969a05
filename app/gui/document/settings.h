#pragma once
// One typed wrapper over QSettings: every key the application stores, with its default.

#include "document/units.h"

#include "document/export_options.h"

#include <QByteArray>
#include <QSettings>
#include <QStringList>

#include <optional>
#include <utility>

namespace cw::gui {

enum class ChartLayout { SideBySide, Tabbed };

/// The trade-study panel's choices kept between sessions (the ranges follow the case, so they are not kept).
struct StudySetup {
  QString firstInput = QStringLiteral("compressor.pressure_ratio");
  int firstCount = 21;
  bool carpet = true;
  QString secondInput = QStringLiteral("burner.exit_temperature_K");
  int secondCount = 6;
  bool audit = false;
  QString compare = QStringLiteral("none");  ///< "none", "ideal" or "changed"
  QString changedInput;                      ///< the input set differently; empty for the default
  QString plot;                              ///< a study column's name; empty for the carpet
  bool operator==(const StudySetup&) const = default;
};

class AppSettings {
 public:
  AppSettings() = default;

  QByteArray windowGeometry() const;
  void setWindowGeometry(const QByteArray& geometry);
  QByteArray windowState() const;
  void setWindowState(const QByteArray& state);

  UnitSystem unitSystem() const;
  void setUnitSystem(UnitSystem system);

  ChartLayout chartLayout() const;
  void setChartLayout(ChartLayout layout);

  /// The export options last used for a chart ("temperature-entropy", "loss-audit", ...).
  ExportOptions exportOptions(const QString& chart) const;
  void setExportOptions(const QString& chart, const ExportOptions& options);

  bool pressureVolumeLogAxes() const;
  void setPressureVolumeLogAxes(bool on);

  /// The loss audit's waterfall order (loss keys); empty for the flow order.
  QStringList auditOrder() const;
  void setAuditOrder(const QStringList& keys);
  /// The loss audit's "Baseline beside": the baseline's waterfall beside the current one
  /// (shown once there is a baseline), default off.
  bool auditBaselineBeside() const;
  void setAuditBaselineBeside(bool on);

  /// The trade-study panel's choices.
  StudySetup studySetup() const;
  void setStudySetup(const StudySetup& setup);
  /// The range the user last typed for a study input (its --set path), SI; none when never typed.
  std::optional<std::pair<double, double>> studyRange(const QString& path) const;
  void setStudyRange(const QString& path, double start, double stop);

  /// The autosave's limit: unsaved edits are autosaved 2 s after the last edit, and at the latest
  /// this many seconds after the first, in [kMinAutosaveWithin, kMaxAutosaveWithin], default 5 [s].
  int autosaveWithinSeconds() const;
  void setAutosaveWithinSeconds(int seconds);
  static constexpr int kMinAutosaveWithin = 2, kMaxAutosaveWithin = 600, kDefaultAutosaveWithin = 5;

  /// Most recent first, at most kMaxRecentFiles.
  QStringList recentFiles() const;
  void setRecentFiles(const QStringList& files);
  void addRecentFile(const QString& file);
  static constexpr int kMaxRecentFiles = 8;

 private:
  mutable QSettings settings_;
};

}  // namespace cw::gui
