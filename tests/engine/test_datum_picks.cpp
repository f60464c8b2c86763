// Datum picks on small invented holes, worked by hand. The bracket convention: a datum observed
// in samples lies between the last sample with the taxon and the next examined sample without it;
// quoting the midpoint +/- half the gap is ocean-drilling practice (checks.md, "Biostratigraphy
// and drilling depths", [M] practice, [F] example). Recovered core is placed at the top of its
// run (ocean-drilling explanatory notes, checks.md [P]), so a logged depth may stand for true
// depths down to the unrecovered length below it.
#include "atollog/engine/biostrat_settings.hpp"
#include "atollog/engine/datum_picks.hpp"
#include "atollog/engine/pick_conflicts.hpp"
#include "atollog/engine/tie_points.hpp"

#include "biostrat_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <stdexcept>

using namespace atollog;
using namespace atollog::test;
using Catch::WithinAbs;

namespace {
constexpr double kTol_m = 1e-9; // sums and halves of a few depths in metres

/// Hole VEA-1: runs 42-45 and 45-48 m, both fully recovered.
///   A1 42.30  OTH count 3, TX caved       A2 43.80  OTH count 12, TX reworked
///   A3 45.30  TX rare                     A4 46.80  TX common, OTH (no abundance)
///   A6 47.00  nothing, kind core (not examined)      A5 47.50  barren
/// Hole VEA-2: run 10-13 m recovered 1.8 m (1.2 m lost), run 13-16 m full.
///   B1 10.40  TZ, OTH    B2 11.20  TY    B3 13.50  TY    B4 14.60  OTH
/// Hole VEA-3C (cuttings): C0 97-100 OTH, C1 100-103 TX, C2 103-106 TX, C3 106-109 OTH.
CoreDataset pickDataset() {
    CoreDataset d;
    d.holes = {makeHole("VEA-1"), makeHole("VEA-2"), makeHole("VEA-3C", HoleKind::Cuttings)};
    d.runs = {makeRun("VEA-1", "A-R1", 42, 45, 3.0), makeRun("VEA-1", "A-R2", 45, 48, 3.0),
              makeRun("VEA-2", "B-R1", 10, 13, 1.8), makeRun("VEA-2", "B-R2", 13, 16, 3.0)};
    d.samples = {makeSample("VEA-1", "A1", 42.30, 42.30), makeSample("VEA-1", "A2", 43.80, 43.80),
                 makeSample("VEA-1", "A3", 45.30, 45.30), makeSample("VEA-1", "A4", 46.80, 46.80),
                 makeKindSample("VEA-1", "A6", 47.00, 47.00, "core"),
                 makeKindSample("VEA-1", "A5", 47.50, 47.50, "barren"),
                 makeSample("VEA-2", "B1", 10.40, 10.40), makeSample("VEA-2", "B2", 11.20, 11.20),
                 makeSample("VEA-2", "B3", 13.50, 13.50), makeSample("VEA-2", "B4", 14.60, 14.60),
                 makeSample("VEA-3C", "C0", 97, 100), makeSample("VEA-3C", "C1", 100, 103),
                 makeSample("VEA-3C", "C2", 103, 106), makeSample("VEA-3C", "C3", 106, 109)};
    d.taxa = {};
    d.occurrences = {
        makeCounted("A1", "OTH", std::int64_t{3}),
        makeOccurrence("A1", "TX", OccurrenceStatus::Caved),
        makeCounted("A2", "OTH", std::int64_t{12}),
        makeOccurrence("A2", "TX", OccurrenceStatus::Reworked),
        makeCounted("A3", "TX", AbundanceClass::Rare),
        makeCounted("A4", "TX", AbundanceClass::Common),
        makeOccurrence("A4", "OTH"),
        makeOccurrence("B1", "TZ"),
        makeOccurrence("B1", "OTH"),
        makeOccurrence("B2", "TY"),
        makeOccurrence("B3", "TY"),
        makeOccurrence("B4", "OTH"),
        makeOccurrence("C0", "OTH"),
        makeOccurrence("C1", "TX"),
        makeOccurrence("C2", "TX"),
        makeOccurrence("C3", "OTH"),
    };
    d.events = {makeEvent("T TX", "TX", EventKind::Top, 1.0, 0.02),
                makeEvent("B TX", "TX", EventKind::Base, 2.0, 0.04),
                makeEvent("T TY", "TY", EventKind::Top, 1.2, 0.02),
                makeEvent("B TY", "TY", EventKind::Base, 1.8, 0.03),
                makeEvent("T TZ", "TZ", EventKind::Top, 0.5, 0.01),
                makeEvent("B TZ", "TZ", EventKind::Base, 0.9, 0.02),
                makeEvent("T NONE", "NONE", EventKind::Top, 0.7, 0.01)};
    return d;
}

const DatumPick& pickOf(const std::vector<DatumPick>& picks, const std::string& hole,
                        const std::string& event) {
    auto it = std::find_if(picks.begin(), picks.end(), [&](const DatumPick& p) {
        return p.hole == hole && p.event == event;
    });
    REQUIRE(it != picks.end());
    return *it;
}

} // namespace

