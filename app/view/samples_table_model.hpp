#pragma once
// The samples of the chosen hole, in stored order: id, top and base in the desk's depth unit
// (a point sample has base = top) and the kind word (core, cuttings, barren, ...).
#include "view/desk_table_model.hpp"

#include <vector>

namespace atollog::view {

class SamplesTableModel : public DeskTableModel {
    Q_OBJECT

  public:
    enum Column { SampleId, Top, Base, Kind, ColumnCount };

    explicit SamplesTableModel(DeskProject &desk, QObject *parent = nullptr);


    const Sample &sampleAt(int r) const { return rows_.at(static_cast<std::size_t>(r)); }

  protected:
    int columnTotal() const override { return ColumnCount; }
    QString columnTitle(int column) const override;
    QString columnTip(int column) const override;
    int storedRowCount() const override { return static_cast<int>(rows_.size()); }
    int rowsIn(const CoreDataset &data, const std::string &hole) const override;
    void readRows(const CoreDataset &data, const std::string &hole) override;
    db::EditableRow row(int r) const override { return sampleAt(r); }
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

  private:
    std::vector<Sample> rows_;
};

} // namespace atollog::view
