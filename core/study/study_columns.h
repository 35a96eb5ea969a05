#pragma once
// The output figures of a trade study point, as named columns: the command line's CSV and JSON,
// and the GUI's choice of what to plot, use this one list.
//
// A column's name carries the unit of its file value (e.g. "tsfc_g_per_kN_s"); value() gives
// the SI value (kg/(N s) for TSFC) and fileScale converts it for files. Figures of the ideal
// twin are prefixed "ideal."; the loss audit's are "audit.<loss>.delta_specific_thrust_N_s_per_kg"
// and "audit.<loss>.delta_tsfc_g_per_kN_s" (present when the study ran the audit), for the losses
// of the case's architecture (analysis::lossesOf): a turbojet's study has no low-pressure
// columns. The architecture defaults to the single-spool turbojet, the only one case files
// give so far.

#include "study/trade_study.h"

#include <optional>
#include <string>
#include <vector>

namespace cw::study {

/// What a column measures, for the GUI's unit conversion.
enum class Quantity {
  Force,           ///< N
  SpecificThrust,  ///< N s/kg
  Tsfc,            ///< kg/(N s) (file: g/(kN s))
  MassFlow,        ///< kg/s
  Velocity,        ///< m/s
  Area,            ///< m^2
  Length,          ///< m
  Temperature,     ///< K
  Dimensionless,   ///< -
};

struct StudyColumn {
  std::string name;   ///< stable name with the file unit, e.g. "specific_thrust_N_s_per_kg"
  std::string label;  ///< short English label without unit, e.g. "specific thrust"
  Quantity quantity;
  double fileScale = 1.0;  ///< file value = SI value * fileScale
  /// The SI value at a solved point; nullopt where undefined (TSFC at zero net thrust, capture
  /// area at zero flight speed) or when the point is not solved.
  std::function<std::optional<double>(const StudyPoint&)> value;
};

/// Every column a study offers, in a fixed order: the cycle's figures, the ideal twin's, then
/// (when the study ran the audit) the audit's, in flow order of the architecture's losses.
std::vector<StudyColumn> studyColumns(bool withAudit,
                                      engine::Architecture architecture = engine::Architecture::Turbojet);

/// Every column a study of any architecture may have, each once (for finding a column by its
/// name, as the GUI's views do).
std::vector<StudyColumn> everyStudyColumn();

/// The columns named (comma-separated names, in the given order), or every column when empty.
/// An unknown or repeated name throws cw::InvalidInput (where = `where`) listing the valid ones.
std::vector<StudyColumn> selectStudyColumns(
    const std::string& names, bool withAudit, const std::string& where = "--output-columns",
    engine::Architecture architecture = engine::Architecture::Turbojet);

/// The default columns of the command line: the cycle's figures and the ideal twin's specific
/// thrust and TSFC (and the audit's when run).
std::vector<StudyColumn> defaultStudyColumns(
    bool withAudit, engine::Architecture architecture = engine::Architecture::Turbojet);

}  // namespace cw::study
