#include "random_dataset.hpp"

#include <algorithm>
#include <array>
#include <random>
#include <set>
#include <string>
#include <vector>

namespace atollog::testing {
namespace {

// Pieces of names on an invented archipelago; some carry CSV specials or non-ASCII UTF-8.
constexpr std::array<const char*, 14> kPieces{
    "Tava",  "Motu Ēre", "Kalo,ra", "Nui \"East\"", "Ōpiri", "reef\nflat", "Hoku-3",
    "Wai'o", "Ça",       "Lagoon;B", "珊瑚",         "🐚",      "Pā\r\nrua", "x"};

class Gen {
  public:
    explicit Gen(std::uint64_t seed) : rng_(seed) {}

    bool chance(double p) { return std::bernoulli_distribution(p)(rng_); }
    std::size_t index(std::size_t n) {
        return std::uniform_int_distribution<std::size_t>(0, n - 1)(rng_);
    }
    double uniform(double lo, double hi) { return std::uniform_real_distribution<double>(lo, hi)(rng_); }
    std::int64_t integer(std::int64_t lo, std::int64_t hi) {
        return std::uniform_int_distribution<std::int64_t>(lo, hi)(rng_);
    }
    /// An id: pieces joined, unique by its number; never starts or ends with a space.
    std::string id(const char* prefix, std::size_t n) {
        std::string s = prefix;
        if (chance(0.6)) s += std::string(" ") + kPieces[index(kPieces.size())];
        return s + "-" + std::to_string(n);
    }
    /// Free text, sometimes empty, sometimes with spaces at its ends.
    std::string text(bool may_be_empty = true) {
        if (may_be_empty && chance(0.3)) return {};
        std::string s;
        const std::size_t n = 1 + index(3);
        for (std::size_t i = 0; i < n; ++i) s += std::string(i ? " " : "") + kPieces[index(kPieces.size())];
        if (chance(0.15)) s = "  " + s + " ";
        return s;
    }
    template <class T> std::optional<T> maybe(T v) { return chance(0.7) ? std::optional<T>(v) : std::nullopt; }
    template <class Enum> Enum pick() {
        const auto all = allValues<Enum>();
        return all[index(all.size())];
    }
    /// x_ columns: a subset of the table's names, always in the same order, non-empty values.
    FreeAttributes extra(const std::vector<std::string>& names) {
        FreeAttributes out;
        for (const auto& n : names)
            if (chance(0.4)) out.emplace_back(n, text(false));
        return out;
    }

