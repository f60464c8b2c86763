// Writing one row of an editable table: INSERT at a chosen id, UPDATE in place, DELETE, with
// its free attributes. Text references become stored ids through the parents' UNIQUE indexes.
// The edit has passed validateDataset before any of this runs, so a reference that resolves
// to nothing here is a bug, reported as ProjectError.
#include "project_edit_detail.hpp"

#include "atollog/db/errors.hpp"

#include <SQLiteCpp/Statement.h>

#include <cmath>

namespace atollog::db::detail {
namespace {

std::int64_t referenceId(SQLite::Database& db, const char* sql, const std::string& text,
                         const char* what) {
    SQLite::Statement find(db, sql);
    find.bind(1, text);
    if (!find.executeStep()) throw ProjectError(std::string(what) + " '" + text + "' is not stored");
    return find.getColumn(0).getInt64();
}

std::int64_t holeId(SQLite::Database& db, const std::string& hole) {
    return referenceId(db, "SELECT id FROM hole WHERE hole = ?", hole, "hole");
}
std::int64_t sampleId(SQLite::Database& db, const std::string& sample) {
    return referenceId(db, "SELECT id FROM sample WHERE sample = ?", sample, "sample");
}
std::int64_t taxonId(SQLite::Database& db, const std::string& taxon) {
    return referenceId(db, "SELECT id FROM taxon WHERE taxon = ?", taxon, "taxon");
}
std::int64_t eventId(SQLite::Database& db, const std::string& event) {
    return referenceId(db, "SELECT id FROM time_scale_event WHERE event = ?", event, "event");
}

// Binds parameters 2, 3, ... in column order (1 is the id).
class Binder {
  public:
    explicit Binder(SQLite::Statement& s) : s_(s) {}
    void real(double v) {
        // SQLite would store a NaN as NULL; validation refuses non-finite numbers first.
        if (std::isnan(v)) throw ProjectError("a NaN cannot be stored");
        s_.bind(next_++, v);
    }
    void real(const std::optional<double>& v) {
        if (v) real(*v); else s_.bind(next_++);
    }
    void integer(std::int64_t v) { s_.bind(next_++, v); }
    void integer(const std::optional<std::int64_t>& v) {
        if (v) integer(*v); else s_.bind(next_++);
    }
    void text(const std::string& v) { s_.bind(next_++, v); }
    void optionalText(const std::string& v) { // "" = not given = NULL, as the import stores it
        if (v.empty()) s_.bind(next_++); else text(v);
    }
    template <class Enum> void word(Enum v) { text(std::string(toString(v))); }
    template <class Enum> void word(const std::optional<Enum>& v) {
        if (v) word(*v); else s_.bind(next_++);
    }

