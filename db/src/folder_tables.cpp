#include "folder_tables.hpp"

#include <array>
#include <stdexcept>

namespace atollog::db::folder_io {
namespace {

using Q = Quantity;
constexpr bool kReq = true;

constexpr std::array<ColumnSpec, 7> kHoles{{{"hole", Q::Plain, kReq},
                                            {"site", Q::Plain, kReq},
                                            {"lat_deg"},
                                            {"lon_deg"},
                                            {"collar_elev_m", Q::Length},
                                            {"chain_km"},
                                            {"kind"}}};
constexpr std::array<ColumnSpec, 5> kRuns{{{"hole", Q::Plain, kReq},
                                           {"run", Q::Plain, kReq},
                                           {"top_m", Q::Length, kReq},
                                           {"base_m", Q::Length, kReq},
                                           {"recovered_m", Q::Length, kReq}}};
constexpr std::array<ColumnSpec, 16> kIntervals{{{"hole", Q::Plain, kReq},
                                                 {"top_m", Q::Length, kReq},
                                                 {"base_m", Q::Length, kReq},
                                                 {"rock", Q::Plain, kReq},
                                                 {"texture"},
                                                 {"mud_supported"},
                                                 {"grains_pct"},
                                                 {"coarse_pct"},
                                                 {"binding"},
                                                 {"base_surface"},
                                                 {"paleodepth_min_m", Q::Length},
                                                 {"paleodepth_max_m", Q::Length},
                                                 {"dry_density_g_cm3"},
                                                 {"porosity_pct"},
                                                 {"caco3_pct"},
                                                 {"notes"}}};
constexpr std::array<ColumnSpec, 5> kSamples{{{"hole", Q::Plain, kReq},
                                              {"sample", Q::Plain, kReq},
                                              {"top_m", Q::Length, kReq},
                                              {"base_m", Q::Length},
                                              {"kind"}}};
constexpr std::array<ColumnSpec, 3> kTaxa{
    {{"taxon", Q::Plain, kReq}, {"name", Q::Plain, kReq}, {"group", Q::Plain, kReq}}};
constexpr std::array<ColumnSpec, 4> kOccurrences{
    {{"sample", Q::Plain, kReq}, {"taxon", Q::Plain, kReq}, {"abundance"}, {"status"}}};
constexpr std::array<ColumnSpec, 6> kEvents{{{"event", Q::Plain, kReq},
                                             {"taxon", Q::Plain, kReq},
                                             {"kind", Q::Plain, kReq},
                                             {"age_ma", Q::Age, kReq},
                                             {"age_sd_ma", Q::Age, kReq},
                                             {"source"}}};
constexpr std::array<ColumnSpec, 16> kDates{{{"hole", Q::Plain, kReq},
                                             {"sample"},
                                             {"depth_m", Q::Length},
                                             {"method", Q::Plain, kReq},
                                             {"age_ma", Q::Age},
                                             {"age_sd_ma", Q::Age},
                                             {"th230_u238_act"},
                                             {"th230_u238_act_sd"},
                                             {"u234_u238_act"},
                                             {"u234_u238_act_sd"},
                                             {"th232_ppb"},
                                             {"u238_ppb"},
                                             {"f14c"},
                                             {"f14c_sd"},
                                             {"delta_r_yr"},
                                             {"delta_r_sd_yr"}}};
constexpr std::array<ColumnSpec, 4> kZones{
    {{"scheme", Q::Plain, kReq}, {"zone", Q::Plain, kReq}, {"base_event"}, {"top_event"}}};
constexpr std::array<ColumnSpec, 3> kSeaLevel{{{"age_ma", Q::Age, kReq},
                                               {"level_m", Q::Length, kReq},
                                               {"level_sd_m", Q::Length}}};
constexpr std::array<ColumnSpec, 3> kCurve{
    {{"cal_bp", Q::Plain, kReq}, {"c14_bp", Q::Plain, kReq}, {"sd", Q::Plain, kReq}}};

const std::array<TableSpec, 11> kTables{{{Table::Holes, kHoles},
                                         {Table::Runs, kRuns},
                                         {Table::Intervals, kIntervals},
                                         {Table::Samples, kSamples},
                                         {Table::Taxa, kTaxa},
                                         {Table::Occurrences, kOccurrences},
                                         {Table::Events, kEvents},
                                         {Table::Dates, kDates},
                                         {Table::Zones, kZones},
                                         {Table::SeaLevel, kSeaLevel},
                                         {Table::Curve, kCurve}}};

} // namespace

std::string_view ColumnSpec::stem() const {
    switch (quantity) {
    case Quantity::Length: return name.substr(0, name.size() - 2); // "_m"
    case Quantity::Age: return name.substr(0, name.size() - 3);    // "_ma"
    case Quantity::Plain: break;
    }
    return name;
}

std::string ColumnSpec::spellings() const {
    const std::string s(stem());
    switch (quantity) {
    case Quantity::Length: return s + "_m (or " + s + "_ft)";
    case Quantity::Age: return s + "_ma (or " + s + "_ka, " + s + "_yr)";
    case Quantity::Plain: break;
    }
    return s;
}

std::span<const TableSpec> folderTables() { return kTables; }

const TableSpec& tableSpec(Table table) {
    for (const auto& t : kTables)
        if (t.table == table) return t;
    throw std::logic_error("tableSpec: unknown table");
}

} // namespace atollog::db::folder_io
