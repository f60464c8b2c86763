#include "table_cells.hpp"

#include "decimal_number.hpp"
#include "folder_tables.hpp"

#include <optional>
#include <stdexcept>

namespace atollog::db::folder_io {
namespace {

std::string num(double v) { return formatShortest(v); }
std::string num(const std::optional<double>& v) { return v ? formatShortest(*v) : std::string(); }
template <class Enum> std::string word(Enum v) { return std::string(toString(v)); }
template <class Enum> std::string word(const std::optional<Enum>& v) {
    return v ? std::string(toString(*v)) : std::string();
}
std::string text(const std::optional<std::string>& v) { return v.value_or(std::string()); }

[[noreturn]] void noSuchColumn(const char* table, int column) {
    throw std::logic_error(std::string("cellText: no column ") + std::to_string(column) + " in " +
                           table);
}

} // namespace

std::string cellText(const Hole& r, int column) {
    using namespace col;
    switch (static_cast<col::Holes>(column)) {
    case kHole: return r.hole;
    case kSite: return r.site;
    case kLat: return num(r.lat_deg);
    case kLon: return num(r.lon_deg);
    case kCollarElev: return num(r.collar_elev_m);
    case kChain: return num(r.chain_km);
    case kHoleKind: return word(r.kind);
    }
    noSuchColumn("holes", column);
}

std::string cellText(const CoreRun& r, int column) {
    using namespace col;
    switch (static_cast<col::Runs>(column)) {
    case kRunHole: return r.hole;
    case kRun: return r.run;
    case kRunTop: return num(r.top_m);
    case kRunBase: return num(r.base_m);
    case kRecovered: return num(r.recovered_m);
    }
    noSuchColumn("runs", column);
}

std::string cellText(const LithInterval& r, int column) {
    using namespace col;
    switch (static_cast<col::Intervals>(column)) {
    case kIntHole: return r.hole;
    case kIntTop: return num(r.top_m);
    case kIntBase: return num(r.base_m);
    case kRock: return word(r.rock);
    case kTexture: return word(r.texture);
    case kMudSupported: return r.mud_supported ? (*r.mud_supported ? "yes" : "no") : "";
    case kGrains: return num(r.grains_pct);
    case kCoarse: return num(r.coarse_pct);
    case kBinding: return word(r.binding);
    case kBaseSurface: return word(r.base_surface);
    case kPaleoMin: return num(r.paleodepth_min_m);
    case kPaleoMax: return num(r.paleodepth_max_m);
    case kDryDensity: return num(r.dry_density_g_cm3);
    case kPorosity: return num(r.porosity_pct);
    case kCaco3: return num(r.caco3_pct);
    case kNotes: return r.notes;
    }
    noSuchColumn("intervals", column);
}

std::string cellText(const Sample& r, int column) {
    using namespace col;
    switch (static_cast<col::Samples>(column)) {
    case kSampleHole: return r.hole;
    case kSample: return r.sample;
    case kSampleTop: return num(r.top_m);
    case kSampleBase: return num(r.base_m);
    case kSampleKind: return r.kind;
    }
    noSuchColumn("samples", column);
}

std::string cellText(const Taxon& r, int column) {
    using namespace col;
    switch (static_cast<col::Taxa>(column)) {
    case kTaxon: return r.taxon;
    case kTaxonName: return r.name;
    case kGroup: return word(r.group);
    }
    noSuchColumn("taxa", column);
}

std::string cellText(const Occurrence& r, int column) {
    using namespace col;
    switch (static_cast<col::Occurrences>(column)) {
    case kOccSample: return r.sample;
    case kOccTaxon: return r.taxon;
    case kAbundance:
        if (!r.abundance) return "";
        if (const auto* count = std::get_if<std::int64_t>(&*r.abundance))
            return formatShortest(*count);
        return word(std::get<AbundanceClass>(*r.abundance));
    case kStatus: return word(r.status);
    }
    noSuchColumn("occurrences", column);
}

std::string cellText(const TimeScaleEvent& r, int column) {
    using namespace col;
    switch (static_cast<col::Events>(column)) {
    case kEvent: return r.event;
    case kEventTaxon: return r.taxon;
    case kEventKind: return word(r.kind);
    case kEventAge: return num(r.age_ma);
    case kEventAgeSd: return num(r.age_sd_ma);
    case kSource: return r.source;
    }
    noSuchColumn("events", column);
}

std::string cellText(const NumericalDate& r, int column) {
    using namespace col;
    const auto uth = [&](auto member) { return r.uth ? num((*r.uth).*member) : std::string(); };
    const auto c14 = [&](auto member) { return r.c14 ? num((*r.c14).*member) : std::string(); };
    switch (static_cast<col::Dates>(column)) {
    case kDateHole: return r.hole;
    case kDateSample: return text(r.sample);
    case kDateDepth: return num(r.depth_m);
    case kMethod: return word(r.method);
    case kDateAge: return num(r.age_ma);
    case kDateAgeSd: return num(r.age_sd_ma);
    case kTh230U238: return uth(&UThMeasurement::th230_u238_act);
    case kTh230U238Sd: return uth(&UThMeasurement::th230_u238_act_sd);
    case kU234U238: return uth(&UThMeasurement::u234_u238_act);
    case kU234U238Sd: return uth(&UThMeasurement::u234_u238_act_sd);
    case kTh232Ppb: return uth(&UThMeasurement::th232_ppb);
    case kU238Ppb: return uth(&UThMeasurement::u238_ppb);
    case kF14c: return c14(&C14Measurement::f14c);
    case kF14cSd: return c14(&C14Measurement::f14c_sd);
    case kDeltaR: return c14(&C14Measurement::delta_r_yr);
    case kDeltaRSd: return c14(&C14Measurement::delta_r_sd_yr);
    }
    noSuchColumn("dates", column);
}

std::string cellText(const Zone& r, int column) {
    using namespace col;
    switch (static_cast<col::Zones>(column)) {
    case kScheme: return r.scheme;
    case kZone: return r.zone;
    case kBaseEvent: return text(r.base_event);
    case kTopEvent: return text(r.top_event);
    }
    noSuchColumn("zones", column);
}

std::string cellText(const SeaLevelPoint& r, int column) {
    using namespace col;
    switch (static_cast<col::SeaLevel>(column)) {
    case kSeaAge: return num(r.age_ma);
    case kLevel: return num(r.level_m);
    case kLevelSd: return num(r.level_sd_m);
    }
    noSuchColumn("sealevel", column);
}

std::string cellText(const CalibrationPoint& r, int column) {
    using namespace col;
    switch (static_cast<col::Curve>(column)) {
    case kCalBp: return num(r.cal_bp);
    case kC14Bp: return num(r.c14_bp);
    case kCurveSd: return num(r.sd);
    }
    noSuchColumn("curve", column);
}

} // namespace atollog::db::folder_io
