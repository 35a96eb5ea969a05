// A child for test_gui_autosave: opens a case file in the main window, edits it and autosaves,
// then edits again and autosaves with the test seam's pause before the rename, where the test
// kills it (SIGKILL). It says on stderr when each step is done.
//
//   autosave_crash_helper CASE complete-first|pause-first
//
// complete-first: the first autosave completes (title "First edit", pressure ratio 9.5), the
// second pauses; pause-first: the first autosave already pauses. Run it in the suite's home
// (cw::test::IsolatedHome) so that it autosaves into the suite's folder.
#include "document/autosave_store.h"
#include "document/case_document.h"
#include "main_window.h"

#include <QApplication>
#include <QLocale>

#include <cstdio>

namespace {

void edit(cw::gui::MainWindow& window, const char* title, double pressureRatio) {
  cw::engine::Case edited = window.document().currentCase();
  edited.title = title;
  edited.compressor.pressureRatio = pressureRatio;
  window.document().applyEdit(-1, QStringLiteral("edit"), edited);
}

void say(const char* line) {
  std::fprintf(stderr, "%s\n", line);
  std::fflush(stderr);
}

}  // namespace

int main(int argc, char** argv) {
  QApplication app(argc, argv);
  QCoreApplication::setOrganizationName("CyclewrightTest");
  QCoreApplication::setApplicationName("CyclewrightTestAutosave");
  QLocale::setDefault(QLocale::c());
  const QStringList arguments = QCoreApplication::arguments();
  if (arguments.size() != 3) return 2;
  const bool completeFirst = arguments[2] == QLatin1String("complete-first");
  cw::gui::MainWindow window;
  if (!window.openCase(arguments[1])) return 3;
  edit(window, "First edit", 9.5);
  if (completeFirst) {
    if (!window.autosaveNow()) return 4;
    say("helper: first autosave written");
    edit(window, "Second edit", 12.0);
  }
  qputenv(cw::gui::AutosaveStore::kTestDelayVariable, "60000");
  window.autosaveNow();  // pauses a minute before its rename: the test kills it there
  say("helper: not killed");
  return 5;
}
