#pragma once
// A table for logging: typing into a cell starts editing it, and Tab / Shift+Tab move to the
// next / previous *editable* cell (row by row), so computed columns (recovery, the suggested
// texture) never stop the logger typing down the core.
#include <QTableView>

namespace atollog::view {

class DeskTableView : public QTableView {
    Q_OBJECT

  public:
    explicit DeskTableView(QWidget *parent = nullptr);

  protected:
    QModelIndex moveCursor(CursorAction action, Qt::KeyboardModifiers modifiers) override;
};

} // namespace atollog::view
