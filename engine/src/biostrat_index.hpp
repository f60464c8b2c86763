#pragma once
// Private to the engine: the occurrences of a dataset indexed once by hole and taxon, with each
// hole's examined samples in depth order, so that ranges and picks cost O(N log N) in all.
#include "atollog/engine/observed_ranges.hpp" // passesAbundanceThreshold
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/depth_model.hpp"

#include <cstddef>
#include <string>
#include <unordered_map>
#include <vector>

namespace atollog::detail {

/// One taxon in one hole: where it was found in place (counted: passing the abundance
/// threshold), and where it was seen reworked, caved or below the threshold.
struct TaxonInHole {
    std::size_t hole_index = 0;
    std::string taxon;
    std::vector<std::size_t> counted_positions; ///< positions in HoleSamples::examined, sorted, unique
    std::vector<std::size_t> reworked_samples;  ///< dataset sample indices, depth order
    std::vector<std::size_t> caved_samples;
    int below_threshold_count = 0;
};

struct HoleSamples {
    const Hole* hole = nullptr;
    std::vector<std::size_t> all;      ///< dataset sample indices by depth (top, base, id)
    std::vector<std::size_t> examined; ///< the examined ones, same order
    DepthModel depth_model{{}};
};

class BiostratIndex {
  public:
    /// Throws std::invalid_argument on a sample in an unknown hole, a duplicate sample id, a
    /// non-finite or inverted sample depth, an occurrence of an unknown sample, a negative count,
    /// or bad runs (through DepthModel).
    BiostratIndex(const CoreDataset& data, const BiostratSettings& settings);

    const CoreDataset& data() const { return data_; }
    const std::vector<HoleSamples>& holes() const { return holes_; }
    const std::vector<TaxonInHole>& taxaInHoles() const { return taxa_in_holes_; }
    /// nullptr when the taxon has no occurrence at all in the hole.
    const TaxonInHole* find(std::size_t hole_index, const std::string& taxon) const;
    const Sample& examinedSample(std::size_t hole_index, std::size_t position) const {
        return data_.samples[holes_[hole_index].examined[position]];
    }

  private:
    const CoreDataset& data_;
    std::vector<HoleSamples> holes_;
    std::vector<TaxonInHole> taxa_in_holes_; ///< by hole, then by first occurrence in the data
    std::unordered_map<std::string, std::size_t> lookup_; ///< hole index + '\n' + taxon
};

/// Distinct sampled levels (sample top_m) among the taxon's counted samples.
int countHorizons(const BiostratIndex& index, const TaxonInHole& t);

/// True for the sample kind that marks an examined sample without fossils.
bool isBarrenKind(const std::string& kind);

} // namespace atollog::detail
