#pragma once
// Per-hole figures a logger checks first: how much was cored and recovered, what rock, how much
// was sampled and how many taxa were seen.
#include "atollog/engine/core_dataset.hpp"

#include <map>
#include <string>
#include <vector>

namespace atollog {

struct HoleSummary {
    std::string hole;
    std::string site;
    std::size_t run_count = 0;
    double cored_m = 0;
    double recovered_m = 0;
    double recovery_pct = 0; ///< 0 when nothing was cored
    double logged_m = 0;     ///< total thickness of logged intervals
    /// Logged thickness by texture word; carbonates without a texture under "unclassified",
    /// non-carbonate rock under its rock word (e.g. "basalt").
    std::map<std::string, double> thickness_by_class_m;
    std::size_t sample_count = 0;
    std::size_t taxon_count = 0; ///< distinct taxa in the hole's occurrences (any status)
    std::size_t exposure_surface_count = 0;
};

/// One summary per hole, in the order of data.holes. Throws std::invalid_argument (naming the
/// table, row or hole) rather than summing data it cannot use: duplicate hole ids, runs that
/// DepthModel refuses, intervals without a positive finite thickness. Validate first.
std::vector<HoleSummary> summarizeHoles(const CoreDataset& data);

} // namespace atollog
