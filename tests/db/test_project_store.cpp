// ProjectStore: round trip of every field, all-or-nothing replace, provenance records,
// connection settings and the dataset hash.
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/sha256.hpp"
#include "atollog/db/version.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/SQLiteCpp.h>
#include <catch2/catch.hpp>

#include <chrono>
#include <cmath>
#include <functional>
#include <limits>
#include <regex>
#include <set>

using atollog::CoreDataset;
using atollog::db::ModelRunRecord;
using atollog::db::ProjectError;
using atollog::db::ProjectStore;
using atollog::test::TempPath;
using Catch::Matchers::Contains;

TEST_CASE("A stored dataset loads back equal, field for field, after reopening", "[unit]") {
    TempPath file("roundtrip");
    const CoreDataset data = atollog::test::everyFieldDataset();
    {
        ProjectStore store = ProjectStore::create(file.path());
        CHECK_FALSE(store.hasData());
        store.replaceDataset(data);
        CHECK(store.hasData());
        CHECK(store.loadDataset() == data);
    }
    ProjectStore reopened = ProjectStore::open(file.path());
    const CoreDataset loaded = reopened.loadDataset();
    CHECK(loaded.holes == data.holes);
    CHECK(loaded.intervals == data.intervals);
    CHECK(loaded.occurrences == data.occurrences);
    CHECK(loaded.dates == data.dates);
    CHECK(loaded.zones == data.zones);
    CHECK(loaded == data);
    CHECK(reopened.rowCount(atollog::Table::Occurrences) == 4);
}

TEST_CASE("Free attributes keep their row-wise order even when rows disagree", "[unit]") {
    TempPath file("free-order");
    CoreDataset data = atollog::test::everyFieldDataset();
    data.holes[0].extra = {{"x_b", "2"}, {"x_a", "1"}};
    data.holes[1].extra = {{"x_a", "3"}, {"x_c", ""}, {"x_b", "4"}};
    ProjectStore store = ProjectStore::create(file.path());
    store.replaceDataset(data);
    CHECK(store.loadDataset() == data);
    // free_column lists each table's columns in order of first appearance.
    SQLite::Statement columns(store.database(),
                              "SELECT col, ord FROM free_column WHERE tbl = 'hole' ORDER BY ord");
    std::vector<std::string> names;
    while (columns.executeStep()) names.push_back(columns.getColumn(0).getString());
    CHECK(names == std::vector<std::string>{"x_b", "x_a", "x_c"});
}

TEST_CASE("Every vocabulary word is accepted by the schema", "[unit]") {
    // The schema's IN (...) lists are frozen text; a new enum value needs a migration, and this
    // test fails until there is one.
    using namespace atollog;
    CoreDataset data;
    for (HoleKind k : allValues<HoleKind>()) {
        data.holes.push_back({"H-" + std::string(toString(k)), "Tavenu", {}, {}, {}, {}, k, {}});
    }
    double depth_m = 0;
    for (Rock r : allValues<Rock>()) {
        for (Surface s : allValues<Surface>()) {
            LithInterval l;
            l.hole = data.holes[0].hole;
            l.top_m = depth_m;
            l.base_m = depth_m + 1;
            depth_m += 1;
            l.rock = r;
            l.base_surface = s;
            data.intervals.push_back(l);
        }
    }
    for (std::size_t i = 0; i < allValues<Texture>().size(); ++i) {
        data.intervals[i].texture = allValues<Texture>()[i];
    }
    for (std::size_t i = 0; i < allValues<Binding>().size(); ++i) {
        data.intervals[i].binding = allValues<Binding>()[i];
    }
    data.samples.push_back({data.holes[0].hole, "S1", 1, 1, "", {}});
    for (TaxonGroup g : allValues<TaxonGroup>()) {
        data.taxa.push_back({"T-" + std::string(toString(g)), "invented", g, {}});
    }
    for (AbundanceClass a : allValues<AbundanceClass>()) {
        for (OccurrenceStatus s : allValues<OccurrenceStatus>()) {
            data.occurrences.push_back({"S1", data.taxa[0].taxon, a, s, {}});
        }
    }
    for (EventKind k : allValues<EventKind>()) {
        data.events.push_back({"E-" + std::string(toString(k)), data.taxa[0].taxon, k, 1, 0.1,
                               "", {}});
    }
    for (DateMethod m : allValues<DateMethod>()) {
        NumericalDate date;
        date.hole = data.holes[0].hole;
        date.depth_m = 2;
        date.method = m;
        data.dates.push_back(date);
    }
    TempPath file("vocabulary");
    ProjectStore store = ProjectStore::create(file.path());
    store.replaceDataset(data);
    CHECK(store.loadDataset() == data);
}

