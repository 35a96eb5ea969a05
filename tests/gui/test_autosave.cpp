// Autosave and recovery: one file per running instance carrying the case and its origin
// together, written atomically; recovery offers only autosaves no running instance holds, keeps a
// named file's origin, refuses malformed files without deleting them; a process killed in the
// middle of an autosave leaves the previous complete autosave (or none) and a temporary that the
// next start removes; temporaries of interrupted saves beside a case go when it is opened or
// saved; the autosave comes 2 s after the last edit and at most the limit after the first.
//
// The suite runs in a home of its own (IsolatedHome applied to this process), shared with the
// child it kills, so both use one autosave folder.
#include "dialogs/dialogs.h"
#include "document/autosave_store.h"
#include "document/autosave_timer.h"
#include "document/case_document.h"
#include "document/settings.h"
#include "gui_test_support.h"
#include "main_window.h"

#include "io/atomic_file.h"
#include "io/case_file.h"

#include <nlohmann/json.hpp>

#include <QAbstractButton>
#include <QApplication>
#include <QDir>
#include <QElapsedTimer>
#include <QFile>
#include <QLineEdit>
#include <QMessageBox>
#include <QProcess>
#include <QSettings>
#include <QSpinBox>
#include <QTest>
#include <QTimer>

#include <signal.h>

#include <cerrno>

using cw::gui::AutosaveStore;
using cw::gui::MainWindow;

using cw::test::typeInto;

namespace {

const QString kDemo = QStringLiteral(":/demo/demo-turbojet.json");

/// Answers every message box the window opens (polled from a timer, as a user would click) and
/// collects their texts. Stops with the window.
class BoxAnswerer : public QObject {
 public:
  BoxAnswerer(MainWindow& window, QMessageBox::StandardButton answer) : QObject(&window), answer_(answer) {
    auto* timer = new QTimer(this);
    timer->setInterval(20);
    connect(timer, &QTimer::timeout, this, [this, &window] {
      auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
      if (!box || !box->isVisible() || box->parent() != &window) return;
      names << box->objectName();
      texts << box->text() + QLatin1Char('\n') + box->informativeText();
      if (QAbstractButton* button =
              box->button(box->objectName() == "recoverBox" ? answer_ : QMessageBox::Ok))
        button->click();
      else
        box->reject();
    });
    timer->start();
  }
  QStringList names;
  QStringList texts;

 private:
  QMessageBox::StandardButton answer_;
};

QStringList autosavesIn(const QString& folder) {
  return QDir(folder).entryList({"autosave-*.json"}, QDir::Files);
}

QStringList temporariesIn(const QString& folder) {
  return QDir(folder).entryList({".*.tmp-*"}, QDir::Files | QDir::Hidden);
}

bool writeFile(const QString& path, const QByteArray& bytes) {
  QFile file(path);
  return file.open(QIODevice::WriteOnly) && file.write(bytes) == bytes.size();
}

QByteArray readFile(const QString& path) {
  QFile file(path);
  return file.open(QIODevice::ReadOnly) ? file.readAll() : QByteArray();
}

/// A process id that is surely no running process: a child that has ended.
qint64 endedProcessId() {
  QProcess child;
  child.start("/bin/true", {});
  if (!child.waitForStarted()) return -1;
  const qint64 pid = child.processId();
  child.waitForFinished();
  return ::kill(static_cast<pid_t>(pid), 0) != 0 && errno == ESRCH ? pid : -1;
}

/// Edits the demo case in a window, autosaves and drops the window without closing it (as a
/// crash would). Returns the autosaved case.
cw::engine::Case crashWithAutosave(const QString& path = kDemo) {
  MainWindow window;
  if (!window.openCase(path)) return {};
  typeInto(window.findChild<QLineEdit*>("compressor.pressureRatio"), "9.5");
  typeInto(window.findChild<QLineEdit*>("case.title"), "Before the crash");
  if (!window.autosaveNow()) return {};
  return window.document().currentCase();
}

}  // namespace

