#pragma once
// Lines of correlation (graphic correlation, Shaw 1964, Time in Stratigraphy): the events two
// holes share, cross-plotted level against level. Where both holes accumulated steadily the
// points fall on a straight line whose slope is the ratio of their accumulation rates; a hiatus
// in one hole shows as a dog-leg, so the line is cut into pieces at logged surfaces and each
// piece gets its own straight line. Points far off their piece's line are flagged: a reworked
// find, a missed datum, or a miscorrelated event.
//
// Points. Each event observed in both holes gives one point. An observed bracket says only that
// the event lies somewhere in [shallow_m, deep_m]; we take it as uniform there, so the point is
// the bracket's midpoint (the uniform's mean, not the observed level, which sits at one end of
// the bracket for a base or top) and its sd is width / sqrt(12) (the uniform's sd), never below
// LocSettings::sd_floor_m. Points are returned sorted by x (then y, then event index).
//
// Pieces. With break_at_surfaces, every logged surface of either hole that lies between points
// cuts the x-sorted points in two:
//   - a surface of the x hole at depth s cuts between the points with x < s and those with
//     x >= s (a level on a surface belongs below it, as in the age model); its break is at s;
//   - a surface of the y hole at depth s cuts at the place in the x order that leaves the fewest
//     points on the wrong side of it (y >= s before the cut, y < s after it; the shallowest such
//     place when several tie), so one off-line point cannot scatter breaks along the line; its
//     break is halfway between the x of the two points either side of the cut.
// A surface with all points on one side cuts nothing and is not listed. breaks_x_m holds the
// break of every surface that cuts, ascending, without repeats; several surfaces between the
// same two points cut once (the pieces cannot tell them apart). Each piece (segment) spans its
// own points' x range [x_from_m, x_to_m]: where the line runs between pieces is not observed.
//
// Fits. A piece with at least 3 points and x not all equal is fitted: York et al. (2004) with
// the points' x and y sds (uncorrelated; yorkFit, sds not scaled by sqrt(MSWD)), or the
// reduced major axis (reducedMajorAxis; mswd then 0). Other pieces stay fitted = false, as does
// an RMA piece whose x and y are uncorrelated (r = 0): the line there is undefined, not NaN.
// Residual (metres of y): y - (intercept + slope x). z = residual / sqrt(y_sd^2 + slope^2
// x_sd^2), the residual over the point's own error across the line (the York weight), for
// either fit, so a misplaced event stands out however many points share its piece. Points of
// an unfitted piece keep residual 0, z 0, off_line false.
#include "atollog/engine/correlation_data.hpp"

#include <cstddef>
#include <string>
#include <vector>

namespace atollog {

enum class LocFit { York, ReducedMajorAxis };

struct LocPoint {
    std::size_t event = 0; ///< index into CorrelationData::events
    double x_m = 0, x_sd_m = 0, y_m = 0, y_sd_m = 0;
    double residual_m = 0;
    double z = 0;
    bool off_line = false;   ///< |z| >= LocSettings::off_line_z
    std::size_t segment = 0; ///< index into LineOfCorrelation::segments
};

struct LocSegment {
    double x_from_m = 0, x_to_m = 0;
    double slope = 0, slope_sd = 0, intercept_m = 0, intercept_sd_m = 0;
    double mswd = 0; ///< York fits; 0 for RMA
    int points = 0;
    bool fitted = false;
};

struct LineOfCorrelation {
    std::string x_name, y_name; ///< hole ids; "composite" for the composite axis
    LocFit fit = LocFit::York;
    std::vector<LocPoint> points;     ///< sorted by x
    std::vector<LocSegment> segments; ///< in x order
    std::vector<double> breaks_x_m;   ///< ascending
};

struct LocSettings {
    LocFit fit = LocFit::York;
    /// |z| at which a point is off the line. 3: our own threshold (as for the age model's tie
    /// tails), not a published one.
    double off_line_z = 3.0;
    bool break_at_surfaces = true;
    /// Smallest sd a level gets. A point bracket (shallow = deep) would have sd 0, which no
    /// weighted fit can take; core depths are logged to the centimetre (common practice), so
    /// 0.01 m. Must be finite and > 0.
    double sd_floor_m = 0.01;
};

/// Events observed in both holes: x = level in x_hole, y = level in y_hole (see the header
/// comment for points, pieces and fits). Throws std::invalid_argument on invalid data
/// (validateCorrelationData), a hole index out of range, the same hole twice, settings out of
/// range, or fewer than 3 shared events (naming both holes). A York fit that does not converge
/// throws std::runtime_error (yorkFit).
LineOfCorrelation lineOfCorrelation(const CorrelationData& data, std::size_t x_hole,
                                    std::size_t y_hole, const LocSettings& s = {});

/// A hole against a composite sequence. composite_order lists event indices oldest first; an
/// event's x is its rank counted from the youngest end, x = (size - 1) - position, so that x,
/// like depth, grows down-section and a steadily accumulating hole gives a rising line (slope
/// in metres per composite step). A rank stands for a unit cell of the composite axis, hence
/// x_sd = 1 / sqrt(12) (the same uniform rule as a depth bracket). y = level in the hole; only
/// the hole's surfaces break the line. Throws std::invalid_argument on invalid data, a hole
/// index out of range, a composite entry out of range or listed twice, settings out of range,
/// or fewer than 3 composite events observed in the hole (naming the hole and the composite).
LineOfCorrelation lineAgainstComposite(const CorrelationData& data,
                                       const std::vector<std::size_t>& composite_order,
                                       std::size_t hole, const LocSettings& s = {});

} // namespace atollog
