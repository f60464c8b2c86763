#pragma once
// Value types for one row of each table of a core data folder. Units are in the member names:
// depths in metres below the collar (positive down), ages in Ma before present. Optional members
// are "not given" in the source. References between records are by id (text), as in the folder.
#include "atollog/engine/free_attributes.hpp"
#include "atollog/engine/vocabulary.hpp"

#include <cstdint>
#include <optional>
#include <string>
#include <variant>

namespace atollog {

struct Hole {
    std::string hole;                    ///< id
    std::string site;
    std::optional<double> lat_deg;
    std::optional<double> lon_deg;
    std::optional<double> collar_elev_m; ///< collar height above present mean sea level
    std::optional<double> chain_km;      ///< distance along the chain from the active centre
    HoleKind kind = HoleKind::Core;
    FreeAttributes extra;
    bool operator==(const Hole&) const = default;
};

struct CoreRun {
    std::string hole;
    std::string run; ///< id, unique in the table
    double top_m = 0;
    double base_m = 0;
    double recovered_m = 0;
    FreeAttributes extra;
    double cored_m() const { return base_m - top_m; }
    bool operator==(const CoreRun&) const = default;
};

struct LithInterval {
    std::string hole;
    double top_m = 0;
    double base_m = 0;
    Rock rock = Rock::Limestone;
    std::optional<Texture> texture;
    std::optional<bool> mud_supported;
    std::optional<double> grains_pct;
    std::optional<double> coarse_pct; ///< share of components over 2 mm
    std::optional<Binding> binding;
    Surface base_surface = Surface::None;
    std::optional<double> paleodepth_min_m;
    std::optional<double> paleodepth_max_m;
    std::optional<double> dry_density_g_cm3;
    std::optional<double> porosity_pct;
    std::optional<double> caco3_pct;
    std::string notes;
    FreeAttributes extra;
    double thickness_m() const { return base_m - top_m; }
    bool operator==(const LithInterval&) const = default;
};

struct Sample {
    std::string hole;
    std::string sample; ///< id, unique in the table
    double top_m = 0;
    double base_m = 0;  ///< equals top_m when not given
    std::string kind;   ///< free word (e.g. "core", "cuttings", "barren"); empty when not given
    FreeAttributes extra;
    bool operator==(const Sample&) const = default;
};

struct Taxon {
    std::string taxon; ///< id
    std::string name;
    TaxonGroup group = TaxonGroup::Other;
    FreeAttributes extra;
    bool operator==(const Taxon&) const = default;
};

/// Abundance: a class word or a whole count; nullopt in Occurrence when not given.
using Abundance = std::variant<AbundanceClass, std::int64_t>;

struct Occurrence {
    std::string sample;
    std::string taxon;
    std::optional<Abundance> abundance;
    OccurrenceStatus status = OccurrenceStatus::InPlace;
    FreeAttributes extra;
    bool operator==(const Occurrence&) const = default;
};

struct TimeScaleEvent {
    std::string event; ///< id
    std::string taxon;
    EventKind kind = EventKind::Base;
    double age_ma = 0;
    double age_sd_ma = 0;
    std::string source;
    FreeAttributes extra;
    bool operator==(const TimeScaleEvent&) const = default;
};

/// Raw U-series measurement (activity ratios), as reported by the laboratory.
struct UThMeasurement {
    double th230_u238_act = 0;
    double th230_u238_act_sd = 0;
    double u234_u238_act = 0;
    double u234_u238_act_sd = 0;
    std::optional<double> th232_ppb;
    std::optional<double> u238_ppb;
    bool operator==(const UThMeasurement&) const = default;
};

/// Raw radiocarbon measurement as fraction modern (F14C), with an optional local reservoir offset.
struct C14Measurement {
    double f14c = 0;
    double f14c_sd = 0;
    std::optional<double> delta_r_yr;
    std::optional<double> delta_r_sd_yr;
    bool operator==(const C14Measurement&) const = default;
};

struct NumericalDate {
    std::string hole;
    std::optional<std::string> sample; ///< one of sample or depth_m is given
    std::optional<double> depth_m;
    DateMethod method = DateMethod::Other;
    std::optional<double> age_ma;    ///< age as entered (given with age_sd_ma), in Ma
    std::optional<double> age_sd_ma;
    std::optional<UThMeasurement> uth;
    std::optional<C14Measurement> c14;
    FreeAttributes extra;
    bool operator==(const NumericalDate&) const = default;
};

struct Zone {
    std::string scheme;
    std::string zone;                      ///< (scheme, zone) is unique
    std::optional<std::string> base_event; ///< empty leaves the zone open at its base
    std::optional<std::string> top_event;
    FreeAttributes extra;
    bool operator==(const Zone&) const = default;
};

struct SeaLevelPoint {
    double age_ma = 0;
    double level_m = 0; ///< relative to present, negative below
    std::optional<double> level_sd_m;
    FreeAttributes extra;
    bool operator==(const SeaLevelPoint&) const = default;
};

/// A point of a user-supplied radiocarbon calibration curve (years BP, as in curve.csv).
struct CalibrationPoint {
    double cal_bp = 0;
    double c14_bp = 0;
    double sd = 0; ///< 1 sd of c14_bp, radiocarbon years
    FreeAttributes extra;
    bool operator==(const CalibrationPoint&) const = default;
};

} // namespace atollog
