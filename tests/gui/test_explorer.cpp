// The explorer end to end, offscreen: an edit of a loss redraws the charts, the station table
// and the summary with the numbers of cw::engine::evaluateCase on the same case; an invalid
// value marks its field and keeps the last result, marked stale; undo restores the case and the
// form; save and reopen give the same case; each export writes a file that reads back.
#include "charts/chart_export.h"
#include "charts/cycle_chart.h"
#include "charts/isobar_labels.h"
#include "charts/label_placer.h"
#include "document/case_document.h"
#include "document/selection_router.h"
#include "document/units.h"
#include "gui_test_support.h"
#include "main_window.h"
#include "tables/performance_model.h"
#include "tables/station_table_model.h"

#include "evaluation/evaluate.h"
#include "io/case_file.h"

#include <qwt_plot_curve.h>
#include <qwt_plot_marker.h>
#include <qwt_plot_zoomer.h>
#include <qwt_scale_map.h>
#include <qwt_series_data.h>
#include <qwt_text.h>

#include <QApplication>
#include <QFile>
#include <QJsonDocument>
#include <QJsonObject>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QSignalSpy>
#include <QSvgRenderer>
#include <QTemporaryDir>
#include <QTest>
#include <QUndoStack>

#include <algorithm>
#include <cmath>

using cw::gui::MainWindow;

using cw::test::typeInto;

namespace {

const QString kDemo = QStringLiteral(":/demo/demo-turbojet.json");

QVector<QPointF> samples(const QwtPlotCurve* curve) {
  QVector<QPointF> out;
  for (size_t i = 0; i < curve->dataSize(); ++i) out.append(curve->sample(i));
  return out;
}

int stationRow(const cw::gui::StationTableModel* model, const QString& id) {
  for (int r = 0; r < model->rowCount(); ++r)
    if (model->index(r, 0).data().toString() == id) return r;
  return -1;
}

}  // namespace

class TestExplorer : public QObject {
  Q_OBJECT

 private slots:
  void initTestCase() { cw::test::isolateGuiTest("CyclewrightTest"); }

  void editingALossRedrawsChartsTableAndSummary() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    QVERIFY(!window.document().isStale());
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    QVERIFY(field);
    const QVector<QPointF> before = samples(window.temperatureEntropyChart()->actualCurve());
    typeInto(field, "0.9");

    cw::engine::Case expected = cw::io::parseCase(cw::io::caseToJson(window.document().currentCase()));
    QCOMPARE(window.document().currentCase().compressor.efficiency.value, 0.9);
    expected.compressor.efficiency.value = 0.9;
    const cw::engine::Evaluation reference = cw::engine::evaluateCase(expected);
    QVERIFY(!window.document().isStale());
    QVERIFY(!window.staleBanner()->isVisible());

    // T-s chart: every state of the cycle with losses, in flow order (SI units on screen).
    const QVector<QPointF> after = samples(window.temperatureEntropyChart()->actualCurve());
    QVERIFY(after != before);
    QVector<QPointF> wanted;
    for (const auto& path : reference.actual.paths)
      if (!path.closure)
        for (const auto& s : path.states) wanted.append({s.entropy, s.temperature});
    QCOMPARE(after.size(), wanted.size());
    for (int i = 0; i < wanted.size(); ++i) {
      QVERIFY(std::fabs(after[i].x() - wanted[i].x()) <= 1e-9 * std::max(1.0, std::fabs(wanted[i].x())));
      QVERIFY(std::fabs(after[i].y() - wanted[i].y()) <= 1e-9 * wanted[i].y());
    }
    // p-v chart: pressure in kPa against v in m^3/kg.
    const QVector<QPointF> pv = samples(window.pressureVolumeChart()->actualCurve());
    QCOMPARE(pv.size(), wanted.size());
    const auto& first = reference.actual.paths.front().states.front();
    QCOMPARE(pv.front().y(), first.pressure / 1000.0);
    QCOMPARE(pv.front().x(), first.specificVolume);

