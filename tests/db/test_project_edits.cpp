// Row edits (applyEdit): add, update and remove one row of each editable table; each refused
// case with its message; the inverse edit restores the dataset exactly and its inverse redoes
// the edit; a refused edit leaves the file's bytes as they were. The rules are the engine's
// (validateDataset), so the expected messages are the engine's wording; the data is the
// invented archipelago of store_fixtures.hpp.
#include "atollog/db/project_edits.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/engine/validation.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

using namespace atollog;
using atollog::db::applyEdit;
using atollog::db::EditRefused;
using atollog::db::ProjectStore;
using atollog::db::RowEdit;
using atollog::test::TempPath;

namespace {

// The every-field dataset without its one deliberately mixed date (sample and depth, U-Th and
// radiocarbon on an Ar-Ar date), which validateDataset reports as errors.
CoreDataset validFixture() {
    CoreDataset d = test::everyFieldDataset();
    d.dates[2].depth_m.reset();
    d.dates[2].uth.reset();
    d.dates[2].c14.reset();
    return d;
}

struct EditFixture {
    TempPath file{"edits"};
    ProjectStore store = ProjectStore::create(file.path());
    CoreDataset start = validFixture();
    EditFixture() {
        for (const DataIssue& i : validateDataset(start))
            if (i.severity == Severity::Error) UNSCOPED_INFO(i.problem << " / " << i.column);
        REQUIRE_FALSE(hasErrors(validateDataset(start)));
        store.replaceDataset(start);
    }
};

std::string integrityCheck(ProjectStore& store) {
    return store.database().execAndGet("PRAGMA integrity_check").getString();
}

/// Applies `edit`, checks the result with `expect`, then undoes (dataset as before, exactly),
/// redoes (as after the edit, exactly) and undoes again.
template <class Expect>
void checkRoundTrip(ProjectStore& store, const RowEdit& edit, Expect expect) {
    const CoreDataset before = store.loadDataset();
    const db::EditOutcome done = applyEdit(store, edit);
    const CoreDataset edited = store.loadDataset();
    CHECK(edited != before);
    expect(edited);
    const db::EditOutcome undone = applyEdit(store, done.inverse);
    CHECK(store.loadDataset() == before);
    const db::EditOutcome redone = applyEdit(store, undone.inverse);
    CHECK(store.loadDataset() == edited);
    applyEdit(store, redone.inverse);
    CHECK(store.loadDataset() == before);
    CHECK(integrityCheck(store) == "ok");
}

/// The edit is refused, with a problem whose text holds every one of `parts`; the file's
/// bytes (main file and write-ahead log) and its dataset stay as they were.
void checkRefused(ProjectStore& store, const RowEdit& edit,
                  const std::vector<std::string>& parts) {
    const CoreDataset before = store.loadDataset();
    const std::string bytes = test::fileBytes(store.path());
    const std::string wal = test::fileBytes(store.path().string() + "-wal");
    try {
        applyEdit(store, edit);
        FAIL("the edit was accepted");
    } catch (const EditRefused& e) {
        INFO(e.what());
        REQUIRE_FALSE(e.problems().empty());
        bool found = false;
        for (const db::EditProblem& p : e.problems()) {
            const std::string text = p.format();
            bool all = true;
            for (const std::string& part : parts) all = all && text.find(part) != std::string::npos;
            found = found || all;
        }
        CHECK(found);
    }
    CHECK(store.loadDataset() == before);
    CHECK(test::fileBytes(store.path()) == bytes);
    CHECK(test::fileBytes(store.path().string() + "-wal") == wal);
    CHECK(integrityCheck(store) == "ok");
}

} // namespace

