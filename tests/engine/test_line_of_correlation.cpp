// Lines of correlation (Shaw 1964, Time in Stratigraphy; checks.md "Event sequencing"): a known
// straight relation recovered, the York branch equal to York et al. (2004) fitted directly,
// the reduced major axis against its definition (Smith 2009, Am. J. Phys. Anthropol. 140:476;
// Sokal & Rohlf, Biometry) and its sds against a Monte Carlo spread, the dog-leg at a logged
// surface, an off-line event, and the refusals.
#include "atollog/engine/line_of_correlation.hpp"
#include "atollog/engine/reduced_major_axis.hpp"
#include "atollog/engine/seeded_draws.hpp"
#include "atollog/engine/york_fit.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <optional>
#include <stdexcept>
#include <vector>

using namespace atollog;
using Catch::WithinAbs;

namespace {

struct Bracket {
    double shallow_m, deep_m;
};

/// Two holes, "NA-1" (x) and "NA-2" (y), with surfaces as given.
CorrelationData twoHoles(std::vector<double> surfaces_x = {}, std::vector<double> surfaces_y = {}) {
    CorrelationData d;
    d.holes = {"NA-1", "NA-2"};
    d.sampled_levels_m = {{}, {}};
    d.surfaces_m = {std::move(surfaces_x), std::move(surfaces_y)};
    return d;
}

/// One more base event, observed in the holes that get a bracket (level at the bracket's top).
void addEvent(CorrelationData& d, const std::vector<std::optional<Bracket>>& per_hole) {
    const std::size_t e = d.events.size();
    d.events.push_back({"B T" + std::to_string(e), SequenceEventKind::Base, "T" + std::to_string(e),
                        std::nullopt, std::nullopt});
    for (std::size_t h = 0; h < per_hole.size(); ++h)
        if (per_hole[h])
            d.levels.push_back(
                {h, e, per_hole[h]->shallow_m, per_hole[h]->deep_m, per_hole[h]->shallow_m});
}

/// A bracket of width w around the true level, placed so the true level is uniform inside it:
/// the bracket's midpoint then errs by a uniform of sd w / sqrt(12), the error the line uses.
Bracket bracketAround(double true_m, double width_m, SeededDraws& rng) {
    const double shallow = true_m - rng.uniformOpen() * width_m;
    return {shallow, shallow + width_m};
}

/// n events with y = 1.8 x + 4 (metres), x spread over 5..95 m, bracket widths 0.2..1.0 m.
CorrelationData linearEvents(std::uint64_t seed, int n) {
    SeededDraws rng(seed);
    CorrelationData d = twoHoles();
    for (int i = 0; i < n; ++i) {
        const double x = 5.0 + 90.0 * (i + rng.uniformOpen()) / n;
        const double y = 1.8 * x + 4.0;
        const double wx = 0.2 + 0.8 * rng.uniformOpen(), wy = 0.2 + 0.8 * rng.uniformOpen();
        addEvent(d, {bracketAround(x, wx, rng), bracketAround(y, wy, rng)});
    }
    return d;
}

void checkAllFinite(const LineOfCorrelation& l) {
    for (const LocPoint& p : l.points)
        for (double v : {p.x_m, p.x_sd_m, p.y_m, p.y_sd_m, p.residual_m, p.z})
            CHECK(std::isfinite(v));
    for (const LocSegment& s : l.segments)
        for (double v :
             {s.x_from_m, s.x_to_m, s.slope, s.slope_sd, s.intercept_m, s.intercept_sd_m, s.mswd})
            CHECK(std::isfinite(v));
}

/// Sample sd, plain two-pass formula, for the checks' own arithmetic.
double sampleSd(const std::vector<double>& v) {
    double m = 0;
    for (double e : v)
        m += e;
    m /= static_cast<double>(v.size());
    double ss = 0;
    for (double e : v)
        ss += (e - m) * (e - m);
    return std::sqrt(ss / static_cast<double>(v.size() - 1));
}

} // namespace

