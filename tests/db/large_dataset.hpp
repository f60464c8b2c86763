#pragma once
// A dataset of a chosen size for tests that need a write to take a while: `base` plus
// `sample_count` samples spread over [from_m, to_m) of `hole` (keep that inside the hole's cored
// runs) and `taxon_count` taxa, with one occurrence of every taxon in every sample
// (sample_count * taxon_count rows). Ids carry `tag`, so two such datasets differ.
#include "atollog/engine/core_dataset.hpp"

#include <string>

namespace atollog::test {

inline CoreDataset largeDataset(CoreDataset base, const std::string& hole, double from_m,
                                double to_m, int sample_count, int taxon_count,
                                const std::string& tag) {
    CoreDataset d = std::move(base);
    for (int t = 0; t < taxon_count; ++t) {
        d.taxa.push_back({"TX-" + tag + "-" + std::to_string(t), "Invented taxon " + tag,
                          TaxonGroup::Coral, {}});
    }
    for (int s = 0; s < sample_count; ++s) {
        const double top_m = from_m + (to_m - from_m) * s / sample_count;
        const std::string id = hole + "-" + tag + "-" + std::to_string(s);
        d.samples.push_back({hole, id, top_m, top_m, "core", {}});
        for (int t = 0; t < taxon_count; ++t) {
            d.occurrences.push_back({id, "TX-" + tag + "-" + std::to_string(t),
                                     std::int64_t{(s * 7 + t) % 50},
                                     OccurrenceStatus::InPlace, {}});
        }
    }
    return d;
}

} // namespace atollog::test
