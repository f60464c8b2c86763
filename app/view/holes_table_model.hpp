#pragma once
// The project's holes, in stored order, whatever hole is chosen: id, site, kind (core or
// cuttings), position (decimal degrees, north and east positive), collar height
// above present mean sea level (in the desk's unit) and distance along the chain (km).
// Renaming or removing a hole that runs, samples or dates still name is refused by the db, the
// rows counted; the desk's hole chooser follows every accepted change.
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class HolesTableModel : public DeskRows<Hole> {
    Q_OBJECT

  public:
    enum Column { HoleId, Site, Kind, Latitude, Longitude, CollarElevation, ChainDistance,
                  ColumnCount };

    explicit HolesTableModel(DeskProject &desk, QObject *parent = nullptr);

    /// Kind offers core and cuttings (kWordChoicesRole).
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;

    const Hole &holeAt(int r) const { return rowAt(r); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    bool isEditable(int /*column*/) const override { return true; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// A new hole under the next free id after the last one, with the last one's site and
    /// kind and no position yet: the hole is typed over before its first run is logged.
    TypedRow newRow() const override;
};

} // namespace atollog::view
