#include "document/autosave_timer.h"

#include <QTimer>

#include <algorithm>

namespace cw::gui {

namespace {

QTimer* singleShot(QObject* parent, int ms) {
  auto* timer = new QTimer(parent);
  timer->setSingleShot(true);
  timer->setTimerType(Qt::PreciseTimer);  // a coarse timer may fire 5 % early
  timer->setInterval(ms);
  return timer;
}

}  // namespace

AutosaveTimer::AutosaveTimer(QObject* parent)
    : QObject(parent), pause_(singleShot(this, kPauseMs)), limit_(singleShot(this, 5000)) {
  connect(pause_, &QTimer::timeout, this, &AutosaveTimer::fire);
  connect(limit_, &QTimer::timeout, this, &AutosaveTimer::fire);
}

void AutosaveTimer::setLimit(int limitMs) {
  limit_->setInterval(std::max(limitMs, 1));
  pause_->setInterval(std::min(kPauseMs, limit_->interval()));
}

int AutosaveTimer::limit() const {
  return limit_->interval();
}

int AutosaveTimer::pause() const {
  return pause_->interval();
}

void AutosaveTimer::edited() {
  pause_->start();
  if (!limit_->isActive()) limit_->start();
}

void AutosaveTimer::stop() {
  pause_->stop();
  limit_->stop();
}

bool AutosaveTimer::isPending() const {
  return pause_->isActive() || limit_->isActive();
}

void AutosaveTimer::fire() {
  stop();
  emit due();
}

}  // namespace cw::gui
