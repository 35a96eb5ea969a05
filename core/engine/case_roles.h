#pragma once
// The roles of a case's compressor and turbine inputs, per architecture: the one place that maps
// a role's case-file name to the member of engine::Case that holds its inputs (case_inputs.h
// names the roles in words). The registry of parameters (parameter_registry.h) describes each
// role's parameters from one description of a compressor's and a turbine's parameters.

#include "engine/case_inputs.h"
#include "engine/parameter_text.h"

#include <array>
#include <string_view>

namespace cw::engine {

/// A compressor's role: its case-file object, the architecture that has it, the member of Case
/// that holds its inputs, and the stations of its pressure ratio (for labels).
struct CompressorRole {
  std::string_view name;  ///< case-file object, e.g. "low_pressure_compressor"
  Architecture architecture;
  CompressorInputs Case::*member;
  std::string_view pressureRatioLabel;  ///< English, e.g. "Pressure ratio pt3/pt2"
};

/// A turbine's role, as CompressorRole.
struct TurbineRole {
  std::string_view name;
  Architecture architecture;
  TurbineInputs Case::*member;
};

/// Every compressor role in flow order (single spool first, then the two-spool LP and HP).
inline constexpr std::array<CompressorRole, 3> kCompressorRoles{{
    {"compressor", Architecture::Turbojet, &Case::compressor,
     CW_PARAMETER_TEXT("Parameters", "Pressure ratio pt3/pt2")},
    {"low_pressure_compressor", Architecture::TwoSpoolTurbojet, &Case::lowPressureCompressor,
     CW_PARAMETER_TEXT("Parameters", "Pressure ratio pt25/pt2")},
    {"high_pressure_compressor", Architecture::TwoSpoolTurbojet, &Case::compressor,
     CW_PARAMETER_TEXT("Parameters", "Pressure ratio pt3/pt25")},
}};

/// Every turbine role in flow order (single spool first, then the two-spool HP and LP).
inline constexpr std::array<TurbineRole, 3> kTurbineRoles{{
    {"turbine", Architecture::Turbojet, &Case::turbine},
    {"high_pressure_turbine", Architecture::TwoSpoolTurbojet, &Case::turbine},
    {"low_pressure_turbine", Architecture::TwoSpoolTurbojet, &Case::lowPressureTurbine},
}};

}  // namespace cw::engine
