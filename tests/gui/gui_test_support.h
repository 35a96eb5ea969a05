#pragma once
// Shared set-up of the GUI suites: the C locale for typed numbers, and settings, autosaves and
// recent files kept in Qt's test locations under an application name of the suite's own.

#include <QCoreApplication>
#include <QLocale>
#include <QStandardPaths>
#include <QString>

namespace cw::test {

inline void isolateGuiTest(const QString& applicationName) {
  QLocale::setDefault(QLocale::c());
  QStandardPaths::setTestModeEnabled(true);
  QCoreApplication::setOrganizationName("CyclewrightTest");
  QCoreApplication::setApplicationName(applicationName);
}

}  // namespace cw::test
