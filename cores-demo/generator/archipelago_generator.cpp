#include "archipelago_generator.hpp"

#include "archipelago_plan.hpp"
#include "core_logging.hpp"
#include "dating.hpp"
#include "fossil_record.hpp"
#include "planted_faults.hpp"
#include "rng.hpp"
#include "sampling.hpp"
#include "sea_level.hpp"
#include "taxon_catalogue.hpp"

#include <cmath>

namespace atollog::demo {
namespace {

/// Ratio measurements of older corals approach secular equilibrium and date poorly; 450 ka
/// keeps every U-Th date well inside the method's reach.
constexpr double kUThMaxAgeMa = 0.45;
/// Radiocarbon only on Holocene material (younger than 11.5 ka).
constexpr double kC14MaxAgeMa = 0.0115;

Hole holeRecord(const IslandPlan& p) {
    Hole h;
    h.hole = p.history.hole;
    h.site = p.site;
    h.lat_deg = p.lat_deg;
    h.lon_deg = p.lon_deg;
    h.collar_elev_m = p.collar_elev_m;
    h.chain_km = p.chain_km;
    h.kind = HoleKind::Core;
    return h;
}

bool isCoralFramework(const LithInterval& iv) {
    return iv.texture == Texture::Framestone || iv.texture == Texture::Bafflestone ||
           iv.texture == Texture::Rudstone || iv.texture == Texture::Floatstone;
}

void dateSample(const Sample& s, const LithInterval& iv, double age_ma, CoreDataset& data,
                DemoRng& rng) {
    if (iv.rock == Rock::Basalt) {
        data.dates.push_back(arArDate(s, age_ma, rng));
        return;
    }
    if (age_ma <= kC14MaxAgeMa) {
        data.dates.push_back(c14Date(s, age_ma, rng));
        if (rng.chance(0.3)) data.dates.push_back(uthDate(s, age_ma, kSeawaterDelta234UPermil, rng));
        return;
    }
    if (age_ma <= kUThMaxAgeMa && isCoralFramework(iv) && rng.chance(0.55))
        data.dates.push_back(uthDate(s, age_ma, kSeawaterDelta234UPermil, rng));
}

} // namespace

DemoArchipelago generateArchipelago(std::uint64_t seed) {
    DemoRng rng(seed);
    // Where each run's core really came from: a stream of its own (archipelago_generator.hpp).
    DemoRng position_rng(seed ^ 0x5deece66dULL);
    DemoArchipelago demo;
    CoreDataset& data = demo.data;
    DemoTruth& truth = demo.truth;
    truth.seed = seed;

    const std::vector<TaxonPlan> taxa = taxonCatalogue();
    data.events = timeScaleEvents(taxa);
    for (const auto& t : taxa) {
        data.taxa.push_back({t.taxon, t.name, t.group, {}});
        truth.ranges.push_back({t.taxon, t.first_ma, t.last_ma});
    }
    for (const auto& e : data.events) truth.events.push_back({e.event, e.taxon, e.kind, e.age_ma});

    for (const IslandPlan& plan : archipelagoPlan()) {
        const TrueHoleHistory& history = plan.history;
        truth.holes.push_back(history);
        for (auto& h : hiatusesOf(history)) truth.hiatuses.push_back(h);
        data.holes.push_back(holeRecord(plan));

        const auto runs = drillRuns(plan, rng);
        const auto offsets = drawCoreOffsets(plan, runs, position_rng);
        const auto intervals = logIntervals(plan, runs, offsets, rng);
        auto samples = takeSamples(plan, runs, rng);
        data.runs.insert(data.runs.end(), runs.begin(), runs.end());
        data.intervals.insert(data.intervals.end(), intervals.begin(), intervals.end());

        for (const auto& s : samples) {
            const double true_m = trueDepthOfLoggedM(runs, offsets, s.top_m);
            const double age_ma = trueAgeMa(history, true_m);
            truth.samples.push_back({s.hole, s.sample, s.top_m, true_m, age_ma});
            const LithInterval& iv = *intervalAt(intervals, s.hole, s.top_m);
            if (iv.rock != Rock::Basalt) {
                SampleSetting setting{s.sample, age_ma, *trueWaterDepthM(history, true_m),
                                      iv.texture};
                for (auto& o : examineSample(setting, taxa, rng)) data.occurrences.push_back(o);
            }
            dateSample(s, iv, age_ma, data, rng);
        }
        data.samples.insert(data.samples.end(), samples.begin(), samples.end());
    }

    data.zones = zonationScheme("VL larger benthic foraminifera", "VL",
                                TaxonGroup::LargerBenthicForam, taxa, data.events);
    const auto nanno = zonationScheme("VN calcareous nannofossils", "VN", TaxonGroup::Nannofossil,
                                      taxa, data.events);
    data.zones.insert(data.zones.end(), nanno.begin(), nanno.end());
    data.sea_level = syntheticSeaLevel();
    data.curve = syntheticCalibrationCurve();

    plantFaults(demo, rng);
    return demo;
}

} // namespace atollog::demo
