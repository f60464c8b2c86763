#include "atollog/engine/radiocarbon.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>
#include <string>

namespace atollog {
namespace {

constexpr double kYrPerMa = 1e6;
constexpr double kHpd68 = 0.683; // the usual "1 sigma" and "2 sigma" probabilities
constexpr double kHpd95 = 0.954;
constexpr double kEdgeDensityShare = 0.01;

} // namespace

RadiocarbonAge conventionalAge(double f14c, double f14c_sd) {
    if (!std::isfinite(f14c) || !(f14c > 0))
        throw std::invalid_argument("radiocarbon: f14c must be finite and > 0, got " +
                                    std::to_string(f14c));
    if (!std::isfinite(f14c_sd) || !(f14c_sd > 0))
        throw std::invalid_argument("radiocarbon: f14c_sd must be finite and > 0, got " +
                                    std::to_string(f14c_sd));
    const RadiocarbonAge a{-kLibbyMeanLifeYr * std::log(f14c), kLibbyMeanLifeYr * f14c_sd / f14c};
    // sd / f14c overflows for e.g. 1e300 / 1e-300: refused rather than returned as inf.
    if (!std::isfinite(a.cra_sd_yr))
        throw std::invalid_argument("radiocarbon: f14c_sd " + std::to_string(f14c_sd) +
                                    " over f14c " + std::to_string(f14c) +
                                    " overflows the CRA sd; check both values");
    return a;
}

RadiocarbonAge applyDeltaR(const RadiocarbonAge& cra, double delta_r_yr, double delta_r_sd_yr) {
    if (!std::isfinite(cra.cra_yr) || !std::isfinite(cra.cra_sd_yr) || cra.cra_sd_yr < 0)
        throw std::invalid_argument("radiocarbon: CRA and its sd must be finite, sd >= 0");
    if (!std::isfinite(delta_r_yr))
        throw std::invalid_argument("radiocarbon: delta_r_yr is not finite");
    if (!std::isfinite(delta_r_sd_yr) || delta_r_sd_yr < 0)
        throw std::invalid_argument("radiocarbon: delta_r_sd_yr must be finite and >= 0");
    const RadiocarbonAge a{cra.cra_yr - delta_r_yr, std::hypot(cra.cra_sd_yr, delta_r_sd_yr)};
    // Two finite values whose difference (or quadrature sum) overflows: refused, not inf.
    if (!std::isfinite(a.cra_yr) || !std::isfinite(a.cra_sd_yr))
        throw std::invalid_argument("radiocarbon: the CRA less delta_r_yr " +
                                    std::to_string(delta_r_yr) +
                                    " (or its sd with delta_r_sd_yr) overflows; check both");
    return a;
}

RadiocarbonAge radiocarbonAgeOf(const C14Measurement& m) {
    RadiocarbonAge a = conventionalAge(m.f14c, m.f14c_sd);
    if (m.delta_r_yr) a = applyDeltaR(a, *m.delta_r_yr, m.delta_r_sd_yr.value_or(0.0));
    else if (m.delta_r_sd_yr)
        throw std::invalid_argument("radiocarbon: delta_r_sd_yr given without delta_r_yr");
    return a;
}

CalibratedAge calibrate(const RadiocarbonAge& cra, const std::vector<CalibrationPoint>& curve) {
    if (!std::isfinite(cra.cra_yr) || !std::isfinite(cra.cra_sd_yr) || cra.cra_sd_yr < 0)
        throw std::invalid_argument("calibrate: CRA and its sd must be finite, sd >= 0");
    if (curve.size() < 2)
        throw std::invalid_argument("calibrate: the calibration curve needs at least two points, "
                                    "got " + std::to_string(curve.size()));
    std::vector<CalibrationPoint> c = curve;
    for (std::size_t i = 0; i < c.size(); ++i) {
        const auto& p = c[i];
        if (!std::isfinite(p.cal_bp) || !std::isfinite(p.c14_bp) || !std::isfinite(p.sd) ||
            p.sd < 0)
            throw std::invalid_argument("calibrate: curve point " + std::to_string(i) +
                                        " has a non-finite value or a negative sd");
    }
    std::stable_sort(c.begin(), c.end(),
                     [](const auto& a, const auto& b) { return a.cal_bp < b.cal_bp; });
    for (std::size_t i = 1; i < c.size(); ++i)
        if (c[i].cal_bp == c[i - 1].cal_bp)
            throw std::invalid_argument("calibrate: two curve points at cal_bp " +
                                        std::to_string(c[i].cal_bp));

    const double young = c.front().cal_bp, old = c.back().cal_bp;
    const double span = old - young;
    // Two finite cal_bp whose difference overflows gave n = floor(inf / inf) (undefined).
    if (!std::isfinite(span))
        throw std::invalid_argument("calibrate: the curve's cal_bp span from " +
                                    std::to_string(young) + " to " + std::to_string(old) +
                                    " overflows; check the curve's cal_bp values");
    const double step = std::max(1.0, span / kMaxCalibrationGridPoints);
    // At least both ends: a curve shorter than one step gave a single point, which no
    // distribution can be made of.
    const std::size_t n = std::max<std::size_t>(
        2, static_cast<std::size_t>(std::floor(span / step)) + 1);

    std::vector<double> t(n), log_p(n);
    std::size_t seg = 0;
    double peak = -std::numeric_limits<double>::infinity();
    for (std::size_t i = 0; i < n; ++i) {
        t[i] = (i + 1 == n) ? old : young + static_cast<double>(i) * step;
        while (seg + 2 < c.size() && t[i] > c[seg + 1].cal_bp) ++seg;
        const auto& a = c[seg];
        const auto& b = c[seg + 1];
        const double w = (t[i] - a.cal_bp) / (b.cal_bp - a.cal_bp);
        const double mu = a.c14_bp + w * (b.c14_bp - a.c14_bp);
        const double sigma = a.sd + w * (b.sd - a.sd);
        // hypot and r / s rather than s^2 + sigma^2 and r^2 / var: a CRA sd of 1e300 made the
        // variance inf and every log density -inf, hence NaN densities.
        const double s = std::hypot(cra.cra_sd_yr, sigma);
        if (!(s > 0))
            throw std::invalid_argument("calibrate: the CRA sd and the curve sd are both 0 at " +
                                        std::to_string(t[i]) + " cal BP");
        const double z = (cra.cra_yr - mu) / s;
        log_p[i] = -0.5 * z * z - std::log(s);
        peak = std::max(peak, log_p[i]);
    }
    // Every point more than ~1e154 sd from the CRA: the densities cannot be compared.
    if (!std::isfinite(peak))
        throw std::invalid_argument("calibrate: the CRA (cra_yr " + std::to_string(cra.cra_yr) +
                                    " +/- " + std::to_string(cra.cra_sd_yr) +
                                    ") lies too many sds from every curve point; check cra_yr "
                                    "and its sd");
    std::vector<double> density(n), ages_ma(n);
    for (std::size_t i = 0; i < n; ++i) {
        density[i] = std::exp(log_p[i] - peak); // peak is 1: no underflow of the whole
        ages_ma[i] = t[i] / kYrPerMa;
    }
    const bool at_edge =
        density.front() > kEdgeDensityShare || density.back() > kEdgeDensityShare;
    AgeDistribution dist = AgeDistribution::gridded(std::move(ages_ma), std::move(density));
    CalibratedAge out{dist, highestDensityIntervals(dist, kHpd68),
                      highestDensityIntervals(dist, kHpd95), step, at_edge};
    return out;
}

} // namespace atollog
