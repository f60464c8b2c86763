// The event-order graph on invented holes worked by hand. An edge older -> younger means the
// older event's bracket lies wholly below the younger's in a hole; a cycle means the holes
// disagree on the order of its events, so a pick in it is at fault (Shaw 1964, graphic
// correlation: where sections disagree on the order of events, a pick is misplaced). Components
// are strongly connected components (Tarjan 1972). Per hole only covering pairs are kept, so a
// pair implied through a third event of the same hole has no edge of its own from that hole.
#include "atollog/engine/event_order_graph.hpp"

#include "event_order_fixture.hpp"

#include <catch2/catch.hpp>

#include <set>

#include <algorithm>
#include <stdexcept>
#include <string>
#include <vector>

using namespace atollog;
using namespace atollog::test;
using Catch::WithinAbs;
using Catch::Matchers::Contains;

namespace {

constexpr double kTol_m = 1e-9;

using Idx = std::vector<std::size_t>;

const OrderEdge* findEdge(const EventOrderGraph& g, std::size_t older, std::size_t younger) {
    for (const OrderEdge& e : g.edges)
        if (e.older == older && e.younger == younger)
            return &e;
    return nullptr;
}

} // namespace

TEST_CASE("two holes in agreement give an order and no conflict", "[correlation][order]") {
    CorrelationBuilder b;
    const auto h1 = b.hole("H1"), h2 = b.hole("H2");
    const auto alpha = b.base("ALPHA"), beta = b.base("BETA"), gamma = b.base("GAMMA"),
               delta = b.base("DELTA");
    b.at(h1, alpha, 100, 101);
    b.at(h1, beta, 90, 91);
    b.at(h1, gamma, 80, 81);
    b.at(h2, alpha, 50, 51);
    b.at(h2, beta, 45, 46);
    b.at(h2, delta, 30, 31);

    SECTION("covering pairs only, merged over holes") {
        const EventOrderGraph g = buildEventOrderGraph(b.data);
        REQUIRE(g.edges.size() == 3);
        const OrderEdge* ab = findEdge(g, alpha, beta);
        REQUIRE(ab);
        CHECK(ab->holes == Idx{h1, h2});
        REQUIRE(ab->separations_m.size() == 2);
        CHECK_THAT(ab->separations_m[0], WithinAbs(9.0, kTol_m)); // 100 - 91 m in H1
        CHECK_THAT(ab->separations_m[1], WithinAbs(4.0, kTol_m)); // 50 - 46 m in H2
        CHECK(ab->rule.empty());
        const OrderEdge* bg = findEdge(g, beta, gamma);
        REQUIRE(bg);
        CHECK(bg->holes == Idx{h1});
        CHECK_THAT(bg->separations_m.at(0), WithinAbs(9.0, kTol_m)); // 90 - 81 m
        const OrderEdge* bd = findEdge(g, beta, delta);
        REQUIRE(bd);
        CHECK_THAT(bd->separations_m.at(0), WithinAbs(14.0, kTol_m)); // 45 - 31 m
        // ALPHA below GAMMA in H1 is implied through BETA: no edge of its own.
        CHECK(findEdge(g, alpha, gamma) == nullptr);
        CHECK(g.conflicts.empty());
        // GAMMA and DELTA are never seen together and carry no age: by id, DELTA first.
        CHECK(g.first_composite == Idx{alpha, beta, delta, gamma});
        CHECK(g.component == std::vector<int>{0, 1, 3, 2});
    }
    SECTION("unordered events are taken by age where known") {
        b.data.events[gamma].age_ma = 5.0;
        b.data.events[delta].age_ma = 3.0;
        const EventOrderGraph g = buildEventOrderGraph(b.data);
        CHECK(g.first_composite == Idx{alpha, beta, gamma, delta});
    }
}

