// Age model benchmark: 10,000 draws x 200 ties x 5,000 grid depths. Prints the time on one and
// two threads, peak memory, and the ratio to a plain version written here that keeps every
// draw at every depth and sorts each depth (same draws, measured side by side in this run).
#include "atollog/engine/age_model.hpp"

#include "../../engine/src/age_model_gibbs.hpp"
#include "../../engine/src/age_model_inputs.hpp"
#include "../../engine/src/age_profile.hpp"
#include "../../engine/src/draw_seeds.hpp"

#include <sys/resource.h>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <numeric>
#include <vector>

using namespace atollog;

namespace {

double seconds(std::chrono::steady_clock::time_point t0) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

long peakRssMb() {
    rusage u{};
    getrusage(RUSAGE_SELF, &u);
    return u.ru_maxrss / 1024;
}

/// 200 ties down 2,500 m (about 100 m/Myr), brackets 2-10 m, sd 0.5-2 % of the age.
std::vector<AgeTie> benchTies() {
    std::vector<AgeTie> t;
    for (int i = 0; i < 200; ++i) {
        const double mid = 12.5 * i + 6.0;
        const double half = 1.0 + (i % 5);
        const double age = mid * 0.01;
        t.push_back(AgeTie{"B1", "t" + std::to_string(i), AgeTieSource::Datum, mid - half,
                           mid + half, AgeDistribution::normal(age, age * (0.005 + 0.003 * (i % 6))),
                           {}});
    }
    return t;
}

/// The plain version: the same Gibbs chains (512 kept draws each, same seeds, burn-in and
/// thinning) kept in a draws x depths matrix, each depth sorted for the same three quantiles.
double plainMedianSum(const std::vector<AgeTie>& ties, const AgeModelSettings& s) {
    const detail::PreparedModel m = detail::prepareAgeModel("B1", ties, s, {});
    const std::size_t n = static_cast<std::size_t>(s.draws), g = m.nodes.size();
    std::vector<double> ages(n * g);
    detail::TieDraw d;
    detail::AgeProfile p;
    for (std::size_t b = 0; b * 512 < n; ++b) {
        std::mt19937_64 rng(detail::blockSeed(s.seed, detail::DrawStream::Main, b));
        detail::initialGibbsState(m.ties, d);
        for (int k = 0; k < s.burn_in_sweeps; ++k)
            detail::gibbsSweep(m.ties, rng, d);
        for (std::size_t j = b * 512; j < std::min(n, b * 512 + 512); ++j) {
            for (int k = 0; k < s.thin; ++k)
                detail::gibbsSweep(m.ties, rng, d);
            p.build(d, m.surfaces_m);
            p.ageAtNodes(m.nodes, &ages[j], n); // column-major: one depth's draws together
        }
    }
    const std::vector<double> w(n, 1.0);
    const double total = static_cast<double>(n);
    double checksum = 0;
    std::vector<std::size_t> idx(n);
    for (std::size_t i = 0; i < g; ++i) {
        const double* col = &ages[i * n];
        std::iota(idx.begin(), idx.end(), 0);
        std::sort(idx.begin(), idx.end(), [&](std::size_t a, std::size_t b) { return col[a] < col[b]; });
        double cum = 0;
        int q = 0;
        const double ps[3] = {0.025, 0.5, 0.975};
        for (std::size_t k = 0; k < n && q < 3; ++k) {
            cum += w[idx[k]];
            while (q < 3 && cum >= ps[q] * total) {
                checksum += col[idx[k]];
                ++q;
            }
        }
    }
    return checksum;
}

} // namespace

int main() {
    const std::vector<AgeTie> ties = benchTies();
    AgeModelSettings s;
    s.draws = 10000;
    s.seed = 42;
    s.grid_step_m = 2506.0 / 4999.0; // 5,000 grid depths from the core top to the deepest tie
    s.outlier_draws = 0;
    s.hiatus_depths_m = {600.0, 1400.0};

    auto t0 = std::chrono::steady_clock::now();
    const AgeModel one = buildAgeModel("B1", ties, s);
    const double t_one = seconds(t0);
    const long rss_engine = peakRssMb();
    std::printf("age model: %d draws x %zu ties x %zu grid depths\n", s.draws, ties.size(),
                one.grid.size());
    std::printf("  streaming, 1 thread : %.3f s (target < 0.5 s), peak RSS %ld MB, "
                "draws kept %.0f (Gibbs, burn-in %d, thin %d), log10 acceptance %.1f\n",
                t_one, rss_engine, one.effective_draws, s.burn_in_sweeps, s.thin,
                one.log10_acceptance);

    s.threads = 2;
    t0 = std::chrono::steady_clock::now();
    const AgeModel two = buildAgeModel("B1", ties, s);
    const double t_two = seconds(t0);
    bool same = true;
    for (std::size_t i = 0; i < one.grid.size(); ++i)
        same &= one.grid[i].age_q500_ma == two.grid[i].age_q500_ma;
    std::printf("  streaming, 2 threads: %.3f s (speed-up %.2f), identical to 1 thread: %s\n",
                t_two, t_one / t_two, same ? "yes" : "NO");

    s.threads = 1;
    t0 = std::chrono::steady_clock::now();
    const double checksum = plainMedianSum(ties, s);
    const double t_plain = seconds(t0);
    std::printf("  plain (store all draws, sort each depth): %.3f s, peak RSS now %ld MB "
                "(checksum %.3f)\n",
                t_plain, peakRssMb(), checksum);
    std::printf("  streaming / plain time: %.2f\n", t_one / t_plain);
    s.outlier_draws = 1000;
    t0 = std::chrono::steady_clock::now();
    (void)buildAgeModel("B1", ties, s);
    std::printf("  with the leave-one-out search (200 ties x 1,000 draws): %.3f s\n",
                seconds(t0));
    return 0;
}
