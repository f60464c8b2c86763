// Export then import reproduces a dataset exactly, and export is canonical: writing what was
// read gives the same bytes. Datasets come from the seeded generator in random_dataset.cpp.
#include "atollog/db/core_folder.hpp"
#include "atollog/engine/validation.hpp"

#include "folder_fixture.hpp"
#include "random_dataset.hpp"

#include <catch2/catch.hpp>

using atollog::CoreDataset;
using atollog::db::InputError;
using atollog::db::readCoreFolder;
using atollog::db::writeCoreFolder;
using atollog::testing::readFolder;
using atollog::testing::TempFolder;

namespace {

/// "table row N" of the first difference, so that a failing round trip says where to look.
template <class Row>
std::string firstDiff(const char* table, const std::vector<Row>& a, const std::vector<Row>& b) {
    if (a.size() != b.size())
        return std::string(table) + ": " + std::to_string(a.size()) + " vs " +
               std::to_string(b.size()) + " rows";
    for (std::size_t i = 0; i < a.size(); ++i)
        if (!(a[i] == b[i])) return std::string(table) + " row " + std::to_string(i);
    return {};
}

std::string firstDifference(const CoreDataset& a, const CoreDataset& b) {
    for (const std::string& s :
         {firstDiff("holes", a.holes, b.holes), firstDiff("runs", a.runs, b.runs),
          firstDiff("intervals", a.intervals, b.intervals),
          firstDiff("samples", a.samples, b.samples), firstDiff("taxa", a.taxa, b.taxa),
          firstDiff("occurrences", a.occurrences, b.occurrences),
          firstDiff("events", a.events, b.events), firstDiff("dates", a.dates, b.dates),
          firstDiff("zones", a.zones, b.zones), firstDiff("sealevel", a.sea_level, b.sea_level),
          firstDiff("curve", a.curve, b.curve)})
        if (!s.empty()) return s;
    return "none";
}

} // namespace

TEST_CASE("the random dataset generator makes valid, varied datasets", "[unit]") {
    std::size_t with_free = 0, with_dates = 0, with_curve = 0;
    for (std::uint64_t seed = 1; seed <= 20; ++seed) {
        const CoreDataset d = atollog::testing::randomValidDataset(seed);
        for (const auto& issue : atollog::validateDataset(d)) {
            INFO("seed " << seed << ": " << issue.problem);
            CHECK(issue.severity == atollog::Severity::Warning);
        }
        with_free += d.holes.front().extra.empty() ? 0 : 1;
        with_dates += d.dates.empty() ? 0 : 1;
        with_curve += d.curve.empty() ? 0 : 1;
    }
    CHECK(atollog::testing::randomValidDataset(7) == atollog::testing::randomValidDataset(7));
    CHECK(with_free > 0);
    CHECK(with_dates > 0);
    CHECK(with_curve > 0);
}

TEST_CASE("readCoreFolder(writeCoreFolder(d)) == d, and rewriting is byte-identical", "[unit]") {
    for (std::uint64_t seed = 1; seed <= 20; ++seed) {
        INFO("seed " << seed);
        const CoreDataset d = atollog::testing::randomValidDataset(seed);
        TempFolder dir;
        writeCoreFolder(d, dir.path() / "first");
        CoreDataset back;
        try {
            back = readCoreFolder(dir.path() / "first");
        } catch (const InputError& e) {
            FAIL(e.what());
        }
        INFO("first difference: " << firstDifference(back, d));
        CHECK(back == d);
        writeCoreFolder(back, dir.path() / "second");
        CHECK(readFolder(dir.path() / "first") == readFolder(dir.path() / "second"));
    }
}

