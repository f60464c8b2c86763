#include "atollog/engine/age_model.hpp"

#include "age_model_draw.hpp"
#include "age_model_inputs.hpp"
#include "age_model_outliers.hpp"
#include "age_model_quantities.hpp"
#include "age_profile.hpp"
#include "draw_seeds.hpp"
#include "parallel_blocks.hpp"

#include "atollog/engine/streaming_quantiles.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <stdexcept>

namespace atollog {

namespace {

using namespace atollog::detail;

constexpr std::size_t kBlockDraws = 64; ///< fixed: the result never depends on threads
constexpr int kBins = 512;
constexpr int kPilotDraws = 1024;
constexpr double kWeightScale = 0x1.0p40; ///< a draw's weight in integer units, at most 2^40
/// The reference weight sits e^8 above the pilot's best draw, so later draws rarely beat it
/// (then the main pass reruns with the true maximum); weights below 2^-40 of it count as 0.
constexpr double kPilotMargin = 8.0;
/// Pilot draws this far below the pilot's best (log) do not widen the histogram ranges.
constexpr double kPilotRangeCut = 20.0;

__extension__ typedef unsigned __int128 U128;

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

struct Ranges {
    std::vector<QuantileRange> grid, hiatus, rates;
    double log_weight_max = 0;
};

/// Pilot run: the reference weight and the histogram ranges.
Ranges pilotRanges(const PreparedModel& m, const AgeModelSettings& s) {
    const std::size_t n = static_cast<std::size_t>(std::min(s.draws, kPilotDraws));
    const std::size_t blocks = (n + kBlockDraws - 1) / kBlockDraws;
    std::vector<TieDraw> draws(n);
    runBlocks(blocks, s.threads, [&](std::size_t b, std::size_t) {
        std::mt19937_64 rng(blockSeed(s.seed, DrawStream::Pilot, b));
        for (std::size_t j = b * kBlockDraws; j < std::min(n, (b + 1) * kBlockDraws); ++j)
            drawTies(m.ties, rng, draws[j]);
    });
    Ranges out;
    out.log_weight_max = -std::numeric_limits<double>::infinity();
    for (const TieDraw& d : draws)
        out.log_weight_max = std::max(out.log_weight_max, d.log_weight);
    if (!std::isfinite(out.log_weight_max))
        return out;
    const std::size_t threads = static_cast<std::size_t>(s.threads);
    std::vector<MinMax> grid(threads, MinMax(m.nodes.size()));
    std::vector<MinMax> hiatus(threads, MinMax(m.surfaces_m.size()));
    std::vector<MinMax> rates(threads, MinMax(rateColumns(m)));
    std::vector<AgeProfile> profiles(threads);
    std::vector<std::vector<double>> ages(threads, std::vector<double>(m.nodes.size()));
    runBlocks(blocks, s.threads, [&](std::size_t b, std::size_t t) {
        for (std::size_t j = b * kBlockDraws; j < std::min(n, (b + 1) * kBlockDraws); ++j) {
            if (draws[j].log_weight < out.log_weight_max - kPilotRangeCut)
                continue;
            profiles[t].build(draws[j], m.surfaces_m);
            profiles[t].ageAtNodes(m.nodes, ages[t].data(), 1);
            for (std::size_t i = 0; i < m.nodes.size(); ++i)
                grid[t].add(i, ages[t][i]);
            forEachDrawQuantity(
                m, draws[j], profiles[t], [&](std::size_t k, double v) { hiatus[t].add(k, v); },
                [&](std::size_t c, double v) { rates[t].add(c, v); });
        }
    });
    for (std::size_t t = 1; t < threads; ++t) {
        grid[0].merge(grid[t]);
        hiatus[0].merge(hiatus[t]);
        rates[0].merge(rates[t]);
    }
    out.grid = grid[0].ranges();
    out.hiatus = hiatus[0].ranges();
    out.rates = rates[0].ranges();
    return out;
}

struct PassResult {
    StreamingQuantiles grid, hiatus, rates;
    std::vector<std::uint64_t> hiatus_positive;
    std::uint64_t weight_sum = 0;
    U128 weight_sq_sum = 0;
    std::size_t used = 0;
    double log_weight_max = -std::numeric_limits<double>::infinity();

