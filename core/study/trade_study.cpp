#include "study/trade_study.h"

#include "common/error.h"
#include "common/thread_pool.h"
#include "engine/case_validation.h"
#include "engine/case_validation_error.h"
#include "evaluation/evaluate.h"
#include "io/case_field_setter.h"
#include "io/case_file.h"
#include "io/case_keys.h"

#include <algorithm>
#include <atomic>
#include <stdexcept>

namespace cw::study {

namespace {

using nlohmann::json;

/// "compressor.pressure_ratio" -> "/compressor/pressure_ratio" (the problems' JSON pointers).
std::string pointerOf(const std::string& path) {
  std::string pointer = "/" + path;
  std::replace(pointer.begin(), pointer.end(), '.', '/');
  return pointer;
}

io::CaseFieldSetter setterFor(const SweepAxis& axis) {
  if (const io::CaseFieldSetter set = io::numericCaseFieldSetter(axis.path)) return set;
  const std::vector<std::string> paths = io::numericCaseFieldPaths();
  const std::vector<std::string_view> views(paths.begin(), paths.end());
  const std::string suggestion = io::closestName(axis.path, views);
  throw InvalidInput("--vary " + axis.path, "not a numeric case input" +
                                                (suggestion.empty() ? std::string(" (see docs/cli.md)")
                                                                    : " (did you mean " + suggestion + "?)"));
}

/// The value of `path` in the case's own document (defaults written out), if the case has it.
std::optional<double> valueIn(const json& document, const std::string& path) {
  const auto dot = path.find('.');
  const json* object = &document;
  if (dot != std::string::npos) {
    const auto section = document.find(path.substr(0, dot));
    if (section == document.end() || !section->is_object()) return std::nullopt;
    object = &*section;
  }
  const auto value = object->find(path.substr(dot == std::string::npos ? 0 : dot + 1));
  if (value == object->end() || !value->is_number()) return std::nullopt;
  return value->get<double>();
}

void fail(StudyPoint& point, PointStatus status, const std::exception& e) {
  point.status = status;
  point.reason = e.what();
  std::replace(point.reason.begin(), point.reason.end(), '\n', ';');  // one line per point
}

}  // namespace

std::string_view toString(PointStatus status) {
  switch (status) {
    case PointStatus::Solved:
      return "solved";
    case PointStatus::InvalidInput:
      return "invalid-input";
    case PointStatus::NoCycle:
      return "no-cycle";
    case PointStatus::NotConverged:
      return "not-converged";
    case PointStatus::OutOfRange:
      return "out-of-range";
    case PointStatus::NotRun:
      return "not-run";
  }
  return "unknown";
}

std::size_t TradeStudy::count(PointStatus status) const {
  return static_cast<std::size_t>(
      std::count_if(points.begin(), points.end(), [&](const StudyPoint& p) { return p.status == status; }));
}

const StudyPoint& TradeStudy::at(int i, int j) const {
  const int inner = axes.size() > 1 ? axes[1].count : 1;
  if (i < 0 || j < 0 || i >= axes.at(0).count || j >= inner) throw std::out_of_range("TradeStudy::at");
  return points[static_cast<std::size_t>(i) * inner + j];
}

StudyPoint evaluatePoint(const engine::Case& inputs, bool withAudit) {
  StudyPoint point;
  try {
    const engine::Evaluation evaluation = engine::evaluateCase(inputs, /*withPaths=*/false);
    point.actual = evaluation.actual.performance;
    point.ideal = evaluation.ideal.performance;
    point.sizing = evaluation.actual.sizing;
    point.burnerExitTemperature = evaluation.actual.burnerExitTemperature();
    if (withAudit) point.audit = analysis::oneAtATime(analysis::AuditPoint(inputs));
    point.status = PointStatus::Solved;
  } catch (const NoSolution& e) {
    fail(point, PointStatus::NoCycle, e);
  } catch (const NotConverged& e) {
    fail(point, PointStatus::NotConverged, e);
  } catch (const OutOfRange& e) {
    fail(point, PointStatus::OutOfRange, e);
  } catch (const Error& e) {  // CaseValidationError and InvalidInput
    fail(point, PointStatus::InvalidInput, e);
  }
  if (!point.solved()) point.audit.clear();
  return point;
}

TradeStudy runTradeStudy(const TradeStudySpec& spec, std::stop_token stop, const StudyProgress& progress) {
  // --- the spec -------------------------------------------------------------------------------
  if (spec.axes.empty() || spec.axes.size() > 2)
    throw InvalidInput("--vary", "give one input to vary (a sweep) or two (a carpet), not " +
                                     std::to_string(spec.axes.size()));
  std::vector<io::CaseFieldSetter> setters;
  long total = 1;
  for (const SweepAxis& axis : spec.axes) {
    checkSweepAxis(axis);
    setters.push_back(setterFor(axis));
    total *= axis.count;
  }
  if (spec.axes.size() == 2 && spec.axes[0].path == spec.axes[1].path)
    throw InvalidInput("--vary " + spec.axes[1].path, "the same input is varied twice");
  if (total > kMaxStudyPoints)
    throw InvalidInput("--vary", "the grid has " + std::to_string(total) +
                                     " points; a study may have at most " + std::to_string(kMaxStudyPoints));

  // --- the base case: the document with each axis set at its start, as --set would ---------
  json document = spec.document;
  for (const SweepAxis& axis : spec.axes)
    io::applySetOverride(document, axis.path + "=" + formatNumber(axis.start));
  for (const SweepAxis& axis : spec.axes)
    if (!valueIn(document, axis.path))
      throw InvalidInput("--vary " + axis.path, "is an alternative of the other varied input (" +
                                                    spec.axes[0].path + " or " + spec.axes[1].path +
                                                    "); vary one of them");
  engine::Case base = io::parseCaseStructure(document, spec.source);
  base.title.clear();  // not needed per point; spares an allocation per copy
  base.notes.clear();
  {
    // Ranges of the inputs that do not vary are the case's problem, not a point's.
    std::vector<engine::CaseProblem> fixed;
    for (const engine::CaseProblem& problem : engine::validateCase(base)) {
      const bool varied = std::any_of(spec.axes.begin(), spec.axes.end(),
                                      [&](const SweepAxis& a) { return pointerOf(a.path) == problem.path; });
      if (!varied) fixed.push_back(problem);
    }
    if (!fixed.empty()) throw engine::CaseValidationError(spec.source, std::move(fixed));
  }

  TradeStudy study;
  study.axes = spec.axes;
  study.withAudit = spec.withAudit;
  study.architecture = base.architecture;

  // --- the design point: the case as given -----------------------------------------------------
  try {
    const engine::Case given = io::parseCaseStructure(spec.document);
    study.designPoint = evaluatePoint(given, spec.withAudit);
    const json written = io::caseToJson(given);
    for (std::size_t k = 0; k < spec.axes.size(); ++k) {
      if (const auto value = valueIn(written, spec.axes[k].path)) {
        study.designPoint.inputs[k] = *value;
        study.designPointOnAxis[k] = true;
      }
    }
  } catch (const Error& e) {
    // A case that is complete only with the axes set has no design point of its own.
    fail(study.designPoint, PointStatus::InvalidInput, e);
  }

  // --- the grid --------------------------------------------------------------------------------
  const std::vector<double> first = spec.axes[0].values();
  const std::vector<double> second = spec.axes.size() > 1 ? spec.axes[1].values() : std::vector<double>{0.0};
  const std::size_t inner = second.size();
  study.points.resize(first.size() * inner);
  for (std::size_t i = 0; i < first.size(); ++i)
    for (std::size_t j = 0; j < inner; ++j) {
      StudyPoint& p = study.points[i * inner + j];
      p.index = {static_cast<int>(i), static_cast<int>(j)};
      p.inputs = {first[i], spec.axes.size() > 1 ? second[j] : 0.0};
    }

  const std::size_t n = study.points.size();
  const std::size_t reportEvery = std::max<std::size_t>(1, n / 100);
  std::atomic<std::size_t> done{0};
  ThreadPool pool(static_cast<unsigned>(
      std::min<std::size_t>(spec.threads == 0 ? ThreadPool::hardwareThreads() : spec.threads, n)));
  study.threads = pool.threadCount();
  const std::size_t ran = pool.parallelFor(
      n,
      [&](std::size_t index) {
        StudyPoint& p = study.points[index];
        engine::Case c = base;
        for (std::size_t k = 0; k < setters.size(); ++k) setters[k](c, p.inputs[k]);
        StudyPoint result = evaluatePoint(c, spec.withAudit);
        result.index = p.index;
        result.inputs = p.inputs;
        p = std::move(result);
        const std::size_t finished = done.fetch_add(1, std::memory_order_relaxed) + 1;
        if (progress && finished % reportEvery == 0 && finished != n) progress(finished, n);
      },
      stop);
  study.stopped = ran < n;
  if (progress) progress(done.load(), n);
  return study;
}

}  // namespace cw::study
