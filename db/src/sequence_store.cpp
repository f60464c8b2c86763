#include "atollog/db/sequence_store.hpp"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>

#include <stdexcept>

namespace atollog::db {

std::int64_t storeSequence(ProjectStore& store, ModelRunRecord run,
                           const std::vector<StoredSequenceEvent>& events) {
    for (std::size_t i = 0; i < events.size(); ++i) {
        const StoredSequenceEvent& e = events[i];
        if (e.rank != static_cast<int>(i) + 1)
            throw std::invalid_argument("storeSequence: event '" + e.event + "' has rank " +
                                        std::to_string(e.rank) + " at position " +
                                        std::to_string(i + 1) + "; give ranks 1..n in order");
        if (e.position_min > e.rank || e.rank > e.position_max)
            throw std::invalid_argument("storeSequence: event '" + e.event + "' has rank " +
                                        std::to_string(e.rank) + " outside its range " +
                                        std::to_string(e.position_min) + ".." +
                                        std::to_string(e.position_max));
    }
    return store.recordModelRun(std::move(run), [&events](SQLite::Database& db, std::int64_t id) {
        SQLite::Statement insert(db, "INSERT INTO sequence_event (model_run_id, rank, event, kind,"
                                     " taxon, position_min, position_max)"
                                     " VALUES (?, ?, ?, ?, ?, ?, ?)");
        for (const StoredSequenceEvent& e : events) {
            insert.bind(1, id);
            insert.bind(2, e.rank);
            insert.bind(3, e.event);
            insert.bind(4, e.kind);
            if (e.taxon)
                insert.bind(5, *e.taxon);
            else
                insert.bind(5);
            insert.bind(6, e.position_min);
            insert.bind(7, e.position_max);
            insert.exec();
            insert.reset();
        }
    });
}

std::vector<StoredSequenceEvent> loadSequence(ProjectStore& store, std::int64_t run_id) {
    SQLite::Statement q(store.database(), "SELECT rank, event, kind, taxon, position_min,"
                                          " position_max FROM sequence_event"
                                          " WHERE model_run_id = ? ORDER BY rank");
    q.bind(1, run_id);
    std::vector<StoredSequenceEvent> out;
    while (q.executeStep()) {
        StoredSequenceEvent e;
        e.rank = q.getColumn(0).getInt();
        e.event = q.getColumn(1).getString();
        e.kind = q.getColumn(2).getString();
        if (!q.getColumn(3).isNull())
            e.taxon = q.getColumn(3).getString();
        e.position_min = q.getColumn(4).getInt();
        e.position_max = q.getColumn(5).getInt();
        out.push_back(std::move(e));
    }
    return out;
}

} // namespace atollog::db
