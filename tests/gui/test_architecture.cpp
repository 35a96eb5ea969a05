// The window follows the case's architecture: the strip and the forms come from the registry's
// sections of the architecture, in flow order; File › New offers each architecture; a version 1
// file says how it was read, and the window asks before saving over it as version 2.
#include "document/case_document.h"
#include "document/selection_router.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "tables/station_table_model.h"
#include "window_files.h"

#include "io/case_file.h"
#include "io/case_keys.h"

#include <QAbstractButton>
#include <QAction>
#include <QApplication>
#include <QFile>
#include <QLineEdit>
#include <QListWidget>
#include <QMenu>
#include <QMessageBox>
#include <QStatusBar>
#include <QTemporaryDir>
#include <QTimer>
#include <QUndoStack>
#include <QtTest/QtTest>

using cw::gui::MainWindow;
using cw::gui::Section;

namespace {

const QString kSource = QStringLiteral(CYCLEWRIGHT_SOURCE_DIR);

/// The strip's items by their stable keys, row by row.
QStringList stripKeys(const MainWindow& window) {
  auto* strip = window.findChild<QListWidget*>("componentStrip");
  QStringList keys;
  for (int row = 0; row < strip->count(); ++row) keys << strip->item(row)->data(Qt::UserRole).toString();
  return keys;
}

/// Clicks `answer` in the version question whenever it is shown; counts the questions.
class VersionBoxAnswerer : public QObject {
 public:
  VersionBoxAnswerer(MainWindow& window, QMessageBox::StandardButton answer) : QObject(&window) {
    auto* timer = new QTimer(this);
    timer->setInterval(20);
    connect(timer, &QTimer::timeout, this, [this, answer] {
      auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
      if (!box || !box->isVisible() || box->objectName() != "versionOneSaveBox") return;
      ++asked;
      text = box->text();
      box->button(answer)->click();
    });
    timer->start();
  }
  int asked = 0;
  QString text;
};

int versionOfFile(const QString& path) {
  return cw::io::caseDocumentVersion(cw::io::readCaseDocument(path.toStdString()));
}

}  // namespace

