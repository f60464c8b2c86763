#include "view/occurrence_grid_model.hpp"

#include "atollog/engine/number_text.hpp"
#include "view/desk_project.hpp"
#include "view/desk_table_model.hpp"

#include <QBrush>
#include <QColor>
#include <QFont>

#include <algorithm>
#include <set>

namespace atollog::view {

namespace {

QString word(std::string_view w) { return QString::fromUtf8(w.data(), static_cast<int>(w.size())); }
QString qs(const std::string &s) { return QString::fromStdString(s); }

} // namespace

OccurrenceGridModel::OccurrenceGridModel(DeskProject &desk, QObject *parent)
    : QAbstractTableModel(parent), desk_(desk) {
    connect(&desk_, &DeskProject::changed, this, &OccurrenceGridModel::refresh);
}

void OccurrenceGridModel::setHole(const std::string &hole) {
    beginResetModel();
    hole_ = hole;
    refused_cell_.reset();
    samples_ = readSamples();
    readCells();
    taxa_ = readTaxa();
    endResetModel();
}

std::vector<OccurrenceGridModel::SampleRow> OccurrenceGridModel::readSamples() const {
    std::vector<SampleRow> rows;
    for (const Sample &s : desk_.data().samples) {
        if (s.hole == hole_) {
            rows.push_back({s.sample, s.top_m, s.base_m});
        }
    }
    std::stable_sort(rows.begin(), rows.end(), [](const SampleRow &a, const SampleRow &b) {
        return a.top_m != b.top_m ? a.top_m < b.top_m : a.base_m < b.base_m;
    });
    return rows;
}

void OccurrenceGridModel::readCells() {
    cells_.clear();
    std::set<std::string> mine;
    for (const SampleRow &s : samples_) {
        mine.insert(s.sample);
    }
    for (const Occurrence &o : desk_.data().occurrences) {
        if (mine.count(o.sample) != 0) {
            cells_[{o.sample, o.taxon}].try_emplace(o.status, o); // the first of each status
        }
    }
}

std::vector<std::string> OccurrenceGridModel::readTaxa() const {
    std::set<std::string> found;
    for (const auto &[key, statuses] : cells_) {
        found.insert(key.second);
    }
    std::vector<std::string> taxa;
    for (const Taxon &t : desk_.data().taxa) {
        if (found.erase(t.taxon) != 0) {
            taxa.push_back(t.taxon);
        }
    }
    taxa.insert(taxa.end(), found.begin(), found.end()); // ids the taxa table lacks
    return taxa;
}

void OccurrenceGridModel::refresh() {
    std::vector<SampleRow> samples = readSamples();
    const bool same_rows =
        samples.size() == samples_.size() &&
        std::equal(samples.begin(), samples.end(), samples_.begin(),
                   [](const SampleRow &a, const SampleRow &b) { return a.sample == b.sample; });
    std::vector<std::string> taxa = taxa_;
    samples_.swap(samples);
    readCells();
    for (const std::string &t : readTaxa()) {
        if (std::find(taxa.begin(), taxa.end(), t) == taxa.end()) {
            taxa.push_back(t); // e.g. brought back by an undo; columns never vanish here
        }
    }
    if (!same_rows || taxa.size() != taxa_.size()) {
        std::swap(samples, samples_); // the old rows for the reset's begin
        beginResetModel();
        samples_ = std::move(samples);
        taxa_ = std::move(taxa);
        refused_cell_.reset();
        endResetModel();
        return;
    }
    if (rowCount() > 0 && columnCount() > 0) {
        emit dataChanged(index(0, 0), index(rowCount() - 1, columnCount() - 1));
    }
    if (rowCount() > 0) {
        emit headerDataChanged(Qt::Vertical, 0, rowCount() - 1); // a sample's depth (tooltip)
    }
}

int OccurrenceGridModel::rowCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : static_cast<int>(samples_.size());
}

int OccurrenceGridModel::columnCount(const QModelIndex &parent) const {
    return parent.isValid() ? 0 : static_cast<int>(taxa_.size());
}

