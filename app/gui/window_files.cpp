#include "window_files.h"

#include "dialogs/problem_box.h"
#include "document/case_document.h"
#include "document/settings.h"

#include "common/error.h"
#include "engine/case_validation_error.h"
#include "engine/parameter_registry.h"
#include "io/atomic_file.h"
#include "io/case_file.h"
#include "io/case_keys.h"
#include "io/json_document.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QMainWindow>
#include <QMessageBox>
#include <QStatusBar>

namespace cw::gui {

namespace {

/// The case at a path or a Qt resource; throws as io::readCaseFile does, naming the path.
engine::Case readCaseAt(const QString& path) {
  if (!path.startsWith(QLatin1Char(':')))
    return io::readCaseFile(QDir::toNativeSeparators(path).toStdString());
  QFile file(path);
  if (!file.open(QIODevice::ReadOnly))
    throw InvalidInput(path.toStdString(), "cannot read case file: " + file.errorString().toStdString());
  const QByteArray bytes = file.readAll();
  // The same checks as a file from disk (nesting, NUL, trailing text, every JSON-library error).
  return io::parseCaseText(std::string_view(bytes.constData(), static_cast<std::size_t>(bytes.size())),
                           path.toStdString());
}

/// Why a case cannot be opened: the core reader's message, naming the file first.
QString openFailureText(const QString& path, const std::exception& e) {
  const auto* invalid = dynamic_cast<const engine::CaseValidationError*>(&e);
  if (!invalid) return QString::fromStdString(e.what());
  QStringList lines;
  for (const auto& p : invalid->problems()) lines << QString::fromStdString(p.message);
  return path + QStringLiteral(": ") + lines.join(QLatin1Char('\n'));
}

/// Removes the temporaries interrupted atomic saves of a case file left beside it.
void removeStaleTemporariesOf(const QString& path) {
  if (path.isEmpty() || path.startsWith(QLatin1Char(':'))) return;
  const QFileInfo info(path);
  io::removeStaleTemporaries(info.absolutePath().toStdString(), info.fileName().toStdString());
}

bool isResource(const QString& path) {
  return path.startsWith(QLatin1Char(':'));
}

/// The case-file version of a file that was read as a case (so its document is valid JSON).
int caseVersionAt(const QString& path) {
  try {
    if (!isResource(path))
      return io::caseDocumentVersion(io::readCaseDocument(QDir::toNativeSeparators(path).toStdString()));
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) return io::kCaseVersion;
    const QByteArray bytes = file.readAll();
    return io::caseDocumentVersion(io::parseDocumentText(
        std::string_view(bytes.constData(), static_cast<std::size_t>(bytes.size())), path.toStdString()));
  } catch (const std::exception&) {
    return io::kCaseVersion;
  }
}

}  // namespace

WindowFiles::WindowFiles(QMainWindow& window, CaseDocument& document, AppSettings& settings,
                         const DisplayUnits& units)
    : QObject(&window),
      window_(window),
      document_(document),
      settings_(settings),
      units_(units),
      fileVersion_(io::kCaseVersion) {
  connect(&document_, &CaseDocument::modifiedChanged, this, &WindowFiles::updateTitle);
}

bool WindowFiles::openCase(const QString& path, QString* error) {
  engine::Case loaded;
  try {
    loaded = readCaseAt(path);
  } catch (const std::exception& e) {
    return refuseToOpen(openFailureText(path, e), error);
  }
  removeStaleTemporariesOf(path);
  fileVersion_ = caseVersionAt(path);
  fileOfVersion_ = path;
  document_.load(loaded, path);
  if (!isResource(path)) settings_.addRecentFile(QFileInfo(path).absoluteFilePath());
  updateTitle();
  const QString title = QString::fromStdString(loaded.title);
  const QString name = title.isEmpty() ? path : title;
  if (fileVersion_ < io::kCaseVersion)
    window_.statusBar()->showMessage(
        tr("Opened %1, read as a version %2 single-spool turbojet case; saving writes version %3")
            .arg(name)
            .arg(fileVersion_)
            .arg(io::kCaseVersion));
  else
    window_.statusBar()->showMessage(tr("Opened %1 (%2)").arg(name, architectureText(loaded.architecture)));
  return true;
}

bool WindowFiles::openBaseline(const QString& path, QString* error) {
  QString why;
  try {
    const engine::Case inputs = readCaseAt(path);
    const QString title =
        inputs.title.empty() ? QFileInfo(path).fileName() : QString::fromStdString(inputs.title);
    if (document_.setBaseline(inputs, title, &why, &units_)) {
      window_.statusBar()->showMessage(tr("Baseline: %1").arg(title));
      return true;
    }
    why = path + QStringLiteral(": ") + why;
  } catch (const std::exception& e) {
    why = openFailureText(path, e);
  }
  if (error) *error = why;
  window_.statusBar()->showMessage(tr("Baseline not opened: %1").arg(why.section(QLatin1Char('\n'), 0, 0)));
  showProblemBox(&window_, QStringLiteral("baselineFailedBox"), tr("Cannot open baseline"), why,
                 tr("The baseline is unchanged."));
  return false;
}

