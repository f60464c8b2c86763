// Two processes editing one project at once lose no edit. Each adds its own samples and then
// updates each of them, one edit per transaction, with small pauses so their transactions
// interleave. SQLite lets one writer at a time in (https://www.sqlite.org/wal.html section
// 2.2); applyEdit waits for the lock (BEGIN IMMEDIATE, 5 s busy timeout, bounded retry,
// DEVELOPERS.md "Concurrent writers") and checks each edit under that lock, against the other
// writer's committed edits.
#include "atollog/db/project_edits.hpp"
#include "atollog/db/project_store.hpp"
#include "child_process.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <random>
#include <thread>

using namespace atollog;
using atollog::db::ProjectStore;
using atollog::db::RowEdit;
using atollog::test::ChildProcess;
using atollog::test::TempPath;

namespace {

constexpr int kEditsPerWriter = 60;

Sample writerSample(const std::string& writer, int i) {
    const double depth_m = 0.02 * i; // inside run KV-1-R1 (0-3.05 m, 2.9 m recovered)
    return {"KV-1", "KV-1-" + writer + std::to_string(i), depth_m, depth_m, "core", {}};
}

void editRounds(const std::filesystem::path& project, const std::string& writer,
                std::uint64_t seed) {
    std::mt19937_64 random(seed);
    ProjectStore store = ProjectStore::open(project);
    for (int i = 0; i < kEditsPerWriter; ++i) {
        std::this_thread::sleep_for(std::chrono::microseconds(random() % 3000));
        db::applyEdit(store, RowEdit::add(writerSample(writer, i)));
    }
    for (int i = 0; i < kEditsPerWriter; ++i) {
        std::this_thread::sleep_for(std::chrono::microseconds(random() % 3000));
        Sample split = writerSample(writer, i);
        split.kind = "split";
        db::applyEdit(store, RowEdit::update(writerSample(writer, i), split));
    }
}

} // namespace

TEST_CASE("Two processes editing one project at once lose no edit", "[slow][concurrent][edits]") {
    TempPath project("edit-concurrent");
    {
        ProjectStore store = ProjectStore::create(project.path());
        store.replaceDataset(test::everyFieldDataset());
    }
    ChildProcess a([&] { editRounds(project.path(), "A", 20310401); }, true);
    ChildProcess b([&] { editRounds(project.path(), "B", 20310402); }, true);
    a.start();
    b.start();
    {
        INFO("writer A: " << a.message());
        CHECK(a.exitedNormally());
    }
    {
        INFO("writer B: " << b.message());
        CHECK(b.exitedNormally());
    }
    SQLite::Database check(project.path(), SQLite::OPEN_READONLY);
    REQUIRE(check.execAndGet("PRAGMA integrity_check").getString() == "ok");
    ProjectStore store = ProjectStore::open(project.path());
    const CoreDataset data = store.loadDataset();
    CoreDataset expected = test::everyFieldDataset();
    CHECK(data.samples.size() == expected.samples.size() + 2 * kEditsPerWriter);
    for (const std::string writer : {"A", "B"}) {
        for (int i = 0; i < kEditsPerWriter; ++i) {
            Sample split = writerSample(writer, i);
            split.kind = "split";
            INFO(split.sample);
            CHECK(std::find(data.samples.begin(), data.samples.end(), split) != data.samples.end());
        }
    }
}
