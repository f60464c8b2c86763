// order, sequence, line and isochrons through the command line, on the demo archipelago.
#include "cli_runner.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/db/sequence_store.hpp"
#include "atollog/db/tie_point_store.hpp"

#include <catch2/catch.hpp>

#include <fstream>
#include <iterator>
#include <sstream>
#include <string>

using atollog::test::runAtollog;
using atollog::test::TempDir;

namespace {
const std::string kDemo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";
std::string firstLine(const std::string& text) { return text.substr(0, text.find('\n')); }

std::string importedDemo(const TempDir& tmp) {
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    return p;
}
} // namespace

TEST_CASE("order lists contradictions, edges and a first order", "[unit][cli][correlation]") {
    TempDir tmp("order");
    const auto p = importedDemo(tmp);
    const auto conflicts = runAtollog({"order", p, "--csv"});
    INFO(conflicts.err);
    REQUIRE(conflicts.exit_code == 0);
    CHECK(firstLine(conflicts.out) == "conflict,events,holes,what");
    CHECK(conflicts.out.find("DISK-MAG") != std::string::npos); // the planted reworked find
    const auto order = runAtollog({"order", p, "--by", "order", "--csv"});
    REQUIRE(order.exit_code == 0);
    CHECK(firstLine(order.out) == "rank,event,kind,taxon,component,age_ma");
    const auto edges = runAtollog({"order", p, "--by", "edge", "--csv", "--no-dates"});
    REQUIRE(edges.exit_code == 0);
    CHECK(edges.out.find("date ") == std::string::npos);
    CHECK(edges.out.find("base before top") != std::string::npos);
}

TEST_CASE("sequence prints the documented columns and stores its run", "[unit][cli][correlation]") {
    TempDir tmp("sequence");
    const auto p = importedDemo(tmp);
    const std::vector<std::string> args{"sequence", p, "--csv", "--moves", "20000", "--seed", "9"};
    const auto r = runAtollog(args);
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const std::string header = "," + firstLine(r.out) + ",";
    for (const char* column : {"rank", "event", "kind", "taxon", "position_min", "position_max"})
        CHECK(header.find(std::string(",") + column + ",") != std::string::npos);
    CHECK(r.err.find("stored the sequence as run #") != std::string::npos);
    auto store = atollog::db::ProjectStore::open(p);
    const auto run = atollog::db::latestModelRun(store, "sequence");
    REQUIRE(run);
    CHECK(run->seed == 9u);
    const auto stored = atollog::db::loadSequence(store, run->id);
    // The printed order is the stored one: one CSV row per event.
    std::istringstream lines(r.out);
    std::string line;
    std::getline(lines, line);
    std::size_t rows = 0;
    while (std::getline(lines, line)) {
        REQUIRE(rows < stored.size());
        CHECK(line.rfind(std::to_string(stored[rows].rank) + "," + stored[rows].event + ",", 0) == 0);
        ++rows;
    }
    CHECK(rows == stored.size());
    // The same seed and data: nothing new stored.
    const auto again = runAtollog(args);
    REQUIRE(again.exit_code == 0);
    CHECK(again.err.find("unchanged since run #") != std::string::npos);
    const auto ext = runAtollog({"sequence", p, "--by", "extension", "--csv", "--moves", "20000",
                                 "--no-store"});
    REQUIRE(ext.exit_code == 0);
    CHECK(firstLine(ext.out) == "hole,event,kind,observed_m,placed_m,extension_m");
}

