#pragma once
// Is a vertical reef accretion rate plausible? 1-10 mm/yr is the range used as a plausibility
// check in common practice. For context: Smith & Kinsey (1976, Science 194:937) put the maximum
// vertical accretion from calcification at 3-5 mm/yr, and a compilation of 79 dated Holocene
// core sections (Depositional Record 5(3):515, 2019) gives a mean of about 5 m/kyr (5 mm/yr).
// Long-term rates over glacial cycles, with exposure gaps, are far lower and fall below it.

namespace atollog {

enum class ReefAccretionVerdict { BelowRange, InRange, AboveRange };

constexpr double kReefAccretionLow_mm_per_yr = 1.0;   ///< common practice
constexpr double kReefAccretionHigh_mm_per_yr = 10.0; ///< common practice

/// Where rate_mm_per_yr lies against the 1-10 mm/yr range (ends inclusive). Throws
/// std::invalid_argument on a negative or non-finite rate.
ReefAccretionVerdict reefAccretionVerdict(double rate_mm_per_yr);

} // namespace atollog
