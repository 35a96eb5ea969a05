// The main window's layout holds: toolbar buttons keep their place whatever the undo text says.
#include "document/case_document.h"
#include "gui_test_support.h"
#include "main_window.h"

#include <QAction>
#include <QTest>
#include <QToolBar>
#include <QToolButton>
#include <QUndoStack>

namespace {

/// Each toolbar button's left edge and width, in toolbar order [px].
QList<QRect> buttonPlaces(QToolBar* bar) {
  QList<QRect> places;
  for (QAction* action : bar->actions())
    if (QWidget* button = bar->widgetForAction(action); button && !action->isSeparator())
      places << button->geometry();
  return places;
}

}  // namespace

class TestWindowLayout : public QObject {
  Q_OBJECT
 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestWindowLayout"); }

  void toolbarButtonsKeepTheirWidthAfterAnEdit() {
    cw::gui::MainWindow window;
    QVERIFY(window.openCase(":/demo/demo-turbojet.json"));
    window.resize(1280, 800);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    auto* bar = window.findChild<QToolBar*>("mainToolBar");
    QVERIFY(bar);
    const QList<QRect> before = buttonPlaces(bar);
    QCOMPARE(before.size(), 9);

    cw::engine::Case edited = window.document().currentCase();
    edited.compressor.pressureRatio = 9.5;
    window.document().applyEdit(-1, QStringLiteral("Change Pressure ratio pt3/pt2"), edited);
    QApplication::processEvents();

    auto* undo = window.findChild<QAction*>("undoAction");
    QVERIFY(undo->isEnabled());
    QVERIFY2(undo->text().contains("Change Pressure ratio pt3/pt2"), qPrintable(undo->text()));
    auto* undoButton = qobject_cast<QToolButton*>(bar->widgetForAction(undo));
    QCOMPARE(undoButton->text(), QString("Undo"));
    QVERIFY2(undo->toolTip().contains("Change Pressure ratio pt3/pt2"), qPrintable(undo->toolTip()));
    QCOMPARE(buttonPlaces(bar), before);

    window.document().undoStack()->undo();  // now Redo carries the text
    QApplication::processEvents();
    QCOMPARE(buttonPlaces(bar), before);
  }
};

QTEST_MAIN(TestWindowLayout)
#include "test_window_layout.moc"
