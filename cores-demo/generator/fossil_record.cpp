#include "fossil_record.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::demo {
namespace {

bool livedAt(const TaxonPlan& t, double age_ma) { return age_ma <= t.first_ma && age_ma >= t.last_ma; }

bool isReefFramework(const std::optional<Texture>& t) {
    return t == Texture::Framestone || t == Texture::Bafflestone || t == Texture::Bindstone ||
           t == Texture::Rudstone || t == Texture::Floatstone;
}

/// A class word around the taxon's usual abundance, or for foraminifera sometimes a count.
Abundance drawAbundance(const TaxonPlan& t, DemoRng& rng) {
    const bool foram = t.group == TaxonGroup::LargerBenthicForam ||
                       t.group == TaxonGroup::BenthicForam;
    if (foram && rng.chance(0.3)) {
        const double typical = 4.0 * std::pow(t.abundance_rank, 1.5);
        const double count = std::exp(rng.normal(std::log(typical), 0.6));
        return std::max<std::int64_t>(1, std::llround(count));
    }
    if (rng.chance(0.08)) return AbundanceClass::Present;
    // Rare(1) .. Dominant(5) in enum order after Present.
    const int level = std::clamp(
        t.abundance_rank + static_cast<int>(std::lround(rng.normal(0.0, 0.8))), 1, 5);
    return static_cast<AbundanceClass>(level);
}

Occurrence occurrence(const std::string& sample, const std::string& taxon,
                      std::optional<Abundance> abundance, OccurrenceStatus status) {
    Occurrence o;
    o.sample = sample;
    o.taxon = taxon;
    o.abundance = abundance;
    o.status = status;
    return o;
}

/// A stray taxon from outside the sample's age; reworked from older rock or caved from above.
void addStray(std::vector<Occurrence>& out, const SampleSetting& s,
              const std::vector<TaxonPlan>& taxa, bool older, DemoRng& rng) {
    std::vector<const TaxonPlan*> candidates;
    for (const auto& t : taxa)
        if (older ? t.last_ma > s.true_age_ma + 0.2 : t.first_ma < s.true_age_ma - 0.1)
            candidates.push_back(&t);
    if (candidates.empty()) return;
    const TaxonPlan* t = candidates[static_cast<std::size_t>(
        rng.integer(0, static_cast<int>(candidates.size()) - 1))];
    out.push_back(occurrence(s.sample, t->taxon, AbundanceClass::Rare,
                             older ? OccurrenceStatus::Reworked : OccurrenceStatus::Caved));
}

} // namespace

double detectionProbability(const TaxonPlan& t, const SampleSetting& s) {
    static constexpr double kByRank[] = {0.0, 0.30, 0.50, 0.70, 0.90};
    double p = kByRank[std::clamp(t.abundance_rank, 1, 4)];
    const bool pelagic = t.group == TaxonGroup::Nannofossil ||
                         t.group == TaxonGroup::PlanktonicForam;
    // Open-ocean plankton is diluted in shallow reef rock; corals are sparse in loose sediment.
    if (pelagic && s.water_depth_m < 10) p *= 0.35;
    if (t.group == TaxonGroup::Coral && !isReefFramework(s.texture)) p *= 0.5;
    // Populations are thin near the beginning and end of a range, so range ends are found late.
    double distance_ma = 1e9;
    if (t.first_ma < kOlderThanAnyReefMa) distance_ma = std::min(distance_ma, t.first_ma - s.true_age_ma);
    if (t.last_ma > 0) distance_ma = std::min(distance_ma, s.true_age_ma - t.last_ma);
    p *= 0.35 + 0.65 * std::min(1.0, distance_ma / 0.08);
    return p;
}

std::vector<Occurrence> examineSample(const SampleSetting& s, const std::vector<TaxonPlan>& taxa,
                                      DemoRng& rng) {
    std::vector<Occurrence> out;
    for (const auto& t : taxa) {
        if (!livedAt(t, s.true_age_ma)) continue;
        if (rng.chance(detectionProbability(t, s)))
            out.push_back(occurrence(s.sample, t.taxon, drawAbundance(t, rng),
                                     OccurrenceStatus::InPlace));
    }
    if (rng.chance(0.05)) addStray(out, s, taxa, true, rng);
    if (rng.chance(0.04)) addStray(out, s, taxa, false, rng);
    return out;
}

} // namespace atollog::demo