    explicit PassResult(const Ranges& r)
        : grid(r.grid, kBins), hiatus(r.hiatus, kBins), rates(r.rates, kBins),
          hiatus_positive(r.hiatus.size(), 0) {}
    void merge(const PassResult& o) {
        grid.merge(o.grid);
        hiatus.merge(o.hiatus);
        rates.merge(o.rates);
        for (std::size_t k = 0; k < hiatus_positive.size(); ++k)
            hiatus_positive[k] += o.hiatus_positive[k];
        weight_sum += o.weight_sum;
        weight_sq_sum += o.weight_sq_sum;
        used += o.used;
        log_weight_max = std::max(log_weight_max, o.log_weight_max);
    }
};

std::uint64_t integerWeight(double log_weight, double log_reference) {
    const double x = log_weight - log_reference;
    if (x >= 0)
        return static_cast<std::uint64_t>(kWeightScale);
    return static_cast<std::uint64_t>(std::llround(std::exp(x) * kWeightScale));
}

/// The main pass: every draw, weighted against log_reference, into streaming quantiles.
PassResult mainPass(const PreparedModel& m, const AgeModelSettings& s, const Ranges& ranges,
                    double log_reference, std::vector<std::uint64_t>& weights,
                    std::vector<std::vector<double>>& kept) {
    const std::size_t n = static_cast<std::size_t>(s.draws);
    const std::size_t blocks = (n + kBlockDraws - 1) / kBlockDraws;
    const std::size_t threads = std::min<std::size_t>(static_cast<std::size_t>(s.threads), blocks);
    const std::size_t nodes = m.nodes.size();
    std::vector<PassResult> acc(threads, PassResult(ranges));
    std::vector<std::vector<double>> buffers(threads, std::vector<double>(nodes * kBlockDraws));
    std::vector<TieDraw> draws(threads);
    std::vector<AgeProfile> profiles(threads);
    runBlocks(blocks, static_cast<int>(threads), [&](std::size_t b, std::size_t t) {
        std::mt19937_64 rng(blockSeed(s.seed, DrawStream::Main, b));
        PassResult& a = acc[t];
        double* buffer = buffers[t].data();
        std::uint64_t block_w[kBlockDraws] = {};
        const std::size_t first = b * kBlockDraws;
        const std::size_t count = std::min(n, first + kBlockDraws) - first;
        for (std::size_t j = 0; j < count; ++j) {
            TieDraw& d = draws[t];
            drawTies(m.ties, rng, d);
            a.log_weight_max = std::max(a.log_weight_max, d.log_weight);
            const std::uint64_t w = integerWeight(d.log_weight, log_reference);
            block_w[j] = w;
            weights[first + j] = w;
            a.weight_sum += w;
            a.weight_sq_sum += static_cast<U128>(w) * w;
            a.used += w > 0;
            AgeProfile& p = profiles[t];
            p.build(d, m.surfaces_m);
            p.ageAtNodes(m.nodes, buffer + j, kBlockDraws);
            for (std::size_t k = 0; k < m.kept_m.size(); ++k)
                kept[k][first + j] = p.ageAt(m.kept_m[k], false);
            if (w == 0)
                continue;
            forEachDrawQuantity(
                m, d, p,
                [&](std::size_t k, double v) {
                    a.hiatus.add(k, v, w);
                    a.hiatus_positive[k] += v > 0 ? w : 0;
                },
                [&](std::size_t c, double v) { a.rates.add(c, v, w); });
        }
        // Column by column: one histogram row stays in cache for the whole block.
        for (std::size_t i = 0; i < nodes; ++i)
            for (std::size_t j = 0; j < count; ++j)
                a.grid.add(i, buffer[i * kBlockDraws + j], block_w[j]);
    });
    for (std::size_t t = 1; t < threads; ++t)
        acc[0].merge(acc[t]);
    return std::move(acc[0]);
}

[[noreturn]] void failNoOrder(const std::string& hole, const PreparedModel& m,
                              const AgeModelSettings& s) {
    std::string msg = "buildAgeModel: hole '" + hole +
                      "': no draw puts the ties in order (every weight is 0)";
    const auto ranked = rankTieInfluence(m.ties, std::max(s.outlier_draws, 200), s.seed, s.threads);
    if (!ranked.empty())
        msg += "; leaving out tie '" + ranked.front().label + "' helps most";
    throw std::invalid_argument(msg);
}

} // namespace

AgeModel buildAgeModel(const std::string& hole, std::vector<AgeTie> ties,
                       const AgeModelSettings& settings,
                       const std::vector<double>& keep_draws_at_m) {
    const PreparedModel m = prepareAgeModel(hole, ties, settings, keep_draws_at_m);
    const Ranges ranges = pilotRanges(m, settings);
    if (!std::isfinite(ranges.log_weight_max))
        failNoOrder(hole, m, settings);

    const std::size_t n = static_cast<std::size_t>(settings.draws);
    std::vector<std::uint64_t> weights(n);
    std::vector<std::vector<double>> kept(m.kept_m.size(), std::vector<double>(n));
    double log_reference = ranges.log_weight_max + kPilotMargin;
    PassResult pass = mainPass(m, settings, ranges, log_reference, weights, kept);
    if (pass.log_weight_max > log_reference) { // a draw beat the reference: weigh again
        log_reference = pass.log_weight_max;
        pass = mainPass(m, settings, ranges, log_reference, weights, kept);
    }
    if (pass.weight_sum == 0)
        failNoOrder(hole, m, settings);

    AgeModel out;
    out.hole = hole;
    out.seed = settings.seed;
    out.draws = settings.draws;
    out.draws_used = pass.used;
    const long double wsum = static_cast<long double>(pass.weight_sum);
    out.effective_draws =
        static_cast<double>(wsum * wsum / static_cast<long double>(pass.weight_sq_sum));
    const double log_mean = std::log(static_cast<double>(wsum) / kWeightScale) + log_reference -
                            std::log(static_cast<double>(n));
    out.log10_acceptance = log_mean / std::numbers::ln10;
    out.acceptance_rate = std::exp(log_mean);

    for (std::size_t i = 0; i < m.nodes.size(); ++i)
        out.grid.push_back({m.nodes[i].depth_m, m.nodes[i].above_surface,
                            pass.grid.quantile(i, 0.025), pass.grid.quantile(i, 0.5),
                            pass.grid.quantile(i, 0.975), pass.grid.mean(i)});

    for (std::size_t k = 0; k < m.surfaces_m.size(); ++k) {
        HiatusEstimate h;
        h.depth_m = m.surfaces_m[k];
        const std::uint64_t w = pass.hiatus.totalWeight(k);
        h.resolved_share = static_cast<double>(static_cast<long double>(w) / wsum);
        if (w > 0) {
            h.duration_q025_myr = pass.hiatus.quantile(k, 0.025);
            h.duration_q500_myr = pass.hiatus.quantile(k, 0.5);
            h.duration_q975_myr = pass.hiatus.quantile(k, 0.975);
            h.probability_positive = static_cast<double>(
                static_cast<long double>(pass.hiatus_positive[k]) / static_cast<long double>(w));
        }
        out.hiatuses.push_back(h);
    }

    auto rate = [&](std::size_t c, AccretionRate r) {
        const std::uint64_t w = pass.rates.totalWeight(c);
        r.defined_share = static_cast<double>(static_cast<long double>(w) / wsum);
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

    out.kept_depths_m = m.kept_m;
    out.kept_age_draws_ma = std::move(kept);
    out.draw_weights.resize(n);
    for (std::size_t j = 0; j < n; ++j)
        out.draw_weights[j] =
            static_cast<double>(static_cast<long double>(weights[j]) / wsum);

    if (settings.outlier_draws > 0)
        out.outlier_ranking =
            rankTieInfluence(m.ties, settings.outlier_draws, settings.seed, settings.threads);
    return out;
}

} // namespace atollog
