#include "composite_sequence_annealer.hpp"

#include <cmath>
#include <utility>

namespace atollog::detail {

SequenceSearchSpace makeSearchSpace(std::vector<double> cost, OrderRules rules) {
    SequenceSearchSpace s;
    s.n = rules.n;
    for (std::size_t a = 0; a < s.n; ++a) {
        cost[a * s.n + a] = 0;
        for (std::size_t b = a + 1; b < s.n; ++b) {
            const double ab = cost[a * s.n + b], ba = cost[b * s.n + a];
            cost[a * s.n + b] = ba - ab;
            cost[b * s.n + a] = ab - ba;
        }
    }
    s.pass = std::move(cost);
    s.rules = std::move(rules);
    return s;
}

std::pair<double, double> annealingTemperatures(const SequenceSearchSpace& s,
                                                const std::vector<std::size_t>& order,
                                                std::mt19937_64& rng) {
    std::vector<double> sizes;
    for (int i = 0; i < 256; ++i) {
        const SequenceMove m = proposeMove(s, order, rng);
        if (m.to != m.from && m.delta != 0)
            sizes.push_back(std::fabs(m.delta));
    }
    if (sizes.empty())
        return {1.0, 1e-3};
    std::sort(sizes.begin(), sizes.end());
    const double median = sizes[sizes.size() / 2], low = sizes[sizes.size() / 10];
    const double t0 = median / std::log(2.0);
    const double t1 = std::min(low / std::log(1000.0), t0);
    return {t0, t1};
}

} // namespace atollog::detail