TEST_CASE("a line of correlation recovers a known straight relation", "[correlation][loc]") {
    // Shaw 1964: two holes accumulating steadily give points on one straight line; here
    // y = 1.8 x + 4 with every level known only to its bracket.
    const LineOfCorrelation l = lineOfCorrelation(linearEvents(20260, 20), 0, 1);
    checkAllFinite(l);
    CHECK(l.x_name == "NA-1");
    CHECK(l.y_name == "NA-2");
    REQUIRE(l.points.size() == 20);
    REQUIRE(l.segments.size() == 1);
    const LocSegment& s = l.segments[0];
    REQUIRE(s.fitted);
    CHECK(s.points == 20);
    // The sds must be small enough for the check to bite: 0.01 in slope, 0.5 m in intercept.
    CHECK(s.slope_sd < 0.01);
    CHECK(s.intercept_sd_m < 0.5);
    CHECK(std::fabs(s.slope - 1.8) <= 2.0 * s.slope_sd);
    CHECK(std::fabs(s.intercept_m - 4.0) <= 2.0 * s.intercept_sd_m);
    // Uniform bracket errors read as normals of the same sd: the scatter matches them.
    CHECK(s.mswd > 0.3);
    CHECK(s.mswd < 2.0);
    for (const LocPoint& p : l.points)
        CHECK_FALSE(p.off_line);
    // A point bracket keeps the floor, a 1 m bracket sd 1 / sqrt(12) m.
    CHECK(l.points[0].x_sd_m >= 0.2 / std::sqrt(12.0) - 1e-12);
    CHECK(l.points[0].x_sd_m <= 1.0 / std::sqrt(12.0) + 1e-12);
}

TEST_CASE("line of correlation sds cover the true slope as often as one sd should",
          "[correlation][loc]") {
    // York et al. 2004: with honest point errors, |slope - true| <= slope_sd about 68 % of the
    // time. 200 seeded data sets; outside 55..80 % the sds do not mean what they say.
    int within = 0;
    const int runs = 200;
    for (int k = 0; k < runs; ++k) {
        const LineOfCorrelation l = lineOfCorrelation(linearEvents(1000 + k, 15), 0, 1);
        within += std::fabs(l.segments.at(0).slope - 1.8) <= l.segments[0].slope_sd ? 1 : 0;
    }
    const double share = static_cast<double>(within) / runs;
    CHECK(share > 0.55);
    CHECK(share < 0.80);
}

TEST_CASE("the York branch of a line of correlation is York et al. 2004 fitted directly",
          "[correlation][loc]") {
    const LineOfCorrelation l = lineOfCorrelation(linearEvents(77, 12), 0, 1);
    std::vector<double> x, xs, y, ys;
    for (const LocPoint& p : l.points) {
        x.push_back(p.x_m);
        xs.push_back(p.x_sd_m);
        y.push_back(p.y_m);
        ys.push_back(p.y_sd_m);
    }
    const YorkFit f = yorkFit(x, xs, y, ys);
    const LocSegment& s = l.segments.at(0);
    CHECK(s.slope == Approx(f.slope).epsilon(1e-12));
    CHECK(s.slope_sd == Approx(f.slope_sd).epsilon(1e-12));
    CHECK(s.intercept_m == Approx(f.intercept).epsilon(1e-12));
    CHECK(s.intercept_sd_m == Approx(f.intercept_sd).epsilon(1e-12));
    CHECK(s.mswd == Approx(f.mswd).epsilon(1e-12));
    // Points are bracket midpoints, not observed levels (which sit at the bracket tops here).
    const CorrelationData d = linearEvents(77, 12);
    bool midpoints = true;
    for (const LocPoint& p : l.points)
        for (const EventLevel& lv : d.levels)
            if (lv.event == p.event && lv.hole == 0)
                midpoints &= std::fabs(p.x_m - 0.5 * (lv.shallow_m + lv.deep_m)) < 1e-12 &&
                             std::fabs(p.x_sd_m - std::max(0.01, (lv.deep_m - lv.shallow_m) /
                                                                     std::sqrt(12.0))) < 1e-12;
    CHECK(midpoints);
}