TEST_CASE("create refuses a file that exists", "[unit]") {
    TempPath file("exists");
    { std::ofstream(file.path()) << "keep me"; }
    CHECK_THROWS_WITH(ProjectStore::create(file.path()),
                      Contains("cannot create project " + file.path().string()) &&
                          Contains("a file of that name exists"));
    CHECK(atollog::test::fileBytes(file.path()) == "keep me");
}

TEST_CASE("create into a missing folder fails cleanly", "[unit]") {
    TempPath folder("no-folder");
    const auto file = folder.path() / "project.atollog";
    CHECK_THROWS_WITH(ProjectStore::create(file), Contains("cannot create project") &&
                                                      Contains("folder exists"));
    CHECK_FALSE(std::filesystem::exists(folder.path()));
}

namespace {

// Runs `replace` on a store holding everyFieldDataset and checks the content is unchanged.
void checkReplaceFailsCleanly(const CoreDataset& bad, const std::string& expected_message) {
    TempPath file("replace-fails");
    ProjectStore store = ProjectStore::create(file.path());
    const CoreDataset before = atollog::test::everyFieldDataset();
    store.replaceDataset(before);
    CHECK_THROWS_AS(store.replaceDataset(bad), ProjectError);
    try {
        store.replaceDataset(bad);
    } catch (const ProjectError& e) {
        CHECK_THAT(e.what(), Contains(expected_message) && Contains("the project is unchanged"));
    }
    CHECK(store.loadDataset() == before);
    // Foreign keys are checked in bulk during a replace and must be on again afterwards.
    CHECK(store.database().execAndGet("PRAGMA foreign_keys").getInt() == 1);
}

} // namespace

TEST_CASE("A failing replaceDataset leaves the previous content intact", "[unit]") {
    CoreDataset bad = atollog::test::everyFieldDataset();
    bad.holes.push_back({"KV-9", "Tavenu", {}, {}, {}, {}, atollog::HoleKind::Core, {}});

    SECTION("an occurrence of an unknown sample") {
        bad.occurrences.push_back({"NOPE", "TX-A", std::nullopt,
                                   atollog::OccurrenceStatus::InPlace, {}});
        checkReplaceFailsCleanly(bad, "occurrences row 5: sample 'NOPE' is not in samples");
    }
    SECTION("a run with its base above its top violates a CHECK") {
        bad.runs[2].base_m = -1;
        checkReplaceFailsCleanly(bad, "runs row 3: CHECK constraint failed");
    }
    SECTION("a duplicate sample id violates UNIQUE") {
        bad.samples.push_back(bad.samples[0]);
        checkReplaceFailsCleanly(bad, "samples row 4: UNIQUE constraint failed: sample.sample");
    }
    SECTION("a percentage above 100") {
        bad.intervals[0].porosity_pct = 100.5;
        checkReplaceFailsCleanly(bad, "intervals row 1: CHECK constraint failed");
    }
    SECTION("a NaN, which SQLite would turn into NULL") {
        bad.sea_level[1].level_m = std::numeric_limits<double>::quiet_NaN();
        checkReplaceFailsCleanly(bad, "sealevel row 2: level_m is NaN");
    }
    SECTION("a zone bounded by an unknown event") {
        bad.zones[0].top_event = "EV-404";
        checkReplaceFailsCleanly(bad, "zones row 1: top_event 'EV-404' is not in events");
    }
    SECTION("a free attribute outside the x_ namespace") {
        bad.curve[0].extra = {{"colour", "red"}};
        checkReplaceFailsCleanly(bad, "curve: free column 'colour'");
    }
    SECTION("a free attribute given twice on one row") {
        bad.taxa[1].extra = {{"x_a", "1"}, {"x_a", "2"}};
        checkReplaceFailsCleanly(bad, "taxa row 2: free column 'x_a'");
    }
}

