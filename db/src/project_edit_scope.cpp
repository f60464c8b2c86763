// The scope a row edit is checked in, the edit applied to it in memory, and row keys for
// messages.
#include "project_edit_detail.hpp"

#include "atollog/engine/number_text.hpp"

#include <SQLiteCpp/Statement.h>

#include <algorithm>

namespace atollog::db::detail {
namespace {

std::string quoted(const std::string& id) { return "'" + id + "'"; }

std::optional<std::int64_t> storedId(SQLite::Database& db, const char* sql,
                                     const std::string& text) {
    SQLite::Statement find(db, sql);
    find.bind(1, text);
    if (!find.executeStep()) return std::nullopt;
    return find.getColumn(0).getInt64();
}

void addId(std::vector<std::int64_t>& ids, std::optional<std::int64_t> id) {
    if (id && std::find(ids.begin(), ids.end(), *id) == ids.end()) ids.push_back(*id);
}

// The rows the engine's rules relate to `row`: the runs, intervals, samples and dates of its
// hole (overlaps, the cored part, a date's sample), rows sharing its id wherever they are
// (uniqueness), and the occurrences of its sample (one listing per sample, taxon and status).
// Holes, taxa, events and zones are always read whole: they are small.
void addScopeOf(SQLite::Database& db, const EditableRow& row, LoadScope& scope) {
    const auto hole = [&](const std::string& id) {
        addId(scope.hole_ids, storedId(db, "SELECT id FROM hole WHERE hole = ?", id));
    };
    const auto sample = [&](const std::string& id) {
        addId(scope.sample_ids, storedId(db, "SELECT id FROM sample WHERE sample = ?", id));
    };
    if (const auto* h = std::get_if<Hole>(&row)) hole(h->hole);
    if (const auto* r = std::get_if<CoreRun>(&row)) {
        hole(r->hole);
        addId(scope.run_ids, storedId(db, "SELECT id FROM core_run WHERE run = ?", r->run));
    }
    if (const auto* v = std::get_if<LithInterval>(&row)) hole(v->hole);
    if (const auto* s = std::get_if<Sample>(&row)) {
        hole(s->hole);
        sample(s->sample);
    }
    if (const auto* o = std::get_if<Occurrence>(&row)) sample(o->sample);
    if (const auto* d = std::get_if<NumericalDate>(&row)) {
        hole(d->hole);
        if (d->sample) sample(*d->sample);
    }
}

template <class Row> void renameIn(std::vector<Row>& rows, std::string Row::*member,
                                   const std::string& from, const std::string& to) {
    for (Row& r : rows)
        if (r.*member == from) r.*member = to;
}

template <class Row>
void renameIn(std::vector<Row>& rows, std::optional<std::string> Row::*member,
              const std::string& from, const std::string& to) {
    for (Row& r : rows)
        if (r.*member && *(r.*member) == from) r.*member = to;
}

// Rows refer to a hole, sample or event by its stored id, so an update that changes the text
// id changes it for them too.
void carryChangedId(CoreDataset& data, const EditableRow& from, const EditableRow& to) {
    if (const auto* h = std::get_if<Hole>(&from)) {
        const std::string& now = std::get<Hole>(to).hole;
        if (h->hole == now) return;
        renameIn(data.runs, &CoreRun::hole, h->hole, now);
        renameIn(data.intervals, &LithInterval::hole, h->hole, now);
        renameIn(data.samples, &Sample::hole, h->hole, now);
        renameIn(data.dates, &NumericalDate::hole, h->hole, now);
    } else if (const auto* s = std::get_if<Sample>(&from)) {
        const std::string& now = std::get<Sample>(to).sample;
        if (s->sample == now) return;
        renameIn(data.occurrences, &Occurrence::sample, s->sample, now);
        renameIn(data.dates, &NumericalDate::sample, s->sample, now);
    } else if (const auto* e = std::get_if<TimeScaleEvent>(&from)) {
        const std::string& now = std::get<TimeScaleEvent>(to).event;
        if (e->event == now) return;
        renameIn(data.zones, &Zone::base_event, e->event, now);
        renameIn(data.zones, &Zone::top_event, e->event, now);
    }
}

} // namespace

EditScope loadEditScope(SQLite::Database& db, const RowEdit& edit) {
    LoadScope load;
    if (edit.before) addScopeOf(db, *edit.before, load);
    if (edit.after) addScopeOf(db, *edit.after, load);
    EditScope scope;
    scope.data = loadDatasetRows(db, &load, &scope.ids);
    return scope;
}

std::optional<RowPlace> findRow(const EditScope& scope, const EditableRow& row) {
    return std::visit(
        [&](const auto& wanted) -> std::optional<RowPlace> {
            using Row = std::decay_t<decltype(wanted)>;
            const auto& rows = scope.data.*RowTable<Row>::rows;
            const auto it = std::find(rows.begin(), rows.end(), wanted);
            if (it == rows.end()) return std::nullopt;
            const auto index = static_cast<std::size_t>(it - rows.begin());
            return RowPlace{index, (scope.ids.*RowTable<Row>::ids)[index]};
        },
        row);
}

std::optional<std::size_t> applyInMemory(CoreDataset& data, DatasetRowIds& ids,
                                         const RowEdit& edit, std::optional<RowPlace> place,
                                         std::int64_t added_id) {
    const EditableRow& shape = edit.after ? *edit.after : *edit.before;
    return std::visit(
        [&](const auto& sample_row) -> std::optional<std::size_t> {
            using Row = std::decay_t<decltype(sample_row)>;
            auto& rows = data.*RowTable<Row>::rows;
            auto& row_ids = ids.*RowTable<Row>::ids;
            switch (edit.kind) {
            case EditKind::Add: {
                const auto at = std::lower_bound(row_ids.begin(), row_ids.end(), added_id);
                const auto index = at - row_ids.begin();
                row_ids.insert(at, added_id);
                rows.insert(rows.begin() + index, std::get<Row>(*edit.after));
                return static_cast<std::size_t>(index);
            }
            case EditKind::Update:
                rows[place->index] = std::get<Row>(*edit.after);
                carryChangedId(data, *edit.before, *edit.after);
                return place->index;
            case EditKind::Remove:
                rows.erase(rows.begin() + static_cast<std::ptrdiff_t>(place->index));
                row_ids.erase(row_ids.begin() + static_cast<std::ptrdiff_t>(place->index));
                return std::nullopt;
            }
            return std::nullopt;
        },
        shape);
}

std::string rowKey(const EditableRow& row) {
    struct Key {
        std::string operator()(const Hole& h) const { return "hole " + quoted(h.hole); }
        std::string operator()(const CoreRun& r) const {
            return "run " + quoted(r.run) + " of hole " + quoted(r.hole);
        }
        std::string operator()(const LithInterval& v) const {
            return "interval " + numberText(v.top_m) + "-" + numberText(v.base_m) +
                   " m of hole " + quoted(v.hole);
        }
        std::string operator()(const Sample& s) const {
            return "sample " + quoted(s.sample) + " of hole " + quoted(s.hole);
        }
        std::string operator()(const Occurrence& o) const {
            return "taxon " + quoted(o.taxon) + " (" + std::string(toString(o.status)) +
                   ") in sample " + quoted(o.sample);
        }
        std::string operator()(const TimeScaleEvent& e) const {
            return "event " + quoted(e.event);
        }
        std::string operator()(const NumericalDate& d) const {
            std::string key = std::string(toString(d.method)) + " date of hole " + quoted(d.hole);
            if (d.sample) key += ", sample " + quoted(*d.sample);
            if (d.depth_m) key += ", depth_m " + numberText(*d.depth_m);
            return key;
        }
        std::string operator()(const Zone& z) const {
            return "zone " + quoted(z.zone) + " of scheme " + quoted(z.scheme);
        }
    };
    return std::visit(Key{}, row);
}

std::string rowKey(const CoreDataset& data, Table table, std::size_t index) {
    switch (table) {
    case Table::Holes: return rowKey(data.holes.at(index));
    case Table::Runs: return rowKey(data.runs.at(index));
    case Table::Intervals: return rowKey(data.intervals.at(index));
    case Table::Samples: return rowKey(data.samples.at(index));
    case Table::Occurrences: return rowKey(data.occurrences.at(index));
    case Table::Events: return rowKey(data.events.at(index));
    case Table::Dates: return rowKey(data.dates.at(index));
    case Table::Zones: return rowKey(data.zones.at(index));
    default: return "row " + std::to_string(index + 1);
    }
}

} // namespace atollog::db::detail
