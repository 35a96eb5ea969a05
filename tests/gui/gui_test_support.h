#pragma once
// Shared set-up of the GUI suites: the C locale for typed numbers, and settings, autosaves and
// recent files kept in Qt's test locations under a temporary home of the suite's own (removed
// when it ends) and an application name of the suite's own.
//
// Child processes (the application run by QProcess) get a home of their own, IsolatedHome:
// every launch of CYCLEWRIGHT_GUI_PATH or a test helper goes through IsolatedHome::start, so a
// child never writes the user's real settings, data, cache or state.

#include <QApplication>
#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QLineEdit>
#include <QLocale>
#include <QProcess>
#include <QProcessEnvironment>
#include <QStandardPaths>
#include <QString>
#include <QStringList>
#include <QTemporaryDir>
#include <QTest>
#include <QTranslator>

#include <string_view>

#include "document/case_auditor.h"
#include "engine/case_inputs.h"
#include "io/case_file.h"
#include "startup/application.h"

// The application's resources live in its static library: registered before a suite reads one
// without a main window (Q_INIT_RESOURCE declares its function in the global namespace).
inline void initialiseGuiResources() {
  Q_INIT_RESOURCE(resources);
}

namespace cw::test {

/// Points this process's HOME and XDG base folders into a temporary folder of its own, removed
/// when the suite ends, so no suite reads what another (or an earlier run) left in Qt's test
/// locations. Call before the first QSettings or QStandardPaths use.
inline void useTemporaryHome() {
  static QTemporaryDir home;
  if (!home.isValid()) qFatal("cannot create a temporary home for the suite");
  for (const char* name : {"HOME", "XDG_CONFIG_HOME", "XDG_DATA_HOME", "XDG_CACHE_HOME", "XDG_STATE_HOME"}) {
    const QString folder = home.filePath(QString::fromLatin1(name).toLower());
    QDir().mkpath(folder);
    qputenv(name, folder.toUtf8());
  }
}

inline void isolateGuiTest(const QString& applicationName) {
  QLocale::setDefault(QLocale::c());
  useTemporaryHome();
  QStandardPaths::setTestModeEnabled(true);
  QCoreApplication::setOrganizationName("CyclewrightTest");
  QCoreApplication::setApplicationName(applicationName);
  // Audits applied before an edit returns, whatever the machine's speed (test_gui_evaluation_pipeline
  // tests the adaptive and worker threading on auditors of its own).
  cw::gui::CaseAuditor::setDefaultThreading(cw::gui::CaseAuditor::Threading::GuiThread);
}

/// Installs a translation for the scope's lifetime ("en": none); removes every translator after.
class ScopedLanguage {
 public:
  explicit ScopedLanguage(const QString& language) {
    if (language != QLatin1String("en"))
      installed_ =
          cw::gui::installTranslation(*qobject_cast<QApplication*>(QCoreApplication::instance()), language);
  }
  ~ScopedLanguage() {
    for (auto* translator : QCoreApplication::instance()->findChildren<QTranslator*>()) {
      QCoreApplication::removeTranslator(translator);
      delete translator;
    }
  }
  ScopedLanguage(const ScopedLanguage&) = delete;
  ScopedLanguage& operator=(const ScopedLanguage&) = delete;
  QString installed() const { return installed_; }

 private:
  QString installed_;
};

/// The demo case, read from the application's resources.
inline cw::engine::Case demoCase() {
  initialiseGuiResources();
  QFile file(QStringLiteral(":/demo/demo-turbojet.json"));
  if (!file.open(QIODevice::ReadOnly)) qFatal("cannot read the demo case");
  const QByteArray bytes = file.readAll();
  return cw::io::parseCaseText(std::string_view(bytes.constData(), static_cast<std::size_t>(bytes.size())),
                               "demo");
}

/// Types text into a field as a user would: select all, delete, then one key click per
/// character (textEdited per key), with no event loop in between (a fast typist).
inline void typeInto(QLineEdit* field, const QString& text) {
  field->setFocus();
  field->selectAll();
  QTest::keyClick(field, Qt::Key_Backspace);
  QTest::keyClicks(field, text);
}

/// A temporary home for child processes: HOME and the XDG base folders (config, data, cache,
/// state, runtime) inside one QTemporaryDir, removed with it.
class IsolatedHome {
 public:
  /// The variables a child gets, each a folder under the temporary one.
  static QStringList variables() {
    return {"HOME",           "XDG_CONFIG_HOME", "XDG_DATA_HOME",
            "XDG_CACHE_HOME", "XDG_STATE_HOME",  "XDG_RUNTIME_DIR"};
  }

  IsolatedHome() {
    for (const QString& name : variables()) {
      QDir().mkpath(folderOf(name));
      // The runtime folder must be private (XDG base directory specification).
      if (name == QLatin1String("XDG_RUNTIME_DIR"))
        QFile::setPermissions(folderOf(name), QFile::ReadOwner | QFile::WriteOwner | QFile::ExeOwner);
    }
  }

  bool isValid() const { return dir_.isValid(); }
  /// A path inside the temporary folder.
  QString path(const QString& relative) const { return dir_.filePath(relative); }
  /// The folder a variable points to, e.g. folderOf("XDG_CONFIG_HOME").
  QString folderOf(const QString& variable) const { return dir_.filePath(variable.toLower()); }

  /// The system environment with HOME and the XDG folders pointing into the temporary folder.
  QProcessEnvironment environment() const {
    QProcessEnvironment environment = QProcessEnvironment::systemEnvironment();
    for (const QString& name : variables()) environment.insert(name, folderOf(name));
    return environment;
  }
  /// environment() without a display: no DISPLAY, WAYLAND_DISPLAY or QT_QPA_PLATFORM.
  QProcessEnvironment environmentWithoutDisplay() const {
    QProcessEnvironment environment = this->environment();
    for (const char* name : {"DISPLAY", "WAYLAND_DISPLAY", "QT_QPA_PLATFORM"}) environment.remove(name);
    return environment;
  }

  /// Starts a child in this home (in `environment`, by default environment()).
  void start(QProcess& process, const QString& program, const QStringList& arguments) const {
    start(process, program, arguments, environment());
  }
  void start(QProcess& process, const QString& program, const QStringList& arguments,
             const QProcessEnvironment& environment) const {
    process.setProcessEnvironment(environment);
    process.setWorkingDirectory(folderOf("HOME"));
    process.start(program, arguments);
  }

  /// Points this process's own HOME and XDG folders here too (for a suite whose children must
  /// share its folders, e.g. the autosave folder); QStandardPaths then resolves under it.
  void applyToThisProcess() const {
    for (const QString& name : variables()) qputenv(name.toLatin1().constData(), folderOf(name).toUtf8());
  }

 private:
  QTemporaryDir dir_;
};

}  // namespace cw::test
