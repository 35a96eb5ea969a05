#include "document/settings.h"

#include <algorithm>
#include <cmath>

namespace cw::gui {

QByteArray AppSettings::windowGeometry() const {
  return settings_.value("window/geometry").toByteArray();
}
void AppSettings::setWindowGeometry(const QByteArray& geometry) {
  settings_.setValue("window/geometry", geometry);
}
QByteArray AppSettings::windowState() const {
  return settings_.value("window/state").toByteArray();
}
void AppSettings::setWindowState(const QByteArray& state) {
  settings_.setValue("window/state", state);
}

UnitSystem AppSettings::unitSystem() const {
  return settings_.value("units/system", "si").toString() == QLatin1String("us") ? UnitSystem::USCustomary
                                                                                 : UnitSystem::SI;
}
void AppSettings::setUnitSystem(UnitSystem system) {
  settings_.setValue("units/system", system == UnitSystem::USCustomary ? "us" : "si");
}

ChartLayout AppSettings::chartLayout() const {
  return settings_.value("charts/layout", "side-by-side").toString() == QLatin1String("tabbed")
             ? ChartLayout::Tabbed
             : ChartLayout::SideBySide;
}
void AppSettings::setChartLayout(ChartLayout layout) {
  settings_.setValue("charts/layout", layout == ChartLayout::Tabbed ? "tabbed" : "side-by-side");
}

ExportOptions AppSettings::exportOptions(const QString& chart) const {
  return ExportOptions::fromMap(settings_.value("export/" + chart).toMap());
}
void AppSettings::setExportOptions(const QString& chart, const ExportOptions& options) {
  settings_.setValue("export/" + chart, options.toMap());
}

bool AppSettings::pressureVolumeLogAxes() const {
  return settings_.value("charts/pv_log_axes", true).toBool();
}
void AppSettings::setPressureVolumeLogAxes(bool on) {
  settings_.setValue("charts/pv_log_axes", on);
}

QStringList AppSettings::auditOrder() const {
  return settings_.value("audit/waterfall_order").toStringList();
}
void AppSettings::setAuditOrder(const QStringList& keys) {
  settings_.setValue("audit/waterfall_order", keys);
}

bool AppSettings::auditBaselineBeside() const {
  return settings_.value("audit/baseline_beside", false).toBool();
}
void AppSettings::setAuditBaselineBeside(bool on) {
  settings_.setValue("audit/baseline_beside", on);
}

StudySetup AppSettings::studySetup() const {
  StudySetup s;
  s.firstInput = settings_.value("study/first_input", s.firstInput).toString();
  s.firstCount = std::clamp(settings_.value("study/first_count", s.firstCount).toInt(), 1, 1000);
  s.carpet = settings_.value("study/carpet", s.carpet).toBool();
  s.secondInput = settings_.value("study/second_input", s.secondInput).toString();
  s.secondCount = std::clamp(settings_.value("study/second_count", s.secondCount).toInt(), 1, 1000);
  s.audit = settings_.value("study/audit", s.audit).toBool();
  s.compare = settings_.value("study/compare", s.compare).toString();
  s.changedInput = settings_.value("study/changed_input", s.changedInput).toString();
  s.plot = settings_.value("study/plot", s.plot).toString();
  return s;
}
void AppSettings::setStudySetup(const StudySetup& s) {
  settings_.setValue("study/first_input", s.firstInput);
  settings_.setValue("study/first_count", s.firstCount);
  settings_.setValue("study/carpet", s.carpet);
  settings_.setValue("study/second_input", s.secondInput);
  settings_.setValue("study/second_count", s.secondCount);
  settings_.setValue("study/audit", s.audit);
  settings_.setValue("study/compare", s.compare);
  settings_.setValue("study/changed_input", s.changedInput);
  settings_.setValue("study/plot", s.plot);
}

std::optional<std::pair<double, double>> AppSettings::studyRange(const QString& path) const {
  const QStringList parts = settings_.value("study/ranges/" + path).toString().split(QLatin1Char(':'));
  if (parts.size() != 2) return std::nullopt;
  bool okStart = false, okStop = false;
  const double start = parts[0].toDouble(&okStart), stop = parts[1].toDouble(&okStop);
  if (!okStart || !okStop || !std::isfinite(start) || !std::isfinite(stop)) return std::nullopt;
  return std::pair{start, stop};
}
void AppSettings::setStudyRange(const QString& path, double start, double stop) {
  // Round-trip text (17 significant digits), independent of the locale.
  settings_.setValue("study/ranges/" + path,
                     QString::number(start, 'g', 17) + QLatin1Char(':') + QString::number(stop, 'g', 17));
}

int AppSettings::autosaveWithinSeconds() const {
  return std::clamp(settings_.value("files/autosave_within_seconds", kDefaultAutosaveWithin).toInt(),
                    kMinAutosaveWithin, kMaxAutosaveWithin);
}
void AppSettings::setAutosaveWithinSeconds(int seconds) {
  settings_.setValue("files/autosave_within_seconds",
                     std::clamp(seconds, kMinAutosaveWithin, kMaxAutosaveWithin));
}

QStringList AppSettings::recentFiles() const {
  QStringList files = settings_.value("files/recent").toStringList();
  while (files.size() > kMaxRecentFiles) files.removeLast();
  return files;
}
void AppSettings::setRecentFiles(const QStringList& files) {
  settings_.setValue("files/recent", files);
}
void AppSettings::addRecentFile(const QString& file) {
  QStringList files = recentFiles();
  files.removeAll(file);
  files.prepend(file);
  while (files.size() > kMaxRecentFiles) files.removeLast();
  setRecentFiles(files);
}

}  // namespace cw::gui
