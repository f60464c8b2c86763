// Pick contradictions that logged surfaces explain, on invented holes worked by hand.
// A hiatus removes time at a surface; it never reverses the order of two events, it squeezes the
// events whose ages fall in the missing time onto the surface: a base (first occurrence) just
// above it, a top (last occurrence) just below (Shaw 1964, graphic correlation: a dog-leg in the
// line of correlation marks a hiatus; International Stratigraphic Guide, Salvador 1994: an
// unconformity separates younger strata from older ones across a surface of erosion or
// non-deposition). So an older base above a younger top with a logged surface between them is
// explained, while the same picks without a surface, or with the surface elsewhere, and a top
// above a base, are conflicts. Carbonate resting on volcanic basement records no first
// occurrence older than the reef, so a base reaching the basement contact is truncated there.
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/inversion_explanation.hpp"
#include "atollog/engine/logged_surfaces.hpp"
#include "atollog/engine/pick_conflicts.hpp"
#include "atollog/engine/tie_points.hpp"
#include "atollog/engine/zone_assignment.hpp"

#include "biostrat_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using namespace atollog::test;
using Catch::WithinAbs;

namespace {
constexpr double kTol_m = 1e-9;

struct Find {
    std::string taxon;
    int from = 0; ///< first and last sample number holding the taxon (S<n> lies at n m)
    int to = 0;
};

/// Hole VEH-1: point samples S1..S10 at 1..10 m, taxon R in every one (all examined), no runs
/// (nothing widens a bracket). Limestone 0-5.5 m whose base is `surface` (none: a conformable
/// contact), limestone 5.5-10.5 m below.
CoreDataset hiatusHole(Surface surface, const std::vector<Find>& finds,
                       std::vector<TimeScaleEvent> events) {
    CoreDataset d;
    d.holes = {makeHole("VEH-1")};
    LithInterval upper = makeInterval("VEH-1", 0.0, 5.5, Rock::Limestone);
    upper.base_surface = surface;
    d.intervals = {upper, makeInterval("VEH-1", 5.5, 10.5, Rock::Limestone)};
    for (int i = 1; i <= 10; ++i) {
        const std::string id = "S" + std::to_string(i);
        d.samples.push_back(makeSample("VEH-1", id, i, i));
        d.occurrences.push_back(makeOccurrence(id, "R"));
        for (const Find& f : finds)
            if (i >= f.from && i <= f.to)
                d.occurrences.push_back(makeOccurrence(id, f.taxon));
    }
    d.events = std::move(events);
    return d;
}

const DatumPick& pickOf(const std::vector<DatumPick>& picks, const std::string& event) {
    auto it = std::find_if(picks.begin(), picks.end(),
                           [&](const DatumPick& p) { return p.event == event; });
    REQUIRE(it != picks.end());
    return *it;
}

const TiePoint* tieOf(const std::vector<TiePoint>& ties, const std::string& event) {
    auto it = std::find_if(ties.begin(), ties.end(),
                           [&](const TiePoint& t) { return t.event == event; });
    return it == ties.end() ? nullptr : &*it;
}

long countKind(const std::vector<PickConflict>& v, PickConflictKind k) {
    return std::count_if(v.begin(), v.end(), [&](const PickConflict& c) { return c.kind == k; });
}

/// The sampling-miss configuration: base of C (2.2 Ma) found only in S1-S3, so picked 3-4 m;
/// top of D (0.9 Ma) found only in S8-S10, so picked 7-8 m. The older base lies wholly above the
/// younger top: 2.2 - 0.9 = 1.3 Ma > 2 sqrt(0.05^2 + 0.05^2) = 0.141 Ma [F]. Zones of scheme HX:
/// H1 below base C, H2 from base C to top D, H3 above top D.
CoreDataset missConfiguration(Surface surface) {
    CoreDataset d = hiatusHole(surface, {{"C", 1, 3}, {"D", 8, 10}},
                               {makeEvent("B C", "C", EventKind::Base, 2.2, 0.05),
                                makeEvent("T D", "D", EventKind::Top, 0.9, 0.05)});
    d.zones = {makeZone("HX", "H1", std::nullopt, "B C"), makeZone("HX", "H2", "B C", "T D"),
               makeZone("HX", "H3", "T D", std::nullopt)};
    return d;
}

const SampleZoneCall& callOf(const ZoneReport& r, const std::string& sample) {
    auto it = std::find_if(r.samples.begin(), r.samples.end(),
                           [&](const SampleZoneCall& c) { return c.sample == sample; });
    REQUIRE(it != r.samples.end());
    return *it;
}

} // namespace

