// Schema version 1 of the project file and the migration runner.
//
// Plain SQLite that any SQLite tool can read: vocabulary words are stored as the words of the
// core data folder, optional values as NULL, rows keep the source order through their INTEGER
// PRIMARY KEY. The word lists repeat the folder vocabulary on purpose: the schema text is frozen
// per version, so a new word needs a migration (test_project_store checks that every word of
// every vocabulary is accepted). They are written as OR chains, not IN (...): SQLite evaluates a
// constant IN list of more than two words through a temporary index rebuilt for every inserted
// row, which doubled the time of a bulk replace.
#include "atollog/db/schema.hpp"

#include "atollog/db/project_store.hpp"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>

#include <algorithm>
#include <tuple>

namespace atollog::db {
namespace {

// Foreign keys: children of a hole, and occurrences and bioevents of a sample or taxon, go with
// their parent (ON DELETE CASCADE). A zone's bounding events and a date's sample use the default
// NO ACTION, so deleting an event a zone is defined by, or a dated sample, is refused rather than
// silently reopening the zone or losing a measurement.
constexpr const char* kSchemaV1 = R"sql(
CREATE TABLE hole (
    id            INTEGER PRIMARY KEY,
    hole          TEXT NOT NULL UNIQUE,
    site          TEXT NOT NULL,
    lat_deg       REAL,
    lon_deg       REAL,
    collar_elev_m REAL,
    chain_km      REAL,
    kind          TEXT NOT NULL CHECK (kind = 'core' OR kind = 'cuttings')
);
CREATE TABLE core_run (
    id          INTEGER PRIMARY KEY,
    hole_id     INTEGER NOT NULL REFERENCES hole(id) ON DELETE CASCADE,
    run         TEXT NOT NULL UNIQUE,
    top_m       REAL NOT NULL,
    base_m      REAL NOT NULL,
    recovered_m REAL NOT NULL CHECK (recovered_m >= 0),
    CHECK (base_m > top_m)
);
CREATE INDEX core_run_hole ON core_run(hole_id);
CREATE TABLE lith_interval (
    id                INTEGER PRIMARY KEY,
    hole_id           INTEGER NOT NULL REFERENCES hole(id) ON DELETE CASCADE,
    top_m             REAL NOT NULL,
    base_m            REAL NOT NULL,
    rock              TEXT NOT NULL CHECK (rock = 'limestone' OR rock = 'dolostone' OR
                                           rock = 'basalt' OR rock = 'volcaniclastic' OR
                                           rock = 'clay' OR rock = 'sand' OR rock = 'gravel' OR
                                           rock = 'soil' OR rock = 'cavity'),
    texture           TEXT CHECK (texture = 'mudstone' OR texture = 'wackestone' OR
                                  texture = 'packstone' OR texture = 'grainstone' OR
                                  texture = 'boundstone' OR texture = 'floatstone' OR
                                  texture = 'rudstone' OR texture = 'bafflestone' OR
                                  texture = 'bindstone' OR texture = 'framestone' OR
                                  texture = 'crystalline'),
    mud_supported     INTEGER CHECK (mud_supported IN (0, 1)),
    grains_pct        REAL CHECK (grains_pct BETWEEN 0 AND 100),
    coarse_pct        REAL CHECK (coarse_pct BETWEEN 0 AND 100),
    binding           TEXT CHECK (binding = 'none' OR binding = 'baffle' OR binding = 'bind' OR
                                  binding = 'frame'),
    base_surface      TEXT NOT NULL CHECK (base_surface = 'none' OR base_surface = 'exposure' OR
                                           base_surface = 'hardground' OR
                                           base_surface = 'erosion'),
    paleodepth_min_m  REAL,
    paleodepth_max_m  REAL,
    dry_density_g_cm3 REAL,
    porosity_pct      REAL CHECK (porosity_pct BETWEEN 0 AND 100),
    caco3_pct         REAL CHECK (caco3_pct BETWEEN 0 AND 100),
    notes             TEXT,
    CHECK (base_m > top_m)
);
CREATE INDEX lith_interval_hole ON lith_interval(hole_id);
CREATE TABLE sample (
    id      INTEGER PRIMARY KEY,
    hole_id INTEGER NOT NULL REFERENCES hole(id) ON DELETE CASCADE,
    sample  TEXT NOT NULL UNIQUE,
    top_m   REAL NOT NULL,
    base_m  REAL NOT NULL,
    kind    TEXT,
    CHECK (base_m >= top_m)
);
CREATE INDEX sample_hole ON sample(hole_id);
CREATE TABLE taxon (
    id          INTEGER PRIMARY KEY,
    taxon       TEXT NOT NULL UNIQUE,
    name        TEXT NOT NULL,
    taxon_group TEXT NOT NULL CHECK (taxon_group = 'coral' OR taxon_group = 'benthic_foram' OR
                                     taxon_group = 'larger_benthic_foram' OR
                                     taxon_group = 'planktonic_foram' OR
                                     taxon_group = 'nannofossil' OR
                                     taxon_group = 'coralline_alga' OR taxon_group = 'mollusc' OR
                                     taxon_group = 'other')
);
CREATE TABLE occurrence (
    id              INTEGER PRIMARY KEY,
    sample_id       INTEGER NOT NULL REFERENCES sample(id) ON DELETE CASCADE,
    taxon_id        INTEGER NOT NULL REFERENCES taxon(id) ON DELETE CASCADE,
    abundance_class TEXT CHECK (abundance_class = 'present' OR abundance_class = 'rare' OR
                                abundance_class = 'few' OR abundance_class = 'common' OR
                                abundance_class = 'abundant' OR abundance_class = 'dominant'),
    abundance_count INTEGER CHECK (abundance_count >= 0),
    status          TEXT NOT NULL CHECK (status = 'in_place' OR status = 'reworked' OR
                                         status = 'caved'),
    CHECK (abundance_class IS NULL OR abundance_count IS NULL)
);
CREATE INDEX occurrence_sample ON occurrence(sample_id);
CREATE INDEX occurrence_taxon ON occurrence(taxon_id);
CREATE TABLE time_scale_event (
    id        INTEGER PRIMARY KEY,
    event     TEXT NOT NULL UNIQUE,
    taxon_id  INTEGER NOT NULL REFERENCES taxon(id) ON DELETE CASCADE,
    kind      TEXT NOT NULL CHECK (kind = 'base' OR kind = 'top'),
    age_ma    REAL NOT NULL,
    age_sd_ma REAL NOT NULL CHECK (age_sd_ma > 0),
    source    TEXT
);
CREATE INDEX time_scale_event_taxon ON time_scale_event(taxon_id);
CREATE TABLE numerical_date (
    id                INTEGER PRIMARY KEY,
    hole_id           INTEGER NOT NULL REFERENCES hole(id) ON DELETE CASCADE,
    sample_id         INTEGER REFERENCES sample(id),
    depth_m           REAL,
    method            TEXT NOT NULL CHECK (method = 'u-th' OR method = 'c14' OR method = 'ar-ar' OR
                                           method = 'k-ar' OR method = 'sr' OR
                                           method = 'other'),
    age_ma            REAL,
    age_sd_ma         REAL CHECK (age_sd_ma > 0),
    th230_u238_act    REAL,
    th230_u238_act_sd REAL CHECK (th230_u238_act_sd > 0),
    u234_u238_act     REAL,
    u234_u238_act_sd  REAL CHECK (u234_u238_act_sd > 0),
    th232_ppb         REAL,
    u238_ppb          REAL,
    f14c              REAL,
    f14c_sd           REAL CHECK (f14c_sd > 0),
    delta_r_yr        REAL,
    delta_r_sd_yr     REAL CHECK (delta_r_sd_yr > 0),
    CHECK (sample_id IS NOT NULL OR depth_m IS NOT NULL),
    CHECK ((th230_u238_act IS NULL) = (th230_u238_act_sd IS NULL)
           AND (th230_u238_act IS NULL) = (u234_u238_act IS NULL)
           AND (th230_u238_act IS NULL) = (u234_u238_act_sd IS NULL)),
    CHECK (th230_u238_act IS NOT NULL OR (th232_ppb IS NULL AND u238_ppb IS NULL)),
    CHECK ((f14c IS NULL) = (f14c_sd IS NULL)),
    CHECK (f14c IS NOT NULL OR (delta_r_yr IS NULL AND delta_r_sd_yr IS NULL))
);
CREATE INDEX numerical_date_hole ON numerical_date(hole_id);
CREATE INDEX numerical_date_sample ON numerical_date(sample_id);
CREATE TABLE zone (
    id            INTEGER PRIMARY KEY,
    scheme        TEXT NOT NULL,
    zone          TEXT NOT NULL,
    base_event_id INTEGER REFERENCES time_scale_event(id),
    top_event_id  INTEGER REFERENCES time_scale_event(id),
    UNIQUE (scheme, zone)
);
CREATE INDEX zone_base_event ON zone(base_event_id);
CREATE INDEX zone_top_event ON zone(top_event_id);
CREATE TABLE sea_level_point (
    id         INTEGER PRIMARY KEY,
    age_ma     REAL NOT NULL,
    level_m    REAL NOT NULL,
    level_sd_m REAL CHECK (level_sd_m > 0)
);
CREATE TABLE calibration_point (
    id     INTEGER PRIMARY KEY,
    cal_bp REAL NOT NULL,
    c14_bp REAL NOT NULL,
    sd     REAL NOT NULL CHECK (sd > 0)
);
CREATE TABLE free_column (
    id  INTEGER PRIMARY KEY,
    tbl TEXT NOT NULL CHECK (tbl = 'hole' OR tbl = 'core_run' OR tbl = 'lith_interval' OR
                             tbl = 'sample' OR tbl = 'taxon' OR tbl = 'occurrence' OR
                             tbl = 'time_scale_event' OR tbl = 'numerical_date' OR tbl = 'zone' OR
                             tbl = 'sea_level_point' OR tbl = 'calibration_point'),
    col TEXT NOT NULL CHECK (substr(col, 1, 2) = 'x_'),
    ord INTEGER NOT NULL CHECK (ord >= 1),
    UNIQUE (tbl, col),
    UNIQUE (tbl, ord)
);
CREATE TABLE free_attribute (
    id     INTEGER PRIMARY KEY,
    tbl    TEXT NOT NULL,
    row_id INTEGER NOT NULL,
    col    TEXT NOT NULL,
    value  TEXT NOT NULL,
    FOREIGN KEY (tbl, col) REFERENCES free_column(tbl, col) ON DELETE CASCADE,
    UNIQUE (tbl, row_id, col)
);
CREATE INDEX free_attribute_column ON free_attribute(tbl, col);
CREATE TABLE model_run (
    id              INTEGER PRIMARY KEY,
    kind            TEXT NOT NULL CHECK (kind <> ''),
    settings        TEXT NOT NULL,
    seed            INTEGER,
    program_version TEXT NOT NULL,
    started_utc     TEXT NOT NULL,
    inputs_sha256   TEXT NOT NULL,
    summary         TEXT NOT NULL
);
)sql";

// Version 2: tie points (datum picks with their time-scale ages) stored per model run. They name
// hole and event by id text rather than by foreign key: they are results of a run on the data as
// it was (the run's inputs_sha256 says which), and stay as history when the data is replaced.
constexpr const char* kSchemaV2 = R"sql(
CREATE TABLE tie_point (
    id           INTEGER PRIMARY KEY,
    model_run_id INTEGER NOT NULL REFERENCES model_run(id) ON DELETE CASCADE,
    hole         TEXT NOT NULL,
    event        TEXT NOT NULL,
    kind         TEXT NOT NULL CHECK (kind = 'base' OR kind = 'top'),
    shallow_m    REAL NOT NULL,
    deep_m       REAL NOT NULL,
    depth_m      REAL NOT NULL,
    age_ma       REAL NOT NULL,
    age_sd_ma    REAL NOT NULL CHECK (age_sd_ma > 0),
    flags        TEXT NOT NULL,
    CHECK (deep_m >= shallow_m AND depth_m >= shallow_m AND depth_m <= deep_m)
);
CREATE INDEX tie_point_run ON tie_point(model_run_id);
)sql";

