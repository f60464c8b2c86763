// Single values within their physical range: percentages, densities, coordinates, ages,
// standard deviations, activity ratios. Non-finite values are left to validateFiniteNumbers.
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/validation_detail.hpp"

#include <cmath>
#include <optional>

namespace atollog::detail {
namespace {

// Dry bulk density cannot exceed the grain density of the minerals: calcite about 2.71,
// dolomite about 2.87, aragonite about 2.93 g/cm3, basalt rarely above 3.0 (values from memory).
// Above 3.0 is therefore a likely typo, not impossible: a warning.
constexpr double kPlausibleDryDensity_g_cm3 = 3.0;

class RangeCheck {
  public:
    RangeCheck(IssueList &out, Table table, std::size_t row, std::string subject)
        : out_(out), table_(table), row_(row), subject_(std::move(subject)) {}

    void within(const char *column, const std::optional<double> &v, double lo, double hi,
                const char *fix) const {
        if (!v || !std::isfinite(*v) || (*v >= lo && *v <= hi))
            return;
        fail(column, *v, "is outside " + numberText(lo) + " to " + numberText(hi), fix);
    }
    void positive(const char *column, const std::optional<double> &v, const char *fix) const {
        if (!v || !std::isfinite(*v) || *v > 0.0)
            return;
        fail(column, *v, "is not greater than 0", fix);
    }
    void notNegative(const char *column, const std::optional<double> &v, const char *fix) const {
        if (!v || !std::isfinite(*v) || *v >= 0.0)
            return;
        fail(column, *v, "is negative", fix);
    }
    void percent(const char *column, const std::optional<double> &v) const {
        within(column, v, 0.0, 100.0, "give a percentage from 0 to 100 (not a fraction 0-1)");
    }
    void sd(const char *column, const std::optional<double> &v) const {
        positive(column, v,
                 "give one standard deviation greater than 0 (an exact value is not a "
                 "measurement)");
    }
    void age(const char *column, const std::optional<double> &v) const {
        notNegative(column, v, "ages are before present, 0 or more");
    }
    void fail(const char *column, double v, const std::string &what, const std::string &fix,
              Severity s = Severity::Error) const {
        std::string problem = subject_ + ": " + column + " " + numberText(v) + " " + what;
        if (s == Severity::Error)
            out_.error(table_, row_, column, numberText(v), std::move(problem), fix);
        else
            out_.warning(table_, row_, column, numberText(v), std::move(problem), fix);
    }

  private:
    IssueList &out_;
    Table table_;
    std::size_t row_;
    std::string subject_;
};

void checkInterval(const LithInterval &v, const RangeCheck &check) {
    check.percent("grains_pct", v.grains_pct);
    check.percent("coarse_pct", v.coarse_pct);
    check.percent("porosity_pct", v.porosity_pct);
    check.percent("caco3_pct", v.caco3_pct);
    check.positive("dry_density_g_cm3", v.dry_density_g_cm3,
                   "give the dry bulk density in g/cm3 (e.g. 1.9)");
    if (v.dry_density_g_cm3 && std::isfinite(*v.dry_density_g_cm3) &&
        *v.dry_density_g_cm3 > kPlausibleDryDensity_g_cm3)
        check.fail("dry_density_g_cm3", *v.dry_density_g_cm3,
                   "is above 3.0 g/cm3, denser than the grains of calcite, aragonite or dolomite",
                   "check the value and its unit (g/cm3, not kg/m3)", Severity::Warning);
    const char *water_depth_fix = "water depths are metres below sea level, 0 or more";
    check.notNegative("paleodepth_min_m", v.paleodepth_min_m, water_depth_fix);
    check.notNegative("paleodepth_max_m", v.paleodepth_max_m, water_depth_fix);
    if (v.paleodepth_min_m && v.paleodepth_max_m && std::isfinite(*v.paleodepth_min_m) &&
        std::isfinite(*v.paleodepth_max_m) && *v.paleodepth_min_m > *v.paleodepth_max_m)
        check.fail("paleodepth_min_m", *v.paleodepth_min_m,
                   "is deeper than paleodepth_max_m " + numberText(*v.paleodepth_max_m),
                   "paleodepth_min_m is the shallow limit; swap the two values");
}

void checkDate(const NumericalDate &d, const RangeCheck &check) {
    check.age("age_ma", d.age_ma);
    check.sd("age_sd_ma", d.age_sd_ma);
    const char *ratio_fix = "an activity ratio is greater than 0; check the laboratory report";
    if (d.uth) {
        check.positive("th230_u238_act", d.uth->th230_u238_act, ratio_fix);
        check.sd("th230_u238_act_sd", d.uth->th230_u238_act_sd);
        check.positive("u234_u238_act", d.uth->u234_u238_act, ratio_fix);
        check.sd("u234_u238_act_sd", d.uth->u234_u238_act_sd);
        const char *ppb_fix = "a concentration is 0 or more (ppb)";
        check.notNegative("th232_ppb", d.uth->th232_ppb, ppb_fix);
        check.notNegative("u238_ppb", d.uth->u238_ppb, ppb_fix);
    }
    if (d.c14) {
        check.positive("f14c", d.c14->f14c,
                       "F14C (fraction modern) is greater than 0; check the laboratory report");
        check.sd("f14c_sd", d.c14->f14c_sd);
        check.sd("delta_r_sd_yr", d.c14->delta_r_sd_yr);
    }
}

} // namespace

void validateValueRanges(const CoreDataset &data, IssueList &out) {
    for (std::size_t i = 0; i < data.holes.size(); ++i) {
        const RangeCheck check(out, Table::Holes, i, "hole " + quoted(data.holes[i].hole));
        check.within("lat_deg", data.holes[i].lat_deg, -90.0, 90.0,
                     "give latitude in decimal degrees, -90 to 90 (north positive)");
        check.within("lon_deg", data.holes[i].lon_deg, -180.0, 180.0,
                     "give longitude in decimal degrees, -180 to 180 (east positive)");
    }
    for (std::size_t i = 0; i < data.intervals.size(); ++i) {
        const LithInterval &v = data.intervals[i];
        checkInterval(v, RangeCheck(out, Table::Intervals, i,
                                    "interval " + numberText(v.top_m) + "-" + numberText(v.base_m) +
                                        " m of hole " + quoted(v.hole)));
    }
    for (std::size_t i = 0; i < data.events.size(); ++i) {
        const RangeCheck check(out, Table::Events, i, "event " + quoted(data.events[i].event));
        check.age("age_ma", data.events[i].age_ma);
        check.sd("age_sd_ma", data.events[i].age_sd_ma);
    }
    for (std::size_t i = 0; i < data.dates.size(); ++i)
        checkDate(data.dates[i],
                  RangeCheck(out, Table::Dates, i, "date of hole " + quoted(data.dates[i].hole)));
    for (std::size_t i = 0; i < data.sea_level.size(); ++i) {
        const RangeCheck check(out, Table::SeaLevel, i,
                               "sea-level point at " + numberText(data.sea_level[i].age_ma) +
                                   " Ma");
        check.age("age_ma", data.sea_level[i].age_ma);
        check.sd("level_sd_m", data.sea_level[i].level_sd_m);
    }
    for (std::size_t i = 0; i < data.curve.size(); ++i) {
        const RangeCheck check(out, Table::Curve, i,
                               "curve point at cal_bp " + numberText(data.curve[i].cal_bp));
        check.sd("sd", data.curve[i].sd);
    }
}

} // namespace atollog::detail
