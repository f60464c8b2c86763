// buildCompositeSequence: checks, the shared search space, seeded restarts (in parallel when
// asked; each restart's stream depends only on the seed and its index, so the thread count never
// changes a bit), the near-best ranges by replay, and the extensions of the best order.
#include "atollog/engine/composite_sequence.hpp"

#include "atollog/engine/number_text.hpp"
#include "atollog/engine/seeded_draws.hpp"

#include "composite_sequence_annealer.hpp"
#include "composite_sequence_pairs.hpp"
#include "composite_sequence_placement.hpp"
#include "composite_sequence_ranges.hpp"
#include "parallel_blocks.hpp"
#include "progress_counter.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>
#include <utility>

namespace atollog {

namespace {

void checkSettings(const SequenceSettings& s) {
    auto fail = [](const std::string& what) {
        throw std::invalid_argument("composite sequence: " + what);
    };
    if (s.restarts < 1)
        fail("SequenceSettings.restarts is " + std::to_string(s.restarts) + "; give 1 or more");
    if (s.moves_per_restart < 1)
        fail("SequenceSettings.moves_per_restart is " + std::to_string(s.moves_per_restart) +
             "; give 1 or more");
    if (!std::isfinite(s.near_best_tolerance) || s.near_best_tolerance < 0)
        fail("SequenceSettings.near_best_tolerance is " + numberText(s.near_best_tolerance) +
             "; give a finite fraction >= 0");
    if (s.threads < 1)
        fail("SequenceSettings.threads is " + std::to_string(s.threads) + "; give 1 or more");
    if (s.unit != MisfitUnit::Metres && s.unit != MisfitUnit::Levels &&
        s.unit != MisfitUnit::Inversions)
        fail("SequenceSettings.unit is not a MisfitUnit");
}

struct NoObserver {
    void operator()(const std::vector<std::size_t>&, std::size_t, std::size_t, double) const {}
};

/// Progress blocks per restart: about 64 blocks over the whole first pass, so that the bar
/// moves in small steps also with the default 4 restarts (16 blocks of 12,500 moves each);
/// one block per restart from 64 restarts up. Never more blocks than moves. Blocks are equal
/// runs of moves, and a move costs the same on average wherever it falls in a run (the same
/// proposal rule throughout; only the acceptance changes with the temperature).
std::int64_t progressBlocksPerRestart(const SequenceSettings& s) {
    constexpr std::int64_t kBlocksOverAllRestarts = 64;
    const std::int64_t per = (kBlocksOverAllRestarts + s.restarts - 1) / s.restarts;
    return std::max<std::int64_t>(1, std::min(per, s.moves_per_restart));
}

} // namespace

CompositeSequence buildCompositeSequence(const CorrelationData& data,
                                         const SequenceSettings& settings,
                                         const std::vector<std::size_t>& start_order,
                                         const WorkProgress& progress) {
    validateCorrelationData(data);
    checkSettings(settings);
    detail::OrderRules rules = detail::hardOrderRules(data);
    std::vector<std::size_t> start = start_order;
    if (start.empty())
        start = detail::meanLevelStartOrder(data, rules);
    else
        start = detail::repairedStartOrder(data, rules, start);

    std::vector<double> cost = detail::pairCostMatrix(data, settings.unit);
    const double start_misfit = detail::misfitFromMatrix(cost, start);
    const detail::SequenceSearchSpace space =
        detail::makeSearchSpace(std::move(cost), std::move(rules));

    const std::size_t restarts = static_cast<std::size_t>(settings.restarts);
    auto restartSeed = [&](std::size_t r) { return streamSeed(settings.seed, r); };
    // Progress: every restart's moves in equal blocks, first pass and near-best replay alike;
    // a restart that needs no replay counts its replay's blocks as done once that is known.
    const std::int64_t blocks = progressBlocksPerRestart(settings);
    detail::ProgressCounter counter(progress, 2 * restarts * static_cast<std::size_t>(blocks));
    auto blockDone = [&counter] { counter.advance(); };
    std::vector<detail::RestartOutcome> runs(restarts);
    detail::runBlocks(restarts, settings.threads, [&](std::size_t r, std::size_t) {
        runs[r] = detail::annealRestart(space, start, start_misfit, restartSeed(r),
                                        settings.moves_per_restart, NoObserver{}, blockDone,
                                        blocks);
    });

    CompositeSequence out;
    out.seed = settings.seed;
    const auto holes = detail::observationsByHole(data);
    std::size_t best = 0;
    std::vector<std::size_t> rank(space.n);
    for (std::size_t r = 0; r < restarts; ++r) {
        for (std::size_t i = 0; i < space.n; ++i)
            rank[runs[r].best_order[i]] = i;
        out.restart_misfits.push_back(detail::misfitFromObservations(holes, rank, settings.unit));
        out.moves_tried += runs[r].tried;
        out.moves_accepted += runs[r].accepted;
        if (out.restart_misfits[r] < out.restart_misfits[best])
            best = r;
    }
    out.order = runs[best].best_order;
    out.misfit = out.restart_misfits[best];

    // Near-best ranges need the overall best, known only now: replay the restarts that came
    // near it. A restart's run is a function of its seed alone, so the replay visits exactly the
    // states the first pass did. The slack absorbs the rounding of the incremental sums.
    const double threshold = out.misfit * (1 + settings.near_best_tolerance) +
                             1e-9 * (1 + std::fabs(out.misfit));
    std::vector<std::size_t> replays;
    for (std::size_t r = 0; r < restarts; ++r)
        if (runs[r].best_misfit <= threshold)
            replays.push_back(r);
    for (std::size_t r = replays.size(); r < restarts; ++r)
        for (std::int64_t b = 0; b < blocks; ++b)
            counter.advance();
    std::vector<detail::NearBestRanges> ranges(replays.size(),
                                               detail::NearBestRanges(space.n, threshold));
    detail::runBlocks(replays.size(), settings.threads, [&](std::size_t i, std::size_t) {
        detail::annealRestart(space, start, start_misfit, restartSeed(replays[i]),
                              settings.moves_per_restart, ranges[i], blockDone, blocks);
    });
    detail::NearBestRanges all(space.n, threshold);
    if (space.n > 0)
        all.take(out.order); // the best order itself always counts
    for (const auto& r : ranges)
        all.merge(r);
    out.position_min = std::move(all.low);
    out.position_max = std::move(all.high);

    out.extensions = detail::holeExtensions(data, out.order);
    return out;
}

} // namespace atollog