// Version 3: age-depth model results per model run and hole: the age quantiles on the depth grid
// and at every sample, each hiatus's duration, accretion rates, and the run's acceptance and
// most likely outlier tie. Like tie points they name holes by id text: results of a run on the
// data as it was.
constexpr const char* kSchemaV3 = R"sql(
CREATE TABLE age_model_hole (
    id               INTEGER PRIMARY KEY,
    model_run_id     INTEGER NOT NULL REFERENCES model_run(id) ON DELETE CASCADE,
    hole             TEXT NOT NULL,
    tie_count        INTEGER NOT NULL CHECK (tie_count >= 0),
    draws            INTEGER NOT NULL CHECK (draws > 0),
    acceptance_rate  REAL NOT NULL CHECK (acceptance_rate >= 0 AND acceptance_rate <= 1),
    outlier_tie      TEXT,
    UNIQUE (model_run_id, hole)
);
CREATE TABLE age_model_point (
    id              INTEGER PRIMARY KEY,
    age_model_id    INTEGER NOT NULL REFERENCES age_model_hole(id) ON DELETE CASCADE,
    depth_m         REAL NOT NULL,
    sample          TEXT,
    age_q025_ma     REAL NOT NULL,
    age_q500_ma     REAL NOT NULL,
    age_q975_ma     REAL NOT NULL,
    age_mean_ma     REAL NOT NULL,
    CHECK (age_q025_ma <= age_q500_ma AND age_q500_ma <= age_q975_ma)
);
CREATE INDEX age_model_point_model ON age_model_point(age_model_id);
CREATE TABLE age_model_hiatus (
    id                   INTEGER PRIMARY KEY,
    age_model_id         INTEGER NOT NULL REFERENCES age_model_hole(id) ON DELETE CASCADE,
    depth_m              REAL NOT NULL,
    duration_q025_ma     REAL NOT NULL,
    duration_q500_ma     REAL NOT NULL,
    duration_q975_ma     REAL NOT NULL,
    probability_positive REAL NOT NULL CHECK (probability_positive >= 0 AND probability_positive <= 1),
    CHECK (duration_q025_ma <= duration_q500_ma AND duration_q500_ma <= duration_q975_ma)
);
CREATE INDEX age_model_hiatus_model ON age_model_hiatus(age_model_id);
CREATE TABLE age_model_rate (
    id                  INTEGER PRIMARY KEY,
    age_model_id        INTEGER NOT NULL REFERENCES age_model_hole(id) ON DELETE CASCADE,
    label               TEXT NOT NULL,
    top_m               REAL NOT NULL,
    base_m              REAL NOT NULL,
    rate_q025_m_per_myr REAL NOT NULL,
    rate_q500_m_per_myr REAL NOT NULL,
    rate_q975_m_per_myr REAL NOT NULL,
    flags               TEXT NOT NULL,
    CHECK (base_m > top_m),
    CHECK (rate_q025_m_per_myr <= rate_q500_m_per_myr AND rate_q500_m_per_myr <= rate_q975_m_per_myr)
);
CREATE INDEX age_model_rate_model ON age_model_rate(age_model_id);
)sql";

