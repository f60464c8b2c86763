// The command line run in-process on the demo archipelago and on small folders.
#include "cli_runner.hpp"

#include "atollog/db/project_store.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <fstream>
#include <iterator>

namespace fs = std::filesystem;
using atollog::test::folderContents;
using atollog::test::runAtollog;
using atollog::test::TempDir;

namespace atollog::test {
std::vector<std::pair<std::string, std::string>> folderContents(const fs::path& dir) {
    std::vector<std::pair<std::string, std::string>> files;
    for (const auto& entry : fs::directory_iterator(dir)) {
        std::ifstream in(entry.path(), std::ios::binary);
        files.emplace_back(entry.path().filename().string(),
                           std::string(std::istreambuf_iterator<char>(in), {}));
    }
    std::sort(files.begin(), files.end());
    return files;
}
} // namespace atollog::test

namespace {
const std::string kDemo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";

std::string projectDump(const fs::path& project) {
    // The whole dataset, compared through the store's canonical hash.
    const auto store = atollog::db::ProjectStore::open(project);
    return atollog::db::ProjectStore::datasetHash(store.loadDataset());
}
} // namespace

TEST_CASE("help and usage errors give the documented exit codes", "[unit][cli]") {
    const auto help = runAtollog({"--help"});
    CHECK(help.exit_code == 0);
    for (const char* cmd : {"init", "import", "export", "check", "show", "history"})
        CHECK(help.out.find(cmd) != std::string::npos);

    for (const char* cmd : {"init", "import", "export", "check", "show", "history"}) {
        const auto sub = runAtollog({cmd, "--help"});
        INFO(cmd);
        CHECK(sub.exit_code == 0);
        CHECK(sub.out.find("Usage") != std::string::npos);
    }

    const auto none = runAtollog({});
    CHECK(none.exit_code == 2);
    const auto unknown = runAtollog({"frobnicate"});
    CHECK(unknown.exit_code == 2);
    CHECK(unknown.err.find("atollog --help") != std::string::npos);
    const auto missingArg = runAtollog({"show"});
    CHECK(missingArg.exit_code == 2);
}

TEST_CASE("import, export, import, export gives identical exports on the demo", "[unit][cli]") {
    TempDir tmp("roundtrip");
    const auto p1 = tmp / "first.atollog", p2 = tmp / "second.atollog";
    const auto e1 = tmp / "export1", e2 = tmp / "export2";

    const auto imp = runAtollog({"import", p1.string(), kDemo});
    INFO(imp.err);
    REQUIRE(imp.exit_code == 0);
    CHECK(imp.out.find("imported") != std::string::npos);
    REQUIRE(runAtollog({"export", p1.string(), e1.string()}).exit_code == 0);
    REQUIRE(runAtollog({"import", p2.string(), e1.string()}).exit_code == 0);
    REQUIRE(runAtollog({"export", p2.string(), e2.string()}).exit_code == 0);

    const auto a = folderContents(e1), b = folderContents(e2);
    REQUIRE(a.size() >= 8); // holes, runs, intervals, samples, taxa, occurrences, events, dates ...
    CHECK(a == b);
    CHECK(projectDump(p1) == projectDump(p2));

    // Exporting onto a non-empty folder is refused unless asked, and leaves it alone.
    const auto again = runAtollog({"export", p2.string(), e2.string()});
    CHECK(again.exit_code == 2);
    CHECK(folderContents(e2) == b);
    CHECK(runAtollog({"export", p2.string(), e2.string(), "--overwrite"}).exit_code == 0);
}

TEST_CASE("show prints per-hole figures and a unit-suffixed CSV", "[unit][cli]") {
    TempDir tmp("show");
    const auto p = tmp / "demo.atollog";
    REQUIRE(runAtollog({"import", p.string(), kDemo}).exit_code == 0);

    const auto text = runAtollog({"show", p.string()});
    REQUIRE(text.exit_code == 0);
    CHECK(text.out.find("recovery_pct") != std::string::npos);

    const auto csv = runAtollog({"show", p.string(), "--csv"});
    REQUIRE(csv.exit_code == 0);
    const std::string header = csv.out.substr(0, csv.out.find('\n'));
    CHECK(header.rfind("hole,site,runs,cored_m,recovered_m,recovery_pct,logged_m,samples,taxa,"
                       "exposure_surfaces",
                       0) == 0);
    // At least four holes in the demo: header + >= 4 rows.
    CHECK(std::count(csv.out.begin(), csv.out.end(), '\n') >= 5);

    const auto bad = runAtollog({"show", p.string(), "--hole", "NO-SUCH-HOLE"});
    CHECK(bad.exit_code == 2);
    CHECK(bad.err.find("NO-SUCH-HOLE") != std::string::npos);
}

