// The start of cyclewright as a process: --help and --version need no display; a case that
// cannot be opened stops a --screenshot with status 2, one line on stderr naming the file and no
// picture; options of the wrong kind say what they expect; a child keeps to its own home.
#include "gui_test_support.h"

#include "common/version.h"

#include <QDateTime>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QImage>
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

/// The lines of our own on stderr (Qt may add its own, e.g. about the platform plugin).
QStringList ourLines(const QString& err) {
  QStringList lines;
  for (const QString& line : err.split(QLatin1Char('\n')))
    if (line.startsWith(QLatin1String("cyclewright: "))) lines << line;
  return lines;
}

/// The demo case with one key's value replaced (invented data; the valid ranges are the core's).
QByteArray demoWith(const QByteArray& from, const QByteArray& to) {
  QFile demo(QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json"));
  if (!demo.open(QIODevice::ReadOnly)) return {};
  return demo.readAll().replace(from, to);
}

bool writeFile(const QString& path, const QByteArray& bytes) {
  QFile file(path);
  return file.open(QIODevice::WriteOnly) && file.write(bytes) == bytes.size();
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

  void helpAndVersionNeedNoDisplay_data() {
    QTest::addColumn<QString>("option");
    QTest::addColumn<QString>("expected");
    QTest::newRow("--help") << "--help"
                            << "--screenshot <FILE>";
    QTest::newRow("-h") << "-h"
                        << "--study-vary <PATH=START:STOP:COUNT>";
    QTest::newRow("--version") << "--version" << QString("Cyclewright %1").arg(cw::kVersion);
    QTest::newRow("-v") << "-v" << QString("Cyclewright %1").arg(cw::kVersion);
  }
  void helpAndVersionNeedNoDisplay() {
    QFETCH(QString, option);
    QFETCH(QString, expected);
    const cw::test::IsolatedHome home;
    const QProcessEnvironment environment = home.environmentWithoutDisplay();
    QVERIFY(!environment.contains("DISPLAY") && !environment.contains("QT_QPA_PLATFORM"));
    const Run run = runApp(home, {option}, environment);
    QVERIFY2(run.status == 0, qPrintable(QString("exit %1: %2").arg(run.status).arg(run.err)));
    QVERIFY2(run.out.contains(expected), qPrintable(run.out));
    QVERIFY2(!run.err.contains("platform plugin"), qPrintable(run.err));
  }

  void screenshotOfACaseThatCannotBeOpened_data() {
    QTest::addColumn<QString>("name");
    QTest::addColumn<QByteArray>("contents");  // empty: no file; "folder": a folder of that name
    QTest::addColumn<QStringList>("extra");
    QTest::addColumn<QString>("expected");  // the core reader's message
    const QStringList none;
    const QStringList study = {"--screenshot-of", "trade-study", "--study-vary",
                               "compressor.pressure_ratio=4:12:3"};
    QTest::newRow("missing") << "missing.json" << QByteArray() << none
                             << "cannot read case file: No such file or directory";
    QTest::newRow("a folder") << "folder.json" << QByteArray("folder") << none
                              << "cannot read case file: is a folder";
    QTest::newRow("not JSON") << "broken.json" << QByteArray("{\"format\": \"cyclewright-case\",") << none
                              << "not valid JSON";
    // [1, 60]: the core's range of the compressor pressure ratio (core/engine/case_validation.cpp).
    QTest::newRow("invalid value") << "invalid.json"
                                   << demoWith("\"pressure_ratio\": 8.0", "\"pressure_ratio\": 0.5") << none
                                   << "/compressor/pressure_ratio = 0.5 is outside the valid range [1, 60]";
    QTest::newRow("missing, with a study")
        << "missing.json" << QByteArray() << study << "cannot read case file: No such file or directory";
  }
  void screenshotOfACaseThatCannotBeOpened() {
    QFETCH(QString, name);
    QFETCH(QByteArray, contents);
    QFETCH(QStringList, extra);
    QFETCH(QString, expected);
    const cw::test::IsolatedHome home;
    const QString casePath = home.path(name);
    if (contents == "folder")
      QVERIFY(QDir().mkpath(casePath));
    else if (!contents.isEmpty())
      QVERIFY(writeFile(casePath, contents));
    const QString picture = home.path("window.png");
    const Run run = runApp(home, QStringList{"--screenshot", picture} + extra + QStringList{casePath});
    QCOMPARE(run.status, 2);
    const QStringList lines = ourLines(run.err);
    QVERIFY2(lines.size() == 1, qPrintable(run.err));
    QVERIFY2(lines.first().contains(casePath), qPrintable(lines.first()));
    QVERIFY2(lines.first().contains(expected), qPrintable(lines.first()));
    QVERIFY(!QFile::exists(picture));
  }

  void optionsOfTheWrongKindSayWhatIsExpected_data() {
    QTest::addColumn<QStringList>("arguments");
    QTest::addColumn<QString>("expected");
    const QStringList vary = {"--study-vary", "compressor.pressure_ratio=4:12:3"};
    QTest::newRow("size, no size")
        << QStringList{"--size", "abc"}
        << "cyclewright: --size: expected WxH in pixels, e.g. 1600x1000, each from "
           "200x150 to 8000x8000; got \"abc\"";
    QTest::newRow("size, too small") << QStringList{"--size", "100x100"}
                                     << "cyclewright: --size = 100x100 is outside the valid range 200x150 to "
                                        "8000x8000";
    QTest::newRow("language") << QStringList{"--language", "xx"}
                              << "cyclewright: --language: no translation for \"xx\"; available: de, en";
    QTest::newRow("palette") << QStringList{"--palette", "purple"}
                             << "cyclewright: --palette: expected system or dark, got \"purple\"";
    QTest::newRow("study input")
        << QStringList{"--study-vary", "compressor.presure_ratio=4:12:3"}
        << "cyclewright: --study-vary compressor.presure_ratio: not a numeric input of this case (did you "
           "mean compressor.pressure_ratio?)";
    QTest::newRow("compared input")
        << vary + QStringList{"--study-compare", "compressor.isentropic_eficiency=0.8"}
        << "cyclewright: --study-compare compressor.isentropic_eficiency: not a numeric input of this case "
           "(did you mean compressor.isentropic_efficiency?)";
    QTest::newRow("plotted column") << vary + QStringList{"--study-plot", "specific_thrust_N_s_per_kgg"}
                                    << "cyclewright: --study-plot specific_thrust_N_s_per_kgg: not an output "
                                       "column (did you mean specific_thrust_N_s_per_kg?)";
  }
  void optionsOfTheWrongKindSayWhatIsExpected() {
    QFETCH(QStringList, arguments);
    QFETCH(QString, expected);
    const cw::test::IsolatedHome home;
    const QString picture = home.path("window.png");
    const Run run = runApp(home, QStringList{"--screenshot", picture} + arguments);
    QCOMPARE(run.status, 2);
    const QStringList lines = ourLines(run.err);
    QVERIFY2(lines.size() == 1, qPrintable(run.err));
    QCOMPARE(lines.first(), expected);
    QVERIFY(!QFile::exists(picture));
  }

  void childrenKeepToTheirOwnHome() {
    // The settings file and data folder a child would use with the real environment.
    const QString realSettings = realLocation("XDG_CONFIG_HOME", ".config", "Cyclewright/Cyclewright.conf");
    const QString realData = realLocation("XDG_DATA_HOME", ".local/share", "Cyclewright/Cyclewright");
    const FileState settingsBefore = stateOf(realSettings), dataBefore = stateOf(realData);
    const cw::test::IsolatedHome home;
    const Run run = runApp(home, {"--screenshot", home.path("window.png"), "--size", "640x480"});
    QCOMPARE(run.status, 0);
    QVERIFY(QFile::exists(home.path("window.png")));
    // Nothing where the user's own settings and data are (and, a screenshot, no settings at all:
    // screenshotRunsChangeNoSettings).
    QVERIFY(stateOf(realSettings) == settingsBefore);
    QVERIFY(stateOf(realData) == dataBefore);
  }

  void screenshotRunsChangeNoSettings() {
    const cw::test::IsolatedHome home;
    const QString settingsFile = home.folderOf("XDG_CONFIG_HOME") + "/Cyclewright/Cyclewright.conf";
    QVERIFY(QDir().mkpath(QFileInfo(settingsFile).absolutePath()));
    // The user's own: the inputs of their last study, SI units, the charts in tabs.
    const QByteArray own =
        "[charts]\nlayout=tabbed\n\n[study]\nfirst_input=nozzle.velocity_coefficient\n"
        "first_count=7\ncarpet=false\n\n[units]\nsystem=si\n";
    QVERIFY(writeFile(settingsFile, own));
    const QString casePath = home.path("case.json");
    QVERIFY(writeFile(casePath, demoWith("\"pressure_ratio\": 8.0", "\"pressure_ratio\": 9.0")));
    for (const auto& [of, size] : {std::pair{QStringLiteral("window"), QStringLiteral("1280x800")},
                                   std::pair{QStringLiteral("trade-study"), QStringLiteral("900x600")}}) {
      const Run run = runApp(home, {"--screenshot", home.path(of + ".png"), "--screenshot-of", of, "--size",
                                    size, "--study-vary", "compressor.pressure_ratio=4:12:5", "--study-vary",
                                    "burner.exit_temperature_K=1200:1500:3", "--study-plot",
                                    "specific_thrust_N_s_per_kg", casePath});
      QVERIFY2(run.status == 0, qPrintable(run.err));
      QFile settings(settingsFile);
      QVERIFY(settings.open(QIODevice::ReadOnly));
      QCOMPARE(settings.readAll(), own);  // byte for byte: no study set-up, no recent file
    }
    // The panel's picture honours --size too.
    QCOMPARE(QImage(home.path("trade-study.png")).size(), QSize(900, 600));
    QCOMPARE(QImage(home.path("window.png")).size(), QSize(1280, 800));
  }

  void exportFiguresWritesEveryChart() {
    const cw::test::IsolatedHome home;
    const QString demo = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");
    const QString out = home.path("figures/si");  // made when missing
    const Run run = runApp(
        home,
        {"--export-figures", demo, "--output-dir", out, "--format", "svg,png,pdf", "--size", "160x100mm"},
        home.environmentWithoutDisplay());
    QVERIFY2(run.status == 0, qPrintable(run.err));
    for (const QString name : {"temperature-entropy", "pressure-volume", "enthalpy-entropy", "loss-audit"}) {
      for (const QString format : {"svg", "png", "pdf"}) {
        const QString file = out + "/" + name + "." + format;
        QVERIFY2(QFileInfo(file).size() > 1000, qPrintable(file));
        QVERIFY(run.out.contains(file));
      }
      // PNG at 300 dpi: 160 mm = 1889.8 px, 100 mm = 1181.1 px.
      QCOMPARE(QImage(out + "/" + name + ".png").size(), QSize(1890, 1181));
      QFile svg(out + "/" + name + ".svg");
      QVERIFY(svg.open(QIODevice::ReadOnly));
      const QByteArray text = svg.readAll();
      // SVG at 85 dpi (charts/chart_export.h): 160 mm = 535.433 units, 100 mm = 334.646.
      QVERIFY2(text.contains("viewBox=\"0 0 535.433 334.646\""), qPrintable(name));
      QVERIFY2(text.contains("Results are conceptual-design estimates."), qPrintable(name));
    }
    // U.S. customary units on the axes.
    const QString us = home.path("figures/us");
    QCOMPARE(runApp(home, {"--export-figures", demo, "--output-dir", us, "--units", "us"},
                    home.environmentWithoutDisplay())
                 .status,
             0);
    QFile ts(us + "/temperature-entropy.svg");
    QVERIFY(ts.open(QIODevice::ReadOnly));
    QVERIFY(ts.readAll().contains("Temperature T [°R]"));
    QVERIFY(!QFile::exists(us + "/temperature-entropy.png"));  // SVG only by default
  }

  void exportFiguresRefusesBadInput_data() {
    QTest::addColumn<QStringList>("arguments");  // after --export-figures
    QTest::addColumn<QString>("expected");       // on the one line of stderr
    const QString demo = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");
    QTest::newRow("missing case") << QStringList{"no-such-case.json", "--output-dir", "out"}
                                  << "no-such-case.json: cannot read case file";
    QTest::newRow("format") << QStringList{demo, "--output-dir", "out", "--format", "svg,gif"}
                            << "--format: expected svg, pdf or png, comma-separated, got \"gif\"";
    QTest::newRow("size form") << QStringList{demo, "--output-dir", "out", "--size", "1600x1000"}
                               << "--size: expected WxHmm";
    QTest::newRow("size range") << QStringList{demo, "--output-dir", "out", "--size", "10x100mm"}
                                << "--size = 10x100mm is outside the valid range 20x20mm to 1000x1000mm";
    QTest::newRow("units") << QStringList{demo, "--output-dir", "out", "--units", "imperial"}
                           << "--units: expected si or us, got \"imperial\"";
    QTest::newRow("no folder") << QStringList{demo} << "--output-dir: is needed with --export-figures";
    QTest::newRow("unwritable folder") << QStringList{demo, "--output-dir", "/proc/cyclewright"}
                                       << "--output-dir: cannot make the folder \"/proc/cyclewright\"";
  }
  void exportFiguresRefusesBadInput() {
    QFETCH(QStringList, arguments);
    QFETCH(QString, expected);
    const cw::test::IsolatedHome home;
    const Run run =
        runApp(home, QStringList{"--export-figures"} + arguments, home.environmentWithoutDisplay());
    QCOMPARE(run.status, 2);
    const QStringList lines = ourLines(run.err);
    QCOMPARE(lines.size(), 1);
    QVERIFY2(lines.front().contains(expected), qPrintable(lines.front()));
    QVERIFY(!QFile::exists(home.folderOf("HOME") + "/out"));  // the child works in its HOME
  }
};

QTEST_GUILESS_MAIN(TestStartUp)
#include "test_start_up.moc"