TEST_CASE("logged surfaces: interval bases and the basement contact", "[unit][biostrat][hiatus]") {
    CoreDataset d;
    d.holes = {makeHole("VEH-2"), makeHole("VEH-3"), makeHole("VEH-4")};
    LithInterval hard = makeInterval("VEH-2", 2.0, 4.0, Rock::Limestone);
    hard.base_surface = Surface::Hardground;
    LithInterval expo = makeInterval("VEH-2", 0.0, 2.0, Rock::Limestone);
    expo.base_surface = Surface::Exposure;
    LithInterval floor = makeInterval("VEH-2", 4.5, 6.0, Rock::Dolostone);
    floor.base_surface = Surface::Erosion;
    d.intervals = {hard, expo,
                   makeInterval("VEH-2", 4.0, 4.5, Rock::Basalt), // a flow inside the section
                   floor,
                   makeInterval("VEH-2", 7.0, 8.0, Rock::Basalt),
                   makeInterval("VEH-2", 6.3, 7.0, Rock::Volcaniclastic), // the shallowest below
                   makeInterval("VEH-3", 0.0, 9.0, Rock::Basalt), // no carbonate: no contact
                   makeInterval("VEH-4", 0.0, 9.0, Rock::Limestone)}; // no basement reached
    const auto s = loggedSurfaces(d);
    REQUIRE(s.size() == 4);
    CHECK(s[0] == LoggedSurface{"VEH-2", 2.0, LoggedSurfaceKind::Exposure});
    CHECK(s[1] == LoggedSurface{"VEH-2", 4.0, LoggedSurfaceKind::Hardground});
    CHECK(s[2] == LoggedSurface{"VEH-2", 6.0, LoggedSurfaceKind::Erosion});
    CHECK(s[3] == LoggedSurface{"VEH-2", 6.3, LoggedSurfaceKind::BasementContact});
    CHECK(toString(LoggedSurfaceKind::BasementContact) == "basement_contact");
    CHECK(surfacesOfHole(s, "VEH-3").empty());

    SECTION("bad input is refused") {
        d.intervals.push_back(makeInterval("VEH-9", 0.0, 1.0, Rock::Limestone));
        CHECK_THROWS_WITH(loggedSurfaces(d), Catch::Contains("'VEH-9'"));
        d.intervals.pop_back();
        d.intervals[0].base_m = std::numeric_limits<double>::quiet_NaN();
        CHECK_THROWS_AS(loggedSurfaces(d), std::invalid_argument);
    }
}