TEST_CASE("replaceDataset replaces everything, including free columns", "[unit]") {
    TempPath file("replace-twice");
    ProjectStore store = ProjectStore::create(file.path());
    store.replaceDataset(atollog::test::everyFieldDataset());
    CoreDataset smaller;
    smaller.holes.push_back({"KV-7", "Tavenu", {}, {}, {}, {}, atollog::HoleKind::Core, {}});
    store.replaceDataset(smaller);
    CHECK(store.loadDataset() == smaller);
    CHECK(store.rowCount(atollog::Table::Occurrences) == 0);
    CHECK(store.database().execAndGet("SELECT count(*) FROM free_column").getInt() == 0);
    store.replaceDataset(CoreDataset{});
    CHECK_FALSE(store.hasData());
}

TEST_CASE("Replacing the dataset with a run record is one transaction", "[unit]") {
    TempPath file("replace-with-run");
    ProjectStore store = ProjectStore::create(file.path());
    const CoreDataset first = atollog::test::everyFieldDataset();
    store.replaceDataset(first);

    CoreDataset second;
    second.holes.push_back({"KV-8", "Tavenu", {}, {}, {}, {}, atollog::HoleKind::Core, {}});
    ModelRunRecord bad_run; // empty kind violates CHECK (kind <> ''): fails after the rows
    CHECK_THROWS_AS(store.replaceDataset(second, bad_run), ProjectError);
    CHECK(store.loadDataset() == first);
    CHECK(store.modelRuns().empty());

    ModelRunRecord run;
    run.kind = "import";
    const std::int64_t id = store.replaceDataset(second, run);
    CHECK(store.loadDataset() == second);
    REQUIRE(store.modelRuns().size() == 1);
    CHECK(store.modelRuns()[0].id == id);
}

TEST_CASE("Model runs keep what ran, with version and UTC start time filled in", "[unit]") {
    TempPath file("runs");
    ProjectStore store = ProjectStore::create(file.path());
    ModelRunRecord first;
    first.kind = "age-model";
    first.settings = "method=linear\nhole=KV-1";
    first.seed = std::numeric_limits<std::uint64_t>::max(); // does not fit a signed integer
    first.inputs_sha256 = std::string(64, 'a');
    first.summary = "3 tie points";
    const auto before = std::chrono::system_clock::now();
    const std::int64_t first_id = store.recordModelRun(first);
    ModelRunRecord second;
    second.kind = "datums";
    second.program_version = "9.9.9";
    second.started_utc = "2031-02-03T04:05:06Z";
    const std::int64_t second_id = store.recordModelRun(second);
    CHECK(second_id > first_id);

    const auto runs = store.modelRuns();
    REQUIRE(runs.size() == 2);
    CHECK(runs[0].id == first_id);
    CHECK(runs[0].kind == first.kind);
    CHECK(runs[0].settings == first.settings);
    CHECK(runs[0].seed == first.seed);
    CHECK(runs[0].inputs_sha256 == first.inputs_sha256);
    CHECK(runs[0].summary == first.summary);
    CHECK(runs[0].program_version == atollog::kProgramVersion);
    // ISO 8601 basic UTC form, e.g. 2031-02-03T04:05:06Z, within a minute of the call.
    REQUIRE(std::regex_match(runs[0].started_utc,
                             std::regex(R"(\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z)")));
    std::tm utc{};
    strptime(runs[0].started_utc.c_str(), "%Y-%m-%dT%H:%M:%SZ", &utc);
    const auto stamped = std::chrono::system_clock::from_time_t(timegm(&utc));
    CHECK(std::chrono::abs(stamped - before) < std::chrono::minutes(1));
    CHECK_FALSE(runs[1].seed.has_value());
    CHECK(runs[1].program_version == "9.9.9");
    CHECK(runs[1].started_utc == "2031-02-03T04:05:06Z");

    // Provenance survives a dataset replace.
    store.replaceDataset(atollog::test::everyFieldDataset());
    CHECK(store.modelRuns().size() == 2);
    CHECK_THROWS_WITH(store.recordModelRun(ModelRunRecord{}),
                      Contains("cannot record the  run") && Contains("CHECK constraint failed"));
}