TEST_CASE("a three-hole cycle is one conflict naming its events, holes and depths",
          "[correlation][order]") {
    CorrelationBuilder b;
    const auto h1 = b.hole("H1"), h2 = b.hole("H2"), h3 = b.hole("H3");
    const auto a = b.base("ACRO"), bb = b.base("BOLI"), c = b.top("CERA");
    b.at(h1, a, 20, 21); // A below B in H1
    b.at(h1, bb, 10, 11);
    b.at(h2, bb, 32, 33); // B below C in H2
    b.at(h2, c, 25, 26);
    b.at(h3, c, 40, 41); // C below A in H3
    b.at(h3, a, 35, 36);
    const EventOrderGraph g = buildEventOrderGraph(b.data);

    REQUIRE(g.edges.size() == 3);
    CHECK(g.component[a] == g.component[bb]);
    CHECK(g.component[bb] == g.component[c]);
    REQUIRE(g.conflicts.size() == 1);
    const OrderConflict& k = g.conflicts[0];
    CHECK(k.cycle == Idx{a, bb, c});
    CHECK(k.holes == Idx{h1, h2, h3});
    CHECK(k.message ==
          "The order of 'B ACRO', 'B BOLI', and 'T CERA' contradicts itself: 'B ACRO' lies "
          "below 'B BOLI' in hole H1 (20-21 m below 10-11 m), 'B BOLI' lies below 'T CERA' in "
          "hole H2 (32-33 m below 25-26 m), and 'T CERA' lies below 'B ACRO' in hole H3 "
          "(40-41 m below 35-36 m); at least one of these picks is misplaced.");
    // Inside the component by mean observed level, deepest first: C 33, A 28, B 21.5 m.
    CHECK(g.first_composite == Idx{c, a, bb});
}

TEST_CASE("a cycle is shortened through an order implied within one hole", "[correlation][order]") {
    // H1: A below B below C (A below C only implied, no edge); H2: C below A. The kept edges make
    // the cycle A -> B -> C -> A, but H1 shows A below C directly: A and C alone contradict.
    CorrelationBuilder b;
    const auto h1 = b.hole("H1"), h2 = b.hole("H2");
    const auto a = b.base("A"), bb = b.base("B"), c = b.base("C");
    b.at(h1, a, 30, 31);
    b.at(h1, bb, 20, 21);
    b.at(h1, c, 10, 11);
    b.at(h2, c, 60, 61);
    b.at(h2, a, 50, 51);
    const EventOrderGraph g = buildEventOrderGraph(b.data);
    CHECK(findEdge(g, a, c) == nullptr);
    REQUIRE(g.conflicts.size() == 1);
    CHECK(g.conflicts[0].cycle == Idx{a, c});
    CHECK(g.conflicts[0].holes == Idx{h1, h2});
    CHECK_THAT(g.conflicts[0].message, Contains("'B A' lies below 'B C' in hole H1 (30-31 m below "
                                                "10-11 m), and 'B C' lies below 'B A' in hole H2"));
    // B is in the component too (A -> B -> C -> A), though not on the cycle shown.
    CHECK(g.component[bb] == g.component[a]);
}

