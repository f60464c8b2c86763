// The age model's passes over Gibbs draws: a pilot that finds the histogram ranges, and the main
// pass that feeds every kept draw, with weight 1, into the streaming quantiles.
#include "atollog/engine/age_model.hpp"

#include "age_model_gibbs.hpp"
#include "age_model_inputs.hpp"
#include "age_model_outliers.hpp"
#include "age_model_quantities.hpp"
#include "age_model_tails.hpp"
#include "age_profile.hpp"
#include "draw_seeds.hpp"
#include "parallel_blocks.hpp"
#include "progress_counter.hpp"

#include "atollog/engine/streaming_quantiles.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace atollog {

namespace {

using namespace atollog::detail;

/// Kept draws per chain: fixed, so the result never depends on the thread count. Each chain
/// pays its burn-in once; 512 keeps that cost near a fifth of the kept sweeps at the defaults.
constexpr std::size_t kChainDraws = 512;
/// Draws whose grid ages are buffered before they go into the histograms column by column
/// (each column's histogram row is then fetched once per buffer).
constexpr std::size_t kBufferDraws = 512;
constexpr int kBins = 512;
constexpr std::size_t kPilotDraws = 1024;

struct MinMax {
    std::vector<double> lo, hi;
    explicit MinMax(std::size_t n)
        : lo(n, std::numeric_limits<double>::infinity()),
          hi(n, -std::numeric_limits<double>::infinity()) {}
    void add(std::size_t c, double v) {
        lo[c] = std::min(lo[c], v);
        hi[c] = std::max(hi[c], v);
    }
    void merge(const MinMax& o) {
        for (std::size_t c = 0; c < lo.size(); ++c) {
            lo[c] = std::min(lo[c], o.lo[c]);
            hi[c] = std::max(hi[c], o.hi[c]);
        }
    }
    /// Ranges 5 % wider than seen each side; a column seen at one value gets a tiny range.
    std::vector<QuantileRange> ranges() const {
        std::vector<QuantileRange> r(lo.size());
        for (std::size_t c = 0; c < lo.size(); ++c) {
            if (!(hi[c] >= lo[c])) {
                r[c] = {0.0, 1.0};
                continue;
            }
            const double pad = std::max(0.05 * (hi[c] - lo[c]), 1e-9 * (1 + std::fabs(lo[c])));
            r[c] = {lo[c] - pad, hi[c] + pad};
        }
        return r;
    }
};

/// Histogram columns: grid nodes, hiatuses, rates, tie ages, tie depths.
struct Columns {
    std::vector<QuantileRange> grid, hiatus, rates, tie_age, tie_depth;
};

/// Runs chain `chain` of `stream`: initial state, burn-in, then `count` kept draws, each
/// `thin` sweeps apart, handed to on_draw(j, state).
template <class OnDraw>
void runChain(const PreparedModel& m, const AgeModelSettings& s, DrawStream stream,
              std::size_t chain, std::size_t count, TieDraw& state, OnDraw&& on_draw) {
    std::mt19937_64 rng(blockSeed(s.seed, stream, chain));
    // The shares between surfaces are no part of the ties' target: a stream of their own keeps
    // the ties' draws what they are without surfaces.
    std::mt19937_64 split_rng(blockSeed(s.seed ^ 0x5b1175ULL, stream, chain));
    initialGibbsState(m.ties, state);
    state.split_u.assign(m.surfaces_m.size(), 0.5);
    for (int k = 0; k < s.burn_in_sweeps; ++k)
        gibbsSweep(m.ties, rng, state);
    for (std::size_t j = 0; j < count; ++j) {
        for (int k = 0; k < s.thin; ++k)
            gibbsSweep(m.ties, rng, state);
        for (double& u : state.split_u)
            u = openUniform(split_rng);
        on_draw(j, state);
    }
}

std::size_t chainsFor(std::size_t n) { return (n + kChainDraws - 1) / kChainDraws; }
std::size_t chainCount(std::size_t n, std::size_t chain) {
    return std::min(n, (chain + 1) * kChainDraws) - chain * kChainDraws;
}

/// Pilot run (its own stream): the histogram ranges.
Columns pilotColumns(const PreparedModel& m, const AgeModelSettings& s, ProgressCounter& progress) {
    const std::size_t n = std::min(static_cast<std::size_t>(s.draws), kPilotDraws);
    const std::size_t chains = chainsFor(n);
    const std::size_t threads =
        std::min<std::size_t>(static_cast<std::size_t>(s.threads), chains);
    const std::size_t ties = m.ties.size();
    std::vector<MinMax> grid(threads, MinMax(m.nodes.size())),
        hiatus(threads, MinMax(m.surfaces_m.size())), rates(threads, MinMax(rateColumns(m))),
        tie_age(threads, MinMax(ties)), tie_depth(threads, MinMax(ties));
    std::vector<AgeProfile> profiles(threads);
    std::vector<TieDraw> states(threads);
    std::vector<std::vector<double>> ages(threads, std::vector<double>(m.nodes.size()));
    runBlocks(chains, static_cast<int>(threads), [&](std::size_t c, std::size_t t) {
        runChain(m, s, DrawStream::Pilot, c, chainCount(n, c), states[t],
                 [&](std::size_t, const TieDraw& d) {
                     profiles[t].build(d, m.surfaces_m);
                     profiles[t].ageAtNodes(m.nodes, ages[t].data(), 1);
                     for (std::size_t i = 0; i < m.nodes.size(); ++i)
                         grid[t].add(i, ages[t][i]);
                     for (std::size_t i = 0; i < ties; ++i) {
                         tie_age[t].add(i, d.age_ma[i]);
                         tie_depth[t].add(i, d.depth_m[i]);
                     }
                     forEachDrawQuantity(
                         m, d, profiles[t],
                         [&](std::size_t k, double v) { hiatus[t].add(k, v); },
                         [&](std::size_t k, double v) { rates[t].add(k, v); });
                 });
        progress.advance();
    });
    for (std::size_t t = 1; t < threads; ++t) {
        grid[0].merge(grid[t]);
        hiatus[0].merge(hiatus[t]);
        rates[0].merge(rates[t]);
        tie_age[0].merge(tie_age[t]);
        tie_depth[0].merge(tie_depth[t]);
    }
    return {grid[0].ranges(), hiatus[0].ranges(), rates[0].ranges(), tie_age[0].ranges(),
            tie_depth[0].ranges()};
}

struct PassResult {
    StreamingQuantiles grid, hiatus, rates, tie_age, tie_depth;
    std::vector<std::uint64_t> hiatus_positive;

