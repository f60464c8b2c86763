// Properties of the event-order graph over random invented inputs (seeded), against a brute
// force written here: every ordered pair that any hole shows or a rule gives, its reachability
// by Floyd-Warshall, and strongly connected components as mutual reachability (the relation
// Tarjan 1972 computes in linear time). Keeping only each hole's covering pairs must not change
// the components or the order.
#include "atollog/engine/event_order_graph.hpp"

#include "event_order_fixture.hpp"

#include <catch2/catch.hpp>

#include <set>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <random>
#include <string>
#include <vector>

using namespace atollog;
using namespace atollog::test;

namespace {

/// Uniform in [0, 1) from the top 53 bits, so every standard library draws the same numbers.
double uniform01(std::mt19937_64& rng) { return static_cast<double>(rng() >> 11) * 0x1.0p-53; }

/// A true order of events, holes that see most of them at depths following it plus noise, and
/// now and then a pick moved far (a planted contradiction); some dated horizons among them.
CorrelationData randomData(std::uint64_t seed) {
    std::mt19937_64 rng(seed);
    CorrelationBuilder b;
    const int holes = 1 + static_cast<int>(rng() % 5);
    const int taxa = 2 + static_cast<int>(rng() % 14);
    // Pick scatter from tidy to wild, so components range from single events to most of them.
    const double scatter_m = 2 + 18 * uniform01(rng) * uniform01(rng);
    for (int h = 0; h < holes; ++h)
        b.hole("H" + std::to_string(h));
    std::vector<double> true_age;
    for (int t = 0; t < taxa; ++t) {
        const double older = 1 + 20 * uniform01(rng);
        const double younger = older - 5 * uniform01(rng);
        b.base("T" + std::to_string(t));
        true_age.push_back(older);
        b.top("T" + std::to_string(t));
        true_age.push_back(younger);
        if (rng() % 3 == 0) {
            b.dated("S" + std::to_string(t), older + 0.3 * (uniform01(rng) - 0.5),
                    0.05 + 0.2 * uniform01(rng));
            true_age.push_back(*b.data.events.back().age_ma);
        }
    }
    for (std::size_t h = 0; h < b.data.holes.size(); ++h) {
        const double rate_m_per_myr = 5 + 10 * uniform01(rng);
        for (std::size_t e = 0; e < b.data.events.size(); ++e) {
            if (uniform01(rng) < 0.25)
                continue; // not seen in this hole
            double depth = true_age[e] * rate_m_per_myr + scatter_m * (uniform01(rng) - 0.5);
            if (uniform01(rng) < 0.05)
                depth += 60 * (uniform01(rng) - 0.5); // a misplaced pick
            const double above = 3 * uniform01(rng) * uniform01(rng);
            const double below = 3 * uniform01(rng) * uniform01(rng);
            b.at(h, e, depth - above, depth + below);
        }
    }
    return b.data;
}

/// Any directed graph: each hole holds two events, one below the other, so every ordered pair
/// is an edge of its own and no hole implies another (the cycles are the graph's own).
CorrelationData randomDigraph(std::uint64_t seed) {
    std::mt19937_64 rng(seed);
    CorrelationBuilder b;
    const std::size_t n = 3 + rng() % 10;
    for (std::size_t e = 0; e < n; ++e)
        b.base("E" + std::to_string(e));
    const std::size_t pairs = n + rng() % (2 * n);
    for (std::size_t p = 0; p < pairs; ++p) {
        const std::size_t older = rng() % n, younger = rng() % n;
        if (older == younger)
            continue;
        const auto h = b.hole("H" + std::to_string(p));
        b.at(h, older, 20, 21);
        b.at(h, younger, 10, 11);
    }
    return b.data;
}

/// The full relation: a -> b where a hole shows a wholly below b, or a rule gives it.
std::vector<std::vector<bool>> fullRelation(const CorrelationData& d) {
    const std::size_t n = d.events.size();
    std::vector<std::vector<bool>> r(n, std::vector<bool>(n, false));
    for (const EventLevel& x : d.levels)
        for (const EventLevel& y : d.levels)
            if (x.hole == y.hole && x.shallow_m > y.deep_m)
                r[x.event][y.event] = true;
    for (std::size_t a = 0; a < n; ++a)
        for (std::size_t c = 0; c < n; ++c) {
            const SequenceEvent& ea = d.events[a];
            const SequenceEvent& ec = d.events[c];
            if (ea.kind == SequenceEventKind::Base && ec.kind == SequenceEventKind::Top &&
                ea.taxon == ec.taxon)
                r[a][c] = true;
            if (ea.kind == SequenceEventKind::Dated && ec.kind == SequenceEventKind::Dated &&
                *ea.age_ma - *ec.age_ma >
                    2 * std::sqrt(*ea.age_sd_ma * *ea.age_sd_ma + *ec.age_sd_ma * *ec.age_sd_ma))
                r[a][c] = true;
        }
    return r;
}

std::vector<std::vector<bool>> reachability(std::vector<std::vector<bool>> r) {
    const std::size_t n = r.size();
    for (std::size_t k = 0; k < n; ++k)
        for (std::size_t i = 0; i < n; ++i)
            if (r[i][k])
                for (std::size_t j = 0; j < n; ++j)
                    if (r[k][j])
                        r[i][j] = true;
    return r;
}

/// Length of the shortest cycle inside component c using only the graph's edges.
std::size_t shortestCycleOfEdges(const EventOrderGraph& g, int c) {
    const std::size_t n = g.component.size();
    std::size_t best = SIZE_MAX;
    for (std::size_t s = 0; s < n; ++s) {
        if (g.component[s] != c)
            continue;
        std::vector<std::size_t> dist(n, SIZE_MAX);
        std::vector<std::size_t> queue{s};
        dist[s] = 0;
        for (std::size_t qi = 0; qi < queue.size(); ++qi)
            for (const OrderEdge& e : g.edges)
                if (e.older == queue[qi] && g.component[e.younger] == c) {
                    if (e.younger == s)
                        best = std::min(best, dist[queue[qi]] + 1);
                    else if (dist[e.younger] == SIZE_MAX) {
                        dist[e.younger] = dist[queue[qi]] + 1;
                        queue.push_back(e.younger);
                    }
                }
    }
    return best;
}

/// Length of the shortest cycle of the full relation using only the given events.
std::size_t shortestCycleAmong(const std::vector<std::vector<bool>>& rel,
                               const std::vector<std::size_t>& events) {
    std::size_t best = SIZE_MAX;
    for (std::size_t s : events) {
        std::vector<std::size_t> dist(rel.size(), SIZE_MAX);
        std::vector<std::size_t> queue{s};
        dist[s] = 0;
        for (std::size_t qi = 0; qi < queue.size(); ++qi)
            for (std::size_t w : events)
                if (rel[queue[qi]][w]) {
                    if (w == s)
                        best = std::min(best, dist[queue[qi]] + 1);
                    else if (dist[w] == SIZE_MAX) {
                        dist[w] = dist[queue[qi]] + 1;
                        queue.push_back(w);
                    }
                }
    }
    return best;
}

void checkAgainstBruteForce(const CorrelationData& d, const EventOrderGraph& g) {
    const std::size_t n = d.events.size();
    const auto rel = fullRelation(d);
    const auto reach = reachability(rel);

    // Every edge is in the full relation, each listed hole shows it with that gap.
    for (const OrderEdge& e : g.edges) {
        REQUIRE(rel[e.older][e.younger]);
        REQUIRE(e.holes.size() == e.separations_m.size());
        REQUIRE((!e.holes.empty() || !e.rule.empty()));
        REQUIRE(std::is_sorted(e.holes.begin(), e.holes.end()));
        for (std::size_t i = 0; i < e.holes.size(); ++i) {
            const EventLevel *lo = nullptr, *hi = nullptr;
            for (const EventLevel& l : d.levels) {
                if (l.hole == e.holes[i] && l.event == e.older)
                    lo = &l;
                if (l.hole == e.holes[i] && l.event == e.younger)
                    hi = &l;
            }
            REQUIRE((lo && hi));
            REQUIRE(lo->shallow_m > hi->deep_m);
            REQUIRE(e.separations_m[i] == lo->shallow_m - hi->deep_m);
        }
    }
    // Components are mutual reachability of the full relation.
    REQUIRE(g.component.size() == n);
    for (std::size_t a = 0; a < n; ++a)
        for (std::size_t c = 0; c < n; ++c)
            if (a != c)
                REQUIRE((g.component[a] == g.component[c]) == (reach[a][c] && reach[c][a]));
    // first_composite: a permutation, components together, every ordered pair forward.
    std::vector<std::size_t> pos(n, SIZE_MAX);
    REQUIRE(g.first_composite.size() == n);
    for (std::size_t i = 0; i < n; ++i) {
        REQUIRE(pos.at(g.first_composite[i]) == SIZE_MAX);
        pos[g.first_composite[i]] = i;
        if (i > 0)
            REQUIRE(g.component[g.first_composite[i - 1]] <= g.component[g.first_composite[i]]);
    }
    for (std::size_t a = 0; a < n; ++a)
        for (std::size_t c = 0; c < n; ++c)
            if (rel[a][c] && g.component[a] != g.component[c]) {
                REQUIRE(pos[a] < pos[c]);
                REQUIRE(g.component[a] < g.component[c]);
            }
    // At least one conflict per component of more than one event, and none elsewhere; each a
    // cycle of the full relation inside its component, reported once; the first of each
    // component no longer than the shortest cycle of the kept edges there.
    std::vector<int> size_of(n, 0);
    for (int c : g.component)
        ++size_of[static_cast<std::size_t>(c)];
    std::set<int> with_conflict;
    std::set<std::vector<std::size_t>> distinct;
    for (std::size_t i = 0; i < g.conflicts.size(); ++i) {
        const int c = g.component[g.conflicts[i].cycle[0]];
        if (with_conflict.insert(c).second)
            REQUIRE(g.conflicts[i].cycle.size() <= shortestCycleOfEdges(g, c));
        REQUIRE(distinct.insert(g.conflicts[i].cycle).second);
    }
    const auto big = static_cast<std::size_t>(
        std::count_if(size_of.begin(), size_of.end(), [](int s) { return s > 1; }));
    REQUIRE(with_conflict.size() == big);
    for (const OrderConflict& k : g.conflicts) {
        REQUIRE(k.cycle.size() >= 2);
        REQUIRE(k.cycle.front() == *std::min_element(k.cycle.begin(), k.cycle.end()));
        const int c = g.component[k.cycle[0]];
        REQUIRE(size_of[static_cast<std::size_t>(c)] > 1);
        auto sorted = k.cycle;
        std::sort(sorted.begin(), sorted.end());
        REQUIRE(std::adjacent_find(sorted.begin(), sorted.end()) == sorted.end());
        std::vector<std::size_t> holes; // every hole that shows a step
        for (std::size_t i = 0; i < k.cycle.size(); ++i) {
            const std::size_t a = k.cycle[i], z = k.cycle[(i + 1) % k.cycle.size()];
            REQUIRE(g.component[a] == c);
            REQUIRE(rel[a][z]);
            std::vector<std::size_t> showing;
            for (const EventLevel& x : d.levels)
                for (const EventLevel& y : d.levels)
                    if (x.event == a && y.event == z && x.hole == y.hole &&
                        x.shallow_m > y.deep_m)
                        showing.push_back(x.hole);
            if (!showing.empty()) // the message names the first hole showing each step
                REQUIRE(k.message.find("hole " + d.holes[*std::min_element(
                                                     showing.begin(), showing.end())]) !=
                        std::string::npos);
            holes.insert(holes.end(), showing.begin(), showing.end());
        }
        std::sort(holes.begin(), holes.end());
        holes.erase(std::unique(holes.begin(), holes.end()), holes.end());
        REQUIRE(k.holes == holes);
        REQUIRE(k.cycle.size() == shortestCycleAmong(rel, k.cycle));
        for (std::size_t e : k.cycle)
            REQUIRE(k.message.find("'" + d.events[e].id + "'") != std::string::npos);
    }
    for (std::size_t i = 1; i < g.conflicts.size(); ++i)
        REQUIRE(g.component[g.conflicts[i - 1].cycle[0]] <= g.component[g.conflicts[i].cycle[0]]);
}

bool sameGraph(const EventOrderGraph& x, const EventOrderGraph& y) {
    if (x.edges.size() != y.edges.size() || x.conflicts.size() != y.conflicts.size())
        return false;
    for (std::size_t i = 0; i < x.edges.size(); ++i) {
        const OrderEdge &a = x.edges[i], &b = y.edges[i];
        if (a.older != b.older || a.younger != b.younger || a.holes != b.holes ||
            a.separations_m != b.separations_m || a.rule != b.rule)
            return false;
    }
    for (std::size_t i = 0; i < x.conflicts.size(); ++i)
        if (x.conflicts[i].cycle != y.conflicts[i].cycle ||
            x.conflicts[i].holes != y.conflicts[i].holes ||
            x.conflicts[i].message != y.conflicts[i].message)
            return false;
    return x.component == y.component && x.first_composite == y.first_composite;
}

} // namespace