TEST_CASE("the shortest cycle of a component is the one reported", "[correlation][order]") {
    // Each hole holds two events, the first below the second, so no hole implies a third pair
    // and only the search decides which cycle is shown.
    CorrelationBuilder b;
    std::vector<std::size_t> ev;
    for (const char* taxon : {"E0", "E1", "E2", "E3", "E4", "E5", "E6", "E7", "E8", "E9"})
        ev.push_back(b.base(taxon));
    const auto below = [&](std::size_t older, std::size_t younger) {
        const auto h = b.hole("H" + std::to_string(b.data.holes.size() + 1));
        b.at(h, ev[older], 20, 21);
        b.at(h, ev[younger], 10, 11);
    };
    // E0..E4: E0 <-> E1, and E0 -> E2 -> E3 -> E4 -> E0 (a search that goes deep first from
    // E0 would return the four-event cycle).
    below(0, 1);
    below(1, 0);
    below(0, 2);
    below(2, 3);
    below(3, 4);
    below(4, 0);
    // E5..E9: E5 -> E6 -> E7 -> E5 found first, E8 <-> E9 shorter, joined by E7 -> E8, E9 -> E5.
    below(5, 6);
    below(6, 7);
    below(7, 5);
    below(7, 8);
    below(8, 9);
    below(9, 8);
    below(9, 5);
    const EventOrderGraph g = buildEventOrderGraph(b.data);
    // Each component's first conflict is its shortest cycle; the cycles through the rest of its
    // edges follow (E0 -> E2 -> E3 -> E4 -> E0; E5 -> E6 -> E7 -> E5 and the ones joining E7,
    // E8, E9, E5), each once.
    std::vector<Idx> first;
    std::set<Idx> all;
    for (std::size_t i = 0; i < g.conflicts.size(); ++i) {
        const int c = g.component[g.conflicts[i].cycle[0]];
        if (i == 0 || g.component[g.conflicts[i - 1].cycle[0]] != c)
            first.push_back(g.conflicts[i].cycle);
        CHECK(all.insert(g.conflicts[i].cycle).second);
    }
    REQUIRE(first.size() == 2);
    std::sort(first.begin(), first.end());
    CHECK(first[0] == Idx{ev[0], ev[1]});
    CHECK(first[1] == Idx{ev[8], ev[9]});
    CHECK(all.count(Idx{ev[0], ev[2], ev[3], ev[4]}) == 1);
    CHECK(all.count(Idx{ev[5], ev[6], ev[7]}) == 1);
    CHECK(g.component[ev[4]] == g.component[ev[0]]);
    CHECK(g.component[ev[5]] == g.component[ev[9]]);
    CHECK(g.component[ev[0]] != g.component[ev[9]]);
}

TEST_CASE("overlapping or touching brackets give no order", "[correlation][order]") {
    CorrelationBuilder b;
    const auto h = b.hole("H1");
    const auto x = b.base("X"), y = b.base("Y");
    SECTION("overlap") {
        b.at(h, x, 11, 13);
        b.at(h, y, 10, 12);
        CHECK(buildEventOrderGraph(b.data).edges.empty());
    }
    SECTION("one bracket inside the other") {
        b.at(h, x, 10, 20);
        b.at(h, y, 12, 13);
        CHECK(buildEventOrderGraph(b.data).edges.empty());
    }
    SECTION("touching: shallow end equal to the other's deep end is not below it") {
        b.at(h, x, 11, 12);
        b.at(h, y, 10, 11);
        CHECK(buildEventOrderGraph(b.data).edges.empty());
    }
    SECTION("a millimetre apart") {
        b.at(h, x, 11.001, 12);
        b.at(h, y, 10, 11);
        const EventOrderGraph g = buildEventOrderGraph(b.data);
        REQUIRE(g.edges.size() == 1);
        CHECK(g.edges[0].older == x);
        CHECK_THAT(g.edges[0].separations_m.at(0), WithinAbs(0.001, kTol_m));
    }
}

TEST_CASE("a taxon's base is older than its top by rule", "[correlation][order]") {
    CorrelationBuilder b;
    const auto h1 = b.hole("H1"), h2 = b.hole("H2");
    const auto base = b.base("PORI"), top = b.top("PORI");
    SECTION("seen in different holes: the rule alone orders them") {
        b.at(h1, base, 50, 51);
        b.at(h2, top, 10, 11);
        const EventOrderGraph g = buildEventOrderGraph(b.data);
        REQUIRE(g.edges.size() == 1);
        CHECK(g.edges[0].older == base);
        CHECK(g.edges[0].younger == top);
        CHECK(g.edges[0].holes.empty());
        CHECK(g.edges[0].rule == "base before top");
        CHECK(g.first_composite == Idx{base, top});
    }
    SECTION("a hole agreeing with the rule adds its support to the same edge") {
        b.at(h1, base, 50, 51);
        b.at(h1, top, 10, 11);
        const EventOrderGraph g = buildEventOrderGraph(b.data);
        REQUIRE(g.edges.size() == 1);
        CHECK(g.edges[0].holes == Idx{h1});
        CHECK(g.edges[0].rule == "base before top");
    }
    SECTION("a base found above its top is a conflict with the rule") {
        b.at(h1, base, 10, 11);
        b.at(h1, top, 20, 21);
        const EventOrderGraph g = buildEventOrderGraph(b.data);
        REQUIRE(g.conflicts.size() == 1);
        CHECK(g.conflicts[0].cycle == Idx{base, top});
        CHECK(g.conflicts[0].holes == Idx{h1});
        CHECK_THAT(g.conflicts[0].message,
                   Contains("'B PORI' is older than 'T PORI' (a taxon's base comes before its "
                            "top), and 'T PORI' lies below 'B PORI' in hole H1 (20-21 m below "
                            "10-11 m)"));
    }
}

