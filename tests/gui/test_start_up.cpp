// The start of cyclewright as a process: a child keeps to its own home.
#include "gui_test_support.h"

#include <QDateTime>
#include <QFile>
#include <QFileInfo>
#include <QProcess>
#include <QTest>

namespace {

const QString kApp = QStringLiteral(CYCLEWRIGHT_GUI_PATH);

struct Run {
  int status = -1;
  QString out;
  QString err;
};

Run runApp(const cw::test::IsolatedHome& home, const QStringList& arguments,
           const QProcessEnvironment& environment) {
  QProcess process;
  home.start(process, kApp, arguments, environment);
  Run run;
  if (!process.waitForFinished(60000)) {
    process.kill();
    process.waitForFinished();
    return run;
  }
  run.status = process.exitStatus() == QProcess::NormalExit ? process.exitCode() : -2;
  run.out = QString::fromUtf8(process.readAllStandardOutput());
  run.err = QString::fromUtf8(process.readAllStandardError());
  return run;
}

Run runApp(const cw::test::IsolatedHome& home, const QStringList& arguments) {
  return runApp(home, arguments, home.environment());
}

struct FileState {
  bool exists = false;
  qint64 size = -1;
  QDateTime modified;
  bool operator==(const FileState&) const = default;
};

FileState stateOf(const QString& path) {
  const QFileInfo info(path);
  return {info.exists(), info.exists() ? info.size() : -1, info.exists() ? info.lastModified() : QDateTime()};
}

/// Where a process with the environment's HOME and XDG variables keeps a file (the XDG base
/// directory specification's defaults when a variable is unset).
QString realLocation(const char* variable, const char* fallback, const QString& file) {
  const QProcessEnvironment system = QProcessEnvironment::systemEnvironment();
  const QString base = system.value(QString::fromLatin1(variable),
                                    system.value(QStringLiteral("HOME")) + QLatin1Char('/') + fallback);
  return base + QLatin1Char('/') + file;
}

}  // namespace

class TestStartUp : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestStartUp"); }

  void childrenKeepToTheirOwnHome() {
    // The settings file and data folder a child would use with the real environment.
    const QString realSettings = realLocation("XDG_CONFIG_HOME", ".config", "Cyclewright/Cyclewright.conf");
    const QString realData = realLocation("XDG_DATA_HOME", ".local/share", "Cyclewright/Cyclewright");
    const FileState settingsBefore = stateOf(realSettings), dataBefore = stateOf(realData);
    const cw::test::IsolatedHome home;
    const Run run = runApp(home, {"--screenshot", home.path("window.png"), "--size", "640x480"});
    QCOMPARE(run.status, 0);
    QVERIFY(QFile::exists(home.path("window.png")));
    // The child wrote its settings (the chart layout, at least) in its own home...
    const QString ownSettings = home.folderOf("XDG_CONFIG_HOME") + "/Cyclewright/Cyclewright.conf";
    QVERIFY2(QFile::exists(ownSettings), qPrintable(ownSettings));
    QFile settings(ownSettings);
    QVERIFY(settings.open(QIODevice::ReadOnly));
    QVERIFY(settings.readAll().contains("layout=side-by-side"));
    // ...and nothing where the user's own settings and data are.
    QVERIFY(stateOf(realSettings) == settingsBefore);
    QVERIFY(stateOf(realData) == dataBefore);
  }
};

QTEST_GUILESS_MAIN(TestStartUp)
#include "test_start_up.moc"