  private:
    std::mt19937_64 rng_;
};

const std::vector<std::string> kFreeNames{"x_lab", "x_Ōrua note", "x_a,b", "x_\"q\""};

} // namespace

CoreDataset randomValidDataset(std::uint64_t seed) {
    Gen g(seed);
    CoreDataset d;
    std::size_t serial = 0;

    const std::size_t hole_count = 1 + g.index(4);
    for (std::size_t h = 0; h < hole_count; ++h) {
        Hole hole;
        hole.hole = g.id("H", ++serial);
        hole.site = g.text(false);
        hole.lat_deg = g.maybe(g.uniform(-90, 90));
        hole.lon_deg = g.maybe(g.uniform(-180, 180));
        hole.collar_elev_m = g.maybe(g.uniform(-30, 40));
        hole.chain_km = g.maybe(g.uniform(0, 900));
        hole.kind = h == 0 || g.chance(0.8) ? HoleKind::Core : HoleKind::Cuttings;
        hole.extra = g.extra(kFreeNames);
        d.holes.push_back(hole);
    }

    // Runs follow each other down the hole, touching or with gaps; intervals and samples are
    // placed inside single runs so that they lie in the cored part.
    for (const Hole& hole : d.holes) {
        if (hole.kind != HoleKind::Core) continue;
        double top_m = g.uniform(0, 5);
        const std::size_t run_count = 1 + g.index(5);
        for (std::size_t r = 0; r < run_count; ++r) {
            CoreRun run;
            run.hole = hole.hole;
            run.run = g.id("R", ++serial);
            run.top_m = top_m;
            run.base_m = top_m + g.uniform(0.5, 3.0);
            run.recovered_m = g.chance(0.1) ? 0.0 : g.uniform(0, 1.05) * run.cored_m();
            run.extra = g.extra(kFreeNames);
            d.runs.push_back(run);
            top_m = g.chance(0.5) ? run.base_m : run.base_m + g.uniform(0.01, 2.0);
        }
    }
    for (const CoreRun& run : d.runs) {
        if (g.chance(0.7)) {
            LithInterval v;
            v.hole = run.hole;
            v.top_m = run.top_m + g.uniform(0, 0.4) * run.cored_m();
            // min(): rounding must not push the base past the run's base.
            v.base_m = std::min(run.base_m, v.top_m + g.uniform(0.1, 1.0) * (run.base_m - v.top_m));
            v.rock = g.pick<Rock>();
            if (isCarbonate(v.rock) && g.chance(0.7)) v.texture = g.pick<Texture>();
            if (g.chance(0.5)) v.mud_supported = g.chance(0.5);
            v.grains_pct = g.maybe(g.uniform(0, 100));
            v.coarse_pct = g.maybe(g.uniform(0, 100));
            if (g.chance(0.5)) v.binding = g.pick<Binding>();
            v.base_surface = g.pick<Surface>();
            if (g.chance(0.5)) {
                v.paleodepth_min_m = g.uniform(0, 20);
                v.paleodepth_max_m = *v.paleodepth_min_m + g.uniform(0, 30);
            }
            v.dry_density_g_cm3 = g.maybe(g.uniform(1.2, 2.9));
            v.porosity_pct = g.maybe(g.uniform(0, 60));
            v.caco3_pct = g.maybe(static_cast<double>(g.integer(0, 100)));
            v.notes = g.text();
            v.extra = g.extra(kFreeNames);
            d.intervals.push_back(v);
        }
        const std::size_t sample_count = g.index(3);
        for (std::size_t s = 0; s < sample_count; ++s) {
            Sample sample;
            sample.hole = run.hole;
            sample.sample = g.id("S", ++serial);
            sample.top_m = run.top_m + g.uniform(0, 1) * run.cored_m();
            sample.base_m =
                g.chance(0.5) ? sample.top_m
                              : std::min(run.base_m, sample.top_m + g.uniform(0, 1) *
                                                                        (run.base_m - sample.top_m));
            sample.kind = g.chance(0.5) ? "" : (g.chance(0.5) ? "core" : "barren");
            sample.extra = g.extra(kFreeNames);
            d.samples.push_back(sample);
        }
    }

    const std::size_t taxon_count = g.index(6);
    for (std::size_t t = 0; t < taxon_count; ++t) {
        Taxon taxon;
        taxon.taxon = g.id("T", ++serial);
        taxon.name = g.text(false);
        taxon.group = g.pick<TaxonGroup>();
        taxon.extra = g.extra(kFreeNames);
        d.taxa.push_back(taxon);
    }
    // Each (sample, taxon, status) at most once.
    for (const Sample& s : d.samples) {
        for (const Taxon& t : d.taxa) {
            if (!g.chance(0.4)) continue;
            Occurrence o;
            o.sample = s.sample;
            o.taxon = t.taxon;
            const double kind = g.uniform(0, 1);
            if (kind < 0.4)
                o.abundance = Abundance{g.pick<AbundanceClass>()};
            else if (kind < 0.8)
                o.abundance = Abundance{g.integer(0, 2'000'000)};
            o.status = g.pick<OccurrenceStatus>();
            o.extra = g.extra(kFreeNames);
            d.occurrences.push_back(o);
        }
    }

    if (!d.taxa.empty()) {
        const std::size_t event_count = g.index(5);
        for (std::size_t e = 0; e < event_count; ++e) {
            TimeScaleEvent ev;
            ev.event = g.id("E", ++serial);
            ev.taxon = d.taxa[g.index(d.taxa.size())].taxon;
            ev.kind = g.pick<EventKind>();
            ev.age_ma = g.uniform(0, 25);
            ev.age_sd_ma = g.uniform(1e-4, 0.5);
            ev.source = g.text();
            ev.extra = g.extra(kFreeNames);
            d.events.push_back(ev);
        }
    }

    for (const CoreRun& run : d.runs) {
        if (!g.chance(0.4)) continue;
        NumericalDate date;
        date.hole = run.hole;
        std::vector<const Sample*> in_hole;
        for (const Sample& s : d.samples)
            if (s.hole == run.hole) in_hole.push_back(&s);
        if (!in_hole.empty() && g.chance(0.5))
            date.sample = in_hole[g.index(in_hole.size())]->sample;
        else
            date.depth_m = std::min(run.base_m, run.top_m + g.uniform(0, 1) * run.cored_m());
        date.method = g.pick<DateMethod>();
        const bool raw = g.chance(0.5);
        if (raw && date.method == DateMethod::UTh) {
            UThMeasurement m;
            m.th230_u238_act = g.uniform(0.01, 1.1);
            m.th230_u238_act_sd = g.uniform(1e-4, 0.01);
            m.u234_u238_act = g.uniform(1.0, 1.2);
            m.u234_u238_act_sd = g.uniform(1e-4, 0.01);
            m.th232_ppb = g.maybe(g.uniform(0, 5));
            m.u238_ppb = g.maybe(g.uniform(1000, 4000));
            date.uth = m;
        } else if (raw && date.method == DateMethod::C14) {
            C14Measurement m;
            m.f14c = g.uniform(0.01, 1.0);
            m.f14c_sd = g.uniform(1e-4, 0.01);
            m.delta_r_yr = g.maybe(g.uniform(-200, 500));
            m.delta_r_sd_yr = g.maybe(g.uniform(1, 100));
            date.c14 = m;
        } else {
            date.age_ma = g.uniform(0, 30);
            date.age_sd_ma = g.uniform(1e-6, 1);
        }
        date.extra = g.extra(kFreeNames);
        d.dates.push_back(date);
    }

    const std::size_t zone_count = g.index(4);
    for (std::size_t z = 0; z < zone_count; ++z) {
        Zone zone;
        zone.scheme = g.chance(0.5) ? "Tava scheme" : "Ōpiri, \"B\"";
        zone.zone = g.id("Z", ++serial);
        if (!d.events.empty() && g.chance(0.7)) zone.base_event = d.events[g.index(d.events.size())].event;
        if (!d.events.empty() && g.chance(0.7)) {
            const std::string top = d.events[g.index(d.events.size())].event;
            if (top != zone.base_event) zone.top_event = top;
        }
        zone.extra = g.extra(kFreeNames);
        d.zones.push_back(zone);
    }

    const std::size_t sea_count = g.index(5);
    for (std::size_t s = 0; s < sea_count; ++s) {
        SeaLevelPoint p;
        p.age_ma = g.uniform(0, 2);
        p.level_m = g.uniform(-130, 10);
        p.level_sd_m = g.maybe(g.uniform(0.1, 10));
        p.extra = g.extra(kFreeNames);
        d.sea_level.push_back(p);
    }
    const std::size_t curve_count = g.index(6);
    double cal_bp = g.uniform(0, 100);
    for (std::size_t c = 0; c < curve_count; ++c) {
        CalibrationPoint p;
        p.cal_bp = cal_bp;
        p.c14_bp = cal_bp * 0.95 + g.uniform(-50, 50);
        p.sd = g.uniform(5, 40);
        p.extra = g.extra(kFreeNames);
        d.curve.push_back(p);
        cal_bp += g.uniform(5, 50);
    }
    return d;
}

} // namespace atollog::testing
