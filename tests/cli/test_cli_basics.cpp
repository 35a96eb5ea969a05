// cyclewright-cli: --version, --help, unknown verbs and exit statuses.
#include "arguments.h"
#include "common/error.h"
#include "common/number_text.h"
#include "common/version.h"
#include "verbs.h"

#include <QProcess>
#include <QTest>

#include <sstream>

class TestCliBasics : public QObject {
  Q_OBJECT
 private slots:
  void versionPrintsProjectVersion() {
    QProcess cli;
    cli.start(CYCLEWRIGHT_CLI_PATH, {"--version"});
    QVERIFY(cli.waitForFinished(10000));
    QCOMPARE(cli.exitCode(), 0);
    QCOMPARE(QString::fromUtf8(cli.readAllStandardOutput()).trimmed(),
             QString("cyclewright-cli %1").arg(cw::kVersion));
  }
  void helpListsUsageExitStatusesAndCaution() {
    QProcess cli;
    cli.start(CYCLEWRIGHT_CLI_PATH, {"--help"});
    QVERIFY(cli.waitForFinished(10000));
    QCOMPARE(cli.exitCode(), 0);
    const QString text = QString::fromUtf8(cli.readAllStandardOutput());
    QVERIFY(text.startsWith("Usage: cyclewright-cli VERB"));
    QVERIFY(text.contains("Exit status: 0 success, 1 internal error"));
    QVERIFY(text.contains("2 invalid input"));
    QVERIFY(text.contains("conceptual-design estimates"));
  }
  void unknownVerbExitsTwoWithOneLine() {
    std::ostringstream out, err;
    QCOMPARE(cw::cli::runCommandLine({"fly"}, out, err), 2);
    QCOMPARE(err.str(), std::string("cyclewright-cli: unknown verb \"fly\" (did you mean flow?) (see "
                                    "cyclewright-cli --help)\n"));
    QVERIFY(out.str().empty());
  }
  void argumentsAreStrict() {
    const std::vector<cw::cli::OptionSpec> specs = {{"mach", true, ""}, {"geometric", false, ""}};
    const cw::cli::Arguments args({"--mach", "0.8", "--geometric", "case.json"}, specs);
    QCOMPARE(args.number("mach"), 0.8);
    QVERIFY(args.has("geometric"));
    QCOMPARE(args.positional().size(), std::size_t(1));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, cw::cli::Arguments({"--speed", "1"}, specs));
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, cw::cli::Arguments({"--mach"}, specs));
    const cw::cli::Arguments bad({"--mach", "fast"}, specs);
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, bad.number("mach"));
    const cw::cli::Arguments inf({"--mach=inf"}, specs);
    QVERIFY_THROWS_EXCEPTION(cw::InvalidInput, inf.number("mach"));
  }
  // Typed numbers: the C locale, the whole text, and each way of being wrong told apart.
  void readNumberIgnoresLocaleAndTellsProblemsApart() {
    using cw::NumberTextProblem;
    QCOMPARE(cw::readNumber("1.5e3").value, 1500.0);
    QCOMPARE(cw::readNumber("+2").value, 2.0);
    QCOMPARE(cw::readNumber("-0.25").value, -0.25);
    for (const char* junk : {"1,5", "nan", "inf", "", " 1", "1 ", "0x10", "++1", "abc", "1e"})
      QVERIFY2(cw::readNumber(junk).problem == NumberTextProblem::NotANumber, junk);
    QVERIFY(cw::readNumber("1e400").problem == NumberTextProblem::TooLarge);
    QVERIFY(cw::readNumber("-1e400").problem == NumberTextProblem::TooLarge);
    QVERIFY(cw::readNumber("1e-400").problem == NumberTextProblem::TooSmall);
    QCOMPARE(cw::readNumber("4.9e-324").value, 4.9e-324);  // the smallest subnormal double (IEEE 754)
  }
};

QTEST_APPLESS_MAIN(TestCliBasics)
#include "test_cli_basics.moc"
