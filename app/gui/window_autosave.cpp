#include "window_autosave.h"

#include "dialogs/problem_box.h"
#include "document/autosave_store.h"
#include "document/autosave_timer.h"
#include "document/case_document.h"

#include <QDir>
#include <QLocale>
#include <QMainWindow>
#include <QMessageBox>
#include <QStatusBar>

namespace cw::gui {

WindowAutosave::WindowAutosave(QMainWindow& window, CaseDocument& document, int limitSeconds)
    : QObject(&window), window_(window), document_(document), store_(std::make_unique<AutosaveStore>()) {
  timer_ = new AutosaveTimer(this);
  setLimitSeconds(limitSeconds);
  connect(timer_, &AutosaveTimer::due, this, &WindowAutosave::writeNow);
  connect(&document_, &CaseDocument::caseChanged, this, &WindowAutosave::scheduleAfterEdit);
  connect(&document_, &CaseDocument::modifiedChanged, this, [this](bool modified) {
    if (!modified) remove();  // saved, or back to the file's state: nothing to recover
  });
}

WindowAutosave::~WindowAutosave() = default;

QString WindowAutosave::ownFile() const {
  return store_->ownFile();
}

void WindowAutosave::setLimitSeconds(int seconds) {
  timer_->setLimit(seconds * 1000);
}

void WindowAutosave::showStatus(const QString& message) {
  window_.statusBar()->showMessage(message);
}

void WindowAutosave::scheduleAfterEdit() {
  if (document_.isModified()) timer_->edited();
}

bool WindowAutosave::writeNow() {
  timer_->stop();
  if (!document_.isModified()) return false;
  try {
    store_->write(document_.currentCase(), document_.filePath());
  } catch (const std::exception& e) {
    showStatus(tr("Autosave failed: %1").arg(QString::fromStdString(e.what())));
    return false;
  }
  return true;
}

void WindowAutosave::remove() {
  timer_->stop();
  store_->removeOwn();
}

bool WindowAutosave::recoverFrom(const QString& autosaveFile) {
  try {
    recover(AutosaveStore::read(autosaveFile));
  } catch (const std::exception& e) {
    const QString what = QString::fromStdString(e.what());
    showStatus(tr("Cannot recover: %1").arg(what));
    showProblemBox(&window_, QStringLiteral("unreadableAutosaveBox"), tr("Cannot recover case"), what,
                   QString());
    return false;
  }
  return true;
}

void WindowAutosave::recover(const Autosave& autosave) {
  document_.load(autosave.inputs, autosave.origin, true);
  emit recovered();
  showStatus(tr("Recovered the autosaved case; save it to keep it."));
}

bool WindowAutosave::readAutosave(OrphanAutosave& orphan, Autosave& autosave) {
  try {
    autosave = AutosaveStore::read(orphan.file);
    return true;
  } catch (const std::exception& e) {
    const QString aside = AutosaveStore::setAside(orphan);
    const QString kept =
        aside.isEmpty() ? tr("It was left where it is.") : tr("It was kept as %1.").arg(aside);
    showStatus(tr("An autosaved case cannot be recovered. %1").arg(kept));
    showProblemBox(&window_, QStringLiteral("unreadableAutosaveBox"), tr("Cannot recover case"),
                   tr("An autosaved case cannot be recovered: %1").arg(QString::fromStdString(e.what())),
                   kept);
    return false;
  }
}

bool WindowAutosave::askToRecover(const Autosave& autosave) {
  const QString when = QLocale().toString(autosave.saved, QLocale::ShortFormat);
  const QString text =
      autosave.origin.isEmpty()
          ? tr("Cyclewright did not close normally. Recover the untitled case autosaved at %1?").arg(when)
          : tr("Cyclewright did not close normally. Recover the changes to %1 autosaved at %2?")
                .arg(QDir::toNativeSeparators(autosave.origin), when);
  QMessageBox box(QMessageBox::Question, tr("Recover case"), text, QMessageBox::Yes | QMessageBox::No,
                  &window_);
  box.setObjectName("recoverBox");
  box.setDefaultButton(QMessageBox::Yes);
  box.setInformativeText(tr("No discards this autosave."));
  return box.exec() == QMessageBox::Yes;
}

bool WindowAutosave::offerRecovery() {
  store_->removeStaleTemporaries();
  std::vector<OrphanAutosave> orphans = store_->claimOrphans();
  for (OrphanAutosave& orphan : orphans) {
    Autosave autosave;
    if (!readAutosave(orphan, autosave)) continue;
    if (!askToRecover(autosave)) {
      AutosaveStore::discard(orphan);
      continue;
    }
    recover(autosave);
    // The orphan goes only once this window's own autosave holds the case.
    if (writeNow()) AutosaveStore::discard(orphan);
    return true;
  }
  return false;
}

}  // namespace cw::gui
