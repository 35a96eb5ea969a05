#include "document/autosave_store.h"

#include "common/error.h"
#include "engine/case_validation_error.h"
#include "io/atomic_file.h"
#include "io/case_file.h"
#include "io/json_document.h"

#include <nlohmann/json.hpp>

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QLockFile>
#include <QStandardPaths>
#include <QThread>

#include <cstdio>
#include <functional>
#include <string>

namespace cw::gui {

namespace {

using nlohmann::json;

[[noreturn]] void refuse(const QString& file, const std::string& what) {
  throw InvalidInput(file.toStdString(), what);
}

std::unique_ptr<QLockFile> lockFor(const QString& autosaveFile) {
  QString stem = autosaveFile;
  stem.chop(int(sizeof(".json")) - 1);
  auto lock = std::make_unique<QLockFile>(stem + QStringLiteral(".lock"));
  lock->setStaleLockTime(0);  // held as long as its process runs, however long that is
  return lock;
}

/// The test seam: a pause before the rename when kTestDelayVariable is set.
std::function<void()> pauseBeforeRename() {
  const int ms = qEnvironmentVariableIntValue(AutosaveStore::kTestDelayVariable);
  if (ms <= 0) return {};
  return [ms] {
    std::fprintf(stderr, "cyclewright: test: autosave paused before its rename\n");
    std::fflush(stderr);
    QThread::msleep(static_cast<unsigned long>(ms));
  };
}

/// The origin as stored: a file's absolute path, a resource path as it is, or empty.
QString storedOrigin(const QString& origin) {
  if (origin.isEmpty() || origin.startsWith(QLatin1Char(':'))) return origin;
  return QFileInfo(origin).absoluteFilePath();
}

/// The autosave's document, read like every document (core/io/json_document.h: a regular file of at
/// most 4 MiB, bounded nesting, every JSON-library error an InvalidInput naming the file).
json parseDocument(const QString& file) {
  const std::string path = file.toStdString();
  return io::parseDocumentText(io::readDocumentFile(path, "autosave"), path);
}

void checkHeader(const QString& file, const json& document) {
  if (!document.is_object()) refuse(file, "not a JSON object");
  const json format = document.value("format", json());
  if (format == json(io::kCaseFormat))
    refuse(file, "a case file without its origin, not an autosave (format \"cyclewright-case\", expected \"" +
                     std::string(AutosaveStore::kFormat) + "\"); open it with File > Open");
  if (format != json(AutosaveStore::kFormat))
    refuse(file, "format = " + format.dump() + ", expected \"" + std::string(AutosaveStore::kFormat) + "\"");
  const json version = document.value("version", json());
  if (!version.is_number_integer() || version.get<long long>() != AutosaveStore::kVersion)
    refuse(file, "version = " + version.dump() + ", expected " + std::to_string(AutosaveStore::kVersion));
  for (const auto& [key, value] : document.items())
    if (key != "format" && key != "version" && key != "origin" && key != "case")
      refuse(file, "unknown key \"" + key + "\" (expected format, version, origin and case)");
}

QString checkedOrigin(const QString& file, const json& document) {
  const auto origin = document.find("origin");
  if (origin == document.end() || !origin->is_string())
    refuse(file, "origin must be a string (the case file's absolute path, or empty)");
  const QString path = QString::fromStdString(origin->get<std::string>());
  if (!path.isEmpty() && !path.startsWith(QLatin1String(":/")) && QDir::isRelativePath(path))
    refuse(file, "origin = \"" + path.toStdString() + "\" is not an absolute path");
  return path;
}

engine::Case checkedCase(const QString& file, const json& document) {
  const auto inputs = document.find("case");
  if (inputs == document.end() || !inputs->is_object())
    refuse(file, "case must be a case document (an object)");
  try {
    return io::parseCaseStructure(*inputs);  // ranges are not checked: it may hold a value being typed
  } catch (const engine::CaseValidationError& e) {
    std::string problems;
    for (const auto& p : e.problems()) problems += (problems.empty() ? "" : "; ") + p.message;
    refuse(file, "its case is malformed: " + problems);
  }
}

}  // namespace

AutosaveStore::AutosaveStore(const QString& folder) : folder_(folder) {}

AutosaveStore::~AutosaveStore() = default;  // releases the lock; the autosave stays, as after a crash

QString AutosaveStore::defaultFolder() {
  return QStandardPaths::writableLocation(QStandardPaths::AppLocalDataLocation);
}

bool AutosaveStore::claimOwnFile() {
  static int counter = 0;  // windows of one process get files of their own
  QDir().mkpath(folder_);
  const QString pid = QString::number(QCoreApplication::applicationPid());
  for (int attempt = 0; attempt < 100; ++attempt) {
    const QString file =
        QDir(folder_).filePath(QStringLiteral("autosave-%1-%2.json").arg(pid).arg(++counter));
    std::unique_ptr<QLockFile> lock = lockFor(file);
    if (QFile::exists(file) || QFile::exists(lock->fileName()) || !lock->tryLock(0)) continue;
    ownLock_ = std::move(lock);
    ownFile_ = file;
    return true;
  }
  return false;
}

void AutosaveStore::write(const engine::Case& inputs, const QString& origin) {
  if (ownFile_.isEmpty() && !claimOwnFile())
    refuse(folder_, "cannot create an autosave file of this instance");
  const QByteArray document = encode(inputs, origin);
  io::writeFileAtomically(ownFile_.toStdString(), std::string_view(document.constData(), document.size()),
                          pauseBeforeRename());
}

void AutosaveStore::removeOwn() {
  if (!ownFile_.isEmpty()) QFile::remove(ownFile_);
}

std::vector<OrphanAutosave> AutosaveStore::claimOrphans() const {
  std::vector<OrphanAutosave> orphans;
  const QFileInfoList files =
      QDir(folder_).entryInfoList({QStringLiteral("autosave-*.json")}, QDir::Files, QDir::Time);
  for (const QFileInfo& info : files) {
    if (!ownFile_.isEmpty() && info.absoluteFilePath() == QFileInfo(ownFile_).absoluteFilePath()) continue;
    std::shared_ptr<QLockFile> lock = lockFor(info.absoluteFilePath());
    if (lock->tryLock(0)) orphans.push_back({info.absoluteFilePath(), std::move(lock)});
  }
  return orphans;
}

void AutosaveStore::discard(OrphanAutosave& orphan) {
  QFile::remove(orphan.file);
  if (orphan.lock) orphan.lock->unlock();
}

QString AutosaveStore::setAside(OrphanAutosave& orphan) {
  QString aside = orphan.file + QStringLiteral(".unreadable");
  for (int n = 2; QFile::exists(aside) && n < 100; ++n)
    aside = orphan.file + QStringLiteral(".unreadable-%1").arg(n);
  const bool renamed = QFile::rename(orphan.file, aside);
  if (orphan.lock) orphan.lock->unlock();
  return renamed ? aside : QString();
}

Autosave AutosaveStore::read(const QString& file) {
  const json document = parseDocument(file);
  checkHeader(file, document);
  Autosave autosave;
  autosave.file = file;
  autosave.origin = checkedOrigin(file, document);
  autosave.inputs = checkedCase(file, document);
  autosave.saved = QFileInfo(file).lastModified();
  return autosave;
}

QByteArray AutosaveStore::encode(const engine::Case& inputs, const QString& origin) {
  nlohmann::ordered_json document;
  document["format"] = kFormat;
  document["version"] = kVersion;
  document["origin"] = storedOrigin(origin).toStdString();
  document["case"] = nlohmann::ordered_json(io::caseToJson(inputs));
  return QByteArray::fromStdString(document.dump(2) + "\n");
}

std::size_t AutosaveStore::removeStaleTemporaries() const {
  std::size_t removed = io::removeStaleTemporaries(folder_.toStdString());
  for (const QFileInfo& info :
       QDir(folder_).entryInfoList({QStringLiteral("autosave-*.lock")}, QDir::Files)) {
    const QString autosave =
        info.absolutePath() + QLatin1Char('/') + info.completeBaseName() + QStringLiteral(".json");
    if (QFile::exists(autosave)) continue;  // an orphan's lock goes with the orphan
    const std::unique_ptr<QLockFile> lock = lockFor(autosave);
    if (!lock->tryLock(0)) continue;  // its instance runs
    lock->unlock();
    ++removed;
  }
  return removed;
}

}  // namespace cw::gui