TEST_CASE("checks.md example: top between 43.80 and 45.30 m quotes 44.55 +/- 0.75 m",
          "[unit][biostrat][picks]") {
    const auto picks = pickDatums(pickDataset(), BiostratSettings{});
    const DatumPick& p = pickOf(picks, "VEA-1", "T TX");
    REQUIRE(p.found);
    CHECK(p.found_sample == "A3");
    // A2 holds TX only reworked and A1 only caved: neither counts, so A2 is the absent sample.
    REQUIRE(p.absent_sample);
    CHECK(*p.absent_sample == "A2");
    // checks.md [F]: highest occurrence 45.30 m, absent at 43.80 m -> 44.55 +/- 0.75 m.
    CHECK_THAT(p.plain.shallow_m, WithinAbs(43.80, kTol_m));
    CHECK_THAT(p.plain.deep_m, WithinAbs(45.30, kTol_m));
    CHECK_THAT(p.depth_m, WithinAbs(44.55, kTol_m));
    REQUIRE(p.half_width_m);
    CHECK_THAT(*p.half_width_m, WithinAbs(0.75, kTol_m));
    CHECK_FALSE(p.open_ended);
    CHECK_FALSE(p.widened_by_recovery); // both runs fully recovered
    CHECK(p.widened == p.plain);
}

TEST_CASE("a barren sample counts as examined; an empty one does not", "[unit][biostrat][picks]") {
    const auto picks = pickDatums(pickDataset(), BiostratSettings{});
    const DatumPick& p = pickOf(picks, "VEA-1", "B TX");
    REQUIRE(p.found);
    CHECK(p.found_sample == "A4");
    // A6 at 47.00 m has no occurrence and is not marked barren: not examined, skipped.
    // A5 at 47.50 m is barren: examined, so it closes the bracket (midpoint practice, checks.md).
    REQUIRE(p.absent_sample);
    CHECK(*p.absent_sample == "A5");
    CHECK_THAT(p.plain.shallow_m, WithinAbs(46.80, kTol_m));
    CHECK_THAT(p.plain.deep_m, WithinAbs(47.50, kTol_m));
    CHECK_THAT(p.depth_m, WithinAbs(47.15, kTol_m));
    CHECK_THAT(*p.half_width_m, WithinAbs(0.35, kTol_m));
}

TEST_CASE("abundance threshold picks the top of common occurrence", "[unit][biostrat][picks]") {
    BiostratSettings s;
    s.min_abundance_class = AbundanceClass::Common;
    s.min_abundance_count = 10;
    const auto picks = pickDatums(pickDataset(), s);
    // TX is rare at A3 and common at A4: the top of common TX lies between A3 and A4.
    const DatumPick& t = pickOf(picks, "VEA-1", "T TX");
    CHECK(t.found_sample == "A4");
    CHECK(*t.absent_sample == "A3");
    CHECK_THAT(t.depth_m, WithinAbs(0.5 * (45.30 + 46.80), kTol_m));
    // VEA-2 occurrences carry no abundance: with a threshold nothing shows they reach it.
    CHECK_FALSE(pickOf(picks, "VEA-2", "T TY").found);
}

