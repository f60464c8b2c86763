// Numbers at the edges of the dates, age-model and rates entry points: NaN and infinities in each
// numeric input, zero and negative sds, zero-thickness intervals, one tie, all ties at one depth,
// ties out of order far beyond their uncertainties, 0 % recovery, empty inputs, and finite
// values so large (1e300) or so small (1e-300) that arithmetic on them overflows or underflows.
// Each case either throws std::invalid_argument whose message names the offending input, or
// gives a result whose every number is finite (DEVELOPERS.md, "Errors": never a silent NaN).
// No expected value here is a published one: the checks are finiteness, order and the names in
// the messages. IEEE 754 facts relied on: NaN compares false with everything; (1e300)^2 and
// 1e308 + 1e308 overflow to +inf; (1e-300)^2 underflows to 0.
#include "atollog/engine/accretion_rates.hpp"
#include "atollog/engine/accumulation.hpp"
#include "atollog/engine/age_distribution.hpp"
#include "atollog/engine/age_model.hpp"
#include "atollog/engine/basement_age.hpp"
#include "atollog/engine/chain_migration.hpp"
#include "atollog/engine/date_ages.hpp"
#include "atollog/engine/decompaction.hpp"
#include "atollog/engine/hpd_intervals.hpp"
#include "atollog/engine/least_squares_line.hpp"
#include "atollog/engine/radiocarbon.hpp"
#include "atollog/engine/reference_depth_curves.hpp"
#include "atollog/engine/sea_level_curve.hpp"
#include "atollog/engine/subsidence.hpp"
#include "atollog/engine/uth_age.hpp"
#include "atollog/engine/york_fit.hpp"
#include "test_fixture_dataset.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>
#include <string>
#include <vector>

using namespace atollog;
using atollog::test::cleanDataset;
using Catch::Matchers::Contains;

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kHuge = 1e300; // finite; its square is not
constexpr double kTiny = 1e-300; // positive; its square is 0
const std::vector<double> kNonFinite = {kNaN, kInf, -kInf};

/// f() must throw std::invalid_argument whose message contains `name` (any other exception, or
/// none, fails the test).
template <class F> void requireRefused(F&& f, const std::string& name) {
    try {
        f();
    } catch (const std::invalid_argument& e) {
        CHECK_THAT(std::string(e.what()), Contains(name));
        return;
    }
    FAIL("no std::invalid_argument; expected one naming '" << name << "'");
}

bool allFinite(double v) { return std::isfinite(v); }
bool allFinite(const std::optional<double>& v) { return !v || std::isfinite(*v); }

void requireFinite(const AgeDistribution& d) {
    CHECK(allFinite(d.mean_ma()));
    CHECK(allFinite(d.sd_ma()));
    CHECK(d.sd_ma() >= 0);
    CHECK(allFinite(d.support_min_ma()));
    CHECK(allFinite(d.support_max_ma()));
    for (const double p : {1e-9, 0.025, 0.5, 0.975, 1 - 1e-9}) CHECK(allFinite(d.quantile(p)));
    CHECK(allFinite(d.cdf(d.mean_ma())));
}

void requireFinite(const std::vector<AgeInterval>& v) {
    for (const AgeInterval& i : v) {
        CHECK(allFinite(i.young_ma));
        CHECK(allFinite(i.old_ma));
        CHECK(i.young_ma <= i.old_ma);
        CHECK(allFinite(i.probability));
    }
}

void requireFinite(const AccretionRate& r) {
    INFO("rate " << r.label);
    CHECK(allFinite(r.top_m));
    CHECK(allFinite(r.base_m));
    CHECK(allFinite(r.defined_share));
    for (const double v : {r.rate_q025_m_per_myr, r.rate_q500_m_per_myr, r.rate_q975_m_per_myr,
                           r.rate_q025_mm_per_yr, r.rate_q500_mm_per_yr, r.rate_q975_mm_per_yr})
        CHECK(allFinite(v));
}

/// Every number the model gives is finite; the grid's ages never decrease downward (a jump at a
/// surface is >= 0) and each kept draw is ordered in depth.
void requireFiniteOrdered(const AgeModel& m) {
    CHECK(allFinite(m.acceptance_rate));
    CHECK(m.acceptance_rate >= 0);
    CHECK(m.acceptance_rate <= 1);
    CHECK(allFinite(m.log10_acceptance));
    CHECK(allFinite(m.effective_draws));
    REQUIRE_FALSE(m.grid.empty());
    for (std::size_t i = 0; i < m.grid.size(); ++i) {
        const AgeGridRow& g = m.grid[i];
        INFO("grid row " << i << " at " << g.depth_m << " m");
        CHECK(allFinite(g.depth_m));
        CHECK(allFinite(g.age_q025_ma));
        CHECK(allFinite(g.age_q500_ma));
        CHECK(allFinite(g.age_q975_ma));
        CHECK(allFinite(g.age_mean_ma));
        CHECK(g.age_q025_ma <= g.age_q500_ma);
        CHECK(g.age_q500_ma <= g.age_q975_ma);
        // Medians of ordered draws are ordered, up to the histogram's one-bin error (0.2 % of
        // the range: streaming_quantiles.hpp).
        if (i > 0)
            CHECK(g.age_q500_ma >= m.grid[i - 1].age_q500_ma -
                                       0.01 * (std::fabs(g.age_q975_ma - g.age_q025_ma) + 1e-9));
    }
    for (const HiatusEstimate& h : m.hiatuses) {
        INFO("hiatus at " << h.depth_m << " m");
        CHECK(allFinite(h.depth_m));
        CHECK(allFinite(h.resolved_share));
        CHECK(allFinite(h.probability_positive));
        CHECK(allFinite(h.duration_q025_myr));
        CHECK(allFinite(h.duration_q500_myr));
        CHECK(allFinite(h.duration_q975_myr));
        if (h.duration_q025_myr) CHECK(*h.duration_q025_myr >= 0);
    }
    for (const AccretionRate& r : m.rates) requireFinite(r);
    for (const TieTail& t : m.tie_tails) {
        INFO("tie " << t.label);
        CHECK(allFinite(t.depth_q500_m));
        CHECK(allFinite(t.age_q500_ma));
        CHECK(allFinite(t.z_score));
        CHECK(allFinite(t.tail_probability));
    }
    for (const TieInfluence& t : m.outlier_ranking) {
        INFO("tie " << t.label);
        CHECK(allFinite(t.log10_acceptance_without));
        CHECK(allFinite(t.log10_gain));
    }
    for (const double w : m.draw_weights) CHECK(allFinite(w));
    REQUIRE(m.kept_age_draws_ma.size() == m.kept_depths_m.size());
    for (std::size_t k = 0; k < m.kept_age_draws_ma.size(); ++k) {
        for (std::size_t j = 0; j < m.kept_age_draws_ma[k].size(); ++j) {
            const double age = m.kept_age_draws_ma[k][j];
            if (!allFinite(age)) FAIL("kept draw " << j << " at " << m.kept_depths_m[k] << " m");
            // Kept depths are given ascending below, so each draw must be non-decreasing.
            if (k > 0 && age < m.kept_age_draws_ma[k - 1][j])
                FAIL("draw " << j << " is younger at " << m.kept_depths_m[k] << " m than above");
        }
    }
}

AgeTie tie(const std::string& label, double shallow_m, double deep_m, double age_ma,
           double sd_ma) {
    return AgeTie{"H1", label, AgeTieSource::Datum, shallow_m, deep_m,
                  AgeDistribution::normal(age_ma, sd_ma), {}};
}

/// Small runs: the Debug build must finish the whole file in seconds.
AgeModelSettings quickSettings() {
    AgeModelSettings s;
    s.draws = 600;
    s.burn_in_sweeps = 40;
    s.outlier_draws = 100;
    s.acceptance_draws = 200;
    s.grid_step_m = 1.0;
    return s;
}

AgeModel quickModel(std::vector<AgeTie> ties, AgeModelSettings s = quickSettings(),
                    std::vector<double> keep = {}) {
    return buildAgeModel("H1", std::move(ties), s, keep);
}

} // namespace

// ---------------------------------------------------------------------------------------------
// AgeDistribution

TEST_CASE("AgeDistribution::normal: non-finite and non-positive inputs are refused by name",
          "[edges][age_distribution]") {
    for (const double bad : kNonFinite) {
        requireRefused([&] { AgeDistribution::normal(bad, 1.0); }, "mean_ma");
        requireRefused([&] { AgeDistribution::normal(1.0, bad); }, "sd_ma");
    }
    requireRefused([] { AgeDistribution::normal(1.0, 0.0); }, "sd_ma");
    requireRefused([] { AgeDistribution::normal(1.0, -0.1); }, "sd_ma");
}

TEST_CASE("AgeDistribution::normal: huge and tiny values stay finite", "[edges][age_distribution]") {
    requireFinite(AgeDistribution::normal(kHuge, kHuge));
    requireFinite(AgeDistribution::normal(-kHuge, 1.0));
    requireFinite(AgeDistribution::normal(1.0, kTiny));
    requireFinite(AgeDistribution::normal(kTiny, kTiny));
    // mean +/- 8 sd must not overflow either: the support bounds are used as real ages.
    requireFinite(AgeDistribution::normal(1e307, 1e307));
    CHECK(AgeDistribution::normal(1.0, kTiny).quantile(0.5) == 1.0);
}

