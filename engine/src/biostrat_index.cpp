#include "biostrat_index.hpp"

#include "atollog/engine/number_text.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace atollog {

bool passesAbundanceThreshold(const Occurrence& o, const BiostratSettings& s) {
    if (!s.abundanceThresholdActive())
        return true;
    if (!o.abundance)
        return false; // nothing shows it reaches the threshold
    if (const auto* cls = std::get_if<AbundanceClass>(&*o.abundance))
        return !s.min_abundance_class || static_cast<int>(*cls) >= static_cast<int>(*s.min_abundance_class);
    const std::int64_t count = std::get<std::int64_t>(*o.abundance);
    return !s.min_abundance_count || count >= *s.min_abundance_count;
}

} // namespace atollog

namespace atollog::detail {
namespace {

std::string lookupKey(std::size_t hole_index, const std::string& taxon) {
    return std::to_string(hole_index) + '\n' + taxon;
}

void requireUsableSample(const Sample& s) {
    if (!std::isfinite(s.top_m) || !std::isfinite(s.base_m))
        throw std::invalid_argument("biostratigraphy: sample '" + s.sample + "' of hole '" +
                                    s.hole + "' has a non-finite depth (top_m " +
                                    numberText(s.top_m) + ", base_m " + numberText(s.base_m) +
                                    "); give finite depths in metres");
    if (s.base_m < s.top_m)
        throw std::invalid_argument("biostratigraphy: sample '" + s.sample + "' of hole '" +
                                    s.hole + "' has base_m " + numberText(s.base_m) +
                                    " above top_m " + numberText(s.top_m) +
                                    "; base_m must be at or below top_m");
}

} // namespace

bool isBarrenKind(const std::string& kind) { return kind == "barren"; }

BiostratIndex::BiostratIndex(const CoreDataset& data, const BiostratSettings& settings)
    : data_(data) {
    validateBiostratSettings(settings);
    std::unordered_map<std::string, std::size_t> hole_of_id;
    holes_.reserve(data.holes.size());
    for (std::size_t h = 0; h < data.holes.size(); ++h) {
        if (!hole_of_id.emplace(data.holes[h].hole, h).second)
            throw std::invalid_argument("biostratigraphy: hole '" + data.holes[h].hole +
                                        "' is listed twice; hole ids must be unique");
        HoleSamples hs;
        hs.hole = &data.holes[h];
        holes_.push_back(std::move(hs));
    }
    {
        std::vector<std::vector<CoreRun>> runs_of(data.holes.size());
        for (const CoreRun& r : data.runs) {
            auto it = hole_of_id.find(r.hole);
            if (it == hole_of_id.end())
                throw std::invalid_argument("biostratigraphy: run '" + r.run +
                                            "' names unknown hole '" + r.hole + "'");
            runs_of[it->second].push_back(r);
        }
        for (std::size_t h = 0; h < holes_.size(); ++h)
            holes_[h].depth_model = DepthModel(std::move(runs_of[h]));
    }

    std::unordered_map<std::string, std::size_t> sample_of_id;
    sample_of_id.reserve(data.samples.size());
    std::vector<std::size_t> hole_of_sample(data.samples.size());
    for (std::size_t i = 0; i < data.samples.size(); ++i) {
        const Sample& s = data.samples[i];
        requireUsableSample(s);
        auto it = hole_of_id.find(s.hole);
        if (it == hole_of_id.end())
            throw std::invalid_argument("biostratigraphy: sample '" + s.sample +
                                        "' names unknown hole '" + s.hole + "'");
        if (!sample_of_id.emplace(s.sample, i).second)
            throw std::invalid_argument("biostratigraphy: sample id '" + s.sample +
                                        "' is used twice; sample ids must be unique");
        hole_of_sample[i] = it->second;
        holes_[it->second].all.push_back(i);
    }

    // An examined sample has a recorded occurrence (any taxon, any status) or is marked barren.
    std::vector<char> examined(data.samples.size(), 0);
    std::vector<std::size_t> sample_of_occ(data.occurrences.size());
    for (std::size_t k = 0; k < data.occurrences.size(); ++k) {
        const Occurrence& o = data.occurrences[k];
        auto it = sample_of_id.find(o.sample);
        if (it == sample_of_id.end())
            throw std::invalid_argument("biostratigraphy: occurrence of taxon '" + o.taxon +
                                        "' names unknown sample '" + o.sample + "'");
        if (o.abundance) {
            if (const auto* n = std::get_if<std::int64_t>(&*o.abundance); n && *n < 0)
                throw std::invalid_argument("biostratigraphy: occurrence of taxon '" + o.taxon +
                                            "' in sample '" + o.sample + "' has count " +
                                            std::to_string(*n) + "; counts must be 0 or more");
        }
        sample_of_occ[k] = it->second;
        examined[it->second] = 1;
    }
    for (std::size_t i = 0; i < data.samples.size(); ++i)
        if (isBarrenKind(data.samples[i].kind))
            examined[i] = 1;

    const auto by_depth = [&data](std::size_t a, std::size_t b) {
        const Sample& x = data.samples[a];
        const Sample& y = data.samples[b];
        if (x.top_m != y.top_m)
            return x.top_m < y.top_m;
        if (x.base_m != y.base_m)
            return x.base_m < y.base_m;
        return x.sample < y.sample;
    };
    std::vector<std::size_t> position(data.samples.size(), 0);
    for (HoleSamples& hs : holes_) {
        std::sort(hs.all.begin(), hs.all.end(), by_depth);
        for (std::size_t i : hs.all)
            if (examined[i]) {
                position[i] = hs.examined.size();
                hs.examined.push_back(i);
            }
    }

    for (std::size_t k = 0; k < data.occurrences.size(); ++k) {
        const Occurrence& o = data.occurrences[k];
        const std::size_t si = sample_of_occ[k];
        const std::size_t h = hole_of_sample[si];
        auto [it, inserted] = lookup_.try_emplace(lookupKey(h, o.taxon), taxa_in_holes_.size());
        if (inserted) {
            TaxonInHole t;
            t.hole_index = h;
            t.taxon = o.taxon;
            taxa_in_holes_.push_back(std::move(t));
        }
        TaxonInHole& t = taxa_in_holes_[it->second];
        switch (o.status) {
        case OccurrenceStatus::InPlace:
            if (passesAbundanceThreshold(o, settings))
                t.counted_positions.push_back(position[si]);
            else
                ++t.below_threshold_count;
            break;
        case OccurrenceStatus::Reworked:
            t.reworked_samples.push_back(si);
            break;
        case OccurrenceStatus::Caved:
            t.caved_samples.push_back(si);
            break;
        }
    }
    for (TaxonInHole& t : taxa_in_holes_) {
        std::sort(t.counted_positions.begin(), t.counted_positions.end());
        t.counted_positions.erase(
            std::unique(t.counted_positions.begin(), t.counted_positions.end()),
            t.counted_positions.end());
        std::sort(t.reworked_samples.begin(), t.reworked_samples.end(), by_depth);
        std::sort(t.caved_samples.begin(), t.caved_samples.end(), by_depth);
    }
    // Stable report order: by hole as listed, then by first occurrence in the data.
    std::vector<std::size_t> order(taxa_in_holes_.size());
    for (std::size_t i = 0; i < order.size(); ++i)
        order[i] = i;
    std::stable_sort(order.begin(), order.end(), [this](std::size_t a, std::size_t b) {
        return taxa_in_holes_[a].hole_index < taxa_in_holes_[b].hole_index;
    });
    std::vector<TaxonInHole> sorted;
    sorted.reserve(order.size());
    for (std::size_t i : order)
        sorted.push_back(std::move(taxa_in_holes_[i]));
    taxa_in_holes_ = std::move(sorted);
    lookup_.clear();
    for (std::size_t i = 0; i < taxa_in_holes_.size(); ++i)
        lookup_.emplace(lookupKey(taxa_in_holes_[i].hole_index, taxa_in_holes_[i].taxon), i);
}

int countHorizons(const BiostratIndex& index, const TaxonInHole& t) {
    // Positions are in depth order, so samples at one level are neighbours.
    int horizons = 0;
    double last_top_m = 0;
    for (std::size_t i = 0; i < t.counted_positions.size(); ++i) {
        const double top_m = index.examinedSample(t.hole_index, t.counted_positions[i]).top_m;
        if (i == 0 || top_m != last_top_m)
            ++horizons;
        last_top_m = top_m;
    }
    return horizons;
}

const TaxonInHole* BiostratIndex::find(std::size_t hole_index, const std::string& taxon) const {
    auto it = lookup_.find(lookupKey(hole_index, taxon));
    return it == lookup_.end() ? nullptr : &taxa_in_holes_[it->second];
}

} // namespace atollog::detail