TEST_CASE("partial recovery widens the bracket (hand computed)", "[unit][biostrat][picks]") {
    const auto picks = pickDatums(pickDataset(), BiostratSettings{});
    // Run B-R1 10-13 m recovered 1.8 m: 1.2 m lost, so B2 logged at 11.20 m may truly lie
    // anywhere in 11.20-12.40 m (core placed at the run top, checks.md [P]).
    const DatumPick& top = pickOf(picks, "VEA-2", "T TY");
    CHECK(top.found_sample == "B2");
    CHECK(*top.absent_sample == "B1");
    CHECK_THAT(top.plain.shallow_m, WithinAbs(10.40, kTol_m));
    CHECK_THAT(top.plain.deep_m, WithinAbs(11.20, kTol_m));
    CHECK_THAT(top.widened.shallow_m, WithinAbs(10.40, kTol_m));
    CHECK_THAT(top.widened.deep_m, WithinAbs(12.40, kTol_m));
    CHECK(top.widened_by_recovery);
    // The quoted midpoint stays on the plain bracket.
    CHECK_THAT(top.depth_m, WithinAbs(10.80, kTol_m));

    // Base of TZ: found in B1, absent in B2; B2 may lie down to 12.40 m.
    const DatumPick& base = pickOf(picks, "VEA-2", "B TZ");
    CHECK_THAT(base.plain.shallow_m, WithinAbs(10.40, kTol_m));
    CHECK_THAT(base.plain.deep_m, WithinAbs(11.20, kTol_m));
    CHECK_THAT(base.widened.deep_m, WithinAbs(12.40, kTol_m));
    CHECK(base.widened_by_recovery);

    // Base of TY: B3 and B4 in the fully recovered run B-R2: no widening.
    const DatumPick& full = pickOf(picks, "VEA-2", "B TY");
    CHECK_THAT(full.plain.shallow_m, WithinAbs(13.50, kTol_m));
    CHECK_THAT(full.plain.deep_m, WithinAbs(14.60, kTol_m));
    CHECK_FALSE(full.widened_by_recovery);
}

TEST_CASE("a taxon in the shallowest examined sample gives an open-ended top",
          "[unit][biostrat][picks]") {
    const auto picks = pickDatums(pickDataset(), BiostratSettings{});
    const DatumPick& p = pickOf(picks, "VEA-2", "T TZ");
    REQUIRE(p.found);
    CHECK(p.open_ended);
    CHECK_FALSE(p.absent_sample.has_value());
    CHECK(p.plain.open_shallow);
    CHECK_FALSE(p.plain.open_deep);
    CHECK_THAT(p.plain.shallow_m, WithinAbs(10.40, kTol_m)); // finite: the found sample
    CHECK_THAT(p.depth_m, WithinAbs(10.40, kTol_m));
    CHECK_FALSE(p.half_width_m.has_value()); // no gap to halve
    CHECK(p.plain.contains(3.0));            // anywhere above is possible
    CHECK_FALSE(p.plain.contains(10.5));
}

TEST_CASE("an event whose taxon is absent from a hole is not found", "[unit][biostrat][picks]") {
    const auto picks = pickDatums(pickDataset(), BiostratSettings{});
    CHECK(picks.size() == 3 * 7); // every event in every hole
    CHECK_FALSE(pickOf(picks, "VEA-1", "T NONE").found);
    CHECK_FALSE(pickOf(picks, "VEA-1", "T TY").found);
    CHECK_FALSE(pickOf(picks, "VEA-3C", "T TZ").found);
}

TEST_CASE("quoting the sample top or base of the found sample", "[unit][biostrat][picks]") {
    // Cuttings intervals: top TX found in C1 (100-103 m), absent in C0 (97-100 m). The datum lies
    // below all of C0 and at or above the deepest point of C1: bracket 100-103 m.
    BiostratSettings s;
    s.depth_quote = PickDepthQuote::Midpoint;
    const DatumPick mid = pickOf(pickDatums(pickDataset(), s), "VEA-3C", "T TX");
    CHECK_THAT(mid.plain.shallow_m, WithinAbs(100.0, kTol_m));
    CHECK_THAT(mid.plain.deep_m, WithinAbs(103.0, kTol_m));
    CHECK_THAT(mid.depth_m, WithinAbs(101.5, kTol_m));
    CHECK_THAT(*mid.half_width_m, WithinAbs(1.5, kTol_m));
    s.depth_quote = PickDepthQuote::SampleTop;
    const DatumPick top = pickOf(pickDatums(pickDataset(), s), "VEA-3C", "T TX");
    CHECK_THAT(top.depth_m, WithinAbs(100.0, kTol_m));
    CHECK_FALSE(top.half_width_m.has_value());
    CHECK(top.plain == mid.plain); // the bracket never depends on the quote
    s.depth_quote = PickDepthQuote::SampleBase;
    CHECK_THAT(pickOf(pickDatums(pickDataset(), s), "VEA-3C", "T TX").depth_m,
               WithinAbs(103.0, kTol_m));
}

