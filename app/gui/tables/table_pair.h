#pragma once
// Two tables side by side while the room allows both at their minimum width, else in two tabs:
// the station table and the performance summary on a laptop screen with a dock open. Neither
// table is ever squeezed below the width of its columns.

#include <QWidget>

class QSplitter;
class QStackedLayout;
class QTabWidget;

namespace cw::gui {

class TablePair : public QWidget {
  Q_OBJECT

 public:
  TablePair(QWidget* first, const QString& firstTitle, QWidget* second, const QString& secondTitle,
            QWidget* parent = nullptr);

  /// Whether the two are side by side (else in tabs).
  bool sideBySide() const;
  /// Titles of the tabs (translated by the caller).
  void setTitles(const QString& firstTitle, const QString& secondTitle);

  QSize minimumSizeHint() const override;
  /// Side by side or in tabs for the present width (also on every resize and show).
  void fit();

 signals:
  /// The two went side by side or into tabs (the height they need changed).
  void arranged(bool sideBySide);

 protected:
  void resizeEvent(QResizeEvent* event) override;
  void showEvent(QShowEvent* event) override;

 private:
  /// The width both need side by side [px].
  int widthOfBoth() const;
  void arrange(bool sideBySide);

  QWidget* first_;
  QWidget* second_;
  QString firstTitle_, secondTitle_;
  QSplitter* split_ = nullptr;
  QTabWidget* tabs_ = nullptr;
  QStackedLayout* stack_ = nullptr;
};

}  // namespace cw::gui