TEST_CASE("A project connection has the promised settings", "[unit]") {
    TempPath file("pragmas");
    ProjectStore store = ProjectStore::create(file.path());
    store.replaceDataset(atollog::test::everyFieldDataset());
    SQLite::Database& db = store.database();
    // Values per https://www.sqlite.org/pragma.html
    CHECK(db.execAndGet("PRAGMA foreign_keys").getInt() == 1);
    CHECK(db.execAndGet("PRAGMA journal_mode").getString() == "wal");
    CHECK(db.execAndGet("PRAGMA synchronous").getInt() == 1); // 1 = NORMAL
    CHECK(db.execAndGet("PRAGMA trusted_schema").getInt() == 0);
    CHECK(db.execAndGet("PRAGMA busy_timeout").getInt() == 5000);
    CHECK(db.execAndGet("PRAGMA application_id").getInt() == ProjectStore::kApplicationId);
    CHECK(db.execAndGet("PRAGMA user_version").getInt() == ProjectStore::kSchemaVersion);
    CHECK(store.schemaVersion() == ProjectStore::kSchemaVersion);
    // Extension loading stays off: https://www.sqlite.org/c3ref/enable_load_extension.html
    CHECK_THROWS_WITH(db.exec("SELECT load_extension('libnothing')"),
                      Contains("not authorized"));
}

TEST_CASE("Foreign keys cascade from a hole and protect zones and dated samples", "[unit]") {
    TempPath file("cascade");
    ProjectStore store = ProjectStore::create(file.path());
    store.replaceDataset(atollog::test::everyFieldDataset());
    SQLite::Database& db = store.database();
    // An event that bounds a zone cannot go (NO ACTION).
    CHECK_THROWS_WITH(db.exec("DELETE FROM time_scale_event WHERE event = 'EV-2'"),
                      Contains("FOREIGN KEY constraint failed"));
    // A hole takes its runs, intervals, samples, occurrences and dates with it.
    db.exec("DELETE FROM hole WHERE hole = 'KV-2'");
    CHECK(db.execAndGet("SELECT count(*) FROM core_run").getInt() == 2);
    CHECK(db.execAndGet("SELECT count(*) FROM sample").getInt() == 2);
    CHECK(db.execAndGet("SELECT count(*) FROM occurrence").getInt() == 3);
    CHECK(db.execAndGet("SELECT count(*) FROM numerical_date").getInt() == 1);
    // The foreign-key check of the whole file is clean: https://www.sqlite.org/pragma.html#pragma_foreign_key_check
    SQLite::Statement fk_check(db, "PRAGMA foreign_key_check");
    CHECK_FALSE(fk_check.executeStep());
}

TEST_CASE("The dataset hash follows the documented canonical encoding", "[unit]") {
    // The empty dataset is the encoding's header and eleven empty tables. Built here byte by
    // byte from the rules in dataset_hash.cpp, hashed with the FIPS-checked SHA-256.
    auto u64 = [](std::uint64_t v) {
        std::string out;
        for (int i = 0; i < 8; ++i) out += static_cast<char>(v >> (8 * i));
        return out;
    };
    auto text = [&](const std::string& s) { return u64(s.size()) + s; };
    std::string expected = text("atollog dataset hash v1");
    for (const char* table : {"holes", "runs", "intervals", "samples", "taxa", "occurrences",
                              "events", "dates", "zones", "sealevel", "curve"}) {
        expected += text(table) + u64(0);
    }
    CHECK(ProjectStore::datasetHash(CoreDataset{}) == atollog::db::sha256Hex(expected));

    CoreDataset one_point;
    one_point.curve.push_back({1.5, 2.0, 0.25, {}});
    std::string with_point = text("atollog dataset hash v1");
    for (const char* table : {"holes", "runs", "intervals", "samples", "taxa", "occurrences",
                              "events", "dates", "zones", "sealevel"}) {
        with_point += text(table) + u64(0);
    }
    // IEEE 754 binary64: 1.5 = 0x3FF8000000000000, 2.0 = 0x4000000000000000,
    // 0.25 = 0x3FD0000000000000; then the (empty) free attributes.
    with_point += text("curve") + u64(1) + u64(0x3FF8000000000000) + u64(0x4000000000000000) +
                  u64(0x3FD0000000000000) + u64(0);
    CHECK(ProjectStore::datasetHash(one_point) == atollog::db::sha256Hex(with_point));
}

