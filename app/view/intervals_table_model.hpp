#pragma once
// The lithology intervals of the chosen hole, in stored order, as logged at the core table:
// depths in the desk's unit, the texture attributes, then the texture class the engine's
// classifier (Dunham 1962 with Embry & Klovan 1971) suggests from them (computed, read only)
// beside the texture as logged, then surface, paleodepths, physical properties and notes.
// addInterval puts a new interval below the deepest one (next_interval.hpp).
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class IntervalsTableModel : public DeskRows<LithInterval> {
    Q_OBJECT

  public:
    enum Column {
        Top, Base, Rock, MudSupported, Grains, Coarse, Binding, Suggested, Texture, Surface,
        PaleodepthMin, PaleodepthMax, Density, Porosity, Carbonate, Notes, ColumnCount
    };

    explicit IntervalsTableModel(DeskProject &desk, QObject *parent = nullptr);


    const LithInterval &intervalAt(int r) const { return rowAt(r); }

    /// Adds the hole's next interval (nextInterval) through the undo stack. Returns the new
    /// row's index (its base cell, the one to type next), or an invalid index when there is
    /// none or the edit was refused: the desk's lastMessage then says why.
    QModelIndex addInterval();

    /// Adds the allowed words of the vocabulary columns (kWordChoicesRole) to the base's roles.
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    QString cellToolTip(int r, int column) const override;
    bool isEditable(int column) const override { return column != Suggested; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// The same interval as addInterval (nextInterval), for the generic addRow.
    TypedRow newRow() const override;
    int firstNewRowColumn() const override { return Base; }
};

} // namespace atollog::view
