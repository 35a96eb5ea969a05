#include "startup/scratch_settings.h"

#include "common/error.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QSettings>

namespace cw::gui {

ScratchSettings::ScratchSettings() {
  if (!dir_.isValid()) throw InvalidInput("settings", "cannot make a temporary folder for a run's settings");
  const QString user = QSettings().fileName();
  for (auto format : {QSettings::NativeFormat, QSettings::IniFormat})
    QSettings::setPath(format, QSettings::UserScope, dir_.path());
  const QString scratch = QSettings().fileName();
  QDir().mkpath(QFileInfo(scratch).absolutePath());
  // The user's settings as they are (units, layout, study set-up), to read; none is fine too.
  if (QFile::exists(user)) QFile::copy(user, scratch);
  QFile::setPermissions(scratch, QFile::ReadOwner | QFile::WriteOwner);
  active_ = true;
}

}  // namespace cw::gui
