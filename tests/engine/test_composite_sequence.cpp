// Composite sequence (constrained optimisation, Kemple, Sadler & Strauss 1995): the pairwise
// misfit by hand, the annealer against brute force, incremental tracking against the full
// recompute, hard constraints, determinism and bad input.
#include "atollog/engine/composite_sequence.hpp"

#include "../../engine/src/composite_sequence_annealer.hpp"
#include "../../engine/src/composite_sequence_pairs.hpp"
#include "composite_sequence_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <numeric>
#include <stdexcept>

using namespace atollog;
using Catch::Matchers::Contains;
using Catch::Matchers::WithinAbs;

namespace {

// Three taxa A, B, C (events 0..5: base A, top A, base B, top B, base C, top C), two holes.
// The order checked: base A, base B, top A, base C, top B, top C (oldest first).
//   H1  base A [100,102]  base B [75,76]  top A [80,82]  base C [70,72]  top B [60,62]
//       top C [50,52]; sampled levels 50 60 70 75 77 78 80 90 100.
//       One inverted pair: base B (older) lies wholly above top A, gap 80 - 76 = 4 m; base B
//       may move down by 4 m (top A up by 4 m would do too: same cost). Levels strictly between
//       76 and 80: 77, 78 -> 2. Every other pair is in order or overlaps.
//   H2  base A [40,41]  top A [30,31]  base C [28,32]  top C [10,12]; sampled 10 20 30 40.
//       Top A and base C overlap (no cost); the rest in order.
// Misfit: 4 m, 2 levels, 1 inversion.
// Swapping top B and top C as well (top C before top B): in H1 top C [50,52] lies wholly above
// top B [60,62], gap 8 m; top B (the younger, a top) may move up: +8 m, +1 level (none strictly
// between 52 and 60, counted as at least 1), +1 inversion.
CorrelationData handExample() {
    CorrelationData d;
    d.holes = {"H1", "H2"};
    for (const char* t : {"A", "B", "C"}) {
        d.events.push_back({std::string("B ") + t, SequenceEventKind::Base, t, {}, {}});
        d.events.push_back({std::string("T ") + t, SequenceEventKind::Top, t, {}, {}});
    }
    d.levels = {{0, 0, 100, 102, 101}, {0, 2, 75, 76, 76}, {0, 1, 80, 82, 80},
                {0, 4, 70, 72, 72},    {0, 3, 60, 62, 60}, {0, 5, 50, 52, 50},
                {1, 0, 40, 41, 41},    {1, 1, 30, 31, 30}, {1, 4, 28, 32, 32},
                {1, 5, 10, 12, 10}};
    d.sampled_levels_m = {{50, 60, 70, 75, 77, 78, 80, 90, 100}, {10, 20, 30, 40}};
    d.surfaces_m = {{}, {}};
    return d;
}

std::vector<std::size_t> ranks(const std::vector<std::size_t>& order) {
    std::vector<std::size_t> r(order.size());
    for (std::size_t i = 0; i < order.size(); ++i)
        r[order[i]] = i;
    return r;
}

/// The least misfit over every order that respects the hard constraints.
double bruteForceMinimum(const CorrelationData& d, MisfitUnit unit) {
    std::vector<std::size_t> p(d.events.size());
    std::iota(p.begin(), p.end(), 0);
    double best = INFINITY;
    do {
        if (seqtest::respectsHardConstraints(d, p))
            best = std::min(best, sequenceMisfit(d, p, unit));
    } while (std::next_permutation(p.begin(), p.end()));
    return best;
}

SequenceSettings quick(MisfitUnit unit, std::uint64_t seed) {
    SequenceSettings s;
    s.unit = unit;
    s.seed = seed;
    s.moves_per_restart = 20000;
    return s;
}

bool sameResult(const CompositeSequence& a, const CompositeSequence& b) {
    if (a.extensions.size() != b.extensions.size())
        return false;
    for (std::size_t i = 0; i < a.extensions.size(); ++i)
        if (a.extensions[i].event != b.extensions[i].event ||
            a.extensions[i].placed_m != b.extensions[i].placed_m)
            return false;
    return a.order == b.order && a.misfit == b.misfit && a.position_min == b.position_min &&
           a.position_max == b.position_max && a.restart_misfits == b.restart_misfits &&
           a.moves_tried == b.moves_tried && a.moves_accepted == b.moves_accepted;
}

} // namespace