TEST_CASE("Holes: add, update with a new id carried to its rows, remove; refusals", "[edits]") {
    EditFixture f;
    const Hole added{"KV-3", "Ossery cay", -17.5, 151.0, 2.0, 45.5, HoleKind::Cuttings,
                     {{"x_rig", "RX-3"}}};
    checkRoundTrip(f.store, RowEdit::add(added), [&](const CoreDataset& d) {
        CHECK(d.holes.back() == added);
    });
    Hole renamed = f.start.holes[1];
    renamed.hole = "KV-2b";
    checkRoundTrip(f.store, RowEdit::update(f.start.holes[1], renamed), [](const CoreDataset& d) {
        CHECK(d.holes[1].hole == "KV-2b");
        // Its runs, samples and dates refer to it by stored id, so they follow.
        CHECK(d.runs[2].hole == "KV-2b");
        CHECK(d.samples[2].hole == "KV-2b");
        CHECK(d.dates[1].hole == "KV-2b");
    });
    applyEdit(f.store, RowEdit::add(added));
    checkRoundTrip(f.store, RowEdit::remove(added), [&](const CoreDataset& d) {
        CHECK(d.holes.size() == f.start.holes.size());
    });

    Hole duplicate = added;
    duplicate.hole = "KV-1";
    // validate_identifiers.cpp: requireUnique.
    checkRefused(f.store, RowEdit::add(duplicate),
                 {"holes: hole 'KV-1'", "column hole", "is already used in data row 1"});
    Hole no_lat = f.start.holes[0];
    no_lat.lat_deg = 95.0;
    checkRefused(f.store, RowEdit::update(f.start.holes[0], no_lat), {"lat_deg", "95"});
    checkRefused(f.store, RowEdit::remove(f.start.holes[0]),
                 {"hole 'KV-1' still has 2 runs, 2 intervals, 2 samples and 1 date",
                  "remove them first"});
}

TEST_CASE("Runs: add, update, remove; negative recovery, overlap and uncovered rows refused",
          "[edits]") {
    EditFixture f;
    const CoreRun deeper{"KV-1", "KV-1-R3", 6.1, 9.15, 2.5, {{"x_bit", "HQ"}}};
    checkRoundTrip(f.store, RowEdit::add(deeper), [&](const CoreDataset& d) {
        CHECK(d.runs.back() == deeper);
    });
    CoreRun shorter = f.start.runs[1];
    shorter.recovered_m = 1.5;
    checkRoundTrip(f.store, RowEdit::update(f.start.runs[1], shorter), [&](const CoreDataset& d) {
        CHECK(d.runs[1].recovered_m == 1.5);
    });
    checkRoundTrip(f.store, RowEdit::remove(f.start.runs[1]), [&](const CoreDataset& d) {
        CHECK(d.runs.size() == 2);
        CHECK(d.runs[1].run == "KV-2-R1");
    });

    CoreRun negative = f.start.runs[1];
    negative.recovered_m = -0.5;
    checkRefused(f.store, RowEdit::update(f.start.runs[1], negative),
                 {"runs: run 'KV-1-R2' of hole 'KV-1'", "column recovered_m", "value '-0.5'",
                  "is negative", "0 when nothing came up"});
    const CoreRun overlapping{"KV-1", "KV-1-R9", 5.0, 7.0, 1.0, {}};
    checkRefused(f.store, RowEdit::add(overlapping), {"overlaps run", "must not overlap"});
    // A run id is unique over all holes: the other hole's run is in the edit's scope too.
    const CoreRun same_id{"KV-1", "KV-2-R1", 6.1, 9.15, 2.0, {}};
    checkRefused(f.store, RowEdit::add(same_id),
                 {"runs: run 'KV-2-R1' of hole 'KV-1'", "column run",
                  "run 'KV-2-R1' is already used in data row 3 of runs.csv"});
    // Removing the first run leaves the logged interval 0-1.25 m outside every run.
    checkRefused(f.store, RowEdit::remove(f.start.runs[0]),
                 {"intervals: interval 0-1.25 m of hole 'KV-1'", "outside every run"});
}

