#pragma once
// One seeded simulated-annealing run (Kirkpatrick, Gelatt & Vecchi 1983) over event orders.
// A move takes the event at one position and walks it toward a target position, a few places
// (three moves in four) or anywhere; the walk stops before an event the hard constraints forbid
// it to pass, so every visited order respects them, and adds up the misfit change from one
// matrix row as it goes: O(places passed), touching only the events passed. Metropolis
// acceptance; geometric cooling per move.
#include "composite_sequence_rules.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <random>
#include <utility>
#include <vector>

namespace atollog::detail {

/// What every restart reads (shared, read-only).
struct SequenceSearchSpace {
    std::size_t n = 0;
    /// pass[e * n + x] = C[x][e] - C[e][x]: the misfit change when e moves from before x to
    /// after x (its negative when e moves from after x to before x). n x n doubles.
    std::vector<double> pass;
    OrderRules rules;
};

/// Turns the pair-cost matrix C (pairCostMatrix) into the search space, in place, so that the
/// two n x n matrices never coexist.
SequenceSearchSpace makeSearchSpace(std::vector<double> cost, OrderRules rules);

struct RestartOutcome {
    std::vector<std::size_t> best_order;
    double best_misfit = 0;           ///< tracked incrementally
    double start_temperature = 0, end_temperature = 0;
    std::int64_t tried = 0, accepted = 0;
};

/// A proposed move: the event at `from` goes to `to` (== from: blocked at once), changing the
/// misfit by `delta`.
struct SequenceMove {
    std::size_t from = 0, to = 0;
    double delta = 0;
};

/// Draws one move from the current order.
inline SequenceMove proposeMove(const SequenceSearchSpace& s, const std::vector<std::size_t>& order,
                                std::mt19937_64& rng) {
    const std::size_t n = s.n;
    const std::size_t from = static_cast<std::size_t>(rng() % n);
    const std::uint64_t r = rng();
    std::size_t target;
    if ((r & 3) != 0) { // a few places: 1..8, either way, turned round at the ends
        const std::size_t d = 1 + static_cast<std::size_t>((r >> 2) & 7);
        const bool down = ((r >> 5) & 1) != 0;
        const std::size_t up_t = from >= d ? from - d : 0, down_t = std::min(from + d, n - 1);
        target = down ? (down_t != from ? down_t : up_t) : (up_t != from ? up_t : down_t);
    } else { // anywhere else, uniformly
        target = static_cast<std::size_t>((r >> 2) % (n - 1));
        if (target >= from)
            ++target;
    }
    const std::size_t e = order[from];
    const double* row = &s.pass[e * n];
    const std::uint8_t* rule = &s.rules.rule[e * n];
    SequenceMove m{from, from, 0.0};
    if (target > from) {
        while (m.to < target) {
            const std::size_t x = order[m.to + 1];
            if (rule[x] == OrderRules::kFirst) // e must stay before x
                break;
            m.delta += row[x];
            ++m.to;
        }
    } else {
        while (m.to > target) {
            const std::size_t x = order[m.to - 1];
            if (rule[x] == OrderRules::kSecond) // x must stay before e
                break;
            m.delta -= row[x];
            --m.to;
        }
    }
    return m;
}

inline void applyMove(std::vector<std::size_t>& order, const SequenceMove& m) {
    if (m.to > m.from)
        std::rotate(order.begin() + static_cast<std::ptrdiff_t>(m.from),
                    order.begin() + static_cast<std::ptrdiff_t>(m.from + 1),
                    order.begin() + static_cast<std::ptrdiff_t>(m.to + 1));
    else
        std::rotate(order.begin() + static_cast<std::ptrdiff_t>(m.to),
                    order.begin() + static_cast<std::ptrdiff_t>(m.from),
                    order.begin() + static_cast<std::ptrdiff_t>(m.from + 1));
}

/// Start and end temperatures from 256 moves proposed (not made) at the start: the start lets
/// a median uphill move through with probability 1/2, the end a move at the 10th percentile of
/// |delta| with probability 1/1000. Quantiles, not the mean: a few penalised pairs would
/// otherwise set the scale. All zero (the holes agree): any positive temperature will do.
std::pair<double, double> annealingTemperatures(const SequenceSearchSpace& s,
                                                const std::vector<std::size_t>& order,
                                                std::mt19937_64& rng);

/// Does nothing at the end of a block of moves (no progress wanted).
struct NoBlockEnd {
    void operator()() const {}
};

/// Runs `moves` proposals from `order` (which must respect the rules) with misfit `misfit`.
/// `observe(order, first, last, misfit)` sees the start (first 0, last n - 1) and every accepted
/// order, with the positions [first, last] whose events changed: the test hook for the
/// incremental misfit, and the near-best ranges' feed. The same seed gives the same run.
/// The moves are cut into `blocks` (1 <= blocks <= moves) runs of equal length (within one
/// move: block b ends at move moves * (b + 1) / blocks), and `block_end()` is called after each:
/// the progress hook. It may throw to stop the run; it cannot change it, since it sees nothing.
/// A run with fewer than two events makes no moves and calls it `blocks` times at once.
template <class Observer, class BlockEnd = NoBlockEnd>
RestartOutcome annealRestart(const SequenceSearchSpace& s, std::vector<std::size_t> order,
                             double misfit, std::uint64_t seed, std::int64_t moves,
                             Observer&& observe, BlockEnd&& block_end = BlockEnd{},
                             std::int64_t blocks = 1) {
    RestartOutcome out;
    out.best_order = order;
    out.best_misfit = misfit;
    auto all_blocks_end = [&] {
        for (std::int64_t b = 0; b < blocks; ++b)
            block_end();
    };
    if (s.n == 0) {
        all_blocks_end();
        return out;
    }
    observe(static_cast<const std::vector<std::size_t>&>(order), std::size_t{0}, s.n - 1, misfit);
    if (s.n < 2) {
        all_blocks_end();
        return out;
    }
    std::mt19937_64 rng(seed);
    const auto [t0, t1] = annealingTemperatures(s, order, rng);
    out.start_temperature = t0;
    out.end_temperature = t1;
    const double cooling = std::pow(t1 / t0, 1.0 / static_cast<double>(moves));
    double t = t0;
    std::int64_t k = 0;
    for (std::int64_t b = 0; b < blocks; ++b) {
        // The same moves, temperatures and draws in the same order as one loop over all moves:
        // the blocks only mark where the progress hook runs.
        const std::int64_t block_last = moves / blocks * (b + 1) + moves % blocks * (b + 1) / blocks;
        for (; k < block_last; ++k, t *= cooling) {
            const SequenceMove m = proposeMove(s, order, rng);
            ++out.tried;
            if (m.to == m.from)
                continue;
            if (m.delta > 0) {
                const double u = static_cast<double>(rng() >> 11) * 0x1.0p-53;
                if (!(u < std::exp(-m.delta / t)))
                    continue;
            }
            applyMove(order, m);
            misfit += m.delta;
            ++out.accepted;
            observe(static_cast<const std::vector<std::size_t>&>(order), std::min(m.from, m.to),
                    std::max(m.from, m.to), misfit);
            if (misfit < out.best_misfit) {
                out.best_misfit = misfit;
                out.best_order = order;
            }
        }
        block_end();
    }
    return out;
}

} // namespace atollog::detail
