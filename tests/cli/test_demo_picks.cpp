// Datum picks on the invented demo archipelago, compared with the generator's truth: how often
// the brackets hold the true event depth, and why they miss. This is a model-versus-truth check
// on invented data (DEVELOPERS.md: demo data is never the expected value of a published check).
#include "archipelago_generator.hpp"

#include "atollog/engine/biostrat_run.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <iostream>
#include <map>
#include <set>
#include <sstream>

using namespace atollog;
using namespace atollog::demo;

namespace {

const DemoArchipelago& demoData() {
    static const DemoArchipelago d = generateArchipelago(kDemoSeed);
    return d;
}

struct Coverage {
    int compared = 0;
    int plain = 0;
    int widened = 0;
    int extended = 0;
    int open_ended = 0;
    int in_hiatus = 0; ///< event time missing in the hole: no true depth to compare
};

/// Why a bracket misses the true depth, from the generator's record.
std::string explainMiss(const DatumPick& p, double true_m, const DemoTruth& truth) {
    std::ostringstream why;
    for (const PlantedFault& f : truth.faults) {
        if (f.hole != p.hole)
            continue;
        const std::string sample = f.item.substr(0, f.item.find('/'));
        if (sample == p.found_sample || (p.absent_sample && sample == *p.absent_sample))
            why << "planted fault " << f.kind << " (" << f.item << "); ";
    }
    const bool datum_beyond_absent =
        p.kind == EventKind::Top ? true_m < p.plain.shallow_m : true_m > p.plain.deep_m;
    if (datum_beyond_absent)
        why << "the taxon lived at sample " << p.absent_sample.value_or("?")
            << " but was not reported there (missed: rare or unsuited facies)";
    else
        why << "the taxon is reported beyond its true range in " << p.found_sample
            << " (found sample on the wrong side)";
    return why.str();
}

} // namespace

TEST_CASE("demo picks: brackets against the true event depths", "[demo][biostrat]") {
    const DemoArchipelago& d = demoData();
    BiostratSettings settings;
    settings.range_extension_confidence = 0.95;
    const BiostratResult result = runBiostratigraphy(d.data, settings);

    Coverage cov;
    std::ostringstream misses;
    for (const DatumPick& p : result.picks) {
        if (!p.found)
            continue;
        const auto& history = trueHistory(d.truth, p.hole);
        const auto true_m = trueDepthOfAgeM(history, p.age_ma);
        if (!true_m) {
            ++cov.in_hiatus;
            continue;
        }
        ++cov.compared;
        cov.open_ended += p.open_ended ? 1 : 0;
        const bool in_plain = p.plain.contains(*true_m);
        cov.plain += in_plain;
        cov.widened += p.widened.contains(*true_m);
        const bool in_extended = p.extended.contains(*true_m);
        cov.extended += in_extended;
        if (!in_plain)
            misses << "  " << p.hole << " '" << p.event << "' plain " << p.plain.shallow_m << "-"
                   << p.plain.deep_m << " m, extended " << p.extended.shallow_m << "-"
                   << p.extended.deep_m << " m, true " << *true_m << " m"
                   << (in_extended ? " (extended holds it)" : " (EXTENDED MISSES)") << ": "
                   << explainMiss(p, *true_m, d.truth) << "\n";
    }
    REQUIRE(cov.compared > 0);
    std::cout << "demo picks (seed " << kDemoSeed << "): " << cov.compared
              << " found picks with a true depth (" << cov.open_ended << " open-ended), "
              << cov.in_hiatus << " more whose event time lies in a hiatus\n"
              << "  plain brackets holding the true depth:    " << cov.plain << " ("
              << 100.0 * cov.plain / cov.compared << " %)\n"
              << "  widened (recovery) holding it:            " << cov.widened << " ("
              << 100.0 * cov.widened / cov.compared << " %)\n"
              << "  extended (95 % range extension) holding it: " << cov.extended << " ("
              << 100.0 * cov.extended / cov.compared << " %)\n"
              << "misses of the plain bracket:\n"
              << misses.str();
    std::cout << "conflicts: " << result.conflicts.size() << "\n";
    for (const PickConflict& c : result.conflicts)
        std::cout << "  " << c.message << "\n";

    // Nesting: plain within widened within extended, so coverage can only grow.
    CHECK(cov.plain <= cov.widened);
    CHECK(cov.widened <= cov.extended);
    // With the 95 % extension, at least 90 % of brackets should hold the true depth.
    CHECK(cov.extended >= 0.90 * cov.compared);
}

TEST_CASE("demo picks: every event is reported in every hole", "[demo][biostrat]") {
    const DemoArchipelago& d = demoData();
    const BiostratResult r = runBiostratigraphy(d.data, BiostratSettings{});
    CHECK(r.picks.size() == d.data.holes.size() * d.data.events.size());
    // Tie points are found, closed picks only.
    for (const TiePoint& t : r.ties) {
        CHECK(t.shallow_m <= t.depth_m);
        CHECK(t.depth_m <= t.deep_m);
    }
    // Every sample gets a call in every scheme.
    std::set<std::string> schemes;
    for (const Zone& z : d.data.zones)
        schemes.insert(z.scheme);
    CHECK(r.zones.samples.size() == schemes.size() * d.data.samples.size());
    std::map<ZoneCall, int> calls;
    for (const SampleZoneCall& c : r.zones.samples)
        ++calls[c.call];
    std::cout << "demo zone calls:";
    for (const auto& [call, n] : calls)
        std::cout << " " << toString(call) << "=" << n;
    std::cout << "\n";
    CHECK(calls[ZoneCall::Assigned] > 0);
}
