// Two processes writing to one project at once lose nothing and tear nothing. Each opens the
// project, replaces the dataset with its own and records a model run, many times over. SQLite
// serialises the writers (one write transaction at a time in WAL mode,
// https://www.sqlite.org/wal.html section 2.2); atollog's part is to wait for the lock instead of
// failing: every write transaction is BEGIN IMMEDIATE (a DEFERRED one that upgrades after
// another connection committed gets SQLITE_BUSY without waiting,
// https://www.sqlite.org/lang_transaction.html) with the 5 s busy timeout
// (https://www.sqlite.org/c3ref/busy_timeout.html) and a bounded retry.
#include "atollog/db/project_store.hpp"
#include "child_process.hpp"
#include "large_dataset.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <map>
#include <memory>
#include <random>
#include <set>
#include <thread>

using atollog::db::ModelRunRecord;
using atollog::db::ProjectStore;
using atollog::test::ChildProcess;
using atollog::test::TempPath;

namespace {

constexpr int kRounds = 25;
constexpr std::uint64_t kSeedA = 20310301;
constexpr std::uint64_t kSeedB = 20310302;

void writeRounds(const std::filesystem::path& project, const std::string& writer,
                 const atollog::CoreDataset& data, std::uint64_t seed) {
    const std::string hash = ProjectStore::datasetHash(data);
    std::mt19937_64 random(seed);
    for (int round = 0; round < kRounds; ++round) {
        // A pause of 0-7 ms between rounds, as between two commands: without it, a writer
        // takes the lock again at once while the other sleeps in its busy handler, and the
        // two would rarely overlap.
        std::this_thread::sleep_for(std::chrono::milliseconds(random() % 8));
        // A fresh open each round, as separate command-line runs would do: opening (its checks
        // read the whole schema and run quick_check) also overlaps the other writer.
        ProjectStore store = ProjectStore::open(project);
        ModelRunRecord replace;
        replace.kind = "replace";
        replace.settings = "writer=" + writer;
        replace.seed = static_cast<std::uint64_t>(round);
        replace.summary = writer + " replace " + std::to_string(round);
        replace.inputs_sha256 = hash;
        store.replaceDataset(data, replace);
        ModelRunRecord note;
        note.kind = "note";
        note.settings = "writer=" + writer;
        note.seed = static_cast<std::uint64_t>(round);
        note.summary = writer + " note " + std::to_string(round);
        store.recordModelRun(note);
    }
}

} // namespace

TEST_CASE("Two processes replacing the dataset and recording runs at once lose nothing",
          "[slow][concurrency]") {
    TempPath project("concurrent");
    // KV-1 of the every-field dataset is cored from 0 to 6.1 m.
    const atollog::CoreDataset data_a = atollog::test::largeDataset(
        atollog::test::everyFieldDataset(), "KV-1", 0.0, 5.0, 100, 40, "A");
    const atollog::CoreDataset data_b = atollog::test::largeDataset(
        atollog::test::everyFieldDataset(), "KV-1", 0.0, 5.0, 80, 60, "B");
    const std::string hash_a = ProjectStore::datasetHash(data_a);
    const std::string hash_b = ProjectStore::datasetHash(data_b);
    REQUIRE(hash_a != hash_b);
    ProjectStore::create(project.path()); // closed again before the fork

    auto writer_a = std::make_unique<ChildProcess>(
        [&] { writeRounds(project.path(), "A", data_a, kSeedA); }, true);
    auto writer_b = std::make_unique<ChildProcess>(
        [&] { writeRounds(project.path(), "B", data_b, kSeedB); }, true);
    writer_a->start();
    writer_b->start();
    for (auto* writer : {writer_a.get(), writer_b.get()}) {
        const std::string message = writer->message();
        INFO("writer failed with: " << message);
        CHECK(message.empty()); // in particular no "database is locked"
        CHECK(writer->exitedNormally());
    }

    SQLite::Database raw(project.path(), SQLite::OPEN_READONLY);
    // https://www.sqlite.org/pragma.html#pragma_integrity_check
    REQUIRE(raw.execAndGet("PRAGMA integrity_check").getString() == "ok");

    ProjectStore store = ProjectStore::open(project.path());
    const auto runs = store.modelRuns();
    CHECK(runs.size() == 4u * kRounds);
    std::set<std::string> summaries;
    for (const auto& run : runs) summaries.insert(run.summary);
    for (const std::string writer : {"A", "B"}) {
        for (int round = 0; round < kRounds; ++round) {
            CHECK(summaries.count(writer + " replace " + std::to_string(round)) == 1);
            CHECK(summaries.count(writer + " note " + std::to_string(round)) == 1);
        }
    }
    // The dataset is one writer's whole dataset, and it is the one the last replace recorded.
    const std::string stored = ProjectStore::datasetHash(store.loadDataset());
    CHECK((stored == hash_a || stored == hash_b));
    const ModelRunRecord* last_replace = nullptr;
    for (const auto& run : runs) {
        if (run.kind == "replace") last_replace = &run;
    }
    REQUIRE(last_replace != nullptr);
    CHECK(last_replace->inputs_sha256 == stored);
    int switches = 0;
    for (std::size_t i = 1; i < runs.size(); ++i) {
        if (runs[i].settings != runs[i - 1].settings) ++switches;
    }
    // Both writers' turns interleaved (A..A B..B would be one switch): they did overlap.
    CHECK(switches >= 2);
    WARN("concurrent writers (seeds " << kSeedA << ", " << kSeedB << "): " << runs.size() << " runs recorded, writer switched " << switches
                                << " times");
}