// Version 4: composite sequences per model run: every event's rank in the best order with the
// range of ranks it took among near-best orders, and the misfit it came with.
constexpr const char* kSchemaV4 = R"sql(
CREATE TABLE sequence_event (
    id            INTEGER PRIMARY KEY,
    model_run_id  INTEGER NOT NULL REFERENCES model_run(id) ON DELETE CASCADE,
    rank          INTEGER NOT NULL CHECK (rank >= 1),
    event         TEXT NOT NULL,
    kind          TEXT NOT NULL CHECK (kind = 'base' OR kind = 'top' OR kind = 'dated'),
    taxon         TEXT,
    position_min  INTEGER NOT NULL,
    position_max  INTEGER NOT NULL,
    CHECK (position_min <= rank AND rank <= position_max),
    UNIQUE (model_run_id, rank),
    UNIQUE (model_run_id, event)
);
CREATE INDEX sequence_event_run ON sequence_event(model_run_id);
)sql";

} // namespace

const std::vector<Migration>& projectMigrations() {
    static const std::vector<Migration> migrations{
        {1, kSchemaV1}, {2, kSchemaV2}, {3, kSchemaV3}, {4, kSchemaV4}};
    return migrations;
}

int readUserVersion(SQLite::Database& db) {
    return db.execAndGet("PRAGMA user_version").getInt();
}

