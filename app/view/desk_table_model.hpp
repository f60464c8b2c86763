#pragma once
// What the logging desk's tables share: the rows of one chosen hole, read from a DeskProject;
// cells shown and typed as text (depths in m or ft, stored in m); an edit turned into
// RowEdit::update(row as read, row with the new value) and applied through the desk's undo
// stack. A refused edit leaves the project as it was: setData returns false and the cell
// carries the message (kCellMessageRole, also its tooltip) until the next accepted edit.
#include "atollog/db/project_edits.hpp"
#include "view/depth_unit.hpp"

#include <QAbstractTableModel>

#include <optional>
#include <string>
#include <variant>

namespace atollog::view {

class DeskProject;

/// The message of the last refused edit of this cell (QString), or an invalid QVariant.
inline constexpr int kCellMessageRole = Qt::UserRole + 1;

class DeskTableModel : public QAbstractTableModel {
    Q_OBJECT

  public:
    DeskTableModel(DeskProject &desk, QObject *parent);

    void setHole(const std::string &hole);
    const std::string &hole() const { return hole_; }
    void setDepthUnit(DepthUnit unit);
    DepthUnit depthUnit() const { return unit_; }

    int rowCount(const QModelIndex &parent = {}) const override;
    /// columnTotal() columns; headers from columnTitle and columnTip, rows numbered from 1.
    int columnCount(const QModelIndex &parent = {}) const final;
    QVariant headerData(int section, Qt::Orientation orientation,
                        int role = Qt::DisplayRole) const final;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    bool setData(const QModelIndex &index, const QVariant &value, int role = Qt::EditRole) override;
    Qt::ItemFlags flags(const QModelIndex &index) const override;

    /// Removes row `r` through the undo stack (undo puts it back in its place). False when it
    /// was refused (e.g. other rows still refer to it): the row's first cell then carries the
    /// message, as a refused edit does.
    bool removeRowAt(int r);
    /// Adds the table's new row (newRow: e.g. the next run below the deepest) through the undo
    /// stack. Returns the new row's first editable cell, or an invalid index when there is
    /// none or it was refused (the desk's lastMessage says why).
    QModelIndex addRow();

  signals:
    /// An edit of this table was refused; the message names field, value and fix.
    void editRefused(const QModelIndex &index, const QString &message);

  protected:
    /// The new row, or a message saying why the text cannot be that field's value.
    using TypedRow = std::variant<db::EditableRow, QString>;

    DeskProject &desk() const { return desk_; }
    /// Re-reads the hole's rows from the desk: a reset when the row count changed, otherwise
    /// every cell reported changed (a reset during setData would lose the view's tab order).
    void refresh();

    virtual int storedRowCount() const = 0;
    virtual int columnTotal() const = 0;
    /// A column's header, with the depth unit where it holds a depth ("Top (ft)").
    virtual QString columnTitle(int column) const = 0;
    /// A column's header tooltip: what to type, or which stored field it is.
    virtual QString columnTip(int column) const = 0;
    /// How many rows `hole` has in `data` (to tell an update from an added or removed row).
    virtual int rowsIn(const CoreDataset &data, const std::string &hole) const = 0;
    /// Collects the rows of `hole` from the dataset.
    virtual void readRows(const CoreDataset &data, const std::string &hole) = 0;
    virtual db::EditableRow row(int r) const = 0;
    virtual QString cellText(int r, int column) const = 0;
    virtual bool isEditable(int column) const = 0;
    /// The row with `text` typed into `column`.
    virtual TypedRow typed(int r, int column, const QString &text) const = 0;
    /// A cell's own tooltip (e.g. why a texture is suggested); empty for none.
    virtual QString cellToolTip(int /*r*/, int /*column*/) const { return {}; }
    /// A label for the undo stack, e.g. "base of interval 2.1-2.79 m".
    virtual QString editLabel(int r, int column) const = 0;
    /// The row named for undo labels, e.g. "run KAL1-R03".
    virtual QString rowName(int r) const { return tr("row %1").arg(r + 1); }
    /// The row addRow adds (the hole's rows as read), or why there is none.
    virtual TypedRow newRow() const { return tr("rows are not added in this table"); }
    /// The column addRow opens for typing.
    virtual int firstNewRowColumn() const { return 0; }

  private:
    void markRefused(int r, int column, const QString &message);

    DeskProject &desk_;
    std::string hole_;
    DepthUnit unit_ = DepthUnit::Metre;
    std::optional<std::pair<int, int>> refused_cell_;
    QString refused_message_;
};

} // namespace atollog::view
