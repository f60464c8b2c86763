#pragma once
// The rows a desk table shows, copied from one table of the dataset as last read: those of the
// chosen hole for tables whose rows belong to a hole (runs, intervals, samples, dates), every
// row for the project-wide ones (events, zones, holes). In stored order.
#include "view/desk_table_model.hpp"

#include <algorithm>
#include <type_traits>
#include <vector>

namespace atollog::view {

template <class Row> class DeskRows : public DeskTableModel {
  public:
    using DeskTableModel::DeskTableModel;

    const Row &rowAt(int r) const { return rows_.at(static_cast<std::size_t>(r)); }

  protected:
    int storedRowCount() const override { return static_cast<int>(rows_.size()); }
    int rowsIn(const CoreDataset &data, const std::string &hole) const override {
        const std::vector<Row> &all = rowsOf(data);
        if constexpr (kPerHole) {
            return static_cast<int>(std::count_if(all.begin(), all.end(),
                                                  [&](const Row &r) { return r.hole == hole; }));
        } else {
            return static_cast<int>(all.size());
        }
    }
    void readRows(const CoreDataset &data, const std::string &hole) override {
        const std::vector<Row> &all = rowsOf(data);
        if constexpr (kPerHole) {
            rows_.clear();
            std::copy_if(all.begin(), all.end(), std::back_inserter(rows_),
                         [&](const Row &r) { return r.hole == hole; });
        } else {
            rows_ = all;
        }
    }
    db::EditableRow row(int r) const override { return rowAt(r); }

    std::vector<Row> rows_;

  private:
    static constexpr bool kPerHole =
        !(std::is_same_v<Row, TimeScaleEvent> || std::is_same_v<Row, Zone> ||
          std::is_same_v<Row, Hole>);

    static const std::vector<Row> &rowsOf(const CoreDataset &data) {
        if constexpr (std::is_same_v<Row, CoreRun>) return data.runs;
        else if constexpr (std::is_same_v<Row, LithInterval>) return data.intervals;
        else if constexpr (std::is_same_v<Row, Sample>) return data.samples;
        else if constexpr (std::is_same_v<Row, NumericalDate>) return data.dates;
        else if constexpr (std::is_same_v<Row, TimeScaleEvent>) return data.events;
        else if constexpr (std::is_same_v<Row, Zone>) return data.zones;
        else return data.holes;
    }
};

} // namespace atollog::view
