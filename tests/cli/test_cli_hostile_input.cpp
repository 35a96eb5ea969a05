// cyclewright-cli against hostile input: every file, option and value that once crashed, hung or
// ran away now ends in exit status 2 and one clear line on stderr that names the file or option,
// is valid UTF-8, is short, and prints numbers without 17 digits. Run as a process, so that a
// crash shows as a crash.
#include "common/error.h"
#include "common/text.h"
#include "verbs.h"

#include <QDir>
#include <QFile>
#include <QProcess>
#include <QRegularExpression>
#include <QTemporaryDir>
#include <QTest>

#include <sys/stat.h>

#include <new>
#include <sstream>
#include <stdexcept>

namespace {

const QString kDemo = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR "/resources/demo/demo-turbojet.json");

struct Run {
  QProcess::ExitStatus exitStatus;
  int status;
  QByteArray out, err;
};

Run runCli(const QStringList& arguments) {
  QProcess cli;
  cli.start(CYCLEWRIGHT_CLI_PATH, arguments);
  if (!cli.waitForFinished(20000)) {  // a hang is a failure, not a stuck test
    cli.kill();
    cli.waitForFinished(5000);
    return {QProcess::CrashExit, -1, {}, "timed out"};
  }
  return {cli.exitStatus(), cli.exitCode(), cli.readAllStandardOutput(), cli.readAllStandardError()};
}

QByteArray demoText() {
  QFile file(kDemo);
  if (!file.open(QIODevice::ReadOnly)) return {};
  return file.readAll();
}

QString writeFile(const QTemporaryDir& dir, const QString& name, const QByteArray& bytes) {
  const QString path = dir.filePath(name);
  QFile file(path);
  if (!file.open(QIODevice::WriteOnly) || file.write(bytes) != bytes.size()) return {};
  return path;
}

/// Exit 2, nothing on stdout, exactly one line on stderr that is valid UTF-8, at most
/// maxBytes long, and contains every expected part.
void expectOneLineRefusal(const Run& run, const QStringList& parts, int maxBytes = 400) {
  QCOMPARE(run.exitStatus, QProcess::NormalExit);
  QCOMPARE(run.status, 2);
  QVERIFY(run.out.isEmpty());
  QVERIFY2(run.err.endsWith('\n') && run.err.count('\n') == 1, run.err.left(500).constData());
  QVERIFY2(cw::isValidUtf8(run.err.toStdString()), run.err.left(500).toHex().constData());
  QVERIFY2(run.err.size() <= maxBytes, QByteArray::number(run.err.size()).constData());
  const QString line = QString::fromUtf8(run.err);
  for (const QString& part : parts) QVERIFY2(line.contains(part), qPrintable(line + " lacks " + part));
}

}  // namespace

class TestCliHostileInput : public QObject {
  Q_OBJECT
 private slots:
  // Nesting: refused before any recursion over the document (60 000 levels crashed the stack).
  void deeplyNestedJsonIsRefused_data() {
    QTest::addColumn<int>("levels");
    QTest::newRow("17 levels") << 17;
    QTest::newRow("30 000 levels") << 30000;
    QTest::newRow("60 000 levels") << 60000;
  }
  void deeplyNestedJsonIsRefused() {
    QFETCH(int, levels);
    QTemporaryDir dir;
    const QString path = writeFile(dir, "nested.json", QByteArray(levels, '[') + QByteArray(levels, ']'));
    expectOneLineRefusal(runCli({"evaluate", path}),
                         {"nested.json", "nested more than 16 levels deep", "line 1, column 17"});
  }
  void sixteenLevelsAreStillJsonButNotACase() {
    QTemporaryDir dir;
    const QString path = writeFile(dir, "sixteen.json", QByteArray(16, '[') + QByteArray(16, ']'));
    // No doubled prefix: the document is named once.
    expectOneLineRefusal(runCli({"evaluate", path}),
                         {"sixteen.json: the case document: expected a JSON object"});
    QVERIFY(!runCli({"evaluate", path}).err.contains("the case document: the case document"));
  }

  // Files that are not a case file's size or kind: refused at once, never read whole or waited on.
  void hugeFileIsRefused() {
    QTemporaryDir dir;
    const QString path = writeFile(dir, "huge.json", QByteArray(5000000, ' '));
    expectOneLineRefusal(runCli({"evaluate", path}),
                         {"huge.json", "5000000 bytes", "more than the limit of 4 MiB"});
  }
  void deviceFifoAndFolderAreRefused() {
    expectOneLineRefusal(runCli({"evaluate", "/dev/urandom"}), {"/dev/urandom", "is a device"});
    QTemporaryDir dir;
    const QString fifo = dir.filePath("pipe.json");
    QCOMPARE(::mkfifo(fifo.toLocal8Bit().constData(), 0600), 0);
    expectOneLineRefusal(runCli({"evaluate", fifo}), {"pipe.json", "is a FIFO"});
    expectOneLineRefusal(runCli({"sweep", fifo, "--vary", "flight.mach=0:1:2"}), {"pipe.json", "is a FIFO"});
    expectOneLineRefusal(runCli({"audit", dir.path()}), {"is a folder"});
    expectOneLineRefusal(runCli({"evaluate", dir.filePath("missing.json")}),
                         {"missing.json", "No such file or directory"});
  }

