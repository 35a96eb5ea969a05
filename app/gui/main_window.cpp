#include "main_window.h"

#include "common/version.h"

#include <QAction>
#include <QApplication>
#include <QFile>
#include <QFileInfo>
#include <QJsonDocument>
#include <QJsonObject>
#include <QKeySequence>
#include <QMenuBar>
#include <QMessageBox>
#include <QStatusBar>

#include <qwt_plot.h>
#include <qwt_plot_grid.h>
#include <qwt_text.h>

// The resources live in a static library; register them once before first use.
static void initialiseResources() { Q_INIT_RESOURCE(resources); }

namespace cw::gui {

MainWindow::MainWindow(QWidget* parent) : QMainWindow(parent) {
  initialiseResources();
  setObjectName("mainWindow");
  setWindowTitle(tr("Cyclewright"));
  createMenus();
  temperatureEntropyChart_ = createTemperatureEntropyChart();
  setCentralWidget(temperatureEntropyChart_);
  statusBar()->showMessage(tr("Ready"));
}

void MainWindow::createMenus() {
  QMenu* fileMenu = menuBar()->addMenu(tr("&File"));
  fileMenu->setObjectName("fileMenu");
  QAction* quit = fileMenu->addAction(tr("&Quit"), qApp, &QApplication::closeAllWindows);
  quit->setShortcut(QKeySequence::Quit);
  quit->setObjectName("quitAction");

  QMenu* helpMenu = menuBar()->addMenu(tr("&Help"));
  helpMenu->setObjectName("helpMenu");
  QAction* about = helpMenu->addAction(tr("&About Cyclewright"), this, &MainWindow::showAbout);
  about->setObjectName("aboutAction");
}

QwtPlot* MainWindow::createTemperatureEntropyChart() {
  auto* plot = new QwtPlot(this);
  plot->setObjectName("temperatureEntropyChart");
  plot->setTitle(tr("Temperature-entropy chart"));
  plot->setAxisTitle(QwtAxis::XBottom, tr("Specific entropy s [J/(kg·K)], zero at the free-stream static state"));
  plot->setAxisTitle(QwtAxis::YLeft, tr("Temperature T [K]"));
  plot->setAxisScale(QwtAxis::XBottom, 0.0, 1500.0);
  plot->setAxisScale(QwtAxis::YLeft, 200.0, 2000.0);
  plot->setCanvasBackground(palette().color(QPalette::Base));
  auto* grid = new QwtPlotGrid;
  grid->setMajorPen(palette().color(QPalette::Mid), 0.0, Qt::DotLine);
  grid->attach(plot);
  return plot;
}

bool MainWindow::openCase(const QString& path) {
  QFile file(path);
  if (!file.open(QIODevice::ReadOnly)) {
    statusBar()->showMessage(tr("Cannot open %1: %2").arg(path, file.errorString()));
    return false;
  }
  QJsonParseError parseError;
  const QJsonDocument document = QJsonDocument::fromJson(file.readAll(), &parseError);
  if (document.isNull() || !document.isObject() ||
      document.object().value("format").toString() != QLatin1String("cyclewright-case")) {
    statusBar()->showMessage(tr("%1 is not a Cyclewright case file").arg(path));
    return false;
  }
  casePath_ = path;
  const QString title = document.object().value("title").toString();
  setWindowTitle(tr("%1 — Cyclewright").arg(QFileInfo(path).fileName()));
  statusBar()->showMessage(tr("Opened %1").arg(title.isEmpty() ? path : title));
  return true;
}

QString MainWindow::cautionText() {
  return tr("Results are conceptual-design estimates. For anything that affects flight safety, "
            "defer to the engine manufacturer's data, your organisation's procedures and "
            "licensed engineering practice.");
}

void MainWindow::showAbout() {
  QMessageBox box(this);
  box.setObjectName("aboutBox");
  box.setWindowTitle(tr("About Cyclewright"));
  box.setIcon(QMessageBox::Information);
  box.setText(tr("<b>Cyclewright %1</b><br>A gas-turbine cycle explorer for conceptual design.")
                  .arg(QString::fromLatin1(kVersion)));
  box.setInformativeText(cautionText());
  box.exec();
}

}  // namespace cw::gui
