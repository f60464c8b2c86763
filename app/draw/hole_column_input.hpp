#pragma once

#include <optional>
#include <string>
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

/// Which tracks the column shows; a hidden track takes no room.
struct HoleColumnTracks {
    bool depth_axis = true;
    bool core_runs = true;
    bool lithology = true;
    bool surfaces = true; // drawn over the lithology track (or alone, when it is hidden)
    bool samples = true;
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
    HoleColumnTracks tracks;
};

} // namespace atollog::draw