TEST_CASE("AgeDistribution::gridded: empty, non-finite and massless inputs are refused by name",
          "[edges][age_distribution]") {
    requireRefused([] { AgeDistribution::gridded({}, {}); }, "two ages");
    requireRefused([] { AgeDistribution::gridded({1.0}, {1.0}); }, "two ages");
    requireRefused([] { AgeDistribution::gridded({1.0, 2.0}, {1.0}); }, "densities");
    for (const double bad : kNonFinite) {
        requireRefused([&] { AgeDistribution::gridded({1.0, bad, 3.0}, {1, 1, 1}); }, "age 1");
        requireRefused([&] { AgeDistribution::gridded({1.0, 2.0, 3.0}, {1, bad, 1}); },
                       "density 1");
    }
    requireRefused([] { AgeDistribution::gridded({1.0, 2.0}, {1.0, -1.0}); }, "density 1");
    requireRefused([] { AgeDistribution::gridded({1.0, 2.0}, {0.0, 0.0}); }, "density");
    requireRefused([] { AgeDistribution::gridded({1.0, 1.0}, {1.0, 1.0}); }, "ascending");
    // Two finite ages whose difference overflows: no finite bin.
    requireRefused([] { AgeDistribution::gridded({-1e308, 1e308}, {1.0, 1.0}); }, "ages");
}

TEST_CASE("AgeDistribution::gridded: huge and tiny spans give finite, positive sds",
          "[edges][age_distribution]") {
    // Squares of 1e300 overflow and squares of 1e-300 underflow: the moments must not use them.
    for (const auto& [ages, label] :
         {std::pair{std::vector<double>{0.0, kHuge}, "huge"},
          std::pair{std::vector<double>{0.0, kTiny, 2 * kTiny}, "tiny"},
          std::pair{std::vector<double>{1000.0, 1000.0 + 1e-10}, "narrow far from 0"},
          std::pair{std::vector<double>{-kHuge, 0.0, kHuge}, "huge both sides"}}) {
        INFO(label);
        const AgeDistribution d =
            AgeDistribution::gridded(ages, std::vector<double>(ages.size(), 1.0));
        requireFinite(d);
        CHECK(d.sd_ma() > 0); // every bin has width, so the spread cannot be 0
        CHECK(d.mean_ma() >= d.support_min_ma());
        CHECK(d.mean_ma() <= d.support_max_ma());
    }
    // Densities of 1e-300 and 1e300 are fine: only their ratio matters.
    requireFinite(AgeDistribution::gridded({1.0, 2.0, 3.0}, {kTiny, kHuge, kTiny}));
}

TEST_CASE("AgeDistribution: NaN probes are refused", "[edges][age_distribution]") {
    const AgeDistribution n = AgeDistribution::normal(1.0, 0.1);
    const AgeDistribution g = AgeDistribution::gridded({1.0, 2.0}, {1.0, 1.0});
    for (const AgeDistribution& d : {n, g}) {
        requireRefused([&] { d.cdf(kNaN); }, "age");
        for (const double p : {kNaN, kInf, 0.0, 1.0, -kTiny})
            requireRefused([&] { d.quantile(p); }, "p must");
        CHECK(d.cdf(kInf) == 1.0);
        CHECK(d.cdf(-kInf) == 0.0);
    }
}

// ---------------------------------------------------------------------------------------------
// Highest-density intervals

TEST_CASE("highestDensityIntervals: bad levels refused, extreme distributions finite",
          "[edges][hpd]") {
    const AgeDistribution n = AgeDistribution::normal(1.0, 0.1);
    for (const double level : {kNaN, kInf, -kInf, 0.0, 1.0, -0.5, kHuge})
        requireRefused([&] { highestDensityIntervals(n, level); }, "level");
    requireFinite(highestDensityIntervals(AgeDistribution::normal(kHuge, kHuge), 0.954));
    requireFinite(highestDensityIntervals(AgeDistribution::normal(1.0, kTiny), 0.954));
    requireFinite(highestDensityIntervals(AgeDistribution::normal(1.0, 0.1), kTiny));
    requireFinite(highestDensityIntervals(AgeDistribution::normal(1.0, 0.1), 1 - 1e-16));
    const AgeDistribution tiny = AgeDistribution::gridded({0.0, kTiny, 2 * kTiny}, {1, 2, 1});
    const AgeDistribution huge = AgeDistribution::gridded({0.0, kHuge}, {1, 2});
    for (const AgeDistribution& d : {tiny, huge}) {
        const auto v = highestDensityIntervals(d, 0.683);
        CHECK_FALSE(v.empty());
        requireFinite(v);
    }
}

// ---------------------------------------------------------------------------------------------
// U-Th

TEST_CASE("U-Th helpers refuse non-finite inputs by name", "[edges][uth]") {
    const auto set = UThHalfLifeSet::Cheng2013;
    for (const double bad : kNonFinite) {
        requireRefused([&] { d234uPermilFromActivity(bad); }, "234U/238U");
        requireRefused([&] { uthRatiosForAge(bad, 146.8, set); }, "age_yr");
        requireRefused([&] { uthRatiosForAge(1000.0, bad, set); }, "initial d234U");
        requireRefused([&] { d234uInitialPermil(bad, 1000.0, set); }, "measured d234U");
        requireRefused([&] { d234uInitialPermil(146.8, bad, set); }, "age_yr");
        requireRefused([&] { solveUThAgeYr(bad, 146.8, set); }, "230Th/238U");
        requireRefused([&] { solveUThAgeYr(0.1, bad, set); }, "measured d234U");
        requireRefused([&] { solveUThAgeYr(0.1, 146.8, set, bad); }, "detrital 230Th/238U");
        requireRefused([&] { detritalTh230U238Act(bad, 3000.0, 4.4e-6, set); }, "th232_ppb");
        requireRefused([&] { detritalTh230U238Act(0.5, bad, 4.4e-6, set); }, "u238_ppb");
        requireRefused([&] { detritalTh230U238Act(0.5, 3000.0, bad, set); }, "230Th/232Th");
    }
    requireRefused([&] { uthRatiosForAge(-1.0, 146.8, set); }, "age_yr");
    requireRefused([&] { solveUThAgeYr(-0.1, 146.8, set); }, "230Th/238U");
    requireRefused([&] { solveUThAgeYr(0.1, -1000.0, set); }, "d234U");
    requireRefused([&] { solveUThAgeYr(0.1, 146.8, set, -kTiny); }, "detrital");
    requireRefused([&] { detritalTh230U238Act(-1.0, 3000.0, 4.4e-6, set); }, "th232_ppb");
    requireRefused([&] { detritalTh230U238Act(0.5, 0.0, 4.4e-6, set); }, "u238_ppb");
    requireRefused([&] { detritalTh230U238Act(0.5, -1.0, 4.4e-6, set); }, "u238_ppb");
}

TEST_CASE("U-Th helpers: huge and tiny values give finite answers or a named refusal",
          "[edges][uth]") {
    const auto set = UThHalfLifeSet::Cheng2013;
    for (const double age : {0.0, kTiny, 1e6, kHuge}) {
        INFO("age_yr " << age);
        const UThRatios r = uthRatiosForAge(age, 146.8, set);
        CHECK(allFinite(r.th230_u238_act));
        CHECK(allFinite(r.d234u_measured_permil));
    }
    CHECK(allFinite(d234uPermilFromActivity(kHuge)));
    CHECK(allFinite(d234uPermilFromActivity(kTiny)));
    // d234U_initial = d234U_m e^(l234 T): for T = 1e300 yr the factor overflows.
    requireRefused([&] { d234uInitialPermil(146.8, kHuge, set); }, "age_yr");
    CHECK(allFinite(d234uInitialPermil(kHuge, 0.0, set)));
    // An activity ratio of 1e306 gives a d234U beyond double range.
    requireRefused([&] { d234uPermilFromActivity(1e306); }, "234U/238U");
    for (const double ratio : {kTiny, kHuge}) {
        for (const double d234u : {-1000.0 + 1e-9, kTiny, kHuge}) {
            INFO("ratio " << ratio << " d234U " << d234u);
            const std::optional<double> t = solveUThAgeYr(ratio, d234u, set);
            CHECK(allFinite(t));
            if (t) CHECK(*t >= 0);
        }
    }
    CHECK_FALSE(solveUThAgeYr(0.1, 146.8, set, kHuge).has_value()); // all of it detrital
    CHECK(allFinite(detritalTh230U238Act(kTiny, 3000.0, 4.4e-6, set)));
    CHECK(allFinite(detritalTh230U238Act(0.5, kHuge, 4.4e-6, set)));
    // 1e300 ppb of 232Th over 1e-300 ppb of 238U: the atom ratio overflows.
    requireRefused([&] { detritalTh230U238Act(kHuge, kTiny, 4.4e-6, set); }, "th232_ppb");
}

namespace {

UThMeasurement coral() { return UThMeasurement{0.1, 0.001, 1.146, 0.002, 0.5, 3000.0}; }

void requireFinite(const UThAge& a) {
    CHECK(allFinite(a.age_yr));
    CHECK(allFinite(a.d234u_initial_permil));
    CHECK(allFinite(a.d234u_measured_permil));
    CHECK(allFinite(a.detrital_th230_u238_act));
    CHECK(a.draws_without_solution <= a.draws);
    if (a.spread) {
        const UThSpread& s = *a.spread;
        for (const double v : {s.mean_age_yr, s.sd_age_yr, s.q025_age_yr, s.median_age_yr,
                               s.q975_age_yr, s.mean_d234u_initial_permil,
                               s.sd_d234u_initial_permil})
            CHECK(allFinite(v));
        CHECK(s.q025_age_yr <= s.median_age_yr);
        CHECK(s.median_age_yr <= s.q975_age_yr);
    }
}

} // namespace

