#include "atollog/engine/observed_ranges.hpp"

#include "biostrat_index.hpp"


namespace atollog {
namespace {

SampleLevel levelOf(const Sample& s) { return {s.sample, s.top_m, s.base_m}; }

} // namespace

std::vector<ObservedRange> observeRanges(const CoreDataset& data,
                                         const BiostratSettings& settings) {
    const detail::BiostratIndex index(data, settings);
    std::vector<ObservedRange> out;
    out.reserve(index.taxaInHoles().size());
    for (const detail::TaxonInHole& t : index.taxaInHoles()) {
        ObservedRange r;
        r.hole = index.holes()[t.hole_index].hole->hole;
        r.taxon = t.taxon;
        if (!t.counted_positions.empty()) {
            r.highest = levelOf(index.examinedSample(t.hole_index, t.counted_positions.front()));
            r.lowest = levelOf(index.examinedSample(t.hole_index, t.counted_positions.back()));
            r.sample_count = static_cast<int>(t.counted_positions.size());
            r.horizon_count = detail::countHorizons(index, t);
        }
        r.below_threshold_count = t.below_threshold_count;
        for (std::size_t si : t.reworked_samples)
            r.reworked.push_back(levelOf(data.samples[si]));
        for (std::size_t si : t.caved_samples)
            r.caved.push_back(levelOf(data.samples[si]));
        out.push_back(std::move(r));
    }
    return out;
}

} // namespace atollog