  // Numbers a double cannot hold: the JSON library's range error becomes a clear refusal.
  void numbersBeyondDoubleAreRefused_data() {
    QTest::addColumn<QByteArray>("document");
    QTest::newRow("version 1e400") << QByteArray("{\"format\":\"cyclewright-case\",\"version\":1e400}");
    QTest::newRow("[1e400]") << QByteArray("[1e400]");
    QTest::newRow("400-digit integer")
        << QByteArray("{\"format\":\"cyclewright-case\",\"version\":") + QByteArray(400, '9') + "}";
  }
  void numbersBeyondDoubleAreRefused() {
    QFETCH(QByteArray, document);
    QTemporaryDir dir;
    const QString path = writeFile(dir, "number.json", document);
    expectOneLineRefusal(runCli({"evaluate", path}), {"number.json", "not valid JSON", "number overflow"});
  }

  // Anything after the document is an error, a NUL byte included (the JSON library stops at NUL).
  void trailingContentIsRefused_data() {
    QTest::addColumn<QByteArray>("tail");
    QTest::addColumn<QString>("says");
    QTest::newRow("NUL and garbage") << QByteArray("\0garbage", 8) << "a NUL byte";
    QTest::newRow("garbage") << QByteArray(" garbage") << "not valid JSON";
    QTest::newRow("a second document") << QByteArray("{}") << "not valid JSON";
  }
  void trailingContentIsRefused() {
    QFETCH(QByteArray, tail);
    QFETCH(QString, says);
    QTemporaryDir dir;
    const QString path = writeFile(dir, "tail.json", demoText() + tail);
    expectOneLineRefusal(runCli({"evaluate", path}), {"tail.json", says});
  }

  // Messages never echo invalid UTF-8, and quote a huge key or value only as a short excerpt.
  void invalidUtf8InSetIsRefusedWithoutEchoingIt() {
    // A QString cannot hold the byte 0xFF: the shell's printf puts it into the argument.
    const QString script = QString("exec '%1' evaluate '%2' --set \"$(printf 'nozzle.kind=conv\\377')\"")
                               .arg(CYCLEWRIGHT_CLI_PATH, kDemo);
    QProcess shell;
    shell.start("/bin/sh", {"-c", script});
    QVERIFY(shell.waitForFinished(20000));
    expectOneLineRefusal(
        {shell.exitStatus(), shell.exitCode(), shell.readAllStandardOutput(), shell.readAllStandardError()},
        {"--set nozzle.kind=conv\\xFF", "is not valid UTF-8"});
  }
  void hugeUnknownKeyIsQuotedAsAnExcerpt() {
    QTemporaryDir dir;
    const QString path =
        writeFile(dir, "key.json",
                  "{\"format\":\"cyclewright-case\",\"version\":1,\"" + QByteArray(1000000, 'k') + "\":1}");
    const Run run = runCli({"evaluate", path});
    expectOneLineRefusal(run, {"key.json", "kkkk...", "(1000001 bytes): unknown key"}, 1000);
  }
  void hugeStringValueIsQuotedAsAnExcerpt() {
    QTemporaryDir dir;
    QByteArray text = demoText();
    text.replace("\"kind\": \"convergent\"", "\"kind\": \"" + QByteArray(200000, 'x') + "\"");
    QVERIFY(text.contains("xxxxxxxx"));
    const Run run = runCli({"evaluate", writeFile(dir, "value.json", text)});
    expectOneLineRefusal(run, {"value.json", "/nozzle/kind", "xxx..."}, 600);
  }

