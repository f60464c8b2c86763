#pragma once
// A write transaction that takes the write lock at BEGIN (internal to atollog::db).
//
// SQLiteCpp's default Transaction is DEFERRED: it starts as a reader and upgrades at the first
// write. In WAL mode, if another connection commits in between, the upgrade fails with
// SQLITE_BUSY at once and the busy timeout does not help, because waiting cannot make the
// reader's snapshot current (https://www.sqlite.org/lang_transaction.html, "Read
// transactions"; https://www.sqlite.org/wal.html, "Sometimes Queries Return SQLITE_BUSY").
// BEGIN IMMEDIATE takes the write lock first, waiting through the busy timeout. When another
// writer holds the lock for longer than that (a large import), BEGIN is retried a few times
// with a growing pause before the caller sees "database is locked".
#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Transaction.h>

#include <chrono>
#include <optional>

namespace atollog::db::detail {

/// How often BEGIN IMMEDIATE is tried and how long to pause after the first failure (doubled
/// after each further one). Each try already waits through the connection's busy timeout.
struct WriteRetryPolicy {
    int attempts = 4;
    std::chrono::milliseconds first_pause{100};
};

class WriteTransaction {
  public:
    /// Begins an IMMEDIATE transaction, retrying on SQLITE_BUSY as `policy` says. Throws the
    /// last SQLite::Exception when every try fails, and at once for any other error.
    explicit WriteTransaction(SQLite::Database& db, WriteRetryPolicy policy = {});
    WriteTransaction(const WriteTransaction&) = delete;
    WriteTransaction& operator=(const WriteTransaction&) = delete;
    /// Rolls back unless committed.
    ~WriteTransaction() = default;

    void commit() { transaction_->commit(); }

  private:
    std::optional<SQLite::Transaction> transaction_;
};

} // namespace atollog::db::detail
