#include "view/desk_table_view.hpp"

#include <QHeaderView>

namespace atollog::view {

DeskTableView::DeskTableView(QWidget *parent) : QTableView(parent) {
    setEditTriggers(QAbstractItemView::DoubleClicked | QAbstractItemView::EditKeyPressed |
                    QAbstractItemView::AnyKeyPressed | QAbstractItemView::SelectedClicked);
    setTabKeyNavigation(true);
    setSelectionBehavior(QAbstractItemView::SelectItems);
    setSelectionMode(QAbstractItemView::SingleSelection);
    setAlternatingRowColors(true);
    verticalHeader()->setDefaultSectionSize(fontMetrics().height() + 6);
    horizontalHeader()->setHighlightSections(false);
}

QModelIndex DeskTableView::moveCursor(CursorAction action, Qt::KeyboardModifiers modifiers) {
    if ((action != MoveNext && action != MovePrevious) || !model()) {
        return QTableView::moveCursor(action, modifiers);
    }
    const QModelIndex current = currentIndex();
    const int rows = model()->rowCount(rootIndex());
    const int columns = model()->columnCount(rootIndex());
    if (!current.isValid() || rows == 0 || columns == 0) {
        return QTableView::moveCursor(action, modifiers);
    }
    // Cells in reading order; step until an editable, visible one. The ends stay put.
    const int step = action == MoveNext ? 1 : -1;
    for (int cell = current.row() * columns + current.column() + step;
         cell >= 0 && cell < rows * columns; cell += step) {
        const QModelIndex i = model()->index(cell / columns, cell % columns, rootIndex());
        if ((i.flags() & Qt::ItemIsEditable) && !isColumnHidden(i.column()) &&
            !isRowHidden(i.row())) {
            return i;
        }
    }
    return current;
}

} // namespace atollog::view
