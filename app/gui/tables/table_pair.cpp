#include "tables/table_pair.h"

#include <QResizeEvent>
#include <QSplitter>
#include <QStackedLayout>
#include <QTabBar>
#include <QTabWidget>

#include <algorithm>

namespace cw::gui {

TablePair::TablePair(QWidget* first, const QString& firstTitle, QWidget* second, const QString& secondTitle,
                     QWidget* parent)
    : QWidget(parent), first_(first), second_(second), firstTitle_(firstTitle), secondTitle_(secondTitle) {
  split_ = new QSplitter(Qt::Horizontal);
  split_->setObjectName("tablePairSplitter");
  split_->setChildrenCollapsible(false);
  tabs_ = new QTabWidget;
  tabs_->setObjectName("tablePairTabs");
  tabs_->setDocumentMode(true);
  stack_ = new QStackedLayout(this);
  stack_->setContentsMargins(0, 0, 0, 0);
  stack_->addWidget(split_);
  stack_->addWidget(tabs_);
  arrange(true);
}

bool TablePair::sideBySide() const {
  return stack_->currentWidget() == split_;
}

void TablePair::setTitles(const QString& firstTitle, const QString& secondTitle) {
  firstTitle_ = firstTitle;
  secondTitle_ = secondTitle;
  if (!sideBySide()) {
    tabs_->setTabText(0, firstTitle_);
    tabs_->setTabText(1, secondTitle_);
  }
}

int TablePair::widthOfBoth() const {
  return first_->minimumSizeHint().width() + second_->minimumSizeHint().width() + split_->handleWidth();
}

QSize TablePair::minimumSizeHint() const {
  // In tabs it needs only the wider of the two.
  const int width = std::max(first_->minimumSizeHint().width(), second_->minimumSizeHint().width());
  const int height = std::max(first_->minimumSizeHint().height(), second_->minimumSizeHint().height());
  return {width, height + (sideBySide() ? 0 : tabs_->tabBar()->sizeHint().height())};
}

void TablePair::resizeEvent(QResizeEvent* event) {
  QWidget::resizeEvent(event);
  fit();
}

void TablePair::showEvent(QShowEvent* event) {
  QWidget::showEvent(event);
  fit();  // a resize while hidden may have been the last one
}

void TablePair::fit() {
  const bool both = width() >= widthOfBoth();
  if (both == sideBySide()) return;
  arrange(both);
  emit arranged(both);
}

void TablePair::arrange(bool sideBySide) {
  if (sideBySide) {
    tabs_->clear();
    split_->addWidget(first_);
    split_->addWidget(second_);
    // The station table takes what is left once the summary has its columns.
    split_->setStretchFactor(0, 1);
    split_->setStretchFactor(1, 0);
    stack_->setCurrentWidget(split_);
    first_->show();
    second_->show();
  } else {
    // The tab widget shows one of them; showing both here would paint them on each other.
    tabs_->addTab(first_, firstTitle_);
    tabs_->addTab(second_, secondTitle_);
    tabs_->setCurrentIndex(0);
    stack_->setCurrentWidget(tabs_);
  }
  updateGeometry();
}

}  // namespace cw::gui
