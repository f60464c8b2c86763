// U-Th closed-system ages (see uth_age.hpp for the equations and their sources).
#include "atollog/engine/uth_age.hpp"

#include "atollog/engine/seeded_draws.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <stdexcept>
#include <string>
#include <tuple>
#include <utility>
#include <vector>

namespace atollog {
namespace {

constexpr double kLn2 = 0.69314718055994530942;
// Atomic masses (g/mol) of 232Th and 238U, AME2020 (Wang et al. 2021, Chinese Phys. C 45:030003)
// [M: from memory; only their ratio matters and it enters the detrital share, itself +/- 50 %].
constexpr double kTh232MolarMass = 232.0380553;
constexpr double kU238MolarMass = 238.0507882;

void requireFinite(double v, const char *what) {
    if (!std::isfinite(v))
        throw std::invalid_argument(std::string("U-Th: ") + what + " is not finite (got " +
                                    std::to_string(v) + "); give a finite number");
}

/// A result computed from finite inputs that overflowed: refused naming the inputs, never
/// returned as inf.
double requireFiniteResult(double v, const std::string& what) {
    if (!std::isfinite(v))
        throw std::invalid_argument("U-Th: " + what + " overflows a double; check the values");
    return v;
}

/// measured-minus-model ratio at age T; negative while T is too young.
double ratioMismatch(double t_yr, double ratio, double d234u_m, double detrital, double l230,
                     double l234) {
    const double closed = 1.0 - std::exp(-l230 * t_yr) +
                          (d234u_m / 1000.0) * l230 / (l230 - l234) *
                              (1.0 - std::exp(-(l230 - l234) * t_yr));
    return closed + detrital * std::exp(-l230 * t_yr) - ratio;
}

} // namespace

double UThHalfLives::lambda230_per_yr() const { return kLn2 / th230_yr; }
double UThHalfLives::lambda234_per_yr() const { return kLn2 / u234_yr; }

UThHalfLives uthHalfLives(UThHalfLifeSet set) {
    switch (set) {
    case UThHalfLifeSet::Cheng2013: return {75584.0, 245620.0};
    case UThHalfLifeSet::Cheng2000: return {75690.0, 245250.0};
    }
    throw std::invalid_argument("uthHalfLives: unknown half-life set");
}

double d234uPermilFromActivity(double u234_u238_act) {
    requireFinite(u234_u238_act, "234U/238U");
    return requireFiniteResult((u234_u238_act - 1.0) * 1000.0,
                               "d234U from 234U/238U " + std::to_string(u234_u238_act));
}

UThRatios uthRatiosForAge(double age_yr, double d234u_initial_permil, UThHalfLifeSet set) {
    requireFinite(age_yr, "age_yr");
    requireFinite(d234u_initial_permil, "initial d234U");
    if (age_yr < 0) throw std::invalid_argument("U-Th: age_yr must be >= 0");
    const UThHalfLives h = uthHalfLives(set);
    const double l230 = h.lambda230_per_yr(), l234 = h.lambda234_per_yr();
    UThRatios r;
    r.d234u_measured_permil = d234u_initial_permil * std::exp(-l234 * age_yr);
    r.th230_u238_act = ratioMismatch(age_yr, 0.0, r.d234u_measured_permil, 0.0, l230, l234);
    return r;
}

double d234uInitialPermil(double d234u_measured_permil, double age_yr, UThHalfLifeSet set) {
    requireFinite(d234u_measured_permil, "measured d234U");
    requireFinite(age_yr, "age_yr");
    // e^(l234 T) overflows for T beyond ~2e8 yr: refused rather than returned as inf.
    return requireFiniteResult(
        d234u_measured_permil * std::exp(uthHalfLives(set).lambda234_per_yr() * age_yr),
        "initial d234U at age_yr " + std::to_string(age_yr));
}

std::optional<double> solveUThAgeYr(double th230_u238_act, double d234u_measured_permil,
                                    UThHalfLifeSet set, double detrital_th230_u238_act) {
    requireFinite(th230_u238_act, "230Th/238U");
    requireFinite(d234u_measured_permil, "measured d234U");
    requireFinite(detrital_th230_u238_act, "detrital 230Th/238U");
    if (th230_u238_act < 0) throw std::invalid_argument("U-Th: 230Th/238U must be >= 0");
    if (detrital_th230_u238_act < 0)
        throw std::invalid_argument("U-Th: detrital 230Th/238U must be >= 0");
    if (!(d234u_measured_permil > -1000.0))
        throw std::invalid_argument("U-Th: d234U must be > -1000 per mil (234U/238U > 0)");

    const UThHalfLives h = uthHalfLives(set);
    const double l230 = h.lambda230_per_yr(), l234 = h.lambda234_per_yr();
    auto f = [&](double t) {
        return ratioMismatch(t, th230_u238_act, d234u_measured_permil, detrital_th230_u238_act,
                             l230, l234);
    };
    const double f0 = f(0.0);
    if (f0 == 0.0) return 0.0;
    if (f0 > 0.0) return std::nullopt; // less 230Th than the detrital share alone

    // The mismatch need not be monotonic (negative d234U, or a detrital share), so walk a
    // geometric grid to the first sign change and solve inside it: the youngest matching age.
    double lo = 0.0, hi = 500.0;
    for (;;) {
        const double fhi = f(hi);
        if (fhi >= 0.0) {
            if (fhi == 0.0) return hi;
            break;
        }
        if (hi >= kUThSearchLimitYr) return std::nullopt;
        lo = hi;
        hi = std::min(hi * 1.08, kUThSearchLimitYr);
    }
    std::uintmax_t max_iter = 200;
    const auto bracket = boost::math::tools::toms748_solve(
        f, lo, hi, boost::math::tools::eps_tolerance<double>(50), max_iter);
    return 0.5 * (bracket.first + bracket.second);
}

double detritalTh230U238Act(double th232_ppb, double u238_ppb, double th230_th232_atomic,
                            UThHalfLifeSet set) {
    requireFinite(th232_ppb, "th232_ppb");
    requireFinite(u238_ppb, "u238_ppb");
    requireFinite(th230_th232_atomic, "initial 230Th/232Th atomic ratio");
    if (th232_ppb < 0) throw std::invalid_argument("U-Th: th232_ppb must be >= 0");
    if (!(u238_ppb > 0)) throw std::invalid_argument("U-Th: u238_ppb must be > 0");
    if (th230_th232_atomic < 0)
        throw std::invalid_argument("U-Th: initial 230Th/232Th atomic ratio must be >= 0");
    const double atoms_232_per_238 = (th232_ppb / kTh232MolarMass) / (u238_ppb / kU238MolarMass);
    const double lambda230_over_238 = kU238HalfLifeYr / uthHalfLives(set).th230_yr;
    // th232_ppb / u238_ppb overflows for e.g. 1e300 / 1e-300: refused rather than inf.
    return requireFiniteResult(atoms_232_per_238 * th230_th232_atomic * lambda230_over_238,
                               "detrital 230Th/238U from th232_ppb " + std::to_string(th232_ppb) +
                                   " and u238_ppb " + std::to_string(u238_ppb));
}

UThAge computeUThAge(const UThMeasurement& m, const UThSettings& settings, std::uint64_t seed) {
    requireFinite(m.th230_u238_act, "230Th/238U");
    requireFinite(m.u234_u238_act, "234U/238U");
    if (m.th230_u238_act < 0) throw std::invalid_argument("U-Th: 230Th/238U must be >= 0");
    if (!(m.u234_u238_act > 0)) throw std::invalid_argument("U-Th: 234U/238U must be > 0");
    if (!std::isfinite(m.th230_u238_act_sd) || !(m.th230_u238_act_sd > 0))
        throw std::invalid_argument("U-Th: 230Th/238U sd must be finite and > 0");
    if (!std::isfinite(m.u234_u238_act_sd) || !(m.u234_u238_act_sd > 0))
        throw std::invalid_argument("U-Th: 234U/238U sd must be finite and > 0");
    if (settings.mc_draws < 2)
        throw std::invalid_argument("U-Th: mc_draws must be at least 2, got " +
                                    std::to_string(settings.mc_draws));
    if (!std::isfinite(settings.detrital_ratio_relative_sd) ||
        settings.detrital_ratio_relative_sd < 0)
        throw std::invalid_argument("U-Th: detrital_ratio_relative_sd must be finite and >= 0");

    const UThHalfLifeSet set = settings.half_lives;
    UThAge out;
    out.d234u_measured_permil = d234uPermilFromActivity(m.u234_u238_act);
    // A 234U/238U so close to 0 (e.g. 1e-300) that d234U rounds to -1000 has no age equation;
    // refused here by name rather than by solveUThAgeYr's message about d234U.
    if (!(out.d234u_measured_permil > -1000.0))
        throw std::invalid_argument("U-Th: 234U/238U " + std::to_string(m.u234_u238_act) +
                                    " is too close to 0 (d234U rounds to -1000 per mil)");
    double detrital = 0.0;
    if (settings.detrital_correction && m.th232_ppb && m.u238_ppb) {
        detrital = detritalTh230U238Act(*m.th232_ppb, *m.u238_ppb,
                                        settings.detrital_th230_th232_atomic, set);
        out.detrital_th230_u238_act = detrital;
    }
    out.age_yr = solveUThAgeYr(m.th230_u238_act, out.d234u_measured_permil, set, detrital);
    if (out.age_yr) out.d234u_initial_permil = d234uInitialPermil(out.d234u_measured_permil,
                                                                  *out.age_yr, set);

    SeededDraws draws(seed);
    std::vector<double> ages, initials;
    ages.reserve(settings.mc_draws);
    initials.reserve(settings.mc_draws);
    for (std::size_t i = 0; i < settings.mc_draws; ++i) {
        // Draw all three every time, so draw i uses the same stream positions whatever failed.
        const double ratio = std::max(0.0, draws.normal(m.th230_u238_act, m.th230_u238_act_sd));
        const double u234 = draws.normal(m.u234_u238_act, m.u234_u238_act_sd);
        const double scale = draws.normal(1.0, settings.detrital_ratio_relative_sd);
        if (!(u234 > 0)) { ++out.draws_without_solution; continue; }
        const double d234u = d234uPermilFromActivity(u234);
        // A draw of 234U/238U just above 0 rounds d234U to -1000: no age, like u234 <= 0
        // (before, solveUThAgeYr threw from inside the Monte Carlo).
        if (!(d234u > -1000.0)) { ++out.draws_without_solution; continue; }
        const std::optional<double> t =
            solveUThAgeYr(ratio, d234u, set, detrital * std::max(0.0, scale));
        if (!t) { ++out.draws_without_solution; continue; }
        ages.push_back(*t);
        initials.push_back(d234uInitialPermil(d234u, *t, set));
    }
    out.draws = settings.mc_draws;
    if (ages.size() >= 2) {
        auto meanSd = [](const std::vector<double>& v) {
            double mean = 0;
            for (double x : v) mean += x;
            mean /= static_cast<double>(v.size());
            // Deviations in units of the largest one: draws of d234U near 1e303 (a 234U/238U
            // sd of 1e300) overflowed the sum of squares into an infinite sd.
            double scale = 0;
            for (double x : v) scale = std::max(scale, std::fabs(x - mean));
            if (!(scale > 0)) return std::pair{mean, 0.0};
            double ss = 0;
            for (double x : v) ss += ((x - mean) / scale) * ((x - mean) / scale);
            return std::pair{mean, scale * std::sqrt(ss / static_cast<double>(v.size() - 1))};
        };
        UThSpread s;
        std::tie(s.mean_age_yr, s.sd_age_yr) = meanSd(ages);
        std::tie(s.mean_d234u_initial_permil, s.sd_d234u_initial_permil) = meanSd(initials);
        std::sort(ages.begin(), ages.end());
        // Quantile of the sorted draws by linear interpolation between order statistics.
        auto q = [&](double p) {
            const double pos = p * static_cast<double>(ages.size() - 1);
            const std::size_t k = static_cast<std::size_t>(pos);
            if (k + 1 >= ages.size()) return ages.back();
            return ages[k] + (pos - static_cast<double>(k)) * (ages[k + 1] - ages[k]);
        };
        s.q025_age_yr = q(0.025);
        s.median_age_yr = q(0.5);
        s.q975_age_yr = q(0.975);
        out.spread = s;
    }
    return out;
}

} // namespace atollog
