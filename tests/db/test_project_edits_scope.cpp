// The scope an edit is checked in gives the same verdict as checking the whole project. For
// random valid datasets (random_dataset.hpp) and random edits of every editable table (depths
// moved, ids and references changed to other rows' or to unknown ones, values made negative,
// rows removed or copied), applyEdit's answer is compared with the same comparison of
// validateDataset run on the whole dataset, loaded in full: refused or not, with the same
// problems and warnings, word for word; and an accepted edit leaves exactly the whole dataset
// with the edit applied in memory.
#include "atollog/db/project_edits.hpp"
#include "atollog/db/project_store.hpp"
#include "project_edit_detail.hpp"
#include "random_dataset.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <algorithm>
#include <random>

using namespace atollog;
using atollog::db::EditProblem;
using atollog::db::EditRefused;
using atollog::db::ProjectStore;
using atollog::db::RowEdit;
using atollog::test::TempPath;

namespace {

class Pick {
  public:
    explicit Pick(std::uint64_t seed) : random_(seed) {}
    std::size_t index(std::size_t n) { return static_cast<std::size_t>(random_() % n); }
    bool chance(int percent) { return static_cast<int>(random_() % 100) < percent; }
    double shift_m() { return (static_cast<double>(random_() % 2001) - 1000.0) / 250.0; }

  private:
    std::mt19937_64 random_;
};

template <class Row> const Row& any(Pick& p, const std::vector<Row>& rows) {
    return rows[p.index(rows.size())];
}

// One field of a copy of `row` changed, in ways that are sometimes valid and sometimes not.
struct Mutate {
    Pick& p;
    const CoreDataset& d;
    std::string otherHole() { return p.chance(10) ? "no such hole" : any(p, d.holes).hole; }
    std::string otherSample() {
        return p.chance(10) || d.samples.empty() ? "no such sample" : any(p, d.samples).sample;
    }
    std::string otherTaxon() { return p.chance(10) ? "no such taxon" : any(p, d.taxa).taxon; }
    std::string otherEvent() {
        return p.chance(10) || d.events.empty() ? "no such event" : any(p, d.events).event;
    }
    std::string fresh(const std::string& id) { return id + "+" + std::to_string(p.index(1000)); }

