#include "write_transaction.hpp"

#include <SQLiteCpp/Exception.h>
#include <sqlite3.h>

#include <thread>

namespace atollog::db::detail {

WriteTransaction::WriteTransaction(SQLite::Database& db, WriteRetryPolicy policy) {
    std::chrono::milliseconds pause = policy.first_pause;
    for (int attempt = 1;; ++attempt) {
        try {
            transaction_.emplace(db, SQLite::TransactionBehavior::IMMEDIATE);
            return;
        } catch (const SQLite::Exception& e) {
            // The primary code: SQLITE_BUSY_SNAPSHOT and friends are busy too.
            const bool busy = (e.getErrorCode() & 0xff) == SQLITE_BUSY;
            if (!busy || attempt >= policy.attempts) throw;
        }
        std::this_thread::sleep_for(pause);
        pause *= 2;
    }
}

} // namespace atollog::db::detail
