// Loading the dataset: each table in id order (the source order), integer references turned
// back into text ids through maps of the parent tables, then the free attributes attached.
#include "dataset_rows.hpp"

#include "atollog/db/errors.hpp"

#include <SQLiteCpp/Statement.h>
#include <sqlite3.h>

#include <algorithm>
#include <string>
#include <unordered_map>

namespace atollog::db::detail {
namespace {

// Content the schema should have kept out: only a file edited by another tool has it.
[[noreturn]] void badContent(std::string_view table, std::int64_t id, const std::string& what) {
    throw ProjectError("table " + std::string(table) + " row id " + std::to_string(id) + ": " +
                       what + "; the project was changed outside atollog");
}

// A cell of the wrong storage class. Declared types do not stop another tool from storing a
// word in a REAL column (https://www.sqlite.org/datatype3.html, "Type Affinity"), and SQLite
// would convert it to 0 on reading; loadRows adds the table and row to the message.
struct WrongCellType {
    std::string what;
};

void requireStorage(const SQLite::Column& c, int storage, const char* expected) {
    if (c.getType() == storage || (storage == SQLITE_FLOAT && c.getType() == SQLITE_INTEGER))
        return;
    throw WrongCellType{std::string("column ") + c.getName() + " holds " +
                        (c.isNull() ? std::string("nothing") : "'" + c.getString() + "'") +
                        " where " + expected + " belongs"};
}

double real(const SQLite::Column& c) {
    requireStorage(c, SQLITE_FLOAT, "a number");
    return c.getDouble();
}

std::int64_t integer(const SQLite::Column& c) {
    requireStorage(c, SQLITE_INTEGER, "a whole number");
    return c.getInt64();
}

std::optional<double> optionalReal(const SQLite::Column& c) {
    if (c.isNull()) return std::nullopt;
    return real(c);
}

/// The table a query of ours reads: the word after " FROM ".
std::string_view tableOf(std::string_view sql) {
    const std::size_t from = sql.find(" FROM ") + 6;
    return sql.substr(from, sql.find(' ', from) - from);
}

std::string optionalText(const SQLite::Column& c) { return c.isNull() ? "" : c.getString(); }

template <class Enum, class Parse>
Enum parseWord(const SQLite::Column& c, Parse parse, std::string_view table, std::int64_t id) {
    const std::string text = c.getString();
    const std::optional<Enum> value = parse(text);
    if (!value) badContent(table, id, "unknown word '" + text + "' in column " + c.getName());
    return *value;
}

template <class Enum, class Parse>
std::optional<Enum> parseOptionalWord(const SQLite::Column& c, Parse parse,
                                      std::string_view table, std::int64_t id) {
    if (c.isNull()) return std::nullopt;
    return parseWord<Enum>(c, parse, table, id);
}

// Integer id -> text id of a parent table.
using TextIds = std::unordered_map<std::int64_t, std::string>;

const std::string& textId(const TextIds& ids, std::int64_t id, std::string_view table,
                          std::int64_t row_id, const char* column) {
    const auto it = ids.find(id);
    if (it == ids.end()) {
        badContent(table, row_id, std::string(column) + " " + std::to_string(id) +
                                      " refers to no row");
    }
    return it->second;
}

// Reads every row of `sql` (first column the id), handing each to `readRow`; returns the ids
// in order for attaching free attributes.
template <class Row, class ReadRow>
std::vector<std::int64_t> loadRows(SQLite::Database& db, const std::string& sql,
                                   std::vector<Row>& rows, ReadRow readRow,
                                   const std::vector<std::int64_t>& binds = {}) {
    std::vector<std::int64_t> ids;
    SQLite::Statement query(db, sql);
    for (std::size_t i = 0; i < binds.size(); ++i) query.bind(static_cast<int>(i + 1), binds[i]);
    while (query.executeStep()) {
        const std::int64_t id = query.getColumn(0).getInt64();
        ids.push_back(id);
        try {
            rows.push_back(readRow(query, id));
        } catch (const WrongCellType& e) {
            badContent(tableOf(sql), id, e.what);
        }
    }
    return ids;
}

// `subset`: `ids` are some of the table's rows (a scoped load); attributes of the others are
// skipped instead of being reported as dangling.
template <class Row>
void attachFreeAttributes(SQLite::Database& db, Table table, const std::vector<std::int64_t>& ids,
                          std::vector<Row>& rows, bool subset = false) {
    SQLite::Statement query(db, "SELECT row_id, col, value FROM free_attribute WHERE tbl = ?"
                                " ORDER BY id");
    const std::string tbl(sqlTableName(table));
    query.bind(1, tbl);
    while (query.executeStep()) {
        const std::int64_t row_id = query.getColumn(0).getInt64();
        // ids are ascending (loaded ORDER BY id), so a binary search finds the row.
        const auto it = std::lower_bound(ids.begin(), ids.end(), row_id);
        if (it == ids.end() || *it != row_id) {
            if (subset) continue;
            badContent("free_attribute", row_id, "row_id refers to no row of " + tbl);
        }
        rows[static_cast<std::size_t>(it - ids.begin())].extra.emplace_back(
            query.getColumn(1).getString(), query.getColumn(2).getString());
    }
}

} // namespace

CoreDataset loadDatasetRows(SQLite::Database& db) { return loadDatasetRows(db, nullptr, nullptr); }

namespace {

// A scoped query: `select` plus " WHERE " + `where` with each "@" a list of bound ids ("NULL"
// when empty), or `select` alone without a scope. Ids are bound, never formatted in.
struct ScopedQuery {
    std::string sql;
    std::vector<std::int64_t> binds;
};
ScopedQuery scopedQuery(std::string select, const LoadScope* scope, std::string_view where,
                        const std::vector<const std::vector<std::int64_t>*>& lists) {
    ScopedQuery q{std::move(select), {}};
    if (scope) {
        q.sql += " WHERE ";
        std::size_t next = 0;
        for (char c : where) {
            if (c != '@') {
                q.sql += c;
                continue;
            }
            const std::vector<std::int64_t>& ids = *lists.at(next++);
            for (std::size_t i = 0; i < ids.size(); ++i) q.sql += i ? ",?" : "?";
            if (ids.empty()) q.sql += "NULL";
            q.binds.insert(q.binds.end(), ids.begin(), ids.end());
        }
    }
    q.sql += " ORDER BY id";
    return q;
}

} // namespace

CoreDataset loadDatasetRows(SQLite::Database& db, const LoadScope* scope,
                            DatasetRowIds* row_ids) {
    CoreDataset data;
    const std::vector<std::int64_t>* holes = scope ? &scope->hole_ids : nullptr;
    const std::vector<std::int64_t>* runs = scope ? &scope->run_ids : nullptr;
    const std::vector<std::int64_t>* samples = scope ? &scope->sample_ids : nullptr;
    const ScopedQuery run_query = scopedQuery(
        "SELECT id, hole_id, run, top_m, base_m, recovered_m FROM core_run", scope,
        "hole_id IN (@) OR id IN (@)", {holes, runs});
    const ScopedQuery interval_query = scopedQuery(
        "SELECT id, hole_id, top_m, base_m, rock, texture, mud_supported, grains_pct,"
        " coarse_pct, binding, base_surface, paleodepth_min_m, paleodepth_max_m,"
        " dry_density_g_cm3, porosity_pct, caco3_pct, notes FROM lith_interval",
        scope, "hole_id IN (@)", {holes});
    const ScopedQuery sample_query = scopedQuery(
        "SELECT id, hole_id, sample, top_m, base_m, kind FROM sample", scope,
        "hole_id IN (@) OR id IN (@) OR id IN (SELECT sample_id FROM numerical_date"
        " WHERE hole_id IN (@))",
        {holes, samples, holes});
    const ScopedQuery occurrence_query = scopedQuery(
        "SELECT id, sample_id, taxon_id, abundance_class, abundance_count, status"
        " FROM occurrence",
        scope, "sample_id IN (@)", {samples});
    const ScopedQuery date_query = scopedQuery(
        "SELECT id, hole_id, sample_id, depth_m, method, age_ma, age_sd_ma, th230_u238_act,"
        " th230_u238_act_sd, u234_u238_act, u234_u238_act_sd, th232_ppb, u238_ppb, f14c,"
        " f14c_sd, delta_r_yr, delta_r_sd_yr FROM numerical_date",
        scope, "hole_id IN (@)", {holes});
    TextIds hole_text, sample_text, taxon_text, event_text;

    const auto hole_ids = loadRows(
        db, "SELECT id, hole, site, lat_deg, lon_deg, collar_elev_m, chain_km, kind FROM hole"
            " ORDER BY id",
        data.holes, [&](SQLite::Statement& q, std::int64_t id) {
            Hole h;
            h.hole = q.getColumn(1).getString();
            h.site = q.getColumn(2).getString();
            h.lat_deg = optionalReal(q.getColumn(3));
            h.lon_deg = optionalReal(q.getColumn(4));
            h.collar_elev_m = optionalReal(q.getColumn(5));
            h.chain_km = optionalReal(q.getColumn(6));
            h.kind = parseWord<HoleKind>(q.getColumn(7), parseHoleKind, "hole", id);
            hole_text.emplace(id, h.hole);
            return h;
        });
    const auto run_ids = loadRows(
        db, run_query.sql, data.runs, [&](SQLite::Statement& q, std::int64_t id) {
            CoreRun r;
            r.hole = textId(hole_text, q.getColumn(1).getInt64(), "core_run", id, "hole_id");
            r.run = q.getColumn(2).getString();
            r.top_m = real(q.getColumn(3));
            r.base_m = real(q.getColumn(4));
            r.recovered_m = real(q.getColumn(5));
            return r;
        },
        run_query.binds);
    const auto interval_ids = loadRows(
        db, interval_query.sql,
        data.intervals, [&](SQLite::Statement& q, std::int64_t id) {
            LithInterval l;
            l.hole = textId(hole_text, q.getColumn(1).getInt64(), "lith_interval", id, "hole_id");
            l.top_m = real(q.getColumn(2));
            l.base_m = real(q.getColumn(3));
            l.rock = parseWord<Rock>(q.getColumn(4), parseRock, "lith_interval", id);
            l.texture =
                parseOptionalWord<Texture>(q.getColumn(5), parseTexture, "lith_interval", id);
            if (!q.getColumn(6).isNull()) l.mud_supported = integer(q.getColumn(6)) != 0;
            l.grains_pct = optionalReal(q.getColumn(7));
            l.coarse_pct = optionalReal(q.getColumn(8));
            l.binding =
                parseOptionalWord<Binding>(q.getColumn(9), parseBinding, "lith_interval", id);
            l.base_surface =
                parseWord<Surface>(q.getColumn(10), parseSurface, "lith_interval", id);
            l.paleodepth_min_m = optionalReal(q.getColumn(11));
            l.paleodepth_max_m = optionalReal(q.getColumn(12));
            l.dry_density_g_cm3 = optionalReal(q.getColumn(13));
            l.porosity_pct = optionalReal(q.getColumn(14));
            l.caco3_pct = optionalReal(q.getColumn(15));
            l.notes = optionalText(q.getColumn(16));
            return l;
        },
        interval_query.binds);
    const auto sample_ids = loadRows(
        db, sample_query.sql, data.samples, [&](SQLite::Statement& q, std::int64_t id) {
            Sample s;
            s.hole = textId(hole_text, q.getColumn(1).getInt64(), "sample", id, "hole_id");
            s.sample = q.getColumn(2).getString();
            s.top_m = real(q.getColumn(3));
            s.base_m = real(q.getColumn(4));
            s.kind = optionalText(q.getColumn(5));
            sample_text.emplace(id, s.sample);
            return s;
        },
        sample_query.binds);
    const auto taxon_ids = loadRows(
        db, "SELECT id, taxon, name, taxon_group FROM taxon ORDER BY id", data.taxa,
        [&](SQLite::Statement& q, std::int64_t id) {
            Taxon t;
            t.taxon = q.getColumn(1).getString();
            t.name = q.getColumn(2).getString();
            t.group = parseWord<TaxonGroup>(q.getColumn(3), parseTaxonGroup, "taxon", id);
            taxon_text.emplace(id, t.taxon);
            return t;
        });
    if (!scope) {
        data.occurrences.reserve(static_cast<std::size_t>(countRows(db, Table::Occurrences)));
    }
    const auto occurrence_ids = loadRows(
        db, occurrence_query.sql,
        data.occurrences, [&](SQLite::Statement& q, std::int64_t id) {
            Occurrence o;
            o.sample = textId(sample_text, q.getColumn(1).getInt64(), "occurrence", id,
                              "sample_id");
            o.taxon = textId(taxon_text, q.getColumn(2).getInt64(), "occurrence", id, "taxon_id");
            if (!q.getColumn(3).isNull()) {
                o.abundance = parseWord<AbundanceClass>(q.getColumn(3), parseAbundanceClass,
                                                        "occurrence", id);
            } else if (!q.getColumn(4).isNull()) {
                o.abundance = integer(q.getColumn(4));
            }
            o.status = parseWord<OccurrenceStatus>(q.getColumn(5), parseOccurrenceStatus,
                                                   "occurrence", id);
            return o;
        },
        occurrence_query.binds);
    const auto event_ids = loadRows(
        db, "SELECT id, event, taxon_id, kind, age_ma, age_sd_ma, source FROM time_scale_event"
            " ORDER BY id",
        data.events, [&](SQLite::Statement& q, std::int64_t id) {
            TimeScaleEvent e;
            e.event = q.getColumn(1).getString();
            e.taxon = textId(taxon_text, q.getColumn(2).getInt64(), "time_scale_event", id,
                             "taxon_id");
            e.kind = parseWord<EventKind>(q.getColumn(3), parseEventKind, "time_scale_event", id);
            e.age_ma = real(q.getColumn(4));
            e.age_sd_ma = real(q.getColumn(5));
            e.source = optionalText(q.getColumn(6));
            event_text.emplace(id, e.event);
            return e;
        });
    const auto date_ids = loadRows(
        db, date_query.sql,
        data.dates, [&](SQLite::Statement& q, std::int64_t id) {
            NumericalDate d;
            d.hole = textId(hole_text, q.getColumn(1).getInt64(), "numerical_date", id, "hole_id");
            if (!q.getColumn(2).isNull()) {
                d.sample = textId(sample_text, q.getColumn(2).getInt64(), "numerical_date", id,
                                  "sample_id");
            }
            d.depth_m = optionalReal(q.getColumn(3));
            d.method = parseWord<DateMethod>(q.getColumn(4), parseDateMethod, "numerical_date", id);
            d.age_ma = optionalReal(q.getColumn(5));
            d.age_sd_ma = optionalReal(q.getColumn(6));
            // The schema keeps the four required U-series values all present or all absent.
            if (!q.getColumn(7).isNull()) {
                UThMeasurement u;
                u.th230_u238_act = real(q.getColumn(7));
                u.th230_u238_act_sd = real(q.getColumn(8));
                u.u234_u238_act = real(q.getColumn(9));
                u.u234_u238_act_sd = real(q.getColumn(10));
                u.th232_ppb = optionalReal(q.getColumn(11));
                u.u238_ppb = optionalReal(q.getColumn(12));
                d.uth = u;
            }
            if (!q.getColumn(13).isNull()) {
                C14Measurement c;
                c.f14c = real(q.getColumn(13));
                c.f14c_sd = real(q.getColumn(14));
                c.delta_r_yr = optionalReal(q.getColumn(15));
                c.delta_r_sd_yr = optionalReal(q.getColumn(16));
                d.c14 = c;
            }
            return d;
        },
        date_query.binds);
    const auto zone_ids = loadRows(
        db, "SELECT id, scheme, zone, base_event_id, top_event_id FROM zone ORDER BY id",
        data.zones, [&](SQLite::Statement& q, std::int64_t id) {
            Zone z;
            z.scheme = q.getColumn(1).getString();
            z.zone = q.getColumn(2).getString();
            if (!q.getColumn(3).isNull()) {
                z.base_event =
                    textId(event_text, q.getColumn(3).getInt64(), "zone", id, "base_event_id");
            }
            if (!q.getColumn(4).isNull()) {
                z.top_event =
                    textId(event_text, q.getColumn(4).getInt64(), "zone", id, "top_event_id");
            }
            return z;
        });
    const auto sea_level_ids = loadRows(
        db, "SELECT id, age_ma, level_m, level_sd_m FROM sea_level_point ORDER BY id",
        data.sea_level, [](SQLite::Statement& q, std::int64_t) {
            SeaLevelPoint p;
            p.age_ma = real(q.getColumn(1));
            p.level_m = real(q.getColumn(2));
            p.level_sd_m = optionalReal(q.getColumn(3));
            return p;
        });
    const auto curve_ids = loadRows(
        db, "SELECT id, cal_bp, c14_bp, sd FROM calibration_point ORDER BY id", data.curve,
        [](SQLite::Statement& q, std::int64_t) {
            CalibrationPoint p;
            p.cal_bp = real(q.getColumn(1));
            p.c14_bp = real(q.getColumn(2));
            p.sd = real(q.getColumn(3));
            return p;
        });

    attachFreeAttributes(db, Table::Holes, hole_ids, data.holes);
    const bool subset = scope != nullptr;
    attachFreeAttributes(db, Table::Runs, run_ids, data.runs, subset);
    attachFreeAttributes(db, Table::Intervals, interval_ids, data.intervals, subset);
    attachFreeAttributes(db, Table::Samples, sample_ids, data.samples, subset);
    attachFreeAttributes(db, Table::Taxa, taxon_ids, data.taxa);
    attachFreeAttributes(db, Table::Occurrences, occurrence_ids, data.occurrences, subset);
    attachFreeAttributes(db, Table::Events, event_ids, data.events);
    attachFreeAttributes(db, Table::Dates, date_ids, data.dates, subset);
    attachFreeAttributes(db, Table::Zones, zone_ids, data.zones);
    attachFreeAttributes(db, Table::SeaLevel, sea_level_ids, data.sea_level);
    attachFreeAttributes(db, Table::Curve, curve_ids, data.curve);
    if (row_ids) {
        *row_ids = DatasetRowIds{hole_ids, run_ids, interval_ids, sample_ids, taxon_ids,
                                 occurrence_ids, event_ids, date_ids, zone_ids};
    }
    return data;
}

} // namespace atollog::db::detail