    db::EditableRow operator()(Hole h) {
        switch (p.index(3)) {
        case 0: h.hole = p.chance(50) ? fresh(h.hole) : otherHole(); break;
        case 1: h.lat_deg = p.chance(80) ? -17.0 : 95.0; break;
        default: h.kind = p.chance(50) ? HoleKind::Core : HoleKind::Cuttings;
        }
        return h;
    }
    db::EditableRow operator()(CoreRun r) {
        switch (p.index(5)) {
        case 0: r.top_m += p.shift_m(); break;
        case 1: r.base_m += p.shift_m(); break;
        case 2: r.recovered_m = p.chance(20) ? -0.5 : r.cored_m() * 0.01 * p.index(120); break;
        case 3: r.run = p.chance(50) ? fresh(r.run) : any(p, d.runs).run; break;
        default: r.hole = otherHole();
        }
        return r;
    }
    db::EditableRow operator()(LithInterval v) {
        switch (p.index(4)) {
        case 0: v.top_m += p.shift_m(); break;
        case 1: v.base_m += p.shift_m(); break;
        case 2: v.grains_pct = 0.5 * p.index(240); break;
        default: v.hole = otherHole();
        }
        return v;
    }
    db::EditableRow operator()(Sample s) {
        switch (p.index(4)) {
        case 0: s.top_m = s.base_m = s.top_m + p.shift_m(); break;
        case 1: s.base_m += p.shift_m(); break;
        case 2: s.sample = p.chance(50) ? fresh(s.sample) : otherSample(); break;
        default: s.hole = otherHole();
        }
        return s;
    }
    db::EditableRow operator()(Occurrence o) {
        switch (p.index(4)) {
        case 0: o.sample = otherSample(); break;
        case 1: o.taxon = otherTaxon(); break;
        case 2: o.abundance = static_cast<std::int64_t>(p.index(10)) - 2; break;
        default: o.status = p.chance(50) ? OccurrenceStatus::InPlace : OccurrenceStatus::Reworked;
        }
        return o;
    }
    db::EditableRow operator()(TimeScaleEvent e) {
        switch (p.index(3)) {
        case 0: e.event = p.chance(50) ? fresh(e.event) : otherEvent(); break;
        case 1: e.age_sd_ma = p.chance(20) ? -0.1 : 0.05; break;
        default: e.taxon = otherTaxon();
        }
        return e;
    }
    db::EditableRow operator()(NumericalDate x) {
        switch (p.index(4)) {
        case 0:
            if (x.depth_m) *x.depth_m += p.shift_m();
            break;
        case 1: x.sample = otherSample(); break;
        case 2: x.hole = otherHole(); break;
        default: x.age_sd_ma = p.chance(30) ? -0.01 : 0.01;
        }
        return x;
    }
    db::EditableRow operator()(Zone z) {
        switch (p.index(3)) {
        case 0: z.zone = p.chance(50) ? z.zone + "b" : any(p, d.zones).zone; break;
        case 1: z.base_event = otherEvent(); break;
        default: z.top_event = z.base_event;
        }
        return z;
    }
};

std::optional<db::EditableRow> anyRow(Pick& p, const CoreDataset& d, Table t) {
    switch (t) {
    case Table::Holes: return any(p, d.holes);
    case Table::Runs: if (!d.runs.empty()) return any(p, d.runs); break;
    case Table::Intervals: if (!d.intervals.empty()) return any(p, d.intervals); break;
    case Table::Samples: if (!d.samples.empty()) return any(p, d.samples); break;
    case Table::Occurrences: if (!d.occurrences.empty()) return any(p, d.occurrences); break;
    case Table::Events: if (!d.events.empty()) return any(p, d.events); break;
    case Table::Dates: if (!d.dates.empty()) return any(p, d.dates); break;
    case Table::Zones: if (!d.zones.empty()) return any(p, d.zones); break;
    default: break;
    }
    return std::nullopt;
}

std::vector<std::string> formatted(const std::vector<EditProblem>& problems) {
    std::vector<std::string> lines;
    for (const EditProblem& e : problems) lines.push_back(e.format());
    std::sort(lines.begin(), lines.end());
    return lines;
}

struct Verdict {
    std::vector<std::string> refusals;
    std::vector<std::string> warnings;
    CoreDataset after;
};

// The same comparison over the whole dataset: what applyEdit would answer without a scope.
Verdict wholeProjectVerdict(SQLite::Database& db, const RowEdit& edit) {
    db::detail::DatasetRowIds ids;
    const CoreDataset whole = db::detail::loadDatasetRows(db, nullptr, &ids);
    const db::detail::EditScope scope{whole, ids};
    std::optional<db::detail::RowPlace> place;
    if (edit.before) place = db::detail::findRow(scope, *edit.before);
    REQUIRE((place || !edit.before));
    const Table table = db::tableOf(edit.after ? *edit.after : *edit.before);
    const std::int64_t id = edit.before ? place->id
                                        : db::detail::idForAddedRow(db, table, edit.position);
    Verdict v{{}, {}, whole};
    db::detail::DatasetRowIds after_ids = ids;
    const auto edited = db::detail::applyInMemory(v.after, after_ids, edit, place, id);
    db::detail::EditCheck check = db::detail::checkEdit(
        db, whole, place ? std::optional(place->index) : std::nullopt, v.after, after_ids,
        edited, table);
    if (edit.kind == db::EditKind::Remove) {
        if (auto orphans = db::detail::rowsReferringTo(db, id, *edit.before))
            check.refusals.push_back(*orphans);
    }
    v.refusals = formatted(check.refusals);
    v.warnings = formatted(check.warnings);
    return v;
}

} // namespace

TEST_CASE("An edit's scope gives the verdict of checking the whole project", "[edits]") {
    constexpr std::uint64_t kSeed = 20310515;
    Pick p(kSeed);
    const Table tables[] = {Table::Holes, Table::Runs,   Table::Intervals, Table::Samples,
                            Table::Occurrences, Table::Events, Table::Dates, Table::Zones};
    int refused = 0, accepted = 0;
    for (std::uint64_t dataset = 1; dataset <= 6; ++dataset) {
        TempPath file("edit-scope");
        ProjectStore store = ProjectStore::create(file.path());
        store.replaceDataset(testing::randomValidDataset(kSeed + dataset));
        for (int step = 0; step < 60; ++step) {
            const CoreDataset d = store.loadDataset();
            const Table table = tables[p.index(8)];
            const std::optional<db::EditableRow> row = anyRow(p, d, table);
            if (!row) continue;
            Mutate mutate{p, d};
            const int kind = static_cast<int>(p.index(3));
            const RowEdit edit = kind == 0   ? RowEdit::add(std::visit(mutate, *row))
                                 : kind == 1 ? RowEdit::update(*row, std::visit(mutate, *row))
                                             : RowEdit::remove(*row);
            INFO("seed " << kSeed << ", dataset " << dataset << ", step " << step << ", table "
                         << tableName(table) << ", kind " << kind);
            const Verdict whole = wholeProjectVerdict(store.database(), edit);
            try {
                const db::EditOutcome outcome = db::applyEdit(store, edit);
                CHECK(whole.refusals.empty());
                CHECK(formatted(outcome.warnings) == whole.warnings);
                CHECK(store.loadDataset() == whole.after);
                ++accepted;
            } catch (const EditRefused& e) {
                INFO(e.what());
                CHECK(formatted(e.problems()) == whole.refusals);
                CHECK(store.loadDataset() == d);
                ++refused;
            }
        }
    }
    // Both verdicts must be exercised for the comparison to mean anything.
    CHECK(refused > 30);
    CHECK(accepted > 30);
}
