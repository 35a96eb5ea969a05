#pragma once
// The trade-study chart: a carpet (specific thrust against TSFC, one line per value of each
// varied input) or any output of the study against its first input (one curve per value of the
// second input for a carpet). Draws only the core's study (core/study/trade_study.h) through its
// columns (core/study/study_columns.h); it computes nothing.
//
// Lines of constant first input: Okabe-Ito blue #0072B2, solid; of constant second input:
// bluish green #009E73, dotted; each labelled with its input's value and unit at its end
// (LineEndLabels keeps the labels clear of each other, the design point and the canvas edge, and
// labels the first and last line of each family; the legend gives each family's step). Both axis
// titles take the longest form that fits their axis (ChartBase::fitAxisTitle).
// The overlay of a second loss level is dashed: the ideal twin orange #E69F00 (as the ideal
// cycle on the cycle charts), a study with one input set differently reddish purple #CC79A7.
// The case's design point is a yellow star (#F0E442, outlined in the text colour), labelled.
// Points without a cycle (or without the figure, e.g. TSFC at zero thrust) leave gaps: a line
// is drawn only through consecutive points that have the figure. Canvas, grid and text take
// the palette's colours; a banner marks a study of a case that has changed since.

#include "charts/chart_base.h"
#include "charts/line_end_labels.h"
#include "document/units.h"

#include "study/study_columns.h"
#include "study/trade_study.h"

#include <QPointF>
#include <QRectF>
#include <QString>
#include <QVector>

#include <array>
#include <memory>
#include <string>
#include <vector>

class QwtPlotCurve;
class QwtPlotLegendItem;
class QwtPlotMarker;
class QwtPlotTextLabel;

namespace cw::gui {

class ReadoutPicker;

enum class StudyPlot { Carpet, Output };
enum class StudyOverlay { None, IdealTwin, OneInputChanged };

/// A varied input as the chart names it: its translated name (no unit) and quantity.
struct StudyAxisName {
  QString name;
  Quantity quantity = Quantity::Dimensionless;
  QString shortName;  ///< without the component, for the legend and a short axis title; empty for `name`
};

class StudyChart : public ChartBase {
  Q_OBJECT

 public:
  enum class Family {
    ConstantFirst,   ///< carpet: the first input fixed, the second varying
    ConstantSecond,  ///< carpet, or output against the first input: the second input fixed
    Sweep,           ///< one varied input
  };
  /// One line of the chart, in SI: a carpet's line of constant input, or an output's curve.
  struct Line {
    Family family = Family::Sweep;
    bool overlay = false;
    double value = 0.0;                          ///< the constant input [SI] (not for Sweep)
    std::vector<std::vector<QPointF>> segments;  ///< runs of consecutive points with the figures [SI]
    QString label;                               ///< its end label ("1350 K"); empty when none
    std::vector<QwtPlotCurve*> curves;           ///< one per segment
  };

  explicit StudyChart(DisplayUnits& units, QWidget* parent = nullptr);
  ~StudyChart() override;

  /// Shows a study (null clears the chart) with the names of its inputs. One replot.
  void setStudy(std::shared_ptr<const study::TradeStudy> study, std::array<StudyAxisName, 2> axes,
                bool stale);
  /// The second loss level: none, the study's ideal twin, or `changed` (the same grid with one
  /// input set differently, described by `description`, e.g. "Compressor › Isentropic efficiency = 0.8").
  void setOverlay(StudyOverlay overlay, std::shared_ptr<const study::TradeStudy> changed = {},
                  const QString& description = {});
  /// The carpet, or the output column `column` (a study column's name) against the first input.
  void setPlot(StudyPlot plot, const std::string& column = {});
  /// Compact (a low place such as the bottom tabs): no title, the legend inside the canvas in a
  /// band left free above the lines. Otherwise the title on top and the legend below the chart.
  void setCompact(bool compact);
  bool isCompact() const { return compact_; }

