#pragma once
// Trade studies: a sweep varies one numeric case input over a range, a carpet varies two. Each
// point is a full design-point evaluation with its ideal twin (evaluation/evaluate.h), optionally
// with the one-at-a-time loss audit (analysis/loss_audit.h). A point without a cycle is kept
// with its status and reason, and the study goes on.
//
// Points run on a thread pool (common/thread_pool.h) and are stored by their grid index, so the
// output is the same, in the same order, whatever the number of threads. A stop request ends a
// study early; points not run are marked as such.
//
// Grid order: the first axis is the outer loop, the second the inner one,
//   point index = i * count2 + j   (i along the first axis, j along the second).

#include "analysis/loss_audit.h"
#include "engine/case_inputs.h"
#include "engine/cycle_result.h"
#include "study/sweep_axis.h"

#include <nlohmann/json.hpp>

#include <array>
#include <cstddef>
#include <functional>
#include <optional>
#include <stop_token>
#include <string>
#include <string_view>
#include <vector>

namespace cw::study {

enum class PointStatus {
  Solved,        ///< the cycle and its ideal twin were evaluated
  InvalidInput,  ///< a varied input (or a value derived from it) is outside its valid range
  NoCycle,       ///< the inputs admit no cycle, e.g. the turbine cannot drive the compressor
  NotConverged,  ///< a solver stopped short of its tolerance
  OutOfRange,    ///< a state beyond the gas data (e.g. a temperature above the polynomials)
  NotRun,        ///< the study was stopped before this point
};

/// "solved", "invalid-input", "no-cycle", "not-converged", "out-of-range", "not-run".
std::string_view toString(PointStatus status);

struct StudyPoint {
  std::array<int, 2> index{0, 0};          ///< along the first and second axis (0 for a sweep)
  std::array<double, 2> inputs{0.0, 0.0};  ///< the varied inputs' values, SI
  PointStatus status = PointStatus::NotRun;
  std::string reason;                      ///< why there is no cycle; empty when solved
  engine::Performance actual;              ///< the cycle with losses (when solved)
  engine::Performance ideal;               ///< its ideal twin
  engine::Sizing sizing;                   ///< of the cycle with losses
  double burnerExitTemperature = 0.0;      ///< Tt4 of the cycle with losses [K]
  std::vector<analysis::LossDelta> audit;  ///< one at a time, flow order, when asked for
  bool solved() const { return status == PointStatus::Solved; }
};

struct TradeStudySpec {
  /// The case document, --set overrides applied (io/case_file.h); the axes' paths are set on
  /// top of it, as --set would set them.
  nlohmann::json document;
  std::string source = "case";  ///< where the document came from (a file path), for messages
  std::vector<SweepAxis> axes;  ///< one (a sweep) or two (a carpet)
  bool withAudit = false;       ///< add each point's one-at-a-time loss audit
  unsigned threads = 0;         ///< worker threads; 0 for one per hardware thread
};

struct TradeStudy {
  std::vector<SweepAxis> axes;
  std::vector<StudyPoint> points;  ///< grid order (see above)
  /// The case as given (no axis applied), evaluated like a point; its inputs hold the axes'
  /// values in that case where the case has them (design point marker of the charts).
  StudyPoint designPoint;
  std::array<bool, 2> designPointOnAxis{false, false};  ///< whether inputs[k] is the case's value
  bool withAudit = false;
  /// The case's architecture: which audit columns the study has (study_columns.h).
  engine::Architecture architecture = engine::Architecture::Turbojet;
  bool stopped = false;  ///< a stop request ended the study before every point ran
  unsigned threads = 1;  ///< threads used

  std::size_t count(PointStatus status) const;
  /// The point at grid index (i, j).
  const StudyPoint& at(int i, int j = 0) const;
};

/// Called from worker threads as points finish: (points done, points in all). Must be thread-safe
/// and quick; it is called about a hundred times per study, and once at the end.
using StudyProgress = std::function<void(std::size_t done, std::size_t total)>;

/// Checks the spec (one or two axes; numeric, distinct, compatible paths; sizes within
/// kMaxAxisCount and kMaxStudyPoints; a case whose structure is valid with the axes set and
/// whose inputs other than the axes are in range) and throws cw::InvalidInput or
/// cw::engine::CaseValidationError before any point runs. Then runs every point.
TradeStudy runTradeStudy(const TradeStudySpec& spec, std::stop_token stop = {},
                         const StudyProgress& progress = {});

/// Evaluates one case as a point of a study would (exposed for tests and the design point).
StudyPoint evaluatePoint(const engine::Case& inputs, bool withAudit);

}  // namespace cw::study