TEST_CASE("bases in cuttings are flagged and kept out of tie points",
          "[unit][biostrat][picks][ties]") {
    // Caving carries younger fossils down the hole, so bases in cuttings read too deep
    // (common practice; checks.md).
    BiostratSettings s;
    const auto picks = pickDatums(pickDataset(), s);
    const DatumPick& base = pickOf(picks, "VEA-3C", "B TX");
    REQUIRE(base.found);
    CHECK(base.unreliable_cuttings_base);
    CHECK_THAT(base.plain.shallow_m, WithinAbs(103.0, kTol_m));
    CHECK_THAT(base.plain.deep_m, WithinAbs(106.0, kTol_m));
    CHECK_FALSE(pickOf(picks, "VEA-3C", "T TX").unreliable_cuttings_base);

    auto hasTie = [](const std::vector<TiePoint>& ties, const std::string& hole,
                     const std::string& event) {
        return std::any_of(ties.begin(), ties.end(), [&](const TiePoint& t) {
            return t.hole == hole && t.event == event;
        });
    };
    const auto conflicts = findPickConflicts(pickDataset(), picks);
    const auto ties = makeTiePoints(picks, conflicts, s);
    CHECK_FALSE(hasTie(ties, "VEA-3C", "B TX"));
    CHECK(hasTie(ties, "VEA-3C", "T TX"));
    CHECK_FALSE(hasTie(ties, "VEA-2", "T TZ")); // open-ended: no bracket for an age model
    CHECK_FALSE(hasTie(ties, "VEA-1", "T NONE"));
    s.cuttings_bases_as_ties = true;
    const auto with_bases = makeTiePoints(picks, conflicts, s);
    REQUIRE(hasTie(with_bases, "VEA-3C", "B TX"));
    const TiePoint& t = *std::find_if(with_bases.begin(), with_bases.end(), [](const TiePoint& x) {
        return x.hole == "VEA-3C" && x.event == "B TX";
    });
    CHECK(tieFlagsText(t) == "cuttings_base");
    CHECK_THAT(t.age_ma, WithinAbs(2.0, 1e-12));
    CHECK_THAT(t.age_sd_ma, WithinAbs(0.04, 1e-12));
}

TEST_CASE("tie points carry the widened bracket and its flag", "[unit][biostrat][ties]") {
    const BiostratSettings s;
    const auto picks = pickDatums(pickDataset(), s);
    const auto ties = makeTiePoints(picks, {}, s);
    const auto it = std::find_if(ties.begin(), ties.end(), [](const TiePoint& t) {
        return t.hole == "VEA-2" && t.event == "T TY";
    });
    REQUIRE(it != ties.end());
    CHECK_THAT(it->shallow_m, WithinAbs(10.40, kTol_m));
    CHECK_THAT(it->deep_m, WithinAbs(12.40, kTol_m));
    CHECK_THAT(it->depth_m, WithinAbs(10.80, kTol_m));
    CHECK(tieFlagsText(*it) == "widened_by_recovery");
}

TEST_CASE("range extension widens picks outward only", "[unit][biostrat][picks][extension]") {
    // Hole VEA-4 (no runs): TW in ten samples at 20, 21, ... 29 m; OTH alone at 19 and 30 m.
    CoreDataset d;
    d.holes = {makeHole("VEA-4")};
    for (int i = 19; i <= 30; ++i) {
        const std::string id = "D" + std::to_string(i);
        d.samples.push_back(makeSample("VEA-4", id, i, i));
        d.occurrences.push_back(makeOccurrence(id, i == 19 || i == 30 ? "OTH" : "TW"));
    }
    d.samples.push_back(makeSample("VEA-4", "D5", 5, 5));
    d.occurrences.push_back(makeOccurrence("D5", "OTH"));
    d.events = {makeEvent("T TW", "TW", EventKind::Top, 1.0, 0.02),
                makeEvent("B TW", "TW", EventKind::Base, 2.0, 0.02),
                makeEvent("T OTH", "OTH", EventKind::Top, 0.1, 0.01)};
    BiostratSettings s;
    s.range_extension_confidence = 0.95;
    const auto picks = pickDatums(d, s);
    const DatumPick& top = pickOf(picks, "VEA-4", "T TW");
    CHECK(top.horizon_count == 10);
    CHECK_THAT(top.observed_range_m, WithinAbs(9.0, kTol_m));
    // Strauss & Sadler 1989 / Marshall 1990 eq. 1 [F]: H = 10, C = 0.95 -> alpha = 0.394951;
    // reach = 9 m x 0.394951 = 3.55456 m above the highest find at 20 m -> 16.44544 m.
    REQUIRE(top.extension_fraction);
    CHECK_THAT(*top.extension_fraction, WithinAbs(0.394951, 1e-6));
    CHECK_THAT(top.extended.shallow_m, WithinAbs(16.44544, 1e-5));
    CHECK_THAT(top.extended.deep_m, WithinAbs(20.0, kTol_m)); // deep side unchanged
    const DatumPick& base = pickOf(picks, "VEA-4", "B TW");
    CHECK_THAT(base.extended.deep_m, WithinAbs(29.0 + 3.55456, 1e-5));
    CHECK_THAT(base.extended.shallow_m, WithinAbs(29.0, kTol_m));

    // C = 0.5 [F]: alpha = 0.080060, reach 0.72054 m: 20 - 0.72 = 19.28 m lies inside the plain
    // bracket 19-20 m, so the extended bracket stays at the absent sample (never narrows).
    s.range_extension_confidence = 0.5;
    const DatumPick half = pickOf(pickDatums(d, s), "VEA-4", "T TW");
    CHECK_THAT(*half.extension_fraction, WithinAbs(0.080060, 1e-6));
    CHECK_THAT(half.extended.shallow_m, WithinAbs(19.0, kTol_m));

    // A top extended above the collar is clipped at 0 m: OTH at 5, 19 and 30 m, H = 3,
    // alpha(0.95) = 0.05^(-1/2) - 1 = 3.4721 [F], reach 25 x 3.4721 = 86.8 m.
    s.range_extension_confidence = 0.95;
    const DatumPick clipped = pickOf(pickDatums(d, s), "VEA-4", "T OTH");
    CHECK(clipped.open_ended);
    CHECK_THAT(clipped.extended.shallow_m, WithinAbs(0.0, kTol_m));
}