TEST_CASE("a base and a top squeezed onto an exposure surface are flagged, not in conflict",
          "[unit][biostrat][hiatus]") {
    // Base of A (1.8 Ma) in S1-S5 above the surface at 5.5 m, top of B (1.2 Ma) in S6-S10 below
    // it: both ages in the missing time. Base A: found S5, absent S6 -> 5-6 m; top B: absent S5,
    // found S6 -> 5-6 m. Both brackets hold the surface.
    const CoreDataset d = hiatusHole(Surface::Exposure, {{"A", 1, 5}, {"B", 6, 10}},
                                     {makeEvent("B A", "A", EventKind::Base, 1.8, 0.05),
                                      makeEvent("T B", "B", EventKind::Top, 1.2, 0.05)});
    const auto picks = pickDatums(d, {});
    for (const char* event : {"B A", "T B"}) {
        const DatumPick& p = pickOf(picks, event);
        CHECK_THAT(p.widened.shallow_m, WithinAbs(5.0, kTol_m));
        CHECK_THAT(p.widened.deep_m, WithinAbs(6.0, kTol_m));
        CHECK(p.truncated_at_surface);
        REQUIRE(p.surfaces_at_pick.size() == 1);
        CHECK(p.surfaces_at_pick[0] == LoggedSurface{"VEH-1", 5.5, LoggedSurfaceKind::Exposure});
        CHECK_FALSE(p.truncated_at_basement); // no basement logged
    }
    const PickConflictReport review = reviewPickConflicts(d, picks);
    CHECK(review.conflicts.empty());
    CHECK(review.explained.empty()); // the brackets overlap: nothing to explain
    // By default a pick squeezed onto a surface dates neither side: no tie. Asked for, the tie
    // is kept and flagged.
    const auto ties = makeTiePoints(picks, review.conflicts, {});
    BiostratSettings with_surface_picks;
    with_surface_picks.surface_picks_as_ties = true;
    const auto kept = makeTiePoints(picks, review.conflicts, with_surface_picks);
    for (const char* event : {"B A", "T B"}) {
        CHECK(tieOf(ties, event) == nullptr);
        const TiePoint* t = tieOf(kept, event);
        REQUIRE(t != nullptr);
        CHECK(tieFlagsText(*t) == "at_surface");
    }

    // The same finds in conformable rock: the same brackets, no flag.
    const CoreDataset plain = hiatusHole(Surface::None, {{"A", 1, 5}, {"B", 6, 10}}, d.events);
    const auto plain_picks = pickDatums(plain, {});
    CHECK_FALSE(pickOf(plain_picks, "B A").truncated_at_surface);
    CHECK(pickOf(plain_picks, "T B").surfaces_at_pick.empty());
}

TEST_CASE("an older base above a younger top across a logged surface is explained",
          "[unit][biostrat][hiatus]") {
    const CoreDataset d = missConfiguration(Surface::Exposure);
    const auto picks = pickDatums(d, {});
    const DatumPick& base = pickOf(picks, "B C");
    const DatumPick& top = pickOf(picks, "T D");
    CHECK_THAT(base.widened.shallow_m, WithinAbs(3.0, kTol_m));
    CHECK_THAT(base.widened.deep_m, WithinAbs(4.0, kTol_m));
    CHECK_THAT(top.widened.shallow_m, WithinAbs(7.0, kTol_m));
    CHECK_THAT(top.widened.deep_m, WithinAbs(8.0, kTol_m));
    CHECK_FALSE(base.truncated_at_surface); // sampling, not the surface, set them apart
    CHECK_FALSE(top.truncated_at_surface);

    const PickConflictReport review = reviewPickConflicts(d, picks);
    CHECK(review.conflicts.empty());
    CHECK(findPickConflicts(d, picks).empty());
    REQUIRE(countKind(review.explained, PickConflictKind::EventOrder) == 1);
    REQUIRE(countKind(review.explained, PickConflictKind::ZoneInverted) == 1);
    for (const PickConflict& c : review.explained) {
        REQUIRE(c.explained_by);
        CHECK(c.explained_by->cause == InversionCause::HiatusSurface);
        CHECK(c.explained_by->surface ==
              LoggedSurface{"VEH-1", 5.5, LoggedSurfaceKind::Exposure});
        CHECK_THAT(c.message, Catch::Contains("exposure surface at 5.5 m"));
    }
    const auto order = std::find_if(review.explained.begin(), review.explained.end(),
                                    [](const PickConflict& c) {
                                        return c.kind == PickConflictKind::EventOrder;
                                    });
    CHECK(order->expected_deeper_event == "B C");
    CHECK_THAT(order->age_gap_ma, WithinAbs(1.3, 1e-12));

    // Ties stay, marked as part of an explained inversion.
    std::vector<PickConflict> all = review.conflicts;
    all.insert(all.end(), review.explained.begin(), review.explained.end());
    const auto ties = makeTiePoints(picks, all, {});
    for (const char* event : {"B C", "T D"}) {
        const TiePoint* t = tieOf(ties, event);
        REQUIRE(t != nullptr);
        CHECK(tieFlagsText(*t) == "explained_inversion");
    }

    // Zone H2 (base C to top D) lies in the missing time. S4-S7 lie below base C (H1 side) and
    // above top D (H3 side); the surface decides: S4, S5 above 5.5 m lie in the younger rock (H3),
    // S6, S7 below it in the older rock (H1).
    const ZoneReport zones = assignZones(d, picks);
    for (const char* s : {"S4", "S5"}) {
        CHECK(callOf(zones, s).call == ZoneCall::Assigned);
        CHECK(callOf(zones, s).zone == std::optional<std::string>("H3"));
    }
    for (const char* s : {"S6", "S7"}) {
        CHECK(callOf(zones, s).call == ZoneCall::Assigned);
        CHECK(callOf(zones, s).zone == std::optional<std::string>("H1"));
    }
}