TEST_CASE("The dataset hash is stable for equal datasets and changes with any field", "[unit]") {
    using namespace atollog;
    const CoreDataset base = test::everyFieldDataset();
    const std::string base_hash = ProjectStore::datasetHash(base);
    CHECK(ProjectStore::datasetHash(CoreDataset(base)) == base_hash);
    REQUIRE(base_hash.size() == 64);

    // Equal under operator== means an equal hash, also for the two zeros.
    CoreDataset negative_zero = base;
    negative_zero.runs[0].top_m = -0.0;
    REQUIRE(negative_zero == base);
    CHECK(ProjectStore::datasetHash(negative_zero) == base_hash);

    const std::vector<std::pair<const char*, std::function<void(CoreDataset&)>>> changes{
        {"hole id", [](CoreDataset& d) { d.holes[0].hole = "KV-1b"; }},
        {"site", [](CoreDataset& d) { d.holes[0].site += "."; }},
        {"lat given->absent", [](CoreDataset& d) { d.holes[0].lat_deg.reset(); }},
        {"lon", [](CoreDataset& d) { d.holes[0].lon_deg = std::nextafter(151.125, 200.0); }},
        {"collar", [](CoreDataset& d) { d.holes[1].collar_elev_m = 0.0; }},
        {"chain", [](CoreDataset& d) { d.holes[0].chain_km = 41.0; }},
        {"hole kind", [](CoreDataset& d) { d.holes[0].kind = HoleKind::Cuttings; }},
        {"hole extra value", [](CoreDataset& d) { d.holes[0].extra[1].second = "RX-3"; }},
        {"hole extra order", [](CoreDataset& d) {
             std::swap(d.holes[0].extra[0], d.holes[0].extra[1]); }},
        {"run hole", [](CoreDataset& d) { d.runs[2].hole = "KV-1"; }},
        {"run id", [](CoreDataset& d) { d.runs[0].run = "R"; }},
        {"run top", [](CoreDataset& d) { d.runs[0].top_m = 0.01; }},
        {"run base", [](CoreDataset& d) { d.runs[0].base_m = 3.0; }},
        {"recovered", [](CoreDataset& d) { d.runs[0].recovered_m = 3.0; }},
        {"run order", [](CoreDataset& d) { std::swap(d.runs[0], d.runs[1]); }},
        {"interval rock", [](CoreDataset& d) { d.intervals[0].rock = Rock::Dolostone; }},
        {"texture", [](CoreDataset& d) { d.intervals[0].texture.reset(); }},
        {"mud supported", [](CoreDataset& d) { d.intervals[0].mud_supported = true; }},
        {"mud supported absent", [](CoreDataset& d) { d.intervals[0].mud_supported.reset(); }},
        {"grains", [](CoreDataset& d) { d.intervals[0].grains_pct = 35.0; }},
        {"coarse", [](CoreDataset& d) { d.intervals[0].coarse_pct.reset(); }},
        {"binding", [](CoreDataset& d) { d.intervals[0].binding = Binding::Baffle; }},
        {"surface", [](CoreDataset& d) { d.intervals[0].base_surface = Surface::Erosion; }},
        {"paleodepth min", [](CoreDataset& d) { d.intervals[0].paleodepth_min_m = 1.0; }},
        {"paleodepth max", [](CoreDataset& d) { d.intervals[0].paleodepth_max_m = 7.0; }},
        {"density", [](CoreDataset& d) { d.intervals[0].dry_density_g_cm3 = 2.3; }},
        {"porosity", [](CoreDataset& d) { d.intervals[0].porosity_pct = 18.0; }},
        {"caco3", [](CoreDataset& d) { d.intervals[0].caco3_pct = 98.0; }},
        {"notes", [](CoreDataset& d) { d.intervals[0].notes.clear(); }},
        {"sample top", [](CoreDataset& d) { d.samples[0].top_m = 0.51; }},
        {"sample base", [](CoreDataset& d) { d.samples[0].base_m = 0.56; }},
        {"sample kind", [](CoreDataset& d) { d.samples[1].kind = "barren"; }},
        {"sample id", [](CoreDataset& d) { d.samples[1].sample = "S"; }},
        {"taxon name", [](CoreDataset& d) { d.taxa[0].name = "Porites"; }},
        {"taxon group", [](CoreDataset& d) { d.taxa[0].group = TaxonGroup::Other; }},
        {"occurrence taxon", [](CoreDataset& d) { d.occurrences[0].taxon = "TX-B"; }},
        {"abundance class", [](CoreDataset& d) {
             d.occurrences[0].abundance = AbundanceClass::Rare; }},
        {"abundance count", [](CoreDataset& d) { d.occurrences[1].abundance = std::int64_t{18}; }},
        {"abundance count vs class", [](CoreDataset& d) {
             d.occurrences[3].abundance = AbundanceClass::Present; }},
        {"abundance absent", [](CoreDataset& d) { d.occurrences[0].abundance.reset(); }},
        {"status", [](CoreDataset& d) { d.occurrences[0].status = OccurrenceStatus::Caved; }},
        {"event kind", [](CoreDataset& d) { d.events[0].kind = EventKind::Top; }},
        {"event age", [](CoreDataset& d) { d.events[0].age_ma = 5.73; }},
        {"event sd", [](CoreDataset& d) { d.events[0].age_sd_ma = 0.06; }},
        {"event source", [](CoreDataset& d) { d.events[1].source = "x"; }},
        {"date sample", [](CoreDataset& d) { d.dates[0].sample.reset(); }},
        {"date depth", [](CoreDataset& d) { d.dates[1].depth_m = 7.5; }},
        {"date method", [](CoreDataset& d) { d.dates[0].method = DateMethod::Sr; }},
        {"date age", [](CoreDataset& d) { d.dates[2].age_ma = 0.3333; }},
        {"date age sd", [](CoreDataset& d) { d.dates[2].age_sd_ma.reset(); }},
        {"th230", [](CoreDataset& d) { d.dates[0].uth->th230_u238_act = 0.0124; }},
        {"th230 sd", [](CoreDataset& d) { d.dates[0].uth->th230_u238_act_sd = 0.0003; }},
        {"u234", [](CoreDataset& d) { d.dates[0].uth->u234_u238_act = 1.147; }},
        {"u234 sd", [](CoreDataset& d) { d.dates[0].uth->u234_u238_act_sd = 0.0016; }},
        {"th232", [](CoreDataset& d) { d.dates[0].uth->th232_ppb.reset(); }},
        {"u238", [](CoreDataset& d) { d.dates[0].uth->u238_ppb = 2851.0; }},
        {"uth absent", [](CoreDataset& d) { d.dates[0].uth.reset(); }},
        {"f14c", [](CoreDataset& d) { d.dates[1].c14->f14c = 0.8732; }},
        {"f14c sd", [](CoreDataset& d) { d.dates[1].c14->f14c_sd = 0.0022; }},
        {"delta r", [](CoreDataset& d) { d.dates[1].c14->delta_r_yr = 46.0; }},
        {"delta r sd", [](CoreDataset& d) { d.dates[1].c14->delta_r_sd_yr.reset(); }},
        {"c14 absent", [](CoreDataset& d) { d.dates[1].c14.reset(); }},
        {"zone scheme", [](CoreDataset& d) { d.zones[0].scheme = "Invented"; }},
        {"zone name", [](CoreDataset& d) { d.zones[0].zone = "IP0"; }},
        {"zone base", [](CoreDataset& d) { d.zones[0].base_event.reset(); }},
        {"zone top", [](CoreDataset& d) { d.zones[1].top_event = "EV-2"; }},
        {"sea level age", [](CoreDataset& d) { d.sea_level[0].age_ma = 0.126; }},
        {"sea level", [](CoreDataset& d) { d.sea_level[0].level_m = -120.0; }},
        {"sea level sd", [](CoreDataset& d) { d.sea_level[1].level_sd_m = 1.0; }},
        {"cal bp", [](CoreDataset& d) { d.curve[0].cal_bp = 1001.0; }},
        {"c14 bp", [](CoreDataset& d) { d.curve[0].c14_bp = 1101.0; }},
        {"curve sd", [](CoreDataset& d) { d.curve[0].sd = 16.0; }},
        {"curve extra", [](CoreDataset& d) { d.curve[1].extra.push_back({"x_set", "demo"}); }},
        {"text moved between fields", [](CoreDataset& d) {
             d.taxa[0].taxon = "TX-AP";
             d.taxa[0].name = "orites nerithensis";
             d.occurrences[0].taxon = "TX-AP"; }},
        {"row moved between tables", [](CoreDataset& d) { d.sea_level.pop_back(); }},
    };
    std::set<std::string> seen{base_hash};
    for (const auto& [what, change] : changes) {
        CoreDataset changed = base;
        change(changed);
        INFO("change: " << what);
        REQUIRE_FALSE(changed == base); // the change itself must be real
        const std::string hash = ProjectStore::datasetHash(changed);
        CHECK(hash != base_hash);
        CHECK(seen.insert(hash).second);
    }
}

