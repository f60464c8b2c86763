// AgeDistribution: normals against the standard normal table, gridded densities against
// hand-worked piecewise-constant (uniform) cases, truncated draws.
#include "atollog/engine/age_distribution.hpp"
#include "atollog/engine/seeded_draws.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

TEST_CASE("normal quantiles match the standard normal table", "[unit][age-distribution]") {
    const AgeDistribution z = AgeDistribution::normal(0.0, 1.0);
    // z(0.975) = 1.959964 [P: any statistics table of the standard normal, e.g. Abramowitz &
    // Stegun 1964, Table 26.5]; z(0.8413) ~ 1 (the one-sigma probability 0.841345) [P: same].
    CHECK_THAT(z.quantile(0.975), WithinAbs(1.959964, 1e-6));
    CHECK_THAT(z.quantile(0.025), WithinAbs(-1.959964, 1e-6));
    CHECK_THAT(z.quantile(0.841345), WithinAbs(1.0, 1e-5));
    CHECK_THAT(z.cdf(1.959964), WithinAbs(0.975, 1e-6));
    CHECK_THAT(z.quantile(0.5), WithinAbs(0.0, 1e-12));

    // Scaled: an event at 1.93 +/- 0.02 Ma (invented numbers); quantiles in Ma.
    const AgeDistribution e = AgeDistribution::normal(1.93, 0.02);
    CHECK_THAT(e.quantile(0.975), WithinAbs(1.93 + 0.02 * 1.959964, 1e-7));
    CHECK_THAT(e.cdf(1.93), WithinAbs(0.5, 1e-12));
    CHECK(e.isNormal());
    CHECK_THAT(e.support_min_ma(), WithinAbs(1.93 - 8 * 0.02, 1e-12));
    CHECK_THAT(e.support_max_ma(), WithinAbs(1.93 + 8 * 0.02, 1e-12));
}

TEST_CASE("normal rejects bad parameters and probabilities", "[unit][age-distribution]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_AS(AgeDistribution::normal(1.0, 0.0), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::normal(1.0, -0.1), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::normal(nan, 0.1), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::normal(1.0, std::numeric_limits<double>::infinity()),
                    std::invalid_argument);
    const AgeDistribution d = AgeDistribution::normal(1.0, 0.1);
    CHECK_THROWS_AS(d.quantile(0.0), std::invalid_argument);
    CHECK_THROWS_AS(d.quantile(1.0), std::invalid_argument);
    CHECK_THROWS_AS(d.quantile(nan), std::invalid_argument);
    CHECK_THROWS_AS(d.cdf(nan), std::invalid_argument);
}

TEST_CASE("gridded uniform density: quantiles and moments analytically",
          "[unit][age-distribution]") {
    // Ages 0, 1, ..., 10 with equal density: bins of width 1 centred on each age, so the
    // distribution is uniform on [-0.5, 10.5] (bin edges at midpoints, outer edges half a step
    // beyond the end ages). Quantile p -> -0.5 + 11 p; mean 5; sd 11 / sqrt(12).
    std::vector<double> ages, dens;
    for (int i = 0; i <= 10; ++i) {
        ages.push_back(i);
        dens.push_back(3.0); // any constant: normalised inside
    }
    const AgeDistribution u = AgeDistribution::gridded(ages, dens);
    CHECK_FALSE(u.isNormal());
    for (double p : {0.01, 0.1, 0.25, 0.5, 0.9, 0.999})
        CHECK_THAT(u.quantile(p), WithinAbs(-0.5 + 11.0 * p, 1e-12));
    CHECK_THAT(u.cdf(0.0), WithinAbs(0.5 / 11.0, 1e-12));
    CHECK_THAT(u.cdf(-1.0), WithinAbs(0.0, 0.0));
    CHECK_THAT(u.cdf(11.0), WithinAbs(1.0, 0.0));
    CHECK_THAT(u.mean_ma(), WithinAbs(5.0, 1e-12));
    CHECK_THAT(u.sd_ma(), WithinAbs(11.0 / std::sqrt(12.0), 1e-12));
    CHECK_THAT(u.support_min_ma(), WithinAbs(-0.5, 0.0));
    CHECK_THAT(u.support_max_ma(), WithinAbs(10.5, 0.0));
    REQUIRE(u.grid_ages_ma().size() == 12);
    REQUIRE(u.grid_cdf().size() == 12);
}

