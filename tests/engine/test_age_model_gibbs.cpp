// Gibbs sampler of the age model: two-sided truncated normal draws against the closed-form
// truncated-normal mean (Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions
// vol. 1, 2nd ed. 1994, sec. 10.1: E = mu + sd (phi(a) - phi(b)) / (Phi(b) - Phi(a))),
// conflicting ties flagged instead of thrown, equal weights.
#include "atollog/engine/age_model.hpp"

#include "../../engine/src/truncated_normal.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <random>
#include <utility>
#include <vector>

using namespace atollog;

namespace {

AgeTie tie(const std::string& label, double shallow_m, double deep_m, double age_ma, double sd_ma) {
    return AgeTie{"H1", label, AgeTieSource::Datum, shallow_m, deep_m,
                  AgeDistribution::normal(age_ma, sd_ma), {}};
}

double phi(double z) { return std::exp(-0.5 * z * z) / std::sqrt(2 * std::numbers::pi); }
double Phi(double z) { return 0.5 * std::erfc(-z / std::numbers::sqrt2); }

/// Mean of truncatedNormalBetween over u by the midpoint rule on 200,000 points.
double quadratureMean(double mean, double sd, double lo, double hi) {
    const int n = 200000;
    double sum = 0;
    for (int k = 0; k < n; ++k) {
        const double v = detail::truncatedNormalBetween(mean, sd, lo, hi, (k + 0.5) / n);
        REQUIRE(std::isfinite(v));
        REQUIRE(v >= lo);
        REQUIRE(v <= hi);
        sum += v;
    }
    return sum / n;
}

} // namespace

TEST_CASE("two-sided truncated normal draws have the closed-form mean", "[age_model]") {
    auto closed = [](double a, double b) { return (phi(a) - phi(b)) / (Phi(b) - Phi(a)); };
    CHECK(quadratureMean(0, 1, -1, 2) == Approx(closed(-1, 2)).margin(1e-4));
    CHECK(quadratureMean(0, 1, 1, 2) == Approx(closed(1, 2)).margin(1e-4));
    CHECK(quadratureMean(0, 1, -3, -2.5) == Approx(closed(-3, -2.5)).margin(1e-4));
    CHECK(quadratureMean(5, 2, 9, 13) == Approx(5 + 2 * closed(2, 4)).margin(2e-4));
    // Far in the upper tail the mass is ~1e-350: E = a + 1/a - 2/a^3 + ... (Mills' ratio series).
    CHECK(quadratureMean(0, 1, 40, 41) == Approx(40 + 1 / 40.0 - 2 / 64000.0).margin(1e-3));
    CHECK(quadratureMean(0, 1, -41, -40) == Approx(-(40 + 1 / 40.0 - 2 / 64000.0)).margin(1e-3));
    // One side open.
    CHECK(quadratureMean(0, 1, -INFINITY, 0) == Approx(-2 * phi(0)).margin(1e-4));
    CHECK(detail::truncatedNormalBetween(0, 1, 3, 3, 0.5) == 3);
}

TEST_CASE("the rejection path of the truncated normal has the closed-form mean and variance",
          "[age_model]") {
    // Monte Carlo over 400,000 draws of truncatedNormalBetweenBy (uniform-proposal rejection,
    // Robert 1995, where the interval is narrow, the inversion elsewhere) against the closed
    // forms (Johnson, Kotz & Balakrishnan 1994, sec. 10.1): E = (phi(a) - phi(b)) / Z and
    // Var = 1 + (a phi(a) - b phi(b)) / Z - E^2, Z = Phi(b) - Phi(a).
    std::mt19937_64 rng(99);
    auto u = [&rng] { return ((rng() >> 11) + 0.5) * 0x1.0p-53; };
    for (const auto& [a, b] : std::vector<std::pair<double, double>>{
             {-1.0, 1.2}, {0.5, 2.0}, {-2.6, -1.9}, {3.0, 3.5}, {-4.0, 4.0}, {-0.3, 0.1}}) {
        const double z = Phi(b) - Phi(a);
        const double mean = (phi(a) - phi(b)) / z;
        const double var = 1 + (a * phi(a) - b * phi(b)) / z - mean * mean;
        const int n = 400000;
        double s = 0, ss = 0;
        for (int k = 0; k < n; ++k) {
            const double v = detail::truncatedNormalBetweenBy(10.0, 2.0, 10 + 2 * a, 10 + 2 * b, u);
            REQUIRE(v >= 10 + 2 * a);
            REQUIRE(v <= 10 + 2 * b);
            s += v;
            ss += v * v;
        }
        const double m = s / n, sd = std::sqrt(ss / n - m * m);
        INFO("[" << a << ", " << b << "]");
        // 5 standard errors of a mean of 400,000 draws.
        CHECK(m == Approx(10 + 2 * mean).margin(5 * 2 * std::sqrt(var / n)));
        CHECK(sd == Approx(2 * std::sqrt(var)).epsilon(0.01));
    }
}

