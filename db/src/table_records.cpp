#include "table_records.hpp"

namespace atollog::db::folder_io {
namespace {

Hole holeOf(RowCells& c) {
    using namespace col;
    Hole h;
    h.hole = c.requiredId(kHole);
    h.site = c.requiredText(kSite);
    h.lat_deg = c.number(kLat);
    h.lon_deg = c.number(kLon);
    h.collar_elev_m = c.number(kCollarElev);
    h.chain_km = c.number(kChain);
    h.kind = c.word(kHoleKind, parseHoleKind).value_or(HoleKind::Core);
    h.extra = c.freeAttributes();
    return h;
}

CoreRun runOf(RowCells& c) {
    using namespace col;
    CoreRun r;
    r.hole = c.requiredId(kRunHole);
    r.run = c.requiredId(kRun);
    r.top_m = c.requiredNumber(kRunTop);
    r.base_m = c.requiredNumber(kRunBase);
    r.recovered_m = c.requiredNumber(kRecovered);
    r.extra = c.freeAttributes();
    return r;
}

LithInterval intervalOf(RowCells& c) {
    using namespace col;
    LithInterval v;
    v.hole = c.requiredId(kIntHole);
    v.top_m = c.requiredNumber(kIntTop);
    v.base_m = c.requiredNumber(kIntBase);
    v.rock = c.word(kRock, parseRock, true).value_or(Rock::Limestone);
    v.texture = c.word(kTexture, parseTexture);
    v.mud_supported = c.yesNo(kMudSupported);
    v.grains_pct = c.number(kGrains);
    v.coarse_pct = c.number(kCoarse);
    v.binding = c.word(kBinding, parseBinding);
    v.base_surface = c.word(kBaseSurface, parseSurface).value_or(Surface::None);
    v.paleodepth_min_m = c.number(kPaleoMin);
    v.paleodepth_max_m = c.number(kPaleoMax);
    v.dry_density_g_cm3 = c.number(kDryDensity);
    v.porosity_pct = c.number(kPorosity);
    v.caco3_pct = c.number(kCaco3);
    v.notes = c.text(kNotes);
    v.extra = c.freeAttributes();
    return v;
}

Sample sampleOf(RowCells& c) {
    using namespace col;
    Sample s;
    s.hole = c.requiredId(kSampleHole);
    s.sample = c.requiredId(kSample);
    s.top_m = c.requiredNumber(kSampleTop);
    s.base_m = c.number(kSampleBase).value_or(s.top_m); // a point sample when not given
    s.kind = c.text(kSampleKind);
    s.extra = c.freeAttributes();
    return s;
}

Taxon taxonOf(RowCells& c) {
    using namespace col;
    Taxon t;
    t.taxon = c.requiredId(kTaxon);
    t.name = c.requiredText(kTaxonName);
    t.group = c.word(kGroup, parseTaxonGroup, true).value_or(TaxonGroup::Other);
    t.extra = c.freeAttributes();
    return t;
}

Occurrence occurrenceOf(RowCells& c) {
    using namespace col;
    Occurrence o;
    o.sample = c.requiredId(kOccSample);
    o.taxon = c.requiredId(kOccTaxon);
    o.abundance = c.abundance(kAbundance);
    o.status = c.word(kStatus, parseOccurrenceStatus).value_or(OccurrenceStatus::InPlace);
    o.extra = c.freeAttributes();
    return o;
}

TimeScaleEvent eventOf(RowCells& c) {
    using namespace col;
    TimeScaleEvent e;
    e.event = c.requiredId(kEvent);
    e.taxon = c.requiredId(kEventTaxon);
    e.kind = c.word(kEventKind, parseEventKind, true).value_or(EventKind::Base);
    e.age_ma = c.requiredNumber(kEventAge);
    e.age_sd_ma = c.requiredNumber(kEventAgeSd);
    e.source = c.text(kSource);
    e.extra = c.freeAttributes();
    return e;
}

/// A raw measurement is a group of columns given together: either all of `needed` (plus any
/// of the optional ones) or none of them.
bool measurementGiven(RowCells& c, std::initializer_list<int> needed,
                      std::initializer_list<int> optional, const std::string& what,
                      const std::string& needed_list) {
    bool any = false;
    for (int k : needed) any = any || c.given(k);
    for (int k : optional) any = any || c.given(k);
    if (!any) return false;
    bool complete = true;
    for (int k : needed) {
        if (c.given(k)) continue;
        c.report(k, "the " + what + " measurement is incomplete: no value for this column",
                 "give all of " + needed_list + ", or leave them all empty");
        complete = false;
    }
    return complete;
}

NumericalDate dateOf(RowCells& c) {
    using namespace col;
    NumericalDate d;
    d.hole = c.requiredId(kDateHole);
    d.sample = c.optionalId(kDateSample);
    d.depth_m = c.number(kDateDepth);
    d.method = c.word(kMethod, parseDateMethod, true).value_or(DateMethod::Other);
    d.age_ma = c.number(kDateAge);
    d.age_sd_ma = c.number(kDateAgeSd);
    if (measurementGiven(c, {kTh230U238, kTh230U238Sd, kU234U238, kU234U238Sd},
                         {kTh232Ppb, kU238Ppb}, "u-th",
                         "th230_u238_act, th230_u238_act_sd, u234_u238_act, u234_u238_act_sd")) {
        UThMeasurement m;
        m.th230_u238_act = c.number(kTh230U238).value_or(0);
        m.th230_u238_act_sd = c.number(kTh230U238Sd).value_or(0);
        m.u234_u238_act = c.number(kU234U238).value_or(0);
        m.u234_u238_act_sd = c.number(kU234U238Sd).value_or(0);
        m.th232_ppb = c.number(kTh232Ppb);
        m.u238_ppb = c.number(kU238Ppb);
        d.uth = m;
    }
    if (measurementGiven(c, {kF14c, kF14cSd}, {kDeltaR, kDeltaRSd}, "c14", "f14c, f14c_sd")) {
        C14Measurement m;
        m.f14c = c.number(kF14c).value_or(0);
        m.f14c_sd = c.number(kF14cSd).value_or(0);
        m.delta_r_yr = c.number(kDeltaR);
        m.delta_r_sd_yr = c.number(kDeltaRSd);
        d.c14 = m;
    }
    d.extra = c.freeAttributes();
    return d;
}

Zone zoneOf(RowCells& c) {
    using namespace col;
    Zone z;
    z.scheme = c.requiredId(kScheme);
    z.zone = c.requiredId(kZone);
    z.base_event = c.optionalId(kBaseEvent);
    z.top_event = c.optionalId(kTopEvent);
    z.extra = c.freeAttributes();
    return z;
}

SeaLevelPoint seaLevelOf(RowCells& c) {
    using namespace col;
    SeaLevelPoint p;
    p.age_ma = c.requiredNumber(kSeaAge);
    p.level_m = c.requiredNumber(kLevel);
    p.level_sd_m = c.number(kLevelSd);
    p.extra = c.freeAttributes();
    return p;
}

CalibrationPoint curvePointOf(RowCells& c) {
    using namespace col;
    CalibrationPoint p;
    p.cal_bp = c.requiredNumber(kCalBp);
    p.c14_bp = c.requiredNumber(kC14Bp);
    p.sd = c.requiredNumber(kCurveSd);
    p.extra = c.freeAttributes();
    return p;
}

template <class Row> bool appendIfClean(RowCells& cells, std::vector<Row>& rows, Row row) {
    if (!cells.clean()) return false;
    rows.push_back(std::move(row));
    return true;
}

} // namespace

bool appendRecord(Table table, RowCells& c, CoreDataset& data) {
    switch (table) {
    case Table::Holes: return appendIfClean(c, data.holes, holeOf(c));
    case Table::Runs: return appendIfClean(c, data.runs, runOf(c));
    case Table::Intervals: return appendIfClean(c, data.intervals, intervalOf(c));
    case Table::Samples: return appendIfClean(c, data.samples, sampleOf(c));
    case Table::Taxa: return appendIfClean(c, data.taxa, taxonOf(c));
    case Table::Occurrences: return appendIfClean(c, data.occurrences, occurrenceOf(c));
    case Table::Events: return appendIfClean(c, data.events, eventOf(c));
    case Table::Dates: return appendIfClean(c, data.dates, dateOf(c));
    case Table::Zones: return appendIfClean(c, data.zones, zoneOf(c));
    case Table::SeaLevel: return appendIfClean(c, data.sea_level, seaLevelOf(c));
    case Table::Curve: return appendIfClean(c, data.curve, curvePointOf(c));
    }
    return false;
}

} // namespace atollog::db::folder_io