TEST_CASE("the same picks without a logged surface are a conflict", "[unit][biostrat][hiatus]") {
    const CoreDataset d = missConfiguration(Surface::None);
    const auto picks = pickDatums(d, {});
    const PickConflictReport review = reviewPickConflicts(d, picks);
    CHECK(review.explained.empty());
    CHECK(countKind(review.conflicts, PickConflictKind::EventOrder) == 1);
    CHECK(countKind(review.conflicts, PickConflictKind::ZoneInverted) == 1);
    for (const PickConflict& c : review.conflicts)
        CHECK_FALSE(c.explained_by);
    const auto ties = makeTiePoints(picks, review.conflicts, {});
    REQUIRE(tieOf(ties, "B C") != nullptr);
    CHECK(tieFlagsText(*tieOf(ties, "B C")) == "order_conflict;zone_inverted");
    const ZoneReport zones = assignZones(d, picks);
    for (const char* s : {"S4", "S5", "S6", "S7"})
        CHECK(callOf(zones, s).call == ZoneCall::ConflictingPicks);
}

TEST_CASE("a logged surface that is not between the picks explains nothing",
          "[unit][biostrat][hiatus]") {
    // The picks of missConfiguration (base C 3-4 m, top D 7-8 m) with the surface moved: above
    // the base's bracket (2.5 m) or below the top's bracket (9.5 m). A hiatus there cannot put
    // the base above the top.
    for (double surface_m : {2.5, 9.5}) {
        CoreDataset d = missConfiguration(Surface::None);
        d.intervals = {makeInterval("VEH-1", 0.0, surface_m, Rock::Limestone),
                       makeInterval("VEH-1", surface_m, 10.5, Rock::Limestone)};
        d.intervals[0].base_surface = Surface::Exposure;
        const PickConflictReport review = reviewPickConflicts(d, pickDatums(d, {}));
        INFO("surface at " << surface_m << " m");
        CHECK(review.explained.empty());
        CHECK(countKind(review.conflicts, PickConflictKind::EventOrder) == 1);
    }
    // A hardground or an erosion surface between them explains as an exposure does.
    for (Surface s : {Surface::Hardground, Surface::Erosion}) {
        const CoreDataset d = missConfiguration(s);
        const PickConflictReport review = reviewPickConflicts(d, pickDatums(d, {}));
        CHECK(review.conflicts.empty());
        CHECK(countKind(review.explained, PickConflictKind::EventOrder) == 1);
    }
}