TEST_CASE("export is canonical: metres, Ma, contract column order, LF, empty columns left out",
          "[unit]") {
    TempFolder dir;
    atollog::testing::writeFolder(
        dir.path() / "in",
        {{"holes.csv", "site,hole,x_note,collar_elev_ft\n\"Kalo, east\",H1,\"a \"\"b\"\"\",10\r\n"},
         {"runs.csv", "recovered_ft,base_ft,top_ft,run,hole\r\n1,100,0,R1,H1\r\n"},
         {"samples.csv", "hole,sample,top_m\nH1,S1,0.5\n"},
         {"dates.csv", "hole,sample,method,age_ka,age_sd_ka\nH1,S1,u-th,125,1.5\n"}});
    const CoreDataset d = readCoreFolder(dir.path() / "in");
    writeCoreFolder(d, dir.path() / "out");
    const auto files = readFolder(dir.path() / "out");
    CHECK(files.size() == 4);
    CHECK(files.at("holes.csv") ==
          "hole,site,collar_elev_m,kind,x_note\nH1,\"Kalo, east\",3.048,core,\"a \"\"b\"\"\"\n");
    CHECK(files.at("runs.csv") == "hole,run,top_m,base_m,recovered_m\nH1,R1,0,30.48,0.3048\n");
    CHECK(files.at("samples.csv") == "hole,sample,top_m,base_m\nH1,S1,0.5,0.5\n");
    CHECK(files.at("dates.csv") == "hole,sample,method,age_ma,age_sd_ma\nH1,S1,u-th,0.125,0.0015\n");
}

TEST_CASE("numbers are written in shortest round-trip form", "[unit]") {
    CoreDataset d;
    d.holes.push_back({"H1", "Kalo", 0.1 + 0.2, 1e-7, 123456789.125, 1.0 / 3.0,
                       atollog::HoleKind::Cuttings, {}});
    TempFolder dir;
    writeCoreFolder(d, dir.path() / "out");
    // 0.1 + 0.2 is 0.30000000000000004 in IEEE 754 binary64; 1/3 needs 17 significant digits.
    CHECK(readFolder(dir.path() / "out").at("holes.csv") ==
          "hole,site,lat_deg,lon_deg,collar_elev_m,chain_km,kind\n"
          "H1,Kalo,0.30000000000000004,1e-07,123456789.125,0.3333333333333333,cuttings\n");
    CHECK(readCoreFolder(dir.path() / "out") == d);
}

TEST_CASE("export refuses a non-empty folder unless told to overwrite", "[unit]") {
    TempFolder dir;
    const auto target = dir.path() / "export";
    CoreDataset first = atollog::testing::randomValidDataset(3);
    CoreDataset second = atollog::testing::randomValidDataset(4);

    std::filesystem::create_directories(target); // an empty folder may be used
    writeCoreFolder(first, target);
    CHECK(readCoreFolder(target) == first);

    CHECK_THROWS_WITH(writeCoreFolder(second, target), Catch::Contains("not empty"));
    CHECK(readCoreFolder(target) == first); // untouched

    atollog::testing::writeText(target / "stale.csv", "left over\n");
    writeCoreFolder(second, target, true);
    CHECK(readCoreFolder(target) == second);
    CHECK_FALSE(std::filesystem::exists(target / "stale.csv")); // replaced, not merged

    // Nothing but the target remains beside it: no temporary or replaced folders.
    std::size_t entries = 0;
    for ([[maybe_unused]] const auto& e : std::filesystem::directory_iterator(dir.path())) ++entries;
    CHECK(entries == 1);

    atollog::testing::writeText(dir.path() / "a-file", "x");
    CHECK_THROWS_WITH(writeCoreFolder(first, dir.path() / "a-file", true),
                      Catch::Contains("not a folder"));
}

TEST_CASE("a free attribute without the x_ prefix cannot be exported", "[unit]") {
    CoreDataset d;
    d.holes.push_back({"H1", "Kalo", {}, {}, {}, {}, atollog::HoleKind::Cuttings, {{"note", "a"}}});
    TempFolder dir;
    CHECK_THROWS_WITH(writeCoreFolder(d, dir.path() / "out"), Catch::Contains("note"));
    CHECK_FALSE(std::filesystem::exists(dir.path() / "out"));
}
