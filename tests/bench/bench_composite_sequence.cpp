// Composite sequence benchmark: 100 holes x 500 taxa (1,000 events), invented seeded data.
// Prints the time to build the pair-cost matrix, annealing moves per second on one core
// (target >= 1,000,000), and the cost of evaluating a move's misfit incrementally against a
// full recompute, measured side by side in this run (target >= 50x).
#include "atollog/engine/composite_sequence.hpp"

#include "../../engine/src/composite_sequence_annealer.hpp"
#include "../../engine/src/composite_sequence_pairs.hpp"

#include <chrono>
#include <cstdio>
#include <random>
#include <string>
#include <vector>

using namespace atollog;

namespace {

double seconds(std::chrono::steady_clock::time_point t0) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

double uniform01(std::mt19937_64& rng) { return static_cast<double>(rng() >> 11) * 0x1.0p-53; }

/// 500 taxa with bases 1-20 Ma and ranges of 0.2-5 Myr; 100 holes at 20-60 m/Myr, each seeing
/// 60 % of the events at their true depth +- 4 m, brackets up to 1 m either side, samples about
/// every 1.5 m.
CorrelationData inventArchipelago(std::uint64_t seed) {
    std::mt19937_64 rng(seed);
    CorrelationData d;
    std::vector<double> age;
    for (int t = 0; t < 500; ++t) {
        const std::string name = "Taxon" + std::to_string(t);
        const double base = 1.0 + 19.0 * uniform01(rng);
        d.events.push_back({"B " + name, SequenceEventKind::Base, name, {}, {}});
        d.events.push_back({"T " + name, SequenceEventKind::Top, name, {}, {}});
        age.push_back(base);
        age.push_back(std::max(0.05, base - 0.2 - 4.8 * uniform01(rng)));
    }
    for (std::size_t h = 0; h < 100; ++h) {
        d.holes.push_back("Hole" + std::to_string(h));
        const double rate = 20.0 + 40.0 * uniform01(rng);
        std::vector<double> samples;
        for (double z = 0; z < 21.0 * rate; z += 1.5)
            samples.push_back(z);
        for (std::size_t e = 0; e < d.events.size(); ++e) {
            if (uniform01(rng) >= 0.6)
                continue;
            const double z = std::max(2.0, age[e] * rate + 8.0 * (uniform01(rng) - 0.5));
            const double shallow = z - uniform01(rng), deep = z + uniform01(rng);
            d.levels.push_back({h, e, shallow, deep, 0.5 * (shallow + deep)});
        }
        d.sampled_levels_m.push_back(samples);
        d.surfaces_m.emplace_back();
    }
    return d;
}

struct NoObserver {
    void operator()(const std::vector<std::size_t>&, std::size_t, std::size_t, double) const {}
};

} // namespace

int main() {
    const CorrelationData data = inventArchipelago(20240611);
    const std::size_t n = data.events.size();
    std::printf("composite sequence: %zu holes x %zu events, %zu observed levels\n",
                data.holes.size(), n, data.levels.size());

    auto t0 = std::chrono::steady_clock::now();
    std::vector<double> cost = detail::pairCostMatrix(data, MisfitUnit::Metres);
    const double t_matrix = seconds(t0);
    std::printf("  pair-cost matrix: %.3f s (%.1f MB of doubles)\n", t_matrix,
                static_cast<double>(n * n * sizeof(double)) / 1e6);

    detail::OrderRules rules = detail::hardOrderRules(data);
    const std::vector<std::size_t> start = detail::meanLevelStartOrder(data, rules);
    const double start_misfit = detail::misfitFromMatrix(cost, start);
    const detail::SequenceSearchSpace space =
        detail::makeSearchSpace(std::move(cost), std::move(rules));

    const std::int64_t moves = 5000000;
    t0 = std::chrono::steady_clock::now();
    const detail::RestartOutcome run =
        detail::annealRestart(space, start, start_misfit, 7, moves, NoObserver{});
    const double t_anneal = seconds(t0);
    std::printf("  annealing, 1 core: %.2f M moves/s (target >= 1 M/s); %lld moves, %.1f %% "
                "accepted; misfit %.1f m -> %.1f m\n",
                static_cast<double>(moves) / t_anneal / 1e6, static_cast<long long>(moves),
                100.0 * static_cast<double>(run.accepted) / static_cast<double>(moves),
                start_misfit, run.best_misfit);

    // Side by side on the best order: evaluating proposed moves by their delta (what the
    // annealer does) against making each move and recomputing the misfit in full.
    std::vector<std::size_t> order = run.best_order;
    std::mt19937_64 rng(99);
    const int n_inc = 2000000;
    double sink = 0;
    t0 = std::chrono::steady_clock::now();
    for (int i = 0; i < n_inc; ++i)
        sink += detail::proposeMove(space, order, rng).delta;
    const double per_inc = seconds(t0) / n_inc;
    const int n_full = 20;
    std::vector<double> full_matrix, full_reference;
    double per_matrix = 0, per_reference = 0;
    for (int i = 0; i < n_full; ++i) {
        const detail::SequenceMove m = detail::proposeMove(space, order, rng);
        std::vector<std::size_t> moved = order;
        detail::applyMove(moved, m);
        t0 = std::chrono::steady_clock::now();
        sink += sequenceMisfit(data, moved, MisfitUnit::Metres);
        per_reference += seconds(t0) / n_full;
        std::vector<double> c = detail::pairCostMatrix(data, MisfitUnit::Metres); // untimed
        t0 = std::chrono::steady_clock::now();
        sink += detail::misfitFromMatrix(c, moved);
        per_matrix += seconds(t0) / n_full;
    }
    std::printf("  misfit of a move: incremental %.1f ns; full recompute from the holes "
                "(sequenceMisfit) %.2f ms = %.0fx; full sum over the matrix %.3f ms = %.0fx "
                "(target >= 50x)\n",
                per_inc * 1e9, per_reference * 1e3, per_reference / per_inc, per_matrix * 1e3,
                per_matrix / per_inc);

    SequenceSettings s;
    s.restarts = 2;
    s.moves_per_restart = 2000000;
    for (int threads : {1, 2}) {
        s.threads = threads;
        t0 = std::chrono::steady_clock::now();
        const CompositeSequence r = buildCompositeSequence(data, s);
        std::printf("  buildCompositeSequence, %d restarts x %lld moves, %d thread(s): %.2f s "
                    "(matrix, annealing, near-best replay, extensions); misfit %.1f m, %zu "
                    "extensions\n",
                    s.restarts, static_cast<long long>(s.moves_per_restart), threads, seconds(t0),
                    r.misfit, r.extensions.size());
    }
    std::printf("  (checksum %.3g)\n", sink);
    return 0;
}