TEST_CASE("gridded density on an unequal grid weighs each bin by its width",
          "[unit][age-distribution]") {
    // Ages 0, 1, 3 with equal density: edges -0.5, 0.5, 2, 4 (widths 1, 1.5, 2), so the
    // distribution is uniform on [-0.5, 4]: median 1.75.
    const AgeDistribution u = AgeDistribution::gridded({0.0, 1.0, 3.0}, {1.0, 1.0, 1.0});
    CHECK_THAT(u.quantile(0.5), WithinAbs(1.75, 1e-12));
    CHECK_THAT(u.cdf(2.0), WithinAbs(2.5 / 4.5, 1e-12));

    // A zero-density bin in the middle is skipped by the quantile: ages 0, 1, 2 with densities
    // 1, 0, 1 -> mass on [-0.5, 0.5] and [1.5, 2.5], half each.
    const AgeDistribution gap = AgeDistribution::gridded({0.0, 1.0, 2.0}, {1.0, 0.0, 1.0});
    CHECK_THAT(gap.quantile(0.25), WithinAbs(0.0, 1e-12));
    CHECK_THAT(gap.quantile(0.75), WithinAbs(2.0, 1e-12));
    CHECK_THAT(gap.cdf(1.0), WithinAbs(0.5, 1e-12));
}

TEST_CASE("gridded rejects bad grids", "[unit][age-distribution]") {
    CHECK_THROWS_AS(AgeDistribution::gridded({1.0}, {1.0}), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::gridded({1.0, 2.0}, {1.0}), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::gridded({2.0, 1.0}, {1.0, 1.0}), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::gridded({1.0, 1.0}, {1.0, 1.0}), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::gridded({1.0, 2.0}, {1.0, -1.0}), std::invalid_argument);
    CHECK_THROWS_AS(AgeDistribution::gridded({1.0, 2.0}, {0.0, 0.0}), std::invalid_argument);
    CHECK_THROWS_AS(
        AgeDistribution::gridded({1.0, 2.0}, {1.0, std::numeric_limits<double>::quiet_NaN()}),
        std::invalid_argument);
}

TEST_CASE("truncated draws through the quantile stay inside their bounds",
          "[unit][age-distribution]") {
    // x = quantile(F(lo) + u (F(hi) - F(lo))): the way the age model draws an age between the
    // ages of its neighbours.
    std::vector<double> ages, dens;
    for (int i = 0; i <= 200; ++i) {
        ages.push_back(0.001 * i);
        dens.push_back(std::exp(-0.5 * std::pow((0.001 * i - 0.08) / 0.02, 2)));
    }
    const AgeDistribution grid = AgeDistribution::gridded(ages, dens);
    const AgeDistribution norm = AgeDistribution::normal(0.08, 0.02);
    SeededDraws draws(42);
    for (const AgeDistribution* d : {&grid, &norm}) {
        const double lo = 0.071, hi = 0.0755;
        const double flo = d->cdf(lo), fhi = d->cdf(hi);
        REQUIRE(fhi > flo);
        double seen_min = hi, seen_max = lo;
        for (int i = 0; i < 2000; ++i) {
            const double x = d->quantile(flo + draws.uniformOpen() * (fhi - flo));
            CHECK(x >= lo - 1e-12);
            CHECK(x <= hi + 1e-12);
            seen_min = std::min(seen_min, x);
            seen_max = std::max(seen_max, x);
        }
        // The draws fill the window rather than piling at one end.
        CHECK(seen_min < lo + 0.0005);
        CHECK(seen_max > hi - 0.0005);
    }
}
