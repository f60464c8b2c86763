#pragma once
// Everything a core data folder holds, in memory: the unit that is validated, imported,
// stored and exported. Row order is the order of the source table.
#include "atollog/engine/core_records.hpp"

#include <vector>

namespace atollog {

struct CoreDataset {
    std::vector<Hole> holes;
    std::vector<CoreRun> runs;
    std::vector<LithInterval> intervals;
    std::vector<Sample> samples;
    std::vector<Taxon> taxa;
    std::vector<Occurrence> occurrences;
    std::vector<TimeScaleEvent> events;
    std::vector<NumericalDate> dates;
    std::vector<Zone> zones;
    std::vector<SeaLevelPoint> sea_level;
    std::vector<CalibrationPoint> curve;

    bool empty() const { return holes.empty(); }
    bool operator==(const CoreDataset&) const = default;
};

/// The table (file stem) each vector comes from, for messages: "holes", "runs", ... "curve".
enum class Table { Holes, Runs, Intervals, Samples, Taxa, Occurrences, Events, Dates, Zones,
                   SeaLevel, Curve };
std::string_view tableName(Table t);       ///< "holes", "sealevel", ...
std::string_view tableFileName(Table t);   ///< "holes.csv", ...

} // namespace atollog
