#pragma once
// The range of ranks each event takes among near-best orders: fed every accepted order of a
// replayed restart, it records the ranks of those whose misfit is at most `threshold`.
#include <algorithm>
#include <climits>
#include <cstddef>
#include <vector>

namespace atollog::detail {

struct NearBestRanges {
    double threshold = 0;
    std::vector<int> low, high; ///< per event; INT_MAX / INT_MIN until seen
    bool last_was_near = false;

    NearBestRanges(std::size_t n, double limit)
        : threshold(limit), low(n, INT_MAX), high(n, INT_MIN) {}

    /// All ranks of `order`.
    void take(const std::vector<std::size_t>& order) { take(order, 0, order.size() - 1); }

    /// The annealer's observer. After a near-best order only the positions a move changed need
    /// looking at (the others hold the ranks already taken); after any other, all of them.
    void operator()(const std::vector<std::size_t>& order, std::size_t first, std::size_t last,
                    double misfit) {
        const bool near = misfit <= threshold;
        if (near)
            last_was_near ? take(order, first, last) : take(order);
        last_was_near = near;
    }

    void take(const std::vector<std::size_t>& order, std::size_t first, std::size_t last) {
        for (std::size_t i = first; i <= last && i < order.size(); ++i) {
            const int r = static_cast<int>(i);
            low[order[i]] = std::min(low[order[i]], r);
            high[order[i]] = std::max(high[order[i]], r);
        }
    }

    void merge(const NearBestRanges& o) {
        for (std::size_t e = 0; e < low.size(); ++e) {
            low[e] = std::min(low[e], o.low[e]);
            high[e] = std::max(high[e], o.high[e]);
        }
    }
};

} // namespace atollog::detail