    explicit PassResult(const Columns& c)
        : grid(c.grid, kBins), hiatus(c.hiatus, kBins), rates(c.rates, kBins),
          tie_age(c.tie_age, kBins), tie_depth(c.tie_depth, kBins),
          hiatus_positive(c.hiatus.size(), 0) {}
    void merge(const PassResult& o) {
        grid.merge(o.grid);
        hiatus.merge(o.hiatus);
        rates.merge(o.rates);
        tie_age.merge(o.tie_age);
        tie_depth.merge(o.tie_depth);
        for (std::size_t k = 0; k < hiatus_positive.size(); ++k)
            hiatus_positive[k] += o.hiatus_positive[k];
    }
};

/// The main pass: every kept draw, weight 1, into the streaming quantiles; ages at the kept
/// depths stored per draw.
PassResult mainPass(const PreparedModel& m, const AgeModelSettings& s, const Columns& columns,
                    std::vector<std::vector<double>>& kept, ProgressCounter& progress) {
    const std::size_t n = static_cast<std::size_t>(s.draws);
    const std::size_t chains = chainsFor(n);
    const std::size_t threads =
        std::min<std::size_t>(static_cast<std::size_t>(s.threads), chains);
    const std::size_t nodes = m.nodes.size();
    std::vector<PassResult> acc(threads, PassResult(columns));
    std::vector<std::vector<double>> buffers(threads, std::vector<double>(nodes * kBufferDraws));
    std::vector<TieDraw> states(threads);
    std::vector<AgeProfile> profiles(threads);
    runBlocks(chains, static_cast<int>(threads), [&](std::size_t c, std::size_t t) {
        PassResult& a = acc[t];
        double* buffer = buffers[t].data();
        std::size_t buffered = 0;
        // Draw-major buffer (each draw's ages written contiguously), read column by column:
        // one histogram row stays in cache for the whole buffer, and the strided reads walk
        // cache lines that the neighbouring columns reuse. Node-major writes, one cache line per
        // node per draw, were the slower half.
        auto flush = [&] {
            for (std::size_t i = 0; i < nodes; ++i)
                a.grid.addMany(i, buffer + i, buffered, nodes, 1);
            buffered = 0;
        };
        const std::size_t first = c * kChainDraws;
        runChain(m, s, DrawStream::Main, c, chainCount(n, c), states[t],
                 [&](std::size_t j, const TieDraw& d) {
                     AgeProfile& p = profiles[t];
                     p.build(d, m.surfaces_m);
                     p.ageAtNodes(m.nodes, buffer + buffered * nodes, 1);
                     if (++buffered == kBufferDraws)
                         flush();
                     for (std::size_t k = 0; k < m.kept_m.size(); ++k)
                         kept[k][first + j] = p.ageAt(m.kept_m[k], false);
                     for (std::size_t i = 0; i < m.ties.size(); ++i) {
                         a.tie_age.add(i, d.age_ma[i], 1);
                         a.tie_depth.add(i, d.depth_m[i], 1);
                     }
                     forEachDrawQuantity(
                         m, d, p,
                         [&](std::size_t k, double v) {
                             a.hiatus.add(k, v, 1);
                             a.hiatus_positive[k] += v > 0 ? 1 : 0;
                         },
                         [&](std::size_t k, double v) { a.rates.add(k, v, 1); });
                 });
        flush();
        progress.advance();
    });
    for (std::size_t t = 1; t < threads; ++t)
        acc[0].merge(acc[t]);
    return std::move(acc[0]);
}

} // namespace

