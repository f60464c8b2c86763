#include "view/desk_table_model.hpp"

#include "view/desk_project.hpp"

#include <QBrush>
#include <QColor>

namespace atollog::view {

DeskTableModel::DeskTableModel(DeskProject &desk, QObject *parent)
    : QAbstractTableModel(parent), desk_(desk) {
    connect(&desk_, &DeskProject::changed, this, &DeskTableModel::refresh);
}

void DeskTableModel::setHole(const std::string &hole) {
    beginResetModel();
    hole_ = hole;
    refused_cell_.reset();
    readRows(desk_.data(), hole_);
    endResetModel();
}

void DeskTableModel::setDepthUnit(DepthUnit unit) {
    if (unit == unit_) {
        return;
    }
    unit_ = unit;
    emit headerDataChanged(Qt::Horizontal, 0, columnCount() - 1);
    if (rowCount() > 0) {
        emit dataChanged(index(0, 0), index(rowCount() - 1, columnCount() - 1));
    }
}

void DeskTableModel::refresh() {
    if (rowsIn(desk_.data(), hole_) != storedRowCount()) {
        beginResetModel();
        refused_cell_.reset();
        readRows(desk_.data(), hole_);
        endResetModel();
        return;
    }
    readRows(desk_.data(), hole_);
    if (storedRowCount() > 0) {
        emit dataChanged(index(0, 0), index(storedRowCount() - 1, columnCount() - 1));
    }
}

int DeskTableModel::rowCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : storedRowCount();
}

int DeskTableModel::columnCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : columnTotal();
}

QVariant DeskTableModel::headerData(int section, Qt::Orientation orientation, int role) const {
    if (orientation == Qt::Vertical) {
        return role == Qt::DisplayRole ? QVariant(section + 1) : QVariant();
    }
    if (section < 0 || section >= columnTotal()) {
        return {};
    }
    if (role == Qt::DisplayRole) {
        return columnTitle(section);
    }
    if (role == Qt::ToolTipRole) {
        const QString tip = columnTip(section);
        return tip.isEmpty() ? QVariant() : QVariant(tip);
    }
    return {};
}

QVariant DeskTableModel::data(const QModelIndex &index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return {};
    }
    const bool refused = refused_cell_ == std::pair{index.row(), index.column()};
    switch (role) {
    case Qt::DisplayRole:
    case Qt::EditRole:
        return cellText(index.row(), index.column());
    case kCellMessageRole:
        return refused ? QVariant(refused_message_) : QVariant();
    case Qt::ToolTipRole: {
        if (refused) {
            return refused_message_;
        }
        const QString tip = cellToolTip(index.row(), index.column());
        return tip.isEmpty() ? QVariant() : QVariant(tip);
    }
    case Qt::BackgroundRole:
        if (refused) {
            return QBrush(QColor(255, 214, 204)); // the refused cell, until the next edit
        }
        if (!isEditable(index.column())) {
            return QBrush(QColor(238, 238, 238)); // computed, not typed
        }
        return {};
    case Qt::TextAlignmentRole:
        return QVariant::fromValue(Qt::Alignment(Qt::AlignVCenter | Qt::AlignLeft));
    default:
        return {};
    }
}

Qt::ItemFlags DeskTableModel::flags(const QModelIndex &index) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return Qt::NoItemFlags;
    }
    Qt::ItemFlags f = Qt::ItemIsEnabled | Qt::ItemIsSelectable | Qt::ItemNeverHasChildren;
    if (isEditable(index.column())) {
        f |= Qt::ItemIsEditable;
    }
    return f;
}

bool DeskTableModel::setData(const QModelIndex &index, const QVariant &value, int role) {
    if (role != Qt::EditRole || !isEditable(index.column()) ||
        !checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return false;
    }
    const int r = index.row();
    const QString text = value.toString().trimmed();
    if (text == cellText(r, index.column())) {
        return true; // tabbing through a field writes nothing
    }
    const TypedRow after = typed(r, index.column(), text);
    QString message;
    if (const auto *bad = std::get_if<QString>(&after)) {
        message = *bad;
        desk_.reportRefusal(message); // the desk's message line shows it, as any refusal
    } else {
        const db::EditableRow &new_row = std::get<db::EditableRow>(after);
        if (new_row == row(r)) {
            return true; // the same value in another spelling
        }
        if (desk_.edit(db::RowEdit::update(row(r), new_row), editLabel(r, index.column()))) {
            refused_cell_.reset();
            return true; // the desk's changed() has refreshed the rows
        }
        message = desk_.lastMessage();
    }
    markRefused(r, index.column(), message);
    return false;
}

void DeskTableModel::markRefused(int r, int column, const QString &message) {
    const QModelIndex cell = this->index(r, column);
    if (cell.isValid()) { // the rows may have changed under a refusal (another writer)
        refused_cell_ = std::pair{r, column};
        refused_message_ = message;
        emit dataChanged(cell, cell, {kCellMessageRole, Qt::ToolTipRole, Qt::BackgroundRole});
    }
    emit editRefused(cell, message);
}

bool DeskTableModel::removeRowAt(int r) {
    if (r < 0 || r >= storedRowCount()) {
        return false;
    }
    if (desk_.edit(db::RowEdit::remove(row(r)), tr("remove %1").arg(rowName(r)))) {
        refused_cell_.reset();
        return true; // the desk's changed() has reset the rows
    }
    markRefused(r, 0, desk_.lastMessage());
    return false;
}

QModelIndex DeskTableModel::addRow() {
    const TypedRow made = newRow();
    if (const auto *why = std::get_if<QString>(&made)) {
        desk_.reportRefusal(*why);
        return {};
    }
    const db::EditableRow &added = std::get<db::EditableRow>(made);
    const std::string_view table = tableName(db::tableOf(added));
    const QString label = tr("add a row to %1")
                              .arg(QString::fromUtf8(table.data(), static_cast<int>(table.size())));
    if (!desk_.edit(db::RowEdit::add(added), label)) {
        return {};
    }
    for (int r = storedRowCount() - 1; r >= 0; --r) {
        if (row(r) == added) {
            return index(r, firstNewRowColumn());
        }
    }
    return {};
}

} // namespace atollog::view