TEST_CASE("computeUThAge refuses bad measurements and settings by name", "[edges][uth]") {
    UThSettings s;
    s.mc_draws = 50;
    const auto refusedWith = [&](auto change, const std::string& name) {
        UThMeasurement m = coral();
        UThSettings settings = s;
        change(m, settings);
        requireRefused([&] { computeUThAge(m, settings, 7); }, name);
    };
    for (const double bad : kNonFinite) {
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.th230_u238_act = bad; },
                    "230Th/238U");
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.u234_u238_act = bad; },
                    "234U/238U");
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.th230_u238_act_sd = bad; },
                    "230Th/238U sd");
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.u234_u238_act_sd = bad; },
                    "234U/238U sd");
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.th232_ppb = bad; }, "th232_ppb");
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.u238_ppb = bad; }, "u238_ppb");
        refusedWith([&](UThMeasurement&, UThSettings& st) { st.detrital_ratio_relative_sd = bad; },
                    "detrital_ratio_relative_sd");
        refusedWith([&](UThMeasurement&, UThSettings& st) { st.detrital_th230_th232_atomic = bad; },
                    "230Th/232Th");
    }
    for (const double bad : {0.0, -0.001}) {
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.th230_u238_act_sd = bad; },
                    "230Th/238U sd");
        refusedWith([&](UThMeasurement& m, UThSettings&) { m.u234_u238_act_sd = bad; },
                    "234U/238U sd");
    }
    refusedWith([&](UThMeasurement& m, UThSettings&) { m.u234_u238_act = 0.0; }, "234U/238U");
    refusedWith([&](UThMeasurement& m, UThSettings&) { m.th230_u238_act = -0.1; }, "230Th/238U");
    for (const std::size_t draws : {std::size_t{0}, std::size_t{1}})
        refusedWith([&](UThMeasurement&, UThSettings& st) { st.mc_draws = draws; }, "mc_draws");
}

TEST_CASE("computeUThAge: huge and tiny measurements and sds give finite results",
          "[edges][uth]") {
    UThSettings s;
    s.mc_draws = 200;
    const auto run = [&](auto change) {
        UThMeasurement m = coral();
        change(m);
        return computeUThAge(m, s, 11);
    };
    requireFinite(run([](UThMeasurement& m) { m.th230_u238_act_sd = kTiny; }));
    requireFinite(run([](UThMeasurement& m) { m.u234_u238_act_sd = kTiny; }));
    requireFinite(run([](UThMeasurement& m) { m.th230_u238_act_sd = kHuge; }));
    requireFinite(run([](UThMeasurement& m) { m.u234_u238_act_sd = kHuge; }));
    requireFinite(run([](UThMeasurement& m) { m.th230_u238_act = kHuge; }));
    requireFinite(run([](UThMeasurement& m) { m.th230_u238_act = kTiny; }));
    requireFinite(run([](UThMeasurement& m) { m.u234_u238_act = kHuge; }));
    // 234U/238U of 1e-300: d234U rounds to -1000 per mil, where the age equation has no meaning.
    requireRefused([&] { run([](UThMeasurement& m) { m.u234_u238_act = kTiny; }); }, "234U/238U");
    requireFinite(run([](UThMeasurement& m) { m.th232_ppb = kTiny; }));
    requireFinite(run([](UThMeasurement& m) { m.u238_ppb = kHuge; }));
    // A 230Th/238U of 1e300 has no closed-system age: reported, not made up.
    CHECK_FALSE(run([](UThMeasurement& m) { m.th230_u238_act = kHuge; }).age_yr.has_value());
}

// ---------------------------------------------------------------------------------------------
// Radiocarbon

namespace {

std::vector<CalibrationPoint> straightCurve() {
    // An invented linear curve: c14 age = calendar age, sd 20 yr, over 0..5000 cal BP.
    return {{0.0, 0.0, 20.0, {}}, {5000.0, 5000.0, 20.0, {}}};
}

void requireFinite(const CalibratedAge& c) {
    requireFinite(c.age);
    requireFinite(c.hpd_68);
    requireFinite(c.hpd_95);
    CHECK_FALSE(c.hpd_95.empty());
    CHECK(allFinite(c.grid_step_yr));
    CHECK(c.grid_step_yr > 0);
}

} // namespace

TEST_CASE("conventionalAge and applyDeltaR refuse bad numbers by name", "[edges][radiocarbon]") {
    for (const double bad : kNonFinite) {
        requireRefused([&] { conventionalAge(bad, 0.004); }, "f14c");
        requireRefused([&] { conventionalAge(0.5, bad); }, "f14c_sd");
        requireRefused([&] { applyDeltaR({1000.0, 30.0}, bad, 10.0); }, "delta_r_yr");
        requireRefused([&] { applyDeltaR({1000.0, 30.0}, 50.0, bad); }, "delta_r_sd_yr");
        requireRefused([&] { applyDeltaR({bad, 30.0}, 50.0, 10.0); }, "CRA");
        requireRefused([&] { applyDeltaR({1000.0, bad}, 50.0, 10.0); }, "CRA");
    }
    for (const double bad : {0.0, -0.5}) {
        requireRefused([&] { conventionalAge(bad, 0.004); }, "f14c");
        requireRefused([&] { conventionalAge(0.5, bad); }, "f14c_sd");
    }
    requireRefused([&] { applyDeltaR({1000.0, 30.0}, 50.0, -1.0); }, "delta_r_sd_yr");
    requireRefused([&] { applyDeltaR({1000.0, -1.0}, 50.0, 1.0); }, "CRA");
    C14Measurement sd_only{0.5, 0.004, std::nullopt, 40.0};
    requireRefused([&] { radiocarbonAgeOf(sd_only); }, "delta_r_sd_yr");
}

TEST_CASE("conventionalAge and applyDeltaR: huge and tiny values finite or refused by name",
          "[edges][radiocarbon]") {
    for (const double f : {kTiny, kHuge, 1.0}) {
        for (const double sd : {kTiny, 1.0}) {
            INFO("f14c " << f << " sd " << sd);
            const RadiocarbonAge a = conventionalAge(f, sd);
            CHECK(allFinite(a.cra_yr));
            CHECK(allFinite(a.cra_sd_yr));
        }
    }
    // sd / f14c = 1e300 / 1e-300 overflows: the sd of the CRA would be infinite.
    requireRefused([] { conventionalAge(kTiny, kHuge); }, "f14c_sd");
    const RadiocarbonAge r = applyDeltaR({kHuge, kHuge}, -kHuge, kHuge);
    CHECK(allFinite(r.cra_yr));
    CHECK(allFinite(r.cra_sd_yr));
    // 1e308 - (-1e308) overflows.
    requireRefused([] { applyDeltaR({1e308, 30.0}, -1e308, 10.0); }, "delta_r_yr");
    const RadiocarbonAge t = applyDeltaR({1000.0, kTiny}, kTiny, kTiny);
    CHECK(allFinite(t.cra_sd_yr));
}

TEST_CASE("calibrate refuses bad curves and CRAs by name", "[edges][radiocarbon]") {
    requireRefused([] { calibrate({1000.0, 30.0}, {}); }, "two points");
    requireRefused([] { calibrate({1000.0, 30.0}, {{0.0, 0.0, 20.0, {}}}); }, "two points");
    for (const double bad : kNonFinite) {
        requireRefused([&] { calibrate({bad, 30.0}, straightCurve()); }, "CRA");
        requireRefused([&] { calibrate({1000.0, bad}, straightCurve()); }, "CRA");
        for (int field = 0; field < 3; ++field) {
            auto c = straightCurve();
            (field == 0 ? c[1].cal_bp : field == 1 ? c[1].c14_bp : c[1].sd) = bad;
            requireRefused([&] { calibrate({1000.0, 30.0}, c); }, "curve point 1");
        }
    }
    auto negative = straightCurve();
    negative[0].sd = -1.0;
    requireRefused([&] { calibrate({1000.0, 30.0}, negative); }, "curve point 0");
    auto twice = straightCurve();
    twice[1].cal_bp = twice[0].cal_bp;
    requireRefused([&] { calibrate({1000.0, 30.0}, twice); }, "cal_bp");
    auto exact = straightCurve();
    exact[0].sd = exact[1].sd = 0.0;
    requireRefused([&] { calibrate({1000.0, 0.0}, exact); }, "sd");
    // Two finite calendar ages whose span overflows.
    requireRefused([] { calibrate({1000.0, 30.0}, {{-1e308, 0.0, 20.0, {}}, {1e308, 5.0, 20.0, {}}}); },
                   "cal_bp");
}

TEST_CASE("calibrate: far-off, huge, tiny and very short curves give finite distributions",
          "[edges][radiocarbon]") {
    SECTION("a CRA of 1e300 yr lies far beyond the curve: piled at its old end, or refused") {
        try {
            const CalibratedAge c = calibrate({kHuge, 30.0}, straightCurve());
            requireFinite(c);
            CHECK(c.at_curve_edge);
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains("cra_yr"));
        }
    }
    SECTION("a CRA sd of 1e300 yr: flat over the curve") {
        const CalibratedAge c = calibrate({1000.0, kHuge}, straightCurve());
        requireFinite(c);
        CHECK(c.at_curve_edge);
    }
    SECTION("a CRA sd of 1e-300 yr with a curve sd") {
        requireFinite(calibrate({1000.0, kTiny}, straightCurve()));
    }
    SECTION("a curve shorter than one year still has two grid points") {
        const CalibratedAge c = calibrate({100.0, 30.0}, {{0.0, 100.0, 20.0, {}},
                                                          {0.5, 100.0, 20.0, {}}});
        requireFinite(c);
    }
    SECTION("a curve of 1e-300 yr") {
        requireFinite(calibrate({100.0, 30.0}, {{0.0, 100.0, 20.0, {}}, {kTiny, 100.0, 20.0, {}}}));
    }
    SECTION("a curve spanning 1e300 yr is gridded coarsely") {
        const CalibratedAge c =
            calibrate({1000.0, 30.0}, {{0.0, 0.0, 20.0, {}}, {kHuge, kHuge, 20.0, {}}});
        requireFinite(c);
    }
}

