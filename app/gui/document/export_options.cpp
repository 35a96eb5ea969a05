#include "document/export_options.h"

#include <algorithm>
#include <cmath>

namespace cw::gui {

namespace {

QString legendKey(LegendPlacement p) {
  switch (p) {
    case LegendPlacement::AsShown:
      return "as-shown";
    case LegendPlacement::Inside:
      return "inside";
    case LegendPlacement::OutsideRight:
      return "outside-right";
    case LegendPlacement::Below:
      return "below";
    case LegendPlacement::None:
      return "none";
  }
  return "as-shown";
}

double finiteIn(const QVariant& v, double fallback, double low, double high) {
  bool ok = false;
  const double x = v.toDouble(&ok);
  return ok && std::isfinite(x) && x >= low && x <= high ? x : fallback;
}

}  // namespace

QVariantMap ExportOptions::toMap() const {
  return {{"transparent", transparent},
          {"selection_highlight", selectionHighlight},
          {"title", title},
          {"subtitle", subtitle},
          {"legend", legendKey(legend)},
          {"font_family", fontFamily},
          {"font_pt", fontPointSize},
          {"line_width_scale", lineWidthScale},
          {"paper_width", paperSize.width()},
          {"paper_height", paperSize.height()},
          {"paper_unit", paperUnit == PaperUnit::Inches ? "in" : "mm"},
          {"png_width", pixels.width()},
          {"png_height", pixels.height()},
          {"png_dpi", dotsPerInch}};
}

ExportOptions ExportOptions::fromMap(const QVariantMap& m) {
  ExportOptions o;
  o.transparent = m.value("transparent", o.transparent).toBool();
  o.selectionHighlight = m.value("selection_highlight", o.selectionHighlight).toBool();
  o.title = m.value("title").toString();
  o.subtitle = m.value("subtitle").toString();
  const QString legend = m.value("legend").toString();
  for (auto p : {LegendPlacement::AsShown, LegendPlacement::Inside, LegendPlacement::OutsideRight,
                 LegendPlacement::Below, LegendPlacement::None})
    if (legend == legendKey(p)) o.legend = p;
  o.fontFamily = m.value("font_family").toString();
  o.fontPointSize = finiteIn(m.value("font_pt"), 0.0, 0.0, 72.0);
  o.lineWidthScale = finiteIn(m.value("line_width_scale"), 1.0, 0.25, 5.0);
  o.paperUnit = m.value("paper_unit").toString() == "in" ? PaperUnit::Inches : PaperUnit::Millimetres;
  const double maxPaper = o.paperUnit == PaperUnit::Inches ? 40.0 : 1000.0;
  o.paperSize = QSizeF(finiteIn(m.value("paper_width"), o.paperSize.width(), 1.0, maxPaper),
                       finiteIn(m.value("paper_height"), o.paperSize.height(), 1.0, maxPaper));
  o.pixels = QSize(std::clamp(m.value("png_width", o.pixels.width()).toInt(), 200, 10000),
                   std::clamp(m.value("png_height", o.pixels.height()).toInt(), 150, 10000));
  o.dotsPerInch = std::clamp(m.value("png_dpi", o.dotsPerInch).toInt(), 50, 1200);
  return o;
}

}  // namespace cw::gui
