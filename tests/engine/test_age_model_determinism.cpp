// Age model: seeded reproducibility at any thread count and with a progress reporter, stopping
// through the reporter, no NaN, validation messages.
#include "atollog/engine/age_model.hpp"

#include <catch2/catch.hpp>

#include <atomic>
#include <cmath>
#include <mutex>
#include <stdexcept>

using namespace atollog;

namespace {

std::vector<AgeTie> sampleTies() {
    std::vector<AgeTie> t;
    for (int i = 0; i < 12; ++i)
        t.push_back(AgeTie{"H1", "t" + std::to_string(i), AgeTieSource::Datum, 3.0 * i + 1,
                           3.0 * i + 4, AgeDistribution::normal(0.1 * i + 0.05, 0.03), {}});
    return t;
}

AgeModelSettings settings(std::uint64_t seed, int threads) {
    AgeModelSettings s;
    s.draws = 3000;
    s.seed = seed;
    s.threads = threads;
    s.hiatus_depths_m = {17.0};
    s.rate_intervals = {{"x", 5, 20, false}};
    s.outlier_draws = 300;
    return s;
}

bool identical(const AgeModel& a, const AgeModel& b) {
    if (a.grid.size() != b.grid.size() || a.draw_weights != b.draw_weights ||
        a.kept_age_draws_ma != b.kept_age_draws_ma || a.acceptance_rate != b.acceptance_rate ||
        a.effective_draws != b.effective_draws)
        return false;
    for (std::size_t i = 0; i < a.grid.size(); ++i)
        if (a.grid[i].age_q025_ma != b.grid[i].age_q025_ma ||
            a.grid[i].age_q500_ma != b.grid[i].age_q500_ma ||
            a.grid[i].age_q975_ma != b.grid[i].age_q975_ma ||
            a.grid[i].age_mean_ma != b.grid[i].age_mean_ma)
            return false;
    for (std::size_t i = 0; i < a.rates.size(); ++i)
        if (a.rates[i].rate_q500_m_per_myr != b.rates[i].rate_q500_m_per_myr)
            return false;
    for (std::size_t i = 0; i < a.hiatuses.size(); ++i)
        if (a.hiatuses[i].duration_q500_myr != b.hiatuses[i].duration_q500_myr)
            return false;
    for (std::size_t i = 0; i < a.outlier_ranking.size(); ++i)
        if (a.outlier_ranking[i].log10_gain != b.outlier_ranking[i].log10_gain)
            return false;
    return true;
}

} // namespace

TEST_CASE("same seed gives bit-identical results, also on two threads", "[age_model]") {
    const std::vector<double> keep = {2.0, 10.0, 30.0};
    const AgeModel a = buildAgeModel("H1", sampleTies(), settings(99, 1), keep);
    const AgeModel b = buildAgeModel("H1", sampleTies(), settings(99, 1), keep);
    const AgeModel two = buildAgeModel("H1", sampleTies(), settings(99, 2), keep);
    const AgeModel three = buildAgeModel("H1", sampleTies(), settings(99, 3), keep);
    const AgeModel other = buildAgeModel("H1", sampleTies(), settings(100, 1), keep);
    CHECK(identical(a, b));
    CHECK(identical(a, two));
    CHECK(identical(a, three));
    CHECK_FALSE(identical(a, other));
}

TEST_CASE("progress counts every block once, in order, and changes nothing", "[age_model]") {
    for (const int threads : {1, 3}) {
        INFO("threads " << threads);
        std::vector<std::pair<std::size_t, std::size_t>> reports;
        std::mutex reports_mutex;
        std::atomic<int> inside{0}, overlapping{0};
        const WorkProgress progress = [&](std::size_t done, std::size_t total) {
            if (inside++ > 0) ++overlapping; // calls must never overlap
            {
                std::lock_guard lock(reports_mutex);
                reports.emplace_back(done, total);
            }
            --inside;
            return true;
        };
        const AgeModel with = buildAgeModel("H1", sampleTies(), settings(99, threads), {}, progress);
        const AgeModel without = buildAgeModel("H1", sampleTies(), settings(99, threads));
        CHECK(identical(with, without));
        CHECK(overlapping == 0);
        // 3,000 draws: the pilot's 1,024 in 2 chains of 512, the main pass's 3,000 in 6 chains,
        // and a leave-one-out run for each of the 12 ties (none is a core top): 20 blocks.
        REQUIRE(reports.size() == 21);
        for (std::size_t i = 0; i < reports.size(); ++i) {
            CHECK(reports[i].first == i);
            CHECK(reports[i].second == 20);
        }
    }
}