TEST_CASE("an older top above a younger base is a conflict even across a surface",
          "[unit][biostrat][hiatus]") {
    // Top of E (3.0 Ma) found in S3-S4, so picked 2-3 m; base of F (1.0 Ma) found in S1-S8, so
    // picked 8-9 m. A hiatus squeezes a top below its surface and a base above it, never the
    // reverse: this is what a reworked older fossil does, and it stays a conflict.
    const CoreDataset d = hiatusHole(Surface::Exposure, {{"E", 3, 4}, {"F", 1, 8}},
                                     {makeEvent("T E", "E", EventKind::Top, 3.0, 0.05),
                                      makeEvent("B F", "F", EventKind::Base, 1.0, 0.05)});
    const PickConflictReport review = reviewPickConflicts(d, pickDatums(d, {}));
    CHECK(review.explained.empty());
    REQUIRE(review.conflicts.size() == 1);
    CHECK(review.conflicts[0].expected_deeper_event == "T E");
    CHECK(review.conflicts[0].expected_shallower_event == "B F");
}

TEST_CASE("a base at the basement contact is truncated and no tie", "[unit][biostrat][hiatus]") {
    // Hole VEB-1: limestone 0-10.5 m resting with an erosion surface on basalt 10.5-12.5 m;
    // samples S1..S10 at 1..10 m with R, and S11 at 11.5 m in the basalt, examined and barren.
    // Base of G (3.0 Ma) in S7-S10: found S10, absent S11 -> 10-11.5 m, reaching the contact.
    // Base of H (1.0 Ma) in S1-S5 -> 5-6 m. Top of G: found S7, absent S6 -> 6-7 m.
    CoreDataset d;
    d.holes = {makeHole("VEB-1")};
    LithInterval reef = makeInterval("VEB-1", 0.0, 10.5, Rock::Limestone);
    reef.base_surface = Surface::Erosion;
    d.intervals = {reef, makeInterval("VEB-1", 10.5, 12.5, Rock::Basalt)};
    for (int i = 1; i <= 10; ++i) {
        const std::string id = "S" + std::to_string(i);
        d.samples.push_back(makeSample("VEB-1", id, i, i));
        d.occurrences.push_back(makeOccurrence(id, "R"));
        if (i >= 7)
            d.occurrences.push_back(makeOccurrence(id, "G"));
        if (i <= 5)
            d.occurrences.push_back(makeOccurrence(id, "H"));
    }
    d.samples.push_back(makeKindSample("VEB-1", "S11", 11.5, 11.5, "barren"));
    d.events = {makeEvent("B G", "G", EventKind::Base, 3.0, 0.05),
                makeEvent("T G", "G", EventKind::Top, 2.0, 0.05),
                makeEvent("B H", "H", EventKind::Base, 1.0, 0.05)};
    const auto picks = pickDatums(d, {});
    const DatumPick& base_g = pickOf(picks, "B G");
    CHECK_THAT(base_g.widened.deep_m, WithinAbs(11.5, kTol_m));
    CHECK(base_g.truncated_at_basement);
    REQUIRE(base_g.basement_contact_m);
    CHECK_THAT(*base_g.basement_contact_m, WithinAbs(10.5, kTol_m));
    REQUIRE(base_g.surfaces_at_pick.size() == 2); // the logged erosion and the contact
    CHECK(base_g.surfaces_at_pick[0].kind == LoggedSurfaceKind::Erosion);
    CHECK(base_g.surfaces_at_pick[1].kind == LoggedSurfaceKind::BasementContact);
    CHECK_FALSE(pickOf(picks, "B H").truncated_at_basement);
    CHECK_FALSE(pickOf(picks, "T G").truncated_at_basement); // tops are recorded in full

    BiostratSettings s;
    const auto ties = makeTiePoints(picks, findPickConflicts(d, picks), s);
    CHECK(tieOf(ties, "B G") == nullptr); // its age only bounds the rock: no tie
    REQUIRE(tieOf(ties, "B H") != nullptr);
    CHECK(tieOf(ties, "B H")->flags.empty());
    REQUIRE(tieOf(ties, "T G") != nullptr);
    s.basement_bases_as_ties = true;
    s.surface_picks_as_ties = true; // its bracket holds the erosion surface as well
    const auto with_bases = makeTiePoints(picks, findPickConflicts(d, picks), s);
    REQUIRE(tieOf(with_bases, "B G") != nullptr);
    CHECK(tieFlagsText(*tieOf(with_bases, "B G")) == "at_surface;at_basement");

    // Base of K (3.5 Ma), older than base G, found in S2-S6 (6-7 m): K was living before G, and
    // G was living when the floor formed, so K's datum lies at or below the floor too although
    // its lowest find is 4 m higher. The older base above the younger one is no fault.
    {
        CoreDataset k = d;
        for (int i = 2; i <= 6; ++i)
            k.occurrences.push_back(makeOccurrence("S" + std::to_string(i), "K"));
        k.events.push_back(makeEvent("B K", "K", EventKind::Base, 3.5, 0.05));
        const auto k_picks = pickDatums(k, {});
        const DatumPick& base_k = pickOf(k_picks, "B K");
        CHECK_THAT(base_k.widened.deep_m, WithinAbs(7.0, kTol_m));
        CHECK(base_k.truncated_at_basement);
        CHECK_FALSE(pickOf(k_picks, "B H").truncated_at_basement); // younger than G
        const PickConflictReport review = reviewPickConflicts(k, k_picks);
        CHECK(review.conflicts.empty());
        REQUIRE(review.explained.size() == 1);
        CHECK(review.explained[0].expected_deeper_event == "B K");
        CHECK(review.explained[0].expected_shallower_event == "B G");
        REQUIRE(review.explained[0].explained_by);
        CHECK(review.explained[0].explained_by->cause == InversionCause::BasementTruncation);
        CHECK(tieOf(makeTiePoints(k_picks, review.explained, {}), "B K") == nullptr);
        // Without the base of G found at the floor nothing is inferred: the same picks conflict.
        CoreDataset no_floor = k;
        no_floor.events.erase(no_floor.events.begin()); // drop B G
        no_floor.events.push_back(makeEvent("B G2", "G", EventKind::Base, 3.0, 0.05));
        no_floor.occurrences.erase(
            std::remove_if(no_floor.occurrences.begin(), no_floor.occurrences.end(),
                           [](const Occurrence& o) { return o.taxon == "G"; }),
            no_floor.occurrences.end());
        for (int i = 7; i <= 9; ++i) // G now ends one sample above the floor: 9-10 m
            no_floor.occurrences.push_back(makeOccurrence("S" + std::to_string(i), "G"));
        const auto nf_picks = pickDatums(no_floor, {});
        CHECK_FALSE(pickOf(nf_picks, "B G2").truncated_at_basement);
        CHECK_FALSE(pickOf(nf_picks, "B K").truncated_at_basement);
        CHECK(findPickConflicts(no_floor, nf_picks).size() == 1);
    }

    // Without S11 the base of G is open below: nothing examined bounds it short of the basement.
    d.samples.pop_back();
    const DatumPick open = pickOf(pickDatums(d, {}), "B G");
    CHECK(open.widened.open_deep);
    CHECK(open.truncated_at_basement);
}

