#pragma once
// The project's holes, in stored order, whatever hole is chosen: id, site, kind (core or
// cuttings), position (decimal degrees, north and east positive), collar height
// above present mean sea level (in the desk's unit) and distance along the chain (km).
// Renaming or removing a hole that runs, samples or dates still name is refused by the db, the
// rows counted; the desk's hole chooser follows every accepted change.
#include "view/desk_table_model.hpp"

#include <vector>

namespace atollog::view {

class HolesTableModel : public DeskTableModel {
    Q_OBJECT

  public:
    enum Column { HoleId, Site, Kind, Latitude, Longitude, CollarElevation, ChainDistance,
                  ColumnCount };

    explicit HolesTableModel(DeskProject &desk, QObject *parent = nullptr);

    /// Kind offers core and cuttings (kWordChoicesRole).
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;

    const Hole &holeAt(int r) const { return rows_.at(static_cast<std::size_t>(r)); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    int storedRowCount() const override { return static_cast<int>(rows_.size()); }
    int rowsIn(const CoreDataset &data, const std::string &hole) const override;
    void readRows(const CoreDataset &data, const std::string &hole) override;
    db::EditableRow row(int r) const override { return holeAt(r); }
    QString cellText(int r, int column) const override;
    bool isEditable(int /*column*/) const override { return true; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// A new hole under the next free id after the last one, with the last one's site and
    /// kind and no position yet: the hole is typed over before its first run is logged.
    TypedRow newRow() const override;

  private:
    std::vector<Hole> rows_;
};

} // namespace atollog::view