TEST_CASE("dated horizons are ordered by age beyond two combined sds", "[correlation][order]") {
    CorrelationBuilder b;
    const auto h1 = b.hole("H1");
    const auto d1 = b.dated("S1", 5.0, 0.1), d2 = b.dated("S2", 4.0, 0.1),
               d3 = b.dated("S3", 4.2, 0.1);
    b.at(h1, d2, 10, 10);
    const EventOrderGraph g = buildEventOrderGraph(b.data);
    // 5.0 - 4.0 and 5.0 - 4.2 exceed 2 sqrt(0.1^2 + 0.1^2) = 0.283 Ma; 4.2 - 4.0 does not.
    REQUIRE(g.edges.size() == 2);
    const OrderEdge* e12 = findEdge(g, d1, d2);
    REQUIRE(e12);
    CHECK(e12->rule == "dated ages");
    CHECK(e12->holes.empty());
    CHECK(findEdge(g, d1, d3) != nullptr);
    CHECK(findEdge(g, d3, d2) == nullptr);
    CHECK(findEdge(g, d2, d3) == nullptr);
    // S2 and S3 are unordered: the older (4.2 Ma) first.
    CHECK(g.first_composite == Idx{d1, d3, d2});
}

TEST_CASE("an event seen in one hole only is ordered against that hole's events",
          "[correlation][order]") {
    CorrelationBuilder b;
    const auto h1 = b.hole("H1"), h2 = b.hole("H2");
    const auto a = b.base("A"), bb = b.base("B"), only = b.base("ONLY");
    b.at(h1, a, 30, 31);
    b.at(h1, bb, 10, 11);
    b.at(h2, a, 40, 41);
    b.at(h2, only, 25, 26);
    b.at(h2, bb, 12, 13);
    const EventOrderGraph g = buildEventOrderGraph(b.data);
    REQUIRE(g.edges.size() == 3);
    REQUIRE(findEdge(g, a, only));
    CHECK(findEdge(g, a, only)->holes == Idx{h2});
    REQUIRE(findEdge(g, only, bb));
    CHECK(findEdge(g, only, bb)->holes == Idx{h2});
    // A below B: a covering pair in H1 only; in H2 it is implied through ONLY.
    REQUIRE(findEdge(g, a, bb));
    CHECK(findEdge(g, a, bb)->holes == Idx{h1});
    CHECK(g.first_composite == Idx{a, only, bb});
    CHECK(g.conflicts.empty());
}

TEST_CASE("invalid correlation data is refused with the validator's message", "[correlation][order]") {
    CorrelationBuilder b;
    const auto h = b.hole("H1");
    const auto a = b.base("A");
    b.at(h, a, 10, 11);
    SECTION("duplicate event id") { b.base("A"); }
    SECTION("level outside its bracket") { b.data.levels[0].level_m = 12; }
    SECTION("per-hole lists of the wrong count") { b.data.surfaces_m.clear(); }

    std::string expected;
    try {
        validateCorrelationData(b.data);
    } catch (const std::invalid_argument& e) {
        expected = e.what();
    }
    REQUIRE_FALSE(expected.empty());
    CHECK_THROWS_WITH(buildEventOrderGraph(b.data), expected);
    CHECK_THROWS_AS(buildEventOrderGraph(b.data), std::invalid_argument);
}

TEST_CASE("no events give an empty graph", "[correlation][order]") {
    CorrelationBuilder b;
    b.hole("H1");
    const EventOrderGraph g = buildEventOrderGraph(b.data);
    CHECK(g.edges.empty());
    CHECK(g.component.empty());
    CHECK(g.first_composite.empty());
    CHECK(g.conflicts.empty());
}
