// Every folder of the bad-input corpus (tests/bad-input, see DEVELOPERS.md) imported through the
// command line into a project that already holds the demo archipelago: exit code 2, a message with
// the expected file:line, column and value, and the project file exactly as it was, its data,
// its provenance and its bytes.
#include "cli_runner.hpp"

#include "atollog/db/project_store.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <fstream>
#include <iterator>
#include <sstream>

namespace fs = std::filesystem;
using atollog::test::runAtollog;
using atollog::test::TempDir;

namespace {

std::string fileBytes(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), {}};
}

std::vector<std::string> expectedLines(const fs::path& file) {
    std::istringstream in(fileBytes(file));
    std::vector<std::string> out;
    for (std::string line; std::getline(in, line);) {
        if (!line.empty() && line.back() == '\r') line.pop_back();
        if (!line.empty()) out.push_back(line);
    }
    return out;
}

} // namespace

TEST_CASE("every bad-input folder fails the import cleanly and changes nothing", "[unit][cli]") {
    const fs::path corpus = fs::path(ATOLLOG_TEST_DATA_DIR) / "bad-input";
    const std::string demo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";
    std::vector<fs::path> folders;
    for (const auto& entry : fs::directory_iterator(corpus))
        if (entry.is_directory()) folders.push_back(entry.path());
    std::sort(folders.begin(), folders.end());
    REQUIRE(folders.size() >= 30);

    TempDir tmp("corpus");
    const fs::path project = tmp / "campaign.atollog";
    REQUIRE(runAtollog({"import", project.string(), demo}).exit_code == 0);
    std::string hashBefore;
    std::size_t runsBefore = 0;
    {
        const auto store = atollog::db::ProjectStore::open(project);
        hashBefore = atollog::db::ProjectStore::datasetHash(store.loadDataset());
        runsBefore = store.modelRuns().size();
    }
    const std::string bytesBefore = fileBytes(project);

    for (const fs::path& folder : folders) {
        INFO("bad-input folder: " << folder.filename().string());
        const auto r = runAtollog({"import", project.string(), folder.string(), "--replace"});
        INFO("stderr: " << r.err);
        CHECK(r.exit_code == 2);
        CHECK(r.err.find("nothing was changed") != std::string::npos);
        for (const auto& expected : expectedLines(folder / "expected.txt"))
            CHECK(r.err.find(expected) != std::string::npos);

        const auto store = atollog::db::ProjectStore::open(project);
        CHECK(atollog::db::ProjectStore::datasetHash(store.loadDataset()) == hashBefore);
        CHECK(store.modelRuns().size() == runsBefore);
    }
    CHECK(fileBytes(project) == bytesBefore);
    CHECK_FALSE(fs::exists(project.string() + "-journal"));
}
