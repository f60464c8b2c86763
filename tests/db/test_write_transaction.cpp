// Why every write transaction of atollog is BEGIN IMMEDIATE, and the bounded retry at BEGIN.
// The SQLite behaviour checked first is documented at https://www.sqlite.org/lang_transaction.html
// ("If a write statement occurs while a read transaction is active, then the read transaction is
// upgraded to a write transaction if possible. If some other database connection has already
// modified the database ... the upgrade ... fails with SQLITE_BUSY") and in
// https://www.sqlite.org/wal.html (SQLITE_BUSY_SNAPSHOT).
#include "store_fixtures.hpp"
#include "write_transaction.hpp"

#include <SQLiteCpp/SQLiteCpp.h>
#include <catch2/catch.hpp>
#include <sqlite3.h>

#include <future>
#include <thread>

using atollog::db::detail::WriteRetryPolicy;
using atollog::db::detail::WriteTransaction;
using atollog::test::TempPath;

namespace {

std::unique_ptr<SQLite::Database> connect(const std::filesystem::path& file, int busy_ms) {
    auto db = std::make_unique<SQLite::Database>(file, SQLite::OPEN_READWRITE |
                                                           SQLite::OPEN_CREATE);
    db->setBusyTimeout(busy_ms);
    db->exec("PRAGMA journal_mode = WAL");
    return db;
}

} // namespace

TEST_CASE("A deferred transaction that read before another commit cannot write, busy timeout "
          "or not",
          "[unit]") {
    TempPath file("deferred");
    auto first = connect(file.path(), 2000);
    first->exec("CREATE TABLE t (v INTEGER); INSERT INTO t VALUES (1)");
    auto second = connect(file.path(), 2000);

    SQLite::Transaction deferred(*first); // SQLiteCpp's default: BEGIN (DEFERRED)
    CHECK(first->execAndGet("SELECT count(*) FROM t").getInt() == 1); // read snapshot taken
    second->exec("INSERT INTO t VALUES (2)");                         // another commit
    int code = SQLITE_OK;
    try {
        first->exec("INSERT INTO t VALUES (3)");
    } catch (const SQLite::Exception& e) {
        code = e.getErrorCode() & 0xff;
    }
    CHECK(code == SQLITE_BUSY);
}

TEST_CASE("WriteTransaction waits for another writer, retrying BEGIN after the busy timeout",
          "[unit]") {
    TempPath file("write-retry");
    auto ours = connect(file.path(), 20); // a short busy timeout, so the retry loop is exercised
    ours->exec("CREATE TABLE t (v INTEGER)");
    auto theirs = connect(file.path(), 20);

    std::promise<void> locked;
    std::promise<void> release;
    std::thread holder([&] {
        SQLite::Transaction hold(*theirs, SQLite::TransactionBehavior::IMMEDIATE);
        theirs->exec("INSERT INTO t VALUES (1)");
        locked.set_value();
        release.get_future().wait();
        hold.commit();
    });
    locked.get_future().wait();

    SECTION("one try fails with SQLITE_BUSY while the other writer holds the lock") {
        int code = SQLITE_OK;
        try {
            WriteTransaction once(*ours, WriteRetryPolicy{1, std::chrono::milliseconds(1)});
        } catch (const SQLite::Exception& e) {
            code = e.getErrorCode() & 0xff;
        }
        CHECK(code == SQLITE_BUSY);
        release.set_value();
    }
    SECTION("retries succeed once the other writer commits") {
        // Released from another thread after a pause; the retries (8 tries, pauses doubling from
        // 20 ms: over 5 s in all) outlast it by far.
        std::thread releaser([&] {
            std::this_thread::sleep_for(std::chrono::milliseconds(150));
            release.set_value();
        });
        {
            WriteTransaction retried(*ours, WriteRetryPolicy{8, std::chrono::milliseconds(20)});
            ours->exec("INSERT INTO t VALUES (2)");
            retried.commit();
        }
        releaser.join();
        CHECK(ours->execAndGet("SELECT count(*) FROM t").getInt() == 2);
    }
    holder.join();
}

TEST_CASE("WriteTransaction rolls back unless committed", "[unit]") {
    TempPath file("write-rollback");
    auto db = connect(file.path(), 100);
    db->exec("CREATE TABLE t (v INTEGER)");
    {
        WriteTransaction abandoned(*db);
        db->exec("INSERT INTO t VALUES (1)");
    }
    CHECK(db->execAndGet("SELECT count(*) FROM t").getInt() == 0);
}