TEST_CASE("Runs: more core than cored length is a warning, not a refusal", "[edits]") {
    EditFixture f;
    CoreRun expanded = f.start.runs[1];
    expanded.recovered_m = 3.2; // 3.05 m cored: 105 % recovery, which expanding core gives
    const db::EditOutcome outcome = applyEdit(f.store, RowEdit::update(f.start.runs[1], expanded));
    REQUIRE(outcome.warnings.size() == 1);
    CHECK(outcome.warnings[0].key == "run 'KV-1-R2' of hole 'KV-1'");
    CHECK(outcome.warnings[0].column == "recovered_m");
    CHECK(outcome.warnings[0].problem.find("more than the cored length") != std::string::npos);
    CHECK(f.store.loadDataset().runs[1] == expanded);
}

TEST_CASE("Intervals: add, update, remove; overlap and upside-down refused", "[edits]") {
    EditFixture f;
    LithInterval next;
    next.hole = "KV-1";
    next.top_m = 2.0;
    next.base_m = 2.5;
    next.rock = Rock::Limestone;
    next.texture = Texture::Grainstone;
    next.notes = "rhodolith rubble";
    next.extra = {{"x_photo", "IMG_0050.jpg"}};
    checkRoundTrip(f.store, RowEdit::add(next), [&](const CoreDataset& d) {
        CHECK(d.intervals.back() == next);
    });
    LithInterval thinner = f.start.intervals[1];
    thinner.base_m = 1.75;
    thinner.notes = "vesicular";
    checkRoundTrip(f.store, RowEdit::update(f.start.intervals[1], thinner),
                   [&](const CoreDataset& d) { CHECK(d.intervals[1] == thinner); });
    checkRoundTrip(f.store, RowEdit::remove(f.start.intervals[0]), [&](const CoreDataset& d) {
        CHECK(d.intervals.size() == 1);
        CHECK(d.intervals[0] == f.start.intervals[1]);
    });

    LithInterval overlapping = next;
    overlapping.top_m = 1.0;
    overlapping.base_m = 1.5;
    checkRefused(f.store, RowEdit::add(overlapping),
                 {"intervals:", "column top_m", "overlaps the interval", "touching is fine"});
    LithInterval upside_down = f.start.intervals[1];
    upside_down.base_m = 1.0;
    checkRefused(f.store, RowEdit::update(f.start.intervals[1], upside_down),
                 {"column base_m", "value '1'", "is above top_m 1.25", "swap them"});
}

TEST_CASE("Samples: add, update, remove; outside the runs and still-referred-to refused",
          "[edits]") {
    EditFixture f;
    const Sample added{"KV-1", "KV-1-S3", 2.5, 2.55, "core", {{"x_tray", "T2"}}};
    checkRoundTrip(f.store, RowEdit::add(added), [&](const CoreDataset& d) {
        CHECK(d.samples.back() == added);
    });
    Sample moved = f.start.samples[1];
    moved.top_m = moved.base_m = 1.2;
    checkRoundTrip(f.store, RowEdit::update(f.start.samples[1], moved),
                   [&](const CoreDataset& d) { CHECK(d.samples[1] == moved); });
    Sample renamed = f.start.samples[0];
    renamed.sample = "KV-1-S1a";
    checkRoundTrip(f.store, RowEdit::update(f.start.samples[0], renamed),
                   [](const CoreDataset& d) {
                       CHECK(d.occurrences[0].sample == "KV-1-S1a");
                       CHECK(d.dates[0].sample == "KV-1-S1a");
                   });
    applyEdit(f.store, RowEdit::add(added));
    checkRoundTrip(f.store, RowEdit::remove(added), [&](const CoreDataset& d) {
        CHECK(d.samples == f.start.samples);
    });

    Sample deep = added;
    deep.top_m = deep.base_m = 20.0;
    checkRefused(f.store, RowEdit::add(deep),
                 {"samples: sample 'KV-1-S3' of hole 'KV-1'", "column top_m", "value '20'",
                  "outside every run of hole 'KV-1'", "add the run that cored it"});
    checkRefused(f.store, RowEdit::remove(f.start.samples[0]),
                 {"sample 'KV-1-S1' of hole 'KV-1' still has 2 occurrences and 1 date",
                  "remove them first"});
    Sample unknown_hole = added;
    unknown_hole.hole = "KV-9";
    checkRefused(f.store, RowEdit::add(unknown_hole),
                 {"column hole", "hole 'KV-9' of sample 'KV-1-S3' is not in holes.csv"});
}

