// Every numeric field must be a finite number: NaN or Inf never travels further into the engine.
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/validation_detail.hpp"

#include <cmath>
#include <optional>

namespace atollog::detail {
namespace {

class FiniteCheck {
  public:
    FiniteCheck(IssueList &out, Table table, std::size_t row)
        : out_(out), table_(table), row_(row) {}
    void operator()(const char *column, double v) const {
        if (std::isfinite(v))
            return;
        out_.error(table_, row_, column, numberText(v),
                   std::string(column) + " is " + numberText(v) + ", not a finite number",
                   "give a decimal number (e.g. 12.5) or leave the cell empty if it is optional");
    }
    void operator()(const char *column, const std::optional<double> &v) const {
        if (v)
            (*this)(column, *v);
    }

  private:
    IssueList &out_;
    Table table_;
    std::size_t row_;
};

} // namespace

void validateFiniteNumbers(const CoreDataset &data, IssueList &out) {
    for (std::size_t i = 0; i < data.holes.size(); ++i) {
        const Hole &h = data.holes[i];
        const FiniteCheck check(out, Table::Holes, i);
        check("lat_deg", h.lat_deg);
        check("lon_deg", h.lon_deg);
        check("collar_elev_m", h.collar_elev_m);
        check("chain_km", h.chain_km);
    }
    for (std::size_t i = 0; i < data.runs.size(); ++i) {
        const CoreRun &r = data.runs[i];
        const FiniteCheck check(out, Table::Runs, i);
        check("top_m", r.top_m);
        check("base_m", r.base_m);
        check("recovered_m", r.recovered_m);
    }
    for (std::size_t i = 0; i < data.intervals.size(); ++i) {
        const LithInterval &v = data.intervals[i];
        const FiniteCheck check(out, Table::Intervals, i);
        check("top_m", v.top_m);
        check("base_m", v.base_m);
        check("grains_pct", v.grains_pct);
        check("coarse_pct", v.coarse_pct);
        check("paleodepth_min_m", v.paleodepth_min_m);
        check("paleodepth_max_m", v.paleodepth_max_m);
        check("dry_density_g_cm3", v.dry_density_g_cm3);
        check("porosity_pct", v.porosity_pct);
        check("caco3_pct", v.caco3_pct);
    }
    for (std::size_t i = 0; i < data.samples.size(); ++i) {
        const FiniteCheck check(out, Table::Samples, i);
        check("top_m", data.samples[i].top_m);
        check("base_m", data.samples[i].base_m);
    }
    for (std::size_t i = 0; i < data.events.size(); ++i) {
        const FiniteCheck check(out, Table::Events, i);
        check("age_ma", data.events[i].age_ma);
        check("age_sd_ma", data.events[i].age_sd_ma);
    }
    for (std::size_t i = 0; i < data.dates.size(); ++i) {
        const NumericalDate &d = data.dates[i];
        const FiniteCheck check(out, Table::Dates, i);
        check("depth_m", d.depth_m);
        check("age_ma", d.age_ma);
        check("age_sd_ma", d.age_sd_ma);
        if (d.uth) {
            check("th230_u238_act", d.uth->th230_u238_act);
            check("th230_u238_act_sd", d.uth->th230_u238_act_sd);
            check("u234_u238_act", d.uth->u234_u238_act);
            check("u234_u238_act_sd", d.uth->u234_u238_act_sd);
            check("th232_ppb", d.uth->th232_ppb);
            check("u238_ppb", d.uth->u238_ppb);
        }
        if (d.c14) {
            check("f14c", d.c14->f14c);
            check("f14c_sd", d.c14->f14c_sd);
            check("delta_r_yr", d.c14->delta_r_yr);
            check("delta_r_sd_yr", d.c14->delta_r_sd_yr);
        }
    }
    for (std::size_t i = 0; i < data.sea_level.size(); ++i) {
        const FiniteCheck check(out, Table::SeaLevel, i);
        check("age_ma", data.sea_level[i].age_ma);
        check("level_m", data.sea_level[i].level_m);
        check("level_sd_m", data.sea_level[i].level_sd_m);
    }
    for (std::size_t i = 0; i < data.curve.size(); ++i) {
        const FiniteCheck check(out, Table::Curve, i);
        check("cal_bp", data.curve[i].cal_bp);
        check("c14_bp", data.curve[i].c14_bp);
        check("sd", data.curve[i].sd);
    }
}

} // namespace atollog::detail