TEST_CASE("a base truncated at the basement explains its place above younger picks",
          "[unit][biostrat][hiatus]") {
    // Hand-made picks: the rule itself, independent of how the brackets arose.
    DatumPick older;
    older.hole = "VEB-2";
    older.event = "B OLD";
    older.kind = EventKind::Base;
    older.age_ma = 4.0;
    older.found = true;
    older.widened = {30.0, 31.0};
    DatumPick younger = older;
    younger.event = "B YOUNG";
    younger.age_ma = 3.0;
    younger.widened = {32.0, 33.0};
    const std::vector<LoggedSurface> none;
    CHECK_FALSE(explainInversion(older, younger, none)); // two bases: no hiatus explains them
    older.truncated_at_basement = younger.truncated_at_basement = true;
    older.basement_contact_m = younger.basement_contact_m = 31.0;
    const auto why = explainInversion(older, younger, none);
    REQUIRE(why);
    CHECK(why->cause == InversionCause::BasementTruncation);
    CHECK_THAT(why->surface.depth_m, WithinAbs(31.0, kTol_m));
    younger.truncated_at_basement = false; // the older one's datum lies below the floor anyway
    CHECK(explainInversion(older, younger, none));
    older.truncated_at_basement = false; // only the younger truncated: the older is misplaced
    younger.truncated_at_basement = true;
    CHECK_FALSE(explainInversion(older, younger, none));
    older.truncated_at_basement = true;
    younger.hole = "VEB-3"; // picks of different holes are never compared
    CHECK_FALSE(explainInversion(older, younger, none));
}