TEST_CASE("reduced major axis on a hand example is sign(r) s_y / s_x", "[correlation][loc]") {
    // Smith 2009 (Am. J. Phys. Anthropol. 140:476) and Sokal & Rohlf (Biometry): RMA slope =
    // sign(r) s_y / s_x, through the means. s_x, s_y and r computed here by the textbook sums.
    const std::vector<double> x = {1, 2, 3, 4, 5, 6};
    const std::vector<double> y = {2.0, 4.5, 5.0, 8.5, 9.0, 12.0};
    auto expected = [](const std::vector<double>& xv, const std::vector<double>& yv) {
        const double n = static_cast<double>(xv.size());
        double mx = 0, my = 0;
        for (std::size_t i = 0; i < xv.size(); ++i) {
            mx += xv[i] / n;
            my += yv[i] / n;
        }
        double sxy = 0;
        for (std::size_t i = 0; i < xv.size(); ++i)
            sxy += (xv[i] - mx) * (yv[i] - my);
        const double sx = sampleSd(xv), sy = sampleSd(yv);
        const double r = sxy / (n - 1) / (sx * sy);
        const double b = (r > 0 ? 1.0 : -1.0) * sy / sx;
        return std::vector<double>{b, my - b * mx, r, std::fabs(b) * std::sqrt((1 - r * r) / n)};
    };
    const std::vector<double> e = expected(x, y);
    const ReducedMajorAxis f = reducedMajorAxis(x, y);
    CHECK(f.slope == Approx(e[0]).epsilon(1e-12));
    CHECK(f.intercept == Approx(e[1]).epsilon(1e-12));
    CHECK(f.r == Approx(e[2]).epsilon(1e-12));
    // Kermack & Haldane 1950, as in Davis 2002: slope sd = |b| sqrt((1 - r^2) / n).
    CHECK(f.slope_sd == Approx(e[3]).epsilon(1e-12));
    // An OLS slope would be r s_y / s_x: smaller whenever |r| < 1. Guards against a fit that
    // is only least squares.
    CHECK(std::fabs(f.slope) > std::fabs(e[2] * e[0]) + 0.01);

    // A falling line: the sign comes from r.
    const std::vector<double> y_down = {12.0, 9.0, 8.5, 5.0, 4.5, 2.0};
    const std::vector<double> e_down = expected(x, y_down);
    const ReducedMajorAxis g = reducedMajorAxis(x, y_down);
    CHECK(e_down[0] < 0);
    CHECK(g.slope == Approx(e_down[0]).epsilon(1e-12));
    CHECK(g.intercept == Approx(e_down[1]).epsilon(1e-12));

    SECTION("the same points as a line of correlation with the RMA fit") {
        CorrelationData d = twoHoles();
        for (std::size_t i = 0; i < x.size(); ++i)
            addEvent(d, {Bracket{10 * x[i], 10 * x[i]}, Bracket{y[i], y[i]}});
        LocSettings s;
        s.fit = LocFit::ReducedMajorAxis;
        const LineOfCorrelation l = lineOfCorrelation(d, 0, 1, s);
        REQUIRE(l.segments.size() == 1);
        CHECK(l.fit == LocFit::ReducedMajorAxis);
        CHECK(l.segments[0].slope == Approx(e[0] / 10).epsilon(1e-12));
        CHECK(l.segments[0].intercept_m == Approx(e[1]).epsilon(1e-12));
        CHECK(l.segments[0].mswd == 0.0);
        checkAllFinite(l);
    }
    CHECK_THROWS_AS(
        reducedMajorAxis(std::vector<double>{1, 2, 3, 4}, std::vector<double>{1, 2, 2, 1}),
        std::invalid_argument); // r = 0: no sign
}

