// Columns and files of a core data folder: x_ columns, unknown/duplicate/missing columns,
// defaults, vocabulary words, which files belong to the folder, and message layout.
#include "atollog/db/core_folder.hpp"

#include "folder_fixture.hpp"

#include <catch2/catch.hpp>

using atollog::db::InputError;
using atollog::db::InputProblem;
using atollog::db::readCoreFolder;
using atollog::testing::TempFolder;
using atollog::testing::writeFolder;
namespace fs = std::filesystem;

namespace {

std::string errorOf(const fs::path& folder) {
    try {
        readCoreFolder(folder);
    } catch (const InputError& e) {
        return e.what();
    }
    FAIL("no InputError");
    return {};
}

const std::string kRuns = "hole,run,top_m,base_m,recovered_m\nH1,R1,0,10,9\n";

} // namespace

TEST_CASE("x_ columns are kept in header order, non-empty cells only", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "x_colour,hole,site,x_logger\n"
                                           "grey,H1,Kalo,Ana\n,H2,Tava,\"Rua, Ema\"\n"},
                             {"runs.csv", kRuns}});
    const auto d = readCoreFolder(dir.path());
    CHECK(d.holes[0].extra == atollog::FreeAttributes{{"x_colour", "grey"}, {"x_logger", "Ana"}});
    CHECK(d.holes[1].extra == atollog::FreeAttributes{{"x_logger", "Rua, Ema"}});
}

TEST_CASE("defaults: kind core, base_m = top_m, status in_place, base_surface none", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site\nH1,Kalo\n"},
                             {"runs.csv", kRuns},
                             {"samples.csv", "hole,sample,top_m\nH1,S1,2.5\n"},
                             {"intervals.csv", "hole,top_m,base_m,rock\nH1,0,9,limestone\n"},
                             {"taxa.csv", "taxon,name,group\nT1,Kaloina,coral\n"},
                             {"occurrences.csv", "sample,taxon\nS1,T1\n"}});
    const auto d = readCoreFolder(dir.path());
    CHECK(d.holes[0].kind == atollog::HoleKind::Core);
    CHECK(d.samples[0].base_m == 2.5);
    CHECK(d.occurrences[0].status == atollog::OccurrenceStatus::InPlace);
    CHECK_FALSE(d.occurrences[0].abundance);
    CHECK(d.intervals[0].base_surface == atollog::Surface::None);
    CHECK_FALSE(d.intervals[0].texture);
}

