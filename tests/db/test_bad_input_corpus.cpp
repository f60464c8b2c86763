// The bad-input corpus: each folder under tests/bad-input is the valid folder
// tests/good-input/minimal with one planted problem, and expected.txt lists the substrings
// (file:line, column, value, ...) that the error message must contain, one per line.
#include "atollog/db/core_folder.hpp"

#include "folder_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <sstream>

namespace fs = std::filesystem;
using atollog::db::InputError;
using atollog::db::InputProblem;
using atollog::db::readCoreFolder;

namespace {

std::vector<std::string> expectedSubstrings(const fs::path& file) {
    std::istringstream in(atollog::testing::readText(file));
    std::vector<std::string> out;
    for (std::string line; std::getline(in, line);) {
        if (!line.empty() && line.back() == '\r') line.pop_back();
        if (!line.empty()) out.push_back(line); // not trimmed: a leading space may matter
    }
    return out;
}

} // namespace

TEST_CASE("the minimal good folder reads without errors or warnings", "[unit]") {
    std::vector<InputProblem> warnings;
    const auto data = readCoreFolder(fs::path(ATOLLOG_TEST_DATA_DIR) / "good-input/minimal", &warnings);
    for (const auto& w : warnings) UNSCOPED_INFO(w.format());
    CHECK(warnings.empty());
    CHECK(data.holes.size() == 2);
    CHECK(data.runs.size() == 5);
    CHECK(data.intervals.size() == 5);
    CHECK(data.samples.size() == 5);
    CHECK(data.taxa.size() == 3);
    CHECK(data.occurrences.size() == 5);
    CHECK(data.events.size() == 2);
    CHECK(data.dates.size() == 2);
    CHECK(data.zones.size() == 2);
    // dates.csv gives ages in ka: 125 ka = 0.125 Ma (1 ka = 1e-3 Ma).
    CHECK(data.dates[0].age_ma == 0.125);
    CHECK(data.dates[0].age_sd_ma == 0.0015);
}

TEST_CASE("every bad-input folder is refused with a message naming the problem", "[unit]") {
    const fs::path corpus = fs::path(ATOLLOG_TEST_DATA_DIR) / "bad-input";
    std::vector<fs::path> folders;
    for (const auto& entry : fs::directory_iterator(corpus))
        if (entry.is_directory()) folders.push_back(entry.path());
    std::sort(folders.begin(), folders.end());
    REQUIRE(folders.size() >= 32);

    for (const fs::path& folder : folders) {
        SECTION(folder.filename().string()) {
            const auto expected = expectedSubstrings(folder / "expected.txt");
            REQUIRE(!expected.empty());
            std::string message;
            try {
                readCoreFolder(folder);
                FAIL("no InputError for " << folder.filename().string());
            } catch (const InputError& e) {
                message = e.what();
            }
            INFO(message);
            for (const auto& s : expected) {
                INFO("expected substring: " << s);
                CHECK(message.find(s) != std::string::npos);
            }
        }
    }
}