class TestAutosave : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() {
    QVERIFY(home_.isValid());
    home_.applyToThisProcess();  // the child it kills autosaves into the same folder
    QLocale::setDefault(QLocale::c());
    QCoreApplication::setOrganizationName("CyclewrightTest");
    QCoreApplication::setApplicationName("CyclewrightTestAutosave");
    folder_ = MainWindow::autosaveFolder();
    QVERIFY2(folder_.startsWith(home_.path("")), qPrintable(folder_));
    QVERIFY(QDir().mkpath(home_.path("cases")));
    casePath_ = home_.path("cases/engine.json");
  }
  void init() {
    QDir(folder_).removeRecursively();
    QVERIFY(QDir().mkpath(folder_));
    QFile::remove(casePath_);
    // The demo as this build writes it (version 2): saving over a version 1 file asks first,
    // which test_gui_architecture checks.
    cw::io::writeCaseFile(casePath_.toStdString(), cw::io::readCaseFile(kDemoSource().toStdString()));
    QFile::setPermissions(casePath_, QFile::ReadOwner | QFile::WriteOwner);
    QSettings().clear();
  }

  void oneFileCarriesTheCaseAndItsOrigin() {
    MainWindow window;
    QVERIFY(window.openCase(casePath_));
    QVERIFY(!window.autosaveNow());  // nothing to save yet
    QVERIFY(autosavesIn(folder_).isEmpty());
    typeInto(window.findChild<QLineEdit*>("compressor.pressureRatio"), "9");
    QVERIFY(window.autosaveNow());
    // One autosave, named after this process, and nothing else but its lock.
    const QStringList files = autosavesIn(folder_);
    QCOMPARE(files.size(), 1);
    QVERIFY2(files.first().startsWith(QString("autosave-%1-").arg(QCoreApplication::applicationPid())),
             qPrintable(files.first()));
    QCOMPARE(QDir(folder_).filePath(files.first()), window.autosaveFile());
    QVERIFY(QDir(folder_).entryList({"*.origin"}, QDir::Files).isEmpty());
    QVERIFY(temporariesIn(folder_).isEmpty());
    const nlohmann::json document = nlohmann::json::parse(readFile(window.autosaveFile()).toStdString());
    QCOMPARE(document.at("format").get<std::string>(), std::string("cyclewright-autosave"));
    QCOMPARE(document.at("version").get<int>(), 1);
    QCOMPARE(QString::fromStdString(document.at("origin").get<std::string>()), casePath_);
    QVERIFY(document.at("case") == cw::io::caseToJson(window.document().currentCase()));
    QCOMPARE(document.at("case").at("compressor").at("pressure_ratio").get<double>(), 9.0);
    // Saving removes it.
    QVERIFY(window.save());
    QVERIFY(autosavesIn(folder_).isEmpty());
  }

  void recoveryOfANamedFileKeepsItsOrigin() {
    const cw::engine::Case autosaved = crashWithAutosave(casePath_);
    QCOMPARE(autosaved.title, std::string("Before the crash"));
    QCOMPARE(autosavesIn(folder_).size(), 1);
    MainWindow window;  // as at start: the demo, then the offer
    QVERIFY(window.openCase(kDemo));
    window.show();
    BoxAnswerer answers(window, QMessageBox::Yes);
    QVERIFY(window.offerRecovery());
    QCOMPARE(answers.names, QStringList{"recoverBox"});
    QVERIFY2(
        answers.texts.first().contains("did not close normally") && answers.texts.first().contains(casePath_),
        qPrintable(answers.texts.first()));
    QVERIFY(window.document().currentCase() == autosaved);
    QCOMPARE(window.findChild<QLineEdit*>("compressor.pressureRatio")->text(), QString("9.5"));
    QVERIFY(window.document().isModified());  // recovered, not yet saved
    QCOMPARE(window.casePath(), casePath_);   // the file it came from, not "Untitled"
    QVERIFY2(window.windowTitle().startsWith("engine.json"), qPrintable(window.windowTitle()));
    // The crashed instance's autosave is gone; this window's own holds the case.
    const QStringList files = autosavesIn(folder_);
    QCOMPARE(files.size(), 1);
    QCOMPARE(QDir(folder_).filePath(files.first()), window.autosaveFile());
    QVERIFY(AutosaveStore::read(window.autosaveFile()).inputs == autosaved);
    // Ctrl+S writes the file it came from.
    QVERIFY(window.save());
    QVERIFY(cw::io::readCaseFile(casePath_.toStdString()) == autosaved);
    QVERIFY(autosavesIn(folder_).isEmpty());
  }

  void anUntitledCaseRecoversUntitledAndNoDiscards() {
    {
      MainWindow window;
      window.newCase();
      typeInto(window.findChild<QLineEdit*>("compressor.pressureRatio"), "11");
      QVERIFY(window.autosaveNow());
    }
    QVERIFY(AutosaveStore::read(QDir(folder_).filePath(autosavesIn(folder_).first())).origin.isEmpty());
    MainWindow window;
    window.show();
    BoxAnswerer answers(window, QMessageBox::No);
    QVERIFY(!window.offerRecovery());
    QCOMPARE(answers.texts.size(), 1);
    QVERIFY2(answers.texts.first().contains("untitled case"), qPrintable(answers.texts.first()));
    QVERIFY(autosavesIn(folder_).isEmpty());  // No discards it
    QVERIFY(!window.document().isModified());
    // Without an autosave the start asks nothing.
    QVERIFY(!window.offerRecovery());
    QTest::qWait(100);
    QCOMPARE(answers.texts.size(), 1);
  }

  void theAutosaveOfARunningInstanceIsNotOffered() {
    MainWindow running;
    QVERIFY(running.openCase(casePath_));
    typeInto(running.findChild<QLineEdit*>("compressor.pressureRatio"), "10");
    QVERIFY(running.autosaveNow());
    const QByteArray before = readFile(running.autosaveFile());
    MainWindow starting;
    starting.show();
    BoxAnswerer answers(starting, QMessageBox::Yes);
    QVERIFY(!starting.offerRecovery());
    QTest::qWait(100);
    QVERIFY(answers.texts.isEmpty());
    QCOMPARE(readFile(running.autosaveFile()), before);
  }

  void aMalformedAutosaveIsRefusedAndKept_data() {
    QTest::addColumn<QByteArray>("contents");
    QTest::addColumn<QString>("reason");
    const QByteArray demoCase =
        QByteArray::fromStdString(cw::io::readCaseDocument(QString(kDemoSource()).toStdString()).dump());
    QTest::newRow("not JSON") << QByteArray("{\"format\": \"cyclewright-autosave\", ") << "not valid JSON";
    QTest::newRow("a bare case") << demoCase << "a case file without its origin";
    QTest::newRow("other format") << QByteArray("{\"format\": \"notes\", \"version\": 1}")
                                  << "format = \"notes\", expected \"cyclewright-autosave\"";
    QTest::newRow("version 2") << "{\"format\": \"cyclewright-autosave\", \"version\": 2, \"origin\": \"\", "
                                  "\"case\": " +
                                      demoCase + "}"
                               << "version = 2, expected 1";
    QTest::newRow("relative origin") << "{\"format\": \"cyclewright-autosave\", \"version\": 1, \"origin\": "
                                        "\"engine.json\", \"case\": " +
                                            demoCase + "}"
                                     << "origin = \"engine.json\" is not an absolute path";
    QTest::newRow("unknown key")
        << "{\"format\": \"cyclewright-autosave\", \"version\": 1, \"origin\": \"\", "
           "\"case\": " +
               demoCase + ", \"window\": 1}"
        << "unknown key \"window\"";
    QTest::newRow("no case")
        << QByteArray("{\"format\": \"cyclewright-autosave\", \"version\": 1, \"origin\": \"\"}")
        << "case must be a case document";
    QTest::newRow("unknown case key")
        << "{\"format\": \"cyclewright-autosave\", \"version\": 1, \"origin\": \"\", \"case\": " +
               QByteArray(demoCase).replace("\"pressure_ratio\"", "\"pressure_ration\"") + "}"
        << "its case is malformed: ";
  }
  void aMalformedAutosaveIsRefusedAndKept() {
    QFETCH(QByteArray, contents);
    QFETCH(QString, reason);
    const QString file = QDir(folder_).filePath("autosave-1-1.json");
    QVERIFY(writeFile(file, contents));
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    const cw::engine::Case demo = window.document().currentCase();
    window.show();
    BoxAnswerer answers(window, QMessageBox::Yes);
    QVERIFY(!window.offerRecovery());
    QCOMPARE(answers.names, QStringList{"unreadableAutosaveBox"});
    QVERIFY2(answers.texts.first().contains(file) && answers.texts.first().contains(reason),
             qPrintable(answers.texts.first()));
    QVERIFY2(answers.texts.first().contains(file + ".unreadable"), qPrintable(answers.texts.first()));
    // Nothing is deleted: set aside under a name that is no longer offered.
    QVERIFY(!QFile::exists(file));
    QCOMPARE(readFile(file + ".unreadable"), contents);
    QVERIFY(window.document().currentCase() == demo);
    QVERIFY(!window.offerRecovery());
    QCOMPARE(answers.texts.size(), 1);
  }

  void aValueOutOfRangeIsRecoveredAsTyped() {
    // An efficiency of 0 is outside (0, 1] (the core's range): the user was typing.
    cw::engine::Case typing = cw::io::readCaseFile(casePath_.toStdString());
    typing.compressor.efficiency.value = 0.0;
    QVERIFY(writeFile(QDir(folder_).filePath("autosave-1-1.json"), AutosaveStore::encode(typing, casePath_)));
    MainWindow window;
    window.show();
    BoxAnswerer answers(window, QMessageBox::Yes);
    QVERIFY(window.offerRecovery());
    QCOMPARE(window.document().currentCase().compressor.efficiency.value, 0.0);
    QVERIFY(window.document().isStale());
    QCOMPARE(window.casePath(), casePath_);
  }

  void killedDuringAnAutosave_data() {
    QTest::addColumn<QString>("mode");
    QTest::addColumn<bool>("offered");
    QTest::newRow("after a complete autosave") << "complete-first" << true;
    QTest::newRow("during the first autosave") << "pause-first" << false;
  }
  void killedDuringAnAutosave() {
    QFETCH(QString, mode);
    QFETCH(bool, offered);
    QProcess child;
    home_.start(child, CYCLEWRIGHT_AUTOSAVE_HELPER_PATH, {casePath_, mode});
    QVERIFY(child.waitForStarted());
    const qint64 pid = child.processId();
    QString said;
    QElapsedTimer clock;
    clock.start();
    while (!said.contains("autosave paused before its rename") && clock.elapsed() < 60000 &&
           child.state() == QProcess::Running) {
      child.waitForReadyRead(200);
      said += QString::fromUtf8(child.readAllStandardError());
    }
    QVERIFY2(said.contains("autosave paused before its rename"), qPrintable(said));
    // At the worst moment: the new autosave written to its temporary, not yet renamed.
    const QStringList temporaries = temporariesIn(folder_);
    QCOMPARE(temporaries.size(), 1);
    QVERIFY2(temporaries.first().contains(QString(".tmp-%1-").arg(pid)), qPrintable(temporaries.first()));
    {  // while it runs, its autosave is its own: not offered
      AutosaveStore store(folder_);
      QVERIFY(store.claimOrphans().empty());
    }
    QCOMPARE(::kill(static_cast<pid_t>(pid), SIGKILL), 0);
    QVERIFY(child.waitForFinished());
    QCOMPARE(child.exitStatus(), QProcess::CrashExit);
    QCOMPARE(autosavesIn(folder_).size(), offered ? 1 : 0);

    // A temporary of a running process (this one) must survive the next start.
    const QString live =
        QDir(folder_).filePath(QString(".autosave-x.json.tmp-%1-0").arg(QCoreApplication::applicationPid()));
    QVERIFY(writeFile(live, "partial"));
    MainWindow window;  // the next start
    window.show();
    BoxAnswerer answers(window, QMessageBox::Yes);
    QCOMPARE(window.offerRecovery(), offered);
    QCOMPARE(temporariesIn(folder_), QStringList{QFileInfo(live).fileName()});  // the dead one's is gone
    QVERIFY(QDir(folder_).entryList({"*.lock"}, QDir::Files).size() <= 1);      // only this window's
    if (offered) {
      // The previous complete autosave, tied to its file: never "Untitled", never the second edit.
      QCOMPARE(answers.texts.size(), 1);
      QVERIFY2(answers.texts.first().contains(casePath_), qPrintable(answers.texts.first()));
      QCOMPARE(window.casePath(), casePath_);
      QCOMPARE(window.document().currentCase().title, std::string("First edit"));
      QCOMPARE(window.document().currentCase().compressor.pressureRatio, 9.5);
      QVERIFY(window.windowTitle().startsWith("engine.json"));
    } else {
      QVERIFY(answers.texts.isEmpty());
      QVERIFY(window.casePath().isEmpty() && !window.document().isModified());
    }
    QFile::remove(live);
  }

  void temporariesBesideACaseGoWhenItIsOpenedOrSaved() {
    const qint64 dead = endedProcessId();
    QVERIFY(dead > 0);
    const qint64 self = QCoreApplication::applicationPid();
    const QString folder = QFileInfo(casePath_).absolutePath();
    auto temporary = [&](const QString& name, qint64 pid, int n) {
      return QDir(folder).filePath(QString(".%1.tmp-%2-%3").arg(name).arg(pid).arg(n));
    };
    const QString deadOne = temporary("engine.json", dead, 0), liveOne = temporary("engine.json", self, 0),
                  otherFile = temporary("other.json", dead, 0);
    for (const QString& path : {deadOne, liveOne, otherFile}) QVERIFY(writeFile(path, "{\"partial\": "));
    MainWindow window;
    QVERIFY(window.openCase(casePath_));
    QVERIFY(!QFile::exists(deadOne));   // its writer is gone
    QVERIFY(QFile::exists(liveOne));    // this process might still rename it
    QVERIFY(QFile::exists(otherFile));  // another file's: left for its own open or save
    QVERIFY(writeFile(deadOne, "{\"partial\": "));
    QVERIFY(window.saveCaseAs(casePath_));
    QVERIFY(!QFile::exists(deadOne));
    QVERIFY(QFile::exists(liveOne) && QFile::exists(otherFile));
    // The core's clean-up on its own: names that only look like temporaries stay.
    const QStringList lookalikes = {QDir(folder).filePath(QString("engine.json.tmp-%1-0").arg(dead)),
                                    QDir(folder).filePath(".engine.json.tmp-abc-0"),
                                    QDir(folder).filePath(QString(".engine.json.tmp-%1-x").arg(dead)),
                                    QDir(folder).filePath(QString(".engine.json.tmp-%1").arg(dead))};
    for (const QString& path : lookalikes) QVERIFY(writeFile(path, "x"));
    QCOMPARE(cw::io::removeStaleTemporaries(folder.toStdString()), std::size_t(1));  // otherFile only
    for (const QString& path : lookalikes) QVERIFY2(QFile::exists(path), qPrintable(path));
    QVERIFY(!QFile::exists(otherFile) && QFile::exists(liveOne));
    for (const QString& path : lookalikes + QStringList{liveOne}) QFile::remove(path);
  }

  void theAutosaveComesAPauseAfterTheLastEdit() {
    cw::gui::AppSettings().setAutosaveWithinSeconds(60);  // so that only the pause can bring it
    MainWindow window;
    QVERIFY(window.openCase(casePath_));
    QCOMPARE(window.autosaveTimer()->pause(), 2000);  // common practice, no source: a typing pause
    QCOMPARE(window.autosaveTimer()->limit(), 60000);
    auto* field = window.findChild<QLineEdit*>("burner.exitTemperature");
    typeInto(field, "140");
    // The clock starts before the last keystroke, so the time its edit takes to evaluate and
    // redraw (long in a sanitizer build) is inside the measured pause, never outside it.
    QElapsedTimer sinceLastEdit;
    sinceLastEdit.start();
    QTest::keyClicks(field, "0");
    QVERIFY(window.autosaveTimer()->isPending());
    QTest::qWait(1200);
    QVERIFY(autosavesIn(folder_).isEmpty());  // a timer never fires early
    QTRY_VERIFY_WITH_TIMEOUT(!autosavesIn(folder_).isEmpty(), 5000);
    QVERIFY2(sinceLastEdit.elapsed() >= 1950, qPrintable(QString::number(sinceLastEdit.elapsed())));
    QVERIFY(AutosaveStore::read(window.autosaveFile()).inputs == window.document().currentCase());
    QVERIFY(!window.autosaveTimer()->isPending());
  }

  void continuousEditsAreAutosavedWithinTheLimit() {
    MainWindow window;
    QVERIFY(window.openCase(casePath_));
    QCOMPARE(window.autosaveTimer()->limit(), 5000);  // the Preferences' default
    auto* field = window.findChild<QLineEdit*>("case.title");
    field->setFocus();
    QElapsedTimer sinceFirstEdit;
    qint64 seen = -1;
    for (int key = 0; key < 20 && seen < 0; ++key) {  // a key every 0.4 s for 8 s: never a 2 s pause
      QTest::keyClick(field, Qt::Key_A);              // types "a"
      if (key == 0) sinceFirstEdit.start();
      QTest::qWait(400);
      if (!autosavesIn(folder_).isEmpty()) seen = sinceFirstEdit.elapsed();
    }
    QVERIFY2(seen >= 0, "no autosave while typing");
    QVERIFY2(seen >= 4900, qPrintable(QString::number(seen)));  // the 5 s limit, not the pause
    // It holds the edits typed so far.
    QVERIFY(QString::fromStdString(AutosaveStore::read(window.autosaveFile()).inputs.title).contains('a'));
  }

  void thePreferencesSetTheLimit() {
    QCOMPARE(cw::gui::AppSettings().autosaveWithinSeconds(), 5);
    cw::gui::AppSettings().setAutosaveWithinSeconds(12);
    {
      MainWindow window;
      QCOMPARE(window.autosaveTimer()->limit(), 12000);
      QCOMPARE(window.autosaveTimer()->pause(), 2000);
    }
    cw::gui::AppSettings().setAutosaveWithinSeconds(1);  // below the range: its lower end
    QCOMPARE(cw::gui::AppSettings().autosaveWithinSeconds(), 2);
    MainWindow window;
    QCOMPARE(window.autosaveTimer()->limit(), 2000);
    QCOMPARE(window.autosaveTimer()->pause(), 2000);
    cw::gui::PreferencesDialog dialog;
    auto* box = dialog.findChild<QSpinBox*>("autosaveWithinSeconds");
    QVERIFY(box);
    QCOMPARE(box->minimum(), 2);
    QCOMPARE(box->maximum(), 600);
    dialog.setAutosaveWithinSeconds(30);
    QCOMPARE(dialog.autosaveWithinSeconds(), 30);
  }

 private:
  static QString kDemoSource() {
    return QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");
  }

  cw::test::IsolatedHome home_;
  QString folder_;
  QString casePath_;
};

QTEST_MAIN(TestAutosave)
#include "test_autosave.moc"
