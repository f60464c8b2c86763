// Range extensions of the composite sequence's best order: the exact L1 placement per hole
// (pool-adjacent-violators) by hand and against brute force.
#include "atollog/engine/composite_sequence.hpp"

#include "../../engine/src/composite_sequence_placement.hpp"
#include "composite_sequence_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <random>

using namespace atollog;
using Catch::Matchers::WithinAbs;
using K = SequenceEventKind;

namespace {

double placementCost(const std::vector<detail::PlacementInput>& in, const std::vector<double>& at) {
    double cost = 0;
    for (std::size_t i = 0; i < in.size(); ++i) {
        const double down = at[i] - in[i].observed_m; // > 0: deeper
        const bool allowed =
            (in[i].kind == K::Base && down > 0) || (in[i].kind == K::Top && down < 0);
        cost += std::fabs(down) * (allowed || down == 0 ? 1.0 : kInfeasiblePairPenalty);
    }
    return cost;
}

bool followsOrder(const std::vector<double>& at) { // oldest first: never shallower
    for (std::size_t i = 1; i < at.size(); ++i)
        if (at[i] > at[i - 1])
            return false;
    return true;
}

/// Every assignment of observed levels to events (an optimum lies on them: each cost is
/// piecewise linear with its kink at an observed level), the cheapest that follows the order.
double bruteForcePlacement(const std::vector<detail::PlacementInput>& in) {
    std::vector<double> values;
    for (const auto& p : in)
        values.push_back(p.observed_m);
    std::vector<std::size_t> pick(in.size(), 0);
    std::vector<double> at(in.size());
    double best = INFINITY;
    for (;;) {
        for (std::size_t i = 0; i < in.size(); ++i)
            at[i] = values[pick[i]];
        if (followsOrder(at))
            best = std::min(best, placementCost(in, at));
        std::size_t i = 0;
        while (i < pick.size() && ++pick[i] == values.size())
            pick[i++] = 0;
        if (i == pick.size())
            return best;
    }
}

} // namespace

TEST_CASE("placement by hand: bases down, tops up, forced moves flagged",
          "[correlation][sequence]") {
    // Base A (older, seen at 5 m) above base B (younger, 10 m): A extends down to 10 m.
    auto p = detail::placeInOrder({{K::Base, 5}, {K::Base, 10}});
    CHECK(p == std::vector<double>{10, 10});
    // Top A (older, 5 m) above top B (younger, 10 m): B extends up to 5 m.
    p = detail::placeInOrder({{K::Top, 5}, {K::Top, 10}});
    CHECK(p == std::vector<double>{5, 5});
    // In order already: nothing moves.
    p = detail::placeInOrder({{K::Top, 12}, {K::Base, 8}, {K::Dated, 3}});
    CHECK(p == std::vector<double>{12, 8, 3});
    // A date at 7 m older than bases at 10 and 12 m: no allowed move resolves it. All at 10 m
    // costs 3 m of date moved + 2 m of base moved up = 5 x penalty; all at 7 m 8 x, at 12 m
    // 5 x penalty + 2 m.
    p = detail::placeInOrder({{K::Dated, 7}, {K::Base, 10}, {K::Base, 12}});
    CHECK(p == std::vector<double>{10, 10, 10});

    CorrelationData d;
    d.holes = {"H1"};
    d.events = {{"date d", K::Dated, "", 2.0, 0.1}, {"B A", K::Base, "A", {}, {}},
                {"B B", K::Base, "B", {}, {}}};
    d.levels = {{0, 0, 7, 7, 7}, {0, 1, 9, 10, 10}, {0, 2, 11, 12, 12}};
    d.sampled_levels_m = {{7, 10, 12}};
    d.surfaces_m = {{}};
    const auto ext = detail::holeExtensions(d, {0, 1, 2});
    REQUIRE(ext.size() == 2);
    CHECK(ext[0].event == 0);
    CHECK(ext[0].placed_m == 10.0);
    CHECK(ext[0].extension_m == 3.0);
    CHECK(ext[0].forced);
    CHECK(ext[1].event == 2);
    CHECK(ext[1].observed_m == 12.0);
    CHECK(ext[1].extension_m == 2.0);
    CHECK(ext[1].forced);
    // Base A before base B, the date last: A (10 m) lies above B (12 m) and extends down to
    // 12 m, an allowed move; the date is already the shallowest.
    const auto down = detail::holeExtensions(d, {1, 2, 0});
    REQUIRE(down.size() == 1);
    CHECK(down[0].event == 1);
    CHECK(down[0].placed_m == 12.0);
    CHECK_FALSE(down[0].forced);
}

TEST_CASE("placement equals the brute-force L1 optimum", "[correlation][sequence]") {
    std::mt19937_64 rng(606);
    int checked = 0;
    for (int trial = 0; trial < 400; ++trial) {
        const std::size_t m = 1 + rng() % 6;
        std::vector<detail::PlacementInput> in;
        for (std::size_t i = 0; i < m; ++i)
            in.push_back({static_cast<K>(rng() % 3), static_cast<double>(rng() % 12)});
        const std::vector<double> at = detail::placeInOrder(in);
        REQUIRE(at.size() == m);
        CHECK(followsOrder(at));
        const double best = bruteForcePlacement(in);
        INFO("trial " << trial);
        CHECK_THAT(placementCost(in, at), WithinAbs(best, 1e-9));
        ++checked;
    }
    CHECK(checked == 400);
}

TEST_CASE("the reported extensions are those of the best order", "[correlation][sequence]") {
    const CorrelationData d = seqtest::inventData(51, 6, 2, 3, 25.0).data;
    SequenceSettings s;
    s.moves_per_restart = 20000;
    const CompositeSequence r = buildCompositeSequence(d, s);
    const auto expected = detail::holeExtensions(d, r.order);
    REQUIRE(r.extensions.size() == expected.size());
    CHECK_FALSE(r.extensions.empty());
    for (std::size_t i = 0; i < expected.size(); ++i) {
        CHECK(r.extensions[i].hole == expected[i].hole);
        CHECK(r.extensions[i].event == expected[i].event);
        CHECK(r.extensions[i].placed_m == expected[i].placed_m);
        CHECK(r.extensions[i].extension_m > 0);
        const SequenceEventKind k = d.events[r.extensions[i].event].kind;
        if (!r.extensions[i].forced) // allowed moves only: bases down, tops up
            CHECK((k == K::Base ? r.extensions[i].placed_m > r.extensions[i].observed_m
                                : r.extensions[i].placed_m < r.extensions[i].observed_m));
    }
}
