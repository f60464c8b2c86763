#include "age_model_gibbs.hpp"

#include "draw_seeds.hpp"
#include "truncated_normal.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace atollog::detail {

namespace {

constexpr double kInf = std::numeric_limits<double>::infinity();

/// Weighted isotonic (non-decreasing) regression by pool-adjacent-violators.
std::vector<double> isotonic(const std::vector<double>& y, const std::vector<double>& w) {
    struct Block {
        double mean, weight;
        std::size_t count;
    };
    std::vector<Block> blocks;
    for (std::size_t i = 0; i < y.size(); ++i) {
        blocks.push_back({y[i], w[i], 1});
        while (blocks.size() > 1 && blocks[blocks.size() - 2].mean > blocks.back().mean) {
            const Block b = blocks.back();
            blocks.pop_back();
            Block& a = blocks.back();
            const double total = a.weight + b.weight;
            a.mean = (a.mean * a.weight + b.mean * b.weight) / total;
            a.weight = total;
            a.count += b.count;
        }
    }
    std::vector<double> out;
    for (const Block& b : blocks)
        out.insert(out.end(), b.count, b.mean);
    return out;
}

} // namespace

double truncatedAgeDraw(const AgeDistribution& d, double lo, double hi, double u) {
    if (!(hi > lo))
        return lo;
    if (d.isNormal())
        return truncatedNormalBetween(d.mean_ma(), d.sd_ma(), lo, hi, u);
    const double f_lo = lo == -kInf ? 0.0 : d.cdf(lo);
    const double f_hi = hi == kInf ? 1.0 : d.cdf(hi);
    if (f_hi > f_lo) {
        const double p =
            std::clamp(f_lo + u * (f_hi - f_lo), 0x1.0p-60, std::nextafter(1.0, 0.0));
        return std::clamp(d.quantile(p), lo, hi);
    }
    // No mass in [lo, hi]: the whole support lies on one side (or in a gap of zero density).
    if (std::isfinite(lo) && std::isfinite(hi)) {
        if (hi <= d.support_min_ma())
            return hi;
        if (lo >= d.support_max_ma())
            return lo;
        return lo + u * (hi - lo);
    }
    return std::isfinite(lo) ? lo : hi;
}

void initialGibbsState(const std::vector<PreparedTie>& ties, TieDraw& state) {
    const std::size_t n = ties.size();
    state.depth_m.resize(n);
    state.age_ma.resize(n);
    state.depth_order.resize(n);
    state.log_weight = 0;
    std::vector<double> median(n), weight(n);
    for (std::size_t i = 0; i < n; ++i) {
        const PreparedTie& t = ties[i];
        state.depth_order[i] = static_cast<int>(i);
        state.depth_m[i] = 0.5 * (t.shallow_m + t.deep_m);
        median[i] = t.exact_age || t.age.isNormal() ? t.age.mean_ma() : t.age.quantile(0.5);
        const double sd = std::max(t.age.sd_ma(), 1e-12);
        weight[i] = t.exact_age ? 1e12 / (sd * sd) : 1.0 / (sd * sd);
    }
    // Midpoints are sorted (prepared order), but keep the depths ordered against rounding.
    for (std::size_t i = 1; i < n; ++i)
        state.depth_m[i] = std::max(state.depth_m[i], state.depth_m[i - 1]);
    state.age_ma = isotonic(median, weight);
    for (std::size_t i = 0; i < n; ++i) {
        if (ties[i].exact_age)
            state.age_ma[i] = ties[i].age.mean_ma();
        if (i > 0)
            state.age_ma[i] = std::max(state.age_ma[i], state.age_ma[i - 1]);
    }
}

namespace {

/// log density of d at x up to a constant of d; -infinity outside a gridded support.
double logDensity(const AgeDistribution& d, double x) {
    if (d.isNormal()) {
        const double z = (x - d.mean_ma()) / d.sd_ma();
        return -0.5 * z * z;
    }
    const std::vector<double>& e = d.grid_ages_ma();
    const std::vector<double>& c = d.grid_cdf();
    const auto it = std::upper_bound(e.begin(), e.end(), x);
    if (it == e.begin() || it == e.end())
        return -kInf;
    const std::size_t k = static_cast<std::size_t>(it - e.begin()) - 1;
    const double p = c[k + 1] - c[k];
    return p > 0 ? std::log(p / (e[k + 1] - e[k])) : -kInf;
}

/// Metropolis swap of two ties adjacent in depth order (i above j): i takes j's depth and age
/// and j takes i's, when each depth lies in the other's bracket. Depths and ages stay in the
/// same sequence, so the order holds; the uniform depth densities cancel; the proposal is its
/// own inverse, so the acceptance ratio is p_i(a_j) p_j(a_i) / (p_i(a_i) p_j(a_j)).
bool trySwap(const std::vector<PreparedTie>& ties, int i, int j, std::mt19937_64& rng,
             TieDraw& state) {
    const PreparedTie& ti = ties[static_cast<std::size_t>(i)];
    const PreparedTie& tj = ties[static_cast<std::size_t>(j)];
    if (ti.exact_age || tj.exact_age || ti.is_core_top || tj.is_core_top)
        return false;
    double& zi = state.depth_m[static_cast<std::size_t>(i)];
    double& zj = state.depth_m[static_cast<std::size_t>(j)];
    if (zj < ti.shallow_m || zj > ti.deep_m || zi < tj.shallow_m || zi > tj.deep_m)
        return false;
    double& ai = state.age_ma[static_cast<std::size_t>(i)];
    double& aj = state.age_ma[static_cast<std::size_t>(j)];
    const double now = logDensity(ti.age, ai) + logDensity(tj.age, aj);
    const double swapped = logDensity(ti.age, aj) + logDensity(tj.age, ai);
    const double u = openUniform(rng);
    if (swapped == -kInf || (now != -kInf && !(std::log(u) < swapped - now)))
        return false;
    std::swap(zi, zj);
    std::swap(ai, aj);
    return true;
}

} // namespace

void gibbsSweep(const std::vector<PreparedTie>& ties, std::mt19937_64& rng, TieDraw& state) {
    const std::size_t n = ties.size();
    double* z = state.depth_m.data();
    double* a = state.age_ma.data();
    std::vector<int>& order = state.depth_order;
    for (std::size_t p = 0; p < n; ++p) {
        const std::size_t i = static_cast<std::size_t>(order[p]);
        const std::size_t up = p > 0 ? static_cast<std::size_t>(order[p - 1]) : n;
        const std::size_t down = p + 1 < n ? static_cast<std::size_t>(order[p + 1]) : n;
        const PreparedTie& t = ties[i];
        if (t.deep_m > t.shallow_m) {
            const double lo = std::max(t.shallow_m, up < n ? z[up] : -kInf);
            const double hi = std::min(t.deep_m, down < n ? z[down] : kInf);
            if (hi > lo)
                z[i] = std::clamp(lo + openUniform(rng) * (hi - lo), lo, hi);
        }
        if (t.exact_age)
            continue;
        const double lo = up < n ? a[up] : -kInf;
        const double hi = down < n ? a[down] : kInf;
        a[i] = t.age.isNormal() ? truncatedNormalBetweenBy(t.age.mean_ma(), t.age.sd_ma(), lo, hi,
                                                           [&rng] { return openUniform(rng); })
                                : truncatedAgeDraw(t.age, lo, hi, openUniform(rng));
    }
    for (std::size_t p = 0; p + 1 < n; ++p)
        if (trySwap(ties, order[p], order[p + 1], rng, state))
            std::swap(order[p], order[p + 1]);
}

} // namespace atollog::detail
