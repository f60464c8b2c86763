#pragma once
// The occurrences of the chosen hole as a grid: its samples as rows (in depth order, top then
// base, stored order among equals), taxa as columns (those found in the hole's samples, in the
// taxa table's order, then any column added with addTaxon). A cell holds what the sample
// lists of the taxon, as occurrence_cell.hpp writes it ("25", "common", "x rw", "25; 3 rw").
//
// Typing a cell compares the entries with the stored occurrences of that sample and taxon,
// status by status: a new status is added, a changed abundance updated (free attributes
// kept), a status no longer typed removed; clearing the cell removes them all. The edits of one
// cell are one undo step, all or none (DeskProject::editAll). A refused cell carries the
// message (kCellMessageRole, tooltip, a red tint) as in the other desk tables.
//
// Columns never vanish while a hole is chosen (a cleared taxon keeps its column), so a
// model reset never happens during typing; choosing a hole again rebuilds them.
#include "view/occurrence_cell.hpp"

#include <QAbstractTableModel>
#include <QStringList>

#include <optional>
#include <string>
#include <vector>

namespace atollog::view {

class DeskProject;

class OccurrenceGridModel : public QAbstractTableModel {
    Q_OBJECT

  public:
    explicit OccurrenceGridModel(DeskProject &desk, QObject *parent = nullptr);

    void setHole(const std::string &hole);
    const std::string &hole() const { return hole_; }

    /// Adds a column for a taxon of the project's taxa table. False, with the desk's message,
    /// when there is no such taxon; true (nothing changes) when the column is there already.
    bool addTaxon(const std::string &taxon);
    /// Taxa of the project without a column yet ("id - name"), for the "Add taxon column"
    /// chooser; the ids in `ids`.
    QStringList taxaWithoutColumn(std::vector<std::string> *ids = nullptr) const;

    const std::string &sampleAt(int r) const { return samples_.at(static_cast<std::size_t>(r)).sample; }
    const std::string &taxonAt(int c) const { return taxa_.at(static_cast<std::size_t>(c)); }
    int columnOf(const std::string &taxon) const;
    int rowOf(const std::string &sample) const;

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    bool setData(const QModelIndex &index, const QVariant &value, int role = Qt::EditRole) override;
    Qt::ItemFlags flags(const QModelIndex &index) const override;
    QVariant headerData(int section, Qt::Orientation orientation,
                        int role = Qt::DisplayRole) const override;

  signals:
    void editRefused(const QModelIndex &index, const QString &message);

  private:
    struct SampleRow {
        std::string sample;
        double top_m = 0;
        double base_m = 0;
    };
    void refresh();
    /// The hole's samples in depth order.
    std::vector<SampleRow> readSamples() const;
    /// The stored occurrences of the hole's samples, by sample and taxon, then status (the
    /// first row of each status: the engine refuses a second one).
    void readCells();
    /// Taxa found in the hole's samples, in taxa table order (unknown ids after them).
    std::vector<std::string> readTaxa() const;
    /// Stored occurrences of the cell, per status (the first row of each status).
    std::map<OccurrenceStatus, Occurrence> stored(int r, int c) const;
    OccurrenceCell cell(int r, int c) const;
    const Taxon *taxonRecord(const std::string &id) const;
    void refuse(const QModelIndex &index, const QString &message);

    DeskProject &desk_;
    std::string hole_;
    std::vector<SampleRow> samples_;
    std::vector<std::string> taxa_;
    std::map<std::pair<std::string, std::string>, std::map<OccurrenceStatus, Occurrence>> cells_;
    std::optional<std::pair<int, int>> refused_cell_;
    QString refused_message_;
};

} // namespace atollog::view