// ---------------------------------------------------------------------------------------------
// computeDateAges

namespace {

void requireFinite(const DateAge& a) {
    INFO("dates row " << a.date_index + 1);
    CHECK(allFinite(a.shallow_m));
    CHECK(allFinite(a.deep_m));
    CHECK(a.shallow_m <= a.deep_m);
    if (a.age) requireFinite(*a.age);
    for (const auto& v : {a.age_ka, a.age_sd_ka, a.d234u_initial_permil, a.d234u_initial_sd_permil,
                          a.uth_age_yr, a.uth_q025_ka, a.uth_q975_ka, a.cra_yr, a.cra_sd_yr})
        CHECK(allFinite(v));
    requireFinite(a.hpd_68);
    requireFinite(a.hpd_95);
}

DateSettings quickDates() {
    DateSettings s;
    s.mc_draws = 100;
    return s;
}

} // namespace

TEST_CASE("computeDateAges refuses bad settings by name", "[edges][dates]") {
    const CoreDataset d = cleanDataset();
    const auto refusedWith = [&](auto change, const std::string& name) {
        DateSettings s = quickDates();
        change(s);
        requireRefused([&] { computeDateAges(d, s); }, name);
    };
    for (const double bad : kNonFinite) {
        refusedWith([&](DateSettings& s) { s.d234u_tolerance_permil = bad; },
                    "d234u_tolerance_permil");
        refusedWith([&](DateSettings& s) { s.detrital_th230_th232_atomic = bad; },
                    "detrital_th230_th232_atomic");
        refusedWith([&](DateSettings& s) { s.detrital_ratio_relative_sd = bad; },
                    "detrital_ratio_relative_sd");
    }
    refusedWith([](DateSettings& s) { s.d234u_tolerance_permil = -1; }, "d234u_tolerance_permil");
    refusedWith([](DateSettings& s) { s.detrital_ratio_relative_sd = -kTiny; },
                "detrital_ratio_relative_sd");
    refusedWith([](DateSettings& s) { s.mc_draws = 0; }, "mc_draws");
    refusedWith([](DateSettings& s) { s.mc_draws = 1; }, "mc_draws");
}

TEST_CASE("computeDateAges refuses non-finite dates naming the row and the input",
          "[edges][dates]") {
    // cleanDataset: row 1 U-Th of sample S3, row 2 c14 at depth 7 m, row 3 Sr entered as an age.
    CoreDataset d = cleanDataset();
    for (const double bad : kNonFinite) {
        INFO("value " << bad);
        CoreDataset c = d;
        c.dates[0].uth->th230_u238_act = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "dates row 1");
        requireRefused([&] { computeDateAges(c, quickDates()); }, "230Th/238U");
        c = d;
        c.dates[0].uth->u234_u238_act_sd = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "234U/238U sd");
        c = d;
        c.dates[1].c14->f14c = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "dates row 2");
        requireRefused([&] { computeDateAges(c, quickDates()); }, "f14c");
        c = d;
        c.dates[1].c14->delta_r_yr = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "delta_r_yr");
        c = d;
        c.dates[1].depth_m = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "dates row 2");
        requireRefused([&] { computeDateAges(c, quickDates()); }, "depth_m");
        c = d;
        c.dates[2].age_ma = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "dates row 3");
        requireRefused([&] { computeDateAges(c, quickDates()); }, "age_ma");
        c = d;
        c.dates[2].age_sd_ma = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "age_sd_ma");
        c = d;
        c.samples[2].top_m = bad; // S3, the U-Th sample
        requireRefused([&] { computeDateAges(c, quickDates()); }, "dates row 1");
        requireRefused([&] { computeDateAges(c, quickDates()); }, "S3");
        c = d;
        c.curve[1].c14_bp = bad;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "curve point");
    }
    for (const double sd : {0.0, -0.1}) {
        CoreDataset c = d;
        c.dates[2].age_sd_ma = sd;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "age_sd_ma");
        c = d;
        c.dates[1].c14->f14c_sd = sd;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "f14c_sd");
    }
}

TEST_CASE("computeDateAges: empty inputs, 0 % recovery and extreme values stay finite",
          "[edges][dates]") {
    CoreDataset d = cleanDataset();
    SECTION("no dates") {
        d.dates.clear();
        CHECK(computeDateAges(d, quickDates()).empty());
    }
    SECTION("no calibration curve: the c14 date is kept out of models, not made up") {
        d.curve.clear();
        const auto ages = computeDateAges(d, quickDates());
        for (const DateAge& a : ages) requireFinite(a);
        CHECK_FALSE(ages[1].usable_for_model);
    }
    SECTION("every run with 0 % recovery: brackets span whole runs, ties give a finite model") {
        for (CoreRun& r : d.runs) r.recovered_m = 0.0;
        const auto ages = computeDateAges(d, quickDates());
        for (const DateAge& a : ages) requireFinite(a);
        std::vector<AgeTie> ties;
        for (AgeTie& t : ageTiesFromDates(ages))
            if (t.hole == "VEY-1") ties.push_back(std::move(t));
        REQUIRE_FALSE(ties.empty());
        AgeModelSettings s = quickSettings();
        const AgeModel m = buildAgeModel("VEY-1", ties, s);
        requireFiniteOrdered(m);
    }
    SECTION("a hole without runs: brackets are the sample's own") {
        d.runs.clear();
        for (const DateAge& a : computeDateAges(d, quickDates())) requireFinite(a);
    }
    SECTION("huge and tiny entered ages and sds") {
        for (const auto& [age, sd] : {std::pair{kHuge, 1.0}, std::pair{1.0, kHuge},
                                      std::pair{kTiny, kTiny}, std::pair{1.0, kTiny}}) {
            INFO("age " << age << " sd " << sd);
            CoreDataset c = d;
            c.dates[2].age_ma = age;
            c.dates[2].age_sd_ma = sd;
            for (const DateAge& a : computeDateAges(c, quickDates())) requireFinite(a);
        }
        // age_ka = 1e3 x age_ma overflows for 1e306 Ma.
        CoreDataset c = d;
        c.dates[2].age_ma = 1e306;
        requireRefused([&] { computeDateAges(c, quickDates()); }, "age_ma");
    }
    SECTION("U-Th sds of 1e-300 and no detrital correction: a finite (tiny) spread, or no "
            "spread refused by name") {
        CoreDataset c = d;
        c.dates[0].uth->th230_u238_act_sd = kTiny;
        c.dates[0].uth->u234_u238_act_sd = kTiny;
        c.dates[0].uth->th232_ppb.reset();
        try {
            for (const DateAge& a : computeDateAges(c, quickDates())) requireFinite(a);
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains("dates row 1") && Contains("230Th/238U sd"));
        }
    }
    SECTION("huge and tiny depths") {
        for (const double depth : {kHuge, kTiny, 0.0}) {
            CoreDataset c = d;
            c.dates[1].depth_m = depth;
            for (const DateAge& a : computeDateAges(c, quickDates())) requireFinite(a);
        }
    }
    SECTION("huge and tiny raw measurements") {
        CoreDataset c = d;
        c.dates[0].uth->th230_u238_act_sd = kTiny;
        c.dates[0].uth->th232_ppb = kTiny;
        c.dates[1].c14->f14c = kTiny;
        c.dates[1].c14->delta_r_sd_yr = kTiny;
        for (const DateAge& a : computeDateAges(c, quickDates())) requireFinite(a);
        c = d;
        c.dates[0].uth->u234_u238_act_sd = kHuge;
        c.dates[1].c14->f14c = kHuge;
        for (const DateAge& a : computeDateAges(c, quickDates())) requireFinite(a);
    }
}

// ---------------------------------------------------------------------------------------------
// buildAgeModel

TEST_CASE("buildAgeModel refuses bad settings by name", "[edges][age_model]") {
    const std::vector<AgeTie> ties = {tie("a", 5, 6, 1.0, 0.1), tie("b", 10, 12, 2.0, 0.1)};
    const auto refusedWith = [&](auto change, const std::string& name,
                                 std::vector<double> keep = {}) {
        AgeModelSettings s = quickSettings();
        change(s);
        requireRefused([&] { buildAgeModel("H1", ties, s, keep); }, name);
    };
    requireRefused([&] { buildAgeModel("", ties, quickSettings()); }, "hole name");
    for (const double bad : kNonFinite) {
        INFO("value " << bad);
        refusedWith([&](AgeModelSettings& s) { s.grid_step_m = bad; }, "grid_step_m");
        refusedWith([&](AgeModelSettings& s) { s.core_top->age_ma = bad; }, "core top age");
        refusedWith([&](AgeModelSettings& s) { s.core_top->sd_ma = bad; }, "core top sd");
        refusedWith([&](AgeModelSettings& s) { s.extrapolate_to_m = bad; }, "extrapolate_to_m");
        refusedWith([&](AgeModelSettings& s) { s.section_base_m = bad; }, "section_base_m");
        refusedWith([&](AgeModelSettings& s) { s.basement_contact_m = bad; },
                    "basement_contact_m");
        refusedWith([&](AgeModelSettings& s) { s.hiatus_depths_m = {bad}; }, "hiatus depth");
        refusedWith([&](AgeModelSettings& s) { s.rate_intervals = {{"reef", bad, 8.0, true}}; },
                    "rate interval 'reef'");
        refusedWith([&](AgeModelSettings& s) { s.rate_intervals = {{"reef", 6.0, bad, true}}; },
                    "rate interval 'reef'");
        refusedWith([](AgeModelSettings&) {}, "kept depth", {bad});
    }
    for (const double step : {0.0, -1.0, kTiny})
        refusedWith([&](AgeModelSettings& s) { s.grid_step_m = step; }, "grid_step_m");
    refusedWith([](AgeModelSettings& s) { s.core_top->sd_ma = -1; }, "core top sd");
    refusedWith([](AgeModelSettings& s) { s.core_top->age_ma = kHuge; }, "core top age");
    refusedWith([](AgeModelSettings& s) { s.section_base_m = 0.0; }, "section_base_m");
    refusedWith([](AgeModelSettings& s) { s.hiatus_depths_m = {-1.0}; }, "hiatus depth");
    // A rate interval of zero thickness has no rate.
    refusedWith([](AgeModelSettings& s) { s.rate_intervals = {{"thin", 7.0, 7.0, false}}; },
                "rate interval 'thin'");
    refusedWith([](AgeModelSettings& s) { s.rate_intervals = {{"far", 7.0, kHuge, false}}; },
                "rate interval 'far'");
    refusedWith([](AgeModelSettings&) {}, "kept depth", {kHuge});
    refusedWith([](AgeModelSettings& s) { s.draws = 0; }, "draws");
    refusedWith([](AgeModelSettings& s) { s.acceptance_draws = 0; }, "acceptance_draws");
}