TEST_CASE("Occurrences: add, update, remove; unknown taxon and second listing refused",
          "[edits]") {
    EditFixture f;
    const Occurrence added{"KV-1-S2", "TX-A", AbundanceClass::Rare, OccurrenceStatus::InPlace,
                           {{"x_counter", "SA"}}};
    checkRoundTrip(f.store, RowEdit::add(added), [&](const CoreDataset& d) {
        CHECK(d.occurrences.back() == added);
    });
    Occurrence recounted = f.start.occurrences[1];
    recounted.abundance = AbundanceClass::Common;
    checkRoundTrip(f.store, RowEdit::update(f.start.occurrences[1], recounted),
                   [&](const CoreDataset& d) { CHECK(d.occurrences[1] == recounted); });
    checkRoundTrip(f.store, RowEdit::remove(f.start.occurrences[0]), [&](const CoreDataset& d) {
        CHECK(d.occurrences.size() == 3);
    });

    Occurrence unknown = added;
    unknown.taxon = "TX-Z";
    checkRefused(f.store, RowEdit::add(unknown),
                 {"occurrences:", "column taxon", "value 'TX-Z'", "taxon 'TX-Z' is not in taxa.csv",
                  "add taxon 'TX-Z' to taxa.csv"});
    Occurrence twice = f.start.occurrences[0];
    twice.abundance = std::int64_t{3};
    twice.extra.clear();
    checkRefused(f.store, RowEdit::add(twice),
                 {"taxon 'TX-A' (in_place) in sample 'KV-1-S1' is already listed",
                  "list each taxon once per sample and status"});
    // Only the occurrences of the samples an edit names are read; the row number in the
    // message is still the row's place in the whole table (4th), not in that scope (1st).
    Occurrence again = f.start.occurrences[3];
    again.abundance = AbundanceClass::Few;
    checkRefused(f.store, RowEdit::add(again),
                 {"taxon 'TX-C' (in_place) in sample 'KV-2-S1' is already listed in data row 4"});
    Occurrence negative = f.start.occurrences[3];
    negative.abundance = std::int64_t{-2};
    checkRefused(f.store, RowEdit::update(f.start.occurrences[3], negative),
                 {"column abundance", "value '-2'", "is negative"});
}

TEST_CASE("Events: add, update, remove; negative sd and an event a zone needs refused",
          "[edits]") {
    EditFixture f;
    const TimeScaleEvent added{"EV-3", "TX-B", EventKind::Top, 1.25, 0.02, "Invented 2030", {}};
    checkRoundTrip(f.store, RowEdit::add(added), [&](const CoreDataset& d) {
        CHECK(d.events.back() == added);
    });
    TimeScaleEvent older = f.start.events[1];
    older.age_ma = 3.25;
    checkRoundTrip(f.store, RowEdit::update(f.start.events[1], older),
                   [&](const CoreDataset& d) { CHECK(d.events[1] == older); });
    applyEdit(f.store, RowEdit::add(added));
    checkRoundTrip(f.store, RowEdit::remove(added), [&](const CoreDataset& d) {
        CHECK(d.events == f.start.events);
    });

    TimeScaleEvent bad_sd = f.start.events[1];
    bad_sd.age_sd_ma = -0.1;
    checkRefused(f.store, RowEdit::update(f.start.events[1], bad_sd),
                 {"events: event 'EV-2'", "column age_sd_ma", "value '-0.1'",
                  "greater than 0"});
    checkRefused(f.store, RowEdit::remove(f.start.events[0]),
                 {"event 'EV-1' still has 2 zones referring to it", "remove those zones first"});
}

