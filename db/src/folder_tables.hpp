#pragma once
// The columns of each core data folder table, in the order of the format contract
// (/work/shared/formats.md). Shared by the folder reader (which columns it accepts) and the
// writer (which columns it writes, in which order).
#include "atollog/engine/core_dataset.hpp"

#include <span>
#include <string>
#include <string_view>

namespace atollog::db::folder_io {

/// What a column measures, which decides the unit suffixes it accepts.
enum class Quantity {
    Plain,  ///< exact name only (ids, words, pct, deg, km, years of delta_r and curve.csv)
    Length, ///< name ends in _m or _ft; stored in metres
    Age,    ///< name ends in _ma, _ka or _yr; stored in Ma
};

struct ColumnSpec {
    std::string_view name; ///< canonical spelling: metres (_m) and Ma (_ma)
    Quantity quantity = Quantity::Plain;
    bool required = false;

    /// The name without its unit suffix ("top" for top_m); the name itself for Plain columns.
    std::string_view stem() const;
    /// "top_m (or top_ft)" for messages.
    std::string spellings() const;
};

struct TableSpec {
    Table table;
    std::span<const ColumnSpec> columns;
};

/// Every table, in the order of the format contract.
std::span<const TableSpec> folderTables();
const TableSpec& tableSpec(Table table);

/// Index of each column in tableSpec(...).columns, named by table for the readers and writers.
namespace col {
enum Holes { kHole, kSite, kLat, kLon, kCollarElev, kChain, kHoleKind };
enum Runs { kRunHole, kRun, kRunTop, kRunBase, kRecovered };
enum Intervals {
    kIntHole, kIntTop, kIntBase, kRock, kTexture, kMudSupported, kGrains, kCoarse, kBinding,
    kBaseSurface, kPaleoMin, kPaleoMax, kDryDensity, kPorosity, kCaco3, kNotes
};
enum Samples { kSampleHole, kSample, kSampleTop, kSampleBase, kSampleKind };
enum Taxa { kTaxon, kTaxonName, kGroup };
enum Occurrences { kOccSample, kOccTaxon, kAbundance, kStatus };
enum Events { kEvent, kEventTaxon, kEventKind, kEventAge, kEventAgeSd, kSource };
enum Dates {
    kDateHole, kDateSample, kDateDepth, kMethod, kDateAge, kDateAgeSd, kTh230U238, kTh230U238Sd,
    kU234U238, kU234U238Sd, kTh232Ppb, kU238Ppb, kF14c, kF14cSd, kDeltaR, kDeltaRSd
};
enum Zones { kScheme, kZone, kBaseEvent, kTopEvent };
enum SeaLevel { kSeaAge, kLevel, kLevelSd };
enum Curve { kCalBp, kC14Bp, kCurveSd };
} // namespace col

} // namespace atollog::db::folder_io