TEST_CASE("buildAgeModel refuses bad ties naming the tie", "[edges][age_model]") {
    const AgeModelSettings s = quickSettings();
    for (const double bad : kNonFinite) {
        requireRefused([&] { quickModel({tie("a", bad, 6, 1.0, 0.1)}); }, "tie 'a'");
        requireRefused([&] { quickModel({tie("a", 5, bad, 1.0, 0.1)}); }, "tie 'a'");
    }
    requireRefused([&] { quickModel({tie("a", 6, 5, 1.0, 0.1)}); }, "tie 'a'");
    requireRefused([&] { quickModel({tie("a", -1, 5, 1.0, 0.1)}); }, "tie 'a'");
    // Ages beyond 1e6 Ma are no geology (age_model_inputs.cpp); the mean or the sd may be it.
    requireRefused([&] { quickModel({tie("old", 5, 6, kHuge, 1.0)}); }, "tie 'old'");
    requireRefused([&] { quickModel({tie("wide", 5, 6, 1.0, kHuge)}); }, "tie 'wide'");
    AgeTie other = tie("x", 5, 6, 1.0, 0.1);
    other.hole = "H2";
    requireRefused([&] { quickModel({other}); }, "tie 'x'");
    // A tie 1e300 m deep: the grid would need 2e300 depths; the message must say why.
    requireRefused([&] { quickModel({tie("deep", kHuge, kHuge, 1.0, 0.1)}); }, "grid");
}

TEST_CASE("buildAgeModel: no tie, one tie, all ties at one depth", "[edges][age_model]") {
    AgeModelSettings s = quickSettings();
    SECTION("no tie at all") {
        requireRefused([&] { quickModel({}); }, "no tie");
        s.core_top.reset();
        requireRefused([&] { quickModel({}, s); }, "no tie");
    }
    SECTION("one tie with the core top") { requireFiniteOrdered(quickModel({tie("a", 4, 6, 1, 0.1)})); }
    SECTION("one tie and no core top") {
        s.core_top.reset();
        requireRefused([&] { quickModel({tie("a", 4, 6, 1.0, 0.1)}, s); }, "two ties");
    }
    SECTION("one point tie 1e-300 m below the collar") {
        requireFiniteOrdered(quickModel({tie("a", kTiny, kTiny, 1.0, 0.1)}));
    }
    SECTION("all ties at one point depth, with the core top") {
        requireFiniteOrdered(quickModel(
            {tie("a", 5, 5, 1.0, 0.1), tie("b", 5, 5, 2.0, 0.1), tie("c", 5, 5, 0.5, 0.1)}));
    }
    SECTION("all ties in one bracket, with the core top, and hiatus and rate inside it") {
        s.hiatus_depths_m = {5.5};
        s.rate_intervals = {{"bed", 5.0, 6.0, true}};
        requireFiniteOrdered(quickModel(
            {tie("a", 5, 6, 1.0, 0.1), tie("b", 5, 6, 2.0, 0.1), tie("c", 5, 6, 0.5, 0.1)}, s,
            {5.0, 5.5, 6.0}));
    }
    SECTION("all ties at one depth without the core top: no depth span") {
        s.core_top.reset();
        requireRefused([&] { quickModel({tie("a", 5, 5, 1.0, 0.1), tie("b", 5, 5, 2.0, 0.1)}, s); },
                       "span no depth");
    }
    SECTION("an open core top over ties at one depth") {
        s.core_top = CoreTopAge{0.0, 0.0, true};
        requireFiniteOrdered(quickModel({tie("a", 5, 5, 1.0, 0.1), tie("b", 5, 5, 2.0, 0.1)}, s));
    }
}

TEST_CASE("buildAgeModel: ties out of order far beyond their sds stay ordered, finite, flagged",
          "[edges][age_model]") {
    AgeModelSettings s = quickSettings();
    s.hiatus_depths_m = {15.0};
    s.rate_intervals = {{"upper", 2.0, 14.0, true}, {"lower", 16.0, 28.0, false}};
    const std::vector<double> keep = {0.0, 5.0, 10.0, 15.0, 20.0, 25.0, 30.0};
    // "b" claims 0.2 Ma below "a" at 5 Ma: 480 sds apart; "d" at 0.1 Ma lies below "c" at 8 Ma.
    const std::vector<AgeTie> ties = {tie("a", 9, 11, 5.0, 0.01), tie("b", 19, 21, 0.2, 0.01),
                                      tie("c", 24, 26, 8.0, 0.01), tie("d", 29, 30, 0.1, 0.01)};
    const auto check = [&](const AgeModel& m) {
        requireFiniteOrdered(m);
        bool flagged = false;
        for (const TieTail& t : m.tie_tails)
            if (t.likely_outlier) flagged = true;
        CHECK(flagged);
        // Independent draws almost never come out in this order: the estimate may underflow to
        // 0, but its log stays finite (age_model.hpp).
        CHECK(m.log10_acceptance < -2);
    };
    SECTION("normal ties") { check(quickModel(ties, s, keep)); }
    SECTION("normal ties with sds of 1e-300 Ma") {
        std::vector<AgeTie> sharp = ties;
        for (AgeTie& t : sharp) t.age = AgeDistribution::normal(t.age.mean_ma(), kTiny);
        check(quickModel(sharp, s, keep));
    }
    SECTION("gridded ties a hair wide (their sd may round to 0)") {
        std::vector<AgeTie> narrow = ties;
        for (AgeTie& t : narrow) {
            const double a = t.age.mean_ma();
            t.age = AgeDistribution::gridded({a, a + 1e-12}, {1.0, 1.0});
        }
        check(quickModel(narrow, s, keep));
    }
    SECTION("an exact core top older than every tie") {
        s.core_top = CoreTopAge{50.0, 0.0, false};
        check(quickModel(ties, s, keep));
    }
    SECTION("an open core top") {
        s.core_top = CoreTopAge{0.0, 0.0, true};
        check(quickModel(ties, s, keep));
    }
    SECTION("extrapolated below the deepest tie, cut at the basement") {
        s.extrapolate_below = true;
        s.extrapolate_to_m = 40.0;
        s.basement_contact_m = 35.0;
        std::vector<AgeTie> with_lava = ties;
        with_lava.push_back(tie("lava1", 36, 36, 9.0, 0.1));
        with_lava.push_back(tie("lava2", 37, 37, 3.0, 0.1)); // scattered far beyond its sd
        requireFiniteOrdered(quickModel(with_lava, s, keep));
    }
}

TEST_CASE("buildAgeModel: huge and tiny spans of depth and age stay finite", "[edges][age_model]") {
    AgeModelSettings s = quickSettings();
    SECTION("ties 1e-15 m apart, far closer than a grid step") {
        s.core_top.reset();
        requireFiniteOrdered(quickModel({tie("a", 1.0, 1.0, 1.0, 0.1),
                                         tie("b", 1.0 + 1e-15, 1.0 + 1e-15, 2.0, 0.1),
                                         tie("c", 2.0, 2.0, 3.0, 0.1)},
                                        s));
    }
    SECTION("ages a whisker apart over metres: rates near the cap stay finite") {
        requireFiniteOrdered(quickModel({tie("a", 10, 10, 1.0, kTiny), tie("b", 20, 20, 1.0, kTiny)}));
    }
    SECTION("a grid step as big as the model") {
        s.grid_step_m = kHuge;
        requireFiniteOrdered(quickModel({tie("a", 10, 12, 1.0, 0.1)}, s));
    }
    SECTION("ages near the 1e6 Ma limit") {
        requireFiniteOrdered(quickModel({tie("a", 10, 12, 9e5, 1e4), tie("b", 20, 22, 1.0, 0.1)}));
    }
}

// ---------------------------------------------------------------------------------------------
// Accretion rates, decompaction, accumulation

TEST_CASE("completeAccretionRate: non-finite quantiles refused, extremes finite",
          "[edges][rates]") {
    for (const double bad : kNonFinite) {
        AccretionRate r;
        r.label = "reef";
        r.defined_share = 1;
        r.rate_q500_m_per_myr = bad;
        requireRefused([&] { completeAccretionRate(r); }, "rate_q500_m_per_myr");
    }
    for (const double v : {0.0, kTiny, kHuge}) {
        AccretionRate r;
        r.defined_share = 1;
        r.rate_q025_m_per_myr = r.rate_q500_m_per_myr = r.rate_q975_m_per_myr = v;
        completeAccretionRate(r);
        requireFinite(r);
        CHECK(r.median_outside_reef_range); // 0, 1e-303 and 1e297 mm/yr are all outside 1-10
    }
    AccretionRate none; // defined in no draw: all zero, never flagged
    completeAccretionRate(none);
    requireFinite(none);
    CHECK_FALSE(none.median_outside_reef_range);
}