AgeModel buildAgeModel(const std::string& hole, std::vector<AgeTie> ties,
                       const AgeModelSettings& settings,
                       const std::vector<double>& keep_draws_at_m, const WorkProgress& report) {
    const PreparedModel m = prepareAgeModel(hole, ties, settings, keep_draws_at_m);
    const std::size_t n = static_cast<std::size_t>(settings.draws);
    // Blocks: the pilot's chains, the main pass's chains, one leave-one-out run per tie.
    const std::size_t outlier_blocks = settings.outlier_draws > 0 ? outlierRuns(m.ties) : 0;
    ProgressCounter progress(report, chainsFor(std::min(n, kPilotDraws)) + chainsFor(n) +
                                         outlier_blocks);
    const Columns columns = pilotColumns(m, settings, progress);
    std::vector<std::vector<double>> kept(m.kept_m.size(), std::vector<double>(n));
    const PassResult pass = mainPass(m, settings, columns, kept, progress);
    const double total = static_cast<double>(n);

    AgeModel out;
    out.hole = hole;
    out.seed = settings.seed;
    out.draws = settings.draws;
    out.draws_used = n;
    out.effective_draws = total;
    // The chance that independent draws of all ties come out in order, estimated by the
    // importance-weighted independent sampler (age_model_draw.hpp) on its own stream.
    out.log10_acceptance = log10MeanWeight(m.ties, -1, settings.acceptance_draws, settings.seed);
    out.acceptance_rate = std::pow(10.0, out.log10_acceptance);

    for (std::size_t i = 0; i < m.nodes.size(); ++i)
        out.grid.push_back({m.nodes[i].depth_m, m.nodes[i].above_surface,
                            pass.grid.quantile(i, 0.025), pass.grid.quantile(i, 0.5),
                            pass.grid.quantile(i, 0.975), pass.grid.mean(i)});

    for (std::size_t k = 0; k < m.surfaces_m.size(); ++k) {
        HiatusEstimate h;
        h.depth_m = m.surfaces_m[k];
        const std::uint64_t w = pass.hiatus.totalWeight(k);
        h.resolved_share = static_cast<double>(w) / total;
        if (w > 0) {
            h.duration_q025_myr = pass.hiatus.quantile(k, 0.025);
            h.duration_q500_myr = pass.hiatus.quantile(k, 0.5);
            h.duration_q975_myr = pass.hiatus.quantile(k, 0.975);
            h.probability_positive =
                static_cast<double>(pass.hiatus_positive[k]) / static_cast<double>(w);
        }
        out.hiatuses.push_back(h);
    }

    auto rate = [&](std::size_t c, AccretionRate r) {
        const std::uint64_t w = pass.rates.totalWeight(c);
        r.defined_share = static_cast<double>(w) / total;
        if (w > 0) {
            r.rate_q025_m_per_myr = pass.rates.quantile(c, 0.025);
            r.rate_q500_m_per_myr = pass.rates.quantile(c, 0.5);
            r.rate_q975_m_per_myr = pass.rates.quantile(c, 0.975);
        }
        completeAccretionRate(r);
        out.rates.push_back(std::move(r));
    };
    for (std::size_t t = 0; t + 1 < m.ties.size(); ++t) {
        AccretionRate r;
        r.label = m.ties[t].label + " .. " + m.ties[t + 1].label;
        r.top_m = 0.5 * (m.ties[t].shallow_m + m.ties[t].deep_m);
        r.base_m = 0.5 * (m.ties[t + 1].shallow_m + m.ties[t + 1].deep_m);
        rate(t, r);
    }
    for (std::size_t i = 0; i < m.intervals.size(); ++i) {
        AccretionRate r;
        r.label = m.intervals[i].label;
        r.between_ties = false;
        r.reef_framework = m.intervals[i].reef_framework;
        r.top_m = m.intervals[i].top_m;
        r.base_m = m.intervals[i].base_m;
        rate(m.ties.size() - 1 + i, r);
    }

    for (std::size_t i = 0; i < m.ties.size(); ++i)
        out.tie_tails.push_back(tieTail(m.ties[i], pass.tie_depth.quantile(i, 0.5),
                                        pass.tie_age.quantile(i, 0.5)));
    rankTieTails(out.tie_tails);

    out.kept_depths_m = m.kept_m;
    out.kept_age_draws_ma = std::move(kept);
    out.draw_weights.assign(n, 1.0 / total);

    if (settings.outlier_draws > 0)
        out.outlier_ranking =
            rankTieInfluence(m.ties, settings.outlier_draws, settings.seed, settings.threads,
                             &progress);
    return out;
}

} // namespace atollog