TEST_CASE("reduced major axis sds match the spread of the estimates", "[correlation][loc]") {
    // Kermack & Haldane 1950 (Biometrika 37:30), as in Davis 2002: large-sample sds of the RMA
    // slope and intercept for a bivariate normal sample. 3000 seeded samples of n = 60 from
    // x ~ N(5, 2), rho = 0.8, s_y = 3; the sd of the 3000 estimates must match the mean
    // reported sd within 8 % (the Monte Carlo error of an sd from 3000 values is about 1.3 %).
    SeededDraws rng(4242);
    const int samples = 3000, n = 60;
    const double rho = 0.8;
    std::vector<double> slopes, intercepts;
    double slope_sd_sum = 0, intercept_sd_sum = 0;
    for (int k = 0; k < samples; ++k) {
        std::vector<double> x(n), y(n);
        for (int i = 0; i < n; ++i) {
            const double z1 = rng.normal(0, 1), z2 = rng.normal(0, 1);
            x[i] = 5.0 + 2.0 * z1;
            y[i] = 1.0 + 3.0 * (rho * z1 + std::sqrt(1 - rho * rho) * z2);
        }
        const ReducedMajorAxis f = reducedMajorAxis(x, y);
        slopes.push_back(f.slope);
        intercepts.push_back(f.intercept);
        slope_sd_sum += f.slope_sd;
        intercept_sd_sum += f.intercept_sd;
    }
    CHECK(sampleSd(slopes) == Approx(slope_sd_sum / samples).epsilon(0.08));
    CHECK(sampleSd(intercepts) == Approx(intercept_sd_sum / samples).epsilon(0.08));
}

TEST_CASE("a logged surface between points makes a dog-leg of two pieces", "[correlation][loc]") {
    // Shaw 1964: a hiatus in one section bends the line of correlation. Below 50 m in NA-1 the
    // rate ratio changes from 1.0 to 2.5.
    auto build = [](std::vector<double> sx, std::vector<double> sy) {
        CorrelationData d = twoHoles(std::move(sx), std::move(sy));
        for (double x : {10.0, 20.0, 30.0, 40.0})
            addEvent(d, {Bracket{x - 0.25, x + 0.25}, Bracket{x + 5 - 0.25, x + 5 + 0.25}});
        for (double x : {60.0, 70.0, 80.0, 90.0}) {
            const double y = 70.0 + 2.5 * (x - 60.0);
            addEvent(d, {Bracket{x - 0.25, x + 0.25}, Bracket{y - 0.25, y + 0.25}});
        }
        return d;
    };
    SECTION("a surface of the x hole breaks at its own depth") {
        const LineOfCorrelation l = lineOfCorrelation(build({50.0}, {}), 0, 1);
        checkAllFinite(l);
        REQUIRE(l.segments.size() == 2);
        REQUIRE(l.breaks_x_m.size() == 1);
        CHECK(l.breaks_x_m[0] == 50.0);
        const LocSegment &a = l.segments[0], &b = l.segments[1];
        REQUIRE(a.fitted);
        REQUIRE(b.fitted);
        CHECK_THAT(a.slope, WithinAbs(1.0, 1e-9));
        CHECK_THAT(b.slope, WithinAbs(2.5, 1e-9));
        CHECK(std::fabs(b.slope - a.slope) > 10 * std::hypot(a.slope_sd, b.slope_sd));
        CHECK(a.x_from_m == 10.0);
        CHECK(a.x_to_m == 40.0);
        CHECK(b.x_from_m == 60.0);
        for (std::size_t i = 0; i < l.points.size(); ++i)
            CHECK(l.points[i].segment == (i < 4 ? 0u : 1u));
    }
    SECTION("a surface of the y hole breaks halfway between the points either side") {
        const LineOfCorrelation l = lineOfCorrelation(build({}, {47.0}), 0, 1);
        REQUIRE(l.segments.size() == 2);
        REQUIRE(l.breaks_x_m.size() == 1);
        CHECK(l.breaks_x_m[0] == 50.0); // (40 + 60) / 2
        CHECK_THAT(l.segments[1].slope, WithinAbs(2.5, 1e-9));
    }
    SECTION("without breaking, one straight line misfits the bend") {
        LocSettings s;
        s.break_at_surfaces = false;
        const LineOfCorrelation l = lineOfCorrelation(build({50.0}, {}), 0, 1, s);
        REQUIRE(l.segments.size() == 1);
        CHECK(l.breaks_x_m.empty());
        CHECK(l.segments[0].mswd > 100);
    }
    SECTION("surfaces beyond the points, or between the same two points, cut once or not at all") {
        const LineOfCorrelation l = lineOfCorrelation(build({5.0, 45.0, 50.0, 95.0}, {1.0}), 0, 1);
        CHECK(l.segments.size() == 2);
        CHECK(l.breaks_x_m == std::vector<double>{45.0, 50.0});
    }
}