  private:
    SQLite::Statement& s_;
    int next_ = 2;
};

// One editable table: its SQL name, columns (without id) and how a row binds to them.
struct Columns {
    const char* table;
    std::vector<const char*> names;
};

Columns columnsOf(const EditableRow& row) {
    struct Of {
        Columns operator()(const Hole&) const {
            return {"hole", {"hole", "site", "lat_deg", "lon_deg", "collar_elev_m", "chain_km", "kind"}};
        }
        Columns operator()(const CoreRun&) const {
            return {"core_run", {"hole_id", "run", "top_m", "base_m", "recovered_m"}};
        }
        Columns operator()(const LithInterval&) const {
            return {"lith_interval",
                    {"hole_id", "top_m", "base_m", "rock", "texture", "mud_supported",
                     "grains_pct", "coarse_pct", "binding", "base_surface", "paleodepth_min_m",
                     "paleodepth_max_m", "dry_density_g_cm3", "porosity_pct", "caco3_pct",
                     "notes"}};
        }
        Columns operator()(const Sample&) const {
            return {"sample", {"hole_id", "sample", "top_m", "base_m", "kind"}};
        }
        Columns operator()(const Occurrence&) const {
            return {"occurrence",
                    {"sample_id", "taxon_id", "abundance_class", "abundance_count", "status"}};
        }
        Columns operator()(const TimeScaleEvent&) const {
            return {"time_scale_event",
                    {"event", "taxon_id", "kind", "age_ma", "age_sd_ma", "source"}};
        }
        Columns operator()(const NumericalDate&) const {
            return {"numerical_date",
                    {"hole_id", "sample_id", "depth_m", "method", "age_ma", "age_sd_ma",
                     "th230_u238_act", "th230_u238_act_sd", "u234_u238_act", "u234_u238_act_sd",
                     "th232_ppb", "u238_ppb", "f14c", "f14c_sd", "delta_r_yr", "delta_r_sd_yr"}};
        }
        Columns operator()(const Zone&) const {
            return {"zone", {"scheme", "zone", "base_event_id", "top_event_id"}};
        }
    };
    return std::visit(Of{}, row);
}

void bindRow(SQLite::Database& db, SQLite::Statement& s, const EditableRow& row) {
    Binder b(s);
    struct Bind {
        SQLite::Database& db;
        Binder& b;
        void operator()(const Hole& h) const {
            b.text(h.hole);
            b.text(h.site);
            b.real(h.lat_deg);
            b.real(h.lon_deg);
            b.real(h.collar_elev_m);
            b.real(h.chain_km);
            b.word(h.kind);
        }
        void operator()(const CoreRun& r) const {
            b.integer(holeId(db, r.hole));
            b.text(r.run);
            b.real(r.top_m);
            b.real(r.base_m);
            b.real(r.recovered_m);
        }
        void operator()(const LithInterval& l) const {
            b.integer(holeId(db, l.hole));
            b.real(l.top_m);
            b.real(l.base_m);
            b.word(l.rock);
            b.word(l.texture);
            b.integer(l.mud_supported ? std::optional<std::int64_t>(*l.mud_supported ? 1 : 0)
                                      : std::nullopt);
            b.real(l.grains_pct);
            b.real(l.coarse_pct);
            b.word(l.binding);
            b.word(l.base_surface);
            b.real(l.paleodepth_min_m);
            b.real(l.paleodepth_max_m);
            b.real(l.dry_density_g_cm3);
            b.real(l.porosity_pct);
            b.real(l.caco3_pct);
            b.optionalText(l.notes);
        }
        void operator()(const Sample& x) const {
            b.integer(holeId(db, x.hole));
            b.text(x.sample);
            b.real(x.top_m);
            b.real(x.base_m);
            b.optionalText(x.kind);
        }
        void operator()(const Occurrence& o) const {
            b.integer(sampleId(db, o.sample));
            b.integer(taxonId(db, o.taxon));
            const auto* cls = o.abundance ? std::get_if<AbundanceClass>(&*o.abundance) : nullptr;
            const auto* count = o.abundance ? std::get_if<std::int64_t>(&*o.abundance) : nullptr;
            b.word(cls ? std::optional(*cls) : std::nullopt);
            b.integer(count ? std::optional(*count) : std::nullopt);
            b.word(o.status);
        }
        void operator()(const TimeScaleEvent& e) const {
            b.text(e.event);
            b.integer(taxonId(db, e.taxon));
            b.word(e.kind);
            b.real(e.age_ma);
            b.real(e.age_sd_ma);
            b.optionalText(e.source);
        }
        void operator()(const NumericalDate& d) const {
            b.integer(holeId(db, d.hole));
            b.integer(d.sample ? std::optional(sampleId(db, *d.sample)) : std::nullopt);
            b.real(d.depth_m);
            b.word(d.method);
            b.real(d.age_ma);
            b.real(d.age_sd_ma);
            const auto& u = d.uth;
            b.real(u ? std::optional(u->th230_u238_act) : std::nullopt);
            b.real(u ? std::optional(u->th230_u238_act_sd) : std::nullopt);
            b.real(u ? std::optional(u->u234_u238_act) : std::nullopt);
            b.real(u ? std::optional(u->u234_u238_act_sd) : std::nullopt);
            b.real(u ? u->th232_ppb : std::nullopt);
            b.real(u ? u->u238_ppb : std::nullopt);
            const auto& c = d.c14;
            b.real(c ? std::optional(c->f14c) : std::nullopt);
            b.real(c ? std::optional(c->f14c_sd) : std::nullopt);
            b.real(c ? c->delta_r_yr : std::nullopt);
            b.real(c ? c->delta_r_sd_yr : std::nullopt);
        }
        void operator()(const Zone& z) const {
            b.text(z.scheme);
            b.text(z.zone);
            b.integer(z.base_event ? std::optional(eventId(db, *z.base_event)) : std::nullopt);
            b.integer(z.top_event ? std::optional(eventId(db, *z.top_event)) : std::nullopt);
        }
    };
    std::visit(Bind{db, b}, row);
}

const FreeAttributes& extraOf(const EditableRow& row) {
    return std::visit([](const auto& r) -> const FreeAttributes& { return r.extra; }, row);
}

void deleteFreeAttributes(SQLite::Database& db, const char* table, std::int64_t id) {
    SQLite::Statement remove(db, "DELETE FROM free_attribute WHERE tbl = ? AND row_id = ?");
    remove.bind(1, table);
    remove.bind(2, id);
    remove.exec();
}

// The row's free attributes, in its order (loading reads them back in free_attribute id
// order); a column the table has not had yet is added after its last one.
void insertFreeAttributes(SQLite::Database& db, const char* table, std::int64_t id,
                          const FreeAttributes& extra) {
    for (const auto& [column, value] : extra) {
        SQLite::Statement known(db, "SELECT 1 FROM free_column WHERE tbl = ? AND col = ?");
        known.bind(1, table);
        known.bind(2, column);
        if (!known.executeStep()) {
            SQLite::Statement add(db, "INSERT INTO free_column (tbl, col, ord) SELECT ?1, ?2,"
                                      " coalesce(max(ord), 0) + 1 FROM free_column WHERE tbl = ?1");
            add.bind(1, table);
            add.bind(2, column);
            add.exec();
        }
        SQLite::Statement cell(
            db, "INSERT INTO free_attribute (tbl, row_id, col, value) VALUES (?, ?, ?, ?)");
        cell.bind(1, table);
        cell.bind(2, id);
        cell.bind(3, column);
        cell.bind(4, value);
        cell.exec();
    }
}

std::int64_t countWhere(SQLite::Database& db, const std::string& sql, std::int64_t id) {
    SQLite::Statement count(db, sql);
    count.bind(1, id);
    count.executeStep();
    return count.getColumn(0).getInt64();
}

std::string counted(std::int64_t n, const char* one, const char* many) {
    return std::to_string(n) + " " + (n == 1 ? one : many);
}

} // namespace

std::int64_t idForAddedRow(SQLite::Database& db, Table table, std::optional<std::int64_t> wanted) {
    // The table name comes from our own switch, never from input.
    const std::string name(sqlTableName(table));
    if (wanted && *wanted > 0 &&
        countWhere(db, "SELECT count(*) FROM " + name + " WHERE id = ?", *wanted) == 0) {
        return *wanted;
    }
    SQLite::Statement last(db, "SELECT coalesce(max(id), 0) FROM " + name);
    last.executeStep();
    return last.getColumn(0).getInt64() + 1;
}

void insertRow(SQLite::Database& db, std::int64_t id, const EditableRow& row) {
    const Columns c = columnsOf(row);
    std::string names = "id", places = "?";
    for (const char* n : c.names) {
        names += std::string(", ") + n;
        places += ", ?";
    }
    SQLite::Statement insert(db, std::string("INSERT INTO ") + c.table + " (" + names +
                                     ") VALUES (" + places + ")");
    insert.bind(1, id);
    bindRow(db, insert, row);
    insert.exec();
    insertFreeAttributes(db, c.table, id, extraOf(row));
}

void updateRow(SQLite::Database& db, std::int64_t id, const EditableRow& row) {
    const Columns c = columnsOf(row);
    std::string set;
    for (std::size_t i = 0; i < c.names.size(); ++i) {
        set += std::string(i ? ", " : "") + c.names[i] + " = ?" + std::to_string(i + 2);
    }
    SQLite::Statement update(db, std::string("UPDATE ") + c.table + " SET " + set +
                                     " WHERE id = ?1");
    update.bind(1, id);
    bindRow(db, update, row);
    update.exec();
    deleteFreeAttributes(db, c.table, id);
    insertFreeAttributes(db, c.table, id, extraOf(row));
}

void deleteRow(SQLite::Database& db, std::int64_t id, const EditableRow& row) {
    const Columns c = columnsOf(row);
    deleteFreeAttributes(db, c.table, id);
    SQLite::Statement remove(db, std::string("DELETE FROM ") + c.table + " WHERE id = ?");
    remove.bind(1, id);
    remove.exec();
}

std::optional<EditProblem> rowsReferringTo(SQLite::Database& db, std::int64_t id,
                                           const EditableRow& row) {
    std::vector<std::string> parts;
    const auto note = [&](const char* sql, const char* one, const char* many) {
        if (const std::int64_t n = countWhere(db, sql, id); n > 0) parts.push_back(counted(n, one, many));
    };
    std::string fix;
    if (std::holds_alternative<Hole>(row)) {
        note("SELECT count(*) FROM core_run WHERE hole_id = ?", "run", "runs");
        note("SELECT count(*) FROM lith_interval WHERE hole_id = ?", "interval", "intervals");
        note("SELECT count(*) FROM sample WHERE hole_id = ?", "sample", "samples");
        note("SELECT count(*) FROM numerical_date WHERE hole_id = ?", "date", "dates");
        fix = "remove them first, or move them to another hole";
    } else if (std::holds_alternative<Sample>(row)) {
        note("SELECT count(*) FROM occurrence WHERE sample_id = ?", "occurrence", "occurrences");
        note("SELECT count(*) FROM numerical_date WHERE sample_id = ?", "date", "dates");
        fix = "remove them first (or give the dates a depth instead of the sample)";
    } else if (std::holds_alternative<TimeScaleEvent>(row)) {
        note("SELECT count(*) FROM zone WHERE base_event_id = ?1 OR top_event_id = ?1", "zone",
             "zones");
        fix = "remove those zones first, or give them another event";
    }
    if (parts.empty()) return std::nullopt;
    std::string list;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        list += (i == 0 ? "" : i + 1 == parts.size() ? " and " : ", ") + parts[i];
    }
    const Table table = tableOf(row);
    return EditProblem{std::string(tableName(table)), rowKey(row), "", "",
                       rowKey(row) + " still has " + list + " referring to it", fix};
}

} // namespace atollog::db::detail