TEST_CASE("a conflicting tie no longer throws and has the largest tail score", "[age_model]") {
    // "c" at 15 m claims 0.3 +/- 0.02 Ma, below a precise date a2 (1.0 +/- 0.01 Ma) and a1: 35 sd
    // too young. Ordered, c and a2 meet near the 1/sd^2-weighted mean of their claims,
    // (1.0 / 0.01^2 + 0.3 / 0.02^2) / (1 / 0.01^2 + 1 / 0.02^2) = 0.86 Ma: c sits about 28 sd
    // above its mean, a2 about 14 sd below its own.
    const std::vector<AgeTie> ties = {tie("a1", 5, 5, 0.5, 0.02), tie("a2", 10, 10, 1.0, 0.01),
                                      tie("c", 14, 16, 0.3, 0.02), tie("b1", 20, 20, 2.0, 0.02),
                                      tie("b2", 25, 25, 2.5, 0.02)};
    AgeModelSettings s;
    s.draws = 2000;
    s.outlier_draws = 0;
    AgeModel m;
    REQUIRE_NOTHROW(m = buildAgeModel("H1", ties, s));
    REQUIRE(m.tie_tails.size() == 6); // the core top too
    CHECK(m.tie_tails.front().label == "c");
    CHECK(m.tie_tails.front().likely_outlier);
    CHECK(m.tie_tails.front().z_score > 20);
    CHECK(m.tie_tails.front().age_q500_ma == Approx(0.86).margin(0.03));
    CHECK(m.tie_tails.front().tail_probability < 1e-50);
    CHECK(m.tie_tails[1].label == "a2");
    CHECK(m.tie_tails[1].z_score < 0);
    CHECK(std::fabs(m.tie_tails[1].z_score) < m.tie_tails.front().z_score - 5);
    CHECK(m.log10_acceptance < -50);
    for (const AgeGridRow& r : m.grid) {
        CHECK(std::isfinite(r.age_q025_ma));
        CHECK(std::isfinite(r.age_q975_ma));
    }
}

TEST_CASE("every Gibbs draw counts once: effective draws equal the draws kept", "[age_model]") {
    AgeModelSettings s;
    s.draws = 1500; // not a multiple of the chain length
    s.outlier_draws = 0;
    const AgeModel m =
        buildAgeModel("H1", {tie("a", 4, 8, 0.3, 0.05), tie("b", 6, 9, 0.32, 0.05)}, s, {5.0});
    CHECK(m.draws_used == 1500);
    CHECK(m.effective_draws == 1500);
    REQUIRE(m.draw_weights.size() == 1500);
    for (double w : m.draw_weights)
        REQUIRE(w == 1.0 / 1500);
    REQUIRE(m.kept_age_draws_ma.size() == 1);
    for (double a : m.kept_age_draws_ma[0])
        REQUIRE(std::isfinite(a));
}

TEST_CASE("Gibbs settings are validated", "[age_model]") {
    AgeModelSettings s;
    s.draws = 100;
    const std::vector<AgeTie> ties = {tie("a", 5, 5, 0.5, 0.02)};
    s.thin = 0;
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("thin must be 1 .. 1000"));
    s.thin = 2;
    s.burn_in_sweeps = -1;
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("burn_in_sweeps must be"));
    s.burn_in_sweeps = 200;
    s.acceptance_draws = 0;
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("acceptance_draws must be"));
}

TEST_CASE("overlapping brackets swap into the order the ages demand", "[age_model]") {
    // "young" (1.0 Ma) anywhere in [10, 30] m, "old" (2.0 Ma, 100 sd older) in [12, 16] m. The
    // midpoints put old first; the ages force young above old. With depths uniform and
    // conditioned on z_young <= z_old: z_young has density prop. to P(z_old >= z) (1 on
    // [10, 12], (16 - z) / 4 on [12, 16]), so its median is 12; z_old has density prop. to
    // P(z_young <= z) = (z - 10) / 20 on [12, 16], so its median solves
    // ((z - 10)^2 - 4) / 32 = 1/2: z = 10 + sqrt(20) = 14.472 m.
    AgeModelSettings s;
    s.draws = 8000;
    s.seed = 3;
    s.outlier_draws = 0;
    const AgeModel m = buildAgeModel(
        "H1", {tie("young", 10, 30, 1.0, 0.01), tie("old", 12, 16, 2.0, 0.01)}, s);
    for (const TieTail& t : m.tie_tails) {
        CHECK(std::fabs(t.z_score) < 3); // neither is squeezed towards the other
        if (t.label == "young")
            CHECK(t.depth_q500_m == Approx(12.0).margin(0.15));
        if (t.label == "old")
            CHECK(t.depth_q500_m == Approx(10 + std::sqrt(20.0)).margin(0.15));
    }
}