class TestArchitecture : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestArchitecture"); }

  void aTwoSpoolCaseShowsItsSectionsInFlowOrder() {
    MainWindow window;
    const QStringList single = stripKeys(window);
    QVERIFY(single.contains("compressor") && single.contains("turbine"));
    QVERIFY(!single.contains("lowPressureCompressor"));

    window.files().newCase(cw::engine::Architecture::TwoSpoolTurbojet);
    // Flow order: inlet, LPC, HPC, burner, HPT, LPT, jet pipe, afterburner, nozzle, after the
    // case's own inputs.
    QCOMPARE(stripKeys(window),
             (QStringList{"case", "flight", "design", "fuel", "gasModel", "inlet", "lowPressureCompressor",
                          "highPressureCompressor", "burner", "highPressureTurbine", "lowPressureTurbine",
                          "jetPipe", "afterburner", "nozzle"}));
    auto* strip = window.findChild<QListWidget*>("componentStrip");
    QCOMPARE(strip->item(6)->text().replace(QLatin1Char('\n'), QLatin1Char(' ')), QString("LP compressor"));
    QCOMPARE(strip->item(10)->text().replace(QLatin1Char('\n'), QLatin1Char(' ')), QString("LP turbine"));
    QVERIFY2(window.windowTitle().contains("Two-spool turbojet"), qPrintable(window.windowTitle()));
    // A new two-spool case keeps the overall pressure ratio of 10: 2.5 times 4 (case_inputs.h).
    const cw::engine::Case& fresh = window.document().currentCase();
    QCOMPARE(fresh.lowPressureCompressor.pressureRatio, 2.5);
    QCOMPARE(fresh.compressor.pressureRatio, 4.0);

    // Editing the LP compressor's ratio in its form changes the case, and only that.
    window.resize(1280, 800);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    strip->setCurrentRow(6);
    QCOMPARE(window.selection().current(), Section{"low_pressure_compressor"});
    auto* ratio = window.findChild<QLineEdit*>("lpc.pressureRatio");
    QVERIFY(ratio && ratio->isVisibleTo(&window));
    QVERIFY(!window.findChild<QLineEdit*>("compressor.pressureRatio")->isVisibleTo(&window));
    cw::test::typeInto(ratio, "3.2");
    window.document().commit();
    QCOMPARE(window.document().currentCase().lowPressureCompressor.pressureRatio, 3.2);
    QCOMPARE(window.document().currentCase().compressor.pressureRatio, 4.0);
    strip->setCurrentRow(7);
    auto* hp = window.findChild<QLineEdit*>("hpc.pressureRatio");
    QVERIFY(hp->isVisibleTo(&window));
    QCOMPARE(hp->text(), QString("4"));

    // Back to a single spool: the strip has its compressor and turbine again.
    window.document().undoStack()->setClean();
    window.files().newCase(cw::engine::Architecture::Turbojet);
    QCOMPARE(stripKeys(window), single);
    QVERIFY(window.windowTitle().contains("Turbojet"));
  }

  void aTwoSpoolCaseIsEvaluatedAndItsStationsListed() {
    MainWindow window;
    QVERIFY(window.openCase(kSource + "/resources/examples/two-spool-cruise.json"));
    QVERIFY(window.document().evaluation());
    const auto* model = window.stationModel();
    QStringList ids;
    for (int row = 0; row < model->rowCount(); ++row) ids << model->index(row, 0).data().toString();
    // SAE AS755: 25 and 45 where the spools split (no afterburner, so no 6).
    QCOMPARE(ids, (QStringList{"0", "2", "25", "3", "4", "45", "5", "7", "8", "9"}));
    // Selecting the HP turbine highlights its stations, 4 to 45.
    window.selection().select(Section{"high_pressure_turbine"});
    QCOMPARE(model->highlightedStations(), QSet<QString>({"4", "45"}));
  }

  void fileNewOffersEachArchitecture() {
    MainWindow window;
    auto* menu = window.findChild<QMenu*>("newMenu");
    QVERIFY(menu);
    QStringList names;
    for (QAction* action : menu->actions()) names << action->text();
    QCOMPARE(names, (QStringList{"Turbojet", "Two-spool turbojet"}));
    menu->actions().at(1)->trigger();
    QCOMPARE(window.document().currentCase().architecture, cw::engine::Architecture::TwoSpoolTurbojet);
  }

  void aVersionOneFileSaysHowItWasRead() {
    MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    const QString status = window.statusBar()->currentMessage();
    QVERIFY2(status.contains("read as a version 1 single-spool turbojet case"), qPrintable(status));
    QCOMPARE(window.files().fileVersion(), 1);
    // A version 2 file says its architecture instead.
    QVERIFY(window.openCase(kSource + "/resources/examples/two-spool-cruise.json"));
    QVERIFY2(window.statusBar()->currentMessage().contains("(Two-spool turbojet)"),
             qPrintable(window.statusBar()->currentMessage()));
    QCOMPARE(window.files().fileVersion(), 2);
  }

  void savingOverAVersionOneFileAsks() {
    QTemporaryDir folder;
    const QString path = folder.filePath("old.json");
    QVERIFY(QFile::copy(kSource + "/resources/demo/demo-turbojet.json", path));
    QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    MainWindow window;
    QVERIFY(window.openCase(path));
    {
      VersionBoxAnswerer cancel(window, QMessageBox::Cancel);
      QVERIFY(!window.files().save());
      QCOMPARE(cancel.asked, 1);
      QVERIFY2(cancel.text.contains("version 1 case file"), qPrintable(cancel.text));
      QCOMPARE(versionOfFile(path), 1);
    }
    {
      VersionBoxAnswerer save(window, QMessageBox::Save);
      QVERIFY(window.files().save());
      QCOMPARE(save.asked, 1);
      QCOMPARE(versionOfFile(path), 2);
      // Now a version 2 file: saved again without a question.
      QVERIFY(window.files().save());
      QCOMPARE(save.asked, 1);
    }
    // The case is the same, read from either version.
    QCOMPARE(cw::io::readCaseFile(path.toStdString()),
             cw::io::readCaseFile((kSource + "/resources/demo/demo-turbojet.json").toStdString()));
  }
};

QTEST_MAIN(TestArchitecture)
#include "test_architecture.moc"