TEST_CASE("line cross-plots two holes or a hole and the stored composite", "[unit][cli][correlation]") {
    TempDir tmp("line");
    const auto p = importedDemo(tmp);
    const auto r = runAtollog({"line", p, "--hole", "OSS1", "--with", "PEL1", "--csv"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    CHECK(firstLine(r.out) == "event,x_m,x_sd_m,y_m,y_sd_m,residual_m,z,segment,off_line");
    const auto seg = runAtollog({"line", p, "--hole", "OSS1", "--with", "PEL1", "--by", "segment",
                                 "--fit", "rma", "--csv"});
    REQUIRE(seg.exit_code == 0);
    CHECK(firstLine(seg.out) ==
          "segment,x_from_m,x_to_m,points,slope,slope_sd,intercept_m,intercept_sd_m,mswd");
    // Against the composite: first refused with the fix, then after a stored sequence.
    const auto none = runAtollog({"line", p, "--hole", "OSS1", "--composite"});
    CHECK(none.exit_code == 2);
    CHECK(none.err.find("run `atollog sequence PROJECT` first") != std::string::npos);
    REQUIRE(runAtollog({"sequence", p, "--moves", "20000"}).exit_code == 0);
    CHECK(runAtollog({"line", p, "--hole", "OSS1", "--composite"}).exit_code == 0);
    const auto unknown = runAtollog({"line", p, "--hole", "NOPE", "--with", "PEL1"});
    CHECK(unknown.exit_code == 2);
    CHECK(unknown.err.find("no hole 'NOPE'") != std::string::npos);
    CHECK(unknown.err.find("KAL1") != std::string::npos);
}

TEST_CASE("isochrons give depth quantiles per hole and event tie lines", "[unit][cli][correlation]") {
    TempDir tmp("isochrons");
    const auto p = importedDemo(tmp);
    const auto r = runAtollog({"isochrons", p, "--ages-ma", "0.2,1.0", "--draws", "500",
                               "--outlier-draws", "0", "--core-top-open", "--csv"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    CHECK(firstLine(r.out) == "age_ma,hole,depth_q025_m,depth_q500_m,depth_q975_m,where");
    CHECK(r.out.find("0.2,KAL1,") != std::string::npos);
    const auto ties = runAtollog({"isochrons", p, "--events", "B CONV-MIN", "--csv"});
    REQUIRE(ties.exit_code == 0);
    CHECK(firstLine(ties.out) == "event,hole,shallow_m,deep_m,level_m");
    const auto bad = runAtollog({"isochrons", p, "--ages-ma", "0.2,soon"});
    CHECK(bad.exit_code == 2);
    CHECK(bad.err.find("'soon' is not an age") != std::string::npos);
    CHECK(runAtollog({"isochrons", p}).exit_code == 2);
}

TEST_CASE("panel draws the holes with ties and isochrons headless", "[unit][cli][correlation][panel]") {
    TempDir tmp("panel");
    const auto p = importedDemo(tmp);
    const auto svg = (tmp / "panel.svg").string();
    const auto r = runAtollog({"panel", p, "--out", svg, "--events", "B CONV-MIN,T LEPT-TEN",
                               "--ages-ma", "0.45", "--draws", "300", "--outlier-draws", "0",
                               "--core-top-open", "--flatten", "B CONV-MIN", "--date",
                               "2026-12-01"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    CHECK(r.out.find("4 holes, 2 tie lines, 1 isochrons") != std::string::npos);
    std::ifstream in(svg);
    const std::string text((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
    for (const char* hole : {"KAL1", "TOR1", "OSS1", "PEL1"})
        CHECK(text.find(hole) != std::string::npos);
    CHECK(text.find("2026-12-01") != std::string::npos);
    CHECK(text.find("<image") == std::string::npos);
    const auto bad = runAtollog({"panel", p, "--out", svg, "--events", "B CONV-MIN", "--flatten",
                                 "T NOWHERE"});
    CHECK(bad.exit_code == 2);
    CHECK(bad.err.find("T NOWHERE") != std::string::npos);
    const auto wrong_ext = runAtollog({"panel", p, "--out", (tmp / "panel.bmp").string()});
    CHECK(wrong_ext.exit_code == 2);
}

TEST_CASE("panel tracks: taxa, zones, dates and the model; bad values named",
          "[unit][cli][correlation][panel]") {
    TempDir tmp("panel-tracks");
    const auto p = importedDemo(tmp);
    const auto svg = (tmp / "tracks.svg").string();
    const auto r = runAtollog({"panel", p, "--out", svg, "--holes", "TOR1,OSS1", "--taxa",
                               "CONV-MIN,LEPT-TEN", "--tracks",
                               "runs,lithology,samples,taxa,zones,dates,model", "--zone-scheme",
                               "VL larger benthic foraminifera", "--draws", "300",
                               "--outlier-draws", "0", "--core-top-open", "--date", "2026-12-01"});
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    std::ifstream in(svg);
    const std::string text((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
    for (const char* word : {"Conovessa minor", "Lepidotorma tenuimura",
                             "VL larger benthic foraminifera", "age model: median, 95 % band"})
        CHECK(text.find(word) != std::string::npos);

    const auto bad_track = runAtollog({"panel", p, "--out", svg, "--tracks", "runs,fossils"});
    CHECK(bad_track.exit_code == 2);
    CHECK(bad_track.err.find("'fossils' is not a track") != std::string::npos);
    CHECK(bad_track.err.find("runs,lithology,surfaces,samples,taxa,zones,dates,model") !=
          std::string::npos);
    const auto bad_taxon = runAtollog({"panel", p, "--out", svg, "--taxa", "NOPE-XX"});
    CHECK(bad_taxon.exit_code == 2);
    CHECK(bad_taxon.err.find("no taxon 'NOPE-XX'") != std::string::npos);
    const auto scheme_alone =
        runAtollog({"panel", p, "--out", svg, "--zone-scheme", "VL larger benthic foraminifera"});
    CHECK(scheme_alone.exit_code == 2);
    CHECK(scheme_alone.err.find("add zones to --tracks") != std::string::npos);
}