TEST_CASE("sequenceMisfit by hand on two holes, in each unit", "[correlation][sequence]") {
    const CorrelationData d = handExample();
    const std::vector<std::size_t> order = {0, 2, 1, 4, 3, 5};
    CHECK_THAT(sequenceMisfit(d, order, MisfitUnit::Metres), WithinAbs(4.0, 1e-12)); // m
    CHECK(sequenceMisfit(d, order, MisfitUnit::Levels) == 2.0);
    CHECK(sequenceMisfit(d, order, MisfitUnit::Inversions) == 1.0);
    const std::vector<std::size_t> swapped = {0, 2, 1, 4, 5, 3};
    CHECK_THAT(sequenceMisfit(d, swapped, MisfitUnit::Metres), WithinAbs(12.0, 1e-12)); // m
    CHECK(sequenceMisfit(d, swapped, MisfitUnit::Levels) == 3.0);
    CHECK(sequenceMisfit(d, swapped, MisfitUnit::Inversions) == 2.0);
    // The matrix the annealer reads sums to the same misfit.
    CHECK_THAT(detail::misfitFromMatrix(detail::pairCostMatrix(d, MisfitUnit::Metres), swapped),
               WithinAbs(12.0, 1e-12));
}

TEST_CASE("a pair no one-sided move resolves is penalised", "[correlation][sequence]") {
    // Top A placed before base B while H1 has top A [10,11] wholly above base B [20,21]: top A
    // may not move down, base B not up. Gap 9 m -> 9 x penalty.
    CorrelationData d;
    d.holes = {"H1"};
    d.events = {{"T A", SequenceEventKind::Top, "A", {}, {}},
                {"B B", SequenceEventKind::Base, "B", {}, {}}};
    d.levels = {{0, 0, 10, 11, 10}, {0, 1, 20, 21, 21}};
    d.sampled_levels_m = {{10, 15, 21}};
    d.surfaces_m = {{}};
    CHECK_THAT(sequenceMisfit(d, {0, 1}, MisfitUnit::Metres),
               WithinAbs(9.0 * kInfeasiblePairPenalty, 1e-9));
    CHECK(sequenceMisfit(d, {0, 1}, MisfitUnit::Levels) == kInfeasiblePairPenalty); // 15 only
    CHECK(sequenceMisfit(d, {0, 1}, MisfitUnit::Inversions) == kInfeasiblePairPenalty);
    CHECK(sequenceMisfit(d, {1, 0}, MisfitUnit::Metres) == 0.0);
}

TEST_CASE("the annealer finds the brute-force minimum on small inputs", "[correlation][sequence]") {
    struct Case {
        std::uint64_t seed;
        int taxa, dated, holes;
    };
    const Case cases[] = {{11, 3, 0, 2}, {12, 3, 1, 2}, {13, 2, 2, 3}, {14, 3, 1, 3},
                          {15, 2, 3, 2}, {16, 3, 0, 3}};
    for (const Case& c : cases)
        for (MisfitUnit unit : {MisfitUnit::Metres, MisfitUnit::Levels, MisfitUnit::Inversions}) {
            const CorrelationData d =
                seqtest::inventData(c.seed, c.taxa, c.dated, c.holes, 25.0).data;
            const CompositeSequence r = buildCompositeSequence(d, quick(unit, c.seed));
            const double truth = bruteForceMinimum(d, unit);
            INFO("seed " << c.seed << " unit " << static_cast<int>(unit));
            REQUIRE(truth > 0); // the scatter must make the holes disagree, or this tests nothing
            CHECK_THAT(r.misfit, WithinAbs(truth, 1e-9 * (1 + truth)));
            CHECK(seqtest::respectsHardConstraints(d, r.order));
            CHECK(r.misfit == sequenceMisfit(d, r.order, unit));
        }
}