TEST_CASE("a range extension stops at the basement and a surface it reaches costs the tie",
          "[unit][biostrat][hiatus]") {
    // Hole VEX-1: limestone 0-6 m with an exposure surface at its base, limestone 6-8 m, basalt
    // 8-12 m. Taxon X in S1..S3 (1, 2, 3 m), absent in S4 (4 m): base bracket 3-4 m. With three
    // horizons the 95 % extension is alpha = 0.05^(-1/2) - 1 = 3.47 (Strauss & Sadler 1989,
    // eq. for the confidence interval on a range end) of the 2 m observed range, 6.9 m: it would
    // reach 10.9 m, inside the lava, where no reef taxon lived.
    CoreDataset d;
    d.holes = {makeHole("VEX-1")};
    LithInterval upper = makeInterval("VEX-1", 0.0, 6.0, Rock::Limestone);
    upper.base_surface = Surface::Exposure;
    d.intervals = {upper, makeInterval("VEX-1", 6.0, 8.0, Rock::Limestone),
                   makeInterval("VEX-1", 8.0, 12.0, Rock::Basalt)};
    for (int i = 1; i <= 4; ++i) {
        const std::string id = "S" + std::to_string(i);
        d.samples.push_back(makeSample("VEX-1", id, i, i));
        d.occurrences.push_back(makeOccurrence(id, i <= 3 ? "X" : "R"));
    }
    d.events = {makeEvent("B X", "X", EventKind::Base, 2.0, 0.05)};
    BiostratSettings s;
    s.range_extension_confidence = 0.95;
    const auto picks = pickDatums(d, s);
    const DatumPick& p = pickOf(picks, "B X");
    CHECK_THAT(p.widened.deep_m, WithinAbs(4.0, kTol_m));
    CHECK_THAT(p.extended.deep_m, WithinAbs(8.0, kTol_m)); // cut at the contact
    CHECK_FALSE(p.truncated_at_surface);                   // the widened bracket holds none
    CHECK(p.extension_reaches_surface);                    // the extension holds the 6 m one

    s.ties_use_extended_bracket = true;
    CHECK(tieOf(makeTiePoints(picks, {}, s), "B X") == nullptr);
    s.surface_picks_as_ties = true;
    const auto kept = makeTiePoints(picks, {}, s);
    REQUIRE(tieOf(kept, "B X") != nullptr);
    CHECK_THAT(tieOf(kept, "B X")->deep_m, WithinAbs(8.0, kTol_m));
    // Plain (widened) ties do not look at the extension.
    s.ties_use_extended_bracket = false;
    s.surface_picks_as_ties = false;
    CHECK(tieOf(makeTiePoints(picks, {}, s), "B X") != nullptr);
}
