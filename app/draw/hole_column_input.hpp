#pragma once

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace atollog::draw {

/// The rock of a logged interval: the words of the core data folder's `rock` column.
enum class RockKind {
    Limestone,
    Dolostone,
    Basalt,
    Volcaniclastic,
    Clay,
    Sand,
    Gravel,
    Soil,
    Cavity
};

/// Carbonate texture class: Dunham (1962) with the Embry & Klovan (1971) names; `Crystalline`
/// when the depositional texture is not recognisable, `None` when not logged (and for rocks that
/// are not carbonates).
enum class TextureClass {
    None,
    Mudstone,
    Wackestone,
    Packstone,
    Grainstone,
    Floatstone,
    Rudstone,
    Boundstone,
    Framestone,
    Bindstone,
    Bafflestone,
    Crystalline,
};

/// A surface logged at the base of an interval (the folder's `base_surface`), or the contact of
/// the carbonate cap on its volcanic basement.
enum class SurfaceKind { Exposure, Hardground, Erosion, BasementContact };

/// A cored run. The recovered core is drawn at the top of its run (ocean-drilling convention,
/// as in the depth model), the rest of the run as unrecovered.
struct ColumnRun {
    std::string id;
    double top_m = 0.0;
    double base_m = 0.0;
    double recovered_m = 0.0;
};

struct ColumnInterval {
    double top_m = 0.0;
    double base_m = 0.0;
    RockKind rock = RockKind::Limestone;
    TextureClass texture = TextureClass::None;
    std::optional<SurfaceKind> base_surface; // drawn across the column at base_m
};

struct ColumnSample {
    std::string id;
    double depth_m = 0.0;
};

/// One row of the hole's age model as drawn: age quantiles (Ma) at a depth (m below the collar).
struct ColumnAgeRow {
    double depth_m = 0.0;
    double q025_ma = 0.0;
    double q500_ma = 0.0;
    double q975_ma = 0.0;
};

/// The hole's age model on its depth grid, depth increasing. At a logged surface the grid holds
/// two rows at one depth, the age just above the surface first, then the age at and below it:
/// the jump between them is the time the surface stands for. Used by the age-model track and by
/// the panel's age axis (depth to age through the medians). Empty rows: the hole has no model.
struct ColumnAgeModel {
    std::vector<ColumnAgeRow> rows;
};

/// A chosen taxon in the hole: one narrow lane, a bar from the shallowest to the deepest counted
/// in-place find. Reworked and caved finds are drawn apart (hollow) and never extend the bar: a
/// reworked fossil is older than its rock, a caved one younger. A taxon with no find here keeps
/// its (empty) lane, so the lanes of every column line up.
struct ColumnTaxonRange {
    std::string taxon; // id; the key of its items
    std::string name;  // header text; the id when empty
    std::string group; // taxon-group word (coral, benthic_foram, ...): the bar's colour
    std::vector<double> finds_m;    // counted in-place finds (sample levels), any order
    std::vector<double> reworked_m; // excluded from the bar
    std::vector<double> caved_m;    // excluded from the bar
};

/// One boundary of a zone in the hole: the bracket its defining event is picked in, or, when
/// the event is not picked here (or the zone has no event on that side), an open edge at
/// `shallow_m` == `deep_m`: the depth the caller lets the box reach (e.g. the next picked
/// boundary, or the end of the hole), drawn without a closing line.
struct ColumnZoneEdge {
    double shallow_m = 0.0;
    double deep_m = 0.0;
    bool open = false;
};

/// A zone in the hole: a box from its top boundary to its base boundary, the brackets of the
/// boundaries drawn as uncertain.
struct ColumnZone {
    std::string scheme; // one lane per scheme, in order of first appearance
    std::string zone;   // the key of its items
    ColumnZoneEdge top;
    ColumnZoneEdge base;
};

/// A numerical date at its depth bracket, with its age and 95 % range (2.5-97.5 %, or the
/// 2-sigma range of a normal), all in Ma.
struct ColumnDate {
    std::string id;     // key of its items, e.g. "u-th KAL1-012"
    std::string method; // method word, e.g. "u-th"
    double shallow_m = 0.0;
    double deep_m = 0.0;
    double age_ma = 0.0;
    double age_low_ma = 0.0;  // younger end of the 95 % range
    double age_high_ma = 0.0; // older end
    bool used_in_model = true; // false: shown, not used by the age model (drawn hollow)
};

/// Which tracks the column shows; a hidden track takes no room. The tracks that draw data
/// (taxa, zones, the age track of dates and the age model) take no room either when the column
/// has no such data.
struct HoleColumnTracks {
    bool depth_axis = true;
    bool core_runs = true;
    bool lithology = true;
    bool surfaces = true; // drawn over the lithology track (or alone, when it is hidden)
    bool samples = true;
    bool taxa = true;      // one lane per ColumnTaxonRange
    bool zones = true;     // one lane per zonation scheme
    bool dates = true;     // in the age track
    bool age_model = true; // in the age track: median line and 95 % band
};

/// One hole as plain values (no engine or db types): the CLI and the viewer fill it from a
/// project. Depths are drilled depths in metres below the collar, positive down.
struct HoleColumnInput {
    std::string hole;
    double collar_elev_m = 0.0;  // collar height above present mean sea level
    double drilled_base_m = 0.0; // total drilled depth: the column ends here
    std::vector<ColumnRun> runs;
    std::vector<ColumnInterval> intervals; // any order; they must not overlap
    std::vector<ColumnSample> samples;
    ColumnAgeModel age_model;
    std::vector<ColumnTaxonRange> taxa; // lanes left to right, in this order
    std::vector<ColumnZone> zones;
    std::vector<ColumnDate> dates;
    /// The age track's x range (Ma, younger first). A panel gives every column the same one so
    /// their curves compare; unset: the span of this column's own model and dates.
    std::optional<std::pair<double, double>> age_track_range_ma;
    HoleColumnTracks tracks;
};

} // namespace atollog::draw
