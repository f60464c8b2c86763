#pragma once
// The observed range of each taxon in each hole: its highest and lowest in-place occurrence.
// Reworked and caved finds are reported beside the range but never extend it: a reworked fossil
// is older than its rock and a caved one younger, so either would stretch the range falsely.
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog {

/// A sample as a level in the hole (depths as logged).
struct SampleLevel {
    std::string sample;
    double top_m = 0;
    double base_m = 0;
    bool operator==(const SampleLevel&) const = default;
};

struct ObservedRange {
    std::string hole;
    std::string taxon;
    /// Highest (shallowest) and lowest (deepest) sample with a counted in-place occurrence;
    /// both unset when the taxon is only reworked, caved or below the abundance threshold here.
    std::optional<SampleLevel> highest;
    std::optional<SampleLevel> lowest;
    int horizon_count = 0;     ///< distinct sampled levels (sample top_m) with a counted occurrence
    int sample_count = 0;      ///< samples with a counted occurrence (>= horizon_count)
    int below_threshold_count = 0; ///< in-place occurrences that fail the abundance threshold
    std::vector<SampleLevel> reworked; ///< excluded from the range; depth order
    std::vector<SampleLevel> caved;    ///< excluded from the range; depth order

    /// lowest.top_m - highest.top_m; 0 without a range.
    double length_m() const { return highest && lowest ? lowest->top_m - highest->top_m : 0.0; }
};

/// Whether an in-place occurrence counts for a range under the settings' abundance threshold
/// (the rule in BiostratSettings): with no threshold every one counts; a class at or above the
/// class threshold, a count at or above the count threshold; an abundance of the other form
/// passes; no abundance fails once a threshold is set.
bool passesAbundanceThreshold(const Occurrence& o, const BiostratSettings& s);

/// Every taxon with at least one occurrence (any status) in every hole, holes in dataset order,
/// taxa by first occurrence in the data. Throws std::invalid_argument on unusable input (unknown
/// hole or sample, duplicate sample id, non-finite or inverted depths, negative counts, bad
/// settings).
std::vector<ObservedRange> observeRanges(const CoreDataset& data, const BiostratSettings& settings);

} // namespace atollog