  std::shared_ptr<const study::TradeStudy> study() const { return study_; }
  StudyPlot plot() const { return plot_; }
  const std::string& column() const { return column_; }
  StudyOverlay overlay() const { return overlay_; }

  // For tests and the panel.
  const std::vector<Line>& lines() const { return lines_; }
  int lineCount(Family family, bool overlay) const;
  /// The design point's marker, or null when the study does not show it.
  const QwtPlotMarker* designMarker() const;
  const LineEndLabels* lineLabels() const { return labels_; }
  /// Why the overlay asked for is not drawn (e.g. an output without an ideal-twin figure); empty when it is.
  QString overlayNote() const { return overlayNote_; }
  /// The readout for a canvas position [px]: the nearest study point's inputs and figures with
  /// their units, or empty when none is near.
  QString readoutAt(const QPoint& canvasPosition) const;

  void retranslateUi();

 protected:
  void refresh() override;
  bool wantsStaleBanner() const override { return study_ != nullptr; }
  void resizeEvent(QResizeEvent* event) override;
  void beginExport(const ExportOptions& options) override;
  void endExport() override;

 private:
  /// Every point drawn (display units), for the autoscale.
  struct DrawnPoints {
    std::vector<double> xs, ys;
  };
  void rebuild();
  /// The study's lines and the overlay's (or the note why there is none).
  void collectLines();
  /// A curve per segment of every line, attached; returns the number of legend groups.
  int attachCurves(DrawnPoints& drawn);
  QwtPlotCurve* makeCurve(const Line& line, const QVector<QPointF>& shown, bool inLegend) const;
  QString legendTitle(const Line& line) const;
  /// The design point's star, where the study knows its inputs; its symbol and label as obstacles.
  void showDesignPoint(DrawnPoints& drawn, std::vector<LineEndLabels::Obstacle>& obstacles);
  /// The lines in the order their labels are placed.
  std::vector<Line*> labelOrder();
  QString lineLabelText(const Line& line) const;
  LineEndLabels::Label endLabel(const Line& line) const;
  void updateLineLabels(std::vector<LineEndLabels::Obstacle> obstacles);
  void fitBounds(const DrawnPoints& drawn, int legendGroups);
  void showHint();
  std::string xColumn() const;
  /// An axis's titles, longest first, with the unit (fitAxisTitle takes the longest that fits).
  QStringList axisTitles(QwtAxisId axis) const;
  void fitAxisTitles(bool whole = false);
  std::string yColumn() const;
  void clearLines();
  void applyPalette();
  void insertStudyLegend();
  void rescale();
  void addLines(const study::TradeStudy& s, bool overlay, const std::string& xColumn,
                const std::string& yColumn);
  const study::StudyColumn* columnNamed(const std::string& name) const;
  Quantity xQuantity() const;
  Quantity yQuantity() const;
  QString overlayTitle() const;
  QString legendName(int axis) const;

  DisplayUnits& units_;
  std::vector<study::StudyColumn> columns_;  ///< every column the core offers (with the audit's)
  std::shared_ptr<const study::TradeStudy> study_;
  std::shared_ptr<const study::TradeStudy> changed_;
  QString changedDescription_;
  std::array<StudyAxisName, 2> axes_{};
  StudyPlot plot_ = StudyPlot::Carpet;
  std::string column_ = "specific_thrust_N_s_per_kg";
  StudyOverlay overlay_ = StudyOverlay::None;
  bool compact_ = false;
  QString overlayNote_;

  std::vector<Line> lines_;
  QRectF bounds_;  ///< of the figures drawn, display units (when hasBounds_)
  bool hasBounds_ = false;
  int legendEntries_ = 0;
  QwtPlotMarker* design_ = nullptr;
  bool designShown_ = false;
  LineEndLabels* labels_ = nullptr;
  QwtPlotLegendItem* legendItem_ = nullptr;  ///< the legend inside the canvas (compact)
  QwtPlotTextLabel* hintLabel_ = nullptr;
  ReadoutPicker* picker_ = nullptr;
};

}  // namespace cw::gui
