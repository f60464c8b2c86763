#include "atollog/db/age_model_store.hpp"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>

namespace atollog::db {
namespace {

void bindOptionalText(SQLite::Statement& s, int index, const std::optional<std::string>& v) {
    if (v) s.bind(index, *v);
    else s.bind(index);
}

std::optional<std::string> optionalText(const SQLite::Column& c) {
    if (c.isNull()) return std::nullopt;
    return c.getString();
}

} // namespace

std::int64_t storeAgeModels(ProjectStore& store, ModelRunRecord run,
                            const std::vector<StoredAgeModel>& models) {
    return store.recordModelRun(std::move(run), [&models](SQLite::Database& db, std::int64_t id) {
        SQLite::Statement hole(db, "INSERT INTO age_model_hole (model_run_id, hole, tie_count,"
                                   " draws, acceptance_rate, outlier_tie) VALUES (?, ?, ?, ?, ?, ?)");
        SQLite::Statement point(db, "INSERT INTO age_model_point (age_model_id, depth_m, sample,"
                                    " age_q025_ma, age_q500_ma, age_q975_ma, age_mean_ma)"
                                    " VALUES (?, ?, ?, ?, ?, ?, ?)");
        SQLite::Statement hiatus(db, "INSERT INTO age_model_hiatus (age_model_id, depth_m,"
                                     " duration_q025_ma, duration_q500_ma, duration_q975_ma,"
                                     " probability_positive) VALUES (?, ?, ?, ?, ?, ?)");
        SQLite::Statement rate(db, "INSERT INTO age_model_rate (age_model_id, label, top_m, base_m,"
                                   " rate_q025_m_per_myr, rate_q500_m_per_myr, rate_q975_m_per_myr,"
                                   " flags) VALUES (?, ?, ?, ?, ?, ?, ?, ?)");
        for (const StoredAgeModel& m : models) {
            hole.bind(1, id);
            hole.bind(2, m.hole);
            hole.bind(3, m.tie_count);
            hole.bind(4, m.draws);
            hole.bind(5, m.acceptance_rate);
            bindOptionalText(hole, 6, m.outlier_tie);
            hole.exec();
            hole.reset();
            const std::int64_t model_id = db.getLastInsertRowid();
            for (const StoredAgePoint& p : m.points) {
                point.bind(1, model_id);
                point.bind(2, p.depth_m);
                bindOptionalText(point, 3, p.sample);
                point.bind(4, p.age_q025_ma);
                point.bind(5, p.age_q500_ma);
                point.bind(6, p.age_q975_ma);
                point.bind(7, p.age_mean_ma);
                point.exec();
                point.reset();
            }
            for (const StoredHiatus& h : m.hiatuses) {
                hiatus.bind(1, model_id);
                hiatus.bind(2, h.depth_m);
                hiatus.bind(3, h.duration_q025_ma);
                hiatus.bind(4, h.duration_q500_ma);
                hiatus.bind(5, h.duration_q975_ma);
                hiatus.bind(6, h.probability_positive);
                hiatus.exec();
                hiatus.reset();
            }
            for (const StoredRate& r : m.rates) {
                rate.bind(1, model_id);
                rate.bind(2, r.label);
                rate.bind(3, r.top_m);
                rate.bind(4, r.base_m);
                rate.bind(5, r.rate_q025_m_per_myr);
                rate.bind(6, r.rate_q500_m_per_myr);
                rate.bind(7, r.rate_q975_m_per_myr);
                rate.bind(8, r.flags);
                rate.exec();
                rate.reset();
            }
        }
    });
}

std::vector<StoredAgeModel> loadAgeModels(ProjectStore& store, std::int64_t run_id) {
    SQLite::Database& db = store.database();
    std::vector<StoredAgeModel> models;
    SQLite::Statement holes(db, "SELECT id, hole, tie_count, draws, acceptance_rate, outlier_tie"
                                " FROM age_model_hole WHERE model_run_id = ? ORDER BY id");
    holes.bind(1, run_id);
    SQLite::Statement points(db, "SELECT depth_m, sample, age_q025_ma, age_q500_ma, age_q975_ma,"
                                 " age_mean_ma FROM age_model_point WHERE age_model_id = ?"
                                 " ORDER BY id");
    SQLite::Statement hiatuses(db, "SELECT depth_m, duration_q025_ma, duration_q500_ma,"
                                   " duration_q975_ma, probability_positive FROM age_model_hiatus"
                                   " WHERE age_model_id = ? ORDER BY id");
    SQLite::Statement rates(db, "SELECT label, top_m, base_m, rate_q025_m_per_myr,"
                                " rate_q500_m_per_myr, rate_q975_m_per_myr, flags FROM"
                                " age_model_rate WHERE age_model_id = ? ORDER BY id");
    while (holes.executeStep()) {
        StoredAgeModel m;
        const std::int64_t model_id = holes.getColumn(0).getInt64();
        m.hole = holes.getColumn(1).getString();
        m.tie_count = holes.getColumn(2).getInt();
        m.draws = holes.getColumn(3).getInt64();
        m.acceptance_rate = holes.getColumn(4).getDouble();
        m.outlier_tie = optionalText(holes.getColumn(5));
        points.bind(1, model_id);
        while (points.executeStep())
            m.points.push_back({points.getColumn(0).getDouble(), optionalText(points.getColumn(1)),
                                points.getColumn(2).getDouble(), points.getColumn(3).getDouble(),
                                points.getColumn(4).getDouble(), points.getColumn(5).getDouble()});
        points.reset();
        hiatuses.bind(1, model_id);
        while (hiatuses.executeStep())
            m.hiatuses.push_back({hiatuses.getColumn(0).getDouble(),
                                  hiatuses.getColumn(1).getDouble(),
                                  hiatuses.getColumn(2).getDouble(),
                                  hiatuses.getColumn(3).getDouble(),
                                  hiatuses.getColumn(4).getDouble()});
        hiatuses.reset();
        rates.bind(1, model_id);
        while (rates.executeStep())
            m.rates.push_back({rates.getColumn(0).getString(), rates.getColumn(1).getDouble(),
                               rates.getColumn(2).getDouble(), rates.getColumn(3).getDouble(),
                               rates.getColumn(4).getDouble(), rates.getColumn(5).getDouble(),
                               rates.getColumn(6).getString()});
        rates.reset();
        models.push_back(std::move(m));
    }
    return models;
}

} // namespace atollog::db