TEST_CASE("an off-line point does not scatter the break of a y-hole surface", "[correlation][loc]") {
    // The event at x = 20 m sits at y = 70 m in NA-2, below the surface at 47 m; the others
    // keep y = x + 5 above and y = 70 + 2.5 (x - 60) below. Fewest points on the wrong side:
    // the cut stays between 40 and 60 m.
    CorrelationData d = twoHoles({}, {47.0});
    for (double x : {10.0, 20.0, 30.0, 40.0}) {
        const double y = x == 20.0 ? 70.0 : x + 5;
        addEvent(d, {Bracket{x - 0.25, x + 0.25}, Bracket{y - 0.25, y + 0.25}});
    }
    for (double x : {60.0, 70.0, 80.0, 90.0}) {
        const double y = 70.0 + 2.5 * (x - 60.0);
        addEvent(d, {Bracket{x - 0.25, x + 0.25}, Bracket{y - 0.25, y + 0.25}});
    }
    const LineOfCorrelation l = lineOfCorrelation(d, 0, 1);
    CHECK(l.breaks_x_m == std::vector<double>{50.0});
    REQUIRE(l.segments.size() == 2);
    CHECK(l.segments[0].points == 4);
}

TEST_CASE("an event far off the line is flagged off_line", "[correlation][loc]") {
    // Shaw 1964: points off the line are reworked finds, missed datums or miscorrelations.
    // One event of 12 is 8 m too deep in NA-2 (brackets 1 m wide: sd 0.29 m each).
    CorrelationData d = twoHoles();
    for (int i = 0; i < 12; ++i) {
        const double x = 5.0 + 7.5 * i;
        const double y = 1.8 * x + 4.0 + (i == 6 ? 8.0 : 0.0);
        addEvent(d, {Bracket{x - 0.5, x + 0.5}, Bracket{y - 0.5, y + 0.5}});
    }
    const LineOfCorrelation l = lineOfCorrelation(d, 0, 1);
    checkAllFinite(l);
    for (const LocPoint& p : l.points) {
        if (p.event == 6) {
            CHECK(p.off_line);
            CHECK(p.z >= 3.0);
            CHECK(p.residual_m > 5.0);
        } else {
            CHECK_FALSE(p.off_line);
            CHECK(std::fabs(p.z) < 3.0);
        }
    }
    SECTION("the threshold is a setting") {
        LocSettings s;
        s.off_line_z = 1000;
        for (const LocPoint& p : lineOfCorrelation(d, 0, 1, s).points)
            CHECK_FALSE(p.off_line);
    }
}

