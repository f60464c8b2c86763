#pragma once
// The composite sequence: one order of all events (oldest first) that the holes contradict
// least, found by constrained optimisation (Kemple, Sadler & Strauss 1995) with simulated
// annealing (Kirkpatrick, Gelatt & Vecchi 1983) over orders.
//
// Misfit (our pairwise form). For two events A and B both observed in hole h, with A placed
// before (older than) B in the order: if A's bracket lies wholly above B's, the pair is
// inverted by the gap g = B.shallow_m - A.deep_m > 0. It costs the smallest one-sided move that
// resolves it in h: A moving down by g if A is a base, or B moving up by g if B is a top (bases
// only move down, tops only up, dated horizons never). If neither may move, the pair is
// infeasible in h and costs its unit cost times kInfeasiblePairPenalty. Overlapping brackets
// cost nothing. Unit cost: Metres g; Levels the number of h's sampled levels strictly between
// the two brackets (at least 1); Inversions 1. The misfit is the sum over holes and over
// ordered pairs.
//
// Why pairwise: the misfit of the original method is the total range extension a section needs
// to follow the order, a placement problem over all of the section's events at once. Summed over
// pairs instead, the misfit of an order is sum_{i<j} C[order[i]][order[j]] for a matrix C
// computed once, so moving one event k places changes it by k looked-up terms: the annealer
// touches only the events a move passes. The price: one long extension that resolves several
// inversions is counted once per pair, so a pair sum weighs an event out of place in many
// pairs more than the placement would. The extensions reported for the best order are computed
// exactly by placement (see HoleExtension).
#include "atollog/engine/correlation_data.hpp"
#include "atollog/engine/work_progress.hpp"

#include <cstddef>
#include <cstdint>
#include <vector>

namespace atollog {

enum class MisfitUnit { Metres, Levels, Inversions };

/// The factor on the unit cost of a pair no one-sided move can resolve in a hole (e.g. a dated
/// horizon above a younger base). Large, so that the search resolves every feasible inversion
/// before it accepts an infeasible one, but finite, so that data that contradict themselves
/// still give an order and a number (and the annealing temperature stays usable).
inline constexpr double kInfeasiblePairPenalty = 1000.0;

struct SequenceSettings {
    MisfitUnit unit = MisfitUnit::Metres;
    std::uint64_t seed = 1;
    int restarts = 4;                      ///< independent seeded annealing runs; the best is kept
    std::int64_t moves_per_restart = 200000;
    /// An order within this fraction of the best misfit counts as near-best.
    double near_best_tolerance = 0.02;
    int threads = 1;                       ///< restarts in parallel; never changes the result
};

/// One range extension the best order needs in one hole. The hole's events are placed at depths
/// that follow the composite order (older not shallower than younger), each base at or below its
/// observed level, each top at or above it, dated horizons at theirs, with the least summed
/// distance moved (an exact L1 placement: pool-adjacent-violators with weighted medians).
struct HoleExtension {
    std::size_t hole = 0, event = 0;
    double observed_m = 0;  ///< the event's observed level (EventLevel::level_m)
    double placed_m = 0;    ///< where the order puts it in this hole
    double extension_m = 0; ///< |placed_m - observed_m| > 0
    /// The hole cannot follow the order by one-sided moves alone, and this event had to move the
    /// way it may not (a base up, a top down, a dated horizon at all); the placement costs such a
    /// move kInfeasiblePairPenalty per metre, as the misfit does.
    bool forced = false;
};

struct CompositeSequence {
    std::vector<std::size_t> order;                 ///< every event, oldest first
    double misfit = 0;                              ///< in settings.unit, sequenceMisfit(order)
    /// Per event index: the range of its rank (0-based) among the near-best orders the search
    /// visited (accepted states within near_best_tolerance of the best misfit, on any restart).
    /// A range, not a confidence interval: orders never visited do not widen it.
    std::vector<int> position_min, position_max;
    /// Per hole, the range extensions the best order needs (bases down, tops up), non-zero ones
    /// only, by hole and then by order.
    std::vector<HoleExtension> extensions;
    std::vector<double> restart_misfits; ///< each restart's best, sequenceMisfit of its order
    std::uint64_t seed = 0;
    /// Summed over restarts; tried counts every proposal, also one a hard constraint blocked
    /// before it moved (the near-best replay is not counted).
    std::int64_t moves_tried = 0, moves_accepted = 0;
};

/// Full recompute of the misfit of an order (the reference the incremental update is checked
/// against): O(sum over holes of observed events squared). Throws std::invalid_argument on
/// invalid data or an order that is not a permutation of all events.
double sequenceMisfit(const CorrelationData& data, const std::vector<std::size_t>& order,
                      MisfitUnit unit);

/// Searches for the order of least misfit under the hard constraints: each taxon's base
/// precedes its top, and dated horizons keep the order of their ages where they differ by more
/// than two combined sds. `start_order` (empty: our own start, events by their mean relative
/// depth in the holes, deepest first) is made to respect them: events taken in its order
/// wherever the constraints allow (e.g. the event-order graph's first composite, which orders
/// dated horizons by the holes, not by their ages).
/// Each restart anneals from that start with its own std::mt19937_64 seeded by
/// streamSeed(seed, restart index): moves relocate one event a few places or anywhere, stopping
/// before an event the constraints forbid it to pass; Metropolis acceptance; geometric cooling
/// per move between temperatures set from the |misfit change| of 256 trial moves. The best
/// restart wins (ties: the lower index). The near-best ranges come from replaying the restarts
/// that came within the tolerance, once the overall best is known (a replay costs as much as the
/// run). Memory: one events x events matrix of doubles (1,000 events: 8 MB) and one of bytes
/// (1 MB), shared by all restarts. Throws std::invalid_argument naming the setting or entry at
/// fault (restarts, moves_per_restart, threads < 1; a negative or non-finite tolerance; a taxon
/// with two bases or two tops; a start_order that is no permutation of the events).
/// `progress` hears of each block of annealing moves: every restart's moves are cut into equal
/// blocks (about 64 over all restarts, at least one per restart), counted for the first pass
/// and again for the near-best replay (2 x restarts x blocks in all; a restart that needs no
/// replay has its replay blocks counted done as soon as that is known). It never changes the
/// result; when it returns false the search stops at the next block boundary of any thread and
/// throws WorkStopped.
CompositeSequence buildCompositeSequence(const CorrelationData& data,
                                         const SequenceSettings& settings,
                                         const std::vector<std::size_t>& start_order = {},
                                         const WorkProgress& progress = {});

} // namespace atollog