TEST_CASE("decompaction refuses bad numbers by name", "[edges][decompaction]") {
    const PorosityLaw chalk = builtInPorosityLaw("chalk");
    for (const double bad : kNonFinite) {
        requireRefused([&] { validatePorosityLaw({bad, 1000.0}); }, "phi0");
        requireRefused([&] { validatePorosityLaw({0.5, bad}); }, "decay_length_m");
        requireRefused([&] { porosityAt(chalk, bad); }, "depth_m");
        requireRefused([&] { solidThicknessM(chalk, bad, 10.0); }, "top_m");
        requireRefused([&] { solidThicknessM(chalk, 0.0, bad); }, "base_m");
        requireRefused([&] { decompactLayer(bad, 10.0, 0.0, chalk); }, "top_m");
        requireRefused([&] { decompactLayer(0.0, bad, 0.0, chalk); }, "base_m");
        requireRefused([&] { decompactLayer(0.0, 10.0, bad, chalk); }, "new_top_m");
    }
    for (const double phi0 : {1.0, -0.1}) requireRefused([&] { validatePorosityLaw({phi0, 1.0}); }, "phi0");
    for (const double l : {0.0, -1.0}) requireRefused([&] { validatePorosityLaw({0.5, l}); }, "decay_length_m");
    // A zero-thickness layer has no solids to conserve.
    requireRefused([&] { decompactLayer(10.0, 10.0, 0.0, chalk); }, "base_m");
    requireRefused([&] { solidThicknessM(chalk, 10.0, 10.0); }, "base_m");
    requireRefused([&] { decompactLayer(0.0, 10.0, -1.0, chalk); }, "new_top_m");
    requireRefused([&] { builtInPorosityLaw("limestone"); }, "limestone");
}

TEST_CASE("decompaction: huge, tiny and nearly all-pore layers give finite, ordered layers",
          "[edges][decompaction]") {
    const PorosityLaw chalk = builtInPorosityLaw("chalk");
    const PorosityLaw tiny_l{0.5, kTiny};
    const PorosityLaw huge_l{0.5, kHuge};
    const PorosityLaw porous{0.9999, 2000.0};
    for (const PorosityLaw& law : {chalk, tiny_l, huge_l, porous}) {
        for (const auto& [top, base, new_top] :
             {std::tuple{0.0, kTiny, 0.0}, std::tuple{1000.0, 1000.1, 0.0},
              std::tuple{0.0, 1e-10, 5.0}, std::tuple{kHuge, 2 * kHuge, 0.0},
              std::tuple{0.0, 100.0, kHuge}, std::tuple{500.0, 600.0, kTiny}}) {
            INFO("phi0 " << law.phi0 << " L " << law.decay_length_m << " layer " << top << ".."
                         << base << " to " << new_top);
            CHECK(allFinite(porosityAt(law, top)));
            const double solid = solidThicknessM(law, top, base);
            CHECK(allFinite(solid));
            CHECK(solid >= 0);
            CHECK(solid <= base - top);
            const DecompactedLayer d = decompactLayer(top, base, new_top, law);
            CHECK(allFinite(d.top_m));
            CHECK(allFinite(d.base_m));
            CHECK(d.base_m >= d.top_m);
            CHECK(allFinite(d.thickness_m()));
        }
    }
}

TEST_CASE("accumulation refuses bad numbers by name", "[edges][accumulation]") {
    for (const double bad : kNonFinite) {
        requireRefused([&] { massAccumulationRate_g_cm2_kyr(bad, 2.0); }, "lsr_cm_per_kyr");
        requireRefused([&] { massAccumulationRate_g_cm2_kyr(1.0, bad); }, "dry_density_g_cm3");
        requireRefused([&] { carbonateAccumulationRate_g_cm2_kyr(bad, 90.0); }, "mar_g_cm2_kyr");
        requireRefused([&] { carbonateAccumulationRate_g_cm2_kyr(1.0, bad); }, "caco3_pct");
        const std::vector<double> p = {bad};
        const std::vector<double> one = {1.0};
        requireRefused([&] { accumulationFromLsrQuantiles(p, one, 2.0, std::nullopt); },
                       "probability");
        requireRefused([&] { accumulationFromLsrDraws(one, p, 2.0, std::nullopt); }, "probability");
        requireRefused([&] { accumulationFromLsrQuantiles(one, p, 2.0, std::nullopt); },
                       "lsr_cm_per_kyr");
        requireRefused([&] { accumulationFromLsrDraws(p, one, 2.0, std::nullopt); }, "LSR draw");
        requireRefused([&] { accumulationFromLsrDraws(one, one, 2.0, bad); }, "caco3_pct");
    }
    requireRefused([] { massAccumulationRate_g_cm2_kyr(-1.0, 2.0); }, "lsr_cm_per_kyr");
    for (const double rho : {0.0, -1.0})
        requireRefused([&] { massAccumulationRate_g_cm2_kyr(1.0, rho); }, "dry_density_g_cm3");
    requireRefused([] { carbonateAccumulationRate_g_cm2_kyr(1.0, 101.0); }, "caco3_pct");
    const std::vector<double> none, two = {0.5, 0.9}, one = {1.0};
    requireRefused([&] { accumulationFromLsrDraws(none, two, 2.0, std::nullopt); }, "LSR draws");
    requireRefused([&] { accumulationFromLsrQuantiles(two, one, 2.0, std::nullopt); },
                   "probabilities");
    // 1e300 cm/kyr x 1e300 g/cm3 overflows.
    requireRefused([] { massAccumulationRate_g_cm2_kyr(kHuge, kHuge); }, "dry_density_g_cm3");
}

TEST_CASE("accumulation: empty, huge and tiny inputs give finite quantiles", "[edges][accumulation]") {
    const std::vector<double> none;
    CHECK(accumulationFromLsrQuantiles(none, none, 2.0, 90.0).empty());
    const std::vector<double> draws = {kTiny, 1.0, kHuge, 0.0};
    const std::vector<double> p = {0.0, 0.025, 0.5, 0.975, 1.0};
    for (const double rho : {kTiny, 1.9}) {
        for (const AccumulationQuantile& q : accumulationFromLsrDraws(draws, p, rho, 100.0)) {
            CHECK(allFinite(q.lsr_cm_per_kyr));
            CHECK(allFinite(q.mar_g_cm2_kyr));
            CHECK(allFinite(q.car_g_cm2_kyr));
        }
    }
    CHECK(allFinite(carbonateAccumulationRate_g_cm2_kyr(kHuge, 100.0)));
    CHECK(allFinite(massAccumulationRate_g_cm2_kyr(kTiny, kTiny)));
}

// ---------------------------------------------------------------------------------------------
// Sea level, subsidence, reference depth curves

namespace {

void requireFinite(const DrawSummary& s) {
    for (const double v : {s.p2_5, s.p50, s.p97_5, s.mean, s.sd}) CHECK(allFinite(v));
}

void requireFinite(const SubsidenceEstimate& e) {
    CHECK(allFinite(e.present_depth_below_sea_level_m));
    requireFinite(e.subsidence_m);
    requireFinite(e.age_ma);
    if (e.rate_m_per_myr) requireFinite(*e.rate_m_per_myr);
    CHECK(allFinite(e.subsidence_age_correlation));
}

SeaLevelCurve glacialCurve() {
    const std::vector<SeaLevelPoint> p = {{0.0, 0.0, 1.0, {}}, {0.02, -120.0, 5.0, {}}};
    return SeaLevelCurve(p);
}

} // namespace

TEST_CASE("SeaLevelCurve refuses bad points and ages by name", "[edges][sea_level]") {
    for (const double bad : kNonFinite) {
        std::vector<SeaLevelPoint> p = {{0.0, 0.0, 1.0, {}}, {bad, -120.0, 5.0, {}}};
        requireRefused([&] { SeaLevelCurve{p}; }, "age");
        p = {{0.0, 0.0, 1.0, {}}, {0.02, bad, 5.0, {}}};
        requireRefused([&] { SeaLevelCurve{p}; }, "level");
        p = {{0.0, 0.0, 1.0, {}}, {0.02, -120.0, bad, {}}};
        requireRefused([&] { SeaLevelCurve{p}; }, "level_sd_m");
        requireRefused([&] { glacialCurve().at(bad); }, "age");
    }
    std::vector<SeaLevelPoint> p = {{0.0, 0.0, -1.0, {}}, {0.02, -120.0, 5.0, {}}};
    requireRefused([&] { SeaLevelCurve{p}; }, "level_sd_m");
    p = {{0.02, 0.0, 1.0, {}}, {0.02, -120.0, 5.0, {}}};
    requireRefused([&] { SeaLevelCurve{p}; }, "two points");
    CHECK_THROWS_AS(SeaLevelCurve().at(1.0), std::logic_error); // documented: a caller's bug
}

TEST_CASE("SeaLevelCurve: huge and tiny ages and levels interpolate to finite levels",
          "[edges][sea_level]") {
    const std::vector<SeaLevelPoint> huge = {{-kHuge, -kHuge, kHuge, {}}, {kHuge, kHuge, 0.0, {}}};
    const std::vector<SeaLevelPoint> widest = {{0.0, -1e308, 1e308, {}}, {1.0, 1e308, 1e308, {}}};
    const std::vector<SeaLevelPoint> tiny = {{0.0, 0.0, kTiny, {}}, {kTiny, kTiny, 0.0, {}}};
    for (const auto& points : {huge, widest, tiny}) {
        const SeaLevelCurve c(points);
        for (const double age : {-kHuge, -1.0, 0.0, kTiny, 0.5, 1.0, kHuge}) {
            INFO("age " << age);
            const SeaLevelAt a = c.at(age);
            CHECK(allFinite(a.level_m));
            CHECK(allFinite(a.level_sd_m));
            CHECK(a.level_sd_m >= 0);
        }
    }
}

