#include "trade_study/study_names.h"

#include "document/loss_names.h"

#include <QCoreApplication>

#include <string>

namespace cw::gui {

namespace {

struct ColumnName {
  const char* name;
  const char* label;
};

// The columns of study_columns.cpp, without the "ideal." prefix.
constexpr ColumnName kColumns[] = {
    {"net_thrust_N", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Net thrust")},
    {"gross_thrust_N", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Gross thrust")},
    {"ram_drag_N", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Ram drag")},
    {"specific_thrust_N_s_per_kg", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Specific thrust")},
    {"tsfc_g_per_kN_s", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "TSFC")},
    {"fuel_flow_kg_per_s", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Fuel flow")},
    {"fuel_air_ratio", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Fuel-air ratio")},
    {"thermal_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Thermal efficiency")},
    {"propulsive_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Propulsive efficiency")},
    {"overall_efficiency", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Overall efficiency")},
    {"jet_velocity_m_per_s", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Jet velocity")},
    {"nozzle_choked", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Nozzle choked (1 yes, 0 no)")},
    {"air_mass_flow_kg_per_s", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Air mass flow")},
    {"burner_exit_temperature_K", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Burner exit temperature")},
    {"capture_area_m2", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Inlet capture area")},
    {"engine_face_diameter_m", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Engine-face diameter")},
    {"nozzle_throat_area_m2", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Nozzle throat area")},
    {"nozzle_exit_area_m2", QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Nozzle exit area")},
};

QString tx(const char* text) {
  return QCoreApplication::translate("cw::gui::StudyNames", text);
}

}  // namespace

Quantity displayQuantity(study::Quantity quantity) {
  switch (quantity) {
    case study::Quantity::Force:
      return Quantity::Force;
    case study::Quantity::SpecificThrust:
      return Quantity::SpecificThrust;
    case study::Quantity::Tsfc:
      return Quantity::Tsfc;
    case study::Quantity::MassFlow:
      return Quantity::MassFlow;
    case study::Quantity::Velocity:
      return Quantity::Velocity;
    case study::Quantity::Area:
      return Quantity::Area;
    case study::Quantity::Length:
      return Quantity::Length;
    case study::Quantity::Temperature:
      return Quantity::Temperature;
    case study::Quantity::Dimensionless:
      return Quantity::Dimensionless;
  }
  return Quantity::Dimensionless;
}

QString studyColumnLabel(const study::StudyColumn& column) {
  const std::string& name = column.name;
  const std::string idealPrefix = "ideal.", auditPrefix = "audit.";
  if (name.rfind(auditPrefix, 0) == 0) {
    // audit.<loss>.delta_specific_thrust_N_s_per_kg or audit.<loss>.delta_tsfc_g_per_kN_s
    const std::size_t dot = name.find('.', auditPrefix.size());
    const std::string loss = name.substr(auditPrefix.size(), dot - auditPrefix.size());
    const bool tsfc = name.find("delta_tsfc") != std::string::npos;
    return (tsfc ? tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "TSFC change without %1"))
                 : tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Specific thrust gained without %1")))
        .arg(lossName(loss));
  }
  const bool ideal = name.rfind(idealPrefix, 0) == 0;
  const std::string base = ideal ? name.substr(idealPrefix.size()) : name;
  for (const ColumnName& known : kColumns)
    if (base == known.name)
      return ideal ? tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Ideal twin: %1")).arg(tx(known.label))
                   : tx(known.label);
  return QString::fromStdString(column.label);
}

QString pointStatusName(study::PointStatus status) {
  switch (status) {
    case study::PointStatus::Solved:
      return tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Cycle"));
    case study::PointStatus::InvalidInput:
      return tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Invalid input"));
    case study::PointStatus::NoCycle:
      return tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "No cycle"));
    case study::PointStatus::NotConverged:
      return tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Not converged"));
    case study::PointStatus::OutOfRange:
      return tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Beyond the gas data"));
    case study::PointStatus::NotRun:
      return tx(QT_TRANSLATE_NOOP("cw::gui::StudyNames", "Not run"));
  }
  return {};
}

}  // namespace cw::gui
