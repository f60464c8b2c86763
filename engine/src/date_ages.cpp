// Numerical dates -> age distributions at depth brackets (see date_ages.hpp).
#include "atollog/engine/date_ages.hpp"

#include "atollog/engine/depth_model.hpp"
#include "atollog/engine/number_text.hpp"
#include "atollog/engine/radiocarbon.hpp"
#include "atollog/engine/seeded_draws.hpp"
#include "atollog/engine/vocabulary.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <stdexcept>

namespace atollog {
namespace {

constexpr double kYrPerMa = 1e6;
constexpr double kKaPerMa = 1e3;

std::string rowText(std::size_t i) { return "dates row " + std::to_string(i + 1); }

void checkSettings(const DateSettings& s) {
    if (!std::isfinite(s.d234u_tolerance_permil) || s.d234u_tolerance_permil < 0)
        throw std::invalid_argument("date settings: d234u_tolerance_permil must be finite and "
                                    ">= 0, got " + numberText(s.d234u_tolerance_permil));
    if (!std::isfinite(s.detrital_th230_th232_atomic) || s.detrital_th230_th232_atomic < 0)
        throw std::invalid_argument("date settings: detrital_th230_th232_atomic must be finite "
                                    "and >= 0, got " + numberText(s.detrital_th230_th232_atomic));
    if (!std::isfinite(s.detrital_ratio_relative_sd) || s.detrital_ratio_relative_sd < 0)
        throw std::invalid_argument("date settings: detrital_ratio_relative_sd must be finite "
                                    "and >= 0, got " + numberText(s.detrital_ratio_relative_sd));
    if (s.mc_draws < 2)
        throw std::invalid_argument("date settings: mc_draws must be at least 2, got " +
                                    std::to_string(s.mc_draws));
}

void setAge(DateAge& out, const AgeDistribution& age, std::size_t row) {
    // Ma -> ka multiplies by 1000: an age above ~1.8e305 Ma would become inf ka.
    if (!std::isfinite(age.mean_ma() * kKaPerMa) || !std::isfinite(age.sd_ma() * kKaPerMa))
        throw std::invalid_argument(rowText(row) + ": age_ma " + numberText(age.mean_ma()) +
                                    " +/- " + numberText(age.sd_ma()) +
                                    " is beyond any age in ka; check the value and its unit");
    out.age = age;
    out.age_ka = age.mean_ma() * kKaPerMa;
    out.age_sd_ka = age.sd_ma() * kKaPerMa;
}

void takeEnteredAge(DateAge& out, const NumericalDate& d, std::size_t row) {
    if (!d.age_ma || !d.age_sd_ma)
        throw std::invalid_argument(rowText(row) + ": method " +
                                    std::string(toString(d.method)) +
                                    " needs age and age_sd (or its raw measurement)");
    // Checked here so that the message names the dates columns, not the distribution's.
    if (!std::isfinite(*d.age_ma))
        throw std::invalid_argument(rowText(row) + ": age_ma " + numberText(*d.age_ma) +
                                    " is not a finite number; give the age in Ma");
    if (!std::isfinite(*d.age_sd_ma) || !(*d.age_sd_ma > 0))
        throw std::invalid_argument(rowText(row) + ": age_sd_ma " + numberText(*d.age_sd_ma) +
                                    " must be a finite number > 0; give the age's 1 sd in Ma");
    setAge(out, AgeDistribution::normal(*d.age_ma, *d.age_sd_ma), row);
    out.flags.push_back(date_flag::kAsEntered);
    out.usable_for_model = true;
}

void dateUTh(DateAge& out, const UThMeasurement& m, const DateSettings& s, std::size_t row) {
    UThSettings us;
    us.half_lives = s.half_lives;
    us.detrital_correction = s.detrital_correction;
    us.detrital_th230_th232_atomic = s.detrital_th230_th232_atomic;
    us.detrital_ratio_relative_sd = s.detrital_ratio_relative_sd;
    us.mc_draws = s.mc_draws;
    UThAge u;
    try {
        u = computeUThAge(m, us, streamSeed(s.seed, row));
    } catch (const std::invalid_argument& e) {
        throw std::invalid_argument(rowText(row) + ": " + e.what());
    }
    if (u.detrital_th230_u238_act) out.flags.push_back(date_flag::kDetritalCorrected);
    if (!u.age_yr || !u.spread) {
        // Kept in the report, never in a model: there is no age to give it.
        out.flags.push_back(date_flag::kNoClosedSystemSolution);
        out.messages.push_back(
            "230Th/238U " + numberText(m.th230_u238_act) + " with 234U/238U " +
            numberText(m.u234_u238_act) + (u.age_yr ? " leaves too few Monte Carlo draws with"
                                                    : " has no") +
            " closed-system age (beyond the equation's range, or open-system behaviour): not "
            "used in models");
        out.usable_for_model = false;
        return;
    }
    if (u.draws_without_solution > 0) {
        out.flags.push_back(date_flag::kMcDrawsWithoutSolution);
        out.messages.push_back(std::to_string(u.draws_without_solution) + " of " +
                               std::to_string(u.draws) +
                               " Monte Carlo draws had no closed-system age: the spread is cut "
                               "at the equation's limit and the age may be too young");
    }
    out.uth_age_yr = u.age_yr;
    out.d234u_initial_permil = u.d234u_initial_permil;
    out.d234u_initial_sd_permil = u.spread->sd_d234u_initial_permil;
    out.uth_q025_ka = u.spread->q025_age_yr / 1e3;
    out.uth_q975_ka = u.spread->q975_age_yr / 1e3;
    // Sds so small (e.g. 1e-300) that every draw gives the same age leave no spread: a normal
    // needs sd > 0, and its own message would name neither the row nor the inputs.
    if (!(u.spread->sd_age_yr > 0))
        throw std::invalid_argument(rowText(row) + ": the U-Th Monte Carlo gives no spread of "
                                    "ages (230Th/238U sd " + numberText(m.th230_u238_act_sd) +
                                    ", 234U/238U sd " + numberText(m.u234_u238_act_sd) +
                                    "); give the measured sds");
    // The model sees a normal with the Monte Carlo mean and sd: close to the draws' shape
    // except near the equation's limit (see uth_q025_ka / uth_q975_ka for the skew).
    setAge(out, AgeDistribution::normal(u.spread->mean_age_yr / kYrPerMa,
                                        u.spread->sd_age_yr / kYrPerMa),
           row);
    const bool passes =
        std::abs(*u.d234u_initial_permil - kSeawaterD234uPermil) <= s.d234u_tolerance_permil;
    if (!passes) {
        out.flags.push_back(date_flag::kD234uOutOfRange);
        out.messages.push_back(
            "initial d234U " + derivedNumberText(std::round(*u.d234u_initial_permil * 10) / 10) +
            " per mil is more than " + numberText(s.d234u_tolerance_permil) +
            " per mil from seawater (146.8): the coral may be altered" +
            (s.include_failed_screen ? "; used in models as the settings ask"
                                     : "; not used in models (setting include_failed_screen)"));
    }
    out.usable_for_model = passes || s.include_failed_screen;
}

void dateC14(DateAge& out, const C14Measurement& m, const std::vector<CalibrationPoint>& curve,
             std::size_t row) {
    RadiocarbonAge cra;
    try {
        cra = radiocarbonAgeOf(m);
    } catch (const std::invalid_argument& e) {
        throw std::invalid_argument(rowText(row) + ": " + e.what());
    }
    out.cra_yr = cra.cra_yr;
    out.cra_sd_yr = cra.cra_sd_yr;
    if (curve.empty()) {
        out.flags.push_back(date_flag::kNoCalibrationCurve);
        out.messages.push_back("no calibration curve (curve.csv) is given: the radiocarbon age " +
                               derivedNumberText(std::round(cra.cra_yr)) +
                               " BP cannot be turned into a calendar age and is not used in "
                               "models");
        out.usable_for_model = false;
        return;
    }
    CalibratedAge cal = [&] {
        try {
            return calibrate(cra, curve);
        } catch (const std::invalid_argument& e) {
            throw std::invalid_argument(rowText(row) + ": " + e.what());
        }
    }();
    setAge(out, cal.age, row);
    out.hpd_68 = std::move(cal.hpd_68);
    out.hpd_95 = std::move(cal.hpd_95);
    if (cal.at_curve_edge) {
        out.flags.push_back(date_flag::kCalibrationAtCurveEdge);
        out.messages.push_back("the radiocarbon age " + derivedNumberText(std::round(cra.cra_yr)) +
                               " BP reaches the end of the calibration curve: the calendar age "
                               "is cut there and not used in models");
    }
    // A date cut at the curve's end is still reported but its age is only a bound: left out.
    out.usable_for_model = !cal.at_curve_edge;
}

} // namespace

std::vector<DateAge> computeDateAges(const CoreDataset& data, const DateSettings& settings) {
    checkSettings(settings);
    std::map<std::string, const Sample *> samples;
    for (const Sample& s : data.samples) samples.emplace(s.sample, &s);
    std::map<std::string, std::vector<CoreRun>> runs_by_hole;
    for (const CoreRun& r : data.runs) runs_by_hole[r.hole].push_back(r);
    std::map<std::string, DepthModel> models;
    auto modelOf = [&](const std::string& hole) -> const DepthModel& {
        auto it = models.find(hole);
        if (it == models.end()) it = models.emplace(hole, DepthModel(runs_by_hole[hole])).first;
        return it->second;
    };

    std::vector<DateAge> out;
    out.reserve(data.dates.size());
    for (std::size_t i = 0; i < data.dates.size(); ++i) {
        const NumericalDate& d = data.dates[i];
        DateAge a;
        a.date_index = i;
        a.hole = d.hole;
        a.sample = d.sample;
        a.method = d.method;

        double top_m = 0, base_m = 0;
        if (d.sample) {
            const auto it = samples.find(*d.sample);
            if (it == samples.end())
                throw std::invalid_argument(rowText(i) + ": sample '" + *d.sample +
                                            "' is not in samples");
            if (it->second->hole != d.hole)
                throw std::invalid_argument(rowText(i) + ": sample '" + *d.sample +
                                            "' belongs to hole '" + it->second->hole +
                                            "', not '" + d.hole + "'");
            top_m = it->second->top_m;
            base_m = std::max(it->second->base_m, top_m);
            // Named here: DepthModel's own message would name neither the row nor the sample.
            if (!std::isfinite(top_m) || !std::isfinite(base_m))
                throw std::invalid_argument(rowText(i) + ": sample '" + *d.sample +
                                            "' has a non-finite top_m or base_m (" +
                                            numberText(it->second->top_m) + ", " +
                                            numberText(it->second->base_m) + ")");
        } else if (d.depth_m) {
            if (!std::isfinite(*d.depth_m))
                throw std::invalid_argument(rowText(i) + ": depth_m is not finite");
            top_m = base_m = *d.depth_m;
        } else {
            throw std::invalid_argument(rowText(i) + ": neither sample nor depth_m given");
        }
        const DepthModel& model = modelOf(d.hole);
        const DepthRange top_range = model.trueDepthRange(top_m);
        const DepthRange base_range = model.trueDepthRange(base_m);
        a.shallow_m = std::min(top_range.shallow_m, base_range.shallow_m);
        a.deep_m = std::max(top_range.deep_m, base_range.deep_m);

        const bool raw_uth = d.method == DateMethod::UTh && d.uth;
        const bool raw_c14 = d.method == DateMethod::C14 && d.c14;
        if (raw_uth || raw_c14) {
            if (d.age_ma) a.flags.push_back(date_flag::kEnteredAgeReplaced);
            if (raw_uth) dateUTh(a, *d.uth, settings, i);
            else dateC14(a, *d.c14, data.curve, i);
        } else {
            // Ar-Ar, K-Ar, Sr, other, and a U-Th or c14 date entered as an age (a c14 age_ma is
            // a calendar age: it is not calibrated again).
            takeEnteredAge(a, d, i);
        }
        out.push_back(std::move(a));
    }
    return out;
}

std::string dateFlagsText(const DateAge& d) {
    std::string s;
    for (const auto& f : d.flags) {
        if (!s.empty()) s += ';';
        s += f;
    }
    return s;
}

std::vector<AgeTie> ageTiesFromDates(const std::vector<DateAge>& dates) {
    std::vector<AgeTie> ties;
    for (const DateAge& d : dates) {
        if (!d.usable_for_model || !d.age) continue;
        AgeTie t;
        t.hole = d.hole;
        t.label = std::string(toString(d.method)) + " " +
                  (d.sample ? *d.sample : derivedNumberText(d.shallow_m) + " m");
        t.source = AgeTieSource::Date;
        t.shallow_m = d.shallow_m;
        t.deep_m = d.deep_m;
        t.age = *d.age;
        t.flags = d.flags;
        ties.push_back(std::move(t));
    }
    return ties;
}

std::vector<AgeTie> ageTiesFromTiePoints(const std::vector<TiePoint>& points) {
    std::vector<AgeTie> ties;
    ties.reserve(points.size());
    for (const TiePoint& p : points) {
        if (!std::isfinite(p.shallow_m) || !std::isfinite(p.deep_m) || p.deep_m < p.shallow_m)
            throw std::invalid_argument("tie point " + p.event + " in " + p.hole +
                                        ": bracket must be finite with deep_m >= shallow_m");
        AgeTie t;
        t.hole = p.hole;
        t.label = p.event;
        t.source = AgeTieSource::Datum;
        t.shallow_m = p.shallow_m;
        t.deep_m = p.deep_m;
        try {
            t.age = AgeDistribution::normal(p.age_ma, p.age_sd_ma);
        } catch (const std::invalid_argument& e) {
            throw std::invalid_argument("tie point " + p.event + " in " + p.hole + ": " +
                                        e.what());
        }
        t.flags = p.flags;
        ties.push_back(std::move(t));
    }
    return ties;
}

} // namespace atollog
