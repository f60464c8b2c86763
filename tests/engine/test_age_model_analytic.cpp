// Age model against cases with a known answer outside the project: linear interpolation of
// independent normals, and the ages a uniform depth bracket implies.
#include "atollog/engine/age_model.hpp"

#include <catch2/catch.hpp>

#include <cmath>

using namespace atollog;

namespace {

AgeTie tie(const std::string& label, double shallow_m, double deep_m, double age_ma, double sd_ma) {
    return AgeTie{"H1", label, AgeTieSource::Date, shallow_m, deep_m,
                  AgeDistribution::normal(age_ma, sd_ma), {}};
}

const AgeGridRow& rowAt(const AgeModel& m, double depth_m) {
    for (const AgeGridRow& r : m.grid)
        if (std::fabs(r.depth_m - depth_m) < 1e-9 && !r.above_surface)
            return r;
    FAIL("no grid row at " << depth_m);
    return m.grid.front();
}

} // namespace

TEST_CASE("two normal point ties: the midpoint age is the mean of the two normals", "[age_model]") {
    // Linear interpolation halfway between independent X ~ N(m1, s1) and Y ~ N(m2, s2) gives
    // (X + Y) / 2 ~ N((m1 + m2) / 2, sqrt(s1^2 + s2^2) / 2) (sum of independent normals). The
    // ties are 20+ sd apart, so the order condition removes no measurable mass.
    AgeModelSettings s;
    s.draws = 40000;
    s.seed = 11;
    s.core_top.reset();
    s.outlier_draws = 0;
    const AgeModel m = buildAgeModel("H1", {tie("a", 10, 10, 1.0, 0.02), tie("b", 20, 20, 2.0, 0.03)}, s);
    const double sd = 0.5 * std::sqrt(0.02 * 0.02 + 0.03 * 0.03);
    const AgeGridRow& r = rowAt(m, 15.0);
    CHECK(r.age_mean_ma == Approx(1.5).margin(0.05 * sd));
    CHECK(r.age_q500_ma == Approx(1.5).margin(0.05 * sd));
    // z(0.975) = 1.959964 (standard normal table).
    CHECK(r.age_q025_ma == Approx(1.5 - 1.959964 * sd).margin(0.06 * sd));
    CHECK(r.age_q975_ma == Approx(1.5 + 1.959964 * sd).margin(0.06 * sd));
    CHECK(m.acceptance_rate == Approx(1.0).margin(1e-6));
    CHECK(m.effective_draws == Approx(40000).epsilon(1e-6));
    // At a tie the age is that tie's normal.
    CHECK(rowAt(m, 20.0).age_q975_ma == Approx(2.0 + 1.959964 * 0.03).margin(0.002));
}

TEST_CASE("a uniform depth bracket gives the ages its quantiles imply", "[age_model]") {
    // Core top 0 Ma at 0 m, one tie of (practically) exact age 1 Ma somewhere uniform in
    // [10, 20] m. At 10 m the age is 10 / Z with Z ~ U(10, 20): P(age <= x) = (20 - 10/x) / 10,
    // so the p-quantile is 1 / (2 - p), and the mean is E[10/Z] = ln 2.
    AgeModelSettings s;
    s.draws = 40000;
    s.seed = 5;
    s.outlier_draws = 0;
    const AgeModel m = buildAgeModel("H1", {tie("bracket", 10, 20, 1.0, 1e-6)}, s);
    const AgeGridRow& r = rowAt(m, 10.0);
    CHECK(r.age_q025_ma == Approx(1.0 / 1.975).margin(0.004));
    CHECK(r.age_q500_ma == Approx(1.0 / 1.5).margin(0.004));
    CHECK(r.age_q975_ma == Approx(1.0 / 1.025).margin(0.004));
    CHECK(r.age_mean_ma == Approx(std::log(2.0)).margin(0.003));
    // The core top is exact: its row is exactly 0, not a bin centre.
    CHECK(rowAt(m, 0.0).age_q500_ma == 0.0);
    CHECK(rowAt(m, 0.0).age_q975_ma == 0.0);
}

TEST_CASE("accretion rate between two ties is thickness over time", "[age_model][rates]") {
    // 10 m in 1 Myr = 10 m/Myr = 0.01 mm/yr (checks.md: 1 cm/kyr = 10 m/Myr = 0.01 mm/yr).
    AgeModelSettings s;
    s.draws = 4000;
    s.core_top.reset();
    s.outlier_draws = 0;
    s.rate_intervals = {{"unit", 12, 18, true}};
    const AgeModel m = buildAgeModel("H1", {tie("a", 10, 10, 1.0, 1e-5), tie("b", 20, 20, 2.0, 1e-5)}, s);
    REQUIRE(m.rates.size() == 2);
    CHECK(m.rates[0].label == "a .. b");
    CHECK(m.rates[0].rate_q500_m_per_myr == Approx(10.0).epsilon(1e-3));
    CHECK(m.rates[0].rate_q500_mm_per_yr == Approx(0.01).epsilon(1e-3));
    CHECK(m.rates[0].median_outside_reef_range);
    CHECK(m.rates[1].rate_q500_m_per_myr == Approx(10.0).epsilon(1e-3));
    CHECK(m.rates[1].reef_framework);
    CHECK(m.rates[1].defined_share == Approx(1.0));
}