TEST_CASE("a progress reporter that says stop stops the model with WorkStopped", "[age_model]") {
    for (const int threads : {1, 2}) {
        INFO("threads " << threads);
        std::atomic<std::size_t> calls{0};
        const WorkProgress stop_after_three = [&](std::size_t done, std::size_t) {
            ++calls;
            return done < 3;
        };
        CHECK_THROWS_AS(buildAgeModel("H1", sampleTies(), settings(99, threads), {}, stop_after_three),
                        WorkStopped);
        CHECK(calls == 4); // 0, 1, 2 and the 3 that said stop; no report after it
        const WorkProgress never = [](std::size_t, std::size_t) { return false; };
        CHECK_THROWS_AS(buildAgeModel("H1", sampleTies(), settings(99, threads), {}, never),
                        WorkStopped);
    }
}

TEST_CASE("no NaN anywhere; the grid stays inside the ties", "[age_model]") {
    AgeModelSettings s = settings(7, 1);
    s.core_top.reset();
    const AgeModel m = buildAgeModel("H1", sampleTies(), s);
    REQUIRE_FALSE(m.grid.empty());
    CHECK(m.grid.front().depth_m == 1.0);  // shallowest bracket top
    CHECK(m.grid.back().depth_m == 37.0);  // deepest bracket base
    for (const AgeGridRow& r : m.grid) {
        CHECK(std::isfinite(r.age_q025_ma));
        CHECK(std::isfinite(r.age_q500_ma));
        CHECK(std::isfinite(r.age_q975_ma));
        CHECK(std::isfinite(r.age_mean_ma));
        CHECK(r.age_q025_ma <= r.age_q500_ma);
        CHECK(r.age_q500_ma <= r.age_q975_ma);
    }
    CHECK_FALSE(m.ageAt(0.5));
    CHECK_FALSE(m.ageAt(37.5));
    CHECK(m.ageAt(20.0));
    for (const AccretionRate& r : m.rates) {
        CHECK(std::isfinite(r.rate_q025_m_per_myr));
        CHECK(std::isfinite(r.rate_q975_mm_per_yr));
    }
    CHECK(std::isfinite(m.log10_acceptance));

    s.extrapolate_below = true;
    s.extrapolate_to_m = 45.0;
    const AgeModel deeper = buildAgeModel("H1", sampleTies(), s);
    CHECK(deeper.grid.back().depth_m == 45.0);
    CHECK(deeper.ageAt(44.0)->q500_ma > deeper.ageAt(37.0)->q500_ma);
}

TEST_CASE("buildAgeModel rejects bad input with a precise message", "[age_model]") {
    AgeModelSettings s;
    s.draws = 100;
    auto ties = sampleTies();
    CHECK_THROWS_WITH(buildAgeModel("H2", ties, s), Catch::Contains("belongs to hole 'H1'"));
    ties[3].shallow_m = 20;
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("shallow_m <= deep_m"));
    ties = sampleTies();
    s.draws = 0;
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("draws must be"));
    s.draws = 100;
    s.grid_step_m = std::nan("");
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("grid_step_m"));
    s.grid_step_m = 0.5;
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s, {50.0}), Catch::Contains("outside the model"));
    CHECK_THROWS_WITH(buildAgeModel("H1", {}, s), Catch::Contains("no tie"));
    s.hiatus_depths_m = {-1};
    CHECK_THROWS_WITH(buildAgeModel("H1", ties, s), Catch::Contains("hiatus depth"));
}