int OccurrenceGridModel::columnOf(const std::string &taxon) const {
    const auto at = std::find(taxa_.begin(), taxa_.end(), taxon);
    return at == taxa_.end() ? -1 : static_cast<int>(at - taxa_.begin());
}

int OccurrenceGridModel::rowOf(const std::string &sample) const {
    for (std::size_t r = 0; r < samples_.size(); ++r) {
        if (samples_[r].sample == sample) {
            return static_cast<int>(r);
        }
    }
    return -1;
}

const Taxon *OccurrenceGridModel::taxonRecord(const std::string &id) const {
    for (const Taxon &t : desk_.data().taxa) {
        if (t.taxon == id) {
            return &t;
        }
    }
    return nullptr;
}

std::map<OccurrenceStatus, Occurrence> OccurrenceGridModel::stored(int r, int c) const {
    const auto at = cells_.find({sampleAt(r), taxonAt(c)});
    return at == cells_.end() ? std::map<OccurrenceStatus, Occurrence>{} : at->second;
}

OccurrenceCell OccurrenceGridModel::cell(int r, int c) const {
    OccurrenceCell out;
    const auto at = cells_.find({sampleAt(r), taxonAt(c)});
    if (at != cells_.end()) {
        for (const auto &[status, o] : at->second) {
            out[status] = o.abundance;
        }
    }
    return out;
}

QVariant OccurrenceGridModel::data(const QModelIndex &index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return {};
    }
    const bool refused = refused_cell_ == std::pair{index.row(), index.column()};
    switch (role) {
    case Qt::DisplayRole:
    case Qt::EditRole:
        return occurrenceCellText(cell(index.row(), index.column()));
    case kCellMessageRole:
        return refused ? QVariant(refused_message_) : QVariant();
    case Qt::ToolTipRole: {
        if (refused) {
            return refused_message_;
        }
        const OccurrenceCell c = cell(index.row(), index.column());
        const QString what = c.empty() ? tr("not listed")
                                       : occurrenceCellDescription(c);
        return tr("%1 in %2: %3.\nTo edit, %4")
            .arg(qs(taxonAt(index.column())), qs(sampleAt(index.row())), what,
                 occurrenceCellSyntax());
    }
    case Qt::BackgroundRole:
        if (refused) {
            return QBrush(QColor(255, 214, 204)); // the refused cell, until the next edit
        }
        return {};
    case Qt::ForegroundRole: {
        // Reworked or caved only: grey, so the in-place range reads at a glance.
        const OccurrenceCell c = cell(index.row(), index.column());
        if (!c.empty() && c.count(OccurrenceStatus::InPlace) == 0) {
            return QBrush(QColor(110, 110, 110));
        }
        return {};
    }
    case Qt::TextAlignmentRole:
        return QVariant::fromValue(Qt::Alignment(Qt::AlignVCenter | Qt::AlignHCenter));
    default:
        return {};
    }
}

Qt::ItemFlags OccurrenceGridModel::flags(const QModelIndex &index) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return Qt::NoItemFlags;
    }
    return Qt::ItemIsEnabled | Qt::ItemIsSelectable | Qt::ItemNeverHasChildren |
           Qt::ItemIsEditable;
}

QVariant OccurrenceGridModel::headerData(int section, Qt::Orientation orientation,
                                         int role) const {
    if (orientation == Qt::Vertical) {
        if (section < 0 || section >= rowCount()) {
            return {};
        }
        const SampleRow &s = samples_[static_cast<std::size_t>(section)];
        if (role == Qt::DisplayRole) {
            return qs(s.sample);
        }
        if (role == Qt::ToolTipRole) {
            return s.base_m == s.top_m
                       ? tr("sample %1 at %2 m").arg(qs(s.sample), word(numberText(s.top_m)))
                       : tr("sample %1, %2-%3 m")
                             .arg(qs(s.sample), word(numberText(s.top_m)),
                                  word(numberText(s.base_m)));
        }
        return {};
    }
    if (section < 0 || section >= columnCount()) {
        return {};
    }
    const std::string &id = taxa_[static_cast<std::size_t>(section)];
    if (role == Qt::DisplayRole) {
        return qs(id);
    }
    if (role == Qt::ToolTipRole) {
        const Taxon *t = taxonRecord(id);
        return t ? tr("%1 (%2): %3").arg(qs(t->name), word(toString(t->group)), qs(id))
                 : tr("%1: not in the taxa table").arg(qs(id));
    }
    return {};
}