TEST_CASE("the graph agrees with a brute force over random inputs", "[correlation][order]") {
    int with_conflicts = 0;
    std::ptrdiff_t largest_component = 0;
    for (std::uint64_t seed = 1; seed <= 300; ++seed) {
        INFO("seed " << seed);
        const CorrelationData d = randomData(seed);
        const EventOrderGraph g = buildEventOrderGraph(d);
        checkAgainstBruteForce(d, g);
        with_conflicts += g.conflicts.empty() ? 0 : 1;
        for (int c : g.component)
            largest_component = std::max(
                largest_component, std::count(g.component.begin(), g.component.end(), c));
    }
    // The inputs must exercise both branches: some with contradictions, some without.
    CHECK(with_conflicts > 30);
    CHECK(with_conflicts < 270);
    CHECK(largest_component >= 15);
}

TEST_CASE("each component's first conflict is its shortest cycle on random digraphs",
          "[correlation][order]") {
    int longer_than_two = 0;
    for (std::uint64_t seed = 1; seed <= 400; ++seed) {
        INFO("seed " << seed);
        const CorrelationData d = randomDigraph(seed);
        const EventOrderGraph g = buildEventOrderGraph(d);
        checkAgainstBruteForce(d, g);
        for (std::size_t i = 0; i < g.conflicts.size(); ++i) {
            const OrderConflict& k = g.conflicts[i];
            const int c = g.component[k.cycle[0]];
            if (i == 0 || g.component[g.conflicts[i - 1].cycle[0]] != c) {
                REQUIRE(k.cycle.size() == shortestCycleOfEdges(g, c));
                longer_than_two += k.cycle.size() > 2 ? 1 : 0;
            }
        }
    }
    CHECK(longer_than_two > 30); // the search must be put to work beyond two-event cycles
}

TEST_CASE("the graph is deterministic and ignores the order levels are listed in",
          "[correlation][order]") {
    for (std::uint64_t seed = 1000; seed < 1050; ++seed) {
        INFO("seed " << seed);
        CorrelationData d = randomData(seed);
        const EventOrderGraph first = buildEventOrderGraph(d);
        CHECK(sameGraph(first, buildEventOrderGraph(d)));
        std::mt19937_64 rng(seed);
        std::shuffle(d.levels.begin(), d.levels.end(), rng);
        CHECK(sameGraph(first, buildEventOrderGraph(d)));
    }
}