void WindowFiles::chooseBaseline() {
  const QString path = QFileDialog::getOpenFileName(&window_, tr("Open Baseline"), QString(),
                                                    tr("Cyclewright cases (*.json);;All files (*)"));
  if (!path.isEmpty()) openBaseline(path);
}

bool WindowFiles::refuseToOpen(const QString& message, QString* error) {
  if (error) *error = message;
  window_.statusBar()->showMessage(tr("Not opened: %1").arg(message.section(QLatin1Char('\n'), 0, 0)));
  showProblemBox(&window_, QStringLiteral("openFailedBox"), tr("Cannot open case"), message,
                 tr("The case shown is unchanged."));
  return false;
}

bool WindowFiles::confirmVersionUpgrade(const QString& path) {
  if (fileVersion_ >= io::kCaseVersion || QFileInfo(path) != QFileInfo(fileOfVersion_)) return true;
  QMessageBox box(QMessageBox::Question, tr("Save as version %1").arg(io::kCaseVersion),
                  tr("%1 is a version %2 case file. Saving writes it as version %3, which older "
                     "versions of Cyclewright cannot read. Save anyway?")
                      .arg(QFileInfo(path).fileName())
                      .arg(fileVersion_)
                      .arg(io::kCaseVersion),
                  QMessageBox::Save | QMessageBox::Cancel, &window_);
  box.setObjectName(QStringLiteral("versionOneSaveBox"));
  box.setDefaultButton(QMessageBox::Save);
  return box.exec() == QMessageBox::Save;
}

bool WindowFiles::saveCaseAs(const QString& path) {
  if (!confirmVersionUpgrade(path)) {
    window_.statusBar()->showMessage(tr("Not saved: %1 is kept as version %2").arg(path).arg(fileVersion_));
    return false;
  }
  try {
    io::writeCaseFile(path.toStdString(), document_.currentCase());
  } catch (const std::exception& e) {
    window_.statusBar()->showMessage(tr("Cannot save %1: %2").arg(path, QString::fromStdString(e.what())));
    if (window_.isVisible())
      QMessageBox::warning(&window_, tr("Cannot save"), QString::fromStdString(e.what()));
    return false;
  }
  document_.markSaved(path);
  fileVersion_ = io::kCaseVersion;
  fileOfVersion_ = path;
  removeStaleTemporariesOf(path);
  settings_.addRecentFile(QFileInfo(path).absoluteFilePath());
  emit saved();
  updateTitle();
  window_.statusBar()->showMessage(tr("Saved %1").arg(path));
  return true;
}

void WindowFiles::newCase(engine::Architecture architecture) {
  if (!maybeSave()) return;
  fileVersion_ = io::kCaseVersion;
  fileOfVersion_.clear();
  document_.load(engine::newCase(architecture), QString());
  updateTitle();
  window_.statusBar()->showMessage(tr("New case: %1").arg(architectureText(architecture)));
}

void WindowFiles::open() {
  if (!maybeSave()) return;
  const QString path = QFileDialog::getOpenFileName(&window_, tr("Open Case"), QString(),
                                                    tr("Cyclewright cases (*.json);;All files (*)"));
  if (!path.isEmpty()) openCase(path);
}

bool WindowFiles::save() {
  const QString path = document_.filePath();
  if (path.isEmpty() || isResource(path)) return saveAs();
  return saveCaseAs(path);
}

bool WindowFiles::saveAs() {
  QString suggestion = document_.filePath();
  if (suggestion.isEmpty() || isResource(suggestion))
    suggestion = QDir::home().filePath(suggestion.isEmpty() ? QStringLiteral("case.json")
                                                            : QFileInfo(suggestion).fileName());
  const QString path = QFileDialog::getSaveFileName(&window_, tr("Save Case As"), suggestion,
                                                    tr("Cyclewright cases (*.json)"));
  return !path.isEmpty() && saveCaseAs(path);
}

void WindowFiles::openRecent(const QString& path) {
  if (maybeSave()) openCase(path);
}

QStringList WindowFiles::recentFiles() const {
  return settings_.recentFiles();
}

bool WindowFiles::maybeSave() {
  if (!document_.isModified()) return true;
  const auto answer = QMessageBox::warning(&window_, tr("Unsaved changes"),
                                           tr("The case has unsaved changes. Save them first?"),
                                           QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel);
  if (answer == QMessageBox::Save) return save();
  return answer == QMessageBox::Discard;
}

void WindowFiles::updateTitle() {
  const QString path = document_.filePath();
  const QString name = path.isEmpty() ? tr("Untitled") : QFileInfo(path).fileName();
  window_.setWindowTitle(
      tr("%1[*] — %2 — Cyclewright").arg(name, architectureText(document_.currentCase().architecture)));
  window_.setWindowModified(document_.isModified());
}

QString WindowFiles::architectureText(engine::Architecture architecture) {
  // The registry's names of the architectures (context "Parameters").
  const engine::Parameter& entry = *engine::findParameter("engine", "architecture");
  return QCoreApplication::translate("Parameters",
                                     entry.choices.at(static_cast<std::size_t>(architecture)).label.data());
}

}  // namespace cw::gui
