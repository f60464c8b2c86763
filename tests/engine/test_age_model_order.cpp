// Age model: order kept in every draw, conflicts named, hiatus jumps recovered.
#include "atollog/engine/age_model.hpp"

#include <catch2/catch.hpp>

#include <cmath>

using namespace atollog;

namespace {

AgeTie tie(const std::string& label, double shallow_m, double deep_m, double age_ma, double sd_ma) {
    return AgeTie{"H1", label, AgeTieSource::Datum, shallow_m, deep_m,
                  AgeDistribution::normal(age_ma, sd_ma), {}};
}

} // namespace

TEST_CASE("close and overlapping ties: age never decreases downward in any draw", "[age_model]") {
    // Ties whose brackets overlap and whose ages overlap by several sd: plain rejection would
    // throw most draws away; every kept draw must still be in order.
    std::vector<AgeTie> ties = {tie("t1", 4, 8, 0.30, 0.05),   tie("t2", 6, 9, 0.32, 0.05),
                                tie("t3", 8.5, 9.5, 0.31, 0.04), tie("t4", 9, 14, 0.40, 0.06),
                                tie("t5", 13, 15, 0.38, 0.05), tie("t6", 20, 20, 0.60, 0.02)};
    AgeModelSettings s;
    s.draws = 3000;
    s.hiatus_depths_m = {16.0};
    s.outlier_draws = 0;
    std::vector<double> keep;
    for (double d = 0; d <= 20.0; d += 0.25)
        keep.push_back(d);
    const AgeModel m = buildAgeModel("H1", ties, s, keep);
    REQUIRE(m.kept_age_draws_ma.size() == keep.size());
    for (std::size_t draw = 0; draw < static_cast<std::size_t>(s.draws); ++draw)
        for (std::size_t k = 1; k < keep.size(); ++k)
            REQUIRE(m.kept_age_draws_ma[k][draw] >= m.kept_age_draws_ma[k - 1][draw]);
    for (std::size_t i = 1; i < m.grid.size(); ++i) {
        CHECK(m.grid[i].age_q500_ma >= m.grid[i - 1].age_q500_ma - 1e-12);
        CHECK(m.grid[i].depth_m >= m.grid[i - 1].depth_m);
    }
    CHECK(m.acceptance_rate > 0);
    CHECK(m.acceptance_rate < 0.9);
    CHECK(m.effective_draws > 100);
    double weight_sum = 0;
    for (double w : m.draw_weights)
        weight_sum += w;
    CHECK(weight_sum == Approx(1.0));
}

TEST_CASE("a tie wholly younger than the ties above it is named by the outlier search",
          "[age_model]") {
    // "c" at 15 m claims 0.3 Ma, while ties at 5 m and 10 m are 0.5 and 1.0 Ma old (25+ sd).
    std::vector<AgeTie> ties = {tie("a1", 5, 5, 0.5, 0.02), tie("a2", 10, 10, 1.0, 0.02),
                                tie("c", 14, 16, 0.3, 0.02), tie("b1", 20, 20, 2.0, 0.02),
                                tie("b2", 25, 25, 2.5, 0.02)};
    AgeModelSettings s;
    s.draws = 2000;
    const AgeModel m = buildAgeModel("H1", ties, s);
    REQUIRE(m.outlier_ranking.size() == 5);
    CHECK(m.outlier_ranking.front().label == "c");
    CHECK(m.outlier_ranking.front().likely_conflict);
    CHECK(m.outlier_ranking.front().log10_gain > m.outlier_ranking[1].log10_gain + 10);
    CHECK(m.log10_acceptance < -50);
    CHECK(std::isfinite(m.log10_acceptance));

    // Without the conflict nothing stands out.
    ties.erase(ties.begin() + 2);
    const AgeModel clean = buildAgeModel("H1", ties, s);
    for (const TieInfluence& t : clean.outlier_ranking)
        CHECK_FALSE(t.likely_conflict);
    CHECK(clean.acceptance_rate > 0.99);
}

TEST_CASE("a hiatus between two groups of ties is recovered within its quantiles",
          "[age_model][hiatus]") {
    // Both groups accrete 0.01 Ma/m (100 m/Myr). Extrapolated to the surface at 35 m, the
    // upper group gives 1.25 Ma and the lower 1.95 Ma: 0.70 Myr are missing.
    std::vector<AgeTie> ties = {tie("u1", 10, 10, 1.0, 0.005), tie("u2", 20, 20, 1.1, 0.005),
                                tie("u3", 30, 30, 1.2, 0.005), tie("l1", 40, 40, 2.0, 0.005),
                                tie("l2", 50, 50, 2.1, 0.005), tie("l3", 60, 60, 2.2, 0.005)};
    AgeModelSettings s;
    s.draws = 4000;
    s.core_top.reset();
    s.hiatus_depths_m = {35.0};
    s.rate_intervals = {{"upper unit", 10, 35, true}};
    s.outlier_draws = 0;
    const AgeModel m = buildAgeModel("H1", ties, s);
    REQUIRE(m.hiatuses.size() == 1);
    const HiatusEstimate& h = m.hiatuses[0];
    CHECK(h.resolved_share == Approx(1.0));
    REQUIRE(h.duration_q500_myr);
    CHECK(*h.duration_q025_myr <= 0.70);
    CHECK(*h.duration_q975_myr >= 0.70);
    CHECK(*h.duration_q500_myr == Approx(0.70).margin(0.01));
    CHECK(h.probability_positive > 0.99);
    // The grid holds both sides of the surface.
    const auto below = m.ageAt(35.0);
    REQUIRE(below);
    CHECK(below->q500_ma == Approx(1.95).margin(0.01));
    bool found_above = false;
    for (const AgeGridRow& r : m.grid)
        if (r.above_surface && r.depth_m == 35.0) {
            found_above = true;
            CHECK(r.age_q500_ma == Approx(1.25).margin(0.01));
        }
    CHECK(found_above);
    // Rates: the unit above the surface excludes the gap; across it, the tie pair includes it.
    const AccretionRate& unit = m.rates.back();
    CHECK(unit.label == "upper unit");
    CHECK(unit.rate_q500_m_per_myr == Approx(100.0).epsilon(0.02));
    const AccretionRate& across = m.rates[2]; // u3 .. l1: 10 m in 0.8 Myr
    CHECK(across.label == "u3 .. l1");
    CHECK(across.rate_q500_m_per_myr == Approx(12.5).epsilon(0.02));

    // Without a surface logged there, the same ties give no jump anywhere.
    s.hiatus_depths_m = {};
    const AgeModel plain = buildAgeModel("H1", ties, s);
    CHECK(plain.ageAt(35.0)->q500_ma == Approx(1.6).margin(0.01));
}
