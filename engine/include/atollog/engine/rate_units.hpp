#pragma once
// Conversions between the units in which sedimentation and accretion rates are quoted:
// 1 cm/kyr = 10 m/Myr = 0.01 mm/yr (1 mm/yr = 1 m/kyr = 1000 m/Myr). Pure unit arithmetic.

namespace atollog {

constexpr double mPerMyrFromCmPerKyr(double rate_cm_per_kyr) { return rate_cm_per_kyr * 10.0; }
constexpr double cmPerKyrFromMPerMyr(double rate_m_per_myr) { return rate_m_per_myr / 10.0; }
constexpr double mmPerYrFromCmPerKyr(double rate_cm_per_kyr) { return rate_cm_per_kyr / 100.0; }
constexpr double cmPerKyrFromMmPerYr(double rate_mm_per_yr) { return rate_mm_per_yr * 100.0; }
constexpr double mmPerYrFromMPerMyr(double rate_m_per_myr) { return rate_m_per_myr / 1000.0; }
constexpr double mPerMyrFromMmPerYr(double rate_mm_per_yr) { return rate_mm_per_yr * 1000.0; }

} // namespace atollog
