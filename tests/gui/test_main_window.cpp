// The main window opens offscreen with its menus, the demo case and an About box
// carrying the caution; --screenshot writes a PNG of the requested size; a case that cannot be
// opened says why in a dialog and leaves the open case.
#include "document/case_document.h"
#include "document/caution.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "startup/application.h"

#include <QApplication>
#include <QFile>
#include <QImage>
#include <QMenu>
#include <QMenuBar>
#include <QMessageBox>
#include <QProcess>
#include <QTemporaryDir>
#include <QTest>
#include <QTimer>
#include <QTranslator>

class TestMainWindow : public QObject {
  Q_OBJECT
 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestMainWindow"); }

  void hasFileAndHelpMenus() {
    cw::gui::MainWindow window;
    QVERIFY(window.menuBar()->findChild<QMenu*>("fileMenu") != nullptr);
    QVERIFY(window.menuBar()->findChild<QMenu*>("helpMenu") != nullptr);
    QVERIFY(window.findChild<QAction*>("aboutAction") != nullptr);
  }
  void opensTheDemoCase() {
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    QCOMPARE(window.casePath(), QString(":/demo/demo-turbojet.json"));
    QVERIFY(window.windowTitle().startsWith("demo-turbojet.json"));
  }
  void rejectsAFileThatIsNotACase() {
    cw::gui::MainWindow window;
    QVERIFY(!window.openCase(":/no/such/file.json"));
    QVERIFY(window.casePath().isEmpty());
  }
  void aboutBoxCarriesTheCaution() {
    cw::gui::MainWindow window;
    QString informative;
    QTimer::singleShot(0, [&] {
      auto* box = window.findChild<QMessageBox*>("aboutBox");
      QVERIFY(box);
      informative = box->informativeText();
      box->accept();
    });
    window.showAbout();
    QVERIFY(informative.contains("conceptual-design estimates"));
    QVERIFY(informative.contains("engine manufacturer's data"));
  }
  void aCaseThatCannotBeOpenedSaysWhyAndKeepsTheOpenCase_data() {
    QTest::addColumn<QByteArray>("contents");  // empty: no file
    QTest::addColumn<QString>("expected");     // the core reader's message
    QTest::newRow("missing") << QByteArray() << "cannot read case file: No such file or directory";
    QTest::newRow("not JSON") << QByteArray("[1, 2") << "not valid JSON";
    // [1, 60]: the core's range of the compressor pressure ratio (core/engine/case_validation.cpp).
    QTest::newRow("invalid value")  // the demo with a pressure ratio of 0.5
        << QByteArray("demo") << "/compressor/pressure_ratio = 0.5 is outside the valid range [1, 60]";
  }
  void aCaseThatCannotBeOpenedSaysWhyAndKeepsTheOpenCase() {
    QFETCH(QByteArray, contents);
    QFETCH(QString, expected);
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    QTemporaryDir dir;
    const QString path = dir.filePath("case.json");
    if (contents == "demo") {
      QFile demo(":/demo/demo-turbojet.json");
      QVERIFY(demo.open(QIODevice::ReadOnly));
      contents = demo.readAll().replace("\"pressure_ratio\": 8.0", "\"pressure_ratio\": 0.5");
      QVERIFY(contents.contains("\"pressure_ratio\": 0.5"));
    }
    if (!contents.isEmpty()) {
      QFile file(path);
      QVERIFY(file.open(QIODevice::WriteOnly));
      file.write(contents);
    }
    const cw::engine::Case demo = window.document().currentCase();
    window.show();
    QString title, text;
    QTimer::singleShot(0, [&] {
      auto* box = window.findChild<QMessageBox*>("openFailedBox");
      if (!box) {  // no such dialog: close whatever is modal, so that the test fails instead of waiting
        if (QWidget* modal = QApplication::activeModalWidget()) modal->close();
        return;
      }
      title = box->windowTitle();
      text = box->text();
      box->accept();
    });
    QVERIFY(!window.openCase(path));
    QCOMPARE(title, QString("Cannot open case"));
    QVERIFY2(text.contains(path) && text.contains(expected), qPrintable(text));
    // The open case is kept: the demo, its file and its title.
    QVERIFY(window.document().currentCase() == demo);
    QCOMPARE(window.casePath(), QString(":/demo/demo-turbojet.json"));
    QVERIFY(window.windowTitle().startsWith("demo-turbojet.json"));
    QVERIFY(!window.document().isModified());
  }
  void screenshotWritesPngOfStatedSize() {
    const cw::test::IsolatedHome home;
    const QString file = home.path("window.png");
    QProcess app;
    home.start(app, CYCLEWRIGHT_GUI_PATH, {"--screenshot", file, "--size", "1024x700"});
    QVERIFY(app.waitForFinished(30000));
    QCOMPARE(app.exitCode(), 0);
    const QImage image(file);
    QVERIFY(!image.isNull());
    QCOMPARE(image.size(), QSize(1024, 700));
  }
  void paletteOptionRendersDark() {
    const cw::test::IsolatedHome home;
    const QString file = home.path("dark.png");
    QProcess app;
    home.start(app, CYCLEWRIGHT_GUI_PATH, {"--palette", "dark", "--screenshot", file, "--size", "800x600"});
    QVERIFY(app.waitForFinished(30000));
    QCOMPARE(app.exitCode(), 0);
    const QImage image(file);
    QCOMPARE(image.size(), QSize(800, 600));
    // Mostly dark: the window (#202124) and the canvases (#2b2b2b) cover most of the picture.
    int dark = 0;
    for (int y = 0; y < image.height(); y += 4)
      for (int x = 0; x < image.width(); x += 4) dark += image.pixelColor(x, y).lightness() < 64 ? 1 : 0;
    QVERIFY2(dark > (image.width() / 4) * (image.height() / 4) * 6 / 10, qPrintable(QString::number(dark)));
    QCOMPARE(image.pixelColor(700, 592), QColor("#202124"));  // the status bar's background
    QProcess wrong;
    home.start(wrong, CYCLEWRIGHT_GUI_PATH, {"--palette", "purple", "--screenshot", file});
    QVERIFY(wrong.waitForFinished(30000));
    QCOMPARE(wrong.exitCode(), 2);
    QVERIFY(QString::fromUtf8(wrong.readAllStandardError()).contains("--palette"));
  }
  void germanTranslationIsPickedByLanguage() {
    auto* app = qobject_cast<QApplication*>(QCoreApplication::instance());
    QCOMPARE(cw::gui::installTranslation(*app, "de"), QString("de_DE"));
    {
      cw::gui::MainWindow window;
      QCOMPARE(window.menuBar()->findChild<QMenu*>("fileMenu")->title(), QString("&Datei"));
      QVERIFY(cw::gui::cautionText().contains("Konzeptentwurf"));
    }
    for (auto* translator : app->findChildren<QTranslator*>()) QCoreApplication::removeTranslator(translator);
    cw::gui::MainWindow english;
    QCOMPARE(english.menuBar()->findChild<QMenu*>("fileMenu")->title(), QString("&File"));
  }
  void versionOption() {
    const cw::test::IsolatedHome home;
    QProcess app;
    home.start(app, CYCLEWRIGHT_GUI_PATH, {"--version"});
    QVERIFY(app.waitForFinished(30000));
    QCOMPARE(app.exitCode(), 0);
    QVERIFY(QString::fromUtf8(app.readAllStandardOutput()).contains("Cyclewright 0."));
  }
};

QTEST_MAIN(TestMainWindow)
#include "test_main_window.moc"
