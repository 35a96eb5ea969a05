#pragma once
// Export of a chart: PNG at a chosen size and resolution, SVG and PDF (with a plain-text
// document title) through QwtPlotRenderer, and an image for the clipboard. Every export goes through an
// ExportScope (chart_base.h): on white in a light palette, the caution as the chart's footer. No dialogs
// here, so tests call these directly.

#include "document/export_options.h"

#include <QImage>
#include <QSize>
#include <QSizeF>
#include <QString>

class QwtPlot;

namespace cw::gui {

/// Renders the chart into an image of the given size [px] at the given resolution [dots per inch].
QImage renderChartImage(QwtPlot* plot, QSize pixels, int dotsPerInch);

/// Writes a PNG of the given size and resolution. False when the file cannot be written.
bool exportChartPng(QwtPlot* plot, const QString& fileName, QSize pixels, int dotsPerInch);

/// Writes an SVG or PDF (by format "svg" or "pdf") of the given size [mm] at 85 dpi for
/// raster parts. False when the file cannot be written.
bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format, QSizeF millimetres);

/// The same with the export's options (background, selection, title, legend, font, lines; the
/// PNG's pixels and resolution, the document's size from the options).
QImage renderChartImage(QwtPlot* plot, const ExportOptions& options);
bool exportChartPng(QwtPlot* plot, const QString& fileName, const ExportOptions& options);
bool exportChartDocument(QwtPlot* plot, const QString& fileName, const QString& format,
                         const ExportOptions& options);

}  // namespace cw::gui
