// One evaluation pipeline per edit, in the document: the case is evaluated and audited by
// CaseDocument (the audit on a worker thread when it is slow, applied only when it is still
// current); the audit panel shows the document's audit and keeps no copy; only the visible form
// rewrites its widgets on an edit.
#include "audit/audit_chart.h"
#include "audit/audit_panel.h"
#include "charts/chart_export.h"
#include "document/case_auditor.h"
#include "document/case_document.h"
#include "document/selection_router.h"
#include "forms/case_form.h"
#include "gui_test_support.h"
#include "main_window.h"

#include "analysis/loss_audit.h"
#include "io/case_file.h"

#include <QFile>
#include <QLineEdit>
#include <QScopeGuard>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QUndoStack>

using cw::gui::CaseAuditor;
using cw::gui::CaseDocument;
using cw::gui::MainWindow;

using cw::test::demoCase;

namespace {}  // namespace

class TestEvaluationPipeline : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTestPipeline"); }

  void theAuditOnAWorkerAppliesOnlyTheNewestEdit() {
    MainWindow window;  // the resources (the demo case)
    CaseDocument document;
    document.auditor().setThreading(CaseAuditor::Threading::Worker);
    document.load(demoCase(), QString());
    QSignalSpy changed(&document, &CaseDocument::auditChanged);
    QVERIFY(changed.wait(10000));
    QVERIFY(!document.isAuditStale());
    changed.clear();

    // Three edits before the event loop runs: the first audit starts, the second is queued and
    // then replaced by the third; the first one's result is dropped when it arrives.
    cw::engine::Case edited = document.currentCase();
    for (double eta : {0.80, 0.82, 0.86}) {
      edited.compressor.efficiency.value = eta;
      document.applyEdit(-1, QStringLiteral("edit"), edited);
    }
    QVERIFY(document.auditor().isPending());
    QVERIFY(document.isAuditStale());
    QVERIFY(changed.wait(10000));
    QCOMPARE(changed.count(), 1);
    QVERIFY(!document.auditor().isPending());
    QVERIFY(!document.isAuditStale());
    QCOMPARE(document.auditor().auditedEvaluation(), document.evaluation());
    const cw::analysis::LossAudit reference = cw::analysis::auditCase(edited);
    QCOMPARE(document.audit()->actual.specificThrust, reference.actual.specificThrust);
    QCOMPARE(document.audit()->actual.thrustSpecificFuelConsumption,
             reference.actual.thrustSpecificFuelConsumption);
  }

  void theAdaptiveRuleFollowsTheLastAudit() {
    // The application's auditors are adaptive: the first audit on the GUI thread, later ones on
    // a worker once an audit took longer than a frame. Checked against the auditor's own
    // measurement, so that the test does not depend on the machine's speed.
    QCOMPARE(CaseAuditor::defaultThreading(), CaseAuditor::Threading::GuiThread);  // these suites
    CaseAuditor::setDefaultThreading(CaseAuditor::Threading::Adaptive);
    const auto restore =
        qScopeGuard([] { CaseAuditor::setDefaultThreading(CaseAuditor::Threading::GuiThread); });
    CaseDocument document;
    QCOMPARE(document.auditor().threading(), CaseAuditor::Threading::Adaptive);
    QVERIFY(document.audit());  // the first audit ran on the GUI thread: applied at once
    QVERIFY(!document.isAuditStale());
    QVERIFY(document.auditor().lastMilliseconds() > 0.0);
    QCOMPARE(document.auditor().runsOnWorker(),
             document.auditor().lastMilliseconds() > CaseAuditor::kFrameMilliseconds);
  }

  void thePanelShowsTheDocumentsAudit() {
    MainWindow window;
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    QCOMPARE(window.auditPanel()->audit(), window.document().audit());
    cw::engine::Case edited = window.document().currentCase();
    edited.turbine.efficiency.value = 0.9;
    window.document().applyEdit(-1, QStringLiteral("edit"), edited);
    QCOMPARE(window.auditPanel()->audit(), window.document().audit());
    QCOMPARE(window.auditPanel()->chart()->bars().back().to,
             cw::analysis::auditCase(edited).actual.specificThrust);
    // The order is the document's too.
    window.auditPanel()->setOrder({QStringLiteral("turbine_efficiency")});
    QCOMPARE(window.document().auditOrder(), QStringList{QStringLiteral("turbine_efficiency")});
    QCOMPARE(window.auditPanel()->audit(), window.document().audit());
    QCOMPARE(window.auditPanel()->chart()->bars()[1].loss, std::string("turbine_efficiency"));
    // The names under the bars follow the order (the scale's label cache is renewed): in the
    // drawing, the turbine's name now comes before the inlet's.
    QTemporaryDir dir;
    const QString svg = dir.filePath("audit.svg");
    QVERIFY(cw::gui::exportChartDocument(window.auditPanel()->chart(), svg, "svg", QSizeF(180.0, 120.0)));
    QFile file(svg);
    QVERIFY(file.open(QIODevice::ReadOnly));
    const QByteArray drawing = file.readAll();
    const qsizetype turbine = drawing.indexOf(">Turbine<"), inlet = drawing.indexOf(">Inlet<");
    QVERIFY(turbine >= 0 && inlet >= 0);
    QVERIFY(turbine < inlet);
  }

  void onlyTheVisibleFormRefreshes() {
    MainWindow window;
    QVERIFY(window.openCase(QStringLiteral(":/demo/demo-turbojet.json")));
    window.show();
    window.selection().select(cw::gui::Section::Compressor);
    auto* flight = window.findChild<cw::gui::CaseForm*>("flightForm");
    auto* compressor = window.findChild<cw::gui::CaseForm*>("compressorForm");
    QVERIFY(flight && compressor);
    auto* altitude = window.findChild<QLineEdit*>("flight.altitude");
    QCOMPARE(altitude->text(), QStringLiteral("6000"));
    cw::engine::Case edited = window.document().currentCase();
    edited.compressor.pressureRatio = 9.0;
    std::get<cw::engine::StandardAtmosphereAmbient>(edited.flight.ambient).altitude = 7000.0;
    window.document().applyEdit(-1, QStringLiteral("edit"), edited, CaseDocument::Commit::Later);  // typed
    QVERIFY(flight->isBehind());
    QVERIFY(!compressor->isBehind());
    QCOMPARE(window.findChild<QLineEdit*>("compressor.pressureRatio")->text(), QStringLiteral("9"));
    QCOMPARE(altitude->text(), QStringLiteral("6000"));  // hidden: not rewritten yet
    // Shown, the flight form catches up.
    window.selection().select(cw::gui::Section::Flight);
    QVERIFY(!flight->isBehind());
    QCOMPARE(altitude->text(), QStringLiteral("7000"));
    // Undo is no typing: every form follows at once.
    window.selection().select(cw::gui::Section::Compressor);
    window.document().undoStack()->undo();
    QVERIFY(!flight->isBehind());
    QCOMPARE(altitude->text(), QStringLiteral("6000"));
  }
};

QTEST_MAIN(TestEvaluationPipeline)
#include "test_evaluation_pipeline.moc"
