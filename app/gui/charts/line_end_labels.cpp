#include "charts/line_end_labels.h"

#include "charts/isobar_labels.h"
#include "charts/label_placer.h"

#include <qwt_plot.h>
#include <qwt_plot_curve.h>
#include <qwt_plot_legenditem.h>
#include <qwt_scale_map.h>

#include <QPainter>

#include <algorithm>
#include <cmath>

namespace cw::gui {

namespace {

constexpr double kGap = 4.0;            // between a label and its line's end [px]
constexpr std::size_t kMaxAnchors = 6;  // points tried along a line, the end included

}  // namespace

LineEndLabels::LineEndLabels() {
  setItemAttribute(QwtPlotItem::Legend, false);
  setItemAttribute(QwtPlotItem::AutoScale, false);
  setZ(40);
}

void LineEndLabels::setLabels(std::vector<Label> labels) {
  labels_ = std::move(labels);
  itemChanged();
}

void LineEndLabels::setObstacles(std::vector<Obstacle> obstacles) {
  obstacles_ = std::move(obstacles);
  itemChanged();
}

void LineEndLabels::draw(QPainter* painter, const QwtScaleMap& xMap, const QwtScaleMap& yMap,
                         const QRectF& canvasRect) const {
  placed_.clear();
  placedTexts_.clear();
  skipped_ = 0;
  auto toPixel = [&](const QPointF& p) { return QPointF(xMap.transform(p.x()), yMap.transform(p.y())); };

  const QRectF bounds = canvasRect.adjusted(1, 1, -1, -1);
  canvas_ = canvasRect;
  LabelPlacer placer(bounds);
  for (const Obstacle& o : obstacles_) {
    const QPointF c = toPixel(o.at) + o.offset;
    placer.addObstacle(QRectF(c - QPointF(o.size.width(), o.size.height()) / 2.0, o.size));
  }
  if (legend_ && legend_->plot() && legend_->isVisible())
    placer.addObstacle(QRectF(legend_->geometry(canvasRect)));
  curvePixels_.clear();
  for (const QwtPlotCurve* curve : curves_) {
    if (!curve || !curve->isVisible() || !curve->plot()) continue;
    std::vector<QPointF> pixels;
    for (size_t i = 0; i < curve->dataSize(); ++i) pixels.push_back(toPixel(curve->sample(i)));
    placer.addCurve(pixels);
    curvePixels_.push_back(std::move(pixels));
  }

  std::vector<std::vector<QRectF>> candidates;
  candidates.reserve(labels_.size());
  for (const Label& label : labels_) {
    const QSizeF size = textSizeOn(painter, label.text);
    std::vector<QRectF> options;
    const std::size_t n = std::min(label.anchors.size(), kMaxAnchors);
    for (std::size_t k = 0; k < n; ++k) {
      const QPointF p = toPixel(label.anchors[k]);
      // The direction the line leaves this point towards its end (beyond the end at k = 0).
      QPointF out(1.0, 0.0);
      if (label.anchors.size() > 1) {
        const QPointF inner = toPixel(label.anchors[k + 1 < label.anchors.size() ? k + 1 : k - 1]);
        const QPointF d = k + 1 < label.anchors.size() ? p - inner : inner - p;
        const double length = std::hypot(d.x(), d.y());
        if (length > 1e-6) out = d / length;
      }
      const double w = size.width(), h = size.height();
      const QRectF beyond(
          QPointF(p.x() + out.x() * (kGap + w / 2) - w / 2, p.y() + out.y() * (kGap + h / 2) - h / 2), size);
      if (k == 0) options.push_back(beyond);
      options.emplace_back(QPointF(p.x() + kGap, p.y() - h / 2), size);      // right
      options.emplace_back(QPointF(p.x() - kGap - w, p.y() - h / 2), size);  // left
      options.emplace_back(QPointF(p.x() - w / 2, p.y() - kGap - h), size);  // above
      options.emplace_back(QPointF(p.x() - w / 2, p.y() + kGap), size);      // below
      options.emplace_back(QPointF(p.x() + kGap, p.y() - kGap - h), size);   // above right
      options.emplace_back(QPointF(p.x() + kGap, p.y() + kGap), size);       // below right
    }
    candidates.push_back(std::move(options));
  }

  // Clear of the lines where there is room; crossing a line (never another label) where not.
  std::vector<int> chosen;
  for (const auto& options : candidates) chosen.push_back(placer.place(options, true));
  for (std::size_t i = 0; i < labels_.size(); ++i) {
    if (chosen[i] < 0) {
      ++skipped_;
      continue;
    }
    const QRectF& r = candidates[i][static_cast<std::size_t>(chosen[i])];
    placed_.push_back(r);
    placedTexts_.push_back(labels_[i].text.text());
    labels_[i].text.draw(painter, r);
  }
}

}  // namespace cw::gui
