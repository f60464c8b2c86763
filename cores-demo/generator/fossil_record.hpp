#pragma once
// Which taxa a micropalaeontologist reports in a sample: those whose true range spans the
// sample's true age, each found with a probability that falls for rare taxa, near the ends of a
// range and in facies that do not suit the group; plus a few flagged reworked and caved finds.
#include "rng.hpp"
#include "taxon_catalogue.hpp"

#include "atollog/engine/core_records.hpp"

#include <optional>
#include <vector>

namespace atollog::demo {

/// What the fossil content of a sample depends on.
struct SampleSetting {
    std::string sample;
    double true_age_ma = 0;
    double water_depth_m = 0;
    std::optional<Texture> texture;
};

std::vector<Occurrence> examineSample(const SampleSetting& setting,
                                      const std::vector<TaxonPlan>& taxa, DemoRng& rng);

/// Chance that a taxon living at the sample's age is reported.
double detectionProbability(const TaxonPlan& taxon, const SampleSetting& setting);

} // namespace atollog::demo