    // Station table: Tt3 [K] and pt3 [kPa].
    auto* table = window.stationModel();
    const int row3 = stationRow(table, "3");
    QVERIFY(row3 >= 0);
    QCOMPARE(table->index(row3, cw::gui::StationTableModel::Tt)
                 .data(cw::gui::StationTableModel::ValueRole)
                 .toDouble(),
             reference.actual.station("3").totalTemperature);
    QCOMPARE(table->index(row3, cw::gui::StationTableModel::Pt)
                 .data(cw::gui::StationTableModel::ValueRole)
                 .toDouble(),
             reference.actual.station("3").totalPressure / 1000.0);
    // Summary: net thrust [N], TSFC [g/(kN s)] and their differences from the ideal twin.
    auto* summary = window.performanceModel();
    using P = cw::gui::PerformanceModel;
    QCOMPARE(summary->index(P::NetThrust, P::Actual).data(P::ValueRole).toDouble(),
             reference.actual.performance.netThrust);
    QCOMPARE(summary->index(P::NetThrust, P::Difference).data(P::ValueRole).toDouble(),
             reference.actual.performance.netThrust - reference.ideal.performance.netThrust);
    QVERIFY(std::fabs(summary->index(P::Tsfc, P::Actual).data(P::ValueRole).toDouble() -
                      reference.actual.performance.thrustSpecificFuelConsumption * 1e6) < 1e-9);
    // One field, one undoable step (the key clicks merged).
    QCOMPARE(window.document().undoStack()->count(), 1);
  }

  void invalidValueMarksFieldAndKeepsLastResult() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.show();
    auto* field = window.findChild<QLineEdit*>("compressor.efficiency");
    const auto shown = window.document().evaluation();
    const QVector<QPointF> before = samples(window.temperatureEntropyChart()->actualCurve());
    const QVariant netThrust =
        window.performanceModel()->index(0, 1).data(cw::gui::PerformanceModel::ValueRole);
    typeInto(field, "0");  // outside (0, 1]

    QVERIFY(window.document().isStale());
    QVERIFY(field->property("invalid").toBool());
    auto* error = window.findChild<QLabel*>("compressor.efficiency.error");
    QVERIFY(error && error->isVisible());
    QVERIFY2(error->text().contains("(0, 1]"), qPrintable(error->text()));    // the core's valid range
    QVERIFY(field->toolTip().contains("/compressor/isentropic_efficiency"));  // the core's own message
    QVERIFY(window.staleBanner()->isVisible());
    QVERIFY(window.staleBanner()->text().contains("Compressor"));
    QVERIFY(window.temperatureEntropyChart()->isStale());
    QVERIFY(window.pressureVolumeChart()->isStale());
    QCOMPARE(window.document().evaluation(), shown);
    QCOMPARE(samples(window.temperatureEntropyChart()->actualCurve()), before);
    QCOMPARE(window.performanceModel()->index(0, 1).data(cw::gui::PerformanceModel::ValueRole), netThrust);

    // Text that is no number: marked too, result still the last valid one.
    typeInto(field, "abc");
    QVERIFY(field->property("invalid").toBool());
    QVERIFY(error->text().contains("not a number"));
    QCOMPARE(window.document().evaluation(), shown);

    // A valid value again clears the marks and the stale state.
    typeInto(field, "0.86");
    QVERIFY(!window.document().isStale());
    QVERIFY(!field->property("invalid").toBool());
    QVERIFY(!error->isVisible());
    QVERIFY(!window.staleBanner()->isVisible());
    QVERIFY(samples(window.temperatureEntropyChart()->actualCurve()) != before);
  }

  void undoRestoresCaseAndForm() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    const cw::engine::Case original = window.document().currentCase();
    auto* ratio = window.findChild<QLineEdit*>("compressor.pressureRatio");
    auto* tt4 = window.findChild<QLineEdit*>("burner.exitTemperature");
    typeInto(ratio, "12.5");
    typeInto(tt4, "1400");
    QCOMPARE(window.document().undoStack()->count(), 2);
    QVERIFY(window.document().isModified());
    window.document().undoStack()->undo();
    QCOMPARE(tt4->text(), QString("1350"));
    QCOMPARE(window.document().currentCase().compressor.pressureRatio, 12.5);
    window.document().undoStack()->undo();
    QVERIFY(window.document().currentCase() == original);
    QCOMPARE(ratio->text(), QString("8"));
    QVERIFY(!window.document().isModified());
    window.document().undoStack()->redo();
    QCOMPARE(ratio->text(), QString("12.5"));
    // Loading a file records nothing.
    QVERIFY(window.openCase(kDemo));
    QCOMPARE(window.document().undoStack()->count(), 0);
  }

  void saveAndReopenGiveTheSameCase() {
    QTemporaryDir dir;
    const QString path = dir.filePath("saved.json");
    cw::engine::Case edited;
    {
      MainWindow window;
      QVERIFY(window.openCase(kDemo));
      typeInto(window.findChild<QLineEdit*>("turbine.efficiency"), "0.905");
      typeInto(window.findChild<QLineEdit*>("flight.mach"), "0.75");
      QVERIFY(window.document().isModified());
      QVERIFY(window.saveCaseAs(path));
      QVERIFY(!window.document().isModified());
      QCOMPARE(window.casePath(), path);
      edited = window.document().currentCase();
    }
    MainWindow reopened;
    QVERIFY(reopened.openCase(path));
    QVERIFY(reopened.document().currentCase() == edited);
    QCOMPARE(reopened.findChild<QLineEdit*>("turbine.efficiency")->text(), QString("0.905"));
  }

  void exportsReadBack() {
    QTemporaryDir dir;
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1400, 900);
    window.show();
    const auto evaluation = window.document().evaluation();

    // CSV: the core's station table, caution first.
    const QString csv = dir.filePath("stations.csv");
    QVERIFY(window.exportStationCsv(csv));
    QFile csvFile(csv);
    QVERIFY(csvFile.open(QIODevice::ReadOnly));
    const QStringList lines = QString::fromUtf8(csvFile.readAll()).split('\n', Qt::SkipEmptyParts);
    QVERIFY(lines.first().startsWith("# ") && lines.first().contains("conceptual-design estimates"));
    QVERIFY(lines.at(1).startsWith("id,Tt_K,pt_Pa"));
    QCOMPARE(lines.size(), 2 + static_cast<int>(evaluation->actual.stations.size()));
    QCOMPARE(lines.at(2).split(',').first(), QString("0"));

    // JSON: the core's evaluation with its caution.
    const QString json = dir.filePath("results.json");
    QVERIFY(window.exportResultJson(json));
    QFile jsonFile(json);
    QVERIFY(jsonFile.open(QIODevice::ReadOnly));
    const QJsonDocument document = QJsonDocument::fromJson(jsonFile.readAll());
    QVERIFY(document.isObject());
    QVERIFY(document.object().value("caution").toString().contains("conceptual-design estimates"));
    QCOMPARE(document.object().value("performance").toObject().value("net_thrust_N").toDouble(),
             evaluation->actual.performance.netThrust);

    // SVG, PDF and PNG of each chart.
    for (cw::gui::CycleChart* chart : {window.temperatureEntropyChart(), window.pressureVolumeChart()}) {
      const QString svg = dir.filePath(chart->objectName() + ".svg");
      QVERIFY(cw::gui::exportChartDocument(chart, svg, "svg", QSizeF(180, 120)));
      QSvgRenderer renderer(svg);
      QVERIFY(renderer.isValid());
      const QString pdf = dir.filePath(chart->objectName() + ".pdf");
      QVERIFY(cw::gui::exportChartDocument(chart, pdf, "pdf", QSizeF(180, 120)));
      QFile pdfFile(pdf);
      QVERIFY(pdfFile.open(QIODevice::ReadOnly));
      QCOMPARE(pdfFile.read(5), QByteArray("%PDF-"));
      const QString png = dir.filePath(chart->objectName() + ".png");
      QVERIFY(cw::gui::exportChartPng(chart, png, QSize(1234, 777), 150));
      const QImage image(png);
      QCOMPARE(image.size(), QSize(1234, 777));
      QCOMPARE(image.dotsPerMeterX(), qRound(150 / 0.0254));
      // The caution footer is only there during the export.
      QVERIFY(chart->footer().isEmpty());
    }
    // The SVG carries the caution.
    QFile svgFile(dir.filePath("temperatureEntropyChart.svg"));
    QVERIFY(svgFile.open(QIODevice::ReadOnly));
    QVERIFY(svgFile.readAll().contains("conceptual-design"));

    // Tab-separated copy: caution, header with units, one line per station.
    const QString tsv = window.stationModel()->toTabSeparated();
    const QStringList rows = tsv.split('\n', Qt::SkipEmptyParts);
    QVERIFY(rows.first().contains("conceptual-design estimates"));
    QVERIFY(rows.at(2).contains("Tt [K]\tpt [kPa]"));
    QCOMPARE(rows.size(), 3 + static_cast<int>(evaluation->actual.stations.size()));
  }

  void selectionHighlightsPathAndStations() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.selection().select(cw::gui::Section::Turbine);
    QCOMPARE(window.temperatureEntropyChart()->highlightedComponent(), std::string("turbine"));
    QCOMPARE(window.pressureVolumeChart()->highlightedComponent(), std::string("turbine"));
    QVERIFY(window.temperatureEntropyChart()->highlightCurve()->dataSize() > 0);
    QCOMPARE(window.stationModel()->highlightedStations(), QSet<QString>({"4", "5"}));
    QVERIFY(window.findChild<QWidget*>("turbineForm")->isVisibleTo(window.findChild<QWidget*>("formStack")));
    window.selection().select(cw::gui::Section::Nozzle);
    QCOMPARE(window.stationModel()->highlightedStations(), QSet<QString>({"7", "8", "9"}));
    // The flight condition is the free stream's state, the design's sizing the engine face's
    // (SAE AS755: 0 free stream, 2 engine face).
    window.selection().select(cw::gui::Section::Flight);
    QCOMPARE(window.stationModel()->highlightedStations(), QSet<QString>({"0"}));
    window.selection().select(cw::gui::Section::Design);
    QCOMPARE(window.stationModel()->highlightedStations(), QSet<QString>({"2"}));
  }

  void readoutShowsStateWithUnits() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.resize(1400, 900);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    auto* chart = window.temperatureEntropyChart();
    const QPointF p3 = chart->actualCurve()->sample(chart->actualCurve()->dataSize() / 3);
    const QPoint pixel(qRound(chart->canvasMap(QwtAxis::XBottom).transform(p3.x())),
                       qRound(chart->canvasMap(QwtAxis::YLeft).transform(p3.y())));
    const QString text = chart->readoutAt(pixel);
    QVERIFY2(text.contains("T = ") && text.contains(" K") && text.contains("kPa") && text.contains("m³/kg"),
             qPrintable(text));
  }

  void usCustomaryUnitsForDisplayAndEntry() {
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    window.setUnitSystem(cw::gui::UnitSystem::USCustomary);
    auto* tt4 = window.findChild<QLineEdit*>("burner.exitTemperature");
    QCOMPARE(tt4->text(), QString("2430"));  // 1350 K x 1.8
    typeInto(tt4, "2520");
    QCOMPARE(std::get<cw::engine::ExitTemperatureSetting>(window.document().currentCase().burner.setting)
                 .exitTemperature,
             1400.0);
    using P = cw::gui::PerformanceModel;
    const double lbf =
        window.performanceModel()->index(P::NetThrust, P::Actual).data(P::ValueRole).toDouble();
    QVERIFY(std::fabs(lbf * 4.4482216152605 - window.document().evaluation()->actual.performance.netThrust) <
            1e-6);
    QVERIFY(window.stationModel()->headerData(1, Qt::Horizontal).toString().contains("°R"));
    window.setUnitSystem(cw::gui::UnitSystem::SI);
  }

  void isobarLabelsDoNotOverlap() {
    // Stations 5 to 8 of the afterburning example have pressures within 10 % of each other.
    MainWindow window;
    QVERIFY(window.openCase(QStringLiteral(CYCLEWRIGHT_SOURCE_DIR) +
                            "/resources/examples/supersonic-afterburning-two-gamma.json"));
    window.resize(1400, 900);
    window.show();
    QVERIFY(QTest::qWaitForWindowExposed(&window));
    const int stations = static_cast<int>(window.document().evaluation()->actual.stations.size());
    for (cw::gui::CycleChart* chart : {window.temperatureEntropyChart(), window.pressureVolumeChart()}) {
      const QString name = chart->objectName();
      chart->grab();  // one paint places the labels for this size
      const cw::gui::IsobarLabels* labels = chart->isobarLabels();
      const auto& placed = labels->placedRects();
      // Every isobar is drawn and has a label to place; crowded ones moved or left out.
      QVERIFY(labels->labelCount() >= 7);
      QVERIFY2(labels->movedCount() + labels->skippedCount() > 0, qPrintable(name));
      QCOMPARE(static_cast<int>(placed.size()) + labels->skippedCount(), labels->labelCount());
      // Seven isobars, four of them in two pairs within 3 % of each other (p3/p4, p5-p8): at least
      // three labels fit (since the two-gamma hot section is joined to the air's entropy scale, the
      // hot isobars crowd closer to the compressor's).
      QVERIFY2(placed.size() >= 3, qPrintable(name + QString(": %1 placed, %2 moved, %3 skipped of %4")
                                                         .arg(placed.size())
                                                         .arg(labels->movedCount())
                                                         .arg(labels->skippedCount())
                                                         .arg(labels->labelCount())));
      if (chart->kind() == cw::gui::ChartKind::TemperatureEntropy)
        QCOMPARE(chart->isobarCount(), labels->labelCount());
      else
        QCOMPARE(static_cast<int>(std::count_if(
                     chart->markers().begin(), chart->markers().end(),
                     [](const QwtPlotMarker* m) { return m->lineStyle() == QwtPlotMarker::HLine; })),
                 labels->labelCount());
      QVERIFY(labels->labelCount() <= stations);
      const QRectF canvas = chart->canvas()->contentsRect();
      for (std::size_t i = 0; i < placed.size(); ++i) {
        QVERIFY2(canvas.contains(placed[i]), qPrintable(name));
        for (std::size_t j = i + 1; j < placed.size(); ++j)
          QVERIFY2(!placed[i].intersects(placed[j]),
                   qPrintable(name + QString(": labels %1 and %2").arg(i).arg(j)));
        for (const QRectF& obstacle : labels->obstacleRects())
          QVERIFY2(!placed[i].intersects(obstacle),
                   qPrintable(name + ": a label covers a station or the legend"));
      }
    }
    // Zooming in on the crowded stations makes room: more of their labels are shown.
    cw::gui::CycleChart* ts = window.temperatureEntropyChart();
    auto crowdedShown = [ts] {
      ts->grab();
      int n = 0;
      for (const QString& text : ts->isobarLabels()->placedTexts())
        for (const char* station : {"p5 ", "p6 ", "p7 ", "p8 "}) n += text.startsWith(station) ? 1 : 0;
      return n;
    };
    const int before = crowdedShown();
    QVERIFY(before < 4);  // they do not all fit at this size
    const auto& s7 = window.document().evaluation()->actual.station("7");
    ts->zoomer()->zoom(
        QRectF(QPointF(s7.entropy - 150.0, s7.totalTemperature - 300.0), QSizeF(300.0, 400.0)));
    const int after = crowdedShown();
    QVERIFY2(after > before,
             qPrintable(QString("%1 labels of p5 to p8 before zooming, %2 after").arg(before).arg(after)));
    for (std::size_t i = 0; i < ts->isobarLabels()->placedRects().size(); ++i)
      for (std::size_t j = i + 1; j < ts->isobarLabels()->placedRects().size(); ++j)
        QVERIFY(!ts->isobarLabels()->placedRects()[i].intersects(ts->isobarLabels()->placedRects()[j]));
  }

  void placeLabelsPicksTheFirstFreeCandidate() {
    const QRectF bounds(0, 0, 100, 100);
    const QRectF a(10, 10, 30, 10), b(20, 15, 30, 10), b2(20, 40, 30, 10), outside(90, 90, 30, 10);
    const std::vector<int> chosen =
        cw::gui::placeLabels({{a}, {b, b2}, {outside}, {b2, a}}, {QRectF(60, 60, 10, 10)}, bounds);
    QCOMPARE(chosen, (std::vector<int>{0, 1, -1, -1}));
    // An obstacle blocks its place too.
    QCOMPARE(cw::gui::placeLabels({{a, b2}}, {QRectF(0, 0, 15, 15)}, bounds), std::vector<int>{1});
  }

  void titleAndNotesAreEditableUndoableAndSaved() {
    QTemporaryDir dir;
    const QString path = dir.filePath("described.json");
    MainWindow window;
    QVERIFY(window.openCase(kDemo));
    const cw::engine::Case original = window.document().currentCase();
    QVERIFY(!original.notes.empty());  // so that undo has something to restore
    window.selection().select(cw::gui::Section::Case);
    auto* form = window.findChild<QWidget*>("caseForm");
    QVERIFY(form && form->isVisibleTo(window.findChild<QWidget*>("formStack")));
    auto* title = window.findChild<QLineEdit*>("case.title");
    auto* notes = window.findChild<QPlainTextEdit*>("case.notes");
    QVERIFY(title && notes);
    QCOMPARE(title->text(), QString::fromStdString(original.title));
    QCOMPARE(notes->toPlainText(), QString::fromStdString(original.notes));

    typeInto(title, "Hot day, 35 °C");
    notes->setFocus();
    notes->selectAll();
    QTest::keyClicks(notes, "First line");
    QTest::keyClick(notes, Qt::Key_Return);
    QTest::keyClicks(notes, "Second line");
    QCOMPARE(window.document().currentCase().title, std::string("Hot day, 35 °C"));
    QCOMPARE(window.document().currentCase().notes, std::string("First line\nSecond line"));
    QCOMPARE(window.document().undoStack()->count(), 2);  // one step per field, keystrokes merged
    QVERIFY(window.document().isModified());
    QVERIFY(!window.document().isStale());  // a description is no physics input

    // Saved to the file and read back equal.
    QVERIFY(window.saveCaseAs(path));
    const cw::engine::Case edited = window.document().currentCase();
    QVERIFY(cw::io::readCaseFile(path.toStdString()) == edited);
    {
      MainWindow reopened;
      QVERIFY(reopened.openCase(path));
      QVERIFY(reopened.document().currentCase() == edited);
      QCOMPARE(reopened.findChild<QLineEdit*>("case.title")->text(), QString("Hot day, 35 °C"));
      QCOMPARE(reopened.findChild<QPlainTextEdit*>("case.notes")->toPlainText(),
               QString("First line\nSecond line"));
    }

    // Undo: the notes first, then the title; form and case back to the original.
    window.document().undoStack()->undo();
    QCOMPARE(window.document().currentCase().notes, original.notes);
    QCOMPARE(notes->toPlainText(), QString::fromStdString(original.notes));
    QCOMPARE(window.document().currentCase().title, std::string("Hot day, 35 °C"));
    window.document().undoStack()->undo();
    QVERIFY(window.document().currentCase() == original);
    QCOMPARE(title->text(), QString::fromStdString(original.title));
    window.document().undoStack()->redo();
    QCOMPARE(title->text(), QString("Hot day, 35 °C"));
  }
};

QTEST_MAIN(TestExplorer)
#include "test_explorer.moc"
