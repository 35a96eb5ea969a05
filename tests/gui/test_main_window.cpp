// The main window opens offscreen with its menus, the demo case and an About box
// carrying the caution; --screenshot writes a PNG of the requested size.
#include "application.h"
#include "gui_test_support.h"
#include "main_window.h"

#include <QApplication>
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
      QVERIFY(cw::gui::MainWindow::cautionText().contains("Konzeptentwurf"));
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