TEST_CASE("a failed import leaves an existing project unchanged and creates no new one",
          "[unit][cli]") {
    TempDir tmp("badimport");
    const auto p = tmp / "demo.atollog";
    REQUIRE(runAtollog({"import", p.string(), kDemo}).exit_code == 0);
    const std::string before = projectDump(p);

    // A copy of the demo with one broken depth.
    const auto bad = tmp / "bad";
    fs::copy(kDemo, bad);
    {
        std::ifstream in(bad / "runs.csv");
        std::string text((std::istreambuf_iterator<char>(in)), {});
        const auto lineEnd = text.find('\n', text.find('\n') + 1); // end of first data row
        const auto lastComma = text.rfind(',', lineEnd);
        text.replace(lastComma + 1, lineEnd - lastComma - 1, "1O.5");
        std::ofstream(bad / "runs.csv", std::ios::trunc) << text;
    }
    const auto r = runAtollog({"import", p.string(), bad.string(), "--replace"});
    CHECK(r.exit_code == 2);
    CHECK(r.err.find("runs.csv:2") != std::string::npos);
    CHECK(r.err.find("1O.5") != std::string::npos);
    CHECK(projectDump(p) == before);

    const auto fresh = tmp / "fresh.atollog";
    CHECK(runAtollog({"import", fresh.string(), bad.string()}).exit_code == 2);
    CHECK_FALSE(fs::exists(fresh));

    // Importing into a project that holds data needs --replace.
    const auto twice = runAtollog({"import", p.string(), kDemo});
    CHECK(twice.exit_code == 2);
    CHECK(projectDump(p) == before);
}

TEST_CASE("check reports findings with exit code 1 and is clean otherwise", "[unit][cli]") {
    TempDir tmp("check");
    const auto folder = tmp / "f";
    fs::create_directories(folder);
    std::ofstream(folder / "holes.csv") << "hole,site\nH1,Testsite\n";
    std::ofstream(folder / "runs.csv") << "hole,run,top_m,base_m,recovered_m\n"
                                          "H1,R1,0,3,2\nH1,R2,3,6,-1\n";
    const auto r = runAtollog({"check", folder.string()});
    CHECK(r.exit_code == 1);
    CHECK(r.out.find("runs.csv:3") != std::string::npos);
    CHECK(r.out.find("recovered_m") != std::string::npos);

    const auto csv = runAtollog({"check", folder.string(), "--csv"});
    CHECK(csv.exit_code == 1);
    CHECK(csv.out.rfind("severity,where,column,value,problem,fix\n", 0) == 0);

    std::ofstream(folder / "runs.csv", std::ios::trunc) << "hole,run,top_m,base_m,recovered_m\n"
                                                           "H1,R1,0,3,2\nH1,R2,3,6,1\n";
    const auto clean = runAtollog({"check", folder.string()});
    INFO(clean.out);
    CHECK(clean.exit_code == 0);
    CHECK(clean.out.find("no problems found") != std::string::npos);
}

TEST_CASE("history lists the import with its input hash", "[unit][cli]") {
    TempDir tmp("history");
    const auto p = tmp / "demo.atollog";
    REQUIRE(runAtollog({"import", p.string(), kDemo}).exit_code == 0);
    const auto r = runAtollog({"history", p.string(), "--csv"});
    REQUIRE(r.exit_code == 0);
    CHECK(r.out.find("import") != std::string::npos);
    const auto store = atollog::db::ProjectStore::open(p);
    const auto hash = atollog::db::ProjectStore::datasetHash(store.loadDataset());
    CHECK(r.out.find(hash) != std::string::npos);
}

TEST_CASE("a project file of another program is refused with exit code 2", "[unit][cli]") {
    TempDir tmp("foreign");
    const auto f = tmp / "notes.atollog";
    std::ofstream(f) << "this is not a database";
    const auto r = runAtollog({"show", f.string()});
    CHECK(r.exit_code == 2);
    CHECK(r.err.find("notes.atollog") != std::string::npos);
}