TEST_CASE("subsidenceDraws refuses bad numbers by name", "[edges][subsidence]") {
    const SeaLevelCurve sl = glacialCurve();
    const std::vector<double> ages = {0.5, 0.6, 0.7};
    for (const double bad : kNonFinite) {
        requireRefused([&] { subsidenceDraws(bad, 3.5, 0, 10, ages, sl, 1); }, "depth_m");
        requireRefused([&] { subsidenceDraws(50, bad, 0, 10, ages, sl, 1); }, "collar_elev_m");
        requireRefused([&] { subsidenceDraws(50, 3.5, bad, 10, ages, sl, 1); }, "paleodepth_min_m");
        requireRefused([&] { subsidenceDraws(50, 3.5, 0, bad, ages, sl, 1); }, "paleodepth_max_m");
        const std::vector<double> with_bad = {0.5, bad};
        requireRefused([&] { subsidenceDraws(50, 3.5, 0, 10, with_bad, sl, 1); }, "age draw");
        requireRefused([&] { subsidenceDraws(50, 3.5, 0, 10, ages, sl, 1, {bad}); },
                       "min_age_for_rate_ma");
    }
    requireRefused([&] { subsidenceDraws(50, 3.5, 10, 0, ages, sl, 1); }, "paleodepth_min_m");
    const std::vector<double> none, future = {-1.0};
    requireRefused([&] { subsidenceDraws(50, 3.5, 0, 10, none, sl, 1); }, "age draws");
    requireRefused([&] { subsidenceDraws(50, 3.5, 0, 10, future, sl, 1); }, "age draw");
}

TEST_CASE("subsidenceDraws: huge, tiny and zero values finite or refused by name",
          "[edges][subsidence]") {
    const SeaLevelCurve sl = glacialCurve();
    const SeaLevelCurve none;
    const std::vector<double> ages = {0.5, 0.6, 0.7, 0.8};
    for (const SeaLevelCurve* c : {&sl, &none}) {
        // One age draw, a zero-width paleodepth bracket, a young age (no rate).
        const std::vector<double> one = {1.0}, young = {0.001, 1.0};
        requireFinite(subsidenceDraws(50, 3.5, 5, 5, one, *c, 1));
        const SubsidenceEstimate y = subsidenceDraws(50, 3.5, 0, 10, young, *c, 1);
        requireFinite(y);
        CHECK(y.rate_undefined_young_age);
        // Tiny values.
        const std::vector<double> tiny_ages = {kTiny, 2 * kTiny};
        requireFinite(subsidenceDraws(kTiny, kTiny, 0, kTiny, tiny_ages, *c, 1));
        // A rate threshold of 0 with ages of 0 and 1e-300 Ma: S / t must not be reported as
        // infinite.
        const std::vector<double> zero_ages = {0.0, kTiny, 1.0};
        try {
            requireFinite(subsidenceDraws(50, 3.5, 0, 10, zero_ages, *c, 1, {0.0}));
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains("min_age_for_rate_ma"));
        }
    }
    // Depths and ages of 1e300: squares of their spread overflow in the sd.
    const auto finiteOrNamed = [&](auto call, const std::string& name) {
        try {
            requireFinite(call());
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains(name));
        }
    };
    finiteOrNamed([&] { return subsidenceDraws(kHuge, 3.5, 0, 10, ages, sl, 1); }, "depth_m");
    finiteOrNamed([&] { return subsidenceDraws(kHuge, -kHuge, 0, 10, ages, sl, 1); }, "depth_m");
    finiteOrNamed([&] { return subsidenceDraws(50, 3.5, -kHuge, kHuge, ages, sl, 1); },
                  "paleodepth");
    const std::vector<double> huge_ages = {1.0, kHuge};
    finiteOrNamed([&] { return subsidenceDraws(50, 3.5, 0, 10, huge_ages, sl, 1); }, "age draw");
}

TEST_CASE("holeSubsidenceRate: bad points refused naming the sample; extremes finite",
          "[edges][subsidence]") {
    const std::vector<SubsidencePoint> good = {{"S1", 0.5, 0.05, 40, 5, 0.1},
                                               {"S2", 1.0, 0.05, 80, 5, 0.0},
                                               {"S3", 2.0, 0.1, 150, 8, -0.2}};
    for (const double bad : kNonFinite) {
        for (int field = 0; field < 5; ++field) {
            auto p = good;
            double* f[] = {&p[1].age_ma, &p[1].age_sd_ma, &p[1].subsidence_m,
                           &p[1].subsidence_sd_m, &p[1].correlation};
            *f[field] = bad;
            INFO("field " << field << " value " << bad);
            requireRefused([&] { holeSubsidenceRate(p); }, "S2");
        }
    }
    for (const double sd : {0.0, -1.0}) {
        auto p = good;
        p[2].age_sd_ma = sd;
        requireRefused([&] { holeSubsidenceRate(p); }, "S3");
    }
    const std::vector<SubsidencePoint> two(good.begin(), good.begin() + 2), none;
    requireRefused([&] { holeSubsidenceRate(two); }, "3 points");
    requireRefused([&] { holeSubsidenceRate(none); }, "3 points");
    auto same_age = good;
    for (auto& q : same_age) q.age_ma = 1.0;
    requireRefused([&] { holeSubsidenceRate(same_age); }, "equal");
}

TEST_CASE("reference depth curves refuse bad ages by name; extremes are finite",
          "[edges][reference_depth]") {
    for (const auto curve : {ReferenceDepthCurve::ParsonsSclater1977,
                             ReferenceDepthCurve::SteinStein1992}) {
        for (const double bad : {kNaN, kInf, -kInf, -1.0, -kTiny}) {
            requireRefused([&] { referenceOceanDepthM(curve, bad); }, "age_ma");
            requireRefused([&] { expectedThermalSubsidenceM(curve, bad, 10.0); }, "age_ma");
            requireRefused([&] { expectedThermalSubsidenceM(curve, 10.0, bad); }, "age_ma");
        }
        for (const double age : {0.0, kTiny, 20.0, 70.0, kHuge}) {
            CHECK(allFinite(referenceOceanDepthM(curve, age)));
            CHECK(allFinite(expectedThermalSubsidenceM(curve, kTiny, age)));
        }
        // Older sea floor is never shallower, even out at 1e300 Ma.
        CHECK(referenceOceanDepthM(curve, kHuge) >= referenceOceanDepthM(curve, 100.0));
    }
}

// ---------------------------------------------------------------------------------------------
// Straight lines, chain migration, pooled basement ages

namespace {

void requireFinite(const YorkFit& f) {
    for (const double v : {f.intercept, f.intercept_sd, f.slope, f.slope_sd, f.chi_square, f.mswd})
        CHECK(allFinite(v));
}

void requireFinite(const LeastSquaresLine& f) {
    for (const double v : {f.intercept, f.intercept_sd, f.slope, f.slope_sd, f.r}) CHECK(allFinite(v));
}

/// Three points near y = 2 + 3x, every coordinate scaled by `kx` and `ky`, sds alike.
struct Line {
    std::vector<double> x, x_sd, y, y_sd;
};
Line scaledLine(double kx, double ky) {
    return {{1 * kx, 2 * kx, 4 * kx},
            {0.1 * kx, 0.1 * kx, 0.2 * kx},
            {5.1 * ky, 7.9 * ky, 14.2 * ky},
            {0.2 * ky, 0.2 * ky, 0.3 * ky}};
}

} // namespace

TEST_CASE("leastSquaresLine refuses bad points by name; huge and tiny values give finite lines",
          "[edges][least_squares]") {
    const Line l = scaledLine(1, 1);
    for (const double bad : kNonFinite) {
        auto x = l.x;
        x[1] = bad;
        requireRefused([&] { leastSquaresLine(x, l.y); }, "point 2");
        auto y = l.y;
        y[2] = bad;
        requireRefused([&] { leastSquaresLine(l.x, y); }, "point 3");
    }
    const std::vector<double> none, two = {1, 2}, same = {3, 3, 3};
    requireRefused([&] { leastSquaresLine(none, none); }, "3 points");
    requireRefused([&] { leastSquaresLine(two, two); }, "3 points");
    requireRefused([&] { leastSquaresLine(l.x, two); }, "y has 2");
    requireRefused([&] { leastSquaresLine(same, l.y); }, "all x values are equal");
    // A fit is unchanged by a change of units: these must all work, with the slope scaled.
    const LeastSquaresLine unit = leastSquaresLine(l.x, l.y);
    for (const auto& [kx, ky] : {std::pair{kHuge, kHuge}, std::pair{kTiny, kTiny},
                                 std::pair{kHuge, 1.0}, std::pair{1.0, kTiny}}) {
        INFO("x scaled by " << kx << ", y by " << ky);
        const Line s = scaledLine(kx, ky);
        const LeastSquaresLine f = leastSquaresLine(s.x, s.y);
        requireFinite(f);
        CHECK(f.slope / (ky / kx) == Approx(unit.slope).epsilon(1e-12));
        CHECK(f.r == Approx(unit.r).epsilon(1e-12));
    }
    // x in units of 1e-300 and y in 1e300: the slope itself overflows.
    const Line s = scaledLine(kTiny, kHuge);
    requireRefused([&] { leastSquaresLine(s.x, s.y); }, "slope");
    const std::vector<double> flat = {2, 2, 2};
    CHECK(leastSquaresLine(l.x, flat).r == 0); // documented: r is 0 for constant y
}

