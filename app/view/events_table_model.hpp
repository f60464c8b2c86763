#pragma once
// The project's time-scale events (datums), in stored order, whatever hole is chosen: id, the
// taxon whose base or top it is, the kind (base or top), its age and sd in Ma, the source.
// Removing an event that zones still use is refused by the db, the zones counted.
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class EventsTableModel : public DeskRows<TimeScaleEvent> {
    Q_OBJECT

  public:
    enum Column { EventId, Taxon, Kind, Age, AgeSd, Source, ColumnCount };

    explicit EventsTableModel(DeskProject &desk, QObject *parent = nullptr);

    /// Kind offers base and top, taxon the project's taxa (kWordChoicesRole).
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;

    const TimeScaleEvent &eventAt(int r) const { return rowAt(r); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    bool isEditable(int /*column*/) const override { return true; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// A copy of the last event under the next free id, to be typed over.
    TypedRow newRow() const override;
};

} // namespace atollog::view
