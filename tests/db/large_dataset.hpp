#pragma once
// A valid dataset of a chosen size for tests that need an import to take a while: the
// every-field dataset plus `sample_count` samples in KV-1's cored interval and `taxon_count`
// taxa, with one occurrence of every taxon in every sample (sample_count * taxon_count rows).
#include "store_fixtures.hpp"

#include <string>

namespace atollog::test {

inline CoreDataset largeDataset(int sample_count, int taxon_count, const std::string& tag) {
    CoreDataset d = everyFieldDataset();
    for (int t = 0; t < taxon_count; ++t) {
        d.taxa.push_back({"TX-" + tag + "-" + std::to_string(t), "Invented taxon " + tag,
                          TaxonGroup::Coral, {}});
    }
    for (int s = 0; s < sample_count; ++s) {
        // KV-1 is cored from 0 to 6.1 m; the samples stay within 0-5 m.
        const double top_m = 5.0 * s / sample_count;
        const std::string id = "KV-1-" + tag + "-" + std::to_string(s);
        d.samples.push_back({"KV-1", id, top_m, top_m, "core", {}});
        for (int t = 0; t < taxon_count; ++t) {
            d.occurrences.push_back({id, "TX-" + tag + "-" + std::to_string(t),
                                     std::int64_t{(s * 7 + t) % 50},
                                     OccurrenceStatus::InPlace, {}});
        }
    }
    return d;
}

} // namespace atollog::test
