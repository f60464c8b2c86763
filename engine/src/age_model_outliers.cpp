#include "age_model_outliers.hpp"

#include "age_model_draw.hpp"
#include "draw_seeds.hpp"
#include "parallel_blocks.hpp"
#include "progress_counter.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace atollog::detail {

namespace {

constexpr double kLog10Floor = -1e9;
/// Leaving a tie out that multiplies acceptance by 100 or more: our own threshold.
constexpr double kConflictGainLog10 = 2.0;

} // namespace

double log10MeanWeight(const std::vector<PreparedTie>& ties, int skip, int draws,
                       std::uint64_t seed) {
    std::mt19937_64 rng(blockSeed(seed, DrawStream::Outliers, 0));
    TieDraw d;
    std::vector<double> log_w(static_cast<std::size_t>(draws));
    for (double& l : log_w) {
        drawTies(ties, rng, d, skip);
        l = d.log_weight;
    }
    const double top = *std::max_element(log_w.begin(), log_w.end());
    if (!std::isfinite(top))
        return kLog10Floor;
    double sum = 0;
    for (double l : log_w)
        sum += std::exp(l - top);
    const double log10_mean = (top + std::log(sum / draws)) / std::numbers::ln10;
    return std::max(log10_mean, kLog10Floor);
}

std::size_t outlierRuns(const std::vector<PreparedTie>& ties) {
    return static_cast<std::size_t>(std::count_if(
        ties.begin(), ties.end(), [](const PreparedTie& t) { return !t.is_core_top; }));
}

std::vector<TieInfluence> rankTieInfluence(const std::vector<PreparedTie>& ties, int draws,
                                           std::uint64_t seed, int threads,
                                           ProgressCounter* progress) {
    const double with_all = log10MeanWeight(ties, -1, draws, seed);
    std::vector<TieInfluence> out(ties.size());
    runBlocks(ties.size(), threads, [&](std::size_t k, std::size_t) {
        if (ties[k].is_core_top)
            return;
        const double without = log10MeanWeight(ties, static_cast<int>(k), draws, seed);
        out[k] = {ties[k].label, without, without - with_all,
                  without - with_all >= kConflictGainLog10};
        if (progress)
            progress->advance();
    });
    std::vector<TieInfluence> ranked;
    for (std::size_t k = 0; k < ties.size(); ++k)
        if (!ties[k].is_core_top)
            ranked.push_back(out[k]);
    std::stable_sort(ranked.begin(), ranked.end(), [](const TieInfluence& a, const TieInfluence& b) {
        return a.log10_gain > b.log10_gain;
    });
    return ranked;
}

} // namespace atollog::detail
