#pragma once
// The one router of the selection: which section of the case (component, flight condition, ...)
// is selected. The strip, the form stack, the charts and the station table all follow it.

#include "document/case_fields.h"

#include <QObject>

namespace cw::gui {

class SelectionRouter : public QObject {
  Q_OBJECT

 public:
  explicit SelectionRouter(QObject* parent = nullptr) : QObject(parent) {}

  Section current() const { return current_; }
  void select(Section section) {
    if (section == current_ && initialised_) return;
    initialised_ = true;
    current_ = section;
    emit selected(section);
  }

 signals:
  void selected(cw::gui::Section section);

 private:
  Section current_ = Section::Compressor;
  bool initialised_ = false;
};

}  // namespace cw::gui
