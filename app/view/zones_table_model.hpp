#pragma once
// The project's biozones, in stored order, whatever hole is chosen: scheme, zone, and the
// events bounding its base and top (ids of the events table; empty leaves that end open).
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class ZonesTableModel : public DeskRows<Zone> {
    Q_OBJECT

  public:
    enum Column { Scheme, ZoneName, BaseEvent, TopEvent, ColumnCount };

    explicit ZonesTableModel(DeskProject &desk, QObject *parent = nullptr);

    /// The event columns offer the project's event ids, "" first (kWordChoicesRole).
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;

    const Zone &zoneAt(int r) const { return rowAt(r); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    bool isEditable(int /*column*/) const override { return true; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// The next zone of the last zone's scheme: its name counted on (VL4 -> VL5), based on
    /// the event that tops the last zone, its top open, to be typed.
    TypedRow newRow() const override;
    int firstNewRowColumn() const override { return TopEvent; }
};

} // namespace atollog::view
