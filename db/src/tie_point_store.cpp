#include "atollog/db/tie_point_store.hpp"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>

#include <sstream>

namespace atollog::db {
namespace {

std::vector<std::string> splitFlags(const std::string& text) {
    std::vector<std::string> flags;
    std::istringstream in(text);
    for (std::string word; std::getline(in, word, ';');)
        if (!word.empty()) flags.push_back(word);
    return flags;
}

} // namespace

std::int64_t storeTiePoints(ProjectStore& store, ModelRunRecord run,
                            const std::vector<TiePoint>& ties) {
    return store.recordModelRun(std::move(run), [&ties](SQLite::Database& db, std::int64_t id) {
        SQLite::Statement insert(db, "INSERT INTO tie_point (model_run_id, hole, event, kind,"
                                     " shallow_m, deep_m, depth_m, age_ma, age_sd_ma, flags)"
                                     " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
        for (const TiePoint& t : ties) {
            insert.bind(1, id);
            insert.bind(2, t.hole);
            insert.bind(3, t.event);
            insert.bind(4, std::string(toString(t.kind)));
            insert.bind(5, t.shallow_m);
            insert.bind(6, t.deep_m);
            insert.bind(7, t.depth_m);
            insert.bind(8, t.age_ma);
            insert.bind(9, t.age_sd_ma);
            insert.bind(10, tieFlagsText(t));
            insert.exec();
            insert.reset();
        }
    });
}

std::vector<TiePoint> loadTiePoints(ProjectStore& store, std::int64_t run_id) {
    SQLite::Statement query(store.database(),
                            "SELECT hole, event, kind, shallow_m, deep_m, depth_m, age_ma,"
                            " age_sd_ma, flags FROM tie_point WHERE model_run_id = ? ORDER BY id");
    query.bind(1, run_id);
    std::vector<TiePoint> ties;
    while (query.executeStep()) {
        TiePoint t;
        t.hole = query.getColumn(0).getString();
        t.event = query.getColumn(1).getString();
        t.kind = parseEventKind(query.getColumn(2).getString()).value_or(EventKind::Base);
        t.shallow_m = query.getColumn(3).getDouble();
        t.deep_m = query.getColumn(4).getDouble();
        t.depth_m = query.getColumn(5).getDouble();
        t.age_ma = query.getColumn(6).getDouble();
        t.age_sd_ma = query.getColumn(7).getDouble();
        t.flags = splitFlags(query.getColumn(8).getString());
        ties.push_back(std::move(t));
    }
    return ties;
}

std::optional<ModelRunRecord> latestModelRun(const ProjectStore& store, std::string_view kind) {
    std::optional<ModelRunRecord> latest;
    for (auto& run : store.modelRuns())
        if (run.kind == kind && (!latest || run.id > latest->id)) latest = std::move(run);
    return latest;
}

std::optional<ModelRunRecord> sameLatestRun(const ProjectStore& store, const ModelRunRecord& run) {
    auto latest = latestModelRun(store, run.kind);
    if (latest && latest->settings == run.settings && latest->inputs_sha256 == run.inputs_sha256)
        return latest;
    return std::nullopt;
}

} // namespace atollog::db
