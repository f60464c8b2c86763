#pragma once
// Invented correlation data for the composite-sequence tests: taxa and dated horizons with true
// ages, holes that record them at depth = age x rate (+ scatter that makes holes disagree), and
// an independent statement of the hard constraints for brute-force checks.
#include "atollog/engine/correlation_data.hpp"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <random>
#include <string>
#include <vector>

namespace seqtest {

using namespace atollog;

inline double uniform01(std::mt19937_64& rng) {
    return static_cast<double>(rng() >> 11) * 0x1.0p-53;
}

struct InventedData {
    CorrelationData data;
    std::vector<double> true_age_ma; ///< per event
};

/// `taxa` taxa (base and top each), `dated` dated horizons, `holes` holes. Each event is seen in
/// a hole with probability `seen`, at age x rate + uniform scatter in +-`scatter_m`, bracket
/// half-widths up to `half_width_m`. Scatter 0 and small widths give holes that all agree.
inline InventedData inventData(std::uint64_t seed, int taxa, int dated, int holes,
                               double scatter_m, double half_width_m = 1.5, double seen = 0.85) {
    std::mt19937_64 rng(seed);
    InventedData out;
    CorrelationData& d = out.data;
    for (int t = 0; t < taxa; ++t) {
        const std::string name = "Taxon" + std::to_string(t);
        const double base = 1.0 + 9.0 * uniform01(rng);
        const double top = base * (0.2 + 0.7 * uniform01(rng));
        d.events.push_back(SequenceEvent{"B " + name, SequenceEventKind::Base, name, {}, {}});
        out.true_age_ma.push_back(base);
        d.events.push_back(SequenceEvent{"T " + name, SequenceEventKind::Top, name, {}, {}});
        out.true_age_ma.push_back(top);
    }
    for (int k = 0; k < dated; ++k) {
        const double age = 0.5 + 9.5 * uniform01(rng);
        d.events.push_back(SequenceEvent{"date d" + std::to_string(k), SequenceEventKind::Dated,
                                         "", age, 0.05 + 0.3 * uniform01(rng)});
        out.true_age_ma.push_back(age);
    }
    for (int h = 0; h < holes; ++h) {
        d.holes.push_back("H" + std::to_string(h));
        const double rate = 5.0 + 10.0 * uniform01(rng); // m per Myr
        std::vector<double> samples;
        for (std::size_t e = 0; e < d.events.size(); ++e) {
            const bool observed = uniform01(rng) < seen;
            const double depth = out.true_age_ma[e] * rate + scatter_m * (2 * uniform01(rng) - 1);
            const double up = half_width_m * uniform01(rng), down = half_width_m * uniform01(rng);
            const double where = uniform01(rng);
            if (!observed)
                continue;
            const double shallow = depth - up, deep = depth + down;
            d.levels.push_back(EventLevel{static_cast<std::size_t>(h), e, shallow, deep,
                                          shallow + where * (deep - shallow)});
            samples.push_back(shallow);
            samples.push_back(deep);
        }
        for (int s = 0; s < 12; ++s)
            samples.push_back(160.0 * uniform01(rng));
        std::sort(samples.begin(), samples.end());
        samples.erase(std::unique(samples.begin(), samples.end()), samples.end());
        d.sampled_levels_m.push_back(samples);
        d.surfaces_m.emplace_back();
    }
    return out;
}

/// The hard constraints, stated again here: a base before its top; dated horizons by age where
/// the ages differ by more than 2 sqrt(sd1^2 + sd2^2).
inline bool respectsHardConstraints(const CorrelationData& d,
                                    const std::vector<std::size_t>& order) {
    std::vector<std::size_t> rank(order.size());
    for (std::size_t i = 0; i < order.size(); ++i)
        rank[order[i]] = i;
    for (std::size_t a = 0; a < d.events.size(); ++a)
        for (std::size_t b = 0; b < d.events.size(); ++b) {
            const SequenceEvent &ea = d.events[a], &eb = d.events[b];
            if (ea.kind == SequenceEventKind::Base && eb.kind == SequenceEventKind::Top &&
                ea.taxon == eb.taxon && rank[a] > rank[b])
                return false;
            if (ea.kind == SequenceEventKind::Dated && eb.kind == SequenceEventKind::Dated) {
                const double sa = *ea.age_sd_ma, sb = *eb.age_sd_ma;
                if (*ea.age_ma - *eb.age_ma > 2 * std::sqrt(sa * sa + sb * sb) && rank[a] > rank[b])
                    return false;
            }
        }
    return true;
}

} // namespace seqtest
