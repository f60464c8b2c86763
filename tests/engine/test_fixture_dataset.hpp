#pragma once
// A small, clean core dataset from the invented Veya archipelago, for engine tests. Every value is
// invented; tests change one thing at a time and look for the issue it causes.
#include "atollog/engine/core_dataset.hpp"

namespace atollog::test {

inline CoreRun makeRun(std::string hole, std::string id, double top_m, double base_m,
                       double recovered_m) {
    CoreRun r;
    r.hole = std::move(hole);
    r.run = std::move(id);
    r.top_m = top_m;
    r.base_m = base_m;
    r.recovered_m = recovered_m;
    return r;
}

inline LithInterval makeInterval(std::string hole, double top_m, double base_m, Rock rock) {
    LithInterval v;
    v.hole = std::move(hole);
    v.top_m = top_m;
    v.base_m = base_m;
    v.rock = rock;
    return v;
}

inline Sample makeSample(std::string hole, std::string id, double top_m, double base_m) {
    Sample s;
    s.hole = std::move(hole);
    s.sample = std::move(id);
    s.top_m = top_m;
    s.base_m = base_m;
    return s;
}

inline Occurrence makeOccurrence(std::string sample, std::string taxon,
                                 OccurrenceStatus status = OccurrenceStatus::InPlace) {
    Occurrence o;
    o.sample = std::move(sample);
    o.taxon = std::move(taxon);
    o.status = status;
    return o;
}

/// Hole VEY-1 (core): runs 1R 0-3 m (2.4 m recovered), 2R 3-6 m (3.0), 3R 6-9 m (1.5).
/// Hole VEY-2C (cuttings, no runs). Intervals, samples, taxa, occurrences, events, dates, a
/// zone, a sea-level curve and a calibration curve, all consistent.
inline CoreDataset cleanDataset() {
    CoreDataset d;
    Hole h1;
    h1.hole = "VEY-1";
    h1.site = "Oru Veya Reef";
    h1.lat_deg = -14.02;
    h1.lon_deg = -128.31;
    h1.collar_elev_m = 3.5;
    h1.chain_km = 42.0;
    Hole h2;
    h2.hole = "VEY-2C";
    h2.site = "Oru Veya Reef";
    h2.kind = HoleKind::Cuttings;
    d.holes = {h1, h2};

    d.runs = {makeRun("VEY-1", "1R", 0.0, 3.0, 2.4), makeRun("VEY-1", "2R", 3.0, 6.0, 3.0),
              makeRun("VEY-1", "3R", 6.0, 9.0, 1.5)};

    LithInterval frame = makeInterval("VEY-1", 0.0, 1.2, Rock::Limestone);
    frame.texture = Texture::Framestone;
    frame.binding = Binding::Frame;
    frame.coarse_pct = 40;
    LithInterval grain = makeInterval("VEY-1", 1.2, 2.4, Rock::Limestone);
    grain.texture = Texture::Grainstone;
    grain.binding = Binding::None;
    grain.coarse_pct = 5;
    grain.mud_supported = false;
    grain.grains_pct = 80;
    grain.dry_density_g_cm3 = 1.9;
    grain.porosity_pct = 30;
    grain.caco3_pct = 97;
    grain.paleodepth_min_m = 0;
    grain.paleodepth_max_m = 10;
    LithInterval wacke = makeInterval("VEY-1", 3.0, 6.0, Rock::Limestone);
    wacke.texture = Texture::Wackestone;
    wacke.binding = Binding::None;
    wacke.coarse_pct = 2;
    wacke.mud_supported = true;
    wacke.grains_pct = 30;
    wacke.base_surface = Surface::Exposure;
    LithInterval basalt = makeInterval("VEY-1", 6.0, 7.5, Rock::Basalt);
    d.intervals = {frame, grain, wacke, basalt};

    d.samples = {makeSample("VEY-1", "S1", 0.5, 0.5), makeSample("VEY-1", "S2", 1.8, 1.9),
                 makeSample("VEY-1", "S3", 4.0, 4.0), makeSample("VEY-1", "S4", 7.0, 7.0),
                 makeSample("VEY-2C", "C1", 10.0, 12.0)};

    Taxon coral{"T1", "Porites sp. 1", TaxonGroup::Coral, {}};
    Taxon foram{"T2", "Amphistegina sp. 1", TaxonGroup::LargerBenthicForam, {}};
    Taxon plank{"T3", "Globigerinoides sp. 1", TaxonGroup::PlanktonicForam, {}};
    d.taxa = {coral, foram, plank};

    d.occurrences = {makeOccurrence("S1", "T1"), makeOccurrence("S2", "T2"),
                     makeOccurrence("S3", "T2"),
                     makeOccurrence("S3", "T3", OccurrenceStatus::Reworked),
                     makeOccurrence("C1", "T3", OccurrenceStatus::Caved)};
    d.occurrences[1].abundance = Abundance{std::int64_t{12}};
    d.occurrences[2].abundance = Abundance{AbundanceClass::Common};

    TimeScaleEvent base{"E1", "T3", EventKind::Base, 1.2, 0.05, "invented", {}};
    TimeScaleEvent top{"E2", "T3", EventKind::Top, 0.5, 0.05, "invented", {}};
    d.events = {base, top};

    NumericalDate uth;
    uth.hole = "VEY-1";
    uth.sample = "S3";
    uth.method = DateMethod::UTh;
    uth.uth = UThMeasurement{0.1, 0.001, 1.146, 0.002, 0.5, 3000};
    NumericalDate c14;
    c14.hole = "VEY-1";
    c14.depth_m = 7.0;
    c14.method = DateMethod::C14;
    c14.c14 = C14Measurement{0.5, 0.004, 30.0, 40.0};
    NumericalDate sr;
    sr.hole = "VEY-1";
    sr.depth_m = 1.0;
    sr.method = DateMethod::Sr;
    sr.age_ma = 1.5;
    sr.age_sd_ma = 0.1;
    d.dates = {uth, c14, sr};

    Zone zone;
    zone.scheme = "VPF";
    zone.zone = "VPF1";
    zone.base_event = "E1";
    zone.top_event = "E2";
    d.zones = {zone};

    d.sea_level = {{0.0, 0.0, 1.0, {}}, {0.02, -120.0, 5.0, {}}};
    d.curve = {{1000.0, 1100.0, 20.0, {}}, {0.0, 0.0, 20.0, {}}, {2000.0, 2050.0, 25.0, {}}};
    return d;
}

} // namespace atollog::test
