// Saving a dataset: one prepared statement per table, bound, stepped and reset per row. Text
// references (hole, sample, taxon, event ids) become integer ids through in-memory maps built
// from the dataset itself; row n of a table gets id n, which keeps the source order.
#include "dataset_rows.hpp"

#include "atollog/db/errors.hpp"

#include <SQLiteCpp/Exception.h>
#include <SQLiteCpp/Statement.h>

#include <cmath>
#include <stdexcept>
#include <string>
#include <unordered_map>
#include <unordered_set>

namespace atollog::db::detail {
namespace {

// A problem with one row; insertRows adds the table and row number.
class RowProblem : public std::runtime_error {
  public:
    using std::runtime_error::runtime_error;
};

// Vocabulary words as stable C strings for bindNoCopy.
template <class Enum> const char* word(Enum value) {
    static const std::vector<std::string> words = [] {
        std::vector<std::string> all;
        for (Enum e : allValues<Enum>()) all.emplace_back(toString(e));
        return all;
    }();
    return words.at(static_cast<std::size_t>(value)).c_str();
}

void bindReal(SQLite::Statement& s, int index, double value, const char* column) {
    // SQLite turns a NaN into NULL: refusing it keeps the round trip exact.
    if (std::isnan(value)) throw RowProblem(std::string(column) + " is NaN, which cannot be stored");
    s.bind(index, value);
}

void bindReal(SQLite::Statement& s, int index, const std::optional<double>& value,
              const char* column) {
    if (value) {
        bindReal(s, index, *value, column);
    } else {
        s.bind(index);
    }
}

// The row's strings outlive the step, so SQLite need not copy them.
void bindText(SQLite::Statement& s, int index, const std::string& value) {
    s.bindNoCopy(index, value);
}

// Free text where "" means "not given": stored as NULL.
void bindOptionalText(SQLite::Statement& s, int index, const std::string& value) {
    if (value.empty()) {
        s.bind(index);
    } else {
        s.bindNoCopy(index, value);
    }
}

template <class Enum>
void bindWord(SQLite::Statement& s, int index, const std::optional<Enum>& value) {
    if (value) {
        s.bindNoCopy(index, word(*value));
    } else {
        s.bind(index);
    }
}

using IdMap = std::unordered_map<std::string_view, std::int64_t>;

template <class Row, class Key> IdMap makeIdMap(const std::vector<Row>& rows, Key key) {
    IdMap ids;
    ids.reserve(rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        // A duplicate keeps its first id; the UNIQUE constraint then reports the duplicate row.
        ids.emplace(key(rows[i]), static_cast<std::int64_t>(i + 1));
    }
    return ids;
}

std::int64_t lookup(const IdMap& ids, const std::string& id, const char* what,
                    const char* table) {
    const auto it = ids.find(id);
    if (it == ids.end()) {
        throw RowProblem(std::string(what) + " '" + id + "' is not in " + table);
    }
    return it->second;
}

void bindReference(SQLite::Statement& s, int index, const IdMap& ids,
                   const std::optional<std::string>& id, const char* what, const char* table) {
    if (id) {
        s.bind(index, lookup(ids, *id, what, table));
    } else {
        s.bind(index);
    }
}

std::string rowLabel(Table t, std::size_t index) {
    return std::string(tableName(t)) + " row " + std::to_string(index + 1);
}

// Inserts every row; `bindRow` binds parameters 2.. (1 is the id).
template <class Row, class BindRow>
void insertRows(SQLite::Database& db, Table table, const char* sql, const std::vector<Row>& rows,
                BindRow bindRow) {
    if (rows.empty()) return;
    SQLite::Statement insert(db, sql);
    for (std::size_t i = 0; i < rows.size(); ++i) {
        try {
            insert.bind(1, static_cast<std::int64_t>(i + 1));
            bindRow(insert, rows[i]);
            insert.exec();
            insert.reset();
        } catch (const RowProblem& e) {
            throw ProjectError(rowLabel(table, i) + ": " + e.what());
        } catch (const SQLite::Exception& e) {
            throw ProjectError(rowLabel(table, i) + ": " + e.what());
        }
    }
}

template <class Row>
void insertFreeAttributes(SQLite::Statement& insert_column, SQLite::Statement& insert_cell,
                          Table table, const std::vector<Row>& rows) {
    // Columns in order of first appearance, which is the source column order for rows read
    // from a folder.
    std::vector<std::string_view> columns;
    std::unordered_set<std::string_view> seen;
    for (const Row& row : rows) {
        for (const auto& [name, value] : row.extra) {
            if (seen.insert(name).second) columns.push_back(name);
        }
    }
    if (columns.empty()) return;
    const std::string tbl(sqlTableName(table));
    for (std::size_t c = 0; c < columns.size(); ++c) {
        try {
            insert_column.bindNoCopy(1, tbl);
            insert_column.bind(2, std::string(columns[c]));
            insert_column.bind(3, static_cast<std::int64_t>(c + 1));
            insert_column.exec();
            insert_column.reset();
        } catch (const SQLite::Exception& e) {
            throw ProjectError(std::string(tableName(table)) + ": free column '" +
                               std::string(columns[c]) + "': " + e.what());
        }
    }
    for (std::size_t i = 0; i < rows.size(); ++i) {
        for (const auto& [name, value] : rows[i].extra) {
            try {
                insert_cell.bindNoCopy(1, tbl);
                insert_cell.bind(2, static_cast<std::int64_t>(i + 1));
                insert_cell.bindNoCopy(3, name);
                insert_cell.bindNoCopy(4, value);
                insert_cell.exec();
                insert_cell.reset();
            } catch (const SQLite::Exception& e) {
                throw ProjectError(rowLabel(table, i) + ": free column '" + name + "': " +
                                   e.what());
            }
        }
    }
}

} // namespace

void insertDatasetRows(SQLite::Database& db, const CoreDataset& data) {
    const IdMap hole_ids = makeIdMap(data.holes, [](const Hole& h) -> std::string_view { return h.hole; });
    const IdMap sample_ids =
        makeIdMap(data.samples, [](const Sample& s) -> std::string_view { return s.sample; });
    const IdMap taxon_ids =
        makeIdMap(data.taxa, [](const Taxon& t) -> std::string_view { return t.taxon; });
    const IdMap event_ids =
        makeIdMap(data.events, [](const TimeScaleEvent& e) -> std::string_view { return e.event; });

    insertRows(db, Table::Holes,
               "INSERT INTO hole (id, hole, site, lat_deg, lon_deg, collar_elev_m, chain_km, kind)"
               " VALUES (?, ?, ?, ?, ?, ?, ?, ?)",
               data.holes, [](SQLite::Statement& s, const Hole& h) {
                   bindText(s, 2, h.hole);
                   bindText(s, 3, h.site);
                   bindReal(s, 4, h.lat_deg, "lat_deg");
                   bindReal(s, 5, h.lon_deg, "lon_deg");
                   bindReal(s, 6, h.collar_elev_m, "collar_elev_m");
                   bindReal(s, 7, h.chain_km, "chain_km");
                   s.bindNoCopy(8, word(h.kind));
               });
    insertRows(db, Table::Runs,
               "INSERT INTO core_run (id, hole_id, run, top_m, base_m, recovered_m)"
               " VALUES (?, ?, ?, ?, ?, ?)",
               data.runs, [&](SQLite::Statement& s, const CoreRun& r) {
                   s.bind(2, lookup(hole_ids, r.hole, "hole", "holes"));
                   bindText(s, 3, r.run);
                   bindReal(s, 4, r.top_m, "top_m");
                   bindReal(s, 5, r.base_m, "base_m");
                   bindReal(s, 6, r.recovered_m, "recovered_m");
               });
    insertRows(db, Table::Intervals,
               "INSERT INTO lith_interval (id, hole_id, top_m, base_m, rock, texture,"
               " mud_supported, grains_pct, coarse_pct, binding, base_surface, paleodepth_min_m,"
               " paleodepth_max_m, dry_density_g_cm3, porosity_pct, caco3_pct, notes)"
               " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
               data.intervals, [&](SQLite::Statement& s, const LithInterval& l) {
                   s.bind(2, lookup(hole_ids, l.hole, "hole", "holes"));
                   bindReal(s, 3, l.top_m, "top_m");
                   bindReal(s, 4, l.base_m, "base_m");
                   s.bindNoCopy(5, word(l.rock));
                   bindWord(s, 6, l.texture);
                   if (l.mud_supported) {
                       s.bind(7, *l.mud_supported ? 1 : 0);
                   } else {
                       s.bind(7);
                   }
                   bindReal(s, 8, l.grains_pct, "grains_pct");
                   bindReal(s, 9, l.coarse_pct, "coarse_pct");
                   bindWord(s, 10, l.binding);
                   s.bindNoCopy(11, word(l.base_surface));
                   bindReal(s, 12, l.paleodepth_min_m, "paleodepth_min_m");
                   bindReal(s, 13, l.paleodepth_max_m, "paleodepth_max_m");
                   bindReal(s, 14, l.dry_density_g_cm3, "dry_density_g_cm3");
                   bindReal(s, 15, l.porosity_pct, "porosity_pct");
                   bindReal(s, 16, l.caco3_pct, "caco3_pct");
                   bindOptionalText(s, 17, l.notes);
               });
    insertRows(db, Table::Samples,
               "INSERT INTO sample (id, hole_id, sample, top_m, base_m, kind)"
               " VALUES (?, ?, ?, ?, ?, ?)",
               data.samples, [&](SQLite::Statement& s, const Sample& x) {
                   s.bind(2, lookup(hole_ids, x.hole, "hole", "holes"));
                   bindText(s, 3, x.sample);
                   bindReal(s, 4, x.top_m, "top_m");
                   bindReal(s, 5, x.base_m, "base_m");
                   bindOptionalText(s, 6, x.kind);
               });
    insertRows(db, Table::Taxa,
               "INSERT INTO taxon (id, taxon, name, taxon_group) VALUES (?, ?, ?, ?)", data.taxa,
               [](SQLite::Statement& s, const Taxon& t) {
                   bindText(s, 2, t.taxon);
                   bindText(s, 3, t.name);
                   s.bindNoCopy(4, word(t.group));
               });
    insertRows(db, Table::Occurrences,
               "INSERT INTO occurrence (id, sample_id, taxon_id, abundance_class, abundance_count,"
               " status) VALUES (?, ?, ?, ?, ?, ?)",
               data.occurrences, [&](SQLite::Statement& s, const Occurrence& o) {
                   s.bind(2, lookup(sample_ids, o.sample, "sample", "samples"));
                   s.bind(3, lookup(taxon_ids, o.taxon, "taxon", "taxa"));
                   if (!o.abundance) {
                       s.bind(4);
                       s.bind(5);
                   } else if (const auto* cls = std::get_if<AbundanceClass>(&*o.abundance)) {
                       s.bindNoCopy(4, word(*cls));
                       s.bind(5);
                   } else {
                       s.bind(4);
                       s.bind(5, std::get<std::int64_t>(*o.abundance));
                   }
                   s.bindNoCopy(6, word(o.status));
               });
    insertRows(db, Table::Events,
               "INSERT INTO time_scale_event (id, event, taxon_id, kind, age_ma, age_sd_ma, source)"
               " VALUES (?, ?, ?, ?, ?, ?, ?)",
               data.events, [&](SQLite::Statement& s, const TimeScaleEvent& e) {
                   bindText(s, 2, e.event);
                   s.bind(3, lookup(taxon_ids, e.taxon, "taxon", "taxa"));
                   s.bindNoCopy(4, word(e.kind));
                   bindReal(s, 5, e.age_ma, "age_ma");
                   bindReal(s, 6, e.age_sd_ma, "age_sd_ma");
                   bindOptionalText(s, 7, e.source);
               });
    insertRows(db, Table::Dates,
               "INSERT INTO numerical_date (id, hole_id, sample_id, depth_m, method, age_ma,"
               " age_sd_ma, th230_u238_act, th230_u238_act_sd, u234_u238_act, u234_u238_act_sd,"
               " th232_ppb, u238_ppb, f14c, f14c_sd, delta_r_yr, delta_r_sd_yr)"
               " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
               data.dates, [&](SQLite::Statement& s, const NumericalDate& d) {
                   s.bind(2, lookup(hole_ids, d.hole, "hole", "holes"));
                   bindReference(s, 3, sample_ids, d.sample, "sample", "samples");
                   bindReal(s, 4, d.depth_m, "depth_m");
                   s.bindNoCopy(5, word(d.method));
                   bindReal(s, 6, d.age_ma, "age_ma");
                   bindReal(s, 7, d.age_sd_ma, "age_sd_ma");
                   const std::optional<UThMeasurement>& u = d.uth;
                   bindReal(s, 8, u ? std::optional(u->th230_u238_act) : std::nullopt,
                            "th230_u238_act");
                   bindReal(s, 9, u ? std::optional(u->th230_u238_act_sd) : std::nullopt,
                            "th230_u238_act_sd");
                   bindReal(s, 10, u ? std::optional(u->u234_u238_act) : std::nullopt,
                            "u234_u238_act");
                   bindReal(s, 11, u ? std::optional(u->u234_u238_act_sd) : std::nullopt,
                            "u234_u238_act_sd");
                   bindReal(s, 12, u ? u->th232_ppb : std::nullopt, "th232_ppb");
                   bindReal(s, 13, u ? u->u238_ppb : std::nullopt, "u238_ppb");
                   const std::optional<C14Measurement>& c = d.c14;
                   bindReal(s, 14, c ? std::optional(c->f14c) : std::nullopt, "f14c");
                   bindReal(s, 15, c ? std::optional(c->f14c_sd) : std::nullopt, "f14c_sd");
                   bindReal(s, 16, c ? c->delta_r_yr : std::nullopt, "delta_r_yr");
                   bindReal(s, 17, c ? c->delta_r_sd_yr : std::nullopt, "delta_r_sd_yr");
               });
    insertRows(db, Table::Zones,
               "INSERT INTO zone (id, scheme, zone, base_event_id, top_event_id)"
               " VALUES (?, ?, ?, ?, ?)",
               data.zones, [&](SQLite::Statement& s, const Zone& z) {
                   bindText(s, 2, z.scheme);
                   bindText(s, 3, z.zone);
                   bindReference(s, 4, event_ids, z.base_event, "base_event", "events");
                   bindReference(s, 5, event_ids, z.top_event, "top_event", "events");
               });
    insertRows(db, Table::SeaLevel,
               "INSERT INTO sea_level_point (id, age_ma, level_m, level_sd_m) VALUES (?, ?, ?, ?)",
               data.sea_level, [](SQLite::Statement& s, const SeaLevelPoint& p) {
                   bindReal(s, 2, p.age_ma, "age_ma");
                   bindReal(s, 3, p.level_m, "level_m");
                   bindReal(s, 4, p.level_sd_m, "level_sd_m");
               });
    insertRows(db, Table::Curve,
               "INSERT INTO calibration_point (id, cal_bp, c14_bp, sd) VALUES (?, ?, ?, ?)",
               data.curve, [](SQLite::Statement& s, const CalibrationPoint& p) {
                   bindReal(s, 2, p.cal_bp, "cal_bp");
                   bindReal(s, 3, p.c14_bp, "c14_bp");
                   bindReal(s, 4, p.sd, "sd");
               });

    SQLite::Statement insert_column(db, "INSERT INTO free_column (tbl, col, ord) VALUES (?, ?, ?)");
    SQLite::Statement insert_cell(
        db, "INSERT INTO free_attribute (tbl, row_id, col, value) VALUES (?, ?, ?, ?)");
    insertFreeAttributes(insert_column, insert_cell, Table::Holes, data.holes);
    insertFreeAttributes(insert_column, insert_cell, Table::Runs, data.runs);
    insertFreeAttributes(insert_column, insert_cell, Table::Intervals, data.intervals);
    insertFreeAttributes(insert_column, insert_cell, Table::Samples, data.samples);
    insertFreeAttributes(insert_column, insert_cell, Table::Taxa, data.taxa);
    insertFreeAttributes(insert_column, insert_cell, Table::Occurrences, data.occurrences);
    insertFreeAttributes(insert_column, insert_cell, Table::Events, data.events);
    insertFreeAttributes(insert_column, insert_cell, Table::Dates, data.dates);
    insertFreeAttributes(insert_column, insert_cell, Table::Zones, data.zones);
    insertFreeAttributes(insert_column, insert_cell, Table::SeaLevel, data.sea_level);
    insertFreeAttributes(insert_column, insert_cell, Table::Curve, data.curve);
}

} // namespace atollog::db::detail