int readApplicationId(SQLite::Database& db) {
    return db.execAndGet("PRAGMA application_id").getInt();
}

void applyMigrations(SQLite::Database& db, const std::vector<Migration>& migrations) {
    const int from_version = readUserVersion(db);
    int reached = from_version;
    for (const Migration& m : migrations) {
        if (m.version <= from_version) continue;
        db.exec(m.sql);
        reached = m.version;
    }
    // PRAGMA takes no bound parameters; the value is our own integer, never file content.
    if (reached != from_version) db.exec("PRAGMA user_version = " + std::to_string(reached));
}

std::vector<SchemaObject> readSchemaObjects(SQLite::Database& db) {
    std::vector<SchemaObject> objects;
    SQLite::Statement query(db, "SELECT type, name, tbl_name, sql FROM main.sqlite_master");
    while (query.executeStep()) {
        objects.push_back({query.getColumn(0).getString(), query.getColumn(1).getString(),
                           query.getColumn(2).getString(), query.getColumn(3).getString()});
    }
    std::sort(objects.begin(), objects.end(), [](const SchemaObject& a, const SchemaObject& b) {
        return std::tie(a.type, a.name) < std::tie(b.type, b.name);
    });
    return objects;
}

std::vector<SchemaObject> expectedSchemaObjects(int version) {
    SQLite::Database memory(":memory:", SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
    std::vector<Migration> upto;
    for (const Migration& m : projectMigrations()) {
        if (m.version <= version) upto.push_back(m);
    }
    applyMigrations(memory, upto);
    return readSchemaObjects(memory);
}

} // namespace atollog::db