TEST_CASE("the incremental misfit equals the full recompute after every move",
          "[correlation][sequence]") {
    const CorrelationData d = seqtest::inventData(21, 8, 4, 3, 30.0).data; // 20 events
    for (MisfitUnit unit : {MisfitUnit::Metres, MisfitUnit::Levels}) {
        const detail::OrderRules rules = detail::hardOrderRules(d);
        const std::vector<std::size_t> start = detail::meanLevelStartOrder(d, rules);
        const std::vector<double> cost = detail::pairCostMatrix(d, unit);
        const double start_misfit = detail::misfitFromMatrix(cost, start);
        const detail::SequenceSearchSpace space = detail::makeSearchSpace(cost, rules);
        std::int64_t checked = 0, mismatched = 0, broken = 0, stale = 0;
        std::vector<std::size_t> previous = start;
        auto observe = [&](const std::vector<std::size_t>& order, std::size_t first,
                           std::size_t last, double misfit) {
            const double full = sequenceMisfit(d, order, unit);
            if (std::fabs(full - misfit) > 1e-9 * (1 + full))
                ++mismatched;
            if (!seqtest::respectsHardConstraints(d, order))
                ++broken;
            for (std::size_t i = 0; i < order.size(); ++i) // only [first, last] may change
                if ((i < first || i > last) && order[i] != previous[i])
                    ++stale;
            previous = order;
            ++checked;
        };
        const detail::RestartOutcome run =
            detail::annealRestart(space, start, start_misfit, 77, 5000, observe);
        CHECK(checked == run.accepted + 1);
        CHECK(run.accepted > 500);
        CHECK(mismatched == 0);
        CHECK(broken == 0);
        CHECK(stale == 0);
        CHECK_THAT(run.best_misfit, WithinAbs(sequenceMisfit(d, run.best_order, unit),
                                              1e-9 * (1 + run.best_misfit)));
    }
}

TEST_CASE("hard constraints hold against the data, and a given start must keep them",
          "[correlation][sequence]") {
    // Every hole has the base of A above its top, and the older date above the younger: the
    // misfit would fall if they swapped, but they may not.
    CorrelationData d;
    d.holes = {"H1", "H2"};
    d.events = {{"B A", SequenceEventKind::Base, "A", {}, {}},
                {"T A", SequenceEventKind::Top, "A", {}, {}},
                {"date old", SequenceEventKind::Dated, "", 5.0, 0.1},
                {"date young", SequenceEventKind::Dated, "", 3.0, 0.1},
                // 3.0 vs 3.1 Ma, sds 0.1: not distinguishable, no rule between them
                {"date close", SequenceEventKind::Dated, "", 3.1, 0.1}};
    for (std::size_t h = 0; h < 2; ++h) {
        d.levels.push_back({h, 0, 10, 11, 11});
        d.levels.push_back({h, 1, 20, 21, 20});
        d.levels.push_back({h, 2, 30, 30, 30});
        d.levels.push_back({h, 3, 40, 40, 40});
        d.levels.push_back({h, 4, 35, 35, 35});
    }
    d.sampled_levels_m = {{10, 20, 30, 40}, {10, 20, 30, 40}};
    d.surfaces_m = {{}, {}};
    const CompositeSequence r = buildCompositeSequence(d, quick(MisfitUnit::Metres, 3));
    const auto rank = ranks(r.order);
    CHECK(rank[0] < rank[1]);
    CHECK(rank[2] < rank[3]);
    CHECK(rank[2] < rank[4]); // the close date must follow the old one, and is free to follow
    CHECK(rank[3] < rank[4]); // the holes, which have it above the young one
    CHECK(seqtest::respectsHardConstraints(d, r.order));
    // A start that breaks a constraint is repaired, not refused: the result still keeps them.
    for (const std::vector<std::size_t>& bad :
         {std::vector<std::size_t>{1, 0, 2, 3, 4}, std::vector<std::size_t>{0, 1, 3, 2, 4}})
        CHECK(seqtest::respectsHardConstraints(
            d, buildCompositeSequence(d, quick(MisfitUnit::Metres, 3), bad).order));
    CHECK_THROWS_WITH(buildCompositeSequence(d, quick(MisfitUnit::Metres, 3), {0, 1, 2, 3}),
                      Contains("start_order"));
}

TEST_CASE("same seed gives the same result, on one thread or several",
          "[correlation][sequence]") {
    const CorrelationData d = seqtest::inventData(31, 10, 3, 4, 30.0).data;
    SequenceSettings s = quick(MisfitUnit::Metres, 4242);
    s.restarts = 5;
    const CompositeSequence a = buildCompositeSequence(d, s);
    const CompositeSequence b = buildCompositeSequence(d, s);
    s.threads = 2;
    const CompositeSequence c = buildCompositeSequence(d, s);
    s.threads = 3;
    const CompositeSequence e = buildCompositeSequence(d, s);
    CHECK(sameResult(a, b));
    CHECK(sameResult(a, c));
    CHECK(sameResult(a, e));
    CHECK(a.seed == 4242);
    CHECK(a.restart_misfits.size() == 5);
    CHECK(a.moves_tried == 5 * s.moves_per_restart);
    CHECK(a.misfit == *std::min_element(a.restart_misfits.begin(), a.restart_misfits.end()));
    const auto rank = ranks(a.order);
    for (std::size_t ev = 0; ev < d.events.size(); ++ev) {
        CHECK(a.position_min[ev] <= static_cast<int>(rank[ev]));
        CHECK(a.position_max[ev] >= static_cast<int>(rank[ev]));
    }
}