TEST_CASE("a single horizon leaves the extension undefined", "[unit][biostrat][extension]") {
    BiostratSettings s;
    s.range_extension_confidence = 0.95;
    const DatumPick p = pickOf(pickDatums(pickDataset(), s), "VEA-2", "B TZ");
    CHECK(p.horizon_count == 1);
    CHECK(p.extension_undefined);
    CHECK_FALSE(p.extension_fraction.has_value());
    // H = 1: the confidence interval on the range end is unbounded (Strauss & Sadler 1989),
    // so the extended bracket is open below, down to the deepest cored depth.
    CHECK(p.extended.shallow_m == p.widened.shallow_m);
    CHECK(p.extended.open_deep);
    CHECK(p.extended.deep_m >= p.widened.deep_m);
}

TEST_CASE("picks reject unusable input", "[unit][biostrat][picks]") {
    CoreDataset d = pickDataset();
    d.occurrences.push_back(makeOccurrence("NOPE", "TX"));
    CHECK_THROWS_WITH(pickDatums(d, {}), Catch::Contains("unknown sample 'NOPE'"));
    d = pickDataset();
    d.samples[0].base_m = 40.0;
    CHECK_THROWS_WITH(pickDatums(d, {}), Catch::Contains("'A1'") && Catch::Contains("base_m"));
    d = pickDataset();
    d.events[0].age_sd_ma = -1;
    CHECK_THROWS_WITH(pickDatums(d, {}), Catch::Contains("'T TX'"));
    BiostratSettings s;
    s.range_extension_confidence = 1.0;
    CHECK_THROWS_WITH(pickDatums(pickDataset(), s),
                      Catch::Contains("range_extension_confidence"));
    s = {};
    s.ties_use_extended_bracket = true;
    CHECK_THROWS_AS(validateBiostratSettings(s), std::invalid_argument);
}

TEST_CASE("settings render as key=value lines", "[unit][biostrat][settings]") {
    BiostratSettings s;
    CHECK(biostratSettingsText(s) == "biostrat.depth_quote=midpoint\n"
                                     "biostrat.min_abundance_class=none\n"
                                     "biostrat.min_abundance_count=none\n"
                                     "biostrat.range_extension_confidence=none\n"
                                     "biostrat.cuttings_bases_as_ties=no\n"
                                     "biostrat.basement_bases_as_ties=no\n"
                                     "biostrat.surface_picks_as_ties=no\n"
                                     "biostrat.ties_use_extended_bracket=no\n");
    s.depth_quote = PickDepthQuote::SampleBase;
    s.min_abundance_class = AbundanceClass::Common;
    s.min_abundance_count = 10;
    s.range_extension_confidence = 0.95;
    s.ties_use_extended_bracket = true;
    const std::string text = biostratSettingsText(s);
    CHECK_THAT(text, Catch::Contains("depth_quote=sample_base\n") &&
                         Catch::Contains("min_abundance_class=common\n") &&
                         Catch::Contains("min_abundance_count=10\n") &&
                         Catch::Contains("range_extension_confidence=0.95\n") &&
                         Catch::Contains("ties_use_extended_bracket=yes\n"));
}
