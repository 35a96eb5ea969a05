#include "settings.h"

#include <algorithm>

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

int AppSettings::autosaveSeconds() const {
  return std::clamp(settings_.value("files/autosave_seconds", 30).toInt(), 5, 3600);
}
void AppSettings::setAutosaveSeconds(int seconds) {
  settings_.setValue("files/autosave_seconds", std::clamp(seconds, 5, 3600));
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
