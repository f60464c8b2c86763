// Interval zones and pick conflicts on invented holes, worked by hand. An interval zone is the
// body of strata between two specified biohorizons (International Stratigraphic Guide, Salvador
// 1994, interval zone); here each biohorizon is the pick of one time-scale event, and a zone with
// no event at one edge is open there. Its base biohorizon lies below its top, so a base pick
// wholly above the top pick is a conflict; so is a pair of events picked in the opposite order
// to their ages by more than 2 sd of the age difference (our criterion, see pick_conflicts.hpp).
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/pick_conflicts.hpp"
#include "atollog/engine/tie_points.hpp"
#include "atollog/engine/zone_assignment.hpp"

#include "biostrat_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <stdexcept>

using namespace atollog;
using namespace atollog::test;
using Catch::WithinAbs;

namespace {
constexpr double kTol_m = 1e-9;

/// Events: base of P at 3.0 Ma, top of Q at 1.5 Ma. Scheme KX: Z1 below base P, Z2 from base P
/// to top Q, Z3 above top Q. Scheme KY: Y1 from base P to the top of M (M never found).
/// Hole VEC-1 (in order): samples at 1..10 m, R everywhere, P at 1-6 m, Q at 4-10 m, and an
/// unexamined sample at 6.5 m. Base P: 6-7 m; top Q: 3-4 m.
/// Hole VEC-2 (inverted): samples at 1..6 m, R everywhere, P at 1 m, Q at 4-6 m.
/// Base P: 1-2 m; top Q: 3-4 m: the older event above the younger.
CoreDataset zoneDataset(double sd_ma = 0.05) {
    CoreDataset d;
    d.holes = {makeHole("VEC-1"), makeHole("VEC-2")};
    for (int i = 1; i <= 10; ++i) {
        const std::string id = "F" + std::to_string(i);
        d.samples.push_back(makeSample("VEC-1", id, i, i));
        d.occurrences.push_back(makeOccurrence(id, "R"));
        if (i <= 6)
            d.occurrences.push_back(makeOccurrence(id, "P"));
        if (i >= 4)
            d.occurrences.push_back(makeOccurrence(id, "Q"));
    }
    d.samples.push_back(makeSample("VEC-1", "F6x", 6.5, 6.5)); // no occurrence: not examined
    for (int i = 1; i <= 6; ++i) {
        const std::string id = "G" + std::to_string(i);
        d.samples.push_back(makeSample("VEC-2", id, i, i));
        d.occurrences.push_back(makeOccurrence(id, "R"));
        if (i == 1)
            d.occurrences.push_back(makeOccurrence(id, "P"));
        if (i >= 4)
            d.occurrences.push_back(makeOccurrence(id, "Q"));
    }
    d.events = {makeEvent("B P", "P", EventKind::Base, 3.0, sd_ma),
                makeEvent("T Q", "Q", EventKind::Top, 1.5, sd_ma),
                makeEvent("T M", "M", EventKind::Top, 0.5, sd_ma)};
    d.zones = {makeZone("KX", "Z1", std::nullopt, "B P"), makeZone("KX", "Z2", "B P", "T Q"),
               makeZone("KX", "Z3", "T Q", std::nullopt), makeZone("KY", "Y1", "B P", "T M")};
    return d;
}

const SampleZoneCall& callOf(const ZoneReport& r, const std::string& scheme,
                             const std::string& sample) {
    auto it = std::find_if(r.samples.begin(), r.samples.end(), [&](const SampleZoneCall& c) {
        return c.scheme == scheme && c.sample == sample;
    });
    REQUIRE(it != r.samples.end());
    return *it;
}

} // namespace

TEST_CASE("interval zones between two biohorizons (Salvador 1994)", "[unit][biostrat][zones]") {
    const CoreDataset d = zoneDataset();
    const ZoneReport r = assignZones(d, pickDatums(d, {}));
    // Hand-worked: base P bracket 6-7 m, top Q bracket 3-4 m.
    for (const char* s : {"F1", "F2", "F3"})
        CHECK(callOf(r, "KX", s).zone == std::optional<std::string>("Z3"));
    for (const char* s : {"F4", "F5", "F6"})
        CHECK(callOf(r, "KX", s).zone == std::optional<std::string>("Z2"));
    for (const char* s : {"F7", "F8", "F9", "F10"})
        CHECK(callOf(r, "KX", s).zone == std::optional<std::string>("Z1"));
    CHECK(callOf(r, "KX", "F5").call == ZoneCall::Assigned);
    CHECK(callOf(r, "KX", "F5").reason.empty());
}

TEST_CASE("a sample inside a boundary bracket is indeterminate", "[unit][biostrat][zones]") {
    const CoreDataset d = zoneDataset();
    const ZoneReport r = assignZones(d, pickDatums(d, {}));
    const SampleZoneCall& c = callOf(r, "KX", "F6x"); // 6.5 m, inside base P at 6-7 m
    CHECK(c.call == ZoneCall::InsideBoundaryBracket);
    CHECK_FALSE(c.zone.has_value());
    CHECK_THAT(c.reason, Catch::Contains("'B P'") && Catch::Contains("6-7 m"));
}

TEST_CASE("a zone whose boundary event is not picked is indeterminate",
          "[unit][biostrat][zones]") {
    const CoreDataset d = zoneDataset();
    const ZoneReport r = assignZones(d, pickDatums(d, {}));
    // Y1 lies above base P, but its top (T M) is not found: a sample above base P cannot be
    // placed; one below base P is outside the only zone of KY.
    const SampleZoneCall& above = callOf(r, "KY", "F3");
    CHECK(above.call == ZoneCall::BoundaryNotPicked);
    CHECK_THAT(above.reason, Catch::Contains("'T M'"));
    CHECK(callOf(r, "KY", "F9").call == ZoneCall::OutsideZones);
}