TEST_CASE("Dates: add, update, remove; negative error refused", "[edits]") {
    EditFixture f;
    NumericalDate added;
    added.hole = "KV-1";
    added.depth_m = 2.5;
    added.method = DateMethod::C14;
    added.c14 = C14Measurement{0.91, 0.003, std::nullopt, std::nullopt};
    added.extra = {{"x_lab", "Nérith"}};
    checkRoundTrip(f.store, RowEdit::add(added), [&](const CoreDataset& d) {
        CHECK(d.dates.back() == added);
    });
    NumericalDate remeasured = f.start.dates[0];
    remeasured.uth->th230_u238_act = 0.0125;
    checkRoundTrip(f.store, RowEdit::update(f.start.dates[0], remeasured),
                   [&](const CoreDataset& d) { CHECK(d.dates[0] == remeasured); });
    checkRoundTrip(f.store, RowEdit::remove(f.start.dates[1]), [&](const CoreDataset& d) {
        CHECK(d.dates.size() == 2);
    });

    NumericalDate negative_error = added;
    negative_error.c14->f14c_sd = -0.003;
    checkRefused(f.store, RowEdit::add(negative_error),
                 {"dates: c14 date of hole 'KV-1', depth_m 2.5", "column f14c_sd",
                  "value '-0.003'", "greater than 0"});
    NumericalDate other_hole_sample = added;
    other_hole_sample.depth_m.reset();
    other_hole_sample.sample = "KV-2-S1";
    checkRefused(f.store, RowEdit::add(other_hole_sample),
                 {"column sample", "sample 'KV-2-S1' belongs to hole 'KV-2', but the date is "
                                   "given for hole 'KV-1'"});
    NumericalDate wrong_hole = f.start.dates[0];
    wrong_hole.hole = "KV-2";
    checkRefused(f.store, RowEdit::update(f.start.dates[0], wrong_hole),
                 {"sample 'KV-1-S1' belongs to hole 'KV-1'", "set hole to 'KV-1'"});
}

TEST_CASE("Zones: add, update, remove; same base and top, unknown event refused", "[edits]") {
    EditFixture f;
    const Zone added{"Invented planktonic", "IP3", "EV-2", std::nullopt, {{"x_colour", "red"}}};
    checkRoundTrip(f.store, RowEdit::add(added), [&](const CoreDataset& d) {
        CHECK(d.zones.back() == added);
    });
    Zone opened = f.start.zones[0];
    opened.top_event.reset();
    checkRoundTrip(f.store, RowEdit::update(f.start.zones[0], opened),
                   [&](const CoreDataset& d) { CHECK(d.zones[0] == opened); });
    checkRoundTrip(f.store, RowEdit::remove(f.start.zones[2]), [&](const CoreDataset& d) {
        CHECK(d.zones.size() == 2);
    });

    Zone same = f.start.zones[0];
    same.top_event = "EV-1";
    checkRefused(f.store, RowEdit::update(f.start.zones[0], same),
                 {"zones: zone 'IP1' of scheme 'Invented planktonic'", "column top_event",
                  "base_event and top_event are both 'EV-1'"});
    Zone unknown = added;
    unknown.base_event = "EV-7";
    checkRefused(f.store, RowEdit::add(unknown),
                 {"column base_event", "event 'EV-7' (base of zone 'IP3') is not in events.csv"});
    Zone twice = added;
    twice.zone = "IP1";
    checkRefused(f.store, RowEdit::add(twice), {"is already used in data row 1"});
}