TEST_CASE("a piece with fewer than 3 points is left unfitted, not NaN", "[correlation][loc]") {
    CorrelationData d = twoHoles({25.0});
    for (double x : {10.0, 20.0, 30.0, 40.0, 50.0})
        addEvent(d, {Bracket{x, x}, Bracket{2 * x, 2 * x + 1}});
    const LineOfCorrelation l = lineOfCorrelation(d, 0, 1);
    checkAllFinite(l);
    REQUIRE(l.segments.size() == 2);
    CHECK_FALSE(l.segments[0].fitted);
    CHECK(l.segments[0].points == 2);
    CHECK(l.segments[1].fitted);
    CHECK(l.points[0].residual_m == 0.0);
    CHECK_FALSE(l.points[0].off_line);
    // Point brackets get the floor: 0.01 m by default.
    CHECK(l.points[0].x_sd_m == 0.01);
}

TEST_CASE("a line of correlation needs 3 shared events and two holes", "[correlation][loc]") {
    CorrelationData d = twoHoles();
    addEvent(d, {Bracket{1, 2}, Bracket{3, 4}});
    addEvent(d, {Bracket{5, 6}, Bracket{7, 8}});
    addEvent(d, {Bracket{9, 10}, std::nullopt});
    addEvent(d, {std::nullopt, Bracket{11, 12}});
    CHECK_THROWS_AS(lineOfCorrelation(d, 0, 1), std::invalid_argument);
    CHECK_THROWS_WITH(lineOfCorrelation(d, 0, 1), Catch::Contains("'NA-1'") &&
                                                      Catch::Contains("'NA-2'") &&
                                                      Catch::Contains("share 2 events"));
    CHECK_THROWS_WITH(lineOfCorrelation(d, 0, 0), Catch::Contains("both x and y"));
    CHECK_THROWS_WITH(lineOfCorrelation(d, 0, 2), Catch::Contains("hole index 2"));
    LocSettings bad;
    bad.sd_floor_m = 0;
    addEvent(d, {Bracket{13, 14}, Bracket{15, 16}});
    CHECK_NOTHROW(lineOfCorrelation(d, 0, 1));
    CHECK_THROWS_WITH(lineOfCorrelation(d, 0, 1, bad), Catch::Contains("sd_floor_m"));
}

TEST_CASE("a hole against a composite: x is the rank from the youngest end", "[correlation][loc]") {
    // Shaw 1964 cross-plots a section against a composite standard. Composite oldest first:
    // events 5, 4, ..., 0; the hole has event k at 10 k + 3 m (older deeper), all but event 2.
    CorrelationData d;
    d.holes = {"NA-3"};
    d.sampled_levels_m = {{}};
    d.surfaces_m = {{}};
    for (int k = 0; k < 6; ++k)
        addEvent(d, {k == 2 ? std::nullopt
                            : std::optional<Bracket>(Bracket{10.0 * k + 3, 10.0 * k + 3.5})});
    const std::vector<std::size_t> oldest_first = {5, 4, 3, 2, 1, 0};
    const LineOfCorrelation l = lineAgainstComposite(d, oldest_first, 0);
    checkAllFinite(l);
    CHECK(l.x_name == "composite");
    CHECK(l.y_name == "NA-3");
    REQUIRE(l.points.size() == 5);
    // Youngest (event 0) at x = 0, oldest (event 5) at x = 5; x grows down-section with depth.
    CHECK(l.points.front().event == 0u);
    CHECK(l.points.front().x_m == 0.0);
    CHECK(l.points.back().event == 5u);
    CHECK(l.points.back().x_m == 5.0);
    CHECK(l.points.front().x_sd_m == Approx(1.0 / std::sqrt(12.0)));
    REQUIRE(l.segments.at(0).fitted);
    CHECK_THAT(l.segments[0].slope, WithinAbs(10.0, 1e-9)); // metres per composite step
    CHECK_THROWS_WITH(lineAgainstComposite(d, {5, 2, 0}, 0),
                      Catch::Contains("'NA-3'") && Catch::Contains("composite"));
    CHECK_THROWS_WITH(lineAgainstComposite(d, {5, 4, 4, 0}, 0), Catch::Contains("twice"));
    CHECK_THROWS_WITH(lineAgainstComposite(d, {5, 4, 9}, 0), Catch::Contains("event index 9"));
}