TEST_CASE("Bulk replace of 1,000,000 occurrences and 50,000 samples", "[.][bench]") {
    using namespace atollog;
    CoreDataset data;
    for (int h = 0; h < 50; ++h) {
        data.holes.push_back({"H" + std::to_string(h), "Tavenu", {}, {}, {}, {}, HoleKind::Core, {}});
    }
    for (int s = 0; s < 50'000; ++s) {
        data.samples.push_back({"H" + std::to_string(s % 50), "S" + std::to_string(s),
                                s * 0.01, s * 0.01, "", {}});
    }
    for (int t = 0; t < 400; ++t) {
        data.taxa.push_back({"T" + std::to_string(t), "invented", TaxonGroup::Coral, {}});
    }
    for (int o = 0; o < 1'000'000; ++o) {
        data.occurrences.push_back({"S" + std::to_string(o / 20), "T" + std::to_string((o * 7) % 400),
                                    std::int64_t{o % 30}, OccurrenceStatus::InPlace, {}});
    }
    TempPath file("bench");
    ProjectStore store = ProjectStore::create(file.path());
    using clock = std::chrono::steady_clock;
    auto seconds = [](clock::duration d) { return std::chrono::duration<double>(d).count(); };
    auto t0 = clock::now();
    store.replaceDataset(data);
    auto t1 = clock::now();
    store.replaceDataset(data); // now also deleting 1,000,000 rows
    auto t2 = clock::now();
    const CoreDataset loaded = store.loadDataset();
    auto t3 = clock::now();
    const std::string hash = ProjectStore::datasetHash(data);
    auto t4 = clock::now();
    { ProjectStore closing = std::move(store); } // checkpoints the WAL into the file
    auto t5 = clock::now();
    ProjectStore reopened = ProjectStore::open(file.path()); // includes quick_check
    auto t6 = clock::now();
    WARN("replace into empty: " << seconds(t1 - t0) << " s; replace over full: "
         << seconds(t2 - t1) << " s; load: " << seconds(t3 - t2) << " s; hash: "
         << seconds(t4 - t3) << " s; close: " << seconds(t5 - t4) << " s; open: "
         << seconds(t6 - t5) << " s; file " << std::filesystem::file_size(file.path()) / 1e6
         << " MB");
    CHECK(loaded == data);
    CHECK(ProjectStore::datasetHash(loaded) == hash);
    CHECK(reopened.rowCount(Table::Occurrences) == 1'000'000);
}
