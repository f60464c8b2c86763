#include "atollog/engine/subsidence.hpp"

#include "draw_statistics.hpp"

#include <algorithm>
#include <cmath>
#include <random>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

namespace atollog {
namespace {

void requireFinite(const char* what, double v) {
    if (!std::isfinite(v))
        throw std::invalid_argument(std::string("subsidence: ") + what + " is not finite");
}

// Bounds that keep every square in the draw summaries finite (finite values of 1e300 gave
// infinite sds). No depth, elevation or water depth exceeds the Earth's radius (6371 km, from
// memory [M]); no age exceeds 1e6 Ma (as buildAgeModel); a rate over less than a year
// (1e-6 Ma) is no long-term rate, and S / t over t near 0 overflowed.
constexpr double kMaxAbsLengthM = 1e7;
constexpr double kMaxAgeMa = 1e6;
constexpr double kMinAgeForRateFloorMa = 1e-6;

void requireLength(const char* what, double v) {
    requireFinite(what, v);
    if (std::fabs(v) > kMaxAbsLengthM)
        throw std::invalid_argument(std::string("subsidence: ") + what + " " +
                                    std::to_string(v) +
                                    " m is beyond the Earth's radius; give metres");
}

DrawSummary summarize(std::vector<double> values) {
    DrawSummary s;
    s.mean = draw_stats::meanOf(values);
    s.sd = draw_stats::sdOf(values, s.mean);
    std::sort(values.begin(), values.end());
    s.p2_5 = draw_stats::quantileOfSorted(values, 0.025);
    s.p50 = draw_stats::quantileOfSorted(values, 0.5);
    s.p97_5 = draw_stats::quantileOfSorted(values, 0.975);
    return s;
}

double correlation(const std::vector<double>& a, const std::vector<double>& b) {
    const double ma = draw_stats::meanOf(a), mb = draw_stats::meanOf(b);
    double saa = 0, sbb = 0, sab = 0;
    for (std::size_t i = 0; i < a.size(); ++i) {
        saa += (a[i] - ma) * (a[i] - ma);
        sbb += (b[i] - mb) * (b[i] - mb);
        sab += (a[i] - ma) * (b[i] - mb);
    }
    if (saa == 0 || sbb == 0)
        return 0;
    return sab / std::sqrt(saa * sbb);
}

} // namespace

SubsidenceEstimate subsidenceDraws(double depth_m, double collar_elev_m, double paleodepth_min_m,
                                   double paleodepth_max_m, std::span<const double> age_draws_ma,
                                   const SeaLevelCurve& sea_level, std::uint64_t seed,
                                   const SubsidenceSettings& settings) {
    requireLength("depth_m", depth_m);
    requireLength("collar_elev_m", collar_elev_m);
    requireLength("paleodepth_min_m", paleodepth_min_m);
    requireLength("paleodepth_max_m", paleodepth_max_m);
    requireFinite("min_age_for_rate_ma", settings.min_age_for_rate_ma);
    if (settings.min_age_for_rate_ma < kMinAgeForRateFloorMa)
        throw std::invalid_argument("subsidence: min_age_for_rate_ma " +
                                    std::to_string(settings.min_age_for_rate_ma) +
                                    " must be >= 1e-6 Ma (one year): S / t over less is no rate");
    if (paleodepth_min_m > paleodepth_max_m)
        throw std::invalid_argument("subsidence: paleodepth_min_m (" +
                                    std::to_string(paleodepth_min_m) +
                                    ") is greater than paleodepth_max_m (" +
                                    std::to_string(paleodepth_max_m) + ")");
    if (age_draws_ma.empty())
        throw std::invalid_argument("subsidence: no age draws");
    for (double t : age_draws_ma) {
        requireFinite("an age draw", t);
        if (t > kMaxAgeMa)
            throw std::invalid_argument("subsidence: age draw " + std::to_string(t) +
                                        " Ma is beyond 1e6 Ma; give ages in Ma");
        if (t < -0.0001)
            throw std::invalid_argument("subsidence: age draw " + std::to_string(t) +
                                        " Ma lies more than a century after 1950");
    }

    SubsidenceEstimate e;
    e.present_depth_below_sea_level_m = depth_m - collar_elev_m;
    e.draws = static_cast<int>(age_draws_ma.size());
    e.no_sea_level_curve = sea_level.empty();
    std::mt19937_64 engine(seed);
    std::vector<double> s_m, t_ma, rate;
    s_m.reserve(age_draws_ma.size());
    for (double t : age_draws_ma) {
        // Always take both words, so a draw's numbers do not depend on the curve's presence.
        const double u_w = draw_stats::unitUniform(engine());
        const double z = draw_stats::standardNormal(engine);
        const double w_m = paleodepth_min_m + u_w * (paleodepth_max_m - paleodepth_min_m);
        double level_m = 0;
        if (!e.no_sea_level_curve) {
            const SeaLevelAt at = sea_level.at(t);
            level_m = at.level_m + at.level_sd_m * z;
            if (at.beyond_curve)
                ++e.draws_beyond_sea_level_curve;
        }
        const double s = e.present_depth_below_sea_level_m + w_m - level_m;
        s_m.push_back(s);
        t_ma.push_back(t);
        if (t < settings.min_age_for_rate_ma)
            e.rate_undefined_young_age = true;
        else
            rate.push_back(s / t);
    }
    e.subsidence_age_correlation = correlation(s_m, t_ma);
    e.subsidence_m = summarize(std::move(s_m));
    e.age_ma = summarize(std::move(t_ma));
    if (!e.rate_undefined_young_age)
        e.rate_m_per_myr = summarize(std::move(rate));
    return e;
}

SubsidencePoint subsidencePoint(std::string sample, const SubsidenceEstimate& e) {
    return {std::move(sample),   e.age_ma.mean,        e.age_ma.sd,
            e.subsidence_m.mean, e.subsidence_m.sd, e.subsidence_age_correlation};
}

HoleSubsidenceRate holeSubsidenceRate(std::span<const SubsidencePoint> points) {
    std::vector<double> t, t_sd, s, s_sd, r;
    for (const SubsidencePoint& p : points) {
        // Checked here so that the message names the sample; the York fit would name only a
        // point number (and clamp would pass a NaN correlation on).
        for (const auto& [name, v] : {std::pair{"age_ma", p.age_ma},
                                      std::pair{"age_sd_ma", p.age_sd_ma},
                                      std::pair{"subsidence_m", p.subsidence_m},
                                      std::pair{"subsidence_sd_m", p.subsidence_sd_m},
                                      std::pair{"correlation", p.correlation}})
            if (!std::isfinite(v))
                throw std::invalid_argument("hole subsidence rate: sample '" + p.sample + "' has " +
                                            name + " " + std::to_string(v) +
                                            "; give a finite number");
        if (!(p.age_sd_ma > 0) || !(p.subsidence_sd_m > 0))
            throw std::invalid_argument("hole subsidence rate: sample '" + p.sample +
                                        "' needs age_sd_ma > 0 and subsidence_sd_m > 0 (got " +
                                        std::to_string(p.age_sd_ma) + " and " +
                                        std::to_string(p.subsidence_sd_m) + ")");
        t.push_back(p.age_ma);
        t_sd.push_back(p.age_sd_ma);
        s.push_back(p.subsidence_m);
        s_sd.push_back(p.subsidence_sd_m);
        // York needs |r| < 1; draws of a sample whose S is driven by its age can come very close.
        r.push_back(std::clamp(p.correlation, -0.999, 0.999));
    }
    const YorkFit fit = yorkFit(t, t_sd, s, s_sd, r);
    return {fit.slope, fit.slope_sd, fit.intercept, fit.intercept_sd, fit.mswd,
            static_cast<int>(points.size())};
}

} // namespace atollog