TEST_CASE("an open core top is uniform between present and the shallowest tie", "[age_model]") {
    // Core top only bounded: age A0 ~ U(0, 1) at 0 m (the order cuts the flat prior at the tie);
    // one tie of practically exact age 1 Ma at 10 m. At 0 m the quantiles are those of U(0, 1);
    // at 5 m the age (A0 + 1) / 2 ~ U(0.5, 1), so its p-quantile is 0.5 + p / 2.
    AgeModelSettings s;
    s.draws = 40000;
    s.seed = 17;
    s.outlier_draws = 0;
    s.core_top = CoreTopAge{0.0, 0.0, true};
    const AgeModel m = buildAgeModel("H1", {tie("t", 10, 10, 1.0, 1e-6)}, s);
    CHECK(rowAt(m, 0.0).age_q025_ma == Approx(0.025).margin(0.006));
    CHECK(rowAt(m, 0.0).age_q500_ma == Approx(0.5).margin(0.01));
    CHECK(rowAt(m, 0.0).age_q975_ma == Approx(0.975).margin(0.006));
    CHECK(rowAt(m, 5.0).age_q025_ma == Approx(0.5125).margin(0.004));
    CHECK(rowAt(m, 5.0).age_q500_ma == Approx(0.75).margin(0.006));
    CHECK(rowAt(m, 5.0).age_q975_ma == Approx(0.9875).margin(0.004));
    // A floor costs nothing: every draw respects it, so acceptance stays 1.
    CHECK(m.acceptance_rate == Approx(1.0).margin(1e-6));
    for (const TieTail& t : m.tie_tails)
        CHECK_FALSE(t.likely_outlier);
}

TEST_CASE("lava dates below the basement contact become one pooled tie at the contact",
          "[age_model]") {
    // Reef tie 1.0 Ma at 5 m; contact at 10 m; lava dates 2.0, 2.2, 2.1 Ma (sd 0.1) at 12, 13,
    // 14 m. Weighted mean (Taylor 1997, eq. 7.10) 2.1 Ma, sd 0.1 / sqrt(3) (eq. 7.12); MSWD
    // (Wendt & Carl 1991) = (1 + 1 + 0) / 2 = 1, so no widening. The model ends at the contact,
    // where the age from below is that normal.
    AgeModelSettings s;
    s.draws = 40000;
    s.seed = 23;
    s.outlier_draws = 0;
    s.core_top.reset();
    s.basement_contact_m = 10.0;
    const AgeModel m = buildAgeModel("H1",
                                     {tie("reef", 5, 5, 1.0, 0.01), tie("lava a", 12, 12, 2.0, 0.1),
                                      tie("lava b", 13, 13, 2.2, 0.1), tie("lava c", 14, 14, 2.1, 0.1)},
                                     s);
    CHECK(m.grid.back().depth_m == Approx(10.0));
    const double sd = 0.1 / std::sqrt(3.0);
    const AgeGridRow& below = rowAt(m, 10.0);
    CHECK(below.age_q500_ma == Approx(2.1).margin(0.05 * sd));
    CHECK(below.age_q975_ma == Approx(2.1 + 1.959964 * sd).margin(0.08 * sd));
    REQUIRE(m.hiatuses.size() == 1);
    CHECK(m.hiatuses.front().depth_m == Approx(10.0));
    bool pooled = false;
    for (const TieTail& t : m.tie_tails)
        pooled |= t.label == "basement (3 dates, MSWD 1)";
    CHECK(pooled);
}

TEST_CASE("the model never reaches below the drilled base", "[age_model]") {
    AgeModelSettings s;
    s.draws = 2000;
    s.outlier_draws = 0;
    s.section_base_m = 20.0;
    const AgeModel m = buildAgeModel("H1", {tie("wide", 10, 30, 1.0, 0.01)}, s);
    CHECK(m.grid.back().depth_m == Approx(20.0));
    s.section_base_m = -1.0;
    CHECK_THROWS_WITH(buildAgeModel("H1", {tie("wide", 10, 30, 1.0, 0.01)}, s),
                      Catch::Contains("section_base_m"));
}
