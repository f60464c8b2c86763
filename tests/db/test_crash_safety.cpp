// A project survives its writer being killed at any moment. A child process imports a large
// folder with --replace semantics into a project holding another dataset and is killed with
// SIGKILL at seeded random moments. Afterwards the file must pass SQLite's own
// PRAGMA integrity_check ("ok": https://www.sqlite.org/pragma.html#pragma_integrity_check) and
// hold all of the old dataset or all of the new one, with the model_run table agreeing: that is
// what SQLite's atomic commit promises in WAL mode (https://www.sqlite.org/atomiccommit.html,
// https://www.sqlite.org/wal.html: a transaction is committed when its commit frame is in the
// WAL; uncommitted frames are ignored on recovery).
#include "atollog/db/core_folder.hpp"
#include "atollog/db/importer.hpp"
#include "atollog/db/project_store.hpp"
#include "child_process.hpp"
#include "large_dataset.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <chrono>
#include <random>
#include <thread>

using atollog::db::ProjectStore;
using atollog::test::ChildProcess;
using atollog::test::TempPath;
using Clock = std::chrono::steady_clock;

namespace {

constexpr std::uint64_t kSeed = 0x5EEDC0DE2031ULL;
constexpr int kKills = 50;

/// Uniform in [0, 1), from the top 53 bits (the standard distributions differ between
/// libraries; see DEVELOPERS.md, Determinism).
double uniform01(std::mt19937_64& random) {
    return static_cast<double>(random() >> 11) * 0x1.0p-53;
}

std::string integrityCheck(const std::filesystem::path& file) {
    SQLite::Database db(file, SQLite::OPEN_READONLY);
    return db.execAndGet("PRAGMA integrity_check").getString();
}

void copyProject(const std::filesystem::path& from, const std::filesystem::path& to) {
    for (const char* suffix : {"", "-wal", "-shm"}) {
        std::filesystem::remove(to.string() + suffix);
    }
    std::filesystem::copy_file(from, to);
}

void importReplacing(const std::filesystem::path& project, const std::filesystem::path& folder) {
    ProjectStore store = ProjectStore::open(project);
    atollog::db::importCoreFolder(store, folder, true);
}

} // namespace

TEST_CASE("A project killed during an import holds the old or the new dataset, whole",
          "[slow][crash]") {
    // The old dataset is the minimal good folder; the new one adds to it, in its hole TV-1
    // (cored 0-9 m), 1,000 samples x 100 taxa = 100,000 occurrences: an import of a few
    // tenths of a second.
    const std::filesystem::path old_folder =
        std::filesystem::path(ATOLLOG_TEST_DATA_DIR) / "good-input" / "minimal";
    TempPath new_folder("crash-new-folder");
    TempPath pristine("crash-pristine");
    TempPath work("crash-work");

    const atollog::CoreDataset old_data = atollog::db::readCoreFolder(old_folder);
    atollog::db::writeCoreFolder(
        atollog::test::largeDataset(old_data, "TV-1", 0.0, 8.0, 1000, 100, "N"),
        new_folder.path());
    const std::string old_hash = ProjectStore::datasetHash(old_data);
    const std::string new_hash =
        ProjectStore::datasetHash(atollog::db::readCoreFolder(new_folder.path()));
    REQUIRE(old_hash != new_hash);
    {
        ProjectStore store = ProjectStore::create(pristine.path());
        atollog::db::importCoreFolder(store, old_folder);
    }

    // One uninterrupted run: how long a whole import takes, and that it stores the new data.
    copyProject(pristine.path(), work.path());
    const auto started = Clock::now();
    {
        ChildProcess child([&] { importReplacing(work.path(), new_folder.path()); });
        INFO("child: " << child.message());
        REQUIRE(child.exitedNormally());
    }
    const auto full_import = Clock::now() - started;
    {
        ProjectStore store = ProjectStore::open(work.path());
        REQUIRE(ProjectStore::datasetHash(store.loadDataset()) == new_hash);
    }
    // The reading of the folder comes before the transaction: timed here in-process.
    const auto read_started = Clock::now();
    (void)atollog::db::readCoreFolder(new_folder.path());
    const auto read_time = Clock::now() - read_started;

    std::mt19937_64 random(kSeed);
    int old_kept = 0;
    int new_whole = 0;
    int finished_before_kill = 0;
    int killed_while_reading = 0;
    for (int kill = 0; kill < kKills; ++kill) {
        // Up to 1.2 times the full import, so some kills come after the commit.
        const auto delay = std::chrono::duration_cast<Clock::duration>(
            full_import * (1.2 * uniform01(random)));
        INFO("seed " << kSeed << ", kill " << kill << " after "
                     << std::chrono::duration<double>(delay).count() << " s");
        copyProject(pristine.path(), work.path());
        ChildProcess child([&] { importReplacing(work.path(), new_folder.path()); });
        std::this_thread::sleep_for(delay);
        if (child.finished()) {
            ++finished_before_kill;
        } else {
            child.kill();
            if (delay < read_time) ++killed_while_reading;
        }
        child.wait();

        REQUIRE(integrityCheck(work.path()) == "ok");
        ProjectStore store = ProjectStore::open(work.path());
        const std::string hash = ProjectStore::datasetHash(store.loadDataset());
        const auto runs = store.modelRuns();
        REQUIRE_FALSE(runs.empty());
        CHECK(runs.front().inputs_sha256 == old_hash);
        if (hash == old_hash) {
            ++old_kept;
            CHECK(runs.size() == 1); // the kill left no provenance of an import that did not happen
        } else {
            REQUIRE(hash == new_hash);
            ++new_whole;
            REQUIRE(runs.size() == 2);
            CHECK(runs.back().kind == "import");
            CHECK(runs.back().inputs_sha256 == new_hash);
        }
    }
    CHECK(old_kept + new_whole == kKills);
    WARN("crash safety, seed " << kSeed << ": full import "
         << std::chrono::duration<double>(full_import).count() << " s (folder read "
         << std::chrono::duration<double>(read_time).count() << " s); " << kKills
         << " kills: " << old_kept << " left the old dataset (about " << killed_while_reading
         << " of them while the folder was still being read, the rest between reading and "
         << "commit), " << new_whole << " the new one (" << new_whole - finished_before_kill
         << " killed after the commit, " << finished_before_kill << " finished before the kill)");
}