TEST_CASE("zone boundaries carry their pick brackets", "[unit][biostrat][zones]") {
    const CoreDataset d = zoneDataset();
    const ZoneReport r = assignZones(d, pickDatums(d, {}));
    auto it = std::find_if(r.boundaries.begin(), r.boundaries.end(), [](const ZoneBoundaryPick& b) {
        return b.scheme == "KX" && b.zone == "Z2" && b.hole == "VEC-1" && b.edge == ZoneEdge::Top;
    });
    REQUIRE(it != r.boundaries.end());
    CHECK(it->event == "T Q");
    CHECK(it->picked);
    CHECK_THAT(it->plain.shallow_m, WithinAbs(3.0, kTol_m));
    CHECK_THAT(it->plain.deep_m, WithinAbs(4.0, kTol_m));
    CHECK_THAT(it->depth_m, WithinAbs(3.5, kTol_m));
    auto unpicked = std::find_if(r.boundaries.begin(), r.boundaries.end(),
                                 [](const ZoneBoundaryPick& b) { return b.event == "T M"; });
    REQUIRE(unpicked != r.boundaries.end());
    CHECK_FALSE(unpicked->picked);
}

TEST_CASE("an inverted zone and an out-of-order pair are conflicts", "[unit][biostrat][zones]") {
    const CoreDataset d = zoneDataset(0.05);
    const auto picks = pickDatums(d, {});
    const auto conflicts = findPickConflicts(d, picks);
    // VEC-1 is in order: no conflict there.
    CHECK(std::none_of(conflicts.begin(), conflicts.end(),
                       [](const PickConflict& c) { return c.hole == "VEC-1"; }));
    // VEC-2: base P (1-2 m) wholly above top Q (3-4 m), the base and top of zone Z2 (Salvador
    // 1994: the base biohorizon of an interval zone lies below its top).
    auto inverted = std::find_if(conflicts.begin(), conflicts.end(), [](const PickConflict& c) {
        return c.kind == PickConflictKind::ZoneInverted;
    });
    REQUIRE(inverted != conflicts.end());
    CHECK(inverted->hole == "VEC-2");
    CHECK(inverted->zone == "Z2");
    CHECK(inverted->expected_deeper_event == "B P");
    // Order: 3.0 - 1.5 = 1.5 Ma > 2 sqrt(0.05^2 + 0.05^2) = 0.141421 Ma [F].
    auto order = std::find_if(conflicts.begin(), conflicts.end(), [](const PickConflict& c) {
        return c.kind == PickConflictKind::EventOrder;
    });
    REQUIRE(order != conflicts.end());
    CHECK(order->hole == "VEC-2");
    CHECK(order->expected_deeper_event == "B P");
    CHECK(order->expected_shallower_event == "T Q");
    CHECK_THAT(order->age_gap_ma, WithinAbs(1.5, 1e-12));
    CHECK_THAT(order->tolerance_ma, WithinAbs(0.141421, 1e-6));
    CHECK(std::count_if(conflicts.begin(), conflicts.end(), [](const PickConflict& c) {
              return c.kind == PickConflictKind::EventOrder;
          }) == 1);

    // The sample at 2 m sits below base P (Z1 side) and above top Q (Z3 side): both hold it.
    const ZoneReport r = assignZones(d, picks);
    const SampleZoneCall& c = callOf(r, "KX", "G2");
    CHECK(c.call == ZoneCall::ConflictingPicks);
    CHECK_THAT(c.reason, Catch::Contains("Z1") && Catch::Contains("Z3"));

    // Tie points keep both picks, flagged.
    const auto ties = makeTiePoints(picks, conflicts, {});
    auto tie = std::find_if(ties.begin(), ties.end(), [](const TiePoint& t) {
        return t.hole == "VEC-2" && t.event == "B P";
    });
    REQUIRE(tie != ties.end());
    CHECK(tieFlagsText(*tie) == "order_conflict;zone_inverted");
}

TEST_CASE("an order within the ages' sds is no conflict", "[unit][biostrat][zones]") {
    // sd 0.6 Ma each: 2 sqrt(0.36 + 0.36) = 1.697 Ma > 1.5 Ma [F]: the time scale cannot tell.
    const CoreDataset d = zoneDataset(0.6);
    const auto conflicts = findPickConflicts(d, pickDatums(d, {}));
    CHECK(std::none_of(conflicts.begin(), conflicts.end(), [](const PickConflict& c) {
        return c.kind == PickConflictKind::EventOrder;
    }));
    CHECK(std::any_of(conflicts.begin(), conflicts.end(), [](const PickConflict& c) {
        return c.kind == PickConflictKind::ZoneInverted; // depths alone still contradict
    }));
}

TEST_CASE("zones naming an unknown event are refused", "[unit][biostrat][zones]") {
    CoreDataset d = zoneDataset();
    d.zones.push_back(makeZone("KX", "Z9", "B NOWHERE", std::nullopt));
    CHECK_THROWS_WITH(assignZones(d, pickDatums(d, {})),
                      Catch::Contains("'Z9'") && Catch::Contains("'B NOWHERE'"));
    CHECK_THROWS_AS(findPickConflicts(d, {}), std::invalid_argument);
}
