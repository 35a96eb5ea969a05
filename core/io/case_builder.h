#pragma once
// Builds a case from a document that passed the structural check (CaseStructureCheck::clean()):
// every value present has the right type and applies; absent values take the defaults.

#include "engine/case_inputs.h"

#include <nlohmann/json.hpp>

namespace cw::io {

engine::Case buildCase(const nlohmann::json& clean);

}  // namespace cw::io
