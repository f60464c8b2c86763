// A project survives its editor being killed at any moment. A child process applies a stream
// of row edits (one sample added per edit, each in its own transaction) and, after each
// commit, appends the edit's sequence number to a log file with one write(2). It is killed
// with SIGKILL at seeded random moments. Afterwards the file must pass PRAGMA integrity_check
// (https://www.sqlite.org/pragma.html#pragma_integrity_check), open, and hold every edit the
// child reported committed and at most one more (the one whose commit was done but not yet
// reported): SQLite's atomic commit in WAL mode (https://www.sqlite.org/atomiccommit.html,
// https://www.sqlite.org/wal.html).
#include "atollog/db/project_edits.hpp"
#include "atollog/db/project_store.hpp"
#include "child_process.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>
#include <fcntl.h>

#include <chrono>
#include <fstream>
#include <random>
#include <thread>

using namespace atollog;
using atollog::db::ProjectStore;
using atollog::db::RowEdit;
using atollog::test::ChildProcess;
using atollog::test::TempPath;
using Clock = std::chrono::steady_clock;

namespace {

constexpr std::uint64_t kSeed = 0xED175C0DE2031ULL;
constexpr int kKills = 30;

double uniform01(std::mt19937_64& random) {
    return static_cast<double>(random() >> 11) * 0x1.0p-53;
}

std::string sampleName(int seq) { return "KV-1-E" + std::to_string(seq); }

// Within run KV-1-R1 (0-3.05 m, 2.9 m recovered) of the fixture, so every edit is valid.
Sample editedSample(int seq) {
    const double depth_m = 0.01 * (seq % 280);
    return {"KV-1", sampleName(seq), depth_m, depth_m, "core", {}};
}

int storedEditCount(const CoreDataset& data) {
    int n = 0;
    for (const Sample& s : data.samples)
        if (s.sample.rfind("KV-1-E", 0) == 0) ++n;
    return n;
}

// The child: continues the stream from what the project holds, reporting each commit. It
// creates `ready` once the project is open, so the kill clock starts at the edits and not at
// the opening (which takes tens of milliseconds on a loaded machine).
void editStream(const std::filesystem::path& project, const std::filesystem::path& log,
                const std::filesystem::path& ready) {
    ProjectStore store = ProjectStore::open(project);
    int seq = storedEditCount(store.loadDataset());
    const int fd = ::open(log.c_str(), O_WRONLY | O_CREAT | O_APPEND, 0644);
    if (fd < 0) throw std::runtime_error("cannot open the edit log");
    std::ofstream(ready).put('r');
    for (;; ++seq) {
        db::applyEdit(store, RowEdit::add(editedSample(seq)));
        const std::string line = std::to_string(seq) + "\n";
        if (::write(fd, line.data(), line.size()) != static_cast<ssize_t>(line.size()))
            throw std::runtime_error("cannot write the edit log");
    }
}

int lastReported(const std::filesystem::path& log) {
    std::ifstream in(log);
    int last = -1, seq = 0;
    while (in >> seq) last = seq;
    return last;
}

} // namespace

TEST_CASE("A project killed while edits are applied holds every reported edit and at most one "
          "more",
          "[slow][crash][edits]") {
    TempPath project("edit-crash");
    TempPath log("edit-crash-log");
    TempPath ready("edit-crash-ready");
    {
        ProjectStore store = ProjectStore::create(project.path());
        store.replaceDataset(test::everyFieldDataset());
    }
    std::mt19937_64 random(kSeed);
    int unreported_commits = 0;
    for (int kill = 0; kill < kKills; ++kill) {
        const auto delay = std::chrono::microseconds(
            static_cast<long>(5000 + 60000 * uniform01(random)));
        INFO("seed " << kSeed << ", kill " << kill << " after " << delay.count() << " us");
        std::filesystem::remove(ready.path());
        ChildProcess child([&] { editStream(project.path(), log.path(), ready.path()); });
        const auto give_up = Clock::now() + std::chrono::seconds(60);
        while (!std::filesystem::exists(ready.path()) && !child.finished() &&
               Clock::now() < give_up) {
            std::this_thread::sleep_for(std::chrono::milliseconds(1));
        }
        REQUIRE(std::filesystem::exists(ready.path()));
        std::this_thread::sleep_for(delay);
        REQUIRE_FALSE(child.finished()); // the stream never ends by itself; it ended by error
        child.kill();
        child.wait();

        SQLite::Database check(project.path(), SQLite::OPEN_READONLY);
        REQUIRE(check.execAndGet("PRAGMA integrity_check").getString() == "ok");
        ProjectStore store = ProjectStore::open(project.path());
        const CoreDataset data = store.loadDataset();
        const int stored = storedEditCount(data);
        const int reported = lastReported(log.path()) + 1; // sequence numbers start at 0
        INFO("stored " << stored << ", reported " << reported);
        REQUIRE(stored >= reported);
        REQUIRE(stored <= reported + 1);
        if (stored == reported + 1) ++unreported_commits;
        // No gaps: the stored edits are exactly the first `stored` of the stream, in order.
        std::vector<std::string> expected;
        for (int seq = 0; seq < stored; ++seq) expected.push_back(sampleName(seq));
        std::vector<std::string> got;
        for (const Sample& s : data.samples)
            if (s.sample.rfind("KV-1-E", 0) == 0) got.push_back(s.sample);
        REQUIRE(got == expected);
        if (stored > reported) { // the next child reports from the stored state on
            std::ofstream(log.path(), std::ios::app) << stored - 1 << "\n";
        }
    }
    const int total = lastReported(log.path()) + 1;
    CHECK(total > kKills); // the children got edits done between the kills
    WARN("edit crash safety, seed " << kSeed << ": " << kKills << " kills, " << total
                                    << " edits committed, " << unreported_commits
                                    << " kills fell between a commit and its report");
}
