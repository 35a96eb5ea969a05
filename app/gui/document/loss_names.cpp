#include "document/loss_names.h"

#include <QCoreApplication>

#include <array>

namespace cw::gui {

namespace {

struct LossNames {
  const char* key;
  const char* name;
  const char* shortName;
  Section section;
};

// The shared keys (compressor_efficiency, bleed, ...) name the HP spool's losses in a two-spool
// case; their names stay those of the single spool (no case reaches these names). The LP losses
// belong to the compressor's and the turbine's strip items until the strip has LP items.
constexpr std::array<LossNames, 18> kLosses{{
    {"inlet_recovery", QT_TRANSLATE_NOOP("LossNames", "Inlet pressure recovery"),
     QT_TRANSLATE_NOOP("LossNames", "Inlet"), Section::Inlet},
    {"low_pressure_compressor_efficiency", QT_TRANSLATE_NOOP("LossNames", "LP compressor efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "LP compressor"), Section::Compressor},
    {"compressor_efficiency", QT_TRANSLATE_NOOP("LossNames", "Compressor efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "Compressor"), Section::Compressor},
    {"burner_pressure_loss", QT_TRANSLATE_NOOP("LossNames", "Burner pressure loss"),
     QT_TRANSLATE_NOOP("LossNames", "Burner Δp"), Section::Burner},
    {"combustion_efficiency", QT_TRANSLATE_NOOP("LossNames", "Combustion efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "Combustion"), Section::Burner},
    {"turbine_efficiency", QT_TRANSLATE_NOOP("LossNames", "Turbine efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "Turbine"), Section::Turbine},
    {"mechanical_efficiency", QT_TRANSLATE_NOOP("LossNames", "Mechanical efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "Shaft"), Section::Turbine},
    {"low_pressure_turbine_efficiency", QT_TRANSLATE_NOOP("LossNames", "LP turbine efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "LP turbine"), Section::Turbine},
    {"low_pressure_mechanical_efficiency", QT_TRANSLATE_NOOP("LossNames", "LP shaft mechanical efficiency"),
     QT_TRANSLATE_NOOP("LossNames", "LP shaft"), Section::Turbine},
    {"jet_pipe_loss", QT_TRANSLATE_NOOP("LossNames", "Jet pipe pressure loss"),
     QT_TRANSLATE_NOOP("LossNames", "Jet pipe"), Section::JetPipe},
    {"afterburner_loss", QT_TRANSLATE_NOOP("LossNames", "Afterburner losses"),
     QT_TRANSLATE_NOOP("LossNames", "Afterburner"), Section::Afterburner},
    {"nozzle_velocity_coefficient", QT_TRANSLATE_NOOP("LossNames", "Nozzle velocity coefficient"),
     QT_TRANSLATE_NOOP("LossNames", "Nozzle Cv"), Section::Nozzle},
    {"nozzle_discharge_coefficient", QT_TRANSLATE_NOOP("LossNames", "Nozzle discharge coefficient"),
     QT_TRANSLATE_NOOP("LossNames", "Nozzle Cd"), Section::Nozzle},
    {"nozzle_expansion", QT_TRANSLATE_NOOP("LossNames", "Incomplete nozzle expansion"),
     QT_TRANSLATE_NOOP("LossNames", "Expansion"), Section::Nozzle},
    {"low_pressure_bleed", QT_TRANSLATE_NOOP("LossNames", "LP compressor bleed"),
     QT_TRANSLATE_NOOP("LossNames", "LP bleed"), Section::Compressor},
    {"bleed", QT_TRANSLATE_NOOP("LossNames", "Compressor bleed"), QT_TRANSLATE_NOOP("LossNames", "Bleed"),
     Section::Compressor},
    {"power_offtake", QT_TRANSLATE_NOOP("LossNames", "Shaft power offtake"),
     QT_TRANSLATE_NOOP("LossNames", "Offtake"), Section::Turbine},
    {"low_pressure_power_offtake", QT_TRANSLATE_NOOP("LossNames", "LP shaft power offtake"),
     QT_TRANSLATE_NOOP("LossNames", "LP offtake"), Section::Turbine},
}};

const LossNames* find(const std::string& key) {
  for (const auto& l : kLosses)
    if (key == l.key) return &l;
  return nullptr;
}

// The core's "per" texts (core/analysis/loss_catalogue.cpp), for translation.
constexpr std::array<const char*, 7> kUnitTexts{{
    QT_TRANSLATE_NOOP("LossNames", "point of efficiency (0.01)"),
    QT_TRANSLATE_NOOP("LossNames", "percent of pressure-loss fraction (0.01)"),
    QT_TRANSLATE_NOOP("LossNames", "point of recovery or ram efficiency (0.01)"),
    QT_TRANSLATE_NOOP("LossNames", "point of velocity coefficient or nozzle efficiency (0.01)"),
    QT_TRANSLATE_NOOP("LossNames", "point of discharge coefficient (0.01)"),
    QT_TRANSLATE_NOOP("LossNames", "percent of bleed (0.01)"),
    QT_TRANSLATE_NOOP("LossNames", "kW of offtake (1000 W)"),
}};

struct ComponentName {
  const char* key;
  const char* name;
};

constexpr std::array<ComponentName, 8> kComponents{{
    {"inlet", QT_TRANSLATE_NOOP("LossNames", "Inlet")},
    {"compressor", QT_TRANSLATE_NOOP("LossNames", "Compressor")},
    {"burner", QT_TRANSLATE_NOOP("LossNames", "Burner")},
    {"turbine", QT_TRANSLATE_NOOP("LossNames", "Turbine")},
    {"shaft", QT_TRANSLATE_NOOP("LossNames", "Shaft")},
    {"jet_pipe", QT_TRANSLATE_NOOP("LossNames", "Jet pipe")},
    {"afterburner", QT_TRANSLATE_NOOP("LossNames", "Afterburner")},
    {"nozzle", QT_TRANSLATE_NOOP("LossNames", "Nozzle")},
}};

}  // namespace

QString lossName(const std::string& key) {
  const LossNames* l = find(key);
  return l ? QCoreApplication::translate("LossNames", l->name) : QString::fromStdString(key);
}

QString lossShortName(const std::string& key) {
  const LossNames* l = find(key);
  return l ? QCoreApplication::translate("LossNames", l->shortName) : QString::fromStdString(key);
}

Section lossSection(const std::string& key) {
  const LossNames* l = find(key);
  return l ? l->section : Section::Case;
}

QString sensitivityUnitText(const std::string& coreText) {
  for (const char* text : kUnitTexts)
    if (coreText == text) return QCoreApplication::translate("LossNames", text);
  return QString::fromStdString(coreText);
}

QString exergyComponentName(const std::string& component) {
  for (const auto& c : kComponents)
    if (component == c.key) return QCoreApplication::translate("LossNames", c.name);
  return QString::fromStdString(component);
}

}  // namespace cw::gui