  // Options of the wrong kind say what was expected.
  void optionsOfTheWrongKindSayWhatWasExpected_data() {
    QTest::addColumn<QStringList>("arguments");
    QTest::addColumn<QString>("says");
    QTest::newRow("--threads 1.5") << QStringList{"sweep",     kDemo, "--vary", "flight.mach=0:1:2",
                                                  "--threads", "1.5"}
                                   << "--threads: expected a whole number from 0 to 256, got \"1.5\"";
    QTest::newRow("--threads abc") << QStringList{"sweep",     kDemo, "--vary", "flight.mach=0:1:2",
                                                  "--threads", "abc"}
                                   << "--threads: expected a whole number from 0 to 256, got \"abc\"";
    QTest::newRow("--altitude-m 1e400")
        << QStringList{"atmosphere", "--altitude-m", "1e400"} << "--altitude-m: \"1e400\" is too large";
    QTest::newRow("--mach abc") << QStringList{"flow", "--gamma", "1.4", "--mach", "abc"}
                                << "--mach: expected a number, got \"abc\"";
    QTest::newRow("--set x=1e400") << QStringList{"evaluate", kDemo, "--set", "flight.mach=1e400"}
                                   << "flight.mach: \"1e400\" is too large";
    QTest::newRow("--set x=1e-400") << QStringList{"evaluate", kDemo, "--set", "flight.mach=1e-400"}
                                    << "flight.mach: \"1e-400\" is too close to zero";
    QTest::newRow("--format xml") << QStringList{"evaluate", kDemo, "--format", "xml"}
                                  << "--format: expected one of text, json, csv, got \"xml\"";
    QTest::newRow("--formt json") << QStringList{"evaluate", kDemo, "--formt", "json"}
                                  << "--formt: unknown option (did you mean --format?)";
  }
  void optionsOfTheWrongKindSayWhatWasExpected() {
    QFETCH(QStringList, arguments);
    QFETCH(QString, says);
    expectOneLineRefusal(runCli(arguments), {says});
  }

  // Usage lines list every format a verb accepts, and the verb accepts each one listed.
  void usageListsEveryFormatTheVerbAccepts() {
    for (const cw::cli::Verb& verb : cw::cli::allVerbs()) {
      const Run help = runCli({QString::fromStdString(verb.name), "--help"});
      const QString usage = QString::fromUtf8(help.out).section('\n', 0, 0);
      const QRegularExpressionMatch match = QRegularExpression("\\[--format ([a-z|]+)\\]").match(usage);
      QVERIFY2(match.hasMatch(), qPrintable(usage));
      QStringList listed = match.captured(1).split('|');
      QStringList accepted;
      for (cw::cli::Format f : verb.formats) accepted << QString::fromStdString(cw::cli::formatName(f));
      QCOMPARE(listed, accepted);
      for (const char* other : {"text", "json", "csv"})
        if (!accepted.contains(other)) {
          const Run refused = runCli({QString::fromStdString(verb.name), "--format", other});
          QCOMPARE(refused.status, 2);
          QVERIFY(refused.err.contains("--format: expected one of"));
        }
    }
  }

  // Error messages: numbers at the shortest round-trip form or 6 significant digits, never 17.
  void messagesPrintNumbersWithoutSeventeenDigits_data() {
    QTest::addColumn<QStringList>("set");
    QTest::newRow("turbine too weak") << QStringList{"turbine.isentropic_efficiency=0.3"};
    QTest::newRow("burner too cold") << QStringList{"burner.exit_temperature_K=500"};
    QTest::newRow("turbine cannot drive")
        << QStringList{"compressor.pressure_ratio=40", "burner.exit_temperature_K=900"};
    QTest::newRow("rich burner") << QStringList{"burner.exit_temperature_K=2900"};
  }
  void messagesPrintNumbersWithoutSeventeenDigits() {
    QFETCH(QStringList, set);
    QStringList arguments{"evaluate", kDemo};
    for (const QString& s : set) arguments << "--set" << s;
    const Run run = runCli(arguments);
    QVERIFY2(run.status == 2 || run.status == 3, run.err.constData());
    const QRegularExpression longNumber("\\d(\\.?\\d){12,}");  // 13 or more significant digits
    QVERIFY2(!longNumber.match(QString::fromUtf8(run.err)).hasMatch(), run.err.constData());
  }

  // Every failure a verb can raise ends in one line and a status: none escapes.
  void everyExceptionEndsInOneLineAndAStatus() {
    std::ostringstream err;
    QCOMPARE(cw::cli::reportFailure(std::make_exception_ptr(std::bad_alloc()), "evaluate", err), 1);
    QCOMPARE(err.str(), std::string("cyclewright-cli evaluate: out of memory\n"));
    err.str("");
    QCOMPARE(cw::cli::reportFailure(std::make_exception_ptr(std::length_error("vector")), "sweep", err), 1);
    QCOMPARE(err.str(), std::string("cyclewright-cli sweep: internal error: vector\n"));
    err.str("");
    QCOMPARE(cw::cli::reportFailure(std::make_exception_ptr(cw::InvalidInput("--mach", "two\nlines")), "flow",
                                    err),
             2);
    QCOMPARE(err.str(), std::string("cyclewright-cli flow: --mach: two; lines\n"));
    err.str("");
    QCOMPARE(
        cw::cli::reportFailure(std::make_exception_ptr(cw::NoSolution("turbine", "weak")), "evaluate", err),
        3);
    err.str("");
    QCOMPARE(cw::cli::reportFailure(std::make_exception_ptr(42), "evaluate", err), 1);
    QVERIFY(err.str().find("internal error") != std::string::npos);
  }
};

QTEST_GUILESS_MAIN(TestCliHostileInput)
#include "test_cli_hostile_input.moc"
