#pragma once
// The numerical dates of a dataset as age distributions at depth brackets, ready to tie an
// age-depth model: U-Th from raw ratios, radiocarbon calibrated on the user's curve, other
// methods (and any date entered as an age) as a normal as entered.
#include "atollog/engine/age_distribution.hpp"
#include "atollog/engine/age_tie.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/hpd_intervals.hpp"
#include "atollog/engine/tie_points.hpp"
#include "atollog/engine/uth_age.hpp"

#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace atollog {

struct DateSettings {
    UThHalfLifeSet half_lives = UThHalfLifeSet::Cheng2013;
    /// A U-Th date passes the screen when |initial d234U - 146.8| <= this (per mil). Keeping
    /// corals within a few per mil of modern seawater is common practice; 8 per mil is our
    /// default setting, not a law.
    double d234u_tolerance_permil = 8.0;
    /// Use dates that fail the d234U screen in age models anyway (they are always reported).
    bool include_failed_screen = false;
    bool detrital_correction = true;
    double detrital_th230_th232_atomic = 4.4e-6; ///< common practice for corals, see uth_age.hpp
    double detrital_ratio_relative_sd = 0.5;
    std::size_t mc_draws = 2000;
    std::uint64_t seed = 20240611; ///< each date draws from streamSeed(seed, row index)
};

/// Flag words (DateAge::flags), in this order when present.
namespace date_flag {
inline constexpr const char *kAsEntered = "as_entered"; ///< age taken as entered (age_ma +/- sd)
inline constexpr const char *kEnteredAgeReplaced = "entered_age_replaced"; ///< raw data won
inline constexpr const char *kDetritalCorrected = "detrital_corrected";
inline constexpr const char *kNoClosedSystemSolution = "no_closed_system_solution";
inline constexpr const char *kMcDrawsWithoutSolution = "mc_draws_without_solution";
inline constexpr const char *kD234uOutOfRange = "d234u_out_of_range";
inline constexpr const char *kNoCalibrationCurve = "no_calibration_curve";
inline constexpr const char *kCalibrationAtCurveEdge = "calibration_at_curve_edge";
} // namespace date_flag

struct DateAge {
    std::size_t date_index = 0;        ///< row of CoreDataset::dates
    std::string hole;
    std::optional<std::string> sample;
    double shallow_m = 0;              ///< true-depth bracket the dated piece may come from
    double deep_m = 0;
    DateMethod method = DateMethod::Other;
    std::optional<AgeDistribution> age; ///< nullopt when no age could be computed
    std::optional<double> age_ka;       ///< mean of `age`
    std::optional<double> age_sd_ka;    ///< sd of `age`
    // U-Th only.
    std::optional<double> d234u_initial_permil;    ///< from the central ratios
    std::optional<double> d234u_initial_sd_permil; ///< Monte Carlo
    std::optional<double> uth_age_yr;              ///< closed-system age of the central ratios
    std::optional<double> uth_q025_ka, uth_q975_ka;
    // Radiocarbon only (raw F14C given).
    std::optional<double> cra_yr;    ///< conventional age, less Delta-R when given
    std::optional<double> cra_sd_yr;
    std::vector<AgeInterval> hpd_68; ///< calibrated ranges, in Ma
    std::vector<AgeInterval> hpd_95;
    std::vector<std::string> flags;
    /// One sentence per problem flag, for the user (what happened and what to do about it).
    std::vector<std::string> messages;
    bool usable_for_model = false;
};

/// One DateAge per row of data.dates, in row order. Depth bracket: the sample's top..base (or
/// depth_m), widened by DepthModel::trueDepthRange of the hole's runs for partial recovery.
/// Throws std::invalid_argument (naming the dates row) on bad settings, a row without sample
/// and depth, an unknown sample, a sample of another hole, a row with neither an entered age nor
/// raw data for its method, or invalid measurements; on invalid runs, as DepthModel does.
std::vector<DateAge> computeDateAges(const CoreDataset& data, const DateSettings& settings);

/// The flags joined with ';' (empty for none).
std::string dateFlagsText(const DateAge& d);

/// Ties for age models from the usable dates, in order. Label: "<method> <sample or depth_m>".
std::vector<AgeTie> ageTiesFromDates(const std::vector<DateAge>& dates);

/// Ties from datum picks: normal(age_ma, age_sd_ma) over [shallow_m, deep_m], the pick's flags
/// kept. Throws std::invalid_argument on a bad age sd or a bracket with deep above shallow.
std::vector<AgeTie> ageTiesFromTiePoints(const std::vector<TiePoint>& ties);

} // namespace atollog