TEST_CASE("holes that all agree give misfit 0 and the true order of every ordered pair",
          "[correlation][sequence]") {
    for (std::uint64_t seed : {41u, 42u, 43u}) {
        const seqtest::InventedData inv = seqtest::inventData(seed, 12, 3, 4, 0.0, 0.05, 0.7);
        const CompositeSequence r =
            buildCompositeSequence(inv.data, quick(MisfitUnit::Metres, seed));
        CHECK(r.misfit == 0.0);
        CHECK(r.extensions.empty());
        const auto rank = ranks(r.order);
        int ordered_pairs = 0, wrong = 0;
        for (const EventLevel& a : inv.data.levels)
            for (const EventLevel& b : inv.data.levels)
                if (a.hole == b.hole && a.shallow_m > b.deep_m) { // a wholly below b
                    ++ordered_pairs;
                    REQUIRE(inv.true_age_ma[a.event] > inv.true_age_ma[b.event]);
                    if (rank[a.event] > rank[b.event])
                        ++wrong;
                }
        CHECK(ordered_pairs > 100);
        CHECK(wrong == 0);
    }
}

TEST_CASE("near-best ranges span the ranks of orders as good as the best",
          "[correlation][sequence]") {
    // Two bases never seen in the same hole, both below the top of X in each: either order of
    // the bases costs nothing, so ranks 0 and 1 are near-best for both; the top stays last.
    CorrelationData d;
    d.holes = {"H1", "H2"};
    d.events = {{"B X", SequenceEventKind::Base, "X", {}, {}},
                {"B Y", SequenceEventKind::Base, "Y", {}, {}},
                {"T X", SequenceEventKind::Top, "X", {}, {}}};
    d.levels = {{0, 0, 10, 11, 11}, {1, 1, 10, 11, 11}, {0, 2, 1, 2, 1}, {1, 2, 1, 2, 1}};
    d.sampled_levels_m = {{}, {}};
    d.surfaces_m = {{}, {}};
    SequenceSettings s = quick(MisfitUnit::Metres, 5);
    s.near_best_tolerance = 0;
    const CompositeSequence r = buildCompositeSequence(d, s);
    CHECK(r.misfit == 0.0);
    CHECK(r.position_min == std::vector<int>{0, 0, 2});
    CHECK(r.position_max == std::vector<int>{1, 1, 2});
}

TEST_CASE("bad settings and data throw naming the setting", "[correlation][sequence]") {
    const CorrelationData d = handExample();
    auto with = [](auto change) {
        SequenceSettings s;
        s.moves_per_restart = 100;
        change(s);
        return s;
    };
    CHECK_THROWS_WITH(buildCompositeSequence(d, with([](SequenceSettings& s) { s.restarts = 0; })),
                      Contains("restarts"));
    CHECK_THROWS_WITH(
        buildCompositeSequence(d, with([](SequenceSettings& s) { s.moves_per_restart = 0; })),
        Contains("moves_per_restart"));
    CHECK_THROWS_WITH(
        buildCompositeSequence(d, with([](SequenceSettings& s) { s.near_best_tolerance = -0.1; })),
        Contains("near_best_tolerance"));
    CHECK_THROWS_WITH(
        buildCompositeSequence(d, with([](SequenceSettings& s) { s.near_best_tolerance = NAN; })),
        Contains("near_best_tolerance"));
    CHECK_THROWS_WITH(buildCompositeSequence(d, with([](SequenceSettings& s) { s.threads = 0; })),
                      Contains("threads"));
    CorrelationData bad = d;
    bad.levels[0].level_m = 99; // outside [100, 102]
    CHECK_THROWS_AS(buildCompositeSequence(bad, with([](SequenceSettings&) {})),
                    std::invalid_argument);
    CHECK_THROWS_WITH(sequenceMisfit(bad, {0, 1, 2, 3, 4, 5}, MisfitUnit::Metres),
                      Contains("outside its bracket"));
    CHECK_THROWS_WITH(sequenceMisfit(d, {0, 1, 2, 3, 4, 4}, MisfitUnit::Metres),
                      Contains("not a permutation"));
    CorrelationData twice = d;
    twice.events[3] = {"B B again", SequenceEventKind::Base, "B", {}, {}};
    CHECK_THROWS_WITH(buildCompositeSequence(twice, with([](SequenceSettings&) {})),
                      Contains("two bases"));
}