TEST_CASE("A row changed meanwhile is not overwritten", "[edits]") {
    EditFixture f;
    CoreRun stale = f.start.runs[1];
    stale.recovered_m = 2.0; // not what is stored
    CoreRun wanted = stale;
    wanted.recovered_m = 1.0;
    checkRefused(f.store, RowEdit::update(stale, wanted),
                 {"run 'KV-1-R2' of hole 'KV-1' is not in the project as it was read",
                  "read the project again"});
}

TEST_CASE("Errors already elsewhere in a project do not block an unrelated edit", "[edits]") {
    EditFixture f;
    CoreDataset flawed = f.start;
    flawed.intervals[1].top_m = 1.0; // overlaps the interval 0-1.25 m: an error in hole KV-1
    REQUIRE(hasErrors(validateDataset(flawed)));
    f.store.replaceDataset(flawed); // stored as given (replaceDataset does not validate)
    Sample moved = flawed.samples[2];
    moved.top_m = moved.base_m = 5.0;
    applyEdit(f.store, RowEdit::update(flawed.samples[2], moved));
    CHECK(f.store.loadDataset().samples[2] == moved);
    // The row carrying the error may be edited when the edit adds no error ...
    LithInterval renoted = flawed.intervals[1];
    renoted.notes = "vesicular";
    applyEdit(f.store, RowEdit::update(flawed.intervals[1], renoted));
    // ... and the error is fixed by an edit like any other.
    LithInterval fixed = renoted;
    fixed.top_m = 1.25;
    applyEdit(f.store, RowEdit::update(renoted, fixed));
    CHECK_FALSE(hasErrors(validateDataset(f.store.loadDataset())));
}

TEST_CASE("A removed row comes back in its place when undone, after other rows were added",
          "[edits]") {
    EditFixture f;
    const db::EditOutcome removed = applyEdit(f.store, RowEdit::remove(f.start.runs[1]));
    const CoreRun extra{"KV-1", "KV-1-R3", 6.1, 9.15, 2.5, {}};
    applyEdit(f.store, RowEdit::add(extra)); // stored id 4: one past the last (3)
    applyEdit(f.store, removed.inverse);     // back at stored id 2
    CoreDataset expected = f.start;
    expected.runs.push_back(extra);
    CHECK(f.store.loadDataset() == expected);

    // When the removed row's id has been taken meanwhile, it comes back after the last row.
    const db::EditOutcome removed_last = applyEdit(f.store, RowEdit::remove(extra));
    const CoreRun other{"KV-1", "KV-1-R4", 9.15, 12.2, 3.0, {}};
    applyEdit(f.store, RowEdit::add(other)); // takes id 4
    applyEdit(f.store, removed_last.inverse);
    const CoreDataset d = f.store.loadDataset();
    REQUIRE(d.runs.size() == 5);
    CHECK(d.runs[3] == other);
    CHECK(d.runs[4] == extra);
}

TEST_CASE("Malformed edits are programming errors", "[edits]") {
    EditFixture f;
    RowEdit no_row;
    no_row.kind = db::EditKind::Update;
    no_row.before = f.start.runs[0];
    CHECK_THROWS_AS(applyEdit(f.store, no_row), std::invalid_argument);
    RowEdit mixed = RowEdit::update(f.start.runs[0], f.start.samples[0]);
    CHECK_THROWS_AS(applyEdit(f.store, mixed), std::invalid_argument);
}

TEST_CASE("A refusal names the row once", "[unit][db][edits]") {
    const db::EditProblem p{"runs", "run 'KV-1-R2' of hole 'KV-1'", "recovered_m", "-1",
                            "run 'KV-1-R2' of hole 'KV-1': recovered_m -1 is negative",
                            "give the recovered core length in metres"};
    CHECK(p.format() == "runs: run 'KV-1-R2' of hole 'KV-1': column recovered_m, value '-1', "
                        "recovered_m -1 is negative; give the recovered core length in metres");
    const db::EditProblem other{"runs", "run 'A'", "", "", "overlaps run 'B'", ""};
    CHECK(other.format() == "runs: run 'A': overlaps run 'B'");
}
