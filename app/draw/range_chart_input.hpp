#pragma once

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// One cored run for the recovery track: the interval and whether core came back from it.
/// A run with partial recovery is given as two intervals (recovered on top, as core is placed
/// at the top of its run, then unrecovered).
struct RecoveryInterval {
    double top_m = 0.0;
    double base_m = 0.0;
    bool recovered = true;
};

struct ChartSample {
    std::string id;
    double depth_m = 0.0;
    bool examined = true; // false: barren, examined and found without fossils
};

enum class OccurrenceKind { InPlace, Reworked, Caved };

struct ChartOccurrence {
    double depth_m = 0.0;
    OccurrenceKind kind = OccurrenceKind::InPlace;
    int abundance_rank = 1; // 0 (present, not counted) .. 5 (dominant); sets the marker size
};

struct ChartTaxon {
    std::string id;           // the project's taxon id; becomes the key of its items
    std::string display_name; // drawn rotated above the column
    std::string group;        // folder word: coral, benthic_foram, ...
    std::vector<ChartOccurrence> occurrences;
};

enum class PickKind { Top, Base };

/// A datum (a taxon's top or base) placed in the hole: the quoted depth with the interval it may
/// lie in, and optionally a wider interval (e.g. extended by a correlation).
struct ChartPick {
    std::string event_id;
    std::string taxon_id; // the column the pick is drawn in
    PickKind kind = PickKind::Top;
    double depth_m = 0.0;
    double shallow_m = 0.0;
    double deep_m = 0.0;
    std::optional<double> extended_shallow_m;
    std::optional<double> extended_deep_m;
    /// True when the datum may lie beyond the bracket on its outward side (above for a top,
    /// below for a base), e.g. the taxon is present in the first sample of the section.
    bool open_ended = false;
};

/// Everything a range chart shows, as plain values (no engine or db types): the CLI and the
/// viewer fill it from a project.
struct RangeChartInput {
    std::string hole;
    double top_m = 0.0;
    double base_m = 0.0;
    double scale_ratio = 200.0; // depth scale 1:N
    std::vector<RecoveryInterval> recovery;
    std::vector<ChartSample> samples;
    std::vector<ChartTaxon> taxa; // columns, left to right, in this order
    std::vector<ChartPick> picks;
};

} // namespace atollog::draw