TEST_CASE("abundance is a class word or a whole count", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site\nH1,Kalo\n"},
                             {"runs.csv", kRuns},
                             {"samples.csv", "hole,sample,top_m\nH1,S1,2.5\n"},
                             {"taxa.csv", "taxon,name,group\nT1,A,coral\nT2,B,coral\n"},
                             {"occurrences.csv", "sample,taxon,abundance\nS1,T1,dominant\nS1,T2,0\n"}});
    const auto d = readCoreFolder(dir.path());
    CHECK(d.occurrences[0].abundance == atollog::Abundance{atollog::AbundanceClass::Dominant});
    CHECK(d.occurrences[1].abundance == atollog::Abundance{std::int64_t{0}});
    writeFolder(dir.path(), {{"occurrences.csv", "sample,taxon,abundance\nS1,T1,2.5\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("occurrences.csv:2: column abundance (3)"));
}

TEST_CASE("unknown, duplicate and missing columns are errors", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site,Lat_deg\nH1,Kalo,1\n"}, {"runs.csv", kRuns}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("unknown column Lat_deg") &&
                                        Catch::Contains("write lat_deg"));
    writeFolder(dir.path(), {{"holes.csv", "hole,site,x_a,x_a\nH1,Kalo,1,2\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("holes.csv:1: column x_a (4): duplicate column"));
    writeFolder(dir.path(), {{"holes.csv", "hole,site\nH1,Kalo\n"},
                             {"runs.csv", "hole,run,top_m,top_ft,base_m,recovered_m\nH1,R1,0,0,10,9\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("runs.csv:1: column top_ft (4): duplicate column"));
    writeFolder(dir.path(), {{"runs.csv", "hole,top_m,base_m,recovered_m\nH1,0,10,9\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("runs.csv:1: column run: missing required column run"));
}

TEST_CASE("unknown vocabulary words list the allowed ones", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site,kind\nH1,Kalo,Core\n"}, {"runs.csv", kRuns}});
    const std::string e = errorOf(dir.path());
    CHECK_THAT(e, Catch::Contains("holes.csv:2: column kind (3): value 'Core'") &&
                      Catch::Contains("write it exactly as core") &&
                      Catch::Contains("expected one of: core, cuttings"));
}

TEST_CASE("which files belong to a core data folder", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site\nH1,Kalo\n"},
                             {"runs.csv", kRuns},
                             {"README.txt", "notes"},
                             {".hidden.csv", "junk"},
                             {"old/holes.csv", "not,read\n"}});
    CHECK(readCoreFolder(dir.path()).holes.size() == 1); // subfolder, hidden and .txt ignored
    writeFolder(dir.path(), {{"Holes.CSV", "hole,site\n"}});
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("Holes.CSV: unknown file name") &&
                                        Catch::Contains("holes.csv, runs.csv, intervals.csv"));
    fs::remove(dir.path() / "Holes.CSV");
    fs::remove(dir.path() / "holes.csv");
    CHECK_THAT(errorOf(dir.path()), Catch::Contains("holes.csv not found in " + dir.path().string() +
                                                    ": a core data folder needs at least holes.csv"));
    CHECK_THAT(errorOf(dir.path() / "nowhere"), Catch::Contains("folder not found"));
}

TEST_CASE("syntax errors of all files are collected before any check", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site,chain_km\nH1,Kalo,x\nH2,Tava,y\n"},
                             {"runs.csv", "hole,run,top_m,base_m,recovered_m\nH1,R1,0,\"10\n"},
                             {"taxa.csv", "taxon,name,group\nT1,A,fish\n"}});
    try {
        readCoreFolder(dir.path());
        FAIL("no InputError");
    } catch (const InputError& e) {
        REQUIRE(e.problems().size() == 4);
        CHECK(e.problems()[0].format().rfind("holes.csv:2: column chain_km (3): value 'x'", 0) == 0);
        CHECK(e.problems()[1].line == 3);
        CHECK(e.problems()[2].file == "runs.csv");
        CHECK(e.problems()[3].file == "taxa.csv");
    }
}

TEST_CASE("at most 200 problems are listed, the rest counted", "[unit]") {
    TempFolder dir;
    std::string holes = "hole,site,chain_km\n";
    for (int i = 0; i < 250; ++i) holes += "H" + std::to_string(i) + ",Kalo,bad\n";
    writeFolder(dir.path(), {{"holes.csv", holes}});
    try {
        readCoreFolder(dir.path());
        FAIL("no InputError");
    } catch (const InputError& e) {
        REQUIRE(e.problems().size() == 201);
        CHECK_THAT(e.problems().back().problem, Catch::Contains("50 more problems"));
    }
}

TEST_CASE("dataset checks come back with file, line and column as written", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site\nH1,Kalo\n"},
                             {"runs.csv", "run,hole,base_ft,top_ft,recovered_ft\nR1,H1,10,20,5\n"}});
    try {
        readCoreFolder(dir.path());
        FAIL("no InputError");
    } catch (const InputError& e) {
        const InputProblem& p = e.problems().front();
        CHECK(p.file == "runs.csv");
        CHECK(p.line == 2);
        CHECK(p.column == "base_ft");
        CHECK(p.column_number == 3);
        CHECK(p.value == "10");
        CHECK_FALSE(p.is_warning);
    }
}

TEST_CASE("warnings are returned, not thrown", "[unit]") {
    TempFolder dir;
    writeFolder(dir.path(), {{"holes.csv", "hole,site\nH1,Kalo\n"},
                             {"runs.csv", "hole,run,top_m,base_m,recovered_m\nH1,R1,0,2,2.2\n"}});
    std::vector<InputProblem> warnings;
    CHECK(readCoreFolder(dir.path(), &warnings).runs.size() == 1);
    REQUIRE(warnings.size() == 1);
    CHECK(warnings[0].is_warning);
    CHECK(warnings[0].format().rfind("warning: runs.csv:2: column recovered_m (5): value '2.2'", 0) == 0);
}

TEST_CASE("InputProblem::format layout", "[unit]") {
    InputProblem p{"runs.csv", 12, "base_m", 3, "1O.5", "not a number",
                   "expected a decimal number like 10.5", false};
    CHECK(p.format() ==
          "runs.csv:12: column base_m (3): value '1O.5': not a number; expected a decimal number like 10.5");
    InputProblem q{"holes.csv", 0, "", 0, "", "empty file", "", true};
    CHECK(q.format() == "warning: holes.csv: empty file");
    InputProblem r{"a.csv", 2, "notes", 1, "x\ny\xFF", "bad", "fix", false};
    CHECK(r.format() == "a.csv:2: column notes (1): value 'x\\ny\\xFF': bad; fix");
}
