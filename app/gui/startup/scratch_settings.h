#pragma once
// Settings for a run that must not change the user's: a --screenshot (or --export-figures) run
// reads a copy of the user's settings in a temporary folder and writes only there, so that its
// --study-* options, the case it opens (recent files) and its window state never reach the
// user's own settings.

#include <QTemporaryDir>

namespace cw::gui {

class ScratchSettings {
 public:
  /// Copies the user's settings file (of the application named by nameApplication()) into a
  /// temporary folder and points QSettings there. Construct before the first QSettings is used.
  ScratchSettings();
  ScratchSettings(const ScratchSettings&) = delete;
  ScratchSettings& operator=(const ScratchSettings&) = delete;

  /// Whether the temporary folder could be made (else the settings stay where they were).
  bool isActive() const { return active_; }

 private:
  QTemporaryDir dir_;
  bool active_ = false;
};

}  // namespace cw::gui