bool OccurrenceGridModel::addTaxon(const std::string &taxon) {
    if (columnOf(taxon) >= 0) {
        return true;
    }
    if (!taxonRecord(taxon)) {
        desk_.reportRefusal(tr("occurrences: taxon '%1' is not in the taxa table; choose one of "
                               "the project's taxa")
                                .arg(qs(taxon)));
        return false;
    }
    const int c = columnCount();
    beginInsertColumns({}, c, c);
    taxa_.push_back(taxon);
    endInsertColumns();
    return true;
}

QStringList OccurrenceGridModel::taxaWithoutColumn(std::vector<std::string> *ids) const {
    QStringList labels;
    for (const Taxon &t : desk_.data().taxa) {
        if (columnOf(t.taxon) < 0) {
            labels << tr("%1 - %2").arg(qs(t.taxon), qs(t.name));
            if (ids) {
                ids->push_back(t.taxon);
            }
        }
    }
    return labels;
}

void OccurrenceGridModel::refuse(const QModelIndex &index, const QString &message) {
    refused_cell_ = std::pair{index.row(), index.column()};
    refused_message_ = message;
    if (index.isValid()) { // the rows may have changed under a refusal (another writer)
        emit dataChanged(index, index, {kCellMessageRole, Qt::ToolTipRole, Qt::BackgroundRole});
    }
    emit editRefused(index, message);
}

bool OccurrenceGridModel::setData(const QModelIndex &index, const QVariant &value, int role) {
    if (role != Qt::EditRole ||
        !checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid)) {
        return false;
    }
    const int r = index.row();
    const int c = index.column();
    const QString text = value.toString().trimmed();
    const auto typed = readOccurrenceCell(text);
    if (const auto *bad = std::get_if<QString>(&typed)) {
        const QString message = tr("occurrences: taxon '%1' in sample '%2': %3")
                                    .arg(qs(taxonAt(c)), qs(sampleAt(r)), *bad);
        desk_.reportRefusal(message);
        refuse(index, message);
        return false;
    }
    const OccurrenceCell &wanted = std::get<OccurrenceCell>(typed);
    const std::map<OccurrenceStatus, Occurrence> before = stored(r, c);

    // Removals first, then updates, then additions: the order a reader of the table expects.
    std::vector<db::RowEdit> removals, updates, additions;
    for (const auto &[status, o] : before) {
        const auto w = wanted.find(status);
        if (w == wanted.end()) {
            removals.push_back(db::RowEdit::remove(o));
        } else if (w->second != o.abundance) {
            Occurrence changed = o; // free attributes kept
            changed.abundance = w->second;
            updates.push_back(db::RowEdit::update(o, changed));
        }
    }
    for (const auto &[status, abundance] : wanted) {
        if (before.count(status) == 0) {
            Occurrence added;
            added.sample = sampleAt(r);
            added.taxon = taxonAt(c);
            added.abundance = abundance;
            added.status = status;
            additions.push_back(db::RowEdit::add(added));
        }
    }
    std::vector<db::RowEdit> edits = std::move(removals);
    edits.insert(edits.end(), updates.begin(), updates.end());
    edits.insert(edits.end(), additions.begin(), additions.end());
    if (edits.empty()) {
        return true; // the same entries, maybe spelled another way: nothing to write
    }
    const QString label = text.isEmpty()
                              ? tr("remove %1 from sample %2").arg(qs(taxonAt(c)), qs(sampleAt(r)))
                              : tr("%1 in sample %2: %3").arg(qs(taxonAt(c)), qs(sampleAt(r)),
                                                              occurrenceCellText(wanted));
    if (desk_.editAll(edits, label)) {
        refused_cell_.reset();
        return true; // the desk's changed() has refreshed the grid
    }
    refuse(this->index(r, c), desk_.lastMessage());
    return false;
}

} // namespace atollog::view