TEST_CASE("yorkFit refuses bad inputs by name; huge and tiny values finite or named",
          "[edges][york]") {
    const Line l = scaledLine(1, 1);
    for (const double bad : kNonFinite) {
        for (int field = 0; field < 4; ++field) {
            Line b = l;
            std::vector<double>* v[] = {&b.x, &b.x_sd, &b.y, &b.y_sd};
            (*v[field])[1] = bad;
            const char* names[] = {"x", "x_sd", "y", "y_sd"};
            INFO(names[field] << " = " << bad);
            requireRefused([&] { yorkFit(b.x, b.x_sd, b.y, b.y_sd); }, "point 2");
            requireRefused([&] { yorkFit(b.x, b.x_sd, b.y, b.y_sd); }, names[field]);
        }
        const std::vector<double> r = {0.0, bad, 0.0};
        requireRefused([&] { yorkFit(l.x, l.x_sd, l.y, l.y_sd, r); }, "r of point 2");
    }
    for (const double sd : {0.0, -1.0}) {
        Line b = l;
        b.y_sd[0] = sd;
        requireRefused([&] { yorkFit(b.x, b.x_sd, b.y, b.y_sd); }, "y_sd of point 1");
    }
    for (const double r : {1.0, -1.0}) {
        const std::vector<double> rr = {r, 0, 0};
        requireRefused([&] { yorkFit(l.x, l.x_sd, l.y, l.y_sd, rr); }, "r of point 1");
    }
    const std::vector<double> none, two = {1, 2};
    requireRefused([&] { yorkFit(none, none, none, none); }, "3 points");
    requireRefused([&] { yorkFit(two, two, two, two); }, "3 points");
    requireRefused([&] { yorkFit(l.x, two, l.y, l.y_sd); }, "same length");
    const std::vector<double> same = {3, 3, 3};
    requireRefused([&] { yorkFit(same, l.x_sd, l.y, l.y_sd); }, "all x values are equal");

    // A change of units must not matter while the weights 1/sd^2 fit in a double; beyond that the
    // refusal names the sds. Either way no NaN and no std::runtime_error.
    const YorkFit unit = yorkFit(l.x, l.x_sd, l.y, l.y_sd);
    for (const auto& [kx, ky] : {std::pair{1e100, 1e100}, std::pair{1e-100, 1e-100},
                                 std::pair{kHuge, kHuge}, std::pair{kTiny, kTiny},
                                 std::pair{kHuge, 1.0}, std::pair{1.0, kTiny}}) {
        INFO("x scaled by " << kx << ", y by " << ky);
        const Line s = scaledLine(kx, ky);
        try {
            const YorkFit f = yorkFit(s.x, s.x_sd, s.y, s.y_sd);
            requireFinite(f);
            CHECK(f.slope / (ky / kx) == Approx(unit.slope).epsilon(1e-9));
            CHECK(f.mswd == Approx(unit.mswd).epsilon(1e-9));
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains("_sd"));
        }
    }
    // Sds of 1e-300 beside values near 1: 1/sd^2 overflows.
    Line sharp = l;
    sharp.x_sd = {kTiny, kTiny, kTiny};
    requireRefused([&] { yorkFit(sharp.x, sharp.x_sd, sharp.y, sharp.y_sd); }, "x_sd");
    // Sds of 1e300 in y: the line is the unweighted one in y, and finite.
    Line vague = l;
    vague.y_sd = {kHuge, kHuge, kHuge};
    requireFinite(yorkFit(vague.x, vague.x_sd, vague.y, vague.y_sd));
}

TEST_CASE("chainMigration: bad points named; huge, tiny and flat chains finite",
          "[edges][chain]") {
    const std::vector<ChainPoint> good = {{"A", 0, 5, 0.5, 0.1},
                                          {"B", 100, 5, 1.4, 0.1},
                                          {"C", 300, 5, 3.6, 0.2}};
    const auto requireFiniteChain = [](const ChainMigration& m) {
        requireFinite(m.york);
        requireFinite(m.ols);
        CHECK(allFinite(m.rate_km_per_myr));
        CHECK(allFinite(m.rate_sd_km_per_myr));
        CHECK(allFinite(m.ols_rate_km_per_myr));
        CHECK(allFinite(m.intercept_ma));
        CHECK(allFinite(m.intercept_sd_ma));
        CHECK(allFinite(m.mswd));
    };
    requireFiniteChain(chainMigration(good));
    for (const double bad : kNonFinite) {
        auto p = good;
        p[1].age_ma = bad;
        requireRefused([&] { chainMigration(p); }, "point 2");
        p = good;
        p[0].distance_sd_km = bad;
        requireRefused([&] { chainMigration(p); }, "x_sd of point 1");
    }
    const std::vector<ChainPoint> none;
    requireRefused([&] { chainMigration(none); }, "3 points");
    std::vector<ChainPoint> one_place = good;
    for (auto& p : one_place) p.distance_km = 50;
    requireRefused([&] { chainMigration(one_place); }, "all x values are equal");
    SECTION("ages equal along the chain: no rate, not an infinite one") {
        auto flat = good;
        for (auto& p : flat) p.age_ma = 2.0;
        const ChainMigration m = chainMigration(flat);
        requireFiniteChain(m);
    }
    SECTION("ages rising by 1e-300 Ma per km: the rate 1/slope overflows; refused or finite") {
        auto creep = good;
        for (auto& p : creep) {
            p.age_ma = 2.0 + p.distance_km * kTiny;
            p.age_sd_ma = kTiny;
        }
        try {
            requireFiniteChain(chainMigration(creep));
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains("slope") || Contains("_sd"));
        }
    }
}

TEST_CASE("pooledAge refuses bad entries by name; huge and tiny sds give finite pools",
          "[edges][basement]") {
    requireRefused([] { pooledAge({}, {}); }, "no age");
    requireRefused([] { pooledAge({1.0}, {}); }, "sds");
    for (const double bad : kNonFinite) {
        requireRefused([&] { pooledAge({1.0, bad}, {0.1, 0.1}); }, "age 2");
        requireRefused([&] { pooledAge({1.0, 2.0}, {bad, 0.1}); }, "sd 1");
    }
    for (const double sd : {0.0, -0.1}) requireRefused([&] { pooledAge({1.0}, {sd}); }, "sd 1");
    const auto requireFinitePool = [](const PooledAge& p) {
        CHECK(allFinite(p.mean_ma));
        CHECK(allFinite(p.sd_ma));
        CHECK(allFinite(p.sd_plain_ma));
        CHECK(allFinite(p.mswd));
        CHECK(p.sd_ma > 0);
        CHECK(p.sd_ma >= p.sd_plain_ma);
    };
    SECTION("a single date is its own pool") {
        const PooledAge p = pooledAge({3.0}, {0.2});
        requireFinitePool(p);
        CHECK(p.mean_ma == 3.0);
        CHECK(p.mswd == 0.0);
    }
    SECTION("sds of 1e-300 and 1e300: 1/sd^2 overflows and underflows") {
        const PooledAge vague = pooledAge({3.0, 3.0, 0.0}, {kHuge, kHuge, kHuge});
        requireFinitePool(vague);
        CHECK(vague.mean_ma == Approx(2.0)); // equal weights: the plain mean
        const PooledAge sharp = pooledAge({2.0, 2.0, 2.0}, {kTiny, kTiny, kTiny});
        requireFinitePool(sharp);
        CHECK(sharp.mean_ma == Approx(2.0));
        const PooledAge mixed = pooledAge({3.0, 5.0}, {kTiny, 1.0});
        requireFinitePool(mixed);
        CHECK(mixed.mean_ma == Approx(3.0)); // the sharp date carries all the weight
    }
    SECTION("huge ages") {
        requireFinitePool(pooledAge({kHuge, kHuge}, {1.0, 1.0}));
        requireFinitePool(pooledAge({kHuge, 2 * kHuge}, {kHuge, kHuge}));
    }
    SECTION("dates scattered far beyond sds of 1e-300: the MSWD overflows; refused or finite") {
        try {
            requireFinitePool(pooledAge({1.0, 9.0}, {kTiny, kTiny}));
        } catch (const std::invalid_argument& e) {
            CHECK_THAT(std::string(e.what()), Contains("MSWD"));
        }
    }
}

TEST_CASE("poolBasementTies: bad contact refused, empty and one-depth ties handled",
          "[edges][basement]") {
    const std::vector<AgeTie> ties = {tie("reef", 5, 12, 1.0, 0.1), tie("lava1", 20, 20, 9.0, 0.3),
                                      tie("lava2", 21, 22, 9.6, 0.3)};
    for (const double bad : {kNaN, kInf, -kInf, -1.0})
        requireRefused([&] { poolBasementTies(ties, bad); }, "contact depth");
    CHECK(poolBasementTies({}, 10.0).empty());
    const auto out = poolBasementTies(ties, 10.0);
    REQUIRE(out.size() == 2);
    CHECK(out[0].deep_m == 10.0); // cut at the contact
    CHECK(allFinite(out[1].age.mean_ma()));
    // Every tie at one depth, the contact there too: all pooled into one.
    const std::vector<AgeTie> same = {tie("a", 20, 20, 9.0, kTiny), tie("b", 20, 20, 9.0, kTiny)};
    const auto pooled = poolBasementTies(same, 20.0);
    REQUIRE(pooled.size() == 1);
    requireFinite(pooled[0].age);
    CHECK(poolBasementTies(ties, kHuge).size() == 3); // nothing below 1e300 m
    CHECK(poolBasementTies(ties, 0.0).size() == 1);   // everything below the collar
}
