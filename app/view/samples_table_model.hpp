#pragma once
// The samples of the chosen hole, in stored order: id, top and base in the desk's depth unit
// (a point sample has base = top) and the kind word (core, cuttings, barren, ...).
#include "view/desk_rows.hpp"

#include <vector>

namespace atollog::view {

class SamplesTableModel : public DeskRows<Sample> {
    Q_OBJECT

  public:
    enum Column { SampleId, Top, Base, Kind, ColumnCount };

    explicit SamplesTableModel(DeskProject &desk, QObject *parent = nullptr);


    const Sample &sampleAt(int r) const { return rowAt(r); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    QString cellText(int r, int column) const override;
    bool isEditable(int /*column*/) const override { return true; }
    TypedRow typed(int r, int column, const QString &text) const override;
    QString editLabel(int r, int column) const override;
    QString rowName(int r) const override;
    /// The next sample: at the base of the hole's deepest sample (a point, to be typed over; or
    /// at the top of its first run when it has none), the kind of that sample, its id counted
    /// on from that sample's.
    TypedRow newRow() const override;
    int firstNewRowColumn() const override { return Top; }
};

} // namespace atollog::view
