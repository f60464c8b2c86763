#include "planted_faults.hpp"

#include "dating.hpp"
#include "rounding.hpp"
#include "sampling.hpp"

#include <cmath>
#include <cstdio>
#include <stdexcept>

namespace atollog::demo {
namespace {

std::string metres(double value_m) {
    char text[32];
    std::snprintf(text, sizeof text, "%.2f m", value_m);
    return text;
}

/// The limestone sample of a hole whose true age is closest to a target age.
TrueSample& sampleNearestAge(DemoArchipelago& demo, const std::string& hole, double age_ma,
                             bool dated) {
    TrueSample* best = nullptr;
    for (auto& s : demo.truth.samples) {
        if (s.hole != hole) continue;
        const LithInterval* iv = intervalAt(demo.data.intervals, hole, s.recorded_depth_m);
        if (!iv || iv->rock != Rock::Limestone) continue;
        bool has_date = false;
        for (const auto& d : demo.data.dates)
            has_date = has_date || (d.sample == s.sample && d.uth.has_value());
        if (has_date != dated) continue;
        if (!best || std::abs(s.age_ma - age_ma) < std::abs(best->age_ma - age_ma)) best = &s;
    }
    if (!best) throw std::logic_error("demo plan has no sample for a planted fault in " + hole);
    return *best;
}

void recordOverRecovery(DemoArchipelago& demo) {
    for (const auto& r : demo.data.runs)
        if (r.recovered_m > r.cored_m())
            demo.truth.faults.push_back(
                {"over_recovery", r.hole, r.run,
                 "recovered " + metres(r.recovered_m) + " from a " + metres(r.cored_m()) +
                     " run (core expansion): a deliberate recovery warning"});
}

void plantUnflaggedReworked(DemoArchipelago& demo) {
    const std::string taxon = "DISK-MAG"; // last appearance 3.75 Ma
    const TrueSample& s = sampleNearestAge(demo, "OSS1", 0.5, false);
    auto& occ = demo.data.occurrences;
    auto pos = occ.begin();
    bool seen = false;
    for (auto it = occ.begin(); it != occ.end(); ++it) {
        if (it->sample == s.sample) seen = true;
        else if (seen) { pos = it; break; }
        pos = it + 1;
    }
    Occurrence o;
    o.sample = s.sample;
    o.taxon = taxon;
    o.abundance = AbundanceClass::Rare;
    o.status = OccurrenceStatus::InPlace;
    occ.insert(pos, o);
    demo.truth.faults.push_back(
        {"unflagged_reworked", s.hole, s.sample + "/" + taxon,
         "taxon last seen at 3.75 Ma logged in place in rock about " +
             std::to_string(static_cast<int>(std::lround(s.age_ma * 1000))) +
             " ka old: reworked but not flagged"});
}

void plantMislabelledSample(DemoArchipelago& demo, DemoRng& rng) {
    TrueSample& s = sampleNearestAge(demo, "TOR1", 0.9, false);
    const double logged_m = s.recorded_depth_m;
    const double wanted_m = logged_m + rng.uniform(6.0, 8.0);
    for (const auto& iv : demo.data.intervals) {
        if (iv.hole != s.hole || iv.rock != Rock::Limestone || iv.base_m - 0.03 <= wanted_m) continue;
        const double recorded_m = roundDp(std::max(wanted_m, iv.top_m + 0.02), 2);
        for (auto& rec : demo.data.samples)
            if (rec.sample == s.sample) rec.top_m = rec.base_m = recorded_m;
        s.recorded_depth_m = recorded_m;
        demo.truth.faults.push_back(
            {"mislabelled_sample", s.hole, s.sample,
             "logged at " + metres(logged_m) + " but labelled " +
                 metres(recorded_m - logged_m) + " deeper, at " + metres(recorded_m)});
        return;
    }
    throw std::logic_error("no logged core below the mislabelled sample");
}

void plantAlteredCoral(DemoArchipelago& demo, DemoRng& rng) {
    const TrueSample& s = sampleNearestAge(demo, "KAL1", 0.30, true);
    // Uranium loss and 234U gain in a diagenetically altered coral make the closed-system age
    // too old and the back-calculated initial d234U well above seawater.
    const double altered_initial_permil = 171.5;
    for (auto& d : demo.data.dates) {
        if (d.sample != s.sample || !d.uth) continue;
        Sample rec;
        rec.hole = s.hole;
        rec.sample = s.sample;
        d.uth = uthDate(rec, s.age_ma * 1.07, altered_initial_permil, rng).uth;
    }
    demo.truth.faults.push_back(
        {"altered_coral", s.hole, s.sample,
         "U-Th ratios of an altered coral: apparent age 7 % too old, initial d234U about 171.5 "
         "per mil instead of 146.8"});
}

} // namespace

void plantFaults(DemoArchipelago& demo, DemoRng& rng) {
    recordOverRecovery(demo);
    plantUnflaggedReworked(demo);
    plantMislabelledSample(demo, rng);
    plantAlteredCoral(demo, rng);
}

} // namespace atollog::demo
