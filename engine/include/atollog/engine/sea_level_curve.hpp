#pragma once
// A relative sea-level curve (sealevel.csv): level relative to present (m, negative below)
// against age (Ma), read by linear interpolation between its points, with its sd.
#include "atollog/engine/core_records.hpp"

#include <span>
#include <vector>

namespace atollog {

struct SeaLevelAt {
    double level_m = 0;    ///< relative to present, negative below
    double level_sd_m = 0; ///< interpolated sd; 0 where the points give none
    bool beyond_curve = false; ///< the age lies outside the curve's age span (see SeaLevelCurve)
};

class SeaLevelCurve {
public:
    SeaLevelCurve() = default; ///< an empty curve: no sea-level information
    /// Sorts the points by age. Throws std::invalid_argument on a non-finite age, level or sd, a
    /// negative sd, or two points at the same age.
    explicit SeaLevelCurve(std::span<const SeaLevelPoint> points);

    bool empty() const { return points_.empty(); }

    /// The level at age_ma. Outside the curve the answer is flagged beyond_curve and
    /// - younger than its first point: that point's level and sd (the present is close);
    /// - older than its last point: 0 m with sd 0, i.e. the present level is assumed, because
    ///   holding the last point would carry one moment of a glacial cycle over millions of
    ///   years. Callers report the flag. Throws std::logic_error on an empty curve and
    ///   std::invalid_argument on a non-finite age.
    SeaLevelAt at(double age_ma) const;

private:
    std::vector<SeaLevelPoint> points_;
};

} // namespace atollog
